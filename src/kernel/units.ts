/** Units as a reader writes them: m2 → m², m3 → m³ (data files and ids keep m2 and m3). */
export function readableUnit(text: string): string {
  return text.replace(/\bm2\b/g, "m²").replace(/\bm3\b/g, "m³");
}

/**
 * A number rounded to a whole one and written with its thousands apart, as the pages' tables write
 * them: 18604.4 → "18,604", −1782 → "−1,782" (a minus sign, U+2212). Written out here rather than by
 * toLocaleString, which builds a formatter at each call: every design writes its cautions.
 */
export function wholeNumber(value: number): string {
  if (!Number.isFinite(value)) return String(value);
  const digits = String(Math.abs(Math.round(value))).replace(/\B(?=(\d{3})+(?!\d))/g, ",");
  return Math.round(value) < 0 ? `−${digits}` : digits;
}
