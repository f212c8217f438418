import { wholeNumber } from "../../kernel/units";
import type { ChsSection } from "../../catalogue/types";
import type { ChsChoice } from "../../catalogue/pick-chs";
import type { LatticeBand } from "../../mechanics/lattice-bands";
import type { BucklingCurve } from "../../mechanics/flexural-buckling";
import { STEEL_E_PA } from "../../mechanics/flexural-buckling";
import { STEEL_DENSITY_KG_PER_M3 } from "../../catalogue/chs";
import { edgeRingTensionN, sphericalMembraneForces, sphericalMembraneSurfaceLoad } from "../../mechanics/spherical-membrane";
import { threeWayGridBarForces, threeWayGridStiffness, doubleLayerGridStiffness } from "../../mechanics/three-way-grid";
import { continuumShellPressurePa } from "../../mechanics/shell-buckling";
import { kPaFromKgPerM2 } from "../../mechanics/gravity";
import { heaviestCase, membraneLoadCases, pickChs, type MembraneLoadCase, type UniformCombination } from "../kit";

export interface LatticeInputs {
  /** The design combinations with their uniform equivalents (the membrane method takes uniform loads). */
  combinations: readonly UniformCombination[];
  /** Services and hung load, permanent, kPa of plan. */
  servicesKPa: number;
  radiusM: number;
  capAngleRad: number;
  baseRadiusM: number;
  surfaceM2: number;
  bands: LatticeBand[];
  sections: readonly ChsSection[];
  steel: { yieldPa: number; curve: BucklingCurve };
  knockDown: number;
  /** Double-layer depth, m (0 = single layer). */
  doubleLayerDepthM: number;
  /** Web members of a double layer: count and length, m. */
  webCount: number;
  webLengthM: number;
  nodeAllowance: number;
  claddingKgPerM2: number;
}

export interface BandResult {
  band: LatticeBand;
  choice: ChsChoice;
  compressionN: number;
  tensionN: number;
  /** ULS normal pressure the band must resist, Pa, and the knocked-down buckling pressure, Pa. */
  pressurePa: number;
  bucklingPa: number;
  barMassKg: number;
  /** The combination that gave the band's worst bar force. */
  governingCase: string;
}

export interface LatticeResult {
  bands: BandResult[];
  /** Band for which no catalogue section sufficed, or -1. */
  failedBand: number;
  failedWhy: string;
  webChoice: ChsChoice | null;
  barMassKg: number;
  webMassKg: number;
  nodeMassKg: number;
  claddingMassKg: number;
  /** Meridional force at the edge under ULS gravity, N/m (negative). */
  edgeMeridionalNPerM: number;
  /** Ring tension T = H a, N, with H = |N_φ| cos φ0. */
  ringTensionN: number;
  ringAreaM2: number;
  ringMassKg: number;
  /** The gravity combination of largest pressure: general buckling and the ring. */
  heaviestCase: string;
}

/** The bar forces of one band under one case, resolved into the three-way grid at the band's ends and middle. */
function bandForces(input: LatticeInputs, band: LatticeBand, c: MembraneLoadCase, layers: number): { compressionN: number; tensionN: number } {
  let compressionN = 0;
  let tensionN = 0;
  for (const phi of [band.fromRad, (band.fromRad + band.toRad) / 2, Math.min(band.toRad, input.capAngleRad)]) {
    const n = c.planPa === 0 ? sphericalMembraneSurfaceLoad(c.surfacePa, input.radiusM, phi) : sphericalMembraneForces(c.surfacePa, c.planPa, input.radiusM, phi);
    const bars = threeWayGridBarForces(n.meridionalNPerM / layers, n.hoopNPerM / layers, band.maxLengthM);
    compressionN = Math.min(compressionN, bars.compressionN);
    tensionN = Math.max(tensionN, bars.tensionN);
  }
  return { compressionN, tensionN };
}

/**
 * One band: its worst bar forces over the band (every combination, resolved into the three-way
 * grid) and the lightest CHS that carries them and gives the lattice its general-buckling
 * resistance; or why none does.
 */
