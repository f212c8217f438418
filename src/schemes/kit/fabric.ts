import type { Catalogue, Fabric } from "../../catalogue/types";
import { findById } from "./find";
import type { CostItemId } from "../../takeoff/takeoff-row";
import type { Check } from "../types";
import { check } from "./assemble";

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
