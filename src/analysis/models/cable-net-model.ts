/**
 * The 3D pin-jointed model of a mast-supported cable net, form-found by the force density method
 * (Schek 1974, src/analysis/force-density.ts): M masts on a ring of radius r_m, each with n radial
 * cables fanning out over its sector to anchors at the edge (radius a, at the eaves) and n fanning in
 * to a central tension ring (radius r_c); circumferential cables at the given radii tie every radial
 * cable that crosses them (their nodes are where the radial cables cross those radii in plan). The
 * mast heads and the edge anchors are held (the masts, backstays and anchors take the reactions);
 * the central ring is free, or held at a given height by a tie-down (its nodes then held), and every
 * cable node is free.
 *
 * Force densities: q = T/ℓ with ℓ each segment's own plan length (so every segment of a cable
 * starts at the cable's prestress, horizontally for the radial cables), T the radial prestress for
 * the radial cables, `hoopShare` × that for the circumferential cables (capped: see
 * circumferentialPrestressN), and for the central ring the T that balances the inner radial cables'
 * pull on it (T_ring = pull/(2 sin(π/N)), N ring nodes). The
 * shape is the one in equilibrium under those force densities and the permanent load at the nodes
 * (so it hangs under its own weight; the prestress sets how far). Every member starts at its found
 * force, in equilibrium with the permanent load (the solver's start).
 *
 * Lumping (an equivalent net: common practice for cable nets, no source): the analysed net may stand
 * k consecutive circumferential cables (on one side of the mast ring, never the one beside the mast
 * heads: hoopGroups) for one at their mean radius, with k × their EA and k × their prestress, loaded
 * by the plan band the k real ones carry. Its force is that of the k real cables together. (Radial cables are not lumped: standing one for two
 * moved the prestress found by 30–70 % at 160 and 250 m, net9; their spacing, not the
 * circumferentials', is what the net's shape under one-sided loads depends on.)
 */
import { formFind } from "../force-density";
import type { CableModel, Member, Vec3 } from "../model";

export interface CableNetModelInput {
  masts: number;
  /** Radial cables per mast on each side (out to the edge, in to the central ring). */
  cablesPerSide: number;
  mastRadiusM: number;
  /** Mast head height (above the eaves), m. */
  mastHeadM: number;
  edgeRadiusM: number;
  centralRingRadiusM: number;
  /** Radii of the circumferential cables (between r_c and a, none at r_m), m. */
  hoopRadiiM: readonly number[];
  /** Prestress force of a radial cable, N, and the circumferential cables' share of it. */
  prestressN: number;
  hoopShare: number;
  /** Permanent load on plan, Pa (down positive), lumped to the nodes for the form finding. */
  permanentPa: number;
  /** Axial stiffness EA of each family, N. */
  eaN: { outer: number; inner: number; hoop: number; ring: number };
  /** Height (above the eaves) at which a tie-down holds the central ring's nodes, m; absent: the ring is free. */
  centreHeldAtM?: number;
  /** Real circumferential cables each analysed one stands for (see lumping above; default 1). */
  hoopsPerCable?: number;
}

/** What the net's topology is made from (the layout and the lumping). */
type NetTopologyInput = Pick<CableNetModelInput, "masts" | "cablesPerSide" | "mastRadiusM" | "mastHeadM" | "edgeRadiusM" | "centralRingRadiusM" | "hoopRadiiM" | "centreHeldAtM" | "hoopsPerCable">;

export type NetMemberFamily = "outer radial" | "inner radial" | "circumferential" | "central ring";

export interface NetMemberTag {
  family: NetMemberFamily;
  /** Circumferential cable number (1…) for the circumferential family, else 0. */
  index: number;
}

export interface CableNetModel {
  model: CableModel;
  tags: NetMemberTag[];
  /** The held nodes: mast heads (by mast) and edge anchors. */
  mastHeads: number[];
  anchors: number[];
  ringNodes: number[];
  /** Plan tributary area of each node (0 at the mast heads; at the held edge anchors the outer half-strip, whose load goes straight into their reactions), m². */
  areaM2: number[];
  /** The real circumferential cables (indices into hoopRadiiM) each analysed one stands for, by its index − 1. */
  hoopGroups: number[][];
}

