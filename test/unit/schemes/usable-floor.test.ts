import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { DEFAULT_BRIEF } from "../../../src/brief";
import { assembleDesign, takeoffGroupOf, usableFloorM2 } from "../../../src/schemes/kit";
import { expectRelClose } from "../../helpers/close";

// Closed forms of plane geometry (areas of discs and annuli) are the check values here.
const brief = { ...DEFAULT_BRIEF, spanM: 100, riseM: 10, minClearHeightM: 10 };
const flat = (h: number): [number, number][] => [[0, h], [50, h]];

describe("usableFloorM2: more cases of the one rule", () => {
  it("counts an annulus when the soffit is low at the centre (a hanging hub) and high outside", () => {
    const floor = { soffit: [[0, 5], [20, 5], [20.001, 15], [50, 15]] as [number, number][], supports: [] };
    expectRelClose(usableFloorM2(brief, floor), Math.PI * (50 * 50 - 20 * 20), 2e-3);
  });

  it("takes a support standing at the centre out whole (its zone covers the centre), not half", () => {
    const central = { soffit: flat(12), supports: [{ radiusM: 0, clearRadiusM: 5, count: 1 }] };
    expectRelClose(usableFloorM2(brief, central), Math.PI * (50 * 50 - 5 * 5), 1e-9);
    const offCentre = { soffit: flat(12), supports: [{ radiusM: 2, clearRadiusM: 5, count: 1 }] };
    expectRelClose(usableFloorM2(brief, offCentre), Math.PI * (50 * 50 - 5 * 5), 1e-9);
  });

  it("counts only the part of a zone that lies on usable floor", () => {
    // usable inside r = 40; a zone of radius 2 centred on r = 40 loses about half its disc
    const floor = { soffit: [[0, 30], [40, 30], [40.001, 5], [50, 5]] as [number, number][], supports: [{ radiusM: 40, clearRadiusM: 2, count: 1 }] };
    expectRelClose(usableFloorM2(brief, floor), Math.PI * 40 * 40 - Math.PI * 4 / 2, 2e-3);
  });

  it("never exceeds the plan, never grows when the clear height rises or a support is added", () => {
    const soffitArb = fc.array(fc.double({ min: 0, max: 40, noNaN: true }), { minLength: 2, maxLength: 8 }).map((hs) => hs.map((h, i) => [(50 * i) / (hs.length - 1), h] as [number, number]));
    fc.assert(
      fc.property(soffitArb, fc.double({ min: 0, max: 30, noNaN: true }), fc.double({ min: 0, max: 10, noNaN: true }), (soffit, h, extra) => {
        const at = (clear: number, supports: { radiusM: number; clearRadiusM: number; count: number }[] = []) => usableFloorM2({ ...brief, minClearHeightM: clear }, { soffit, supports });
        const a = at(h);
        expect(a).toBeGreaterThanOrEqual(0);
        expect(a).toBeLessThanOrEqual(Math.PI * 2500 * (1 + 1e-12));
        expect(at(h + extra)).toBeLessThanOrEqual(a + 1e-9);
        expect(at(h, [{ radiusM: 25, clearRadiusM: 2, count: 4 }])).toBeLessThanOrEqual(a + 1e-9);
      }),
      { numRuns: 60 },
    );
  });
});

describe("default take-off groups by element", () => {
  const row = (element: string, costItem: Parameters<typeof takeoffGroupOf>[0]["costItem"]) => ({ element, material: null, costItem, quantity: 1, unit: "t" as const, massKg: 1 });
  it("rings and edge beams perimeter (a central hub ring is structure), columns and foundations substructure", () => {
    expect(takeoffGroupOf(row("compression ring", "concrete"))).toBe("perimeter");
    expect(takeoffGroupOf(row("compression ring reinforcement", "rebar"))).toBe("perimeter");
    expect(takeoffGroupOf(row("ring prestressing tendons", "prestressing"))).toBe("perimeter");
    expect(takeoffGroupOf(row("edge beam", "steel-secondary"))).toBe("perimeter");
    expect(takeoffGroupOf(row("central tension ring", "steel-ring"))).toBe("structure");
    expect(takeoffGroupOf(row("perimeter columns", "steel-column"))).toBe("substructure");
    expect(takeoffGroupOf(row("roof deck", "metal-deck"))).toBe("envelope");
    expect(takeoffGroupOf(row("shell concrete", "concrete"))).toBe("structure");
  });
});

describe("assembleDesign draws the usable floor it counts", () => {
  const parts = (floor?: { soffit: [number, number][]; supports: { radiusM: number; clearRadiusM: number; count: number }[] }) => ({
    summary: [], members: [], takeoff: [], checks: [], warnings: [], iterations: 1, roofSurfaceM2: 1, enclosedVolumeM3: 1, drawing: { section: [] },
    ...(floor ? { floor } : { usableFloorM2: 1234 }),
  });
  const model = { id: "cable-dome" as const, label: "Cable dome", validSpanM: { min: 50, max: 200 } };
  it("uses `floor` by the one rule and adds the 'usable floor' lines; keeps a scheme's own number otherwise", () => {
    const floor = { soffit: [[0, 20], [50, 0]] as [number, number][], supports: [] };
    const d = assembleDesign(model, brief, parts(floor));
    expect(d.usableFloorM2).toBe(usableFloorM2(brief, floor));
    const drawn = d.drawing.section.filter((l) => l.role === "usable floor");
    const halfWidth = Math.max(...drawn.flatMap((l) => l.points.map((p) => Math.abs(p[0]))));
    expectRelClose(halfWidth, 25, 0.01);
    expect(assembleDesign(model, brief, parts()).usableFloorM2).toBe(1234);
  });
});
