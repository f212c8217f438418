/**
 * Design charring rates of softwood, m/min, EN 1995-1-2 §3.4.2 Table 3.1: one-dimensional β0 and
 * notional β_n (which includes corner rounding and fissures). Glued laminated softwood,
 * ρ_k ≥ 290 kg/m³: β0 = 0.65 mm/min, β_n = 0.7 mm/min; solid softwood: β0 = 0.65, β_n = 0.8 mm/min.
 */
export const CHARRING_RATE_M_PER_MIN = {
  glulamSoftwood: { oneDimensional: 0.65e-3, notional: 0.7e-3 },
  solidSoftwood: { oneDimensional: 0.65e-3, notional: 0.8e-3 },
} as const;

/** Depth of the zero-strength layer d0, m, EN 1995-1-2 §4.2.2(1): 7 mm. */
export const ZERO_STRENGTH_LAYER_M = 0.007;

/**
 * Design charring depth for a time of standard fire exposure, EN 1995-1-2 §3.4.2 eqs 3.1/3.2:
 * d_char = β·t (β0 one-dimensional, or β_n notional).
 * @param minutes t, fire exposure, min (≥ 0); @param rateMPerMin β, m/min (> 0)
 * @throws RangeError naming the argument out of range
 * @example charringDepthM(60, 0.7e-3) // 0.042
 */
export function charringDepthM(minutes: number, rateMPerMin: number): number {
  if (!(minutes >= 0 && minutes <= 240)) throw new RangeError(`invalid fire exposure: ${minutes} min (expected 0 to 240)`);
  if (!(rateMPerMin > 0)) throw new RangeError(`invalid charring rate: ${rateMPerMin} m/min (expected > 0)`);
  return minutes * rateMPerMin;
}

/**
 * Effective charring depth of the reduced cross-section method, EN 1995-1-2 §4.2.2 eq. 4.1:
 * d_ef = d_char,n + k0 d0, with d0 = 7 mm and k0 = t/20 for t < 20 min, 1 from 20 min
 * (Table 4.1, unprotected surfaces).
 * @param minutes t, min; @param notionalRateMPerMin β_n, m/min (default glulam softwood 0.7 mm/min)
 * @example effectiveCharDepthM(60) // 0.049
 */
export function effectiveCharDepthM(minutes: number, notionalRateMPerMin: number = CHARRING_RATE_M_PER_MIN.glulamSoftwood.notional): number {
  const dChar = charringDepthM(minutes, notionalRateMPerMin);
  const k0 = Math.min(1, minutes / 20);
  return dChar + k0 * ZERO_STRENGTH_LAYER_M;
}
