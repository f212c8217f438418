import type { Brief } from "../../brief";
import type { Catalogue, ChsSection, Fabric } from "../../catalogue/types";
import type { RoofActions } from "../../loads/roof-actions";
import { membraneStripForceNPerM } from "../../mechanics/membrane-strip";
import { inclinedParabolicCable, parabolaLengthM, parabolicCable } from "../../mechanics/parabolic-cable";
import { ringForceFromPullsN } from "../../mechanics/ring-buckling";
import { PLAIN_CONCRETE_DENSITY_KG_PER_M3 } from "../../mechanics/concrete";
import { GRAVITY_M_PER_S2, kPaOfMass } from "../../mechanics/gravity";
import { chsFromDimensions, STEEL_DENSITY_KG_PER_M3 } from "../../catalogue/chs";
import { fabricCover, pickChs, pickStrandGroup, SizingError, steelTensionRing, uniformPressurePa, type SizedGroup, type PlanCombination } from "../kit";
import { designLacedMast, MAST_FACE_MAX_M, MAST_SEGMENT_MAX_M } from "./laced-mast";
import { BACKSTAY_SLOPE_RAD, circumferentialSpanM, type CableNetLayout, type NetBay } from "./geometry";

export type NetMemberKind = "suspension" | "valley" | "circumferential" | "edge" | "backstay" | "mast" | "central ring" | "tie-down";

/** A member group of the net; a mast may be fabricated from plate (not a catalogue section). */
/** A member group of the net; `eaN` its axial stiffness (cables and ring), N. */
export type NetMemberGroup = SizedGroup<NetMemberKind, { fabricated?: boolean; caseName: string; eaN?: number; spliceKg?: number; splices?: number }>;

export interface NetSizing {
  /** The design combinations' uniform equivalents, Pa on plan (down positive), in the order of `caseNames`. */
  casesPa: number[];
  caseNames: string[];
  groups: NetMemberGroup[];
  /** Prestress as the downward pull of the valley cables on the net, outer and inner bays, N per m of plan span. */
  prestressOuterNPerM: number;
  prestressInnerNPerM: number;
  mastForceN: number;
  backstayForceN: number;
  anchorUpliftN: number;
  anchorConcreteM3: number;
  /**
   * Largest upward pull of the net on its central ring, N: what a tie-down takes when the centre is
   * held down (option centre), or what a free ring leaves unbalanced in the closed form.
   */
  ringUpliftN: number;
  /** The tie-down's ground anchor (dead weight for its pull × margin; 0 with a free centre), m³. */
  tieDownConcreteM3: number;
  fabricAreaM2: number;
  fabricMassKg: number;
  fabricGravityNPerM: number;
  fabricUpliftNPerM: number;
  selfWeightKPa: number;
}

export type NetSizingInput = {
  brief: Brief;
  actions: RoofActions;
  combinations: readonly PlanCombination[];
  layout: CableNetLayout;
  catalogue: Catalogue;
  fabric: Fabric;
  residualPrestress: number;
  gammaR: number;
  yieldPa: number;
  hangerSpacingM: number;
  braced: boolean;
  /** Laced masts may narrow from mid-height to half their face at the ends (option mastShape). */
  taperedMasts?: boolean;
  anchorUpliftMargin: number;
  fabricAllowancePct: number;
  fabricSagRatio: number;
  /** The central ring held down by a tie-down to the floor (option centre = held-down). */
  heldCentre?: boolean;
};

/** Floor to the central ring, m: the tie-down's length. */
const tieDownLengthM = (input: NetSizingInput) => input.brief.eavesHeightM + input.layout.inner.endHeightM;

/** The tie-down (a strand group to the floor) and its anchor's concrete for a pull, when the centre is held down. */
function tieDown(input: NetSizingInput, pullN: number, caseName: string): { groups: NetMemberGroup[]; concreteM3: number } {
  if (!input.heldCentre) return { groups: [], concreteM3: 0 };
  const group = strandGroup(input, "tie-down", "central tie-down", 1, tieDownLengthM(input), Math.max(pullN, 1), caseName);
  return { groups: [group], concreteM3: (Math.max(pullN, 0) * input.anchorUpliftMargin) / (PLAIN_CONCRETE_DENSITY_KG_PER_M3 * GRAVITY_M_PER_S2) };
}

