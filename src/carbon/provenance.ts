import type { FactorRow } from "./factor-table";

/**
 * Where each bundled factor's A1–A3 value can be traced: the published dataset, its version, the
 * row, the declared unit, what the value is valid for and where. Values as read in the datasets
 * (2026-12) and cited in ../shared/reference/carbon-factors.md; a material with no readable source
 * says so. ICE's terms forbid redistributing the database: single values are cited, not shipped.
 */
export type FactorProvenance = {
  material: string;
  /** Short name of the source. */
  source: string;
  /** Dataset and version as published. */
  dataset: string;
  /** Table and row (or sheet and row) the value is read from. */
  row: string;
  /** Declared unit and boundary of the published value. */
  declaredUnit: string;
  /** What the value is valid for (data year, what it includes and leaves out). */
  validity: string;
  geography: string;
  /** The published A1–A3 per kg, or null when no readable source gives one. */
  citedA1a3KgCO2ePerKg: number | null;
  /** The published module D per kg, or null. */
  citedModuleDKgCO2ePerKg: number | null;
  /** Spread across published datasets (low / typical / high), when known. */
  spread?: string;
};

const ICE_DATASET = "Inventory of Carbon and Energy (ICE) V3.0, University of Bath / Circular Ecology; machine-readable edition \"ICE DB Machine Readable V3.0a Beta\" (10 Nov 2019), sheet ICE_DB; data version V3.0 Beta, 30 May 2019";
const ICE_UNIT = "kgCO2e per kg, cradle to gate (A1–A3)";
const ICE_VALIDITY = "Generic average for concept design, 2019 data; replace with the EPD of the product bought";
const CONCRETE_VALIDITY = "Per m³ in ICE, divided here by the row's density; unreinforced; 2019 data";

function ice(material: string, row: string, a1a3: number, moduleD: number | null, geography: string, extra: Partial<FactorProvenance> = {}): FactorProvenance {
  return { material, source: "ICE V3.0", dataset: ICE_DATASET, row, declaredUnit: ICE_UNIT, validity: ICE_VALIDITY, geography, citedA1a3KgCO2ePerKg: a1a3, citedModuleDKgCO2ePerKg: moduleD, ...extra };
}

function unsupported(material: string, what: string): FactorProvenance {
  return { material, source: "none read", dataset: "—", row: "—", declaredUnit: "—", validity: what, geography: "—", citedA1a3KgCO2ePerKg: null, citedModuleDKgCO2ePerKg: null };
}

