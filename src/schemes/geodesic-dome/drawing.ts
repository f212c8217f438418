import type { Brief } from "../../brief";
import type { DrawingLine } from "../kit";
import type { GeodesicCap } from "../../mechanics/geodesic";
import { sphericalCap, capHeightAt } from "../../mechanics/spherical-cap";

/** The section: the lattice (two layers when double) on its supports, heights above the floor. */
export function latticeSection(brief: Brief, depthM: number): DrawingLine[] {
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

/** The plan: every strut, the ring struts apart. */
export function latticePlan(mesh: GeodesicCap): DrawingLine[] {
  return mesh.edges.map(([p, q], e) => ({
    role: mesh.edgeOnRing[e] ? "ring" : "strut",
    points: [
      [mesh.nodes[p]![0], mesh.nodes[p]![1]],
      [mesh.nodes[q]![0], mesh.nodes[q]![1]],
    ],
  }));
}
