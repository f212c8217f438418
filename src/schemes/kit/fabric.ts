import type { Catalogue, Fabric } from "../../catalogue/types";
import { findById } from "./find";
import type { CostItemId } from "../../takeoff/takeoff-row";
import type { Check } from "../types";
import type { OptionDeclaration } from "./define-options";
import { check } from "./assemble";

/** Fabric ids offered by the tension schemes (rows of data/fabrics.csv). */
export const FABRIC_CHOICES = [
  { value: "ptfe-glass-iii", label: "PTFE-coated glass, medium" },
  { value: "ptfe-glass-v", label: "PTFE-coated glass, heavy" },
  { value: "pvc-polyester-iii", label: "PVC-coated polyester, type III" },
  { value: "pvc-polyester-v", label: "PVC-coated polyester, type V" },
  { value: "etfe-250", label: "ETFE foil 250 μm, single layer" },
] as const;

/** The fabric with this id from the catalogue. @throws RangeError when the catalogue has no such fabric */
export function findFabric(catalogue: Catalogue, id: string): Fabric {
  return findById(catalogue.fabrics, id, "fabric");
}

/** The rate-table item a fabric is priced with. */
export function fabricCostItem(fabric: Fabric): CostItemId {
  if (fabric.material === "fabric-ptfe-glass") return "fabric-ptfe-glass";
  if (fabric.material === "fabric-pvc-polyester") return "fabric-pvc-polyester";
  return "etfe-cushion";
}

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
 * cross-checks it (issue 13). The closed form is the default: with the 3D analysis on by default the
 * risk page (one design per draw) and the span study took over a minute on this machine; the 3D
 * analysis is asked for per study, and shown on the compare page when it ran.
 */
export const ANALYSIS_OPTION = {
  analysis: { kind: "select", label: "Analysis", choices: [{ value: "3d", label: "3D nonlinear (sizes from the analysed forces)" }, { value: "closed-form", label: "Closed form only" }], default: "closed-form", source: "issue 13: the 3D analysis designs, the closed form seeds and cross-checks it" },
} as const satisfies Record<string, OptionDeclaration>;

/** Largest displacement under the analysed design combinations ÷ span allowed (common practice for cable roofs, no source; ULS loads, an upper bound of the service value). */
export const CABLE_ROOF_DEFLECTION_RATIO = 1 / 100;

/** Allowable membrane force of a fabric under characteristic load: the weaker direction's strength / factor, N/m. */
export function fabricAllowableNPerM(fabric: Fabric, strengthFactor: number): number {
  return Math.min(fabric.tensileWarpNPerM, fabric.tensileWeftNPerM) / strengthFactor;
}

/** Fabric bought for a roof surface: area with seams and waste, m², and its mass, kg. */
export function fabricCover(surfaceM2: number, allowancePct: number, fabric: Fabric): { areaM2: number; massKg: number } {
  const areaM2 = surfaceM2 * (1 + allowancePct / 100);
  return { areaM2, massKg: areaM2 * fabric.massKgPerM2 };
}

/** The two fabric panel checks, gravity and uplift, of the widest panel against the allowable force. */
export function fabricPanelChecks(gravityNPerM: number, upliftNPerM: number, allowableNPerM: number): Check[] {
  const clause = "n = p s²/(8f) (Irvine 1981 ch. 1) against strength / factor (common practice)";
  return [check("fabric panel, gravity", clause, gravityNPerM, allowableNPerM, "N/m"), check("fabric panel, uplift", clause, upliftNPerM, allowableNPerM, "N/m")];
}
