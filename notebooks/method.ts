// Method and assumptions: the published methods behind every number, the record of every input,
// and the comparison of two study files.
import "../src/notebook/style.css";
import demoStudy from "../data/demo-study.json";
import { startPage, reactiveCell, staticCell, tableElement, downloadText, signal, computed, fmt, studyFilePicker } from "../src/notebook";
import { SCHEME_DECLARATIONS } from "../src/schemes/declarations";
import { assumptionsRecord, type Assumption, type Study } from "../src/study";
import { compareStudies, HEADLINE_METRICS, type SchemeDelta } from "../src/comparison";
import { defaultCatalogue, formatCsv } from "../src/catalogue";
import { designBasis, summariseCase, summariseCombination, type DesignBasis } from "../src/loads";

const { store, main } = startPage({
  id: "method",
  demoStudy,
  intro: "How each number is made, from which published method, and every input the current study uses — with its default, its source and whether it was changed. Compare two study files to see what changed and what each change does.",
});

/** What the method page says of the lattice domes' rise trend, from their declarations (how many rises each samples, and at which other proportions). */
function riseTrendText(): string {
  const byTrend = SCHEME_DECLARATIONS.flatMap((m) => (m.riseSpanRatio?.byTrend ? [{ label: m.label, preferred: m.riseSpanRatio.preferred, ...m.riseSpanRatio.byTrend }] : []));
  if (byTrend.length === 0) return "";
  const each = byTrend.map((t) =>
    t.sampledAt === "reference"
      ? `the ${t.label.toLowerCase()} designs ${t.samples} rises at the reference values of its other proportions, the same at every span, so that its choice moves smoothly with span`
      : `the ${t.label.toLowerCase()} designs ${t.samples} rises at the other proportions a descent finds best at the preferred rise (${t.preferred} × span)`,
  );
  return `The lattice domes' rise is chosen on the trend of the goal across the rise range, not among single designs (each rise gives another mesh and other sections, steps of about ±5 %): a least-squares quadratic through designs at equal steps of rise ÷ span; of the rises whose fitted goal is within 2 % of its least, the one nearest the preferred rise; the other proportions are then searched at that rise. To sample the trend, ${each.join("; ")}.`;
}

