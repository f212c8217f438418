/**
 * Masts as laced built-up columns (issue 13 item 6): four CHS chords at the corners of a square,
 * laced on every face with CHS diagonals alternating at 45° (W lacing, no posts), uniform over the
 * height or narrowing from mid-height to the ends (taperedLacedColumnForces), checked by EN 1993-1-1 §6.4 (src/mechanics/built-up-column.ts): the chord at mid-height
 * for N_ch,Ed over its panel length (§6.4.2.1: buckling length a), a diagonal for its share of
 * V_Ed over its own length (the system length: conservative). The lightest square wins.
 */
import type { ChsSection } from "../../catalogue/types";
import { chsResistance } from "../../catalogue/pick-chs";
import { lacedColumnForces, lacingShearStiffnessN, taperedCriticalForcePerAreaN, taperedLacedColumnForces, type LacedColumnForces } from "../../mechanics/built-up-column";
import { STEEL_E_PA } from "../../mechanics/flexural-buckling";

/** Longest mast segment shipped by road, m (common practice, no source). */
export const MAST_SEGMENT_MAX_M = 12;
/** Widest face between chord centres, m, so a segment travels without a wide-load permit (common practice, no source). */
export const MAST_FACE_MAX_M = 2.5;
/** Face widths tried, m (0.5 m up to MAST_FACE_MAX_M in 0.25 m steps). */
const FACES_M = Array.from({ length: Math.round((MAST_FACE_MAX_M - 0.5) / 0.25) + 1 }, (_, k) => 0.5 + 0.25 * k);

/**
 * End face ÷ mid-height face of a tapered mast (issue 13 item 6: "larger at mid-height"): a mast
 * narrows linearly from mid-height to each end. 0.5 is our choice (common practice, no source);
 * the end face never goes below the narrowest face tried.
 */
export const MAST_TAPER_END_RATIO = 0.5;

export interface LacedMast {
  chord: ChsSection;
  diagonal: ChsSection;
  /** Face at mid-height, m (the whole height when not tapered). */
  faceM: number;
  /** Face at each end, m (= faceM when not tapered). */
  endFaceM: number;
  panelM: number;
  segments: number;
  massKgPerM: number;
  forces: LacedColumnForces;
  /** Resistances (N) and the larger utilisation of chord and diagonal. */
  chordResistanceN: number;
  diagonalResistanceN: number;
  utilisation: number;
  designation: string;
}

/** The checked forces of one chord and diagonal pair: the chord's and the diagonal's worst force and the diagonal's buckling length. */
interface PairForces {
  forces: LacedColumnForces;
  chordForceN: number;
  diagonals: { forceN: number; lengthM: number }[];
  /** Mean diagonal length along the mast, m (for its mass). */
  meanDiagonalM: number;
}

/** Forces in a uniform mast (eqs. 6.69–6.73 at mid-height) or a tapered one (at stations along it). */
function pairForces(axialN: number, lengthM: number, faceM: number, endFaceM: number, panelM: number, chord: ChsSection, diagonal: ChsSection, criticalPerAreaN: number): PairForces | null {
  const input = { lengthM, axialN, chordSpacingM: faceM, chordAreaM2: chord.areaM2, chordsPerSide: 2 as const, lacing: { kind: "W" as const, planes: 2, panelM, diagonalAreaM2: diagonal.areaM2 } };
  const forces = lacedColumnForces(input);
  if (endFaceM >= faceM) {
    if (!Number.isFinite(forces.momentNm)) return null;
    return { forces, chordForceN: forces.chordForceN, diagonals: [{ forceN: forces.diagonalForceN, lengthM: forces.diagonalLengthM }], meanDiagonalM: forces.diagonalLengthM };
  }
  const tapered = taperedLacedColumnForces({ ...input, endChordSpacingM: endFaceM, criticalForceN: criticalPerAreaN * chord.areaM2 });
  if (!Number.isFinite(tapered.momentNm)) return null;
  const stations = tapered.stations;
  return {
    forces: { ...forces, criticalForceN: tapered.criticalForceN, shearStiffnessN: tapered.shearStiffnessN, momentNm: tapered.momentNm, shearN: tapered.shearN },
    chordForceN: Math.max(...stations.map((s) => s.chordForceN)),
    diagonals: stations.map((s) => ({ forceN: s.diagonalForceN, lengthM: s.diagonalLengthM })),
    meanDiagonalM: stations.reduce((sum, s) => sum + s.diagonalLengthM, 0) / stations.length,
  };
}

