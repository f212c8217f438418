import { wholeNumber } from "../../kernel/units";
import type { Brief } from "../../brief";
import type { Catalogue, Fabric } from "../../catalogue/types";
import type { TakeoffRow } from "../../takeoff/takeoff-row";
import type { DesignParts, DrawingLine, FloorEnvelope } from "../kit";
import { capEnvelope, check, convergeSelfWeight, defineScheme, drawingWithLazyPlan, once, fabricAllowableNPerM, fabricCostItem, fabricPanelChecks, findFabric, massOfKinds, memberOf, tonnesRow, planCombinations, SchemeError, SizingError, CABLE_ROOF_DEFLECTION_RATIO } from "../kit";
import { roofActions } from "../../loads/roof-actions";
import { capHeightAt } from "../../mechanics/spherical-cap";
import { PLAIN_CONCRETE_DENSITY_KG_PER_M3 } from "../../mechanics/concrete";
import { cableNetLayout, cableNetPlan, cableNetSection, type CableNetLayout } from "./geometry";
import { sizeCableNet, sizeNetFromAnalysis, MAST_SPLICE_TUBE_LENGTH_M, type NetSizing, type NetSizingInput } from "./sizing";
import { MAST_SEGMENT_MAX_M } from "./laced-mast";
import { analyseNet, formFoundRing, mastRadialCables, lumpingNote, type NetAnalysis, type NetAnalysisInput } from "./analysis";
import { heightFieldMeasure } from "../../analysis/height-field";
import { designBasis } from "../../loads";
import { strandResistanceN } from "../../catalogue/pick-strand";
import { cableNetDeclaration, type CableNetOptions } from "./declaration";

/** Parallel strands a group may have (the catalogue pick's default). */
const MAX_PARALLEL_STRANDS = 8;

/** The radial cables must hang between 3 % and half their span below their chord. */
function checkSags(layout: CableNetLayout, section: () => DrawingLine[]): void {
  for (const [name, bay] of [["outer", layout.outer], ["inner", layout.inner]] as const) {
    if (!(bay.sagM > 0.03 * bay.spanM)) {
      throw new SchemeError(`the ${name} radial cables would hang less than 3 % of their span below their chord (${bay.sagM.toFixed(1)} m over ${bay.spanM.toFixed(0)} m): raise the mast height ratio`, { section });
    }
    if (bay.sagM > 0.5 * bay.spanM) {
      throw new SchemeError(`the ${name} radial cables would sag more than half their span (${bay.sagM.toFixed(1)} m over ${bay.spanM.toFixed(0)} m): lower the mast height ratio or move the mast ring`, { section });
    }
  }
}

/** A held centre's tie-down and its anchor (substructure allowances); none with a free centre. */
function tieDownRows(sized: NetSizing): TakeoffRow[] {
  if (!sized.groups.some((g) => g.kind === "tie-down")) return [];
  return [
    { ...tonnesRow("central tie-down (strand for the net's pull; substructure allowance)", "steel-strand", "cable", massOfKinds(sized.groups, ["tie-down"])), group: "substructure" },
    { element: "central tie-down anchor", material: "concrete-c30-37", costItem: "anchor", quantity: sized.tieDownConcreteM3, unit: "m3", massKg: sized.tieDownConcreteM3 * PLAIN_CONCRETE_DENSITY_KG_PER_M3, group: "substructure" },
  ];
}

