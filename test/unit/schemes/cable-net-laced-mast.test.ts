import { describe, it, expect } from "vitest";
import { defaultCatalogue } from "../../../src/catalogue/default-catalogue";
import { chsResistance, pickLightestChs } from "../../../src/catalogue/pick-chs";
import { lacedColumnForces, taperedLacedColumnForces } from "../../../src/mechanics/built-up-column";
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

describe("tapered laced masts (issue 13 item 6: larger at mid-height)", () => {
  const lacing = { kind: "W" as const, planes: 2, panelM: 2.5, diagonalAreaM2: 8e-4 };
  const base = { lengthM: 30, axialN: 5e6, chordSpacingM: 1.25, chordAreaM2: 6e-3, chordsPerSide: 2 as const, lacing };

  it("with equal faces the tapered forces are the uniform member's (eqs. 6.69–6.73), to the critical force's difference scheme", () => {
    const uniform = lacedColumnForces(base);
    const same = taperedLacedColumnForces({ ...base, endChordSpacingM: base.chordSpacingM });
    expect(Math.abs(same.criticalForceN - uniform.criticalForceN) / uniform.criticalForceN).toBeLessThan(1e-4);
    const mid = same.stations[same.stations.length - 1]!;
    const end = same.stations[0]!;
    expect(Math.abs(mid.chordForceN - uniform.chordForceN) / uniform.chordForceN).toBeLessThan(1e-4);
    expect(Math.abs(end.diagonalForceN - uniform.diagonalForceN) / uniform.diagonalForceN).toBeLessThan(1e-4);
  });

  it("narrower ends: the critical force lies between the uniform members of the end and of the mid face, and the chord force peaks off mid-height no higher than a uniform member of the end face", () => {
    const t = taperedLacedColumnForces({ ...base, endChordSpacingM: 0.625 });
    const wide = lacedColumnForces(base);
    const narrow = lacedColumnForces({ ...base, chordSpacingM: 0.625 });
    expect(t.criticalForceN).toBeGreaterThan(narrow.criticalForceN);
    expect(t.criticalForceN).toBeLessThan(wide.criticalForceN);
    const peak = Math.max(...t.stations.map((s) => s.chordForceN));
    expect(peak).toBeGreaterThanOrEqual(t.stations[t.stations.length - 1]!.chordForceN);
    expect(peak).toBeLessThan(narrow.chordForceN);
  });

  it("a 30 m mast under 5 MN: allowing a taper never gives a heavier mast, and a tapered one is checked at every station", () => {
    const uniform = designLacedMast(sections, 5e6, 30, fy)!;
    const best = designLacedMast(sections, 5e6, 30, fy, Infinity, { tapered: true })!;
    expect(best.massKgPerM).toBeLessThanOrEqual(uniform.massKgPerM);
    expect(best.endFaceM).toBeLessThanOrEqual(best.faceM);
    if (best.endFaceM < best.faceM) {
      expect(best.designation).toMatch(/m square at mid-height, [\d.]+ m at the ends/);
      const t = taperedLacedColumnForces({ lengthM: 30, axialN: 5e6, chordSpacingM: best.faceM, endChordSpacingM: best.endFaceM, chordAreaM2: best.chord.areaM2, chordsPerSide: 2, lacing: { kind: "W", planes: 2, panelM: best.panelM, diagonalAreaM2: best.diagonal.areaM2 } });
      for (const s of t.stations) {
        expect(chsResistance(best.chord, { forceN: -s.chordForceN, effectiveLengthM: best.panelM, yieldPa: fy, curve: "a" })!.utilisation).toBeLessThanOrEqual(1);
        if (s.diagonalForceN > 0) expect(chsResistance(best.diagonal, { forceN: -s.diagonalForceN, effectiveLengthM: s.diagonalLengthM, yieldPa: fy, curve: "a" })!.utilisation).toBeLessThanOrEqual(1);
      }
    }
  });
});
