/**
 * Geometrically nonlinear statics of a pin-jointed cable-and-strut model: Newton–Raphson on the
 * out-of-balance force with the tangent stiffness (elastic + geometric), load stepping (the step is
 * halved when Newton fails) and a backtracking line search on the residual norm; cables that would
 * shorten below their unstressed length carry nothing (slack) and come back when they lengthen.
 *
 * Member law (see model.ts): N = EA(l − L_u)/L_u, engineering strain on the unstressed length L_u;
 * loads are dead (they keep their direction) unless `loadAt` supplies deformation-dependent loads.
 * Tangent of a member with unit vector e: K = (EA/L_u)·e eᵀ + (N/l)·(I − e eᵀ) (for a slack cable a
 * token 1e-9·EA/L_u is kept in the tangent only, so a node held by slack cables alone does not stop
 * the factorisation; the residual, and so the converged answer, is unaffected).
 *
 * Convergence: ‖R‖ ≤ tolerance × the applied load (the larger of the norm of the loads on the free
 * freedoms and of the support reactions). Otherwise the result says `converged: false` and why.
 */
import { type CableModel, checkCableModel, flatCoordinates, flatLoads, restLengths } from "./model";
import { type Factorisation, factorLDL, numberEquations } from "./sparse";
import type { SparsePattern, SparseSymmetricMatrix } from "./sparse-ldl";
import { SecantUpdates } from "./secant";

export interface CableSolverOptions {
  /** Load steps (equal increments of the load factor), default 1. */
  steps?: number;
  /** Newton iterations allowed per step, default 40. */
  maxIterations?: number;
  /** Residual tolerance relative to the applied load, default 1e-6. */
  tolerance?: number;
  /** Times a failing step may be halved, default 8. */
  maxStepHalvings?: number;
  /**
   * Accept equilibrium states reached through a tangent that is not positive definite (default
   * false: a load step whose tangent loses definiteness fails — a limit point or bifurcation — so
   * load control never jumps silently past a snap-through to a remote equilibrium). Set it for
   * displacement-controlled paths that are meant to go past a limit point.
   */
  allowUnstable?: boolean;
  /** Extra loads that depend on the current coordinates (e.g. pressure on the deformed surface), flat N. */
  loadAt?: (coordinates: Float64Array) => Float64Array;
  /**
   * Candidate starting states (flat displacements from the model's nodes, m; e.g. a similar load
   * case's answer): Newton starts at the full load from the candidate, or the unloaded state, with
   * the least out-of-balance force. Should that attempt fail, the load is stepped from the unloaded
   * state as without candidates. Under dead loads on cables only, the total potential is convex, so
   * every start reaches the same equilibrium (within the tolerance).
   */
  starts?: readonly Float64Array[];
}

export interface CableSolution {
  converged: boolean;
  /** Why it did not converge (absent when it did). */
  reason?: string;
  /** Flat displacements, m, and deformed coordinates. */
  displacementsM: Float64Array;
  coordinatesM: Float64Array;
  /** Member forces, N (tension positive), and which cables are slack. */
  forcesN: Float64Array;
  slack: boolean[];
  /** Flat support reactions, N (zero at free freedoms). */
  reactionsN: Float64Array;
  /** Newton iterations in all, and per load step. */
  iterations: number;
  iterationsPerStep: number[];
  /** Final residual norm and the applied load it is measured against, N. */
  residualN: number;
  appliedN: number;
}

interface Prepared {
  model: CableModel;
  x0: Float64Array;
  restM: Float64Array;
  load: Float64Array;
  prescribed: Float64Array;
  equationOf: Int32Array;
  matrix: () => SparseSymmetricMatrix;
  pattern: SparsePattern;
  /** Per member, the 21 positions in the matrix's values of its 6×6 tangent's upper triangle (−1: restrained). */
  slots: Int32Array;
  /** The members flat (first freedom of each end, EA, cable or not), for the loops run every iteration. */
  ends: Int32Array;
  eaN: Float64Array;
  cable: Uint8Array;
  /** Free freedoms (equations). */
  free: number;
  /**
   * The internal force vector's buffer, reused by every evaluation (read before the next): fresh
   * typed arrays are dear in a browser's worker (DEVELOPERS.md, "Where the work runs").
   */
  fint: Float64Array;
  /** The member forces and slack flags of the iterations (reused likewise; the final state's are made afresh). */
  forces: Float64Array;
  slack: boolean[];
  /** Arrays of states no longer read (trials the line search passed over, the state before each step), for the next states. */
  spareU: Float64Array[];
  spareResidual: Float64Array[];
  /** The BFGS pairs, cleared at each Newton start (one object, so its arrays serve every start). */
  updates: SecantUpdates;
}

