// The answer first (issue 14): the ranking takes only feasible, in-range schemes, and names the rest.
import { describe, it, expect } from "vitest";
import { verdict, statusOf, rankMetric } from "../../../src/comparison/verdict";
import { answerParts } from "../../../src/notebook/answer";
import { fixtureResults } from "../../helpers/fixtures";

describe("verdict", () => {
  it("names the lowest of each measure and the next, with the margin between them", () => {
    const results = fixtureResults();
    const v = verdict(results);
    const carbon = v.winners.find((w) => w.metric === "carbon");
    const ranked = rankMetric(results, "carbon").ranked;
    expect(carbon?.id).toBe(ranked[0]?.id);
    expect(carbon?.next?.value).toBe(ranked[1]?.value);
    expect(ranked[0]!.value).toBeLessThanOrEqual(ranked[1]!.value);
    expect(v.excluded).toEqual([]);
  });

  it("leaves out an out-of-range scheme and an infeasible one, each with its reason, and never calls them best", () => {
    const [a, b] = fixtureResults();
    const outside = { ...a!, design: { ...a!.design, outsideValidRange: true, status: "out-of-range" as const } };
    const failed = { ...b!, design: { ...b!.design, feasible: false, status: "infeasible" as const, reason: "fails ring buckling (utilisation 1.30)" } };
    expect(statusOf(outside.design)).toBe("out-of-range");
    expect(statusOf(failed.design)).toBe("infeasible");
    const v = verdict([outside, failed]);
    expect(v.winners).toEqual([]);
    expect(v.excluded.map((e) => e.reason)).toEqual(["the span is outside its method's valid range", "not feasible: fails ring buckling (utilisation 1.30)"]);
    const parts = answerParts([outside, failed], "EUR");
    expect(parts[0]?.text).toMatch(/none is ranked/);
    expect(parts[1]?.text).toMatch(/^Left out of the ranking: the cable dome \(the span is outside its method's valid range\); the geodesic steel dome \(not feasible: fails ring buckling/);
  });

  it("a scheme that wins two measures gets one sentence with both, and the currency on the cost", () => {
    const results = fixtureResults();
    const parts = answerParts(results, "EUR");
    const all = parts.flatMap((p) => p.winner?.metrics ?? []);
    expect(all.sort()).toEqual(["carbon", "cost", "weight"]);
    expect(parts.filter((p) => p.winner).length).toBeLessThanOrEqual(3);
    expect(parts.map((p) => p.text).join(" ")).toMatch(/EUR\/m²/);
  });
});

describe("crossovers without flip-flop (issue 14)", () => {
  it("two schemes within 2 % of each other do not swap the best at every span", async () => {
    const { crossovers, steadyBest } = await import("../../../src/comparison/crossovers");
    const rows = [40, 50, 60, 70, 80].map((spanM, i) => ({ spanM, values: { a: 100 + (i % 2 === 0 ? 0 : 1.5), b: 100.5, c: spanM >= 80 ? 90 : 200 } }));
    expect(steadyBest(rows).map((s) => s.best)).toEqual(["a", "a", "a", "a", "c"]);
    expect(crossovers(rows)).toEqual([{ fromSpanM: 70, toSpanM: 80, from: "a", to: "c" }]);
  });
});

describe("the answer's margin (issue 14: words a project lead uses)", () => {
  it("writes a lead of 1 % or more as a percentage and a smaller one as level, never as '0 % below'", async () => {
    const { marginText } = await import("../../../src/notebook/answer");
    expect(marginText(80, 100, "the truss at 100")).toBe("20 % below the truss at 100");
    expect(marginText(663, 664, "the shell at 664 EUR/m²")).toBe("less than 1 % below the shell at 664 EUR/m²: level within the accuracy of these estimates");
    expect(marginText(663, 664, "x")).not.toMatch(/\b0 %/);
  });
});
