// The geodesic-dome scheme's declaration: who it is, its valid range and its options, declared once.
// No design code here: the main-thread pages read it through ../declarations.ts; the design
// (./index.ts) is built on it.
import { declareScheme, defineOptions, CLADDING_CHOICES, STEEL_GRADE_CHOICES, type OptionValues } from "../kit/declare";

const declarations = {
  // default: single-layer lattices are usually meshed at 3–6 m (common practice, no source)
  targetStrutLengthM: { kind: "number", label: "Target strut length", unit: "m", min: 1.5, max: 15, step: 0.5, default: 5, source: "mesh size; frequency v = round(1.2 R / L) (class I subdivision)", free: true },
  layers: {
    kind: "select",
    label: "Layers",
    choices: [
      { value: "single", label: "Single-layer lattice" },
      { value: "double", label: "Double-layer grid" },
    ],
    default: "single",
    source: "double layer: two grids at a depth, webs between (equivalent sandwich stiffness)",
  },
  // default span/50 (common practice for double-layer domes, no source)
  doubleLayerDepthPct: { kind: "number", label: "Double-layer depth", unit: "% of span", min: 0.5, max: 6, step: 0.1, default: 2, source: "common practice span/50, no source", free: true, freeWhen: { key: "layers", value: "double" } },
  // default: lattice shells reach 0.2–0.4 of p_cl with imperfections (from memory; cf. Kollár & Dulácska)
  knockDown: { kind: "number", label: "Buckling knock-down on p_cl", unit: "", min: 0.05, max: 1, step: 0.05, default: 0.3, source: "imperfection sensitivity of lattice shells, from memory 0.2–0.4", uncertainty: "knock-down" },
  bands: { kind: "number", label: "Bar size bands, crown to edge", unit: "", min: 1, max: 20, step: 1, integer: true, default: 6, source: "grouping of alike members" },
  // default: nodes and connections 10–20 % of bar mass (common practice, no source)
  nodeAllowancePct: { kind: "number", label: "Nodes and connections", unit: "% of bar mass", min: 0, max: 50, step: 1, default: 15, source: "common practice 10–20 %, no source", uncertainty: "allowance" },
  cladding: { kind: "select", label: "Cladding", choices: CLADDING_CHOICES, default: "metal-deck", source: "data/claddings.csv" },
  steelGrade: { kind: "select", label: "Steel grade", choices: STEEL_GRADE_CHOICES, default: "S355", source: "EN 1993-1-1 Table 3.1" },
  // on demand: seconds at 160 m (the command line's --buckling and the details panel set it)
  bucklingAnalysis: { kind: "toggle", label: "3D analysis of the net (member forces and buckling)", default: false, source: "rigid-jointed frame of the net under uniform and drifted snow, linear buckling × knock-down (issue 13)" },
} as const;
export type GeodesicDomeOptions = OptionValues<typeof declarations>;

export const geodesicDomeDeclaration = declareScheme({
  id: "geodesic-dome",
  label: "Geodesic steel dome",
  colour: "#E69F00",
  clientNotes: [
    "A steel lattice of short straight bars, familiar to build, but heavier in steel than the cable roofs.",
    "Its stability under uneven snow is estimated by a simplified rule at this stage; a full analysis follows in design.",
  ],
  description:
    "A single- or double-layer lattice of steel tubes on a geodesic (icosahedral) net, cut to a spherical cap on a steel tension ring. The dome carries the roof as a shell in compression; the bars are sized for their membrane forces and the whole lattice for general buckling.",
  meshCache: "geodesic spheres",
  validSpanM: { min: 40, max: 250 },
  // rise ÷ span 0.1–0.3, preferring 0.15 (common practice for braced domes, no source)
  riseSpanRatio: { min: 0.1, max: 0.3, preferred: 0.15, byTrend: { samples: 7, sampledAt: "reference" } },
  options: defineOptions(declarations),
});