/** Margin on eq. 6.70's denominator below which a pair is surely unstable (far above the rounding of the quick estimate). */
const SURELY_UNSTABLE = -1e-9;

/**
 * A quick test of eq. 6.70's denominator 1 − N/N_cr − N/S_v, with S_v ∝ A_d (Fig. 6.9 at a given
 * spacing and panel): a search over chords and diagonals skips the pairs it shows to be surely
 * unstable (no finite M_Ed; pairForces gives null for them) without building their forces. Nine in
 * ten pairs tried at 160 m were of that kind. Pairs near the limit go through the full check.
 */
function stabilityTest(axialN: number, lengthM: number, faceM: number, endFaceM: number, panelM: number, criticalPerAreaN: number) {
  const lacing = { kind: "W" as const, planes: 2, panelM, diagonalAreaM2: 1 };
  const shearPerAreaN = Math.min(lacingShearStiffnessN({ chordSpacingM: faceM, lacing }), lacingShearStiffnessN({ chordSpacingM: endFaceM, lacing }));
  // N_cr per m² of one chord: uniform, π²·E·(0.5·h0²·2·A_ch)/L² (eqs. 6.70, 6.72); tapered, as computed for the member
  const perAreaN = endFaceM < faceM ? criticalPerAreaN : (Math.PI ** 2 * STEEL_E_PA * faceM * faceM) / (lengthM * lengthM);
  return {
    /** What is left of the denominator once the chord has taken its share, N/N_cr. */
    chordLeft: (chord: ChsSection) => 1 - axialN / (perAreaN * chord.areaM2),
    surelyUnstable: (left: number, diagonal: ChsSection) => left - axialN / (shearPerAreaN * diagonal.areaM2) < SURELY_UNSTABLE,
  };
}

/** The worst diagonal utilisation over its stations (each buckling over its own length), or null when one fails. */
function diagonalCheck(diagonal: ChsSection, pairs: readonly { forceN: number; lengthM: number }[], yieldPa: number): { utilisation: number; resistanceN: number } | null {
  let worst = { utilisation: 0, resistanceN: Infinity };
  for (const p of pairs) {
    if (p.forceN <= 0) continue;
    const d = chsResistance(diagonal, { forceN: -p.forceN, effectiveLengthM: p.lengthM, yieldPa, curve: "a" });
    if (!d || d.utilisation > 1) return null;
    if (d.utilisation > worst.utilisation) worst = { utilisation: d.utilisation, resistanceN: d.resistanceN };
  }
  return worst;
}

/**
 * The lightest laced mast of one face width (at mid-height; `endFaceM` at each end) whose mass per
 * metre is below `belowKgPerM`, or null. A chord carries at least N/4 + N·e0/(2·h0) (eq. 6.69 with
 * the first-order moment alone), so a chord whose A·f_y is less is skipped without the full check;
 * chords come lightest first, so the search stops at the first chord whose four alone weigh as much
 * as the best mast so far.
 */
