import { wholeNumber } from "../../kernel/units";
import type { Brief } from "../../brief";
import { analysedCombinations, unboundedCombinations, uniformPressurePa, type AnalysisView, type DesignAnalysis, type PlanCombination } from "../kit";
import { combinationAtPlanKPa, type DesignBasis } from "../../loads";
import { cableNetFormFinding, cableNetNodeCount, type CableNetModel, type NetMemberFamily } from "../../analysis/models/cable-net-model";
import { largestDisplacementM, solveCableModel, type CableSolution } from "../../analysis/cable-solver";
import { lengthOf, restLengths, type NodalLoad, type Vec3 } from "../../analysis/model";
import { capHeightAt } from "../../mechanics/spherical-cap";
import { BACKSTAY_SLOPE_RAD, type CableNetLayout } from "./geometry";

export interface NetAnalysisInput {
  brief: Brief;
  basis: DesignBasis;
  layout: CableNetLayout;
  combinations: readonly PlanCombination[];
  /** Converged self-weight from the closed form, kPa on plan. */
  selfWeightKPa: number;
  /** The closed form's prestress as a radial cable's horizontal tension, N (the seed). */
  seedPrestressN: number;
  residualPrestress: number;
  displacementLimitM: number;
  /** Largest radial prestress the search may try: what the largest strand group carries, N. */
  maxPrestressN: number;
  eaN: { outer: number; inner: number; hoop: number; ring: number };
  /** The central ring held by a tie-down at the roof's crown (option centre = held-down); else free. */
  heldCentre?: boolean;
  /** Real circumferential cables each analysed one stands for (cable-net-model.ts); absent: netLumping's choice for the layout. */
  hoopsPerCable?: number;
}

/** The largest analysed force of each family (each circumferential cable apart) and the combination giving it. */
export interface NetForceEnvelope {
  outerN: number;
  innerN: number;
  hoopN: number[];
  ringN: number;
  caseOf: Record<string, string>;
}

export interface NetAnalysis {
  prestressN: number;
  reason: string;
  /** What sets the prestress (the criterion nearest its limit at it), in words; "" when some combination did not converge. */
  governs: string;
  envelope: NetForceEnvelope;
  /** The largest cable force down a mast and horizontal pull on a mast head (N) over the combinations, the mast's combination; the edge anchors' largest total uplift, N. */
  mastForceN: number;
  backstayHorizontalN: number;
  mastCase: string;
  anchorUpliftN: number;
  /** Held centre: the largest net upward pull on the ring (the tie-down's force) and its combination; the least (negative: the tie-down would be pushed), N. */
  ringUpliftN: number;
  ringUpliftCase: string;
  ringLeastUpliftN: number;
  /** Whether the net pulls a mast head outwards in some combination (the backstay would then be a forestay). */
  outwardPull: boolean;
  /** Length of one outer and one inner radial cable as found, m (the mean over the cables). */
  outerLengthM: number;
  innerLengthM: number;
  /** Height of the central ring above the eaves as found (under permanent load), m. */
  crownM: number;
  model: CableNetModel;
  summary: DesignAnalysis;
  /** Uniform combinations left out of the last check as bounded by the heaviest uniform one (kit unboundedCombinations). */
  screened: string[];
}

/**
 * Nodes the analysed net may have: the net's model grows as the span² (a circumferential cable every
 * hanger spacing, crossed by more radial cables as the masts grow in number), and a design's 3D
 * analysis with it (4 s at 400 m, net9); beyond this many nodes (the 12-mast default net at 160 m
 * has 684) the model lumps cables into an equivalent net (netLumping). Our choice, no source.
 */
export const NET_MODEL_NODE_CAP = 700;
/**
 * Most real circumferential cables an analysed one stands for, whatever the node count. Two (the
 * cable beside the mast heads alone, hoopGroups) keeps the forces, backstay and displacement within
 * 3.6 % of the full net's at its prestress and the prestress found within 4.8 % (default brief,
 * 120–300 m, net10; the search alone stops within SEARCH_TOLERANCE); three moved the prestress by up
 * to 8 % and the backstay force by 14 % (200 m, net9, with the cable beside the mast heads paired).
 */
const MOST_HOOPS_PER_CABLE = 2;

/**
 * The real circumferential cables each analysed one stands for: the least number (up to
 * MOST_HOOPS_PER_CABLE) that keeps the analysed net within NET_MODEL_NODE_CAP nodes.
 * Equivalent-net lumping is common practice for cable nets (no source).
 */
export function netLumping(layout: CableNetLayout, cap = NET_MODEL_NODE_CAP): number {
  let k = 1;
  while (k < MOST_HOOPS_PER_CABLE && cableNetNodeCount({ ...netModelLayout(layout), hoopsPerCable: k }) > cap) k++;
  return k;
}

/** What the analysed net lumped, in words for the design's warnings; null when it is the real net. */
export function lumpingNote(layout: CableNetLayout, net: CableNetModel): string | null {
  const k = Math.max(1, ...net.hoopGroups.map((g) => g.length));
  if (k === 1) return null;
  return `the 3D analysis ran on an equivalent net of ${net.model.nodes.length} nodes (the real net has ${cableNetNodeCount(netModelLayout(layout))}): each analysed circumferential cable stands for up to ${k} consecutive real ones (${net.hoopGroups.length} for ${layout.hoopRadiiM.length}; the one beside the mast heads on each side alone) at their mean radius, with their stiffness and prestress together, loaded by their plan band, its force shared equally among them for sizing; the take-off and the drawings are of the real net (equivalent-net lumping: common practice for cable nets, no source)`;
}

