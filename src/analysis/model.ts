/**
 * A 3D model of pin-jointed cables and struts. Units are SI by convention (m, N), but every
 * formula here is consistent in any unit system (the reference tests use inches and pounds too).
 *
 * Prestress and strain (the convention every solver here uses): a member's unstressed length is
 * either given (restLengthM) or follows from its initial force T0 at the initial geometry:
 * L_u = L0 / (1 + T0/EA). Its force at length l is N = EA·(l − L_u)/L_u (engineering strain on the
 * unstressed length). A cable carries no compression: when l < L_u its force is 0 (slack).
 */
export type Vec3 = readonly [number, number, number];

export type MemberKind = "cable" | "strut";

export interface Member {
  /** End nodes (indices into nodes). */
  i: number;
  j: number;
  /** Axial stiffness EA, N (> 0). */
  eaN: number;
  kind: MemberKind;
  /** Unstressed length L_u, m; when absent it follows from initialForceN (default 0) at the initial geometry. */
  restLengthM?: number;
  /** Force at the initial geometry, N (tension positive). */
  initialForceN?: number;
}

export interface Support {
  node: number;
  /** Restrained freedoms x, y, z. */
  fixed: readonly [boolean, boolean, boolean];
  /** Prescribed displacement of the restrained freedoms, m (scaled with the load factor; default 0). */
  displacementM?: Vec3;
}

export interface NodalLoad {
  node: number;
  forceN: Vec3;
}

export interface CableModel {
  nodes: readonly Vec3[];
  members: readonly Member[];
  supports: readonly Support[];
  loads: readonly NodalLoad[];
}

/**
 * Throws a RangeError naming the first bad field of a model; returns the model unchanged. Every
 * solve checks its model, so a message is written only for a field that fails (writing each field's
 * name up front made a fifth of the span study's 3D garbage).
 */
export function checkCableModel(model: CableModel): CableModel {
  const n = model.nodes.length;
  if (n === 0) throw new RangeError("invalid model.nodes: empty (expected at least two nodes)");
  for (let k = 0; k < n; k++) {
    const p = model.nodes[k]!;
    if (!(p.length === 3 && Number.isFinite(p[0]) && Number.isFinite(p[1]) && Number.isFinite(p[2]))) throw new RangeError(`invalid model.nodes[${k}]: ${JSON.stringify(p)} (expected three finite coordinates)`);
  }
  const node = (field: string, k: number, end: string, value: unknown) => {
    if (!(Number.isInteger(value) && (value as number) >= 0 && (value as number) < n)) throw new RangeError(`invalid model.${field}[${k}]${end}: ${String(value)} (expected a node index 0–${n - 1})`);
  };
  for (let k = 0; k < model.members.length; k++) {
    const m = model.members[k]!;
    node("members", k, ".i", m.i);
    node("members", k, ".j", m.j);
    if (m.i === m.j) throw new RangeError(`invalid model.members[${k}]: both ends at node ${m.i} (expected two different nodes)`);
    if (!(m.eaN > 0 && Number.isFinite(m.eaN))) throw new RangeError(`invalid model.members[${k}].eaN: ${m.eaN} (expected > 0)`);
    if (m.kind !== "cable" && m.kind !== "strut") throw new RangeError(`invalid model.members[${k}].kind: ${String(m.kind)} (expected "cable" or "strut")`);
    if (m.restLengthM !== undefined && !(m.restLengthM > 0)) throw new RangeError(`invalid model.members[${k}].restLengthM: ${m.restLengthM} (expected > 0)`);
    if (m.initialForceN !== undefined && !(Number.isFinite(m.initialForceN) && m.initialForceN > -m.eaN)) {
      throw new RangeError(`invalid model.members[${k}].initialForceN: ${m.initialForceN} (expected finite and > −EA)`);
    }
    const a = model.nodes[m.i]!;
    const b = model.nodes[m.j]!;
    if (a[0] === b[0] && a[1] === b[1] && a[2] === b[2]) throw new RangeError(`invalid model.members[${k}]: nodes ${m.i} and ${m.j} coincide (expected a member of nonzero length)`);
  }
  for (let k = 0; k < model.supports.length; k++) {
    const s = model.supports[k]!;
    node("supports", k, ".node", s.node);
    if (s.displacementM && !s.displacementM.every(Number.isFinite)) throw new RangeError(`invalid model.supports[${k}].displacementM (expected three finite numbers)`);
  }
  for (let k = 0; k < model.loads.length; k++) {
    const l = model.loads[k]!;
    node("loads", k, ".node", l.node);
    if (!(l.forceN.length === 3 && Number.isFinite(l.forceN[0]) && Number.isFinite(l.forceN[1]) && Number.isFinite(l.forceN[2]))) throw new RangeError(`invalid model.loads[${k}].forceN (expected three finite numbers)`);
  }
  return model;
}

export function lengthOf(p: Vec3, q: Vec3): number {
  return Math.hypot(q[0] - p[0], q[1] - p[1], q[2] - p[2]);
}

/** Unstressed length of each member, L_u = L0/(1 + T0/EA) unless given. */
export function restLengths(model: CableModel): Float64Array {
  return Float64Array.from(model.members, (m) => m.restLengthM ?? lengthOf(model.nodes[m.i]!, model.nodes[m.j]!) / (1 + (m.initialForceN ?? 0) / m.eaN));
}

/** Node coordinates as a flat array x0, y0, z0, x1, … */
export function flatCoordinates(nodes: readonly Vec3[]): Float64Array {
  const x = new Float64Array(nodes.length * 3);
  nodes.forEach((p, k) => x.set(p, 3 * k));
  return x;
}

/** Applied nodal loads as a flat array (loads on the same node add up), in `into` when given (cleared first). */
export function flatLoads(nodeCount: number, loads: readonly NodalLoad[], into?: Float64Array): Float64Array {
  const f = into ?? new Float64Array(nodeCount * 3);
  if (into) f.fill(0);
  for (const l of loads) for (let d = 0; d < 3; d++) f[3 * l.node + d]! += l.forceN[d]!;
  return f;
}
