// `npm run evaluate -- FILE [options]`: the whole pipeline on a study file, from the command line.
import { readFileSync } from "node:fs";
import { parseArgs as nodeParseArgs, type ParseArgsConfig } from "node:util";
import { pathToFileURL } from "node:url";
import { studyFromJson, describeProblems, BRIEF_LIMITS, type Study } from "./study";
import { SCHEMES } from "./schemes";
import { ON_DEMAND_ANALYSIS_OPTION } from "./schemes/declarations";
import type { SchemeId } from "./schemes/types";
import { defaultCatalogue } from "./catalogue/default-catalogue";
import { formatCsv, parseDecimal, shown } from "./kernel/csv-table";
import { parseFactorCsv } from "./carbon";
import { parseRateCsv } from "./cost";
import { evaluateStudy, tableGaps, describeGaps, OBJECTIVES, usesRise, type Objective, type SchemeFigures, type SchemeResult, type TableGap } from "./pipeline";
import { runSpanStudy } from "./comparison/span-study";
import { CAUTION } from "./kernel/caution";
import { failure, messageOf } from "./kernel/errors";
import { runRisk, RISK_LIMITS, type RiskResult } from "./risk";

export const USAGE = `usage: npm run evaluate -- FILE [--json] [--span M] [--sweep FROM:TO:STEP] [--schemes a,b]
                              [--factors FILE.csv] [--rates FILE.csv] [--risk N [--seed S]] [--partial]
  FILE              a study file (.json)
  --json            machine-readable results
  --span M          evaluate at span M (m), keeping the rise-to-span ratio
  --sweep F:T:S     evaluate every span from F to T in steps of S (m) and print CSV
  --schemes a,b     only these schemes (${SCHEMES.map((s) => s.id).join(", ")})
  --factors FILE    replace the study's carbon factor table with this CSV for the run
  --rates FILE      replace the study's rate table with this CSV for the run
  --risk N          also run N Monte Carlo samples of the study's uncertain inputs (P10/P50/P90)
  --seed S          seed for --risk (default: the study's seed)
  --partial         print the results even when a table lacks a row a scheme needs (its carbon or
                    cost is left blank and the gap named on stderr; without it: exit 2)
  --objective O     choose each scheme's free proportions for least mass, carbon or cost per m² of
                    usable floor (default: the study's objective)
  --buckling        also run the on-demand 3D buckling analysis where a scheme offers one`;

export interface CliResult {
  code: number;
  stdout: string;
  stderr: string;
}

class UsageError extends Error {}

interface Parsed {
  file: string;
  json: boolean;
  /** Print what can be computed when a table lacks rows (the gaps named on stderr), exit 0. */
  partial: boolean;
  spanM?: number;
  sweep?: { from: number; to: number; step: number };
  schemes?: SchemeId[];
  factors?: string;
  rates?: string;
  risk?: number;
  seed?: number;
  objective?: Objective;
  /** Run the on-demand buckling analysis of the schemes that offer it. */
  buckling?: boolean;
}

function wholeNumber(text: string, what: string, min: number, max: number, unit: string): number {
  const value = parseDecimal(text);
  if (value === null || !Number.isInteger(value) || value < min || value > max) throw new UsageError(`invalid ${what}: ${shown(text)} (expected a whole number${unit ? ` of ${unit}` : ""} from ${min} to ${max})`);
  return value;
}

/** A span typed on the command line; the message echoes what was typed. */
function spanIn(text: string, what: string): number {
  const { min, max } = BRIEF_LIMITS.spanM;
  const value = parseDecimal(text);
  if (value === null) throw new UsageError(`invalid ${what}: ${shown(text)} (expected a span from ${min} to ${max} m, as a decimal number)`);
  if (!(value >= min && value <= max)) throw new UsageError(`invalid ${what}: ${shown(text)} m (expected a span from ${min} to ${max} m)`);
  return value;
}