/** Sag / span of circumferential and edge cables between radial cables (common practice, no source). */
export const NET_SECONDARY_SAG_RATIO = 0.1;

/** Fabricated tubes for masts beyond the catalogue: D 1.3–4.0 m, D/t = 50 (class 3 at S355, EN 1993-1-1 Table 5.2: D/t ≤ 90ε²). */
const FABRICATED_TUBES: ChsSection[] = Array.from({ length: 28 }, (_, i) => {
  const d = 1.3 + 0.1 * i;
  return chsFromDimensions(d, d / 50, `fabricated tube ${(d * 1000).toFixed(0)}×${(d * 20).toFixed(0)}`);
});

/**
 * Horizontal tension, the vertical reaction at the mast head and the tension there of a parabolic
 * cable on its inclined chord (inclinedParabolicCable, Irvine 1981 ch. 1); the mast head is the
 * upper support when the chord rises to it, the lower one otherwise.
 */
function cableEnd(wNPerM: number, bay: NetBay): { H: number; Vup: number; T: number } {
  const cable = inclinedParabolicCable(wNPerM, bay.spanM, bay.sagM, Math.abs(bay.riseM));
  const Vup = bay.riseM >= 0 ? cable.verticalN : cable.lowerVerticalN;
  return { H: cable.horizontalN, Vup, T: Math.hypot(cable.horizontalN, Vup) };
}

/**
 * Sizes a mast-supported cable net for an assumed self-weight (kPa on plan), for every design
 * combination of the study's basis at its conservative uniform equivalent (the peak of a gravity
 * map, the most upward value of an uplift map; the closed form takes only a uniform load). Each radial
 * suspension cable is a parabola on its inclined chord carrying its tributary plan load
 * (H = wL²/(8f), Irvine 1981 ch. 1). Uplift is resisted by prestress against a second, opposite
 * family of valley cables of the same sag: with equal sags and stiffnesses a load is shared equally
 * by the two families (linear theory of the pretensioned cable truss, from memory), so the valley
 * pull w_p on the net must be ≥ |w|/(2(1 − residual)) for both ULS cases. The inner prestress is
 * raised where needed so the inner cables always pull the mast heads at least as hard as the outer
 * ones; the difference goes down a backstay at 45° to a ground anchor. Masts carry the vertical
 * reactions; anchors are concrete dead weights: volume = uplift × margin / (ρ g).
 * @throws SizingError when a member cannot be sized
 */
