/**
 * The surface z(x, y) through a set of points, taken as the piecewise-linear one over their plan
 * Delaunay triangulation (each triangle flat between its three points): its area, the plan area the
 * triangles cover and the volume between it and z = 0. For the fabric on a form-found net: the
 * fabric spans from node to node of the net, so the flat triangles between them are its surface at
 * the net's own resolution (a doubly curved panel is larger than its flat triangles by its
 * curvature: about 0.3 % for a panel sagging 1/20 of its span, Pythagoras on a parabola; common
 * practice to neglect at this stage, no source).
 */
import { Delaunay } from "d3";
import type { Vec3 } from "./model";

export interface HeightFieldMeasure {
  surfaceM2: number;
  planM2: number;
  volumeM3: number;
}

/** @throws RangeError with fewer than three points not all on one line in plan */
export function heightFieldMeasure(points: readonly Vec3[]): HeightFieldMeasure {
  const { triangles } = Delaunay.from(points, (p) => p[0], (p) => p[1]);
  const out: HeightFieldMeasure = { surfaceM2: 0, planM2: 0, volumeM3: 0 };
  for (let t = 0; t < triangles.length; t += 3) {
    const [a, b, c] = [points[triangles[t]!]!, points[triangles[t + 1]!]!, points[triangles[t + 2]!]!];
    const u = [b[0] - a[0], b[1] - a[1], b[2] - a[2]];
    const v = [c[0] - a[0], c[1] - a[1], c[2] - a[2]];
    const n = [u[1]! * v[2]! - u[2]! * v[1]!, u[2]! * v[0]! - u[0]! * v[2]!, u[0]! * v[1]! - u[1]! * v[0]!];
    const plan = Math.abs(n[2]!) / 2;
    out.surfaceM2 += Math.hypot(n[0]!, n[1]!, n[2]!) / 2;
    out.planM2 += plan;
    out.volumeM3 += (plan * (a[2] + b[2] + c[2])) / 3;
  }
  if (!(out.planM2 > 0)) throw new RangeError("a surface needs three points not on one line in plan");
  return out;
}
