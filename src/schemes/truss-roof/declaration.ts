// The truss-roof scheme's declaration: who it is, its valid range and its options, declared once.
// No design code here: the main-thread pages read it through ../declarations.ts; the design
// (./index.ts) is built on it.
import { declareScheme, defineOptions, CLADDING_CHOICES, STEEL_GRADE_CHOICES, type OptionValues } from "../kit/declare";

/** The span ÷ depth range of the trusses, both the option's range and the depth search's. */
export const DEPTH_RATIO_RANGE = { min: 8, max: 25 } as const;

const declarations = {
  // default: primary trusses at 6–10 m so cold-formed purlins can span between them (common practice, no source)
  trussSpacingM: { kind: "number", label: "Truss spacing", unit: "m", min: 4, max: 20, step: 0.5, default: 8, source: "common practice 6–10 m, no source", free: true },
  // default: long-span trusses span/10–span/20 (common practice, no source)
  spanDepthRatio: { kind: "number", label: "Span / depth", unit: "", min: DEPTH_RATIO_RANGE.min, max: DEPTH_RATIO_RANGE.max, step: 0.5, default: 15, source: "common practice 10–20, no source", free: true },
  /** Let the tool choose the span/depth ratio of least mass (8–25) that meets the deflection limit. */
  optimiseDepth: { kind: "toggle", label: "Choose the depth of least mass", default: false, source: "searches span/depth 8–25 meeting the deflection limit" },
  // default L/250 under variable load (common practice for roofs, cf. EN 1990 A1.4 leaves limits to the project)
  deflectionLimit: { kind: "number", label: "Deflection limit span /", unit: "", min: 100, max: 1000, step: 10, default: 250, source: "common practice L/250 under variable load" },
  // default L/200 under the total characteristic load (common practice, no source; EN 1990 A1.4.3 leaves the limits to the project)
  deflectionLimitTotal: { kind: "number", label: "Deflection limit under total load span /", unit: "", min: 100, max: 1000, step: 10, default: 200, source: "common practice L/200 under permanent + variable, no source" },
  // default: metal deck spans 2–3.5 m (common practice, no source)
  purlinSpacingM: { kind: "number", label: "Purlin spacing (top chord restraint)", unit: "m", min: 1, max: 6, step: 0.25, default: 3, source: "deck span, common practice 2–3.5 m" },
  zones: { kind: "number", label: "Chord size changes per half span", unit: "", min: 1, max: 8, step: 1, integer: true, default: 3, source: "grouping of alike members" },
  // default: web member strain adds 10–20 % to chord-only deflection of parallel-chord trusses at span/depth 10–20 (common practice, no source)
  webAllowancePct: { kind: "number", label: "Web deflection allowance", unit: "% of chord deflection", min: 0, max: 50, step: 1, default: 15, source: "common practice 10–20 %, no source", uncertainty: "allowance" },
  // default: truss joints, end plates and gussets 8–12 % (common practice, no source)
  // default 10 %: welded CHS trusses with bolted site splices, range 5–15 % (common practice, no source: no published figure was found here; the risk page varies it over that range)
  connectionAllowancePct: { kind: "number", label: "Truss connections", unit: "% of truss mass", min: 0, max: 30, step: 1, default: 10, source: "common practice, range 5–15 % of the truss mass, no source found", uncertainty: "allowance" },
  cladding: { kind: "select", label: "Roof deck", choices: CLADDING_CHOICES, default: "metal-deck", source: "data/claddings.csv" },
  steelGrade: { kind: "select", label: "Steel grade", choices: STEEL_GRADE_CHOICES, default: "S355", source: "EN 1993-1-1 Table 3.1" },
} as const;
export type TrussRoofOptions = OptionValues<typeof declarations>;

export const trussRoofDeclaration = declareScheme({
  id: "truss-roof",
  label: "Steel truss roof",
  colour: "#CC79A7",
  clientNotes: [
    "A flat roof on long steel trusses: simple to build, but deep and heavy at long spans.",
    "A flat roof must drain: it needs a fall to its gutters so that rainwater cannot pond.",
  ],
  description:
    "A flat roof of parallel steel trusses at a regular spacing, each spanning its own chord of the circular plan onto perimeter columns, with cold-formed purlins, roof bracing and a metal deck. The trusses carry the roof in bending; their depth sets their weight and their stiffness.",
  validSpanM: { min: 20, max: 200 },
  options: defineOptions(declarations),
});
