import { wholeNumber } from "../../kernel/units";
import type { Brief } from "../../brief";
import type { Catalogue, Cladding } from "../../catalogue/types";
import type { ChsChoice } from "../../catalogue/pick-chs";
import type { TakeoffRow } from "../../takeoff/takeoff-row";
import type { Check, DesignParts, MemberGroup } from "../kit";
import { check, convergeSelfWeight, uniformCombinations, defineScheme, findCladding, claddingCostItem, steelGrade, tonnesRow, SchemeError } from "../kit";
import { roofActions } from "../../loads/roof-actions";
import { designBasis } from "../../loads/design-basis";
import { snowShapeMu1 } from "../../loads/snow";
import { kPaFromKgPerM2 } from "../../mechanics/gravity";
import { designTrussRoof, trussLayout, trussRoofSelfWeightKPa, type TrussRoofInputs, type TrussRoofResult } from "./layout";
import { trussPlan, trussSection } from "./drawing";
import { trussRoofDeclaration, DEPTH_RATIO_RANGE, type TrussRoofOptions } from "./declaration";

type Layout = ReturnType<typeof trussLayout>;

/**
 * Snow on the flat roof, kPa: μ1 = 0.8 at a pitch of 0° (EN 1991-1-3 Table 5.2), the same flat-roof
 * value the shared basis gives a curved roof's undrifted case (μ1 = 0.8, Fig. 5.6). Its drifted
 * case (Fig. 5.3 case (ii) at α = 0: 0.8 and 0.4 on the two halves) is bounded by it.
 */
function flatRoofSnowKPa(brief: Brief): number {
  return snowShapeMu1(0) * brief.snowGroundKPa;
}

/** The inputs of the whole-roof design at a span/depth ratio: the shared combinations with the flat roof's snow (μ1 at 0°) and the dome wind map at f/d = depth/span, the nearest shape the basis has (wind at eaves + truss depth). */
function trussInputs(brief: Brief, opts: TrussRoofOptions, catalogue: Catalogue, layout: Layout, cladding: Cladding, ratio: number): TrussRoofInputs {
  const a = brief.spanM / 2;
  const longest = Math.max(...layout.spansM);
  const depthBrief = { ...brief, riseM: Math.min(a, longest / ratio) };
  const snowKPa = flatRoofSnowKPa(brief);
  const actions = { ...roofActions(depthBrief), mu1: snowShapeMu1(0), mu3: 0, muUniform: snowShapeMu1(0), snowKPa, leadingVariableKPa: Math.max(snowKPa, brief.imposedRoofKPa), leadingVariable: snowKPa >= brief.imposedRoofKPa ? ("snow" as const) : ("imposed" as const) };
  return {
    brief,
    actions,
    combinations: uniformCombinations(designBasis(depthBrief), { "snow-uniform": snowKPa, "snow-drifted": snowKPa }),
    slsVariableKPa: Math.max(snowKPa, brief.imposedRoofKPa),
    catalogue,
    steel: steelGrade(opts.steelGrade),
    spacingM: layout.spacingM,
    spansM: layout.spansM,
    spanDepthRatio: ratio,
    purlinSpacingM: opts.purlinSpacingM,
    zones: opts.zones,
    webAllowance: opts.webAllowancePct / 100,
    deflectionLimit: opts.deflectionLimit,
    deflectionLimitTotal: opts.deflectionLimitTotal,
    connectionAllowance: opts.connectionAllowancePct / 100,
    deckKgPerM2: cladding.massKgPerM2,
  };
}

/** The span/depth ratio of least truss mass at a fixed self-weight: whole ratios, then ±0.5 about the best; null when none works. */
function leastMassRatio(inputsFor: (ratio: number) => TrussRoofInputs, selfWeightKPa: number, startRatio: number): number | null {
  let best = { ratio: startRatio, massKg: Number.POSITIVE_INFINITY };
  const tryRatio = (q: number) => {
    if (q < DEPTH_RATIO_RANGE.min || q > DEPTH_RATIO_RANGE.max) return;
    const r = designTrussRoof(inputsFor(q), selfWeightKPa);
    const massKg = r.trussMassKg + r.connectionMassKg + r.bracingMassKg;
    if (r.failure === "" && massKg < best.massKg) best = { ratio: q, massKg };
  };
  for (let q = DEPTH_RATIO_RANGE.min; q <= DEPTH_RATIO_RANGE.max; q += 1) tryRatio(q);
  const whole = best.ratio;
  tryRatio(whole - 0.5);
  tryRatio(whole + 0.5);
  return Number.isFinite(best.massKg) ? best.ratio : null;
}

