import type { Brief } from "../../brief";
import type { RoofActions } from "../../loads/roof-actions";
import { ulsFactors } from "../../loads/uls-factors";
import { sphericalMembraneForces } from "../../mechanics/spherical-membrane";
import { zoellyPressurePa, zoellyThicknessM } from "../../mechanics/shell-buckling";
import { REINFORCED_CONCRETE_DENSITY_KG_PER_M3 } from "../../mechanics/concrete";
import { kPaFromKgPerM2 } from "../../mechanics/gravity";

/** Poisson's ratio of uncracked concrete, EN 1992-1-1 §3.1.3(4). */
export const CONCRETE_POISSON = 0.2;

export interface ShellInputs {
  brief: Brief;
  actions: RoofActions;
  radiusM: number;
  capAngleRad: number;
  /** Smallest thickness that can be built, m. */
  minThicknessM: number;
  /** Long-term modulus E_cm/(1 + φ), Pa. */
  effectiveModulusPa: number;
  knockDown: number;
  /** f_cd, Pa. */
  designStrengthPa: number;
  /** Finishes (waterproofing, insulation) per m² of surface, kPa. */
  finishesKPa: number;
  /** Thickness step the shell is rounded up to, m. */
  stepM: number;
}

export interface ShellThickness {
  thicknessM: number;
  /** Which criterion set the thickness. */
  governing: "constructable minimum" | "buckling" | "membrane compression";
  bucklingThicknessM: number;
  compressionThicknessM: number;
  /** ULS normal pressure at the crown (surface + plan loads), Pa. */
  designPressurePa: number;
  /** k·p_cl at the chosen thickness, Pa. */
  bucklingCapacityPa: number;
  /** Largest membrane compression, N/m (positive number). */
  maxCompressionNPerM: number;
  /** Largest hoop tension (beyond 51.8°), N/m; 0 when none. */
  maxHoopTensionNPerM: number;
  /** ULS and SLS meridional force at the edge, N/m (negative). */
  edgeMeridionalUlsNPerM: number;
  edgeMeridionalSlsNPerM: number;
  expression: string;
}

/**
 * Thickness of a spherical concrete shell for an assumed self-weight (shell + finishes, kPa of
 * surface): the largest of the constructable minimum, buckling (p ≤ k·p_cl with the Zoelly
 * pressure at E_eff = E_cm/(1 + φ), solved for t: t = R √(p √(3(1 − ν²)) / (2 k E_eff))) and
 * membrane compression N/t ≤ f_cd (Timoshenko & Woinowsky-Krieger ch. 14), rounded up to the step.
 */
export function shellThickness(input: ShellInputs, selfWeightKPa: number): ShellThickness {
  const { brief, actions, radiusM: R, capAngleRad: phi0 } = input;
  const variableKPa = actions.leadingVariableKPa;
  const f = ulsFactors(brief, selfWeightKPa + actions.servicesKPa, variableKPa);
  const surfacePa = f.permanent * selfWeightKPa * 1000;
  const planPa = (f.permanent * actions.servicesKPa + f.variable * variableKPa) * 1000;
  const designPressurePa = surfacePa + planPa;
  const bucklingThicknessM = zoellyThicknessM(designPressurePa, input.effectiveModulusPa, R, CONCRETE_POISSON, input.knockDown);
  let maxCompression = 0;
  let maxHoopTension = 0;
  const steps = 24;
  for (let i = 0; i <= steps; i++) {
    const n = sphericalMembraneForces(surfacePa, planPa, R, (phi0 * i) / steps);
    maxCompression = Math.max(maxCompression, -n.meridionalNPerM, -n.hoopNPerM);
    maxHoopTension = Math.max(maxHoopTension, n.hoopNPerM);
  }
  const compressionThicknessM = maxCompression / input.designStrengthPa;
  const raw = Math.max(input.minThicknessM, bucklingThicknessM, compressionThicknessM);
  const thicknessM = Math.ceil(raw / input.stepM - 1e-9) * input.stepM;
  const governing = raw === input.minThicknessM ? "constructable minimum" : raw === bucklingThicknessM ? "buckling" : "membrane compression";
  const sls = sphericalMembraneForces(selfWeightKPa * 1000, (actions.servicesKPa + variableKPa) * 1000, R, phi0);
  return {
    thicknessM,
    governing,
    bucklingThicknessM,
    compressionThicknessM,
    designPressurePa,
    bucklingCapacityPa: input.knockDown * zoellyPressurePa(input.effectiveModulusPa, thicknessM, R, CONCRETE_POISSON),
    maxCompressionNPerM: maxCompression,
    maxHoopTensionNPerM: maxHoopTension,
    edgeMeridionalUlsNPerM: sphericalMembraneForces(surfacePa, planPa, R, phi0).meridionalNPerM,
    edgeMeridionalSlsNPerM: sls.meridionalNPerM,
    expression: f.expression,
  };
}

/** Self-weight of a shell of thickness t plus finishes, kPa of surface (25 kN/m³, EN 1991-1-1 Table A.1). */
export function shellSelfWeightKPa(thicknessM: number, finishesKPa: number): number {
  return kPaFromKgPerM2(REINFORCED_CONCRETE_DENSITY_KG_PER_M3 * thicknessM) + finishesKPa;
}
