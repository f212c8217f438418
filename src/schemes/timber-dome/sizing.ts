import type { GlulamClass } from "../../catalogue/types";
import { membraneLoadCases, type UniformCombination } from "../kit";
import { edgeRingTensionN, sphericalMembraneForces, sphericalMembraneSurfaceLoad } from "../../mechanics/spherical-membrane";
import { threeWayGridBarForces, threeWayGridStiffness } from "../../mechanics/three-way-grid";
import { continuumShellPressurePa } from "../../mechanics/shell-buckling";
import { simplySupportedMomentNm } from "../../mechanics/beam";
import { kPaFromKgPerM2 } from "../../mechanics/gravity";
import { STEEL_DENSITY_KG_PER_M3 } from "../../catalogue/chs";
import type { LatticeBand } from "../../mechanics/lattice-bands";
import { pickGlulam, torsionalLengthM, type MemberCheck, type MemberDemand } from "./member-design";
import { rectangularSection, type GlulamSection } from "./sections";
import { deckThicknessM, sizePurlins, type PurlinResult } from "./secondary";

/** Smallest tension ring, m² (common practice, no source: a box of 10 mm plates about 60 mm across). */
const MIN_RING_AREA_M2 = 25e-4;

/** Share of a triangular panel's load that one lattice member carries per metre: two panels × (√3/4 L²)/3 over L = (√3/6)L (tributary area). */
const TRIBUTARY_WIDTH_PER_LENGTH = Math.sqrt(3) / 6;

/** A ULS case: load per m² of roof surface and of plan, Pa, and the k_mod of its shortest action. */
export interface LoadCase {
  label: string;
  purpose: "gravity" | "uplift";
  surfacePa: number;
  planPa: number;
  kMod: number;
}

export interface TimberLatticeInputs {
  /** The design combinations with their uniform equivalents (the membrane method takes uniform loads). */
  combinations: readonly UniformCombination[];
  /** γ_G,sup, for the permanent-only case (EN 1990 eq. 6.10 with no variable action). */
  gammaGSup: number;
  /** Services and hung load, permanent, kPa of plan. */
  servicesKPa: number;
  /** Characteristic variable load for serviceability (the largest uniform equivalent of imposed and snow), kPa of plan. */
  slsVariableKPa: number;
  radiusM: number;
  capAngleRad: number;
  baseRadiusM: number;
  surfaceM2: number;
  bands: LatticeBand[];
  sections: readonly GlulamSection[];
  glulam: GlulamClass;
  /** Deck boards' bending strength f_m,k, Pa. */
  deckBendingPa: number;
  gammaM: number;
  gammaMBoards: number;
  kModPermanent: number;
  kModSnow: number;
  /** k_mod of wind and of the roof's maintenance load (short-term, EN 1995-1-1 Table 2.2, from memory). */
  kModWind: number;
  /** E_0,mean/(1 + k_def), Pa. */
  creepModulusPa: number;
  knockDown: number;
  purlinSpacingM: number;
  /** Effective charring depth added to each exposed face of lattice members and purlins, m (0 = no fire resistance asked). */
  charDepthM: number;
  /** Charring depth added to the deck, exposed on its underside only, m. */
  deckCharDepthM: number;
  /** Density of the deck boards, kg/m³. */
  deckDensityKgPerM3: number;
  /** Steel connectors, kg per m³ of lattice and purlin glulam. */
  connectorKgPerM3: number;
  membraneKgPerM2: number;
  ringYieldPa: number;
  /** ULS factors on permanent and variable load for an assumed self-weight (EN 1990, the governing expression). */
}

export interface BandResult {
  band: LatticeBand;
  section: GlulamSection;
  check: MemberCheck;
  compressionN: number;
  tensionN: number;
  /** ULS pressure on the lattice and its knocked-down general-buckling pressure, Pa. */
  pressurePa: number;
  bucklingPa: number;
}

