import { format } from "d3";

/** Units as a reader writes them: m2 → m², m3 → m³ (data files and ids keep m2 and m3). */
export function readableUnit(text: string): string {
  return text.replace(/\bm2\b/g, "m²").replace(/\bm3\b/g, "m³");
}

/** d3's grouped whole-number format, built once (the notebook's fmt.int is the same format). */
const whole = format(",.0f");

/**
 * A number rounded to a whole one and written with its thousands apart, as the pages' tables write
 * them: 18604.4 → "18,604", −1782 → "−1,782" (d3's minus sign, U+2212); a negative rounded to 0 is "0".
 */
export function wholeNumber(value: number): string {
  return Number.isFinite(value) ? whole(Math.round(value) || 0) : String(value);
}