function netTakeoff(sized: NetSizing, fabric: Fabric): TakeoffRow[] {
  const mast = sized.groups.find((g) => g.kind === "mast");
  const cables = (element: string, kind: NetSizing["groups"][number]["kind"]) => tonnesRow(element, "steel-strand", "cable", massOfKinds(sized.groups, [kind]));
  return [
    cables("radial cables", "suspension"),
    // the closed form's valley cables; the 3D net has none (no row for an element not built)
    ...(sized.groups.some((g) => g.kind === "valley") ? [cables("valley cables", "valley")] : []),
    cables("circumferential cables", "circumferential"),
    cables("edge cables", "edge"),
    cables("backstays", "backstay"),
    ...tieDownRows(sized),
    tonnesRow("masts", mast?.fabricated ? "steel-plate" : "steel-hot-finished-hollow", "steel-mast", massOfKinds(sized.groups, ["mast"])),
    ...(mast?.spliceKg ? [tonnesRow(`mast splices (${mast.splices} site joints, segments ≤ ${MAST_SEGMENT_MAX_M} m for road transport; allowance: each weighs ${MAST_SPLICE_TUBE_LENGTH_M} m of the tubes it joins)`, mast.fabricated ? "steel-plate" : "steel-hot-finished-hollow", "steel-mast", mast.spliceKg)] : []),
    { ...tonnesRow("central tension ring", "steel-plate", "steel-ring", massOfKinds(sized.groups, ["central ring"])), group: "structure" },
    { element: "fabric", material: fabric.material, costItem: fabricCostItem(fabric), quantity: sized.fabricAreaM2, unit: "m2", massKg: sized.fabricMassKg, group: "envelope" },
    { element: "anchors", material: "concrete-c30-37", costItem: "anchor", quantity: sized.anchorConcreteM3, unit: "m3", massKg: sized.anchorConcreteM3 * PLAIN_CONCRETE_DENSITY_KG_PER_M3, group: "substructure" },
  ];
}

function netSummary(layout: CableNetLayout, sized: NetSizing, analysis: NetAnalysis | undefined) {
  const perM2 = (kg: number) => kg / layout.cap.planAreaM2;
  const prestress = analysis
    ? [
        { key: "prestressRadial", label: "Prestress of a radial cable (3D analysis)", value: analysis.prestressN / 1000, unit: "kN" },
        { key: "crownHeight", label: "Net crown above the eaves (form-found)", value: analysis.crownM, unit: "m" },
      ]
    : [
        { key: "prestressOuter", label: "Valley pull on the net, outer bay", value: sized.prestressOuterNPerM / 1000, unit: "kN/m" },
        { key: "prestressInner", label: "Valley pull on the net, inner bay", value: sized.prestressInnerNPerM / 1000, unit: "kN/m" },
      ];
  return [
    { key: "masts", label: "Masts", value: layout.masts, unit: "" },
    { key: "mastLength", label: "Mast length", value: layout.mastLengthM, unit: "m" },
    { key: "mastForce", label: "Mast force (ULS)", value: sized.mastForceN / 1000, unit: "kN" },
    { key: "backstayForce", label: "Backstay force (ULS)", value: sized.backstayForceN / 1000, unit: "kN" },
    ...prestress,
    { key: "gravityUls", label: "ULS gravity, uniform equivalent of the worst combination", value: Math.max(...sized.casesPa) / 1000, unit: "kPa" },
    { key: "upliftUls", label: "ULS net pressure, uniform equivalent of the worst uplift (negative up)", value: Math.min(...sized.casesPa) / 1000, unit: "kPa" },
    { key: "cableKgPerM2", label: "Cables", value: perM2(massOfKinds(sized.groups, ["suspension", "valley", "circumferential", "edge", "backstay"])), unit: "kg/m²" },
    { key: "mastKgPerM2", label: "Masts", value: perM2(massOfKinds(sized.groups, ["mast"])), unit: "kg/m²" },
    { key: "fabricKgPerM2", label: "Fabric", value: perM2(sized.fabricMassKg), unit: "kg/m²" },
    { key: "anchorKgPerM2", label: "Anchors (concrete; substructure allowance, not designed)", value: perM2(sized.anchorConcreteM3 * PLAIN_CONCRETE_DENSITY_KG_PER_M3), unit: "kg/m²" },
  ];
}

/** EA of a group of the closed form, N (1 GN where it has none: only a ring of no force). */
function stiffnessOf(sized: NetSizing, element: string): number {
  return sized.groups.find((x) => x.element === element)?.eaN ?? 1e9;
}

