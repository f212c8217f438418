import { wholeNumber } from "../../kernel/units";
import type { Brief } from "../../brief";
import type { Catalogue, Fabric } from "../../catalogue/types";
import type { TakeoffRow } from "../../takeoff/takeoff-row";
import type { Design, DesignParts, PlanCombination } from "../kit";
import { assembleDesign, capEnvelope, check, convergeSelfWeight, defineScheme, fabricAllowableNPerM, fabricCostItem, fabricPanelChecks, findFabric, infeasibleOnFailure, massOfKinds, memberOf, tonnesRow, planCombinations, SizingError, CABLE_ROOF_DEFLECTION_RATIO } from "../kit";
import { roofActions } from "../../loads/roof-actions";
import { PLAIN_CONCRETE_DENSITY_KG_PER_M3 } from "../../mechanics/concrete";
import { kPaFromKgPerM2 } from "../../mechanics/gravity";
import { autoHoopCount, cableDomeLayout, cableDomePlan, cableDomeSection, cableDomeSoffit, type CableDomeLayout } from "./geometry";
import { domeMembers, sizeCableDome, type DomeSizing, type DomeSizingInput } from "./sizing";
import { analyseDome, DOME_MAX_ITERATIONS, type DomeAnalysis, type DomeSlackRule } from "./analysis";
import { designBasis, type DesignBasis } from "../../loads";
import { designCompressionRing, type RingDesign, type RingMaterial } from "./compression-ring";
import { cableDomeDeclaration, type CableDomeOptions } from "./declaration";

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
  const bareFactor = opts.ringCableRestraint || opts.bareRingLoad !== "centre" ? 1 : 1.5;
  return designCompressionRing({ compressionN: sized.ringCompressionN, radiusM: a, foundationNPerM2: opts.ringCableRestraint ? foundation : 0, spokes: layout.trusses, material, yieldPa: opts.steelYieldMPa * 1e6, bareRingFactor: bareFactor });
}

function domeTakeoff(sized: DomeSizing, ring: RingDesign | null, fabric: Fabric, ringMaterial: string): TakeoffRow[] {
  const massOf = (kind: DomeSizing["groups"][number]["kind"]) => massOfKinds(sized.groups, [kind]);
  const takeoff: TakeoffRow[] = [
    tonnesRow("ridge cables", "steel-strand", "cable", massOf("ridge")),
    tonnesRow("diagonal cables", "steel-strand", "cable", massOf("diagonal")),
    tonnesRow("hoops", "steel-strand", "cable", massOf("hoop")),
    tonnesRow("posts", "steel-hot-finished-hollow", "steel-mast", massOf("post")),
    { ...tonnesRow("central tension ring", "steel-plate", "steel-ring", massOf("central ring")), group: "structure" },
    { element: "fabric", material: fabric.material, costItem: fabricCostItem(fabric), quantity: sized.fabricAreaM2, unit: "m2", massKg: sized.fabricMassKg, group: "envelope" },
  ];
  if (ring && ringMaterial === "steel") {
    takeoff.push({ ...tonnesRow("compression ring", "steel-plate", "steel-ring", ring.steelKg), group: "perimeter" });
  } else if (ring) {
    takeoff.push({ element: "compression ring", material: "concrete-c40-50", costItem: "concrete", quantity: ring.concreteM3, unit: "m3", massKg: ring.concreteM3 * PLAIN_CONCRETE_DENSITY_KG_PER_M3, group: "perimeter" });
    takeoff.push({ ...tonnesRow("compression ring reinforcement", "rebar", "rebar", ring.steelKg), group: "perimeter" });
  }
  return takeoff;
}

