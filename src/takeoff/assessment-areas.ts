/** The area a per-m² figure is divided by. */
export type AreaBasis = "usable-floor" | "covered-plan" | "roof-surface";
export const AREA_BASES = ["usable-floor", "covered-plan", "roof-surface"] as const;

/** The areas carbon and cost are normalised by, m² (from a Design: usableFloorM2, planAreaM2, roofSurfaceM2). */
export type AssessmentAreas = {
  /** Plan area with at least the brief's clear height, m². */
  usableFloorM2: number;
  /** Plan area inside the roof edge, m². */
  planAreaM2: number;
  /** Roof surface area, m². */
  roofSurfaceM2: number;
};

/**
 * Checks the areas: each finite and ≥ 0 (a zero area gives no per-m² figure, not an error).
 * @throws Error naming the area, its value and what is allowed
 */
export function checkAreas(areas: AssessmentAreas): void {
  for (const key of ["usableFloorM2", "planAreaM2", "roofSurfaceM2"] as const) {
    const value = areas[key];
    if (!(typeof value === "number" && Number.isFinite(value) && value >= 0)) {
      throw new Error(`invalid ${key}: ${String(value)} m² (expected a finite area ≥ 0)`);
    }
  }
}

/** The area for a basis, m². */
export function areaForBasis(areas: AssessmentAreas, basis: AreaBasis): number {
  switch (basis) {
    case "usable-floor":
      return areas.usableFloorM2;
    case "covered-plan":
      return areas.planAreaM2;
    case "roof-surface":
      return areas.roofSurfaceM2;
  }
}
