import type { Brief } from "../../brief";
import { combinationAtPlanKPa, designBasis, type Combination, type DesignBasis } from "../../loads";
import { memoOnObject } from "../../kernel/memo";

/** A design combination as a method that takes only a uniform load sees it. */
export interface PlanCombination {
  combination: Combination;
  /** Name to report ("drifted snow + wind (6.10b)"). */
  name: string;
  purpose: Combination["purpose"];
  /** The uniform equivalent with no self-weight, kPa on plan, down positive (gravity: the map's peak; uplift: its minimum). */
  baseKPa: number;
  /** Factor on the scheme's self-weight (the combination's factor on G). */
  permanentFactor: number;
  /** Factor on the temperature case (cable roofs). */
  temperatureFactor: number;
  rule: string;
  /** Whether the combined map is one value over the whole plan (then it is proportional to every other uniform map). */
  uniform: boolean;
}

/**
 * Every combination of the study's design basis with its conservative uniform equivalent, for the
 * closed-form methods that can only take a uniform load: the peak of the combined map for a
 * gravity combination, its most upward value for an uplift one (src/loads summariseCombination) —
 * this bounds the resultant and the axisymmetric member forces in the governing sense, not the
 * antisymmetric part, which the 3D analysis takes. The map is linear in the self-weight g, so the
 * equivalent at g is baseKPa + permanentFactor × g.
 */
export function planCombinations(brief: Brief, basis: DesignBasis = designBasis(brief)): PlanCombination[] {
  return combinationsOfBasis(basis);
}

/** planCombinations of one basis, remembered with it (designBasis shares one basis per brief): read only. */
const combinationsOfBasis = memoOnObject((basis: DesignBasis): PlanCombination[] => {
  const points = extremePoints(basis);
  return basis.combinations.map((combination) => {
    const at = combinationAtPlanKPa(basis, combination, 0);
    let peak = -Infinity;
    let min = Infinity;
    for (const [x, y] of points) {
      const v = at(x, y);
      peak = Math.max(peak, v);
      min = Math.min(min, v);
    }
    const gravity = combination.purpose === "gravity";
    return {
      combination,
      name: combination.name,
      purpose: combination.purpose,
      baseKPa: gravity ? peak : min,
      permanentFactor: combination.permanentFactor,
      temperatureFactor: combination.temperatureFactor,
      uniform: peak - min <= 1e-9 * Math.max(1, Math.abs(peak)),
      rule: gravity ? "the peak of the combined map over the whole plan" : "the most upward value of the combined map over the whole plan",
    };
  });
});

/**
 * Where the basis's maps take their extremes (as src/loads summariseCombination samples them, more
 * coarsely): every case depends on x and r only, so on the diameter y = 0 and on the rim, with the
 * steps at x = 0 and at each case's radial breaks.
 */
function extremePoints(basis: DesignBasis, count = 240): [number, number][] {
  const a = basis.cap.baseRadiusM;
  const points: [number, number][] = [[-a, 0], [-1e-9 * a, 0], [1e-9 * a, 0], [a, 0]];
  for (const load of Object.values(basis.cases)) for (const r of load.radialBreaksM) points.push([-r, 0], [r, 0], [-r * (1 - 1e-9), 0], [r * (1 - 1e-9), 0]);
  for (let k = 0; k <= count; k++) {
    const psi = (2 * Math.PI * k) / count;
    points.push([-a * Math.cos(psi), a * Math.sin(psi)], [-a * Math.cos(psi / 2), 0]);
  }
  return points;
}

/** The uniform design pressure of a combination at a self-weight, Pa on plan, down positive. */
export function uniformPressurePa(c: PlanCombination, selfWeightKPa: number): number {
  return (c.baseKPa + c.permanentFactor * selfWeightKPa) * 1000;
}

/**
 * The combinations the 3D analysis runs: the gravity combination with the largest peak, the
 * largest drifted-snow one, and the most upward uplift one (the others are bounded by these in the
 * uniform equivalents; common practice at feasibility, no source).
 */
export function analysedCombinations(combinations: readonly PlanCombination[]): PlanCombination[] {
  const gravity = combinations.filter((c) => c.purpose === "gravity").sort((a, b) => b.baseKPa - a.baseKPa);
  const drifted = gravity.find((c) => c.combination.terms.some((t) => t.caseId === "snow-drifted"));
  const uplift = combinations.filter((c) => c.purpose === "uplift").sort((a, b) => a.baseKPa - b.baseKPa);
  return [...new Set([gravity[0], drifted, uplift[0]].filter((c): c is PlanCombination => c !== undefined))];
}

/**
 * The combinations the 3D analysis checks at the prestress found: every one, less the uniform
 * downward maps lighter than the heaviest uniform downward map at this self-weight. A uniform map is
 * that one scaled by a factor between 0 and 1: along that proportional path the net moves further
 * and its least-taut cable loses more as the factor grows, so the heaviest bounds the displacement
 * and slack checks; the member forces of the lighter ones stay within the envelope of the
 * combinations kept (not always within the heaviest uniform one's alone). Our rule, no source,
 * checked on the cable net at 60 and 160 m (test/unit/schemes/cable-net-screening.test.ts).
 */
export function unboundedCombinations(combinations: readonly PlanCombination[], selfWeightKPa: number): PlanCombination[] {
  const downward = combinations.filter((c) => c.uniform && uniformPressurePa(c, selfWeightKPa) > 0);
  const heaviest = downward.reduce<PlanCombination | undefined>((h, c) => (h === undefined || uniformPressurePa(c, selfWeightKPa) > uniformPressurePa(h, selfWeightKPa) ? c : h), undefined);
  return combinations.filter((c) => !downward.includes(c) || c === heaviest);
}
