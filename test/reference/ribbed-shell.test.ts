import { describe, it, expect } from "vitest";
import { ribbedShellStiffness, ribbedPanelBucklingNPerM, continuumShellPressurePa, zoellyPressurePa, threeWayGridStiffness } from "../../src/mechanics";
import { concreteShell } from "../../src/schemes/concrete-shell";
import { DEFAULT_BRIEF } from "../../src/brief";
import { defaultCatalogue } from "../../src/catalogue/default-catalogue";
import { expectRelClose } from "../helpers/close";

describe("ribbedShellStiffness (equivalent continuum of a shell with a three-way rib grid)", () => {
  it("with no ribs is the solid shell: 4√(DB)/R² equals Zoelly (Timoshenko & Gere §11.9)", () => {
    const s = ribbedShellStiffness(11e9, 0.2, 0.15, 0, 0, 8);
    expectRelClose(continuumShellPressurePa(s.bendingNm, s.membraneNPerM, 150), zoellyPressurePa(11e9, 0.15, 150, 0.2), 1e-12);
    expect(s.ribVolumePerM2).toBe(0);
  });
  it("with a vanishing shell tends to the three-way grid of the ribs about their own axis plus the offset (threeWayGridStiffness, B = 2EA/(√3 L))", () => {
    const s = ribbedShellStiffness(30e9, 0.2, 1e-6, 0.3, 0.9, 6);
    const g = threeWayGridStiffness(30e9 * 0.27, (30e9 * 0.3 * 0.9 ** 3) / 12, 6);
    expectRelClose(s.membraneNPerM, g.membraneNPerM, 1e-4);
    // bending about the ribs' own centroid once the flange is gone: (9/8) EI/h = (3√3/4) EI/L
    expectRelClose(s.bendingNm, g.bendingNm, 1e-3);
  });
  it("rib volume per m² is the rib area times 2√3/L (three families at spacing L√3/2)", () => {
    expectRelClose(ribbedShellStiffness(30e9, 0.2, 0.1, 0.3, 0.6, 8).ribVolumePerM2, (0.18 * 2 * Math.sqrt(3)) / 8, 1e-12);
  });
  it("ribs always stiffen: D and B grow with the rib depth", () => {
    let last = ribbedShellStiffness(11e9, 0.2, 0.12, 0.2, 0, 8);
    for (let d = 0.1; d <= 2; d += 0.1) {
      const s = ribbedShellStiffness(11e9, 0.2, 0.12, 0.2, d, 8);
      expect(s.bendingNm).toBeGreaterThan(last.bendingNm);
      expect(s.membraneNPerM).toBeGreaterThan(last.membraneNPerM);
      last = s;
    }
  });
  it("panel buckling is the square plate's 2π²D/L² (Timoshenko & Gere §9.2, k = 2, from memory)", () => {
    const D = (11e9 * 0.1 ** 3) / (12 * (1 - 0.04));
    expectRelClose(ribbedPanelBucklingNPerM(11e9, 0.2, 0.1, 5), (2 * Math.PI ** 2 * D) / 25, 1e-12);
  });
});

// Plausibility (wide tolerance): issue 12 quotes a ribbed concrete dome of about 201 m span with a
// 5 in (127 mm) shell between its ribs (a built dome; the figure as the issue gives it). The rise
// is not given there: rise/span 0.2 is assumed. The designed shell between the ribs should be of
// that order (within ±50 %), and the ribbed dome far lighter than the smooth one would be.
describe("plausibility: a ribbed concrete dome of about 201 m", () => {
  const d = concreteShell.design({ ...DEFAULT_BRIEF, spanM: 201, riseM: 40 }, { ...concreteShell.defaults, form: "ribbed", ringTie: "prestress" }, defaultCatalogue());
  it("is feasible", () => expect(d.reason).toBe(""));
  it("has a shell between the ribs within ±50 % of 127 mm", () => {
    const t = d.summary.find((s) => s.key === "thicknessMm")!.value;
    expect(t).toBeGreaterThan(127 * 0.5);
    expect(t).toBeLessThan(127 * 1.5);
  });
  it("is lighter at 160 m than the smooth shell at the same rise", () => {
    const brief = { ...DEFAULT_BRIEF, spanM: 160, riseM: 32 };
    const smooth = concreteShell.design(brief, { ...concreteShell.defaults, ringTie: "prestress" }, defaultCatalogue());
    const ribbed = concreteShell.design(brief, { ...concreteShell.defaults, ringTie: "prestress", form: "ribbed" }, defaultCatalogue());
    expect(ribbed.selfWeightKgPerM2).toBeLessThan(smooth.selfWeightKgPerM2);
  });
});
