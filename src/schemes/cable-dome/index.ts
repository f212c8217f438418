import type { Brief } from "../../brief";
import type { Catalogue, Fabric } from "../../catalogue/types";
import type { TakeoffRow } from "../../takeoff/takeoff-row";
import type { DesignParts, OptionValues } from "../kit";
import { assembleDesign, capEnvelope, check, convergeSelfWeight, defineOptions, defineScheme, fabricAllowableNPerM, fabricCostItem, fabricPanelChecks, findFabric, infeasibleOnFailure, massOfKinds, memberOf, tonnesRow, FABRIC_OPTION, TENSION_COMMON_OPTIONS } from "../kit";
import { roofActions } from "../../loads/roof-actions";
import { usableFloorAreaM2 } from "../../mechanics/usable-floor";
import { PLAIN_CONCRETE_DENSITY_KG_PER_M3 } from "../../mechanics/concrete";
import { kPaFromKgPerM2 } from "../../mechanics/gravity";
import { autoHoopCount, cableDomeLayout, cableDomePlan, cableDomeSection, cableDomeUndersideM, type CableDomeLayout } from "./geometry";
import { sizeCableDome, type DomeSizing } from "./sizing";
import { designCompressionRing, type RingDesign, type RingMaterial } from "./compression-ring";

const declarations = {
  /** Radial trusses N; 0 = automatic (even count with ridges ≤ 12 m apart at the perimeter, closer where the fabric needs it, at least 12). */
  radialTrusses: { kind: "number", label: "Radial trusses (0 = automatic)", unit: "", min: 0, max: 120, step: 2, integer: true, default: 0, source: "automatic: perimeter ridge spacing ≤ 12 m (common practice, no source), closer where the fabric panel needs it; at least 12" },
  /** Hoops n; 0 = automatic (one per 27.5 m of radius, 1 to 8; fewer where the outer members cannot be made). */
  hoops: { kind: "number", label: "Hoops (0 = automatic)", unit: "", min: 0, max: 8, step: 1, integer: true, default: 0, source: "automatic: one per 27.5 m of radius, common practice 20–35 m (no source); fewer where the outer members cannot be made" },
  centralRingRatio: { kind: "number", label: "Central ring radius / plan radius", unit: "", min: 0.03, max: 0.3, step: 0.01, default: 0.1, source: "common practice, no source" },
  // default 0.6 gives the lightest roof with its ring at 160 m here; 0.4 more usable floor (common practice, no source)
  postHeightRatio: { kind: "number", label: "Diagonal rise per bay", unit: "", min: 0.05, max: 1.0, step: 0.01, default: 0.6, source: "common practice, no source" },
  ringMaterial: { kind: "select", label: "Compression ring", choices: [{ value: "concrete", label: "Reinforced concrete" }, { value: "steel", label: "Steel box" }], default: "concrete", source: "design choice" },
  // the cables do restrain the ring; false gives the bare-ring 3EI/R³ (Timoshenko & Gere ch. 7)
  ringCableRestraint: { kind: "toggle", label: "Ridge cables restrain ring buckling", default: true, source: "ring on elastic foundation (from memory); off: bare ring 3EI/R³, Timoshenko & Gere ch. 7" },
  ...FABRIC_OPTION,
  ...TENSION_COMMON_OPTIONS,
} as const;
export type CableDomeOptions = OptionValues<typeof declarations>;

/**
 * Widest fabric panel the automatic truss count allows: n = p s/(8·sag ratio) ≤ allowable, with the
 * characteristic pressure for an estimated permanent load (fabric + services + 0.35 kPa of cables and posts).
 */
function widestPanelM(brief: Brief, opts: CableDomeOptions, fabric: Fabric, actions: ReturnType<typeof roofActions>): number {
  const allowable = fabricAllowableNPerM(fabric, opts.fabricStrengthFactor);
  const permanentEstimateKPa = brief.servicesKPa + 0.35 + kPaFromKgPerM2(fabric.massKgPerM2);
  const panelKPa = Math.max(permanentEstimateKPa + actions.leadingVariableKPa, actions.upliftKPa - permanentEstimateKPa);
  return (0.95 * 8 * opts.fabricSagRatio * allowable) / (panelKPa * 1000);
}

