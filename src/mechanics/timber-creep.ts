import type { ServiceClass } from "./timber-kmod";

/** k_def for solid timber (EN 14081-1) and glued laminated timber (EN 14080), EN 1995-1-1 Table 3.2, by service class. */
export const GLULAM_K_DEF: Readonly<Record<ServiceClass, number>> = { 1: 0.6, 2: 0.8, 3: 2.0 };

/**
 * Creep-reduced stiffness for an ultimate-limit-state analysis in which the distribution of forces
 * (or stability) depends on stiffness, EN 1995-1-1 §2.3.2.2(2) eq. 2.7: E_fin = E_mean/(1 + ψ2 k_def).
 * ψ2 is the quasi-permanent factor of the action causing the largest stress relative to strength;
 * ψ2 = 1 for a permanent action (the default, giving E/(1 + k_def), the safe side for a dome whose
 * buckling load is mostly self-weight and finishes). Eq. number and ψ2 reading from memory.
 * @param modulusPa E, Pa (> 0); @param kDef k_def (≥ 0); @param psi2 ψ2 (0 ≤ ψ2 ≤ 1)
 * @throws RangeError naming the argument out of range
 * @example creepReducedModulusPa(11.5e9, 0.8) // 6.389e9
 */
export function creepReducedModulusPa(modulusPa: number, kDef: number, psi2 = 1): number {
  if (!(modulusPa > 0)) throw new RangeError(`invalid modulus: ${modulusPa} Pa (expected > 0)`);
  if (!(kDef >= 0 && kDef <= 3)) throw new RangeError(`invalid k_def: ${kDef} (expected 0 to 3)`);
  if (!(psi2 >= 0 && psi2 <= 1)) throw new RangeError(`invalid psi2: ${psi2} (expected 0 to 1)`);
  return modulusPa / (1 + psi2 * kDef);
}
