import type { Brief } from "../../brief";
import type { Catalogue, GlulamClass } from "../../catalogue/types";
import type { TakeoffRow } from "../../takeoff/takeoff-row";
import type { Check, DesignParts, Lines, MemberGroup } from "../kit";
import { sphericalCap, type SphericalCap } from "../../mechanics/spherical-cap";
import { CapTooSmallError, geodesicFrequencyFor, type GeodesicCap } from "../../mechanics/geodesic";
import { cachedGeodesicCap } from "../../mechanics/geodesic-cache";
import { glulamKMod, type LoadDurationClass, type ServiceClass } from "../../mechanics/timber-kmod";
import { TIMBER_GAMMA_M } from "../../mechanics/timber-gamma-m";
import { creepReducedModulusPa, GLULAM_K_DEF } from "../../mechanics/timber-creep";
import { charringDepthM, effectiveCharDepthM, CHARRING_RATE_M_PER_MIN, ZERO_STRENGTH_LAYER_M } from "../../mechanics/timber-charring";
import { kPaFromKgPerM2 } from "../../mechanics/gravity";
import { designBasis } from "../../loads/design-basis";
import { capEnvelope, capFloor, capLatticePlan, capLatticeSection, characteristicVariableKPa, check, convergeSelfWeight, defineScheme, drawingWithLazyPlan, once, uniformCombinations, SchemeError, UNIFORM_EQUIVALENT_WARNING } from "../kit";
import { geodesicCapBands } from "../../mechanics/geodesic-bands";
import type { LatticeBand } from "../../mechanics/lattice-bands";
import { GLULAM_SECTIONS } from "./sections";
import { sizeTimberLattice, timberSelfWeightKPa, withCharLayer, type TimberLatticeInputs, type TimberLatticeResult } from "./sizing";
import { analyseTimberNet } from "./analysis";
import type { MemberCheck } from "./member-design";
import { frameTooLarge } from "../../analysis/frame";
import { timberDomeDeclaration, type TimberDomeOptions } from "./declaration";

/** Single-ply roofing membrane on the deck, kg/m²: 1.5 mm PVC reinforced with polyester at about 1.4 t/m³ (from memory); its carbon is that of the PVC-coated polyester fabric row (the same two materials). */
const MEMBRANE_KG_PER_M2 = 2.1;
/** Tension ring steel S355, f_y for t ≤ 40 mm (EN 1993-1-1 Table 3.1). */
const RING_YIELD_PA = 355e6;
/** Deck boards: C24 softwood (EN 338, from memory f_m,k 24 MPa) taken at the GL24h row, γ_M of solid timber. */
const DECK_CLASS = "GL24h";

function findGlulam(catalogue: Catalogue, strengthClass: string): GlulamClass {
  const found = catalogue.glulam.find((g) => g.strengthClass === strengthClass);
  if (!found) throw new RangeError(`invalid strengthClass: "${strengthClass}" (expected one of ${catalogue.glulam.map((g) => g.strengthClass).join(", ")})`);
  return found;
}

function latticeInputs(brief: Brief, opts: TimberDomeOptions, catalogue: Catalogue, cap: SphericalCap, bands: LatticeBand[]): TimberLatticeInputs {
  const basis = designBasis(brief);
  const glulam = findGlulam(catalogue, opts.strengthClass);
  const deck = findGlulam(catalogue, catalogue.glulam.some((g) => g.strengthClass === DECK_CLASS) ? DECK_CLASS : opts.strengthClass);
  const serviceClass = Number(opts.serviceClass) as ServiceClass;
  const fire = opts.fireMinutes > 0;
  return {
    combinations: uniformCombinations(basis),
    gammaGSup: brief.factors.gammaGSup,
    servicesKPa: brief.servicesKPa,
    slsVariableKPa: characteristicVariableKPa(basis),
    radiusM: cap.radiusM,
    capAngleRad: cap.edgeAngleRad,
    baseRadiusM: cap.baseRadiusM,
    surfaceM2: cap.surfaceM2,
    bands,
    sections: GLULAM_SECTIONS,
    glulam,
    deckBendingPa: deck.bendingPa,
    deckDensityKgPerM3: deck.densityMeanKgPerM3,
    gammaM: TIMBER_GAMMA_M.glulam,
    gammaMBoards: TIMBER_GAMMA_M.solidTimber,
    kModPermanent: glulamKMod("permanent", serviceClass),
    kModSnow: glulamKMod(opts.snowDuration as LoadDurationClass, serviceClass),
    kModWind: glulamKMod("short-term", serviceClass),
    creepModulusPa: creepReducedModulusPa(glulam.modulusMeanPa, GLULAM_K_DEF[serviceClass]),
    knockDown: opts.knockDown,
    purlinSpacingM: opts.purlinSpacingM,
    charDepthM: fire ? effectiveCharDepthM(opts.fireMinutes) : 0,
    deckCharDepthM: fire ? charringDepthM(opts.fireMinutes, CHARRING_RATE_M_PER_MIN.glulamSoftwood.oneDimensional) + ZERO_STRENGTH_LAYER_M : 0,
    connectorKgPerM3: opts.connectorKgPerM3,
    membraneKgPerM2: MEMBRANE_KG_PER_M2,
    ringYieldPa: RING_YIELD_PA,
  };
}

