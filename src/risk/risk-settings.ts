import * as v from "valibot";
import { integerIn, oneOf, textUpTo } from "../kernel/validate";
import { DISTRIBUTION_KINDS, type DistributionKind } from "./distribution";

/**
 * A table row picked by its id: `{ material: "steel-chs" }` in carbon.factors, `{ item: "steel-truss" }`
 * in cost.rates. One key, one value. Rows are addressed by id, never by position, so a table
 * imported in another order still points each input at its own row.
 */
export type RowSelector = Readonly<Record<string, string>>;

/** A step of a path into the study: an object key, an array index, or a row picked by its id. */
export type PathStep = string | number | RowSelector;

/** How an input's low and high are read. */
export const RANGE_SCALES = ["factor", "offset"] as const;
/**
 * "factor": low and high multiply the study's value (0.75 and 1.5: from 25 % below to 50 % above);
 * "offset": they are added to it, in the field's unit (−2 and 8 percentage points). Either way the
 * range moves with the study and always holds the study's own value, which is the mode.
 */
export type RangeScale = (typeof RANGE_SCALES)[number];

/**
 * One uncertain input of the risk analysis: a number in the study (found by `path`) given a range
 * around the study's own value (the mode) and a distribution. Inputs with the same `group` share
 * one draw per sample (as a quantile u, so each maps through its own range): fully correlated,
 * e.g. all steel rates.
 */
export type UncertainInput = {
  /** Unique id, e.g. "snow" or "rate-steel-lattice". */
  id: string;
  label: string;
  /** Where the number is in the study, e.g. ["brief", "snowGroundKPa"] or ["cost", "rates", { item: "steel-truss" }, "rate"]. */
  path: PathStep[];
  /** How low and high are read: multiples of the study's value, or amounts added to it. */
  scale: RangeScale;
  /** Lowest plausible value: factor ≤ 1, or offset ≤ 0. */
  low: number;
  /** Highest plausible value: factor ≥ 1, or offset ≥ 0. */
  high: number;
  distribution: DistributionKind;
  /** Inputs of the same group are drawn together (rank-perfectly correlated); null: independent. */
  group: string | null;
};

/** The risk analysis settings a study carries. */
export type RiskSettings = {
  inputs: UncertainInput[];
  /** Monte Carlo samples, 10–50,000 (default 5000). */
  samples: number;
  /**
   * Distinct draws of the inputs that change a design (loads, scheme options), 1–5000 (default
   * 64): each is designed once and paired with many draws of the assessment-only inputs.
   */
  designSamples: number;
};

export const RISK_LIMITS = {
  samples: { min: 10, max: 50000, default: 5000 },
  designSamples: { min: 1, max: 5000, default: 64 },
  inputs: { max: 400 },
} as const;

const FINITE = 1e12;

function finiteNumber(what: string) {
  return v.pipe(
    v.number((issue) => `${String(issue.input)} (expected a number for ${what})`),
    v.check((x) => Number.isFinite(x) && Math.abs(x) <= FINITE, (issue) => `${String(issue.input)} (expected a finite number for ${what})`),
  );
}

const rowSelector = v.pipe(
  v.record(v.pipe(v.string(), v.minLength(1)), v.pipe(v.string(), v.minLength(1))),
  v.check((o) => Object.keys(o).length === 1, (issue) => `${JSON.stringify(issue.input)} (expected one key and id, e.g. {"material": "steel-chs"})`),
);

const pathStep = v.union(
  [
    v.pipe(v.string(), v.minLength(1)),
    v.pipe(v.number(), v.integer(), v.minValue(0)),
    rowSelector,
  ],
  (issue) => `${JSON.stringify(issue.input)} (expected a key, an index ≥ 0 or a row id such as {"material": "steel-chs"})`,
);

/** The allowed low and high of each scale, for messages and checks. */
export const SCALE_RULES: Record<RangeScale, { lowMax: number; highMin: number; lowMin: number; text: string }> = {
  factor: { lowMin: 0, lowMax: 1, highMin: 1, text: "0 ≤ low ≤ 1 ≤ high (multiples of the study's value)" },
  offset: { lowMin: -FINITE, lowMax: 0, highMin: 0, text: "low ≤ 0 ≤ high (added to the study's value)" },
};

