import { describe, it, expect } from "vitest";
import { cableNet } from "../../../src/schemes/cable-net";
import { DEFAULT_BRIEF } from "../../../src/brief";
import { defaultCatalogue } from "../../../src/catalogue/default-catalogue";
import { expectRelClose } from "../../helpers/close";
import { cableNetLayout, circumferentialSpanM } from "../../../src/schemes/cable-net/geometry";
import { capHeightAt } from "../../../src/mechanics/spherical-cap";
import { wholeNumber } from "../../../src/kernel/units";

const catalogue = defaultCatalogue();
const design = (brief = DEFAULT_BRIEF, options = cableNet.defaults) => cableNet.design(brief, options, catalogue);
const cableKg = (d: ReturnType<typeof design>) => d.takeoff.filter((r) => r.material === "steel-strand").reduce((s, r) => s + r.massKg, 0);

describe("cableNet.design", () => {
  const d = design();

  it("is feasible at 160 m with the default brief", () => {
    expect(d.reason).toBe("");
    expect(d.feasible).toBe(true);
    expect(d.outsideValidRange).toBe(false);
  });

  it("converges on its self-weight in a bounded number of iterations", () => {
    expect(d.iterations).toBeGreaterThanOrEqual(1);
    expect(d.iterations).toBeLessThanOrEqual(60);
  });

  it("take-off masses sum to totalMassKg", () => expectRelClose(d.takeoff.reduce((s, r) => s + r.massKg, 0), d.totalMassKg, 1e-12));

  it("names cables, masts, anchors and fabric in its take-off", () => {
    const elements = d.takeoff.map((r) => r.element);
    for (const e of ["radial cables", "circumferential cables", "backstays", "masts", "anchors", "fabric"]) expect(elements).toContain(e);
    expect(d.takeoff.find((r) => r.element === "anchors")?.costItem).toBe("anchor");
    // valley cables only where they are built: the closed form's net has them, the form-found 3D net (the default) none, and no empty row for them
    expect(elements).not.toContain("valley cables");
    const closed = design(DEFAULT_BRIEF, { ...cableNet.defaults, analysis: "closed-form" });
    expect(closed.takeoff.find((r) => r.element === "valley cables")?.massKg).toBeGreaterThan(0);
  });

  it("more snow needs more cable", () => {
    const heavier = design({ ...DEFAULT_BRIEF, snowGroundKPa: 2.0 });
    expect(heavier.feasible).toBe(true);
    expect(cableKg(heavier)).toBeGreaterThan(cableKg(d));
  });

  it("more wind uplift needs more anchor concrete", () => {
    const windier = design({ ...DEFAULT_BRIEF, windBasicMPerS: 32 });
    const anchors = (x: typeof d) => x.takeoff.find((r) => r.element === "anchors")?.quantity ?? 0;
    expect(anchors(windier)).toBeGreaterThan(anchors(d));
  });

  it("a plain mast (full buckling length) is heavier than a braced one", () => {
    const plain = design(DEFAULT_BRIEF, { ...cableNet.defaults, mastType: "plain" });
    const masts = (x: typeof d) => x.takeoff.find((r) => r.element === "masts")?.massKg ?? 0;
    expect(masts(plain)).toBeGreaterThan(masts(d));
  });

  it("masts wider at mid-height (option mastShape): never heavier than uniform ones, and named so where the taper wins", () => {
    for (const [spanM, riseM] of [[60, 8], [160, 22]] as const) {
      const brief = { ...DEFAULT_BRIEF, spanM, riseM };
      const masts = (x: typeof d) => ({ massKg: x.takeoff.find((r) => r.element === "masts")!.massKg, section: x.members.find((m) => m.element === "masts")!.section });
      const uniform = masts(design(brief, { ...cableNet.defaults, mastType: "plain" }));
      const tapered = masts(design(brief, { ...cableNet.defaults, mastType: "plain", mastShape: "tapered" }));
      expect(tapered.massKg).toBeLessThanOrEqual(uniform.massKg * (1 + 1e-9));
      if (tapered.massKg < uniform.massKg) expect(tapered.section).toMatch(/at mid-height, [\d.]+ m at the ends/);
      else expect(tapered.section).toBe(uniform.section);
    }
  });

  it("flags spans outside 60–400 m", () => {
    const small = design({ ...DEFAULT_BRIEF, spanM: 40, riseM: 6 });
    expect(small.outsideValidRange).toBe(true);
    expect(small.warnings[0]).toMatch(/outside the method's valid range/);
  });

  it("answers infeasible with a reason, not a throw, where the masts are too short to hang the net", () => {
    const low = design(DEFAULT_BRIEF, { ...cableNet.defaults, mastHeightRatio: 0.03 });
    expect(low.feasible).toBe(false);
    expect(low.reason).toMatch(/raise the mast height ratio/);
  });

  it("answers infeasible with a reason when no mast can carry the load", () => {
    const few = design({ ...DEFAULT_BRIEF, spanM: 400, riseM: 60, snowGroundKPa: 10 }, { ...cableNet.defaults, masts: 3, mastType: "plain" });
    expect(few.feasible).toBe(false);
    expect(few.reason).toMatch(/mast/);
  });

  it("throws on a bad option, naming it", () => {
    expect(() => design(DEFAULT_BRIEF, { ...cableNet.defaults, masts: 2.5 })).toThrow(/invalid masts: 2.5/);
  });

  it("draws masts, cables and fabric (valley cables only in the closed form: the 3D net, the default, has none)", () => {
    const roles = new Set(d.drawing.section.map((l) => l.role));
    for (const role of ["radial cable", "circumferential cable", "mast", "backstay", "fabric", "ring"]) expect(roles.has(role)).toBe(true);
    expect(roles.has("valley cable")).toBe(cableNet.defaults.analysis === "closed-form");
    const closed = new Set(design(DEFAULT_BRIEF, { ...cableNet.defaults, analysis: "closed-form" }).drawing.section.map((l) => l.role));
    expect(closed.has("valley cable")).toBe(true);
  });
});

describe("circumferentialSpanM", () => {
  const layout = cableNetLayout(DEFAULT_BRIEF, 12, 0.6, 0.15, 8, 6);
  it("at the mast ring the fans are bunched: the span is the gap between masts, 2πr/masts", () =>
    expectRelClose(circumferentialSpanM(layout, layout.mastRadiusM), (2 * Math.PI * layout.mastRadiusM) / 12, 1e-12));
  it("at the edge the fan is spread evenly: 2πa/(masts·cables per side)", () =>
    expectRelClose(circumferentialSpanM(layout, layout.cap.baseRadiusM), (2 * Math.PI * layout.cap.baseRadiusM) / 48, 1e-12));
  it("every suspension cable stays on or above the roof, and touches it", () => {
    for (const bay of [layout.outer, layout.inner]) {
      let closest = Number.POSITIVE_INFINITY;
      for (let i = 1; i < 400; i++) {
        const t = i / 400;
        const cable = layout.mastHeadM + (bay.endHeightM - layout.mastHeadM) * t - 4 * bay.sagM * t * (1 - t);
        const roof = capHeightAt(layout.cap, layout.mastRadiusM + (bay.endRadiusM - layout.mastRadiusM) * t);
        closest = Math.min(closest, cable - roof);
      }
      expect(closest).toBeGreaterThan(-0.02); // sampled 4× finer than the layout's own search
      expect(closest).toBeLessThan(0.05);
    }
  });
});

describe("cableNetLayout: circumferential cables", () => {
  // our rule (geometry.ts evenlyBetween): evenly within each bay, at most the hanger spacing apart, none at the mast ring
  const bays = (l: ReturnType<typeof cableNetLayout>) => [
    [l.centralRingRadiusM, ...l.hoopRadiiM.filter((r) => r < l.mastRadiusM), l.mastRadiusM],
    [l.mastRadiusM, ...l.hoopRadiiM.filter((r) => r > l.mastRadiusM), l.cap.baseRadiusM],
  ];
  it.each([
    [60, 3, 0.65, 6],
    [65, 3, 0.65, 6],
    [160, 12, 0.6, 6],
    [300, 10, 0.45, 7.5],
  ])("%d m, %d masts at %f of the radius, %f m: evenly spaced in each bay, as few as keep them ≤ the spacing apart", (spanM, masts, ring, spacing) => {
    const layout = cableNetLayout({ ...DEFAULT_BRIEF, spanM, riseM: 0.1 * spanM }, masts, ring, 0.15, 8, spacing);
    for (const radii of bays(layout)) {
      const gaps = radii.slice(1).map((r, i) => r - (radii[i] as number));
      for (const g of gaps) expectRelClose(g, (gaps[0] as number), 1e-9);
      expect(gaps[0]).toBeLessThanOrEqual(spacing + 1e-9);
      expect(((radii.length - 1) * (gaps[0] as number)) / (radii.length - 2)).toBeGreaterThan(spacing); // one cable fewer would leave a gap wider than the spacing
    }
  });
  it("at 60 m (3 masts at 0.65 × the radius) none passes within half a spacing of the mast heads (laid out every 6 m from the ring, one passed 0.3 m outside)", () => {
    const layout = cableNetLayout({ ...DEFAULT_BRIEF, spanM: 60, riseM: 3 }, 3, 0.65, 0.15, 8, 6);
    for (const r of layout.hoopRadiiM) expect(Math.abs(r - layout.mastRadiusM)).toBeGreaterThan(3);
  });
});

describe("cableNet on the shared design basis (issue 12)", () => {
  const d = design();
  it("the masts inside the plan take their clear zones out of the usable floor", () => {
    expect(d.usableFloorM2).toBeLessThan(d.planAreaM2);
    const fewer = design(DEFAULT_BRIEF, { ...cableNet.defaults, masts: 6 });
    expect(fewer.usableFloorM2).toBeGreaterThan(d.usableFloorM2);
  });
  it("counts the anchors and the held centre's tie-down as substructure, outside the roof's self-weight", () => {
    // since the held-down centre became the default (the closed form holds its ring down), the
    // substructure is the edge anchors plus the central tie-down and its anchor
    const anchors = d.takeoff.find((r) => r.element === "anchors");
    const tieDown = d.takeoff.filter((r) => r.element.startsWith("central tie-down"));
    expect(anchors?.group).toBe("substructure");
    expect(tieDown.map((r) => r.group)).toEqual(["substructure", "substructure"]);
    expectRelClose(d.massByGroupKg.substructure, (anchors?.massKg ?? NaN) + tieDown.reduce((s, r) => s + r.massKg, 0), 1e-12);
    expectRelClose(d.roofMassKg, d.totalMassKg - d.massByGroupKg.substructure, 1e-12);
  });
  it("names the design combination that governs, and declares mast ring, mast height and mast count free", () => {
    expect(d.governingLoadCase).toMatch(/\((6\.10|6\.10a|6\.10b)\)$/);
    const free = cableNet.options.filter((o) => o.kind === "number" && o.free).map((o) => o.key);
    expect(free).toEqual(["masts", "mastRingRatio", "mastHeightRatio"]);
    expect(cableNet.riseSpanRatio?.preferred).toBeGreaterThan(0);
  });
});

describe("cableNet through the 3D analysis (issue 13, option analysis = 3d)", () => {
  const d = design({ ...DEFAULT_BRIEF, spanM: 60, riseM: 6 }, { ...cableNet.defaults, analysis: "3d" });
  it("fills Design.analysis: every design combination converged with no slack cable, the prestress, and a view with the masts", () => {
    expect(d.reason).toBe("");
    const a = d.analysis!;
    expect(a.loadCases.length).toBeGreaterThanOrEqual(8);
    expect(a.loadCases.every((c) => c.converged && c.slackMembers === 0)).toBe(true);
    expect(a.prestressKN).toBeGreaterThan(0);
    expect(a.view?.members.filter((m) => m.kind === "strut")).toHaveLength(cableNet.defaults.masts);
    expect(a.loadCases.map((c) => c.name)).toContain(a.view?.caseName);
  });
  it("checks the largest displacement against span/100 and keeps it", () => {
    const c = d.checks.find((x) => x.name.startsWith("largest displacement"));
    expect(c?.passed).toBe(true);
    expect(c?.capacity).toBeCloseTo(60 / 100, 9);
  });
  it("sizes the radial cables from the analysed forces, not the closed form's (no valley cables in the form-found net)", () => {
    expect(d.members.some((m) => m.element === "outer radial cables")).toBe(true);
    expect(d.members.some((m) => m.element.includes("valley"))).toBe(false);
    const closed = design({ ...DEFAULT_BRIEF, spanM: 60, riseM: 6 }, { ...cableNet.defaults, analysis: "closed-form" });
    expect(closed.analysis).toBeUndefined();
    expect(closed.members.some((m) => m.element.includes("valley"))).toBe(true);
  });
  it("draws the form-found net in section: its radial cables from the mast head to the edge and to the central ring, no valley cables", () => {
    const lines = d.drawing.section;
    expect(lines.some((l) => l.role === "valley cable")).toBe(false);
    const layout = cableNetLayout({ ...DEFAULT_BRIEF, spanM: 60, riseM: 6 }, cableNet.defaults.masts, cableNet.defaults.mastRingRatio, cableNet.defaults.mastHeightRatio, cableNet.defaults.radialCablesPerMast, cableNet.defaults.hangerSpacingM);
    const radial = lines.filter((l) => l.role === "radial cable" && l.points[0]![0] > 0);
    // every radial cable of the first mast (both sides of the section mirror it)
    expect(radial).toHaveLength(cableNet.defaults.radialCablesPerMast);
    const head = [layout.mastRadiusM, layout.mastHeadM + DEFAULT_BRIEF.eavesHeightM];
    for (const l of radial) {
      expect(l.points[0]![0]).toBeCloseTo(head[0]!, 6);
      expect(l.points[0]![1]).toBeCloseTo(head[1]!, 6);
      const end = l.points.at(-1)!;
      const atEdge = Math.abs(end[0] - layout.cap.baseRadiusM) < 1e-6;
      const atRing = Math.abs(end[0] - layout.centralRingRadiusM) < 1e-6;
      expect(atEdge || atRing).toBe(true);
    }
    const closedLines = design({ ...DEFAULT_BRIEF, spanM: 60, riseM: 6 }, { ...cableNet.defaults, analysis: "closed-form" }).drawing.section;
    expect(closedLines.some((l) => l.role === "valley cable")).toBe(true);
  });
  it("covers the form-found net with fabric: its surface lies between the plan's and the plan's × the steepest facet's secant, above the cap's; the take-off and the section follow it", () => {
    const brief = { ...DEFAULT_BRIEF, spanM: 60, riseM: 6 };
    const closed = design(brief, { ...cableNet.defaults, analysis: "closed-form" });
    const layout = cableNetLayout(brief, cableNet.defaults.masts, cableNet.defaults.mastRingRatio, cableNet.defaults.mastHeightRatio, cableNet.defaults.radialCablesPerMast, cableNet.defaults.hangerSpacingM);
    // the closed form's fabric is on the cap; the 3D net stands on or above it, up to the mast heads, so its surface is larger
    expect(closed.roofSurfaceM2).toBeCloseTo(layout.cap.surfaceM2, 6);
    expect(d.roofSurfaceM2).toBeGreaterThan(layout.cap.surfaceM2);
    // no facet is steeper than the line from a mast head straight down to the nearest edge anchor or the ring
    const steepest = Math.max(layout.mastHeadM / (layout.cap.baseRadiusM - layout.mastRadiusM), (layout.mastHeadM - layout.inner.endHeightM) / (layout.mastRadiusM - layout.centralRingRadiusM));
    expect(d.roofSurfaceM2).toBeLessThan(layout.cap.planAreaM2 * Math.hypot(1, steepest));
    const fabric = (x: typeof d) => x.takeoff.find((r) => r.element === "fabric")!;
    expectRelClose(fabric(d).quantity, d.roofSurfaceM2 * (1 + cableNet.defaults.fabricAllowancePct / 100), 1e-12);
    expectRelClose(fabric(closed).quantity, closed.roofSurfaceM2 * (1 + cableNet.defaults.fabricAllowancePct / 100), 1e-12);
    expect(d.warnings.some((w) => w.includes("node to node of the form-found net") && w.includes(`${wholeNumber(d.roofSurfaceM2)} m²`))).toBe(true);
    // the section's fabric runs through the mast head (it lies on the net) and down to the edge at the eaves
    const line = d.drawing.section.find((l) => l.role === "fabric")!;
    const top = Math.max(...line.points.map((p) => p[1]));
    expect(top).toBeCloseTo(layout.mastHeadM + DEFAULT_BRIEF.eavesHeightM, 6);
    expect(line.points.at(-1)![1]).toBeCloseTo(DEFAULT_BRIEF.eavesHeightM, 6);
  });
  it("checks the fabric panels under uplift and the edge cables for the span between circumferential cables along the net's slope; under gravity for their plan spacing (the safe side on a slope)", () => {
    const brief = { ...DEFAULT_BRIEF, spanM: 60, riseM: 6 };
    const closed = design(brief, { ...cableNet.defaults, analysis: "closed-form" });
    const demand = (x: typeof d, name: string) => x.checks.find((c) => c.name === name)!.demand;
    // n = p s²/(8 f), f ∝ s: the ratio is the span's, at least the widest plan gap's over the spacing
    const ratio = demand(d, "fabric panel, uplift") / demand(closed, "fabric panel, uplift");
    const layout = cableNetLayout(brief, cableNet.defaults.masts, cableNet.defaults.mastRingRatio, cableNet.defaults.mastHeightRatio, cableNet.defaults.radialCablesPerMast, cableNet.defaults.hangerSpacingM);
    const radii = [layout.centralRingRadiusM, layout.mastRadiusM, ...layout.hoopRadiiM, layout.cap.baseRadiusM].sort((x, y) => x - y);
    const widest = Math.max(...radii.slice(1).map((r, i) => r - radii[i]!));
    expect(ratio).toBeGreaterThan(1);
    expect(ratio * cableNet.defaults.hangerSpacingM).toBeGreaterThanOrEqual(widest * (1 - 1e-9));
    // no segment is steeper than the mast head straight down to the central ring or the edge over the widest gap
    const steepest = Math.max(Math.hypot(1, layout.mastHeadM / (layout.cap.baseRadiusM - layout.mastRadiusM)), Math.hypot(1, layout.mastHeadM / widest));
    expect(ratio * cableNet.defaults.hangerSpacingM).toBeLessThanOrEqual(steepest * widest);
    expectRelClose(demand(d, "fabric panel, gravity"), demand(closed, "fabric panel, gravity"), 1e-12);
    const edge = (x: typeof d) => x.members.find((m) => m.element === "edge cables")!.designForceN;
    expect(edge(d)).toBeGreaterThanOrEqual(edge(closed) * (1 - 1e-12));
  });
});
