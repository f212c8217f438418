import type { Catalogue, Cladding } from "../../catalogue/types";
import { findById } from "./find";
import type { CostItemId } from "../../takeoff/takeoff-row";

/** The cladding with this id. @throws RangeError when the catalogue has none */
export function findCladding(catalogue: Catalogue, id: string): Cladding {
  return findById(catalogue.claddings, id, "cladding");
}

/** The rate-table item a cladding is priced with. */
export function claddingCostItem(cladding: Cladding): CostItemId {
  if (cladding.material === "etfe-foil") return "etfe-cushion";
  if (cladding.material === "glazing") return "glazing";
  return "metal-deck";
}
