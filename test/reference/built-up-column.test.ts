import { describe, it, expect } from "vitest";
import { lacedColumnForces, lacingShearStiffnessN } from "../../src/mechanics/built-up-column";
import { expectRelClose } from "../helpers/close";

// A stated case, evaluated by hand from EN 1993-1-1 §6.4.1–6.4.2 (eq. 6.69, 6.70, 6.72, 6.73 and
// Fig. 6.9; the figure's expressions from memory, checked by virtual work on one panel): values
// "computed by hand from EN 1993-1-1 eq. 6.69/6.72/6.73", four to five significant figures.
// Two chords, A_ch = 5,000 mm² each, h0 = 1.0 m, L = 20 m, N_Ed = 1,000 kN, M_Ed^I = 0;
// W lacing (diagonals alternating, no posts) in n = 2 planes, a = 2.0 m, A_d = 1,000 mm²; E = 210 GPa.
const stated = {
  lengthM: 20,
  axialN: 1e6,
  chordSpacingM: 1.0,
  chordAreaM2: 5e-3,
  chordsPerSide: 1 as const,
  lacing: { kind: "W" as const, planes: 2, panelM: 2.0, diagonalAreaM2: 1e-3 },
  modulusPa: 210e9,
};

describe("laced built-up column, EN 1993-1-1 §6.4 (computed by hand)", () => {
  const r = lacedColumnForces(stated);
  it("e0 = L/500 = 0.04 m; I_eff = 0.5·h0²·A_ch = 2.5e-3 m⁴ (eq. 6.72); N_cr = π²·E·I_eff/L² = 12,954 kN", () => {
    expectRelClose(r.bowM, 0.04, 1e-12);
    expectRelClose(r.effectiveSecondMomentM4, 2.5e-3, 1e-12);
    expectRelClose(r.criticalForceN, 12_954e3, 1e-4);
  });
  it("S_v = n·E·A_d·a·h0²/(2·d³), d = √(1² + 1²) = 1.4142 m: 2·210e9·1e-3·2·1/(2·2.8284) = 148,490 kN (Fig. 6.9)", () => {
    expectRelClose(r.diagonalLengthM, 1.4142, 1e-4);
    expectRelClose(r.shearStiffnessN, 148_490e3, 1e-4);
  });
  it("M_Ed = N·e0/(1 − N/N_cr − N/S_v) = 40.0/(1 − 0.07720 − 0.00673) = 43.665 kNm (eq. 6.70)", () => {
    expectRelClose(r.momentNm, 43_665, 1e-4);
  });
  it("N_ch,Ed = 0.5·N + M·h0·A_ch/(2·I_eff) = 500 + 43.665 = 543.67 kN (eq. 6.69)", () => {
    expectRelClose(r.chordForceN, 543_665, 1e-5);
  });
  it("V_Ed = π·M_Ed/L = 6.8589 kN (eq. 6.73); a diagonal carries V·d/(n·h0) = 4.8499 kN", () => {
    expectRelClose(r.shearN, 6_858.9, 1e-4);
    expectRelClose(r.diagonalForceN, 4_849.9, 1e-4);
  });
  it("N lacing with posts (A_v = 1,000 mm², a = 1.0 m, d = 1.4142 m): S_v = n·E·A_d·a·h0²/(d³·(1 + A_d·h0³/(A_v·d³))) = 109,706 kN", () => {
    const sv = lacingShearStiffnessN({ chordSpacingM: 1, modulusPa: 210e9, lacing: { kind: "N", planes: 2, panelM: 1, diagonalAreaM2: 1e-3, postAreaM2: 1e-3 } });
    expectRelClose(sv, 109_706e3, 1e-4);
  });
  it("a square four-chord mast (two chords a side) carries half the side's force in each chord", () => {
    const four = lacedColumnForces({ ...stated, chordAreaM2: stated.chordAreaM2 / 2, chordsPerSide: 2 });
    expectRelClose(four.momentNm, r.momentNm, 1e-12);
    expectRelClose(four.chordForceN, r.chordForceN / 2, 1e-12);
  });
  it("past the member's stability limit the moment is infinite, and bad input names the field", () => {
    expect(lacedColumnForces({ ...stated, axialN: 13e6 }).momentNm).toBe(Infinity);
    expect(() => lacedColumnForces({ ...stated, chordSpacingM: 0 })).toThrow(/chordSpacingM: 0/);
    expect(() => lacingShearStiffnessN({ chordSpacingM: 1, lacing: { kind: "N", planes: 2, panelM: 1, diagonalAreaM2: 1e-3 } })).toThrow(/postAreaM2/);
  });
});