/** Circumferential prestress ÷ radial (common practice for anticlastic nets of similar spacing, no source). */
export const NET_HOOP_PRESTRESS_SHARE = 0.5;

/** Nodal loads of a combination: the map at each node's plan position × its tributary plan area (vertical). */
export function netNodeLoads(input: Pick<NetAnalysisInput, "basis" | "selfWeightKPa">, net: CableNetModel, c: PlanCombination): NodalLoad[] {
  const at = combinationAtPlanKPa(input.basis, c.combination, input.selfWeightKPa);
  const loads: NodalLoad[] = [];
  net.areaM2.forEach((area, node) => {
    if (area === 0) return;
    const [x, y] = net.model.nodes[node] as readonly [number, number, number];
    loads.push({ node, forceN: [0, 0, -at(x, y) * 1000 * area] });
  });
  return loads;
}

type Solved = { c: PlanCombination; s: CableSolution }[];
/** A round of the prestress search: the net form-found at α and solved under some combinations; its worst margin (marginOf) and whether it passes (converged, margin ≥ 0). */
export interface NetRound {
  alpha: number;
  net: CableNetModel;
  solved: Solved;
  pass: boolean;
  crownM: number;
  margin: number | null;
}
type Round = NetRound;

/** One round of the prestress search as it ran (for benches and profiles). */
export interface NetSearchRound {
  alphaN: number;
  combinations: number;
  pass: boolean;
  /** The round's worst normalised margin (analyseNet), null when some combination did not converge. */
  margin: number | null;
  iterations: number;
}

/** The search's step: it tries the points of a geometric grid of this ratio less one (onGrid), and stops when a passing one is a grid step above a failing one. */
const SEARCH_TOLERANCE = 0.02;
/** Rounds the search may run (the searched combinations; each verification may add some and search again). */
const MAX_ROUNDS = 14;
const MAX_VERIFICATIONS = 3;
/** Growth of the prestress after a round that did not converge (nothing to extrapolate from). */
const GROWTH_UNCONVERGED = 3;
/** Most the prestress may grow after a failing round that converged (its margin predicts how far). */
const GROWTH = 4;
/**
 * The search starts at this multiple of the closed form's prestress: the 3D analysis needed 3.4–7×
 * it held down and up to 16× free (default brief and rise ÷ span 0.1, 60–300 m, net6), 6.7–9.8×
 * held down at the proportions the search chooses (rise ÷ span 0.05, 160–400 m, net9). A round well
 * below the answer costs the most of any round (200+ Newton iterations, half the analysis at
 * 250–400 m) and tells little but "more"; one above it passes in a few iterations and predicts the
 * answer well. From 3×: 92 rounds over ten designs (160–400 m held down and free, 60 m, 200 m with
 * tall masts), from 6×: 76, the held-down 250–400 m analyses 2.1–4.5× faster (net9, measured;
 * `npm run bench -- net` prints the rounds per design). The demo study's nets need 6–10× (300 and 380 m,
 * each mast height the search samples): from 6× the first round failed at 38–187 Newton iterations,
 * from 10× 28–41. CPU of the span study's 3D pass over 37 spans (node): demo study 42.3 s from 6×,
 * 26.3 from 8×, 22.4 from 9×, 23.8 from 10×, 23.1 from 12×; default study 31.6 (6×), 25.0 (9×), 27.1
 * (10×), 31.3 (12×); the designs moved within the search's tolerance (self-weight within 4 %). From 8×
 * and 10× the demo net's self-weight stepped 15.4 % from 65 to 70 m, past the span-smoothness limit
 * (from 6× and 9×: 14.2 %): its 70 m prestress moved 0.2 % and a strand size with it, on a step
 * made by the mast height the search chooses (0.15, 0.1, 0.15 × span at 60, 65, 70 m).
 */
const START_OF_SEED = 9;
/** Least radial prestress tried, as a share of the heaviest combination's load per radial cable (a floor for the search, not a design value). */
const PRESTRESS_FLOOR_OF_LOAD = 0.05;

/** The criterion with the least margin in a round (marginOf): a cable's share of its prestress, a node's movement, or a free crown's height. */
export type NetCriterion =
  | { kind: "cable"; member: number; combination: string; forceN: number; prestressN: number }
  | { kind: "displacement"; combination: string; displacementM: number }
  | { kind: "crown" };

/**
 * A round's worst margin over the criteria, each normalised so that it reads g = 1 − c/α when the
 * loads' effect does not grow with the prestress α (so a root is predicted from one round, α* = α(1 − g),
 * and from two by a secant in 1/α): a cable's (f/f0 − m)/(1 − m) (a slack one at its would-be force
 * EA(ℓ − ℓ_u)/ℓ_u, negative), the displacement's 1 − d/limit, and a free crown's
 * 1 − (head − crown)/(head − roof crown) (when given); with the criterion that gives it. Null when some combination did not converge.
 */
