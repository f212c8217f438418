/** Escapes text for HTML. */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c] ?? c);
}

export interface ClientExportInput {
  title: string;
  subtitle: string;
  /** The study's own lines (title, prepared by, date, last changed, notes), shown under the title. */
  details?: readonly (readonly [string, string])[];
  caution: string;
  /** The one-page summary (answer, recommendation, options side by side, glossary, caution) as HTML, already serialised. */
  summaryHtml?: string;
  /** Stylesheet text, inlined. */
  css: string;
  table: { caption: string; header: readonly string[]; rows: readonly (readonly string[])[] };
  /** Rendered chart figures as HTML (inline SVG), already serialised. */
  chartsHtml: readonly string[];
  assumptions: { heading: string; items: readonly (readonly [string, string])[] }[];
  generated: string;
}

/**
 * One self-contained HTML file for the client: styles inlined, charts as inline SVG, no script
 * and no network access, clean A4 pages when printed.
 */
export function clientExportHtml(input: ClientExportInput): string {
  const assumptions = input.assumptions.map((section) => `<h3>${escapeHtml(section.heading)}</h3>${keyValuesHtml(section.items)}`).join("");
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'; img-src data:">
<title>${escapeHtml(input.title)}</title>
<style>${input.css}</style>
</head>
<body>
<main class="notebook client-export">
<h1>${escapeHtml(input.title)}</h1>
<p class="intro">${escapeHtml(input.subtitle)}</p>
<p class="caution top-caution" role="note">${escapeHtml(input.caution)}</p>
${input.details ? `<section class="cell summary-part"><h2>Study</h2>${keyValuesHtml(input.details)}</section>` : ""}
${input.summaryHtml ? `<section class="cell summary-part"><h2>At a glance</h2>${input.summaryHtml}</section>` : ""}
<section class="appendix"><h2 class="appendix-title">Appendix: the engineering figures</h2>
<section class="cell"><h2>Headline comparison</h2><div class="table-scroll">${headlineTableHtml(input.table)}</div></section>
<section class="cell"><h2>Option charts</h2><div class="grid charts">${input.chartsHtml.join("\n")}</div></section>
<section class="cell"><h2>Assumptions</h2>${assumptions}</section>
</section>
<p class="caution">${escapeHtml(input.caution)}</p>
<footer class="intro">${escapeHtml(input.generated)}</footer>
</main>
</body>
</html>
`;
}

/** A definition list of label → value. */
function keyValuesHtml(items: readonly (readonly [string, string])[]): string {
  return `<dl class="kv">${items.map(([k, v]) => `<dt>${escapeHtml(k)}</dt><dd>${escapeHtml(v)}</dd>`).join("")}</dl>`;
}

/**
 * The headline table, marked (class and the counts of fields and schemes) for the print layout
 * that turns it on its side so that every heading and every scheme fits the width of A4.
 */
function headlineTableHtml(t: ClientExportInput["table"]): string {
  const head = `<thead><tr>${t.header.map((h) => `<th scope="col">${escapeHtml(h)}</th>`).join("")}</tr></thead>`;
  const body = t.rows.map((r) => `<tr>${r.map((c, i) => `<td${i > 0 && /^[−\-\d.,–]+$/.test(c) ? ' class="num"' : ""}>${escapeHtml(c)}</td>`).join("")}</tr>`).join("");
  return `<table class="headline" style="--fields: ${t.header.length}; --schemes: ${t.rows.length}"><caption>${escapeHtml(t.caption)}</caption>${head}<tbody>${body}</tbody></table>`;
}
