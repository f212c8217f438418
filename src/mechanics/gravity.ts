/** Standard acceleration of gravity g_n, m/s² (ISO 80000-3 conventional value). */
export const GRAVITY_M_PER_S2 = 9.80665;

/**
 * Pressure of a mass spread over an area, kPa: m g / A / 1000.
 * @example kPaOfMass(1000, 100) // 0.0980665
 */
export function kPaOfMass(massKg: number, areaM2: number): number {
  return (massKg * GRAVITY_M_PER_S2) / areaM2 / 1000;
}

/** Pressure of a mass per unit area, kPa: (kg/m²) g / 1000. */
export function kPaFromKgPerM2(massKgPerM2: number): number {
  return (massKgPerM2 * GRAVITY_M_PER_S2) / 1000;
}
