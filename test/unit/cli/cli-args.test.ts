// The command line's arguments, read by Node's parser (node:util parseArgs): every refusal names
// the option and what it allows, on one line, exit 2.
import { describe, it, expect } from "vitest";
import { readFileSync } from "node:fs";
import { runCli } from "../../../src/cli";

const demo = readFileSync("data/demo-study.json", "utf8");
const run = (...args: string[]) => runCli(args, (path) => {
  if (path === "demo.json") return demo;
  throw Object.assign(new Error("missing"), { code: "ENOENT" });
});

describe("command-line arguments", () => {
  const refused: [string[], RegExp][] = [
    [["demo.json", "--frobnicate"], /unknown option: --frobnicate \(allowed: --help, --json, --partial, --span, --sweep, --schemes, --factors, --rates, --risk, --seed, --objective, --buckling; see --help\)/],
    [["demo.json", "-x"], /unknown option: -x \(allowed: /],
    [["demo.json", "--span"], /missing value for --span \(expected a span in m from 30 to 500\)/],
    [["demo.json", "--schemes"], /missing value for --schemes \(expected scheme ids separated by commas, from cable-dome, /],
    [["demo.json", "--json=yes"], /--json takes no value \(got yes\)/],
    [["demo.json", "--span=abc"], /invalid --span: abc \(expected a span from 30 to 500 m/],
    [["demo.json", "other.json"], /unexpected argument: other\.json \(only one study file\)/],
  ];
  for (const [args, message] of refused) {
    it(`refuses ${args.join(" ")}`, () => {
      const result = run(...args);
      expect(result.code).toBe(2);
      expect(result.stdout).toBe("");
      expect(result.stderr).toMatch(message);
      expect(result.stderr.trim().split("\n")).toHaveLength(1);
    });
  }
  it("reads --name=value as --name value, and a negative number as the value it is", () => {
    expect(run("demo.json", "--span=90", "--schemes=truss-roof", "--json").stdout).toBe(run("demo.json", "--span", "90", "--schemes", "truss-roof", "--json").stdout);
    expect(run("demo.json", "--risk", "20", "--seed", "-1").stderr).toMatch(/invalid --seed: -1 \(expected a whole number from 0 to 2147483647\)/);
  });
  it("-h and --help print the usage, exit 0", () => {
    for (const flag of ["-h", "--help"]) {
      const result = run(flag);
      expect(result.code).toBe(0);
      expect(result.stdout).toMatch(/^usage: npm run evaluate -- FILE/);
    }
  });
});

describe("the equal-footing keys (issue 12, issue 13 command-line sections)", () => {
  const files: Record<string, string> = { "demo.json": readFileSync("data/demo-study.json", "utf8") };
  const readDemo = (p: string) => {
    const t = files[p];
    if (t === undefined) throw Object.assign(new Error("missing"), { code: "ENOENT" });
    return t;
  };
  it("adds status, load case, rise, proportions and the four mass groups per scheme, and the objective and rise rule on top", () => {
    const out = runCli(["demo.json", "--json", "--objective", "mass"], readDemo);
    expect(out.code).toBe(0);
    const json = JSON.parse(out.stdout) as { objective: string; rise_rule: string; schemes: Record<string, unknown>[] };
    expect(json.objective).toBe("mass");
    expect(json.rise_rule).toBe("own"); // the demo study lets each scheme choose its rise
    const demo = JSON.parse(files["demo.json"]!) as { brief: { spanM: number; riseM: number; eavesHeightM: number; heightLimitM: number } };
    for (const s of json.schemes) {
      expect(["feasible", "out-of-range", "infeasible"]).toContain(s.status);
      expect(typeof s.governing_load_case).toBe("string");
      expect(typeof s.proportions).toBe("object");
      // the runner-up is on the chosen design's own footing: the tension roofs' proportions are chosen again on 3D designs
      const runnerUp = s.runner_up as { proportions: Record<string, unknown>; difference_pct: number; designs: string } | null;
      if (runnerUp) expect(runnerUp.designs).toBe("full");
      if (runnerUp && (s.id === "cable-net" || s.id === "cable-dome")) expect(Object.keys(runnerUp.proportions).sort()).toEqual(Object.keys(s.proportions as object).sort());
      const groups = ["structure_t", "perimeter_t", "substructure_t", "envelope_t"].map((k) => s[k] as number);
      expect(groups.reduce((a, b) => a + b, 0)).toBeCloseTo(s.total_mass_t as number, 6);
      if (s.status === "infeasible") continue;
      // a scheme without a rise range keeps the common rise; the others' own rise stays under the height limit
      if (s.rise_source === "common") expect(s.rise_m).toBe(demo.brief.riseM);
      else {
        expect(s.rise_source).toBe("searched");
        expect(s.rise_m as number).toBeLessThanOrEqual(demo.brief.heightLimitM - demo.brief.eavesHeightM + 1e-9);
      }
    }
  });
  it("refuses an unknown objective, naming the option and what it allows", () => {
    expect(runCli(["demo.json", "--objective", "beauty"], readDemo).stderr).toMatch(/invalid --objective: "?beauty"? \(expected one of mass, carbon, cost\)/);
  });
});