function timberWarnings(opts: TimberDomeOptions): string[] {
  const warnings = [
    UNIFORM_EQUIVALENT_WARNING,
    "the roofing is a membrane on the deck with no insulation layer (the metal deck of the steel schemes includes 150 mm of mineral wool)",
    "the deck is priced and counted with the glulam factor as a proxy for softwood boards",
    "the supports under the edge ring (walls or columns to the eaves) are not included",
    "lateral-torsional buckling (EN 1995-1-1 §6.3.3): a purlin's upper edge is held by the deck and a lattice member's by the purlins framing into it, at the purlin spacing (common practice, no source); under a net uplift the lower edge is free over 0.9 × the span (Table 6.1); the supports are taken as holding the members against twisting",
    "the depth factor k_h (EN 1995-1-1 eq. 3.2, up to 1.1 on the bending and tension strengths of glulam under 600 mm deep) is taken as 1, the safe side",
  ];
  if (opts.fireMinutes > 0) warnings.push(`fire: ${opts.fireMinutes} min of charring added to the ambient sections; the fire situation itself (EN 1995-1-2 §4.2.2, k_fi, γ_M,fi = 1) is not checked separately`);
  return warnings;
}

/** A member check's governing text split at its clause: what governs (with its case), and the clause ("EN 1995-1-1 eq. …"). */
function whatGoverns(c: MemberCheck): string {
  return c.governing.split(", EN")[0]!;
}
function clauseOf(c: MemberCheck): string {
  return c.governing.slice(whatGoverns(c).length + 2);
}
/** The member table's words for a check: without its case, as the other schemes' member rows read (the check table names the case). */
function memberGoverning(c: MemberCheck): string {
  return c.governing.replace(` (${c.demand.label})`, "");
}

function timberMembers(r: TimberLatticeResult, charDepthM: number): { members: MemberGroup[]; checks: Check[] } {
  const members: MemberGroup[] = [];
  const checks: Check[] = [];
  const group = (element: string, count: number, lengthM: number, section: ReturnType<typeof withCharLayer>, utilisation: number, forceN: number, governing: string): MemberGroup => ({
    element,
    material: "glulam",
    count,
    lengthM,
    section: withCharLayer(section, charDepthM).designation + (charDepthM > 0 ? ` (${section.designation} after charring)` : ""),
    designForceN: forceN,
    resistanceN: utilisation > 0 ? Math.abs(forceN) / utilisation : 0,
    utilisation,
    governing,
  });
  for (const b of r.bands) {
    const name = b.band.edge ? "members meeting the ring" : `members, band ${b.band.index + 1} of ${r.bands.filter((x) => !x.band.edge).length}`;
    members.push(group(`lattice ${name}`, b.band.count, b.band.meanLengthM, b.section, b.check.utilisation, b.check.demand.forceN, memberGoverning(b.check)));
    checks.push(check(`${name}: ${whatGoverns(b.check)}`, clauseOf(b.check), b.check.utilisation, 1, ""));
    checks.push(check(`${name}: general buckling of the lattice`, "equivalent continuum 4√(DB)/R² × knock-down, E/(1 + k_def) (EN 1995-1-1 Table 3.2)", b.pressurePa, b.bucklingPa, "Pa"));
  }
  if (r.purlins) {
    const p = r.purlins;
    const moment = p.check.demand.momentNm;
    members.push({ ...group("purlins", Math.round(p.totalLengthM / Math.max(...r.bands.map((b) => b.band.maxLengthM))), Math.max(...r.bands.map((b) => b.band.maxLengthM)), p.section, p.check.utilisation, 0, memberGoverning(p.check)), bending: { designMomentNm: moment, resistanceNm: p.check.utilisation > 0 ? moment / p.check.utilisation : 0 } });
    checks.push(check(`purlins: ${whatGoverns(p.check)}`, clauseOf(p.check), p.check.utilisation, 1, ""));
    checks.push(check("purlins: final deflection", "EN 1995-1-1 §7.2, Table 7.2 (l/250, from memory)", p.deflectionM, p.limitM, "m"));
  }
  if (r.ringTensionN > 0) checks.push(check("edge tension ring", "EN 1993-1-1 eq. 6.6", r.ringTensionN, r.ringAreaM2 * RING_YIELD_PA, "N"));
  return { members, checks };
}

