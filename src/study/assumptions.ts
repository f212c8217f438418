import type { Study } from "./study";
import { defaultStudy } from "./defaults";
import { SCHEME_DECLARATIONS } from "../schemes/declarations";
import { BRIEF_FIELDS } from "../brief";
import { getIn } from "../kernel/patch";
import { studyToJson } from "./load-study";
import { defaultRiskSettings } from "../risk/default-risk-settings";
import { SHAPE_WORDS } from "../risk/distribution";

/** One input of a study, as the assumptions record lists it. */
export interface Assumption {
  /** Stable key: the path with table rows named by their material or item id, e.g. "carbon.factors[steel-plate].wasteRatePct". */
  key: string;
  /** The value itself (for applying a change to another study). */
  raw: unknown;
  /** brief, scheme, carbon factor, carbon setting, rate, on-cost, risk. */
  group: string;
  /** Dotted path in the study file, e.g. "brief.spanM". */
  path: string;
  label: string;
  value: string;
  unit: string;
  default: string;
  source: string;
  changed: boolean;
}

type FieldInfo = { label: string; unit: string; source: string };

const FACTOR_FIELDS: Record<string, FieldInfo> = {
  a1a3KgCO2ePerKg: { label: "A1–A3", unit: "kgCO2e/kg", source: "" },
  transportKmRoad: { label: "A4 road distance", unit: "km", source: "" },
  transportKmSea: { label: "A4 sea distance", unit: "km", source: "" },
  wasteRatePct: { label: "A5 waste rate", unit: "%", source: "" },
  endOfLifeKgCO2ePerKg: { label: "C1–C4", unit: "kgCO2e/kg", source: "" },
  moduleDKgCO2ePerKg: { label: "module D (reported apart)", unit: "kgCO2e/kg", source: "" },
  biogenicKgCO2ePerKg: { label: "biogenic storage (reported apart)", unit: "kgCO2/kg", source: "" },
};

const ON_COST_FIELDS: Record<string, FieldInfo> = {
  preliminariesPct: { label: "Preliminaries", unit: "%", source: "" },
  overheadsProfitPct: { label: "Overheads and profit", unit: "%", source: "" },
  designFeesPct: { label: "Design fees", unit: "%", source: "" },
  riskPct: { label: "Risk allowance", unit: "%", source: "" },
  inflationPct: { label: "Inflation", unit: "%", source: "" },
  locationFactor: { label: "Location factor", unit: "–", source: "" },
  priceBase: { label: "Price base", unit: "", source: "" },
  currency: { label: "Currency", unit: "", source: "" },
  rateSetName: { label: "Rate set (name)", unit: "", source: "" },
};

function show(value: unknown): string {
  if (value === undefined) return "";
  if (typeof value === "number") return String(Number(value.toPrecision(10)));
  if (typeof value === "object" && value !== null) return JSON.stringify(value);
  return String(value);
}

function dotted(path: readonly (string | number)[]): string {
  return path.map((p, i) => (typeof p === "number" ? `[${p}]` : i === 0 ? p : `.${p}`)).join("");
}

function row(group: string, path: (string | number)[], info: FieldInfo, study: Study, defaults: Study, defaultPath = path, key = dotted(path), shown: (value: unknown) => string = show): Assumption {
  const value = getIn(study, path);
  const dflt = getIn(defaults, defaultPath);
  return {
    key,
    raw: value,
    group,
    path: dotted(path),
    label: info.label,
    value: shown(value),
    unit: info.unit,
    default: shown(dflt),
    source: info.source,
    changed: dflt === undefined ? true : show(value) !== show(dflt),
  };
}

/** A risk range's parts in the risk page's words, not the file's keys (issue 14: our own vocabulary; audit8). */
const RISK_PART_WORDS = { scale: "ends given as", low: "least", high: "most", distribution: "how likely in between", group: "moves with (group)" } as const;

function riskPartValue(key: keyof typeof RISK_PART_WORDS): (value: unknown) => string {
  return (value) => {
    if (value === undefined) return "";
    if (key === "scale") return value === "factor" ? "× study value" : "+ study value";
    if (key === "distribution") return SHAPE_WORDS[value as keyof typeof SHAPE_WORDS] ?? String(value);
    if (key === "group") return value === null ? "none (moves on its own)" : String(value);
    return show(value);
  };
}

/**
 * Every input of a study — brief, scheme options, carbon factors and settings, rates, on-costs, risk ranges —
 * with its value, unit, default, source and whether it differs from the default. Table rows are
 * matched to their defaults by material or item id, so a reordered table is not "changed".
 */
