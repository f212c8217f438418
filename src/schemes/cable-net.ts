import type { Brief } from "../study/brief";
import type { Catalogue } from "../catalogue/types";
import type { Check, Design, MemberGroup, OptionSpec, SchemeModel } from "./types";
import type { TakeoffRow } from "../takeoff/takeoff-row";
import { roofActions } from "../loads/roof-actions";
import { usableFloorAreaM2 } from "../mechanics/usable-floor";
import { capHeightAt } from "../mechanics/spherical-cap";
import { assembleDesign, check, infeasibleDesign } from "./assemble-design";
import { iterateSelfWeight, ConvergenceError } from "./converge";
import { cableNetLayout, cableNetPlan, cableNetSection } from "./cable-net-geometry";
import { sizeCableNet, type NetSizing } from "./cable-net-sizing";
import { SizingError } from "./cable-dome-sizing";
import { PLAIN_CONCRETE_DENSITY_KG_PER_M3 } from "./compression-ring";
import { FABRIC_CHOICES, TENSION_COMMON_OPTIONS, fabricCostItem, findFabric } from "./tension-common";
import { checkSchemeOptions } from "./check-options";

export type CableNetOptions = {
  /** Masts on the mast ring. */
  masts: number;
  /** Mast ring radius / plan radius, –. */
  mastRingRatio: number;
  /** Mast head height above the roof surface / span, –. */
  mastHeightRatio: number;
  /** Radial cables from each mast head (half out to the edge, half in to the central ring). */
  radialCablesPerMast: number;
  /** Spacing of the circumferential cables along the radius (fabric panel span), m. */
  hangerSpacingM: number;
  fabric: string;
  /** Plain masts buckle over their full length; braced masts over half (guyed at mid-height). */
  mastType: "plain" | "braced";
  /** Dead weight of an anchor / its ULS uplift, –. */
  anchorUpliftMargin: number;
  /** Tension every cable keeps under the worst ULS case, as a fraction of its prestress, –. */
  residualPrestress: number;
  /** γR of EN 1993-1-11 §6.2, –. */
  gammaR: number;
  fabricAllowancePct: number;
  fabricSagRatio: number;
  fabricStrengthFactor: number;
  steelYieldMPa: number;
};

const defaults: CableNetOptions = {
  masts: 12, // common practice for large nets, no source
  mastRingRatio: 0.6, // common practice, no source
  mastHeightRatio: 0.15, // mast head above the roof ≈ span/7 (common practice, no source)
  radialCablesPerMast: 8, // common practice, no source
  hangerSpacingM: 6, // fabric panels 5–8 m, common practice, no source
  fabric: "ptfe-glass-iii",
  mastType: "braced",
  anchorUpliftMargin: 1.1, // ≈ 1/0.9: EN 1990 Table A1.2(A) (EQU) γ_G,inf = 0.9 on the stabilising weight
  residualPrestress: 0.1, // common practice, no source
  gammaR: 1.0, // EN 1993-1-11:2006 §6.2 (from memory); 1.0 is the safe side
  fabricAllowancePct: 10, // common practice, no source
  fabricSagRatio: 0.1, // common practice, no source
  fabricStrengthFactor: 5, // common practice for coated fabrics (from memory)
  steelYieldMPa: 355, // S355, EN 1993-1-1 Table 3.1
};

const options: readonly OptionSpec[] = [
  { key: "masts", label: "Masts", kind: "number", unit: "", min: 3, max: 48, step: 1, integer: true, source: "common practice, no source" },
  { key: "mastRingRatio", label: "Mast ring radius / plan radius", kind: "number", unit: "", min: 0.3, max: 0.9, step: 0.05, source: "common practice, no source" },
  { key: "mastHeightRatio", label: "Mast height above roof / span", kind: "number", unit: "", min: 0.03, max: 0.4, step: 0.01, source: "common practice, no source" },
  { key: "radialCablesPerMast", label: "Radial cables per mast", kind: "number", unit: "", min: 2, max: 40, step: 2, integer: true, source: "common practice, no source" },
  { key: "hangerSpacingM", label: "Hanger (circumferential cable) spacing", kind: "number", unit: "m", min: 2, max: 15, step: 0.5, source: "common practice, no source" },
  { key: "fabric", label: "Fabric", kind: "select", unit: "", choices: FABRIC_CHOICES, source: "data/fabrics.csv" },
  { key: "mastType", label: "Mast type", kind: "select", unit: "", choices: [{ value: "plain", label: "Plain tube (buckles over full length)" }, { value: "braced", label: "Braced at mid-height (half length)" }], source: "assumption: braced L_cr = L/2" },
  { key: "anchorUpliftMargin", label: "Anchor weight / uplift", kind: "number", unit: "", min: 1.0, max: 3.0, step: 0.05, source: "EN 1990 Table A1.2(A): 1/0.9" },
  ...TENSION_COMMON_OPTIONS,
];