function worstOf(net: CableNetModel, solved: Solved, m: number, limitM: number, crown?: { crownM: number; roofM: number; headM: number }): { margin: number; criterion: NetCriterion } | null {
  if (solved.some(({ s }) => !s.converged)) return null;
  const rest = restLengths(net.model);
  const members = net.model.members;
  let worst: { margin: number; criterion: NetCriterion } = { margin: crown ? 1 - (crown.headM - crown.crownM) / (crown.headM - crown.roofM) : Infinity, criterion: { kind: "crown" } };
  for (const { c, s } of solved) {
    const moved = largestDisplacementM(s);
    if (1 - moved / limitM < worst.margin) worst = { margin: 1 - moved / limitM, criterion: { kind: "displacement", combination: c.name, displacementM: moved } };
    const x = s.coordinatesM;
    members.forEach((mem, j) => {
      const f0 = mem.initialForceN ?? 0;
      if (!(f0 > 0)) return;
      let f = s.forcesN[j] as number;
      if (s.slack[j]) {
        const L = rest[j] as number;
        f = (mem.eaN * (Math.hypot(x[3 * mem.j]! - x[3 * mem.i]!, x[3 * mem.j + 1]! - x[3 * mem.i + 1]!, x[3 * mem.j + 2]! - x[3 * mem.i + 2]!) - L)) / L;
      }
      const g = (f / f0 - m) / (1 - m);
      if (g < worst.margin) worst = { margin: g, criterion: { kind: "cable", member: j, combination: c.name, forceN: f, prestressN: f0 } };
    });
  }
  return worst;
}

/** A round's worst margin (worstOf), null when some combination did not converge. */
function marginOf(net: CableNetModel, solved: Solved, m: number, limitM: number, crown?: { crownM: number; roofM: number; headM: number }): number | null {
  return worstOf(net, solved, m, limitM, crown)?.margin ?? null;
}

/** What sets the prestress found, in words for a project lead: the criterion with the least margin at it (worstOf). */
function governingText(input: NetAnalysisInput, round: NetRound): string {
  const crown = input.heldCentre ? undefined : { crownM: round.crownM, roofM: capHeightAt(input.layout.cap, input.layout.centralRingRadiusM), headM: input.layout.mastHeadM };
  const worst = worstOf(round.net, round.solved, input.residualPrestress, input.displacementLimitM, crown);
  if (!worst) return "";
  const w = worst.criterion;
  if (w.kind === "crown") return "the free central ring hanging no lower than the roof's crown";
  if (w.kind === "displacement") return `the net's movement under ${w.combination}: ${w.displacementM.toFixed(2)} m, against a limit of ${input.displacementLimitM.toFixed(2)} m`;
  const mem = round.net.model.members[w.member]!;
  const [a, b] = [round.net.model.nodes[mem.i]!, round.net.model.nodes[mem.j]!];
  // the mean of its ends' plan radii (a circumferential cable's straight segment passes nearer the centre between them)
  const radius = (Math.hypot(a[0], a[1]) + Math.hypot(b[0], b[1])) / 2;
  const family = round.net.tags[w.member]!.family;
  const share = (100 * w.forceN) / w.prestressN;
  return `${family === "central ring" ? "the central ring" : `a${family === "outer radial" || family === "inner radial" ? "n" : ""} ${family} cable ${radius.toFixed(0)} m from the centre (the masts stand ${input.layout.mastRadiusM.toFixed(0)} m out)`} under ${w.combination}: it keeps ${share.toFixed(1)} % of its ${wholeNumber(w.prestressN / 1000)} kN prestress, against ${(100 * input.residualPrestress).toFixed(0)} % required`;
}

/**
 * The prestress where the margin is predicted to reach zero: by the secant in 1/α through the
 * highest failing and the lowest passing round with margins, else through the two rounds nearest
 * the root, else α(1 − g) from the one round (the model g = 1 − c/α).
 */
function predictedRoot(rounds: readonly Round[]): number | null {
  const known = rounds.filter((r): r is Round & { margin: number } => r.margin !== null);
  if (known.length === 0) return null;
  const below = known.filter((r) => r.margin < 0).sort((a, b) => b.alpha - a.alpha)[0];
  const above = known.filter((r) => r.margin >= 0).sort((a, b) => a.alpha - b.alpha)[0];
  const pair = below && above ? [below, above] : known.length > 1 ? [...known].sort((a, b) => Math.abs(a.margin) - Math.abs(b.margin)).slice(0, 2) : null;
  if (pair && pair[0]!.alpha !== pair[1]!.alpha) {
    const [p, q] = pair as [Round & { margin: number }, Round & { margin: number }];
    const [xp, xq] = [1 / p.alpha, 1 / q.alpha];
    const x = xp - (p.margin * (xq - xp)) / (q.margin - p.margin);
    if (x > 0 && Number.isFinite(x)) return 1 / x;
  }
  const r = known[known.length - 1]!;
  return r.alpha * Math.max(0.25, 1 - r.margin);
}

/** A failing round's margin below which it predicts nothing (its slack cables' would-be forces are far from what more prestress gives: −8 at 60 m where 1.2× passed), and the prestress grows by GROWTH_FAR. */
const LEAST_PREDICTING_MARGIN = -1;
const GROWTH_FAR = 1.5;
/** A failing round's margin below which its secant with a passing one is not trusted (slack cables' would-be forces are a poor guide): the bracket is halved instead. */
const SECANT_LEAST_MARGIN = -0.3;

