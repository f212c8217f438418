import { describe, it, expect } from "vitest";
import { paretoFront, crossovers, describeCrossovers, spansOf, compareStudies, comparisonTable, comparisonRows } from "../../../src/comparison";
import { assumptionsRecord, defaultStudy, setIn } from "../../../src/study";
import { defaultCatalogue } from "../../../src/catalogue/default-catalogue";
import { evaluateStudy } from "../../../src/pipeline";

describe("paretoFront", () => {
  it("keeps the points no other beats on both", () => {
    expect(paretoFront([{ id: "a", x: 1, y: 2 }, { id: "b", x: 2, y: 1 }, { id: "c", x: 2, y: 2 }])).toEqual(["a", "b"]);
  });
  it("keeps ties and ignores NaN", () => {
    expect(paretoFront([{ id: "a", x: 1, y: 1 }, { id: "b", x: 1, y: 1 }, { id: "n", x: Number.NaN, y: 0 }])).toEqual(["a", "b"]);
  });
  it("is empty for no points", () => expect(paretoFront([])).toEqual([]));
});

describe("crossovers", () => {
  const rows = [
    { spanM: 40, values: { a: 1, b: 2 } },
    { spanM: 50, values: { a: 3, b: 2 } },
    { spanM: 60, values: { a: 3, b: Number.NaN } },
  ];
  it("finds each change of the lowest scheme, with the interval it lies in", () => {
    expect(crossovers(rows)).toEqual([
      { fromSpanM: 40, toSpanM: 50, from: "a", to: "b" },
      { fromSpanM: 50, toSpanM: 60, from: "b", to: "a" },
    ]);
  });
  it("starts the sentence with a capital when the name is written in running text (audit8: 'then Mast-supported cable net')", () => {
    expect(describeCrossovers(rows, "the lightest", (id) => `the ${id} roof`)).toBe(
      "The a roof is the lightest from 40 m; then the b roof from 50 m (the change lies between 40 and 50 m); then the a roof from 60 m (the change lies between 50 and 60 m), up to 60 m.",
    );
    expect(describeCrossovers(rows.slice(0, 1), "the lightest", (id) => `the ${id} roof`)).toBe("The a roof is the lightest across the whole range (40–40 m).");
  });
  it("says it in words", () => {
    expect(describeCrossovers(rows, "the lightest", (id) => id.toUpperCase())).toBe(
      "A is the lightest from 40 m; then B from 50 m (the change lies between 40 and 50 m); then A from 60 m (the change lies between 50 and 60 m), up to 60 m.",
    );
  });
});

describe("spansOf", () => {
  it("gives 37 spans for 40–400 m in steps of 10 m", () => {
    const spans = spansOf({ fromM: 40, toM: 400, stepM: 10 });
    expect(spans).toHaveLength(37);
    expect(spans[36]).toBe(400);
  });
  it("refuses a zero step", () => expect(() => spansOf({ fromM: 40, toM: 400, stepM: 0 })).toThrow(/step/));
});

describe("assumptionsRecord", () => {
  it("marks nothing changed for the defaults, and exactly the edited input otherwise", () => {
    expect(assumptionsRecord(defaultStudy()).filter((r) => r.changed)).toEqual([]);
    const edited = setIn(defaultStudy(), ["brief", "eavesHeightM"], 15);
    const changed = assumptionsRecord(edited).filter((r) => r.changed);
    expect(changed.map((r) => r.path)).toEqual(["brief.eavesHeightM"]);
    expect(changed[0]?.default).toBe("12");
  });
  it("a risk range follows an edit of its input (issue 10: it used to be left behind at the old value)", () => {
    // Ranges are stored as factors on the study's value, so editing snow changes no risk row.
    const edited = setIn(defaultStudy(), ["brief", "snowGroundKPa"], 1.2);
    const changed = assumptionsRecord(edited).filter((r) => r.changed);
    expect(changed.map((r) => r.path)).toEqual(["brief.snowGroundKPa"]);
  });
  it("lists every factor and rate row", () => {
    const study = defaultStudy();
    const record = assumptionsRecord(study);
    expect(record.filter((r) => r.group === "carbon factor").length).toBe(study.carbon.factors.length * 7);
    expect(record.filter((r) => r.group === "rate").length).toBe(study.cost.rates.length * 3);
  });
});

describe("compareStudies", () => {
  it("lists the changed input and what it alone does", () => {
    const a = defaultStudy();
    const b = setIn(a, ["brief", "snowGroundKPa"], 2.0);
    const comparison = compareStudies(a, b, defaultCatalogue());
    expect(comparison.changes.map((c) => c.key)).toEqual(["brief.snowGroundKPa"]);
    const effect = comparison.changes[0]?.effect ?? [];
    expect(effect.length).toBeGreaterThan(0);
    // More snow never makes a feasible scheme lighter.
    for (const d of effect) {
      if (d.a.selfWeightKgPerM2 !== null && d.b.selfWeightKgPerM2 !== null) expect(d.b.selfWeightKgPerM2).toBeGreaterThanOrEqual(d.a.selfWeightKgPerM2 - 1e-9);
    }
  });
});

describe("comparisonTable", () => {
  it("has one row per enabled scheme with every column", () => {
    const evaluation = evaluateStudy(defaultStudy(), defaultCatalogue());
    const { header, rows } = comparisonRows(comparisonTable(evaluation.results));
    expect(rows).toHaveLength(evaluation.results.length);
    for (const row of rows) expect(row).toHaveLength(header.length);
  });
  it("heads the cost columns with the rates' currency, where the rows have one", () => {
    const evaluation = evaluateStudy(defaultStudy(), defaultCatalogue());
    const table = comparisonTable(evaluation.results);
    const { header } = comparisonRows(table);
    expect(header).toContain("Cost (million EUR)");
    expect(header).toContain("Cost (EUR/m² floor)");
    expect(comparisonRows(table.map((r) => ({ ...r, currency: null }))).header).toContain("Cost (million)");
  });
  it("writes none of a material as a dash and a small amount as a number", () => {
    const evaluation = evaluateStudy(defaultStudy(), defaultCatalogue());
    const { header, rows } = comparisonRows(comparisonTable(evaluation.results));
    const [scheme, concrete, steel] = ["Scheme", "Concrete (t)", "Steel (t)"].map((h) => header.indexOf(h));
    const shell = rows.find((r) => r[scheme!] === "Thin concrete shell")!;
    expect(shell[steel!]).toBe("–");
    expect(shell[concrete!]).toMatch(/^[\d,]+$/);
    const geodesic = rows.find((r) => r[scheme!] === "Geodesic steel dome")!;
    expect(geodesic[concrete!]).toBe("–");
  });
});
