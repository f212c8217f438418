/** ISA sea-level pressure, Pa (ISO 2533). */
export const ISA_SEA_LEVEL_PRESSURE_PA = 101_325;
/** ISA sea-level temperature, K (ISO 2533). */
export const ISA_SEA_LEVEL_TEMPERATURE_K = 288.15;
/** Specific gas constant of dry air, J/(kg·K) (ISO 2533). */
export const DRY_AIR_GAS_CONSTANT = 287.05;

/** Density of dry air from the ideal gas law ρ = p / (R·T), kg/m³. ISA sea level: 1.2250. */
export function airDensityKgPerM3(pressurePa = ISA_SEA_LEVEL_PRESSURE_PA, temperatureK = ISA_SEA_LEVEL_TEMPERATURE_K): number {
  if (!(pressurePa > 0 && temperatureK > 0)) throw new RangeError(`invalid air state: ${pressurePa} Pa, ${temperatureK} K (expected both > 0)`);
  return pressurePa / (DRY_AIR_GAS_CONSTANT * temperatureK);
}

/** Mass of air in an enclosed volume at ISA sea-level density, kg. */
export function enclosedAirMassKg(volumeM3: number): number {
  return volumeM3 * airDensityKgPerM3();
}