/** Member tangent slots by pattern (one pattern ⇔ one topology, members in one order: see numberEquations). */
const slotCache = new WeakMap<SparsePattern, Int32Array>();

function memberSlots(pattern: SparsePattern, equationOf: Int32Array, members: CableModel["members"]): Int32Array {
  const known = slotCache.get(pattern);
  if (known) return known;
  const slots = new Int32Array(21 * members.length);
  members.forEach((m, k) => {
    const eq = [0, 1, 2].map((d) => equationOf[3 * m.i + d]!).concat([0, 1, 2].map((d) => equationOf[3 * m.j + d]!));
    let s = 21 * k;
    for (let a = 0; a < 6; a++) for (let b = a; b < 6; b++) slots[s++] = eq[a]! >= 0 && eq[b]! >= 0 ? pattern.slot(eq[a]!, eq[b]!) : -1;
  });
  slotCache.set(pattern, slots);
  return slots;
}

/**
 * What a solve prepares of a model, kept by its members (with its nodes and supports checked), so
 * that the load cases of one design, each a model with the same members, nodes and supports and its
 * own loads, share it: in a browser's worker fresh typed arrays are dear (DEVELOPERS.md), and a
 * profile of the span study's workers found preparing 4.9 %, the BFGS arrays made afresh per solve
 * 3.3 % and the numbering's key 0.9 % of their time (3D pass, demo study). The working arrays (fint,
 * forces, spare states, BFGS pairs) are shared too: every solve is synchronous and overwrites them
 * before reading; a solve that starts while another of the same model runs (a `loadAt` that solves)
 * prepares its own.
 */
const preparedModels = new WeakMap<CableModel["members"], { nodes: CableModel["nodes"]; supports: CableModel["supports"]; prepared: Prepared; busy: boolean }>();

/** The model prepared (from preparedModels when its members, nodes and supports were prepared before), its loads its own; `done` frees it for the next solve. */
function prepared(model: CableModel): { p: Prepared; done: () => void } {
  const known = preparedModels.get(model.members);
  if (known && !known.busy && known.nodes === model.nodes && known.supports === model.supports) {
    checkCableModel(model);
    known.busy = true;
    known.prepared.model = model;
    flatLoads(model.nodes.length, model.loads, known.prepared.load);
    return { p: known.prepared, done: () => (known.busy = false) };
  }
  const p = prepare(model);
  const entry = { nodes: model.nodes, supports: model.supports, prepared: p, busy: true };
  if (!known?.busy) preparedModels.set(model.members, entry);
  return { p, done: () => (entry.busy = false) };
}

function prepare(model: CableModel): Prepared {
  checkCableModel(model);
  const n = model.nodes.length;
  const fixed = new Uint8Array(3 * n);
  const prescribed = new Float64Array(3 * n);
  for (const s of model.supports) {
    for (let d = 0; d < 3; d++) {
      if (!s.fixed[d]) continue;
      fixed[3 * s.node + d] = 1;
      prescribed[3 * s.node + d] = s.displacementM?.[d] ?? 0;
    }
  }
  const { equationOf, matrix, pattern } = numberEquations(n, 3, model.members.map((m) => [m.i, m.j]), (node, d) => fixed[3 * node + d] === 1);
  const slots = memberSlots(pattern, equationOf, model.members);
  const ends = new Int32Array(2 * model.members.length);
  model.members.forEach((m, k) => {
    ends[2 * k] = 3 * m.i;
    ends[2 * k + 1] = 3 * m.j;
  });
  return {
    model, x0: flatCoordinates(model.nodes), restM: restLengths(model), load: flatLoads(n, model.loads), prescribed, equationOf, matrix, pattern, slots, ends,
    eaN: Float64Array.from(model.members, (m) => m.eaN), cable: Uint8Array.from(model.members, (m) => (m.kind === "cable" ? 1 : 0)), free: pattern.n,
    fint: new Float64Array(3 * n), forces: new Float64Array(model.members.length), slack: new Array<boolean>(model.members.length).fill(false),
    spareU: [], spareResidual: [], updates: new SecantUpdates(),
  };
}

