import type { Brief } from "../../brief";
import type { GeodesicCap, Vec3 } from "../../mechanics/geodesic";
import type { SphericalCap } from "../../mechanics/spherical-cap";
import type { Check, DesignAnalysis } from "../kit";
import type { BandResult } from "./sizing";
import type { GlulamSection } from "./sections";
import { bandOfEachEdge } from "../../mechanics/lattice-bands";
import { designBasis, type DesignBasis } from "../../loads/design-basis";
import { combinationAtPlanKPa } from "../../loads/combination-summary";
import type { Combination } from "../../loads/design-combinations";
import { latticeBuckling, latticeFrame, latticePlanLoads } from "../../analysis/lattice";
import { frameSystem, solveFrameLinear, type FrameModel, type FrameSection } from "../../analysis/frame";
import { check, heaviestByUniformEquivalent } from "../kit";

/** Shear modulus of glulam as a share of E_0,mean: EN 14080:2013 Table 5 gives G_g,mean 650 MPa for 11,500–14,200 MPa, about E/16 (from memory). */
const GLULAM_SHEAR_PER_MODULUS = 1 / 16;

/**
 * A rectangular glulam section as a frame section of modulus E (the creep-reduced E/(1 + k_def)
 * for the final state): strong axis (depth) about local y, so the member bends out of the roof
 * surface on it when the member's local z is turned to the surface normal; St Venant torsion
 * J ≈ (1/3)(1 − 0.63 t/w) t³w, t the short side and w the long (Roark's Formulas, table 10.7 case 4, from memory).
 */
export function glulamFrameSection(section: GlulamSection, modulusPa: number): FrameSection {
  const t = Math.min(section.widthM, section.depthM);
  const w = Math.max(section.widthM, section.depthM);
  const torsion = (1 / 3) * (1 - 0.63 * (t / w)) * t ** 3 * w;
  return {
    eaN: modulusPa * section.areaM2,
    eiyNm2: modulusPa * section.secondMomentYM4,
    eizNm2: modulusPa * section.secondMomentZM4,
    gjNm2: modulusPa * GLULAM_SHEAR_PER_MODULUS * torsion,
    polarRadius2M2: (section.secondMomentYM4 + section.secondMomentZM4) / section.areaM2,
  };
}

/**
 * The frame of the net: each member with its band's section, its depth normal to the sphere at its
 * midpoint, the base ring pinned. The deck and purlins brace the members in the roof surface at the
 * purlin spacing s (the member design takes that buckling length about the weak axis); the frame has
 * no deck, so each member's in-plane bending stiffness is raised by (L/s)², which gives its
 * in-plane Euler load at length L the value it has braced at s. Without it the lowest mode is
 * every member bowing sideways over its whole length, which the deck prevents.
 */
export function timberNetFrame(mesh: GeodesicCap, sectionOfBand: readonly GlulamSection[], bandOf: readonly number[], modulusPa: number, inPlaneBraceM = Infinity): FrameModel {
  const sections = sectionOfBand.map((s) => glulamFrameSection(s, modulusPa));
  const frame = latticeFrame(mesh, sections[0]!, { base: "pinned" });
  const members = frame.members.map((m, e) => {
    const [p, q] = [mesh.nodes[m.i]!, mesh.nodes[m.j]!];
    const section = sections[bandOf[e]!]!;
    const braced = Math.max(1, (mesh.edgeLengthsM[e]! / inPlaneBraceM) ** 2);
    return { ...m, section: braced > 1 ? { ...section, eizNm2: section.eizNm2 * braced } : section, zReference: [p[0] + q[0], p[1] + q[1], p[2] + q[2]] as Vec3 };
  });
  return { ...frame, members };
}

/** The gravity combination of the design basis that is largest by its uniform equivalents (the analysis then takes its distribution on plan). */
function heaviestGravityCombination(basis: DesignBasis, selfWeightKPa: number): Combination {
  return heaviestByUniformEquivalent(basis, basis.combinations.filter((c) => c.purpose === "gravity"), selfWeightKPa);
}