/** The most steps a --sweep may take. */
const MAX_SWEEP_SPANS = 1000;

/** The options the command line knows: Node's own parser reads them (`node:util` parseArgs). */
const OPTIONS = {
  help: { type: "boolean", short: "h" },
  json: { type: "boolean" },
  partial: { type: "boolean" },
  span: { type: "string" },
  sweep: { type: "string" },
  schemes: { type: "string" },
  factors: { type: "string" },
  rates: { type: "string" },
  risk: { type: "string" },
  seed: { type: "string" },
  objective: { type: "string" },
  buckling: { type: "boolean" },
} as const satisfies ParseArgsConfig["options"];

type OptionName = keyof typeof OPTIONS;
type Flags = Omit<Parsed, "file" | "json" | "partial" | "buckling">;
type Switch = "help" | "json" | "partial" | "buckling";

const ALLOWED = `allowed: ${Object.keys(OPTIONS).map((name) => `--${name}`).join(", ")}`;

function sweepIn(text: string): NonNullable<Parsed["sweep"]> {
  const texts = text.split(":");
  const parts = texts.map(parseDecimal);
  if (parts.length !== 3 || parts.some((p) => p === null)) throw new UsageError(`invalid --sweep: ${shown(text)} (expected FROM:TO:STEP in m as decimal numbers, e.g. 40:400:10)`);
  const [from, to, step] = parts as [number, number, number];
  spanIn(texts[0] ?? "", "--sweep start");
  spanIn(texts[1] ?? "", "--sweep end");
  if (!(step > 0) || to < from) throw new UsageError(`invalid --sweep: ${text} (expected FROM ≤ TO and STEP > 0)`);
  if ((to - from) / step > MAX_SWEEP_SPANS) throw new UsageError(`invalid --sweep: ${text} (expected at most ${MAX_SWEEP_SPANS} spans)`);
  return { from, to, step };
}

function schemesIn(text: string): SchemeId[] {
  const ids = text.split(",").map((s) => s.trim());
  for (const id of ids) {
    if (!SCHEMES.some((s) => s.id === id)) throw new UsageError(`unknown scheme: ${id} (expected one of ${SCHEMES.map((s) => s.id).join(", ")})`);
  }
  return ids as SchemeId[];
}

/** How each option that takes a value reads it into `Flags`; the message names the option and what it allows. */
const READERS: Record<Exclude<OptionName, Switch>, (text: string, flags: Flags) => void> = {
  span: (text, flags) => (flags.spanM = spanIn(text, "--span")),
  sweep: (text, flags) => (flags.sweep = sweepIn(text)),
  schemes: (text, flags) => (flags.schemes = schemesIn(text)),
  factors: (text, flags) => (flags.factors = text),
  rates: (text, flags) => (flags.rates = text),
  risk: (text, flags) => (flags.risk = wholeNumber(text, "--risk", RISK_LIMITS.samples.min, RISK_LIMITS.samples.max, "samples")),
  seed: (text, flags) => (flags.seed = wholeNumber(text, "--seed", 0, 2 ** 31 - 1, "")),
  objective: (text, flags) => {
    if (!(OBJECTIVES as readonly string[]).includes(text)) throw new UsageError(`invalid --objective: ${shown(text)} (expected one of ${OBJECTIVES.join(", ")})`);
    flags.objective = text as Objective;
  },
};

/** What each option that takes a value expects, for the message when the value is missing. */
const EXPECTED: Record<keyof typeof READERS, () => string> = {
  span: () => `a span in m from ${BRIEF_LIMITS.spanM.min} to ${BRIEF_LIMITS.spanM.max}`,
  sweep: () => "FROM:TO:STEP in m, e.g. 40:400:10",
  schemes: () => `scheme ids separated by commas, from ${SCHEMES.map((m) => m.id).join(", ")}`,
  factors: () => "a carbon factor table (.csv)",
  rates: () => "a rate table (.csv)",
  risk: () => `a whole number of samples from ${RISK_LIMITS.samples.min} to ${RISK_LIMITS.samples.max}`,
  seed: () => `a whole number from 0 to ${2 ** 31 - 1}`,
  objective: () => `one of ${OBJECTIVES.join(", ")}`,
};

