import type { Brief } from "../brief";
import { sphericalCap } from "../mechanics/spherical-cap";
import { snowShapeMu1, snowShapeMu3 } from "./snow";
import { domeWindReference } from "./wind";
import { ulsGravity, ulsUplift, type UlsResult } from "./combinations";

/** The characteristic roof actions of a brief, every scheme's starting point. Pressures in kPa. */
export interface RoofActions {
  /** μ1 at the edge pitch (EN 1991-1-3 Table 5.2). */
  mu1: number;
  /** μ3 for the curved roof (EN 1991-1-3 §5.3.5), h = rise, b = span. */
  mu3: number;
  /** Shape coefficient used as a uniform load: max(μ1, 0.75 μ3), the plan mean of the drifted case (0.5 μ3 / μ3 halves). */
  muUniform: number;
  /** Snow on plan s = μ s_k (C_e = C_t = 1), kPa. */
  snowKPa: number;
  /** Imposed roof load, category H, kPa. */
  imposedKPa: number;
  /** Leading gravity variable action: the larger of snow and imposed (EN 1991-1-1 §3.3.2: not combined), kPa. */
  leadingVariableKPa: number;
  /** Which variable action leads. */
  leadingVariable: "snow" | "imposed";
  /** Services and hung load (permanent, on plan), kPa. */
  servicesKPa: number;
  /** Reference height for wind: crown height above ground, m. */
  windHeightM: number;
  /** Peak velocity pressure q_p at the crown, kPa. */
  peakWindKPa: number;
  /** Characteristic net uplift c · q_p, kPa (positive upwards). */
  upliftKPa: number;
}

/**
 * Characteristic actions from the brief. The drifted snow case on a curved roof (μ3 on one half,
 * 0.5 μ3 on the other, EN 1991-1-3 Fig. 5.6) is applied as its plan mean 0.75 μ3 for the
 * axisymmetric methods used here (common practice, no source); schemes that are sensitive to
 * asymmetric load say so in their warnings.
 */
export function roofActions(brief: Brief): RoofActions {
  const cap = sphericalCap(brief.spanM, brief.riseM);
  const edgePitchDeg = (cap.edgeAngleRad * 180) / Math.PI;
  const mu1 = snowShapeMu1(Math.min(edgePitchDeg, 90));
  const mu3 = edgePitchDeg > 60 ? 0 : snowShapeMu3(brief.riseM, brief.spanM);
  const muUniform = Math.max(mu1, 0.75 * mu3);
  const snowKPa = muUniform * brief.snowGroundKPa;
  const leadingVariable = snowKPa >= brief.imposedRoofKPa ? "snow" : "imposed";
  const { heightM: windHeightM, peakKPa: peakWindKPa } = domeWindReference(brief);
  return {
    mu1,
    mu3,
    muUniform,
    snowKPa,
    imposedKPa: brief.imposedRoofKPa,
    leadingVariableKPa: Math.max(snowKPa, brief.imposedRoofKPa),
    leadingVariable,
    servicesKPa: brief.servicesKPa,
    windHeightM,
    peakWindKPa,
    upliftKPa: brief.upliftCoefficient * peakWindKPa,
  };
}

/** Design pressures for a roof with a given permanent load G_k (self-weight + services), kPa. */
export interface DesignPressures {
  gravity: UlsResult;
  /** γ_G,inf G − γ_Q W; negative is net uplift. */
  upliftNetKPa: number;
  /** Characteristic variable load for serviceability (leading variable), kPa. */
  slsVariableKPa: number;
}

/** ULS gravity, ULS uplift and SLS variable pressures for a permanent load G_k, kPa. */
export function designPressures(brief: Brief, actions: RoofActions, permanentKPa: number): DesignPressures {
  return {
    gravity: ulsGravity(permanentKPa, actions.leadingVariableKPa, 0, brief.factors, brief.ulsExpression),
    upliftNetKPa: ulsUplift(permanentKPa, actions.upliftKPa, brief.factors),
    slsVariableKPa: actions.leadingVariableKPa,
  };
}