function timberTakeoff(r: TimberLatticeResult, surfaceM2: number, glulamDensity: number): TakeoffRow[] {
  const timber = (element: string, volumeM3: number): TakeoffRow => ({ element, material: "glulam", costItem: "glulam-structure", quantity: volumeM3, unit: "m3", massKg: volumeM3 * glulamDensity });
  const steel = (element: string, massKg: number, costItem: TakeoffRow["costItem"]): TakeoffRow => ({ element, material: "steel-plate", costItem, quantity: massKg / 1000, unit: "t", massKg });
  return [
    timber("glulam lattice members", r.latticeVolumeM3),
    timber("glulam purlins", r.purlinVolumeM3),
    { element: "timber deck", material: "glulam", costItem: "timber-deck", quantity: surfaceM2, unit: "m2", massKg: r.deckMassKg },
    steel("steel connectors", r.connectorMassKg, "steel-connectors"),
    steel("steel tension ring", r.ringMassKg, "steel-ring"),
    { element: "roofing membrane", material: "fabric-pvc-polyester", costItem: "roofing-membrane", quantity: surfaceM2, unit: "m2", massKg: r.membraneMassKg },
  ];
}

function timberSummary(r: TimberLatticeResult, frequency: number, cap: SphericalCap) {
  // the bands hold every member not on the ring once
  const inner = { count: r.bands.reduce((n, b) => n + b.band.count, 0), meanM: r.bands.reduce((sum, b) => sum + b.band.totalLengthM, 0) / r.bands.reduce((n, b) => n + b.band.count, 0) };
  const timberM3 = r.latticeVolumeM3 + r.purlinVolumeM3 + r.deckVolumeM3;
  return [
    { key: "frequency", label: "Geodesic frequency v", value: frequency, unit: "" },
    { key: "members", label: "Lattice members", value: inner.count, unit: "nr" },
    { key: "memberMeanM", label: "Member length, mean", value: inner.meanM, unit: "m" },
    { key: "sphereRadiusM", label: "Sphere radius", value: cap.radiusM, unit: "m" },
    { key: "deckThicknessMm", label: "Deck thickness", value: r.deckThicknessM * 1000, unit: "mm" },
    { key: "glulamM3", label: "Glulam, lattice and purlins", value: r.latticeVolumeM3 + r.purlinVolumeM3, unit: "m³" },
    { key: "timberM3PerM2", label: "Timber per m² of plan (with deck)", value: timberM3 / cap.planAreaM2, unit: "m³/m²" },
    { key: "ringTensionKN", label: "Edge ring tension", value: r.ringTensionN / 1000, unit: "kN" },
  ];
}

/** A SchemeError for a mesh of this frequency that cannot be made; rethrows anything else. */
function meshFailure(e: unknown, failure: { warnings: string[]; section: Lines }): SchemeError {
  if (e instanceof CapTooSmallError) return new SchemeError("the mesh is too coarse for so small a cap: shorten the members", { ...failure, cause: e });
  throw e;
}

