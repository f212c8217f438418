// studyProblems checks the study part by part, remembering each part object's answer (issue 14:
// a slider step re-checks only the part it edited). It must find exactly what validateStudy finds.
import { describe, it, expect } from "vitest";
import demo from "../../../data/demo-study.json";
import { defaultStudy, validateStudy, studyProblems, setIn } from "../../../src/study";

const whole = (input: unknown) => {
  const result = validateStudy(input);
  return result.ok ? [] : result.problems;
};

describe("studyProblems", () => {
  const base = defaultStudy();
  const factors = base.carbon.factors;
  const withoutBrief: Record<string, unknown> = { ...base };
  delete withoutBrief.brief;
  const cases: [string, unknown][] = [
    ["the defaults", base],
    ["the demo study (optional parts missing: defaults taken)", demo],
    ["a span out of range", setIn(base, ["brief", "spanM"], 900)],
    ["a rise above span/2 (a check across two brief fields)", setIn(base, ["brief", "spanM"], 40)],
    ["an odd number of cables per mast with an odd number of masts (a check across scheme options)", setIn(setIn(base, ["schemes", "cable-net", "options", "masts"], 3), ["schemes", "cable-net", "options", "radialCablesPerMast"], 3)],
    ["the same material twice in the factor table (a check on a whole list)", setIn(base, ["carbon", "factors"], [...factors, factors[0]])],
    ["a factor row's bad value (a path through a list index)", setIn(base, ["carbon", "factors", 2, "a1a3KgCO2ePerKg"], -1)],
    ["a bad date and a bad span together (problems in two parts, in schema order)", setIn(setIn(base, ["meta", "date"], "yesterday"), ["brief", "spanM"], -5)],
    ["a wrong schema version", { ...base, schemaVersion: 99 }],
    ["no brief at all", withoutBrief],
    ["a brief that is not an object", { ...base, brief: 7 }],
    ["null", null],
    ["a list", [base]],
  ];
  it.each(cases)("finds what validateStudy finds: %s", (_name, input) => {
    expect(studyProblems(input)).toEqual(whole(input));
    // asked again (every part remembered now), the same answer
    expect(studyProblems(input)).toEqual(whole(input));
  });

  it("finds problems at all where there are some (the cases above are not all clean)", () => {
    expect(cases.filter(([, input]) => studyProblems(input).length > 0).length).toBe(cases.length - 2);
  });

  it("sees an edit of a part it has already checked (a new object along the edited path)", () => {
    const study = defaultStudy();
    expect(studyProblems(study)).toEqual([]);
    const edited = setIn(study, ["brief", "riseM"], study.brief.spanM);
    expect(studyProblems(edited).map((p) => p.path)).toEqual(["brief.riseM"]);
  });
});