type Zone = TrussRoofResult["trusses"][number]["zones"][number];

/** The chord and diagonal groups (worst zone of any truss), secondary members, and their checks. */
function trussMembers(r: TrussRoofResult, layout: Layout, brief: Brief, opts: TrussRoofOptions): { members: MemberGroup[]; checks: Check[] } {
  const members: MemberGroup[] = [];
  const checks: Check[] = [];
  const worst = (pick: (z: Zone) => { choice: ChsChoice; force: number }) => {
    let best: { choice: ChsChoice; force: number } | undefined;
    for (const t of r.trusses) for (const z of t.zones) {
      const c = pick(z);
      if (best === undefined || c.choice.utilisation > best.choice.utilisation) best = c;
    }
    return best!;
  };
  const meanSpan = layout.spansM.reduce((s, L) => s + L, 0) / layout.spansM.length;
  const n = layout.spansM.length;
  for (const [element, pick] of [
    ["top chords", (z: Zone) => ({ choice: z.top, force: z.topForceN })],
    ["bottom chords", (z: Zone) => ({ choice: z.bottom, force: z.bottomForceN })],
    ["diagonals", (z: Zone) => ({ choice: z.diagonal, force: -z.diagonalForceN })],
  ] as const) {
    const w = worst(pick);
    const count = element === "diagonals" ? r.trusses.reduce((s, t) => s + t.diagonalCount, 0) : n;
    const lengthM = element === "diagonals" ? (r.trusses[0]?.diagonalLengthM ?? 0) : meanSpan;
    members.push({ element, material: "steel-hot-finished-hollow", count, lengthM, section: w.choice.section.designation, designForceN: w.force, resistanceN: w.choice.resistanceN, utilisation: w.choice.utilisation, governing: w.choice.governing });
    checks.push(check(`${element}: ${w.choice.governing.split(",")[0]}`, w.choice.governing.split(", ")[1] ?? "EN 1993-1-1", w.choice.utilisation * w.choice.resistanceN, w.choice.resistanceN, "N"));
  }
  const worstDeflection = r.trusses.reduce((m, t) => (t.deflectionM / t.deflectionLimitM > m.deflectionM / m.deflectionLimitM ? t : m), r.trusses[0]!);
  checks.push(check(`truss deflection (span/${opts.deflectionLimit})`, "SLS, common practice limit", worstDeflection.deflectionM, worstDeflection.deflectionLimitM, "m"));
  const worstTotal = r.trusses.reduce((m, t) => (t.totalDeflectionM / t.totalDeflectionLimitM > m.totalDeflectionM / m.totalDeflectionLimitM ? t : m), r.trusses[0]!);
  checks.push(check(`truss deflection under total load (span/${opts.deflectionLimitTotal})`, "SLS, common practice limit; EN 1990 A1.4.3", worstTotal.totalDeflectionM, worstTotal.totalDeflectionLimitM, "m"));
  checks.push(pondingCheck(r, layout.spansM));
  const purlinW = r.purlin.modulusM3;
  const { momentNm, momentResistanceNm } = r.purlin;
  const purlinUtilisation = momentNm / momentResistanceNm;
  const purlinGoverning = r.purlin.governedBy === "bending" ? "bending M/(0.7 f_y W)" : `deflection span/200 (bending M/(0.7 f_y W) ${purlinUtilisation.toFixed(2)})`;
  members.push({ element: "purlins", material: "steel-cold-formed", count: Math.round(r.purlinLengthM / layout.spacingM), lengthM: layout.spacingM, section: `cold-formed Z/C ${(r.purlin.depthM * 1000).toFixed(0)} deep, W ${(purlinW * 1e6).toFixed(0)} cm³`, designForceN: 0, resistanceN: 0, utilisation: purlinUtilisation, governing: purlinGoverning, bending: { designMomentNm: momentNm, resistanceNm: momentResistanceNm } });
  if (r.bracing) members.push({ element: "roof bracing", material: "steel-hot-finished-hollow", count: Math.round(r.bracingLengthM / (layout.spacingM * Math.SQRT2)), lengthM: layout.spacingM * Math.SQRT2, section: r.bracing.section.designation, designForceN: -r.bracing.utilisation * r.bracing.resistanceN, resistanceN: r.bracing.resistanceN, utilisation: r.bracing.utilisation, governing: r.bracing.governing });
  if (r.trussColumn) {
    members.push({ element: "truss columns", material: "steel-hot-finished-hollow", count: 2 * n, lengthM: brief.eavesHeightM, section: r.trussColumn.section.designation, designForceN: -r.trussColumnForceN, resistanceN: r.trussColumn.resistanceN, utilisation: r.trussColumn.utilisation, governing: r.trussColumn.governing });
    checks.push(check("truss columns: flexural buckling", "EN 1993-1-1 §6.3.1", r.trussColumnForceN, r.trussColumn.resistanceN, "N"));
  }
  if (r.post) members.push({ element: "perimeter posts", material: "steel-hot-finished-hollow", count: r.postCount, lengthM: brief.eavesHeightM, section: r.post.section.designation, designForceN: -r.postForceN, resistanceN: r.post.resistanceN, utilisation: r.post.utilisation, governing: r.post.governing });
  return { members, checks };
}

