import { describe, it, expect } from "vitest";
import fc from "fast-check";
import {
  cableDomeSelfStress,
  cableDomeLoadState,
  cableDomeNodeResiduals,
  type CableDomeTrussForces,
  type CableDomeTrussGeometry,
  type CableDomeTrussLoads,
} from "../../src/mechanics";

/** A valid geometry: convex ridge line falling to the ring, each diagonal rising outwards. */
const geometryArb = fc
  .record({
    trusses: fc.integer({ min: 6, max: 80 }),
    hoops: fc.integer({ min: 1, max: 6 }),
    radiusM: fc.double({ min: 20, max: 200, noNaN: true }),
    centralRatio: fc.double({ min: 0.05, max: 0.25, noNaN: true }),
    riseRatio: fc.double({ min: 0.05, max: 0.3, noNaN: true }),
    diagonalRise: fc.double({ min: 0.05, max: 0.8, noNaN: true }),
  })
  .map(({ trusses, hoops, radiusM, centralRatio, riseRatio, diagonalRise }): CableDomeTrussGeometry => {
    const r0 = centralRatio * radiusM;
    const bay = (radiusM - r0) / (hoops + 1);
    const radiiM = Array.from({ length: hoops + 1 }, (_, i) => r0 + i * bay);
    const rise = riseRatio * radiusM;
    const topM = radiiM.map((r) => rise * (1 - (r / radiusM) ** 2));
    const bottomM = radiiM.map((_, i) => (i + 1 < radiiM.length ? (topM[i + 1] as number) : 0) - diagonalRise * bay);
    return { trusses, radiiM, topM, bottomM, ringRadiusM: radiusM, ringHeightM: 0 };
  });

const loadsArb = (nodes: number) =>
  fc.record({
    topN: fc.array(fc.double({ min: -1e6, max: 1e6, noNaN: true }), { minLength: nodes, maxLength: nodes }),
    bottomN: fc.array(fc.double({ min: -1e5, max: 1e5, noNaN: true }), { minLength: nodes, maxLength: nodes }),
  });

const all = (f: CableDomeTrussForces) => [...f.ridgeN, ...f.diagonalN, ...f.postN, ...f.hoopN, f.centralTopRingN, f.centralBottomRingN];
const largest = (f: CableDomeTrussForces) => Math.max(...all(f).map(Math.abs));
const worstResidual = (g: CableDomeTrussGeometry, f: CableDomeTrussForces, l: CableDomeTrussLoads) =>
  Math.max(...cableDomeNodeResiduals(g, f, l).flat().map(Math.abs));

describe("cable-dome radial truss (equilibrium by marching from the centre)", () => {
  it("every node is in equilibrium for the load state, to 1e-9 of the largest member force", () => {
    fc.assert(
      fc.property(geometryArb.chain((g) => fc.tuple(fc.constant(g), loadsArb(g.radiiM.length))), ([g, loads]) => {
        const f = cableDomeLoadState(g, loads);
        expect(worstResidual(g, f, loads)).toBeLessThanOrEqual(1e-9 * Math.max(largest(f), 1));
      }),
      { numRuns: 300 },
    );
  });

  it("every node is in equilibrium for the self-stress state, with no load", () => {
    fc.assert(
      fc.property(geometryArb, (g) => {
        const f = cableDomeSelfStress(g, 1000);
        const zero = { topN: g.radiiM.map(() => 0), bottomN: g.radiiM.map(() => 0) };
        expect(worstResidual(g, f, zero)).toBeLessThanOrEqual(1e-9 * largest(f));
        expect(Math.abs(f.ringReactionN)).toBeLessThanOrEqual(1e-9 * largest(f));
      }),
      { numRuns: 300 },
    );
  });

  it("the self-stress state scales linearly with the central ring force", () => {
    fc.assert(
      fc.property(geometryArb, fc.double({ min: 1, max: 1e7, noNaN: true }), (g, force) => {
        const unit = all(cableDomeSelfStress(g, 1));
        const scaled = all(cableDomeSelfStress(g, force));
        const scale = Math.max(...unit.map(Math.abs)) * force;
        scaled.forEach((v, i) => expect(Math.abs(v - force * (unit[i] as number))).toBeLessThanOrEqual(1e-9 * scale));
      }),
      { numRuns: 200 },
    );
  });

  it("reversing the load reverses the load state", () => {
    fc.assert(
      fc.property(geometryArb.chain((g) => fc.tuple(fc.constant(g), loadsArb(g.radiiM.length))), ([g, loads]) => {
        const up = all(cableDomeLoadState(g, loads));
        const down = all(cableDomeLoadState(g, { topN: loads.topN.map((v) => -v), bottomN: loads.bottomN.map((v) => -v) }));
        const scale = Math.max(1, ...up.map(Math.abs));
        up.forEach((v, i) => expect(Math.abs(v + (down[i] as number))).toBeLessThanOrEqual(1e-9 * scale));
      }),
      { numRuns: 200 },
    );
  });

  it("prestress puts every cable in tension and every post in compression on a valid geometry", () => {
    fc.assert(
      fc.property(geometryArb, (g) => {
        const f = cableDomeSelfStress(g, 1);
        for (const v of [...f.ridgeN, ...f.diagonalN, ...f.hoopN, f.centralBottomRingN]) expect(v).toBeGreaterThan(0);
        for (const v of f.postN) expect(v).toBeLessThan(0);
        expect(f.compressionRingN).toBeLessThan(0);
      }),
      { numRuns: 200 },
    );
  });
});
