import type { Brief } from "../../brief";
import type { MaterialId } from "../../materials";
import type { TakeoffRow } from "../../takeoff/takeoff-row";
import type { Check, DesignParts, MemberGroup, OptionValues } from "../kit";
import { capEnvelope, check, convergeSelfWeight, defineOptions, defineScheme } from "../kit";
import { sphericalCap, type SphericalCap } from "../../mechanics/spherical-cap";
import { capUsableRadiusM } from "../../mechanics/usable-floor";
import { edgeRingTensionN, hoopSignChangeAngleRad } from "../../mechanics/spherical-membrane";
import { concreteProperties, concreteDesignStrengthPa, minimumReinforcementRatio, PLAIN_CONCRETE_DENSITY_KG_PER_M3, rebarDesignStrengthPa, type ConcreteClass } from "../../mechanics/concrete";
import { STEEL_DENSITY_KG_PER_M3 } from "../../catalogue/chs";
import { roofActions } from "../../loads/roof-actions";
import { shellSelfWeightKPa, shellThickness, type ShellThickness } from "./sizing";
import { edgeRingTie, type EdgeRingTie } from "./ring";
import { shellPlan, shellSection } from "./drawing";

const declarations = {
  concreteClass: { kind: "select", label: "Concrete class", choices: [{ value: "C30/37", label: "C30/37" }, { value: "C40/50", label: "C40/50" }], default: "C30/37", source: "EN 1992-1-1 Table 3.1" },
  cement: { kind: "select", label: "Cement", choices: [{ value: "cem-i", label: "CEM I" }, { value: "ggbs", label: "50 % GGBS" }], default: "cem-i", source: "material for embodied carbon" },
  // default: two layers of mesh with cover (common practice, no source)
  minThicknessMm: { kind: "number", label: "Constructable minimum thickness", unit: "mm", min: 50, max: 300, step: 5, default: 90, source: "common practice 80–100 mm, no source" },
  // default φ(∞, 28 d) for outdoor exposure, thin member (EN 1992-1-1 Fig. 3.1 range, from memory)
  creepCoefficient: { kind: "number", label: "Creep coefficient φ", unit: "", min: 0, max: 4, step: 0.1, default: 2.0, source: "EN 1992-1-1 §3.1.4, Fig. 3.1", uncertainty: "creep" },
  // default: imperfection and creep-sensitive concrete shells reach 0.15–0.25 of p_cl (from memory)
  knockDown: { kind: "number", label: "Buckling knock-down on p_cl", unit: "", min: 0.05, max: 1, step: 0.05, default: 0.2, source: "from memory 0.15–0.25", uncertainty: "knock-down" },
  ringTie: { kind: "select", label: "Edge ring tie", choices: [{ value: "reinforcement", label: "Reinforcement" }, { value: "prestress", label: "Prestressing tendons" }], default: "reinforcement", source: "ring tension T = H·a" },
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

function concreteMaterial(strengthClass: string, cement: string): MaterialId {
  const base = strengthClass === "C40/50" ? "concrete-c40-50" : "concrete-c30-37";
  return (cement === "ggbs" ? `${base}-ggbs` : base) as MaterialId;
}

/** Shell, thickened edge and ring: volumes and reinforcement (rates, never below EN 1992-1-1 eq. 9.1N). */
function quantities(cap: SphericalCap, opts: ConcreteShellOptions, s: ShellThickness, tie: EdgeRingTie, fctmPa: number, fydPa: number) {
  const { radiusM: R, edgeAngleRad: phi0 } = cap;
  const t = s.thicknessM;
  const ringLengthM = 2 * Math.PI * cap.baseRadiusM;
  const ringVolumeM3 = tie.ringAreaM2 * ringLengthM;
  const tieMassKg = tie.tieAreaM2 * ringLengthM * STEEL_DENSITY_KG_PER_M3 * 1.1; // laps and anchorages +10 % (common practice, no source)
  const edgeWidthM = Math.min(2.4 * Math.sqrt(R * t), R * phi0);
  // The edge zone is the spherical zone from φ0 − w/R to φ0: 2πR²(cos(φ0 − w/R) − cos φ0), never more than the cap.
  const edgeAreaM2 = 2 * Math.PI * R * R * (Math.cos(phi0 - edgeWidthM / R) - Math.cos(phi0));
  const edgeExtraM3 = 0.5 * (opts.edgeThickening - 1) * t * edgeAreaM2;
  const shellM3 = t * cap.surfaceM2;
  const edgeZoneM3 = t * edgeAreaM2 + edgeExtraM3;
  const minimumRateKgPerM3 = 2 * minimumReinforcementRatio(fctmPa) * 0.8 * STEEL_DENSITY_KG_PER_M3; // both ways, d ≈ 0.8 t
  const shellRate = Math.max(opts.shellRateKgPerM3, minimumRateKgPerM3);
  const hoopTieKg = s.maxHoopTensionNPerM > 0 ? (s.maxHoopTensionNPerM / fydPa) * STEEL_DENSITY_KG_PER_M3 * 2 * Math.PI * R * R * (Math.cos(hoopSignChangeAngleRad()) - Math.cos(phi0)) : 0;
  return {
    ringLengthM,
    ringVolumeM3,
    tieMassKg,
    edgeWidthM,
    shellConcreteM3: shellM3 + edgeExtraM3,
    shellRebarKg: shellRate * Math.max(0, shellM3 - t * edgeAreaM2) + hoopTieKg,
    edgeRebarKg: Math.max(opts.edgeRateKgPerM3, minimumRateKgPerM3) * edgeZoneM3,
    ringRebarKg: opts.ringRateKgPerM3 * ringVolumeM3,
    concreteM3: shellM3 + edgeExtraM3 + ringVolumeM3,
  };
}
type Quantities = ReturnType<typeof quantities>;

function shellTakeoff(opts: ConcreteShellOptions, q: Quantities, tie: EdgeRingTie, cap: SphericalCap): TakeoffRow[] {
  const material = concreteMaterial(opts.concreteClass, opts.cement);
  const prestress = opts.ringTie === "prestress";
  const row = (element: string, mat: MaterialId | null, costItem: TakeoffRow["costItem"], quantity: number, unit: TakeoffRow["unit"], massKg: number): TakeoffRow => ({ element, material: mat, costItem, quantity, unit, massKg });
  return [
    row("shell concrete", material, "concrete", q.shellConcreteM3, "m3", q.shellConcreteM3 * PLAIN_CONCRETE_DENSITY_KG_PER_M3),
    row("edge ring concrete", material, "concrete", q.ringVolumeM3, "m3", q.ringVolumeM3 * PLAIN_CONCRETE_DENSITY_KG_PER_M3),
    row("shell reinforcement", "rebar", "rebar", q.shellRebarKg / 1000, "t", q.shellRebarKg),
    row("edge reinforcement", "rebar", "rebar", q.edgeRebarKg / 1000, "t", q.edgeRebarKg),
    row("ring reinforcement", "rebar", "rebar", q.ringRebarKg / 1000, "t", q.ringRebarKg),
    row(prestress ? "ring prestressing tendons" : "ring tie bars", tie.material, prestress ? "prestressing" : "rebar", q.tieMassKg / 1000, "t", q.tieMassKg),
    row("formwork and falsework", null, "formwork", cap.surfaceM2, "m2", 0),
  ];
}

function ringMember(opts: ConcreteShellOptions, q: Quantities, tie: EdgeRingTie, ringTensionUlsN: number): MemberGroup {
  const prestress = opts.ringTie === "prestress";
  return {
    element: prestress ? "ring prestressing tendons" : "ring tie bars",
    material: tie.material,
    count: 1,
    lengthM: q.ringLengthM,
    section: `${(tie.tieAreaM2 * 1e4).toFixed(0)} cm² in a ${Math.sqrt(tie.ringAreaM2).toFixed(2)} m square ring`,
    designForceN: ringTensionUlsN,
    resistanceN: tie.capacityN,
    utilisation: ringTensionUlsN / tie.capacityN,
    governing: prestress ? "ULS f_p0.1k/γ_S or no decompression under SLS" : "ULS f_yd or crack control σ_s ≤ 240 MPa under SLS",
  };
}

function shellWarnings(brief: Brief, cap: SphericalCap, s: ShellThickness): string[] {
  const warnings: string[] = [
    `thickness set by ${s.governing}`,
    "membrane theory with the plan-mean snow: drifted snow, wind and the edge disturbance bend the shell; rates cover them only roughly",
    "the shell is cast on full falsework over the whole plan; the supports of the edge ring are not included",
  ];
  if (brief.riseM / brief.spanM < 0.1) warnings.push("rise under span/10: the shell is shallow and its buckling very sensitive to imperfections and creep");
  if (cap.edgeAngleRad > hoopSignChangeAngleRad()) warnings.push("edge angle beyond 51.8°: hoop tension near the edge, reinforced at the shell rate plus the hoop tie");
  if (brief.spanM > 100) warnings.push("thin concrete shells above about 100 m span are rare (from memory): falsework and creep dominate");
  return warnings;
}

/**
 * Designs a thin spherical concrete shell on an edge ring: thickness from the constructable
 * minimum, buckling (k·p_cl, Zoelly, with the creep-reduced modulus) and membrane compression
 * (Timoshenko & Woinowsky-Krieger ch. 14), iterated with its own weight; ring tension T = H·a tied
 * by reinforcement or prestress; reinforcement from rates, never below EN 1992-1-1 eq. 9.1N;
 * formwork over the whole soffit. Validity: membrane state (rise/span ≳ 1/10), 20–200 m.
 */
function design(brief: Brief, opts: ConcreteShellOptions): DesignParts {
  const cap = sphericalCap(brief.spanM, brief.riseM);
  const concrete = concreteProperties(opts.concreteClass as ConcreteClass);
  const fcd = concreteDesignStrengthPa(concrete.fckPa);
  const fyd = rebarDesignStrengthPa();
  const inputs = {
    brief,
    actions: roofActions(brief),
    radiusM: cap.radiusM,
    capAngleRad: cap.edgeAngleRad,
    minThicknessM: opts.minThicknessMm / 1000,
    effectiveModulusPa: concrete.ecmPa / (1 + opts.creepCoefficient),
    knockDown: opts.knockDown,
    designStrengthPa: fcd,
    finishesKPa: opts.finishesKPa,
    stepM: 0.005,
  };
  const converged = convergeSelfWeight<ShellThickness>(
    (g) => {
      const t = shellThickness(inputs, g);
      return { value: t, selfWeightKPa: shellSelfWeightKPa(t.thicknessM, opts.finishesKPa) };
    },
    shellSelfWeightKPa(inputs.minThicknessM, opts.finishesKPa),
    { section: shellSection(brief, 0.1), reason: (m) => `${m}: a thicker, lighter or less shallow shell is needed` },
  );
  const s = converged.value;
  const t = s.thicknessM;
  const ringTensionUlsN = edgeRingTensionN(s.edgeMeridionalUlsNPerM, cap.edgeAngleRad, cap.baseRadiusM);
  const ringTensionSlsN = edgeRingTensionN(s.edgeMeridionalSlsNPerM, cap.edgeAngleRad, cap.baseRadiusM);
  const tie = edgeRingTie(opts.ringTie, ringTensionUlsN, ringTensionSlsN, fyd, concrete.fckPa, t);
  const q = quantities(cap, opts, s, tie, concrete.fctmPa, fyd);
  const checks: Check[] = [
    check("shell buckling", "Zoelly p_cl × knock-down, E_cm/(1 + φ)", s.designPressurePa, s.bucklingCapacityPa, "Pa"),
    check("membrane compression", "EN 1992-1-1 eq. 3.15 f_cd", s.maxCompressionNPerM / t, fcd, "Pa"),
    check(`edge ring tie (${opts.ringTie})`, opts.ringTie === "prestress" ? "EN 1992-1-1 §3.3.6" : "EN 1992-1-1 §3.2.7", ringTensionUlsN, tie.capacityN, "N"),
  ];
  const usableRadius = capUsableRadiusM(cap.radiusM, brief.riseM, cap.baseRadiusM, brief.eavesHeightM, t, brief.minClearHeightM);
  const summary = [
    { key: "thicknessMm", label: "Shell thickness", value: t * 1000, unit: "mm" },
    { key: "bucklingThicknessMm", label: "Thickness for buckling", value: s.bucklingThicknessM * 1000, unit: "mm" },
    { key: "compressionThicknessMm", label: "Thickness for membrane compression", value: s.compressionThicknessM * 1000, unit: "mm" },
    { key: "sphereRadiusM", label: "Sphere radius", value: cap.radiusM, unit: "m" },
    { key: "edgeWidthM", label: "Thickened edge width 2.4√(Rt)", value: q.edgeWidthM, unit: "m" },
    { key: "ringTensionKN", label: "Edge ring tension (ULS)", value: ringTensionUlsN / 1000, unit: "kN" },
    { key: "concreteM3", label: "Concrete", value: q.concreteM3, unit: "m³" },
    { key: "rebarKgPerM3", label: "Reinforcement per m³ of concrete", value: (q.shellRebarKg + q.edgeRebarKg + q.ringRebarKg + (tie.material === "rebar" ? q.tieMassKg : 0)) / q.concreteM3, unit: "kg/m³" },
  ];
  return {
    summary,
    members: [ringMember(opts, q, tie, ringTensionUlsN)],
    takeoff: shellTakeoff(opts, q, tie, cap),
    checks,
    warnings: shellWarnings(brief, cap, s),
    iterations: converged.iterations,
    usableFloorM2: Math.PI * usableRadius * usableRadius,
    ...capEnvelope(cap, brief.eavesHeightM),
    drawing: { section: shellSection(brief, t, opts.edgeThickening, q.edgeWidthM, Math.sqrt(tie.ringAreaM2)), plan: shellPlan(cap.baseRadiusM) },
  };
}

export const concreteShell = defineScheme({
  id: "concrete-shell",
  label: "Thin concrete shell",
  colour: "#7f7f7f",
  description:
    "A thin reinforced concrete spherical cap on an edge ring, cast on falsework. The shell carries the roof by membrane compression; its thickness is set by buckling, allowing for creep, or by the smallest thickness that can be built; the ring ties the outward thrust.",
  validSpanM: { min: 20, max: 200 },
  options: defineOptions(declarations),
  design,
});