/**
 * Fall against ponding: the roof is cambered to fall at 1:48 from the centre line to the eaves, the
 * slope beyond which a roof need not be checked for ponding (AISC 360-16 Appendix 2, ¼ in. per ft,
 * from memory). The fall must outlast the deflected slope at the support under the total
 * characteristic load, 16δ/(5L) for a uniform load (the slope wL³/24EI of a simply supported beam).
 */
const PONDING_FALL = 1 / 48;
function pondingCheck(r: TrussRoofResult, spansM: readonly number[]): Check {
  const worst = r.trusses.reduce((m, t, k) => Math.max(m, (16 * t.totalDeflectionM) / (5 * spansM[k]!)), 0);
  return check("ponding: fall 1:48 left after deflection", "AISC 360-16 App. 2 (slope ≥ ¼ in./ft, from memory); slope wL³/24EI", worst, PONDING_FALL, "");
}

function trussTakeoff(r: TrussRoofResult, cladding: Cladding, planAreaM2: number): TakeoffRow[] {
  return [
    tonnesRow("primary trusses", "steel-hot-finished-hollow", "steel-truss", r.trussMassKg),
    tonnesRow("truss connections", "steel-plate", "steel-truss", r.connectionMassKg),
    tonnesRow("purlins", "steel-cold-formed", "steel-secondary", r.purlinMassKg),
    tonnesRow("roof bracing", "steel-hot-finished-hollow", "steel-secondary", r.bracingMassKg),
    { ...tonnesRow("edge beam", "steel-hot-finished-hollow", "steel-secondary", r.edgeBeamMassKg), group: "perimeter" },
    { element: "roof deck", material: cladding.material, costItem: claddingCostItem(cladding), quantity: planAreaM2, unit: "m2", massKg: r.deckMassKg },
  ];
}

function trussSummary(r: TrussRoofResult, layout: Layout, brief: Brief, ratio: number, planAreaM2: number) {
  const worstDeflection = r.trusses.reduce((m, t) => (t.deflectionM / t.deflectionLimitM > m.deflectionM / m.deflectionLimitM ? t : m), r.trusses[0]!);
  return [
    { key: "trusses", label: "Primary trusses", value: layout.spansM.length, unit: "nr" },
    { key: "spacingM", label: "Truss spacing", value: layout.spacingM, unit: "m" },
    { key: "longestSpanM", label: "Longest truss span", value: Math.max(...layout.spansM), unit: "m" },
    { key: "spanDepthRatio", label: "Span / depth", value: ratio, unit: "" },
    { key: "deepestM", label: "Depth of the longest truss", value: Math.max(...r.depthsM), unit: "m" },
    { key: "deflectionMm", label: "Largest truss deflection (variable load)", value: worstDeflection.deflectionM * 1000, unit: "mm" },
    { key: "totalDeflectionMm", label: "Largest truss deflection (total characteristic load)", value: Math.max(...r.trusses.map((t) => t.totalDeflectionM)) * 1000, unit: "mm" },
    { key: "fallM", label: "Fall to the eaves at 1:48 (camber)", value: (brief.spanM / 2) * PONDING_FALL, unit: "m" },
    { key: "clearHeightM", label: "Clear height under the bottom chords", value: brief.eavesHeightM, unit: "m" },
    { key: "steelKgPerM2", label: "Steel per m² of plan", value: (r.trussMassKg + r.connectionMassKg + r.purlinMassKg + r.bracingMassKg + r.edgeBeamMassKg) / planAreaM2, unit: "kg/m²" },
    { key: "columnKgPerM2", label: "Columns to the eaves (designed, not counted)", value: r.columnMassKg / planAreaM2, unit: "kg/m²" },
  ];
}

