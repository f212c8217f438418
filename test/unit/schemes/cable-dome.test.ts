import { describe, it, expect } from "vitest";
import { cableDome } from "../../../src/schemes/cable-dome";
import { DEFAULT_BRIEF } from "../../../src/brief";
import { defaultCatalogue } from "../../../src/catalogue/default-catalogue";
import { expectRelClose } from "../../helpers/close";
import { wholeNumber } from "../../../src/kernel/units";

/** A whole number of kN as the cautions write it ("1,782"). */
const kNIn = (text: string) => Number(text.replace(/,/g, ""));

const catalogue = defaultCatalogue();
const design = (brief = DEFAULT_BRIEF, options = cableDome.defaults) => cableDome.design(brief, options, catalogue);
const cableKg = (d: ReturnType<typeof design>) => d.takeoff.filter((r) => r.material === "steel-strand").reduce((s, r) => s + r.massKg, 0);

describe("cableDome.design", () => {
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

  it("names cables, posts, rings and fabric in its take-off", () => {
    const elements = d.takeoff.map((r) => r.element);
    for (const e of ["ridge cables", "diagonal cables", "hoops", "posts", "central tension ring", "compression ring", "fabric"]) expect(elements).toContain(e);
    expect(d.takeoff.find((r) => r.element === "fabric")?.unit).toBe("m2");
  });

  it("steel and cable excluding rings weigh 15–40 kg/m² of plan at 160 m (engineering sense)", () => {
    const kg = d.takeoff.filter((r) => ["ridge cables", "diagonal cables", "hoops", "posts"].includes(r.element)).reduce((s, r) => s + r.massKg, 0);
    const perM2 = kg / d.planAreaM2;
    expect(perM2).toBeGreaterThan(15);
    expect(perM2).toBeLessThan(40);
  });

  it("more snow needs more cable", () => {
    const heavier = design({ ...DEFAULT_BRIEF, snowGroundKPa: 2.0 });
    expect(heavier.feasible).toBe(true);
    expect(cableKg(heavier)).toBeGreaterThan(cableKg(d));
  });

  it("every cable keeps the residual prestress: no check fails when feasible", () => {
    expect(d.checks.every((c) => c.passed)).toBe(true);
    expect(d.maxUtilisation).toBeLessThanOrEqual(1);
  });

  it("flags spans outside 40–250 m", () => {
    const small = design({ ...DEFAULT_BRIEF, spanM: 30, riseM: 4.5 });
    expect(small.outsideValidRange).toBe(true);
    expect(small.warnings[0]).toMatch(/outside the method's valid range/);
    const large = design({ ...DEFAULT_BRIEF, spanM: 300, riseM: 45 });
    expect(large.outsideValidRange || !large.feasible).toBe(true);
  });

  it("answers infeasible with a reason, not a throw, where it cannot work", () => {
    const huge = design({ ...DEFAULT_BRIEF, spanM: 400, riseM: 60, snowGroundKPa: 3 });
    expect(huge.feasible).toBe(false);
    expect(huge.reason.length).toBeGreaterThan(10);
  });

  it("a steel ring is lighter than a concrete one", () => {
    const steel = design(DEFAULT_BRIEF, { ...cableDome.defaults, ringMaterial: "steel" });
    const concrete = design(DEFAULT_BRIEF, { ...cableDome.defaults, ringMaterial: "concrete" });
    const ringKg = (x: typeof d) => x.takeoff.filter((r) => r.element.startsWith("compression ring")).reduce((s, r) => s + r.massKg, 0);
    expect(ringKg(steel)).toBeLessThan(ringKg(concrete));
  });

  it("throws on a bad option, naming it", () => {
    expect(() => design(DEFAULT_BRIEF, { ...cableDome.defaults, postHeightRatio: -1 })).toThrow(/invalid postHeightRatio: -1/);
    expect(() => design(DEFAULT_BRIEF, { ...cableDome.defaults, fabric: "paper" })).toThrow(/invalid fabric: paper/);
  });

  it("draws every role of the section", () => {
    const roles = new Set(d.drawing.section.map((l) => l.role));
    for (const role of ["ridge cable", "diagonal", "hoop", "post", "ring", "fabric"]) expect(roles.has(role)).toBe(true);
  });

  it("draws the wall the raised ring sits on, from the eaves up to the ring's underside; none with the ring at the eaves", () => {
    const raise = cableDome.defaults.ringHeightRatio * DEFAULT_BRIEF.spanM;
    expect(raise).toBeGreaterThan(0);
    const walls = d.drawing.section.filter((l) => l.role === "perimeter wall");
    expect(walls).toHaveLength(2);
    for (const w of walls) {
      expect(Math.abs(w.points[0]![0])).toBeCloseTo(DEFAULT_BRIEF.spanM / 2, 6);
      expect(w.points[0]![1]).toBeCloseTo(DEFAULT_BRIEF.eavesHeightM, 6);
      expect(w.points[1]![1]).toBeGreaterThan(DEFAULT_BRIEF.eavesHeightM);
      expect(w.points[1]![1]).toBeLessThan(DEFAULT_BRIEF.eavesHeightM + raise);
    }
    const atEaves = design(DEFAULT_BRIEF, { ...cableDome.defaults, ringHeightRatio: 0 });
    expect(atEaves.drawing.section.some((l) => l.role === "perimeter wall")).toBe(false);
  });

  it("counts floor as usable only where the clear height suffices", () => {
    // a clear height above the compression ring: the outer feet cannot keep it
    const low = design({ ...DEFAULT_BRIEF, minClearHeightM: DEFAULT_BRIEF.eavesHeightM + 2 }, { ...cableDome.defaults, ringHeightRatio: 0 });
    expect(low.usableFloorM2).toBeGreaterThan(0);
    expect(low.usableFloorM2).toBeLessThan(low.planAreaM2);
    const tall = design({ ...DEFAULT_BRIEF, eavesHeightM: 40 });
    expectRelClose(tall.usableFloorM2, tall.planAreaM2, 1e-9);
  });
});

describe("cableDome on the shared design basis (issue 12)", () => {
  const d = design();
  it("keeps the whole floor at the default brief: no post foot below the clear height", () => {
    expectRelClose(d.usableFloorM2, d.planAreaM2, 1e-9);
  });
  it("names the design combination that governs, from the basis", () => {
    expect(d.governingLoadCase).toMatch(/\((6\.10|6\.10a|6\.10b)\)$/);
  });
  it("puts every take-off row in a group: the compression ring is perimeter, the fabric envelope", () => {
    expect(d.takeoff.every((r) => r.group !== undefined)).toBe(true);
    expect(d.takeoff.find((r) => r.element === "compression ring")?.group).toBe("perimeter");
    expect(d.takeoff.find((r) => r.element === "fabric")?.group).toBe("envelope");
    expectRelClose(Object.values(d.massByGroupKg).reduce((a, b) => a + b, 0), d.totalMassKg, 1e-12);
  });
  it("declares hoops, post depth and ring height free, and a rise ÷ span", () => {
    const free = cableDome.options.filter((o) => o.kind === "number" && o.free).map((o) => o.key);
    expect(free).toEqual(["hoops", "postHeightRatio", "ringHeightRatio"]);
    expect(cableDome.riseSpanRatio?.preferred).toBeGreaterThan(0);
  });
  it("more drifted snow needs more prestress or more cable (the drifted case is designed for)", () => {
    const heavier = design({ ...DEFAULT_BRIEF, snowGroundKPa: 1.5 });
    expect(cableKg(heavier)).toBeGreaterThan(cableKg(d));
  });
});

describe("cableDome ring restraint", () => {
  it("a bare ring under a centre-directed pull (4.5EI/r³) needs no more than under normal pressure (3EI/r³)", () => {
    const opts = { ...cableDome.defaults, ringMaterial: "steel", ringCableRestraint: false };
    const ringKg = (x: ReturnType<typeof design>) => x.takeoff.filter((r) => r.element === "compression ring").reduce((s, r) => s + r.massKg, 0);
    const normal = cableDome.design(DEFAULT_BRIEF, { ...opts, bareRingLoad: "normal" }, catalogue);
    const centre = cableDome.design(DEFAULT_BRIEF, { ...opts, bareRingLoad: "centre" }, catalogue);
    expect(ringKg(centre)).toBeLessThanOrEqual(ringKg(normal));
  });
  it("without the cables' restraint (bare ring, 3EI/R³) the compression ring is heavier", () => {
    const restrained = cableDome.design(DEFAULT_BRIEF, { ...cableDome.defaults, ringMaterial: "steel" }, catalogue);
    const bare = cableDome.design(DEFAULT_BRIEF, { ...cableDome.defaults, ringMaterial: "steel", ringCableRestraint: false }, catalogue);
    const ringKg = (x: typeof bare) => x.takeoff.filter((r) => r.element === "compression ring").reduce((s, r) => s + r.massKg, 0);
    expect(ringKg(bare)).toBeGreaterThan(ringKg(restrained));
  });
});

describe("cableDome through the 3D analysis (issue 13)", () => {
  const analysed = { ...cableDome.defaults, analysis: "3d" };
  const d = design(DEFAULT_BRIEF, analysed);
  it("fills Design.analysis: every analysed combination converged, its prestress, and a view of the case that moves it most", () => {
    expect(d.analysis).toBeDefined();
    const a = d.analysis!;
    expect(a.loadCases.length).toBeGreaterThanOrEqual(2);
    expect(a.loadCases.every((c) => c.converged && c.slackMembers === 0)).toBe(true);
    expect(a.prestressKN).toBeGreaterThan(0);
    expect(a.view?.nodes.length).toBeGreaterThan(0);
    expect(a.loadCases.map((c) => c.name)).toContain(a.view?.caseName);
  });
  it("checks the largest displacement against its limit and keeps it", () => {
    const c = d.checks.find((x) => x.name.startsWith("largest displacement"));
    expect(c?.passed).toBe(true);
    expect(c?.capacity).toBeCloseTo(DEFAULT_BRIEF.spanM / 100, 9);
  });
  it("says in words what set the prestress, and the design bears it out", () => {
    const say = (x: ReturnType<typeof design>) => x.warnings.find((w) => w.startsWith("prestress "));
    const displacement = (x: ReturnType<typeof design>) => x.checks.find((c) => c.name.startsWith("largest displacement"))!.utilisation;
    // 60 and 100 m at rise/span 0.08 (measured 0.95 and 0.98 of span/100): the movement limit sets it; a lower prestress tried moved the roof too far
    for (const spanM of [60, 100]) {
      const x = design({ ...DEFAULT_BRIEF, spanM, riseM: 0.08 * spanM }, analysed);
      const words = say(x)!;
      expect(words).toMatch(new RegExp(`^prestress ${wholeNumber(x.analysis!.prestressKN!)} kN, set by how far the roof may move: at ([\\d,]+) kN it moves more than span/100`));
      expect(kNIn(/at ([\d,]+) kN/.exec(words)![1]!)).toBeLessThan(x.analysis!.prestressKN!);
      expect(displacement(x)).toBeGreaterThan(0.8);
      expect(displacement(x)).toBeLessThanOrEqual(1);
    }
    // light snow at 60 m: the roof stays well within its limit, so keeping the cables taut sets it. Until the search went on
    // lowering a passing prestress (4 trials) it stopped at the first that passed and said "the lowest the analysis tried";
    // now a failing one is found and the answer is bracketed within 10 %
    const light = design({ ...DEFAULT_BRIEF, spanM: 60, riseM: 4.8, snowGroundKPa: 0.2 }, analysed);
    const words = say(light)!;
    // it names the cable that kept least, as the member table names it, and what it kept
    const taut = new RegExp(`^prestress ${wholeNumber(light.analysis!.prestressKN!)} kN, set by keeping the cables taut: at ([\\d,]+) kN (.+?) (?:keeps ([\\d.]+) % of its prestress|goes slack) under (.+), against 10 % required$`).exec(words);
    expect(taut, words).not.toBeNull();
    expect(light.members.map((m) => m.element)).toContain(taut![2]);
    expect(light.analysis!.loadCases.map((c) => c.name)).toContain(taut![4]);
    if (taut![3] !== undefined) expect(Number(taut![3])).toBeLessThan(10);
    // a cable the designer lets slacken is never the one named
    const loose = say(design({ ...DEFAULT_BRIEF, spanM: 60, riseM: 4.8, snowGroundKPa: 0.2 }, { ...analysed, slackAllowed: "diagonals" }));
    expect(loose).toMatch(/set by keeping the cables taut: at [\d,]+ kN (?!diagonal)\S/);
    const failing = kNIn(/at ([\d,]+) kN/.exec(words)![1]!);
    expect(failing).toBeLessThan(light.analysis!.prestressKN!);
    expect(failing).toBeGreaterThan(light.analysis!.prestressKN! / 1.1);
    expect(displacement(light)).toBeLessThan(0.8);
    // the closed form says nothing of it
    expect(say(design(DEFAULT_BRIEF, { ...cableDome.defaults, analysis: "closed-form" }))).toBeUndefined();
  });
  it("the closed form alone stays available as the cross-check, without an analysis", () => {
    const closed = design(DEFAULT_BRIEF, { ...cableDome.defaults, analysis: "closed-form" });
    expect(closed.analysis).toBeUndefined();
    expect(closed.feasible).toBe(true);
  });
  it("runs the 3D analysis only within the valid span range (out of range it is not ranked: the closed form answers, and says so)", () => {
    const wide = design({ ...DEFAULT_BRIEF, spanM: 280, riseM: 42 }, analysed);
    expect(wide.analysis).toBeUndefined();
    expect(wide.warnings.some((w) => w.includes("3D analysis is not run"))).toBe(true);
  });
  it("finds a prestress where no combination lifts the roof (the closed form's is nil; a light wind was infeasible)", () => {
    const calm = design({ ...DEFAULT_BRIEF, spanM: 120, riseM: 18, windBasicMPerS: 10 }, analysed);
    expect(calm.reason).toBe("");
    expect(calm.analysis?.loadCases.every((c) => c.converged)).toBe(true);
    expect(calm.analysis?.prestressKN).toBeGreaterThan(100);
  });
});
