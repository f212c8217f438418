/** Units as a reader writes them: m2 → m², m3 → m³ (data files and ids keep m2 and m3). */
export function readableUnit(text: string): string {
  return text.replace(/\bm2\b/g, "m²").replace(/\bm3\b/g, "m³");
}
