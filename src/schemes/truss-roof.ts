import type { Brief } from "../study/brief";
import type { Catalogue } from "../catalogue/types";
import type { TakeoffRow } from "../takeoff/takeoff-row";
import type { Check, DrawingLine, MemberGroup, OptionSpec, SchemeModel } from "./types";
import { roofActions } from "../loads/roof-actions";
import { snowShapeMu1 } from "../loads/snow";
import { assembleDesign, check, infeasibleDesign } from "./assemble-design";
import { iterateSelfWeight, ConvergenceError } from "./converge";
import { CLADDING_CHOICES, STEEL_GRADE_CHOICES, STEEL_GRADES, claddingCostItem, findCladding, type SteelGrade } from "./compression-common";
import { checkSchemeOptions } from "./check-options";
import { kPaFromKgPerM2 } from "../mechanics/gravity";
import { designTrussRoof, trussLayout, trussRoofSelfWeightKPa, type TrussRoofInputs, type TrussRoofResult } from "./truss-roof-layout";
import { PURLIN_REDUCTION, PURLIN_YIELD_PA } from "./truss-secondary";

export type TrussRoofOptions = {
  trussSpacingM: number;
  spanDepthRatio: number;
  /** Let the tool choose the span/depth ratio of least mass (8–25) that meets the deflection limit. */
  optimiseDepth: boolean;
  deflectionLimit: number;
  purlinSpacingM: number;
  zones: number;
  webAllowancePct: number;
  connectionAllowancePct: number;
  cladding: string;
  steelGrade: string;
};

const defaults: TrussRoofOptions = {
  trussSpacingM: 8, // primary trusses at 6–10 m so cold-formed purlins can span between them (common practice, no source)
  spanDepthRatio: 15, // long-span trusses span/10–span/20 (common practice, no source)
  optimiseDepth: false,
  deflectionLimit: 250, // L/250 under variable load (common practice for roofs, cf. EN 1990 A1.4 leaves limits to the project)
  purlinSpacingM: 3, // metal deck spans 2–3.5 m (common practice, no source)
  zones: 3,
  webAllowancePct: 15, // web member strain adds 10–20 % to chord-only deflection of parallel-chord trusses at span/depth 10–20 (common practice, no source)
  connectionAllowancePct: 10, // truss joints, end plates and gussets 8–12 % (common practice, no source)
  cladding: "metal-deck",
  steelGrade: "S355",
};

const DEPTH_RATIO_RANGE = { min: 8, max: 25 } as const;

const options = [
  { key: "trussSpacingM", label: "Truss spacing", kind: "number", unit: "m", min: 4, max: 20, step: 0.5, source: "common practice 6–10 m, no source" },
  { key: "spanDepthRatio", label: "Span / depth", kind: "number", unit: "", min: DEPTH_RATIO_RANGE.min, max: DEPTH_RATIO_RANGE.max, step: 0.5, source: "common practice 10–20, no source" },
  { key: "optimiseDepth", label: "Choose the depth of least mass", kind: "toggle", unit: "", source: "searches span/depth 8–25 meeting the deflection limit" },
  { key: "deflectionLimit", label: "Deflection limit span /", kind: "number", unit: "", min: 100, max: 1000, step: 10, source: "common practice L/250 under variable load" },
  { key: "purlinSpacingM", label: "Purlin spacing (top chord restraint)", kind: "number", unit: "m", min: 1, max: 6, step: 0.25, source: "deck span, common practice 2–3.5 m" },
  { key: "zones", label: "Chord size changes per half span", kind: "number", unit: "", min: 1, max: 8, step: 1, integer: true, source: "grouping of alike members" },
  { key: "webAllowancePct", label: "Web deflection allowance", kind: "number", unit: "% of chord deflection", min: 0, max: 50, step: 1, source: "common practice 10–20 %, no source" },
  { key: "connectionAllowancePct", label: "Truss connections", kind: "number", unit: "% of truss mass", min: 0, max: 30, step: 1, source: "common practice 8–12 %, no source" },
  { key: "cladding", label: "Roof deck", kind: "select", unit: "", choices: CLADDING_CHOICES, source: "data/claddings.csv" },
  { key: "steelGrade", label: "Steel grade", kind: "select", unit: "", choices: STEEL_GRADE_CHOICES, source: "EN 1993-1-1 Table 3.1" },
] as const satisfies readonly OptionSpec[];

