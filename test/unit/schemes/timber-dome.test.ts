import { describe, it, expect } from "vitest";
import { timberDome } from "../../../src/schemes/timber-dome";
import { GLULAM_SECTIONS } from "../../../src/schemes/timber-dome/sections";
import { geodesicCap, cachedGeodesicCap, effectiveCharDepthM } from "../../../src/mechanics";
import { DEFAULT_BRIEF } from "../../../src/brief";
import { defaultCatalogue } from "../../../src/catalogue/default-catalogue";
import { expectRelClose } from "../../helpers/close";

const catalogue = defaultCatalogue();

describe("timberDome.design", () => {
  const d = timberDome.design(DEFAULT_BRIEF, timberDome.defaults, catalogue);
  const rows = (pred: (r: (typeof d.takeoff)[number]) => boolean) => d.takeoff.filter(pred);
  it("is feasible at 160 m with the default brief, and every check passes", () => {
    expect(d.reason).toBe("");
    expect(d.feasible).toBe(true);
    expect(d.checks.every((c) => c.passed)).toBe(true);
  });
  it("take-off masses sum to totalMassKg", () => expectRelClose(d.takeoff.reduce((s, r) => s + r.massKg, 0), d.totalMassKg, 1e-12));
  it("measures glulam by volume, with mass at the class's mean density", () => {
    const glulam = rows((r) => r.costItem === "glulam-structure");
    expect(glulam.length).toBe(2);
    const rho = catalogue.glulam.find((g) => g.strengthClass === timberDome.defaults.strengthClass)!.densityMeanKgPerM3;
    for (const r of glulam) {
      expect(r.unit).toBe("m3");
      expectRelClose(r.massKg, r.quantity * rho, 1e-12);
    }
  });
  it("has rows for connectors, ring, deck and membrane", () => {
    for (const item of ["steel-connectors", "steel-ring", "timber-deck", "roofing-membrane"]) expect(rows((r) => r.costItem === item).length).toBe(1);
  });
  it("connectors are the stated allowance per m³ of glulam", () => {
    const glulamM3 = rows((r) => r.costItem === "glulam-structure").reduce((s, r) => s + r.quantity, 0);
    expectRelClose(rows((r) => r.costItem === "steel-connectors")[0]!.massKg, timberDome.defaults.connectorKgPerM3 * glulamM3, 1e-12);
  });
  it("fire resistance adds charring: more glulam, every member at least 2·d_ef wider", () => {
    const f = timberDome.design(DEFAULT_BRIEF, { ...timberDome.defaults, fireMinutes: 60 }, catalogue);
    expect(f.feasible).toBe(true);
    const volume = (x: typeof d) => x.takeoff.filter((r) => r.costItem === "glulam-structure").reduce((s, r) => s + r.quantity, 0);
    expect(volume(f)).toBeGreaterThan(volume(d));
    const widthMm = (section: string) => Number(/GL (\d+)×/.exec(section)![1]);
    const dEf = effectiveCharDepthM(60) * 1000;
    for (const m of f.members) expect(widthMm(m.section)).toBeGreaterThanOrEqual(120 + 2 * dEf - 1e-9);
    expect(f.warnings.some((w) => w.startsWith("fire: 60 min"))).toBe(true);
  });
  it("a stiffer service class (SC1) needs no more glulam than SC3", () => {
    const volume = (serviceClass: string) =>
      timberDome.design(DEFAULT_BRIEF, { ...timberDome.defaults, serviceClass }, catalogue).takeoff.filter((r) => r.costItem === "glulam-structure").reduce((s, r) => s + r.quantity, 0);
    expect(volume("1")).toBeLessThanOrEqual(volume("3"));
  });
  it("is infeasible, not an exception, when general buckling cannot be met", () => {
    const flat = timberDome.design({ ...DEFAULT_BRIEF, spanM: 160, riseM: 8 }, { ...timberDome.defaults, knockDown: 0.05 }, catalogue);
    expect(flat.feasible).toBe(false);
    expect(flat.reason).toMatch(/glulam section/);
  });
  it("rejects an out-of-range option, naming it", () => {
    expect(() => timberDome.design(DEFAULT_BRIEF, { ...timberDome.defaults, knockDown: 2 }, catalogue)).toThrow(/invalid knockDown: 2/);
  });
  it("rejects a strength class the catalogue lacks, naming it", () => {
    expect(() => timberDome.design(DEFAULT_BRIEF, { ...timberDome.defaults, strengthClass: "GL99h" }, catalogue)).toThrow(/strengthClass/);
  });
});

describe("timber dome parts", () => {
  it("cachedGeodesicCap gives the same cap object for the same arguments, and the cap geodesicCap makes", () => {
    const a = cachedGeodesicCap(6, 50, 0.6);
    expect(cachedGeodesicCap(6, 50, 0.6)).toBe(a);
    expect(a.edges.length).toBe(geodesicCap(6, 50, 0.6).edges.length);
  });
  it("glulam sections are sorted by area, depth 2–8 times the width", () => {
    for (let i = 1; i < GLULAM_SECTIONS.length; i++) expect(GLULAM_SECTIONS[i]!.areaM2).toBeGreaterThanOrEqual(GLULAM_SECTIONS[i - 1]!.areaM2);
    for (const s of GLULAM_SECTIONS) expect(s.depthM / s.widthM).toBeGreaterThanOrEqual(2 - 1e-9);
  });
});

describe("timber dome: the purlins are shown by their moment", () => {
  it("carries the purlins' design moment and the moment resistance of their bending check, the utilisation their ratio", () => {
    const d = timberDome.design(DEFAULT_BRIEF, timberDome.defaults, catalogue);
    const purlins = d.members.find((m) => m.element === "purlins");
    expect(purlins?.bending).toBeDefined();
    const { designMomentNm, resistanceNm } = purlins!.bending!;
    expect(designMomentNm).toBeGreaterThan(0);
    expectRelClose(purlins!.utilisation, designMomentNm / resistanceNm, 1e-12);
    expect(purlins!.governing).toBe("bending, EN 1995-1-1 eq. 6.11"); // no axial force: not "tension and bending"; the case is the check table's
    expect(d.members.filter((m) => m.bending).map((m) => m.element)).toEqual(["purlins"]);
  });
});
