import type { Brief } from "../../brief";
import type { MaterialId } from "../../materials";
import type { TakeoffRow } from "../../takeoff/takeoff-row";
import type { Check, DesignParts, MemberGroup } from "../kit";
import { capEnvelope, capFloor, characteristicVariableKPa, check, convergeSelfWeight, defineScheme, uniformCombinations, SchemeError, UNIFORM_EQUIVALENT_WARNING } from "../kit";
import { sphericalCap, type SphericalCap } from "../../mechanics/spherical-cap";
import { edgeRingTensionN, hoopSignChangeAngleRad } from "../../mechanics/spherical-membrane";
import { concreteProperties, concreteDesignStrengthPa, minimumReinforcementRatio, PLAIN_CONCRETE_DENSITY_KG_PER_M3, rebarDesignStrengthPa, type ConcreteClass } from "../../mechanics/concrete";
import { STEEL_DENSITY_KG_PER_M3 } from "../../catalogue/chs";
import { designBasis } from "../../loads/design-basis";
import { shellSelfWeightKPa, shellThickness, type ShellInputs, type ShellThickness } from "./sizing";
import { ribbedShell, type RibbedShellResult } from "./ribbed";
import { edgeRingTie, type EdgeRingTie } from "./ring";
import { shellPlan, shellSection } from "./drawing";
import { concreteShellDeclaration, type ConcreteShellOptions } from "./declaration";

function concreteMaterial(strengthClass: string, cement: string): MaterialId {
  const base = strengthClass === "C40/50" ? "concrete-c40-50" : "concrete-c30-37";
  return (cement === "ggbs" ? `${base}-ggbs` : base) as MaterialId;
}

/** Shell, thickened edge and ring: volumes and reinforcement (rates, never below EN 1992-1-1 eq. 9.1N). */
function quantities(cap: SphericalCap, opts: ConcreteShellOptions, s: ShellForm, tie: EdgeRingTie, fctmPa: number, fydPa: number) {
  const { radiusM: R, edgeAngleRad: phi0 } = cap;
  const t = s.thicknessM;
  const ringLengthM = 2 * Math.PI * cap.baseRadiusM;
  const ringVolumeM3 = tie.ringAreaM2 * ringLengthM;
  const tieMassKg = tie.tieAreaM2 * ringLengthM * STEEL_DENSITY_KG_PER_M3 * 1.1; // laps and anchorages +10 % (common practice, no source)
  const edgeWidthM = Math.min(2.4 * Math.sqrt(R * t), R * phi0);
  // The edge zone is the spherical zone from φ0 − w/R to φ0: 2πR²(cos(φ0 − w/R) − cos φ0), never more than the cap.
  const edgeAreaM2 = 2 * Math.PI * R * R * (Math.cos(phi0 - edgeWidthM / R) - Math.cos(phi0));
  const edgeExtraM3 = 0.5 * (opts.edgeThickening - 1) * t * edgeAreaM2;
  const shellM3 = s.equivalentThicknessM * cap.surfaceM2;
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
    ribConcreteM3: (s.equivalentThicknessM - t) * cap.surfaceM2,
    edgeRebarKg: Math.max(opts.edgeRateKgPerM3, minimumRateKgPerM3) * edgeZoneM3,
    ringRebarKg: opts.ringRateKgPerM3 * ringVolumeM3,
    concreteM3: shellM3 + edgeExtraM3 + ringVolumeM3,
  };
}
type Quantities = ReturnType<typeof quantities>;