export interface TimberLatticeResult {
  bands: BandResult[];
  /** Why the lattice cannot be built ("" when it can). */
  failure: string;
  purlins: (PurlinResult & { totalLengthM: number }) | null;
  deckThicknessM: number;
  latticeVolumeM3: number;
  purlinVolumeM3: number;
  deckVolumeM3: number;
  glulamMassKg: number;
  deckMassKg: number;
  connectorMassKg: number;
  membraneMassKg: number;
  ringTensionN: number;
  ringAreaM2: number;
  ringMassKg: number;
  /** The case that gave the highest member utilisation, and the heaviest gravity case (ring, general buckling). */
  governingCase: string;
  heaviestCase: string;
}

/**
 * ULS cases for an assumed self-weight g (kPa of surface): permanent alone (γ_G,sup, k_mod
 * permanent), and every combination of the design basis with its uniform equivalents, at the k_mod
 * of its shortest action (wind or the maintenance load short-term, else snow).
 */
export function loadCases(input: TimberLatticeInputs, selfWeightKPa: number): LoadCase[] {
  const gammaG = input.gammaGSup;
  const permanent: LoadCase = { label: "permanent only (6.10)", purpose: "gravity", surfacePa: gammaG * selfWeightKPa * 1000, planPa: gammaG * input.servicesKPa * 1000, kMod: input.kModPermanent };
  const combined = membraneLoadCases(input.combinations, selfWeightKPa, input.servicesKPa).map((c) => ({
    label: c.name,
    purpose: c.purpose,
    surfacePa: c.surfacePa,
    planPa: c.planPa,
    kMod: c.actions.includes("wind") || c.actions.includes("imposed") ? input.kModWind : input.kModSnow,
  }));
  return [permanent, ...combined];
}

/** Axial demands (membrane forces resolved into the three-way grid) and member bending from the panel load, for one band and one case. */
function bandDemands(input: TimberLatticeInputs, band: LatticeBand, c: LoadCase): MemberDemand[] {
  let compressionN = 0;
  let tensionN = 0;
  for (const phi of [band.fromRad, (band.fromRad + band.toRad) / 2, Math.min(band.toRad, input.capAngleRad)]) {
    const n = c.planPa === 0 ? sphericalMembraneSurfaceLoad(c.surfacePa, input.radiusM, phi) : sphericalMembraneForces(c.surfacePa, c.planPa, input.radiusM, phi);
    const bars = threeWayGridBarForces(n.meridionalNPerM, n.hoopNPerM, band.maxLengthM);
    compressionN = Math.min(compressionN, bars.compressionN);
    tensionN = Math.max(tensionN, bars.tensionN);
  }
  const lineLoad = Math.abs(c.surfacePa + c.planPa) * TRIBUTARY_WIDTH_PER_LENGTH * band.maxLengthM;
  const momentNm = simplySupportedMomentNm(lineLoad, band.maxLengthM);
  const beam = { momentNm, shearN: (lineLoad * band.maxLengthM) / 2, torsionalLengthM: torsionalLengthM(c, band.maxLengthM, input.purlinSpacingM), kMod: c.kMod, label: c.label };
  return [
    { forceN: compressionN, ...beam },
    { forceN: tensionN, ...beam },
  ];
}

/** The section with its charred layer: three faces exposed (the deck covers the top), EN 1995-1-2 §4.2.2. */
export function withCharLayer(section: GlulamSection, charDepthM: number): GlulamSection {
  return charDepthM > 0 ? rectangularSection(section.widthM + 2 * charDepthM, section.depthM + charDepthM) : section;
}

/** Each band's sections' general-buckling pressures, remembered per lattice input (they do not change with the self-weight). */
const bucklingTables = new WeakMap<TimberLatticeInputs, Map<LatticeBand, Map<GlulamSection, number>>>();

/**
 * The knocked-down general-buckling pressure of the lattice with a band's members of a section, Pa
 * (equivalent continuum 4√(DB)/R², the creep-reduced modulus): it depends on the section and the
 * mesh, not on the self-weight, so each is worked out once per lattice input and band and read again
 * at every step of the self-weight iteration (the section search asks it of a hundred sections and more).
 */
