import { describe, expect, it } from "vitest";
import { DEFAULT_BRIEF } from "../../../src/brief";
import { designStatus, massByGroupKg, soffitHeightAtM, takeoffGroupOf, usableFloorM2 } from "../../../src/schemes/kit";
import { expectRelClose } from "../../helpers/close";
import { usableFloorAreaM2 } from "../../../src/mechanics/usable-floor";

const brief = { ...DEFAULT_BRIEF, spanM: 100, minClearHeightM: 10 };

describe("usable floor by one rule (kit)", () => {
  it("a soffit everywhere above the clear height gives the whole plan, π a²", () => {
    expectRelClose(usableFloorM2(brief, { soffit: [[0, 30], [50, 12]], supports: [] }), Math.PI * 50 ** 2, 1e-9);
  });
  it("a soffit that crosses the clear height at r = 40 m gives the disc inside it (exact to the ring width)", () => {
    // soffit 14 m at r = 30, 6 m at r = 50: 10 m at r = 40
    const area = usableFloorM2(brief, { soffit: [[0, 20], [30, 14], [50, 6]], supports: [] });
    expectRelClose(area, Math.PI * 40 ** 2, 2e-3);
  });
  it("supports on usable floor take their clear zones away; on unusable floor they take nothing more", () => {
    const full = { soffit: [[0, 30], [50, 12]] as const, supports: [] };
    const masts = { ...full, supports: [{ radiusM: 25, clearRadiusM: 2, count: 12 }] };
    expectRelClose(usableFloorM2(brief, full) - usableFloorM2(brief, masts), 12 * Math.PI * 4, 1e-9);
    const low = { soffit: [[0, 30], [40, 30], [40.001, 5], [50, 5]] as const, supports: [{ radiusM: 45, clearRadiusM: 2, count: 12 }] };
    expectRelClose(usableFloorM2(brief, low), Math.PI * 40 ** 2, 2e-3);
  });
  it("interpolates the soffit linearly and holds it flat beyond the ends; an empty soffit is refused by name", () => {
    expect(soffitHeightAtM([[10, 4], [20, 8]], 15)).toBe(6);
    expect(soffitHeightAtM([[10, 4], [20, 8]], 0)).toBe(4);
    expect(soffitHeightAtM([[10, 4], [20, 8]], 30)).toBe(8);
    expect(() => soffitHeightAtM([], 1)).toThrow(/floor\.soffit/);
  });
});

describe("usable floor walked outwards (kit)", () => {
  it("gives exactly the area of the soffit looked up ring by ring, for wavy, stepped, unsorted and one-point soffits", () => {
    const wavy = Array.from({ length: 41 }, (_, k) => [k * 1.25, 10 + 4 * Math.sin(k / 2)] as const);
    const stepped = [[0, 14], [20, 14], [20, 8], [35, 12], [35, 12], [50, 9]] as const;
    const unsorted = [[0, 14], [30, 9], [20, 12], [50, 11]] as const;
    for (const soffit of [wavy, stepped, unsorted, [[10, 12]] as const]) {
      const byLookUp = usableFloorAreaM2(50, (r) => soffitHeightAtM(soffit, r), brief.minClearHeightM, 2000);
      expect(usableFloorM2(brief, { soffit, supports: [] })).toBe(byLookUp);
    }
  });
});

describe("one accounting and status (kit)", () => {
  const row = (costItem: Parameters<typeof takeoffGroupOf>[0]["costItem"], massKg: number, group?: "structure" | "perimeter" | "substructure" | "envelope") => ({ element: "x", material: null, costItem, quantity: 1, unit: "t" as const, massKg, ...(group ? { group } : {}) });
  it("groups rows by their own group, else by cost item, and the groups sum to the total", () => {
    const rows = [row("cable", 10), row("anchor", 20), row("steel-ring", 30), row("fabric-ptfe-glass", 40), row("concrete", 50, "perimeter")];
    expect(rows.map(takeoffGroupOf)).toEqual(["structure", "substructure", "perimeter", "envelope", "perimeter"]);
    expect(massByGroupKg(rows)).toEqual({ structure: 10, perimeter: 80, substructure: 20, envelope: 40 });
  });
  it("status: a reason makes it infeasible, else out-of-range outside the valid span, else feasible", () => {
    expect(designStatus("fails x", false)).toBe("infeasible");
    expect(designStatus("fails x", true)).toBe("infeasible");
    expect(designStatus("", true)).toBe("out-of-range");
    expect(designStatus("", false)).toBe("feasible");
  });
});

describe("usable floor: the rings counted piece by piece (an ascending soffit) are the rings counted one by one", () => {
  it("random ascending soffits, with steps, flat ends, points beyond the plan: exactly the area of usableFloorAreaM2 on 2,000 rings", async () => {
    const fc = await import("fast-check");
    const soffit = fc.array(fc.tuple(fc.double({ min: 0, max: 60, noNaN: true }), fc.double({ min: 0, max: 25, noNaN: true })), { minLength: 1, maxLength: 12 }).map((points) => [...points].sort((p, q) => p[0] - q[0]));
    fc.assert(
      fc.property(soffit, fc.double({ min: 0, max: 25, noNaN: true }), (points, minClearHeightM) => {
        const b = { ...brief, minClearHeightM };
        const oneByOne = usableFloorAreaM2(50, (r) => soffitHeightAtM(points, r), minClearHeightM, 2000);
        expect(usableFloorM2(b, { soffit: points, supports: [] })).toBe(oneByOne);
      }),
      { numRuns: 300 },
    );
  });
});