function isOption(name: string): name is OptionName {
  return Object.hasOwn(OPTIONS, name);
}

/**
 * The arguments, read by Node's parser without its strict mode (so that `--seed -1` reaches our
 * range check) and then checked here option by option, in the order given, each refusal naming
 * the option and what it allows.
 */
function parseArgs(args: readonly string[]): Parsed | "help" {
  const { tokens } = nodeParseArgs({ args: [...args], options: OPTIONS, allowPositionals: true, strict: false, tokens: true });
  const flags: Flags = {};
  const switches = { json: false, partial: false, buckling: false };
  let file: string | undefined;
  for (const token of tokens) {
    if (token.kind === "option-terminator") continue;
    if (token.kind === "positional") {
      if (file !== undefined) throw new UsageError(`unexpected argument: ${token.value} (only one study file)`);
      file = token.value;
      continue;
    }
    const { name, rawName, value } = token;
    if (!isOption(name)) throw new UsageError(`unknown option: ${rawName} (${ALLOWED}; see --help)`);
    if (name === "help") return "help";
    if (name === "json" || name === "partial" || name === "buckling") {
      if (value !== undefined) throw new UsageError(`${rawName} takes no value (got ${shown(value)})`);
      switches[name] = true;
      continue;
    }
    if (value === undefined) throw new UsageError(`missing value for ${rawName} (expected ${EXPECTED[name]()})`);
    READERS[name](value, flags);
  }
  if (file === undefined) throw new UsageError("missing study file (usage: npm run evaluate -- FILE [options])");
  if (flags.seed !== undefined && flags.risk === undefined) throw new UsageError("--seed applies only with --risk N");
  if (flags.risk !== undefined && flags.sweep) throw new UsageError("--risk cannot be combined with --sweep (run one span at a time)");
  return { ...flags, ...switches, file };
}

/** A file's text; a leading byte-order mark is dropped (the browser opens such files too). */
function read(path: string, what: string, readText: (p: string) => string): string {
  try {
    return readText(path).replace(/^\uFEFF/, "");
  } catch (error) {
    const code = (error as { code?: string }).code;
    throw new UsageError(`cannot read ${what} ${path}${code === "ENOENT" ? ": no such file" : code ? `: ${code}` : ""}`);
  }
}

function oneLine(text: string): string {
  return text.replace(/\s*\n\s*/g, "; ");
}

/** Loads the study and applies the table overrides; all checked before any work. */
function loadStudy(parsed: Parsed, readText: (p: string) => string): Study {
  const result = studyFromJson(read(parsed.file, "study file", readText));
  if (!result.ok) throw new UsageError(`invalid study ${parsed.file}: ${oneLine(describeProblems(result.problems, 5))}`);
  let study = result.study;
  try {
    if (parsed.factors) study = { ...study, carbon: { ...study.carbon, factors: parseFactorCsv(read(parsed.factors, "factor file", readText)) } };
    if (parsed.rates) study = { ...study, cost: { ...study.cost, rates: parseRateCsv(read(parsed.rates, "rate file", readText)) } };
  } catch (error) {
    if (error instanceof UsageError) throw error;
    throw failure(`invalid table: ${oneLine(messageOf(error))}`, error, UsageError);
  }
  return withRunFlags(study, parsed);
}


