import { describe, expect, it } from "vitest";
import { bestAt, crossovers, paretoFront } from "../../../src/comparison";

// Issue 12 item 7: only feasible, in-range results are ranked, best, in crossovers and on the Pareto front.
describe("status in crossovers and the Pareto front", () => {
  it("an out-of-range scheme is never best, however low its value", () => {
    expect(bestAt({ truss: 50, net: 80 }, { truss: "out-of-range", net: "feasible" })).toBe("net");
    expect(bestAt({ truss: 50, net: 80 })).toBe("truss");
    const rows = [
      { spanM: 180, values: { truss: 50, net: 80 }, status: { truss: "feasible", net: "feasible" } as const },
      { spanM: 220, values: { truss: 55, net: 80 }, status: { truss: "out-of-range", net: "feasible" } as const },
    ];
    expect(crossovers(rows)).toEqual([{ fromSpanM: 180, toSpanM: 220, from: "truss", to: "net" }]);
  });

  it("out-of-range and infeasible points neither sit on the front nor push others off it", () => {
    const points = [
      { id: "a", x: 2, y: 2, status: "feasible" as const },
      { id: "b", x: 1, y: 1, status: "out-of-range" as const },
      { id: "c", x: 3, y: 1, status: "feasible" as const },
    ];
    expect(paretoFront(points).sort()).toEqual(["a", "c"]);
  });
});
