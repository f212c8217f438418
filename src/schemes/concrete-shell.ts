import type { Brief } from "../study/brief";
import type { Catalogue } from "../catalogue/types";
import type { MaterialId } from "../materials";
import type { TakeoffRow } from "../takeoff/takeoff-row";
import type { Check, DrawingLine, OptionSpec, SchemeModel } from "./types";
import { sphericalCap, capHeightAt } from "../mechanics/spherical-cap";
import { capUsableRadiusM } from "../mechanics/usable-floor";
import { hoopSignChangeAngleRad } from "../mechanics/spherical-membrane";
import { concreteProperties, concreteDesignStrengthPa, rebarDesignStrengthPa, type ConcreteClass } from "../mechanics/concrete";
import { STEEL_DENSITY_KG_PER_M3 } from "../catalogue/chs";
import { roofActions } from "../loads/roof-actions";
import { assembleDesign, check, infeasibleDesign } from "./assemble-design";
import { iterateSelfWeight, ConvergenceError } from "./converge";
import { checkSchemeOptions } from "./check-options";
import { minimumReinforcementRatio, shellSelfWeightKPa, shellThickness, type ShellThickness } from "./concrete-shell-sizing";

export type ConcreteShellOptions = {
  concreteClass: string;
  cement: string;
  minThicknessMm: number;
  creepCoefficient: number;
  knockDown: number;
  ringTie: string;
  edgeThickening: number;
  shellRateKgPerM3: number;
  edgeRateKgPerM3: number;
  ringRateKgPerM3: number;
  finishesKPa: number;
};

const defaults: ConcreteShellOptions = {
  concreteClass: "C30/37",
  cement: "cem-i",
  minThicknessMm: 90, // two layers of mesh with cover (common practice, no source)
  creepCoefficient: 2.0, // φ(∞, 28 d) for outdoor exposure, thin member (EN 1992-1-1 Fig. 3.1 range, from memory)
  knockDown: 0.2, // imperfection and creep-sensitive concrete shells: 0.15–0.25 of p_cl (from memory)
  ringTie: "reinforcement",
  edgeThickening: 2, // edge thickness / shell thickness (common practice, no source)
  shellRateKgPerM3: 80, // two meshes both ways (common practice, no source)
  edgeRateKgPerM3: 150, // bending at the edge disturbance (common practice, no source)
  ringRateKgPerM3: 120, // links and side bars, beside the tie (common practice, no source)
  finishesKPa: 0.4, // waterproofing and insulation, load only (common practice, no source)
};

/** Steel stress limit for crack control with 16 mm bars at w_k = 0.3 mm, EN 1992-1-1 Table 7.2N (from memory), Pa. */
const CRACK_CONTROL_STEEL_PA = 240e6;
/** Tie reinforcement ratio of the reinforced ring (common practice 2–3 %, no source; EN 1992-1-1 §9.2.1.1(3) caps beams at 4 %). */
const RING_TIE_RATIO = 0.03;
/** Strand Y1860: f_pk and f_p0.1k ≈ 0.88 f_pk (EN 10138-3, from memory), Pa. */
const STRAND_FPK_PA = 1860e6;
const STRAND_FP01K_PA = 1640e6;
/** Long-term prestress losses (common practice 15–25 %, no source). */
const PRESTRESS_LOSSES = 0.2;
/** Density of plain concrete for the take-off mass, kg/m³ (EN 1991-1-1 Table A.1: 24 kN/m³); the rebar is counted apart. */
const PLAIN_CONCRETE_KG_PER_M3 = 2400;