function domeSummary(layout: CableDomeLayout, sized: DomeSizing, ring: RingDesign | null) {
  const perM2 = (kg: number) => kg / layout.cap.planAreaM2;
  return [
    { key: "trusses", label: "Radial trusses", value: layout.trusses, unit: "" },
    { key: "hoops", label: "Hoops", value: layout.hoops, unit: "" },
    { key: "postHeightRatio", label: "Diagonal rise per bay", value: layout.postHeightRatio, unit: "" },
    { key: "ringHeight", label: "Compression ring above the eaves", value: layout.ringRaiseM, unit: "m" },
    { key: "prestress", label: "Prestress (central upper ring force)", value: sized.prestressN / 1000, unit: "kN" },
    { key: "ringForce", label: "Compression ring force (ULS)", value: sized.ringCompressionN / 1000, unit: "kN" },
    { key: "gravityUls", label: "ULS gravity, uniform equivalent of the worst combination", value: Math.max(...sized.states.map((st) => st.pressurePa)) / 1000, unit: "kPa" },
    { key: "upliftUls", label: "ULS net pressure, uniform equivalent of the worst uplift (negative up)", value: Math.min(...sized.states.map((st) => st.pressurePa)) / 1000, unit: "kPa" },
    { key: "cableKgPerM2", label: "Cables", value: perM2(massOfKinds(sized.groups, ["ridge", "diagonal", "hoop"])), unit: "kg/m²" },
    { key: "postKgPerM2", label: "Posts", value: perM2(massOfKinds(sized.groups, ["post"])), unit: "kg/m²" },
    { key: "fabricKgPerM2", label: "Fabric", value: perM2(sized.fabricMassKg), unit: "kg/m²" },
    { key: "ringKgPerM2", label: "Compression ring", value: ring ? perM2(ring.steelKg + ring.concreteM3 * PLAIN_CONCRETE_DENSITY_KG_PER_M3) : 0, unit: "kg/m²" },
  ];
}

/**
 * The closed-form sizing re-done from the 3D analysis: members sized for the analysed forces
 * (enveloped over the trusses), the ring for the largest analysed pull, the prestress the analysis
 * found; null when the analysis failed (its reason is returned instead).
 */
function analysedSizing(input: DomeSizingInput, sized: DomeSizing, selfWeightKPa: number, opts: CableDomeOptions): { sized: DomeSizing; analysis: DomeAnalysis } {
  let analysis: DomeAnalysis;
  try {
    analysis = analyseDome({
      brief: input.brief, basis: input.basis, layout: input.layout, combinations: input.combinations, selfWeightKPa, groups: sized.groups,
      seedPrestressN: sized.prestressN, residualPrestress: opts.residualPrestress, slack: opts.slackAllowed as DomeSlackRule, displacementLimitM: input.brief.spanM * DEFLECTION_LIMIT_RATIO,
    });
  } catch (error) {
    // the model refuses a member state it cannot represent (e.g. a strut squeezed beyond −EA by a very large prestress)
    if (!(error instanceof RangeError)) throw error;
    throw new SizingError(`the 3D analysis could not be set up: ${error.message}; try the closed form, more hoops or a deeper truss`);
  }
  if (analysis.reason !== "") return { sized, analysis };
  const groups = domeMembers(input, analysis.cases.map((c) => ({ name: c.name, pressurePa: 0, forces: c.envelope })));
  return { sized: { ...sized, groups, prestressN: analysis.prestressN, ringCompressionN: analysis.ringCompressionN, ringCase: analysis.ringCase }, analysis };
}

/** What set the analysed prestress, in a project lead's words: keeping the cables taut, how far the roof may move, or a lower prestress the analysis could not balance. */
function prestressWarning(analysis: DomeAnalysis, spanM: number, residualPrestress: number): string {
  const kN = `${wholeNumber(analysis.prestressN / 1000)} kN`;
  const limit = analysis.governedBy;
  if (limit === null) return `prestress ${kN}: the lowest the analysis tried; with it every cable stays taut and the roof moves less than span/${(1 / DEFLECTION_LIMIT_RATIO).toFixed(0)} (no lower prestress was found to fail)`;
  const lower = `at ${wholeNumber(limit.prestressN / 1000)} kN`;
  if (limit.kind === "displacement") return `prestress ${kN}, set by how far the roof may move: ${lower} it moves more than span/${(1 / DEFLECTION_LIMIT_RATIO).toFixed(0)} (${(spanM * DEFLECTION_LIMIT_RATIO).toFixed(2)} m) under ${limit.caseName}`;
  if (limit.kind === "taut cables") {
    const { name, keptShare } = limit.cable;
    const kept = keptShare === 0 ? "goes slack" : `keeps ${(100 * keptShare).toFixed(1)} % of its prestress`;
    return `prestress ${kN}, set by keeping the cables taut: ${lower} ${name} ${kept} under ${limit.caseName}, against ${(100 * residualPrestress).toFixed(0)} % required`;
  }
  return `prestress ${kN}, set by the analysis converging: ${lower} it found no balanced shape under ${limit.caseName} within ${DOME_MAX_ITERATIONS} iterations (counted as failing)`;
}