/**
 * Designs a flat steel truss roof over the circular plan: parallel-chord Warren trusses at a spacing,
 * each on its own chord of the circle, sized from the CHS catalogue (EN 1993-1-1 §6.2.3, §6.3.1)
 * for M = wL²/8 over the depth and V/sin θ in the diagonals, stiffened for deflection; cold-formed
 * purlins, roof bracing, an edge beam and columns to the eaves (designed and checked, not taken off:
 * no scheme counts the supports under its edge); self-weight iterated.
 * The trusses sit with their bottom chords at eaves height, so the clear height is the eaves height
 * everywhere and the brief's rise is not used. Validity: 20–200 m.
 */
function design(brief: Brief, opts: TrussRoofOptions, catalogue: Catalogue): DesignParts {
  const a = brief.spanM / 2;
  const planAreaM2 = Math.PI * a * a;
  const layout = trussLayout(brief.spanM, opts.trussSpacingM);
  const cladding = findCladding(catalogue, opts.cladding);
  const inputsFor = (ratio: number) => trussInputs(brief, opts, catalogue, layout, cladding, ratio);
  const section = (r?: TrussRoofResult) => trussSection(brief, layout.spansM, r?.depthsM ?? layout.spansM.map((L) => L / opts.spanDepthRatio));
  const converge = (ratio: number) => {
    const inputs = inputsFor(ratio);
    const size = (g: number) => {
      const r = designTrussRoof(inputs, g);
      return { value: r, selfWeightKPa: r.failure !== "" ? g : trussRoofSelfWeightKPa(r, planAreaM2) };
    };
    return convergeSelfWeight<TrussRoofResult>(size, kPaFromKgPerM2(60 + cladding.massKgPerM2), { section: section() });
  };
  let ratio = opts.spanDepthRatio;
  let converged = converge(ratio);
  if (opts.optimiseDepth) {
    // Search span/depth at the converged self-weight, then converge again at the best ratio.
    const best = leastMassRatio(inputsFor, converged.selfWeightKPa, ratio);
    if (best !== null) {
      ratio = best;
      converged = converge(ratio);
    }
  }
  const r = converged.value;
  const warnings = [
    `flat truss roof: the brief's rise of ${brief.riseM} m is not used; the bottom chords sit at the eaves (${brief.eavesHeightM} m), so the clear height is the eaves height`,
    "vertical wall bracing and wind along the trusses are not included",
    `the columns to the eaves (two under each truss, posts round the rest: ${wholeNumber(r.columnMassKg / 1000)} t of steel) are designed and checked but not counted in the take-off, carbon or cost: no scheme counts the supports under its edge (walls or columns to the eaves; a heavier roof needs heavier ones)`,
    `every design combination is checked with uniform loads: the flat roof's snow μ1 s_k (EN 1991-1-3 Table 5.2 at 0°; its drifted case is bounded by it) and the dome wind map's peak values at f/d = depth/span, the nearest shape the shared basis has; uplift checked with ${r.upliftCase || "no uplift combination"}`,
  ];
  if (r.failure !== "") throw new SchemeError(`${r.failure}: use deeper trusses, a closer spacing or a higher steel grade`, { warnings, section: section(r) });
  if (layout.spacingM > 10) warnings.push(`purlins span ${layout.spacingM.toFixed(1)} m between trusses, beyond the usual cold-formed range (≈ 10 m, common practice)`);
  const roofVolumeM3 = layout.spansM.reduce((s, L, k) => s + L * layout.spacingM * r.depthsM[k]!, 0);
  return {
    ...trussMembers(r, layout, brief, opts),
    summary: trussSummary(r, layout, brief, ratio, planAreaM2),
    takeoff: trussTakeoff(r, cladding, planAreaM2),
    warnings,
    iterations: converged.iterations,
    governingLoadCase: r.governingCase,
    floor: { soffit: [[0, brief.eavesHeightM], [a, brief.eavesHeightM]], supports: [] },
    roofSurfaceM2: planAreaM2,
    enclosedVolumeM3: planAreaM2 * brief.eavesHeightM + roofVolumeM3,
    drawing: { section: section(r), plan: trussPlan(brief.spanM, layout.offsetsM, layout.spansM) },
  };
}

export const trussRoof = defineScheme(trussRoofDeclaration, design);
