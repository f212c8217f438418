import type { SphericalCap } from "../mechanics/spherical-cap";
import type { PressureCase } from "./load-case";

/**
 * Plan point (x, y), m, of the cap's surface point at an angle from the crown θ (measured at the
 * sphere's centre) and an azimuth ψ from the windward meridian: r = R sin θ, x = −r cos ψ,
 * y = r sin ψ (the wind blows towards +x; ψ = 0 is the windward base, ψ = π the leeward base).
 * @throws when θ is outside 0 … the edge angle
 */
export function planPointOf(cap: SphericalCap, angleFromCrownRad: number, azimuthFromWindRad: number): { xM: number; yM: number } {
  if (!(angleFromCrownRad >= 0 && angleFromCrownRad <= cap.edgeAngleRad + 1e-12)) {
    throw new RangeError(`invalid angle from the crown: ${angleFromCrownRad} rad (expected 0 to the edge angle ${cap.edgeAngleRad} rad)`);
  }
  const r = cap.radiusM * Math.sin(angleFromCrownRad);
  return { xM: -r * Math.cos(azimuthFromWindRad), yM: r * Math.sin(azimuthFromWindRad) };
}

/** Angle from the crown θ = asin(r/R) of the surface point above plan point (x, y), rad; also the surface's slope there. */
export function angleFromCrownAt(cap: SphericalCap, xM: number, yM: number): number {
  return Math.asin(Math.min(1, Math.hypot(xM, yM) / cap.radiusM));
}

/** Plan radius at which the cap's slope reaches `slopeRad`, or the base radius if it never does, m. */
export function radiusAtSlope(cap: SphericalCap, slopeRad: number): number {
  return slopeRad >= cap.edgeAngleRad ? cap.baseRadiusM : cap.radiusM * Math.sin(slopeRad);
}

/** Whether plan point (x, y) lies within `radiusM` of the centre (the plan by default), with a relative 1e-12 for rounding on the rim. */
export function withinRadius(cap: SphericalCap, xM: number, yM: number, radiusM = cap.baseRadiusM): boolean {
  return Math.hypot(xM, yM) <= radiusM * (1 + 1e-12);
}

/** A case's value at the surface point at angle θ from the crown and azimuth ψ from the windward meridian, kPa. */
export function caseAtSurfaceKPa(load: Pick<PressureCase, "atPlanKPa">, cap: SphericalCap, angleFromCrownRad: number, azimuthFromWindRad: number): number {
  const { xM, yM } = planPointOf(cap, angleFromCrownRad, azimuthFromWindRad);
  return load.atPlanKPa(xM, yM);
}
