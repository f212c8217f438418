import type { TransportMode } from "./carbon-settings";

/** The distances a material travels from factory gate to site, km per mode. */
export type TransportLeg = { mode: TransportMode["mode"]; distanceKm: number };

/**
 * A4 transport carbon per kg of material: Σ over legs (distance km × mode factor kgCO2e/t·km)
 * / 1000 kg per t. IStructE, How to calculate embodied carbon, 2nd ed. (2022), A4 (from memory).
 * @throws Error naming a leg's mode when no factor for it is given, or a negative distance
 * @example transportFactorKgCO2ePerKg([{ mode: "road", distanceKm: 300 }], modes) // 0.0322 with road 0.10749
 */
export function transportFactorKgCO2ePerKg(legs: readonly TransportLeg[], modes: readonly TransportMode[]): number {
  let sum = 0;
  for (const leg of legs) {
    if (!(leg.distanceKm >= 0)) throw new Error(`invalid ${leg.mode} distance: ${leg.distanceKm} km (expected ≥ 0)`);
    if (leg.distanceKm === 0) continue;
    const mode = modes.find((m) => m.mode === leg.mode);
    if (!mode) throw new Error(`no transport factor for mode "${leg.mode}" (expected one of ${modes.map((m) => m.mode).join(", ")})`);
    sum += leg.distanceKm * mode.kgCO2ePerTonneKm;
  }
  return sum / 1000;
}
