/** Membrane forces in a spherical shell at one point, N/m (+ tension, − compression). */
export interface MembraneForces {
  /** Meridional force N_φ, N/m. */
  meridionalNPerM: number;
  /** Hoop (circumferential) force N_θ, N/m. */
  hoopNPerM: number;
}

function checkArguments(pressurePa: number, radiusM: number, angleRad: number): void {
  if (!Number.isFinite(pressurePa)) throw new RangeError(`invalid pressure: ${pressurePa} Pa (expected a finite number)`);
  if (!(radiusM > 0)) throw new RangeError(`invalid sphere radius: ${radiusM} m (expected > 0)`);
  if (!(angleRad >= 0 && angleRad < Math.PI)) throw new RangeError(`invalid meridional angle: ${angleRad} rad (expected 0 ≤ φ < π)`);
}

/**
 * Membrane forces of a spherical dome under a uniform load per unit of shell surface (self-weight):
 * N_φ = −qR/(1 + cos φ), N_θ = qR(1/(1 + cos φ) − cos φ).
 * Timoshenko & Woinowsky-Krieger, Theory of Plates and Shells (2nd ed.), ch. 14 §129 (spherical dome
 * under its own weight). Validity: membrane state, φ measured from the crown, supports tangential
 * to the meridian (no edge bending).
 * @param surfacePressurePa q, load per m² of surface, Pa (positive downwards)
 * @param radiusM sphere radius R, m
 * @param angleRad meridional angle φ from the crown, rad
 * @example sphericalMembraneSurfaceLoad(2500, 30, 0) // { meridionalNPerM: −37500, hoopNPerM: −37500 }
 */
export function sphericalMembraneSurfaceLoad(surfacePressurePa: number, radiusM: number, angleRad: number): MembraneForces {
  checkArguments(surfacePressurePa, radiusM, angleRad);
  const c = Math.cos(angleRad);
  const q = surfacePressurePa;
  return { meridionalNPerM: (-q * radiusM) / (1 + c), hoopNPerM: q * radiusM * (1 / (1 + c) - c) };
}

/**
 * Membrane forces of a spherical dome under a uniform load per unit of plan (snow):
 * N_φ = −pR/2, N_θ = −(pR/2) cos 2φ.
 * Timoshenko & Woinowsky-Krieger, Theory of Plates and Shells, ch. 14 §129 (load uniformly
 * distributed over the horizontal projection). Validity as for the surface load.
 * @param planPressurePa p, load per m² of plan, Pa (positive downwards)
 * @example sphericalMembranePlanLoad(1000, 100, Math.PI / 4) // { meridionalNPerM: −50000, hoopNPerM: ≈ 0 }
 */
export function sphericalMembranePlanLoad(planPressurePa: number, radiusM: number, angleRad: number): MembraneForces {
  checkArguments(planPressurePa, radiusM, angleRad);
  const half = (planPressurePa * radiusM) / 2;
  return { meridionalNPerM: -half, hoopNPerM: -half * Math.cos(2 * angleRad) };
}

/**
 * Sum of the surface-load and plan-load membrane states at φ (superposition, linear membrane theory).
 */
export function sphericalMembraneForces(surfacePressurePa: number, planPressurePa: number, radiusM: number, angleRad: number): MembraneForces {
  const a = sphericalMembraneSurfaceLoad(surfacePressurePa, radiusM, angleRad);
  const b = sphericalMembranePlanLoad(planPressurePa, radiusM, angleRad);
  return { meridionalNPerM: a.meridionalNPerM + b.meridionalNPerM, hoopNPerM: a.hoopNPerM + b.hoopNPerM };
}

/**
 * The meridional angle at which the hoop force under self-weight changes sign:
 * cos²φ + cos φ − 1 = 0, cos φ = (√5 − 1)/2, φ = 51.83° (Timoshenko & Woinowsky-Krieger ch. 14 §129).
 */
export function hoopSignChangeAngleRad(): number {
  return Math.acos((Math.sqrt(5) - 1) / 2);
}

/**
 * Tension in the edge ring of a spherical dome from the horizontal thrust of its meridional force:
 * H = |N_φ| cos φ0 per metre of edge, T = H·a (equilibrium of a ring under uniform radial load;
 * Timoshenko & Woinowsky-Krieger ch. 14 §129, the supporting ring of a dome).
 * @param edgeMeridionalNPerM N_φ at the edge, N/m (the sign is ignored: the thrust acts outwards)
 * @param edgeAngleRad φ0, the meridional angle of the edge, rad
 * @param baseRadiusM a, the plan radius of the ring, m
 * @example edgeRingTensionN(-75_000, Math.PI / 3, 40) // 75 kN/m × 0.5 × 40 m = 1.5 MN
 */
export function edgeRingTensionN(edgeMeridionalNPerM: number, edgeAngleRad: number, baseRadiusM: number): number {
  return Math.abs(edgeMeridionalNPerM) * Math.cos(edgeAngleRad) * baseRadiusM;
}
