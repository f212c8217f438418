/**
 * Laced built-up compression members, EN 1993-1-1 §6.4.1–6.4.2 (uniform members with chords in
 * pairs a distance h0 apart, joined by lacing in n planes):
 * - bow imperfection e0 = L/500 (§6.4.1(1));
 * - effective second moment I_eff = 0.5·h0²·A_ch (eq. 6.72);
 * - shear stiffness of the lacing S_v (Fig. 6.9) for diagonals alternating without posts ("W"),
 *   diagonals one way with posts ("N") and crossed diagonals ("X");
 * - second-order moment M_Ed = (N_Ed·e0 + M_Ed^I)/(1 − N_Ed/N_cr − N_Ed/S_v), N_cr = π²·E·I_eff/L²
 *   (eq. 6.70);
 * - chord force at mid-height N_ch,Ed = 0.5·N_Ed + M_Ed·h0·A_ch/(2·I_eff) (eq. 6.69);
 * - shear for the lacing V_Ed = π·M_Ed/L (eq. 6.73).
 * A square four-chord mast laced on all four faces is read as the standard's two-chord member with
 * two chords on each side (A_ch → 2·A_ch, two lacing planes parallel to the shear); per chord the
 * side's force is halved. That reading is ours (the standard draws two chords).
 *
 * Fig. 6.9's expressions were written from memory and checked by virtual work on one panel
 * (diagonal force V·d/h0, its stretch over a panel gives the shear strain); a = distance between
 * the chord's lacing nodes on one chord, d = diagonal length, A_d, A_v diagonal and post areas.
 */
import { STEEL_E_PA } from "./flexural-buckling";
import { variableColumnCriticalForceN } from "./variable-column";

export type LacingKind = "W" | "N" | "X";

export interface LacedColumnInput {
  /** System length L (pin-ended), m. */
  lengthM: number;
  /** Design axial compression N_Ed, N (> 0). */
  axialN: number;
  /** First-order moment at mid-height M_Ed^I, N·m (default 0). */
  firstOrderMomentNm?: number;
  /** Distance between the centroids of the chords h0, m. */
  chordSpacingM: number;
  /** One chord's area A_ch, m². */
  chordAreaM2: number;
  /** Chords on each side of the bending axis: 1 (the standard's two-chord member) or 2 (a square four-chord mast). */
  chordsPerSide: 1 | 2;
  lacing: {
    kind: LacingKind;
    /** Lacing planes parallel to the shear, n. */
    planes: number;
    /** Panel length a (between the lacing nodes of one chord), m. */
    panelM: number;
    diagonalAreaM2: number;
    /** Post area A_v, m² (N lacing only). */
    postAreaM2?: number;
  };
  modulusPa?: number;
}

export interface LacedColumnForces {
  bowM: number;
  effectiveSecondMomentM4: number;
  criticalForceN: number;
  shearStiffnessN: number;
  /** Second-order moment at mid-height, N·m (Infinity when N_Ed reaches the member's stability limit). */
  momentNm: number;
  /** Force in the most compressed chord at mid-height, N. */
  chordForceN: number;
  /** Shear for the lacing V_Ed, N, and the force in one diagonal (and one post), N. */
  shearN: number;
  diagonalForceN: number;
  postForceN: number;
  diagonalLengthM: number;
}

/** Diagonal length d of the lacing: W diagonals span a/2 along the chord, N and X diagonals span a. */
export function diagonalLengthM(kind: LacingKind, chordSpacingM: number, panelM: number): number {
  return Math.hypot(chordSpacingM, kind === "W" ? panelM / 2 : panelM);
}