export function sizeCableNet(input: NetSizingInput, selfWeightKPa: number): NetSizing {
  const { brief, actions, layout, fabric } = input;
  const permanentKPa = selfWeightKPa + brief.servicesKPa;
  const cases = input.combinations.map((c) => uniformPressurePa(c, selfWeightKPa));
  const names = input.combinations.map((c) => c.name);
  const lines = layout.masts * layout.cablesPerSide;
  const groups: NetMemberGroup[] = [];
  const strands = (kind: NetMemberKind, element: string, count: number, lengthM: number, [forceN, k]: Worst) => groups.push(strandGroup(input, kind, element, count, lengthM, forceN, names[k] ?? ""));
  const radial = radialFamilies(input, cases, strands);
  const worstP = worstOf(cases.map(Math.abs));
  for (const [i, r] of layout.hoopRadiiM.entries()) {
    const span = circumferentialSpanM(layout, r);
    strands("circumferential", `circumferential cable ${i + 1}`, 1, 2 * Math.PI * r, [parabolicCable(worstP[0] * input.hangerSpacingM, span, NET_SECONDARY_SAG_RATIO * span).maxTensionN, worstP[1]]);
  }
  const fabricSag = input.fabricSagRatio * input.hangerSpacingM;
  const fabricUlsNPerM = membraneStripForceNPerM(worstP[0], input.hangerSpacingM, fabricSag);
  const edgeCable = edgeCableOf(layout, lines, fabricUlsNPerM);
  strands("edge", "edge cables", lines, edgeCable.lengthM, [edgeCable.maxTensionN, worstP[1]]);
  const horizontal = worstOf(radial.horizontal);
  const backstayN = Math.max(0, horizontal[0]) / Math.cos(BACKSTAY_SLOPE_RAD);
  strands("backstay", "backstays", layout.masts, layout.backstayLengthM, [Math.max(backstayN, 1), horizontal[1]]);
  const mastLoad = worstOf(radial.upperV.map((v, k) => v + (Math.max(0, radial.horizontal[k] as number) / Math.cos(BACKSTAY_SLOPE_RAD)) * Math.sin(BACKSTAY_SLOPE_RAD)));
  const mast = { ...sizeMast(input, mastLoad[0]), caseName: names[mastLoad[1]] ?? "" };
  groups.push(mast);
  const ringN = ringForceFromPullsN(radial.ringPull[0], lines);
  const ringLength = 2 * Math.PI * layout.centralRingRadiusM;
  groups.push({ kind: "central ring", element: "central tension ring", material: "steel-plate", count: 1, lengthM: ringLength, designForceN: ringN, ...tensionRing(ringN, input.yieldPa, ringLength), caseName: names[radial.ringPull[1]] ?? "" });
  const anchorUpliftN = lines * radial.edgeUplift + layout.masts * backstayN * Math.sin(BACKSTAY_SLOPE_RAD);
  const anchorConcreteM3 = (anchorUpliftN * input.anchorUpliftMargin) / (PLAIN_CONCRETE_DENSITY_KG_PER_M3 * GRAVITY_M_PER_S2);
  const ringUpliftN = lines * radial.ringUplift[0];
  const tie = tieDown(input, ringUpliftN, names[radial.ringUplift[1]] ?? "");
  groups.push(...tie.groups);
  const fabricCut = fabricCover(layout.cap.surfaceM2, input.fabricAllowancePct, fabric);
  const roofKg = groups.filter((g) => g.kind !== "mast" && g.kind !== "backstay" && g.kind !== "tie-down").reduce((s, g) => s + g.massKg, 0) + fabricCut.massKg;
  return {
    casesPa: cases,
    caseNames: names,
    groups,
    prestressOuterNPerM: radial.wpOuter,
    prestressInnerNPerM: radial.wpInner,
    mastForceN: -mast.designForceN,
    backstayForceN: backstayN,
    anchorUpliftN,
    anchorConcreteM3,
    ringUpliftN,
    tieDownConcreteM3: tie.concreteM3,
    fabricAreaM2: fabricCut.areaM2,
    fabricMassKg: fabricCut.massKg,
    fabricGravityNPerM: membraneStripForceNPerM((permanentKPa + actions.leadingVariableKPa) * 1000, input.hangerSpacingM, fabricSag),
    fabricUpliftNPerM: membraneStripForceNPerM(Math.max(0, actions.upliftKPa - permanentKPa) * 1000, input.hangerSpacingM, fabricSag),
    selfWeightKPa: kPaOfMass(roofKg, layout.cap.planAreaM2),
  };
}

/** A steel tension ring with its axial stiffness (E = 210 GPa, EN 1993-1-1 §3.2.6). */
function tensionRing(forceN: number, yieldPa: number, lengthM: number) {
  const ring = steelTensionRing(forceN, yieldPa, lengthM);
  return { ...ring, eaN: 2.1e11 * Math.max(ring.areaM2, 1e-4) };
}

/** A group of strands for a force, from the catalogue. @throws SizingError when none carries it */
function strandGroup(input: NetSizingInput, kind: NetMemberKind, element: string, count: number, lengthM: number, forceN: number, caseName: string): NetMemberGroup {
  const choice = pickStrandGroup(input.catalogue.strands, forceN, input.gammaR, `no strand group in the catalogue carries the ${element} (${(forceN / 1e6).toFixed(1)} MN): add masts or radial cables per mast`);
  return { kind, element, material: "steel-strand", count, lengthM, section: choice.designation, designForceN: forceN, resistanceN: choice.resistanceN, utilisation: choice.utilisation, governing: choice.governing, massKg: choice.massKgPerM * lengthM * count, caseName, eaN: choice.count * choice.strand.metallicAreaM2 * choice.strand.modulusPa };
}