const methods: [string, string][] = [
  ["Actions", "One design basis for every scheme (table below): services, imposed roof load, snow uniform (EN 1991-1-3 μ1, Table 5.2) and drifted over half the roof (§5.3.5, Fig. 5.6 — applying it to domes is common practice, not an EN clause), wind as external pressure maps on the dome (EN 1991-1-4 §7.2.8, Fig. 7.12, values from memory) with internal pressure +0.2 / −0.3 (§7.2.9), and a temperature change for cable roofs; combined by EN 1990 eq. 6.10 or the less favourable of 6.10a/6.10b (Table A1.2(B)). A method that takes only a uniform load uses each case's stated conservative uniform equivalent and says so."],
  ["Geometry", "Spherical cap from span and rise; usable floor, by one rule for every scheme, is the plan area with at least the minimum clear height under its lowest members, less the clear zones of anything standing on the floor (masts); enclosed air at ISA sea-level density 1.225 kg/m³ (ISO 2533)."],
  ["Steel members", "EN 1993-1-1 §6.2.3 tension and §6.3.1 flexural buckling (eqs 6.47–6.50, curve a for hot-finished CHS); sections from EN 10210-2 sizes, properties computed from D and t; tube classes by d/t (Table 5.2: bending on W_pl in class 1–2, on W_el in class 3; a class 4 tube is not used in compression)."],
  ["Cables", "Strands sized for EN 1993-1-11 §6.2 (F_Rd = F_uk / (1.5 γR)); parabolic sag–tension H = wL²/8f (Irvine, Cable Structures, ch. 1); fabric strip n = p s²/(8f)."],
  ["Shells and lattices", "Membrane forces of the spherical dome (Timoshenko & Woinowsky-Krieger, ch. 14); classical buckling p_cl = 2E t²/(R²√(3(1−ν²))) times a knock-down; lattice shells through an equivalent continuum 4√(DB)/R²."],
  ["3D analysis", "Tension roofs: form found by the force density method, then geometrically nonlinear static analysis (Newton–Raphson, cables slack in compression) under every combination, with the least prestress that keeps the cables taut, and what sets it named; the default, with the closed form as its seed and the proportion search's fast first estimate (the closed form alone stays a choice per study). The cable dome's closed form is also its cross-check; the cable net's is not: it assumes deep-sagging radial cables held down by valley cables, where the form-found 3D net has none and carries the roof inside the mast ring on its circumferential cables, which uplift unloads (the 3D prestress is about ten times the closed form's at 160 m); its fabric spans from node to node of the form-found net, so the fabric is taken off on the net's surface (flat triangles between its nodes), not on the brief's cap (the closed form's). The span study draws every scheme first with the closed form for the tension roofs, then designs those again in 3D; a large cable net is analysed as an equivalent net that stands two neighbouring circumferential cables for one (not the one beside the mast heads), within 4 % of the full net at its prestress (120–300 m); the risk draws design them by the closed form scaled by the 3D design's ratio to it at the study's own values. Lattice domes: a rigid-jointed 3D frame, linear static solution (each bar checked for its axial force with the joints' bending, EN 1993-1-1 §6.3.3) and the lowest elastic buckling factor (elastic and geometric stiffness), times the knock-down, beside the continuum formula; on demand (the button in a lattice dome's engineering detail, its option, or --buckling on the command line), the deformed shape and the lowest buckling mode drawn there; the span study and the risk draws design the lattice domes without it."],
  ["Timber", "Glulam members to EN 1995-1-1: strengths of the EN 14080 classes with k_mod (Table 3.1) and γ_M (Table 2.3), tension with bending §6.2.3, compression with bending and buckling §6.3.2 (eqs 6.23/6.24, k_c from eqs 6.25–6.28), lateral-torsional buckling §6.3.3 (eqs 6.30–6.35, the lower edge free under uplift over 0.9 × the span, Table 6.1), shear §6.1.7 (eq. 6.13, k_cr = 0.67), deflection §7.2; creep through E/(1+k_def) (§2.3.2.2) in the general buckling check."],
  ["Best proportions", `Each scheme's free proportions (counts, depths, spacings, layers, and its rise within the height limit when each scheme takes its own) are searched for the study's goal — least carbon, cost or mass per m² of usable floor — subject to every check; a pinned proportion is not searched. A tension roof in 3D is searched on its closed form; then the cable dome's rise and post depth and the cable net's mast count and mast height, which the closed form judges badly, are chosen again on 3D designs: the mast count first, on 3D designs at the screened count, a half and two thirds of it, then on from the best to a neighbour while a step is lower by more than the 2 % tie band, the least of them kept (the 3D net is lightest in carbon at about six masts over most spans, where the closed form's count grows with the span); the others on the trend through a few fixed samples (the net's mast height then moved to a neighbouring value while its 3D design is lower by more than the 2 % tie band; its mast ring, sampled at 0.6 and 0.65 × the radius with the mast height moved along so that the outer radial cables keep their slope, moved on past the better by 0.05 at a time while so lower; where the ring moved, the mast height then steps again, from the better of where it was moved to and where it was chosen). Each is chosen at the others' values, not together, so a better pair can be missed: on the demo study a search of every pair around the choice found up to 2 % more at the same mast count (160 m), and with fewer masts on a smaller ring the net is up to 11 % lower at some spans from 70 to 150 m (80 m), where the mast count, chosen first, is not chosen again. ${riseTrendText()} The chosen form and the runner-up's difference are shown with each scheme: for a tension roof, both the best other of its 3D designs and the closed-form search's own choice and runner-up.`],
  ["Take-off", "Every row is roof structure, perimeter (rings, edge beams), substructure (the cable net's ground anchors and central tie-down: allowances, not designed) or envelope (fabric, deck, cladding); carbon and cost count all four, the roof's self-weight the first, second and fourth. No scheme counts the supports under its edge (walls or columns to the eaves): the truss roof designs and checks its columns but gives their steel apart, and a heavier roof would need heavier supports."],
  ["Concrete", "EN 1992-1-1 Table 3.1 (f_cm, E_cm), f_cd = α_cc f_ck / γ_C, minimum reinforcement eq. 9.1N."],
  ["Embodied carbon", "EN 15978 modules as in IStructE, How to calculate embodied carbon (2nd ed.): A1–A3 = mass × factor; A4 by distance and mode; A5 wastage with WF = 1/(1−WR) − 1; C1–C4 where given; module D and biogenic storage (EN 16449) reported apart, never netted."],
  ["Cost", "Elemental order of cost: quantity × rate × location factor, on-costs compounding works → preliminaries → overheads and profit → fees → risk → inflation. Estimate class: concept screening, roughly −50 % to +100 %."],
];
staticCell(main, { id: "methods", title: "Methods" }, tableElement(["Topic", "Method and source"], methods, { whole: [false, true] }));

staticCell(
  main,
  { id: "scheme-methods", title: "Schemes" },
  tableElement(
    ["Scheme", "Structural system", "Valid spans (m)"],
    SCHEME_DECLARATIONS.map((m) => [m.label, m.description, `${m.validSpanM.min}–${m.validSpanM.max}`]),
  ),
);

// ——— design basis: load cases and combinations (src/loads/design-basis.ts) ———
const kPa = (x: number) => fmt.sig3(x);
const EXPRESSION_SOURCE = { "6.10": "EN 1990 eq. 6.10", "6.10a": "EN 1990 eq. 6.10a", "6.10b": "EN 1990 eq. 6.10b" } as const;