/**
 * Designs a flat steel truss roof over the circular plan: parallel-chord Warren trusses at a spacing,
 * each on its own chord of the circle, sized from the CHS catalogue (EN 1993-1-1 §6.2.3, §6.3.1)
 * for M = wL²/8 over the depth and V/sin θ in the diagonals, stiffened for deflection; cold-formed
 * purlins, roof bracing, an edge beam and columns to the eaves; self-weight iterated.
 * The trusses sit with their bottom chords at eaves height, so the clear height is the eaves height
 * everywhere and the brief's rise is not used. Validity: 20–200 m.
 */
function design(brief: Brief, opts: TrussRoofOptions, catalogue: Catalogue) {
  checkSchemeOptions(options, opts);
  const model = trussRoof;
  const a = brief.spanM / 2;
  const planAreaM2 = Math.PI * a * a;
  const layout = trussLayout(brief.spanM, opts.trussSpacingM);
  const cladding = findCladding(catalogue, opts.cladding);
  const steel = STEEL_GRADES[opts.steelGrade as SteelGrade];
  const longest = Math.max(...layout.spansM);
  // Actions for a flat roof: snow μ1 at 0° pitch (EN 1991-1-3 Table 5.2); wind at eaves + truss depth.
  const actionsFor = (ratio: number) => {
    const base = roofActions({ ...brief, riseM: Math.min(a, longest / ratio) });
    const snowKPa = snowShapeMu1(0) * brief.snowGroundKPa;
    return { ...base, mu1: snowShapeMu1(0), mu3: 0, muUniform: snowShapeMu1(0), snowKPa, leadingVariableKPa: Math.max(snowKPa, brief.imposedRoofKPa), leadingVariable: snowKPa >= brief.imposedRoofKPa ? ("snow" as const) : ("imposed" as const) };
  };
  const inputsFor = (ratio: number): TrussRoofInputs => ({
    brief,
    actions: actionsFor(ratio),
    catalogue,
    steel,
    spacingM: layout.spacingM,
    spansM: layout.spansM,
    spanDepthRatio: ratio,
    purlinSpacingM: opts.purlinSpacingM,
    zones: opts.zones,
    webAllowance: opts.webAllowancePct / 100,
    deflectionLimit: opts.deflectionLimit,
    connectionAllowance: opts.connectionAllowancePct / 100,
    deckKgPerM2: cladding.massKgPerM2,
  });
  const converge = (ratio: number) => {
    const inputs = inputsFor(ratio);
    return iterateSelfWeight<TrussRoofResult>((g) => {
      const r = designTrussRoof(inputs, g);
      return { value: r, selfWeightKPa: r.failure !== "" ? g : trussRoofSelfWeightKPa(r, planAreaM2) };
    }, kPaFromKgPerM2(60 + cladding.massKgPerM2));
  };
  const section = (r?: TrussRoofResult) => sectionLines(brief, layout.spansM, r?.depthsM ?? layout.spansM.map((L) => L / opts.spanDepthRatio));
  let ratio = opts.spanDepthRatio;
  let converged;
  try {
    converged = converge(ratio);
    if (opts.optimiseDepth) {
      // Search span/depth at the converged self-weight (whole ratios, then ±0.5 about the best),
      // then converge again at the best ratio.
      const g = converged.selfWeightKPa;
      let best = { ratio, massKg: Number.POSITIVE_INFINITY };
      const tryRatio = (q: number) => {
        if (q < DEPTH_RATIO_RANGE.min || q > DEPTH_RATIO_RANGE.max) return;
        const r = designTrussRoof(inputsFor(q), g);
        const massKg = r.trussMassKg + r.connectionMassKg + r.bracingMassKg;
        if (r.failure === "" && massKg < best.massKg) best = { ratio: q, massKg };
      };
      for (let q = DEPTH_RATIO_RANGE.min; q <= DEPTH_RATIO_RANGE.max; q += 1) tryRatio(q);
      const whole = best.ratio;
      tryRatio(whole - 0.5);
      tryRatio(whole + 0.5);
      if (Number.isFinite(best.massKg)) {
        ratio = best.ratio;
        converged = converge(ratio);
      }
    }
  } catch (e) {
    if (e instanceof ConvergenceError) return infeasibleDesign("truss-roof", brief, e.message, [], section());
    throw e;
  }
  const r = converged.value;
  const warnings = [
    `flat truss roof: the brief's rise of ${brief.riseM} m is not used; the bottom chords sit at the eaves (${brief.eavesHeightM} m), so the clear height is the eaves height`,
    "top chord bending from purlins between panel points, vertical wall bracing and wind along the trusses are not included",
  ];
  if (r.failure !== "") return infeasibleDesign("truss-roof", brief, `${r.failure}: use deeper trusses, a closer spacing or a higher steel grade`, warnings, section(r));
  if (layout.spacingM > 10) warnings.push(`purlins span ${layout.spacingM.toFixed(1)} m between trusses, beyond the usual cold-formed range (≈ 10 m, common practice)`);

  const members: MemberGroup[] = [];
  const checks: Check[] = [];
  const worst = (pick: (z: TrussRoofResult["trusses"][number]["zones"][number]) => { choice: import("../catalogue/pick-chs").ChsChoice; force: number }) => {
    let best: { choice: import("../catalogue/pick-chs").ChsChoice; force: number } | undefined;
    for (const t of r.trusses) for (const z of t.zones) {
      const c = pick(z);
      if (best === undefined || c.choice.utilisation > best.choice.utilisation) best = c;
    }
    return best!;
  };
  const meanSpan = layout.spansM.reduce((s, L) => s + L, 0) / layout.spansM.length;
  const n = layout.spansM.length;
  for (const [element, pick] of [
    ["top chords", (z: TrussRoofResult["trusses"][number]["zones"][number]) => ({ choice: z.top, force: z.topForceN })],
    ["bottom chords", (z: TrussRoofResult["trusses"][number]["zones"][number]) => ({ choice: z.bottom, force: z.bottomForceN })],
    ["diagonals", (z: TrussRoofResult["trusses"][number]["zones"][number]) => ({ choice: z.diagonal, force: -z.diagonalForceN })],
  ] as const) {
    const w = worst(pick);
    const count = element === "diagonals" ? r.trusses.reduce((s, t) => s + t.diagonalCount, 0) : n;
    members.push({
      element,
      material: "steel-hot-finished-hollow",
      count,
      lengthM: element === "diagonals" ? (r.trusses[0]?.diagonalLengthM ?? 0) : meanSpan,
      section: w.choice.section.designation,
      designForceN: w.force,
      resistanceN: w.choice.resistanceN,
      utilisation: w.choice.utilisation,
      governing: w.choice.governing,
    });
    checks.push(check(`${element}: ${w.choice.governing.split(",")[0]}`, w.choice.governing.split(", ")[1] ?? "EN 1993-1-1", w.choice.utilisation * w.choice.resistanceN, w.choice.resistanceN, "N"));
  }
  const worstDeflection = r.trusses.reduce((m, t) => (t.deflectionM / t.deflectionLimitM > m.deflectionM / m.deflectionLimitM ? t : m), r.trusses[0]!);
  checks.push(check(`truss deflection (span/${opts.deflectionLimit})`, "SLS, common practice limit", worstDeflection.deflectionM, worstDeflection.deflectionLimitM, "m"));
  const purlinW = r.purlin.modulusM3;
  members.push({ element: "purlins", material: "steel-cold-formed", count: Math.round(r.purlinLengthM / layout.spacingM), lengthM: layout.spacingM, section: `cold-formed Z/C ${(r.purlin.depthM * 1000).toFixed(0)} deep, W ${(purlinW * 1e6).toFixed(0)} cm³`, designForceN: 0, resistanceN: 0, utilisation: r.purlin.momentNm / (PURLIN_REDUCTION * PURLIN_YIELD_PA * purlinW), governing: "bending M/(0.7 f_y W), or deflection span/200" });
  if (r.bracing) members.push({ element: "roof bracing", material: "steel-hot-finished-hollow", count: Math.round(r.bracingLengthM / (layout.spacingM * Math.SQRT2)), lengthM: layout.spacingM * Math.SQRT2, section: r.bracing.section.designation, designForceN: -r.bracing.utilisation * r.bracing.resistanceN, resistanceN: r.bracing.resistanceN, utilisation: r.bracing.utilisation, governing: r.bracing.governing });
  if (r.trussColumn) {
    members.push({ element: "truss columns", material: "steel-hot-finished-hollow", count: 2 * n, lengthM: brief.eavesHeightM, section: r.trussColumn.section.designation, designForceN: -r.trussColumnForceN, resistanceN: r.trussColumn.resistanceN, utilisation: r.trussColumn.utilisation, governing: r.trussColumn.governing });
    checks.push(check("truss columns: flexural buckling", "EN 1993-1-1 §6.3.1", r.trussColumnForceN, r.trussColumn.resistanceN, "N"));
  }
  if (r.post) members.push({ element: "perimeter posts", material: "steel-hot-finished-hollow", count: r.postCount, lengthM: brief.eavesHeightM, section: r.post.section.designation, designForceN: -r.postForceN, resistanceN: r.post.resistanceN, utilisation: r.post.utilisation, governing: r.post.governing });

  const t = (element: string, massKg: number, costItem: TakeoffRow["costItem"], material: TakeoffRow["material"]): TakeoffRow => ({ element, material, costItem, quantity: massKg / 1000, unit: "t", massKg });
  const takeoff: TakeoffRow[] = [
    t("primary trusses", r.trussMassKg, "steel-truss", "steel-hot-finished-hollow"),
    t("truss connections", r.connectionMassKg, "steel-truss", "steel-plate"),
    t("purlins", r.purlinMassKg, "steel-secondary", "steel-cold-formed"),
    t("roof bracing", r.bracingMassKg, "steel-secondary", "steel-hot-finished-hollow"),
    t("edge beam", r.edgeBeamMassKg, "steel-secondary", "steel-hot-finished-hollow"),
    t("perimeter columns", r.columnMassKg, "steel-column", "steel-hot-finished-hollow"),
    { element: "roof deck", material: cladding.material, costItem: claddingCostItem(cladding), quantity: planAreaM2, unit: "m2", massKg: r.deckMassKg },
  ];
  const deepest = Math.max(...r.depthsM);
  const summary = [
    { key: "trusses", label: "Primary trusses", value: n, unit: "nr" },
    { key: "spacingM", label: "Truss spacing", value: layout.spacingM, unit: "m" },
    { key: "longestSpanM", label: "Longest truss span", value: longest, unit: "m" },
    { key: "spanDepthRatio", label: "Span / depth", value: ratio, unit: "" },
    { key: "deepestM", label: "Depth of the longest truss", value: deepest, unit: "m" },
    { key: "deflectionMm", label: "Largest truss deflection (variable load)", value: worstDeflection.deflectionM * 1000, unit: "mm" },
    { key: "clearHeightM", label: "Clear height under the bottom chords", value: brief.eavesHeightM, unit: "m" },
    { key: "steelKgPerM2", label: "Steel per m² of plan", value: (r.trussMassKg + r.connectionMassKg + r.purlinMassKg + r.bracingMassKg + r.edgeBeamMassKg + r.columnMassKg) / planAreaM2, unit: "kg/m²" },
  ];
  const roofVolumeM3 = layout.spansM.reduce((s, L, k) => s + L * layout.spacingM * r.depthsM[k]!, 0);
  return assembleDesign(model, brief, {
    summary,
    members,
    takeoff,
    checks,
    warnings,
    iterations: converged.iterations,
    usableFloorM2: brief.eavesHeightM >= brief.minClearHeightM ? planAreaM2 : 0,
    roofSurfaceM2: planAreaM2,
    enclosedVolumeM3: planAreaM2 * brief.eavesHeightM + roofVolumeM3,
    drawing: { section: section(r), plan: planLines(brief.spanM, layout.offsetsM, layout.spansM) },
  });
}