function sizeBand(input: LatticeInputs, band: LatticeBand, cases: readonly MembraneLoadCase[], pressurePa: number, layers: number): { result: BandResult | null; failedWhy: string; largestBarForceN: number } {
  const R = input.radiusM;
  let compressionN = 0;
  let tensionN = 0;
  let governingCase = "";
  for (const c of cases) {
    const f = bandForces(input, band, c, layers);
    if (Math.max(-f.compressionN, f.tensionN) > Math.max(-compressionN, tensionN)) governingCase = c.name;
    compressionN = Math.min(compressionN, f.compressionN);
    tensionN = Math.max(tensionN, f.tensionN);
  }
  const largestBarForceN = Math.max(-compressionN, tensionN);
  const bucklingOf = (s: ChsSection): number => {
    const single = threeWayGridStiffness(STEEL_E_PA * s.areaM2, STEEL_E_PA * s.secondMomentM4, band.meanLengthM);
    const grid = layers === 2 ? doubleLayerGridStiffness(single, input.doubleLayerDepthM) : single;
    return input.knockDown * continuumShellPressurePa(grid.bendingNm, grid.membraneNPerM, R);
  };
  const demands = [
    { forceN: compressionN, effectiveLengthM: band.maxLengthM },
    { forceN: tensionN, effectiveLengthM: band.maxLengthM },
  ];
  const choice = pickChs(input.sections, demands, input.steel, (s) => bucklingOf(s) >= pressurePa);
  if (choice === null) {
    const memberOnly = pickChs(input.sections, demands, input.steel);
    const failedWhy =
      memberOnly === null
        ? `no catalogue hollow section carries the bar force of ${wholeNumber(-compressionN / 1000)} kN over ${band.maxLengthM.toFixed(1)} m`
        : `no catalogue hollow section gives the lattice enough general-buckling resistance (${(pressurePa / 1000).toFixed(2)} kPa needed)`;
    return { result: null, failedWhy, largestBarForceN };
  }
  const result = { band, choice, compressionN, tensionN, pressurePa, bucklingPa: bucklingOf(choice.section), barMassKg: band.totalLengthM * choice.section.massKgPerM * layers, governingCase };
  return { result, failedWhy: "", largestBarForceN };
}

/**
 * Sizes a lattice dome for an assumed self-weight g (kPa of surface): membrane forces
 * (Timoshenko ch. 14) resolved into the three-way grid, bars from the CHS catalogue per band for
 * tension and flexural buckling (EN 1993-1-1 §6.2.3, §6.3.1; node-to-node length), upsized until
 * the band passes general buckling k·p_cl ≥ p (equivalent continuum, 4√(DB)/R²), and the tension
 * ring for the edge thrust.
 */
export function sizeLattice(input: LatticeInputs, selfWeightKPa: number): LatticeResult {
  const { radiusM: R, capAngleRad: phi0 } = input;
  const layers = input.doubleLayerDepthM > 0 ? 2 : 1;
  const cases = membraneLoadCases(input.combinations, selfWeightKPa, input.servicesKPa);
  const heaviest = heaviestCase(cases);
  const { surfacePa, planPa } = heaviest;
  const results: BandResult[] = [];
  let failedBand = -1;
  let failedWhy = "";
  let largestBarForceN = 0;
  for (const band of input.bands) {
    const sized = sizeBand(input, band, cases, surfacePa + planPa, layers);
    largestBarForceN = Math.max(largestBarForceN, sized.largestBarForceN);
    if (sized.result === null) {
      failedBand = band.index;
      failedWhy = sized.failedWhy;
      break;
    }
    results.push(sized.result);
  }
  const barMassKg = results.reduce((s, r) => s + r.barMassKg, 0);
  // Web members of a double layer: nominal force 2.5 % of the largest bar force (common practice, no source).
  let webChoice: ChsChoice | null = null;
  let webMassKg = 0;
  if (layers === 2 && failedBand < 0) {
    webChoice = pickChs(input.sections, [{ forceN: -0.025 * largestBarForceN, effectiveLengthM: input.webLengthM }], input.steel);
    if (webChoice === null) {
      failedBand = input.bands.length;
      failedWhy = `no catalogue hollow section is stocky enough for the ${input.webLengthM.toFixed(1)} m web members`;
    } else webMassKg = input.webCount * input.webLengthM * webChoice.section.massKgPerM;
  }
  const nodeMassKg = input.nodeAllowance * (barMassKg + webMassKg);
  const edge = sphericalMembraneForces(surfacePa, planPa, R, Math.min(phi0, Math.PI / 2 - 1e-9));
  const ringTensionN = edgeRingTensionN(edge.meridionalNPerM, phi0, input.baseRadiusM);
  // EN 1993-1-1 eq. 6.6 with γ_M0 = 1.0; area rounded up to a 25 cm² step of plate (a box of plates).
  const ringAreaM2 = Math.max(25e-4, Math.ceil(ringTensionN / input.steel.yieldPa / 25e-4) * 25e-4);
  const ringMassKg = ringAreaM2 * 2 * Math.PI * input.baseRadiusM * STEEL_DENSITY_KG_PER_M3 * (1 + input.nodeAllowance);
  return {
    bands: results,
    failedBand,
    failedWhy,
    webChoice,
    barMassKg,
    webMassKg,
    nodeMassKg,
    claddingMassKg: input.claddingKgPerM2 * input.surfaceM2,
    edgeMeridionalNPerM: edge.meridionalNPerM,
    ringTensionN,
    ringAreaM2,
    ringMassKg,
    heaviestCase: heaviest.name,
  };
}

/** Self-weight of lattice and cladding per m² of surface, kPa (the ring sits on the supports). */
export function latticeSelfWeightKPa(r: LatticeResult, surfaceM2: number): number {
  return kPaFromKgPerM2((r.barMassKg + r.webMassKg + r.nodeMassKg + r.claddingMassKg) / surfaceM2);
}
