import type { Catalogue, Fabric } from "../catalogue/types";
import type { CostItemId } from "../takeoff/takeoff-row";

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
