/**
 * Geometry of a spherical cap from its base radius and rise (elementary geometry).
 * Validity: 0 < rise ≤ base radius (a cap no deeper than a hemisphere).
 */
export interface SphericalCap {
  /** Base (plan) radius a, m. */
  baseRadiusM: number;
  /** Rise h, m. */
  riseM: number;
  /** Sphere radius R = (a² + h²) / (2h), m. */
  radiusM: number;
  /** Half-angle at the edge φ0 = asin(a/R), rad. */
  edgeAngleRad: number;
  /** Curved surface 2πRh, m². */
  surfaceM2: number;
  /** Volume under the cap πh²(3R − h)/3, m³. */
  volumeM3: number;
  /** Plan area πa², m². */
  planAreaM2: number;
}

/**
 * Spherical cap on a circular plan of the given span (diameter) and rise.
 * @throws when span or rise is not positive or rise exceeds span/2
 * @example sphericalCap(100, 12.5).radiusM // 106.25
 */
export function sphericalCap(spanM: number, riseM: number): SphericalCap {
  if (!(spanM > 0)) throw new RangeError(`invalid span: ${spanM} m (expected > 0)`);
  if (!(riseM > 0 && riseM <= spanM / 2)) throw new RangeError(`invalid rise: ${riseM} m (expected 0 < rise ≤ span/2 = ${spanM / 2})`);
  const a = spanM / 2;
  const h = riseM;
  const R = (a * a + h * h) / (2 * h);
  return {
    baseRadiusM: a,
    riseM: h,
    radiusM: R,
    edgeAngleRad: Math.asin(Math.min(1, a / R)),
    surfaceM2: 2 * Math.PI * R * h,
    volumeM3: (Math.PI * h * h * (3 * R - h)) / 3,
    planAreaM2: Math.PI * a * a,
  };
}

/** Height of the cap surface above its base plane at plan radius r (0 ≤ r ≤ a), m. */
export function capHeightAt(cap: SphericalCap, rM: number): number {
  const r = Math.min(Math.abs(rM), cap.baseRadiusM);
  // At rise = span/2 (a hemisphere) R = a, and R² − a² can round to a tiny negative: clamp it to 0
  // so the edge lies on the base plane instead of giving NaN.
  return Math.sqrt(Math.max(0, cap.radiusM * cap.radiusM - r * r)) - (cap.radiusM - cap.riseM);
}
