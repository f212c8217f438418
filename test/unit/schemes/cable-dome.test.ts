import { describe, it, expect } from "vitest";
import { cableDome } from "../../../src/schemes/cable-dome";
import { DEFAULT_BRIEF } from "../../../src/brief";
import { defaultCatalogue } from "../../../src/catalogue/default-catalogue";
import { expectRelClose } from "../../helpers/close";

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
    const ringKg = (x: typeof d) => x.takeoff.filter((r) => r.element.startsWith("compression ring")).reduce((s, r) => s + r.massKg, 0);
    expect(ringKg(steel)).toBeLessThan(ringKg(d));
  });

  it("throws on a bad option, naming it", () => {
    expect(() => design(DEFAULT_BRIEF, { ...cableDome.defaults, postHeightRatio: -1 })).toThrow(/invalid postHeightRatio: -1/);
    expect(() => design(DEFAULT_BRIEF, { ...cableDome.defaults, fabric: "paper" })).toThrow(/invalid fabric: paper/);
  });

  it("draws every role of the section", () => {
    const roles = new Set(d.drawing.section.map((l) => l.role));
    for (const role of ["ridge cable", "diagonal", "hoop", "post", "ring", "fabric"]) expect(roles.has(role)).toBe(true);
  });

  it("counts floor as usable only where the clear height suffices", () => {
    expect(d.usableFloorM2).toBeGreaterThan(0);
    expect(d.usableFloorM2).toBeLessThan(d.planAreaM2);
    const tall = design({ ...DEFAULT_BRIEF, eavesHeightM: 40 });
    expectRelClose(tall.usableFloorM2, tall.planAreaM2, 1e-9);
  });
});

describe("cableDome ring restraint", () => {
  it("without the cables' restraint (bare ring, 3EI/R³) the compression ring is heavier", () => {
    const restrained = cableDome.design(DEFAULT_BRIEF, { ...cableDome.defaults, ringMaterial: "steel" }, catalogue);
    const bare = cableDome.design(DEFAULT_BRIEF, { ...cableDome.defaults, ringMaterial: "steel", ringCableRestraint: false }, catalogue);
    const ringKg = (x: typeof bare) => x.takeoff.filter((r) => r.element === "compression ring").reduce((s, r) => s + r.massKg, 0);
    expect(ringKg(bare)).toBeGreaterThan(ringKg(restrained));
  });
});