/** Elevation of the longest truss (chords and diagonals) on its columns. */
function sectionLines(brief: Brief, spansM: number[], depthsM: number[]): DrawingLine[] {
  const k = spansM.indexOf(Math.max(...spansM));
  const L = spansM[k]!;
  const d = depthsM[k]!;
  const e = brief.eavesHeightM;
  const panels = Math.max(2, 2 * Math.round(L / (2 * Math.max(d, 1))));
  const web: [number, number][] = [];
  for (let i = 0; i <= panels; i++) web.push([-L / 2 + (i * L) / panels, i % 2 === 0 ? e : e + d]);
  return [
    { role: "chord", points: [[-L / 2, e], [L / 2, e]] },
    { role: "chord", points: [[-L / 2, e + d], [L / 2, e + d]] },
    { role: "web", points: web },
    { role: "column", points: [[-L / 2, 0], [-L / 2, e]] },
    { role: "column", points: [[L / 2, 0], [L / 2, e]] },
  ];
}

function planLines(spanM: number, offsetsM: number[], spansM: number[]): DrawingLine[] {
  const a = spanM / 2;
  const edge: [number, number][] = Array.from({ length: 73 }, (_, i) => [a * Math.cos((i * Math.PI) / 36), a * Math.sin((i * Math.PI) / 36)]);
  return [{ role: "edge", points: edge }, ...offsetsM.map((y, k) => ({ role: "truss", points: [[-spansM[k]! / 2, y], [spansM[k]! / 2, y]] as [number, number][] }))];
}

export const trussRoof: SchemeModel<TrussRoofOptions> = {
  id: "truss-roof",
  label: "Steel truss roof",
  description:
    "A flat roof of parallel steel trusses at a regular spacing, each spanning its own chord of the circular plan onto perimeter columns, with cold-formed purlins, roof bracing and a metal deck. The trusses carry the roof in bending; their depth sets their weight and their stiffness.",
  validSpanM: { min: 20, max: 200 },
  options,
  defaults,
  design,
};
