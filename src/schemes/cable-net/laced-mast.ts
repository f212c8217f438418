/**
 * Masts as laced built-up columns (issue 13 item 6): four CHS chords at the corners of a square,
 * laced on every face with CHS diagonals alternating at 45° (W lacing, no posts), uniform over the
 * height, checked by EN 1993-1-1 §6.4 (src/mechanics/built-up-column.ts): the chord at mid-height
 * for N_ch,Ed over its panel length (§6.4.2.1: buckling length a), a diagonal for its share of
 * V_Ed over its own length (the system length: conservative). The lightest square wins.
 */
import type { ChsSection } from "../../catalogue/types";
import { chsResistance } from "../../catalogue/pick-chs";
import { lacedColumnForces, type LacedColumnForces } from "../../mechanics/built-up-column";

/** Longest mast segment shipped by road, m (common practice, no source). */
export const MAST_SEGMENT_MAX_M = 12;
/** Widest face between chord centres, m, so a segment travels without a wide-load permit (common practice, no source). */
export const MAST_FACE_MAX_M = 2.5;
/** Face widths tried, m (0.5 m up to MAST_FACE_MAX_M in 0.25 m steps). */
const FACES_M = Array.from({ length: Math.round((MAST_FACE_MAX_M - 0.5) / 0.25) + 1 }, (_, k) => 0.5 + 0.25 * k);

export interface LacedMast {
  chord: ChsSection;
  diagonal: ChsSection;
  faceM: number;
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

/**
 * The lightest laced mast of one face width whose mass per metre is below `belowKgPerM`, or null.
 * A chord carries at least N/4 + N·e0/(2·h0) (eq. 6.69 with the first-order moment alone), so a
 * chord whose A·f_y is less is skipped without the full check; chords come lightest first, so the
 * search stops at the first chord whose four alone weigh as much as the best mast so far.
 */
function lacedMastAt(sections: readonly ChsSection[], axialN: number, lengthM: number, yieldPa: number, faceM: number, belowKgPerM: number): LacedMast | null {
  const panels = Math.max(1, Math.ceil(lengthM / (2 * faceM)));
  const panelM = lengthM / panels;
  const leastChordN = axialN / 4 + (axialN * lengthM) / 500 / (2 * faceM);
  for (const chord of sections) {
    if (4 * chord.massKgPerM >= belowKgPerM) return null;
    if (chord.areaM2 * yieldPa < leastChordN) continue;
    const c = chsResistance(chord, { forceN: -leastChordN, effectiveLengthM: panelM, yieldPa, curve: "a" });
    if (!c || c.utilisation > 1) continue;
    for (const diagonal of sections) {
      const forces = lacedColumnForces({ lengthM, axialN, chordSpacingM: faceM, chordAreaM2: chord.areaM2, chordsPerSide: 2, lacing: { kind: "W", planes: 2, panelM, diagonalAreaM2: diagonal.areaM2 } });
      if (!Number.isFinite(forces.momentNm)) continue;
      const chordUtilisation = forces.chordForceN / c.resistanceN;
      if (chordUtilisation > 1) break; // a stiffer lacing would help only through S_v: try a heavier chord
      const d = chsResistance(diagonal, { forceN: -forces.diagonalForceN, effectiveLengthM: forces.diagonalLengthM, yieldPa, curve: "a" });
      if (!d || d.utilisation > 1) continue;
      const massKgPerM = 4 * chord.massKgPerM + (4 * 2 * forces.diagonalLengthM * diagonal.massKgPerM) / panelM;
      if (massKgPerM >= belowKgPerM) return null;
      const segments = Math.ceil(lengthM / MAST_SEGMENT_MAX_M - 1e-9);
      return {
        chord, diagonal, faceM, panelM, segments, massKgPerM, forces,
        chordResistanceN: c.resistanceN, diagonalResistanceN: d.resistanceN, utilisation: Math.max(chordUtilisation, d.utilisation),
        designation: `laced mast ${faceM.toFixed(2)} m square: 4 × ${chord.designation} chords, ${diagonal.designation} diagonals at ${panelM.toFixed(2)} m, ${segments} segment${segments === 1 ? "" : "s"} ≤ ${MAST_SEGMENT_MAX_M} m`,
      };
    }
  }
  return null;
}

/**
 * The lightest laced mast (sections sorted by mass) for a pin-ended compression N over L lighter
 * than `belowKgPerM` (default: any), or null.
 */
export function designLacedMast(sections: readonly ChsSection[], axialN: number, lengthM: number, yieldPa: number, belowKgPerM = Infinity): LacedMast | null {
  let best: LacedMast | null = null;
  for (const faceM of FACES_M) {
    const m = lacedMastAt(sections, axialN, lengthM, yieldPa, faceM, best?.massKgPerM ?? belowKgPerM);
    if (m) best = m;
  }
  return best;
}
