import type { Brief } from "../../brief";
import type { DrawingLine } from "../types";
import type { GeodesicCap } from "../../mechanics/geodesic";
import { sphericalCap, capHeightAt } from "../../mechanics/spherical-cap";

/** Section through the dome: the lattice arc at its member depth, and the walls to the eaves. */
export function timberSection(brief: Brief, memberDepthM: number): DrawingLine[] {
  const cap = sphericalCap(brief.spanM, brief.riseM);
  const arc = (drop: number): [number, number][] =>
    Array.from({ length: 41 }, (_, i) => {
      const x = cap.baseRadiusM * (i / 20 - 1);
      return [x, brief.eavesHeightM + capHeightAt(cap, x) - drop];
    });
  const lines: DrawingLine[] = [{ role: "lattice", points: arc(0) }];
  if (memberDepthM > 0) lines.push({ role: "lattice", points: arc(memberDepthM) });
  for (const side of [-1, 1]) lines.push({ role: "support", points: [[side * cap.baseRadiusM, 0], [side * cap.baseRadiusM, brief.eavesHeightM]] });
  return lines;
}

/** Plan of the lattice: each member as a line, the ring edges as the ring. */
export function timberPlan(mesh: GeodesicCap): DrawingLine[] {
  return mesh.edges.map(([p, q], e) => ({
    role: mesh.edgeOnRing[e] ? "ring" : "strut",
    points: [
      [mesh.nodes[p]![0], mesh.nodes[p]![1]],
      [mesh.nodes[q]![0], mesh.nodes[q]![1]],
    ],
  }));
}
