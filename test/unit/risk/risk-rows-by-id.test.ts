// Issue 10, item 10: risk inputs pointed at factor and rate rows by position (importing the factor
// CSV with its rows reversed silently re-targeted them), and their ranges were absolute (after snow
// was changed to 1.5 kPa the risk page still sampled 0.525 / 0.7 / 1.05). Rows are now found by
// material or cost item id, and ranges are stored around the study's value.
import { describe, it, expect } from "vitest";
import { readFileSync } from "node:fs";
import { studyFromJson, setIn, getIn, STUDY_SCHEMA_VERSION, type Study } from "../../../src/study";
import { defaultCatalogue } from "../../../src/catalogue/default-catalogue";
import { parseFactorCsv, factorRowsToCsv } from "../../../src/carbon";
import { parseRateCsv, rateRowsToCsv } from "../../../src/cost";
import { checkRiskInputs, runRisk, makeDistribution, type ResolvedInput } from "../../../src/risk";
import { assumptionsRecord } from "../../../src/study/assumptions";

function demo(): Study {
  const r = studyFromJson(readFileSync("data/demo-study.json", "utf8"));
  if (!r.ok) throw new Error("demo study invalid");
  return r.study;
}

/** Reverses the data rows of a CSV text (the header stays first). */
function reversedCsv(text: string): string {
  const [header, ...rows] = text.trimEnd().split("\n");
  return `${[header, ...rows.reverse()].join("\n")}\n`;
}

const resolved = (study: Study): ResolvedInput[] => {
  const check = checkRiskInputs(study);
  expect(check.problems).toEqual([]);
  return check.resolved;
};

describe("risk inputs find table rows by id", () => {
  it("importing the factor CSV and the rate CSV with their rows reversed leaves every input on its own material and item", () => {
    const study = demo();
    const factors = parseFactorCsv(reversedCsv(factorRowsToCsv(study.carbon.factors)));
    const rates = parseRateCsv(reversedCsv(rateRowsToCsv(study.cost.rates)));
    expect(factors[0]?.material).toBe(study.carbon.factors.at(-1)?.material);
    const reversed = setIn(setIn(study, ["carbon", "factors"], factors), ["cost", "rates"], rates);
    const before = resolved(study);
    const after = resolved(reversed);
    for (const [k, input] of before.entries()) {
      const other = after[k] as ResolvedInput;
      expect(other.id).toBe(input.id);
      // The same value of the same row, wherever the row now sits.
      expect(getIn(reversed, other.path)).toBe(getIn(study, input.path));
      expect([other.low, other.mode, other.high]).toEqual([input.low, input.mode, input.high]);
      if (input.path[1] === "factors") expect(getIn(reversed, [...other.path.slice(0, 3), "material"])).toBe(`${input.id.replace(/^(carbon|waste|transport)-/, "")}`);
      if (input.path[1] === "rates") expect(getIn(reversed, [...other.path.slice(0, 3), "item"])).toBe(input.id.replace(/^rate-/, ""));
    }
    // And so the run gives the same numbers.
    const catalogue = defaultCatalogue();
    const options = { samples: 20, seed: 7, designSamples: 2 };
    expect(JSON.stringify(runRisk(reversed, catalogue, options).schemes)).toBe(JSON.stringify(runRisk(study, catalogue, options).schemes));
  });
});

