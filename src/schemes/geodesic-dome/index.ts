import type { Brief } from "../../brief";
import type { Catalogue } from "../../catalogue/types";
import type { TakeoffRow } from "../../takeoff/takeoff-row";
import type { Check, DesignParts, DrawingLine, MemberGroup } from "../kit";
import { briefCombinations, capEnvelope, capLatticePlan, capLatticeSection, capFloor, check, convergeSelfWeight, drawingWithLazyPlan, UNIFORM_EQUIVALENT_WARNING, defineScheme, findCladding, claddingCostItem, steelGrade, tonnesRow, SchemeError } from "../kit";
import { sphericalCap, type SphericalCap } from "../../mechanics/spherical-cap";
import { cachedGeodesicCap } from "../../mechanics/geodesic-cache";
import { CapTooSmallError, geodesicFrequencyFor } from "../../mechanics/geodesic";
import { geodesicCapCut, type GeodesicCapCut } from "../../mechanics/geodesic-bands";
import { hoopSignChangeAngleRad } from "../../mechanics/spherical-membrane";
import { kPaFromKgPerM2 } from "../../mechanics/gravity";
import { bandStrutLengths } from "../../mechanics/lattice-bands";
import { latticeSelfWeightKPa, sizeLattice, type LatticeInputs, type LatticeResult } from "./sizing";
import { analyseNet } from "./analysis";
import { frameTooLarge } from "../../analysis/frame";
import { geodesicDomeDeclaration, type GeodesicDomeOptions } from "./declaration";

/** Usual upper span of a single-layer lattice dome, m (from memory: single-layer braced domes to ≈ 100 m, double-layer beyond). */
const SINGLE_LAYER_USUAL_MAX_SPAN_M = 100;

/**
 * The geodesic mesh at the frequency whose mean strut meets the target length, cut into its bands
 * (at most `bands`, and half the frequency) from the remembered sphere without building it: the
 * sizing and the summary read only the bands and counts, the mesh is built for the drawing and the
 * 3D analysis of the design kept. A SchemeError when the mesh cannot be made.
 */
function latticeMesh(cap: SphericalCap, targetStrutLengthM: number, bands: number, section: DrawingLine[]): { frequency: number; cut: GeodesicCapCut } {
  const frequency = geodesicFrequencyFor(cap.radiusM, targetStrutLengthM);
  if (frequency > 400) throw new SchemeError(`the mesh would need frequency ${frequency} (over 400): increase the target strut length`, { section });
  try {
    return { frequency, cut: geodesicCapCut(frequency, cap.radiusM, cap.edgeAngleRad, Math.min(bands, Math.max(1, Math.floor(frequency / 2)))) };
  } catch (e) {
    if (e instanceof CapTooSmallError) throw new SchemeError("the mesh is too coarse for so small a cap: reduce the target strut length", { cause: e, section });
    throw e;
  }
}

function latticeWarnings(brief: Brief, cap: SphericalCap, double: boolean): string[] {
  const warnings: string[] = [];
  if (!double && brief.spanM > SINGLE_LAYER_USUAL_MAX_SPAN_M) {
    warnings.push(`single-layer lattice beyond its usual span range (≈ ${SINGLE_LAYER_USUAL_MAX_SPAN_M} m, from memory): consider the double-layer option`);
  }
  if (cap.edgeAngleRad > hoopSignChangeAngleRad()) warnings.push("edge angle beyond 51.8°: hoop forces turn to tension near the edge (bars sized for it)");
  warnings.push(UNIFORM_EQUIVALENT_WARNING);
  warnings.push("the supports under the edge ring (walls or columns to the eaves) are not included");
  return warnings;
}

