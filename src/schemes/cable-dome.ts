import type { Brief } from "../study/brief";
import type { Catalogue } from "../catalogue/types";
import type { Check, Design, MemberGroup, OptionSpec, SchemeModel } from "./types";
import type { TakeoffRow } from "../takeoff/takeoff-row";
import { roofActions } from "../loads/roof-actions";
import { usableFloorAreaM2 } from "../mechanics/usable-floor";
import { assembleDesign, check, infeasibleDesign } from "./assemble-design";
import { iterateSelfWeight, ConvergenceError } from "./converge";
import { autoHoopCount, cableDomeLayout, cableDomePlan, cableDomeSection, cableDomeUndersideM } from "./cable-dome-geometry";
import { sizeCableDome, SizingError, type DomeSizing } from "./cable-dome-sizing";
import { designCompressionRing, PLAIN_CONCRETE_DENSITY_KG_PER_M3, type RingMaterial } from "./compression-ring";
import { FABRIC_CHOICES, TENSION_COMMON_OPTIONS, fabricCostItem, findFabric } from "./tension-common";
import { checkSchemeOptions } from "./check-options";

export type CableDomeOptions = {
  /** Radial trusses N; 0 = automatic (even count with ridges ≤ 12 m apart at the perimeter, closer where the fabric needs it, at least 12). */
  radialTrusses: number;
  /** Hoops n; 0 = automatic (one per 27.5 m of radius, 1 to 8; fewer where the outer members cannot be made). */
  hoops: number;
  /** Central tension ring radius / plan radius, –. */
  centralRingRatio: number;
  /** Rise of each diagonal over its radial bay, –: sets the post heights. */
  postHeightRatio: number;
  /** Tension every cable keeps under the worst ULS case, as a fraction of its prestress, –. */
  residualPrestress: number;
  /** γR of EN 1993-1-11 §6.2, –. */
  gammaR: number;
  ringMaterial: RingMaterial;
  /** Count the radial stiffness of the ridge cables as an elastic foundation restraining the ring's in-plane buckling. */
  ringCableRestraint: boolean;
  /** Fabric id (data/fabrics.csv). */
  fabric: string;
  /** Seams, overlaps and cutting waste, % of the roof surface. */
  fabricAllowancePct: number;
  /** Sag of a fabric panel / its span between ridges, –. */
  fabricSagRatio: number;
  /** Fabric strength / allowable membrane force under characteristic load, –. */
  fabricStrengthFactor: number;
  /** Yield strength of posts and steel rings, MPa. */
  steelYieldMPa: number;
};

const defaults: CableDomeOptions = {
  radialTrusses: 0, // automatic
  hoops: 0, // automatic
  centralRingRatio: 0.1, // common practice, no source
  postHeightRatio: 0.6, // common practice, no source (0.6 gives the lightest roof with its ring at 160 m here; 0.4 more usable floor)
  residualPrestress: 0.1, // common practice, no source
  gammaR: 1.0, // EN 1993-1-11:2006 Table 6.2 (from memory); 1.0 is the safe side
  ringMaterial: "concrete",
  ringCableRestraint: true, // the cables do restrain the ring; false gives the bare-ring 3EI/R³ (Timoshenko & Gere ch. 7)
  fabric: "ptfe-glass-iii",
  fabricAllowancePct: 10, // common practice, no source
  fabricSagRatio: 0.1, // common practice, no source
  fabricStrengthFactor: 5, // common practice for coated fabrics under long-term load (from memory)
  steelYieldMPa: 355, // S355, EN 1993-1-1 Table 3.1 (t ≤ 40 mm)
};

const options: readonly OptionSpec[] = [
  { key: "radialTrusses", label: "Radial trusses (0 = automatic)", kind: "number", unit: "", min: 0, max: 120, step: 2, integer: true, source: "automatic: perimeter ridge spacing ≤ 12 m (common practice, no source), closer where the fabric panel needs it; at least 12" },
  { key: "hoops", label: "Hoops (0 = automatic)", kind: "number", unit: "", min: 0, max: 8, step: 1, integer: true, source: "automatic: one per 27.5 m of radius, common practice 20–35 m (no source); fewer where the outer members cannot be made" },
  { key: "centralRingRatio", label: "Central ring radius / plan radius", kind: "number", unit: "", min: 0.03, max: 0.3, step: 0.01, source: "common practice, no source" },
  { key: "postHeightRatio", label: "Diagonal rise per bay", kind: "number", unit: "", min: 0.05, max: 1.0, step: 0.01, source: "common practice, no source" },
  { key: "ringMaterial", label: "Compression ring", kind: "select", unit: "", choices: [{ value: "concrete", label: "Reinforced concrete" }, { value: "steel", label: "Steel box" }], source: "design choice" },
  { key: "ringCableRestraint", label: "Ridge cables restrain ring buckling", kind: "toggle", unit: "", source: "ring on elastic foundation (from memory); off: bare ring 3EI/R³, Timoshenko & Gere ch. 7" },
  { key: "fabric", label: "Fabric", kind: "select", unit: "", choices: FABRIC_CHOICES, source: "data/fabrics.csv" },
  ...TENSION_COMMON_OPTIONS,
];