/** The parameters t in (0, 1) where the plan segment p + t(q − p) crosses radius r (the first crossing from p). */
function crossing(p: readonly [number, number], q: readonly [number, number], r: number): number | null {
  const d = [q[0] - p[0], q[1] - p[1]] as const;
  const A = d[0] * d[0] + d[1] * d[1];
  const B = 2 * (p[0] * d[0] + p[1] * d[1]);
  const C = p[0] * p[0] + p[1] * p[1] - r * r;
  const disc = B * B - 4 * A * C;
  if (disc < 0) return null;
  const roots = [(-B - Math.sqrt(disc)) / (2 * A), (-B + Math.sqrt(disc)) / (2 * A)].filter((t) => t > 1e-9 && t < 1 - 1e-9).sort((x, y) => x - y);
  return roots[0] ?? null;
}

interface Topology {
  nodes: Vec3[];
  fixed: number[];
  branches: [number, number][];
  tags: NetMemberTag[];
  mastHeads: number[];
  anchors: number[];
  ringNodes: number[];
  /** Node of each circumferential cable crossing, by hoop, with its plan angle. */
  onHoop: { node: number; angle: number }[][];
}

/** Nodes (plan positions where the cables cross; heights a first guess) and the branches of the net. */
function topology(input: NetTopologyInput, hoopRadiiM: readonly number[]): Topology {
  const { masts: M, cablesPerSide: n, mastRadiusM: rm, edgeRadiusM: a, centralRingRadiusM: rc } = input;
  const t: Topology = { nodes: [], fixed: [], branches: [], tags: [], mastHeads: [], anchors: [], ringNodes: [], onHoop: hoopRadiiM.map(() => []) };
  const node = (x: number, y: number, z: number) => t.nodes.push([x, y, z]) - 1;
  const sector = (2 * Math.PI) / M;
  const ringAt: number[] = [];
  for (let m = 0; m < M; m++) {
    const theta = m * sector;
    const head: [number, number] = [rm * Math.cos(theta), rm * Math.sin(theta)];
    const h = node(head[0], head[1], input.mastHeadM);
    t.mastHeads.push(h);
    t.fixed.push(h);
    for (let j = 0; j < n; j++) {
      const phi = theta + sector * ((j + 0.5) / n - 0.5);
      for (const side of ["outer", "inner"] as const) {
        const endR = side === "outer" ? a : rc;
        const end: [number, number] = [endR * Math.cos(phi), endR * Math.sin(phi)];
        const hoops = hoopRadiiM.map((r, i) => ({ r, i })).filter(({ r }) => (side === "outer" ? r > rm && r < a : r < rm && r > rc));
        const along = hoops.map(({ r, i }) => ({ i, t: crossing(head, end, r) })).filter((c): c is { i: number; t: number } => c.t !== null).sort((x, y) => x.t - y.t);
        let previous = h;
        for (const c of along) {
          const k = node(head[0] + c.t * (end[0] - head[0]), head[1] + c.t * (end[1] - head[1]), input.mastHeadM * (1 - c.t));
          t.onHoop[c.i]!.push({ node: k, angle: Math.atan2(t.nodes[k]![1], t.nodes[k]![0]) });
          t.branches.push([previous, k]);
          t.tags.push({ family: side === "outer" ? "outer radial" : "inner radial", index: 0 });
          previous = k;
        }
        const e = node(end[0], end[1], side === "inner" ? (input.centreHeldAtM ?? 0) : 0);
        if (side === "outer") {
          t.anchors.push(e);
          t.fixed.push(e);
        } else {
          ringAt.push(e);
          if (input.centreHeldAtM !== undefined) t.fixed.push(e);
        }
        t.branches.push([previous, e]);
        t.tags.push({ family: side === "outer" ? "outer radial" : "inner radial", index: 0 });
      }
    }
  }
  // the ring nodes in angle order (they were made mast by mast, fan by fan: already in order)
  t.ringNodes = ringAt;
  ringAt.forEach((k, i) => {
    t.branches.push([k, ringAt[(i + 1) % ringAt.length]!]);
    t.tags.push({ family: "central ring", index: 0 });
  });
  t.onHoop.forEach((ring, i) => {
    ring.sort((x, y) => x.angle - y.angle);
    ring.forEach((c, k) => {
      if (ring.length < 3) return;
      t.branches.push([c.node, ring[(k + 1) % ring.length]!.node]);
      t.tags.push({ family: "circumferential", index: i + 1 });
    });
  });
  return t;
}

