// Command-line hardening (issue 10): BOM, decimal-only numbers, echoed input, capped error lists,
// unknown scheme ids, and rows missing from the tables (exit 2 unless --partial).
import { describe, it, expect } from "vitest";
import { readFileSync } from "node:fs";
import { runCli } from "../../../src/cli";
import { defaultFactorRows, factorRowsToCsv, FACTOR_COLUMNS } from "../../../src/carbon";
import { defaultRateRows, rateRowsToCsv } from "../../../src/cost";

const demo = readFileSync("data/demo-study.json", "utf8");
const header = FACTOR_COLUMNS.map((c) => c.column).join(",");
const files: Record<string, string> = {
  "demo.json": demo,
  "bom.json": `\uFEFF${demo}`,
  "unknown-scheme.json": JSON.stringify({ ...JSON.parse(demo), schemes: { ...JSON.parse(demo).schemes, igloo: { enabled: true } } }),
  "one-factor.csv": factorRowsToCsv(defaultFactorRows().slice(0, 1)),
  "no-cable-rate.csv": rateRowsToCsv(defaultRateRows().filter((r) => r.item !== "cable")),
  "hex-factor.csv": factorRowsToCsv(defaultFactorRows()).replace(/^(steel-plate,[^,]*,)[^,]*/m, "$10x10"),
  "huge-bad.csv": `${header}\n${Array.from({ length: 20000 }, (_, i) => `m${i},L,abc,7850,0,0,0,0,0,0,s,`).join("\n")}\n`,
};
const readText = (path: string): string => {
  const text = files[path];
  if (text === undefined) throw Object.assign(new Error("missing"), { code: "ENOENT" });
  return text;
};
const run = (...args: string[]) => runCli(args, readText);

describe("runCli input hardening", () => {
  it("opens a study file that starts with a byte-order mark, as the browser does", () => {
    const result = run("bom.json", "--json");
    expect(result.stderr).toBe("");
    expect(result.code).toBe(0);
    expect(JSON.parse(result.stdout)).toEqual(JSON.parse(run("demo.json", "--json").stdout));
  });

  const refused: [string[], RegExp][] = [
    [["demo.json", "--span", "abc"], /invalid --span: abc \(expected a span from 30 to 500 m/],
    [["demo.json", "--span", "0x64"], /invalid --span: 0x64 /],
    [["demo.json", "--sweep", "0x28:100:10"], /invalid --sweep: 0x28:100:10 /],
    [["demo.json", "--risk", "0x10"], /invalid --risk: 0x10 \(expected a whole number/],
    [["demo.json", "--risk", "100", "--seed", "0x10"], /invalid --seed: 0x10 /],
    [["demo.json", "--factors", "hex-factor.csv"], /line \d+, column a1a3_kgco2e_per_kg: "0x10" \(expected a number/],
    [["unknown-scheme.json"], /schemes\.igloo: unknown scheme "igloo" \(expected one of cable-dome/],
  ];
  for (const [args, message] of refused) {
    it(`refuses ${args.join(" ")}, naming the field and echoing what was typed`, () => {
      const result = run(...args);
      expect(result.code).toBe(2);
      expect(result.stdout).toBe("");
      expect(result.stderr).toMatch(message);
      expect(result.stderr).not.toMatch(/NaN/);
      expect(result.stderr.trim().split("\n")).toHaveLength(1);
    });
  }

  it("caps the problem list of a large bad CSV: one short line ending in '… and N more'", () => {
    const result = run("demo.json", "--factors", "huge-bad.csv");
    expect(result.code).toBe(2);
    expect(result.stderr.trim().split("\n")).toHaveLength(1);
    expect(result.stderr.length).toBeLessThan(4000);
    expect(result.stderr).toMatch(/… and 19980 more/);
  });
});

describe("runCli rows missing from a table", () => {
  it("a factor table of one row: exit 2, every missing material named with the schemes that need it", () => {
    const result = run("demo.json", "--factors", "one-factor.csv");
    expect(result.code).toBe(2);
    expect(result.stdout).toBe("");
    expect(result.stderr.trim().split("\n")).toHaveLength(1);
    expect(result.stderr).toMatch(/no carbon factor for material "steel-strand" \(needed by cable-dome, cable-net\)/);
    expect(result.stderr).toMatch(/no carbon factor for material "rebar" \(needed by [^)]*concrete-shell\)/);
    expect(result.stderr).toMatch(/--partial/);
  });

  it("--partial prints the results: carbon blank, cost still there (a carbon gap does not hide the cost), gaps named", () => {
    const result = run("demo.json", "--factors", "one-factor.csv", "--partial", "--json");
    expect(result.code).toBe(0);
    expect(result.stderr).toMatch(/partial results, left blank: .*no carbon factor for material "steel-plate"/);
    const out = JSON.parse(result.stdout) as { schemes: { carbon_total_kgco2e: number | null; cost_total: number | null }[]; gaps: { table: string; key: string; schemes: string[] }[] };
    for (const s of out.schemes) {
      expect(s.carbon_total_kgco2e).toBeNull();
      expect(s.cost_total).toBeGreaterThan(0);
    }
    expect(out.gaps).toContainEqual({ table: "factors", key: "steel-cold-formed", schemes: ["truss-roof"] });
  });

  it("a rate table without the cable item: exit 2 naming it; --partial keeps every carbon figure", () => {
    const refused = run("demo.json", "--rates", "no-cable-rate.csv");
    expect(refused.code).toBe(2);
    expect(refused.stderr).toMatch(/no rate for cost item "cable" \(needed by cable-dome, cable-net\)/);
    const text = run("demo.json", "--rates", "no-cable-rate.csv", "--partial");
    expect(text.code).toBe(0);
    expect(text.stdout).toMatch(/Left blank \(–\): no rate for cost item "cable"/);
    const out = JSON.parse(run("demo.json", "--rates", "no-cable-rate.csv", "--partial", "--json").stdout) as { schemes: { id: string; carbon_total_kgco2e: number | null; cost_total: number | null }[] };
    for (const s of out.schemes) expect(s.carbon_total_kgco2e).toBeGreaterThan(0);
    expect(out.schemes.find((s) => s.id === "truss-roof")?.cost_total).toBeGreaterThan(0);
    expect(out.schemes.find((s) => s.id === "cable-net")?.cost_total).toBeNull();
  });

  it("--sweep with a gap: exit 2 without --partial", () => {
    expect(run("demo.json", "--sweep", "60:80:10", "--rates", "no-cable-rate.csv").code).toBe(2);
    expect(run("demo.json", "--sweep", "60:80:10", "--rates", "no-cable-rate.csv", "--partial").code).toBe(0);
  });
});