/** The provenance of each bundled material's factor. */
export const FACTOR_PROVENANCE: readonly FactorProvenance[] = [
  ice("steel-open-section", '"Steel, Section"', 1.55, -0.34, "world average", { spread: "0.91 / 1.55 / 2.45 (range across published datasets)", validity: `${ICE_VALIDITY}; module D at 85 % recovery` }),
  ice("steel-hot-finished-hollow", '"Steel, global seamless tube" (proxy; "Steel, welded pipe" 2.78, module D −1.31)', 2.13, -0.84, "world", { spread: "2.13 / 2.5 / 2.78 (range across published datasets)", validity: `${ICE_VALIDITY}; no ICE row for hot-finished hollow sections: tube rows as proxies` }),
  ice("steel-cold-formed", '"Steel, hot-dip galvanized steel"', 2.76, -1.32, "world", { spread: "2.36 / 2.76 / 3.06 (range across published datasets)" }),
  ice("steel-plate", '"Steel, Plate"', 2.46, -1.16, "world", { spread: "1.13 / 1.9 / 2.46 (range across published datasets)" }),
  ice("steel-strand", '"Steel, Wire rod" (proxy)', 2.27, -1.15, "world", { validity: "Wire rod only: drawing, stranding and galvanising are not included, so the cited value is a floor, not an estimate" }),
  ice("rebar", '"Steel, Rebar" (Europe EAF recycled rebar: 0.73, n 29, range 0.28–1.22)', 1.99, -0.79, "world", { spread: "0.28 / 0.76 / 1.99 (range across published datasets)" }),
  ice("concrete-c30-37", "row 124, RC28/35 CEM I, 325 kg cementitious, 2,400 kg/m³ (nearest row to C30/37): 326.8 kgCO2e/m³", 0.1362, null, "UK", { validity: CONCRETE_VALIDITY, spread: "0.111 / 0.14 / 0.150 (range across published datasets)" }),
  ice("concrete-c30-37-ggbs", "row 184, RC28/35 with about 50 % GGBS, 330 kg cementitious, 2,390 kg/m³: 186.2 kgCO2e/m³", 0.0779, null, "UK", { validity: CONCRETE_VALIDITY, spread: "0.078 / 0.083 / 0.089 (range across published datasets)" }),
  ice("concrete-c40-50", "row 127, C40/50 CEM I, 420 kg cementitious: 413.5 kgCO2e/m³", 0.1723, null, "UK", { validity: CONCRETE_VALIDITY }),
  ice("concrete-c40-50-ggbs", "row 187, C40/50 with 50 % GGBS, 449 kg cementitious: 242.7 kgCO2e/m³", 0.1015, null, "UK", { validity: CONCRETE_VALIDITY }),
  ice("glazing", "toughened glass (n 43, range 1.31–2.44); laminated \"Multi layer safety, unfilled\" 1.556", 1.667, null, "UK", { spread: "0.92 / 1.44 / 2.03 for float glass (range across published datasets)", validity: `${ICE_VALIDITY}; interlayer and frame not included` }),
  ice("glulam", '"Timber, Glulam - No Carbon Storage" (n 13, range 0.280–0.782); biogenic: "Including Carbon Storage" −1.408 kgCO2/kg; EN 16449:2014 gives 44/12 × 0.5 × oven-dry mass', 0.512, null, "UK/EU literature", { spread: "0.28 / 0.51 / 0.78 (range across published datasets)", validity: `${ICE_VALIDITY}; fossil carbon only, biogenic reported apart` }),
  unsupported("fabric-ptfe-glass", "No readable published source was found; product EPDs exist. The bundled value is recalled from memory: replace it with the manufacturer's EPD."),
  unsupported("fabric-pvc-polyester", "No readable published source was found; product EPDs exist. The bundled value is recalled from memory: replace it with the manufacturer's EPD."),
  unsupported("etfe-foil", "Only an embodied energy was found (about 26.5 GJ/t, Robinson-Gayle 2001, as quoted by Lamnatou et al., Renewable and Sustainable Energy Reviews, 2018), not a carbon factor. The bundled value is recalled from memory."),
  unsupported("insulated-metal-deck", "No readable published source was found; association EPDs exist. The bundled value is recalled from memory: replace it with the panel EPD."),
];

/** What a factor row's A1–A3 value has behind it. */
export type ProvenanceVerdict = {
  provenance: FactorProvenance | null;
  /** "cited": the row holds the published value (within 1 %); "differs": a published value exists and the row holds another; "unsupported": no source read supports it. */
  status: "cited" | "differs" | "unsupported";
  /** One plain sentence. */
  text: string;
};

/**
 * Whether a factor row's A1–A3 value is the published one: within 1 % of the cited value (the
 * rounding of a two- or three-figure citation), a different value, or a value no source supports.
 */
export function provenanceOf(row: Pick<FactorRow, "material" | "a1a3KgCO2ePerKg">): ProvenanceVerdict {
  const provenance = FACTOR_PROVENANCE.find((p) => p.material === row.material) ?? null;
  const value = row.a1a3KgCO2ePerKg;
  if (!provenance || provenance.citedA1a3KgCO2ePerKg === null) {
    return { provenance, status: "unsupported", text: `No published source read supports A1–A3 = ${value} kgCO2e/kg for this material: treat it as a placeholder until an EPD or dataset is cited.` };
  }
  const cited = provenance.citedA1a3KgCO2ePerKg;
  if (Math.abs(value - cited) <= 0.01 * Math.abs(cited)) {
    return { provenance, status: "cited", text: `A1–A3 = ${value} kgCO2e/kg is the published value (${provenance.source}: ${cited}).` };
  }
  return { provenance, status: "differs", text: `A1–A3 = ${value} kgCO2e/kg is not the published value (${provenance.source}: ${cited}); nothing in the cited sources supports ${value}. Use the cited value, or name the EPD this one comes from in the row's source.` };
}