/** The compression ring on the ridge cables: their radial stiffness (series springs EA cos²θ / L, central ring held) is its elastic foundation. */
function compressionRing(layout: CableDomeLayout, sized: DomeSizing, opts: CableDomeOptions): RingDesign | null {
  const a = layout.cap.baseRadiusM;
  const ridges = sized.groups.filter((m) => m.kind === "ridge");
  const chainFlexibility = ridges.reduce((sum, m, i) => {
    const dr = (i + 1 < layout.truss.radiiM.length ? (layout.truss.radiiM[i + 1] as number) : a) - (layout.truss.radiiM[i] as number);
    const cos = dr / m.lengthM;
    return sum + m.lengthM / (m.modulusPa * m.areaM2 * cos * cos);
  }, 0);
  const foundation = layout.trusses / chainFlexibility / (2 * Math.PI * a);
  const material = opts.ringMaterial as RingMaterial;
  return designCompressionRing({ compressionN: sized.ringCompressionN, radiusM: a, foundationNPerM2: opts.ringCableRestraint ? foundation : 0, spokes: layout.trusses, material, yieldPa: opts.steelYieldMPa * 1e6 });
}

function domeTakeoff(sized: DomeSizing, ring: RingDesign | null, fabric: Fabric, ringMaterial: string): TakeoffRow[] {
  const massOf = (kind: DomeSizing["groups"][number]["kind"]) => massOfKinds(sized.groups, [kind]);
  const takeoff: TakeoffRow[] = [
    tonnesRow("ridge cables", "steel-strand", "cable", massOf("ridge")),
    tonnesRow("diagonal cables", "steel-strand", "cable", massOf("diagonal")),
    tonnesRow("hoops", "steel-strand", "cable", massOf("hoop")),
    tonnesRow("posts", "steel-hot-finished-hollow", "steel-mast", massOf("post")),
    tonnesRow("central tension ring", "steel-plate", "steel-ring", massOf("central ring")),
    { element: "fabric", material: fabric.material, costItem: fabricCostItem(fabric), quantity: sized.fabricAreaM2, unit: "m2", massKg: sized.fabricMassKg },
  ];
  if (ring && ringMaterial === "steel") {
    takeoff.push(tonnesRow("compression ring", "steel-plate", "steel-ring", ring.steelKg));
  } else if (ring) {
    takeoff.push({ element: "compression ring", material: "concrete-c40-50", costItem: "concrete", quantity: ring.concreteM3, unit: "m3", massKg: ring.concreteM3 * PLAIN_CONCRETE_DENSITY_KG_PER_M3 });
    takeoff.push(tonnesRow("compression ring reinforcement", "rebar", "rebar", ring.steelKg));
  }
  return takeoff;
}

function domeSummary(layout: CableDomeLayout, sized: DomeSizing, ring: RingDesign | null) {
  const perM2 = (kg: number) => kg / layout.cap.planAreaM2;
  return [
    { key: "trusses", label: "Radial trusses", value: layout.trusses, unit: "" },
    { key: "hoops", label: "Hoops", value: layout.hoops, unit: "" },
    { key: "prestress", label: "Prestress (central upper ring force)", value: sized.prestressN / 1000, unit: "kN" },
    { key: "ringForce", label: "Compression ring force (ULS)", value: sized.ringCompressionN / 1000, unit: "kN" },
    { key: "gravityUls", label: `ULS gravity (EN 1990 eq. ${sized.gravityExpression})`, value: sized.gravityPa / 1000, unit: "kPa" },
    { key: "upliftUls", label: "ULS net pressure, uplift case (negative up)", value: sized.upliftPa / 1000, unit: "kPa" },
    { key: "cableKgPerM2", label: "Cables", value: perM2(massOfKinds(sized.groups, ["ridge", "diagonal", "hoop"])), unit: "kg/m²" },
    { key: "postKgPerM2", label: "Posts", value: perM2(massOfKinds(sized.groups, ["post"])), unit: "kg/m²" },
    { key: "fabricKgPerM2", label: "Fabric", value: perM2(sized.fabricMassKg), unit: "kg/m²" },
    { key: "ringKgPerM2", label: "Compression ring", value: ring ? perM2(ring.steelKg + ring.concreteM3 * PLAIN_CONCRETE_DENSITY_KG_PER_M3) : 0, unit: "kg/m²" },
  ];
}

