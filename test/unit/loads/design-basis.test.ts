import { describe, it, expect } from "vitest";
import {
  designBasis,
  designCombinations,
  domeCpe,
  temperatureCase,
  gaussLegendre,
  integrate1d,
  integrateOverPlan,
  planPointOf,
  angleFromCrownAt,
  combinationAtPlanKPa,
  caseAtSurfaceKPa,
  summariseCombination,
  TEMPERATURE_DEFAULTS,
} from "../../../src/loads";
import { sphericalCap } from "../../../src/mechanics/spherical-cap";
import { DEFAULT_BRIEF, DEFAULT_FACTORS } from "../../../src/brief";
import { expectRelClose } from "../../helpers/close";

describe("designCombinations", () => {
  it("with 6.10a/b: every action set as 6.10b and each distinct gravity set once as 6.10a", () => {
    const all = designCombinations(DEFAULT_FACTORS, "6.10a/b");
    expect(all.filter((c) => c.expression === "6.10b")).toHaveLength(9);
    expect(all.filter((c) => c.expression === "6.10a").map((c) => c.name)).toEqual([
      "permanent only (6.10a)",
      "uniform snow (6.10a)",
      "uniform snow + wind, all accompanying (6.10a)",
      "drifted snow (6.10a)",
      "drifted snow + wind, all accompanying (6.10a)",
    ]);
  });
  it("with 6.10: no 6.10a or 6.10b, γ_G,sup on G in gravity", () => {
    const all = designCombinations(DEFAULT_FACTORS, "6.10");
    expect(all.every((c) => c.expression === "6.10")).toBe(true);
    expect(all.filter((c) => c.purpose === "gravity").every((c) => c.permanentFactor === 1.35)).toBe(true);
  });
  it("names and ids are unique", () => {
    const all = designCombinations(DEFAULT_FACTORS, "6.10a/b");
    expect(new Set(all.map((c) => c.name)).size).toBe(all.length);
    expect(new Set(all.map((c) => c.id)).size).toBe(all.length);
  });
  it("imposed is never combined with snow or wind (EN 1991-1-1 §3.3.2(1))", () => {
    for (const c of designCombinations(DEFAULT_FACTORS, "6.10a/b")) {
      if (c.terms.some((t) => t.caseId === "imposed")) expect(c.terms).toHaveLength(1);
    }
  });
  it("uplift takes G as favourable and no snow", () => {
    for (const c of designCombinations(DEFAULT_FACTORS, "6.10a/b").filter((x) => x.purpose === "uplift")) {
      expect(c.permanentFactor).toBe(DEFAULT_FACTORS.gammaGInf);
      expect(c.terms.map((t) => t.caseId)).toEqual(["wind-internal-pressure"]);
    }
  });
  it("only the temperature-leading combination is for temperature-sensitive schemes alone", () => {
    const flagged = designCombinations(DEFAULT_FACTORS, "6.10").filter((c) => c.temperatureSensitiveOnly);
    expect(flagged.map((c) => [c.name, c.temperatureFactor])).toEqual([["temperature + wind uplift (6.10)", 1.5]]);
  });
});

describe("designBasis", () => {
  const basis = designBasis(DEFAULT_BRIEF);
  it("has the six pressure cases and the temperature case", () => {
    expect(Object.keys(basis.cases).sort()).toEqual(["imposed", "services", "snow-drifted", "snow-uniform", "wind-internal-pressure", "wind-internal-suction"]);
    expect(basis.temperature.fallK).toBe(TEMPERATURE_DEFAULTS.minMemberC - TEMPERATURE_DEFAULTS.installationC);
  });
  it("marks the Fig. 7.12 values as from memory in the wind cases' source", () => {
    expect(basis.cases["wind-internal-pressure"].source).toMatch(/FROM MEMORY/);
  });
  it("says that the cylindrical-roof snow rule on a dome is common practice", () => {
    expect(basis.cases["snow-drifted"].source).toMatch(/common practice, not an EN clause/);
  });
  it("gravity combinations' uniform equivalent is their peak, uplift's their minimum", () => {
    for (const c of basis.combinations) {
      const s = summariseCombination(basis, c, 0.3);
      expect(s.uniformEquivalentKPa).toBe(c.purpose === "gravity" ? s.peakKPa : s.minKPa);
    }
  });
  it("rejects a negative self-weight, naming it", () => {
    expect(() => combinationAtPlanKPa(basis, basis.combinations[0]!, -1)).toThrow(/invalid self-weight: -1 kPa/);
  });
});

describe("bad input", () => {
  it("domeCpe rejects f/d over 0.5", () => expect(() => domeCpe(0.6, 0)).toThrow(/f\/d: 0.6 \(expected 0 to 0.5/));
  it("domeCpe rejects a negative h/d", () => expect(() => domeCpe(0.1, -1)).toThrow(/h\/d/));
  it("temperatureCase needs T_e,min < T0 < T_e,max", () =>
    expect(() => temperatureCase({ installationC: 10, minMemberC: 20, maxMemberC: 40 })).toThrow(/expected T_e,min < T0 < T_e,max/));
  it("gaussLegendre rejects order 0", () => expect(() => gaussLegendre(0)).toThrow(/quadrature order: 0/));
  it("integrate1d rejects a fractional panel count", () => expect(() => integrate1d((t) => t, 0, 1, 1.5)).toThrow(/panel count/));
  it("integrateOverPlan rejects an inner radius beyond the outer", () => expect(() => integrateOverPlan(() => 1, { radiusM: 1, innerRadiusM: 2 })).toThrow(/plan region/));
  it("planPointOf rejects an angle beyond the edge", () => expect(() => planPointOf(sphericalCap(100, 10), 1, 0)).toThrow(/angle from the crown/));
});

describe("coordinates", () => {
  const cap = sphericalCap(100, 20);
  it("azimuth 0 is the windward base (x = −a), π the leeward", () => {
    expectRelClose(planPointOf(cap, cap.edgeAngleRad, 0).xM, -50, 1e-12);
    expectRelClose(planPointOf(cap, cap.edgeAngleRad, Math.PI).xM, 50, 1e-12);
  });
  it("angleFromCrownAt inverts planPointOf", () => {
    const p = planPointOf(cap, 0.3, 2.1);
    expectRelClose(angleFromCrownAt(cap, p.xM, p.yM), 0.3, 1e-12);
  });
  it("caseAtSurfaceKPa reads the drifted snow's heavy half on the windward side and the light half on the leeward", () => {
    const basis = designBasis(DEFAULT_BRIEF);
    const drift = basis.cases["snow-drifted"];
    expect(caseAtSurfaceKPa(drift, basis.cap, 0.2, 0)).toBe(drift.peakKPa);
    expect(caseAtSurfaceKPa(drift, basis.cap, 0.2, Math.PI)).toBe(drift.peakKPa / 2);
  });
  it("integrate1d splits at breaks, so a step integrates exactly", () => expectRelClose(integrate1d((t) => (t < 0.3 ? 1 : 0), 0, 1, 1, [0.3]), 0.3, 1e-14));
  it("integrate1d of reversed limits is negative", () => expectRelClose(integrate1d((t) => t, 1, 0), -0.5, 1e-14));
});