/** What the 3D analysis is given: the closed form's converged self-weight, its prestress as the seed (a radial cable's horizontal tension H = w_p L²/(8f)) and its stiffnesses. */
function netAnalysisInput(input: NetSizingInput, closed: NetSizing, selfWeightKPa: number): NetAnalysisInput {
  const { layout } = input;
  return {
    brief: input.brief, basis: designBasis(input.brief), layout, combinations: input.combinations, selfWeightKPa,
    seedPrestressN: (closed.prestressOuterNPerM * layout.outer.spanM ** 2) / (8 * layout.outer.sagM), residualPrestress: input.residualPrestress,
    displacementLimitM: input.brief.spanM * CABLE_ROOF_DEFLECTION_RATIO,
    maxPrestressN: MAX_PARALLEL_STRANDS * Math.max(...input.catalogue.strands.map((x) => strandResistanceN(x.minBreakingForceN, input.gammaR))),
    heldCentre: input.heldCentre,
    eaN: { outer: stiffnessOf(closed, "outer radial cables"), inner: stiffnessOf(closed, "inner radial cables"), hoop: stiffnessOf(closed, "circumferential cable 1"), ring: stiffnessOf(closed, "central tension ring") },
  };
}

/**
 * The closed-form net re-sized from the 3D analysis (analysis.ts): the analysis seeded by the closed
 * form's prestress (the radial cable's horizontal tension H = w_p L²/(8f)) and stiffnesses; when it
 * fails, the closed form's sizes with the analysis's reason.
 */
function analysedNet(input: NetSizingInput, closed: NetSizing, selfWeightKPa: number): { sized: NetSizing; analysis: NetAnalysis; surface?: NetSurface } {
  let analysis: NetAnalysis;
  try {
    analysis = analyseNet(netAnalysisInput(input, closed, selfWeightKPa));
  } catch (error) {
    // the force density network or the model refuses a state it cannot represent
    if (!(error instanceof RangeError)) throw error;
    throw new SizingError(`the 3D analysis of the net could not be set up: ${error.message}; try the closed form or other mast proportions`);
  }
  if (analysis.reason !== "") return { sized: closed, analysis };
  const e = analysis.envelope;
  const surface = netSurface(input.layout, analysis);
  const sized = sizeNetFromAnalysis(input, closed, {
    fabricSurfaceM2: surface.roofSurfaceM2,
    fabricPanelSpanM: surface.panelSpanM,
    outerN: e.outerN, innerN: e.innerN, hoopN: e.hoopN, ringN: e.ringN, caseOf: e.caseOf, outerLengthM: analysis.outerLengthM, innerLengthM: analysis.innerLengthM, ringRadiusM: formFoundRing(analysis.model).radiusM,
    mastForceN: analysis.mastForceN, mastCase: analysis.mastCase, backstayHorizontalN: analysis.backstayHorizontalN, anchorUpliftN: analysis.anchorUpliftN,
    ringUpliftN: analysis.ringUpliftN, ringUpliftCase: analysis.ringUpliftCase,
  });
  return { sized, analysis, surface };
}

/** The form-found net's surface (the fabric's), the volume under it above the eaves, and how far its nodes stand above the brief's cap (the least negative where the net dips below it). */
interface NetSurface {
  roofSurfaceM2: number;
  /** The fabric's longest span between circumferential cables (or a cable and the mast head, the edge, the ring) along the net: over the radial segments, the widest real gap a segment spans in plan × its length ÷ its plan length (a lumped net's segment spans several real gaps), m. */
  panelSpanM: number;
  enclosedVolumeM3: number;
  aboveCapM: { least: number; most: number };
}

/**
 * The fabric on the form-found net (under the permanent load): the flat triangles between the net's
 * nodes (heightFieldMeasure), their surface scaled from the polygon of edge anchors to the full
 * plan (the strip between them lies at the eaves, so its volume is left at 0).
 */