export interface TimberNetInputs {
  brief: Brief;
  cap: SphericalCap;
  mesh: GeodesicCap;
  bands: readonly BandResult[];
  /** Self-weight of the lattice and what it carries per m² of plan, kPa. */
  selfWeightPlanKPa: number;
  /** E_0,mean/(1 + k_def), Pa (EN 1995-1-1 §2.3.2.2, final state). */
  creepModulusPa: number;
  knockDown: number;
  /** Purlin spacing, m: the deck and purlins brace the members in the roof surface at it. */
  purlinSpacingM: number;
}

function translations(mesh: GeodesicCap, u: Float64Array): (readonly [number, number, number])[] {
  return mesh.nodes.map((_, k) => [u[6 * k]!, u[6 * k + 1]!, u[6 * k + 2]!] as const);
}

/**
 * General buckling of the timber net through the analysis layer, on demand: the rigid-jointed
 * frame of the actual mesh, each member with its band's glulam section at the creep-reduced
 * modulus, under the heaviest gravity combination as its distribution on plan; linear statics,
 * then the lowest buckling factor × knock-down, reported beside the equivalent continuum's.
 * Joints are taken rigid (timber joints are semi-rigid: the knock-down carries that).
 */
export function analyseTimberNet(input: TimberNetInputs): { analysis: DesignAnalysis; checks: Check[] } {
  const { mesh, bands, brief, cap } = input;
  const basis = designBasis(brief);
  const combination = heaviestGravityCombination(basis, input.selfWeightPlanKPa);
  const at = combinationAtPlanKPa(basis, combination, input.selfWeightPlanKPa);
  const loads = latticePlanLoads(mesh, (x, y) => at(x, y) * 1000);
  const frame = timberNetFrame(mesh, bands.map((b) => b.section), bandOfEachEdge(mesh, bands.map((b) => b.band)), input.creepModulusPa, input.purlinSpacingM);
  const system = frameSystem({ ...frame, loads });
  const statics = solveFrameLinear({ ...frame, loads }, system);
  const result = latticeBuckling(frame, loads, 1);
  let maxDisplacementM = 0;
  for (let k = 0; k < statics.displacements.length; k += 6) maxDisplacementM = Math.max(maxDisplacementM, Math.hypot(statics.displacements[k]!, statics.displacements[k + 1]!, statics.displacements[k + 2]!));
  const base = -(cap.radiusM - cap.riseM) + brief.eavesHeightM;
  const analysis: DesignAnalysis = {
    loadCases: [{ name: combination.name, iterations: 1, converged: statics.ok, maxDisplacementM, slackMembers: 0 }],
    continuumBucklingFactor: Math.min(...bands.map((b) => b.bucklingPa / b.pressurePa)),
    view: {
      caseName: combination.name,
      nodes: mesh.nodes.map((p) => [p[0], p[1], p[2] + base] as const),
      members: mesh.edges.map(([a, b], e) => ({ a, b, kind: "beam" as const, forceN: statics.axialN[e]! })),
      displacementsM: translations(mesh, statics.displacements),
    },
  };
  const checks: Check[] = [];
  const lowest = result.buckling.factors[0];
  if (result.buckling.converged && lowest !== undefined) {
    analysis.bucklingFactor = input.knockDown * lowest;
    checks.push(check(`general buckling of the net, 3D buckling factor × knock-down (${combination.name})`, "linear buckling of the frame of the net (Lanczos), E/(1 + k_def) (EN 1995-1-1 §2.3.2.2), × knock-down", 1, analysis.bucklingFactor, ""));
    const mode = new Float64Array(6 * mesh.nodes.length);
    system.equationOf.forEach((eq, k) => eq >= 0 && (mode[k] = result.buckling.modes[0]![eq]!));
    analysis.view!.modeShape = translations(mesh, mode);
  } else {
    checks.push(check("general buckling of the net, 3D buckling factor", `the buckling analysis did not converge: ${result.buckling.reason ?? "no positive factor"}`, 1, 0, ""));
  }
  return { analysis, checks };
}