/** Shear stiffness S_v of the lacing, EN 1993-1-1 Fig. 6.9, N. */
export function lacingShearStiffnessN(input: Pick<LacedColumnInput, "chordSpacingM" | "lacing" | "modulusPa">): number {
  const { chordSpacingM: h0, lacing } = input;
  const E = input.modulusPa ?? STEEL_E_PA;
  const d = diagonalLengthM(lacing.kind, h0, lacing.panelM);
  const base = (lacing.planes * E * lacing.diagonalAreaM2 * lacing.panelM * h0 * h0) / d ** 3;
  if (lacing.kind === "W") return base / 2;
  if (lacing.kind === "X") return base;
  const post = lacing.postAreaM2;
  if (!(post !== undefined && post > 0)) throw new RangeError(`invalid lacing.postAreaM2: ${String(post)} (expected > 0 for N lacing)`);
  return base / (1 + (lacing.diagonalAreaM2 * h0 ** 3) / (post * d ** 3));
}

/** The member's forces at mid-height by EN 1993-1-1 eqs. 6.69–6.73 (see the file's note). */
export function lacedColumnForces(input: LacedColumnInput): LacedColumnForces {
  const { lengthM: L, axialN: N, chordSpacingM: h0, chordAreaM2, chordsPerSide, lacing } = input;
  if (!(L > 0 && N > 0 && h0 > 0 && chordAreaM2 > 0 && lacing.panelM > 0 && lacing.diagonalAreaM2 > 0 && lacing.planes > 0 && Number.isFinite(L + N + h0 + chordAreaM2 + lacing.panelM + lacing.diagonalAreaM2 + lacing.planes))) {
    // the slow path only on bad input: name the first bad field
    for (const [field, v] of [["lengthM", L], ["axialN", N], ["chordSpacingM", h0], ["chordAreaM2", chordAreaM2], ["lacing.panelM", lacing.panelM], ["lacing.diagonalAreaM2", lacing.diagonalAreaM2], ["lacing.planes", lacing.planes]] as const) {
      if (!(v > 0 && Number.isFinite(v))) throw new RangeError(`invalid ${field}: ${v} (expected a finite number > 0)`);
    }
  }
  const E = input.modulusPa ?? STEEL_E_PA;
  const sideArea = chordsPerSide * chordAreaM2;
  const bowM = L / 500;
  const ieff = 0.5 * h0 * h0 * sideArea;
  const ncr = (Math.PI ** 2 * E * ieff) / (L * L);
  const sv = lacingShearStiffnessN(input);
  const denominator = 1 - N / ncr - N / sv;
  const moment = denominator > 0 ? (N * bowM + (input.firstOrderMomentNm ?? 0)) / denominator : Infinity;
  const sideForce = 0.5 * N + (moment * h0 * sideArea) / (2 * ieff);
  const shear = (Math.PI * moment) / L;
  const d = diagonalLengthM(lacing.kind, h0, lacing.panelM);
  const diagonalsPerPlane = lacing.kind === "X" ? 2 : 1;
  return {
    bowM,
    effectiveSecondMomentM4: ieff,
    criticalForceN: ncr,
    shearStiffnessN: sv,
    momentNm: moment,
    chordForceN: sideForce / chordsPerSide,
    shearN: shear,
    diagonalForceN: (shear * d) / (lacing.planes * diagonalsPerPlane * h0),
    postForceN: lacing.kind === "N" ? shear / lacing.planes : 0,
    diagonalLengthM: d,
  };
}

/** One station along a tapered laced member: its chord spacing and the largest chord and diagonal forces there. */
export interface LacedStation {
  xM: number;
  chordSpacingM: number;
  /** Force in the most compressed chord, N: its share of N_Ed plus M_Ed·sin(πx/L) over the chord spacing. */
  chordForceN: number;
  /** Force in one diagonal, N, from V_Ed·|cos(πx/L)| (eq. 6.73 distributed as the bow's slope), and its length, m. */
  diagonalForceN: number;
  diagonalLengthM: number;
}

export interface TaperedLacedForces {
  criticalForceN: number;
  /** The least shear stiffness along the member (at the narrower end for the usual proportions), N. */
  shearStiffnessN: number;
  momentNm: number;
  shearN: number;
  stations: LacedStation[];
}

/** Chord spacing at x of a member narrowing linearly from `midM` at mid-length to `endM` at each end, m. */
export function taperedChordSpacingM(xM: number, lengthM: number, midM: number, endM: number): number {
  return endM + (midM - endM) * (1 - Math.abs((2 * xM) / lengthM - 1));
}

