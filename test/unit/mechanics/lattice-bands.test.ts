import { describe, it, expect } from "vitest";
import { geodesicCap, sphericalCap, latticeBands, bandOfEachEdge, edgeMidpointAngleRad } from "../../../src/mechanics";

// Moved from test/unit/schemes/timber-dome.test.ts with its subject (the timber dome's memberBands,
// now the banding both lattice domes share).
describe("latticeBands", () => {
  const cap = sphericalCap(160, 24);
  const mesh = geodesicCap(17, cap.radiusM, cap.edgeAngleRad);
  const ringNode = new Set(mesh.ringNodes);
  it("member bands hold every non-ring edge of the mesh once", () => {
    const bands = latticeBands(mesh, 4);
    expect(bands.reduce((s, b) => s + b.count, 0)).toBe(mesh.edgeOnRing.filter((on) => !on).length);
    const all = bands.flatMap((b) => b.edges).sort((p, q) => p - q);
    expect(new Set(all).size).toBe(all.length);
    for (const e of all) expect(mesh.edgeOnRing[e]).toBe(false);
  });
  it("puts exactly the members meeting the ring in the edge band, sized for the outermost band's angles", () => {
    const bands = latticeBands(mesh, 4);
    const edge = bands.find((b) => b.edge)!;
    const touches = (e: number) => ringNode.has(mesh.edges[e]![0]) || ringNode.has(mesh.edges[e]![1]);
    expect(edge.edges.every(touches)).toBe(true);
    for (const b of bands.filter((x) => !x.edge)) expect(b.edges.some(touches)).toBe(false);
    expect(edge.toRad).toBeCloseTo(mesh.capAngleRad, 12);
    expect(edge.fromRad).toBeCloseTo((3 / 4) * mesh.capAngleRad, 12);
  });
  it("bands inner members by the angle of their midpoint, within the band's limits; lengths add up", () => {
    for (const b of latticeBands(mesh, 5).filter((x) => !x.edge)) {
      for (const e of b.edges) {
        const phi = edgeMidpointAngleRad(mesh, e);
        expect(phi).toBeGreaterThanOrEqual(b.fromRad - 1e-12);
        expect(phi).toBeLessThanOrEqual(b.toRad + 1e-12);
      }
      const lengths = b.edges.map((e) => mesh.edgeLengthsM[e]!);
      expect(b.totalLengthM).toBeCloseTo(lengths.reduce((s, l) => s + l, 0), 9);
      expect(b.maxLengthM).toBe(Math.max(...lengths));
      expect(b.meanLengthM).toBeCloseTo(b.totalLengthM / b.count, 12);
    }
  });
  it("bandOfEachEdge gives each member its band and the ring edges the edge band", () => {
    const bands = latticeBands(mesh, 3);
    const of = bandOfEachEdge(mesh, bands);
    bands.forEach((b, i) => b.edges.forEach((e) => expect(of[e]).toBe(i)));
    const edgeBand = bands.findIndex((b) => b.edge);
    mesh.edgeOnRing.forEach((on, e) => on && expect(of[e]).toBe(edgeBand));
  });
  it("refuses a band count that is not a whole number ≥ 1, naming it", () => {
    expect(() => latticeBands(mesh, 0)).toThrow(/invalid bandCount: 0/);
    expect(() => latticeBands(mesh, 2.5)).toThrow(/invalid bandCount/);
  });
});
