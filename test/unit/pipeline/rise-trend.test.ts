import { describe, expect, it } from "vitest";
import { fitQuadratic, trendChoice } from "../../../src/pipeline/rise-trend";
import { searchProportions, riseSettingFor, MAX_EVALUATIONS, PROPORTION_TIE_FRACTION, type RiseSetting } from "../../../src/pipeline/proportions";
import { infeasibleDesign } from "../../../src/schemes/kit";
import { DEFAULT_BRIEF } from "../../../src/brief";
import type { Design, RiseTrend, SchemeModel, SchemeOptions } from "../../../src/schemes/types";
import { expectAbsClose, expectRelClose } from "../../helpers/close";

// Made-up objectives whose trend is known (no scheme involved): a parabola in the rise, with and
// without a ±3 % saw laid over it (the steps a lattice's mesh and catalogue sections give).
const rises = Array.from({ length: 41 }, (_, i) => 10 + i * 0.5); // 10 … 30 m
const trend = (x: number) => 100 + 0.1 * (x - 24) ** 2; // least 100 at 24 m
const saw = (x: number) => trend(x) * (1 + 0.03 * (Math.round(x / 4) % 2 === 0 ? 1 : -1)); // the samples at 10, 14 … 30 m fall −, +, −, +, −, +
const sampleAt = (f: (x: number) => number) => [0, 8, 16, 24, 32, 40].map((index) => ({ index, value: f(rises[index]!) }));
/** Of the rises whose trend is within the band of its least, the nearest the reference (here 15 m): the band's edge 24 − √20 ≈ 19.53 m, on the grid 20 m. */
const BAND_EDGE_M = 20;

describe("rise on the trend", () => {
  it("the least-squares quadratic through points of a parabola is that parabola (to rounding)", () => {
    const fit = fitQuadratic([10, 14, 18, 22, 26, 30].map((x) => ({ x, y: trend(x) })));
    expect(fit).not.toBeNull();
    for (const x of [10, 17.3, 24, 29]) expectRelClose(fit!(x), trend(x), 1e-12);
    expect(fitQuadratic([{ x: 1, y: 1 }, { x: 2, y: 2 }])).toBeNull();
  });

  it("chooses the rise nearest the reference within the band of the fitted least: on the clean trend and through a ±3 % saw alike", () => {
    const reference = rises.indexOf(15);
    const clean = trendChoice(rises, sampleAt(trend), reference, PROPORTION_TIE_FRACTION);
    expect(rises[clean]).toBe(BAND_EDGE_M);
    const sawn = trendChoice(rises, sampleAt(saw), reference, PROPORTION_TIE_FRACTION);
    expectAbsClose(rises[sawn]!, BAND_EDGE_M, 1.5);
    // the best single sample of the saw lies elsewhere (at 26 m: 0.97 × 100.4), where choosing among samples would go
    const best = sampleAt(saw).sort((a, b) => a.value - b.value)[0]!;
    expect(Math.abs(rises[best.index]! - BAND_EDGE_M)).toBeGreaterThan(4);
  });

  it("with fewer than three finite samples keeps the best sample; it never extrapolates beyond the finite samples", () => {
    const two = [{ index: 0, value: Infinity }, { index: 8, value: 5 }, { index: 16, value: 4 }, { index: 24, value: Infinity }];
    expect(trendChoice(rises, two, 10, PROPORTION_TIE_FRACTION)).toBe(16);
    // falling to the right, but the rises above the last finite sample (index 24) are not chosen
    const falling = [0, 8, 16, 24].map((index) => ({ index, value: 200 - index })).concat([{ index: 32, value: Infinity }, { index: 40, value: Infinity }]);
    expect(trendChoice(rises, falling, 0, PROPORTION_TIE_FRACTION)).toBeLessThanOrEqual(24);
  });

  /** A one-option lattice-like scheme whose rise is on the declared trend, searched on the sawn objective at 100 m; every design asked for, in order. */
  function searchSawn(byTrend: RiseTrend) {
    const m = {
      id: "geodesic-dome",
      label: "Test",
      colour: "#000",
      description: "",
      clientNotes: ["test"],
      validSpanM: { min: 0, max: 1000 },
      options: [{ key: "length", label: "length", kind: "number", unit: "m", min: 2, max: 16, step: 0.5, source: "test", free: true }],
      defaults: { length: 5 },
      riseSpanRatio: { min: 0.1, max: 0.3, preferred: 0.15, byTrend },
      design: () => {
        throw new Error("not used");
      },
    } as SchemeModel;
    const brief = { ...DEFAULT_BRIEF, spanM: 100, riseM: 15, eavesHeightM: 10, heightLimitM: 60, riseRule: "own" as const };
    const rise = riseSettingFor(m, brief, 100, undefined) as RiseSetting;
    const objective = (o: SchemeOptions, riseM: number) => saw(riseM) + ((o.length as number) - 9) ** 2;
    const calls: { length: number; riseM: number }[] = [];
    const { choice } = searchProportions(m, m.defaults, [], rise, "mass", (o, riseM): Design => {
      calls.push({ length: o.length as number, riseM });
      return { ...infeasibleDesign("geodesic-dome", DEFAULT_BRIEF, ""), status: "feasible", feasible: true, totalMassKg: objective(o, riseM) };
    }, (d) => d.totalMassKg, 100);
    return { choice, calls };
  }

  /** The chosen rise on the trend, and the length at its least (9 m) or pulled toward its reference (5 m) as far as the objective stays within the band. */
  function expectTrendChoice(choice: ReturnType<typeof searchSawn>["choice"]): void {
    expectAbsClose(choice.riseM, BAND_EDGE_M, 1.5);
    const length = choice.proportions.length as number;
    expect(length).toBeLessThanOrEqual(9);
    expect((length - 9) ** 2).toBeLessThanOrEqual(PROPORTION_TIE_FRACTION * saw(choice.riseM));
  }

  it("a scheme that asks for it gets its rise on the trend of a sawn objective, its other proportion searched at that rise", () => {
    const { choice, calls } = searchSawn({ samples: 6, sampledAt: "searched" });
    expectTrendChoice(choice);
    expect(calls.length).toBeLessThanOrEqual(MAX_EVALUATIONS);
  });

  it("sampled at the reference proportions: the declared number of rises, equal steps across the range, all at the reference length, no descent before them", () => {
    const { choice, calls } = searchSawn({ samples: 7, sampledAt: "reference" });
    // the first designs are the 7 samples from 10 to 30 m (0.1–0.3 × 100 m), on the 0.5 m rise grid
    const samples = calls.slice(0, 7);
    expect(samples.map((c) => c.length)).toEqual(Array(7).fill(5));
    expect(samples.map((c) => c.riseM)).toEqual([10, 13.5, 16.5, 20, 23.5, 26.5, 30]);
    expectTrendChoice(choice);
    expect(calls.length).toBeLessThanOrEqual(MAX_EVALUATIONS);
  });
});
