// Which uncertain inputs a scheme's result can depend on, so the sensitivity charts list only those.
import type { UncertainInput } from "./risk-settings";

/**
 * Whether a scheme's result can depend on an input: its own options, the factor and rate rows its
 * take-off names, and every input of the brief and of the carbon and cost settings.
 */
export function inputUsedBy(input: Pick<UncertainInput, "path">, schemeId: string, takeoff: readonly { material: string | null; costItem: string }[]): boolean {
  const [head, second, third] = input.path;
  if (head === "schemes") return second === schemeId;
  const selector = typeof third === "object" && third !== null ? (third as Record<string, string>) : null;
  if (head === "carbon" && second === "factors" && selector?.material) return takeoff.some((r) => r.material === selector.material);
  if (head === "cost" && second === "rates" && selector?.item) return takeoff.some((r) => r.costItem === selector.item);
  return true;
}
