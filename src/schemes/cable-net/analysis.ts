import type { Brief } from "../../brief";
import { analysedCombinations, unboundedCombinations, uniformPressurePa, type AnalysisView, type DesignAnalysis, type PlanCombination } from "../kit";
import { combinationAtPlanKPa, type DesignBasis } from "../../loads";
import { cableNetModel, type CableNetModel, type NetMemberFamily } from "../../analysis/models/cable-net-model";
import { solveCableModel, type CableSolution } from "../../analysis/cable-solver";
import { lengthOf, type NodalLoad, type Vec3 } from "../../analysis/model";
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

/** Circumferential prestress ÷ radial (common practice for anticlastic nets of similar spacing, no source). */
export const NET_HOOP_PRESTRESS_SHARE = 0.5;

function maxDisplacement(s: CableSolution): number {
  let m = 0;
  for (let k = 0; k < s.displacementsM.length; k += 3) m = Math.max(m, Math.hypot(s.displacementsM[k] as number, s.displacementsM[k + 1] as number, s.displacementsM[k + 2] as number));
  return m;
}

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

type Round = { alpha: number; net: CableNetModel; solved: { c: PlanCombination; s: CableSolution }[]; pass: boolean; estimate: number; crownM: number };

const RAISES = 8;
const BISECTIONS = 3;
/** Times the prestress may be raised by a quarter when a combination the search did not run fails at the prestress found. */
const VERIFY_RAISES = 4;
/** Least radial prestress tried, as a share of the heaviest combination's load per radial cable (a floor for the search, not a design value). */
const PRESTRESS_FLOOR_OF_LOAD = 0.05;

/**
 * The 3D analysis of the net: form-found (force density) at a radial prestress α under the
 * permanent load, then Newton–Raphson (tension-only cables) under every design combination's load
 * map. The prestress is the least α (bracketed from the closed form's, then bisected) under which
 * every combination converges, every cable keeps `residualPrestress` × its prestress force, no node
 * moves more than the limit, and the net's crown hangs no lower than the roof's (the fabric hangs
 * below the net).
 */
export function analyseNet(input: NetAnalysisInput): NetAnalysis {
  const { layout } = input;
  const lines = layout.masts * layout.cablesPerSide;
  const permanentPa = (input.selfWeightKPa + input.brief.servicesKPa) * 1000;
  const roofCrownM = capHeightAt(layout.cap, layout.centralRingRadiusM);
  const margin = input.residualPrestress;
  const searched = analysedCombinations(input.combinations);
  const run = (alpha: number, combos: readonly PlanCombination[] = searched): Round => {
    const net = cableNetModel({
      masts: layout.masts, cablesPerSide: layout.cablesPerSide, mastRadiusM: layout.mastRadiusM, mastHeadM: layout.mastHeadM, edgeRadiusM: layout.cap.baseRadiusM,
      centralRingRadiusM: layout.centralRingRadiusM, hoopRadiiM: layout.hoopRadiiM, prestressN: alpha, hoopShare: NET_HOOP_PRESTRESS_SHARE, permanentPa, eaN: input.eaN,
      ...(input.heldCentre ? { centreHeldAtM: roofCrownM } : {}),
    });
    const s0 = net.model.members.map((m) => m.initialForceN ?? 0);
    const crownM = net.ringNodes.reduce((sum, k) => sum + (net.model.nodes[k] as readonly number[])[2]!, 0) / net.ringNodes.length;
    // a held ring is at the roof's crown by construction (its mean height may differ in the last bit)
    const high = input.heldCentre === true || crownM >= roofCrownM;
    let pass = high;
    let estimate = high ? 0 : alpha * 1.5;
    const solved = combos.map((c) => ({ c, s: solveCableModel({ ...net.model, loads: netNodeLoads(input, net, c) }, { steps: 1, maxIterations: 30 }) }));
    for (const { s } of solved) {
      if (!s.converged) {
        pass = false;
        continue;
      }
      if (maxDisplacement(s) > input.displacementLimitM) pass = false;
      s.forcesN.forEach((f, j) => {
        const f0 = s0[j] as number;
        if (s.slack[j] || f < margin * f0) pass = false;
        if (f0 > 0) estimate = Math.max(estimate, (alpha * (margin * f0 - f)) / ((1 - margin) * f0) + alpha);
      });
    }
    return { alpha, net, solved, pass, estimate, crownM };
  };
  const heaviestPerLine = (Math.max(0, ...input.combinations.map((c) => uniformPressurePa(c, input.selfWeightKPa))) * layout.cap.planAreaM2) / (2 * lines);
  let hi = run(Math.max(input.seedPrestressN, PRESTRESS_FLOOR_OF_LOAD * heaviestPerLine));
  let lo: Round | null = null;
  for (let k = 0; k < RAISES && !hi.pass && hi.alpha < input.maxPrestressN; k++) {
    lo = hi;
    const allConverged = hi.solved.every(({ s }) => s.converged);
    hi = run(Math.min(input.maxPrestressN, allConverged ? Math.max(1.5 * hi.alpha, Math.min(4 * hi.alpha, 1.02 * hi.estimate)) : 4 * hi.alpha));
  }
  if (lo === null && hi.pass) {
    const trial = run(0.5 * hi.alpha);
    if (trial.pass) hi = trial;
    else lo = trial;
  }
  for (let k = 0; k < BISECTIONS && lo !== null && hi.pass; k++) {
    const mid = run((lo.alpha + hi.alpha) / 2);
    if (mid.pass) hi = mid;
    else lo = mid;
  }
  // the search ran the governing few; the prestress found must hold under every combination (less the uniform ones the heaviest uniform one bounds)
  const checked = unboundedCombinations(input.combinations, input.selfWeightKPa);
  let all = run(hi.alpha, checked);
  for (let k = 0; k < VERIFY_RAISES && hi.pass && !all.pass && all.alpha < input.maxPrestressN; k++) all = run(Math.min(input.maxPrestressN, 1.25 * all.alpha), checked);
  const screened = hi.pass ? input.combinations.filter((c) => !checked.includes(c)).map((c) => c.name) : [];
  return { ...summarise(input, hi.pass ? all : hi), screened };
}