const validSpanM = { min: 40, max: 250 };
const identity = { id: "cable-dome" as const, label: "Cable dome", validSpanM };

function design(brief: Brief, opts: CableDomeOptions, catalogue: Catalogue): Design {
  checkSchemeOptions(options, opts);
  if (opts.hoops > 0) return designWith(brief, opts, catalogue, opts.hoops);
  // Automatic hoops: one per 27.5 m of radius, fewer where the outer members cannot be made (the
  // force grows by a factor at each hoop outwards).
  const first = designWith(brief, opts, catalogue, autoHoopCount(brief.spanM));
  for (let hoops = autoHoopCount(brief.spanM) - 1; !first.feasible && hoops >= 1; hoops--) {
    const fewer = designWith(brief, opts, catalogue, hoops);
    if (fewer.feasible) return { ...fewer, warnings: [...fewer.warnings, `${hoops} hoops instead of the usual ${autoHoopCount(brief.spanM)}: with more, ${first.reason}`] };
  }
  return first;
}

function designWith(brief: Brief, opts: CableDomeOptions, catalogue: Catalogue, hoops: number): Design {
  const fabric = findFabric(catalogue, opts.fabric);
  const actions = roofActions(brief);
  // Widest fabric panel the automatic truss count allows: n = p s/(8·sag ratio) ≤ allowable, with the
  // characteristic pressure for an estimated permanent load (fabric + services + 0.35 kPa of cables and posts).
  const allowable = Math.min(fabric.tensileWarpNPerM, fabric.tensileWeftNPerM) / opts.fabricStrengthFactor;
  const permanentEstimateKPa = brief.servicesKPa + 0.35 + (fabric.massKgPerM2 * 9.81) / 1000;
  const panelKPa = Math.max(permanentEstimateKPa + actions.leadingVariableKPa, actions.upliftKPa - permanentEstimateKPa);
  const maxSpacingM = (0.95 * 8 * opts.fabricSagRatio * allowable) / (panelKPa * 1000);
  const layout = cableDomeLayout(brief, opts.radialTrusses, hoops, opts.centralRingRatio, opts.postHeightRatio, maxSpacingM);
  const section = cableDomeSection(layout, brief.eavesHeightM);
  const yieldPa = opts.steelYieldMPa * 1e6;
  const input = {
    brief, actions, layout, catalogue, fabric, yieldPa,
    residualPrestress: opts.residualPrestress, gammaR: opts.gammaR, fabricAllowancePct: opts.fabricAllowancePct, fabricSagRatio: opts.fabricSagRatio,
  };
  let converged: { value: DomeSizing; iterations: number };
  try {
    converged = iterateSelfWeight((g) => {
      const value = sizeCableDome(input, g);
      return { value, selfWeightKPa: value.selfWeightKPa };
    }, 0.15);
  } catch (error) {
    if (error instanceof ConvergenceError || error instanceof SizingError) return infeasibleDesign("cable-dome", brief, error.message, [], section);
    throw error;
  }
  const sized = converged.value;
  const a = layout.cap.baseRadiusM;
  const ridges = sized.groups.filter((m) => m.kind === "ridge");
  // Radial stiffness of the ridge chain at the ring, series springs EA cos²θ / L (central ring held): the ring's elastic foundation.
  const chainFlexibility = ridges.reduce((sum, m, i) => {
    const dr = (i + 1 < layout.truss.radiiM.length ? (layout.truss.radiiM[i + 1] as number) : a) - (layout.truss.radiiM[i] as number);
    const cos = dr / m.lengthM;
    return sum + m.lengthM / (m.modulusPa * m.areaM2 * cos * cos);
  }, 0);
  const foundation = layout.trusses / chainFlexibility / (2 * Math.PI * a);
  const ring = designCompressionRing({ compressionN: sized.ringCompressionN, radiusM: a, foundationNPerM2: opts.ringCableRestraint ? foundation : 0, spokes: layout.trusses, material: opts.ringMaterial, yieldPa });

  const checks: Check[] = sized.groups.map((m) => check(m.name, m.governing, m.designForceN, m.resistanceN, "N"));
  const fabricClause = "n = p s²/(8f) (Irvine 1981 ch. 1) against strength / factor (common practice)";
  checks.push(check("fabric panel, gravity", fabricClause, sized.fabricGravityNPerM, allowable, "N/m"));
  checks.push(check("fabric panel, uplift", fabricClause, sized.fabricUpliftNPerM, allowable, "N/m"));
  if (ring) checks.push(check("compression ring", ring.governing, sized.ringCompressionN, ring.resistanceN, "N"));

  const members: MemberGroup[] = sized.groups.map((m) => ({
    element: m.name,
    material: m.kind === "post" ? "steel-hot-finished-hollow" : m.kind === "central ring" ? "steel-plate" : "steel-strand",
    count: m.count, lengthM: m.lengthM, section: m.designation, designForceN: m.designForceN, resistanceN: m.resistanceN, utilisation: m.utilisation, governing: m.governing,
  }));
  const massOf = (kinds: readonly string[]) => sized.groups.filter((m) => kinds.includes(m.kind)).reduce((s, m) => s + m.massKg, 0);
  const cableRow = (element: string, kind: string): TakeoffRow => {
    const massKg = massOf([kind]);
    return { element, material: "steel-strand", costItem: "cable", quantity: massKg / 1000, unit: "t", massKg };
  };
  const takeoff: TakeoffRow[] = [
    cableRow("ridge cables", "ridge"),
    cableRow("diagonal cables", "diagonal"),
    cableRow("hoops", "hoop"),
    { element: "posts", material: "steel-hot-finished-hollow", costItem: "steel-mast", quantity: massOf(["post"]) / 1000, unit: "t", massKg: massOf(["post"]) },
    { element: "central tension ring", material: "steel-plate", costItem: "steel-ring", quantity: massOf(["central ring"]) / 1000, unit: "t", massKg: massOf(["central ring"]) },
    { element: "fabric", material: fabric.material, costItem: fabricCostItem(fabric), quantity: sized.fabricAreaM2, unit: "m2", massKg: sized.fabricMassKg },
  ];
  if (ring && opts.ringMaterial === "steel") {
    takeoff.push({ element: "compression ring", material: "steel-plate", costItem: "steel-ring", quantity: ring.steelKg / 1000, unit: "t", massKg: ring.steelKg });
  } else if (ring) {
    takeoff.push({ element: "compression ring", material: "concrete-c40-50", costItem: "concrete", quantity: ring.concreteM3, unit: "m3", massKg: ring.concreteM3 * PLAIN_CONCRETE_DENSITY_KG_PER_M3 });
    takeoff.push({ element: "compression ring reinforcement", material: "rebar", costItem: "rebar", quantity: ring.steelKg / 1000, unit: "t", massKg: ring.steelKg });
  }
  const plan = layout.cap.planAreaM2;
  const perM2 = (kg: number) => kg / plan;
  const cablesKg = massOf(["ridge", "diagonal", "hoop"]);
  const summary = [
    { key: "trusses", label: "Radial trusses", value: layout.trusses, unit: "" },
    { key: "hoops", label: "Hoops", value: layout.hoops, unit: "" },
    { key: "prestress", label: "Prestress (central upper ring force)", value: sized.prestressN / 1000, unit: "kN" },
    { key: "ringForce", label: "Compression ring force (ULS)", value: sized.ringCompressionN / 1000, unit: "kN" },
    { key: "gravityUls", label: `ULS gravity (EN 1990 eq. ${sized.gravityExpression})`, value: sized.gravityPa / 1000, unit: "kPa" },
    { key: "upliftUls", label: "ULS net pressure, uplift case (negative up)", value: sized.upliftPa / 1000, unit: "kPa" },
    { key: "cableKgPerM2", label: "Cables", value: perM2(cablesKg), unit: "kg/m²" },
    { key: "postKgPerM2", label: "Posts", value: perM2(massOf(["post"])), unit: "kg/m²" },
    { key: "fabricKgPerM2", label: "Fabric", value: perM2(sized.fabricMassKg), unit: "kg/m²" },
    { key: "ringKgPerM2", label: "Compression ring", value: ring ? perM2(ring.steelKg + ring.concreteM3 * PLAIN_CONCRETE_DENSITY_KG_PER_M3) : 0, unit: "kg/m²" },
  ];
  const warnings = [
    "axisymmetric first-order analysis: asymmetric snow and wind, and large-displacement effects, are not analysed (cable domes are sensitive to both: check at the next stage)",
    "the columns or stand structure under the compression ring are not designed",
    "self-weight is smeared over the plan and applied at the post heads",
  ];
  const usableFloorM2 = usableFloorAreaM2(a, (r) => brief.eavesHeightM + cableDomeUndersideM(layout, r), brief.minClearHeightM);
  return assembleDesign(identity, brief, {
    summary, members, takeoff, checks, warnings,
    iterations: converged.iterations,
    usableFloorM2,
    roofSurfaceM2: layout.cap.surfaceM2,
    enclosedVolumeM3: plan * brief.eavesHeightM + layout.cap.volumeM3,
    drawing: { section, plan: cableDomePlan(layout) },
    reason: ring ? "" : `no ${opts.ringMaterial} compression ring up to 8 m wide carries ${(sized.ringCompressionN / 1e6).toFixed(0)} MN with in-plane buckling: use more radial trusses (stiffer restraint) or the other ring material`,
  });
}

/** Cable dome: radial cable trusses between a perimeter compression ring and a central tension ring, fabric between the ridges. */
export const cableDome: SchemeModel<CableDomeOptions> = {
  ...identity,
  description:
    "Radial cable trusses span from a perimeter compression ring to a central tension ring: ridge cables over the top, vertical posts standing on hoops, and diagonals from the foot of each post to the head of the next. Prestress in the cables holds the posts up; coated fabric spans between the ridges. The roof is very light; the compression ring carries the whole horizontal thrust.",
  options,
  defaults,
  design,
};
