import { format } from "d3";
import { readableUnit } from "../kernel/units";

// One formatting module for every page (issue 14, "words a project lead uses"): three significant
// figures, a currency on every cost, forces in kN or MN, m² and m³ rather than m2 and m3, and
// results text without the internal wording ("could not be computed", "from memory") that belongs
// in the method record. Fixed locale (d3's default en-US), so output is deterministic.

const grouped = format(",.0f");
const g3 = format(",.3~r");

/** Three significant figures with thousands separated: 42,500 · 123 · 12.3 · 0.0123; "–" for a non-finite value. */
function sig3(x: number): string {
  if (!Number.isFinite(x)) return "–";
  if (x === 0) return "0";
  // Above 1,000 the digits past the third are rounded away but the number keeps its size.
  return Math.abs(x) >= 1000 ? grouped(Number(x.toPrecision(3))) : g3(x).replace(/^-/, "−");
}

/** A cost with its currency: "1,230 GBP", "12.3 million GBP". */
function money(x: number, currency: string): string {
  if (!Number.isFinite(x)) return "–";
  return Math.abs(x) >= 1e6 ? `${sig3(x / 1e6)} million ${currency}` : `${sig3(x)} ${currency}`;
}

/** A force in kN below 1 MN and in MN above, 3 significant figures: 42,519,682 N → "42.5 MN". */
function force(newtons: number): string {
  return quantity(newtons, "N");
}

/** A moment in kNm below 1 MNm and in MNm above, 3 significant figures: 86,400 N·m → "86.4 kNm". */
function moment(newtonMetres: number): string {
  return quantity(newtonMetres, "Nm");
}

/** A mass in kg below a tonne and in t above: "850 kg", "1,230 t". */
function mass(kg: number): string {
  return Math.abs(kg) >= 1000 ? `${sig3(kg / 1000)} t` : `${sig3(kg)} kg`;
}

/** Units as a reader writes them: m2 → m², m3 → m³, kgCO2e → kgCO₂e is left as is (a common spelling). */
const unit = readableUnit;

/** The multiples a reader expects of a unit in newtons, largest first (the last below it too): forces in kN or MN, moments in kNm or MNm, stresses in MPa, pressures in kPa, line forces in kN/m. */
const MULTIPLES: Record<string, readonly (readonly [number, string])[]> = {
  N: [[1e6, "MN"], [1e3, "kN"]],
  Nm: [[1e6, "MNm"], [1e3, "kNm"]],
  Pa: [[1e6, "MPa"], [1e3, "kPa"]],
  "N/m": [[1e6, "MN/m"], [1e3, "kN/m"]],
};

/**
 * A value with its unit, ready for a table: forces (N) in kN or MN, stresses and pressures (Pa) in
 * kPa or MPa, line forces (N/m) in kN/m or MN/m, areas in m²; each value in its own multiple, as
 * the member table writes forces (a check's demand and capacity written in one multiple put
 * "0.896 MN" beside "783 kN" in the rows above it, and wrapped in a narrow column).
 */
function quantity(value: number, unitText: string): string {
  const multiples = MULTIPLES[unitText];
  if (multiples) {
    const [factor, name] = multiples.find(([f]) => Math.abs(value) >= f) ?? multiples[multiples.length - 1]!;
    return `${sig3(value / factor)} ${name}`;
  }
  const u = unit(unitText);
  return u ? `${sig3(value)} ${u}` : sig3(value);
}

/**
 * Results text in a project lead's words: the internal prefix "could not be computed:" and
 * "(from memory)" notes dropped (the sources stay in the method record), m2/m3 written m²/m³.
 */
function plain(text: string): string {
  return unit(
    text
      .replace(/\bcould not be computed:\s*/gi, "")
      .replace(/\s*\((?:values? )?from memory[^)]*\)/gi, "")
      .replace(/,\s*from memory\b[^,;)]*/gi, "")
      .replace(/\s{2,}/g, " ")
      .trim(),
  );
}

/** The difference of a value to the best, in per cent of the best: "best", "+12 %", "+1.2×". */
function versusBest(value: number, best: number): string {
  if (!Number.isFinite(value) || !Number.isFinite(best) || best <= 0) return "";
  if (value === best) return "best";
  const ratio = value / best;
  return ratio >= 2 ? `${sig3(ratio)}× the best` : `+${format(".0f")((ratio - 1) * 100)} %`;
}

/** Number formats used on every page. */
export const fmt = {
  /** Thousands separated, no decimals: 12,345 */
  int: grouped,
  /** One decimal: 12.3 */
  one: format(",.1f"),
  /** Two decimals: 1.23 */
  two: format(",.2f"),
  /** Three significant figures: 42,500 · 123 · 12.3 · 0.0123 */
  sig3,
  /** Per cent from a fraction: 0.123 → 12 % */
  pct: (x: number) => `${format(".0f")(x * 100)} %`,
  money,
  force,
  moment,
  mass,
  unit,
  quantity,
  plain,
  versusBest,
};

/**
 * A standard's reference ("EN 1993-1-11:2006") and a command-line flag ("--buckling"): where a
 * table column broke them at their hyphens (a check's clause read "strand tension, EN 1993-1-" over
 * "11:2006 §6.2"), they are kept whole (a clause after it may go to the next line).
 */
const UNBROKEN = /\b(?:EN|ISO|BS) \d[\d-]*(?::\d{4})?|(?<![\w-])--[a-z][a-z-]*/g;

/** A text in runs, those to be kept whole (UNBROKEN) marked; the runs joined are the text. */
export function unbrokenRuns(text: string): { text: string; whole: boolean }[] {
  const runs: { text: string; whole: boolean }[] = [];
  let at = 0;
  for (const m of text.matchAll(UNBROKEN)) {
    if (m.index > at) runs.push({ text: text.slice(at, m.index), whole: false });
    runs.push({ text: m[0], whole: true });
    at = m.index + m[0].length;
  }
  if (at < text.length || runs.length === 0) runs.push({ text: text.slice(at), whole: false });
  return runs;
}

/**
 * A small table element from rows of cells; the first row is the header. `whole`: the columns whose
 * standards' references and flags are kept whole (unbrokenRuns), where the column is wide enough for
 * them (a check table's clauses, the method page's text; in a member table's narrow last column
 * they pushed the table past its box).
 */
export function tableElement(header: readonly string[], rows: readonly (readonly (string | number)[])[], options: { caption?: string; numeric?: readonly boolean[]; whole?: readonly boolean[] } = {}): HTMLTableElement {
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
      if (typeof cell === "number") td.textContent = fmt.sig3(cell);
      else if (options.whole?.[i]) td.append(...unbrokenRuns(cell).map(({ text, whole }) => (whole ? Object.assign(document.createElement("span"), { className: "whole", textContent: text }) : text)));
      else td.textContent = cell;
      if (options.numeric?.[i]) td.className = "num";
      r.append(td);
    });
    tbody.append(r);
  }
  table.append(thead, tbody);
  return table;
}
