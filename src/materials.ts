/**
 * The materials a take-off can name. Carbon factors and cost know these ids; schemes name them on
 * their take-off rows. The `kind` groups them for the comparison table (steel, cable, fabric…).
 */

/**
 * The kinds of material, in the order tables list their tonnages; `digits` is how many decimals a
 * table shows their tonnes with (fabric and foil are light).
 */
export const MATERIAL_KINDS = [
  { kind: "steel", label: "Steel", digits: 0 },
  { kind: "cable", label: "Cable", digits: 0 },
  { kind: "fabric", label: "Fabric", digits: 1 },
  { kind: "concrete", label: "Concrete", digits: 0 },
  { kind: "rebar", label: "Rebar", digits: 0 },
  { kind: "cladding", label: "Cladding", digits: 0 },
  { kind: "timber", label: "Timber", digits: 0 },
] as const;

export type MaterialKind = (typeof MATERIAL_KINDS)[number]["kind"];

export interface MaterialInfo {
  id: string;
  label: string;
  kind: MaterialKind;
}

export const MATERIALS = [
  { id: "steel-hot-finished-hollow", label: "Steel, hot-finished hollow section", kind: "steel" },
  { id: "steel-open-section", label: "Steel, hot-rolled open section", kind: "steel" },
  { id: "steel-cold-formed", label: "Steel, cold-formed section (purlins, deck)", kind: "steel" },
  { id: "steel-plate", label: "Steel plate (rings, boxes, nodes)", kind: "steel" },
  { id: "steel-strand", label: "Steel strand and wire rope", kind: "cable" },
  { id: "rebar", label: "Reinforcing steel", kind: "rebar" },
  { id: "concrete-c30-37", label: "Concrete C30/37, CEM I", kind: "concrete" },
  { id: "concrete-c30-37-ggbs", label: "Concrete C30/37, 50 % GGBS", kind: "concrete" },
  { id: "concrete-c40-50", label: "Concrete C40/50, CEM I", kind: "concrete" },
  { id: "concrete-c40-50-ggbs", label: "Concrete C40/50, 50 % GGBS", kind: "concrete" },
  { id: "fabric-ptfe-glass", label: "PTFE-coated glass fabric", kind: "fabric" },
  { id: "fabric-pvc-polyester", label: "PVC-coated polyester fabric", kind: "fabric" },
  { id: "etfe-foil", label: "ETFE foil", kind: "fabric" },
  { id: "glazing", label: "Glazing (laminated glass)", kind: "cladding" },
  { id: "insulated-metal-deck", label: "Insulated metal roof deck", kind: "cladding" },
  { id: "glulam", label: "Glued laminated timber", kind: "timber" },
] as const satisfies readonly MaterialInfo[];

export type MaterialId = (typeof MATERIALS)[number]["id"];

const BY_ID = new Map<string, MaterialInfo>(MATERIALS.map((m) => [m.id, m]));

/** The material with this id, or undefined. */
export function materialInfo(id: string): MaterialInfo | undefined {
  return BY_ID.get(id);
}

export function isMaterialId(id: string): id is MaterialId {
  return BY_ID.has(id);
}
