// The cable-dome scheme's declaration: who it is, its valid range and its options, declared once.
// No design code here: the main-thread pages read it through ../declarations.ts; the design
// (./index.ts) is built on it.
import { declareScheme, defineOptions, ANALYSIS_OPTION, FABRIC_OPTION, TENSION_COMMON_OPTIONS, type OptionValues } from "../kit/declare";

const declarations = {
  /** Radial trusses N; 0 = automatic (even count with ridges ≤ 12 m apart at the perimeter, closer where the fabric needs it, at least 12). */
  radialTrusses: { kind: "number", label: "Radial trusses (0 = automatic)", unit: "", min: 0, max: 120, step: 2, integer: true, default: 0, source: "automatic: perimeter ridge spacing ≤ 12 m (common practice, no source), closer where the fabric panel needs it; at least 12" },
  /** Hoops n; 0 = automatic (the lightest of three counts around one per 55 m of radius). */
  hoops: { kind: "number", label: "Hoops (0 = automatic)", unit: "", min: 0, max: 8, step: 1, integer: true, default: 0, free: true, searchMin: 1, source: "the search tries 1 to 8 (the automatic choice is one of them); automatic: the lightest of one fewer, the usual and one more than one per 55 m of radius (the lightest here; common practice 20–35 m, no source, is for low outer hoops)" },
  centralRingRatio: { kind: "number", label: "Central ring radius / plan radius", unit: "", min: 0.03, max: 0.3, step: 0.01, default: 0.1, source: "common practice, no source" },
  // default 0.6 gives the lightest roof with its ring at 160 m here; 0.4 more usable floor (common practice, no source)
  postHeightRatio: { kind: "number", label: "Diagonal rise per bay (post depth; feet kept above the clear height)", unit: "", min: 0.05, max: 1.0, step: 0.01, default: 0.6, free: true, source: "common practice, no source" },
  // the ring on a perimeter wall above the eaves lifts the whole truss; 0 keeps the brief's eaves
  // 0.06 (the default design): the ring high enough that the outer post foot keeps the clear height
  // with a working outer diagonal (common practice, no source). The search's reference is 0.11
  // (issue 12 item 5): carbon is flat in the ring height above about 0.09 × span and the search keeps,
  // within its 2 % band, the height nearest its reference; with 0.06 (below the flat part) the chosen
  // height sat on the band's edge and mass ÷ air jumped 15.9 % at 175→180 m. Measured 40–400 m
  // (default study): references 0.09, 0.11 and 0.12 hold (largest jump 10.0, 12.2, 13.5 %), 0.10 jumps
  // 15.1 % at 40→45 m; 0.11 is also the least carbon of these at 160 m. The default design keeps 0.06
  // (at 0.11 without the search it jumps 15.7 % at 120→125 m). The wall or stand under the ring is
  // an allowance, not sized by its height.
  ringHeightRatio: { kind: "number", label: "Compression ring above the eaves / span", unit: "", min: 0, max: 0.15, step: 0.005, default: 0.06, searchReference: 0.11, free: true, source: "common practice, no source (the wall or stand under the ring is substructure, counted as an allowance)" },
  // steel: the lighter ring for the same buckling resistance at every span here
  ringMaterial: { kind: "select", label: "Compression ring", choices: [{ value: "concrete", label: "Reinforced concrete" }, { value: "steel", label: "Steel box" }], default: "steel", source: "design choice" },
  // the cables do restrain the ring; false gives the bare-ring 3EI/R³ (Timoshenko & Gere ch. 7)
  ringCableRestraint: { kind: "toggle", label: "Ridge cables restrain ring buckling", default: true, source: "ring on elastic foundation (from memory); off: bare ring, Timoshenko & Gere ch. 7" },
  bareRingLoad: { kind: "select", label: "Bare ring: direction of the cable pull", choices: [{ value: "normal", label: "Normal to the ring (3EI/r³)" }, { value: "centre", label: "Directed to the centre (4.5EI/r³)" }], default: "normal", source: "Timoshenko & Gere, Theory of Elastic Stability, 1961, ch. 7 (from memory): q_cr = 3EI/r³ for pressure normal to the ring, 4.5EI/r³ for a load that stays directed to the centre" },
  ...ANALYSIS_OPTION,
  slackAllowed: { kind: "select", label: "Cables allowed to slacken", choices: [{ value: "none", label: "None" }, { value: "diagonals", label: "Diagonals" }], default: "none", source: "design choice" },
  ...FABRIC_OPTION,
  ...TENSION_COMMON_OPTIONS,
} as const;
export type CableDomeOptions = OptionValues<typeof declarations>;

/** Cable dome: radial cable trusses between a perimeter compression ring and a central tension ring, fabric between the ridges. */
export const cableDomeDeclaration = declareScheme({
  id: "cable-dome",
  riseSpanRatio: { min: 0.08, max: 0.25, preferred: 0.125 },
  // the proportion search designs its candidates by the closed form; the chosen ones are designed by the 3D analysis (the default option)
  screeningOptions: { analysis: "closed-form" },
  // the closed form is least near 0.5 of a bay in post depth and flat in rise (within 2 % from 0.08 to 0.095 × span
  // at 80 m), the 3D analysis near 0.35–0.4 and at the least rise, steeply (+12 % from post depth 0.35 to 0.6 at
  // 70 m, +10 % from rise 0.085 to 0.095 at 80 m): chosen on the closed form, both wandered within its band and the
  // 3D dome's self-weight jumped 22.5 % at 70 → 75 m (post depth 0.55 → 0.6) and 22.8 % at 75 → 80 m (rise 0.087 →
  // 0.099 × span); refined on the 3D designs, in this order. The rise is kept nearest the least within the band (the
  // 3D dome is lightest there: shorter posts); with the preferred rise as reference it sat on the band's edge, which
  // a quadratic through three samples places loosely (85 m: 0.086 × span, 7 % above 0.08 in 3D). The post depth is
  // kept the shallowest within the band (shorter posts, less often held by L/i ≤ 180 alone): nearest the default 0.6
  // it sat on the band's deep edge, and on the demo brief at 245 → 250 m a post stepped from CHS 610 to 711 (+15.5 %).
  // Measured (search, 3D, 40–250 m): largest step 12.7 % default study, 11.2 % demo study (was 22.5 %)
  refinedInFull: [{ key: "riseM", samples: [0.08, 0.1, 0.12], reference: 0.08 }, { key: "postHeightRatio", samples: [0.2, 0.3, 0.4, 0.5, 0.6], reference: 0.2 }],
  label: "Cable dome",
  colour: "#0072B2",
  clientNotes: [
    "A light roof of cables, posts and fabric, held taut against a heavy ring at its edge: it needs a specialist designer and builder from the start.",
    "Its cables are sized from a 3D computer model under uneven snow and wind on one side; a specialist's detailed analysis will refine them.",
  ],
  description:
    "Radial cable trusses span from a perimeter compression ring to a central tension ring: ridge cables over the top, vertical posts standing on hoops, and diagonals from the foot of each post to the head of the next. Prestress in the cables holds the posts up; coated fabric spans between the ridges. The roof is very light; the compression ring carries the whole horizontal thrust.",
  validSpanM: { min: 40, max: 250 },
  options: defineOptions(declarations),
});