/** The study as this run asks: --objective replaces the study's; --buckling switches on (and pins) the on-demand buckling analysis wherever a scheme offers it. */
function withRunFlags(study: Study, parsed: Parsed): Study {
  const brief = parsed.objective ? { ...study.brief, objective: parsed.objective } : study.brief;
  if (!parsed.buckling) return { ...study, brief };
  const schemes = Object.fromEntries(
    Object.entries(study.schemes).map(([id, setting]) => {
      const offers = SCHEMES.find((m) => m.id === id)?.options.some((o) => o.key === ON_DEMAND_ANALYSIS_OPTION) === true;
      return [id, offers ? { ...setting, options: { ...setting.options, [ON_DEMAND_ANALYSIS_OPTION]: true }, pinned: [...(setting.pinned ?? []), ON_DEMAND_ANALYSIS_OPTION] } : setting];
    }),
  ) as Study["schemes"];
  return { ...study, brief, schemes };
}

const SWEEP_COLUMNS = ["span_m", "id", "feasible", "self_weight_kg_per_m2", "total_mass_t", "roof_mass_t", "mass_to_air", "usable_floor_m2", "carbon_kgco2e_per_m2_floor", "cost_per_m2_floor", "governing", "reason", "status", "governing_load_case", "rise_m", "structure_t", "perimeter_t", "substructure_t", "envelope_t"] as const;

function round(x: number | null, digits = 3): number | null {
  return x === null || !Number.isFinite(x) ? null : Number(x.toPrecision(digits + 3));
}

/**
 * One scheme's figures with the keys the command line prints (snake_case, units in the names,
 * tonnes): the only place the figures are named this way.
 */
export function jsonFigures(f: SchemeFigures) {
  const t = (kg: number) => kg / 1000;
  return {
    id: f.id,
    label: f.label,
    feasible: f.feasible,
    reason: f.reason,
    self_weight_kg_per_m2: f.selfWeightKgPerM2,
    steel_t: t(f.massByKindKg.steel),
    cable_t: t(f.massByKindKg.cable),
    fabric_m2: f.fabricM2,
    fabric_t: t(f.massByKindKg.fabric),
    concrete_m3: f.concreteM3,
    rebar_t: t(f.massByKindKg.rebar),
    cladding_t: t(f.massByKindKg.cladding),
    total_mass_t: t(f.totalMassKg),
    enclosed_air_t: t(f.enclosedAirKg),
    roof_mass_t: t(f.roofMassKg),
    mass_to_air: f.massToAir,
    usable_floor_m2: f.usableFloorM2,
    plan_area_m2: f.planAreaM2,
    governing: f.governing,
    max_utilisation: f.maxUtilisation,
    iterations: f.iterations,
    carbon_a1a3_kgco2e: f.carbonA1A3KgCO2e,
    carbon_a1a5_kgco2e: f.carbonA1A5KgCO2e,
    carbon_total_kgco2e: f.carbonTotalKgCO2e,
    carbon_kgco2e_per_m2_floor: f.carbonKgCO2ePerM2Floor,
    carbon_kgco2e_per_m2_plan: f.carbonKgCO2ePerM2Plan,
    module_d_kgco2e: f.moduleDKgCO2e,
    cost_total: f.costTotal,
    cost_per_m2_floor: f.costPerM2Floor,
    currency: f.currency,
    warnings: f.warnings,
  };
}

/** What the 3D analysis found, with the command line's keys; null where none ran. */
function analysisJson(result: SchemeResult) {
  const a = result.design.analysis;
  if (!a) return null;
  return {
    load_cases: a.loadCases.map((c) => ({ name: c.name, iterations: c.iterations, converged: c.converged, max_displacement_m: c.maxDisplacementM, slack_members: c.slackMembers })),
    ...(a.prestressKN !== undefined ? { prestress_kn: a.prestressKN } : {}),
    ...(a.bucklingFactor !== undefined ? { buckling_factor: a.bucklingFactor } : {}),
    ...(a.continuumBucklingFactor !== undefined ? { continuum_buckling_factor: a.continuumBucklingFactor } : {}),
  };
}

/**
 * One scheme's result with the command line's keys: its figures, then its status, the governing
 * load case, the rise it was designed with, its chosen proportions (with the runner-up), its mass by
 * the four groups and, where one ran, its 3D analysis.
 */