const validSpanM = { min: 60, max: 400 };
const identity = { id: "cable-net" as const, label: "Mast-supported cable net", validSpanM };

function design(brief: Brief, opts: CableNetOptions, catalogue: Catalogue): Design {
  checkSchemeOptions(options, opts);
  const fabric = findFabric(catalogue, opts.fabric);
  const layout = cableNetLayout(brief, opts.masts, opts.mastRingRatio, opts.mastHeightRatio, opts.radialCablesPerMast, opts.hangerSpacingM);
  const section = cableNetSection(layout, brief.eavesHeightM);
  for (const [name, bay] of [["outer", layout.outer], ["inner", layout.inner]] as const) {
    if (!(bay.sagM > 0.03 * bay.spanM)) {
      return infeasibleDesign("cable-net", brief, `the ${name} radial cables would hang less than 3 % of their span below their chord (${bay.sagM.toFixed(1)} m over ${bay.spanM.toFixed(0)} m): raise the mast height ratio`, [], section);
    }
    if (bay.sagM > 0.5 * bay.spanM) {
      return infeasibleDesign("cable-net", brief, `the ${name} radial cables would sag more than half their span (${bay.sagM.toFixed(1)} m over ${bay.spanM.toFixed(0)} m): lower the mast height ratio or move the mast ring`, [], section);
    }
  }
  const actions = roofActions(brief);
  const input = {
    brief, actions, layout, catalogue, fabric,
    residualPrestress: opts.residualPrestress, gammaR: opts.gammaR, yieldPa: opts.steelYieldMPa * 1e6, hangerSpacingM: opts.hangerSpacingM,
    braced: opts.mastType === "braced", anchorUpliftMargin: opts.anchorUpliftMargin, fabricAllowancePct: opts.fabricAllowancePct, fabricSagRatio: opts.fabricSagRatio,
  };
  let converged: { value: NetSizing; iterations: number };
  try {
    converged = iterateSelfWeight((g) => {
      const value = sizeCableNet(input, g);
      return { value, selfWeightKPa: value.selfWeightKPa };
    }, 0.1);
  } catch (error) {
    if (error instanceof ConvergenceError || error instanceof SizingError) return infeasibleDesign("cable-net", brief, error.message, [], section);
    throw error;
  }
  const sized = converged.value;
  const checks: Check[] = sized.groups.map((g) => check(g.name, g.governing, g.designForceN, g.resistanceN, "N"));
  const allowable = Math.min(fabric.tensileWarpNPerM, fabric.tensileWeftNPerM) / opts.fabricStrengthFactor;
  const fabricClause = "n = p s²/(8f) (Irvine 1981 ch. 1) against strength / factor (common practice)";
  checks.push(check("fabric panel, gravity", fabricClause, sized.fabricGravityNPerM, allowable, "N/m"));
  checks.push(check("fabric panel, uplift", fabricClause, sized.fabricUpliftNPerM, allowable, "N/m"));
  const mast = sized.groups.find((g) => g.kind === "mast");
  const members: MemberGroup[] = sized.groups.map((g) => ({
    element: g.name,
    material: g.kind === "mast" ? (g.fabricated ? "steel-plate" : "steel-hot-finished-hollow") : g.kind === "central ring" ? "steel-plate" : "steel-strand",
    count: g.count, lengthM: g.lengthM, section: g.designation, designForceN: g.designForceN, resistanceN: g.resistanceN, utilisation: g.utilisation, governing: g.governing,
  }));
  const massOf = (kinds: readonly string[]) => sized.groups.filter((g) => kinds.includes(g.kind)).reduce((s, g) => s + g.massKg, 0);
  const cableRow = (element: string, kinds: readonly string[]): TakeoffRow => {
    const massKg = massOf(kinds);
    return { element, material: "steel-strand", costItem: "cable", quantity: massKg / 1000, unit: "t", massKg };
  };
  const mastKg = massOf(["mast"]);
  const anchorKg = sized.anchorConcreteM3 * PLAIN_CONCRETE_DENSITY_KG_PER_M3;
  const takeoff: TakeoffRow[] = [
    cableRow("radial cables", ["suspension"]),
    cableRow("valley cables", ["valley"]),
    cableRow("circumferential cables", ["circumferential"]),
    cableRow("edge cables", ["edge"]),
    cableRow("backstays", ["backstay"]),
    { element: "masts", material: mast?.fabricated ? "steel-plate" : "steel-hot-finished-hollow", costItem: "steel-mast", quantity: mastKg / 1000, unit: "t", massKg: mastKg },
    { element: "central tension ring", material: "steel-plate", costItem: "steel-ring", quantity: massOf(["central ring"]) / 1000, unit: "t", massKg: massOf(["central ring"]) },
    { element: "fabric", material: fabric.material, costItem: fabricCostItem(fabric), quantity: sized.fabricAreaM2, unit: "m2", massKg: sized.fabricMassKg },
    { element: "anchors", material: "concrete-c30-37", costItem: "anchor", quantity: sized.anchorConcreteM3, unit: "m3", massKg: anchorKg },
  ];
  const plan = layout.cap.planAreaM2;
  const perM2 = (kg: number) => kg / plan;
  const summary = [
    { key: "masts", label: "Masts", value: layout.masts, unit: "" },
    { key: "mastLength", label: "Mast length", value: layout.mastLengthM, unit: "m" },
    { key: "mastForce", label: "Mast force (ULS)", value: sized.mastForceN / 1000, unit: "kN" },
    { key: "backstayForce", label: "Backstay force (ULS)", value: sized.backstayForceN / 1000, unit: "kN" },
    { key: "prestressOuter", label: "Valley pull on the net, outer bay", value: sized.prestressOuterNPerM / 1000, unit: "kN/m" },
    { key: "prestressInner", label: "Valley pull on the net, inner bay", value: sized.prestressInnerNPerM / 1000, unit: "kN/m" },
    { key: "gravityUls", label: `ULS gravity (EN 1990 eq. ${sized.gravityExpression})`, value: sized.gravityPa / 1000, unit: "kPa" },
    { key: "upliftUls", label: "ULS net pressure, uplift case (negative up)", value: sized.upliftPa / 1000, unit: "kPa" },
    { key: "cableKgPerM2", label: "Cables", value: perM2(massOf(["suspension", "valley", "circumferential", "edge", "backstay"])), unit: "kg/m²" },
    { key: "mastKgPerM2", label: "Masts", value: perM2(mastKg), unit: "kg/m²" },
    { key: "fabricKgPerM2", label: "Fabric", value: perM2(sized.fabricMassKg), unit: "kg/m²" },
    { key: "anchorKgPerM2", label: "Anchors (concrete)", value: perM2(anchorKg), unit: "kg/m²" },
  ];
  const warnings = [
    "axisymmetric first-order analysis: asymmetric snow and wind, fan angles of the cables in plan and large displacements are not analysed",
    "uplift is resisted by an idealised valley-cable family sharing load equally with the radial cables (equal sag and stiffness assumed)",
    "anchors are checked for uplift only (sliding and the mast foundations are not designed)",
  ];
  if (mast?.fabricated) warnings.push(`masts exceed the hollow-section catalogue: a fabricated ${mast.designation} tube is assumed`);
  if (layout.mastRadiusM + layout.backstayRunM < layout.cap.baseRadiusM) warnings.push("backstay anchors fall inside the plan: raise the mast ring ratio or check the floor layout");
  const usableFloorM2 = usableFloorAreaM2(layout.cap.baseRadiusM, (r) => brief.eavesHeightM + capHeightAt(layout.cap, r), brief.minClearHeightM);
  return assembleDesign(identity, brief, {
    summary, members, takeoff, checks, warnings,
    iterations: converged.iterations,
    usableFloorM2,
    roofSurfaceM2: layout.cap.surfaceM2,
    enclosedVolumeM3: plan * brief.eavesHeightM + layout.cap.volumeM3,
    drawing: { section, plan: cableNetPlan(layout) },
  });
}

/** Mast-supported cable net: fabric hung from radial cables off mast heads, prestressed against valley cables, masts stayed by backstays. */
export const cableNet: SchemeModel<CableNetOptions> = {
  ...identity,
  description:
    "Masts on a ring inside the plan carry radial cables that hang the fabric: half run out to anchors at the edge, half in to a central tension ring. Circumferential cables between the radial cables carry the fabric panels. A second family of valley cables, prestressed against the radial ones, holds the roof down in wind uplift. Backstays take the difference of pull at each mast head down to ground anchors.",
  options,
  defaults,
  design,
};