export function assumptionsRecord(study: Study, defaults: Study = defaultStudy()): Assumption[] {
  const out: Assumption[] = [];
  for (const { key, label, unit, source } of BRIEF_FIELDS) out.push(row("brief", ["brief", ...key.split(".")], { label, unit, source }, study, defaults));
  for (const model of SCHEME_DECLARATIONS) {
    out.push(row("scheme", ["schemes", model.id, "enabled"], { label: `${model.label}: compared`, unit: "", source: "study" }, study, defaults));
    for (const spec of model.options) {
      out.push(row("scheme", ["schemes", model.id, "options", spec.key], { label: `${model.label}: ${spec.label}`, unit: spec.unit, source: spec.source }, study, defaults));
    }
  }
  study.carbon.factors.forEach((factor, index) => {
    const d = defaults.carbon.factors.findIndex((f) => f.material === factor.material);
    for (const [key, info] of Object.entries(FACTOR_FIELDS)) {
      out.push(
        row("carbon factor", ["carbon", "factors", index, key], { ...info, label: `${factor.label}: ${info.label}`, source: factor.source }, study, defaults, ["carbon", "factors", d < 0 ? -1 : d, key], `carbon.factors[${factor.material}].${key}`),
      );
    }
  });
  for (const key of Object.keys(study.carbon.settings)) {
    if (key === "transportModes") continue;
    out.push(row("carbon setting", ["carbon", "settings", key], { label: key, unit: key.endsWith("Pct") ? "%" : "", source: "study" }, study, defaults));
  }
  study.carbon.settings.transportModes.forEach((mode, index) => {
    const d = defaults.carbon.settings.transportModes.findIndex((m) => m.mode === mode.mode);
    out.push(
      row("carbon setting", ["carbon", "settings", "transportModes", index, "kgCO2ePerTonneKm"], { label: `A4 ${mode.mode} factor`, unit: "kgCO2e/t·km", source: mode.source }, study, defaults, ["carbon", "settings", "transportModes", d < 0 ? -1 : d, "kgCO2ePerTonneKm"], `carbon.settings.transportModes[${mode.mode}].kgCO2ePerTonneKm`),
    );
  });
  study.cost.rates.forEach((rate, index) => {
    const d = defaults.cost.rates.findIndex((r) => r.item === rate.item);
    for (const key of ["rate", "low", "high"] as const) {
      out.push(row("rate", ["cost", "rates", index, key], { label: `${rate.label}: ${key}`, unit: `per ${rate.unit}`, source: rate.source }, study, defaults, ["cost", "rates", d < 0 ? -1 : d, key], `cost.rates[${rate.item}].${key}`));
    }
  });
  for (const [key, info] of Object.entries(ON_COST_FIELDS)) out.push(row("on-cost", ["cost", "onCosts", key], { ...info, source: "study" }, study, defaults));
  out.push(row("study", ["seed"], { label: "Random seed", unit: "", source: "study" }, study, defaults));
  // Risk ranges: their defaults are the ones the study's own values imply (defaultRiskSettings).
  const { risk, ...rest } = study;
  const riskDefaults = { risk: defaultRiskSettings(rest) } as Study;
  out.push(row("risk", ["risk", "samples"], { label: "Monte Carlo samples", unit: "", source: "study" }, study, riskDefaults));
  risk.inputs.forEach((input, index) => {
    const d = riskDefaults.risk.inputs.findIndex((i) => i.id === input.id);
    // Ranges are stored around the study's value (the most likely): factors on it, or amounts added to it.
    const around = input.scale === "factor" ? "× the study's value, the most likely" : "added to the study's value, the most likely";
    for (const key of ["scale", "low", "high", "distribution", "group"] as const) {
      const label = key === "low" || key === "high" ? `${input.label}: ${RISK_PART_WORDS[key]} (${around})` : `${input.label}: ${RISK_PART_WORDS[key]}`;
      const info = { label, unit: "", source: "risk range (common practice, no source)" };
      out.push(row("risk", ["risk", "inputs", index, key], info, study, riskDefaults, ["risk", "inputs", d < 0 ? -1 : d, key], `risk.inputs[${input.id}].${key}`, riskPartValue(key)));
    }
  });
  return out;
}

/**
 * The study as a file to keep: the study itself plus, under `assumptionsRecord`, every input with
 * its default, unit, source and changed flag, so a reader of the file sees them without spanbook.
 * The record is derived: on opening it is ignored (the schema drops unknown keys) and rebuilt.
 */
export function studyFileText(study: Study): string {
  const record = assumptionsRecord(study).map(({ raw: _raw, key: _key, ...row }) => row);
  return studyToJson({ ...study, assumptionsRecord: record } as Study);
}
