import { describe, it, expect } from "vitest";
import { readFileSync } from "node:fs";
import { studyFromJson, setIn, defaultStudy, BRIEF_LIMITS, type Study } from "../../../src/study";
import { defaultCatalogue } from "../../../src/catalogue/default-catalogue";
import { evaluateStudy, assessDesign } from "../../../src/pipeline";
import { applyValues, checkRiskInputs, defaultRiskSettings, designQuantities, assessmentIntensities, linearAssessment, makeDistribution, createPrng, affectsDesign } from "../../../src/risk";
import { expectRelClose } from "../../helpers/close";

function demo(): Study {
  const r = studyFromJson(readFileSync("data/demo-study.json", "utf8"));
  if (!r.ok) throw new Error("demo study invalid");
  return r.study;
}

describe("risk settings in the study", () => {
  it("the demo study (no risk field) loads with default inputs whose modes are the study's own values", () => {
    const study = demo();
    expect(study.risk.inputs.length).toBeGreaterThan(20);
    expect(study.risk.samples).toBe(5000);
    const check = checkRiskInputs(study);
    expect(check.problems).toEqual([]);
    expect(check.warnings).toEqual([]);
    expect(check.resolved.find((i) => i.id === "snow")?.mode).toBe(0.7);
  });
  it("span and rise are never uncertain by default; steel carbon factors share a group", () => {
    const settings = defaultRiskSettings(defaultStudy());
    expect(settings.inputs.some((i) => i.path.join(".").match(/spanM|riseM/))).toBe(false);
    const steel = settings.inputs.filter((i) => i.group === "steel-carbon");
    expect(steel.length).toBeGreaterThanOrEqual(4);
  });
  it("a factor range that does not hold the study's value (low factor above 1) is refused with a message naming the input", () => {
    const study = demo();
    const bad = setIn(study, ["risk", "inputs", 0, "low"], 5);
    const r = studyFromJson(JSON.stringify(bad));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems.map((p) => p.message).join("\n")).toMatch(/input "snow": low 5 is outside its factor range \(expected 0 ≤ low ≤ 1 ≤ high/);
  });
  it("a path that leads nowhere, a row id not in the table, and a high end the study's schema refuses, name the input", () => {
    const study = demo();
    const nowhere = setIn(study, ["risk", "inputs", 0, "path"], ["brief", "snowKPa"]);
    expect(checkRiskInputs(nowhere).problems[0]?.message).toMatch(/input "snow": path brief\.snowKPa does not lead to a number/);
    const k = study.risk.inputs.findIndex((i) => i.id === "carbon-steel-plate");
    const noRow = setIn(study, ["risk", "inputs", k, "path", 2], { material: "steel-unknown" });
    expect(checkRiskInputs(noRow).problems[0]?.message).toMatch(/input "carbon-steel-plate": path carbon\.factors\[material=steel-unknown\]\.a1a3KgCO2ePerKg: carbon\.factors has no row with material "steel-unknown"/);
    // The risk allowance has no range the risk code knows, so the study's own schema judges the ends.
    const r = study.risk.inputs.findIndex((i) => i.id === "oncost-riskPct");
    const tooHigh = setIn(study, ["risk", "inputs", r, "high"], 1000);
    const problem = checkRiskInputs(tooHigh).problems[0];
    expect(problem?.inputId).toBe("oncost-riskPct");
    expect(problem?.message).toMatch(/input "oncost-riskPct": high \d+ not allowed: cost\.onCosts\.riskPct/);
  });
  it("ends beyond a field's limits are kept inside them, and the study's value always inside the range", () => {
    const study = setIn(demo(), ["brief", "snowGroundKPa"], 9);
    const snow = checkRiskInputs(study).resolved.find((i) => i.id === "snow");
    expect(snow).toMatchObject({ mode: 9, low: 6.75, high: BRIEF_LIMITS.snowGroundKPa.max });
  });
});

describe("applyValues", () => {
  it("gives what setIn one path at a time gives, sharing untouched branches", () => {
    const study = demo();
    const inputs = checkRiskInputs(study).resolved;
    const values = inputs.map((i) => i.high);
    const expected = inputs.reduce((s, input, k) => setIn(s, input.path, values[k]), study);
    const got = applyValues(study, inputs.map((i) => i.path), values);
    expect(got).toEqual(expected);
    expect(got.meta).toBe(study.meta);
    expect(study.brief.snowGroundKPa).toBe(0.7); // the original is untouched
  });
});

describe("linear assessment equals assessDesign (the pipeline) for sampled tables", () => {
  it("carbon and cost per m² floor of every feasible design, 20 random draws of the assessment-only inputs", () => {
    const study = demo();
    const designs = evaluateStudy(study, defaultCatalogue()).results.map((r) => r.design).filter((d) => d.feasible);
    expect(designs.length).toBeGreaterThan(0);
    const inputs = checkRiskInputs(study).resolved.filter((i) => !affectsDesign(i));
    const dists = inputs.map((i) => makeDistribution(i.distribution, i.low, i.mode, i.high));
    const rng = createPrng(9);
    for (let draw = 0; draw < 20; draw++) {
      const sampled = applyValues(study, inputs.map((i) => i.path), dists.map((d) => d.quantile(rng.uniform())));
      for (const design of designs) {
        const q = designQuantities(design);
        const intensities = assessmentIntensities(sampled, q.massKgByMaterial.map(([m]) => m), q.quantityByItem.map(([c]) => c));
        const linear = linearAssessment(q, intensities);
        const direct = assessDesign(design, sampled);
        expectRelClose(linear.carbonPerM2Floor, direct.carbon?.perM2UsableFloor.perM2?.counted ?? Number.NaN, 1e-12);
        expectRelClose(linear.costPerM2Floor, direct.cost?.perM2UsableFloor?.total ?? Number.NaN, 1e-12);
      }
    }
  });
});
