import { describe, it, expect } from "vitest";
import { readFileSync } from "node:fs";
import { defaultStudy, validateStudy, setIn, studyFromJson, studyToJson, encodeStudyLink, decodeStudyLink, type Study } from "../../../src/study";
import { runCli } from "../../../src/cli";
import { SCHEMES } from "../../../src/schemes";
import { designScheme } from "../../../src/pipeline";
import { defaultCatalogue } from "../../../src/catalogue/default-catalogue";

// Issue 10 item 3: cross-field rules live in the study schema, once, and give the same message
// from an edit, a file, a link and the command line.
type Case = { name: string; edit: (s: Study) => Study; path: string; message: RegExp };
const CASES: Case[] = [
  { name: "rise 100 m at span 160 m", edit: (s) => setIn(s, ["brief", "riseM"], 100), path: "brief.riseM", message: /^100 m \(expected 0 < rise ≤ span\/2 = 80 m\)$/ },
  { name: "span 40 m with rise 22 m", edit: (s) => setIn(setIn(s, ["brief", "spanM"], 40), ["brief", "riseM"], 22), path: "brief.riseM", message: /^22 m \(expected 0 < rise ≤ span\/2 = 20 m\)$/ },
  {
    name: "3 masts with 3 radial cables per mast",
    edit: (s) => setIn(setIn(s, ["schemes", "cable-net", "options", "masts"], 3), ["schemes", "cable-net", "options", "radialCablesPerMast"], 3),
    path: "schemes.cable-net.options.radialCablesPerMast",
    message: /^3 with 3 masts \(expected an even number of radial cables in all/,
  },
  { name: "2 radial trusses", edit: (s) => setIn(s, ["schemes", "cable-dome", "options", "radialTrusses"], 2), path: "schemes.cable-dome.options.radialTrusses", message: /^2 \(expected 0 for automatic, or at least 4 radial trusses/ },
];

const files: Record<string, string> = {};
const readText = (path: string): string => {
  const text = files[path];
  if (text === undefined) throw Object.assign(new Error("missing"), { code: "ENOENT" });
  return text;
};

describe("cross-field rules in the study schema", () => {
  for (const c of CASES) {
    it(`${c.name}: refused by the schema, a file, a link and the command line with one message`, () => {
      const bad = c.edit(defaultStudy());
      const direct = validateStudy(bad);
      expect(direct.ok).toBe(false);
      if (direct.ok) return;
      expect(direct.problems).toHaveLength(1);
      expect(direct.problems[0]?.path).toBe(c.path);
      expect(direct.problems[0]?.message).toMatch(c.message);
      const line = `${direct.problems[0]?.path}: ${direct.problems[0]?.message}`;

      const file = studyFromJson(studyToJson(bad));
      expect(file.ok ? [] : file.problems).toEqual(direct.problems);
      const link = decodeStudyLink(encodeStudyLink(bad, defaultStudy()), defaultStudy());
      expect(link.ok ? [] : link.problems).toEqual(direct.problems);

      files["bad.json"] = studyToJson(bad);
      const cli = runCli(["bad.json"], readText);
      expect(cli.code).toBe(2);
      expect(cli.stderr).toContain(line);
    });
  }

  it("reports rise > span/2 even when another brief field is also wrong", () => {
    const bad = setIn(setIn(defaultStudy(), ["brief", "riseM"], 100), ["brief", "snowGroundKPa"], -1);
    const result = validateStudy(bad);
    expect(result.ok ? [] : result.problems.map((p) => p.path).sort()).toEqual(["brief.riseM", "brief.snowGroundKPa"]);
  });

  it("the combinations the rules allow are computed by every designer (no 'could not be computed')", () => {
    const catalogue = defaultCatalogue();
    const net = SCHEMES.find((m) => m.id === "cable-net");
    const dome = SCHEMES.find((m) => m.id === "cable-dome");
    if (!net || !dome) throw new Error("scheme missing");
    const base = defaultStudy();
    for (const masts of [3, 4, 5]) {
      for (const cables of [2, 3, 4, 5]) {
        const study = setIn(setIn(base, ["schemes", "cable-net", "options", "masts"], masts), ["schemes", "cable-net", "options", "radialCablesPerMast"], cables);
        const valid = validateStudy(study).ok;
        expect(valid).toBe((masts * cables) % 2 === 0);
        if (valid) expect(designScheme(net, study.brief, study.schemes["cable-net"].options, catalogue).reason).not.toMatch(/could not be computed/);
      }
    }
    for (const trusses of [0, 1, 2, 3, 4, 5]) {
      const study = setIn(base, ["schemes", "cable-dome", "options", "radialTrusses"], trusses);
      const valid = validateStudy(study).ok;
      expect(valid).toBe(trusses === 0 || trusses >= 4);
      if (valid) expect(designScheme(dome, study.brief, study.schemes["cable-dome"].options, catalogue).reason).not.toMatch(/could not be computed/);
    }
  });

  it("the demo study still validates", () => {
    expect(validateStudy(JSON.parse(readFileSync("data/demo-study.json", "utf8"))).ok).toBe(true);
  });
});
