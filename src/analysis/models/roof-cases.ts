/**
 * Illustrative load cases for the generic models (tests and benchmarks; the schemes will bring the
 * shared EN 1990 / EN 1991 load cases instead): dead load over the plan, dead + uniform snow,
 * dead + drifted snow (μ on the half x < 0, half of it on the other — the shape of EN 1991-1-3
 * §5.3.5's drifted case, applied across a diameter), and dead + wind suction varying linearly from
 * the windward (x < 0) to the leeward edge, applied normal to the deformed surface (a follower load).
 */
import { solveCableModel, type CableSolution, type CableSolverOptions } from "../cable-solver";
import { flatCoordinates, type CableModel, type NodalLoad } from "../model";
import { planLoads, pressureLoads } from "../surface-loads";
import type { NetModel } from "./saddle-net";

export interface RoofActions {
  deadPa: number;
  snowPa: number;
  /** Suction at the windward and the leeward edge, Pa (positive = outward). */
  suctionWindwardPa: number;
  suctionLeewardPa: number;
}

export interface RoofCase {
  name: string;
  /** Dead loads on the initial geometry, N. */
  loads: NodalLoad[];
  /** Follower surface loads on the current geometry, flat N (only the wind case). */
  loadAt?: (coordinates: Float64Array) => Float64Array;
}

function asNodalLoads(flat: Float64Array, free: readonly number[]): NodalLoad[] {
  return free.map((node) => ({ node, forceN: [flat[3 * node]!, flat[3 * node + 1]!, flat[3 * node + 2]!] as const }));
}

/** The four cases above for a net whose plan spans x ∈ [−halfWidth, halfWidth]. */
export function roofCases(net: NetModel, actions: RoofActions, halfWidthM: number): RoofCase[] {
  const x0 = flatCoordinates(net.model.nodes);
  const plan = (f: (x: number) => number) => asNodalLoads(planLoads(x0, net.faces, (x) => f(x)), net.free);
  const dead = plan(() => actions.deadPa);
  const add = (a: NodalLoad[], b: NodalLoad[]) => a.map((l, k) => ({ node: l.node, forceN: [0, 1, 2].map((d) => l.forceN[d]! + b[k]!.forceN[d]!) as unknown as NodalLoad["forceN"] }));
  const suction = (x: number) => {
    const t = Math.min(1, Math.max(0, (x + halfWidthM) / (2 * halfWidthM)));
    return actions.suctionWindwardPa + t * (actions.suctionLeewardPa - actions.suctionWindwardPa);
  };
  const isFree = new Uint8Array(net.model.nodes.length);
  for (const k of net.free) isFree[k] = 1;
  return [
    { name: "dead", loads: dead },
    { name: "dead + snow", loads: add(dead, plan(() => actions.snowPa)) },
    { name: "dead + drifted snow", loads: add(dead, plan((x) => (x < 0 ? actions.snowPa : actions.snowPa / 2))) },
    {
      name: "dead + wind suction",
      loads: dead,
      // Suction pulls along the upward normal: a pressure of −suction on faces whose normals point up.
      loadAt: (c) => pressureLoads(c, net.faces, (x) => -suction(x)).map((f, k) => (isFree[Math.floor(k / 3)] ? f : 0)),
    },
  ];
}

/** Solves one case from the prestressed state. */
export function solveRoofCase(model: CableModel, roofCase: RoofCase, options: CableSolverOptions = {}): CableSolution {
  return solveCableModel({ ...model, loads: roofCase.loads }, { ...options, ...(roofCase.loadAt ? { loadAt: roofCase.loadAt } : {}) });
}
