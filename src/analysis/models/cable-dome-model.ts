/**
 * The 3D pin-jointed model of a cable dome (Geiger type) from its radial-truss geometry: N radial
 * trusses at equal angles, each with post heads T_i and feet B_i (i = 0 the central drum), ridge
 * cables T_(i−1)→T_i, diagonals B_(i−1)→T_i, posts T_i–B_i (struts), hoops through the feet B_i of
 * neighbouring trusses, the central upper and lower rings through T_0 and B_0; the last ridge and
 * diagonal of each truss end at a ring node C, pinned (the compression ring is taken as rigid: its
 * force comes from the reactions). Each member starts with its prestress force from the
 * axisymmetric self-stress state, which is exactly in equilibrium on this geometry (the polygon of a
 * hoop pulls each node inwards with 2F sin(π/N), as the ring-by-ring statics assume).
 */
import type { CableDomeTrussForces, CableDomeTrussGeometry } from "../../mechanics/cable-dome-truss";
import type { CableModel, Member, Vec3 } from "../model";

/** What each member of the model is, for sizing and drawing: its family and its index in the truss (ridge 1…n+1, diagonal 1…n+1, post 0…n, hoop 1…n). */
export interface DomeMemberTag {
  family: "ridge" | "diagonal" | "post" | "hoop" | "central upper ring" | "central lower ring";
  index: number;
  truss: number;
}

export interface CableDomeModel {
  model: CableModel;
  tags: DomeMemberTag[];
  /** Node index of the head of truss k, station i (the loaded nodes), and the ring nodes. */
  headNode: (k: number, i: number) => number;
  ringNodes: number[];
  /** Plan tributary area of each head station (the same for every truss), m². */
  headAreaM2: number[];
}

/** Axial stiffness EA of a member of each family and index, N. */
export type DomeStiffness = (family: DomeMemberTag["family"], index: number) => number;

/**
 * Builds the model. `prestress` is the axisymmetric self-stress state scaled to the chosen
 * prestress (forces per truss member, ring and hoop forces circumferential).
 */
export function cableDomeModel(g: CableDomeTrussGeometry, prestress: CableDomeTrussForces, stiffness: DomeStiffness): CableDomeModel {
  const N = g.trusses;
  const n = g.radiiM.length - 1;
  const perTruss = 2 * (n + 1) + 1;
  const head = (k: number, i: number) => (k % N) * perTruss + 2 * i;
  const foot = (k: number, i: number) => head(k, i) + 1;
  const ring = (k: number) => (k % N) * perTruss + 2 * (n + 1);
  const nodes: Vec3[] = [];
  for (let k = 0; k < N; k++) {
    const [c, s] = [Math.cos((2 * Math.PI * k) / N), Math.sin((2 * Math.PI * k) / N)];
    for (let i = 0; i <= n; i++) {
      const r = g.radiiM[i] as number;
      nodes.push([r * c, r * s, g.topM[i] as number], [r * c, r * s, g.bottomM[i] as number]);
    }
    nodes.push([g.ringRadiusM * c, g.ringRadiusM * s, g.ringHeightM]);
  }
  const members: Member[] = [];
  const tags: DomeMemberTag[] = [];
  const add = (i: number, j: number, tag: DomeMemberTag, forceN: number, kind: Member["kind"] = "cable") => {
    members.push({ i, j, eaN: stiffness(tag.family, tag.index), kind, initialForceN: forceN });
    tags.push(tag);
  };
  for (let k = 0; k < N; k++) {
    for (let i = 1; i <= n + 1; i++) {
      add(head(k, i - 1), i <= n ? head(k, i) : ring(k), { family: "ridge", index: i, truss: k }, prestress.ridgeN[i - 1] as number);
      add(foot(k, i - 1), i <= n ? head(k, i) : ring(k), { family: "diagonal", index: i, truss: k }, prestress.diagonalN[i - 1] as number);
    }
    for (let i = 0; i <= n; i++) add(head(k, i), foot(k, i), { family: "post", index: i, truss: k }, prestress.postN[i] as number, "strut");
    for (let i = 1; i <= n; i++) add(foot(k, i), foot(k + 1, i), { family: "hoop", index: i, truss: k }, prestress.hoopN[i - 1] as number);
    add(head(k, 0), head(k + 1, 0), { family: "central upper ring", index: 0, truss: k }, prestress.centralTopRingN);
    add(foot(k, 0), foot(k + 1, 0), { family: "central lower ring", index: 0, truss: k }, prestress.centralBottomRingN);
  }
  const ringNodes = Array.from({ length: N }, (_, k) => ring(k));
  const edges = [0, ...g.radiiM.slice(1).map((r, i) => (r + (g.radiiM[i] as number)) / 2), ((g.radiiM[n] as number) + g.ringRadiusM) / 2];
  const headAreaM2 = g.radiiM.map((_, i) => (Math.PI * ((edges[i + 1] as number) ** 2 - (edges[i] as number) ** 2)) / N);
  return {
    model: { nodes, members, supports: ringNodes.map((node) => ({ node, fixed: [true, true, true] as const })), loads: [] },
    tags,
    headNode: head,
    ringNodes,
    headAreaM2,
  };
}
