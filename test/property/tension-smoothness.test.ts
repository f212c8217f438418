// Issue 12 item 5: along 40–400 m in 5 m steps no metric of a feasible, in-range scheme changes by
// more than 15 % between neighbouring spans. Checked here even where a scheme names a regime change (stricter than
// the span study's test).
// The brief keeps the default rise ÷ span at every span.
import { describe, expect, it } from "vitest";
import { DEFAULT_BRIEF } from "../../src/brief";
import { defaultCatalogue } from "../../src/catalogue/default-catalogue";
import { cableNet } from "../../src/schemes/cable-net";
import { cableDome } from "../../src/schemes/cable-dome";
import type { Design, SchemeModel } from "../../src/schemes/types";
import { readFileSync } from "node:fs";
import { defaultStudy, studyFromJson, type Study } from "../../src/study";
import { briefAtSpan, designAtBestProportions } from "../../src/pipeline";

const catalogue = defaultCatalogue();
const spans = Array.from({ length: 73 }, (_, i) => 40 + 5 * i);
const metrics: [string, (d: Design) => number][] = [
  ["self-weight per m² of plan", (d) => d.selfWeightKgPerM2],
  ["usable floor ÷ plan", (d) => d.usableFloorM2 / d.planAreaM2],
  ["total mass per m² of plan", (d) => d.totalMassKg / d.planAreaM2],
];

function jumps(model: SchemeModel, options: Record<string, string> = {}): string[] {
  return jumpsOf(spans, spans.map((spanM) => model.design({ ...DEFAULT_BRIEF, spanM, riseM: (spanM * DEFAULT_BRIEF.riseM) / DEFAULT_BRIEF.spanM }, { ...model.defaults, ...options }, catalogue)));
}

function jumpsOf(at: readonly number[], designs: readonly Design[]): string[] {
  const found: string[] = [];
  designs.forEach((d, i) => {
    const prev = designs[i - 1];
    if (!prev || prev.status !== "feasible" || d.status !== "feasible") return;
    for (const [name, metric] of metrics) {
      const [a, b] = [metric(prev), metric(d)];
      if (Math.abs(b - a) > 0.15 * Math.abs(a)) found.push(`${name} ${a.toFixed(3)} → ${b.toFixed(3)} between ${at[i - 1]} and ${at[i]} m`);
    }
  });
  return found;
}

/** The scheme at its searched proportions on a study (the pipeline's one rule), with options set, at each span. */
function searchedJumps(model: SchemeModel, at: readonly number[], options: Record<string, string>, study: Study = defaultStudy()): string[] {
  const setting = study.schemes[model.id];
  return jumpsOf(at, at.map((spanM) => designAtBestProportions(model, briefAtSpan(study.brief, spanM), { ...setting, options: { ...setting?.options, ...options } }, study, catalogue).design));
}

describe("tension roofs are smooth across span (40–400 m at 5 m)", () => {
  // With the 3D analysis the dome chooses its hoop count on the analysed designs (src/schemes/cable-dome/index.ts,
  // lightestHoops). When the closed form chose it, the self-weight stepped 16.8 % at 215 → 220 m: the one-hoop
  // dome's 38.8 m posts, held by L/i ≤ 180 alone under the smaller analysed forces, went from CHS 610 to 711.
  // Measured after the change (dome6): largest step 10.7 % at 215 → 220 m (1 → 2 hoops, named in Design.regime).
  it("cable dome with the 3D analysis", () => expect(jumps(cableDome as unknown as SchemeModel, { analysis: "3d" })).toEqual([]), 600_000);
  it("cable dome, closed form", () => expect(jumps(cableDome as unknown as SchemeModel, { analysis: "closed-form" })).toEqual([]), 600_000);
  it("cable net, closed form", () => expect(jumps(cableNet as unknown as SchemeModel, { analysis: "closed-form" })).toEqual([]), 600_000);
  // The net designed in 3D at the proportions the search chose (screened by the closed form, then its rise and mast
  // height refined on 3D designs: declaration.ts), 60–105 m, where it keeps 3 masts (4 from 110 m, a named regime).
  // Before smooth9: self-weight −29.2 % at 60 → 65 m (a circumferential cable passing 0.3 m beside the mast heads:
  // geometry.ts evenlyBetween) and +16.5 % at 95 → 100 m (the closed form's mast height 0.19 and rise 0.055 × span,
  // where the 3D net is heaviest); after the layout alone, +19.1 % at 65 → 70 m and +18.6 % at 95 → 100 m.
  // Measured after both: largest step 11.6 % (self-weight, 65 → 70 m). Since the fabric lies on the form-found net
  // (4 Dec), that step was 18.9 %. Since the mast count is refined on 3D designs (5 Dec) the self-weight holds (4 → 5
  // masts at 60 → 65 m: 5.84 → 5.17 kg/m², then 5.57 at 70 m), and the one step is the total mass per m² of plan at that
  // change of mast count, 387 → 321 kg/m² (−17 %: the ground anchors' dead weight, most of the total, is shared by more
  // masts; measured): a named regime change, which this stricter test does not exempt. Since the mast ring carries the
  // mast height (5 Dec, later) that step is gone: at 60 m the net takes ring 0.55 and height 0.16 (was 0.65 and 0.11),
  // carbon 103.0 → 85.7 kgCO2e/m² of floor (measured).
  it("cable net with the 3D analysis at its searched proportions, 60–105 m", () => expect(searchedJumps(cableNet as unknown as SchemeModel, spans.filter((s) => s >= 60 && s <= 105), { analysis: "3d" })).toEqual([]), 600_000);
  // The demo study, 95–105 m. Before net10 the self-weight stepped +15.5 % at 100 → 105 m (carbon, the objective,
  // +2.9 %): the mast height was chosen at 0.14 on the quadratic through the samples 0.1 / 0.15 / 0.2 (the 3D net
  // at 0.1 needs 11 % more prestress than at 0.11: the trend misjudged it) while its 3D design at 0.12 was 5.7 %
  // lower in carbon. The refinement now steps to a better neighbouring mast height while there is one by more than
  // the tie band (declaration.ts, refine-in-full.ts descended): 0.13, +9.1 %.
  it("cable net with the 3D analysis at its searched proportions on the demo study, 95–105 m", () => {
    const loaded = studyFromJson(readFileSync("data/demo-study.json", "utf8"));
    if (!loaded.ok) throw new Error("the demo study does not load");
    expect(searchedJumps(cableNet as unknown as SchemeModel, [95, 100, 105], { analysis: "3d" }, loaded.study)).toEqual([]);
  }, 600_000);
});
