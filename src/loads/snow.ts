/**
 * Snow load shape coefficient μ1 for a roof of pitch α, EN 1991-1-3 Table 5.2:
 * 0.8 for 0° ≤ α ≤ 30°, 0.8(60 − α)/30 for 30° < α < 60°, 0 for α ≥ 60°.
 */
export function snowShapeMu1(pitchDeg: number): number {
  if (!(pitchDeg >= 0 && pitchDeg <= 90)) throw new RangeError(`invalid roof pitch: ${pitchDeg}° (expected 0 to 90)`);
  if (pitchDeg <= 30) return 0.8;
  if (pitchDeg < 60) return (0.8 * (60 - pitchDeg)) / 30;
  return 0;
}

/**
 * Snow load shape coefficient μ3 for a cylindrical (curved) roof, EN 1991-1-3 §5.3.5 eq. 5.5:
 * μ3 = 0.2 + 10 h/b for β ≤ 60°, capped at 2.0 (recommended upper value).
 * @param riseM h, the rise of the curve; @param widthM b, its width
 * @example snowShapeMu3(12.5, 100) // 1.45
 */
export function snowShapeMu3(riseM: number, widthM: number): number {
  if (!(riseM >= 0 && widthM > 0)) throw new RangeError(`invalid curved roof: rise ${riseM} m, width ${widthM} m (expected rise ≥ 0, width > 0)`);
  return Math.min(2.0, 0.2 + (10 * riseM) / widthM);
}
