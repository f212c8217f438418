import type { Brief } from "../brief";
import { sphericalCap, capHeightAt, type SphericalCap } from "../mechanics/spherical-cap";
import { capUsableRadiusM } from "../mechanics/usable-floor";
import { enclosedAirMassKg } from "../mechanics/air";

/** The enclosure a brief describes, before any scheme: roof surface, floor, volume, air. */
export interface Envelope {
  cap: SphericalCap;
  planAreaM2: number;
  /** Plan area where the roof surface itself is at least the minimum clear height above the floor, m². */
  usableFloorM2: number;
  /** Radius of that usable floor, m. */
  usableRadiusM: number;
  /** Walls to eaves plus the cap, m³. */
  enclosedVolumeM3: number;
  /** Air inside at ISA sea-level density, kg. */
  enclosedAirKg: number;
}

/**
 * Envelope of a brief, with a structural zone of the given depth under the roof surface
 * (0 for the roof surface itself). A scheme with structure hanging below its surface passes its depth.
 */
export function envelope(brief: Brief, structuralDepthM = 0): Envelope {
  const cap = sphericalCap(brief.spanM, brief.riseM);
  const usableRadiusM = capUsableRadiusM(cap.radiusM, cap.riseM, cap.baseRadiusM, brief.eavesHeightM, structuralDepthM, brief.minClearHeightM);
  const enclosedVolumeM3 = cap.planAreaM2 * brief.eavesHeightM + cap.volumeM3;
  return {
    cap,
    planAreaM2: cap.planAreaM2,
    usableFloorM2: Math.PI * usableRadiusM * usableRadiusM,
    usableRadiusM,
    enclosedVolumeM3,
    enclosedAirKg: enclosedAirMassKg(enclosedVolumeM3),
  };
}

/** Points of the roof profile in section, x from −a to a, y above the floor, m. */
export function roofProfile(brief: Brief, points = 61): [number, number][] {
  const cap = sphericalCap(brief.spanM, brief.riseM);
  const a = cap.baseRadiusM;
  return Array.from({ length: points }, (_, i) => {
    const x = -a + (2 * a * i) / (points - 1);
    return [x, brief.eavesHeightM + capHeightAt(cap, x)];
  });
}