/**
 * The next prestress to try (onGrid puts it on the grid), or null when the least passing one is found
 * (within SEARCH_TOLERANCE above a failing one; or none passes at the most allowed). Until one passes: just above the
 * predicted root, 1.2–GROWTH × the last failing one (GROWTH_UNCONVERGED × when it did not
 * converge). Until one fails: just below it. Then: the secant's root inside the bracket (or, when
 * the failing end's margin is not trusted, just below the passing end's own prediction), or the
 * bracket's geometric middle when the last two rounds landed on one side.
 */
function nextAlpha(rounds: readonly Round[], maxN: number): number | null {
  const hi = rounds.filter((r) => r.pass).sort((a, b) => a.alpha - b.alpha)[0];
  const lo = rounds.filter((r) => !r.pass).sort((a, b) => b.alpha - a.alpha)[0];
  const last = rounds[rounds.length - 1]!;
  if (!hi) {
    if (lo!.alpha >= maxN) return null;
    if (last.margin !== null && last.margin < LEAST_PREDICTING_MARGIN) return Math.min(maxN, GROWTH_FAR * lo!.alpha);
    const root = last.margin === null ? null : predictedRoot(rounds);
    return Math.min(maxN, root === null ? GROWTH_UNCONVERGED * lo!.alpha : Math.min(GROWTH * lo!.alpha, Math.max(1.2 * lo!.alpha, root * (1 + SEARCH_TOLERANCE))));
  }
  if (!lo) return Math.min(hi.alpha / (1 + SEARCH_TOLERANCE), Math.max(0.25 * hi.alpha, (predictedRoot(rounds) ?? 0.5 * hi.alpha) * (1 - SEARCH_TOLERANCE)));
  if (hi.alpha <= lo.alpha * (1 + SEARCH_TOLERANCE)) return null;
  // the last two rounds were both tried inside a bracket and landed on the same side: the secant is creeping
  const before = rounds.slice(0, -2);
  const previous = rounds[rounds.length - 2];
  const sameSide = previous !== undefined && previous.pass === last.pass && before.some((r) => r.pass) && before.some((r) => !r.pass);
  const trusted = lo.margin !== null && lo.margin > SECANT_LEAST_MARGIN;
  const aim = sameSide || hi.margin === null ? Math.sqrt(lo.alpha * hi.alpha) : trusted ? predictedRoot([lo, hi])! : predictedRoot([hi])! * (1 - SEARCH_TOLERANCE);
  return Math.min(hi.alpha / (1 + SEARCH_TOLERANCE / 2), Math.max(lo.alpha * (1 + SEARCH_TOLERANCE / 2), aim));
}

/**
 * The combinations the prestress search runs: the kit's governing few (analysedCombinations: the
 * heaviest downward, the heaviest with drifted snow, the most upward) and drifted snow with the
 * largest factor and the fewest other actions. Held down at 60–300 m (default brief), drifted snow alone (6.10b)
 * governed by a margin of ~0.005 while the kit's drifted pick (drifted snow + wind, the heavier peak)
 * kept 0.05–0.12; without it the check of every combination failed and the search ran again.
 */
function searchedCombinations(combinations: readonly PlanCombination[]): PlanCombination[] {
  const drift = (c: PlanCombination) => c.combination.terms.find((t) => t.caseId === "snow-drifted")?.factor ?? 0;
  const most = combinations.filter((c) => c.purpose === "gravity" && drift(c) > 0).sort((a, b) => drift(b) - drift(a) || a.combination.terms.length - b.combination.terms.length)[0];
  return [...new Set([...analysedCombinations(combinations), ...(most ? [most] : [])])];
}

/** The layout's part of the net's model input (the real net: masts, cables, circumferential radii). */
function netModelLayout(layout: CableNetLayout) {
  return {
    masts: layout.masts, cablesPerSide: layout.cablesPerSide, mastRadiusM: layout.mastRadiusM, mastHeadM: layout.mastHeadM, edgeRadiusM: layout.cap.baseRadiusM,
    centralRingRadiusM: layout.centralRingRadiusM, hoopRadiiM: layout.hoopRadiiM,
  };
}

/** The net form-found at any radial prestress α (N) under the permanent load, lumped as the input says (else as netLumping chooses): the layout's topology and loads built once (cableNetFormFinding). */
function netFormFinding(input: NetAnalysisInput): (alpha: number) => CableNetModel {
  const { layout } = input;
  return cableNetFormFinding({
    ...netModelLayout(layout), hoopShare: NET_HOOP_PRESTRESS_SHARE,
    permanentPa: (input.selfWeightKPa + input.brief.servicesKPa) * 1000, eaN: input.eaN,
    hoopsPerCable: input.hoopsPerCable ?? netLumping(layout),
    ...(input.heldCentre ? { centreHeldAtM: capHeightAt(layout.cap, layout.centralRingRadiusM) } : {}),
  });
}

/**
 * The prestresses the search tries: GRID_BASE_N × (1 + SEARCH_TOLERANCE)^k for whole k (and the
 * most allowed), the same for every design. The prestress found is then the least grid point that
 * passes where the one below it fails (a passing round is never taken as the answer on its margin
 * alone): where the search starts and which rounds it runs on the way change its cost, not its answer
 * (for a margin that grows with the prestress). Stopping on a passing margin within 0.002 as well
 * saved 7 % of the rounds in the demo's span study and gave the same designs there, but could stop
 * a grid step high where the margin grows slowly. Our choice, no source.
 */
