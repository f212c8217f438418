import { describe, it, expect } from "vitest";
import { concreteShell } from "../../../src/schemes/concrete-shell";
import { minimumReinforcementRatio } from "../../../src/mechanics/concrete";
import { concreteProperties, zoellyPressurePa } from "../../../src/mechanics";
import { DEFAULT_BRIEF } from "../../../src/brief";
import { defaultCatalogue } from "../../../src/catalogue/default-catalogue";
import { expectAbsClose, expectRelClose } from "../../helpers/close";

const catalogue = defaultCatalogue();

describe("concreteShell.design", () => {
  const d = concreteShell.design(DEFAULT_BRIEF, concreteShell.defaults, catalogue);
  const value = (key: string, design = d) => design.summary.find((s) => s.key === key)?.value ?? Number.NaN;
  it("is feasible at 160 m with the default brief", () => {
    expect(d.reason).toBe("");
    expect(d.feasible).toBe(true);
  });
  it("take-off masses sum to totalMassKg", () => expectRelClose(d.takeoff.reduce((s, r) => s + r.massKg, 0), d.totalMassKg, 1e-12));
  it("is buckling-governed at 160 m and meets k·p_cl at the chosen thickness", () => {
    expect(d.warnings).toContain("thickness set by buckling");
    const c = d.checks.find((x) => x.name === "shell buckling")!;
    expect(c.passed).toBe(true);
    // independent recomputation of the capacity: 0.2 × Zoelly at E_cm/(1 + 2)
    const t = value("thicknessMm") / 1000;
    expectRelClose(c.capacity, 0.2 * zoellyPressurePa(concreteProperties("C30/37").ecmPa / 3, t, value("sphereRadiusM"), 0.2), 1e-9);
  });
  it("is the constructable minimum on a small span", () => {
    const small = concreteShell.design({ ...DEFAULT_BRIEF, spanM: 40, riseM: 6 }, concreteShell.defaults, catalogue);
    expect(value("thicknessMm", small)).toBe(90);
  });
  it("has a formwork row with no material, priced as formwork, over the shell surface", () => {
    const f = d.takeoff.find((r) => r.costItem === "formwork")!;
    expect(f.material).toBeNull();
    expect(f.massKg).toBe(0);
    expectRelClose(f.quantity, d.roofSurfaceM2, 1e-12);
  });
  it("prestressing the ring needs less ring concrete than a reinforced tie", () => {
    const p = concreteShell.design(DEFAULT_BRIEF, { ...concreteShell.defaults, ringTie: "prestress" }, catalogue);
    const ring = (x: typeof d) => x.takeoff.find((r) => r.element === "edge ring concrete")!.quantity;
    expect(ring(p)).toBeLessThan(ring(d));
    expect(p.takeoff.some((r) => r.costItem === "prestressing" && r.material === "steel-strand")).toBe(true);
  });
  it("names the GGBS concrete when chosen", () => {
    const g = concreteShell.design(DEFAULT_BRIEF, { ...concreteShell.defaults, cement: "ggbs", concreteClass: "C40/50" }, catalogue);
    expect(g.takeoff[0]!.material).toBe("concrete-c40-50-ggbs");
  });
  it("rejects an unknown tie, naming the option", () => {
    expect(() => concreteShell.design(DEFAULT_BRIEF, { ...concreteShell.defaults, ringTie: "rope" }, catalogue)).toThrow(/invalid ringTie: rope/);
  });
});

describe("minimumReinforcementRatio (EN 1992-1-1 eq. 9.1N)", () => {
  // C30/37: f_ctm = 0.30 × 30^(2/3) = 2.896 MPa (Table 3.1 lists 2.9); 0.26 × 2.896/500 = 0.001506 > 0.0013.
  it("is 0.26 f_ctm/f_yk = 0.00151 for C30/37", () => expectAbsClose(minimumReinforcementRatio(concreteProperties("C30/37").fctmPa), 0.001506, 2e-6));
  // C20/25 would give 0.26 × 2.21/500 = 0.00115 < 0.0013: the floor applies.
  it("never falls below 0.0013", () => expect(minimumReinforcementRatio(2.21e6)).toBe(0.0013));
});

describe("concrete shell: the plan draws the ribs", () => {
  it("draws a ribbed shell's three-way grid of ribs, a rib through the crown in each family, the next at the rib spacing along the shell; a smooth shell's plan is its edge ring", () => {
    const ribbed = concreteShell.design(DEFAULT_BRIEF, { ...concreteShell.defaults, form: "ribbed" }, catalogue);
    const ribs = (ribbed.drawing.plan ?? []).filter((l) => l.role === "rib");
    const spacing = ribbed.summary.find((s) => s.key === "ribSpacingM")!.value;
    // the ribs through the crown: three, 60° apart
    const throughCrown = ribs.filter((l) => {
      const [p, q] = l.points as [[number, number], [number, number]];
      return Math.abs(p[0] * q[1] - p[1] * q[0]) < 1e-6;
    });
    expect(ribs.length % 3).toBe(0);
    expect(throughCrown).toHaveLength(3);
    // each rib is a chord of the plan circle
    const a = DEFAULT_BRIEF.spanM / 2;
    for (const l of ribs) for (const [x, y] of l.points) expectRelClose(Math.hypot(x, y), a, 1e-9);
    // the family along x: its offsets (y) are R sin(k s / R), the first about the spacing
    const offsets = [...new Set(ribs.filter((l) => Math.abs(l.points[0]![1] - l.points[1]![1]) < 1e-9).map((l) => Math.abs(l.points[0]![1])))].sort((p, q) => p - q);
    expect(offsets[0]).toBe(0);
    expect(offsets[1]).toBeGreaterThan(0.99 * spacing);
    expect(offsets[1]).toBeLessThanOrEqual(spacing);
    const smooth = concreteShell.design(DEFAULT_BRIEF, { ...concreteShell.defaults, form: "smooth" }, catalogue);
    expect((smooth.drawing.plan ?? []).map((l) => l.role)).toEqual(["ring"]);
  });
});
