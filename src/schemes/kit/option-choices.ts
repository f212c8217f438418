// The option declarations and choices several schemes share. Declarations only (no design code):
// the schemes' declaration.ts files reach them through ./declare.ts on the main thread.
import type { OptionDeclaration } from "./define-options";

/** Fabric ids offered by the tension schemes (rows of data/fabrics.csv). */
export const FABRIC_CHOICES = [
  { value: "ptfe-glass-iii", label: "PTFE-coated glass, medium" },
  { value: "ptfe-glass-v", label: "PTFE-coated glass, heavy" },
  { value: "pvc-polyester-iii", label: "PVC-coated polyester, type III" },
  { value: "pvc-polyester-v", label: "PVC-coated polyester, type V" },
  { value: "etfe-250", label: "ETFE foil 250 μm, single layer" },
] as const;

/** The fabric option of the tension schemes. */
export const FABRIC_OPTION = {
  fabric: { kind: "select", label: "Fabric", choices: FABRIC_CHOICES, default: "ptfe-glass-iii", source: "data/fabrics.csv" },
} as const satisfies Record<string, OptionDeclaration>;

/** Options both tension schemes have, with the same ranges, defaults and sources: prestress, strands, fabric, steel. */
export const TENSION_COMMON_OPTIONS = {
  residualPrestress: { kind: "number", label: "Residual prestress under ULS", unit: "", min: 0, max: 0.5, step: 0.05, default: 0.1, source: "common practice, no source" },
  // 1.0 is the safe side
  gammaR: { kind: "number", label: "γR for strands", unit: "", min: 0.9, max: 1.5, step: 0.05, default: 1.0, source: "EN 1993-1-11:2006 §6.2 (from memory)" },
  fabricAllowancePct: { kind: "number", label: "Fabric seams and waste", unit: "%", min: 0, max: 30, step: 1, default: 10, source: "common practice, no source", uncertainty: "allowance" },
  fabricSagRatio: { kind: "number", label: "Fabric panel sag / span", unit: "", min: 0.04, max: 0.15, step: 0.01, default: 0.1, source: "common practice, no source" },
  // under long-term load
  fabricStrengthFactor: { kind: "number", label: "Fabric strength factor", unit: "", min: 2, max: 10, step: 0.5, default: 5, source: "common practice for coated fabrics (from memory)" },
  // S355, t ≤ 40 mm
  steelYieldMPa: { kind: "number", label: "Steel yield strength", unit: "MPa", min: 235, max: 460, step: 5, default: 355, source: "EN 1993-1-1 Table 3.1" },
} as const satisfies Record<string, OptionDeclaration>;

/**
 * The tension roofs' choice of analysis: the 3D analysis designs, the closed form seeds and
 * cross-checks it (issue 13). The 3D analysis is the default: the proportion search screens its
 * candidates by the closed form (the schemes' screeningOptions) and only the chosen proportions are
 * designed in 3D; the closed form alone stays a choice (the fast first estimate).
 */
export const ANALYSIS_OPTION = {
  analysis: { kind: "select", label: "Analysis", choices: [{ value: "3d", label: "3D nonlinear (sizes from the analysed forces)" }, { value: "closed-form", label: "Closed form only" }], default: "3d", source: "issue 13: the 3D analysis designs, the closed form seeds and cross-checks it" },
} as const satisfies Record<string, OptionDeclaration>;

/** Roof coverings of data/claddings.csv offered to the rigid schemes. */
export const CLADDING_CHOICES = [
  { value: "metal-deck", label: "Insulated metal deck" },
  { value: "etfe-cushion", label: "ETFE cushions" },
  { value: "glazing", label: "Laminated glazing" },
] as const;

/** Structural steel grades offered (their strengths: STEEL_GRADES in ./steel.ts). */
export const STEEL_GRADE_CHOICES = [
  { value: "S275", label: "S275" },
  { value: "S355", label: "S355" },
  { value: "S460", label: "S460" },
] as const;