const options = [
  { key: "concreteClass", label: "Concrete class", kind: "select", unit: "", choices: [{ value: "C30/37", label: "C30/37" }, { value: "C40/50", label: "C40/50" }], source: "EN 1992-1-1 Table 3.1" },
  { key: "cement", label: "Cement", kind: "select", unit: "", choices: [{ value: "cem-i", label: "CEM I" }, { value: "ggbs", label: "50 % GGBS" }], source: "material for embodied carbon" },
  { key: "minThicknessMm", label: "Constructable minimum thickness", kind: "number", unit: "mm", min: 50, max: 300, step: 5, source: "common practice 80–100 mm, no source" },
  { key: "creepCoefficient", label: "Creep coefficient φ", kind: "number", unit: "", min: 0, max: 4, step: 0.1, source: "EN 1992-1-1 §3.1.4, Fig. 3.1" },
  { key: "knockDown", label: "Buckling knock-down on p_cl", kind: "number", unit: "", min: 0.05, max: 1, step: 0.05, source: "from memory 0.15–0.25" },
  { key: "ringTie", label: "Edge ring tie", kind: "select", unit: "", choices: [{ value: "reinforcement", label: "Reinforcement" }, { value: "prestress", label: "Prestressing tendons" }], source: "ring tension T = H·a" },
  { key: "edgeThickening", label: "Edge thickness / shell thickness", kind: "number", unit: "", min: 1, max: 4, step: 0.1, source: "common practice, no source" },
  { key: "shellRateKgPerM3", label: "Reinforcement rate, shell", kind: "number", unit: "kg/m³", min: 0, max: 300, step: 5, source: "common practice, no source; never below EN 1992-1-1 eq. 9.1N" },
  { key: "edgeRateKgPerM3", label: "Reinforcement rate, thickened edge", kind: "number", unit: "kg/m³", min: 0, max: 400, step: 5, source: "common practice, no source" },
  { key: "ringRateKgPerM3", label: "Reinforcement rate, ring (beside the tie)", kind: "number", unit: "kg/m³", min: 0, max: 400, step: 5, source: "common practice, no source" },
  { key: "finishesKPa", label: "Roof finishes (load only)", kind: "number", unit: "kPa", min: 0, max: 3, step: 0.05, source: "common practice, no source" },
] as const satisfies readonly OptionSpec[];

function concreteMaterial(strengthClass: string, cement: string): MaterialId {
  const base = strengthClass === "C40/50" ? "concrete-c40-50" : "concrete-c30-37";
  return (cement === "ggbs" ? `${base}-ggbs` : base) as MaterialId;
}

/**
 * Designs a thin spherical concrete shell on an edge ring: thickness from the constructable
 * minimum, buckling (k·p_cl, Zoelly, with the creep-reduced modulus) and membrane compression
 * (Timoshenko & Woinowsky-Krieger ch. 14), iterated with its own weight; ring tension T = H·a tied
 * by reinforcement or prestress; reinforcement from rates, never below EN 1992-1-1 eq. 9.1N;
 * formwork over the whole soffit. Validity: membrane state (rise/span ≳ 1/10), 20–200 m.
 */
