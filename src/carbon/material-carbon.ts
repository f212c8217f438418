import type { FactorRow } from "./factor-table";
import type { TransportMode } from "./carbon-settings";
import { transportFactorKgCO2ePerKg } from "./transport-factor";
import { wasteFactor } from "./waste-factor";

/** Carbon of one quantity of material by EN 15978 module, kgCO2e. */
export type ModuleCarbon = {
  /** A1–A3, product stage. */
  a1a3KgCO2e: number;
  /** A4, transport to site of the installed mass. */
  a4KgCO2e: number;
  /** A5, site wastage: the wasted mass's A1–A3, A4 and C (counted here only). */
  a5KgCO2e: number;
  /** C1–C4, end of life of the installed mass. */
  cKgCO2e: number;
  /** Module D, beyond the system boundary (negative is a benefit); reported apart. */
  moduleDKgCO2e: number;
  /** Biogenic CO2 stored (EN 16449); reported apart, never netted. */
  biogenicKgCO2: number;
};

/** Which of A4 and C enter the A5 wastage term (A1–A3 always does). */
export type WastageScope = { includeA4: boolean; includeC: boolean };

/**
 * Embodied carbon of an installed mass of one material, by module, following EN 15978 as set out
 * in IStructE, How to calculate embodied carbon, 2nd ed. (2022) (from memory):
 * A1–A3 = m · ECF_A1–A3; A4 = m · Σ(d · TF_mode)/1000; A5w = m · WF · (ECF_A1–A3 + ECF_A4 + ECF_C)
 * with WF = 1/(1 − WR) − 1; C1–C4 = m · ECF_C; D = m · ECF_D; biogenic = m · stored CO2 per kg.
 * The mass is the installed mass (take-off, allowance included); the wasted mass is counted in A5
 * only. A5 site activities (plant, energy) are not included.
 * @param massKg installed mass, kg (≥ 0)
 * @throws Error for a negative or non-finite mass, or a transport mode with no factor
 */
export function materialCarbon(
  massKg: number,
  factor: FactorRow,
  modes: readonly TransportMode[],
  wastage: WastageScope = { includeA4: true, includeC: true },
): ModuleCarbon {
  if (!(massKg >= 0 && Number.isFinite(massKg))) throw new Error(`invalid mass of ${factor.material}: ${massKg} kg (expected a finite mass ≥ 0)`);
  const a4PerKg = transportFactorKgCO2ePerKg(
    [
      { mode: "road", distanceKm: factor.transportKmRoad },
      { mode: "sea", distanceKm: factor.transportKmSea },
    ],
    modes,
  );
  const wastedKg = massKg * wasteFactor(factor.wasteRatePct);
  const wastedPerKg = factor.a1a3KgCO2ePerKg + (wastage.includeA4 ? a4PerKg : 0) + (wastage.includeC ? factor.endOfLifeKgCO2ePerKg : 0);
  return {
    a1a3KgCO2e: massKg * factor.a1a3KgCO2ePerKg,
    a4KgCO2e: massKg * a4PerKg,
    a5KgCO2e: wastedKg * wastedPerKg,
    cKgCO2e: massKg * factor.endOfLifeKgCO2ePerKg,
    moduleDKgCO2e: massKg * factor.moduleDKgCO2ePerKg,
    biogenicKgCO2: massKg * factor.biogenicKgCO2ePerKg,
  };
}