/**
 * Member forces, which cables are slack and the internal force vector at displacements u; optionally
 * the tangent. The internal forces are in p.fint until the next call; the member forces and slack
 * flags are fresh arrays only when `kept` (the iterations need only the internal forces).
 */
function internal(p: Prepared, u: Float64Array, tangent?: SparseSymmetricMatrix, kept = false): { forces: Float64Array; fint: Float64Array; slack: boolean[] } {
  const { x0, restM, ends, eaN, cable, fint } = p;
  const count = restM.length;
  const forces = kept ? new Float64Array(count) : p.forces;
  fint.fill(0);
  const slack: boolean[] = kept ? new Array<boolean>(count).fill(false) : p.slack;
  const e = [0, 0, 0];
  for (let k = 0; k < count; k++) {
    const a = ends[2 * k]!;
    const b = ends[2 * k + 1]!;
    const ex = x0[b]! + u[b]! - x0[a]! - u[a]!;
    const ey = x0[b + 1]! + u[b + 1]! - x0[a + 1]! - u[a + 1]!;
    const ez = x0[b + 2]! + u[b + 2]! - x0[a + 2]! - u[a + 2]!;
    const l = Math.sqrt(ex * ex + ey * ey + ez * ez);
    const lu = restM[k]!;
    let force = (eaN[k]! * (l - lu)) / lu;
    let axial = eaN[k]! / lu;
    const isSlack = cable[k] === 1 && force < 0;
    if (isSlack) {
      force = 0;
      axial *= 1e-9;
    }
    slack[k] = isSlack;
    forces[k] = force;
    const fl = force / l;
    fint[a]! -= fl * ex;
    fint[a + 1]! -= fl * ey;
    fint[a + 2]! -= fl * ez;
    fint[b]! += fl * ex;
    fint[b + 1]! += fl * ey;
    fint[b + 2]! += fl * ez;
    if (tangent) {
      e[0] = ex / l;
      e[1] = ey / l;
      e[2] = ez / l;
      addBarTangent(tangent.values, p.slots, k, e, axial, fl);
    }
  }
  return { forces, fint, slack };
}

/** Adds the 6×6 bar tangent [k −k; −k k], k = axial·e eᵀ + geometric·(I − e eᵀ), through the member's slots. */
function addBarTangent(values: Float64Array, slots: Int32Array, member: number, e: number[], axial: number, geometric: number): void {
  let s = 21 * member;
  for (let a = 0; a < 6; a++) {
    for (let b = a; b < 6; b++, s++) {
      const slot = slots[s]!;
      if (slot < 0) continue;
      const r = a % 3;
      const c = b % 3;
      const k = (axial - geometric) * e[r]! * e[c]! + (r === c ? geometric : 0);
      values[slot]! += a < 3 === b < 3 ? k : -k;
    }
  }
}

interface State {
  u: Float64Array;
  residual: Float64Array;
  residualN: number;
  appliedN: number;
  /** The load factor it was evaluated at. */
  lambda: number;
}

/** Residual (free freedoms) at load factor λ, and the reactions into `reactions` when given (zero at free freedoms). */
function evaluate(p: Prepared, u: Float64Array, lambda: number, options: CableSolverOptions, tangent?: SparseSymmetricMatrix, reactions?: Float64Array): State {
  const { fint } = internal(p, u, tangent);
  const extra = options.loadAt ? options.loadAt(sum(p.x0, u, 1)) : undefined;
  const residual = p.spareResidual.pop() ?? new Float64Array(p.free);
  let free2 = 0;
  let react2 = 0;
  let r2 = 0;
  for (let k = 0; k < u.length; k++) {
    const applied = lambda * p.load[k]! + (extra ? lambda * extra[k]! : 0);
    const eq = p.equationOf[k]!;
    if (eq >= 0) {
      residual[eq] = applied - fint[k]!;
      r2 += residual[eq]! ** 2;
      free2 += applied * applied;
    } else {
      const reaction = fint[k]! - applied;
      if (reactions) reactions[k] = reaction;
      react2 += reaction * reaction;
    }
  }
  return { u, residual, residualN: Math.sqrt(r2), appliedN: Math.max(Math.sqrt(free2), Math.sqrt(react2)), lambda };
}

