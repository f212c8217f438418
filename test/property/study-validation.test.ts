import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { defaultStudy, validateStudy, setIn, studyFromJson } from "../../src/study";

// Property: random or malformed studies never crash the validator and always yield a field path.
const base = defaultStudy();
const paths: (string | number)[][] = [
  ["brief", "spanM"],
  ["brief", "riseM"],
  ["brief", "terrain"],
  ["brief", "factors", "gammaQ"],
  ["meta", "date"],
  ["seed"],
  ["carbon", "factors", 0, "a1a3KgCO2ePerKg"],
  ["cost", "rates", 0, "rate"],
  ["schemes"],
  ["brief"],
];

describe("validateStudy on malformed input (fast-check)", () => {
  it("never throws on any JSON value", () => {
    fc.assert(
      fc.property(fc.jsonValue(), (value) => {
        const result = validateStudy(value);
        if (!result.ok) expect(result.problems.length).toBeGreaterThan(0);
      }),
      { numRuns: 300 },
    );
  });

  it("names a field path for a corrupted field", () => {
    fc.assert(
      fc.property(fc.constantFrom(...paths), fc.oneof(fc.string(), fc.double(), fc.constant(null), fc.boolean(), fc.array(fc.integer())), (path, junk) => {
        const result = validateStudy(setIn(base, path, junk));
        if (result.ok) return; // the junk happened to be valid there
        for (const problem of result.problems) {
          expect(problem.path.length).toBeGreaterThan(0);
          expect(problem.message.length).toBeGreaterThan(0);
        }
        expect(result.problems.some((p) => p.path.startsWith(String(path[0])))).toBe(true);
      }),
      { numRuns: 300 },
    );
  });

  it("never throws on arbitrary text as a file", () => {
    fc.assert(
      fc.property(fc.string(), (text) => {
        const result = studyFromJson(text);
        expect(typeof result.ok).toBe("boolean");
      }),
      { numRuns: 200 },
    );
  });
});