export function jsonResult(result: SchemeResult) {
  const f = result.figures;
  const p = result.proportions;
  return {
    ...jsonFigures(f),
    status: f.status,
    governing_load_case: f.governingLoadCase,
    rise_m: result.brief?.riseM ?? null,
    rise_source: p?.riseSource ?? null,
    proportions: p ? p.proportions : {},
    runner_up: runnerUpJson(p),
    structure_t: f.massByGroupKg.structure / 1000,
    perimeter_t: f.massByGroupKg.perimeter / 1000,
    substructure_t: f.massByGroupKg.substructure / 1000,
    envelope_t: f.massByGroupKg.envelope / 1000,
    ...(result.design.analysis ? { analysis: analysisJson(result) } : {}),
  };
}

/**
 * The best other proportions and how much worse (negative: lower), % of the chosen design's objective:
 * among the full designs where proportions were chosen again on them (`designs: "full"`), else among
 * the search's candidates (`"screening"` where they were designed by the fast first estimate).
 */
function runnerUpJson(p: SchemeResult["proportions"]) {
  const full = p?.full;
  const refined = full !== undefined && full.refined.length > 0;
  const r = refined ? full.runnerUp : p?.runnerUp;
  if (!r) return null;
  return { proportions: r.proportions, difference_pct: round(r.differencePct), designs: refined || full === undefined ? "full" : "screening" };
}

/** Which rise each scheme was designed with, and for what objective its proportions were chosen. */
function riseLine(study: Study, results: readonly SchemeResult[]): string {
  const rises = results.map((r) => {
    // a scheme that uses no rise (the flat truss) reports none, as its panel does
    if (r.proportions && !usesRise(r.proportions)) return `${r.id} uses no rise`;
    return `${r.id} ${r.brief ? r.brief.riseM.toFixed(1) : "–"} m${r.proportions?.riseSource === "searched" ? " (own)" : r.proportions?.riseSource === "pinned" ? " (pinned)" : ""}`;
  });
  const rule = study.brief.riseRule === "own" ? "each scheme's own rise within the height limit" : "one common rise";
  return `Rise: ${rule} — ${rises.join(", ")}; free proportions chosen for least ${study.brief.objective} per m² of usable floor`;
}

/** The "feasible" column: yes only for a feasible result in its method's range. */
function feasibleWord(f: SchemeFigures): string {
  return f.status === "feasible" ? "yes" : f.status === "out-of-range" ? "out of range" : "no";
}

function table(rows: readonly SchemeFigures[]): string {
  const header = ["scheme", "feasible", "kg/m² plan", "steel t", "cable t", "fabric m²", "concrete m³", "kgCO2e/m² floor", "cost/m² floor", "governing"];
  const body = rows.map((f) => [
    f.id,
    feasibleWord(f),
    f.selfWeightKgPerM2.toFixed(1),
    (f.massByKindKg.steel / 1000).toFixed(0),
    (f.massByKindKg.cable / 1000).toFixed(0),
    f.fabricM2.toFixed(0),
    f.concreteM3.toFixed(0),
    f.carbonKgCO2ePerM2Floor === null ? "–" : f.carbonKgCO2ePerM2Floor.toFixed(0),
    f.costPerM2Floor === null ? "–" : `${f.costPerM2Floor.toFixed(0)} ${f.currency ?? ""}`.trim(),
    f.feasible ? f.governing : f.reason,
  ]);
  const widths = header.map((_, i) => Math.max(header[i]?.length ?? 0, ...body.map((r) => r[i]?.length ?? 0)));
  const line = (cells: readonly string[]) => cells.map((c, i) => (i === 0 || i === cells.length - 1 ? c.padEnd(widths[i] ?? 0) : c.padStart(widths[i] ?? 0))).join("  ").trimEnd();
  return [line(header), ...body.map(line)].join("\n");
}

