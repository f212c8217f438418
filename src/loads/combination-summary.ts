import type { SphericalCap } from "../mechanics/spherical-cap";
import type { PressureCase } from "./load-case";
import type { Combination } from "./design-combinations";
import type { DesignBasis } from "./design-basis";
import { caseResultants } from "./plan-integral";

/**
 * The design load of a combination at plan point (x, y), kPa, as a vertical load per unit plan
 * area (downward positive): permanentFactor (self-weight + services) + Σ factor × case. A normal
 * pressure enters by its vertical component per unit plan area, which equals the pressure (its
 * horizontal component is in `summariseCombination`'s alongWindKN). Temperature is not a pressure
 * and is left to the schemes that take it (`temperatureFactor`).
 * @throws when the self-weight is negative or not a number
 */
export function combinationAtPlanKPa(basis: DesignBasis, combination: Combination, selfWeightKPa: number): (xM: number, yM: number) => number {
  if (!(selfWeightKPa >= 0)) throw new RangeError(`invalid self-weight: ${selfWeightKPa} kPa (expected ≥ 0)`);
  const services = basis.cases.services;
  const terms = combination.terms.map((t) => ({ load: basis.cases[t.caseId], factor: t.factor }));
  return (x, y) => {
    let sum = combination.permanentFactor * (selfWeightKPa + services.atPlanKPa(x, y));
    for (const { load, factor } of terms) sum += factor * load.atPlanKPa(x, y);
    return sum;
  };
}

/** Figures of a distributed case or a combination on the roof. */
export interface LoadSummary {
  /** Largest and smallest value anywhere on the roof, kPa. */
  peakKPa: number;
  minKPa: number;
  /** Vertical resultant ÷ plan area, kPa. */
  meanKPa: number;
  /** Vertical resultant, downward positive, kN. */
  verticalKN: number;
  /** Horizontal resultant along the wind, kN. */
  alongWindKN: number;
  /** A conservative uniform load for methods that take only one, kPa, and the rule that gives it. */
  uniformEquivalentKPa: number;
  uniformRule: string;
}

/** Summary of one pressure case: its own exact peak and minimum, resultants by integration. */
export function summariseCase(load: PressureCase, cap: SphericalCap): LoadSummary {
  const r = caseResultants(load, cap);
  return {
    peakKPa: load.peakKPa,
    minKPa: load.minKPa,
    meanKPa: r.planMeanKPa,
    verticalKN: r.verticalKN,
    alongWindKN: r.alongWindKN,
    uniformEquivalentKPa: load.uniformEquivalent.kPa,
    uniformRule: load.uniformEquivalent.rule,
  };
}

/**
 * Plan points where a combination of the basis takes its extremes. Every case of the basis depends
 * on the plan position only through x and r, and at fixed x a larger |y| can only take the snow
 * away (slopes over 60°): so the largest value lies on the diameter y = 0 and the smallest on the
 * diameter or the rim. Both are sampled finely, with the breakpoints x = −a, 0⁻, 0⁺, a and ± each
 * radial break (where a case ends or steps), at which the extremes of these piecewise-monotone maps
 * lie.
 */
function extremePoints(cap: SphericalCap, radialBreaksM: readonly number[], count = 720): [number, number][] {
  const a = cap.baseRadiusM;
  const points: [number, number][] = [[-a, 0], [-1e-9 * a, 0], [1e-9 * a, 0], [a, 0]];
  for (const r of radialBreaksM) points.push([-r, 0], [r, 0]);
  for (let k = 0; k <= count; k++) {
    const psi = (2 * Math.PI * k) / count;
    points.push([-a * Math.cos(psi), a * Math.sin(psi)], [-a * Math.cos(psi / 2), 0]);
  }
  return points;
}

/**
 * Summary of a combination at a given self-weight, kPa: the extremes of its design map, its plan
 * mean and resultants (sums of the cases' integrals, since a combination is linear in them), and
 * its conservative uniform equivalent — the peak for a gravity combination, the minimum (the
 * largest net uplift) for an uplift one.
 */
export function summariseCombination(basis: DesignBasis, combination: Combination, selfWeightKPa: number): LoadSummary {
  const at = combinationAtPlanKPa(basis, combination, selfWeightKPa);
  let peakKPa = -Infinity;
  let minKPa = Infinity;
  const breaks = combination.terms.flatMap((t) => basis.cases[t.caseId].radialBreaksM);
  for (const [x, y] of extremePoints(basis.cap, breaks)) {
    const v = at(x, y);
    peakKPa = Math.max(peakKPa, v);
    minKPa = Math.min(minKPa, v);
  }
  const area = basis.cap.planAreaM2;
  const permanentKN = combination.permanentFactor * (selfWeightKPa + basis.cases.services.peakKPa) * area;
  let verticalKN = permanentKN;
  let alongWindKN = 0;
  for (const t of combination.terms) {
    const r = caseResultants(basis.cases[t.caseId], basis.cap);
    verticalKN += t.factor * r.verticalKN;
    alongWindKN += t.factor * r.alongWindKN;
  }
  const gravity = combination.purpose === "gravity";
  return {
    peakKPa,
    minKPa,
    meanKPa: verticalKN / area,
    verticalKN,
    alongWindKN,
    uniformEquivalentKPa: gravity ? peakKPa : minKPa,
    uniformRule: gravity ? "the peak of the combined map over the whole plan" : "the smallest (most upward) value of the combined map over the whole plan",
  };
}
