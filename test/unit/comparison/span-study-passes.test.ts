import { describe, expect, it } from "vitest";
import { defaultStudy } from "../../../src/study";
import { defaultCatalogue } from "../../../src/catalogue/default-catalogue";
import { runSpanStudy, schemesDesignedAgain, screeningGroups } from "../../../src/comparison";
import { briefAtSpan, designAtBestProportions, evaluateStudy } from "../../../src/pipeline";
import { SCHEMES } from "../../../src/schemes";

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

  it("the second pass starts from the first pass's search: the same designs, without searching again", () => {
    const ids = ["cable-dome", "truss-roof"] as const;
    const spans = [90, 160];
    const screening = runSpanStudy(study, catalogue, spans, { schemeIds: ids, depth: "screening" });
    // only the scheme designed again keeps its search's choice
    expect(screening.filter((p) => p.screened).map((p) => `${p.id}@${p.spanM}`)).toEqual(["cable-dome@90", "cable-dome@160"]);
    const again = runSpanStudy(study, catalogue, spans, { schemeIds: ["cable-dome"], screenedPoints: screening });
    const searchedAgain = runSpanStudy(study, catalogue, spans, { schemeIds: ["cable-dome"] });
    expect(again).toEqual(searchedAgain);
    // it is the screening points that set the start: another hoop count there gives another design
    const otherHoops = screening.map((p) => (p.screened ? { ...p, screened: { ...p.screened, options: { ...p.screened.options, hoops: (p.screened.options.hoops as number) + 1 } } } : p));
    const fromOther = runSpanStudy(study, catalogue, spans, { schemeIds: ["cable-dome"], screenedPoints: otherHoops });
    expect(fromOther.map((p) => p.selfWeightKgPerM2)).not.toEqual(again.map((p) => p.selfWeightKgPerM2));

    // and the search is skipped: counted on the scheme's designs at 160 m
    const dome = SCHEMES.find((m) => m.id === "cable-dome");
    if (!dome) throw new Error("no cable dome");
    let designs = 0;
    const counted = { ...dome, design: (...args: Parameters<typeof dome.design>) => (designs++, dome.design(...args)) };
    const brief = briefAtSpan(study.brief, 160);
    const first = designAtBestProportions(counted, brief, study.schemes["cable-dome"], study, catalogue, "screening");
    const searchedDesigns = designs;
    designs = 0;
    const fromScreened = designAtBestProportions(counted, brief, study.schemes["cable-dome"], study, catalogue, "full", first.screened);
    const fullDesigns = designs;
    designs = 0;
    const whole = designAtBestProportions(counted, brief, study.schemes["cable-dome"], study, catalogue, "full");
    expect(designs).toBe(searchedDesigns + fullDesigns);
    expect(fullDesigns).toBeLessThan(searchedDesigns);
    expect(fromScreened.proportions).toEqual(whole.proportions);
    expect(fromScreened.design.totalMassKg).toBe(whole.design.totalMassKg);
  });

  it("groups the schemes of the first pass by the meshes they share, and the groups' points are the whole pass's", () => {
    // the two lattice domes cut the same geodesic spheres: one worker takes both
    expect(screeningGroups(study)).toEqual([["cable-dome", "cable-net", "truss-roof", "concrete-shell"], ["geodesic-dome", "timber-dome"]]);
    const off = { ...study, schemes: { ...study.schemes, "timber-dome": { ...study.schemes["timber-dome"], enabled: false }, "truss-roof": { ...study.schemes["truss-roof"], enabled: false } } };
    expect(screeningGroups(off)).toEqual([["cable-dome", "cable-net", "concrete-shell"], ["geodesic-dome"]]);
    const lattices = { ...study, schemes: Object.fromEntries(Object.entries(study.schemes).map(([id, s]) => [id, { ...s, enabled: id === "timber-dome" }])) as typeof study.schemes };
    expect(screeningGroups(lattices)).toEqual([["timber-dome"]]);
    // a scheme's point depends on nothing but the study, the span and the scheme: designed in groups, the same points
    const spans = [70];
    const whole = runSpanStudy(study, catalogue, spans, { depth: "screening" });
    const grouped = screeningGroups(study).flatMap((schemeIds) => runSpanStudy(study, catalogue, spans, { depth: "screening", schemeIds }));
    expect(grouped.length).toBe(whole.length);
    for (const p of whole) expect(grouped.find((q) => q.id === p.id)).toEqual(p);
  });
});
