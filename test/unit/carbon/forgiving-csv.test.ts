import { describe, it, expect } from "vitest";
import { readFactorFile, defaultFactorRows, factorRowsToCsv, detectDelimiter, normaliseHeader } from "../../../src/carbon";
import { CsvError } from "../../../src/kernel/csv-table";

const current = defaultFactorRows();
const plate = current.find((r) => r.material === "steel-plate")!;

function problemsOf(run: () => unknown): string[] {
  try {
    run();
  } catch (error) {
    if (error instanceof CsvError) return error.problems.map((p) => `line ${p.line}, column ${p.column}: ${p.message}`);
    throw error;
  }
  throw new Error("expected a CsvError");
}

describe("detectDelimiter and normaliseHeader", () => {
  it("finds comma, semicolon and tab from the header line, ignoring quoted text", () => {
    expect(detectDelimiter("a,b,c\n1,2,3")).toBe(",");
    expect(detectDelimiter('material;"A1, A3";x\n')).toBe(";");
    expect(detectDelimiter("a\tb\n")).toBe("\t");
  });
  it("drops units in brackets, case, dashes and underscores", () => {
    expect(normaliseHeader("A1–A3 (kgCO2e/kg)")).toBe("a1 a3");
    expect(normaliseHeader("waste_rate_pct")).toBe("waste rate pct");
    expect(normaliseHeader("Waste %")).toBe("waste pct");
  });
});

describe("readFactorFile", () => {
  it("reads the table's own export back as a whole table, with no notes", () => {
    const read = readFactorFile(factorRowsToCsv(current), current, "f.csv");
    expect(read.partial).toBe(false);
    expect(read.rows).toEqual(current);
    expect(read.notes).toEqual([]);
  });

  it("a semicolon file with decimal commas and header variants is a partial update, and says what it mapped", () => {
    const text = "Material ID;A1-A3 (kgCO2e/kg);Wastage (%);Unit\nsteel-plate;2,1;3;kg\nrebar;0,73;;kg\n";
    const read = readFactorFile(text, current, "epd.csv");
    expect(read.partial).toBe(true);
    expect(read.rows.map((r) => [r.material, r.a1a3KgCO2ePerKg, r.wasteRatePct])).toEqual([
      ["steel-plate", 2.1, 3],
      ["rebar", 0.73, current.find((r) => r.material === "rebar")?.wasteRatePct],
    ]);
    expect(read.rows[0]).toEqual({ ...plate, a1a3KgCO2ePerKg: 2.1, wasteRatePct: 3 });
    expect(read.notes).toContain("semicolon-separated file");
    expect(read.notes).toContain('column "A1-A3 (kgCO2e/kg)" read as a1a3_kgco2e_per_kg');
    expect(read.notes).toContain('column "Wastage (%)" read as waste_rate_pct');
    expect(read.notes).toContain('column "Unit" not in the table: ignored');
    expect(read.notes).toContain("decimal commas read as decimal points");
    expect(read.notes.some((n) => n.startsWith("partial update: columns label, density_kg_per_m3"))).toBe(true);
  });

  it("names every problem by line and by the column as the file spells it; nothing is returned", () => {
    const text = "material;A1–A3;waste\nsteel-plate;x;3\nrebar;1,5;90\nno-such-row;1;1\nsteel-plate;1;1\n";
    expect(problemsOf(() => readFactorFile(text, current, "bad.csv"))).toEqual([
      'line 2, column A1–A3: "x" is not a number',
      "line 3, column waste: 90 (expected a number from 0 to 50 %)",
      'line 4, column material: "no-such-row" is not in the table, and a new row needs every column (missing: label, density_kg_per_m3, transport_km_road, transport_km_sea, end_of_life_kgco2e_per_kg, module_d_kgco2e_per_kg, biogenic_kgco2e_per_kg, source, notes)',
      "line 5, column material: duplicate steel-plate (first on line 2; expected each once)",
    ]);
  });

  it("refuses a file with no key column, and one with two columns for the same field", () => {
    expect(problemsOf(() => readFactorFile("A1-A3\n2\n", current, "f.csv"))[0]).toMatch(/^line 1, column material: missing column: each row needs its material/);
    expect(problemsOf(() => readFactorFile("material,A1-A3,a1a3\nrebar,1,2\n", current, "f.csv"))).toEqual(['line 1, column a1a3: a second column for a1a3_kgco2e_per_kg (the first is "A1-A3"; expected each once)']);
  });
});
