import type { SphericalCap } from "../mechanics/spherical-cap";
import type { PressureCase } from "./load-case";
import { integrate1d } from "./gauss-legendre";

/** A region of the circular plan in polar coordinates about its centre (azimuth from the windward meridian, as `planPointOf`). */
export interface PlanRegion {
  /** Outer radius, m. */
  radiusM: number;
  /** Inner radius, m (default 0). */
  innerRadiusM?: number;
  /** Azimuth range, rad (default the full circle 0 … 2π). */
  fromAzimuthRad?: number;
  toAzimuthRad?: number;
  /** Radii, m, where the integrand steps or kinks (integrated piecewise). */
  radialBreaksM?: readonly number[];
}

/** The azimuths of the line x = 0 across the wind, where the drifted snow steps and c_pe kinks. */
const AZIMUTH_BREAKS = [Math.PI / 2, (3 * Math.PI) / 2, -Math.PI / 2];

/**
 * ∫∫ f(x, y) dA over a region of the plan, by composite Gauss–Legendre in polar coordinates
 * (∫ψ ∫r f(−r cos ψ, r sin ψ) r dr dψ), split at x = 0 and at the given radial breaks so that the
 * piecewise loads of the design basis are integrated as smooth pieces. For a load in kPa the result
 * is in kN.
 * @throws when the region is not 0 ≤ inner < outer or the azimuth range is empty or over 2π
 * @example integrateOverPlan(() => 1, { radiusM: 1 }) // π
 */
export function integrateOverPlan(f: (xM: number, yM: number) => number, region: PlanRegion): number {
  const { radiusM, innerRadiusM = 0, fromAzimuthRad = 0, toAzimuthRad = 2 * Math.PI, radialBreaksM = [] } = region;
  if (!(radiusM > 0 && innerRadiusM >= 0 && innerRadiusM < radiusM)) {
    throw new RangeError(`invalid plan region: radii ${innerRadiusM}–${radiusM} m (expected 0 ≤ inner < outer)`);
  }
  const sweep = toAzimuthRad - fromAzimuthRad;
  if (!(sweep > 0 && sweep <= 2 * Math.PI + 1e-12)) throw new RangeError(`invalid plan region: azimuths ${fromAzimuthRad}–${toAzimuthRad} rad (expected a range over 0 to 2π)`);
  const ring = (psi: number) => {
    const c = Math.cos(psi);
    const s = Math.sin(psi);
    return integrate1d((r) => f(-r * c, r * s) * r, innerRadiusM, radiusM, 4, radialBreaksM);
  };
  return integrate1d(ring, fromAzimuthRad, toAzimuthRad, 8, AZIMUTH_BREAKS);
}

/** Resultants of a pressure case on the cap, kN. */
export interface CaseResultants {
  /** Vertical resultant, downward positive, kN. */
  verticalKN: number;
  /** Horizontal resultant along the wind (+x), kN; 0 for vertical loads. */
  alongWindKN: number;
  /** verticalKN ÷ plan area: the plan mean, kPa. */
  planMeanKPa: number;
}

/**
 * Vertical and along-wind resultants of a case on the cap. Vertical: ∫∫ p dA_plan (for a normal
 * pressure too, since n_z dA = dA_plan). Along the wind, for a normal pressure only:
 * F_x = ∫∫ p sin θ cos ψ R² sin θ dθ dψ over the surface (inward pressure on the windward side
 * pushes downwind).
 */
export function caseResultants(load: PressureCase, cap: SphericalCap): CaseResultants {
  const known = remembered.get(load);
  if (known?.cap === cap) return known.result;
  const result = integrateCase(load, cap);
  remembered.set(load, { cap, result });
  return result;
}

/** Resultants already integrated, per case object and cap (cases are never mutated). */
const remembered = new WeakMap<PressureCase, { cap: SphericalCap; result: CaseResultants }>();

function integrateCase(load: PressureCase, cap: SphericalCap): CaseResultants {
  const region = { radiusM: cap.baseRadiusM, radialBreaksM: load.radialBreaksM };
  const verticalKN = integrateOverPlan((x, y) => load.atPlanKPa(x, y), region);
  let alongWindKN = 0;
  if (load.direction === "normal") {
    const R = cap.radiusM;
    const thetaBreaks = load.radialBreaksM.map((r) => Math.asin(Math.min(1, r / R)));
    const ring = (psi: number) =>
      integrate1d((theta) => {
        const s = Math.sin(theta);
        const r = R * s;
        return load.atPlanKPa(-r * Math.cos(psi), r * Math.sin(psi)) * s * s * Math.cos(psi) * R * R;
      }, 0, cap.edgeAngleRad, 4, thetaBreaks);
    alongWindKN = integrate1d(ring, 0, 2 * Math.PI, 8, AZIMUTH_BREAKS);
  }
  return { verticalKN, alongWindKN, planMeanKPa: verticalKN / cap.planAreaM2 };
}