const GRID_BASE_N = 1000;
const GRID_RATIO = 1 + SEARCH_TOLERANCE;

function gridIndex(alphaN: number): number {
  return Math.log(alphaN / GRID_BASE_N) / Math.log(GRID_RATIO);
}

/**
 * The grid point nearest `alphaN` strictly between the highest failing and the lowest passing
 * prestress tried (the most allowed, `maxN`, stands for the points above it); null when there is none.
 */
function onGrid(alphaN: number | null, rounds: readonly Round[], maxN: number): number | null {
  if (alphaN === null) return null;
  const passing = rounds.filter((r) => r.pass).map((r) => r.alpha);
  const failing = rounds.filter((r) => !r.pass).map((r) => r.alpha);
  const above = failing.length === 0 ? -Infinity : Math.round(gridIndex(Math.max(...failing))) + 1;
  const hi = Math.min(...passing);
  const below = passing.length === 0 ? Infinity : (hi >= maxN ? Math.ceil(gridIndex(maxN) - 1e-9) : Math.round(gridIndex(hi))) - 1;
  if (above > below) return null;
  const k = Math.min(below, Math.max(above, Math.round(gridIndex(alphaN))));
  return Math.min(maxN, GRID_BASE_N * GRID_RATIO ** k);
}

/**
 * Where the search starts, learned: the prestress found ÷ the closed form's seed (the multiple) of
 * the latest design of the same kind (masts, mast height ÷ span and mast ring radius ÷ plan radius
 * to 0.01, radial cables per mast, held or free centre, lumping) in this thread, else START_OF_SEED. The multiple follows a kind
 * smoothly from span to span (demo study, 170–400 m: 6.0–6.6, 8.1–9.0 and 10.0–10.8 at mast heights
 * 0.13, 0.18 and 0.23 × span; it jumps where the mast count changes, measured), so a span study's
 * next span or a slider's next step starts a grid step or two from its answer. The grid (onGrid)
 * keeps the answer the same from whichever start: only the rounds run change. Starting a new kind
 * from a neighbouring kind's multiple (interpolated in mast height, or the nearest mast count) ran
 * no fewer rounds in the demo's span study (551 against 544, measured), so a new kind starts afresh.
 */
const learnedStarts = new Map<string, { multiple: number; searched: string[] }>();
const MOST_LEARNED = 256;

function kindOf(input: NetAnalysisInput): string {
  const { layout } = input;
  return [layout.masts, Math.round((100 * layout.mastHeadM) / (2 * layout.cap.baseRadiusM)), Math.round((100 * layout.mastRadiusM) / layout.cap.baseRadiusM), layout.cablesPerSide, input.heldCentre === true, input.hoopsPerCable ?? 0].join("|");
}

/** Records where a design's search ended (a passing prestress) and the combinations it searched on (by name), for the next design of its kind. */
export function learnStart(input: NetAnalysisInput, prestressN: number, searched: readonly string[] = []): void {
  if (!(input.seedPrestressN > 0)) return;
  if (learnedStarts.size >= MOST_LEARNED) learnedStarts.clear();
  learnedStarts.set(kindOf(input), { multiple: prestressN / input.seedPrestressN, searched: [...searched] });
}

/** Forgets every learned start: the next search of each kind starts at START_OF_SEED (benches time both). */
export function forgetLearnedStarts(): void {
  learnedStarts.clear();
}

/** Earlier rounds whose answers a round may start from: the two nearest in prestress. */
const WARM_ROUNDS = 2;

/**
 * Every round solves as the final check does (the solver's default step halvings): with fewer, a round that converges only on a halved step would fail and the search would settle up to 10 % high (60 m, measured by the search test).
 * Each combination may start from its displacements in the earlier rounds nearest in prestress
 * (the solver takes whichever start, or the unloaded state, is out of balance least): the nets of
 * neighbouring rounds differ by a few per cent, and their answers are close. All cables under dead
 * loads: one equilibrium whatever the start (solver `starts`). 160 m: 114 → 81 factorisations in
 * the search, the rounds after the second 37/39 → 20/10 Newton iterations.
 */
function solveNet(input: NetAnalysisInput, net: CableNetModel, combinations: readonly PlanCombination[], alpha?: number, earlier: readonly NetRound[] = []): Solved {
  const near = alpha === undefined ? [] : [...earlier].sort((a, b) => Math.abs(a.alpha - alpha) - Math.abs(b.alpha - alpha)).slice(0, WARM_ROUNDS);
  return combinations.map((c) => {
    const starts = near.flatMap((r) => r.solved.filter((x) => x.c === c && x.s.converged).map((x) => x.s.displacementsM));
    return { c, s: solveCableModel({ ...net.model, loads: netNodeLoads(input, net, c) }, { steps: 1, maxIterations: 30, starts }) };
  });
}

function judge(input: NetAnalysisInput, alpha: number, net: CableNetModel, solved: Solved): NetRound {
  const crownM = net.ringNodes.reduce((sum, k) => sum + (net.model.nodes[k] as readonly number[])[2]!, 0) / net.ringNodes.length;
  // a held ring is at the roof's crown by construction: only a free one is checked for hanging below it
  const crown = input.heldCentre ? undefined : { crownM, roofM: capHeightAt(input.layout.cap, input.layout.centralRingRadiusM), headM: input.layout.mastHeadM };
  const margin = marginOf(net, solved, input.residualPrestress, input.displacementLimitM, crown);
  return { alpha, net, solved, crownM, margin, pass: margin !== null && margin >= 0 };
}

