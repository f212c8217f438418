import type { Strand } from "./types";

/** Options for strand sizing. */
export type StrandDesignOptions = {
  /** γR, EN 1993-1-11:2006 §6.2(2), nationally determined (recommended 0.90 where the breaking force is verified by tests on the assembled component, 1.0 otherwise — from memory); default 1.0, the safe side. */
  gammaR?: number;
  /** Most strands allowed side by side in one member (parallel strands), default 8 (common practice, no source). */
  maxParallel?: number;
};

export interface StrandChoice {
  strand: Strand;
  /** Strands side by side. */
  count: number;
  /** Design tension resistance of the group, N. */
  resistanceN: number;
  utilisation: number;
  /** Mass of the group per metre, kg/m. */
  massKgPerM: number;
  /** e.g. "2 × FLC 60". */
  designation: string;
  governing: string;
}

/**
 * Design tension resistance of a strand, EN 1993-1-11:2006 (Design of structures with tension
 * components) §6.2: F_Rd = min(F_uk/(1.5 γR), F_k/γR). γR is a nationally determined parameter of
 * §6.2(2) (a published national annex lists that clause among its NDPs); the formula and its
 * recommended γR values are recalled, from memory — the clause text itself was not found. The proof
 * force F_k of a strand is about 0.8–0.85 F_uk, so the first term governs and is the one used:
 * F_Rd = F_uk / (1.5 γR).
 * @param minBreakingForceN F_uk, N
 * @example strandResistanceN(1e6) // 666667 with γR = 1.0
 */
export function strandResistanceN(minBreakingForceN: number, gammaR = 1.0): number {
  if (!(minBreakingForceN > 0)) throw new RangeError(`invalid minimum breaking force: ${minBreakingForceN} N (expected > 0)`);
  if (!(gammaR >= 0.8 && gammaR <= 1.5)) throw new RangeError(`invalid gammaR: ${gammaR} (expected 0.8 to 1.5)`);
  return minBreakingForceN / (1.5 * gammaR);
}

/**
 * The strand group with the fewest strands (one, or up to maxParallel equal strands side by side), and the lightest of those, from the
 * catalogue whose EN 1993-1-11 design resistance carries the tension. Returns null when even the
 * largest group is too weak. A force ≤ 0 returns the smallest strand (a nominal member).
 */
export function pickLightestStrand(strands: readonly Strand[], tensionN: number, options: StrandDesignOptions = {}): StrandChoice | null {
  const { gammaR = 1.0, maxParallel = 8 } = options;
  if (!Number.isFinite(tensionN)) throw new RangeError(`invalid cable tension: ${tensionN} N (expected a finite number)`);
  if (!(Number.isInteger(maxParallel) && maxParallel >= 1)) throw new RangeError(`invalid maxParallel: ${maxParallel} (expected a whole number ≥ 1)`);
  if (strands.length === 0) throw new RangeError("invalid strand catalogue: empty (expected at least one strand)");
  // Fewest strands first (each strand needs its own sockets and anchorage), then the lightest.
  for (let count = 1; count <= maxParallel; count++) {
    let best: StrandChoice | null = null;
    for (const strand of strands) {
      const resistanceN = count * strandResistanceN(strand.minBreakingForceN, gammaR);
      if (resistanceN < tensionN) continue;
      const massKgPerM = count * strand.massKgPerM;
      if (best === null || massKgPerM < best.massKgPerM) {
        best = {
          strand,
          count,
          resistanceN,
          utilisation: Math.max(0, tensionN) / resistanceN,
          massKgPerM,
          designation: count === 1 ? strand.designation : `${count} × ${strand.designation}`,
          governing: "strand tension, EN 1993-1-11:2006 §6.2",
        };
      }
    }
    if (best) return best;
  }
  return null;
}
