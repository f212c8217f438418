import { describe, it, expect } from "vitest";
import { readFileSync } from "node:fs";
import { studyFromJson, setIn, type Study } from "../../../src/study";
import { defaultCatalogue } from "../../../src/catalogue/default-catalogue";
import { evaluateStudy } from "../../../src/pipeline";
import { riskTornado, runRisk, checkRiskInputs, RiskCancelledError, RISK_METRICS } from "../../../src/risk";
import { riskRangeChart, riskLowestChart, riskTornadoChart, riskRankChart, riskRangeData } from "../../../src/charts";

const catalogue = defaultCatalogue();
function demo(): Study {
  const r = studyFromJson(readFileSync("data/demo-study.json", "utf8"));
  if (!r.ok) throw new Error("demo study invalid");
  return r.study;
}

describe("riskTornado", () => {
  const study = demo();
  const tornadoes = riskTornado(study, catalogue);
  it("one tornado per enabled scheme and metric, bars sorted by swing, base = the pipeline's value", () => {
    const headlines = new Map(evaluateStudy(study, catalogue).results.map((r) => [r.id, r.figures]));
    expect(tornadoes.length).toBe(headlines.size * 2);
    for (const t of tornadoes) {
      const h = headlines.get(t.scheme);
      if (h?.feasible) expect(t.base).toBe(t.metric === "carbonKgCO2ePerM2Floor" ? h.carbonKgCO2ePerM2Floor : h.costPerM2Floor);
      const swings = t.bars.map((b) => b.swing).filter((s) => !Number.isNaN(s));
      expect(swings).toEqual([...swings].sort((a, b) => b - a));
    }
  });
  it("an input at its high end gives what the pipeline gives for the study with that value", () => {
    const t = tornadoes.find((x) => x.metric === "costPerM2Floor" && x.bars.some((b) => b.inputId === "rate-steel-truss" && b.swing > 0));
    expect(t).toBeDefined(); // the steel truss roof prices its trusses with this rate
    if (!t) return;
    const bar = t.bars.find((b) => b.inputId === "rate-steel-truss");
    const input = checkRiskInputs(study).resolved.find((i) => i.id === "rate-steel-truss");
    if (!bar || !input) throw new Error("missing bar");
    const moved = setIn(study, input.path, input.high);
    const h = evaluateStudy(moved, catalogue).results.map((r) => r.figures).find((x) => x.id === t.scheme);
    expect(bar.atHigh).toBe(h?.costPerM2Floor);
  });
  it("inputs of zero width have no bar", () => {
    const fixed = setIn(study, ["risk", "inputs", 0], { ...study.risk.inputs[0], low: 1, high: 1 });
    expect(riskTornado(fixed, catalogue)[0]?.bars.some((b) => b.inputId === "snow")).toBe(false);
  });
});

describe("runRisk options", () => {
  it("shouldStop stops the run with RiskCancelledError; progress is reported", () => {
    let calls = 0;
    expect(() => runRisk(demo(), catalogue, { samples: 200, designSamples: 2, onProgress: () => (calls += 1), shouldStop: () => calls >= 3 })).toThrow(RiskCancelledError);
    expect(calls).toBe(3);
  });
  it("the result lists the inputs each scheme depends on, from its own take-off at the study's values", () => {
    const study = demo();
    const result = runRisk(study, catalogue, { samples: 10, seed: 1, designSamples: 2 });
    const truss = new Set(result.usedInputs["truss-roof"]);
    const timber = new Set(result.usedInputs["timber-dome"]);
    // shared inputs for every scheme; a scheme's own options only for it
    for (const used of [truss, timber]) expect(used.has("snow")).toBe(true);
    expect(truss.has("truss-roof.webAllowancePct")).toBe(true);
    expect(timber.has("truss-roof.webAllowancePct")).toBe(false);
    // factor rows: only the materials the take-off names (the truss carries no PTFE-glass fabric)
    const trussMaterials = new Set(evaluateStudy(study, catalogue).results.find((r) => r.id === "truss-roof")?.design.takeoff.map((row) => row.material));
    expect(trussMaterials.has("fabric-ptfe-glass")).toBe(false);
    expect(truss.has("carbon-fabric-ptfe-glass")).toBe(false);
    for (const material of trussMaterials) if (material && study.risk.inputs.some((i) => i.id === `carbon-${material}`)) expect(truss.has(`carbon-${material}`)).toBe(true);
  });
  it("bad samples or seed throw naming them", () => {
    expect(() => runRisk(demo(), catalogue, { samples: 3 })).toThrow(/invalid samples: 3 \(expected a whole number from 10 to 50000\)/);
    expect(() => runRisk(demo(), catalogue, { samples: 20, seed: -2 })).toThrow(/invalid seed: -2/);
  });
});

describe("risk charts are titled, captioned and label their axes with units", () => {
  const study = demo();
  const result = runRisk(study, catalogue, { samples: 20, seed: 3, designSamples: 2 });
  const common = { title: "a title", caption: "a caption" };
  it("range bars: one row per scheme with P10 ≤ P50 ≤ P90; the axis names quantity and unit", () => {
    for (const metric of RISK_METRICS) {
      const options = riskRangeChart(result, metric, common);
      expect(options.title).toBe("a title");
      expect(String(options.caption)).toMatch(/a caption/);
      expect((options.x as { label: string }).label).toMatch(/\(.+\/m²/);
      for (const d of riskRangeData(result, metric)) expect(d.p10 <= d.p50 && d.p50 <= d.p90).toBe(true);
    }
  });
  it("lowest, tornado and rank charts", () => {
    expect((riskLowestChart(result, common).x as { label: string }).label).toMatch(/Probability/);
    const t = riskTornado(study, catalogue)[0];
    if (t) expect((riskTornadoChart(t, "EUR", common).x as { label: string }).label).toMatch(/kgCO2e\/m²|EUR\/m²/);
    const first = result.schemes[0];
    if (first) expect((riskRankChart(result.rankCorrelations, study.risk.inputs, first.id, "costPerM2Floor", common).x as { domain: number[] }).domain).toEqual([-1, 1]);
  });
});