function designBasisTables(basis: DesignBasis): HTMLElement {
  const wrap = document.createElement("div");
  const intro = document.createElement("p");
  intro.textContent =
    `The load cases and EN 1990 combinations every scheme is to design for, at this study's brief. Distributed cases are maps over the plan (x along the wind). ` +
    `Wind: f/d = ${fmt.sig3(basis.fOverD)}, h/d = ${fmt.sig3(basis.hOverD)}; c_pe,10 at the windward base A ${fmt.sig3(basis.cpe.A)}, crown B ${fmt.sig3(basis.cpe.B)}, leeward base C ${fmt.sig3(basis.cpe.C)} ` +
    `(EN 1991-1-4 Fig. 7.12 — values from memory, the figure could not be read here; linear along the wind, constant across it); q_p = ${kPa(basis.peakVelocityPressureKPa)} kPa at z_e = h + f = ${fmt.sig3(basis.windReferenceHeightM)} m. ` +
    `Snow on a dome by the cylindrical-roof rule of EN 1991-1-3 §5.3.5 is common practice, not an EN clause. ` +
    `The schemes move onto this basis next; until then they design for the uniform loads under Methods → Actions.`;
  const cases = Object.values(basis.cases).map((c) => {
    const s = summariseCase(c, basis.cap);
    return [c.label, c.direction === "vertical" ? "vertical, on plan" : "normal to surface", kPa(s.peakKPa), kPa(s.minKPa), kPa(s.meanKPa), `${kPa(s.uniformEquivalentKPa)} — ${s.uniformRule}`, c.source];
  });
  const t = basis.temperature;
  cases.push([t.label, "uniform ΔT of the cables", `+${t.riseK} K`, `−${Math.abs(t.fallK)} K`, "—", "—", `${t.source}; from T0 = ${t.installationC} °C, for cable roofs`]);
  const combinations = basis.combinations.map((c) => {
    const s = summariseCombination(basis, c, 0);
    const temperature = c.temperatureSensitiveOnly ? "cable roofs only" : `× ${fmt.sig3(c.temperatureFactor)} for cable roofs`;
    return [c.name, c.formula, kPa(s.peakKPa), kPa(s.minKPa), kPa(s.meanKPa), temperature, `${EXPRESSION_SOURCE[c.expression]}, Table A1.2(B); ψ0 Table A1.1`];
  });
  wrap.append(
    intro,
    tableElement(["Case", "Acts", "Peak (kPa)", "Min (kPa)", "Plan mean (kPa)", "Uniform equivalent (kPa)", "Source"], cases, { caption: "Load cases (characteristic)", numeric: [false, false, true, true, true] }),
    tableElement(["Combination", "Design load", "Peak (kPa)", "Min (kPa)", "Plan mean (kPa)", "Temperature", "Source"], combinations, {
      caption: "Combinations: design values with G = services only (each scheme adds its self-weight × the factor on G); downward positive",
      numeric: [false, false, true, true, true],
    }),
  );
  return wrap;
}

reactiveCell(main, { id: "design-basis", title: "Design basis: load cases and combinations" }, () => designBasisTables(designBasis(store.study.value.brief)));

// The record, searchable: every word typed must appear in the row (input, group, value, unit, default or source).
const query = signal("");
const search = document.createElement("div");
search.className = "control";
const searchLabel = document.createElement("label");
searchLabel.htmlFor = "record-search";
searchLabel.textContent = "Search the record (input, group, value or source)";
const searchInput = document.createElement("input");
searchInput.type = "search";
searchInput.id = "record-search";
searchInput.placeholder = "e.g. snow, steel, EN 1993, changed";
searchInput.size = 40;
searchInput.addEventListener("input", () => {
  query.value = searchInput.value;
});
search.append(searchLabel, searchInput);

/** Whether every word of the query is in the row's text ("changed" also matches a changed input). */
function matches(row: Assumption, words: readonly string[]): boolean {
  const text = `${row.group} ${row.label} ${row.value} ${row.unit} ${row.default} ${row.source} ${row.changed ? "changed" : ""}`.toLowerCase();
  return words.every((w) => text.includes(w));
}

