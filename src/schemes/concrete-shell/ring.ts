import type { MaterialId } from "../../materials";

/** Steel stress limit for crack control with 16 mm bars at w_k = 0.3 mm, EN 1992-1-1 Table 7.2N (from memory), Pa. */
const CRACK_CONTROL_STEEL_PA = 240e6;
/** Tie reinforcement ratio of the reinforced ring: the most EN 1992-1-1 §9.2.1.1(3) allows outside laps, A_s,max = 0.04 A_c — the ring's concrete is only what houses the tie. */
const RING_TIE_RATIO = 0.04;
/** Steel tension ring S355, f_y for t ≤ 40 mm (EN 1993-1-1 Table 3.1), γ_M0 = 1.0. */
const RING_STEEL_YIELD_PA = 355e6;
/** Strand Y1860: f_pk and f_p0.1k ≈ 0.88 f_pk (EN 10138-3, from memory), Pa. */
const STRAND_FPK_PA = 1860e6;
const STRAND_FP01K_PA = 1640e6;
/** Long-term prestress losses (common practice 15–25 %, no source). */
const PRESTRESS_LOSSES = 0.2;

export interface EdgeRingTie {
  material: MaterialId;
  /** Tie steel area, m². */
  tieAreaM2: number;
  /** Concrete area of the ring section, m². */
  ringAreaM2: number;
  /** Design tension resistance of the tie, N. */
  capacityN: number;
}

/**
 * The tie of the edge ring for its ULS and SLS tension. Steel: a box ring for the ULS tension at
 * f_y, with no concrete ring. Reinforcement: A_s for f_yd under ULS and
 * for the crack-control stress under SLS, the ring sized to the tie ratio. Prestress: tendons for
 * f_p0.1k/γ_S under ULS and no decompression under SLS (σ_pm0 ≤ 0.75 f_pk less losses), the ring
 * sized so that σ_c ≤ 0.6 f_ck at transfer. A concrete ring is never smaller than (2t)².
 */
export function edgeRingTie(kind: string, ulsN: number, slsN: number, fydPa: number, fckPa: number, shellThicknessM: number): EdgeRingTie {
  let tie: EdgeRingTie;
  if (kind === "steel") {
    // A steel box ring ties the thrust by itself (EN 1993-1-1 eq. 6.6): no concrete ring beyond the shell's thickened edge.
    const tieAreaM2 = Math.ceil((ulsN / RING_STEEL_YIELD_PA) * 1e4) / 1e4; // whole cm² of plate
    return { material: "steel-plate", tieAreaM2, capacityN: tieAreaM2 * RING_STEEL_YIELD_PA, ringAreaM2: 0 };
  }
  if (kind === "prestress") {
    const fpd = STRAND_FP01K_PA / 1.15; // EN 1992-1-1 §3.3.6
    const effectiveStress = 0.75 * STRAND_FPK_PA * (1 - PRESTRESS_LOSSES); // σ_pm0 ≤ 0.75 f_pk, EN 1992-1-1 §5.10.3(2)
    const tieAreaM2 = Math.max(ulsN / fpd, slsN / effectiveStress); // no decompression under SLS
    // σ_c ≤ 0.6 f_ck at transfer, EN 1992-1-1 §5.10.2.2(5)
    tie = { material: "steel-strand", tieAreaM2, capacityN: tieAreaM2 * fpd, ringAreaM2: (0.75 * STRAND_FPK_PA * tieAreaM2) / (0.6 * fckPa) };
  } else {
    const tieAreaM2 = Math.max(ulsN / fydPa, slsN / CRACK_CONTROL_STEEL_PA);
    tie = { material: "rebar", tieAreaM2, capacityN: tieAreaM2 * fydPa, ringAreaM2: tieAreaM2 / RING_TIE_RATIO };
  }
  return { ...tie, ringAreaM2: Math.max(tie.ringAreaM2, (2 * shellThicknessM) ** 2) };
}
