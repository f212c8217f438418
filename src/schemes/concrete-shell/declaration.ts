// The concrete-shell scheme's declaration: who it is, its valid range and its options, declared once.
// No design code here: the main-thread pages read it through ../declarations.ts; the design
// (./index.ts) is built on it.
import { declareScheme, defineOptions, type OptionValues } from "../kit/declare";

const declarations = {
  concreteClass: { kind: "select", label: "Concrete class", choices: [{ value: "C30/37", label: "C30/37" }, { value: "C40/50", label: "C40/50" }], default: "C30/37", source: "EN 1992-1-1 Table 3.1" },
  cement: { kind: "select", label: "Cement", choices: [{ value: "cem-i", label: "CEM I" }, { value: "ggbs", label: "50 % GGBS" }], default: "cem-i", source: "material for embodied carbon" },
  // default: two layers of mesh with cover (common practice, no source)
  minThicknessMm: { kind: "number", label: "Constructable minimum thickness", unit: "mm", min: 50, max: 300, step: 5, default: 90, source: "common practice 80–100 mm, no source" },
  // default φ(∞, 28 d) for outdoor exposure, thin member (EN 1992-1-1 Fig. 3.1 range, from memory)
  creepCoefficient: { kind: "number", label: "Creep coefficient φ", unit: "", min: 0, max: 4, step: 0.1, default: 2.0, source: "EN 1992-1-1 §3.1.4, Fig. 3.1", uncertainty: "creep" },
  // default: imperfection and creep-sensitive concrete shells reach 0.15–0.25 of p_cl (from memory)
  knockDown: { kind: "number", label: "Buckling knock-down on p_cl", unit: "", min: 0.05, max: 1, step: 0.05, default: 0.2, source: "from memory 0.15–0.25", uncertainty: "knock-down" },
  ringTie: {
    kind: "select",
    label: "Edge ring tie",
    choices: [
      { value: "reinforcement", label: "Reinforcement in a concrete ring" },
      { value: "prestress", label: "Prestressing tendons in a concrete ring" },
      { value: "steel", label: "Steel ring (no concrete ring)" },
    ],
    default: "reinforcement",
    source: "ring tension T = H·a; concrete only where the tie needs it (bars at ≤ 4 %, tendons at σ_c ≤ 0.6 f_ck)",
  },
  form: {
    kind: "select",
    label: "Shell form",
    choices: [
      { value: "smooth", label: "Smooth shell" },
      { value: "ribbed", label: "Ribbed shell (three-way ribs)" },
    ],
    default: "smooth",
    free: true,
    source: "ribbed: equivalent continuum of the shell and its ribs (as the lattice's), 4√(DB)/R²",
  },
  // default: ≈ 8 m between ribs keeps a thin panel between them (common practice, no source)
  ribSpacingM: { kind: "number", label: "Rib spacing (ribbed shell)", unit: "m", min: 3, max: 20, step: 0.5, default: 8, source: "common practice 5–15 m, no source", free: true, freeWhen: { key: "form", value: "ribbed" } },
  edgeThickening: { kind: "number", label: "Edge thickness / shell thickness", unit: "", min: 1, max: 4, step: 0.1, default: 2, source: "common practice, no source" },
  // default: two meshes both ways
  shellRateKgPerM3: { kind: "number", label: "Reinforcement rate, shell", unit: "kg/m³", min: 0, max: 300, step: 5, default: 80, source: "common practice, no source; never below EN 1992-1-1 eq. 9.1N", uncertainty: "reinforcement" },
  // default: bending at the edge disturbance
  edgeRateKgPerM3: { kind: "number", label: "Reinforcement rate, thickened edge", unit: "kg/m³", min: 0, max: 400, step: 5, default: 150, source: "common practice, no source", uncertainty: "reinforcement" },
  // default: links and side bars, beside the tie
  ringRateKgPerM3: { kind: "number", label: "Reinforcement rate, ring (beside the tie)", unit: "kg/m³", min: 0, max: 400, step: 5, default: 120, source: "common practice, no source", uncertainty: "reinforcement" },
  // waterproofing and insulation, load only
  finishesKPa: { kind: "number", label: "Roof finishes (load only)", unit: "kPa", min: 0, max: 3, step: 0.05, default: 0.4, source: "common practice, no source", uncertainty: "load" },
} as const;
export type ConcreteShellOptions = OptionValues<typeof declarations>;

export const concreteShellDeclaration = declareScheme({
  id: "concrete-shell",
  label: "Thin concrete shell",
  colour: "#7f7f7f",
  clientNotes: [
    "A thin concrete dome: durable and needing little upkeep, but heavy, and cast on large temporary supports.",
    "Most of its carbon is in the concrete; a ribbed shell saves material at the larger spans.",
  ],
  description:
    "A thin reinforced concrete spherical cap on an edge ring, cast on falsework, smooth or stiffened by a three-way grid of ribs. The shell carries the roof by membrane compression; a smooth shell's thickness is set by buckling, allowing for creep, or by the smallest thickness that can be built; a ribbed shell keeps a thin panel between ribs whose depth gives the general-buckling resistance; the ring ties the outward thrust.",
  // 20 m to the ribbed form's credible span (the smooth form is infeasible beyond 200 m)
  validSpanM: { min: 20, max: 250 },
  // rise ÷ span 1/10 to 0.3, preferring 0.2: a shell wants a high rise for buckling and a small ring thrust (common practice, no source)
  riseSpanRatio: { min: 0.1, max: 0.3, preferred: 0.2 },
  options: defineOptions(declarations),
});
