import type { FloorEnvelope } from "../types";
import { capHeightAt, type SphericalCap } from "../../mechanics/spherical-cap";

/**
 * The floor envelope of a roof on a spherical cap whose lowest members hang a constant depth below
 * the cap: the soffit at 41 radii from the centre to the edge, no supports on the floor.
 */
export function capFloor(cap: SphericalCap, eavesHeightM: number, depthM: number): FloorEnvelope {
  const soffit = Array.from({ length: 41 }, (_, i) => {
    const r = (cap.baseRadiusM * i) / 40;
    return [r, eavesHeightM + capHeightAt(cap, r) - depthM] as const;
  });
  return { soffit, supports: [] };
}
