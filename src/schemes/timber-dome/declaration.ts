// The timber-dome scheme's declaration: who it is, its valid range and its options, declared once.
// No design code here: the main-thread pages read it through ../declarations.ts; the design
// (./index.ts) is built on it.
import { declareScheme, defineOptions, type OptionValues } from "../kit/declare";

const GLULAM_CHOICES = ["GL24h", "GL28h", "GL30h", "GL32h"].map((value) => ({ value, label: `${value} (EN 14080)` }));

const declarations = {
  // the built 163.4 m glulam lattice dome (1991): 781 members over ≈ 21,000 m² of plan → ≈ 10 m members (derived from the published count)
  memberLengthM: { kind: "number", label: "Target member length", unit: "m", min: 4, max: 20, step: 0.5, default: 10, source: "mesh size; ≈ 10 m in a built 163 m glulam lattice dome (781 members); frequency v = round(1.2 R / L) and its two neighbours are designed, the lightest kept", free: true },
  strengthClass: { kind: "select", label: "Glulam strength class", choices: GLULAM_CHOICES, default: "GL28h", source: "EN 14080:2013 Table 5 (data/glulam.csv)" },
  // covered heated buildings are SC1; SC2 is the safe side (common practice, no source)
  serviceClass: {
    kind: "select",
    label: "Service class",
    choices: [
      { value: "1", label: "1: heated, enclosed" },
      { value: "2", label: "2: covered, unheated" },
      { value: "3", label: "3: exposed" },
    ],
    default: "2",
    source: "EN 1995-1-1 §2.3.1.3; sets k_mod (Table 3.1) and k_def (Table 3.2)",
  },
  // EN 1995-1-1 Table 2.2 note: snow short- or medium-term by site (from memory)
  snowDuration: {
    kind: "select",
    label: "Load-duration class of snow",
    choices: [
      { value: "short-term", label: "Short-term" },
      { value: "medium-term", label: "Medium-term" },
    ],
    default: "short-term",
    source: "EN 1995-1-1 Table 2.2 and its national annexes (from memory)",
  },
  // lattice shells reach 0.2–0.4 of p_cl with imperfections (from memory; cf. Kollár & Dulácska)
  knockDown: { kind: "number", label: "Buckling knock-down on p_cl", unit: "", min: 0.05, max: 1, step: 0.05, default: 0.3, source: "imperfection sensitivity of lattice shells, from memory 0.2–0.4; timber joints are semi-rigid (the low end is prudent)", uncertainty: "knock-down" },
  bands: { kind: "number", label: "Member size bands, crown to edge", unit: "", min: 1, max: 12, step: 1, integer: true, default: 4, source: "grouping of alike members" },
  purlinSpacingM: { kind: "number", label: "Purlin spacing", unit: "m", min: 0.6, max: 5, step: 0.1, default: 2.4, source: "common practice 1.2–3 m, no source" },
  // steel hubs, plates and dowels ≈ 5–15 % of the timber mass (common practice, no source)
  connectorKgPerM3: { kind: "number", label: "Steel connectors", unit: "kg per m³ of glulam", min: 0, max: 200, step: 5, default: 50, source: "allowance for hubs, plates and dowels, common practice, no source", uncertainty: "allowance" },
  fireMinutes: { kind: "number", label: "Fire resistance (charring added)", unit: "min", min: 0, max: 120, step: 15, integer: true, default: 0, source: "EN 1995-1-2 §3.4 (β_n 0.7 mm/min) and §4.2.2 (d_ef = β_n t + 7 mm)" },
  // on demand: a frame of the whole net (seconds at 160 m); the command line's --buckling and the details panel set it
  bucklingAnalysis: { kind: "toggle", label: "3D analysis of the net (general buckling)", default: false, source: "rigid-jointed frame of the net at E/(1 + k_def) under the heaviest gravity combination, linear buckling × knock-down (issue 15)" },
} as const;
export type TimberDomeOptions = OptionValues<typeof declarations>;

export const timberDomeDeclaration = declareScheme({
  id: "timber-dome",
  label: "Glulam timber dome",
  colour: "#D55E00",
  clientNotes: [
    "A lattice of glued-laminated timber: less carbon in its materials than steel or concrete.",
    "The carbon stored in the wood is reported apart and not subtracted; the timber must be kept dry and its joints are the main design task.",
  ],
  description:
    "A single-layer lattice of glued-laminated timber members on a three-way geodesic grid, with purlins, a board deck and a roofing membrane, cut to a spherical cap on a steel tension ring. The triangulated grid is chosen over ribs and rings because it carries unbalanced load by in-plane action with straight members of nearly one length, as in the two largest built timber domes (161.5 m and 163.4 m spans). Members are designed to EN 1995-1-1 for axial force with the bending of the panel load, the lattice for general buckling with creep-reduced stiffness; fire resistance adds charring to each member.",
  meshCache: "geodesic spheres",
  // 40 m (common practice, no source) to 165 m: the largest built glulam domes span 161.5 m (completed 1983) and 163.4 m (completed 1991), published figures.
  validSpanM: { min: 40, max: 165 },
  // rise ÷ span 0.1–0.3, preferring 0.15 (the built glulam domes are near it; common practice, no source)
  riseSpanRatio: { min: 0.1, max: 0.3, preferred: 0.15, byTrend: { samples: 6, sampledAt: "searched" } },
  options: defineOptions(declarations),
});