/** One round at a radial prestress α (N) under the given combinations (by default every one the final check runs): the net form-found, solved and judged as the search does. */
export function netRoundAt(input: NetAnalysisInput, alphaN: number, combinations: readonly PlanCombination[] = unboundedCombinations(input.combinations, input.selfWeightKPa)): NetRound {
  const net = netFormFinding(input)(alphaN);
  return judge(input, alphaN, net, solveNet(input, net, combinations));
}

/** The analysis at a given radial prestress α (N), every combination the final check runs: what analyseNet reports when its search ends at α. */
export function netAnalysisAt(input: NetAnalysisInput, alphaN: number): NetAnalysis {
  return { ...summarise(input, netRoundAt(input, alphaN)), screened: [] };
}

/**
 * The 3D analysis of the net: form-found (force density) at a radial prestress α under the
 * permanent load, then Newton–Raphson (tension-only cables) under every design combination's load
 * map. The prestress is the least α under which every combination converges, every cable keeps
 * `residualPrestress` × its prestress force, no node moves more than the limit, and a free ring
 * hangs no lower than the roof's crown (the fabric hangs below the net). It is searched on the
 * governing few combinations (kit analysedCombinations) by a secant on the worst margin in 1/α
 * (marginOf, nextAlpha) over the points of a fixed grid (onGrid), from where the last design of its
 * kind ended (learnStart) or else START_OF_SEED × the closed form's prestress; the other combinations
 * are then checked at the α found (every one solved from the unloaded state), and any that fails joins
 * the searched ones and the search goes on from there.
 */
export function analyseNet(input: NetAnalysisInput, onRound?: (round: NetSearchRound) => void): NetAnalysis {
  const { layout } = input;
  const seen = (r: NetRound) => {
    onRound?.({ alphaN: r.alpha, combinations: r.solved.length, pass: r.pass, margin: r.margin, iterations: r.solved.reduce((n, { s }) => n + s.iterations, 0) });
    return r;
  };
  const heaviestPerLine = (Math.max(0, ...input.combinations.map((c) => uniformPressurePa(c, input.selfWeightKPa))) * layout.cap.planAreaM2) / (2 * layout.masts * layout.cablesPerSide);
  const checked = unboundedCombinations(input.combinations, input.selfWeightKPa);
  const learned = learnedStarts.get(kindOf(input));
  // the governing few, and those the last design of this kind found governing too (its check of every combination failed on them)
  let searched = [...new Set([...searchedCombinations(input.combinations), ...input.combinations.filter((c) => learned?.searched.includes(c.name))])];
  let rounds: NetRound[] = [];
  const netAt = netFormFinding(input);
  let alpha: number | null = onGrid(Math.min(input.maxPrestressN, Math.max((learned?.multiple ?? START_OF_SEED) * input.seedPrestressN, PRESTRESS_FLOOR_OF_LOAD * heaviestPerLine)), [], input.maxPrestressN);
  /** The search's first round, solved from the unloaded state: the answers every path to its prestress gives, to the last digit. */
  let fromRest: NetRound | undefined;
  for (let verification = 0, total = 0; ; verification++) {
    for (; alpha !== null && total < MAX_ROUNDS; total++) {
      const net = netAt(alpha);
      const round = seen(judge(input, alpha, net, solveNet(input, net, searched, alpha, rounds)));
      fromRest ??= round;
      rounds.push(round);
      alpha = onGrid(nextAlpha(rounds, input.maxPrestressN), rounds, input.maxPrestressN);
    }
    const hi = rounds.filter((r) => r.pass).sort((a, b) => a.alpha - b.alpha)[0];
    if (!hi) return { ...summarise(input, rounds.reduce((h, r) => (r.alpha > h.alpha ? r : h))), screened: [] };
    // the search ran the governing few; the prestress found must hold under every combination (less the uniform ones the heaviest uniform one bounds),
    // each solved from the unloaded state: a round started from earlier rounds' answers converges to the same equilibrium but not the same last digits,
    // and the design must not depend on the way the search came (the page, the span study and the command line give the same figures)
    const own = fromRest === hi ? hi.solved : [];
    const rest = solveNet(input, hi.net, checked.filter((c) => !own.some((x) => x.c === c)));
    const all = seen(judge(input, hi.alpha, hi.net, checked.map((c) => own.find((x) => x.c === c) ?? rest.find((x) => x.c === c)!)));
    if (all.pass) learnStart(input, all.alpha, searched.map((c) => c.name));
    if (all.pass || verification >= MAX_VERIFICATIONS || total >= MAX_ROUNDS) return { ...summarise(input, all), screened: all.pass ? input.combinations.filter((c) => !checked.includes(c)).map((c) => c.name) : [] };
    // another combination governs: search again with it too, from the prestress that now fails
    const failing = all.solved.filter((x) => !searched.includes(x.c) && (marginOf(hi.net, [x], input.residualPrestress, input.displacementLimitM) ?? -1) < 0);
    searched = [...searched, ...failing.map(({ c }) => c)];
    // a prestress that failed the fewer combinations fails the more too; one that passed them is no longer known to pass
    rounds = [...rounds.filter((r) => !r.pass), { ...all, pass: false }];
    alpha = onGrid(nextAlpha(rounds, input.maxPrestressN), rounds, input.maxPrestressN);
  }
}

