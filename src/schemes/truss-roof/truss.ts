import { wholeNumber } from "../../kernel/units";
import type { ChsSection } from "../../catalogue/types";
import type { ChsChoice } from "../../catalogue/pick-chs";
import type { BucklingCurve } from "../../mechanics/flexural-buckling";
import { STEEL_E_PA } from "../../mechanics/flexural-buckling";
import { simplySupportedUdl } from "../../mechanics/beam";
import { chsResistance, tubeBendingModulusM3 } from "../../catalogue/pick-chs";
import { pickChs } from "../kit";

/** What one parallel-chord Warren truss must carry. Loads in N/m along the span. */
export interface TrussDemand {
  spanM: number;
  depthM: number;
  /** ULS gravity line load, N/m. */
  ulsNPerM: number;
  /** ULS net line load with permanent favourable; negative = uplift, N/m. */
  upliftNPerM: number;
  /** SLS variable line load for deflection, N/m. */
  slsNPerM: number;
  /** SLS total characteristic line load (permanent + variable) for deflection, N/m. */
  slsTotalNPerM: number;
  /** Panel length between top chord nodes (a whole number of purlin spacings), m. */
  panelM: number;
  /** Purlin spacing: out-of-plane restraint of the top chord, m. */
  purlinSpacingM: number;
  /** Bottom chord out-of-plane restraint spacing (fly bracing), m. */
  bottomRestraintM: number;
  /** Chord size changes per half span. */
  zones: number;
  /** Added deflection from the web members, fraction of the chord deflection. */
  webAllowance: number;
  /** Deflection limits as span / limit: under the variable load, and under the total characteristic load. */
  deflectionLimit: number;
  deflectionLimitTotal: number;
}

export interface TrussZone {
  /** Zone from x0 to x1 measured from the support, m (one half; the other mirrors it). */
  x0M: number;
  x1M: number;
  top: ChsChoice;
  bottom: ChsChoice;
  diagonal: ChsChoice;
  topForceN: number;
  /** Bending of the top chord between panel nodes from the purlins, N·m. */
  topMomentNm: number;
  bottomForceN: number;
  diagonalForceN: number;
}

export interface TrussResult {
  zones: TrussZone[];
  massKg: number;
  chordMassKg: number;
  diagonalMassKg: number;
  diagonalCount: number;
  diagonalLengthM: number;
  deflectionM: number;
  deflectionLimitM: number;
  /** Midspan deflection under the total characteristic load, m, and its limit. */
  totalDeflectionM: number;
  totalDeflectionLimitM: number;
  /** Support reaction under ULS gravity, N. */
  reactionN: number;
  /** Largest top chord compression, N (negative). */
  topCompressionN: number;
  /** "" or why no catalogue section works. */
  failure: string;
}

/**
 * Deflection at midspan of a simply supported beam of graded stiffness under a uniform load, by
 * virtual work δ = 2∫₀^{L/2} M(x)·m(x)/(E I(x)) dx with m = x/2 (unit load at midspan; elementary
 * structural analysis), Simpson's rule on 40 steps per zone. For uniform EI it equals 5wL⁴/(384EI).
 */
export function gradedBeamDeflectionM(loadNPerM: number, spanM: number, zoneEnds: readonly number[], zoneEI: readonly number[]): number {
  let total = 0;
  let start = 0;
  zoneEnds.forEach((end, z) => {
    const ei = zoneEI[z]!;
    const steps = 40;
    const h = (end - start) / steps;
    const f = (x: number) => ((loadNPerM * x * (spanM - x)) / 2) * (x / 2) / ei;
    let s = f(start) + f(end);
    for (let i = 1; i < steps; i++) s += (i % 2 === 1 ? 4 : 2) * f(start + i * h);
    total += (s * h) / 3;
    start = end;
  });
  return 2 * total;
}

interface TrussGeometry {
  edges: number[];
  topLengthM: number;
  bottomLengthM: number;
  diagonalLengthM: number;
  sinTheta: number;
  localMomentNm: number;
}

/**
 * Per zone: the chord and diagonal forces, and the sections for strength alone (they do not change
 * between the deflection attempts, which only raise the chord areas).
 */