function design(brief: Brief, opts: ConcreteShellOptions, _catalogue: Catalogue) {
  checkSchemeOptions(options, opts);
  const cap = sphericalCap(brief.spanM, brief.riseM);
  const R = cap.radiusM;
  const a = cap.baseRadiusM;
  const phi0 = cap.edgeAngleRad;
  const concrete = concreteProperties(opts.concreteClass as ConcreteClass);
  const fcd = concreteDesignStrengthPa(concrete.fckPa);
  const fyd = rebarDesignStrengthPa();
  const actions = roofActions(brief);
  const inputs = {
    brief,
    actions,
    radiusM: R,
    capAngleRad: phi0,
    minThicknessM: opts.minThicknessMm / 1000,
    effectiveModulusPa: concrete.ecmPa / (1 + opts.creepCoefficient),
    knockDown: opts.knockDown,
    designStrengthPa: fcd,
    finishesKPa: opts.finishesKPa,
    stepM: 0.005,
  };
  const section = sectionLines(brief, 0.1);
  let converged;
  try {
    converged = iterateSelfWeight<ShellThickness>((g) => {
      const t = shellThickness(inputs, g);
      return { value: t, selfWeightKPa: shellSelfWeightKPa(t.thicknessM, opts.finishesKPa) };
    }, shellSelfWeightKPa(inputs.minThicknessM, opts.finishesKPa));
  } catch (e) {
    if (e instanceof ConvergenceError) return infeasibleDesign("concrete-shell", brief, `${e.message}: a thicker, lighter or less shallow shell is needed`, [], section);
    throw e;
  }
  const s = converged.value;
  const t = s.thicknessM;
  const warnings: string[] = [
    "membrane theory with the plan-mean snow: drifted snow, wind and the edge disturbance bend the shell; rates cover them only roughly",
    "the shell is cast on full falsework over the whole plan; the supports of the edge ring are not included",
  ];
  if (brief.riseM / brief.spanM < 0.1) warnings.push("rise under span/10: the shell is shallow and its buckling very sensitive to imperfections and creep");
  if (phi0 > hoopSignChangeAngleRad()) warnings.push("edge angle beyond 51.8°: hoop tension near the edge, reinforced at the shell rate plus the hoop tie");
  if (brief.spanM > 100) warnings.push("thin concrete shells above about 100 m span are rare (from memory): falsework and creep dominate");

  // Edge ring: H = |N_φ| cos φ0 per m of edge, T = H·a.
  const ringTensionUlsN = Math.abs(s.edgeMeridionalUlsNPerM) * Math.cos(phi0) * a;
  const ringTensionSlsN = Math.abs(s.edgeMeridionalSlsNPerM) * Math.cos(phi0) * a;
  const ringLengthM = 2 * Math.PI * a;
  let tieMaterial: MaterialId = "rebar";
  let tieAreaM2: number;
  let ringAreaM2: number;
  let tieCapacityN: number;
  if (opts.ringTie === "prestress") {
    tieMaterial = "steel-strand";
    const fpd = STRAND_FP01K_PA / 1.15; // EN 1992-1-1 §3.3.6
    const effectiveStress = 0.75 * STRAND_FPK_PA * (1 - PRESTRESS_LOSSES); // σ_pm0 ≤ 0.75 f_pk, EN 1992-1-1 §5.10.3(2)
    tieAreaM2 = Math.max(ringTensionUlsN / fpd, ringTensionSlsN / effectiveStress); // no decompression under SLS
    tieCapacityN = tieAreaM2 * fpd;
    ringAreaM2 = (0.75 * STRAND_FPK_PA * tieAreaM2) / (0.6 * concrete.fckPa); // σ_c ≤ 0.6 f_ck at transfer, EN 1992-1-1 §5.10.2.2(5)
  } else {
    tieAreaM2 = Math.max(ringTensionUlsN / fyd, ringTensionSlsN / CRACK_CONTROL_STEEL_PA);
    tieCapacityN = tieAreaM2 * fyd;
    ringAreaM2 = tieAreaM2 / RING_TIE_RATIO;
  }
  ringAreaM2 = Math.max(ringAreaM2, (2 * t) ** 2);
  const ringVolumeM3 = ringAreaM2 * ringLengthM;
  const tieMassKg = tieAreaM2 * ringLengthM * STEEL_DENSITY_KG_PER_M3 * 1.1; // laps and anchorages +10 % (common practice, no source)

  // Shell, thickened edge, ring: volumes and reinforcement.
  const edgeWidthM = Math.min(2.4 * Math.sqrt(R * t), R * phi0);
  // The edge zone is the spherical zone from φ0 − w/R to φ0: 2πR²(cos(φ0 − w/R) − cos φ0), never more than the cap.
  const edgeAreaM2 = 2 * Math.PI * R * R * (Math.cos(phi0 - edgeWidthM / R) - Math.cos(phi0));
  const edgeExtraM3 = 0.5 * (opts.edgeThickening - 1) * t * edgeAreaM2;
  const shellM3 = t * cap.surfaceM2;
  const edgeZoneM3 = t * edgeAreaM2 + edgeExtraM3;
  const rhoMin = minimumReinforcementRatio(concrete.fctmPa);
  const minimumRateKgPerM3 = 2 * rhoMin * 0.8 * STEEL_DENSITY_KG_PER_M3; // both ways, d ≈ 0.8 t
  const shellRate = Math.max(opts.shellRateKgPerM3, minimumRateKgPerM3);
  const hoopTieKg = s.maxHoopTensionNPerM > 0 ? (s.maxHoopTensionNPerM / fyd) * STEEL_DENSITY_KG_PER_M3 * 2 * Math.PI * R * R * (Math.cos(hoopSignChangeAngleRad()) - Math.cos(phi0)) : 0;
  const shellRebarKg = shellRate * Math.max(0, shellM3 - t * edgeAreaM2) + hoopTieKg;
  const edgeRebarKg = Math.max(opts.edgeRateKgPerM3, minimumRateKgPerM3) * edgeZoneM3;
  const ringRebarKg = opts.ringRateKgPerM3 * ringVolumeM3;
  const concreteM3 = shellM3 + edgeExtraM3 + ringVolumeM3;
  const material = concreteMaterial(opts.concreteClass, opts.cement);

  const checks: Check[] = [
    check("shell buckling", "Zoelly p_cl × knock-down, E_cm/(1 + φ)", s.designPressurePa, s.bucklingCapacityPa, "Pa"),
    check("membrane compression", "EN 1992-1-1 eq. 3.15 f_cd", s.maxCompressionNPerM / t, fcd, "Pa"),
    check(`edge ring tie (${opts.ringTie})`, opts.ringTie === "prestress" ? "EN 1992-1-1 §3.3.6" : "EN 1992-1-1 §3.2.7", ringTensionUlsN, tieCapacityN, "N"),
  ];
  const row = (element: string, mat: MaterialId | null, costItem: TakeoffRow["costItem"], quantity: number, unit: TakeoffRow["unit"], massKg: number): TakeoffRow => ({ element, material: mat, costItem, quantity, unit, massKg });
  const takeoff: TakeoffRow[] = [
    row("shell concrete", material, "concrete", shellM3 + edgeExtraM3, "m3", (shellM3 + edgeExtraM3) * PLAIN_CONCRETE_KG_PER_M3),
    row("edge ring concrete", material, "concrete", ringVolumeM3, "m3", ringVolumeM3 * PLAIN_CONCRETE_KG_PER_M3),
    row("shell reinforcement", "rebar", "rebar", shellRebarKg / 1000, "t", shellRebarKg),
    row("edge reinforcement", "rebar", "rebar", edgeRebarKg / 1000, "t", edgeRebarKg),
    row("ring reinforcement", "rebar", "rebar", ringRebarKg / 1000, "t", ringRebarKg),
    row(opts.ringTie === "prestress" ? "ring prestressing tendons" : "ring tie bars", tieMaterial, opts.ringTie === "prestress" ? "prestressing" : "rebar", tieMassKg / 1000, "t", tieMassKg),
    row("formwork and falsework", null, "formwork", cap.surfaceM2, "m2", 0),
  ];
  const usableRadius = capUsableRadiusM(R, brief.riseM, a, brief.eavesHeightM, t, brief.minClearHeightM);
  const summary = [
    { key: "thicknessMm", label: "Shell thickness", value: t * 1000, unit: "mm" },
    { key: "bucklingThicknessMm", label: "Thickness for buckling", value: s.bucklingThicknessM * 1000, unit: "mm" },
    { key: "compressionThicknessMm", label: "Thickness for membrane compression", value: s.compressionThicknessM * 1000, unit: "mm" },
    { key: "sphereRadiusM", label: "Sphere radius", value: R, unit: "m" },
    { key: "edgeWidthM", label: "Thickened edge width 2.4√(Rt)", value: edgeWidthM, unit: "m" },
    { key: "ringTensionKN", label: "Edge ring tension (ULS)", value: ringTensionUlsN / 1000, unit: "kN" },
    { key: "concreteM3", label: "Concrete", value: concreteM3, unit: "m³" },
    { key: "rebarKgPerM3", label: "Reinforcement per m³ of concrete", value: (shellRebarKg + edgeRebarKg + ringRebarKg + (tieMaterial === "rebar" ? tieMassKg : 0)) / concreteM3, unit: "kg/m³" },
  ];
  return assembleDesign(concreteShell, brief, {
    summary,
    members: [
      {
        element: opts.ringTie === "prestress" ? "ring prestressing tendons" : "ring tie bars",
        material: tieMaterial,
        count: 1,
        lengthM: ringLengthM,
        section: `${(tieAreaM2 * 1e4).toFixed(0)} cm² in a ${Math.sqrt(ringAreaM2).toFixed(2)} m square ring`,
        designForceN: ringTensionUlsN,
        resistanceN: tieCapacityN,
        utilisation: ringTensionUlsN / tieCapacityN,
        governing: opts.ringTie === "prestress" ? "ULS f_p0.1k/γ_S or no decompression under SLS" : "ULS f_yd or crack control σ_s ≤ 240 MPa under SLS",
      },
    ],
    takeoff,
    checks,
    warnings: [`thickness set by ${s.governing}`, ...warnings],
    iterations: converged.iterations,
    usableFloorM2: Math.PI * usableRadius * usableRadius,
    roofSurfaceM2: cap.surfaceM2,
    enclosedVolumeM3: cap.planAreaM2 * brief.eavesHeightM + cap.volumeM3,
    drawing: { section: sectionLines(brief, t, opts.edgeThickening, edgeWidthM, Math.sqrt(ringAreaM2)), plan: planLines(a) },
  });
}