function bucklingPressureOf(input: TimberLatticeInputs, band: LatticeBand): (s: GlulamSection) => number {
  const byBand = bucklingTables.get(input) ?? new Map<LatticeBand, Map<GlulamSection, number>>();
  bucklingTables.set(input, byBand);
  const known = byBand.get(band) ?? new Map<GlulamSection, number>();
  byBand.set(band, known);
  return (s) => {
    let pressurePa = known.get(s);
    if (pressurePa === undefined) {
      const grid = threeWayGridStiffness(input.creepModulusPa * s.areaM2, input.creepModulusPa * s.secondMomentYM4, band.meanLengthM);
      pressurePa = input.knockDown * continuumShellPressurePa(grid.bendingNm, grid.membraneNPerM, input.radiusM);
      known.set(s, pressurePa);
    }
    return pressurePa;
  };
}

/** Sizes the lattice members band by band for every case and for general buckling. */
function sizeBands(input: TimberLatticeInputs, cases: LoadCase[], pressurePa: number): { bands: BandResult[]; failure: string } {
  const bands: BandResult[] = [];
  for (const band of input.bands) {
    const demands = cases.flatMap((c) => bandDemands(input, band, c));
    const bucklingOf = bucklingPressureOf(input, band);
    const lengths = { strongM: band.maxLengthM, weakM: Math.min(band.maxLengthM, input.purlinSpacingM) };
    const pick = pickGlulam(input.sections, input.glulam, lengths, demands, input.gammaM, (s) => bucklingOf(s) >= pressurePa);
    if (pick === null) {
      const memberOnly = pickGlulam(input.sections, input.glulam, lengths, demands, input.gammaM);
      const where = band.edge ? `the members meeting the ring (up to ${band.maxLengthM.toFixed(1)} m)` : `band ${band.index + 1} (members up to ${band.maxLengthM.toFixed(1)} m)`;
      return {
        bands,
        failure: memberOnly === null ? `no glulam section up to 300 × 2,400 mm carries the members of ${where}: shorten the members or choose a stronger class` : `no glulam section up to 300 × 2,400 mm gives the lattice enough general-buckling resistance at ${where} (${(pressurePa / 1000).toFixed(2)} kPa needed): raise the rise or shorten the members`,
      };
    }
    const axial = demands.map((d) => d.forceN);
    bands.push({ band, section: pick.section, check: pick.check, compressionN: Math.min(0, ...axial), tensionN: Math.max(0, ...axial), pressurePa, bucklingPa: bucklingOf(pick.section) });
  }
  return { bands, failure: "" };
}

/** The steel tension ring for the edge thrust: T = |N_φ| cos φ0 · a (Timoshenko & Woinowsky-Krieger ch. 14 §129), A = T/f_y (EN 1993-1-1 eq. 6.6, γ_M0 = 1.0), at least 25 cm². The area is taken as it comes (to the next mm²), not rounded up to 25 cm² steps as before: a box of plates can be made to any area within a plate's thickness step (a few %), and the 25 cm² steps doubled the ring between neighbouring spans at small spans (+78 % from 40 to 45 m). */
function tensionRing(input: TimberLatticeInputs, c: LoadCase): { tensionN: number; areaM2: number; massKg: number } {
  const edge = sphericalMembraneForces(c.surfacePa, c.planPa, input.radiusM, Math.min(input.capAngleRad, Math.PI / 2 - 1e-9));
  const tensionN = edgeRingTensionN(edge.meridionalNPerM, input.capAngleRad, input.baseRadiusM);
  // to the next whole mm² above T/f_y: taken exactly, A·f_y fell short of T in the last digit and the check failed at utilisation 1.00
  const areaM2 = Math.max(MIN_RING_AREA_M2, Math.floor((tensionN / input.ringYieldPa) * 1e6 + 1) / 1e6);
  return { tensionN, areaM2, massKg: areaM2 * 2 * Math.PI * input.baseRadiusM * STEEL_DENSITY_KG_PER_M3 };
}

/**
 * Sizes the timber lattice dome for an assumed self-weight g (kPa of roof surface): the deck and the
 * purlins for the panel load, the lattice members band by band for membrane forces (Timoshenko ch. 14,
 * resolved into the three-way grid) with the bending of the panel load they carry (EN 1995-1-1
 * eqs 6.17, 6.23/6.24) and for general buckling k·4√(DB)/R² with the creep-reduced stiffness, the
 * char layer of the fire option, connectors as an allowance, and the steel tension ring.
 */
