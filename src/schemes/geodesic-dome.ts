import type { Brief } from "../study/brief";
import type { Catalogue } from "../catalogue/types";
import type { TakeoffRow } from "../takeoff/takeoff-row";
import type { Check, DrawingLine, MemberGroup, SchemeModel } from "./types";
import { sphericalCap, capHeightAt } from "../mechanics/spherical-cap";
import { capUsableRadiusM } from "../mechanics/usable-floor";
import { CapTooSmallError, geodesicCap, geodesicFrequencyFor, strutLengths } from "../mechanics/geodesic";
import { hoopSignChangeAngleRad } from "../mechanics/spherical-membrane";
import { roofActions } from "../loads/roof-actions";
import { assembleDesign, check, infeasibleDesign } from "./assemble-design";
import { iterateSelfWeight, ConvergenceError } from "./converge";
import { CLADDING_CHOICES, STEEL_GRADE_CHOICES, STEEL_GRADES, claddingCostItem, findCladding, type SteelGrade } from "./compression-common";
import { checkSchemeOptions } from "./check-options";
import { kPaFromKgPerM2 } from "../mechanics/gravity";
import { latticeSelfWeightKPa, sizeLattice, strutBands, type LatticeResult } from "./geodesic-dome-sizing";

export type GeodesicDomeOptions = {
  /** Target mean strut length, m. */
  targetStrutLengthM: number;
  /** "single" or "double" layer. */
  layers: string;
  /** Double-layer depth as % of span. */
  doubleLayerDepthPct: number;
  /** Knock-down on the classical buckling pressure, –. */
  knockDown: number;
  /** Bands of equal bar size, crown to edge. */
  bands: number;
  /** Node and connection allowance, % of bar mass. */
  nodeAllowancePct: number;
  cladding: string;
  steelGrade: string;
};

const defaults: GeodesicDomeOptions = {
  targetStrutLengthM: 5, // single-layer lattices are usually meshed at 3–6 m (common practice, no source)
  layers: "single",
  doubleLayerDepthPct: 2, // span/50 (common practice for double-layer domes, no source)
  knockDown: 0.3, // lattice shells reach 0.2–0.4 of p_cl with imperfections (from memory; cf. Kollár & Dulácska)
  bands: 6,
  nodeAllowancePct: 15, // nodes and connections 10–20 % of bar mass (common practice, no source)
  cladding: "metal-deck",
  steelGrade: "S355",
};

/** Usual upper span of a single-layer lattice dome, m (from memory: single-layer braced domes to ≈ 100 m, double-layer beyond). */
const SINGLE_LAYER_USUAL_MAX_SPAN_M = 100;

const options = [
  { key: "targetStrutLengthM", label: "Target strut length", kind: "number", unit: "m", min: 1.5, max: 15, step: 0.5, source: "mesh size; frequency v = round(1.2 R / L) (class I subdivision)" },
  {
    key: "layers",
    label: "Layers",
    kind: "select",
    unit: "",
    choices: [
      { value: "single", label: "Single-layer lattice" },
      { value: "double", label: "Double-layer grid" },
    ],
    source: "double layer: two grids at a depth, webs between (equivalent sandwich stiffness)",
  },
  { key: "doubleLayerDepthPct", label: "Double-layer depth", kind: "number", unit: "% of span", min: 0.5, max: 6, step: 0.1, source: "common practice span/50, no source" },
  { key: "knockDown", label: "Buckling knock-down on p_cl", kind: "number", unit: "", min: 0.05, max: 1, step: 0.05, source: "imperfection sensitivity of lattice shells, from memory 0.2–0.4" },
  { key: "bands", label: "Bar size bands, crown to edge", kind: "number", unit: "", min: 1, max: 20, step: 1, integer: true, source: "grouping of alike members" },
  { key: "nodeAllowancePct", label: "Nodes and connections", kind: "number", unit: "% of bar mass", min: 0, max: 50, step: 1, source: "common practice 10–20 %, no source" },
  { key: "cladding", label: "Cladding", kind: "select", unit: "", choices: CLADDING_CHOICES, source: "data/claddings.csv" },
  { key: "steelGrade", label: "Steel grade", kind: "select", unit: "", choices: STEEL_GRADE_CHOICES, source: "EN 1993-1-1 Table 3.1" },
] as const satisfies readonly import("./types").OptionSpec[];

/**
 * Designs a geodesic steel lattice dome: a class I icosahedral cap generated at the frequency whose
 * mean strut meets the target length; membrane forces (Timoshenko & Woinowsky-Krieger ch. 14) resolved
 * into the three-way grid; CHS bars per band for EN 1993-1-1 §6.3.1 buckling node to node, upsized
 * until the lattice passes general buckling k·4√(DB)/R²; a tension ring for the edge thrust; the
 * self-weight iterated to convergence. Validity: axisymmetric membrane state; 40–250 m.
 */
