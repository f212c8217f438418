/**
 * A generic radial cable-truss dome ("spoked wheel") for tests and benchmarks: `trusses` radial lens
 * trusses, each a hogging top cable and a sagging bottom cable held apart by posts at `panels`
 * stations, anchored to a fixed outer ring (top and bottom anchors `ringDepthM` apart) and meeting
 * at a central hub of two hoop cables (tension rings) joined by posts. Form-found by the force
 * density method: top and bottom cables q = T0/panel, hoops the q that holds the hub at the chosen
 * radius, posts the (negative) q that gives the chosen depth at the hub — from the continuous lens
 * q·s²·δ'' + 2|q_p|·δ = 0 (half-depth δ(r) = δ_hub·cos ω(r − r_hub)), so the truss is as deep as
 * asked; the discrete form is whatever the force densities give, and it is exactly in equilibrium.
 */
import { formFind } from "../force-density";
import type { CableModel, Member, Vec3 } from "../model";
import type { Face } from "../surface-loads";
import type { NetModel } from "./saddle-net";

export interface RadialDomeInput {
  spanM: number;
  trusses: number;
  panels: number;
  /** Hub radius as a fraction of the outer radius. */
  hubRatio: number;
  /** Truss depth at the ring and at the hub, m. */
  ringDepthM: number;
  hubDepthM: number;
  /** Horizontal prestress of each radial cable, N; EA of cables and posts, N. */
  prestressN: number;
  cableEaN: number;
  postEaN: number;
}

export function radialCableDome(input: RadialDomeInput): NetModel & { topNodes: number[] } {
  const { spanM, trusses, panels, hubRatio, ringDepthM, hubDepthM, prestressN, cableEaN, postEaN } = input;
  if (!(Number.isInteger(trusses) && trusses >= 3)) throw new RangeError(`invalid trusses: ${trusses} (expected a whole number ≥ 3)`);
  if (!(Number.isInteger(panels) && panels >= 2)) throw new RangeError(`invalid panels: ${panels} (expected a whole number ≥ 2)`);
  if (!(hubRatio > 0 && hubRatio < 0.5)) throw new RangeError(`invalid hubRatio: ${hubRatio} (expected 0 < ratio < 0.5)`);
  if (!(hubDepthM > ringDepthM && ringDepthM > 0)) throw new RangeError(`invalid depths: ring ${ringDepthM} m, hub ${hubDepthM} m (expected 0 < ring < hub)`);
  const outer = spanM / 2;
  const hub = hubRatio * outer;
  const step = (outer - hub) / panels;
  // Node numbering: truss k, station i (0 = hub … panels = ring): top 2·(k·(panels+1) + i), bottom +1.
  const top = (k: number, i: number) => 2 * ((k % trusses) * (panels + 1) + i);
  const nodes: Vec3[] = [];
  for (let k = 0; k < trusses; k++) {
    const [c, s] = [Math.cos((2 * Math.PI * k) / trusses), Math.sin((2 * Math.PI * k) / trusses)];
    for (let i = 0; i <= panels; i++) {
      const r = hub + i * step;
      const half = i === panels ? ringDepthM / 2 : hubDepthM / 2;
      nodes.push([r * c, r * s, half], [r * c, r * s, -half]);
    }
  }
  const q = prestressN / step;
  const omega = Math.acos(ringDepthM / hubDepthM) / (outer - hub);
  const qPost = -(omega * omega * q * step * step) / 2;
  // Hub equilibrium, radially: the radial cable pulls out with q·step; the two hoops pull in with
  // 2·q_h·chord·sin(π/n), chord = 2·r_hub·sin(π/n) ⇒ q_h = q·step/(4·r_hub·sin²(π/n)).
  const qHoop = (q * step) / (4 * hub * Math.sin(Math.PI / trusses) ** 2);
  const branches: [number, number][] = [];
  const density: number[] = [];
  const kinds: Member["kind"][] = [];
  const add = (a: number, b: number, qd: number, kind: Member["kind"]) => (branches.push([a, b]), density.push(qd), kinds.push(kind));
  for (let k = 0; k < trusses; k++) {
    for (let i = 0; i < panels; i++) {
      add(top(k, i), top(k, i + 1), q, "cable");
      add(top(k, i) + 1, top(k, i + 1) + 1, q, "cable");
      // The hub post gets half the density: the hub is the lens's axis of symmetry (δ' = 0 there).
      add(top(k, i), top(k, i) + 1, i === 0 ? qPost / 2 : qPost, "strut");
    }
    add(top(k, 0), top(k + 1, 0), qHoop, "cable");
    add(top(k, 0) + 1, top(k + 1, 0) + 1, qHoop, "cable");
  }
  const fixed = Array.from({ length: trusses }, (_, k) => [top(k, panels), top(k, panels) + 1]).flat();
  const found = formFind({ nodes, branches, forceDensityNPerM: density, fixed });
  const faces: Face[] = [];
  for (let k = 0; k < trusses; k++) {
    for (let i = 0; i < panels; i++) faces.push([top(k, i), top(k, i + 1), top(k + 1, i + 1)], [top(k, i), top(k + 1, i + 1), top(k + 1, i)]);
    if (k >= 2) faces.push([top(0, 0), top(k - 1, 0), top(k, 0)]);
  }
  const isFixed = new Set(fixed);
  const model: CableModel = {
    nodes: found.nodes,
    members: branches.map(([i, j], m) => ({ i, j, eaN: kinds[m] === "strut" ? postEaN : cableEaN, kind: kinds[m]!, initialForceN: found.forcesN[m]! })),
    supports: fixed.map((node) => ({ node, fixed: [true, true, true] })),
    loads: [],
  };
  const free = nodes.map((_, k) => k).filter((k) => !isFixed.has(k));
  return { model, faces, free, topNodes: free.filter((k) => k % 2 === 0) };
}
