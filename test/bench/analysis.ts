// The analysis layer's budgets (issue 13): a 160 m cable net and cable dome through every load case
// (median ≤ 100 ms in node), and a 160 m geodesic lattice's buckling analysis (≤ 1 s). Printed, not
// asserted. Run alone: npm run bench -- analysis
import { saddleNet } from "../../src/analysis/models/saddle-net";
import { radialCableDome } from "../../src/analysis/models/radial-cable-dome";
import { roofCases, solveRoofCase } from "../../src/analysis/models/roof-cases";
import { latticeBuckling, latticeFrame, latticePlanLoads, tubeSection } from "../../src/analysis/lattice";
import { geodesicCap, geodesicFrequencyFor } from "../../src/mechanics/geodesic";
import type { NetModel } from "../../src/analysis/models/saddle-net";

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
/** CPU time of this process, ms (user + system): less distorted than wall time on a busy machine. */
const cpuMs = () => {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1000;
};

// Illustrative actions (kPa-scale roof loads; not a design case): dead 0.3 kPa, snow 1.0 kPa,
// suction 1.2 → 0.4 kPa windward → leeward.
const actions = { deadPa: 300, snowPa: 1000, suctionWindwardPa: 1200, suctionLeewardPa: 400 };

function benchTension(name: string, net: NetModel, halfWidthM: number, repeats: number): void {
  const cases = roofCases(net, actions, halfWidthM);
  const dofs = 3 * net.free.length;
  console.log(`${name}: ${net.model.nodes.length} nodes, ${net.model.members.length} members, ${dofs} dofs`);
  const times: number[] = [];
  const cpu: number[] = [];
  let lines: string[] = [];
  for (let r = 0; r < repeats; r++) {
    const t = performance.now();
    const c0 = cpuMs();
    lines = cases.map((c) => {
      const s = solveRoofCase(net.model, c);
      let maxDisp = 0;
      for (let k = 0; k < s.displacementsM.length; k += 3) maxDisp = Math.max(maxDisp, Math.hypot(s.displacementsM[k]!, s.displacementsM[k + 1]!, s.displacementsM[k + 2]!));
      return `  ${c.name.padEnd(22)} ${s.converged ? "converged" : `NOT converged: ${s.reason}`}  iterations ${s.iterations}  max displacement ${maxDisp.toFixed(3)} m  slack ${s.slack.filter(Boolean).length}`;
    });
    times.push(performance.now() - t);
    cpu.push(cpuMs() - c0);
  }
  lines.forEach((l) => console.log(l));
  console.log(`  every case: median ${median(times).toFixed(1)} ms wall, ${median(cpu).toFixed(1)} ms CPU (n=${repeats}; budget 100 ms)`);
}

function benchLattice(): void {
  // 160 m span, rise 1/6 of the span; struts about 5 m (the scheme's default target); CHS 273 × 10.
  const span = 160;
  const rise = span / 6;
  const R = ((span / 2) ** 2 + rise ** 2) / (2 * rise);
  const cap = geodesicCap(geodesicFrequencyFor(R, 5), R, Math.asin(span / 2 / R));
  const frame = latticeFrame(cap, tubeSection(210e9, 0.3, 0.273, 0.01));
  const cases: [string, (x: number, y: number) => number][] = [
    ["uniform snow 1 kPa", () => 1000],
    ["drifted snow 1 / 0.5 kPa", (x) => (x < 0 ? 1000 : 500)],
  ];
  for (const [name, load] of cases) {
    const times: number[] = [];
    const cpu: number[] = [];
    let result = latticeBuckling(frame, latticePlanLoads(cap, load), 3);
    for (let r = 0; r < 3; r++) {
      const t = performance.now();
      const c0 = cpuMs();
      result = latticeBuckling(frame, latticePlanLoads(cap, load), 3);
      times.push(performance.now() - t);
      cpu.push(cpuMs() - c0);
    }
    const b = result.buckling;
    console.log(
      `160 m geodesic lattice (v = ${cap.frequency}, R = ${R.toFixed(1)} m), ${name}: ${result.nodes} nodes, ${result.members} members, ${result.dofs} dofs; ` +
        `buckling factors ${b.factors.map((f) => f.toFixed(2)).join(", ")} (${b.converged ? "converged" : b.reason}) in ${b.steps} Lanczos steps; median ${median(times).toFixed(0)} ms wall, ${median(cpu).toFixed(0)} ms CPU (budget 1 s)`,
    );
  }
}

