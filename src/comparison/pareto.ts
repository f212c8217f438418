import type { DesignStatus } from "../schemes/types";

/** A point to compare on two costs, lower being better on both. */
export interface ParetoPoint {
  id: string;
  x: number;
  y: number;
  /** The design's status: only "feasible" points take part (a point without one takes part by its values). */
  status?: DesignStatus;
}

/**
 * The ids of the points that no other point beats on both measures (the Pareto front, lower is
 * better): a point is dominated when another is ≤ on both and < on at least one. Points out of
 * their method's range or infeasible (status other than "feasible") are neither on it nor dominate.
 * @example paretoFront([{id:"a",x:1,y:2},{id:"b",x:2,y:1},{id:"c",x:2,y:2}]) // ["a","b"]
 */
export function paretoFront(points: readonly ParetoPoint[]): string[] {
  const finite = points.filter((p) => (p.status === undefined || p.status === "feasible") && Number.isFinite(p.x) && Number.isFinite(p.y));
  return finite
    .filter((p) => !finite.some((q) => q !== p && q.x <= p.x && q.y <= p.y && (q.x < p.x || q.y < p.y)))
    .map((p) => p.id);
}