/** a + s·b, elementwise (a loop: Float64Array.from with a mapping function is several times slower in V8). */
function sum(a: Float64Array, b: Float64Array, s: number): Float64Array {
  const c = new Float64Array(a.length);
  for (let k = 0; k < a.length; k++) c[k] = a[k]! + s * b[k]!;
  return c;
}

function withPrescribed(p: Prepared, u: Float64Array, lambda: number): Float64Array {
  const v = p.spareU.pop() ?? new Float64Array(u.length);
  v.set(u);
  for (let k = 0; k < v.length; k++) if (p.equationOf[k]! < 0) v[k] = lambda * p.prescribed[k]!;
  return v;
}

function describeEquation(p: Prepared, equation: number): string {
  const k = p.equationOf.indexOf(equation);
  return `node ${Math.floor(k / 3)} (${"xyz"[k % 3]})`;
}

type NewtonOutcome = { ok: true; state: State; iterations: number } | { ok: false; reason: string; iterations: number; state: State };

/** v − u over the free freedoms, by equation, into d. */
function freeDifference(p: Prepared, v: Float64Array, u: Float64Array, d: Float64Array): Float64Array {
  for (let k = 0; k < u.length; k++) {
    const eq = p.equationOf[k]!;
    if (eq >= 0) d[eq] = v[k]! - u[k]!;
  }
  return d;
}

/** u + s·Δu over the free freedoms. */
function stepped(p: Prepared, u: Float64Array, du: Float64Array, s: number): Float64Array {
  const trial = p.spareU.pop() ?? new Float64Array(u.length);
  trial.set(u);
  for (let k = 0; k < trial.length; k++) {
    const eq = p.equationOf[k]!;
    if (eq >= 0) trial[k]! += s * du[eq]!;
  }
  return trial;
}

/** Gives a state's arrays back for later states (the state must not be read again). */
function release(p: Prepared, state: State): void {
  p.spareU.push(state.u);
  p.spareResidual.push(state.residual);
}

/**
 * Energy line search (Crisfield, Non-linear Finite Element Analysis of Solids and Structures,
 * vol. 1, 1991, §9.3 — from memory): the step length s along the Newton direction Δu where the
 * out-of-balance force does no work, g(s) = Δuᵀ·R(u + sΔu) = 0, by secant steps from g(0);
 * the full step is kept when |g(1)| ≤ ½|g(0)|. Residual-norm backtracking crawled (3 % a step) on a
 * cable dome whose hub swings a metre; this does not.
 */
function lineSearch(p: Prepared, u: Float64Array, du: Float64Array, state: State, lambda: number, options: CableSolverOptions): State {
  const g = (t: State) => {
    let sum = 0;
    for (let k = 0; k < du.length; k++) sum += du[k]! * t.residual[k]!;
    return sum;
  };
  const g0 = g(state);
  let [sPrev, gPrev] = [0, g0];
  let s = 1;
  let trial = evaluate(p, stepped(p, u, du, s), lambda, options);
  let best = trial;
  for (let k = 0; k < 5; k++) {
    const gs = g(trial);
    if (!Number.isFinite(gs)) {
      s /= 4;
    } else {
      if (Math.abs(gs) <= 0.5 * Math.abs(g0)) break;
      const next = s - (gs * (s - sPrev)) / (gs - gPrev);
      [sPrev, gPrev] = [s, gs];
      s = Math.min(4, Math.max(0.05, Number.isFinite(next) ? next : s / 2));
    }
    const previous = trial;
    trial = evaluate(p, stepped(p, u, du, s), lambda, options);
    if (trial.residualN < best.residualN || !Number.isFinite(best.residualN)) {
      if (best !== previous) release(p, best);
      best = trial;
    }
    if (previous !== best) release(p, previous);
  }
  const chosen = Number.isFinite(trial.residualN) && Math.abs(g(trial)) <= 0.5 * Math.abs(g0) ? trial : best;
  if (trial !== chosen) release(p, trial);
  if (best !== chosen && best !== trial) release(p, best);
  return chosen;
}