function netSurface(layout: CableNetLayout, analysis: NetAnalysis): NetSurface {
  const nodes = analysis.model.model.nodes;
  const m = heightFieldMeasure(nodes);
  const above = nodes.map(([x, y, z]) => z - capHeightAt(layout.cap, Math.min(Math.hypot(x, y), layout.cap.baseRadiusM)));
  const { members } = analysis.model.model;
  // each radial segment: its slope (length ÷ plan length) times the widest real gap it spans in plan (a lumped net's segment spans several)
  const radii = [layout.centralRingRadiusM, layout.mastRadiusM, ...layout.hoopRadiiM, layout.cap.baseRadiusM].sort((x, y) => x - y);
  const gaps = radii.slice(1).map((r, i) => ({ from: radii[i]!, to: r }));
  const panelSpanM = Math.max(
    0,
    ...members.map((member, k) => {
      const family = analysis.model.tags[k]!.family;
      if (family !== "outer radial" && family !== "inner radial") return 0;
      const [p, q] = [nodes[member.i]!, nodes[member.j]!];
      const [rp, rq] = [Math.hypot(p[0], p[1]), Math.hypot(q[0], q[1])];
      const [lo, hi] = [Math.min(rp, rq), Math.max(rp, rq)];
      const widest = Math.max(0, ...gaps.filter((g) => g.to > lo + 1e-6 && g.from < hi - 1e-6).map((g) => g.to - g.from));
      return (Math.hypot(q[0] - p[0], q[1] - p[1], q[2] - p[2]) / Math.hypot(q[0] - p[0], q[1] - p[1])) * widest;
    }),
  );
  return {
    roofSurfaceM2: (m.surfaceM2 / m.planM2) * layout.cap.planAreaM2,
    panelSpanM,
    enclosedVolumeM3: m.volumeM3,
    aboveCapM: { least: Math.min(...above), most: Math.max(...above) },
  };
}

function netWarnings(layout: CableNetLayout, sized: NetSizing, analysis: NetAnalysis | undefined, surface: NetSurface | undefined, held: boolean): string[] {
  const mast = sized.groups.find((g) => g.kind === "mast");
  const warnings = [
    analysis
      ? `cables, masts, backstays, ring and anchors from the 3D analysis (force density form finding under the permanent load, then Newton–Raphson with tension-only cables) of every design combination's load map; the form-found net has no separate valley cables: inside the mast ring it falls like a funnel from the mast heads to the central ring, its level circumferential cables carry the roof and its radial cables, arched above their chords, hold it down, and uplift unloads the circumferential cables, which sets the prestress; the closed form (uniform equivalents) only seeds it: it assumes deep-sagging radial cables held down by valley cables, a different net, so its prestress (a radial cable's ${wholeNumber(((sized.prestressOuterNPerM * layout.outer.spanM ** 2) / (8 * layout.outer.sagM)) / 1000)} kN, here ${wholeNumber(analysis.prestressN / 1000)} kN) is no check of this one's; each trial prestress is form-found anew, and a higher one flattens the net (form-finding to a fixed, deeper shape with valley cables would need less: not built); the net's crown hangs ${analysis.crownM.toFixed(1)} m above the eaves (the roof's ${capHeightAt(layout.cap, layout.centralRingRadiusM).toFixed(1)} m); mast heads and edge anchors held, the wind's horizontal part left out, member stiffness the closed form's`
      : "axisymmetric first-order closed form: each design combination is taken at its conservative uniform equivalent (the peak of a gravity map, the most upward value of an uplift map, over the whole plan); fan angles of the cables in plan and large displacements are not analysed by it",
    "temperature: not in the closed form (the sagging cables between masts and ground anchors are flexible; a uniform change moves the net more than it changes its forces)",
    `the masts stand on the floor: each takes a clear zone of ${MAST_CLEAR_RADIUS_M} m radius out of the usable floor (common practice, no source)`,
    ...(analysis ? [] : ["uplift is resisted by an idealised valley-cable family sharing load equally with the radial cables (equal sag and stiffness assumed)"]),
    "anchors are a substructure allowance, not designed: dead weight for the uplift × margin only (sliding and the mast foundations are not designed)",
  ];
  const kN = (n: number) => `${wholeNumber(n / 1000)} kN`;
  if (held) warnings.push(`the central ring is held at the roof's crown by a tie-down to the floor (${kN(analysis?.ringUpliftN ?? sized.ringUpliftN)} pull); the tie-down stands in the floor with a clear zone of ${MAST_CLEAR_RADIUS_M} m radius and its anchor is a dead-weight allowance (substructure, not designed)`);
  else if (!analysis && sized.ringUpliftN > 0) warnings.push(`the closed form's valley cables pull the free central ring up by ${kN(sized.ringUpliftN)}, which nothing balances: the closed form's net is in fact held down at its centre (choose a held-down centre to cost the tie-down, or the 3D analysis, which finds the free net's prestress)`);
  if (analysis && analysis.ringLeastUpliftN < 0) warnings.push(`under some combination the net presses the held ring down by ${kN(-analysis.ringLeastUpliftN)}: the tie-down must also take compression there (a strut, or enough prestress)`);
  const lumped = analysis ? lumpingNote(layout, analysis.model) : null;
  if (lumped) warnings.push(lumped);
  if (surface) {
    const capM2 = layout.cap.surfaceM2;
    warnings.push(`the fabric spans from node to node of the form-found net, so its surface is the net's: ${wholeNumber(surface.roofSurfaceM2)} m², ${((surface.roofSurfaceM2 / capM2 - 1) * 100).toFixed(0)} % more than the brief's cap at this rise (${wholeNumber(capM2)} m²), taken off so; the net stands up to ${surface.aboveCapM.most.toFixed(1)} m above the cap (at the mast heads); the wind's pressure maps are the cap's (the net's steeper faces near the mast heads are not mapped) and the permanent load the closed form's (its fabric on the cap's surface)${surface.aboveCapM.least < -0.05 ? `; the net dips up to ${(-surface.aboveCapM.least).toFixed(1)} m below the cap, where the usable floor, taken under the cap, is overstated` : "; the usable floor is taken under the cap, on or below every node of the net (on the safe side)"}`);
  }
  if (analysis && analysis.reason === "" && analysis.governs !== "") warnings.push(`prestress ${kN(analysis.prestressN)} a radial cable: the least the search found that keeps every cable at its required share of prestress and the net within its movement limit under every combination analysed; what sets it: ${analysis.governs}`);
  if (analysis && analysis.screened.length > 0) warnings.push(`not analysed, bounded by the heaviest uniform combination (a lighter uniform map is that one scaled down): ${analysis.screened.join(", ")}`);
  if (analysis?.outwardPull) warnings.push("the net pulls some mast heads outwards under some combination: the backstay there would have to be a stay to the inside (its force is taken the same)");
  if (mast?.fabricated) warnings.push(`masts exceed the hollow-section catalogue: a fabricated ${mast.section} tube is assumed`);
  if (layout.mastRadiusM + layout.backstayRunM < layout.cap.baseRadiusM) warnings.push("backstay anchors fall inside the plan: raise the mast ring ratio or check the floor layout");
  return warnings;
}