/** Plan tributary areas: radially half-way to the neighbouring real circumferential cables (or ring, or edge; a lumped cable carries the band of the real ones it stands for), around half-way to the neighbours on the same one. */
function tributaryAreas(input: Pick<CableNetModelInput, "centralRingRadiusM" | "hoopRadiiM" | "edgeRadiusM">, t: Topology, groups: readonly (readonly number[])[]): number[] {
  const area = t.nodes.map(() => 0);
  const radii = [input.centralRingRadiusM, ...input.hoopRadiiM, input.edgeRadiusM];
  const mid = (i: number) => ((radii[i] as number) + (radii[i + 1] as number)) / 2;
  // ∫ r dr over the band of plan radius that the circles radii[first…last] carry together
  const band = (first: number, last: number) => {
    const lo = first === 0 ? 0 : mid(first - 1);
    const hi = mid(last);
    return (hi * hi - lo * lo) / 2;
  };
  const share = (ring: readonly { node: number; angle: number }[], bandM2: number) => {
    ring.forEach((c, k) => {
      const prev = ring[(k - 1 + ring.length) % ring.length]!.angle;
      const next = ring[(k + 1) % ring.length]!.angle;
      const span = ((next - prev + 4 * Math.PI) % (2 * Math.PI)) / 2;
      area[c.node] = bandM2 * (ring.length === 1 ? 2 * Math.PI : span);
    });
  };
  const around = (nodes: readonly number[]) => nodes.map((node) => ({ node, angle: Math.atan2(t.nodes[node]![1], t.nodes[node]![0]) }));
  share(around(t.ringNodes), band(0, 0));
  t.onHoop.forEach((ring, g) => share(ring, band(groups[g]![0]! + 1, groups[g]![groups[g]!.length - 1]! + 1)));
  // the outer half-strip, from half-way to the last circumferential cable out to the edge, to the edge anchors: held, so
  // its load goes straight into their reactions (it was carried by no node: the anchors' uplift missed it)
  const a = input.edgeRadiusM;
  const lastMid = mid(radii.length - 2);
  share(around([...t.anchors].sort((x, y) => Math.atan2(t.nodes[x]![1], t.nodes[x]![0]) - Math.atan2(t.nodes[y]![1], t.nodes[y]![0]))), (a * a - lastMid * lastMid) / 2);
  return area;
}

/**
 * The real circumferential cables (indices into the ascending hoopRadiiM) grouped for lumping: on
 * each side of the mast ring the cable nearest the mast heads stays alone, and the others go in
 * consecutive runs of at most k, as even in number as they can be (6 by 4: 2, 2, 2; 5 by 2: 2, 1, 2);
 * a cable on the mast ring stays alone.
 *
 * Why the cable beside the mast heads stays alone (net10, measured at the full net's prestress,
 * default brief, held down): next to the mast heads the radial cables fan out from a point and the
 * net's slope changes fastest, so the first cable on each side sets how stiffly the net holds the
 * heads. Paired with its neighbour (moved 3 m off the heads at 160 m, 5 masts) the lumped net moved
 * 20 % more, its backstays pulled 12 % harder (120 m: 15 %) and its prestress found was 13.5 % higher
 * than the full net's; kept alone, every family's force, the backstay and the largest displacement
 * are within 3.6 % at 120–300 m, and the prestress found within 4.6 % (search tolerance 2 %).
 */