/** A largest value and the index of the combination giving it. */
type Worst = [number, number];
/** An edge cable between neighbouring anchors, sagging NET_SECONDARY_SAG_RATIO of its span under the fabric's pull (N/m). */
function edgeCableOf(layout: CableNetLayout, lines: number, fabricPullNPerM: number) {
  const spanM = (2 * Math.PI * layout.cap.baseRadiusM) / lines;
  return parabolicCable(fabricPullNPerM, spanM, NET_SECONDARY_SAG_RATIO * spanM);
}

const worstOf = (values: readonly number[]): Worst => values.reduce<Worst>((w, v, k) => (v > w[0] ? [v, k] : w), [-Infinity, 0]);

/**
 * The radial suspension and valley cables of both bays (sized through `strands`), with the valley
 * pull that prestresses the net, and what they bring to the mast heads (vertical, and the horizontal
 * difference the backstay takes), to the edge anchors (uplift) and to the central ring (pull).
 */
function radialFamilies(input: NetSizingInput, cases: readonly number[], strands: (kind: NetMemberKind, element: string, count: number, lengthM: number, worst: Worst) => void) {
  const { layout } = input;
  const lines = layout.masts * layout.cablesPerSide;
  const m = input.residualPrestress;
  const perLine = (bay: NetBay, p: number) => (p * bay.areaM2) / lines / bay.spanM; // N per m of plan span
  const outerW = cases.map((p) => perLine(layout.outer, p));
  const innerW = cases.map((p) => perLine(layout.inner, p));
  const wpOuter = Math.max(...outerW.map(Math.abs)) / (2 * (1 - m));
  let wpInner = Math.max(...innerW.map(Math.abs)) / (2 * (1 - m));
  const outerH = outerW.map((w) => cableEnd(wpOuter + w / 2, layout.outer).H);
  outerW.forEach((_, k) => {
    // inner pull ≥ outer pull at the mast head: w_A,in ≥ H_out 8 f_in / L_in²
    const need = ((outerH[k] as number) * 8 * layout.inner.sagM) / layout.inner.spanM ** 2 - (innerW[k] as number) / 2;
    wpInner = Math.max(wpInner, need);
  });
  const upperV = cases.map(() => 0);
  const horizontal = cases.map(() => 0);
  let edgeUplift = 0;
  let ringPull: Worst = [0, 0];
  let ringUplift: Worst = [0, 0];
  for (const { bay, w, wp, label } of [
    { bay: layout.outer, w: outerW, wp: wpOuter, label: "outer" },
    { bay: layout.inner, w: innerW, wp: wpInner, label: "inner" },
  ]) {
    const ridge = w.map((wk) => cableEnd(wp + wk / 2, bay));
    const valley = w.map((wk) => cableEnd(wp - wk / 2, bay));
    const length = parabolaLengthM(bay.spanM, bay.sagM) * Math.hypot(1, bay.riseM / bay.spanM);
    strands("suspension", `${label} radial cables`, lines, length, worstOf(ridge.map((e) => e.T)));
    strands("valley", `${label} valley cables`, lines, length, worstOf(valley.map((e) => e.T)));
    ridge.forEach((e, k) => {
      upperV[k] = (upperV[k] as number) + layout.cablesPerSide * e.Vup;
      horizontal[k] = (horizontal[k] as number) + (label === "inner" ? 1 : -1) * layout.cablesPerSide * e.H;
    });
    if (label === "outer") {
      ridge.forEach((e, k) => {
        const v = valley[k] as { H: number };
        const up = (e.H * (bay.riseM - 4 * bay.sagM)) / bay.spanM + (v.H * (bay.riseM + 4 * bay.sagM)) / bay.spanM;
        edgeUplift = Math.max(edgeUplift, up);
      });
    } else {
      ringPull = worstOf(ridge.map((e, k) => e.H + (valley[k] as { H: number }).H));
      // the ring is the inner cables' lower end: their vertical pull on it, as on the edge anchors
      ringUplift = worstOf(ridge.map((e, k) => (e.H * (bay.riseM - 4 * bay.sagM)) / bay.spanM + ((valley[k] as { H: number }).H * (bay.riseM + 4 * bay.sagM)) / bay.spanM));
    }
  }
  return { wpOuter, wpInner, upperV, horizontal, edgeUplift, ringPull, ringUplift };
}