console.log("\n## analysis layer (node)");
const load = (await import("node:os")).loadavg()[0]!;
console.log(`(load average ${load.toFixed(1)} on ${(await import("node:os")).cpus().length} cores while measuring)`);
// Prestress about 190 kN per metre of net width each way, cables about 200 MN of EA per metre.
benchTension("160 m saddle cable net, 8 m mesh", saddleNet({ spanM: 160, spacingM: 8, riseM: 20, prestressN: 1.5e6, eaN: 1.6e9 }), 80, 5);
benchTension("160 m saddle cable net, 4 m mesh", saddleNet({ spanM: 160, spacingM: 4, riseM: 20, prestressN: 0.75e6, eaN: 0.8e9 }), 80, 3);
const dome = radialCableDome({ spanM: 160, trusses: 32, panels: 8, hubRatio: 0.12, ringDepthM: 4, hubDepthM: 14, prestressN: 4e6, cableEaN: 4e9, postEaN: 8e9 });
benchTension("160 m radial cable-truss dome, 32 trusses × 8 panels", dome, 80, 5);
benchLattice();

// The tension schemes' full design (closed form, hoop choice, 3D analysis and prestress search) at
// 60, 160 and 300 m with the default brief's rise ÷ span: CPU medians (the budget is ~100 ms at 160 m).
{
  const { cableDome } = await import("../../src/schemes/cable-dome");
  const { cableNet } = await import("../../src/schemes/cable-net");
  const { forgetLearnedStarts } = await import("../../src/schemes/cable-net/analysis");
  const { DEFAULT_BRIEF } = await import("../../src/brief");
  const { defaultCatalogue } = await import("../../src/catalogue/default-catalogue");
  const catalogue = defaultCatalogue();
  const variants = [["cable dome", cableDome, {}, [60, 160, 300]], ["cable net (centre held down, the default)", cableNet, {}, [60, 160, 300]], ["cable net, centre free", cableNet, { centre: "free" }, [60, 160, 300]]] as const;
  for (const [name, model, extra, spans] of variants) {
    for (const spanM of spans) {
      const brief = { ...DEFAULT_BRIEF, spanM, riseM: (spanM * DEFAULT_BRIEF.riseM) / DEFAULT_BRIEF.spanM };
      const cpu: number[] = [];
      const cold: number[] = [];
      const options = { ...model.defaults, ...extra, analysis: "3d" } as never;
      let d = model.design(brief, options, catalogue);
      for (let r = 0; r < 3; r++) {
        // the net's prestress search from its fixed start (nothing learned), then from where the design before ended (as a page's next design does)
        forgetLearnedStarts();
        let c0 = cpuMs();
        model.design(brief, options, catalogue);
        cold.push(cpuMs() - c0);
        c0 = cpuMs();
        d = model.design(brief, options, catalogue);
        cpu.push(cpuMs() - c0);
      }
      const cases = d.analysis?.loadCases.map((c) => `${c.name}: ${c.iterations} it, ${c.maxDisplacementM.toFixed(2)} m, ${c.slackMembers} slack`).join("; ") ?? "no 3D analysis";
      const starts = model === cableNet ? `; the net's search started afresh ${median(cold).toFixed(0)} ms, where the same design ended ${median(cpu).toFixed(0)} ms` : "";
      console.log(`${name} ${spanM} m: full design median ${median(cpu).toFixed(0)} ms CPU${starts}; ${d.status}; prestress ${d.analysis?.prestressKN?.toFixed(0) ?? "–"} kN; ${cases}`);
    }
  }
}