/**
 * A factorised tangent is kept for the next iteration (its inverse corrected by BFGS updates,
 * secant.ts) while the residual falls at least this much per iteration; otherwise it is refreshed
 * at the current state. Near the solution Newton's own rate is far below it, so a good tangent is
 * never thrown away; an old one costs a few cheap solves instead of a factorisation (≈ 15 solves'
 * work on the 160 m net). Our choice: 0.25 gave the fewest factorisations on the bench's net
 * (0.5: as many, more iterations; 0.9: half as many again, one combination at 41 iterations).
 */
const CHORD_RATE = 0.25;

/** The factorised tangent at the unloaded state, by model (same members and nodes ⇒ same tangent). */
const initialTangents = new WeakMap<CableModel["members"], { nodes: CableModel["nodes"]; factor: Factorisation }>();

/** The matrix each pattern's tangents are assembled in (a factorisation copies what it needs, so one serves every solve of the pattern). */
const tangentMatrices = new WeakMap<SparsePattern, SparseSymmetricMatrix>();

/** The factorised tangent at u, and whether it is the shared one at rest (which must not be released). */
function tangentAt(p: Prepared, u: Float64Array): { factor: Factorisation; shared: boolean } {
  const atRest = u.every((v) => v === 0);
  const known = atRest ? initialTangents.get(p.model.members) : undefined;
  if (known && known.nodes === p.model.nodes) return { factor: known.factor, shared: true };
  const K = tangentMatrices.get(p.pattern) ?? p.matrix();
  tangentMatrices.set(p.pattern, K);
  K.values.fill(0);
  internal(p, u, K);
  const factor = factorLDL(K);
  if (atRest) initialTangents.set(p.model.members, { nodes: p.model.nodes, factor });
  return { factor, shared: atRest };
}

/**
 * Newton–Raphson with a line search from state u to equilibrium at load factor λ; the tangent is
 * refactorised only when the last step did not cut the residual by CHORD_RATE, and between
 * refactorisations BFGS-corrected (every factorisation is checked for a mechanism and, unless
 * allowed, for loss of positive definiteness). The tangent at rest is factorised once per model
 * and shared by every load case solved on it.
 */
function newton(p: Prepared, start: Float64Array, lambda: number, options: CableSolverOptions): NewtonOutcome {
  const tolerance = options.tolerance ?? 1e-6;
  const maxIterations = options.maxIterations ?? 40;
  let u = withPrescribed(p, start, lambda);
  let state = evaluate(p, u, lambda, options);
  let tangent: { factor: Factorisation & { ok: true }; shared: boolean } | undefined;
  // a factor no longer used gives its arrays to the next factorisation (none is kept but the shared one at rest)
  const drop = () => {
    if (tangent && !tangent.shared) tangent.factor.release?.();
    tangent = undefined;
  };
  const updates = p.updates;
  updates.clear();
  for (let iteration = 0; ; iteration++) {
    const outcome = finished(state, iteration, tolerance, maxIterations);
    if (outcome) {
      drop();
      return outcome;
    }
    if (!tangent) {
      const { factor: f, shared } = tangentAt(p, u);
      if (!f.ok) return { ok: false, reason: `the stiffness is singular at ${describeEquation(p, f.equation)}: a mechanism (a node held only by slack cables, or too few supports)`, iterations: iteration, state };
      if (f.negativePivots > 0 && !options.allowUnstable) {
        if (!shared) f.release?.();
        return { ok: false, reason: `the tangent stiffness lost positive definiteness (${f.negativePivots} negative pivots): a limit point or bifurcation, the structure is unstable under this load`, iterations: iteration, state };
      }
      tangent = { factor: f, shared };
      updates.clear();
    }
    const du = updates.direction(state.residual, tangent.factor.solveInPlace ?? tangent.factor.solve);
    const before = state;
    state = lineSearch(p, u, du, state, lambda, options);
    const change = updates.vector(p.free);
    for (let k = 0; k < change.length; k++) change[k] = before.residual[k]! - state.residual[k]!;
    updates.push(freeDifference(p, state.u, u, updates.vector(p.free)), change);
    updates.recycle(du);
    u = state.u;
    release(p, before);
    if (!(state.residualN <= CHORD_RATE * before.residualN)) drop();
  }
}