/**
 * The masts: the lightest of a CHS from the catalogue, a fabricated tube and a laced built-up
 * column of catalogue tubes (laced-mast.ts, EN 1993-1-1 §6.4), for the cable forces plus the
 * mast's own weight (γ_G,sup, EN 1990 Table A1.2(B)): size, add the weight, resize.
 * @throws SizingError when none of them carries it
 */
function sizeMast(input: NetSizingInput, cableMastN: number): Omit<NetMemberGroup, "caseName"> {
  const { layout, brief } = input;
  const effective = input.braced ? layout.mastLengthM / 2 : layout.mastLengthM;
  // segments no longer than road transport takes, spliced on site: the splices' weight is the mast's too
  const splices = Math.ceil(layout.mastLengthM / MAST_SEGMENT_MAX_M - 1e-9) - 1;
  const kgOf = (c: MastChoice) => c.massKgPerM * layout.mastLengthM + splices * c.spliceKgPerJoint;
  const withWeight = (c: MastChoice) => cableMastN + brief.factors.gammaGSup * kgOf(c) * GRAVITY_M_PER_S2;
  const tube = selfWeighing(cableMastN, withWeight, (mastN) => singleTube(input, mastN, effective));
  // A laced mast weighs at least its chords' N/f_y of steel a metre: where the tube is lighter than that, it wins.
  const lacedFloorKgPerM = (cableMastN / input.yieldPa) * STEEL_DENSITY_KG_PER_M3;
  const laced = tube && tube.choice.massKgPerM <= lacedFloorKgPerM ? null : selfWeighing(cableMastN, withWeight, (mastN) => {
    const m = designLacedMast(input.catalogue.chs, mastN, effective, input.yieldPa, tube ? 1.5 * tube.choice.massKgPerM : Infinity, { tapered: input.taperedMasts === true, mastLengthM: layout.mastLengthM });
    // the four chords are spliced; the diagonals end at the joint
    return m && { massKgPerM: m.massKgPerM, spliceKgPerJoint: 4 * m.chord.massKgPerM * MAST_SPLICE_TUBE_LENGTH_M, resistanceN: mastN / m.utilisation, governing: "laced built-up column, EN 1993-1-1 §6.4", designation: m.designation, fabricated: false };
  });
  const mast = tube && (!laced || kgOf(tube.choice) <= kgOf(laced.choice)) ? tube : laced;
  if (!mast) throw new SizingError(`no mast (a tube up to 4 m or a laced column up to ${MAST_FACE_MAX_M} m square) carries ${(cableMastN / 1e6).toFixed(1)} MN over ${effective.toFixed(0)} m: use braced masts, more masts or shorter masts`);
  const { choice, mastN } = mast;
  return {
    kind: "mast", element: "masts", material: choice.fabricated ? "steel-plate" : "steel-hot-finished-hollow", count: layout.masts, lengthM: layout.mastLengthM, section: choice.designation, designForceN: -mastN,
    resistanceN: choice.resistanceN, utilisation: mastN / choice.resistanceN, governing: choice.governing, massKg: choice.massKgPerM * layout.mastLengthM * layout.masts, fabricated: choice.fabricated,
    splices: splices * layout.masts, spliceKg: splices * layout.masts * choice.spliceKgPerJoint,
  };
}

/**
 * A site splice of a tube (two bolted flanges with stiffeners, and the bolts) weighs about as much as
 * this length of the tube it joins (common practice, no source): an allowance, not a design.
 */
export const MAST_SPLICE_TUBE_LENGTH_M = 1;

interface MastChoice {
  massKgPerM: number;
  /** Mass of the splices at one joint of the mast (every tube crossing it), kg. */
  spliceKgPerJoint: number;
  resistanceN: number;
  governing: string;
  designation: string;
  fabricated: boolean;
}

