import { describe, it, expect } from "vitest";
import { defaultFactorRows, factorRowsToCsv, parseFactorCsv, FACTOR_COLUMNS } from "../../src/carbon";
import { defaultRateRows, parseRateCsv, rateRowsToCsv } from "../../src/cost";
import { MATERIALS } from "../../src/materials";
import { COST_ITEMS } from "../../src/takeoff/takeoff-row";
import { CsvError } from "../../src/catalogue";

const header = FACTOR_COLUMNS.map((c) => c.column).join(",");

function problemsOf(run: () => unknown): { line: number; column: string; message: string }[] {
  try {
    run();
  } catch (error) {
    if (error instanceof CsvError) return error.problems;
    throw error;
  }
  expect.fail("expected a CsvError");
}

describe("parseFactorCsv", () => {
  it("reads the bundled table: one row for every material id of src/materials.ts", () => {
    const rows = defaultFactorRows();
    expect(rows.map((r) => r.material).sort()).toEqual(MATERIALS.map((m) => m.id).sort());
    for (const row of rows) expect(row.source.length).toBeGreaterThan(0);
  });

  it("reports every bad row with its line and column and returns nothing", () => {
    const text = [
      header,
      "steel-plate,Plate,2.46,7850,300,0,1,0.01,-0.4,0,src,",
      "rebar,Rebar,abc,7850,300,0,60,0.01,0,0,src,", // line 3: a1a3 not a number, waste 60 > 50
      "glulam,Glulam,0.5,,1500,0,1,0.03,0,1.637,src,", // line 4: density empty
      "steel-plate,Plate again,2.46,7850,300,0,1,0.01,0,0,src,", // line 5: duplicate
      "Bad Id,X,1,1000,0,0,0,0,0,0,src,", // line 6: id pattern
    ].join("\n");
    const problems = problemsOf(() => parseFactorCsv(text));
    expect(problems).toContainEqual(expect.objectContaining({ line: 3, column: "a1a3_kgco2e_per_kg" }));
    expect(problems).toContainEqual(expect.objectContaining({ line: 3, column: "waste_rate_pct" }));
    expect(problems).toContainEqual(expect.objectContaining({ line: 4, column: "density_kg_per_m3", message: "empty (a value is required)" }));
    expect(problems).toContainEqual(expect.objectContaining({ line: 5, column: "material" }));
    expect(problems).toContainEqual(expect.objectContaining({ line: 6, column: "material" }));
    expect(problems.filter((p) => p.line === 2)).toEqual([]);
    expect(problems.find((p) => p.line === 3 && p.column === "waste_rate_pct")?.message).toMatch(/60 \(expected a number from 0 to 50 %\)/);
    expect(problems.find((p) => p.line === 5)?.message).toMatch(/duplicate steel-plate \(first on line 2/);
  });

  it("rejects a missing or unexpected column on line 1", () => {
    const text = header.replace(",notes", ",remarks") + "\nsteel-plate,Plate,2.46,7850,300,0,1,0.01,-0.4,0,src,x\n";
    const problems = problemsOf(() => parseFactorCsv(text));
    expect(problems).toContainEqual(expect.objectContaining({ line: 1, column: "notes" }));
    expect(problems).toContainEqual(expect.objectContaining({ line: 1, column: "remarks" }));
  });

  it("round-trips export → import unchanged, quotes and commas included", () => {
    const rows = defaultFactorRows();
    rows[0] = { ...rows[0]!, notes: 'a "quoted", comma note', a1a3KgCO2ePerKg: 0.1 + 0.2 };
    expect(parseFactorCsv(factorRowsToCsv(rows))).toEqual(rows);
  });
});

describe("parseRateCsv", () => {
  it("reads the bundled rates: one per COST_ITEMS id, in its unit", () => {
    const rows = defaultRateRows();
    expect(rows.map((r) => r.item).sort()).toEqual(COST_ITEMS.map((c) => c.id).sort());
    for (const row of rows) expect(row.unit).toBe(COST_ITEMS.find((c) => c.id === row.item)?.unit);
  });

  it("reports a unit that does not match the item, a low above the rate and an unknown item", () => {
    const text = [
      "item,label,unit,rate,low,high,basis,source,notes",
      "cable,Cable,m2,18000,13000,26000,b,s,", // line 2: unit
      "rebar,Rebar,t,1800,1900,2400,b,s,", // line 3: low > rate
      "gold-leaf,Gold,m2,1,1,1,b,s,", // line 4: unknown item
    ].join("\n");
    const problems = problemsOf(() => parseRateCsv(text));
    expect(problems).toContainEqual(expect.objectContaining({ line: 2, column: "unit", message: expect.stringMatching(/expected "t"/) }));
    expect(problems).toContainEqual(expect.objectContaining({ line: 3, column: "low" }));
    expect(problems).toContainEqual(expect.objectContaining({ line: 4, column: "item" }));
  });

  it("round-trips export → import unchanged", () => {
    const rows = defaultRateRows();
    expect(parseRateCsv(rateRowsToCsv(rows))).toEqual(rows);
  });
});