function shellTakeoff(opts: ConcreteShellOptions, q: Quantities, tie: EdgeRingTie, cap: SphericalCap): TakeoffRow[] {
  const material = concreteMaterial(opts.concreteClass, opts.cement);
  const row = (element: string, mat: MaterialId | null, costItem: TakeoffRow["costItem"], quantity: number, unit: TakeoffRow["unit"], massKg: number, group: TakeoffRow["group"] = "structure"): TakeoffRow => ({ element, material: mat, costItem, quantity, unit, massKg, group });
  const tonnes = (element: string, mat: MaterialId, costItem: TakeoffRow["costItem"], massKg: number) => row(element, mat, costItem, massKg / 1000, "t", massKg, "perimeter");
  const rows = [
    row(opts.form === "ribbed" ? "shell and rib concrete" : "shell concrete", material, "concrete", q.shellConcreteM3, "m3", q.shellConcreteM3 * PLAIN_CONCRETE_DENSITY_KG_PER_M3),
    ...(q.ringVolumeM3 > 0 ? [row("edge ring concrete", material, "concrete", q.ringVolumeM3, "m3", q.ringVolumeM3 * PLAIN_CONCRETE_DENSITY_KG_PER_M3, "perimeter")] : []),
    row("shell reinforcement", "rebar", "rebar", q.shellRebarKg / 1000, "t", q.shellRebarKg),
    row("edge reinforcement", "rebar", "rebar", q.edgeRebarKg / 1000, "t", q.edgeRebarKg),
    ...(q.ringRebarKg > 0 ? [tonnes("ring reinforcement", "rebar", "rebar", q.ringRebarKg)] : []),
  ];
  if (opts.ringTie === "steel") rows.push(tonnes("steel tension ring", "steel-plate", "steel-ring", q.tieMassKg));
  else if (opts.ringTie === "prestress") rows.push(tonnes("ring prestressing tendons", tie.material, "prestressing", q.tieMassKg));
  else rows.push(tonnes("ring tie bars", tie.material, "rebar", q.tieMassKg));
  rows.push(row("formwork and falsework", null, "formwork", cap.surfaceM2, "m2", 0));
  return rows;
}

function ringMember(opts: ConcreteShellOptions, q: Quantities, tie: EdgeRingTie, ringTensionUlsN: number): MemberGroup {
  const prestress = opts.ringTie === "prestress";
  return {
    element: opts.ringTie === "steel" ? "steel tension ring" : prestress ? "ring prestressing tendons" : "ring tie bars",
    material: tie.material,
    count: 1,
    lengthM: q.ringLengthM,
    section: tie.ringAreaM2 > 0 ? `${(tie.tieAreaM2 * 1e4).toFixed(0)} cm² in a ${Math.sqrt(tie.ringAreaM2).toFixed(2)} m square ring` : `steel ring, ${(tie.tieAreaM2 * 1e4).toFixed(0)} cm²`,
    designForceN: ringTensionUlsN,
    resistanceN: tie.capacityN,
    utilisation: ringTensionUlsN / tie.capacityN,
    governing: opts.ringTie === "steel" ? "tension, EN 1993-1-1 §6.2.3" : prestress ? "ULS f_p0.1k/γ_S or no decompression under SLS" : "ULS f_yd or crack control σ_s ≤ 240 MPa under SLS",
  };
}

/** Largest span of a smooth thin concrete dome taken as credible, m: the method's upper limit (common practice, no source — built smooth domes stay well below it). */
const SMOOTH_CREDIBLE_SPAN_M = 200;
/** Largest span of a ribbed concrete dome taken as credible, m: a ribbed concrete dome of about 201 m with a 127 mm shell between ribs has been built (issue 12's check value); 250 m allows a margin (common practice, no source). */
const RIBBED_CREDIBLE_SPAN_M = 250;

/** What the two forms share: the shell between ribs (the whole shell when smooth), its concrete per m² and the membrane state. */
type ShellForm = (ShellThickness | RibbedShellResult) & { equivalentThicknessM: number };

function shellWarnings(brief: Brief, cap: SphericalCap, s: ShellForm, ribbed: boolean): string[] {
  const warnings: string[] = [
    ribbed ? `shell between the ribs set by ${s.governing}` : `thickness set by ${s.governing}`,
    UNIFORM_EQUIVALENT_WARNING,
    "the edge disturbance bends the shell near the ring; rates cover it only roughly",
    "the shell is cast on full falsework over the whole plan; the supports of the edge ring are not included",
  ];
  if (brief.riseM / brief.spanM < 0.1) warnings.push("rise under span/10: the shell is shallow and its buckling very sensitive to imperfections and creep");
  if (cap.edgeAngleRad > hoopSignChangeAngleRad()) warnings.push("edge angle beyond 51.8°: hoop tension near the edge, reinforced at the shell rate plus the hoop tie");
  if (brief.spanM > 100 && !ribbed) warnings.push("thin smooth concrete shells above about 100 m span are rare (from memory): falsework and creep dominate; the ribbed form is lighter");
  return warnings;
}

