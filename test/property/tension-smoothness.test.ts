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

const catalogue = defaultCatalogue();
const spans = Array.from({ length: 73 }, (_, i) => 40 + 5 * i);
const metrics: [string, (d: Design) => number][] = [
  ["self-weight per m² of plan", (d) => d.selfWeightKgPerM2],
  ["usable floor ÷ plan", (d) => d.usableFloorM2 / d.planAreaM2],
  ["total mass per m² of plan", (d) => d.totalMassKg / d.planAreaM2],
];

function jumps(model: SchemeModel, options: Record<string, string> = {}): string[] {
  const designs = spans.map((spanM) => model.design({ ...DEFAULT_BRIEF, spanM, riseM: (spanM * DEFAULT_BRIEF.riseM) / DEFAULT_BRIEF.spanM }, { ...model.defaults, ...options }, catalogue));
  const found: string[] = [];
  designs.forEach((d, i) => {
    const prev = designs[i - 1];
    if (!prev || prev.status !== "feasible" || d.status !== "feasible") return;
    for (const [name, metric] of metrics) {
      const [a, b] = [metric(prev), metric(d)];
      if (Math.abs(b - a) > 0.15 * Math.abs(a)) found.push(`${name} ${a.toFixed(3)} → ${b.toFixed(3)} between ${spans[i - 1]} and ${spans[i]} m`);
    }
  });
  return found;
}

describe("tension roofs are smooth across span (40–400 m at 5 m)", () => {
  // With the 3D analysis the dome chooses its hoop count on the analysed designs (src/schemes/cable-dome/index.ts,
  // lightestHoops). When the closed form chose it, the self-weight stepped 16.8 % at 215 → 220 m: the one-hoop
  // dome's 38.8 m posts, held by L/i ≤ 180 alone under the smaller analysed forces, went from CHS 610 to 711.
  // Measured after the change (dome6): largest step 10.7 % at 215 → 220 m (1 → 2 hoops, named in Design.regime).
  it("cable dome with the 3D analysis", () => expect(jumps(cableDome as unknown as SchemeModel, { analysis: "3d" })).toEqual([]), 600_000);
  it("cable dome, closed form (the default)", () => expect(jumps(cableDome as unknown as SchemeModel)).toEqual([]), 600_000);
  it("cable net", () => expect(jumps(cableNet as unknown as SchemeModel)).toEqual([]), 600_000);
});