/** The last few generated caps: the same geometry is asked for again whenever only loads, factors or rates change (compare page, risk runs). Read-only. */
const capCache = new Map<string, ReturnType<typeof geodesicCap>>();
function cachedCap(frequency: number, radiusM: number, capAngleRad: number): ReturnType<typeof geodesicCap> {
  const key = `${frequency}|${radiusM}|${capAngleRad}`;
  let mesh = capCache.get(key);
  if (!mesh) {
    mesh = geodesicCap(frequency, radiusM, capAngleRad);
    if (capCache.size >= 16) capCache.delete(capCache.keys().next().value as string);
    capCache.set(key, mesh);
  }
  return mesh;
}

function design(brief: Brief, opts: GeodesicDomeOptions, catalogue: Catalogue) {
  checkSchemeOptions(options, opts);
  const model = geodesicDome;
  const cap = sphericalCap(brief.spanM, brief.riseM);
  const R = cap.radiusM;
  const a = cap.baseRadiusM;
  const double = opts.layers === "double";
  const depthM = double ? (opts.doubleLayerDepthPct / 100) * brief.spanM : 0;
  const cladding = findCladding(catalogue, opts.cladding);
  const steel = STEEL_GRADES[opts.steelGrade as SteelGrade];
  const frequency = geodesicFrequencyFor(R, opts.targetStrutLengthM);
  const section = sectionLines(brief, depthM);
  if (frequency > 400) return infeasibleDesign("geodesic-dome", brief, `the mesh would need frequency ${frequency} (over 400): increase the target strut length`, [], section);
  let mesh;
  try {
    mesh = cachedCap(frequency, R, cap.edgeAngleRad);
  } catch (e) {
    if (e instanceof CapTooSmallError) return infeasibleDesign("geodesic-dome", brief, "the mesh is too coarse for so small a cap: reduce the target strut length", [], section);
    throw e;
  }
  const bands = strutBands(mesh, Math.min(opts.bands, Math.max(1, Math.floor(frequency / 2))));
  const lengths = strutLengths(mesh.edgeLengthsM);
  const webLengthM = double ? Math.hypot(depthM, lengths.meanM / Math.sqrt(3)) : 0;
  const inputs = {
    brief,
    actions: roofActions(brief),
    radiusM: R,
    capAngleRad: cap.edgeAngleRad,
    baseRadiusM: a,
    surfaceM2: cap.surfaceM2,
    bands,
    sections: catalogue.chs,
    steel,
    knockDown: opts.knockDown,
    doubleLayerDepthM: depthM,
    webCount: double ? 3 * mesh.nodes.length : 0,
    webLengthM,
    nodeAllowance: opts.nodeAllowancePct / 100,
    claddingKgPerM2: cladding.massKgPerM2,
  };
  let converged;
  try {
    converged = iterateSelfWeight<LatticeResult>((g) => {
      const r = sizeLattice(inputs, g);
      return { value: r, selfWeightKPa: r.failedBand >= 0 ? g : latticeSelfWeightKPa(r, cap.surfaceM2) };
    }, kPaFromKgPerM2(40 + cladding.massKgPerM2));
  } catch (e) {
    if (e instanceof ConvergenceError) return infeasibleDesign("geodesic-dome", brief, e.message, [], section);
    throw e;
  }
  const r = converged.value;
  const warnings: string[] = [];
  if (!double && brief.spanM > SINGLE_LAYER_USUAL_MAX_SPAN_M) {
    warnings.push(`single-layer lattice beyond its usual span range (≈ ${SINGLE_LAYER_USUAL_MAX_SPAN_M} m, from memory): consider the double-layer option`);
  }
  if (cap.edgeAngleRad > hoopSignChangeAngleRad()) warnings.push("edge angle beyond 51.8°: hoop forces turn to tension near the edge (bars sized for it)");
  warnings.push("membrane forces from the plan-mean snow load; drifted snow and point loads bend a lattice and are not covered at this stage");
  warnings.push("the supports under the edge ring (walls or columns to the eaves) are not included");
  if (r.failedBand >= 0) {
    const reason = double ? `${r.failedWhy}: use a deeper double layer or a shorter mesh` : `${r.failedWhy}: choose the double-layer option or a shorter mesh`;
    return infeasibleDesign("geodesic-dome", brief, reason, warnings, section);
  }

  const members: MemberGroup[] = [];
  const checks: Check[] = [];
  const layerWord = double ? " (each layer)" : "";
  for (const b of r.bands) {
    const name = b.band.edge ? "bars meeting the ring" : `bars, band ${b.band.index + 1} of ${bands.length - 1}`;
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
    members.push({
      element: "web members",
      material: "steel-hot-finished-hollow",
      count: inputs.webCount,
      lengthM: webLengthM,
      section: r.webChoice.section.designation,
      designForceN: -r.webChoice.utilisation * r.webChoice.resistanceN,
      resistanceN: r.webChoice.resistanceN,
      utilisation: r.webChoice.utilisation,
      governing: r.webChoice.governing,
    });
  }
  if (r.ringTensionN > 0) checks.push(check("edge tension ring", "EN 1993-1-1 eq. 6.6", r.ringTensionN, r.ringAreaM2 * steel.yieldPa, "N"));

  const steelRow = (element: string, massKg: number, costItem: TakeoffRow["costItem"], material: TakeoffRow["material"] = "steel-hot-finished-hollow"): TakeoffRow => ({ element, material, costItem, quantity: massKg / 1000, unit: "t", massKg });
  const takeoff: TakeoffRow[] = [
    steelRow("lattice bars", r.barMassKg, "steel-lattice"),
    ...(r.webMassKg > 0 ? [steelRow("web members", r.webMassKg, "steel-lattice")] : []),
    steelRow("nodes and connections", r.nodeMassKg, "steel-lattice", "steel-plate"),
    steelRow("edge tension ring", r.ringMassKg, "steel-ring", "steel-plate"),
    { element: "cladding", material: cladding.material, costItem: claddingCostItem(cladding), quantity: cap.surfaceM2, unit: "m2", massKg: r.claddingMassKg },
  ];
  const innerStruts = strutLengths(mesh.edgeLengthsM, (e) => !mesh.edgeOnRing[e]);
  const usableRadius = capUsableRadiusM(R, brief.riseM, a, brief.eavesHeightM, depthM, brief.minClearHeightM);
  const summary = [
    { key: "frequency", label: "Geodesic frequency v", value: frequency, unit: "" },
    { key: "nodes", label: "Nodes", value: mesh.nodes.length * (double ? 2 : 1), unit: "nr" },
    { key: "struts", label: "Struts (lattice, without ring)", value: innerStruts.count * (double ? 2 : 1), unit: "nr" },
    { key: "faces", label: "Triangular faces", value: mesh.faces.length, unit: "nr" },
    { key: "strutMinM", label: "Strut length, shortest", value: innerStruts.minM, unit: "m" },
    { key: "strutMeanM", label: "Strut length, mean", value: innerStruts.meanM, unit: "m" },
    { key: "strutMaxM", label: "Strut length, longest", value: innerStruts.maxM, unit: "m" },
    { key: "strutTotalM", label: "Strut length, total (one layer)", value: innerStruts.totalM, unit: "m" },
    { key: "sphereRadiusM", label: "Sphere radius", value: R, unit: "m" },
    { key: "ringTensionKN", label: "Edge ring tension", value: r.ringTensionN / 1000, unit: "kN" },
    { key: "steelKgPerM2", label: "Steel per m² of plan", value: (r.barMassKg + r.webMassKg + r.nodeMassKg + r.ringMassKg) / cap.planAreaM2, unit: "kg/m²" },
  ];
  return assembleDesign(model, brief, {
    summary,
    members,
    takeoff,
    checks,
    warnings,
    iterations: converged.iterations,
    usableFloorM2: Math.PI * usableRadius * usableRadius,
    roofSurfaceM2: cap.surfaceM2,
    enclosedVolumeM3: cap.planAreaM2 * brief.eavesHeightM + cap.volumeM3,
    drawing: { section, plan: planLines(mesh) },
  });
}