/** The risk run for the CLI: the study at the evaluated brief, only the chosen schemes enabled. */
function riskRun(study: Study, brief: Study["brief"], schemeIds: readonly SchemeId[] | undefined, samples: number, seed: number | undefined, catalogue: ReturnType<typeof defaultCatalogue>): RiskResult {
  const schemes = schemeIds
    ? (Object.fromEntries(Object.entries(study.schemes).map(([id, setting]) => [id, { ...setting, enabled: schemeIds.includes(id as SchemeId) }])) as Study["schemes"])
    : study.schemes;
  try {
    return runRisk({ ...study, brief, schemes }, catalogue, { samples, ...(seed !== undefined ? { seed } : {}) });
  } catch (error) {
    throw failure(oneLine(messageOf(error)), error, UsageError);
  }
}

function band(risk: RiskResult, id: string, metric: "carbonKgCO2ePerM2Floor" | "costPerM2Floor" | "selfWeightKgPerM2") {
  const m = risk.schemes.find((s) => s.id === id)?.metrics[metric];
  return m ? { p10: round(m.p10), p50: round(m.p50), p90: round(m.p90), mean: round(m.mean), se_mean: round(m.seMean) } : null;
}

function riskJson(risk: RiskResult, id: string) {
  const s = risk.schemes.find((x) => x.id === id);
  if (!s) return null;
  return {
    carbon_kgco2e_per_m2_floor: band(risk, id, "carbonKgCO2ePerM2Floor"),
    cost_per_m2_floor: band(risk, id, "costPerM2Floor"),
    self_weight_kg_per_m2: band(risk, id, "selfWeightKgPerM2"),
    p_feasible: round(s.pFeasible),
    p_lowest_carbon: round(s.pLowestCarbon),
    p_lowest_cost: round(s.pLowestCost),
  };
}

function riskMeta(risk: RiskResult) {
  return {
    samples: risk.samples,
    seed: risk.seed,
    design_samples: risk.designSamples,
    estimate_class: risk.estimateClass.label,
    coverage: risk.coverage,
    warnings: risk.warnings,
  };
}

function riskTable(risk: RiskResult): string {
  const f = (x: number | undefined) => (x === undefined ? "–" : x.toFixed(0));
  const header = ["scheme", "kgCO2e/m² P10", "P50", "P90", `cost/m² P10`, "P50", "P90", "P(lowest CO2e)", "P(cheapest)"];
  const body = risk.schemes.map((s) => {
    const c = s.metrics.carbonKgCO2ePerM2Floor;
    const k = s.metrics.costPerM2Floor;
    return [s.id, f(c?.p10), f(c?.p50), f(c?.p90), f(k?.p10), f(k?.p50), f(k?.p90), s.pLowestCarbon.toFixed(2), s.pLowestCost.toFixed(2)];
  });
  const widths = header.map((_, i) => Math.max(header[i]?.length ?? 0, ...body.map((r) => r[i]?.length ?? 0)));
  const line = (cells: readonly string[]) => cells.map((c, i) => (i === 0 ? c.padEnd(widths[i] ?? 0) : c.padStart(widths[i] ?? 0))).join("  ").trimEnd();
  return [`Risk: ${risk.samples} samples, seed ${risk.seed}, ${risk.designSamples} design draws (${risk.currency}, ${risk.estimateClass.label})`, line(header), ...body.map(line), risk.coverage].join("\n");
}

/**
 * The rows the evaluated take-offs need and the study's tables lack (carbon and cost are assessed
 * apart, so a gap blanks only its own figure). Without --partial they stop the run (exit 2).
 */
function gapsOf(results: readonly SchemeResult[], study: Study): TableGap[] {
  return tableGaps(results.map((r) => ({ label: r.id, design: r.design })), { factors: study.carbon.factors, rates: study.cost.rates });
}