function lacedMastAt(sections: readonly ChsSection[], axialN: number, lengthM: number, yieldPa: number, faceM: number, endFaceM: number, belowKgPerM: number, mastLengthM = lengthM): LacedMast | null {
  const panels = Math.max(1, Math.ceil(lengthM / (2 * faceM)));
  const panelM = lengthM / panels;
  const leastChordN = axialN / 4 + (axialN * lengthM) / 500 / (2 * faceM);
  // N_cr of the tapered member per m² of chord (four chords, two a side)
  const criticalPerAreaN = endFaceM < faceM ? taperedCriticalForcePerAreaN(lengthM, faceM, endFaceM, 2) : NaN;
  const stability = stabilityTest(axialN, lengthM, faceM, endFaceM, panelM, criticalPerAreaN);
  for (const chord of sections) {
    if (4 * chord.massKgPerM >= belowKgPerM) return null;
    if (chord.areaM2 * yieldPa < leastChordN) continue;
    const c = chsResistance(chord, { forceN: -leastChordN, effectiveLengthM: panelM, yieldPa, curve: "a" });
    if (!c || c.utilisation > 1) continue;
    const left = stability.chordLeft(chord);
    if (left < SURELY_UNSTABLE) continue; // no lacing can hold this chord
    for (const diagonal of sections) {
      if (stability.surelyUnstable(left, diagonal)) continue;
      const pair = pairForces(axialN, lengthM, faceM, endFaceM, panelM, chord, diagonal, criticalPerAreaN);
      if (!pair) continue;
      const chordUtilisation = pair.chordForceN / c.resistanceN;
      if (chordUtilisation > 1) break; // a stiffer lacing would help only through S_v: try a heavier chord
      const d = diagonalCheck(diagonal, pair.diagonals, yieldPa);
      if (!d) continue;
      const massKgPerM = 4 * chord.massKgPerM + (4 * 2 * pair.meanDiagonalM * diagonal.massKgPerM) / panelM;
      if (massKgPerM >= belowKgPerM) return null;
      const segments = Math.ceil(mastLengthM / MAST_SEGMENT_MAX_M - 1e-9);
      const shape = endFaceM < faceM ? `${faceM.toFixed(2)} m square at mid-height, ${endFaceM.toFixed(2)} m at the ends` : `${faceM.toFixed(2)} m square`;
      return {
        chord, diagonal, faceM, endFaceM, panelM, segments, massKgPerM, forces: pair.forces,
        chordResistanceN: c.resistanceN, diagonalResistanceN: d.resistanceN, utilisation: Math.max(chordUtilisation, d.utilisation),
        designation: `laced mast ${shape}: 4 × ${chord.designation} chords, ${diagonal.designation} diagonals at ${panelM.toFixed(2)} m, ${segments} segment${segments === 1 ? "" : "s"} ≤ ${MAST_SEGMENT_MAX_M} m`,
      };
    }
  }
  return null;
}

/**
 * The lightest laced mast (sections sorted by mass) for a pin-ended compression N over L lighter
 * than `belowKgPerM` (default: any), or null. With `tapered`, masts narrowing to
 * MAST_TAPER_END_RATIO of their mid-height face at the ends are tried after the uniform ones.
 * `mastLengthM`: the whole mast, when L is a part of it (braced at mid-height), for its segments.
 */
export function designLacedMast(sections: readonly ChsSection[], axialN: number, lengthM: number, yieldPa: number, belowKgPerM = Infinity, options: { tapered?: boolean; mastLengthM?: number } = {}): LacedMast | null {
  let best: LacedMast | null = null;
  for (const faceM of FACES_M) {
    const m = lacedMastAt(sections, axialN, lengthM, yieldPa, faceM, faceM, best?.massKgPerM ?? belowKgPerM, options.mastLengthM);
    if (m) best = m;
  }
  if (!options.tapered || !best) return best;
  // A taper pays where a wider middle cuts the second-order moment: tried at the best uniform face
  // and the three wider ones (the checks at eleven stations make a tapered candidate dearer to try).
  const from = best.faceM;
  for (const faceM of FACES_M.filter((f) => f >= from - 1e-9 && f <= from + 0.75 + 1e-9)) {
    const m = lacedMastAt(sections, axialN, lengthM, yieldPa, faceM, Math.max(FACES_M[0] ?? 0.5, faceM * MAST_TAPER_END_RATIO), best.massKgPerM, options.mastLengthM);
    if (m) best = m;
  }
  return best;
}