/** The layout, the sizing input and the converged closed form of a design (the 3D analysis starts from it). */
function closedNet(brief: Brief, opts: CableNetOptions, catalogue: Catalogue) {
  const fabric = findFabric(catalogue, opts.fabric);
  const layout = cableNetLayout(brief, opts.masts, opts.mastRingRatio, opts.mastHeightRatio, opts.radialCablesPerMast, opts.hangerSpacingM);
  // drawn only when asked for (the design kept, or a failure's reason): the search designs dozens of candidates
  const section = once(() => cableNetSection(layout, brief.eavesHeightM));
  checkSags(layout, section);
  const input = {
    brief, actions: roofActions(brief), combinations: planCombinations(brief), layout, catalogue, fabric,
    residualPrestress: opts.residualPrestress, gammaR: opts.gammaR, yieldPa: opts.steelYieldMPa * 1e6, hangerSpacingM: opts.hangerSpacingM,
    heldCentre: opts.centre === "held-down",
    braced: opts.mastType === "braced", taperedMasts: opts.mastShape === "tapered", anchorUpliftMargin: opts.anchorUpliftMargin, fabricAllowancePct: opts.fabricAllowancePct, fabricSagRatio: opts.fabricSagRatio,
  };
  const converged = convergeSelfWeight<NetSizing>((g) => {
    const value = sizeCableNet(input, g);
    return { value, selfWeightKPa: value.selfWeightKPa };
  }, 0.1, { section });
  return { fabric, layout, section, input, converged };
}

/** The input the design's 3D analysis gets (for benches and profiles that follow the prestress search round by round). */
export function cableNetAnalysisInput(brief: Brief, options: CableNetOptions, catalogue: Catalogue): NetAnalysisInput {
  const { input, converged } = closedNet(brief, options, catalogue);
  return netAnalysisInput(input, converged.value, converged.selfWeightKPa);
}

