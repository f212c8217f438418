import type { Distribution, DistributionKind } from "./distribution";
import { pertDistribution } from "./pert-distribution";
import { triangularDistribution } from "./triangular-distribution";
import { uniformDistribution } from "./uniform-distribution";

/**
 * The distribution of a kind on a three-point range (Beta-PERT, triangular or uniform).
 * @throws Error unless low ≤ mode ≤ high (finite)
 */
export function makeDistribution(kind: DistributionKind, low: number, mode: number, high: number): Distribution {
  switch (kind) {
    case "pert":
      return pertDistribution(low, mode, high);
    case "triangular":
      return triangularDistribution(low, mode, high);
    case "uniform":
      return uniformDistribution(low, mode, high);
  }
}
