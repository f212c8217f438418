import type { MaterialId } from "../materials";

/** Units a take-off quantity can be measured in. Steel, cable and rebar by tonne; fabric and cladding by m². */
export type QuantityUnit = "t" | "m" | "m2" | "m3" | "nr";

/**
 * Which part of the building a take-off row belongs to, one accounting for every scheme: the roof
 * structure, the perimeter support (rings, edge beams), the substructure (anchors, columns,
 * foundations — an allowance, not designed) and the envelope (fabric, cladding, deck).
 */
export type TakeoffGroup = "structure" | "perimeter" | "substructure" | "envelope";

/**
 * One line of a scheme's quantity take-off. Carbon reads `material` and `massKg`; cost reads
 * `costItem`, `quantity` and `unit`. A row with no material (formwork, say) carries no carbon.
 */
export interface TakeoffRow {
  /** Element of the scheme, e.g. "ridge cables", "posts", "shell". */
  element: string;
  /** Material for embodied carbon, or null for an operation with no material of its own (formwork). */
  material: MaterialId | null;
  /** Rate-table item the row is priced with. */
  costItem: CostItemId;
  /** Quantity in `unit`. */
  quantity: number;
  unit: QuantityUnit;
  /** Mass of material, kg (0 for rows with no material). */
  massKg: number;
  /** Its group; assembleDesign fills it by `takeoffGroupOf` where a scheme leaves it out. */
  group?: TakeoffGroup;
}

/** The items of the rate table a take-off row can be priced with, each with the unit its rate is per. */
export const COST_ITEMS = [
  { id: "steel-lattice", label: "Steel lattice members and nodes, supplied, fabricated and erected", unit: "t" },
  { id: "steel-truss", label: "Long-span steel trusses, supplied, fabricated and erected", unit: "t" },
  { id: "steel-secondary", label: "Secondary steel: purlins, bracing", unit: "t" },
  { id: "steel-column", label: "Perimeter columns", unit: "t" },
  { id: "steel-ring", label: "Steel compression or tension ring (box or plate)", unit: "t" },
  { id: "steel-mast", label: "Masts and posts, fabricated and erected", unit: "t" },
  { id: "cable", label: "Cable strand with sockets and fittings, installed and stressed", unit: "t" },
  { id: "fabric-ptfe-glass", label: "PTFE-coated glass fabric, supplied and installed", unit: "m2" },
  { id: "fabric-pvc-polyester", label: "PVC-coated polyester fabric, supplied and installed", unit: "m2" },
  { id: "etfe-cushion", label: "ETFE cushion roofing, supplied and installed", unit: "m2" },
  { id: "glazing", label: "Glazed roof panels", unit: "m2" },
  { id: "metal-deck", label: "Insulated metal roof deck", unit: "m2" },
  { id: "concrete", label: "In-situ concrete, placed", unit: "m3" },
  { id: "rebar", label: "Reinforcement, fixed", unit: "t" },
  { id: "formwork", label: "Formwork and falsework to curved soffit", unit: "m2" },
  { id: "prestressing", label: "Prestressing tendons, stressed and grouted", unit: "t" },
  { id: "glulam-structure", label: "Glulam members, supplied, machined and erected", unit: "m3" },
  { id: "timber-deck", label: "Timber board deck, supplied and fixed", unit: "m2" },
  { id: "steel-connectors", label: "Steel connectors for timber (hubs, plates, dowels)", unit: "t" },
  { id: "roofing-membrane", label: "Single-ply roofing membrane on a deck", unit: "m2" },
  { id: "anchor", label: "Ground anchors and dead-weight foundations (concrete)", unit: "m3" },
] as const satisfies readonly { id: string; label: string; unit: QuantityUnit }[];

export type CostItemId = (typeof COST_ITEMS)[number]["id"];
