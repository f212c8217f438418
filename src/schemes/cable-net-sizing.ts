import type { Brief } from "../study/brief";
import type { Catalogue, ChsSection, Fabric } from "../catalogue/types";
import type { RoofActions } from "../loads/roof-actions";
import { designPressures } from "../loads/roof-actions";
import { membraneStripForceNPerM } from "../mechanics/membrane-strip";
import { parabolaLengthM } from "../mechanics/parabolic-cable";
import { ringForceFromPullsN } from "../mechanics/ring-buckling";
import { pickLightestStrand } from "../catalogue/pick-strand";
import { pickLightestChs } from "../catalogue/pick-chs";
import { chsFromDimensions, STEEL_DENSITY_KG_PER_M3 } from "../catalogue/chs";
import { BACKSTAY_SLOPE_RAD, circumferentialSpanM, type CableNetLayout, type NetBay } from "./cable-net-geometry";
import { SizingError } from "./cable-dome-sizing";
import { GRAVITY_M_PER_S2, kPaOfMass } from "../mechanics/gravity";
import { PLAIN_CONCRETE_DENSITY_KG_PER_M3 } from "./compression-ring";

export type NetMemberKind = "suspension" | "valley" | "circumferential" | "edge" | "backstay" | "mast" | "central ring";

export interface NetMemberGroup {
  kind: NetMemberKind;
  name: string;
  count: number;
  lengthM: number;
  designForceN: number;
  designation: string;
  resistanceN: number;
  utilisation: number;
  governing: string;
  massKg: number;
  /** Mast fabricated from plate (not a catalogue section). */
  fabricated?: boolean;
}

export interface NetSizing {
  gravityPa: number;
  upliftPa: number;
  gravityExpression: string;
  groups: NetMemberGroup[];
  /** Prestress as the downward pull of the valley cables on the net, outer and inner bays, N per m of plan span. */
  prestressOuterNPerM: number;
  prestressInnerNPerM: number;
  mastForceN: number;
  backstayForceN: number;
  anchorUpliftN: number;
  anchorConcreteM3: number;
  fabricAreaM2: number;
  fabricMassKg: number;
  fabricGravityNPerM: number;
  fabricUpliftNPerM: number;
  selfWeightKPa: number;
}

export type NetSizingInput = {
  brief: Brief;
  actions: RoofActions;
  layout: CableNetLayout;
  catalogue: Catalogue;
  fabric: Fabric;
  residualPrestress: number;
  gammaR: number;
  yieldPa: number;
  hangerSpacingM: number;
  braced: boolean;
  anchorUpliftMargin: number;
  fabricAllowancePct: number;
  fabricSagRatio: number;
};

/** Sag / span of circumferential and edge cables between radial cables (common practice, no source). */
export const NET_SECONDARY_SAG_RATIO = 0.1;

/** Fabricated tubes for masts beyond the catalogue: D 1.3–4.0 m, D/t = 50 (class 3 at S355, EN 1993-1-1 Table 5.2: D/t ≤ 90ε²). */
const FABRICATED_TUBES: ChsSection[] = Array.from({ length: 28 }, (_, i) => {
  const d = 1.3 + 0.1 * i;
  return chsFromDimensions(d, d / 50, `fabricated tube ${(d * 1000).toFixed(0)}×${(d * 20).toFixed(0)}`);
});

/** Horizontal tension and the upper-end vertical reaction of a parabolic cable on an inclined chord (Irvine 1981 ch. 1). */
function cableEnd(wNPerM: number, bay: NetBay): { H: number; Vup: number; T: number } {
  const H = (wNPerM * bay.spanM * bay.spanM) / (8 * bay.sagM);
  const Vup = (wNPerM * bay.spanM) / 2 + (H * bay.riseM) / bay.spanM;
  return { H, Vup, T: Math.hypot(H, Vup) };
}