function envelopeOf(net: CableNetModel, solved: Round["solved"], hoops: number): NetForceEnvelope {
  const e: NetForceEnvelope = { outerN: 0, innerN: 0, hoopN: Array(hoops).fill(0), ringN: 0, caseOf: {} };
  const keyOf = (family: NetMemberFamily, index: number) => (family === "circumferential" ? `circumferential ${index}` : family);
  for (const { c, s } of solved) {
    net.tags.forEach((t, j) => {
      const f = s.forcesN[j] as number;
      const key = keyOf(t.family, t.index);
      const before = t.family === "outer radial" ? e.outerN : t.family === "inner radial" ? e.innerN : t.family === "central ring" ? e.ringN : (e.hoopN[t.index - 1] as number);
      if (f <= before) return;
      if (t.family === "outer radial") e.outerN = f;
      else if (t.family === "inner radial") e.innerN = f;
      else if (t.family === "central ring") e.ringN = f;
      else e.hoopN[t.index - 1] = f;
      e.caseOf[key] = c.name;
    });
  }
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

function summarise(input: NetAnalysisInput, last: Round): Omit<NetAnalysis, "screened"> {
  const { net, solved, alpha } = last;
  const notConverged = solved.find(({ s }) => !s.converged);
  const slack = solved.find(({ s }) => s.slack.some(Boolean));
  const cases = solved.map(({ c, s }) => ({ name: c.name, s, maxDisplacementM: maxDisplacement(s) }));
  const moving = cases.find((c) => c.maxDisplacementM > input.displacementLimitM);
  const tried = `at the largest prestress tried (${(alpha / 1000).toFixed(0)} kN a radial cable)`;
  const reason = notConverged
    ? `the 3D analysis of the net did not converge under ${notConverged.c.name}: ${notConverged.s.reason ?? "no equilibrium"}`
    : slack
      ? `cables of the net go slack under ${slack.c.name} ${tried}: add masts or raise them`
      : moving
        ? `the net moves ${moving.maxDisplacementM.toFixed(2)} m under ${moving.name} ${tried}, more than the limit of ${input.displacementLimitM.toFixed(2)} m: add masts or raise them`
        : last.pass
          ? ""
          : `the form-found net hangs below the roof's crown ${tried}`;
  const lines = input.layout.masts * input.layout.cablesPerSide;
  const familyLength = (family: NetMemberFamily) =>
    net.model.members.reduce((sum, m, j) => (net.tags[j]?.family === family ? sum + lengthOf(net.model.nodes[m.i] as Vec3, net.model.nodes[m.j] as Vec3) : sum), 0) / lines;
  const worst = cases.reduce((w, c) => (c.maxDisplacementM > w.maxDisplacementM ? c : w), cases[0]!);
  return {
    prestressN: alpha,
    reason,
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