/** Sizes for the cable force, adds the mast's weight and resizes until it carries both (or null). */
function selfWeighing(cableMastN: number, withWeight: (choice: MastChoice) => number, size: (mastN: number) => MastChoice | null): { choice: MastChoice; mastN: number } | null {
  let mastN = cableMastN;
  for (let pass = 0; pass < 6; pass++) {
    const choice = size(mastN);
    if (!choice) return null;
    const next = withWeight(choice);
    if (next <= mastN) return choice.resistanceN >= mastN ? { choice, mastN } : null;
    mastN = next;
  }
  const choice = size(mastN);
  return choice && choice.resistanceN >= mastN ? { choice, mastN } : null;
}

/** A single tube: the lighter of the catalogue's CHS and a fabricated tube (the catalogue's large sizes step coarsely). */
function singleTube(input: NetSizingInput, mastN: number, effectiveM: number): MastChoice | null {
  const demand = [{ forceN: -mastN, effectiveLengthM: effectiveM }];
  const fromCatalogue = pickChs(input.catalogue.chs, demand, { yieldPa: input.yieldPa, curve: "a" });
  const fabricatedTube = pickChs(FABRICATED_TUBES, demand, { yieldPa: input.yieldPa, curve: "b" });
  const catalogueMast = fromCatalogue && (!fabricatedTube || fromCatalogue.section.massKgPerM <= fabricatedTube.section.massKgPerM) ? fromCatalogue : null;
  const mast = catalogueMast ?? fabricatedTube;
  return mast && { massKgPerM: mast.section.massKgPerM, spliceKgPerJoint: mast.section.massKgPerM * MAST_SPLICE_TUBE_LENGTH_M, resistanceN: mast.resistanceN, governing: mast.governing, designation: mast.section.designation, fabricated: catalogueMast === null };
}

/** The net's forces from the 3D analysis, for sizing (see analysis.ts). */
export interface NetAnalysedForces {
  outerN: number;
  innerN: number;
  /** Each circumferential cable's largest force, N. */
  hoopN: readonly number[];
  ringN: number;
  /** The combination giving each: keys "outer radial", "inner radial", "central ring", "circumferential i". */
  caseOf: Readonly<Record<string, string>>;
  /** The fabric's surface on the form-found net (it spans from node to node of the net), m². */
  fabricSurfaceM2: number;
  /** The longest span of the fabric between circumferential cables along the form-found net (a radial segment's slope × the widest plan gap it spans), m. */
  fabricPanelSpanM: number;
  /** Length of one outer and one inner radial cable as found, m. */
  outerLengthM: number;
  innerLengthM: number;
  /** Plan radius of the central ring as found (a free ring finds its own), m. */
  ringRadiusM: number;
  mastForceN: number;
  mastCase: string;
  backstayHorizontalN: number;
  anchorUpliftN: number;
  /** Largest upward pull of the net on the held central ring (the tie-down's force), N, and its combination. */
  ringUpliftN: number;
  ringUpliftCase: string;
}

/**
 * The net re-sized from the 3D analysis: radial cables, circumferential cables (the larger of the
 * analysed force and the closed form's local sag between radial cables under the fabric), the
 * central ring, masts, backstays and anchors from the analysed forces and reactions. The
 * form-found net's own two families carry and hold it (inside the mast ring its level circumferential
 * cables carry the roof and its arched radial cables hold it down: 160 m demo study, measured), so the closed form's
 * idealised valley cables are not added. The fabric covers the form-found net's surface (it spans
 * from node to node of the net, not over the brief's cap), and its panels and the edge cables are
 * checked under uplift for the longest span between circumferential cables along the net's slope
 * (the closed form: their plan spacing; under gravity that stays the safe side, see below).
 * @throws SizingError when a member cannot be sized
 */