/** One member group and its two checks per band, the web members, and the ring check. */
function latticeMembers(r: LatticeResult, inputs: LatticeInputs, double: boolean): { members: MemberGroup[]; checks: Check[] } {
  const members: MemberGroup[] = [];
  const checks: Check[] = [];
  const layerWord = double ? " (each layer)" : "";
  for (const b of r.bands) {
    const name = b.band.edge ? "bars meeting the ring" : `bars, band ${b.band.index + 1} of ${inputs.bands.length - 1}`;
    members.push({
      element: `lattice ${name}${layerWord}`,
      material: "steel-hot-finished-hollow",
      count: b.band.count * (double ? 2 : 1),
      lengthM: b.band.meanLengthM,
      section: b.choice.section.designation,
      designForceN: Math.abs(b.compressionN) >= b.tensionN ? b.compressionN : b.tensionN,
      resistanceN: b.choice.resistanceN,
      utilisation: b.choice.utilisation,
      governing: b.choice.governing,
    });
    checks.push(check(`${name}: ${b.choice.governing.split(",")[0]}`, b.choice.governing.split(", ")[1] ?? "EN 1993-1-1", b.choice.utilisation * b.choice.resistanceN, b.choice.resistanceN, "N"));
    checks.push(check(`${name}: general buckling of the lattice`, "equivalent continuum 4√(DB)/R² × knock-down", b.pressurePa, b.bucklingPa, "Pa"));
  }
  if (r.webChoice) {
    const web = r.webChoice;
    members.push({ element: "web members", material: "steel-hot-finished-hollow", count: inputs.webCount, lengthM: inputs.webLengthM, section: web.section.designation, designForceN: -web.utilisation * web.resistanceN, resistanceN: web.resistanceN, utilisation: web.utilisation, governing: web.governing });
  }
  if (r.ringTensionN > 0) checks.push(check("edge tension ring", "EN 1993-1-1 eq. 6.6", r.ringTensionN, r.ringAreaM2 * inputs.steel.yieldPa, "N"));
  return { members, checks };
}

function latticeTakeoff(r: LatticeResult, cladding: ReturnType<typeof findCladding>, cap: SphericalCap): TakeoffRow[] {
  return [
    tonnesRow("lattice bars", "steel-hot-finished-hollow", "steel-lattice", r.barMassKg),
    ...(r.webMassKg > 0 ? [tonnesRow("web members", "steel-hot-finished-hollow", "steel-lattice", r.webMassKg)] : []),
    tonnesRow("nodes and connections", "steel-plate", "steel-lattice", r.nodeMassKg),
    tonnesRow("edge tension ring", "steel-plate", "steel-ring", r.ringMassKg),
    { element: "cladding", material: cladding.material, costItem: claddingCostItem(cladding), quantity: cap.surfaceM2, unit: "m2", massKg: r.claddingMassKg },
  ];
}

function latticeSummary(r: LatticeResult, cut: GeodesicCapCut, frequency: number, cap: SphericalCap, double: boolean) {
  // the bands hold every strut not on the ring once
  const innerStruts = bandStrutLengths(cut.bands);
  return [
    { key: "frequency", label: "Geodesic frequency v", value: frequency, unit: "" },
    { key: "nodes", label: "Nodes", value: cut.nodeCount * (double ? 2 : 1), unit: "nr" },
    { key: "struts", label: "Struts (lattice, without ring)", value: innerStruts.count * (double ? 2 : 1), unit: "nr" },
    { key: "faces", label: "Triangular faces", value: cut.faceCount, unit: "nr" },
    { key: "strutMinM", label: "Strut length, shortest", value: innerStruts.minM, unit: "m" },
    { key: "strutMeanM", label: "Strut length, mean", value: innerStruts.meanM, unit: "m" },
    { key: "strutMaxM", label: "Strut length, longest", value: innerStruts.maxM, unit: "m" },
    { key: "strutTotalM", label: "Strut length, total (one layer)", value: innerStruts.totalM, unit: "m" },
    { key: "sphereRadiusM", label: "Sphere radius", value: cap.radiusM, unit: "m" },
    { key: "ringTensionKN", label: "Edge ring tension", value: r.ringTensionN / 1000, unit: "kN" },
    { key: "steelKgPerM2", label: "Steel per m² of plan", value: (r.barMassKg + r.webMassKg + r.nodeMassKg + r.ringMassKg) / cap.planAreaM2, unit: "kg/m²" },
  ];
}

/**
 * Designs a geodesic steel lattice dome: a class I icosahedral cap generated at the frequency whose
 * mean strut meets the target length; membrane forces (Timoshenko & Woinowsky-Krieger ch. 14) resolved
 * into the three-way grid; CHS bars per band for EN 1993-1-1 §6.3.1 buckling node to node, upsized
 * until the lattice passes general buckling k·4√(DB)/R²; a tension ring for the edge thrust; the
 * self-weight iterated to convergence. Validity: axisymmetric membrane state; 40–250 m.
 */
