import { describe, it, expect } from "vitest";
import { defaultStudy } from "../../../src/study";
import { defaultCatalogue } from "../../../src/catalogue/default-catalogue";
import { evaluateStudy } from "../../../src/pipeline";
import { COMPARISON_COLUMNS, comparisonTable, runSpanStudy } from "../../../src/comparison";
import { MATERIAL_KINDS, materialInfo } from "../../../src/materials";
import { expectRelClose } from "../../helpers/close";

const catalogue = defaultCatalogue();
const evaluation = evaluateStudy(defaultStudy(), catalogue);

describe("the figures of each scheme (the one result model)", () => {
  it("tonnages by material kind add up to the take-off rows that name a material", () => {
    for (const r of evaluation.results) {
      const named = r.design.takeoff.filter((row) => row.material !== null && materialInfo(row.material) !== undefined).reduce((s, row) => s + row.massKg, 0);
      const byKind = Object.values(r.figures.massByKindKg).reduce((s, m) => s + m, 0);
      expectRelClose(byKind, named, 1e-12);
    }
  });
  it("the comparison table has one tonnage column per material kind", () => {
    for (const k of MATERIAL_KINDS) expect(COMPARISON_COLUMNS.some((c) => c.heading === `${k.label} (t)`)).toBe(true);
    const rows = comparisonTable(evaluation.results);
    evaluation.results.forEach((r, i) => {
      for (const k of MATERIAL_KINDS) expect(rows[i]?.[`${k.kind}Tonnes`]).toBe(r.figures.massByKindKg[k.kind] / 1000);
    });
  });
  it("the span study at the brief's span gives the figures of the evaluation", () => {
    const spanM = defaultStudy().brief.spanM;
    const seen: number[] = [];
    const points = runSpanStudy(defaultStudy(), catalogue, [spanM], { onResult: (s, result) => seen.push(s, result.figures.selfWeightKgPerM2) });
    expect(points.map((p) => p.id)).toEqual(evaluation.results.map((r) => r.id));
    evaluation.results.forEach((r, i) => {
      if (r.figures.feasible) expect(points[i]?.selfWeightKgPerM2).toBe(r.figures.selfWeightKgPerM2);
      expect(seen[2 * i + 1]).toBe(r.figures.selfWeightKgPerM2);
    });
  });
});