function design(brief: Brief, opts: CableNetOptions, catalogue: Catalogue): DesignParts {
  const { fabric, layout, section, input, converged } = closedNet(brief, opts, catalogue);
  const analysed = opts.analysis === "3d" ? analysedNet(input, converged.value, converged.selfWeightKPa) : null;
  const sized = analysed?.sized ?? converged.value;
  const analysis = analysed?.analysis;
  const surface = analysed?.surface;
  // the 3D net as form-found, when its analysis found a prestress (drawn in the section and plan)
  const found = analysis && analysis.reason === "" ? analysis.model : null;
  const ring = found ? formFoundRing(found) : undefined; // a mean over the ring's nodes: cheap, so not deferred with the drawing
  const checks = sized.groups.map((g) => check(g.element, g.governing, g.designForceN, g.resistanceN, "N"));
  if (analysis && found) {
    const largest = Math.max(...analysis.summary.loadCases.map((c) => c.maxDisplacementM));
    checks.push(check("largest displacement (3D analysis, design combinations)", `≤ span × ${CABLE_ROOF_DEFLECTION_RATIO} (common practice for cable roofs, no source; ULS loads, an upper bound of the service value)`, largest, brief.spanM * CABLE_ROOF_DEFLECTION_RATIO, "m"));
  }
  checks.push(...fabricPanelChecks(sized.fabricGravityNPerM, sized.fabricUpliftNPerM, fabricAllowableNPerM(fabric, opts.fabricStrengthFactor)));
  return {
    summary: netSummary(layout, sized, analysis),
    members: sized.groups.map(memberOf),
    takeoff: netTakeoff(sized, fabric),
    checks,
    warnings: netWarnings(layout, sized, analysis, surface, opts.centre === "held-down"),
    iterations: converged.iterations,
    floor: netFloor(layout, brief.eavesHeightM, opts.centre === "held-down"),
    regime: `${layout.masts} masts`,
    // the central ring's pull is the same in every combination of the closed form (ridge and valley share the load): the most utilised of the others names the case
    governingLoadCase: sized.groups.filter((g) => g.kind !== "central ring").reduce((w, g) => (g.utilisation > w.utilisation ? g : w)).caseName,
    ...(surface ? { roofSurfaceM2: surface.roofSurfaceM2, enclosedVolumeM3: layout.cap.planAreaM2 * brief.eavesHeightM + surface.enclosedVolumeM3 } : capEnvelope(layout.cap, brief.eavesHeightM)),
    // the 3D net's section: its form-found radial cables, no valley cables (the closed form's are not built)
    // and its central ring where the form finding put it (a free ring finds its own radius and height)
    drawing: drawingWithLazyPlan(found && ring ? () => cableNetSection(layout, brief.eavesHeightM, mastRadialCables(found), ring) : section, () => cableNetPlan(layout, ring?.radiusM)),
    ...(analysis ? { analysis: analysis.summary } : {}),
    reason: analysis?.reason ?? "",
  };
}

/** Clear zone around a mast's foot, radius, m (the mast, its base and its protection; common practice, no source). */
export const MAST_CLEAR_RADIUS_M = 3;

/**
 * The net over the floor: the cap (the closed form's fabric; the 3D net's fabric, on the form-found
 * net, stands on or above it at every node: the warning says where not), and under it any backstay
 * that lands inside the plan; the masts (and a held centre's tie-down) stand on the floor with their
 * clear zones.
 */
function netFloor(layout: CableNetLayout, eavesM: number, held: boolean): FloorEnvelope {
  const a = layout.cap.baseRadiusM;
  const steps = 200;
  const soffit: [number, number][] = [];
  for (let i = 0; i <= steps; i++) {
    const r = (i / steps) * a;
    const roof = eavesM + capHeightAt(layout.cap, r);
    const t = (r - layout.mastRadiusM) / layout.backstayRunM;
    const backstay = t > 0 && t < 1 ? layout.mastLengthM * (1 - t) : Infinity;
    soffit.push([r, Math.min(roof, backstay)]);
  }
  const tieDown = held ? [{ radiusM: 0, clearRadiusM: MAST_CLEAR_RADIUS_M, count: 1 }] : [];
  return { soffit, supports: [{ radiusM: layout.mastRadiusM, clearRadiusM: MAST_CLEAR_RADIUS_M, count: layout.masts }, ...tieDown] };
}

/** Mast-supported cable net: fabric hung from radial cables off mast heads, prestressed against circumferential cables (valley cables in the closed form), masts stayed by backstays. */
export const cableNet = defineScheme(cableNetDeclaration, design);
