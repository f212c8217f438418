import { sphericalMembraneForces } from "../../mechanics/spherical-membrane";
import { heaviestCase, membraneLoadCases, type UniformCombination } from "../kit";
import { zoellyPressurePa, zoellyThicknessM } from "../../mechanics/shell-buckling";
import { REINFORCED_CONCRETE_DENSITY_KG_PER_M3 } from "../../mechanics/concrete";
import { kPaFromKgPerM2 } from "../../mechanics/gravity";

/** Poisson's ratio of uncracked concrete, EN 1992-1-1 §3.1.3(4). */
export const CONCRETE_POISSON = 0.2;

export interface ShellInputs {
  /** The design combinations with their uniform equivalents (the membrane method takes uniform loads). */
  combinations: readonly UniformCombination[];
  /** Services and hung load, permanent, kPa of plan. */
  servicesKPa: number;
  /** Characteristic variable load for serviceability, kPa of plan. */
  slsVariableKPa: number;
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
  /** The gravity combination of largest pressure, which sets the thickness. */
  governingCase: string;
}

/** The membrane state of the heaviest combination at a self-weight: its pressures, the largest compression and hoop tension, and the edge forces. */
export function shellMembraneState(input: ShellInputs, selfWeightKPa: number) {
  const R = input.radiusM;
  const phi0 = input.capAngleRad;
  const heaviest = heaviestCase(membraneLoadCases(input.combinations, selfWeightKPa, input.servicesKPa));
  const { surfacePa, planPa } = heaviest;
  let maxCompressionNPerM = 0;
  let maxHoopTensionNPerM = 0;
  const steps = 24;
  for (let i = 0; i <= steps; i++) {
    const n = sphericalMembraneForces(surfacePa, planPa, R, (phi0 * i) / steps);
    maxCompressionNPerM = Math.max(maxCompressionNPerM, -n.meridionalNPerM, -n.hoopNPerM);
    maxHoopTensionNPerM = Math.max(maxHoopTensionNPerM, n.hoopNPerM);
  }
  const sls = sphericalMembraneForces(selfWeightKPa * 1000, (input.servicesKPa + input.slsVariableKPa) * 1000, R, phi0);
  return {
    designPressurePa: surfacePa + planPa,
    maxCompressionNPerM,
    maxHoopTensionNPerM,
    edgeMeridionalUlsNPerM: sphericalMembraneForces(surfacePa, planPa, R, phi0).meridionalNPerM,
    edgeMeridionalSlsNPerM: sls.meridionalNPerM,
    governingCase: heaviest.name,
  };
}

/**
 * Thickness of a spherical concrete shell for an assumed self-weight (shell + finishes, kPa of
 * surface): the largest of the constructable minimum, buckling (p ≤ k·p_cl with the Zoelly
 * pressure at E_eff = E_cm/(1 + φ), solved for t: t = R √(p √(3(1 − ν²)) / (2 k E_eff))) and
 * membrane compression N/t ≤ f_cd (Timoshenko & Woinowsky-Krieger ch. 14), rounded up to the step.
 */
export function shellThickness(input: ShellInputs, selfWeightKPa: number): ShellThickness {
  const R = input.radiusM;
  const m = shellMembraneState(input, selfWeightKPa);
  const bucklingThicknessM = zoellyThicknessM(m.designPressurePa, input.effectiveModulusPa, R, CONCRETE_POISSON, input.knockDown);
  const compressionThicknessM = m.maxCompressionNPerM / input.designStrengthPa;
  const raw = Math.max(input.minThicknessM, bucklingThicknessM, compressionThicknessM);
  const thicknessM = Math.ceil(raw / input.stepM - 1e-9) * input.stepM;
  const governing = raw === input.minThicknessM ? "constructable minimum" : raw === bucklingThicknessM ? "buckling" : "membrane compression";
  return {
    ...m,
    thicknessM,
    governing,
    bucklingThicknessM,
    compressionThicknessM,
    bucklingCapacityPa: input.knockDown * zoellyPressurePa(input.effectiveModulusPa, thicknessM, R, CONCRETE_POISSON),
  };
}

/** Self-weight of a shell of thickness t plus finishes, kPa of surface (25 kN/m³, EN 1991-1-1 Table A.1). */
export function shellSelfWeightKPa(thicknessM: number, finishesKPa: number): number {
  return kPaFromKgPerM2(REINFORCED_CONCRETE_DENSITY_KG_PER_M3 * thicknessM) + finishesKPa;
}