export function sizeTimberLattice(input: TimberLatticeInputs, selfWeightKPa: number): TimberLatticeResult {
  const cases = loadCases(input, selfWeightKPa);
  const gravity = cases.filter((c) => c.purpose === "gravity");
  const heaviest = gravity.reduce((worst, c) => (c.surfacePa + c.planPa > worst.surfacePa + worst.planPa ? c : worst));
  const pressurePa = heaviest.surfacePa + heaviest.planPa;
  // the deck and the purlins carry every case, uplift too: it bends them the other way, with the purlins' lower edge free
  const panelCases = cases.map((c) => ({ pressurePa: c.surfacePa + c.planPa, kMod: c.kMod, label: c.label }));
  const serviceLoadPa = (selfWeightKPa + input.servicesKPa + input.slsVariableKPa) * 1000;
  const purlinSpanM = Math.max(...input.bands.map((b) => b.maxLengthM));
  const deckT = deckThicknessM({ bendingPa: input.deckBendingPa }, panelCases, serviceLoadPa, input.purlinSpacingM, input.creepModulusPa, input.gammaMBoards);
  const purlins = sizePurlins(input.sections, input.glulam, panelCases, serviceLoadPa, purlinSpanM, input.purlinSpacingM, input.creepModulusPa, input.gammaM);
  const lattice = sizeBands(input, cases, pressurePa);
  const failure =
    deckT === null ? `the deck boards would need over 300 mm to span ${input.purlinSpacingM} m between purlins: reduce the purlin spacing`
    : purlins === null ? `no glulam section carries the purlins over ${purlinSpanM.toFixed(1)} m: shorten the members or reduce the purlin spacing`
    : lattice.failure;
  const purlinLengthM = input.surfaceM2 / input.purlinSpacingM;
  const latticeVolumeM3 = lattice.bands.reduce((sum, b) => sum + b.band.totalLengthM * withCharLayer(b.section, input.charDepthM).areaM2, 0);
  const purlinVolumeM3 = purlins ? purlinLengthM * withCharLayer(purlins.section, input.charDepthM).areaM2 : 0;
  const deckVolumeM3 = input.surfaceM2 * ((deckT ?? 0) + input.deckCharDepthM);
  const glulamMassKg = (latticeVolumeM3 + purlinVolumeM3) * input.glulam.densityMeanKgPerM3;
  const deckMassKg = deckVolumeM3 * input.deckDensityKgPerM3;
  const ring = tensionRing(input, heaviest);
  const worstBand = lattice.bands.reduce<BandResult | null>((worst, b) => (worst === null || b.check.utilisation > worst.check.utilisation ? b : worst), null);
  return {
    bands: lattice.bands,
    failure,
    purlins: purlins && { ...purlins, totalLengthM: purlinLengthM },
    deckThicknessM: deckT ?? 0,
    latticeVolumeM3,
    purlinVolumeM3,
    deckVolumeM3,
    glulamMassKg,
    deckMassKg,
    connectorMassKg: input.connectorKgPerM3 * (latticeVolumeM3 + purlinVolumeM3),
    membraneMassKg: input.membraneKgPerM2 * input.surfaceM2,
    ringTensionN: ring.tensionN,
    ringAreaM2: ring.areaM2,
    ringMassKg: ring.massKg,
    governingCase: worstBand && worstBand.pressurePa / worstBand.bucklingPa < worstBand.check.utilisation ? worstBand.check.demand.label : heaviest.label,
    heaviestCase: heaviest.label,
  };
}

/** Self-weight of everything the lattice carries, per m² of roof surface, kPa (the ring sits on the supports). */
export function timberSelfWeightKPa(r: TimberLatticeResult, surfaceM2: number): number {
  return kPaFromKgPerM2((r.glulamMassKg + r.deckMassKg + r.connectorMassKg + r.membraneMassKg) / surfaceM2);
}
