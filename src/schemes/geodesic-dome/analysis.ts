import type { Brief } from "../../brief";
import type { BucklingCurve } from "../../mechanics/flexural-buckling";
import type { GeodesicCap } from "../../mechanics/geodesic";
import type { SphericalCap } from "../../mechanics/spherical-cap";
import type { Check, DesignAnalysis } from "../kit";
import type { BandResult } from "./sizing";
import type { ChsSection } from "../../catalogue/types";
import { STEEL_E_PA } from "../../mechanics/flexural-buckling";
import { chsResistance, tubeBendingModulusM3, tubeClass } from "../../catalogue/pick-chs";
import { designBasis, type DesignBasis } from "../../loads/design-basis";
import { combinationAtPlanKPa } from "../../loads/combination-summary";
import type { Combination } from "../../loads/design-combinations";
import { latticeBuckling, latticeFrame, latticePlanLoads, tubeSection } from "../../analysis/lattice";
import { frameSystem, solveFrameLinear, type FrameModel } from "../../analysis/frame";
import { check, heaviestByUniformEquivalent } from "../kit";
import { bandOfEachEdge } from "../../mechanics/lattice-bands";

/** Steel's Poisson's ratio (EN 1993-1-1 §3.2.6). */
const STEEL_POISSON = 0.3;

/** The rigid-jointed frame of the actual net, each strut with its band's tube, the base ring pinned. */
function netFrame(mesh: GeodesicCap, bands: readonly BandResult[]): { frame: FrameModel; band: number[] } {
  const band = bandOfEachEdge(mesh, bands.map((b) => b.band));
  const sections = bands.map((b) => tubeSection(STEEL_E_PA, STEEL_POISSON, b.choice.section.diameterM, b.choice.section.thicknessM));
  const frame = latticeFrame(mesh, sections[0]!, { base: "pinned" });
  return { frame: { ...frame, members: frame.members.map((m, e) => ({ ...m, section: sections[band[e]!]! })) }, band };
}

/** The gravity combination with a snow case that is largest by its uniform equivalents (a cheap ranking; the analysis then takes the distribution). */
function snowCombination(basis: DesignBasis, caseId: "snow-uniform" | "snow-drifted", selfWeightKPa: number): Combination {
  const other = caseId === "snow-uniform" ? "snow-drifted" : "snow-uniform";
  const led = basis.combinations.filter((c) => c.purpose === "gravity" && c.terms.some((t) => t.caseId === caseId) && !c.terms.some((t) => t.caseId === other));
  return heaviestByUniformEquivalent(basis, led, selfWeightKPa);
}

export interface NetAnalysisInputs {
  brief: Brief;
  cap: SphericalCap;
  mesh: GeodesicCap;
  bands: readonly BandResult[];
  /** Lattice self-weight per m² of plan, kPa (the combination maps take permanent load on plan). */
  selfWeightPlanKPa: number;
  steel: { yieldPa: number; curve: BucklingCurve };
  knockDown: number;
  /** Run the linear buckling analysis after the statics. */
  buckling: boolean;
}

/**
 * The 3D analysis of the actual net (issue 13 item 6): a rigid-jointed frame of the struts with
 * their chosen tubes, base ring pinned, under the uniform-snow and the drifted-snow combinations as
 * distributions over the plan (wind in them taken vertical on plan); each bar's analysed axial force
 * with the bending of the rigid joints checked against its band's tube (barUtilisation); on demand, the lowest elastic buckling factor of the governing case, times the
 * knock-down, for general buckling, beside the continuum formula's factor.
 */
