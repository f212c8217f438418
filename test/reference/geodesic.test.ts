import { describe, it, expect } from "vitest";
import { geodesicCap, strutLengths, geodesicFrequencyFor } from "../../src/mechanics";
import { expectAbsClose } from "../helpers/close";

describe("geodesicCap, class I icosahedral subdivision (Kenner, Geodesic Math and How to Use It, ch. 5)", () => {
  // A frequency-v class I sphere has 20v² faces, 30v² edges and 10v² + 2 vertices
  // (each icosahedron face splits into v² triangles; Euler V − E + F = 2).
  for (let v = 1; v <= 6; v++) {
    it(`full sphere at v = ${v}: F = 20v², E = 30v², V = 10v² + 2`, () => {
      const g = geodesicCap(v, 1, Math.PI);
      expect(g.faces.length).toBe(20 * v * v);
      expect(g.edges.length).toBe(30 * v * v);
      expect(g.nodes.length).toBe(10 * v * v + 2);
      expect(g.ringNodes.length).toBe(0);
    });
  }
  // The 2V icosahedral hemisphere (vertex at the crown; the equator passes through 10 nodes):
  // 26 nodes, 65 struts, 40 faces (published dome tables, e.g. Kenner ch. 5; by hand: 1 + 5 + 5 + 5 + 10 nodes,
  // 5×4 crown triangles + 5×3 + 5×1 belt triangles).
  it("2V hemisphere: 26 nodes, 65 struts, 40 faces, 10 ring nodes", () => {
    const g = geodesicCap(2, 1, Math.PI / 2);
    expect(g.nodes.length).toBe(26);
    expect(g.edges.length).toBe(65);
    expect(g.faces.length).toBe(40);
    expect(g.ringNodes.length).toBe(10);
  });
  // 2V chord factors (strut length / R) from the published chord-factor tables: A = 0.54653, B = 0.61803.
  // By hand: A = 2 sin(θ/4) with θ = 63.435° the icosahedron edge's central angle.
  it("2V chord factors 0.54653 and 0.61803", () => {
    const g = geodesicCap(2, 1, Math.PI);
    const distinct = [...new Set(g.edgeLengthsM.map((l) => l.toFixed(5)))].map(Number).sort((a, b) => a - b);
    expect(distinct.length).toBe(2);
    expectAbsClose(distinct[0]!, 0.54653, 5e-6);
    expectAbsClose(distinct[1]!, 0.61803, 5e-6);
    expectAbsClose(distinct[0]!, 2 * Math.sin(Math.atan(2) / 2 / 2), 5e-6);
  });
  // Mean chord ≈ 1.2 R/v: a flat equilateral net of the sphere's area has chord √(16π/(20√3)) R/v = 1.2046 R/v
  // (elementary geometry); the projected net is measured here to agree within 0.5 % from v = 6 up.
  it("mean chord is 1.2 R/v within 0.5 % for v = 6…30 (full sphere)", () => {
    for (const v of [6, 12, 30]) {
      const mean = strutLengths(geodesicCap(v, 1, Math.PI).edgeLengthsM).meanM;
      expectAbsClose((mean * v) / 1.2, 1, 0.005);
    }
  });
  it("geodesicFrequencyFor picks v = round(1.2 R / L)", () => {
    expect(geodesicFrequencyFor(145.33, 5)).toBe(35);
    expect(geodesicFrequencyFor(1, 10)).toBe(1);
  });
  it("ring nodes of a cap lie on the cut circle", () => {
    const g = geodesicCap(17, 100, 0.6);
    for (const n of g.ringNodes) {
      const p = g.nodes[n]!;
      expectAbsClose(p[2], 100 * Math.cos(0.6), 1e-9);
      expectAbsClose(Math.hypot(p[0], p[1]), 100 * Math.sin(0.6), 1e-9);
    }
  });
  it("throws when not one sub-triangle fits in the cap", () => expect(() => geodesicCap(1, 1, 0.3)).toThrow(/invalid cap: no whole triangle of frequency 1/));
  it("rejects a fractional frequency", () => expect(() => geodesicCap(2.5, 1, 1)).toThrow(/invalid geodesic frequency: 2.5/));
});