/** The largest analysed force of each family and its combination, shared back to the real cables: a lumped cable's force equally over the cables it stands for. */
function envelopeOf(net: CableNetModel, solved: Round["solved"], hoops: number): NetForceEnvelope {
  const analysed = { outer: 0, inner: 0, ring: 0, hoop: net.hoopGroups.map(() => 0) };
  const caseOf: Record<string, string> = {};
  const keyOf = (family: NetMemberFamily, index: number) => (family === "circumferential" ? `circumferential ${index}` : family);
  for (const { c, s } of solved) {
    net.tags.forEach((t, j) => {
      const f = s.forcesN[j] as number;
      const before = t.family === "outer radial" ? analysed.outer : t.family === "inner radial" ? analysed.inner : t.family === "central ring" ? analysed.ring : (analysed.hoop[t.index - 1] as number);
      if (f <= before) return;
      if (t.family === "outer radial") analysed.outer = f;
      else if (t.family === "inner radial") analysed.inner = f;
      else if (t.family === "central ring") analysed.ring = f;
      else analysed.hoop[t.index - 1] = f;
      caseOf[keyOf(t.family, t.index)] = c.name;
    });
  }
  const e: NetForceEnvelope = { outerN: analysed.outer, innerN: analysed.inner, hoopN: Array(hoops).fill(0), ringN: analysed.ring, caseOf: {} };
  for (const family of ["outer radial", "inner radial", "central ring"] as const) if (caseOf[family] !== undefined) e.caseOf[family] = caseOf[family];
  net.hoopGroups.forEach((group, g) => {
    const name = caseOf[keyOf("circumferential", g + 1)];
    for (const i of group) {
      e.hoopN[i] = (analysed.hoop[g] as number) / group.length;
      if (name !== undefined) e.caseOf[keyOf("circumferential", i + 1)] = name;
    }
  });
  return e;
}

/** Mast heads: the largest cable force down a mast (the vertical pull plus the backstay's vertical part, at 45°: equal to the horizontal pull) and the largest horizontal pull; edge anchors: the largest total uplift. */
function supportsOf(net: CableNetModel, solved: Round["solved"]) {
  let mastN = 0;
  let horizontal = 0;
  let mastCase = "";
  let uplift = 0;
  let outwardPull = false;
  const ring = { most: 0, mostCase: "", least: Infinity };
  for (const { c, s } of solved) {
    const R = s.reactionsN;
    for (const h of net.mastHeads) {
      const [x, y] = net.model.nodes[h] as readonly [number, number, number];
      const rh = Math.hypot(R[3 * h] as number, R[3 * h + 1] as number);
      // the support pushes the head inwards when the net pulls it outwards: a backstay to the outside cannot
      if (((R[3 * h] as number) * x + (R[3 * h + 1] as number) * y) / Math.hypot(x, y) < -0.01 * rh) outwardPull = true;
      const down = (R[3 * h + 2] as number) + rh * Math.tan(BACKSTAY_SLOPE_RAD);
      if (down > mastN) {
        mastN = down;
        mastCase = c.name;
      }
      horizontal = Math.max(horizontal, rh);
    }
    uplift = Math.max(uplift, net.anchors.reduce((sum, k) => sum + Math.max(0, -(R[3 * k + 2] as number)), 0));
    if (net.model.supports.some((sp) => sp.node === net.ringNodes[0])) {
      const pull = net.ringNodes.reduce((sum, k) => sum - (R[3 * k + 2] as number), 0);
      if (pull > ring.most) [ring.most, ring.mostCase] = [pull, c.name];
      ring.least = Math.min(ring.least, pull);
    }
  }
  return { mastForceN: mastN, backstayHorizontalN: horizontal, mastCase, anchorUpliftN: uplift, outwardPull, ringUpliftN: ring.most, ringUpliftCase: ring.mostCase, ringLeastUpliftN: Number.isFinite(ring.least) ? ring.least : 0 };
}

/** Why the net fails at the last prestress the search tried, in words for a project lead. */
function failureReason(input: NetAnalysisInput, last: NetRound, cases: readonly { name: string; maxDisplacementM: number }[]): string {
  const { solved, alpha } = last;
  const tried = `at the largest prestress tried (${wholeNumber(alpha / 1000)} kN a radial cable)`;
  const notConverged = solved.find(({ s }) => !s.converged);
  if (notConverged) return `the 3D analysis of the net did not converge under ${notConverged.c.name}: ${notConverged.s.reason ?? "no equilibrium"}`;
  const slack = solved.find(({ s }) => s.slack.some(Boolean));
  if (slack) return `cables of the net go slack under ${slack.c.name} ${tried}: add masts or raise them`;
  const moving = cases.find((c) => c.maxDisplacementM > input.displacementLimitM);
  if (moving) return `the net moves ${moving.maxDisplacementM.toFixed(2)} m under ${moving.name} ${tried}, more than the limit of ${input.displacementLimitM.toFixed(2)} m: add masts or raise them`;
  const f0 = last.net.model.members.map((m) => m.initialForceN ?? 0);
  const loose = solved.find(({ s }) => s.forcesN.some((f, j) => f < input.residualPrestress * (f0[j] as number)));
  if (loose) return `cables of the net keep less than ${(100 * input.residualPrestress).toFixed(0)} % of their prestress under ${loose.c.name} ${tried}: add masts or raise them`;
  return `the form-found net hangs below the roof's crown ${tried}`;
}