// The cable net's prestress search round by round (net6): the prestress tried, the combinations
// solved, pass or fail, the worst margin (analyseNet's marginOf) and CPU per round, at 60, 160 and
// 300 m (held-down centre, the default), after one warm-up design: from the search's fixed start
// (nothing learned), then in one line from where that search ended.
{
  const { cableNet, cableNetAnalysisInput } = await import("../../src/schemes/cable-net");
  const { analyseNet, forgetLearnedStarts } = await import("../../src/schemes/cable-net/analysis");
  const { DEFAULT_BRIEF } = await import("../../src/brief");
  const { defaultCatalogue } = await import("../../src/catalogue/default-catalogue");
  const catalogue = defaultCatalogue();
  for (const spanM of [60, 160, 300]) {
    const brief = { ...DEFAULT_BRIEF, spanM, riseM: (spanM * DEFAULT_BRIEF.riseM) / DEFAULT_BRIEF.spanM };
    const input = cableNetAnalysisInput(brief, cableNet.defaults, catalogue);
    analyseNet(input);
    forgetLearnedStarts();
    const lines: string[] = [];
    const c0 = cpuMs();
    let t = c0;
    const a = analyseNet(input, (r) => {
      const now = cpuMs();
      lines.push(`  ${(r.alphaN / 1000).toFixed(0).padStart(6)} kN  ${String(r.combinations).padStart(2)} combinations  ${r.pass ? "pass" : "fail"}  margin ${r.margin === null ? "not converged" : r.margin.toFixed(4)}  ${r.iterations} iterations  ${(now - t).toFixed(0)} ms CPU`);
      t = now;
    });
    console.log(`cable net ${spanM} m, prestress search (seed ${(input.seedPrestressN / 1000).toFixed(0)} kN): ${lines.length} rounds, ${(cpuMs() - c0).toFixed(0)} ms CPU; prestress ${(a.prestressN / 1000).toFixed(0)} kN${a.reason ? `; ${a.reason}` : ""}`);
    lines.forEach((l) => console.log(l));
    let learned = 0;
    const c1 = cpuMs();
    const b = analyseNet(input, () => learned++);
    console.log(`  from where it ended: ${learned} rounds, ${(cpuMs() - c1).toFixed(0)} ms CPU; prestress ${(b.prestressN / 1000).toFixed(0)} kN`);
  }
}

/** Rounds of every combination timed on the scheme's own net. */
const NET_ROUNDS = 10;

