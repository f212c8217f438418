/** Molar mass ratio CO2 : C, 44/12 (EN 16449 eq. 1). */
export const CO2_PER_C = 44 / 12;

/** Carbon fraction of the oven-dry mass of wood, 0.5 (EN 16449 §5, default). */
export const WOOD_CARBON_FRACTION = 0.5;

/**
 * Biogenic CO2 stored in a volume of wood, kg: P_CO2 = (44/12) · cf · ρ_ω · V_ω / (1 + ω/100).
 * EN 16449:2014 eq. 1 (from memory), for wood-based products whose density ρ_ω and volume V_ω are
 * given at moisture content ω. Reported apart from the counted modules, never netted.
 * @param densityKgPerM3 density at moisture content ω, kg/m³ (> 0)
 * @param volumeM3 volume at ω, m³ (≥ 0)
 * @param moisturePct moisture content ω, % of oven-dry mass (0–100, 12 % typical in service)
 * @param carbonFraction cf, carbon fraction of oven-dry mass (default 0.5)
 * @throws Error naming the argument out of range
 * @example biogenicCo2StoredKg(470, 1, 12) // 769.3 kg (= 44/12 · 0.5 · 470 / 1.12)
 */
export function biogenicCo2StoredKg(densityKgPerM3: number, volumeM3: number, moisturePct: number, carbonFraction = WOOD_CARBON_FRACTION): number {
  if (!(densityKgPerM3 > 0)) throw new Error(`invalid density: ${densityKgPerM3} kg/m³ (expected > 0)`);
  if (!(volumeM3 >= 0)) throw new Error(`invalid volume: ${volumeM3} m³ (expected ≥ 0)`);
  if (!(moisturePct >= 0 && moisturePct <= 100)) throw new Error(`invalid moisture content: ${moisturePct} % (expected 0 to 100 %)`);
  if (!(carbonFraction > 0 && carbonFraction <= 1)) throw new Error(`invalid carbon fraction: ${carbonFraction} (expected 0 < cf ≤ 1)`);
  return (CO2_PER_C * carbonFraction * densityKgPerM3 * volumeM3) / (1 + moisturePct / 100);
}

/**
 * Biogenic CO2 stored per kg of wood weighed at moisture content ω, kg CO2/kg: EN 16449 eq. 1
 * divided by the mass ρ_ω·V_ω, i.e. (44/12) · cf / (1 + ω/100).
 * @example biogenicCo2PerKg(12) // 1.637
 */
export function biogenicCo2PerKg(moisturePct: number, carbonFraction = WOOD_CARBON_FRACTION): number {
  return biogenicCo2StoredKg(1, 1, moisturePct, carbonFraction);
}