/** The dome with a given number of hoops: layout, self-weight iterated around the sizing, ring, checks and take-off. */
function designWith(brief: Brief, opts: CableDomeOptions, catalogue: Catalogue, hoops: number): DesignParts {
  const fabric = findFabric(catalogue, opts.fabric);
  const actions = roofActions(brief);
  const layout = cableDomeLayout(brief, opts.radialTrusses, hoops, opts.centralRingRatio, opts.postHeightRatio, widestPanelM(brief, opts, fabric, actions));
  const section = cableDomeSection(layout, brief.eavesHeightM);
  const input = {
    brief, actions, layout, catalogue, fabric, yieldPa: opts.steelYieldMPa * 1e6,
    residualPrestress: opts.residualPrestress, gammaR: opts.gammaR, fabricAllowancePct: opts.fabricAllowancePct, fabricSagRatio: opts.fabricSagRatio,
  };
  const converged = convergeSelfWeight<DomeSizing>((g) => {
    const value = sizeCableDome(input, g);
    return { value, selfWeightKPa: value.selfWeightKPa };
  }, 0.15, { section });
  const sized = converged.value;
  const ring = compressionRing(layout, sized, opts);
  const checks = sized.groups.map((m) => check(m.element, m.governing, m.designForceN, m.resistanceN, "N"));
  checks.push(...fabricPanelChecks(sized.fabricGravityNPerM, sized.fabricUpliftNPerM, fabricAllowableNPerM(fabric, opts.fabricStrengthFactor)));
  if (ring) checks.push(check("compression ring", ring.governing, sized.ringCompressionN, ring.resistanceN, "N"));
  const warnings = [
    "axisymmetric first-order analysis: asymmetric snow and wind, and large-displacement effects, are not analysed (cable domes are sensitive to both: check at the next stage)",
    "the columns or stand structure under the compression ring are not designed",
    "self-weight is smeared over the plan and applied at the post heads",
  ];
  const a = layout.cap.baseRadiusM;
  return {
    summary: domeSummary(layout, sized, ring),
    members: sized.groups.map(memberOf),
    takeoff: domeTakeoff(sized, ring, fabric, opts.ringMaterial),
    checks,
    warnings,
    iterations: converged.iterations,
    usableFloorM2: usableFloorAreaM2(a, (r) => brief.eavesHeightM + cableDomeUndersideM(layout, r), brief.minClearHeightM),
    ...capEnvelope(layout.cap, brief.eavesHeightM),
    drawing: { section, plan: cableDomePlan(layout) },
    reason: ring ? "" : `no ${opts.ringMaterial} compression ring up to 8 m wide carries ${(sized.ringCompressionN / 1e6).toFixed(0)} MN with in-plane buckling: use more radial trusses (stiffer restraint) or the other ring material`,
  };
}

const identity = {
  id: "cable-dome",
  label: "Cable dome",
  colour: "#0072B2",
  description:
    "Radial cable trusses span from a perimeter compression ring to a central tension ring: ridge cables over the top, vertical posts standing on hoops, and diagonals from the foot of each post to the head of the next. Prestress in the cables holds the posts up; coated fabric spans between the ridges. The roof is very light; the compression ring carries the whole horizontal thrust.",
  validSpanM: { min: 40, max: 250 },
} as const;

/** Automatic hoops: one per 27.5 m of radius, fewer where the outer members cannot be made (the force grows by a factor at each hoop outwards). */
function design(brief: Brief, opts: CableDomeOptions, catalogue: Catalogue) {
  const withHoops = (hoops: number) => infeasibleOnFailure(identity.id, brief, () => assembleDesign(identity, brief, designWith(brief, opts, catalogue, hoops)));
  if (opts.hoops > 0) return withHoops(opts.hoops);
  const usual = autoHoopCount(brief.spanM);
  const first = withHoops(usual);
  for (let hoops = usual - 1; !first.feasible && hoops >= 1; hoops--) {
    const fewer = withHoops(hoops);
    if (fewer.feasible) return { ...fewer, warnings: [...fewer.warnings, `${hoops} hoops instead of the usual ${usual}: with more, ${first.reason}`] };
  }
  return first;
}

/** Cable dome: radial cable trusses between a perimeter compression ring and a central tension ring, fabric between the ridges. */
export const cableDome = defineScheme({ ...identity, options: defineOptions(declarations), design });