function sectionLines(brief: Brief, depthM: number): DrawingLine[] {
  const cap = sphericalCap(brief.spanM, brief.riseM);
  const arc = (offset: number): [number, number][] =>
    Array.from({ length: 41 }, (_, i) => {
      const x = -cap.baseRadiusM + (i / 40) * 2 * cap.baseRadiusM;
      return [x, brief.eavesHeightM + capHeightAt(cap, x) - offset] as [number, number];
    });
  const lines: DrawingLine[] = [{ role: "lattice", points: arc(0) }];
  if (depthM > 0) lines.push({ role: "lattice", points: arc(depthM) });
  for (const side of [-1, 1]) lines.push({ role: "support", points: [[side * cap.baseRadiusM, 0], [side * cap.baseRadiusM, brief.eavesHeightM]] });
  return lines;
}

function planLines(mesh: ReturnType<typeof geodesicCap>): DrawingLine[] {
  const lines: DrawingLine[] = mesh.edges.map(([p, q], e) => ({
    role: mesh.edgeOnRing[e] ? "ring" : "strut",
    points: [
      [mesh.nodes[p]![0], mesh.nodes[p]![1]],
      [mesh.nodes[q]![0], mesh.nodes[q]![1]],
    ],
  }));
  return lines;
}

export const geodesicDome: SchemeModel<GeodesicDomeOptions> = {
  id: "geodesic-dome",
  label: "Geodesic steel dome",
  description:
    "A single- or double-layer lattice of steel tubes on a geodesic (icosahedral) net, cut to a spherical cap on a steel tension ring. The dome carries the roof as a shell in compression; the bars are sized for their membrane forces and the whole lattice for general buckling.",
  validSpanM: { min: 40, max: 250 },
  options,
  defaults,
  design,
};