/**
 * Sizes a mast-supported cable net for an assumed self-weight (kPa on plan). Each radial
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
  const { brief, actions, layout, catalogue, fabric } = input;
  const permanentKPa = selfWeightKPa + brief.servicesKPa;
  const pressures = designPressures(brief, actions, permanentKPa);
  const cases = [pressures.gravity.valueKPa * 1000, pressures.upliftNetKPa * 1000];
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
  const groups: NetMemberGroup[] = [];
  const strands = (kind: NetMemberKind, name: string, count: number, lengthM: number, forceN: number) => {
    const choice = pickLightestStrand(catalogue.strands, forceN, { gammaR: input.gammaR });
    if (!choice) throw new SizingError(`no strand group in the catalogue carries the ${name} (${(forceN / 1e6).toFixed(1)} MN): add masts or radial cables per mast`);
    groups.push({ kind, name, count, lengthM, designForceN: forceN, designation: choice.designation, resistanceN: choice.resistanceN, utilisation: choice.utilisation, governing: choice.governing, massKg: choice.massKgPerM * lengthM * count });
  };
  const bays = [
    { bay: layout.outer, w: outerW, wp: wpOuter, label: "outer" },
    { bay: layout.inner, w: innerW, wp: wpInner, label: "inner" },
  ];
  const upperV = [0, 0];
  const horizontal = [0, 0];
  let edgeUplift = 0;
  let ringPull = 0;
  for (const { bay, w, wp, label } of bays) {
    const ridge = w.map((wk) => cableEnd(wp + wk / 2, bay));
    const valley = w.map((wk) => cableEnd(wp - wk / 2, bay));
    const length = parabolaLengthM(bay.spanM, bay.sagM) * Math.hypot(1, bay.riseM / bay.spanM);
    strands("suspension", `${label} radial cables`, lines, length, Math.max(...ridge.map((e) => e.T)));
    strands("valley", `${label} valley cables`, lines, length, Math.max(...valley.map((e) => e.T)));
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
      ringPull = Math.max(...ridge.map((e, k) => e.H + (valley[k] as { H: number }).H));
    }
  }
  const a = layout.cap.baseRadiusM;
  const worstP = Math.max(...cases.map(Math.abs));
  for (const [i, r] of layout.hoopRadiiM.entries()) {
    const span = circumferentialSpanM(layout, r);
    const w = worstP * input.hangerSpacingM;
    const H = (w * span) / (8 * NET_SECONDARY_SAG_RATIO);
    strands("circumferential", `circumferential cable ${i + 1}`, 1, 2 * Math.PI * r, Math.hypot(H, (w * span) / 2));
  }
  const fabricSag = input.fabricSagRatio * input.hangerSpacingM;
  const fabricUlsNPerM = membraneStripForceNPerM(worstP, input.hangerSpacingM, fabricSag);
  const edgeSpan = (2 * Math.PI * a) / lines;
  strands("edge", "edge cables", lines, parabolaLengthM(edgeSpan, NET_SECONDARY_SAG_RATIO * edgeSpan), Math.hypot((fabricUlsNPerM * edgeSpan) / (8 * NET_SECONDARY_SAG_RATIO), (fabricUlsNPerM * edgeSpan) / 2));
  const backstayN = Math.max(0, ...horizontal) / Math.cos(BACKSTAY_SLOPE_RAD);
  strands("backstay", "backstays", layout.masts, layout.backstayLengthM, Math.max(backstayN, 1));
  const cableMastN = Math.max(...upperV) + backstayN * Math.sin(BACKSTAY_SLOPE_RAD);
  const effective = input.braced ? layout.mastLengthM / 2 : layout.mastLengthM;
  // The mast's own weight (γ_G,sup, EN 1990 Table A1.2(B)) adds to the cable forces: size, add, resize.
  let mastN = cableMastN;
  let catalogueMast: ReturnType<typeof pickLightestChs> = null;
  let mast: ReturnType<typeof pickLightestChs> = null;
  for (let pass = 0; pass < 6; pass++) {
    const demand = { forceN: -mastN, effectiveLengthM: effective, yieldPa: input.yieldPa };
    catalogueMast = pickLightestChs(catalogue.chs, demand);
    mast = catalogueMast ?? pickLightestChs(FABRICATED_TUBES, { ...demand, curve: "b" });
    if (!mast) break;
    const withWeight = cableMastN + brief.factors.gammaGSup * mast.section.massKgPerM * layout.mastLengthM * GRAVITY_M_PER_S2;
    if (withWeight <= mastN) break;
    mastN = withWeight;
  }
  if (!mast || mastN > mast.resistanceN) throw new SizingError(`no mast section up to a 4 m tube carries ${(mastN / 1e6).toFixed(1)} MN over ${effective.toFixed(0)} m: use braced masts, more masts or shorter masts`);
  groups.push({
    kind: "mast", name: "masts", count: layout.masts, lengthM: layout.mastLengthM, designForceN: -mastN, designation: mast.section.designation, resistanceN: mast.resistanceN,
    utilisation: mastN / mast.resistanceN, governing: mast.governing, massKg: mast.section.massKgPerM * layout.mastLengthM * layout.masts, fabricated: catalogueMast === null,
  });
  const ringN = ringForceFromPullsN(ringPull, lines);
  const ringArea = Math.ceil((ringN / input.yieldPa) * 1e4) / 1e4;
  const ringLength = 2 * Math.PI * layout.centralRingRadiusM;
  groups.push({
    kind: "central ring", name: "central tension ring", count: 1, lengthM: ringLength, designForceN: ringN, designation: `steel ring, ${(ringArea * 1e4).toFixed(0)} cm²`, resistanceN: ringArea * input.yieldPa,
    utilisation: ringN / (ringArea * input.yieldPa), governing: "tension, EN 1993-1-1 §6.2.3", massKg: ringArea * ringLength * STEEL_DENSITY_KG_PER_M3,
  });
  const anchorUpliftN = lines * edgeUplift + layout.masts * backstayN * Math.sin(BACKSTAY_SLOPE_RAD);
  const anchorConcreteM3 = (anchorUpliftN * input.anchorUpliftMargin) / (PLAIN_CONCRETE_DENSITY_KG_PER_M3 * GRAVITY_M_PER_S2);
  const fabricAreaM2 = layout.cap.surfaceM2 * (1 + input.fabricAllowancePct / 100);
  const fabricMassKg = fabricAreaM2 * fabric.massKgPerM2;
  const roofKg = groups.filter((g) => g.kind !== "mast" && g.kind !== "backstay").reduce((s, g) => s + g.massKg, 0) + fabricMassKg;
  return {
    gravityPa: cases[0] as number,
    upliftPa: cases[1] as number,
    gravityExpression: pressures.gravity.expression,
    groups,
    prestressOuterNPerM: wpOuter,
    prestressInnerNPerM: wpInner,
    mastForceN: mastN,
    backstayForceN: backstayN,
    anchorUpliftN,
    anchorConcreteM3,
    fabricAreaM2,
    fabricMassKg,
    fabricGravityNPerM: membraneStripForceNPerM((permanentKPa + actions.leadingVariableKPa) * 1000, input.hangerSpacingM, fabricSag),
    fabricUpliftNPerM: membraneStripForceNPerM(Math.max(0, actions.upliftKPa - permanentKPa) * 1000, input.hangerSpacingM, fabricSag),
    selfWeightKPa: kPaOfMass(roofKg, layout.cap.planAreaM2),
  };
}
