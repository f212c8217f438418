import * as v from "valibot";
import { numberIn, oneOf } from "../kernel/validate";
import type { Brief } from "./brief";
import { BRIEF_FIELDS, messageUnit, type BriefField } from "./fields";

function fieldSchema(field: BriefField) {
  return field.kind === "number"
    ? numberIn(field.min, field.max, messageUnit(field))
    : oneOf(field.choices.map((c) => c.value) as unknown as readonly [string, ...string[]]);
}

/** The object entries for the fields under `prefix` (nested objects for dotted keys), in table order. */
function entries(prefix: string): v.ObjectEntries {
  const out: v.ObjectEntries = {};
  for (const field of BRIEF_FIELDS) {
    if (!field.key.startsWith(prefix)) continue;
    const [head, ...rest] = field.key.slice(prefix.length).split(".") as [string, ...string[]];
    if (rest.length === 0) out[head] = fieldSchema(field);
    else out[head] ??= v.object(entries(`${prefix}${head}.`));
  }
  return out;
}

/**
 * The brief's schema, made from BRIEF_FIELDS, plus the rule across fields: the rise is at most
 * half the span (a spherical cap cannot rise more than its radius).
 */
export const BriefSchema = v.pipe(
  v.object(entries("")),
  // Cross-field: checked whenever span and rise are themselves valid, even if another field is not.
  v.forward(
    v.partialCheck([["riseM"], ["spanM"]], (b: { riseM: number; spanM: number }) => b.riseM <= b.spanM / 2, (issue) => `${(issue.input as { riseM: number }).riseM} m (expected 0 < rise ≤ span/2 = ${(issue.input as { spanM: number }).spanM / 2} m)`),
    ["riseM"] as never,
  ),
) as unknown as v.GenericSchema<unknown, Brief>;