export function hoopGroups(hoopRadiiM: readonly number[], mastRadiusM: number, k: number): number[][] {
  const side = (r: number) => Math.sign(r - mastRadiusM);
  const runs: number[][] = [];
  hoopRadiiM.forEach((r, i) => {
    const run = runs[runs.length - 1];
    if (run && side(hoopRadiiM[run[0]!]!) === side(r) && side(r) !== 0) run.push(i);
    else runs.push([i]);
  });
  const evenly = (run: readonly number[]) => {
    const count = Math.ceil(run.length / k);
    return Array.from({ length: count }, (_, g) => run.slice(Math.round((g * run.length) / count), Math.round(((g + 1) * run.length) / count)));
  };
  return runs.flatMap((run) => {
    if (run.length < 2) return [run];
    // inside the mast ring the last cable of the run is beside the mast heads, outside it the first
    const inside = side(hoopRadiiM[run[0]!]!) < 0;
    return inside ? [...evenly(run.slice(0, -1)), run.slice(-1)] : [run.slice(0, 1), ...evenly(run.slice(1))];
  });
}

/** The analysed net's topology: each group of real circumferential cables at its mean radius. */
function lumpedTopology(input: NetTopologyInput): { groups: number[][]; t: Topology } {
  const groups = hoopGroups(input.hoopRadiiM, input.mastRadiusM, input.hoopsPerCable ?? 1);
  const radii = groups.map((g) => g.reduce((sum, i) => sum + (input.hoopRadiiM[i] as number), 0) / g.length);
  return { groups, t: topology(input, radii) };
}

/** Nodes of the analysed net (mast heads, cable crossings, anchors, ring) for its layout and lumping, without form-finding it. */
export function cableNetNodeCount(input: NetTopologyInput): number {
  return lumpedTopology(input).t.nodes.length;
}

/** Outward horizontal pull of the outer and inward pull of the inner cables on the first mast head, N. */
function headPulls(t: Topology, nodes: readonly Vec3[], forcesN: readonly number[]): { outer: number; inner: number } {
  const h = t.mastHeads[0] as number;
  const [hx, hy] = nodes[h] as Vec3;
  const r = Math.hypot(hx, hy);
  const pull = { outer: 0, inner: 0 };
  t.branches.forEach(([i, j], k) => {
    if (i !== h && j !== h) return;
    const other = nodes[i === h ? j : i] as Vec3;
    const d = [other[0] - hx, other[1] - hy, other[2] - (nodes[h] as Vec3)[2]];
    const radial = (forcesN[k]! * (d[0]! * hx + d[1]! * hy)) / (r * Math.hypot(d[0]!, d[1]!, d[2]!));
    if (t.tags[k]!.family === "outer radial") pull.outer += radial;
    else pull.inner -= radial;
  });
  return pull;
}

/** Largest strain of a cable under its prestress: 0.2 % (≈ 320 MPa in a strand of E ≈ 160 GPa, a quarter to a fifth of its breaking stress; common practice, no source). */
export const PRESTRESS_STRAIN = 0.002;

/** Force density passes that scale the inner cables so they pull the mast heads inwards as hard as the outer ones pull outwards. */
const BALANCE_PASSES = 6;

/**
 * Most of a radial cable's pull the circumferential cables inside the mast ring may take together
 * (our rule, no source): each of them pulls every inner radial cable towards the centre by about
 * 2π·T_c/lines, so the inner cable's pull falls from the mast head to the ring by that much at every
 * crossing; were the sum to reach the pull itself, the ring would be pulled to a point (with 4
 * radial cables per mast at 300 m, half the radial prestress on 13 inner circumferentials is 1.7×).
 */
export const INNER_HOOPS_SHARE_OF_RADIAL = 0.5;

/** The circumferential cables' prestress: `hoopShare` × the radial one, less if the inner ones would take more than INNER_HOOPS_SHARE_OF_RADIAL of a radial cable's pull. */
export function circumferentialPrestressN(input: Pick<CableNetModelInput, "masts" | "cablesPerSide" | "mastRadiusM" | "centralRingRadiusM" | "hoopRadiiM" | "prestressN" | "hoopShare">): number {
  const inner = input.hoopRadiiM.filter((r) => r > input.centralRingRadiusM && r < input.mastRadiusM).length;
  const lines = input.masts * input.cablesPerSide;
  const cap = inner > 0 ? (INNER_HOOPS_SHARE_OF_RADIAL * lines) / (2 * Math.PI * inner) : Infinity;
  return Math.min(input.hoopShare, cap) * input.prestressN;
}

/**
 * Builds and form-finds the net; the inner radial cables' force density is scaled (a few passes)
 * until the prestress pulls on the mast heads balance horizontally, so the backstays carry only
 * what the loads add (the closed form balances them the same way).
 * @throws RangeError when the force density network is singular
 */
