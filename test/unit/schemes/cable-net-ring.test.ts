// The cable net's mast ring is chosen on 3D designs between its samples 0.6 and 0.65 of the radius,
// then stepped on past the better while each step is lower by more than the 2 % band (refinedInFull
// `beyond`, src/schemes/cable-net/declaration.ts). On the demo study at 60 m the samples alone kept
// 0.6 where 0.55 is 13 % lower in carbon (137.3 against 119.0 kgCO2e/m² of floor, measured 5 Dec); the mast
// height, chosen on 0.6, is then stepped again on 0.55 (0.15 → 0.16, 115.3).
import { describe, it, expect } from "vitest";
import { readFileSync } from "node:fs";
import { studyFromJson } from "../../../src/study";
import { defaultCatalogue } from "../../../src/catalogue/default-catalogue";
import { briefAtSpan, designAtBestProportions } from "../../../src/pipeline";
import { cableNet } from "../../../src/schemes/cable-net";

/** The demo study's net at a span, searched; and the same net at proportions pinned. */
function demoNetAt(spanM: number) {
  const loaded = studyFromJson(readFileSync("data/demo-study.json", "utf8"));
  if (!loaded.ok) throw new Error("the demo study does not load");
  const study = loaded.study;
  const brief = briefAtSpan(study.brief, spanM);
  const setting = study.schemes[cableNet.id];
  const searched = designAtBestProportions(cableNet, brief, setting, study, defaultCatalogue());
  const pinnedAt = (options: { masts: number; mastHeightRatio: number; mastRingRatio: number }) =>
    designAtBestProportions(cableNet, brief, { ...setting, options: { ...(setting?.options ?? {}), ...options }, pinned: ["masts", "mastHeightRatio", "mastRingRatio"] }, study, defaultCatalogue());
  return { searched, pinnedAt };
}

describe("cable net: the mast ring beyond its samples", () => {
  it("takes a ring smaller than both samples where that is lower by more than the band (demo study, 60 m)", () => {
    const { searched, pinnedAt } = demoNetAt(60);
    expect(searched.design.status).toBe("feasible");
    const chosen = searched.proportions.proportions;
    expect(chosen.mastRingRatio).toBe(0.55);
    // and the mast height stepped again at that ring: 0.16 (115.3) where 0.15 (119.0) was chosen on 0.6 (measured 5 Dec)
    expect(chosen.mastHeightRatio).toBe(0.16);
    // the same net on the better sample's ring, 0.6: higher by more than the 2 % band
    const onSample = pinnedAt({ masts: chosen.masts as number, mastHeightRatio: chosen.mastHeightRatio as number, mastRingRatio: 0.6 });
    expect(onSample.design.status).toBe("feasible");
    expect(searched.proportions.value).toBeLessThan(0.98 * onSample.proportions.value);
  });
  // The ring's samples carry the mast height (× (1 − ring) ÷ (1 − ring before): the outer radial cables keep their
  // slope). Chosen one at a time, the demo's net at 100 m kept ring 0.65 at height 0.13 (118.8 kgCO2e/m² of floor),
  // where ring 0.6 at 0.15 is 111.3 (measured 5 Dec; a search of every pair around it found nothing lower at 6 masts).
  it("moves the mast height with the ring, along the valley of equally sloped outer cables (demo study, 100 m)", () => {
    const { searched, pinnedAt } = demoNetAt(100);
    const chosen = searched.proportions.proportions;
    expect([chosen.masts, chosen.mastRingRatio, chosen.mastHeightRatio]).toEqual([6, 0.6, 0.15]);
    // the pair the one-at-a-time rule kept: higher by more than the 2 % band
    const kept = pinnedAt({ masts: 6, mastHeightRatio: 0.13, mastRingRatio: 0.65 });
    expect(kept.design.status).toBe("feasible");
    expect(searched.proportions.value).toBeLessThan(0.98 * kept.proportions.value);
  });
});
