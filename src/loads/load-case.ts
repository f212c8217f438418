/**
 * A load case of the design basis. A distributed case is a function over the plan: the origin at
 * the centre of the circular plan, x along the wind (the wind blows towards +x, so the windward
 * base is at x = −a), y across it. Surface points map to the plan by `planPointOf`.
 */

/** The actions of EN 1990 §4.1.1 that the roof design basis uses. */
export type Action = "permanent" | "imposed" | "snow" | "wind" | "temperature";

/** The named cases of the design basis. */
export type LoadCaseId = "services" | "imposed" | "snow-uniform" | "snow-drifted" | "wind-internal-pressure" | "wind-internal-suction" | "temperature";

/** A conservative uniform value for methods that can only take a uniform load, and why it is conservative. */
export interface UniformEquivalent {
  /** kPa, same direction convention as the case. */
  kPa: number;
  /** Which value it is and what it bounds (and what it does not). */
  rule: string;
}

/** A load case given as a pressure distribution. */
export interface PressureCase {
  kind: "pressure";
  id: LoadCaseId;
  /** Short name used in combination names ("drifted snow"). */
  label: string;
  action: Action;
  /**
   * "vertical": a gravity load per unit plan area, downward positive. "normal": a pressure normal to
   * the surface per unit surface area, positive towards the surface (inward); its vertical
   * component per unit plan area is the same number (n_z dA = dA_plan), downward for positive.
   */
  direction: "vertical" | "normal";
  /** The load at plan point (x, y), m; 0 outside the plan. kPa. */
  atPlanKPa(xM: number, yM: number): number;
  /** Largest value anywhere on the roof, kPa (exact, from the case's own construction). */
  peakKPa: number;
  /** Smallest value anywhere on the roof, kPa (negative = upward / outward). */
  minKPa: number;
  /** Plan radii, m, where the load steps or kinks radially (for exact piecewise integration). */
  radialBreaksM: readonly number[];
  uniformEquivalent: UniformEquivalent;
  /** Standard and clause, with what is common practice or from memory. */
  source: string;
}

/**
 * A uniform temperature change of the cable roof from its installation temperature, K
 * (EN 1991-1-5 §6.1.3, uniform component only). It carries no pressure.
 */
export interface TemperatureCase {
  kind: "temperature";
  id: "temperature";
  label: string;
  action: "temperature";
  /** Installation (initial) temperature T0, °C. */
  installationC: number;
  /** ΔT_N,con = T_e,min − T0 (negative), K. */
  fallK: number;
  /** ΔT_N,exp = T_e,max − T0 (positive), K. */
  riseK: number;
  source: string;
}

export type LoadCase = PressureCase | TemperatureCase;
