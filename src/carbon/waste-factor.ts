/**
 * The waste factor WF = 1/(1 − WR) − 1: mass wasted on site per unit of mass installed, for a
 * waste rate WR (fraction of the material delivered that is wasted). IStructE, How to calculate
 * embodied carbon, 2nd ed. (2022), A5 wastage (from memory). Valid for 0 ≤ WR < 100 %.
 * @param wasteRatePct waste rate WR, % of material delivered
 * @throws Error for a rate outside 0 ≤ WR < 100 %
 * @example wasteFactor(5) // 0.05263… (= 1/0.95 − 1)
 */
export function wasteFactor(wasteRatePct: number): number {
  if (!(wasteRatePct >= 0 && wasteRatePct < 100)) {
    throw new Error(`invalid wasteRatePct: ${wasteRatePct} % (expected 0 ≤ waste rate < 100 %)`);
  }
  const rate = wasteRatePct / 100;
  return 1 / (1 - rate) - 1;
}
