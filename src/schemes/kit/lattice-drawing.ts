import type { Brief } from "../../brief";
import type { DrawingLine } from "../types";
import type { GeodesicCap } from "../../mechanics/geodesic";
import { sphericalCap, capHeightAt } from "../../mechanics/spherical-cap";

// The drawings of a lattice dome on a spherical cap, steel or timber: one role name, "lattice", for
// its members in the section and in the plan, so the two drawings share one colour and one legend
// entry (the plan called them "strut" and the legend listed both).

/** The section: the lattice (two layers, or its member depth, when `depthM` > 0) on its supports to the eaves, heights above the floor. */
export function capLatticeSection(brief: Brief, depthM: number): DrawingLine[] {
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

/** The plan: every member of the lattice, those on the edge ring as the ring. */
export function capLatticePlan(mesh: GeodesicCap): DrawingLine[] {
  return mesh.edges.map(([p, q], e) => ({
    role: mesh.edgeOnRing[e] ? "ring" : "lattice",
    points: [
      [mesh.nodes[p]![0], mesh.nodes[p]![1]],
      [mesh.nodes[q]![0], mesh.nodes[q]![1]],
    ],
  }));
}