function sectionLines(brief: Brief, thicknessM: number, thickening = 1, edgeWidthM = 0, ringSideM = 0): DrawingLine[] {
  const cap = sphericalCap(brief.spanM, brief.riseM);
  const e = brief.eavesHeightM;
  const xs = Array.from({ length: 41 }, (_, i) => -cap.baseRadiusM + (i / 40) * 2 * cap.baseRadiusM);
  const lines: DrawingLine[] = [
    { role: "shell", points: xs.map((x) => [x, e + capHeightAt(cap, x)] as [number, number]) },
    {
      role: "shell",
      points: xs.map((x) => {
        const fromEdge = cap.baseRadiusM - Math.abs(x);
        const extra = edgeWidthM > 0 && fromEdge < edgeWidthM ? (thickening - 1) * thicknessM * (1 - fromEdge / edgeWidthM) : 0;
        return [x, e + capHeightAt(cap, x) - thicknessM - extra] as [number, number];
      }),
    },
  ];
  if (ringSideM > 0) {
    for (const side of [-1, 1]) {
      const x0 = side * cap.baseRadiusM;
      const x1 = x0 - side * ringSideM;
      lines.push({ role: "ring", points: [[x0, e], [x1, e], [x1, e - ringSideM], [x0, e - ringSideM], [x0, e]] });
    }
  }
  return lines;
}

function planLines(a: number): DrawingLine[] {
  return [{ role: "ring", points: Array.from({ length: 73 }, (_, i) => [a * Math.cos((i * Math.PI) / 36), a * Math.sin((i * Math.PI) / 36)] as [number, number]) }];
}

export const concreteShell: SchemeModel<ConcreteShellOptions> = {
  id: "concrete-shell",
  label: "Thin concrete shell",
  description:
    "A thin reinforced concrete spherical cap on an edge ring, cast on falsework. The shell carries the roof by membrane compression; its thickness is set by buckling, allowing for creep, or by the smallest thickness that can be built; the ring ties the outward thrust.",
  validSpanM: { min: 20, max: 200 },
  options,
  defaults,
  design,
};
