import { describe, expect, it } from "vitest";
import { defaultStudy } from "../../../src/study";
import { defaultCatalogue } from "../../../src/catalogue/default-catalogue";
import { runSpanStudy, schemesDesignedAgain } from "../../../src/comparison";
import { evaluateStudy } from "../../../src/pipeline";

// The span study's two passes (issue 13: the tension roofs designed by the 3D analysis by default;
// the span study shows every scheme by its screening design first, then designs again those whose
// full design differs). The second pass must give what the compare page gives at that span.
describe("span study passes", () => {
  const catalogue = defaultCatalogue();
  const study = defaultStudy();

  it("designs again exactly the tension roofs while they use the 3D analysis, none with the closed form chosen", () => {
    expect(schemesDesignedAgain(study).sort()).toEqual(["cable-dome", "cable-net"]);
    const closed = { ...study, schemes: { ...study.schemes, "cable-net": { ...study.schemes["cable-net"], options: { ...study.schemes["cable-net"]?.options, analysis: "closed-form" } } } };
    expect(schemesDesignedAgain(closed)).toEqual(["cable-dome"]);
    // pinned to the 3D analysis, the search screens nothing differently either
    const pinned = { ...study, schemes: { ...study.schemes, "cable-dome": { ...study.schemes["cable-dome"], pinned: ["analysis"] } } };
    expect(schemesDesignedAgain(pinned)).toEqual(["cable-net"]);
  });

  it("screening points are the closed-form designs, full points the compare page's 3D designs", () => {
    const ids = ["cable-dome", "cable-net"] as const;
    const screening = runSpanStudy(study, catalogue, [160], { schemeIds: ids, depth: "screening" });
    const full = runSpanStudy(study, catalogue, [160], { schemeIds: ids });
    const compare = evaluateStudy(study, catalogue, { spanM: 160, schemeIds: ids }).results;
    for (const id of ids) {
      const s = screening.find((p) => p.id === id);
      const f = full.find((p) => p.id === id);
      const c = compare.find((r) => r.id === id);
      expect(f?.carbonKgCO2ePerM2Floor).toBe(c?.figures.carbonKgCO2ePerM2Floor);
      // the 3D analysis finds other prestress and sizes: the two passes must not coincide
      expect(s?.carbonKgCO2ePerM2Floor).not.toBe(f?.carbonKgCO2ePerM2Floor);
      expect(c?.design.analysis).toBeDefined();
    }
  });
});
