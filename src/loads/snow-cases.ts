import type { SphericalCap } from "../mechanics/spherical-cap";
import type { PressureCase } from "./load-case";
import { radiusAtSlope, withinRadius } from "./dome-coordinates";
import { snowShapeMu3 } from "./snow";

/** EN 1991-1-3 Fig. 5.6 case (i): the undrifted shape coefficient on a cylindrical roof, μ1 = 0.8. */
export const MU1_CURVED_ROOF = 0.8;

/** EN 1991-1-3 §5.3.5(1): no snow where the roof's slope exceeds 60°. */
export const SNOW_MAX_SLOPE_RAD = Math.PI / 3;

/**
 * Uniform snow on the dome: s = μ1 C_e C_t s_k with μ1 = 0.8 (EN 1991-1-3 §5.2(3)a eq. 5.1 with
 * C_e = C_t = 1, Fig. 5.6 case (i)), vertical on plan wherever the slope is at most 60° (§5.3.5(1)),
 * 0 on steeper parts. Applying the cylindrical-roof rule of §5.3.5 to a dome is common practice,
 * not an EN clause (EN 1991-1-3 has no dome rule).
 */
export function uniformSnowCase(cap: SphericalCap, groundSnowKPa: number): PressureCase {
  if (!(groundSnowKPa >= 0)) throw new RangeError(`invalid ground snow load: ${groundSnowKPa} kPa (expected ≥ 0)`);
  const covered = radiusAtSlope(cap, SNOW_MAX_SLOPE_RAD);
  const value = MU1_CURVED_ROOF * groundSnowKPa;
  return {
    kind: "pressure",
    id: "snow-uniform",
    label: "uniform snow",
    action: "snow",
    direction: "vertical",
    atPlanKPa: (x, y) => (withinRadius(cap, x, y, covered) ? value : 0),
    peakKPa: value,
    minKPa: covered < cap.baseRadiusM ? 0 : value,
    radialBreaksM: covered < cap.baseRadiusM ? [covered] : [],
    uniformEquivalent: { kPa: value, rule: "the case itself (uniform where the slope is at most 60°)" },
    source: "EN 1991-1-3 §5.2 eq. 5.1 (C_e = C_t = 1), §5.3.5 and Fig. 5.6 case (i): μ1 = 0.8; cylindrical-roof rule applied to the dome — common practice, not an EN clause",
  };
}

/**
 * Drifted (asymmetric) snow on the dome, EN 1991-1-3 §5.3.5 and Fig. 5.6 case (ii): μ3 s_k on one
 * half of the plan and 0.5 μ3 s_k on the other, with μ3 = 0.2 + 10 h/b ≤ 2.0 (eq. 5.5, h = rise,
 * b = span), vertical on plan wherever the slope is at most 60°. The heavy half is x ≤ 0, the
 * windward half of the wind case it is combined with: the wind's windward pressure then falls on
 * the heavier half, which maximises the asymmetry (the drift and the design wind need not come from
 * the same storm — a conservative choice, no source). Applying the cylindrical-roof rule to a dome
 * (split at a diameter) is common practice, not an EN clause; some codes load a downwind 90° sector
 * instead.
 *
 * Uniform equivalent: the peak μ3 s_k everywhere. It bounds the vertical resultant and every
 * axisymmetric membrane force the heavy half can cause, so it is conservative for methods that
 * take a uniform load; it does not represent the bending the antisymmetric part (±0.25 μ3 s_k)
 * causes in shells and lattices, which needs an asymmetric analysis.
 */
export function driftedSnowCase(cap: SphericalCap, groundSnowKPa: number): PressureCase {
  if (!(groundSnowKPa >= 0)) throw new RangeError(`invalid ground snow load: ${groundSnowKPa} kPa (expected ≥ 0)`);
  const covered = radiusAtSlope(cap, SNOW_MAX_SLOPE_RAD);
  const mu3 = snowShapeMu3(cap.riseM, 2 * cap.baseRadiusM);
  const heavy = mu3 * groundSnowKPa;
  const light = 0.5 * heavy;
  return {
    kind: "pressure",
    id: "snow-drifted",
    label: "drifted snow",
    action: "snow",
    direction: "vertical",
    atPlanKPa: (x, y) => (!withinRadius(cap, x, y, covered) ? 0 : x <= 0 ? heavy : light),
    peakKPa: heavy,
    minKPa: covered < cap.baseRadiusM ? 0 : light,
    radialBreaksM: covered < cap.baseRadiusM ? [covered] : [],
    uniformEquivalent: {
      kPa: heavy,
      rule: "the peak μ3 s_k over the whole plan: bounds the resultant and the axisymmetric membrane forces of the heavy half; not the bending of the antisymmetric part",
    },
    source: "EN 1991-1-3 §5.3.5 eq. 5.5 (μ3 = 0.2 + 10 h/b ≤ 2.0) and Fig. 5.6 case (ii): μ3 on one half, 0.5 μ3 on the other; cylindrical-roof rule applied to the dome — common practice, not an EN clause",
  };
}
