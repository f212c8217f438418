import { describe, it, expect } from "vitest";
import { defaultStudy, validateStudy, setIn, studyFromJson } from "../../../src/study";
import { migrateStudy } from "../../../src/study/migrate";

// Issue 12 item 2: the brief's envelope (height limit, rise rule, objective) and the study migration.
describe("the brief's envelope", () => {
  it("refuses a height limit below eaves + rise, naming the height limit", () => {
    const bad = setIn(defaultStudy(), ["brief", "heightLimitM"], 30); // eaves 12 + rise 24 = 36
    const result = validateStudy(bad);
    expect(result.ok ? [] : result.problems).toEqual([{ path: "brief.heightLimitM", message: "30 m (expected at least eaves + rise = 36 m)" }]);
  });

  it("refuses a minimum clear height above the eaves, naming the clear height", () => {
    const bad = setIn(defaultStudy(), ["brief", "minClearHeightM"], 13); // eaves 12
    const result = validateStudy(bad);
    expect(result.ok ? [] : result.problems).toEqual([{ path: "brief.minClearHeightM", message: "13 m (expected at most the eaves height, 12 m)" }]);
  });

  it("refuses an unknown rise rule or objective, naming the field", () => {
    const result = validateStudy(setIn(setIn(defaultStudy(), ["brief", "riseRule"], "tallest"), ["brief", "objective"], "beauty"));
    expect(result.ok ? [] : result.problems.map((p) => p.path).sort()).toEqual(["brief.objective", "brief.riseRule"]);
  });

  it("a new study searches each scheme's own rise for least carbon", () => {
    expect(defaultStudy().brief.riseRule).toBe("own");
    expect(defaultStudy().brief.objective).toBe("carbon");
  });
});

describe("study migration 2 → 3", () => {
  const v2 = () => {
    const s = JSON.parse(JSON.stringify(defaultStudy())) as Record<string, unknown> & { brief: Record<string, unknown>; schemes: Record<string, { options: Record<string, unknown> }> };
    delete s.brief.heightLimitM;
    delete s.brief.riseRule;
    delete s.brief.objective;
    for (const setting of Object.values(s.schemes)) delete (setting as { pinned?: unknown }).pinned;
    s.schemaVersion = 2;
    return s;
  };

  it("keeps every stored value, adds the envelope with the common rise, and pins options the user changed", () => {
    const old = v2();
    old.brief.riseM = 70;
    old.brief.spanM = 400;
    old.schemes["cable-net"]!.options.masts = 16;
    const migrated = migrateStudy(old) as typeof old;
    expect(migrated.brief).toMatchObject({ riseM: 70, spanM: 400, heightLimitM: 82, riseRule: "common", objective: "carbon" });
    expect((migrated.schemes["cable-net"] as { pinned?: string[] }).pinned).toContain("masts");
    expect((migrated.schemes["cable-dome"] as { pinned?: string[] }).pinned).toEqual([]);
    const opened = studyFromJson(JSON.stringify(old));
    expect(opened.ok).toBe(true);
    if (opened.ok) expect(opened.study.schemes["cable-net"].options.masts).toBe(16);
  });
});
