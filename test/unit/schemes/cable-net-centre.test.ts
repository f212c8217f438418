// The cable net's centre (issue 13): free, or held at the roof's crown by a tie-down to the floor.
import { describe, it, expect } from "vitest";
import { cableNet } from "../../../src/schemes/cable-net";
import { cableNetLayout } from "../../../src/schemes/cable-net/geometry";
import { DEFAULT_BRIEF } from "../../../src/brief";
import { defaultCatalogue } from "../../../src/catalogue/default-catalogue";
import { PLAIN_CONCRETE_DENSITY_KG_PER_M3 } from "../../../src/mechanics/concrete";
import { GRAVITY_M_PER_S2 } from "../../../src/mechanics/gravity";
import { MAST_CLEAR_RADIUS_M } from "../../../src/schemes/cable-net";
import { expectRelClose } from "../../helpers/close";

const catalogue = defaultCatalogue();
const brief = { ...DEFAULT_BRIEF, spanM: 160, riseM: 16 };
const design = (centre: "free" | "held-down", analysis: "closed-form" | "3d") => cableNet.design(brief, { ...cableNet.defaults, centre, analysis }, catalogue);
const pullOf = (warning: string | undefined) => Number(/\(([\d,.]+) kN pull\)/.exec(warning ?? "")?.[1]?.replace(/,/g, ""));

describe("closed form: the free ring against the held one", () => {
  const free = design("free", "closed-form");
  const held = design("held-down", "closed-form");
  it("the free ring is pulled up by the closed form's valley cables and the design says so", () => {
    expect(free.warnings.some((w) => w.startsWith("the closed form's valley cables pull the free central ring up by"))).toBe(true);
    expect(free.takeoff.some((r) => r.element.includes("tie-down"))).toBe(false);
  });
  it("the held ring takes the tie-down as substructure rows, its anchor a dead weight for the pull × margin", () => {
    const rows = held.takeoff.filter((r) => r.element.includes("tie-down"));
    expect(rows).toHaveLength(2);
    expect(rows.every((r) => r.group === "substructure")).toBe(true);
    const pullN = pullOf(held.warnings.find((w) => w.startsWith("the central ring is held"))) * 1000;
    const anchor = rows.find((r) => r.unit === "m3")!;
    expectRelClose(anchor.quantity, (pullN * cableNet.defaults.anchorUpliftMargin) / (PLAIN_CONCRETE_DENSITY_KG_PER_M3 * GRAVITY_M_PER_S2), 1e-3);
  });
  it("the roof is the same; the substructure grows by the tie-down; the floor loses one clear zone", () => {
    expect(held.massByGroupKg.structure).toBe(free.massByGroupKg.structure);
    const tieKg = held.takeoff.filter((r) => r.element.includes("tie-down")).reduce((s, r) => s + r.massKg, 0);
    expectRelClose(held.massByGroupKg.substructure - free.massByGroupKg.substructure, tieKg, 1e-9);
    expectRelClose(free.usableFloorM2 - held.usableFloorM2, Math.PI * MAST_CLEAR_RADIUS_M ** 2, 0.05);
  });
});

describe("3D analysis: the held centre makes the inner net anticlastic", () => {
  const free = design("free", "3d");
  const held = design("held-down", "3d");
  it("both converge with every cable taut; the held net needs less prestress and is lighter", () => {
    for (const d of [free, held]) {
      expect(d.reason).toBe("");
      expect(d.analysis!.loadCases.every((c) => c.converged && c.slackMembers === 0)).toBe(true);
    }
    expect(held.analysis!.prestressKN!).toBeLessThan(free.analysis!.prestressKN!);
    expect(held.selfWeightKgPerM2).toBeLessThan(free.selfWeightKgPerM2);
  });
  it("the held ring stays at the roof's crown: the view draws its nodes there", () => {
    const o = cableNet.defaults;
    const layout = cableNetLayout(brief, o.masts, o.mastRingRatio, o.mastHeightRatio, o.radialCablesPerMast, o.hangerSpacingM);
    const view = held.analysis!.view!;
    const atRing = view.nodes.filter(([x, y]) => Math.abs(Math.hypot(x, y) - layout.centralRingRadiusM) < 1e-6);
    expect(atRing.length).toBeGreaterThan(0);
    for (const [, , z] of atRing) expect(z).toBeCloseTo(brief.eavesHeightM + layout.inner.endHeightM, 6);
  });
  it("the section and the plan draw the central ring where the form finding put it: the free one far above the held one, where the inner radial cables end", () => {
    const ringOf = (d: typeof free) => d.drawing.section.find((l) => l.role === "ring")!.points;
    for (const d of [free, held]) {
      const ring = ringOf(d);
      // the inner radial cables (those ending inside the mast ring) end on the ring's line
      const innerEnds = d.drawing.section.filter((l) => l.role === "radial cable" && Math.abs(l.points.at(-1)![0]) < Math.abs(l.points[0]![0])).map((l) => l.points.at(-1)!);
      expect(innerEnds.length).toBeGreaterThan(0);
      for (const [r, z] of innerEnds) {
        expect(Math.abs(r)).toBeCloseTo(Math.abs(ring[0]![0]), 1);
        expect(z).toBeCloseTo(ring[0]![1], 1);
      }
      // the plan's ring has the section's radius, and the take-off the ring's length at it
      const planRing = d.drawing.plan!.find((l) => l.role === "ring")!.points;
      expect(Math.hypot(...planRing[0]!)).toBeCloseTo(ring[1]![0], 6);
      expectRelClose(d.members.find((m) => m.element === "central tension ring")!.lengthM, 2 * Math.PI * ring[1]![0], 1e-9);
    }
    // a free ring hangs where the net's prestress and loads put it, metres above the held one (at 160 m; measured 16 m)
    expect(ringOf(free)[0]![1] - ringOf(held)[0]![1]).toBeGreaterThan(5);
  });
  it("the tie-down is sized from the analysed pull (a strand group carrying it)", () => {
    const tie = held.members.find((m) => m.element === "central tie-down");
    const pullN = pullOf(held.warnings.find((w) => w.startsWith("the central ring is held"))) * 1000;
    expect(tie).toBeDefined();
    expectRelClose(tie!.designForceN, pullN, 1e-3);
    expect(tie!.utilisation).toBeLessThanOrEqual(1);
  });
});
