import { describe, it, expect } from "vitest";
import { defaultCatalogue } from "../../../src/catalogue/default-catalogue";
import { chsResistance, pickLightestChs } from "../../../src/catalogue/pick-chs";
import { lacedColumnForces } from "../../../src/mechanics/built-up-column";
import { designLacedMast, MAST_FACE_MAX_M, MAST_SEGMENT_MAX_M } from "../../../src/schemes/cable-net/laced-mast";

const sections = defaultCatalogue().chs;
const fy = 355e6;

describe("laced masts (cable net)", () => {
  it("a 30 m mast under 5 MN: a laced square lighter than the lightest single catalogue tube, its checks re-done from §6.4", () => {
    const m = designLacedMast(sections, 5e6, 30, fy)!;
    expect(m).not.toBeNull();
    const tube = pickLightestChs(sections, { forceN: -5e6, effectiveLengthM: 30, yieldPa: fy, curve: "a" });
    expect(tube).not.toBeNull();
    expect(m.massKgPerM).toBeLessThan(tube!.section.massKgPerM);
    expect(m.faceM).toBeLessThanOrEqual(MAST_FACE_MAX_M);
    expect(m.segments).toBe(Math.ceil(30 / MAST_SEGMENT_MAX_M));
    const f = lacedColumnForces({ lengthM: 30, axialN: 5e6, chordSpacingM: m.faceM, chordAreaM2: m.chord.areaM2, chordsPerSide: 2, lacing: { kind: "W", planes: 2, panelM: m.panelM, diagonalAreaM2: m.diagonal.areaM2 } });
    const chord = chsResistance(m.chord, { forceN: -f.chordForceN, effectiveLengthM: m.panelM, yieldPa: fy, curve: "a" })!;
    const diagonal = chsResistance(m.diagonal, { forceN: -f.diagonalForceN, effectiveLengthM: f.diagonalLengthM, yieldPa: fy, curve: "a" })!;
    expect(chord.utilisation).toBeLessThanOrEqual(1);
    expect(diagonal.utilisation).toBeLessThanOrEqual(1);
    expect(m.utilisation).toBeCloseTo(Math.max(chord.utilisation, diagonal.utilisation), 12);
    // Mass per metre: four chords and, on four faces, two diagonals per panel.
    expect(m.massKgPerM).toBeCloseTo(4 * m.chord.massKgPerM + (8 * f.diagonalLengthM * m.diagonal.massKgPerM) / m.panelM, 9);
    expect(m.designation).toMatch(/^laced mast [\d.]+ m square: 4 × CHS .+ chords, CHS .+ diagonals at [\d.]+ m, 3 segments ≤ 12 m$/);
  });
  it("heavier load, heavier mast; beyond every chord in the catalogue, none", () => {
    const light = designLacedMast(sections, 2e6, 30, fy)!;
    const heavy = designLacedMast(sections, 8e6, 30, fy)!;
    expect(heavy.massKgPerM).toBeGreaterThan(light.massKgPerM);
    expect(designLacedMast(sections, 1e10, 30, fy)).toBeNull();
  });
});
