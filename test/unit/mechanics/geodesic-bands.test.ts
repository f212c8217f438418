import { describe, it, expect } from "vitest";
import { geodesicCap, strutLengths, CapTooSmallError } from "../../../src/mechanics/geodesic";
import { bandStrutLengths, latticeBands } from "../../../src/mechanics/lattice-bands";
import { geodesicCapBands, geodesicCapCut } from "../../../src/mechanics/geodesic-bands";
import { sphericalCap } from "../../../src/mechanics/spherical-cap";
import { expectRelClose } from "../../helpers/close";

// geodesicCapBands cuts the bands from a remembered unit sphere instead of building the cap: it must
// give what latticeBands gives on the built cap (the same edges in each band, lengths to rounding).
const CASES = [
  { spanM: 40, riseM: 6, frequency: 5, bandCount: 4 },
  { spanM: 60, riseM: 9, frequency: 7, bandCount: 4 },
  { spanM: 160, riseM: 24, frequency: 19, bandCount: 4 },
  { spanM: 160, riseM: 33.6, frequency: 22, bandCount: 5 },
  { spanM: 160, riseM: 48, frequency: 26, bandCount: 3 },
  { spanM: 300, riseM: 45, frequency: 36, bandCount: 4 },
  { spanM: 100, riseM: 50, frequency: 12, bandCount: 4 },
  { spanM: 80, riseM: 40, frequency: 9, bandCount: 2 },
];

describe("geodesicCapBands: the bands of a cap cut from the remembered sphere", () => {
  for (const c of CASES) {
    it(`${c.spanM} m span, ${c.riseM} m rise, frequency ${c.frequency}, ${c.bandCount} bands: as latticeBands on the built cap`, () => {
      const cap = sphericalCap(c.spanM, c.riseM);
      const built = latticeBands(geodesicCap(c.frequency, cap.radiusM, cap.edgeAngleRad), c.bandCount);
      const cut = geodesicCapBands(c.frequency, cap.radiusM, cap.edgeAngleRad, c.bandCount);
      expect(cut.map((b) => [b.index, b.edge, b.count, b.fromRad, b.toRad])).toEqual(built.map((b) => [b.index, b.edge, b.count, b.fromRad, b.toRad]));
      cut.forEach((b, i) => {
        const w = built[i]!;
        expect(b.edges).toEqual(w.edges);
        expectRelClose(b.totalLengthM, w.totalLengthM, 1e-12);
        expectRelClose(b.meanLengthM, w.meanLengthM, 1e-12);
        expectRelClose(b.maxLengthM, w.maxLengthM, 1e-12);
      });
    });
  }

  for (const c of CASES) {
    it(`${c.spanM} m span, ${c.riseM} m rise, frequency ${c.frequency}: node, face and ring counts and strut lengths as on the built cap`, () => {
      const cap = sphericalCap(c.spanM, c.riseM);
      const built = geodesicCap(c.frequency, cap.radiusM, cap.edgeAngleRad);
      const cut = geodesicCapCut(c.frequency, cap.radiusM, cap.edgeAngleRad, c.bandCount);
      const ringEdges = built.edges.filter((_, e) => built.edgeOnRing[e]);
      expect([cut.nodeCount, cut.faceCount, cut.ringEdgeCount]).toEqual([built.nodes.length, built.faces.length, ringEdges.length]);
      expectRelClose(cut.ringLengthM, strutLengths(built.edgeLengthsM, (e) => built.edgeOnRing[e]!).totalM, 1e-12);
      const inner = strutLengths(built.edgeLengthsM, (e) => !built.edgeOnRing[e]);
      const fromBands = bandStrutLengths(cut.bands);
      expect(fromBands.count).toBe(inner.count);
      for (const key of ["minM", "meanM", "maxM", "totalM"] as const) expectRelClose(fromBands[key], inner[key], 1e-12);
      // Euler's relation for a triangulated disc: V − E + F = 1 (E counts the ring edges too)
      expect(cut.nodeCount - (fromBands.count + cut.ringEdgeCount) + cut.faceCount).toBe(1);
    });
  }

  it("the whole sphere: no ring, and V − E + F = 2 (Euler)", () => {
    const cut = geodesicCapCut(6, 10, Math.PI, 3);
    expect(cut.ringEdgeCount).toBe(0);
    expect(cut.nodeCount).toBe(10 * 6 * 6 + 2);
    expect(cut.faceCount).toBe(20 * 6 * 6);
    expect(cut.nodeCount - bandStrutLengths(cut.bands).count + cut.faceCount).toBe(2);
  });

  it("the same bands when asked again after other caps (scratch arrays reused)", () => {
    const cap = sphericalCap(160, 33.6);
    const first = geodesicCapBands(22, cap.radiusM, cap.edgeAngleRad, 4);
    geodesicCapBands(30, cap.radiusM * 2, cap.edgeAngleRad / 2, 3);
    expect(geodesicCapBands(22, cap.radiusM, cap.edgeAngleRad, 4)).toEqual(first);
  });

  it("a larger cap of a frequency already cut (the sphere is built again larger), and caps beyond a hemisphere", () => {
    for (const [frequency, capAngleRad] of [[12, 0.3], [12, Math.PI / 8], [12, 1.5], [12, 2.5], [12, Math.PI], [7, 0.9]] as const) {
      const built = latticeBands(geodesicCap(frequency, 50, capAngleRad), 4);
      const cut = geodesicCapBands(frequency, 50, capAngleRad, 4);
      expect(cut.map((b) => [b.count, b.edges])).toEqual(built.map((b) => [b.count, b.edges]));
      cut.forEach((b, i) => expectRelClose(b.totalLengthM, built[i]!.totalLengthM, 1e-12));
    }
  });

  it("a cap too small for the frequency is refused as geodesicCap refuses it", () => {
    expect(() => geodesicCap(1, 100, 0.2)).toThrow(CapTooSmallError);
    expect(() => geodesicCapBands(1, 100, 0.2, 4)).toThrow(CapTooSmallError);
  });
});