/**
 * N_cr of such a member per m² of one chord's area (I_eff(x) = 0.5·h0(x)²·chordsPerSide·A_ch, eq.
 * 6.72 at each section; Euler's equation for a variable section): N_cr is proportional to A_ch, so a
 * search over chords computes this once.
 */
export function taperedCriticalForcePerAreaN(lengthM: number, midM: number, endM: number, chordsPerSide: 1 | 2, modulusPa = STEEL_E_PA): number {
  return variableColumnCriticalForceN(lengthM, (x) => modulusPa * 0.5 * taperedChordSpacingM(x, lengthM, midM, endM) ** 2 * chordsPerSide, 100);
}

/**
 * A laced member whose chord spacing grows linearly from `endChordSpacingM` at each end to
 * `chordSpacingM` at mid-height (a mast "larger at mid-height", issue 13 item 6). EN 1993-1-1 §6.4
 * is written for uniform members; here its method is kept and fed the tapered member's own
 * stiffness (common practice, no source for the taper itself):
 * - N_cr is the elastic critical force of the member with I_eff(x) = 0.5·h0(x)²·A_side (eq. 6.72 at
 *   each section), from Euler's equation for a variable section (variable-column.ts) — or the
 *   caller's `criticalForceN` (it is proportional to A_ch, so a search over chords computes it once);
 * - S_v is the least of Fig. 6.9 along the member (chords' lacing at the same panel length);
 * - M_Ed by eq. 6.70 with those two; along the member it follows the bow, M_Ed·sin(πx/L), and the
 *   shear V_Ed = π·M_Ed/L (eq. 6.73) its slope, ·|cos(πx/L)|;
 * - chord and diagonal forces (eqs. 6.69, 6.73 as in lacedColumnForces) at `stations` points along
 *   half the member (it is symmetric), with the chord spacing and diagonal length there.
 */
export function taperedLacedColumnForces(input: LacedColumnInput & { endChordSpacingM: number; criticalForceN?: number }, stations = 11): TaperedLacedForces {
  const { lengthM: L, axialN: N, chordSpacingM: hMid, endChordSpacingM: hEnd, chordAreaM2, chordsPerSide, lacing } = input;
  if (!(hEnd > 0 && hEnd <= hMid)) throw new RangeError(`invalid endChordSpacingM: ${hEnd} (expected > 0 and at most chordSpacingM ${hMid})`);
  const E = input.modulusPa ?? STEEL_E_PA;
  const spacingAt = (x: number) => taperedChordSpacingM(x, L, hMid, hEnd);
  const ncr = input.criticalForceN ?? taperedCriticalForcePerAreaN(L, hMid, hEnd, chordsPerSide, E) * chordAreaM2;
  const sv = Math.min(lacingShearStiffnessN({ chordSpacingM: hEnd, lacing, modulusPa: E }), lacingShearStiffnessN({ chordSpacingM: hMid, lacing, modulusPa: E }));
  const denominator = 1 - N / ncr - N / sv;
  const moment = denominator > 0 ? (N * (L / 500) + (input.firstOrderMomentNm ?? 0)) / denominator : Infinity;
  const shear = (Math.PI * moment) / L;
  const diagonalsPerPlane = lacing.kind === "X" ? 2 : 1;
  const out: LacedStation[] = [];
  for (let k = 0; k < stations; k++) {
    const x = (k / (stations - 1)) * (L / 2);
    const h0 = spacingAt(x);
    const d = diagonalLengthM(lacing.kind, h0, lacing.panelM);
    const sideForce = 0.5 * N + (moment * Math.sin((Math.PI * x) / L)) / h0;
    const v = shear * Math.abs(Math.cos((Math.PI * x) / L));
    out.push({ xM: x, chordSpacingM: h0, chordForceN: sideForce / chordsPerSide, diagonalForceN: (v * d) / (lacing.planes * diagonalsPerPlane * h0), diagonalLengthM: d });
  }
  return { criticalForceN: ncr, shearStiffnessN: sv, momentNm: moment, shearN: shear, stations: out };
}
