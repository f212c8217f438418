import type { Catalogue, Fabric } from "../catalogue/types";
import type { CostItemId } from "../takeoff/takeoff-row";
import type { OptionSpec } from "./types";

/** Fabric ids offered by the tension schemes (rows of data/fabrics.csv). */
export const FABRIC_CHOICES = [
  { value: "ptfe-glass-iii", label: "PTFE-coated glass, medium" },
  { value: "ptfe-glass-v", label: "PTFE-coated glass, heavy" },
  { value: "pvc-polyester-iii", label: "PVC-coated polyester, type III" },
  { value: "pvc-polyester-v", label: "PVC-coated polyester, type V" },
  { value: "etfe-250", label: "ETFE foil 250 μm, single layer" },
] as const;

/** The fabric with this id from the catalogue. @throws when the catalogue has no such fabric */
export function findFabric(catalogue: Catalogue, id: string): Fabric {
  const fabric = catalogue.fabrics.find((f) => f.id === id);
  if (!fabric) throw new RangeError(`invalid fabric: ${id} (expected one of ${catalogue.fabrics.map((f) => f.id).join(", ")})`);
  return fabric;
}

/** The rate-table item a fabric is priced with. */
export function fabricCostItem(fabric: Fabric): CostItemId {
  if (fabric.material === "fabric-ptfe-glass") return "fabric-ptfe-glass";
  if (fabric.material === "fabric-pvc-polyester") return "fabric-pvc-polyester";
  return "etfe-cushion";
}

/** Options both tension schemes have, with the same ranges and sources: prestress, strands, fabric, steel. */
export const TENSION_COMMON_OPTIONS: readonly OptionSpec[] = [
  { key: "residualPrestress", label: "Residual prestress under ULS", kind: "number", unit: "", min: 0, max: 0.5, step: 0.05, source: "common practice, no source" },
  { key: "gammaR", label: "γR for strands", kind: "number", unit: "", min: 0.9, max: 1.5, step: 0.05, source: "EN 1993-1-11:2006 §6.2 (from memory)" },
  { key: "fabricAllowancePct", label: "Fabric seams and waste", kind: "number", unit: "%", min: 0, max: 30, step: 1, source: "common practice, no source" },
  { key: "fabricSagRatio", label: "Fabric panel sag / span", kind: "number", unit: "", min: 0.04, max: 0.15, step: 0.01, source: "common practice, no source" },
  { key: "fabricStrengthFactor", label: "Fabric strength factor", kind: "number", unit: "", min: 2, max: 10, step: 0.5, source: "common practice for coated fabrics (from memory)" },
  { key: "steelYieldMPa", label: "Steel yield strength", kind: "number", unit: "MPa", min: 235, max: 460, step: 5, source: "EN 1993-1-1 Table 3.1" },
];
