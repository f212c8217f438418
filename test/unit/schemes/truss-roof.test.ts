import { describe, it, expect } from "vitest";
import { trussRoof } from "../../../src/schemes/truss-roof";
import { trussLayout } from "../../../src/schemes/truss-roof/layout";
import { gradedBeamDeflectionM } from "../../../src/schemes/truss-roof/truss";
import { simplySupportedUdl } from "../../../src/mechanics";
import { DEFAULT_BRIEF } from "../../../src/brief";
import { defaultCatalogue } from "../../../src/catalogue/default-catalogue";
import { expectRelClose } from "../../helpers/close";

const catalogue = defaultCatalogue();

describe("trussRoof.design", () => {
  const d = trussRoof.design(DEFAULT_BRIEF, trussRoof.defaults, catalogue);
  it("is feasible at 160 m with the default brief", () => {
    expect(d.reason).toBe("");
    expect(d.feasible).toBe(true);
  });
  it("take-off masses sum to totalMassKg", () => expectRelClose(d.takeoff.reduce((s, r) => s + r.massKg, 0), d.totalMassKg, 1e-12));
  it("warns that the brief's rise is not used and the clear height is the eaves height", () => {
    expect(d.warnings.some((w) => w.startsWith("flat truss roof: the brief's rise of 24 m is not used"))).toBe(true);
    expect(d.usableFloorM2).toBeCloseTo(d.planAreaM2, 6);
  });
  it("has no usable floor when the eaves are below the minimum clear height", () => {
    const low = trussRoof.design({ ...DEFAULT_BRIEF, eavesHeightM: 8 }, trussRoof.defaults, catalogue);
    expect(low.usableFloorM2).toBe(0);
  });
  it("meets the deflection limit and every check", () => {
    expect(d.checks.find((c) => c.name.startsWith("truss deflection"))?.passed).toBe(true);
    expect(d.checks.every((c) => c.passed)).toBe(true);
  });
  it("chooses a depth in 8–25 when asked, no heavier in trusses than the default ratio", () => {
    const opt = trussRoof.design(DEFAULT_BRIEF, { ...trussRoof.defaults, optimiseDepth: true }, catalogue);
    const ratio = opt.summary.find((s) => s.key === "spanDepthRatio")!.value;
    expect(ratio).toBeGreaterThanOrEqual(8);
    expect(ratio).toBeLessThanOrEqual(25);
    const trussKg = (x: typeof d) => x.takeoff.filter((r) => r.costItem === "steel-truss").reduce((s, r) => s + r.massKg, 0);
    expect(trussKg(opt)).toBeLessThanOrEqual(trussKg(d) * 1.01);
  });
  it("rejects a span/depth outside 8–25, naming the option", () => {
    expect(() => trussRoof.design(DEFAULT_BRIEF, { ...trussRoof.defaults, spanDepthRatio: 30 }, catalogue)).toThrow(/invalid spanDepthRatio: 30/);
  });
});

describe("trussLayout", () => {
  it("puts each truss on its own chord of the circle", () => {
    const l = trussLayout(160, 8);
    l.offsetsM.forEach((y, k) => expectRelClose(l.spansM[k]!, 2 * Math.sqrt(80 * 80 - y * y), 1e-12));
    expect(Math.max(...l.spansM)).toBeCloseTo(160, 6);
  });
});

describe("gradedBeamDeflectionM", () => {
  // With one stiffness everywhere the virtual-work integral is the closed form 5wL⁴/(384EI).
  it("equals 5wL⁴/(384EI) for uniform EI", () => {
    const ei = 2.1e11 * 0.5;
    expectRelClose(gradedBeamDeflectionM(12e3, 60, [10, 20, 30], [ei, ei, ei]), simplySupportedUdl(12e3, 60, ei).deflectionM, 1e-9);
  });
});

describe("truss roof: the purlins are shown by their moment", () => {
  it("carries the purlins' design moment and moment resistance (their force columns are 0), the utilisation their ratio, and names the check that set W", () => {
    const d = trussRoof.design(DEFAULT_BRIEF, trussRoof.defaults, catalogue);
    const purlins = d.members.find((m) => m.element === "purlins");
    expect(purlins?.bending).toBeDefined();
    const { designMomentNm, resistanceNm } = purlins!.bending!;
    expect(designMomentNm).toBeGreaterThan(0);
    expectRelClose(purlins!.utilisation, designMomentNm / resistanceNm, 1e-12);
    expect(purlins!.governing).toMatch(purlins!.utilisation > 1 - 1e-9 ? /^bending/ : /^deflection span\/200/);
    // only a member in bending carries a moment
    expect(d.members.filter((m) => m.bending).map((m) => m.element)).toEqual(["purlins"]);
  });
});
