// Issue 10: rebase range, rows missing from a table (carbon and cost apart, every gap named),
// spreadsheet-safe CSV cells, decimal-only numbers, unknown scheme ids.
import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { csvCell, readCsvText, formatCsv, parseDecimal, parseCsvTable, CsvError } from "../../src/catalogue";
import { defaultFactorRows, factorRowsToCsv, parseFactorCsv, checkRowEdit, FactorRowSchema, mergeRows, importedSetName } from "../../src/carbon";
import { defaultRateRows, parseRateCsv, rateRowsToCsv, rebaseRateRows, RebaseRangeError, RateTableSchema, MAX_RATE, DEFAULT_RATE_SET_NAME } from "../../src/cost";
import { chartCaption } from "../../src/charts";
import { assumptionsRecord } from "../../src/study/assumptions";
import { evaluateStudy, tableGaps, describeGap } from "../../src/pipeline";
import { defaultCatalogue } from "../../src/catalogue/default-catalogue";
import { defaultStudy, validateStudy } from "../../src/study";
import * as v from "valibot";

describe("rebaseRateRows refuses a rebase that leaves the allowed range", () => {
  it("× 1e6 on the default table is refused, naming both index fields; nothing is returned", () => {
    const rows = defaultRateRows();
    let caught: unknown;
    try {
      rebaseRateRows(rows, 0.001, 1000);
    } catch (error) {
      caught = error;
    }
    expect(caught).toBeInstanceOf(RebaseRangeError);
    const message = (caught as Error).message;
    expect(message).toMatch(/fromIndex \(the index at the rates' price base\)/);
    expect(message).toMatch(/toIndex \(the index at the new date\)/);
    expect(message).toMatch(new RegExp(`above the largest rate allowed \\(${MAX_RATE} per unit\\)`));
  });
  it("any accepted rebase gives a table the rate schema accepts (so the next load keeps it)", () => {
    const rows = defaultRateRows();
    fc.assert(
      fc.property(fc.double({ min: 0.001, max: 1e6, noNaN: true }), fc.double({ min: 0.001, max: 1e6, noNaN: true }), (from, to) => {
        let rebased;
        try {
          rebased = rebaseRateRows(rows, from, to);
        } catch (error) {
          expect(error).toBeInstanceOf(RebaseRangeError);
          return;
        }
        expect(v.safeParse(RateTableSchema, rebased).success).toBe(true);
      }),
      { numRuns: 300 },
    );
  });
});

describe("rows missing from the tables", () => {
  const catalogue = defaultCatalogue();
  it("a one-row factor table blanks carbon only: cost is still assessed, and every missing material is named", () => {
    const study = defaultStudy();
    study.carbon.factors = study.carbon.factors.slice(0, 1);
    const evaluation = evaluateStudy(study, catalogue);
    for (const r of evaluation.results) {
      if (r.design.takeoff.length === 0) continue;
      expect(r.carbon).toBeNull();
      expect(r.cost).not.toBeNull();
      expect(r.error).toMatch(/no carbon factor for material "/);
    }
    const gaps = tableGaps(evaluation.results, { factors: study.carbon.factors, rates: study.cost.rates });
    expect(gaps.every((g) => g.table === "factors")).toBe(true);
    const plate = gaps.find((g) => g.key === "steel-plate");
    expect(plate?.schemes.length).toBeGreaterThan(1);
    expect(describeGap(plate as NonNullable<typeof plate>)).toMatch(/^no carbon factor for material "steel-plate" \(needed by .*Steel truss roof/);
  });
  it("a rate table without an item blanks cost only for the schemes that need it", () => {
    const study = defaultStudy();
    study.cost.rates = study.cost.rates.filter((r) => r.item !== "cable");
    const evaluation = evaluateStudy(study, catalogue);
    const net = evaluation.results.find((r) => r.id === "cable-net");
    const truss = evaluation.results.find((r) => r.id === "truss-roof");
    expect(net?.cost).toBeNull();
    expect(net?.carbon).not.toBeNull();
    expect(net?.error).toMatch(/no rate for item "cable"/);
    expect(truss?.cost).not.toBeNull();
    expect(tableGaps(evaluation.results, { rates: study.cost.rates })).toEqual([{ table: "rates", key: "cable", schemes: expect.arrayContaining(["Mast-supported cable net", "Cable dome"]) }]);
  });
});

describe("CSV cells a spreadsheet would run as formulas", () => {
  it("text beginning with = + - @ is prefixed with a quote; numbers, negative ones too, are not", () => {
    expect(csvCell("=HYPERLINK(\"x\")")).toBe("'=HYPERLINK(\"x\")");
    expect(csvCell("+1+1")).toBe("'+1+1");
    expect(csvCell("-cmd")).toBe("'-cmd");
    expect(csvCell("@SUM(A1)")).toBe("'@SUM(A1)");
    expect(csvCell(-0.34)).toBe("-0.34");
    expect(csvCell("-0.34")).toBe("-0.34");
    expect(csvCell("1e-3")).toBe("1e-3");
    expect(csvCell("steel")).toBe("steel");
    expect(formatCsv([{ a: "=1+2", b: -0.4 }], ["a", "b"])).toBe("a,b\n'=1+2,-0.4");
  });
  it("any text survives write and read back unchanged", () => {
    fc.assert(
      fc.property(fc.string(), (text) => {
        expect(readCsvText(csvCell(text))).toBe(text);
      }),
      { numRuns: 2000 },
    );
    for (const text of ["'=x", "''=x", "'hello", "=", "-"]) expect(readCsvText(csvCell(text))).toBe(text);
  });
  it("a factor table with formula-like labels and negative module D exports neutralised and re-imports unchanged", () => {
    const rows = defaultFactorRows();
    rows[0] = { ...rows[0]!, label: "=cmd|' /C calc'!A0", notes: "@risk", source: "-see EPD", moduleDKgCO2ePerKg: -0.34 };
    const csv = factorRowsToCsv(rows);
    const line = csv.split("\n")[1] ?? "";
    expect(line).toMatch(/,'=cmd/);
    expect(line).toMatch(/,-0\.34,/);
    expect(line).toMatch(/,'-see EPD,'@risk$/);
    expect(parseFactorCsv(csv)).toEqual(rows);
    const rates = defaultRateRows();
    rates[0] = { ...rates[0]!, basis: "+supply" };
    expect(rateRowsToCsv(rates)).toMatch(/'\+supply/);
    expect(parseRateCsv(rateRowsToCsv(rates))).toEqual(rates);
  });
});

describe("decimal numbers only", () => {
  it("parseDecimal refuses hexadecimal, binary, octal, Infinity and empty text", () => {
    for (const text of ["0x10", "0b1", "0o7", "Infinity", "", " ", "1_000", "1,5"]) expect(parseDecimal(text)).toBeNull();
    expect(parseDecimal(" -0.34 ")).toBe(-0.34);
    expect(parseDecimal("1.5e3")).toBe(1500);
    expect(parseDecimal(".5")).toBe(0.5);
  });
  it("a table cell, a factor CSV and a catalogue CSV refuse 0x10, naming the column", () => {
    const plate = defaultFactorRows().find((r) => r.material === "steel-plate")!;
    const edit = checkRowEdit(FactorRowSchema, plate, "a1a3KgCO2ePerKg", "0x10", "number");
    expect(edit.ok).toBe(false);
    expect(!edit.ok && edit.message).toMatch(/"0x10" is not a decimal number/);
    const csv = factorRowsToCsv([plate]).replace(/,2\.46,/, ",0x10,");
    expect(() => parseFactorCsv(csv)).toThrow(/line 2, column a1a3_kgco2e_per_kg: "0x10"/);
    expect(() => parseCsvTable("d_mm\n0x10\n", [{ name: "d_mm", kind: "number" }], "t.csv")).toThrow(CsvError);
  });
  it("a CSV error message lists at most 20 problems and says how many more", () => {
    const text = `d_mm\n${Array.from({ length: 500 }, () => "x").join("\n")}\n`;
    expect(() => parseCsvTable(text, [{ name: "d_mm", kind: "number" }], "t.csv")).toThrow(/; … and 480 more$/);
  });
});

describe("study schema: unknown scheme id", () => {
  it("is refused with its field path and the known ids", () => {
    const study = { ...defaultStudy(), schemes: { ...defaultStudy().schemes, "cable-domes": { enabled: true, options: {} } } };
    const result = validateStudy(study);
    expect(result.ok).toBe(false);
    expect(!result.ok && result.problems).toContainEqual({ path: "schemes.cable-domes", message: expect.stringMatching(/^unknown scheme "cable-domes" \(expected one of cable-dome, /) });
  });
});

describe("partial imports and the name of a table set", () => {
  it("mergeRows keeps rows the file lacks, replaces and adds by key, and lists every change", () => {
    const current = defaultFactorRows();
    const plate = { ...current.find((r) => r.material === "steel-plate")!, a1a3KgCO2ePerKg: 3 };
    const extra = { ...plate, material: "steel-s460", label: "S460 plate" };
    const merge = mergeRows(current, [plate, extra], "material");
    expect(merge.rows).toHaveLength(current.length + 1);
    expect(merge.added).toEqual(["steel-s460"]);
    expect(merge.changed).toEqual([{ key: "steel-plate", fields: [{ field: "a1a3KgCO2ePerKg", from: 2.46, to: 3 }] }]);
    expect(merge.rows.find((r) => r.material === "rebar")).toEqual(current.find((r) => r.material === "rebar"));
  });
  it("importedSetName names the file and date and stays within the schema's 120 characters", () => {
    expect(importedSetName("epds.csv", "2026-12-02")).toBe("epds.csv, imported 2026-12-02");
    expect(importedSetName("plate.csv", "2026-12-02", "spanbook defaults")).toBe("plate.csv, merged 2026-12-02 into spanbook defaults");
    expect(importedSetName("x".repeat(500), "2026-12-02", "y".repeat(500)).length).toBeLessThanOrEqual(120);
  });
  it("a named factor and rate set shows in the chart caption and the assumptions record", () => {
    const study = defaultStudy();
    expect(chartCaption(study)).not.toMatch(/rates:/);
    study.carbon.settings.factorSetName = "epds.csv, imported 2026-12-02";
    study.cost.onCosts.rateSetName = "supplier.csv, imported 2026-12-02";
    expect(chartCaption(study)).toMatch(/carbon factors: epds\.csv, imported 2026-12-02 · rates: supplier\.csv, imported 2026-12-02/);
    const record = assumptionsRecord(study);
    expect(record.find((r) => r.path === "carbon.settings.factorSetName")).toMatchObject({ value: "epds.csv, imported 2026-12-02", changed: true });
    expect(record.find((r) => r.path === "cost.onCosts.rateSetName")).toMatchObject({ value: "supplier.csv, imported 2026-12-02", changed: true });
  });
  it("a study file without a rate set name opens with the bundled name", () => {
    const study = defaultStudy() as unknown as { cost: { onCosts: Record<string, unknown> } };
    delete study.cost.onCosts.rateSetName;
    const result = validateStudy(study);
    expect(result.ok && result.study.cost.onCosts.rateSetName).toBe(DEFAULT_RATE_SET_NAME);
  });
});