/** Largest displacement under the analysed combinations ÷ span allowed. */
export const DEFLECTION_LIMIT_RATIO = CABLE_ROOF_DEFLECTION_RATIO;

/** The dome with a given number of hoops: layout, self-weight iterated around the sizing, ring, checks and take-off. */
function designWith(brief: Brief, opts: CableDomeOptions, catalogue: Catalogue, hoops: number, combinations: readonly PlanCombination[], basis: DesignBasis, analyse: boolean): DesignParts {
  const fabric = findFabric(catalogue, opts.fabric);
  const actions = roofActions(brief);
  const layout = cableDomeLayout(brief, opts.radialTrusses, hoops, opts.centralRingRatio, opts.postHeightRatio, opts.ringHeightRatio * brief.spanM, widestPanelM(brief, opts, fabric, actions));
  const section = cableDomeSection(layout, brief.eavesHeightM);
  const input = {
    brief, actions, combinations, basis, layout, catalogue, fabric, yieldPa: opts.steelYieldMPa * 1e6,
    residualPrestress: opts.residualPrestress, gammaR: opts.gammaR, fabricAllowancePct: opts.fabricAllowancePct, fabricSagRatio: opts.fabricSagRatio,
  };
  const converged = convergeSelfWeight<DomeSizing>((g) => {
    const value = sizeCableDome(input, g);
    return { value, selfWeightKPa: value.selfWeightKPa };
  }, 0.15, { section });
  const closedForm = converged.value;
  const analysed = analyse ? analysedSizing(input, closedForm, converged.selfWeightKPa, opts) : null;
  const sized = analysed?.sized ?? closedForm;
  const ring = compressionRing(layout, sized, opts);
  const checks = sized.groups.map((m) => check(m.element, m.governing, m.designForceN, m.resistanceN, "N"));
  const analysis = analysed?.analysis;
  if (analysis && analysis.reason === "") {
    const largest = Math.max(...analysis.cases.map((c) => c.maxDisplacementM));
    checks.push(check("largest displacement (3D analysis, design combinations)", `≤ span × ${DEFLECTION_LIMIT_RATIO} (common practice for cable roofs, no source; ULS loads, an upper bound of the service value)`, largest, brief.spanM * DEFLECTION_LIMIT_RATIO, "m"));
  }
  checks.push(...fabricPanelChecks(sized.fabricGravityNPerM, sized.fabricUpliftNPerM, fabricAllowableNPerM(fabric, opts.fabricStrengthFactor)));
  if (ring) checks.push(check("compression ring", ring.governing, sized.ringCompressionN, ring.resistanceN, "N"));
  const warnings = [
    analysis
      ? `members, ring and prestress from the 3D analysis (Newton–Raphson, tension-only cables) of ${analysis.cases.map((c) => c.name).join(", ")} — the combinations with the largest gravity peak, drifted snow and the largest uplift; the closed form (uniform equivalents) seeds it and is the cross-check: prestress ${wholeNumber(closedForm.prestressN / 1000)} kN there; the ring is taken as rigid in the analysis, the wind's horizontal part is left out, and member stiffness is the closed form's`
      : "axisymmetric first-order closed form: each design combination is taken at its conservative uniform equivalent (the peak of a gravity map, the most upward value of an uplift map, over the whole plan); the antisymmetric part of drifted snow and one-sided wind is not analysed by it",
    ...(analysis && analysis.reason === "" ? [prestressWarning(analysis, brief.spanM, opts.residualPrestress)] : []),
    "temperature: a uniform change does not change the forces of cables, posts and a steel ring that expand alike; with a concrete ring the small difference of expansion is left out",
    "the columns or stand structure under the compression ring are not designed",
    "self-weight is smeared over the plan and applied at the post heads",
  ];
  const worstGroup = sized.groups.reduce((w, m) => (m.utilisation > w.utilisation ? m : w));
  const ringGoverns = ring !== null && ring.utilisation > worstGroup.utilisation;
  return {
    summary: domeSummary(layout, sized, ring),
    members: sized.groups.map(memberOf),
    takeoff: domeTakeoff(sized, ring, fabric, opts.ringMaterial),
    checks,
    warnings,
    iterations: converged.iterations,
    floor: { soffit: cableDomeSoffit(layout), supports: [] },
    governingLoadCase: ringGoverns ? sized.ringCase : worstGroup.caseName,
    regime: `${layout.hoops} hoop${layout.hoops === 1 ? "" : "s"}`,
    ...capEnvelope(layout.cap, brief.eavesHeightM + layout.ringRaiseM),
    drawing: { section, plan: cableDomePlan(layout) },
    ...(analysis ? { analysis: analysis.summary } : {}),
    reason: analysis && analysis.reason !== "" ? analysis.reason : ring ? "" : `no ${opts.ringMaterial} compression ring up to 8 m wide carries ${(sized.ringCompressionN / 1e6).toFixed(0)} MN with in-plane buckling: use more radial trusses (stiffer restraint) or the other ring material`,
  };
}

