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

type Geometry = Pick<Brief, "spanM" | "riseM" | "eavesHeightM" | "minClearHeightM" | "heightLimitM">;
const input = (issue: { input: unknown }) => issue.input as Geometry;

/**
 * The brief's schema, made from BRIEF_FIELDS, plus the rules across fields, each named on the
 * field it constrains: the rise is at most half the span (a spherical cap cannot rise more than its
 * radius); eaves + rise within the height limit; the minimum clear height at most the eaves height.
 * Each is checked whenever its own fields are valid, even if another field is not.
 */
export const BriefSchema = v.pipe(
  v.object(entries("")),
  v.forward(
    v.partialCheck([["riseM"], ["spanM"]], (b: Geometry) => b.riseM <= b.spanM / 2, (issue) => `${input(issue).riseM} m (expected 0 < rise ≤ span/2 = ${input(issue).spanM / 2} m)`),
    ["riseM"] as never,
  ),
  v.forward(
    // Not reported again when the rise itself is refused (rise > span/2): one problem per mistake.
    v.partialCheck([["riseM"], ["spanM"], ["eavesHeightM"], ["heightLimitM"]], (b: Geometry) => b.riseM > b.spanM / 2 || b.eavesHeightM + b.riseM <= b.heightLimitM + 1e-9, (issue) => `${input(issue).heightLimitM} m (expected at least eaves + rise = ${input(issue).eavesHeightM + input(issue).riseM} m)`),
    ["heightLimitM"] as never,
  ),
  v.forward(
    v.partialCheck([["minClearHeightM"], ["eavesHeightM"]], (b: Geometry) => b.minClearHeightM <= b.eavesHeightM, (issue) => `${input(issue).minClearHeightM} m (expected at most the eaves height, ${input(issue).eavesHeightM} m)`),
    ["minClearHeightM"] as never,
  ),
) as unknown as v.GenericSchema<unknown, Brief>;