export function analyseNet(input: NetAnalysisInputs): { analysis: DesignAnalysis; checks: Check[]; governingCase: string } {
  const { brief, cap, mesh, bands } = input;
  const basis = designBasis(brief);
  const { frame, band } = netFrame(mesh, bands);
  const system = frameSystem(frame);
  const K = system.assemble(true);
  const cases = (["snow-uniform", "snow-drifted"] as const).map((id) => {
    const combination = snowCombination(basis, id, input.selfWeightPlanKPa);
    const at = combinationAtPlanKPa(basis, combination, input.selfWeightPlanKPa);
    const loads = latticePlanLoads(mesh, (x, y) => at(x, y) * 1000);
    const solution = solveFrameLinear({ ...frame, loads }, system, K);
    return { combination, loads, solution };
  });
  const checks: Check[] = [];
  let worst = { utilisation: 0, caseName: cases[0]!.combination.name, caseIndex: 0 };
  for (const [ci, c] of cases.entries()) {
    const moments = system.endMomentsNm(c.solution.displacements);
    c.solution.axialN.forEach((n, e) => {
      const b = bands[band[e]!]!;
      const utilisation = barUtilisation(b.choice.section, n, moments[e]!, b.band.maxLengthM, input.steel);
      if (utilisation > worst.utilisation) worst = { utilisation, caseName: c.combination.name, caseIndex: ci };
    });
  }
  const governing = cases[worst.caseIndex]!;
  const capacity = worst.utilisation > 0 ? 1 / worst.utilisation : 1;
  checks.push(check(`bars under the analysed ${governing.combination.name}: axial force with the joints' bending`, "3D rigid-jointed frame of the net; EN 1993-1-1 §6.3.3, eq. 6.61 with Annex B's k for C_m = 1, in compression; §6.2.1(7) in tension; W plastic or elastic by the tube's class", 1, capacity, ""));
  const base = -(cap.radiusM - cap.riseM) + brief.eavesHeightM;
  const nodes = mesh.nodes.map((p) => [p[0], p[1], p[2] + base] as const);
  const analysis: DesignAnalysis = {
    loadCases: cases.map((c) => ({ name: c.combination.name, iterations: 1, converged: c.solution.ok, maxDisplacementM: maxTranslation(c.solution.displacements), slackMembers: 0 })),
    continuumBucklingFactor: Math.min(...bands.map((b) => b.bucklingPa / b.pressurePa)),
  };
  const translations = (u: Float64Array) => mesh.nodes.map((_, k) => [u[6 * k]!, u[6 * k + 1]!, u[6 * k + 2]!] as const);
  const members = mesh.edges.map(([a, b], e) => ({ a, b, kind: "beam" as const, forceN: governing.solution.axialN[e]! }));
  analysis.view = { caseName: governing.combination.name, nodes, members, displacementsM: translations(governing.solution.displacements) };
  if (input.buckling) {
    const result = latticeBuckling(frame, governing.loads, 1);
    const lowest = result.buckling.factors[0];
    if (result.buckling.converged && lowest !== undefined) {
      analysis.bucklingFactor = input.knockDown * lowest;
      checks.push(check(`general buckling, 3D buckling factor × knock-down (${governing.combination.name})`, "linear buckling of the frame of the net (Lanczos), × knock-down", 1, analysis.bucklingFactor, ""));
      const mode = new Float64Array(6 * mesh.nodes.length);
      system.equationOf.forEach((eq, k) => eq >= 0 && (mode[k] = result.buckling.modes[0]![eq]!));
      analysis.view.modeShape = translations(mode);
    } else {
      checks.push(check("general buckling, 3D buckling factor", `the buckling analysis did not converge: ${result.buckling.reason ?? "no positive factor"}`, 1, 0, ""));
    }
  }
  return { analysis, checks, governingCase: governing.combination.name };
}

/**
 * A tube's utilisation under axial force N (tension +) and the resultant end moment M of the frame:
 * in compression N/N_b,Rd + k·M/M_Rd (EN 1993-1-1 eq. 6.61) with Annex B Table B.1's k at its upper
 * bound for C_m = 1 (any moment shape): 1 + 0.8n for class 1–2, 1 + 0.6n for class 3, n = N/N_b,Rd;
 * in tension N/N_t,Rd + M/M_Rd (§6.2.1(7), the linear sum). M_Rd = W f_y with W plastic or elastic by
 * class (γ_M0 = γ_M1 = 1.0, the recommended values of §6.1). The resultant moment of a tube, as is
 * usual for circular sections (common practice, no source). +∞ when the tube is too slender for the
 * buckling curve or class 4.
 */
function barUtilisation(section: ChsSection, axialN: number, momentNm: number, effectiveLengthM: number, steel: NetAnalysisInputs["steel"]): number {
  const r = chsResistance(section, { forceN: axialN, effectiveLengthM, yieldPa: steel.yieldPa, curve: steel.curve });
  const modulusM3 = tubeBendingModulusM3(section, steel.yieldPa);
  if (!r || modulusM3 === null) return Number.POSITIVE_INFINITY;
  const bending = momentNm / (modulusM3 * steel.yieldPa);
  if (axialN >= 0) return r.utilisation + bending;
  const k = 1 + (tubeClass(section, steel.yieldPa) <= 2 ? 0.8 : 0.6) * r.utilisation;
  return r.utilisation + k * bending;
}

function maxTranslation(u: Float64Array): number {
  let max = 0;
  for (let k = 0; k < u.length; k += 6) max = Math.max(max, Math.hypot(u[k]!, u[k + 1]!, u[k + 2]!));
  return max;
}