describe("risk ranges follow the study", () => {
  it("after snow is changed to 1.5 kPa the snow input samples around 1.5 kPa, and its P10–P90 holds it", () => {
    const study = setIn(demo(), ["brief", "snowGroundKPa"], 1.5);
    const snow = resolved(study).find((i) => i.id === "snow") as ResolvedInput;
    expect(snow.mode).toBe(1.5);
    expect(snow.low).toBeCloseTo(1.125, 12);
    expect(snow.high).toBeCloseTo(2.25, 12);
    const d = makeDistribution(snow.distribution, snow.low, snow.mode, snow.high);
    expect(d.quantile(0.1)).toBeLessThan(1.5);
    expect(d.quantile(0.9)).toBeGreaterThan(1.5);
  });

  it("every default input holds the study's value for a study far from the defaults", () => {
    let study = demo();
    study = setIn(study, ["brief", "snowGroundKPa"], 3.2);
    study = setIn(study, ["brief", "windBasicMPerS"], 31);
    study = setIn(study, ["carbon", "factors", 0, "a1a3KgCO2ePerKg"], 0.9);
    study = setIn(study, ["cost", "onCosts", "inflationPct"], 12);
    for (const input of resolved(study)) {
      expect(input.low).toBeLessThanOrEqual(input.mode);
      expect(input.mode).toBeLessThanOrEqual(input.high);
      expect(input.mode).toBe(getIn(study, input.path));
    }
  });

  it("the assumptions record says the range is around the study's value", () => {
    const rows = assumptionsRecord(demo()).filter((r) => r.key.startsWith("risk.inputs[snow]"));
    expect(rows.map((r) => r.label).join("\n")).toMatch(/least \(× the study's value, the most likely\)/);
    // in the risk page's words, not the file's keys or the add-in vocabulary (audit8: "low", "mode", "pert", "null")
    expect(rows.find((r) => r.key === "risk.inputs[snow].scale")?.value).toBe("× study value");
    expect(rows.find((r) => r.key === "risk.inputs[snow].distribution")?.value).toBe("peak at study value, smooth");
    expect(rows.find((r) => r.key === "risk.inputs[snow].group")?.value).toBe("none (moves on its own)");
    expect(rows.map((r) => `${r.label} ${r.value}`).join("\n")).not.toMatch(/\b(low|high|mode|pert|null)\b/);
  });
});

describe("a study saved by schema version 1 (rows by position, absolute ranges) still opens", () => {
  /** What the previous version stored: index paths and absolute low / mode / high. */
  function asVersion1(study: Study): unknown {
    const inputs = resolved(study).map((i) => ({ id: i.id, label: i.label, path: i.path, low: i.low, mode: i.mode, high: i.high, distribution: i.distribution, group: i.group }));
    return { ...study, schemaVersion: 1, risk: { ...study.risk, inputs } };
  }

  it("migrates to rows by id and ranges as factors, sampling the same values", () => {
    const study = setIn(demo(), ["risk", "samples"], 777);
    const old = asVersion1(study) as { risk: { inputs: { path: unknown[] }[] } };
    expect(old.risk.inputs.some((i) => typeof i.path[2] === "number")).toBe(true);
    const opened = studyFromJson(JSON.stringify(old));
    expect(opened.ok).toBe(true);
    if (!opened.ok) return;
    expect(opened.study.schemaVersion).toBe(STUDY_SCHEMA_VERSION);
    expect(opened.study.risk.samples).toBe(777);
    const steel = opened.study.risk.inputs.find((i) => i.id === "carbon-steel-plate");
    expect(steel?.path).toEqual(["carbon", "factors", { material: "steel-plate" }, "a1a3KgCO2ePerKg"]);
    expect(steel?.scale).toBe("factor");
    const before = resolved(study);
    const after = resolved(opened.study);
    after.forEach((input, k) => {
      const was = before[k] as ResolvedInput;
      expect(input.path).toEqual(was.path);
      expect(input.mode).toBe(was.mode);
      expect(input.low).toBeCloseTo(was.low, 10);
      expect(input.high).toBeCloseTo(was.high, 10);
    });
  });

  it("a version-1 study without its own tables reads the positions in the default tables", () => {
    const study = demo();
    const old = asVersion1(study) as Record<string, unknown>;
    delete old.carbon;
    delete old.cost;
    const opened = studyFromJson(JSON.stringify(old));
    expect(opened.ok && opened.study.risk.inputs.find((i) => i.id === "rate-steel-truss")?.path).toEqual(["cost", "rates", { item: "steel-truss" }, "rate"]);
  });
});