/** Checks one uncertain input; the range message names the input. */
export const UncertainInputSchema = v.pipe(
  v.object({
    id: v.pipe(
      textUpTo(80),
      v.regex(/^[A-Za-z0-9][A-Za-z0-9._-]*$/, (issue) => `${JSON.stringify(issue.input)} (expected letters, digits, ".", "_" or "-", e.g. snow)`),
    ),
    label: textUpTo(200),
    path: v.pipe(
      v.array(pathStep, () => "expected a path: a list of keys and indexes"),
      v.minLength(1, () => "empty path (expected a path into the study, e.g. [\"brief\", \"snowGroundKPa\"])"),
      v.maxLength(8, () => "path too long (expected at most 8 steps)"),
      v.check((p) => ["brief", "schemes", "carbon", "cost"].includes(String(p[0])), (issue) => `${JSON.stringify((issue.input as PathStep[])[0])} (expected a path starting with brief, schemes, carbon or cost)`),
    ),
    scale: oneOf(RANGE_SCALES),
    low: finiteNumber("low"),
    high: finiteNumber("high"),
    distribution: oneOf(DISTRIBUTION_KINDS),
    group: v.nullable(
      v.pipe(
        textUpTo(60),
        v.minLength(1, () => `empty group (expected a name, or null for an independent input)`),
      ),
      null,
    ),
  }),
  v.forward(
    v.partialCheck(
      [["id"], ["scale"], ["low"]],
      (input) => input.low >= SCALE_RULES[input.scale].lowMin && input.low <= SCALE_RULES[input.scale].lowMax,
      (issue) => {
        const input = issue.input as UncertainInput;
        return `input "${input.id}": low ${input.low} is outside its ${input.scale} range (expected ${SCALE_RULES[input.scale].text})`;
      },
    ),
    ["low"],
  ),
  v.forward(
    v.partialCheck(
      [["id"], ["scale"], ["high"]],
      (input) => input.high >= SCALE_RULES[input.scale].highMin,
      (issue) => {
        const input = issue.input as UncertainInput;
        return `input "${input.id}": high ${input.high} is outside its ${input.scale} range (expected ${SCALE_RULES[input.scale].text})`;
      },
    ),
    ["high"],
  ),
);

/** Checks the risk settings: each input, unique ids, unique paths, the sample counts. */
export const RiskSettingsSchema = v.pipe(
  v.object({
    inputs: v.pipe(
      v.array(UncertainInputSchema, () => "expected a list of uncertain inputs"),
      v.maxLength(RISK_LIMITS.inputs.max, () => `too many inputs (expected at most ${RISK_LIMITS.inputs.max})`),
    ),
    samples: v.optional(integerIn(RISK_LIMITS.samples.min, RISK_LIMITS.samples.max, "samples"), RISK_LIMITS.samples.default),
    designSamples: v.optional(integerIn(RISK_LIMITS.designSamples.min, RISK_LIMITS.designSamples.max, "design samples"), RISK_LIMITS.designSamples.default),
  }),
  v.forward(
    v.check(
      (s) => new Set(s.inputs.map((i) => i.id)).size === s.inputs.length,
      (issue) => {
        const ids = (issue.input as RiskSettings).inputs.map((i) => i.id);
        return `input id "${ids.find((id, k) => ids.indexOf(id) !== k) ?? ""}" is used twice (expected each id once)`;
      },
    ),
    ["inputs"],
  ),
  v.forward(
    v.check(
      (s) => new Set(s.inputs.map((i) => JSON.stringify(i.path))).size === s.inputs.length,
      (issue) => {
        const paths = (issue.input as RiskSettings).inputs.map((i) => JSON.stringify(i.path));
        const k = paths.findIndex((p, j) => paths.indexOf(p) !== j);
        return `input "${(issue.input as RiskSettings).inputs[k]?.id ?? ""}" varies the same study value as another input (expected each path once)`;
      },
    ),
    ["inputs"],
  ),
);