const record = computed(() => assumptionsRecord(store.study.value));
const recordCell = staticCell(main, { id: "record", title: "Assumptions record" }, search);
reactiveCell(recordCell, { id: "record-table" }, () => {
  const all = record.value;
  const words = query.value.toLowerCase().split(/\s+/).filter((w) => w !== "");
  const shown = words.length === 0 ? all : all.filter((r) => matches(r, words));
  const wrap = document.createElement("div");
  const changed = all.filter((r) => r.changed).length;
  const p = document.createElement("p");
  p.id = "record-count";
  p.setAttribute("aria-live", "polite");
  p.textContent = `${all.length} inputs, ${changed} changed from spanbook's defaults (marked ●)${words.length > 0 ? `; ${shown.length} match “${query.value.trim()}”` : ""}.`;
  const button = document.createElement("button");
  button.type = "button";
  button.id = "download-record";
  button.textContent = "Download the whole record (CSV)";
  button.addEventListener("click", () => {
    const rows = all.map(({ raw: _raw, ...r }) => ({ ...r, changed: r.changed ? "yes" : "no" }));
    downloadText("assumptions.csv", `${formatCsv(rows, ["group", "path", "label", "value", "unit", "default", "source", "changed"])}\n`, "text/csv");
  });
  const table = tableElement(
    ["", "Group", "Input", "Value", "Unit", "Default", "Source"],
    shown.map((r) => [r.changed ? "●" : "", r.group, fmt.unit(r.label), r.value, fmt.unit(r.unit), r.default, r.source]),
  );
  table.id = "record-rows";
  const scroll = document.createElement("div");
  scroll.style.maxHeight = "32rem";
  scroll.style.overflow = "auto";
  scroll.append(table);
  wrap.append(p, button, scroll);
  return wrap;
});

// ——— compare two study files ———
const other = signal<{ name: string; study: Study } | null>(null);
const otherNotice = signal("");
const picker = document.createElement("div");
picker.className = "study-tools";
const pickerText = document.createElement("span");
pickerText.textContent = "A is the current study; B is a study file you choose.";
picker.append(
  pickerText,
  studyFilePicker({
    label: "Choose study file B…",
    inputLabel: "Study file to compare with the current study",
    id: "other-study",
    onStudy: (study, name) => {
      other.value = { name, study };
      otherNotice.value = "";
    },
    onRefused: (message) => {
      otherNotice.value = message;
    },
  }),
);
staticCell(main, { id: "compare-studies-picker", title: "Compare two studies" }, picker);

/** How a scheme reads in one study: switched off, not feasible, or its value. */
function side(study: Study, id: string, value: number | null): string {
  if (study.schemes[id as keyof Study["schemes"]]?.enabled === false) return "switched off";
  return value === null ? "not feasible" : fmt.sig3(value);
}

function cell(d: SchemeDelta, key: (typeof HEADLINE_METRICS)[number]["key"], a: Study, b: Study): string {
  const va = d.a[key];
  const vb = d.b[key];
  if (va === null || vb === null) return `${side(a, d.id, va)} → ${side(b, d.id, vb)}`;
  const change = vb - va;
  return `${fmt.sig3(va)} → ${fmt.sig3(vb)} (${change >= 0 ? "+" : "−"}${fmt.sig3(Math.abs(change))})`;
}

reactiveCell(main, { id: "compare-studies" }, () => {
  if (otherNotice.value) throw new Error(otherNotice.value);
  const o = other.value;
  if (!o) return "Choose a study file to compare.";
  const comparison = compareStudies(store.study.value, o.study, defaultCatalogue());
  const wrap = document.createElement("div");
  const header = ["Scheme", ...HEADLINE_METRICS.map((m) => `${m.label} (${m.unit})`)];
  wrap.append(
    tableElement(header, comparison.overall.map((d) => [d.label, ...HEADLINE_METRICS.map((m) => cell(d, m.key, store.study.value, o.study))]), { caption: `All changes together: current study (A) → ${o.name} (B)` }),
  );
  for (const change of comparison.changes) {
    const h = document.createElement("h3");
    h.textContent = `${change.label}: ${change.valueA} → ${change.valueB}${change.unit ? ` ${change.unit}` : ""}`;
    wrap.append(h);
    // "This change alone" is A with only this input taken from B: schemes are switched as in A, except the switch that changed.
    const switched = /^schemes\.([\w-]+)\.enabled$/.exec(change.key)?.[1];
    const a = store.study.value;
    const alone = switched ? { ...a, schemes: { ...a.schemes, [switched]: { ...a.schemes[switched as keyof Study["schemes"]], enabled: change.valueB === "true" || change.valueB === "yes" } } } : a;
    if (change.effect) wrap.append(tableElement(header, change.effect.map((d) => [d.label, ...HEADLINE_METRICS.map((m) => cell(d, m.key, store.study.value, alone))]), { caption: "This change alone" }));
    else wrap.append("(effect of this change alone not computed)");
  }
  if (comparison.changes.length === 0) wrap.append("The two studies have the same inputs.");
  if (comparison.onlyInA.length + comparison.onlyInB.length > 0) {
    const p = document.createElement("p");
    p.textContent = `Only in the current study: ${comparison.onlyInA.length} inputs; only in ${o.name}: ${comparison.onlyInB.length} inputs (table rows added or removed).`;
    wrap.append(p);
  }
  return wrap;
});
