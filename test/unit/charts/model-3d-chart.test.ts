import { describe, expect, it } from "vitest";
import { model3dChartOptions, model3dMagnification } from "../../../src/charts/model-3d-chart";
import type { AnalysisView } from "../../../src/schemes/types";

// A hand-made three-member view (not a check value of any method).
const view: AnalysisView = {
  caseName: "drifted snow (6.10b)",
  nodes: [[0, 0, 10], [50, 0, 12], [0, 50, 12], [25, 25, 20]],
  members: [
    { a: 0, b: 3, kind: "cable", forceN: 2e5 },
    { a: 1, b: 3, kind: "cable", forceN: 0, slack: true },
    { a: 2, b: 3, kind: "strut", forceN: -5e4 },
  ],
  displacementsM: [[0, 0, 0], [0, 0, 0], [0, 0, 0], [0, 0, -0.5]],
  modeShape: [[0, 0, 0], [0, 0, 0], [0, 0, 0], [1, 0, 0]],
};

describe("model3dChartOptions", () => {
  it("magnifies the largest displacement to about 4 % of the extent, rounded to 1, 2 or 5 × 10ⁿ", () => {
    // 0.04 × 50 m / 0.5 m = 4 → 5
    expect(model3dMagnification({ view })).toBe(5);
    expect(model3dMagnification({ view, magnification: 10 })).toBe(10);
    // mode shape of unit length: 2 → 2
    expect(model3dMagnification({ view, mode: true })).toBe(2);
  });
  it("states the case, the magnification and the slack cables in its caption and accessible description", () => {
    const o = model3dChartOptions({ view, projection: "oblique", title: "Net: 3D", caption: "Study." });
    expect(o.caption).toMatch(/drifted snow \(6\.10b\), magnified 5×/);
    expect(o.ariaLabel).toBe("Net: 3D");
    expect(o.ariaDescription).toMatch(/1 slack cables dashed/);
    expect(o.caption).toMatch(/magnified 5×; 1 slack cable dashed; grey: as built\.$/);
    expect(o.marks?.length).toBe(3);
  });
  it("lists in its legend only what it draws, each in its one colour, and says when no cable went slack", () => {
    const o = model3dChartOptions({ view, projection: "plan", title: "Net", caption: "" });
    // the largest |force| of three members (5 % of them, at least one) is the most utilised
    expect(o.color?.domain).toEqual(["strut", "slack cable", "most utilised"]);
    expect(o.color?.range).toEqual(["#555555", "#D55E00", "#E69F00"]);
    const taut = { ...view, members: view.members.map((m) => ({ ...m, slack: false, forceN: m.forceN || 1e4 })) };
    const t = model3dChartOptions({ view: taut, projection: "plan", title: "Net", caption: "" });
    expect(t.color?.domain).toEqual(["cable", "strut", "most utilised"]);
    expect(t.caption).toMatch(/; no cable slack; grey: as built\.$/);
    const frame = { ...view, members: view.members.map((m) => ({ ...m, kind: "beam" as const, slack: false })) };
    expect(model3dChartOptions({ view: frame, projection: "plan", title: "Lattice", caption: "" }).caption).not.toMatch(/slack/);
  });
  it("draws the buckling mode when asked and the view has one", () => {
    const o = model3dChartOptions({ view, projection: "plan", mode: true, title: "Lattice", caption: "" });
    expect(o.caption).toMatch(/Buckling mode/);
    // a mode has no size: its drawn size is stated, not a magnification of its arbitrary units (unit mode × 2 = 2 m)
    expect(o.caption).toMatch(/its largest movement drawn as 2 m \(a buckling mode has no size of its own\)/);
    expect(o.caption).not.toMatch(/magnified/);
    expect(o.ariaDescription).toMatch(/buckling mode under .+, its largest movement drawn as 2 m/);
  });
});