/** Newton's outcome when it stops at this state: converged, non-finite or out of iterations; undefined while it goes on. */
function finished(state: State, iteration: number, tolerance: number, maxIterations: number): NewtonOutcome | undefined {
  if (!Number.isFinite(state.residualN)) return { ok: false, reason: "the residual became non-finite", iterations: iteration, state };
  if (state.residualN <= tolerance * state.appliedN || state.appliedN === 0) return { ok: true, state, iterations: iteration };
  if (iteration >= maxIterations) return { ok: false, reason: `no equilibrium after ${iteration} Newton iterations (residual ${state.residualN.toExponential(2)} N against ${state.appliedN.toExponential(2)} N applied)`, iterations: iteration, state };
  return undefined;
}

/** Solves the model under its loads (and prescribed support displacements), stepping the load. */
export function solveCableModel(model: CableModel, options: CableSolverOptions = {}): CableSolution {
  const { p, done } = prepared(model);
  try {
    return solvePrepared(p, options);
  } finally {
    done();
  }
}

function solvePrepared(p: Prepared, options: CableSolverOptions): CableSolution {
  const warm = warmStart(p, options);
  if (warm?.ok) return solution(p, options, warm, 1, 0, [warm.iterations], warm.iterations);
  const steps = Math.max(1, Math.round(options.steps ?? 1));
  const maxHalvings = options.maxStepHalvings ?? 8;
  let u: Float64Array = new Float64Array(p.x0.length);
  let lambda = 0;
  let increment = 1 / steps;
  let halvings = 0;
  let iterations = warm?.iterations ?? 0;
  const perStep: number[] = [];
  let last: NewtonOutcome | undefined;
  while (lambda < 1 - 1e-12) {
    const target = Math.min(1, lambda + increment);
    const outcome = newton(p, u, target, options);
    iterations += outcome.iterations;
    last = outcome;
    if (outcome.ok) {
      u = outcome.state.u;
      lambda = target;
      perStep.push(outcome.iterations);
      continue;
    }
    if (++halvings > maxHalvings) break;
    increment /= 2;
  }
  return solution(p, options, last!, lambda, increment, perStep, iterations);
}

/** Newton at the full load from the best of the candidate starts (none when there are none, or the unloaded state is best). */
function warmStart(p: Prepared, options: CableSolverOptions): NewtonOutcome | undefined {
  let best: { u: Float64Array; r: number } | undefined;
  for (const u of options.starts ?? []) {
    if (u.length !== p.x0.length) throw new RangeError(`invalid options.starts: ${u.length} displacements (expected ${p.x0.length}, three a node)`);
    const candidate = evaluate(p, withPrescribed(p, u, 1), 1, options);
    const r = candidate.residualN;
    release(p, candidate);
    if (r < (best?.r ?? Infinity)) best = { u, r };
  }
  if (!best) return undefined;
  const unloaded = evaluate(p, withPrescribed(p, new Float64Array(p.x0.length), 1), 1, options);
  const restBetter = !(best.r < unloaded.residualN);
  release(p, unloaded);
  if (restBetter) return undefined;
  return newton(p, best.u, 1, options);
}

function solution(p: Prepared, options: CableSolverOptions, final: NewtonOutcome, lambda: number, increment: number, perStep: number[], iterations: number): CableSolution {
  const state = final.state;
  // the reactions, member forces and slack cables of the final state only (evaluated again: the iterations need only the residual)
  const reactions = new Float64Array(state.u.length);
  evaluate(p, state.u, state.lambda, options, undefined, reactions);
  const { forces, slack } = internal(p, state.u, undefined, true);
  return {
    converged: final.ok && lambda >= 1 - 1e-12,
    ...(final.ok ? {} : { reason: `${final.reason} at load factor ${(lambda + increment).toFixed(4)}` }),
    displacementsM: state.u,
    coordinatesM: sum(p.x0, state.u, 1),
    forcesN: forces,
    slack,
    reactionsN: reactions,
    iterations,
    iterationsPerStep: perStep,
    residualN: state.residualN,
    appliedN: state.appliedN,
  };
}

/** The tangent stiffness at the unloaded state (elastic plus the geometric stiffness of the members' initial forces), as every solve assembles it: for benches of the factorisation. */
export function tangentAtRest(model: CableModel): SparseSymmetricMatrix {
  const p = prepare(model);
  const K = p.matrix();
  internal(p, new Float64Array(p.x0.length), K);
  return K;
}

