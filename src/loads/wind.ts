import type { Brief, TerrainCategory } from "../brief";

/** EN 1991-1-4 Table 4.1: roughness length z0 and minimum height z_min per terrain category, m. */
export const TERRAIN = {
  "0": { z0M: 0.003, zMinM: 1 },
  I: { z0M: 0.01, zMinM: 1 },
  II: { z0M: 0.05, zMinM: 2 },
  III: { z0M: 0.3, zMinM: 5 },
  IV: { z0M: 1.0, zMinM: 10 },
} as const satisfies Record<TerrainCategory, { z0M: number; zMinM: number }>;

/** z_max of EN 1991-1-4 §4.3.2, m. */
export const Z_MAX_M = 200;

export interface PeakVelocityPressure {
  /** q_p(z), Pa. */
  peakPa: number;
  /** Basic velocity pressure q_b = ½ ρ v_b², Pa. */
  basicPa: number;
  /** Exposure factor c_e = q_p / q_b. */
  exposureFactor: number;
  /** Mean wind velocity v_m(z), m/s. */
  meanVelocityMPerS: number;
  /** Turbulence intensity I_v(z). */
  turbulenceIntensity: number;
}

/**
 * Peak velocity pressure q_p(z) on flat terrain (orography factor c_o = 1, turbulence factor k_l = 1),
 * EN 1991-1-4 eqs 4.3–4.8: k_r = 0.19 (z0/0.05)^0.07, c_r = k_r ln(max(z, z_min)/z0),
 * v_m = c_r v_b, I_v = 1/ln(z/z0), q_p = (1 + 7 I_v) ½ ρ v_m².
 * Validity: z ≤ 200 m.
 * @example peakVelocityPressure(26, "II", 10, 1.25).peakPa // 993.8
 */
export function peakVelocityPressure(basicVelocityMPerS: number, terrain: TerrainCategory, heightM: number, airDensityKgPerM3 = 1.25): PeakVelocityPressure {
  if (!(basicVelocityMPerS > 0)) throw new RangeError(`invalid basic wind velocity: ${basicVelocityMPerS} m/s (expected > 0)`);
  if (!(heightM >= 0 && heightM <= Z_MAX_M)) throw new RangeError(`invalid height for wind: ${heightM} m (expected 0 to ${Z_MAX_M} m, EN 1991-1-4 §4.3.2)`);
  const { z0M, zMinM } = TERRAIN[terrain];
  const z = Math.max(heightM, zMinM);
  const kr = 0.19 * Math.pow(z0M / 0.05, 0.07);
  const roughness = kr * Math.log(z / z0M);
  const meanVelocity = roughness * basicVelocityMPerS;
  const turbulence = 1 / Math.log(z / z0M);
  const peakPa = (1 + 7 * turbulence) * 0.5 * airDensityKgPerM3 * meanVelocity * meanVelocity;
  const basicPa = 0.5 * airDensityKgPerM3 * basicVelocityMPerS * basicVelocityMPerS;
  return { peakPa, basicPa, exposureFactor: peakPa / basicPa, meanVelocityMPerS: meanVelocity, turbulenceIntensity: turbulence };
}

/**
 * Wind reference of a dome on walls: z_e = h + f, the crown's height above ground (EN 1991-1-4
 * Fig. 7.12), capped at z_max, and the peak velocity pressure there.
 */
export function domeWindReference(brief: Pick<Brief, "eavesHeightM" | "riseM" | "windBasicMPerS" | "terrain" | "airDensityKgPerM3">): { heightM: number; peakKPa: number } {
  const heightM = Math.min(Z_MAX_M, brief.eavesHeightM + brief.riseM);
  return { heightM, peakKPa: peakVelocityPressure(brief.windBasicMPerS, brief.terrain, heightM, brief.airDensityKgPerM3).peakPa / 1000 };
}
