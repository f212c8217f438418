/** Forces and length of a shallow cable hanging in a parabola under a load uniform on plan. */
export interface ParabolicCable {
  /** Horizontal component of tension H = wL²/(8f), N. */
  horizontalN: number;
  /** Vertical reaction at each support V = wL/2 (level chord), N. */
  verticalN: number;
  /** Largest tension, at the supports: T_max = √(H² + V²), N. */
  maxTensionN: number;
  /** Length of the parabola, m. */
  lengthM: number;
}

/**
 * Sag–tension of a cable with a level chord under a load w uniform per unit of horizontal span:
 * H = wL²/(8f), V = wL/2, T_max = √(H² + V²), and the exact arc length of the parabola
 * y = 4f x(L − x)/L². Irvine, Cable Structures (1981), ch. 1 (the parabolic cable). The tension is
 * the inextensible (statics-only) value; elastic stretch and the catenary correction are ignored,
 * which is good to a few per cent for f/L ≤ 1/8.
 * @param loadNPerM w, N per metre of span (> 0)
 * @param spanM L, horizontal span, m (> 0)
 * @param sagM f, mid-span sag below the chord, m (0 < f ≤ L/2)
 * @throws when a parameter is out of range
 * @example parabolicCable(2000, 100, 10).maxTensionN // 269258 (H 250 kN, V 100 kN)
 */
export function parabolicCable(loadNPerM: number, spanM: number, sagM: number): ParabolicCable {
  if (!(loadNPerM >= 0 && Number.isFinite(loadNPerM))) throw new RangeError(`invalid cable load: ${loadNPerM} N/m (expected ≥ 0)`);
  if (!(spanM > 0 && Number.isFinite(spanM))) throw new RangeError(`invalid cable span: ${spanM} m (expected > 0)`);
  if (!(sagM > 0 && sagM <= spanM / 2)) throw new RangeError(`invalid cable sag: ${sagM} m (expected 0 < sag ≤ span/2 = ${spanM / 2})`);
  const horizontalN = (loadNPerM * spanM * spanM) / (8 * sagM);
  const verticalN = (loadNPerM * spanM) / 2;
  return {
    horizontalN,
    verticalN,
    maxTensionN: Math.hypot(horizontalN, verticalN),
    lengthM: parabolaLengthM(spanM, sagM),
  };
}

/**
 * Arc length of the parabola of span L and sag f: with k = 4f/L,
 * s = (L/2)√(1 + k²) + (L/(2k)) asinh(k) (elementary calculus; Irvine 1981 ch. 1 gives the
 * series L(1 + 8/3 (f/L)² − …) of the same length).
 * @example parabolaLengthM(100, 10) // 102.606
 */
export function parabolaLengthM(spanM: number, sagM: number): number {
  if (!(spanM > 0)) throw new RangeError(`invalid span: ${spanM} m (expected > 0)`);
  if (!(sagM >= 0)) throw new RangeError(`invalid sag: ${sagM} m (expected ≥ 0)`);
  if (sagM === 0) return spanM;
  const k = (4 * sagM) / spanM;
  return (spanM / 2) * Math.sqrt(1 + k * k) + (spanM / (2 * k)) * Math.asinh(k);
}

/**
 * Sag–tension of a cable on an inclined chord (supports a height Δz apart over a horizontal span L)
 * under a load uniform on plan, sag f measured vertically from the chord at mid-span: H = wL²/(8f)
 * as on a level chord; the support reactions are V = wL/2 ± H·Δz/L, the larger at the upper support
 * (Irvine 1981, ch. 1, the inclined parabolic cable).
 * @param riseM Δz, height of the upper support above the lower one, m (≥ 0)
 */
export function inclinedParabolicCable(loadNPerM: number, spanM: number, sagM: number, riseM: number): ParabolicCable & { lowerVerticalN: number } {
  if (!(riseM >= 0)) throw new RangeError(`invalid chord rise: ${riseM} m (expected ≥ 0)`);
  const level = parabolicCable(loadNPerM, spanM, sagM);
  const shearN = (level.horizontalN * riseM) / spanM;
  const upper = level.verticalN + shearN;
  const lower = level.verticalN - shearN;
  // Length: the parabola sheared onto the chord; its length is that of the level parabola on the
  // chord's slope, taken here as level length × secant of the chord (good for shallow chords).
  const lengthM = level.lengthM * Math.hypot(1, riseM / spanM);
  return {
    horizontalN: level.horizontalN,
    verticalN: upper,
    lowerVerticalN: lower,
    maxTensionN: Math.hypot(level.horizontalN, Math.max(Math.abs(upper), Math.abs(lower))),
    lengthM,
  };
}