/**
 * Automatic hoops: the lightest feasible design of one fewer, the usual (one per 55 m of radius) and
 * one more hoop — the least over the candidates, so the result does not jump where the usual count
 * steps; with none feasible, the usual count's answer.
 */
function design(brief: Brief, opts: CableDomeOptions, catalogue: Catalogue) {
  const basis = designBasis(brief);
  const combinations = planCombinations(brief, basis);
  const withHoops = (hoops: number, analyse: boolean) => infeasibleOnFailure(cableDomeDeclaration.id, brief, () => assembleDesign(cableDomeDeclaration, brief, designWith(brief, opts, catalogue, hoops, combinations, basis, analyse)));
  // outside the method's span range the design is not ranked: the closed form answers there, in milliseconds rather than seconds
  const inRange = brief.spanM >= cableDomeDeclaration.validSpanM.min && brief.spanM <= cableDomeDeclaration.validSpanM.max;
  const analyse = opts.analysis === "3d" && inRange;
  const result = opts.hoops > 0 ? withHoops(opts.hoops, analyse) : lightestHoops(brief, withHoops, analyse);
  return opts.analysis === "3d" && !inRange ? { ...result, warnings: [...result.warnings, `outside the valid span range (${cableDomeDeclaration.validSpanM.min}–${cableDomeDeclaration.validSpanM.max} m) the 3D analysis is not run: closed form only`] } : result;
}

/**
 * The lightest feasible of one hoop fewer, the usual count and one more, each designed the way the
 * result will be: by the closed form, or — when the 3D analysis is asked for — by the analysis. The
 * 3D design does not choose its hoops on the closed form's masses: those post forces are about 20 %
 * higher, so at 215–220 m the closed form keeps one hoop, whose 38.8 m posts in the 3D design are held
 * by L/i ≤ 180 alone and step from CHS 610 to 711 (+49 % per metre, a 16.8 % step in self-weight),
 * where two hoops are lighter in 3D. With none feasible, the usual count's answer.
 */
function lightestHoops(brief: Brief, withHoops: (hoops: number, analyse: boolean) => Design, analyse: boolean): Design {
  const usual = autoHoopCount(brief.spanM);
  const counts = [usual - 1, usual, usual + 1].filter((n) => n >= 1 && n <= 8);
  const candidates = counts.map((n) => withHoops(n, analyse));
  const feasible = candidates.filter((d) => d.feasible);
  if (feasible.length > 0) return feasible.reduce((best, d) => (d.roofMassKg < best.roofMassKg ? d : best));
  return candidates[usual > 1 ? 1 : 0] as Design;
}

/** Cable dome: radial cable trusses between a perimeter compression ring and a central tension ring, fabric between the ridges. */
export const cableDome = defineScheme(cableDomeDeclaration, design);
