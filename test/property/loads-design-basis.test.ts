import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { designBasis, summariseCase, summariseCombination, combinationAtPlanKPa, integrateOverPlan, caseResultants, snowShapeMu3 } from "../../src/loads";
import { DEFAULT_BRIEF, type Brief } from "../../src/brief";
import { expectRelClose, expectAbsClose } from "../helpers/close";

/** Briefs across the allowed ranges (rise from 2 % of the span to a hemisphere). */
const briefArb = fc
  .record({
    spanM: fc.double({ min: 30, max: 500, noNaN: true }),
    riseRatio: fc.double({ min: 0.02, max: 0.5, noNaN: true }),
    eavesHeightM: fc.double({ min: 0, max: 60, noNaN: true }),
    snowGroundKPa: fc.double({ min: 0.1, max: 10, noNaN: true }),
    windBasicMPerS: fc.double({ min: 10, max: 60, noNaN: true }),
  })
  .map(({ riseRatio, ...rest }): Brief => ({ ...DEFAULT_BRIEF, ...rest, riseM: riseRatio * rest.spanM }));

const point = fc.record({ u: fc.double({ min: 0, max: 1, noNaN: true }), psi: fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }) });

const runs = { numRuns: 40 };

describe("design basis invariants", () => {
  it("every case and combination stays within its stated peak and minimum, and its uniform equivalent bounds it in the governing sense", () => {
    fc.assert(
      fc.property(briefArb, fc.array(point, { minLength: 1, maxLength: 20 }), fc.double({ min: 0, max: 5, noNaN: true }), (brief, points, selfWeight) => {
        const basis = designBasis(brief);
        const a = basis.cap.baseRadiusM;
        const at = points.map(({ u, psi }) => [-a * Math.sqrt(u) * Math.cos(psi), a * Math.sqrt(u) * Math.sin(psi)] as const);
        for (const load of Object.values(basis.cases)) {
          for (const [x, y] of at) {
            const v = load.atPlanKPa(x, y);
            expect(v).toBeLessThanOrEqual(load.peakKPa + 1e-12);
            expect(v).toBeGreaterThanOrEqual(load.minKPa - 1e-12);
          }
        }
        for (const c of basis.combinations) {
          const s = summariseCombination(basis, c, selfWeight);
          const f = combinationAtPlanKPa(basis, c, selfWeight);
          for (const [x, y] of at) {
            const v = f(x, y);
            if (c.purpose === "gravity") expect(v).toBeLessThanOrEqual(s.uniformEquivalentKPa + 1e-9);
            else expect(v).toBeGreaterThanOrEqual(s.uniformEquivalentKPa - 1e-9);
          }
        }
      }),
      runs,
    );
  });

  it("drifted snow: the heavy half carries twice the light half, the total is 0.75 μ3 / μ1 of the uniform case's", () => {
    fc.assert(
      fc.property(briefArb, (brief) => {
        const basis = designBasis(brief);
        const drift = basis.cases["snow-drifted"];
        const region = { radiusM: basis.cap.baseRadiusM, radialBreaksM: drift.radialBreaksM };
        const heavy = integrateOverPlan(drift.atPlanKPa, { ...region, fromAzimuthRad: -Math.PI / 2, toAzimuthRad: Math.PI / 2 });
        const light = integrateOverPlan(drift.atPlanKPa, { ...region, fromAzimuthRad: Math.PI / 2, toAzimuthRad: (3 * Math.PI) / 2 });
        expectRelClose(heavy, 2 * light, 1e-9);
        const mu3 = snowShapeMu3(brief.riseM, brief.spanM);
        const uniform = caseResultants(basis.cases["snow-uniform"], basis.cap).verticalKN;
        expectRelClose(heavy + light, ((0.75 * mu3) / 0.8) * uniform, 1e-9);
      }),
      runs,
    );
  });

  it("wind: the two internal pressures differ by 0.5 q_p everywhere, and c_pi changes no horizontal resultant", () => {
    fc.assert(
      fc.property(briefArb, point, (brief, { u, psi }) => {
        const basis = designBasis(brief);
        const plus = basis.cases["wind-internal-pressure"];
        const minus = basis.cases["wind-internal-suction"];
        const r = basis.cap.baseRadiusM * Math.sqrt(u);
        const [x, y] = [-r * Math.cos(psi), r * Math.sin(psi)];
        expectAbsClose(minus.atPlanKPa(x, y) - plus.atPlanKPa(x, y), 0.5 * basis.peakVelocityPressureKPa, 1e-12);
        const sPlus = summariseCase(plus, basis.cap);
        const sMinus = summariseCase(minus, basis.cap);
        expectRelClose(sMinus.verticalKN - sPlus.verticalKN, 0.5 * basis.peakVelocityPressureKPa * basis.cap.planAreaM2, 1e-9);
        expectRelClose(sMinus.alongWindKN, sPlus.alongWindKN, 1e-9);
      }),
      runs,
    );
  });

  it("a combination's vertical resultant grows by its permanent factor × plan area per kPa of self-weight", () => {
    fc.assert(
      fc.property(briefArb, fc.double({ min: 0, max: 3, noNaN: true }), fc.double({ min: 0.01, max: 3, noNaN: true }), (brief, g, dg) => {
        const basis = designBasis(brief);
        for (const c of basis.combinations) {
          const grown = summariseCombination(basis, c, g + dg).verticalKN - summariseCombination(basis, c, g).verticalKN;
          expectRelClose(grown, c.permanentFactor * dg * basis.cap.planAreaM2, 1e-9);
        }
      }),
      { numRuns: 10 },
    );
  });
});