export function sizeNetFromAnalysis(input: NetSizingInput, closed: NetSizing, f: NetAnalysedForces): NetSizing {
  const { layout } = input;
  const lines = layout.masts * layout.cablesPerSide;
  const groups: NetMemberGroup[] = [];
  const strands = (kind: NetMemberKind, element: string, count: number, lengthM: number, forceN: number, caseName: string) => groups.push(strandGroup(input, kind, element, count, lengthM, forceN, caseName));
  strands("suspension", "outer radial cables", lines, f.outerLengthM, f.outerN, f.caseOf["outer radial"] ?? "");
  strands("suspension", "inner radial cables", lines, f.innerLengthM, f.innerN, f.caseOf["inner radial"] ?? "");
  layout.hoopRadiiM.forEach((r, i) => {
    const element = `circumferential cable ${i + 1}`;
    const local = closed.groups.find((g) => g.element === element);
    const analysed = f.hoopN[i] ?? 0;
    const governs = local !== undefined && local.designForceN > analysed;
    strands("circumferential", element, 1, 2 * Math.PI * r, governs ? local.designForceN : analysed, governs ? local.caseName : (f.caseOf[`circumferential ${i + 1}`] ?? ""));
  });
  // The fabric spans from circumferential cable to circumferential cable along the net's slope, not
  // across their plan spacing. Uplift (wind, normal to the fabric) acts on that span; gravity (per m²
  // of plan) keeps the plan spacing's value: on a strip sloping at θ its normal part p cos²θ over the
  // span s/cos θ gives n = p s cos θ/(8 r), less than p s/(8 r) on the plan spacing s (f = r × span).
  const panelM = Math.max(f.fabricPanelSpanM, input.hangerSpacingM);
  const gravity = worstOf(closed.casesPa);
  const uplift = worstOf(closed.casesPa.map((p) => -p));
  const strip = (p: number, spanM: number) => (p > 0 ? membraneStripForceNPerM(p, spanM, input.fabricSagRatio * spanM) : 0);
  const edgeLoads: Worst[] = [[strip(gravity[0], input.hangerSpacingM), gravity[1]], [strip(uplift[0], panelM), uplift[1]]];
  const edgeLoad = edgeLoads[0]![0] >= edgeLoads[1]![0] ? edgeLoads[0]! : edgeLoads[1]!;
  const edgeCable = edgeCableOf(layout, lines, edgeLoad[0]);
  strands("edge", "edge cables", lines, edgeCable.lengthM, edgeCable.maxTensionN, closed.caseNames[edgeLoad[1]] ?? "");
  const backstayN = f.backstayHorizontalN / Math.cos(BACKSTAY_SLOPE_RAD);
  strands("backstay", "backstays", layout.masts, layout.backstayLengthM, Math.max(backstayN, 1), f.mastCase);
  groups.push({ ...sizeMast(input, f.mastForceN), caseName: f.mastCase });
  const ringLength = 2 * Math.PI * f.ringRadiusM;
  groups.push({ kind: "central ring", element: "central tension ring", material: "steel-plate", count: 1, lengthM: ringLength, designForceN: f.ringN, ...tensionRing(f.ringN, input.yieldPa, ringLength), caseName: f.caseOf["central ring"] ?? "" });
  const anchorUpliftN = f.anchorUpliftN + layout.masts * backstayN * Math.sin(BACKSTAY_SLOPE_RAD);
  const tie = tieDown(input, f.ringUpliftN, f.ringUpliftCase);
  groups.push(...tie.groups);
  const fabricCut = fabricCover(f.fabricSurfaceM2, input.fabricAllowancePct, input.fabric);
  const roofKg = groups.filter((g) => g.kind !== "mast" && g.kind !== "backstay" && g.kind !== "tie-down").reduce((s, g) => s + g.massKg, 0) + fabricCut.massKg;
  return {
    ...closed,
    groups,
    fabricAreaM2: fabricCut.areaM2,
    fabricMassKg: fabricCut.massKg,
    // n = p s²/(8 f) with f = ratio × s: linear in the span
    fabricUpliftNPerM: (closed.fabricUpliftNPerM * panelM) / input.hangerSpacingM,
    ringUpliftN: f.ringUpliftN,
    tieDownConcreteM3: tie.concreteM3,
    mastForceN: f.mastForceN,
    backstayForceN: backstayN,
    anchorUpliftN,
    anchorConcreteM3: (anchorUpliftN * input.anchorUpliftMargin) / (PLAIN_CONCRETE_DENSITY_KG_PER_M3 * GRAVITY_M_PER_S2),
    selfWeightKPa: kPaOfMass(roofKg, layout.cap.planAreaM2),
  };
}
