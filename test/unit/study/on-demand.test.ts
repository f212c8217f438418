// The on-demand 3D analysis left out where every span or draw is designed (issue 13: "it may run on
// demand … rather than in every span-study point").
import { describe, it, expect } from "vitest";
import { defaultStudy, setIn, onDemandAnalysesOn, withoutOnDemandAnalyses } from "../../../src/study";
import { ON_DEMAND_ANALYSIS_OPTION } from "../../../src/schemes/declarations";

describe("withoutOnDemandAnalyses", () => {
  const plain = defaultStudy();
  it("leaves a study with none on as it is (the same object)", () => {
    expect(onDemandAnalysesOn(plain)).toEqual([]);
    expect(withoutOnDemandAnalyses(plain)).toBe(plain);
  });
  it("switches off each one that is on, and nothing else", () => {
    const on = setIn(setIn(plain, ["schemes", "timber-dome", "options", ON_DEMAND_ANALYSIS_OPTION], true), ["brief", "spanM"], 140);
    expect(onDemandAnalysesOn(on)).toEqual(["timber-dome"]);
    const off = withoutOnDemandAnalyses(on);
    expect(onDemandAnalysesOn(off)).toEqual([]);
    expect(off.schemes["timber-dome"]?.options?.[ON_DEMAND_ANALYSIS_OPTION]).toBe(false);
    expect(setIn(off, ["schemes", "timber-dome", "options", ON_DEMAND_ANALYSIS_OPTION], true)).toEqual(on);
    // the study it came from is untouched
    expect(on.schemes["timber-dome"]?.options?.[ON_DEMAND_ANALYSIS_OPTION]).toBe(true);
  });
});