// The cable net's own 3D model (issue 13 item 6, option analysis = 3d) at 160 m with the default
// brief: every design combination at the prestress the scheme's search found; model size and the
// iterations per case. The full design (closed form, prestress search, every combination) beside it.
{
  const { cableNet } = await import("../../src/schemes/cable-net");
  const { netNodeLoads } = await import("../../src/schemes/cable-net/analysis");
  const { planCombinations, unboundedCombinations } = await import("../../src/schemes/kit");
  const { designBasis } = await import("../../src/loads");
  const { cableNetDesignModel } = await import("../helpers/cable-net-design-model");
  const { solveCableModel } = await import("../../src/analysis/cable-solver");
  const { DEFAULT_BRIEF } = await import("../../src/brief");
  const { defaultCatalogue } = await import("../../src/catalogue/default-catalogue");
  const brief = { ...DEFAULT_BRIEF, spanM: 160, riseM: (160 * DEFAULT_BRIEF.riseM) / DEFAULT_BRIEF.spanM };
  const options = { ...cableNet.defaults, analysis: "3d" } as never;
  const c0 = cpuMs();
  const d = cableNet.design(brief, options, defaultCatalogue());
  const designCpu = cpuMs() - c0;
  const o = cableNet.defaults;
  const { layout, prestressN, selfWeightKPa, net } = cableNetDesignModel(brief, o, d);
  const basis = designBasis(brief);
  const every = planCombinations(brief, basis);
  // as the scheme checks them: the lighter uniform combinations are bounded by the heaviest (kit unboundedCombinations)
  const combinations = unboundedCombinations(every, selfWeightKPa);
  const free = net.model.nodes.length - net.model.supports.length;
  console.log(`160 m cable net (scheme model, ${layout.masts} masts × ${2 * layout.cablesPerSide} radial cables, ${layout.hoopRadiiM.length} circumferential): ${net.model.nodes.length} nodes, ${net.model.members.length} members, ${3 * free} dofs; radial prestress ${(prestressN / 1000).toFixed(0)} kN (self-weight of the design smeared)`);
  const times: number[] = [];
  const cpu: number[] = [];
  let lines: string[] = [];
  // The first rounds still run partly unoptimised code (the JIT tiers up over several calls): the
  // median is over ten rounds, the first round's CPU printed beside it.
  for (let r = 0; r < NET_ROUNDS; r++) {
    const t = performance.now();
    const c1 = cpuMs();
    lines = combinations.map((c) => {
      const s = solveCableModel({ ...net.model, loads: netNodeLoads({ basis, selfWeightKPa }, net, c) }, { steps: 1, maxIterations: 30 });
      let maxDisp = 0;
      for (let k = 0; k < s.displacementsM.length; k += 3) maxDisp = Math.max(maxDisp, Math.hypot(s.displacementsM[k]!, s.displacementsM[k + 1]!, s.displacementsM[k + 2]!));
      return `  ${c.name.padEnd(46)} ${s.converged ? "converged" : `NOT converged: ${s.reason}`}  iterations ${s.iterations}  max displacement ${maxDisp.toFixed(3)} m  slack ${s.slack.filter(Boolean).length}`;
    });
    times.push(performance.now() - t);
    cpu.push(cpuMs() - c1);
  }
  lines.forEach((l) => console.log(l));
  console.log(`  every combination (${combinations.length} analysed of ${every.length}; left out as bounded: ${every.filter((c) => !combinations.includes(c)).map((c) => c.name).join(", ")}): median ${median(times).toFixed(0)} ms wall, ${median(cpu).toFixed(0)} ms CPU (n=${NET_ROUNDS}; the first round ${cpu[0]!.toFixed(0)} ms CPU; budget 100 ms)`);
  console.log(`  full design with the 3D analysis (closed form, prestress search on the governing combinations, every combination at the end): ${designCpu.toFixed(0)} ms CPU; ${d.status}; governing ${d.governingLoadCase}`);
  await benchFactorisation(net.model);
}

/**
 * One LDLᵀ factorisation of a net's tangent at rest (elastic, plus the geometric stiffness of the
 * members' initial forces), the kernel of every Newton iteration: its size and median time.
 */
async function benchFactorisation(model: NetModel["model"]): Promise<void> {
  const { tangentAtRest } = await import("../../src/analysis/cable-solver");
  const { factorSparseLDL } = await import("../../src/analysis/sparse-ldl");
  const A = tangentAtRest(model);
  const times: number[] = [];
  for (let r = 0; r < 250; r++) {
    const t = performance.now();
    const f = factorSparseLDL(A);
    if (r >= 50) times.push(performance.now() - t);
    if (!f.ok) throw new Error(`the net's tangent at rest is singular at equation ${f.equation}`);
    f.release();
  }
  console.log(`  one factorisation of its tangent at rest (${A.n} equations, ${A.pattern.factorSize} entries in L, ${[...A.pattern.rowPlan.triple].filter(Boolean).length} of ${A.pattern.supernodes.count} supernodes by node rows): median ${median(times).toFixed(2)} ms (200 after 50 to warm up)`);
}