export function cableNetModel(input: CableNetModelInput): CableNetModel {
  return cableNetFormFinding(input)(input.prestressN);
}

/**
 * cableNetModel at any radial prestress for one layout: the topology, tributary areas and nodal
 * loads (which the prestress does not change) built once, the net form-found anew at each prestress
 * asked for (the same numbers as cableNetModel's). A prestress search form-finds a dozen nets of one layout.
 * @throws RangeError (from the returned function) when the force density network is singular
 */
export function cableNetFormFinding(input: Omit<CableNetModelInput, "prestressN">): (prestressN: number) => CableNetModel {
  const { groups, t } = lumpedTopology(input);
  const areaM2 = tributaryAreas(input, t, groups);
  const lines = input.masts * input.cablesPerSide;
  const chord = 2 * Math.sin(Math.PI / lines);
  // every segment's force density from its own plan length (q = T/ℓ): each cable then starts at its prestress (radial: horizontally) all along
  const planM = t.branches.map(([i, j]) => Math.hypot(t.nodes[j]![0] - t.nodes[i]![0], t.nodes[j]![1] - t.nodes[i]![1]));
  const loadsN = areaM2.map((A) => [0, 0, -input.permanentPa * A] as const);
  // an analysed circumferential cable stands for this many real ones: its prestress and EA are theirs together
  const many = (tag: NetMemberTag) => (tag.family === "circumferential" ? groups[tag.index - 1]!.length : 1);
  return (prestressN) => formFoundNet(input, prestressN, { groups, t, areaM2, chord, planM, loadsN, many });
}

function formFoundNet(
  input: Omit<CableNetModelInput, "prestressN">,
  prestressN: number,
  { groups, t, areaM2, chord, planM, loadsN, many }: { groups: number[][]; t: Topology; areaM2: number[]; chord: number; planM: number[]; loadsN: (readonly [0, 0, number])[]; many: (tag: NetMemberTag) => number },
): CableNetModel {
  const hoopN = circumferentialPrestressN({ ...input, prestressN });
  // the ring's tension balances the inner cables' horizontal pull at each node: 2 T sin(π/N) = T_inner
  const formFound = (inner: number) => {
    const forceOf = (tag: NetMemberTag) => (tag.family === "circumferential" ? many(tag) * hoopN : tag.family === "central ring" ? inner / chord : tag.family === "inner radial" ? inner : prestressN);
    const q = t.tags.map((tag, k) => forceOf(tag) / (planM[k] as number));
    return formFind({ nodes: t.nodes, branches: t.branches, forceDensityNPerM: q, fixed: t.fixed, loadsN });
  };
  let innerScale = 1;
  let found = formFound(prestressN);
  for (let pass = 1; pass < BALANCE_PASSES; pass++) {
    const pull = headPulls(t, found.nodes, found.forcesN);
    if (!(pull.inner > 0 && pull.outer > 0) || Math.abs(pull.outer / pull.inner - 1) < 1e-3) break;
    innerScale *= pull.outer / pull.inner;
    found = formFound(innerScale * prestressN);
  }
  const ea = (tag: NetMemberTag) => many(tag) * (tag.family === "outer radial" ? input.eaN.outer : tag.family === "inner radial" ? input.eaN.inner : tag.family === "circumferential" ? input.eaN.hoop : input.eaN.ring);
  // a cable is at least as stiff as a strand group sized for its prestress at PRESTRESS_STRAIN (the given EA is the closed form's, for its lower prestress)
  const members: Member[] = t.branches.map(([i, j], k) => ({ i, j, eaN: Math.max(ea(t.tags[k]!), found.forcesN[k]! / PRESTRESS_STRAIN), kind: "cable", initialForceN: found.forcesN[k]! }));
  return {
    model: { nodes: found.nodes, members, supports: t.fixed.map((node) => ({ node, fixed: [true, true, true] as const })), loads: [] },
    tags: t.tags,
    mastHeads: t.mastHeads,
    anchors: t.anchors,
    ringNodes: t.ringNodes,
    areaM2,
    hoopGroups: groups,
  };
}