function refuseGaps(gaps: readonly TableGap[], parsed: Parsed): string {
  if (gaps.length === 0) return "";
  const text = describeGaps(gaps);
  if (!parsed.partial) throw new UsageError(`missing table rows: ${text}; add them to the study's tables (or --factors/--rates), or pass --partial to print the other results`);
  return `spanbook: partial results, left blank: ${text}\n`;
}

/** The sweep: the span study the page runs, over the given range, printed as CSV. */
function sweepCsv(study: Study, parsed: Parsed, catalogue: ReturnType<typeof defaultCatalogue>): CliResult {
  const rows: Record<string, unknown>[] = [];
  const all: SchemeResult[] = [];
  const { from, to, step } = parsed.sweep as NonNullable<Parsed["sweep"]>;
  const onResult = (spanM: number, result: SchemeResult) => {
    all.push(result);
    const h = jsonResult(result);
    rows.push({ ...h, span_m: spanM, self_weight_kg_per_m2: round(h.self_weight_kg_per_m2), mass_to_air: round(h.mass_to_air), rise_m: round(h.rise_m) });
  };
  runSpanStudy(study, catalogue, { fromM: from, toM: to, stepM: step }, { onResult, maxSpans: MAX_SWEEP_SPANS + 1, ...(parsed.schemes ? { schemeIds: parsed.schemes } : {}) });
  const stderr = refuseGaps(gapsOf(all, study), parsed);
  return { code: 0, stdout: `${formatCsv(rows, SWEEP_COLUMNS)}\n`, stderr };
}

/** Runs the command line; never throws. Exit status 2 for bad input (or rows missing from a table, without --partial) with one line on stderr. */
export function runCli(args: readonly string[], readText: (path: string) => string = (p) => readFileSync(p, "utf8")): CliResult {
  try {
    const parsed = parseArgs(args);
    if (parsed === "help") return { code: 0, stdout: `${USAGE}\n`, stderr: "" };
    const study = loadStudy(parsed, readText);
    const catalogue = defaultCatalogue();
    const schemeIds = parsed.schemes;
    if (parsed.sweep) return sweepCsv(study, parsed, catalogue);
    const evaluation = evaluateStudy(study, catalogue, { ...(parsed.spanM !== undefined ? { spanM: parsed.spanM } : {}), ...(schemeIds ? { schemeIds } : {}) });
    const gaps = gapsOf(evaluation.results, study);
    const stderr = refuseGaps(gaps, parsed);
    const figures = evaluation.results.map((r) => r.figures);
    const risk = parsed.risk === undefined ? null : riskRun(study, evaluation.brief, schemeIds, parsed.risk, parsed.seed, catalogue);
    if (parsed.json) {
      const schemes = evaluation.results.map((r) => (risk ? { ...jsonResult(r), risk: riskJson(risk, r.id) } : jsonResult(r)));
      const out = { span_m: evaluation.brief.spanM, caution: CAUTION, objective: study.brief.objective, rise_rule: study.brief.riseRule, schemes, ...(gaps.length > 0 ? { gaps } : {}), ...(risk ? { risk: riskMeta(risk) } : {}) };
      return { code: 0, stdout: `${JSON.stringify(out, null, 2)}\n`, stderr };
    }
    const riskText = risk ? `\n\n${riskTable(risk)}` : "";
    const gapText = gaps.length > 0 ? `\nLeft blank (–): ${describeGaps(gaps, 12, "\n  ")}` : "";
    return { code: 0, stdout: `${study.meta.title} — span ${evaluation.brief.spanM} m\n${riseLine(study, evaluation.results)}\n${table(figures)}${gapText}${riskText}\n\n${CAUTION}\n`, stderr };
  } catch (error) {
    if (error instanceof UsageError) return { code: 2, stdout: "", stderr: `spanbook: ${error.message}\n` };
    return { code: 1, stdout: "", stderr: `spanbook: internal error: ${messageOf(error)}\n` };
  }
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  const result = runCli(process.argv.slice(2));
  process.stdout.write(result.stdout);
  process.stderr.write(result.stderr);
  process.exitCode = result.code;
}
