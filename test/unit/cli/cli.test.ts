import { describe, it, expect } from "vitest";
import { readFileSync } from "node:fs";
import { runCli } from "../../../src/cli";

const files: Record<string, string> = {
  "demo.json": readFileSync("data/demo-study.json", "utf8"),
  "broken.json": "{ nope",
  "invalid.json": JSON.stringify({ ...JSON.parse(readFileSync("data/demo-study.json", "utf8")), brief: { spanM: 10 } }),
  "bad-factors.csv": "material,label\nsteel-plate,Plate\n",
};
const readText = (path: string): string => {
  const text = files[path];
  if (text === undefined) throw Object.assign(new Error("missing"), { code: "ENOENT" });
  return text;
};
const run = (...args: string[]) => runCli(args, readText);

describe("runCli bad input: exit 2, one line on stderr naming the field", () => {
  const cases: [string[], RegExp][] = [
    [[], /missing study file/],
    [["missing.json"], /cannot read study file missing.json: no such file/],
    [["broken.json"], /invalid study broken.json: \(file\): not valid JSON/],
    [["invalid.json"], /invalid study invalid.json: brief\.spanM: /],
    [["demo.json", "--span", "20"], /invalid --span: 20 m \(expected a span from 30 to 500 m\)/],
    [["demo.json", "--sweep", "40:abc"], /invalid --sweep/],
    [["demo.json", "--schemes", "igloo"], /unknown scheme: igloo/],
    [["demo.json", "--factors", "bad-factors.csv"], /invalid table/],
    [["demo.json", "--frobnicate"], /unknown option/],
  ];
  for (const [args, message] of cases) {
    it(`${args.join(" ") || "(no arguments)"}`, () => {
      const result = run(...args);
      expect(result.code).toBe(2);
      expect(result.stdout).toBe("");
      expect(result.stderr).toMatch(message);
      expect(result.stderr.trim().split("\n")).toHaveLength(1);
    });
  }
});

describe("runCli results", () => {
  it("--json gives the span and one entry per enabled scheme", () => {
    const result = run("demo.json", "--json");
    expect(result.code).toBe(0);
    const out = JSON.parse(result.stdout) as { span_m: number; schemes: { id: string }[] };
    expect(out.span_m).toBe(160);
    expect(Array.isArray(out.schemes)).toBe(true);
  });
  it("--span overrides the span", () => {
    expect((JSON.parse(run("demo.json", "--json", "--span", "120").stdout) as { span_m: number }).span_m).toBe(120);
  });
  it("--sweep prints CSV with a header and one row per scheme and span", () => {
    const result = run("demo.json", "--sweep", "60:80:10");
    expect(result.code).toBe(0);
    const lines = result.stdout.trim().split("\n");
    expect(lines[0]).toMatch(/^span_m,id,feasible/);
  });
  it("prints the caution with the table", () => {
    expect(run("demo.json").stdout).toMatch(/Feasibility-stage/);
  });
});
