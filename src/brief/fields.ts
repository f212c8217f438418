import { TERRAIN_CATEGORIES } from "./brief";

/**
 * The brief's fields, described once: key (dotted path inside the brief), label, unit, range,
 * step, source. The brief's schema (brief-schema.ts), the brief controls of the pages and the
 * brief rows of the assumptions record are all made from this table, so their wording cannot
 * drift apart. A unit of "–" is a pure number (no unit in messages).
 */
interface FieldBase {
  /** Dotted path inside the brief, e.g. "spanM" or "factors.gammaQ". */
  key: string;
  label: string;
  /** Where the value (or its default) comes from. */
  source: string;
  /** The control group it is edited in, or null when the pages show no control for it. */
  group: "Geometry" | "Site loads (characteristic)" | "Partial factors (EN 1990 Table A1.2(B))" | null;
  /** A short note under the control. */
  hint?: string;
}

export interface NumberField extends FieldBase {
  kind: "number";
  unit: string;
  min: number;
  max: number;
  step: number;
  /** Whether the control also carries a slider. */
  slider?: boolean;
}

export interface ChoiceField extends FieldBase {
  kind: "choice";
  unit: "";
  /** Allowed values, each with its control label. */
  choices: readonly { value: string; label: string }[];
}

export type BriefField = NumberField | ChoiceField;

const GEOMETRY = "Geometry";
const SITE = "Site loads (characteristic)";
const FACTORS = "Partial factors (EN 1990 Table A1.2(B))";
const TABLE_A1_2B = "EN 1990 Table A1.2(B)";

export const BRIEF_FIELDS = [
  { key: "spanM", kind: "number", label: "Clear span (plan diameter)", unit: "m", min: 30, max: 500, step: 1, slider: true, source: "brief", group: GEOMETRY },
  { key: "riseM", kind: "number", label: "Rise of the roof above the eaves", unit: "m", min: 0.5, max: 250, step: 0.5, slider: true, hint: "at most half the span; the one rise every scheme shares when 'Rise of each scheme' says so, else only for schemes without a rise range", source: "brief", group: GEOMETRY },
  { key: "eavesHeightM", kind: "number", label: "Eaves height", unit: "m", min: 0, max: 60, step: 0.5, source: "brief", group: GEOMETRY },
  { key: "minClearHeightM", kind: "number", label: "Minimum clear height for usable floor", unit: "m", min: 0, max: 60, step: 0.5, hint: "at most the eaves height", source: "brief", group: GEOMETRY },
  { key: "heightLimitM", kind: "number", label: "Roof height limit above the floor", unit: "m", min: 1, max: 400, step: 0.5, hint: "the planning envelope: eaves + rise at most this", source: "brief (planning envelope)", group: GEOMETRY },
  {
    key: "riseRule",
    kind: "choice",
    label: "Rise of each scheme",
    unit: "",
    choices: [
      { value: "own", label: "each scheme at its own best rise, within the height limit" },
      { value: "common", label: "one common rise for every scheme (the rise above)" },
    ],
    source: "study choice",
    group: GEOMETRY,
  },
  {
    key: "objective",
    kind: "choice",
    label: "Free proportions chosen for least",
    unit: "",
    choices: [
      { value: "carbon", label: "embodied carbon per m² of usable floor" },
      { value: "mass", label: "mass per m² of usable floor" },
      { value: "cost", label: "cost per m² of usable floor" },
    ],
    source: "study choice",
    group: GEOMETRY,
  },
  { key: "snowGroundKPa", kind: "number", label: "Ground snow load s_k", unit: "kPa", min: 0, max: 10, step: 0.05, source: "site (EN 1991-1-3 §4 and national annex)", group: SITE },
  { key: "windBasicMPerS", kind: "number", label: "Basic wind velocity v_b", unit: "m/s", min: 10, max: 60, step: 0.5, source: "site (EN 1991-1-4 §4.2 and national annex)", group: SITE },
  {
    key: "terrain",
    kind: "choice",
    label: "Terrain category",
    unit: "",
    choices: TERRAIN_CATEGORIES.map((t) => ({ value: t, label: `Category ${t}` })),
    source: "EN 1991-1-4 Table 4.1",
    group: SITE,
  },
  { key: "airDensityKgPerM3", kind: "number", label: "Air density for wind", unit: "kg/m³", min: 1.0, max: 1.4, step: 0.01, source: "EN 1991-1-4 §4.5 note 2", group: null },
  {
    key: "upliftCoefficient",
    kind: "number",
    label: "Net uplift pressure coefficient",
    unit: "–",
    min: 0,
    max: 2,
    step: 0.05,
    hint: "editable assumption for a domed roof",
    source: "editable assumption (from memory: EN 1991-1-4 Fig. 7.12 crown about −0.8)",
    group: SITE,
  },
  { key: "imposedRoofKPa", kind: "number", label: "Roof imposed load, category H", unit: "kPa", min: 0, max: 1.0, step: 0.05, source: "EN 1991-1-1 Table 6.10", group: SITE },
  { key: "servicesKPa", kind: "number", label: "Services and hung load (permanent)", unit: "kPa", min: 0, max: 2, step: 0.05, source: "common practice, no source", group: SITE },
  { key: "factors.gammaGSup", kind: "number", label: "γ_G,sup", unit: "–", min: 1, max: 2, step: 0.05, source: TABLE_A1_2B, group: FACTORS },
  { key: "factors.gammaGInf", kind: "number", label: "γ_G,inf", unit: "–", min: 0, max: 1.5, step: 0.05, source: TABLE_A1_2B, group: FACTORS },
  { key: "factors.gammaQ", kind: "number", label: "γ_Q", unit: "–", min: 1, max: 2, step: 0.05, source: TABLE_A1_2B, group: FACTORS },
  { key: "factors.xi", kind: "number", label: "ξ (eq. 6.10b)", unit: "–", min: 0.5, max: 1, step: 0.01, source: TABLE_A1_2B, group: FACTORS },
  { key: "factors.psi0Snow", kind: "number", label: "ψ0 snow", unit: "–", min: 0, max: 1, step: 0.05, source: "EN 1990 Table A1.1", group: null },
  { key: "factors.psi0Wind", kind: "number", label: "ψ0 wind", unit: "–", min: 0, max: 1, step: 0.05, source: "EN 1990 Table A1.1", group: null },
  {
    key: "ulsExpression",
    kind: "choice",
    label: "ULS expression",
    unit: "",
    choices: [
      { value: "6.10a/b", label: "less favourable of 6.10a and 6.10b" },
      { value: "6.10", label: "6.10" },
    ],
    source: "EN 1990 §6.4.3.2",
    group: FACTORS,
  },
] as const satisfies readonly BriefField[];

type NumberKeys = Extract<(typeof BRIEF_FIELDS)[number], { kind: "number" }>["key"];
type TopNumberKeys = Exclude<NumberKeys, `factors.${string}`>;

/** Range of each top-level numeric brief field (the risk ranges and the CLI's span sweep clamp to them). */
export const BRIEF_LIMITS = Object.fromEntries(
  BRIEF_FIELDS.filter((f) => f.kind === "number" && !f.key.includes(".")).map((f) => [f.key, { min: (f as NumberField).min, max: (f as NumberField).max }]),
) as Record<TopNumberKeys, { min: number; max: number }>;

/** The unit as a message shows it ("–", a pure number, shows none). */
export function messageUnit(field: BriefField): string {
  return field.unit === "–" ? "" : field.unit;
}