function shellInputs(brief: Brief, opts: ConcreteShellOptions, cap: SphericalCap, concrete: ReturnType<typeof concreteProperties>): ShellInputs {
  const basis = designBasis(brief);
  return {
    combinations: uniformCombinations(basis),
    servicesKPa: brief.servicesKPa,
    slsVariableKPa: characteristicVariableKPa(basis),
    radiusM: cap.radiusM,
    capAngleRad: cap.edgeAngleRad,
    minThicknessM: opts.minThicknessMm / 1000,
    effectiveModulusPa: concrete.ecmPa / (1 + opts.creepCoefficient),
    knockDown: opts.knockDown,
    designStrengthPa: concreteDesignStrengthPa(concrete.fckPa),
    finishesKPa: opts.finishesKPa,
    stepM: 0.005,
  };
}

/** The shell of the chosen form iterated with its own weight. */
function sizeShell(brief: Brief, opts: ConcreteShellOptions, inputs: ShellInputs): { s: ShellForm; iterations: number } {
  const failure = { section: shellSection(brief, 0.1), reason: (m: string) => `${m}: a thicker, lighter or less shallow shell is needed` };
  if (opts.form === "ribbed") {
    const c = convergeSelfWeight<RibbedShellResult>(
      (g) => {
        const r = ribbedShell(inputs, opts.ribSpacingM, g);
        return { value: r, selfWeightKPa: shellSelfWeightKPa(r.equivalentThicknessM, opts.finishesKPa) };
      },
      shellSelfWeightKPa(inputs.minThicknessM * 2, opts.finishesKPa),
      failure,
    );
    if (c.value.failure) throw new SchemeError(c.value.failure, { section: shellSection(brief, c.value.thicknessM) });
    return { s: c.value, iterations: c.iterations };
  }
  const c = convergeSelfWeight<ShellThickness>(
    (g) => {
      const t = shellThickness(inputs, g);
      return { value: t, selfWeightKPa: shellSelfWeightKPa(t.thicknessM, opts.finishesKPa) };
    },
    shellSelfWeightKPa(inputs.minThicknessM, opts.finishesKPa),
    failure,
  );
  return { s: { ...c.value, equivalentThicknessM: c.value.thicknessM }, iterations: c.iterations };
}

function shellChecks(opts: ConcreteShellOptions, s: ShellForm, fcd: number, ringTensionUlsN: number, tie: EdgeRingTie): Check[] {
  const t = s.thicknessM;
  const checks: Check[] =
    "ribDepthM" in s
      ? [
          check("general buckling of the ribbed shell", "equivalent continuum 4√(DB)/R² × knock-down, E_cm/(1 + φ)", s.designPressurePa, s.bucklingCapacityPa, "Pa"),
          check("panel buckling between the ribs", "flat plate 2π²D/L², Timoshenko & Gere §9.2 (from memory)", s.panelForceNPerM, s.panelCapacityNPerM, "N/m"),
        ]
      : [check("shell buckling", "Zoelly p_cl × knock-down, E_cm/(1 + φ)", s.designPressurePa, s.bucklingCapacityPa, "Pa")];
  checks.push(check("membrane compression", "EN 1992-1-1 eq. 3.15 f_cd", s.maxCompressionNPerM / t, fcd, "Pa"));
  const clause = opts.ringTie === "prestress" ? "EN 1992-1-1 §3.3.6" : opts.ringTie === "steel" ? "EN 1993-1-1 eq. 6.6" : "EN 1992-1-1 §3.2.7";
  checks.push(check(`edge ring tie (${opts.ringTie})`, clause, ringTensionUlsN, tie.capacityN, "N"));
  return checks;
}

function shellSummary(s: ShellForm, cap: SphericalCap, q: Quantities, tie: EdgeRingTie, ringTensionUlsN: number) {
  const ribbed = "ribDepthM" in s;
  return [
    { key: "thicknessMm", label: ribbed ? "Shell thickness between the ribs" : "Shell thickness", value: s.thicknessM * 1000, unit: "mm" },
    ...(ribbed
      ? [
          { key: "ribSpacingM", label: "Rib spacing", value: s.ribSpacingM, unit: "m" },
          { key: "ribDepthMm", label: "Rib depth below the shell", value: s.ribDepthM * 1000, unit: "mm" },
          { key: "ribWidthMm", label: "Rib width", value: s.ribWidthM * 1000, unit: "mm" },
        ]
      : [
          { key: "bucklingThicknessMm", label: "Thickness for buckling", value: s.bucklingThicknessM * 1000, unit: "mm" },
          { key: "compressionThicknessMm", label: "Thickness for membrane compression", value: s.compressionThicknessM * 1000, unit: "mm" },
        ]),
    { key: "equivalentThicknessMm", label: "Concrete per m² of shell (ribs included)", value: s.equivalentThicknessM * 1000, unit: "mm" },
    { key: "sphereRadiusM", label: "Sphere radius", value: cap.radiusM, unit: "m" },
    { key: "edgeWidthM", label: "Thickened edge width 2.4√(Rt)", value: q.edgeWidthM, unit: "m" },
    { key: "ringTensionKN", label: "Edge ring tension (ULS)", value: ringTensionUlsN / 1000, unit: "kN" },
    { key: "concreteM3", label: "Concrete", value: q.concreteM3, unit: "m³" },
    { key: "rebarKgPerM3", label: "Reinforcement per m³ of concrete", value: (q.shellRebarKg + q.edgeRebarKg + q.ringRebarKg + (tie.material === "rebar" ? q.tieMassKg : 0)) / q.concreteM3, unit: "kg/m³" },
  ];
}