/**
 * The largest movement of any node, m. The node is found on the squares (Math.hypot, called for
 * every node of every solve, was a tenth of the span study's 3D garbage) and its length taken once.
 */
export function largestDisplacementM(s: Pick<CableSolution, "displacementsM">): number {
  const u = s.displacementsM;
  let most = -1;
  let at = 0;
  for (let k = 0; k < u.length; k += 3) {
    const squared = u[k]! * u[k]! + u[k + 1]! * u[k + 1]! + u[k + 2]! * u[k + 2]!;
    if (Number.isNaN(squared)) return Number.NaN; // as Math.max of the lengths gives
    if (squared > most) {
      most = squared;
      at = k;
    }
  }
  return u.length === 0 ? 0 : Math.hypot(u[at]!, u[at + 1]!, u[at + 2]!);
}

/**
 * First-order (linear) analysis about the initial geometry: K·u = P with K the tangent there
 * (elastic plus the geometric stiffness of the initial forces), member forces
 * N = N0 + (EA/L_u)·e·Δu. Cables are not allowed to slacken (a linear analysis cannot tell);
 * prescribed support displacements are not supported here.
 */
export function solveCableModelLinear(model: CableModel): CableSolution {
  const p = prepare(model);
  if (p.prescribed.some((v) => v !== 0)) throw new RangeError("invalid model.supports: prescribed displacements need the nonlinear solver (expected none in a linear analysis)");
  const zero = new Float64Array(p.x0.length);
  const K = p.matrix();
  const initial = internal(p, zero, K, true);
  const u = new Float64Array(p.x0.length);
  const f = factorLDL(K);
  const rhs = new Float64Array(K.n);
  for (let k = 0; k < u.length; k++) if (p.equationOf[k]! >= 0) rhs[p.equationOf[k]!] = p.load[k]! - initial.fint[k]!;
  const ok = f.ok;
  if (f.ok) {
    const du = f.solve(rhs);
    for (let k = 0; k < u.length; k++) if (p.equationOf[k]! >= 0) u[k] = du[p.equationOf[k]!]!;
  }
  const forces = new Float64Array(model.members.length);
  const reactions = new Float64Array(u.length);
  model.members.forEach((m, k) => {
    const a = 3 * m.i;
    const b = 3 * m.j;
    const l = Math.hypot(p.x0[b]! - p.x0[a]!, p.x0[b + 1]! - p.x0[a + 1]!, p.x0[b + 2]! - p.x0[a + 2]!);
    const e = [0, 1, 2].map((d) => (p.x0[b + d]! - p.x0[a + d]!) / l);
    const du = [0, 1, 2].map((d) => u[b + d]! - u[a + d]!);
    const stretch = e[0]! * du[0]! + e[1]! * du[1]! + e[2]! * du[2]!;
    const n0 = initial.forces[k]!;
    forces[k] = n0 + (m.eaN / p.restM[k]!) * stretch;
    // Linearised end force on node j: N e + (N0/l)(Δu − e (e·Δu)); on node i the opposite.
    for (let d = 0; d < 3; d++) {
      const end = forces[k]! * e[d]! + (n0 / l) * (du[d]! - e[d]! * stretch);
      if (p.equationOf[b + d]! < 0) reactions[b + d]! += end;
      if (p.equationOf[a + d]! < 0) reactions[a + d]! -= end;
    }
  });
  for (let k = 0; k < u.length; k++) if (p.equationOf[k]! < 0) reactions[k]! -= p.load[k]!;
  let applied2 = 0;
  for (let k = 0; k < u.length; k++) if (p.equationOf[k]! >= 0) applied2 += p.load[k]! ** 2;
  return {
    converged: ok,
    ...(f.ok ? {} : { reason: `the stiffness is singular at ${describeEquation(p, f.equation)}: a mechanism (too few supports or members)` }),
    displacementsM: u,
    coordinatesM: sum(p.x0, u, 1),
    forcesN: forces,
    slack: model.members.map(() => false),
    reactionsN: reactions,
    iterations: 1,
    iterationsPerStep: [1],
    residualN: 0,
    appliedN: Math.sqrt(applied2),
  };
}
