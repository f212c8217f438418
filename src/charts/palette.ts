// The palettes, each with fixed meanings on every page and export: schemes (each scheme declares
// its own), materials (one colour per material id, in its kind's family), life-cycle modules, and
// parts (elements of a cost). Every material, module and part colour reaches at least 3:1 against
// white (WCAG 2.1 SC 1.4.11, tested), and no material colour is a scheme colour.
import type { SchemeId } from "../schemes/types";
import { SCHEME_DECLARATIONS } from "../schemes/declarations";
import { MATERIALS, materialInfo, type MaterialId, type MaterialKind } from "../materials";

/** One colour per scheme, the same on every page and export: each scheme declares its own (colour-blind-safe set, Okabe–Ito). */
export const SCHEME_COLOURS: Readonly<Record<SchemeId, string>> = Object.fromEntries(SCHEME_DECLARATIONS.map((m) => [m.id, m.colour])) as Record<SchemeId, string>;

/** One colour per material: steels in blues, cable violet, rebar rust, concretes in greys, fabrics in teals and greens, claddings plum and brick, timber ochre. */
export const MATERIAL_COLOURS: Readonly<Record<MaterialId, string>> = {
  "steel-hot-finished-hollow": "#1f4e79",
  "steel-open-section": "#3b6fa0",
  "steel-cold-formed": "#56708f",
  "steel-plate": "#2f3e4e",
  "steel-strand": "#6a3d9a",
  rebar: "#9a4a12",
  "concrete-c30-37": "#5c5c5c",
  "concrete-c30-37-ggbs": "#6e6a4f",
  "concrete-c40-50": "#3f3f3f",
  "concrete-c40-50-ggbs": "#55523a",
  "fabric-ptfe-glass": "#00707a",
  "fabric-pvc-polyester": "#3d7a1e",
  "etfe-foil": "#2a7f7f",
  glazing: "#8f3b76",
  "insulated-metal-deck": "#9e4a3a",
  glulam: "#8a6100",
};

/** The colour of a material kind (the first material of that kind), for charts by kind. */
export const MATERIAL_KIND_COLOURS: Readonly<Record<MaterialKind, string>> = Object.fromEntries(
  [...new Set(MATERIALS.map((m) => m.kind))].map((kind) => [kind, MATERIAL_COLOURS[MATERIALS.find((m) => m.kind === kind)?.id as MaterialId]]),
) as Record<MaterialKind, string>;

/** A material a page added (not in src/materials.ts) is drawn in this dark grey. */
export const OTHER_MATERIAL_COLOUR = "#4d4d4d";

/** The colour of a material id (a page may add ids the bundled list lacks). */
export function materialColour(id: string): string {
  return materialInfo(id) ? MATERIAL_COLOURS[id as MaterialId] : OTHER_MATERIAL_COLOUR;
}

/** The life-cycle modules (EN 15978 codes), their words and colours: product and construction stages in blues, end of life grey; module D and biogenic storage, reported apart, in green and brown. */
export const MODULE_PALETTE = [
  { code: "A1–A3", label: "A1–A3 product", colour: "#1d4e89" },
  { code: "A4", label: "A4 transport", colour: "#4a78b0" },
  { code: "A5", label: "A5 site wastage", colour: "#9a5b00" },
  { code: "C1–C4", label: "C1–C4 end of life", colour: "#5f5f5f" },
  { code: "D", label: "D beyond the life cycle (apart)", colour: "#2f7d32" },
  { code: "biogenic", label: "Biogenic CO2 stored (apart)", colour: "#7b4f2a" },
] as const;

export type ModuleCode = (typeof MODULE_PALETTE)[number]["code"];

/** The colour of a module by its code. */
export function moduleColour(code: ModuleCode): string {
  return MODULE_PALETTE.find((m) => m.code === code)?.colour ?? OTHER_MATERIAL_COLOUR;
}
