import type { OptionSpec, SchemeOptions } from "../types";

/**
 * Checks every option against its spec before any work: numbers finite and in range (whole where
 * asked), selects one of their choices, toggles boolean.
 * @throws RangeError naming the option, the value and what is allowed
 */
export function checkSchemeOptions(specs: readonly OptionSpec[], options: SchemeOptions): void {
  for (const spec of specs) {
    const value = options[spec.key];
    if (spec.kind === "number") {
      if (typeof value !== "number" || !(value >= spec.min && value <= spec.max) || (spec.integer === true && !Number.isInteger(value))) {
        throw new RangeError(`invalid ${spec.key}: ${String(value)}${spec.unit ? " " + spec.unit : ""} (expected ${spec.integer ? "a whole number " : ""}${spec.min} to ${spec.max})`);
      }
    } else if (spec.kind === "select") {
      if (typeof value !== "string" || !spec.choices.some((c) => c.value === value)) {
        throw new RangeError(`invalid ${spec.key}: ${String(value)} (expected one of ${spec.choices.map((c) => c.value).join(", ")})`);
      }
    } else if (typeof value !== "boolean") {
      throw new RangeError(`invalid ${spec.key}: ${String(value)} (expected true or false)`);
    }
  }
}
