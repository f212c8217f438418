/**
 * Plan area of a circular floor where the clear height under the structure is at least a minimum.
 * The clear height is given as a function of plan radius; it need not be monotonic. The annuli are
 * integrated by the midpoint rule on `steps` rings (error ≤ one ring's area per crossing).
 * @param baseRadiusM plan radius, m
 * @param clearHeightAtM clear height under the structure at radius r, m
 * @param minClearHeightM minimum clear height that counts as usable, m
 */
export function usableFloorAreaM2(
  baseRadiusM: number,
  clearHeightAtM: (rM: number) => number,
  minClearHeightM: number,
  steps = 2000,
): number {
  if (!(baseRadiusM > 0)) throw new RangeError(`invalid base radius: ${baseRadiusM} m (expected > 0)`);
  const dr = baseRadiusM / steps;
  let area = 0;
  for (let i = 0; i < steps; i++) {
    const r0 = i * dr;
    const r1 = r0 + dr;
    if (clearHeightAtM(r0 + dr / 2) >= minClearHeightM) area += Math.PI * (r1 * r1 - r0 * r0);
  }
  return area;
}

/**
 * Outer radius where a clear height that falls monotonically outwards meets the minimum, solved
 * in closed form for a spherical cap offset by a constant structural depth: the radius r where
 * eaves + capHeight(r) − depth = minimum. Returns 0 when even the crown is too low and a when all
 * of the plan is usable.
 */
export function capUsableRadiusM(
  radiusM: number,
  riseM: number,
  baseRadiusM: number,
  eavesHeightM: number,
  structuralDepthM: number,
  minClearHeightM: number,
): number {
  const needed = minClearHeightM - eavesHeightM + structuralDepthM; // height above base plane needed
  if (needed <= 0) return baseRadiusM;
  if (needed > riseM) return 0;
  const z = radiusM - riseM + needed;
  return Math.min(baseRadiusM, Math.sqrt(Math.max(0, radiusM * radiusM - z * z)));
}
