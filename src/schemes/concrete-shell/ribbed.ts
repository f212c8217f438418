import { ribbedPanelBucklingNPerM, ribbedShellStiffness } from "../../mechanics/ribbed-shell";
import { continuumShellPressurePa } from "../../mechanics/shell-buckling";
import { CONCRETE_POISSON, shellMembraneState, type ShellInputs } from "./sizing";

/** Deepest rib tried, m (common practice, no source: deeper ribs are beams, not a ribbed shell). */
export const MAX_RIB_DEPTH_M = 3;
/** Rib depth step, m. */
const RIB_STEP_M = 0.025;
/** Rib width: a third of the depth, at least 200 mm for two bars and cover (common practice, no source). */
export function ribWidthM(depthM: number): number {
  return Math.max(0.2, depthM / 3);
}

export interface RibbedShellResult {
  /** Shell between the ribs, m, and what set it. */
  thicknessM: number;
  governing: "constructable minimum" | "panel buckling" | "membrane compression";
  ribSpacingM: number;
  ribDepthM: number;
  ribWidthM: number;
  /** Concrete per m² of shell surface (shell and ribs), m. */
  equivalentThicknessM: number;
  /** Membrane force the panel carries, and its flat-plate buckling force, N/m. */
  panelForceNPerM: number;
  panelCapacityNPerM: number;
  designPressurePa: number;
  /** k·p_cl of the ribbed continuum, Pa. */
  bucklingCapacityPa: number;
  maxCompressionNPerM: number;
  maxHoopTensionNPerM: number;
  edgeMeridionalUlsNPerM: number;
  edgeMeridionalSlsNPerM: number;
  governingCase: string;
  /** Why no rib depth up to MAX_RIB_DEPTH_M suffices ("" when one does). */
  failure: string;
}

/**
 * A shell ribbed by a three-way grid of ribs at spacing L, for an assumed self-weight (kPa of
 * surface): the shell between the ribs from the constructable minimum, membrane compression
 * N/t ≤ f_cd (the shell alone, ribs ignored) and panel buckling (flat-plate lower bound, long-term
 * modulus); then the shallowest rib (25 mm steps, width ribWidthM) whose equivalent continuum
 * (ribbedShellStiffness) gives k·4√(DB)/R² ≥ p.
 */
export function ribbedShell(input: ShellInputs, ribSpacingM: number, selfWeightKPa: number): RibbedShellResult {
  const m = shellMembraneState(input, selfWeightKPa);
  const E = input.effectiveModulusPa;
  const nu = CONCRETE_POISSON;
  const panelThicknessM = Math.cbrt((m.maxCompressionNPerM * ribSpacingM * ribSpacingM * 12 * (1 - nu * nu)) / (2 * Math.PI * Math.PI * E));
  const compressionThicknessM = m.maxCompressionNPerM / input.designStrengthPa;
  const raw = Math.max(input.minThicknessM, panelThicknessM, compressionThicknessM);
  const t = Math.ceil(raw / input.stepM - 1e-9) * input.stepM;
  const governing = raw === input.minThicknessM ? "constructable minimum" : raw === panelThicknessM ? "panel buckling" : "membrane compression";
  const capacityAt = (depthM: number) => {
    const s = ribbedShellStiffness(E, nu, t, ribWidthM(depthM), depthM, ribSpacingM);
    return { s, pressurePa: input.knockDown * continuumShellPressurePa(s.bendingNm, s.membraneNPerM, input.radiusM) };
  };
  let depthM = 0;
  let at = capacityAt(0);
  while (at.pressurePa < m.designPressurePa && depthM < MAX_RIB_DEPTH_M - 1e-9) {
    depthM = Math.min(MAX_RIB_DEPTH_M, depthM + RIB_STEP_M);
    at = capacityAt(depthM);
  }
  const failure =
    at.pressurePa < m.designPressurePa
      ? `ribs ${MAX_RIB_DEPTH_M} m deep at ${ribSpacingM} m give only ${(at.pressurePa / 1000).toFixed(1)} of ${(m.designPressurePa / 1000).toFixed(1)} kPa against general buckling: raise the rise or close the ribs`
      : "";
  return {
    thicknessM: t,
    governing,
    ribSpacingM,
    ribDepthM: depthM,
    ribWidthM: depthM > 0 ? ribWidthM(depthM) : 0,
    equivalentThicknessM: t + at.s.ribVolumePerM2,
    panelForceNPerM: m.maxCompressionNPerM,
    panelCapacityNPerM: ribbedPanelBucklingNPerM(E, nu, t, ribSpacingM),
    designPressurePa: m.designPressurePa,
    bucklingCapacityPa: at.pressurePa,
    maxCompressionNPerM: m.maxCompressionNPerM,
    maxHoopTensionNPerM: m.maxHoopTensionNPerM,
    edgeMeridionalUlsNPerM: m.edgeMeridionalUlsNPerM,
    edgeMeridionalSlsNPerM: m.edgeMeridionalSlsNPerM,
    governingCase: m.governingCase,
    failure,
  };
}
