import { describe, it, expect } from "vitest";
import demo from "../../../data/demo-study.json";
import {
  defaultStudy,
  validateStudy,
  studyFromJson,
  studyToJson,
  migrateStudy,
  encodeStudyLink,
  decodeStudyLink,
  readStoredStudy,
  writeStoredStudy,
  STORAGE_KEY,
  setIn,
  studyFileText,
  type KeyValueStore,
} from "../../../src/study";

function memoryStore(initial: Record<string, string> = {}): KeyValueStore & { data: Record<string, string> } {
  const data = { ...initial };
  return {
    data,
    getItem: (k) => data[k] ?? null,
    setItem: (k, v) => {
      data[k] = v;
    },
    removeItem: (k) => {
      delete data[k];
    },
  };
}

describe("validateStudy", () => {
  it("accepts the defaults and the demo study", () => {
    expect(validateStudy(defaultStudy()).ok).toBe(true);
    expect(validateStudy(demo).ok).toBe(true);
  });

  it("names the field, the value and what is allowed", () => {
    const bad = setIn(defaultStudy(), ["brief", "spanM"], 900);
    const result = validateStudy(bad);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.problems).toContainEqual({ path: "brief.spanM", message: "900 (expected a number from 30 to 500 m)" });
  });

  it("refuses a rise above half the span, on the rise field", () => {
    const bad = setIn(setIn(defaultStudy(), ["brief", "spanM"], 60), ["brief", "riseM"], 31);
    const result = validateStudy(bad);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.problems.map((p) => p.path)).toEqual(["brief.riseM"]);
  });

  it("reports every problem, not only the first", () => {
    let bad = setIn(defaultStudy(), ["brief", "spanM"], -1);
    bad = setIn(bad, ["brief", "terrain"], "V");
    bad = setIn(bad, ["seed"], 1.5);
    const result = validateStudy(bad);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.problems.map((p) => p.path).sort()).toEqual(["brief.spanM", "brief.terrain", "seed"]);
  });

  it("fills missing tables from the defaults", () => {
    const result = validateStudy(demo);
    expect(result.ok && result.study.carbon.factors.length).toBe(defaultStudy().carbon.factors.length);
  });
});

describe("study files", () => {
  it("keep the assumptions record beside the study, and reopen to the same study", () => {
    const study = setIn(defaultStudy(), ["brief", "eavesHeightM"], 15);
    const text = studyFileText(study);
    const parsed = JSON.parse(text) as { assumptionsRecord: { path: string; changed: boolean }[] };
    expect(parsed.assumptionsRecord.filter((r) => r.changed).map((r) => r.path)).toEqual(["brief.eavesHeightM"]);
    const back = studyFromJson(text);
    expect(back.ok && back.study).toEqual(study);
  });

  it("round-trips through JSON", () => {
    const study = defaultStudy();
    const back = studyFromJson(studyToJson(study));
    expect(back.ok && back.study).toEqual(study);
  });

  it("refuses invalid JSON with a message and changes nothing", () => {
    const result = studyFromJson("{ not json");
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.problems[0]?.message).toMatch(/not valid JSON/);
  });
});

describe("migrateStudy", () => {
  it("runs each step from the file's version to the current one", () => {
    const steps = { 1: (s: Record<string, unknown>) => ({ ...s, added: true }), 2: (s: Record<string, unknown>) => ({ ...s, twice: true }) };
    expect(migrateStudy({ schemaVersion: 1 }, steps, 3)).toEqual({ schemaVersion: 3, added: true, twice: true });
  });
  it("refuses a file from a newer version", () => {
    expect(() => migrateStudy({ schemaVersion: 99 })).toThrow(/newer/);
  });
  it("refuses a file without a version", () => {
    expect(() => migrateStudy({})).toThrow(/schemaVersion/);
  });
});

describe("study links", () => {
  it("reopen the same study", () => {
    const defaults = defaultStudy();
    const study = setIn(setIn(defaults, ["brief", "spanM"], 210), ["meta", "title"], "Ünïcode title — test");
    const result = decodeStudyLink(encodeStudyLink(study, defaults), defaults);
    expect(result.ok && result.study).toEqual(study);
  });
  it("of the defaults are short", () => {
    const defaults = defaultStudy();
    // 47 characters: the version, the format, the defaults' fingerprint ("b", 8 hex digits, since 5 Dec 2026) and an empty difference
    expect(encodeStudyLink(defaults, defaults).length).toBeLessThan(60);
  });
  it("that are damaged change nothing and say why", () => {
    const result = decodeStudyLink("%%%not-base64", defaultStudy());
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.problems[0]?.message).toMatch(/damaged/);
  });
});

describe("browser storage", () => {
  it("saves and reads back", () => {
    const store = memoryStore();
    const study = setIn(defaultStudy(), ["brief", "spanM"], 99);
    expect(writeStoredStudy(store, study)).toBeNull();
    expect(readStoredStudy(store, defaultStudy)?.study).toEqual(study);
  });
  it("falls back to the defaults with a message when corrupt", () => {
    const store = memoryStore({ [STORAGE_KEY]: "{garbage" });
    const read = readStoredStudy(store, defaultStudy);
    expect(read?.study).toEqual(defaultStudy());
    expect(read?.message).toMatch(/could not be used/);
  });
  it("returns null when nothing is saved", () => {
    expect(readStoredStudy(memoryStore(), defaultStudy)).toBeNull();
  });
});

describe("study links and risk settings", () => {
  it("leave out risk settings derived from the study's own tables, and rebuild them", () => {
    const defaults = defaultStudy();
    const study = validateStudy(demo);
    if (!study.ok) throw new Error("demo study invalid");
    const link = encodeStudyLink(study.study, defaults);
    expect(link.length).toBeLessThan(2000);
    const back = decodeStudyLink(link, defaults);
    expect(back.ok && back.study).toEqual(study.study);
  });
  it("keep edited risk settings", () => {
    const defaults = defaultStudy();
    const edited = setIn(defaults, ["risk", "samples"], 1234);
    const back = decodeStudyLink(encodeStudyLink(edited, defaults), defaults);
    expect(back.ok && back.study.risk.samples).toBe(1234);
  });
});
