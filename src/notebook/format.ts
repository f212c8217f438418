import { format } from "d3";

/** Number formats used on every page (fixed locale: d3's default en-US, so output is deterministic). */
export const fmt = {
  /** Thousands separated, no decimals: 12,345 */
  int: format(",.0f"),
  /** One decimal: 12.3 */
  one: format(",.1f"),
  /** Two decimals: 1.23 */
  two: format(",.2f"),
  /** Three significant figures: 0.0123, 1.23k avoided */
  sig3: (x: number) => (Math.abs(x) >= 1000 ? format(",.0f")(x) : format(".3~g")(x)),
  /** Per cent from a fraction: 0.123 → 12 % */
  pct: (x: number) => `${format(".0f")(x * 100)} %`,
};

/** A small table element from rows of cells; the first row is the header. */
export function tableElement(header: readonly string[], rows: readonly (readonly (string | number)[])[], options: { caption?: string; numeric?: readonly boolean[] } = {}): HTMLTableElement {
  const table = document.createElement("table");
  if (options.caption) {
    const caption = document.createElement("caption");
    caption.textContent = options.caption;
    table.append(caption);
  }
  const thead = document.createElement("thead");
  const tr = document.createElement("tr");
  header.forEach((h, i) => {
    const th = document.createElement("th");
    th.scope = "col";
    th.textContent = h;
    if (options.numeric?.[i]) th.className = "num";
    tr.append(th);
  });
  thead.append(tr);
  const tbody = document.createElement("tbody");
  for (const row of rows) {
    const r = document.createElement("tr");
    row.forEach((cell, i) => {
      const td = document.createElement("td");
      td.textContent = typeof cell === "number" ? fmt.sig3(cell) : cell;
      if (options.numeric?.[i]) td.className = "num";
      r.append(td);
    });
    tbody.append(r);
  }
  table.append(thead, tbody);
  return table;
}
