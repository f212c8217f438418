import type { Catalogue, Fabric } from "../catalogue/types";
import type { CostItemId } from "../takeoff/takeoff-row";
import type { OptionSpec, SchemeOptions } from "./types";

/** Fabric ids offered by the tension schemes (rows of data/fabrics.csv). */
export const FABRIC_CHOICES = [
  { value: "ptfe-glass-iii", label: "PTFE-coated glass, medium" },
  { value: "ptfe-glass-v", label: "PTFE-coated glass, heavy" },
  { value: "pvc-polyester-iii", label: "PVC-coated polyester, type III" },
  { value: "pvc-polyester-v", label: "PVC-coated polyester, type V" },
  { value: "etfe-250", label: "ETFE foil 250 μm, single layer" },
] as const;

/**
 * Checks every option against its spec before any work: numbers finite and in range (whole where
 * asked), selects one of their choices, toggles boolean.
 * @throws RangeError naming the option, the value and what is allowed
 */
export function validateOptions(specs: readonly OptionSpec[], options: SchemeOptions): void {
  for (const spec of specs) {
    const value = options[spec.key];
    if (spec.kind === "number") {
      if (typeof value !== "number" || !(value >= spec.min && value <= spec.max) || (spec.integer === true && !Number.isInteger(value))) {
        throw new RangeError(`invalid ${spec.key}: ${String(value)}${spec.unit ? " " + spec.unit : ""} (expected ${spec.integer ? "a whole number " : ""}${spec.min} to ${spec.max})`);
      }
    } else if (spec.kind === "select") {
      if (typeof value !== "string" || !spec.choices.some((c) => c.value === value)) {
        throw new RangeError(`invalid ${spec.key}: ${String(value)} (expected one of ${spec.choices.map((c) => c.value).join(", ")})`);
      }
    } else if (typeof value !== "boolean") {
      throw new RangeError(`invalid ${spec.key}: ${String(value)} (expected true or false)`);
    }
  }
}

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

/** Standard gravity, m/s² (ISO 80000-3 conventional value). */
export const GRAVITY_M_PER_S2 = 9.80665;

/** Plan pressure, kPa, of a mass spread over an area. */
export function kPaOfMass(massKg: number, areaM2: number): number {
  return (massKg * GRAVITY_M_PER_S2) / areaM2 / 1000;
}
