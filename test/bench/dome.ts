// `npm run bench -- dome`: the cable dome's 3D prestress against the closed form's, 60–300 m at the
// default study with analysis "3d" (proportions searched as the pages do, screened by the closed form),
// the closed form at the same proportions, and what set the 3D prestress. Nothing asserted.
import { defaultStudy } from "../../src/study";
import { defaultCatalogue } from "../../src/catalogue/default-catalogue";
import { SCHEMES } from "../../src/schemes";
import { briefAtSpan, designAtBestProportions } from "../../src/pipeline";

const study = defaultStudy();
const catalogue = defaultCatalogue();
const dome = SCHEMES.find((m) => m.id === "cable-dome");
if (!dome) throw new Error("no cable-dome scheme");
const prestressKN = (summary: readonly { key: string; value: number }[]) => summary.find((s) => s.key === "prestress")?.value ?? Number.NaN;

console.log("\n## cable dome: 3D prestress against the closed form's (default study, searched proportions, node)");
for (const spanM of [60, 100, 160, 200, 250, 300]) {
  const brief = briefAtSpan(study.brief, spanM);
  const setting = { ...study.schemes[dome.id], options: { ...(study.schemes[dome.id]?.options ?? {}), analysis: "3d" } };
  const t = process.cpuUsage();
  const searched = designAtBestProportions(dome, brief, setting, study, catalogue);
  const cpu = process.cpuUsage(t);
  const d = searched.design;
  // the same proportions designed by the closed form alone
  const options = { ...dome.defaults, ...setting.options, ...searched.proportions.proportions, analysis: "closed-form" };
  delete (options as Record<string, unknown>).riseM;
  const closed = dome.design(searched.brief, options, catalogue);
  const analysed = d.analysis?.prestressKN;
  const closedKN = prestressKN(closed.summary);
  const why = d.warnings.find((w) => w.startsWith("prestress ")) ?? "no 3D analysis (outside the valid span range)";
  console.log(
    `${String(spanM).padStart(3)} m  ${d.status.padEnd(12)} ${d.regime}  3D ${analysed === undefined ? "–" : `${analysed.toFixed(0)} kN`}  closed form ${closedKN.toFixed(0)} kN  ratio ${analysed === undefined ? "–" : (analysed / closedKN).toFixed(2)}  ${d.selfWeightKgPerM2.toFixed(1)} kg/m² (closed form ${closed.selfWeightKgPerM2.toFixed(1)})  design incl. search ${((cpu.user + cpu.system) / 1000).toFixed(0)} ms CPU  — ${why}`,
  );
}