function strengthZones(d: TrussDemand, sections: readonly ChsSection[], steel: { yieldPa: number; curve: BucklingCurve }, g: TrussGeometry) {
  const { edges, topLengthM, bottomLengthM, diagonalLengthM, sinTheta, localMomentNm } = g;
  const L = d.spanM;
  const half = L / 2;
  const moment = (w: number, x: number) => (w * x * (L - x)) / 2;
  const withBendingFor = (chordN: number) => (s: ChsSection) => {
    if (localMomentNm === 0) return true;
    const c = chsResistance(s, { forceN: -chordN, effectiveLengthM: topLengthM, yieldPa: steel.yieldPa, curve: steel.curve });
    // plastic modulus for class 1–2 tubes, elastic for class 3 (EN 1993-1-1 eqs 6.13–6.14): a class 3 chord with W_pl was over-rated by W_pl/W_el ≈ 1.3
    const modulusM3 = tubeBendingModulusM3(s, steel.yieldPa);
    return c !== null && modulusM3 !== null && c.utilisation + localMomentNm / (modulusM3 * steel.yieldPa) <= 1;
  };
  return Array.from({ length: d.zones }, (_, z) => {
    const x0 = edges[z]!;
    const x1 = edges[z + 1]!;
    const chordN = moment(d.ulsNPerM, x1) / d.depthM;
    const chordUpN = moment(Math.min(0, d.upliftNPerM), x1) / d.depthM; // ≤ 0
    const topForces = [
      { forceN: -chordN, effectiveLengthM: topLengthM },
      { forceN: -chordUpN, effectiveLengthM: topLengthM },
    ];
    const bottomForces = [
      { forceN: chordN, effectiveLengthM: bottomLengthM },
      { forceN: chordUpN, effectiveLengthM: bottomLengthM },
    ];
    const withBending = withBendingFor(chordN);
    const shearN = Math.max(d.ulsNPerM, -d.upliftNPerM) * (half - x0);
    const diagonalN = shearN / sinTheta;
    const diagonal = pickChs(
      sections,
      [
        { forceN: -diagonalN, effectiveLengthM: diagonalLengthM },
        { forceN: diagonalN, effectiveLengthM: diagonalLengthM },
      ],
      steel,
    );
    return { x0, x1, chordN, topForces, bottomForces, withBending, diagonalN, diagonal, baseTop: pickChs(sections, topForces, steel, withBending), baseBottom: pickChs(sections, bottomForces, steel) };
  });
}

/**
 * Sizes one parallel-chord Warren truss from the CHS catalogue: chords for M/d per zone, diagonals
 * for V/sin θ (EN 1993-1-1 §6.2.3 tension, §6.3.1 flexural buckling), then chords upsized together
 * until the SLS deflection (chord stiffness I = A_t A_b d²/(A_t + A_b) ≈ A d²/2, plus the web
 * allowance) meets span/limit.
 * Buckling lengths: a tube buckles about any axis, so the top chord takes the larger of the purlin
 * spacing (out of plane) and the panel length (in plane, between nodes); the bottom chord, in
 * compression under uplift, the larger of the panel and the fly-brace spacing. Purlins between the
 * panel nodes bend the top chord: M = wP²/10 (continuous chord, interior panel; from memory), taken
 * with the axial force by the linear interaction N/N_b,Rd + M/M_pl,Rd ≤ 1 (a conservative
 * simplification of EN 1993-1-1 eqs 6.61–6.62 with k = 1).
 */
