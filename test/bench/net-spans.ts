// `npm run bench -- net`: the cable net's full 3D design (proportion search, then the 3D analysis of
// the chosen proportions) across the spans, default study with analysis "3d": CPU (median of
// NET_REPS runs, default 7) at 60–400 m with the analysed net's size (lumped / real nodes), the
// prestress search's rounds, prestress and self-weight; then the CPU over the 37 spans 40–400 m (one
// run each). Nothing asserted; the load is printed beside the figures.
import { loadavg } from "node:os";
import { defaultStudy } from "../../src/study";
import { defaultCatalogue } from "../../src/catalogue/default-catalogue";
import { SCHEMES } from "../../src/schemes";
import { briefAtSpan, designAtBestProportions } from "../../src/pipeline";
import { cableNetAnalysisInput } from "../../src/schemes/cable-net";
import { analyseNet, netLumping } from "../../src/schemes/cable-net/analysis";
import { cableNetNodeCount } from "../../src/analysis/models/cable-net-model";
import type { CableNetOptions } from "../../src/schemes/cable-net/declaration";

const study = defaultStudy();
const catalogue = defaultCatalogue();
const net = SCHEMES.find((m) => m.id === "cable-net");
if (!net) throw new Error("no cable-net scheme");
const setting = { ...study.schemes[net.id], options: { ...(study.schemes[net.id]?.options ?? {}), analysis: "3d" } };
const reps = Number(process.env.NET_REPS ?? 7);
const cpuMs = (t: NodeJS.CpuUsage) => {
  const c = process.cpuUsage(t);
  return (c.user + c.system) / 1000;
};
const load = () => loadavg().map((x) => x.toFixed(2)).join(" ");

console.log(`\n## cable net: full 3D design across the spans (default study, analysis 3d, node; load ${load()})`);
for (const spanM of [60, 160, 250, 300, 350, 400]) {
  const brief = briefAtSpan(study.brief, spanM);
  const times: number[] = [];
  let searched = designAtBestProportions(net, brief, setting, study, catalogue);
  for (let r = 0; r < reps; r++) {
    const t = process.cpuUsage();
    searched = designAtBestProportions(net, brief, setting, study, catalogue);
    times.push(cpuMs(t));
  }
  const median = [...times].sort((a, b) => a - b)[Math.floor(times.length / 2)] as number;
  const d = searched.design;
  const options = { ...net.defaults, ...setting.options, ...searched.proportions.proportions } as CableNetOptions;
  const input = cableNetAnalysisInput(searched.brief, options, catalogue);
  let rounds = 0;
  analyseNet(input, () => rounds++);
  const layout = { ...input.layout, edgeRadiusM: input.layout.cap.baseRadiusM };
  const k = netLumping(input.layout);
  const nodes = (hoopsPerCable: number) => cableNetNodeCount({ ...layout, hoopsPerCable });
  console.log(
    `${spanM} m: median ${median.toFixed(0)} ms CPU [${times.map((x) => x.toFixed(0)).join(" ")}]; ${d.regime}; model ${nodes(k)} nodes (real net ${nodes(1)}, ${k} circumferential cable${k > 1 ? "s" : ""} per analysed one); ` +
      `${rounds} prestress rounds; ${d.status}; prestress ${d.analysis?.prestressKN?.toFixed(1) ?? "–"} kN; self-weight ${d.feasible ? d.selfWeightKgPerM2.toFixed(2) : "–"} kg/m²`,
  );
}
let total = 0;
for (let spanM = 40; spanM <= 400; spanM += 10) {
  const t = process.cpuUsage();
  designAtBestProportions(net, briefAtSpan(study.brief, spanM), setting, study, catalogue);
  total += cpuMs(t);
}
console.log(`37 spans 40–400 m: ${(total / 1000).toFixed(1)} s CPU (load ${load()})`);