function summarise(input: NetAnalysisInput, last: Round): Omit<NetAnalysis, "screened"> {
  const { net, solved, alpha } = last;
  const cases = solved.map(({ c, s }) => ({ name: c.name, s, maxDisplacementM: largestDisplacementM(s) }));
  const reason = last.pass ? "" : failureReason(input, last, cases);
  const lines = input.layout.masts * input.layout.cablesPerSide;
  const familyLength = (family: NetMemberFamily) =>
    net.model.members.reduce((sum, m, j) => (net.tags[j]?.family === family ? sum + lengthOf(net.model.nodes[m.i] as Vec3, net.model.nodes[m.j] as Vec3) : sum), 0) / lines;
  const worst = cases.reduce((w, c) => (c.maxDisplacementM > w.maxDisplacementM ? c : w), cases[0]!);
  return {
    prestressN: alpha,
    reason,
    governs: governingText(input, last),
    envelope: envelopeOf(net, solved, input.layout.hoopRadiiM.length),
    ...supportsOf(net, solved),
    outerLengthM: familyLength("outer radial"),
    innerLengthM: familyLength("inner radial"),
    crownM: last.crownM,
    model: net,
    summary: {
      loadCases: cases.map((c) => ({ name: c.name, iterations: c.s.iterations, converged: c.s.converged, maxDisplacementM: c.maxDisplacementM, slackMembers: c.s.slack.filter(Boolean).length })),
      prestressKN: alpha / 1000,
      view: netView(input, net, worst.name, worst.s),
    },
  };
}

/**
 * The radial cables of the first mast as form-found (under the permanent load, before any
 * combination): each cable from the mast head to its end (the edge anchor or the central ring), as
 * (plan radius, height above the eaves) points, for the section drawing; those nearest the mast's
 * own radial plane (by the plan angle of their end) first.
 */
export function mastRadialCables(net: CableNetModel): [number, number][][] {
  const head = net.mastHeads[0];
  if (head === undefined) return [];
  const { nodes, members } = net.model;
  const radial = (j: number) => net.tags[j]!.family === "outer radial" || net.tags[j]!.family === "inner radial";
  const at = (k: number): [number, number] => [Math.hypot(nodes[k]![0], nodes[k]![1]), nodes[k]![2]];
  const cables: { points: [number, number][]; offAxis: number }[] = [];
  const headAngle = Math.atan2(nodes[head]![1], nodes[head]![0]);
  const ends = new Set([...net.mastHeads, ...net.anchors, ...net.ringNodes]);
  members.forEach((m, j) => {
    if (!radial(j) || (m.i !== head && m.j !== head)) return;
    // follow the cable from the head to an end (an anchor, the ring): at each node, the other radial member of the same family
    const family = net.tags[j]!.family;
    const points = [at(head)];
    let [member, node] = [j, m.i === head ? m.j : m.i];
    for (;;) {
      points.push(at(node));
      const next = ends.has(node) ? -1 : members.findIndex((n, k) => k !== member && net.tags[k]!.family === family && (n.i === node || n.j === node));
      if (next < 0) break;
      [member, node] = [next, members[next]!.i === node ? members[next]!.j : members[next]!.i];
    }
    const turn = Math.atan2(nodes[node]![1], nodes[node]![0]) - headAngle;
    cables.push({ points, offAxis: Math.abs(Math.atan2(Math.sin(turn), Math.cos(turn))) });
  });
  return cables.sort((a, b) => a.offAxis - b.offAxis).map((c) => c.points);
}

/** The central ring as form-found (under the permanent load): the mean plan radius and height above the eaves of its nodes, m. A free ring finds both; a held one stays where it is held. */
export function formFoundRing(net: CableNetModel): { radiusM: number; heightM: number } {
  const at = net.ringNodes.map((k) => net.model.nodes[k]!);
  return { radiusM: at.reduce((sum, [x, y]) => sum + Math.hypot(x, y), 0) / at.length, heightM: at.reduce((sum, p) => sum + p[2], 0) / at.length };
}

/** The net drawn for the combination that moves it most: heights above the floor, forces, displacements, slack cables; the masts drawn as struts to the floor. */
function netView(input: NetAnalysisInput, net: CableNetModel, caseName: string, s: CableSolution): AnalysisView {
  const base = input.brief.eavesHeightM;
  const d = s.displacementsM;
  const nodes = net.model.nodes.map(([x, y, z]) => [x, y, z + base] as const);
  const displacementsM = net.model.nodes.map((_, k) => [d[3 * k] as number, d[3 * k + 1] as number, d[3 * k + 2] as number] as const);
  const members: AnalysisView["members"][number][] = net.model.members.map((m, j) => ({ a: m.i, b: m.j, kind: "cable", forceN: s.forcesN[j] as number, slack: s.slack[j] as boolean }));
  const feet = net.mastHeads.map((h) => {
    const [x, y] = net.model.nodes[h] as readonly [number, number, number];
    nodes.push([x, y, 0]);
    displacementsM.push([0, 0, 0]);
    return nodes.length - 1;
  });
  net.mastHeads.forEach((h, k) => members.push({ a: feet[k] as number, b: h, kind: "strut", forceN: -(s.reactionsN[3 * h + 2] as number) }));
  return { caseName, nodes, members, displacementsM };
}