export function sizeTruss(d: TrussDemand, sections: readonly ChsSection[], steel: { yieldPa: number; curve: BucklingCurve }): TrussResult {
  const L = d.spanM;
  const half = L / 2;
  const beam = simplySupportedUdl(d.ulsNPerM, L, 1);
  const diagonalRunM = d.panelM / 2;
  const diagonalLengthM = Math.hypot(d.depthM, diagonalRunM);
  const topLengthM = Math.max(d.panelM, d.purlinSpacingM);
  const bottomLengthM = Math.max(d.panelM, d.bottomRestraintM);
  const localMomentNm = d.panelM > d.purlinSpacingM * 1.001 ? (Math.max(d.ulsNPerM, -d.upliftNPerM) * d.panelM * d.panelM) / 10 : 0;
  const sinTheta = d.depthM / diagonalLengthM;
  const edges = Array.from({ length: d.zones + 1 }, (_, i) => (half * i) / d.zones);
  const zones: TrussZone[] = [];
  const areaScale = { value: 1 };
  let failure = "";
  let deflectionM = 0;
  let totalDeflectionM = 0;
  const limitM = L / d.deflectionLimit;
  const totalLimitM = L / d.deflectionLimitTotal;
  const zoneBase = strengthZones(d, sections, steel, { edges, topLengthM, bottomLengthM, diagonalLengthM, sinTheta, localMomentNm });
  for (let attempt = 0; attempt < 12; attempt++) {
    zones.length = 0;
    for (const b of zoneBase) {
      const { baseTop, baseBottom, diagonal } = b;
      if (baseTop === null || baseBottom === null) {
        failure = `no catalogue hollow section carries the chord force of ${wholeNumber(b.chordN / 1000)} kN`;
        break;
      }
      // the deflection's floor on the chords' areas, passed as such: the picker starts its search there
      const top = attempt === 0 ? baseTop : pickChs(sections, b.topForces, steel, b.withBending, areaScale.value * baseTop.section.areaM2);
      const bottom = attempt === 0 ? baseBottom : pickChs(sections, b.bottomForces, steel, undefined, areaScale.value * baseBottom.section.areaM2);
      if (top === null || bottom === null || diagonal === null) {
        failure = diagonal === null ? `no catalogue hollow section carries the diagonal force of ${wholeNumber(b.diagonalN / 1000)} kN over ${diagonalLengthM.toFixed(1)} m` : "no catalogue hollow section gives the chords the stiffness the deflection limit needs";
        break;
      }
      zones.push({ x0M: b.x0, x1M: b.x1, top, bottom, diagonal, topForceN: -b.chordN, topMomentNm: localMomentNm, bottomForceN: b.chordN, diagonalForceN: b.diagonalN });
    }
    if (failure !== "") break;
    const ei = zones.map((z) => {
      const at = z.top.section.areaM2;
      const ab = z.bottom.section.areaM2;
      return (STEEL_E_PA * at * ab * d.depthM * d.depthM) / (at + ab);
    });
    deflectionM = gradedBeamDeflectionM(d.slsNPerM, L, edges.slice(1), ei) * (1 + d.webAllowance);
    totalDeflectionM = gradedBeamDeflectionM(d.slsTotalNPerM, L, edges.slice(1), ei) * (1 + d.webAllowance);
    const excess = Math.max(deflectionM / limitM, totalDeflectionM / totalLimitM);
    if (excess <= 1) break;
    areaScale.value *= excess * 1.02;
  }
  let chordMassKg = 0;
  let diagonalMassKg = 0;
  const diagonalsPerZone = (half / d.zones / d.panelM) * 2; // two diagonals per panel
  for (const z of zones) {
    chordMassKg += 2 * (z.x1M - z.x0M) * (z.top.section.massKgPerM + z.bottom.section.massKgPerM);
    diagonalMassKg += 2 * diagonalsPerZone * diagonalLengthM * z.diagonal.section.massKgPerM;
  }
  return {
    zones,
    massKg: chordMassKg + diagonalMassKg,
    chordMassKg,
    diagonalMassKg,
    diagonalCount: Math.round(2 * d.zones * diagonalsPerZone),
    diagonalLengthM,
    deflectionM,
    deflectionLimitM: limitM,
    totalDeflectionM,
    totalDeflectionLimitM: totalLimitM,
    reactionN: beam.shearN,
    topCompressionN: zones.length > 0 ? zones[zones.length - 1]!.topForceN : 0,
    failure:
      failure !== "" ? failure
      : deflectionM > limitM ? `deflection ${(deflectionM * 1000).toFixed(0)} mm exceeds span/${d.deflectionLimit} even with the largest chords`
      : totalDeflectionM > totalLimitM ? `deflection under the total load ${(totalDeflectionM * 1000).toFixed(0)} mm exceeds span/${d.deflectionLimitTotal} even with the largest chords`
      : "",
  };
}