function design(brief: Brief, opts: GeodesicDomeOptions, catalogue: Catalogue): DesignParts {
  const cap = sphericalCap(brief.spanM, brief.riseM);
  const double = opts.layers === "double";
  const depthM = double ? (opts.doubleLayerDepthPct / 100) * brief.spanM : 0;
  const cladding = findCladding(catalogue, opts.cladding);
  const section = capLatticeSection(brief, depthM);
  const { frequency, cut } = latticeMesh(cap, opts.targetStrutLengthM, opts.bands, section);
  // built only for the drawing and the 3D analysis (remembered: both ask for the same cap)
  const mesh = () => cachedGeodesicCap(frequency, cap.radiusM, cap.edgeAngleRad);
  const inner = bandStrutLengths(cut.bands);
  // the mean of every strut, ring included
  const meanStrutM = (inner.totalM + cut.ringLengthM) / (inner.count + cut.ringEdgeCount);
  const webLengthM = double ? Math.hypot(depthM, meanStrutM / Math.sqrt(3)) : 0;
  const inputs: LatticeInputs = {
    combinations: briefCombinations(brief),
    servicesKPa: brief.servicesKPa,
    radiusM: cap.radiusM,
    capAngleRad: cap.edgeAngleRad,
    baseRadiusM: cap.baseRadiusM,
    surfaceM2: cap.surfaceM2,
    bands: cut.bands,
    sections: catalogue.chs,
    steel: steelGrade(opts.steelGrade),
    knockDown: opts.knockDown,
    doubleLayerDepthM: depthM,
    webCount: double ? 3 * cut.nodeCount : 0,
    webLengthM,
    nodeAllowance: opts.nodeAllowancePct / 100,
    claddingKgPerM2: cladding.massKgPerM2,
  };
  const converged = convergeSelfWeight<LatticeResult>(
    (g) => {
      const r = sizeLattice(inputs, g);
      return { value: r, selfWeightKPa: r.failedBand >= 0 ? g : latticeSelfWeightKPa(r, cap.surfaceM2) };
    },
    kPaFromKgPerM2(40 + cladding.massKgPerM2),
    { section },
  );
  const r = converged.value;
  const warnings = latticeWarnings(brief, cap, double);
  if (r.failedBand >= 0) {
    const reason = double ? `${r.failedWhy}: use a deeper double layer or a shorter mesh` : `${r.failedWhy}: choose the double-layer option or a shorter mesh`;
    throw new SchemeError(reason, { warnings, section });
  }
  const governingBand = r.bands.reduce((worst, b) => (b.choice.utilisation > worst.choice.utilisation ? b : worst));
  const membraneCase = governingBand.bucklingPa > 0 && governingBand.pressurePa / governingBand.bucklingPa >= governingBand.choice.utilisation ? r.heaviestCase : governingBand.governingCase;
  const members = latticeMembers(r, inputs, double);
  const tooLargeWarning = !double && opts.bucklingAnalysis ? frameTooLarge(cut.nodeCount, "bar forces from membrane theory; lengthen the target strut") : null;
  const tooLarge = tooLargeWarning !== null;
  if (tooLargeWarning) warnings.push(tooLargeWarning);
  const net = double || !opts.bucklingAnalysis || tooLarge ? null : analyseNet({ brief, cap, mesh: mesh(), bands: r.bands, selfWeightPlanKPa: latticeSelfWeightKPa(r, cap.surfaceM2) * (cap.surfaceM2 / cap.planAreaM2), steel: inputs.steel, knockDown: opts.knockDown, buckling: opts.bucklingAnalysis });
  if (double && opts.bucklingAnalysis) warnings.push("double layer: no 3D analysis of the net (the frame model is single-layer); bar forces from membrane theory only");
  if (!net && !tooLarge) warnings.push("bar forces from membrane theory; the 3D analysis of the net (member forces under drifted snow, buckling factor) runs on demand: the option “3D analysis of the net”, or --buckling on the command line");
  const maxMembrane = Math.max(...members.checks.map((c) => c.utilisation));
  const maxNet = net ? Math.max(...net.checks.map((c) => c.utilisation)) : 0;
  return {
    members: members.members,
    checks: [...members.checks, ...(net?.checks ?? [])],
    ...(net ? { analysis: net.analysis } : {}),
    governingLoadCase: net && maxNet > maxMembrane ? net.governingCase : membraneCase,
    regime: double ? "double layer" : "single layer",
    summary: latticeSummary(r, cut, frequency, cap, double),
    takeoff: latticeTakeoff(r, cladding, cap),
    warnings,
    iterations: converged.iterations,
    floor: capFloor(cap, brief.eavesHeightM, depthM),
    ...capEnvelope(cap, brief.eavesHeightM),
    drawing: drawingWithLazyPlan(section, () => capLatticePlan(mesh())),
  };
}

export const geodesicDome = defineScheme(geodesicDomeDeclaration, design);