/**
 * Designs a thin spherical concrete shell on an edge ring, smooth or ribbed: thickness (smooth) from
 * the constructable minimum, buckling (k·p_cl, Zoelly, with the creep-reduced modulus) and membrane
 * compression (Timoshenko & Woinowsky-Krieger ch. 14); ribbed: the shell between ribs for panel
 * buckling and compression, the ribs for general buckling of the equivalent continuum; every
 * combination of the design basis by its uniform equivalent, iterated with its own weight; ring
 * tension T = H·a tied by a steel ring, reinforcement or prestress; reinforcement from rates, never
 * below EN 1992-1-1 eq. 9.1N; formwork over the whole soffit. Beyond the form's credible span the
 * shell is infeasible.
 */
function design(brief: Brief, opts: ConcreteShellOptions): DesignParts {
  const cap = sphericalCap(brief.spanM, brief.riseM);
  const ribbed = opts.form === "ribbed";
  const credible = ribbed ? RIBBED_CREDIBLE_SPAN_M : SMOOTH_CREDIBLE_SPAN_M;
  if (brief.spanM > credible) {
    throw new SchemeError(
      ribbed
        ? `a ribbed concrete dome over ${RIBBED_CREDIBLE_SPAN_M} m has no built precedent (the largest is about 201 m; common practice, no source): choose a lattice or cable roof`
        : `a smooth concrete shell over ${SMOOTH_CREDIBLE_SPAN_M} m is not credible (common practice, no source): choose the ribbed form`,
      { section: shellSection(brief, 0.1) },
    );
  }
  const concrete = concreteProperties(opts.concreteClass as ConcreteClass);
  const fcd = concreteDesignStrengthPa(concrete.fckPa);
  const fyd = rebarDesignStrengthPa();
  const inputs = shellInputs(brief, opts, cap, concrete);
  const { s, iterations } = sizeShell(brief, opts, inputs);
  const t = s.thicknessM;
  const ringTensionUlsN = edgeRingTensionN(s.edgeMeridionalUlsNPerM, cap.edgeAngleRad, cap.baseRadiusM);
  const ringTensionSlsN = edgeRingTensionN(s.edgeMeridionalSlsNPerM, cap.edgeAngleRad, cap.baseRadiusM);
  const tie = edgeRingTie(opts.ringTie, ringTensionUlsN, ringTensionSlsN, fyd, concrete.fckPa, t);
  const q = quantities(cap, opts, s, tie, concrete.fctmPa, fyd);
  const soffitDepthM = "ribDepthM" in s ? t + s.ribDepthM : t;
  return {
    summary: shellSummary(s, cap, q, tie, ringTensionUlsN),
    members: [ringMember(opts, q, tie, ringTensionUlsN)],
    takeoff: shellTakeoff(opts, q, tie, cap),
    checks: shellChecks(opts, s, fcd, ringTensionUlsN, tie),
    governingLoadCase: s.governingCase,
    regime: ribbed ? "ribbed" : "smooth",
    warnings: shellWarnings(brief, cap, s, ribbed),
    iterations,
    floor: capFloor(cap, brief.eavesHeightM, soffitDepthM),
    ...capEnvelope(cap, brief.eavesHeightM),
    drawing: { section: shellSection(brief, soffitDepthM, opts.edgeThickening, q.edgeWidthM, Math.sqrt(tie.ringAreaM2)), plan: shellPlan(cap, "ribSpacingM" in s ? s.ribSpacingM : 0) },
  };
}

export const concreteShell = defineScheme(concreteShellDeclaration, design);