/** The geodesic mesh of one frequency; a SchemeError when it cannot be made. */
function latticeMesh(cap: SphericalCap, frequency: number, failure: { warnings: string[]; section: Lines }): GeodesicCap {
  if (frequency > 200) throw new SchemeError(`the mesh would need frequency ${frequency} (over 200): lengthen the members`, failure);
  try {
    return cachedGeodesicCap(frequency, cap.radiusM, cap.edgeAngleRad);
  } catch (e) {
    throw meshFailure(e, failure);
  }
}

/**
 * The member bands of the mesh of one frequency, cut from the remembered sphere without building the
 * mesh (the sizing reads only the bands; the mesh is built for the design kept); a SchemeError when
 * the mesh cannot be made.
 */
function latticeMeshBands(cap: SphericalCap, frequency: number, bandCount: number, failure: { warnings: string[]; section: Lines }): LatticeBand[] {
  if (frequency > 200) throw new SchemeError(`the mesh would need frequency ${frequency} (over 200): lengthen the members`, failure);
  try {
    return geodesicCapBands(frequency, cap.radiusM, cap.edgeAngleRad, bandCount);
  } catch (e) {
    throw meshFailure(e, failure);
  }
}

/** The timber dome sized on one mesh (self-weight iterated to convergence), and its mass; its parts are drawn up only for the mesh kept. */
interface MeshDesign {
  massKg: number;
  /** The mesh, built when first asked for (only the design kept needs it). */
  mesh: () => GeodesicCap;
  frequency: number;
  result: TimberLatticeResult;
  inputs: TimberLatticeInputs;
  iterations: number;
}

/** The lattice sized on the mesh of one frequency; a SchemeError when it cannot be built. */
function sizeOnMesh(brief: Brief, opts: TimberDomeOptions, catalogue: Catalogue, cap: SphericalCap, frequency: number, warnings: string[]): MeshDesign {
  // drawn only when asked for (a failure's reason): the search sizes dozens of meshes
  const bare = once(() => capLatticeSection(brief, 0));
  const failure = { warnings, section: bare };
  const inputs = latticeInputs(brief, opts, catalogue, cap, latticeMeshBands(cap, frequency, opts.bands, failure));
  const converged = convergeSelfWeight<TimberLatticeResult>(
    (g) => {
      const r = sizeTimberLattice(inputs, g);
      return { value: r, selfWeightKPa: r.failure ? g : timberSelfWeightKPa(r, cap.surfaceM2) };
    },
    kPaFromKgPerM2(60),
    { section: bare },
  );
  const r = converged.value;
  if (r.failure) throw new SchemeError(r.failure, { warnings, section: () => capLatticeSection(brief, memberDepthM(r)) });
  const massKg = timberTakeoff(r, cap.surfaceM2, inputs.glulam.densityMeanKgPerM3).reduce((sum, row) => sum + row.massKg, 0);
  return { massKg, mesh: () => latticeMesh(cap, frequency, failure), frequency, result: r, inputs, iterations: converged.iterations };
}

/** Meshes sized lately, per catalogue, by frequency, brief and the options the sizing reads. */
const SIZED_CACHE_SIZE = 48;
const sized = new WeakMap<Catalogue, Map<string, MeshDesign | SchemeError>>();

/**
 * sizeOnMesh, remembering the last few answers: the proportion search asks for neighbouring member
 * lengths at one rise, and each designs the nominal frequency and its two neighbours, so most meshes
 * come again (at 160 m, lengths 5, 5.5 and 6 m give frequencies 26, 24 and 22: five of their nine
 * meshes are repeats). The member length is not in the key: it acts only through the frequency. Shared
 * answers: read only.
 */
function sizeOnMeshCached(brief: Brief, opts: TimberDomeOptions, catalogue: Catalogue, cap: SphericalCap, frequency: number, warnings: string[]): MeshDesign {
  const { memberLengthM: _length, bucklingAnalysis: _analysis, ...sizing } = opts;
  const key = JSON.stringify([frequency, brief, sizing]);
  const cache = sized.get(catalogue) ?? new Map<string, MeshDesign | SchemeError>();
  sized.set(catalogue, cache);
  let answer = cache.get(key);
  if (answer === undefined) {
    try {
      answer = sizeOnMesh(brief, opts, catalogue, cap, frequency, warnings);
    } catch (e) {
      if (!(e instanceof SchemeError)) throw e;
      answer = e;
    }
    if (cache.size >= SIZED_CACHE_SIZE) cache.delete(cache.keys().next().value as string);
    cache.set(key, answer);
  }
  if (answer instanceof SchemeError) throw answer;
  return answer;
}

