import { describe, it, expect } from "vitest";
import { readFileSync } from "node:fs";
import { runCli } from "../../../src/cli";

const files: Record<string, string> = { "demo.json": readFileSync("data/demo-study.json", "utf8") };
const readText = (path: string): string => {
  const text = files[path];
  if (text === undefined) throw Object.assign(new Error("missing"), { code: "ENOENT" });
  return text;
};
const run = (...args: string[]) => runCli(args, readText);

describe("runCli --risk bad input: exit 2, one line naming the option", () => {
  const cases: [string[], RegExp][] = [
    [["demo.json", "--risk", "5"], /invalid --risk: 5 \(expected a whole number of samples from 10 to 50000\)/],
    [["demo.json", "--risk", "12.5"], /invalid --risk: 12\.5/],
    [["demo.json", "--risk", "many"], /invalid --risk: many/],
    [["demo.json", "--risk", "100", "--seed", "-1"], /invalid --seed: -1 \(expected a whole number from 0 to 2147483647\)/],
    [["demo.json", "--risk", "100", "--seed", "x"], /invalid --seed: x/],
    [["demo.json", "--seed", "3"], /--seed applies only with --risk N/],
    [["demo.json", "--risk", "100", "--sweep", "60:80:10"], /--risk cannot be combined with --sweep/],
    [["demo.json", "--risk"], /missing value for --risk/],
  ];
  for (const [args, message] of cases) {
    it(args.join(" "), () => {
      const result = run(...args);
      expect(result.code).toBe(2);
      expect(result.stdout).toBe("");
      expect(result.stderr).toMatch(message);
      expect(result.stderr.trim().split("\n")).toHaveLength(1);
    });
  }
});

describe("runCli --risk N --seed S --json", () => {
  const out = (...extra: string[]) => JSON.parse(run("demo.json", "--json", "--risk", "60", ...extra).stdout) as {
    schemes: { id: string; feasible: boolean; carbon_kgco2e_per_m2_floor: number | null; risk: { carbon_kgco2e_per_m2_floor: { p10: number; p50: number; p90: number } | null; cost_per_m2_floor: { p10: number; p50: number; p90: number } | null; p_lowest_carbon: number; p_lowest_cost: number } }[];
    risk: { samples: number; seed: number; coverage: string; estimate_class: string };
  };
  it("adds P10 ≤ P50 ≤ P90 of carbon and cost per scheme and the probabilities of being lowest", () => {
    const result = out("--seed", "7");
    expect(result.risk.samples).toBe(60);
    expect(result.risk.seed).toBe(7);
    expect(result.risk.estimate_class).toMatch(/concept screening/);
    expect(result.risk.coverage).toMatch(/do not cover/);
    expect(result.schemes.length).toBeGreaterThan(0);
    let pCarbon = 0;
    for (const s of result.schemes) {
      for (const band of [s.risk.carbon_kgco2e_per_m2_floor, s.risk.cost_per_m2_floor]) {
        if (!band) continue;
        expect(band.p10).toBeLessThanOrEqual(band.p50);
        expect(band.p50).toBeLessThanOrEqual(band.p90);
      }
      pCarbon += s.risk.p_lowest_carbon;
    }
    if (result.schemes.some((s) => s.risk.carbon_kgco2e_per_m2_floor)) expect(pCarbon).toBeCloseTo(1, 2);
  });
  it("the same seed gives the same output, another seed another", () => {
    const a = run("demo.json", "--json", "--risk", "40", "--seed", "11").stdout;
    expect(run("demo.json", "--json", "--risk", "40", "--seed", "11").stdout).toBe(a);
    expect(run("demo.json", "--json", "--risk", "40", "--seed", "12").stdout).not.toBe(a);
  });
  it("prints a risk table without --json", () => {
    const result = run("demo.json", "--risk", "30");
    expect(result.code).toBe(0);
    expect(result.stdout).toMatch(/Risk: 30 samples/);
    expect(result.stdout).toMatch(/P\(cheapest\)/);
  });
});
