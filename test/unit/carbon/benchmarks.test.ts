import { describe, it, expect } from "vitest";
import * as v from "valibot";
import { CarbonSettingsSchema, DEFAULT_CARBON_SETTINGS } from "../../../src/carbon";
import { defaultStudy, studyFromJson, studyToJson, encodeStudyLink, decodeStudyLink, setIn } from "../../../src/study";

const bands = [
  { label: "good practice", fromKgCO2ePerM2: 0, toKgCO2ePerM2: 150, basis: "usable-floor" as const },
  { label: "typical", fromKgCO2ePerM2: 150, toKgCO2ePerM2: 300, basis: "usable-floor" as const },
];

describe("benchmark bands in the carbon settings", () => {
  it("a study saved before bands existed reads with none, and nothing else changes", () => {
    const study = defaultStudy();
    const old = JSON.parse(studyToJson(study));
    delete old.carbon.settings.benchmarks;
    const loaded = studyFromJson(JSON.stringify(old));
    if (!loaded.ok) throw new Error(JSON.stringify(loaded.problems));
    expect(loaded.study.carbon.settings.benchmarks).toEqual([]);
    expect({ ...loaded.study.carbon.settings, benchmarks: undefined }).toEqual({ ...study.carbon.settings, benchmarks: undefined });
  });
  it("bands survive the study file and the link", () => {
    const study = setIn(defaultStudy(), ["carbon", "settings", "benchmarks"], bands);
    const loaded = studyFromJson(studyToJson(study));
    expect(loaded.ok && loaded.study.carbon.settings.benchmarks).toEqual(bands);
    const fragment = encodeStudyLink(study, defaultStudy());
    const back = decodeStudyLink(fragment, defaultStudy());
    expect(back.ok && back.study.carbon.settings.benchmarks).toEqual(bands);
  });
  it("a band whose ends are the wrong way round is refused on its upper end", () => {
    const result = v.safeParse(CarbonSettingsSchema, { ...DEFAULT_CARBON_SETTINGS, benchmarks: [{ ...bands[0], fromKgCO2ePerM2: 200 }] });
    expect(result.success).toBe(false);
    expect(result.issues?.[0]?.message).toBe("from 200 is not below to 150 (expected from < to)");
  });
  it("the single target of an older study reads as the band \"Target\" from 0 on its basis, first, and is never written back", () => {
    const study = setIn(defaultStudy(), ["carbon", "settings", "benchmarks"], bands);
    const old = JSON.parse(studyToJson(study));
    old.carbon.settings.targetKgCO2ePerM2 = 250;
    old.carbon.settings.areaBasis = "covered-plan";
    const loaded = studyFromJson(JSON.stringify(old));
    if (!loaded.ok) throw new Error(JSON.stringify(loaded.problems));
    expect(loaded.study.carbon.settings.benchmarks).toEqual([{ label: "Target", fromKgCO2ePerM2: 0, toKgCO2ePerM2: 250, basis: "covered-plan" }, ...bands]);
    expect(JSON.parse(studyToJson(loaded.study)).carbon.settings).not.toHaveProperty("targetKgCO2ePerM2");
  });
  it("an older study whose target was off (null) reads with its bands unchanged", () => {
    const old = JSON.parse(studyToJson(setIn(defaultStudy(), ["carbon", "settings", "benchmarks"], bands)));
    old.carbon.settings.targetKgCO2ePerM2 = null;
    const loaded = studyFromJson(JSON.stringify(old));
    expect(loaded.ok && loaded.study.carbon.settings.benchmarks).toEqual(bands);
  });
  it("a target with a full set of bands is refused, naming the bands, rather than dropped", () => {
    const full = Array.from({ length: 8 }, (_, i) => ({ ...bands[0]!, label: `band ${i}` }));
    const result = v.safeParse(CarbonSettingsSchema, { ...DEFAULT_CARBON_SETTINGS, benchmarks: full, targetKgCO2ePerM2: 100 });
    expect(result.success).toBe(false);
    expect(result.issues?.[0]?.path?.map((p) => p.key)).toEqual(["benchmarks"]);
    expect(result.issues?.[0]?.message).toBe("more than 8 bands (expected at most 8)");
  });
});