function memberDepthM(r: TimberLatticeResult): number {
  return Math.max(0, ...r.bands.map((b) => b.section.depthM));
}

/** The parts of the design on the mesh kept: members, checks, take-off, summary and drawings. */
function partsOf(brief: Brief, cap: SphericalCap, d: MeshDesign, warnings: string[]): DesignParts {
  const r = d.result;
  const depthM = memberDepthM(r);
  const { members, checks } = timberMembers(r, d.inputs.charDepthM);
  return {
    governingLoadCase: r.governingCase,
    summary: timberSummary(r, d.frequency, cap),
    members,
    takeoff: timberTakeoff(r, cap.surfaceM2, d.inputs.glulam.densityMeanKgPerM3),
    checks,
    warnings,
    iterations: d.iterations,
    floor: capFloor(cap, brief.eavesHeightM, depthM),
    ...capEnvelope(cap, brief.eavesHeightM),
    drawing: drawingWithLazyPlan(() => capLatticeSection(brief, depthM), () => capLatticePlan(d.mesh())),
  };
}

/** The chosen design with the 3D analysis of its net: Design.analysis and the 3D buckling check beside the continuum one. */
function withNetAnalysis(brief: Brief, cap: SphericalCap, d: MeshDesign, parts: DesignParts, knockDown: number): DesignParts {
  const mesh = d.mesh();
  const tooLarge = frameTooLarge(mesh.nodes.length, "lengthen the target member");
  if (tooLarge) return { ...parts, warnings: [...parts.warnings, tooLarge] };
  const selfWeightPlanKPa = timberSelfWeightKPa(d.result, cap.surfaceM2) * (cap.surfaceM2 / cap.planAreaM2);
  const net = analyseTimberNet({ brief, cap, mesh, bands: d.result.bands, selfWeightPlanKPa, creepModulusPa: d.inputs.creepModulusPa, knockDown, purlinSpacingM: d.inputs.purlinSpacingM });
  return { ...parts, checks: [...parts.checks, ...net.checks], analysis: net.analysis };
}

/**
 * Designs a glulam lattice dome: a class I geodesic (three-way) cap, membrane forces resolved into
 * the grid, members to EN 1995-1-1 with the bending of the panel load, general buckling with the
 * creep-reduced stiffness, purlins and deck, optional charring, steel connectors as an allowance
 * and a steel tension ring; self-weight iterated to convergence. The mesh is designed at the
 * frequency whose mean member meets the target length and at its two neighbours, and the lightest
 * that can be built is kept: a frequency is a whole number, so at small spans one step of it moves
 * the members by a quarter of their length, and the mass jumped where the rounding stepped (+21 %
 * from 40 to 45 m).
 */
function design(brief: Brief, opts: TimberDomeOptions, catalogue: Catalogue): DesignParts {
  const cap = sphericalCap(brief.spanM, brief.riseM);
  const warnings = timberWarnings(opts);
  const nominal = geodesicFrequencyFor(cap.radiusM, opts.memberLengthM);
  let best: MeshDesign | null = null;
  let nominalFailure: unknown = null;
  for (const frequency of [nominal, nominal - 1, nominal + 1]) {
    if (frequency < 1) continue;
    try {
      const candidate = sizeOnMeshCached(brief, opts, catalogue, cap, frequency, warnings);
      if (best === null || candidate.massKg < best.massKg) best = candidate;
    } catch (e) {
      if (!(e instanceof SchemeError)) throw e;
      if (frequency === nominal) nominalFailure = e;
    }
  }
  if (best === null) throw nominalFailure ?? new SchemeError("no mesh near the target member length can be built: change the member length", { warnings, section: () => capLatticeSection(brief, 0) });
  const parts = partsOf(brief, cap, best, warnings);
  return opts.bucklingAnalysis ? withNetAnalysis(brief, cap, best, parts, opts.knockDown) : parts;
}

export const timberDome = defineScheme(timberDomeDeclaration, design);
