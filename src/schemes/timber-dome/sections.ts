/** A solid rectangular glulam section, depth normal to the roof surface. */
export interface GlulamSection {
  /** e.g. "GL 200×800". */
  designation: string;
  widthM: number;
  depthM: number;
  areaM2: number;
  /** Second moments about the strong (y) and weak (z) axes, m⁴. */
  secondMomentYM4: number;
  secondMomentZM4: number;
  /** Elastic modulus about the strong axis, bh²/6, m³. */
  sectionModulusYM3: number;
}

/** A rectangular section b × h (elementary section geometry). */
export function rectangularSection(widthM: number, depthM: number): GlulamSection {
  if (!(widthM > 0 && depthM > 0)) throw new RangeError(`invalid glulam section: ${widthM} × ${depthM} m (expected both > 0)`);
  return {
    designation: `GL ${Math.round(widthM * 1000)}×${Math.round(depthM * 1000)}`,
    widthM,
    depthM,
    areaM2: widthM * depthM,
    secondMomentYM4: (widthM * depthM ** 3) / 12,
    secondMomentZM4: (depthM * widthM ** 3) / 12,
    sectionModulusYM3: (widthM * depthM ** 2) / 6,
  };
}

/**
 * The glulam sections the sizing may choose, lightest first: widths 120–300 mm in 20 mm steps,
 * depths 200–2,400 mm in 40 mm steps (about one lamination of 40–45 mm), depth 2 to 8 times the
 * width (common practice, no source: wider is blocked glulam, deeper needs lateral restraint the
 * model does not give).
 */
export const GLULAM_SECTIONS: readonly GlulamSection[] = (() => {
  const out: GlulamSection[] = [];
  for (let b = 120; b <= 300; b += 20) {
    for (let h = 200; h <= 2400; h += 40) if (h >= 2 * b && h <= 8 * b) out.push(rectangularSection(b / 1000, h / 1000));
  }
  return out.sort((p, q) => p.areaM2 - q.areaM2 || p.depthM - q.depthM);
})();
