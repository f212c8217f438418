import type { RiskStudy } from "./risk-study";
import type { Catalogue } from "../catalogue/types";
import type { Design, SchemeId, SchemeModel } from "../schemes/types";
import { SCHEMES } from "../schemes";
import { evaluateStudy, designWithChoice, assessDesign, screensDifferently, screenedOptions, type SchemeFigures, type SchemeResult } from "../pipeline";
import { CONCEPT_SCREENING } from "../cost";
import { getIn } from "../kernel/patch";
import { createPrng } from "./prng";
import { makeDistribution } from "./make-distribution";
import type { Distribution } from "./distribution";
import { applyValues, compilePaths } from "./apply-values";
import { checkRiskInputs } from "./check-risk-inputs";
import { designQuantities, assessmentIntensities, linearAssessment, type DesignQuantities } from "./linear-assessment";
import { summariseMetric, lowestProbabilities, pairwiseProbabilities, rankCorrelationsWith, type Clusters } from "./risk-summaries";
import { ranks } from "./rank-correlation";
import { RISK_LIMITS, type PathStep } from "./risk-settings";
import type { ResolvedInput } from "./resolve-inputs";
import { inputUsedBy } from "./input-used-by";
import { RISK_COVERAGE, RISK_METRICS, type RankCorrelation, type RiskMetric, type RiskResult, type SchemeRisk } from "./risk-result";

export type RiskProgress = { phase: "designs" | "samples"; done: number; total: number };

export type RunRiskOptions = {
  /** Samples (default: the study's risk.samples). */
  samples?: number;
  /** Seed (default: the study's seed). */
  seed?: number;
  /** Distinct design draws (default: the study's risk.designSamples), never more than the samples. */
  designSamples?: number;
  onProgress?: (progress: RiskProgress) => void;
  /** Checked between batches; returning true stops the run with a RiskCancelledError. */
  shouldStop?: () => boolean;
};

/** Thrown when shouldStop asked the run to stop. */
export class RiskCancelledError extends Error {
  constructor() {
    super("risk run cancelled");
    this.name = "RiskCancelledError";
  }
}

/** True for inputs that change a design (loads, scheme options); the rest change only carbon and cost. */
export function affectsDesign(input: { path: readonly PathStep[] }): boolean {
  return input.path[0] === "brief" || input.path[0] === "schemes";
}

/** True when an input changes the design of this scheme. */
function affectsScheme(input: { path: readonly PathStep[] }, id: SchemeId): boolean {
  return input.path[0] === "brief" || (input.path[0] === "schemes" && input.path[1] === id);
}

type DesignEntry = { design: Design; quantities: DesignQuantities; direct?: { carbon: number; cost: number } };

function checkCount(value: number, what: string, min: number, max: number): number {
  if (!(Number.isInteger(value) && value >= min && value <= max)) throw new Error(`invalid ${what}: ${value} (expected a whole number from ${min} to ${max})`);
  return value;
}

/**
 * Monte Carlo risk analysis of a study: the whole pipeline (designScheme, then carbon and cost)
 * run for `samples` draws of the study's uncertain inputs, by inverse transform from a seeded
 * xoshiro128** stream; per scheme P10/P50/P90, mean and standard errors of self-weight, carbon and
 * cost per m² beside the deterministic value, the probability of being lowest in carbon and in
 * cost among the schemes feasible in each sample, P(A beats B) for each pair, and Spearman rank
 * correlations of each input with each output. The same study and seed give the same result, byte
 * for byte.
 *
 * Speed. Inputs are split: those that change a design (brief loads, scheme options) are drawn
 * `designSamples` times by Latin hypercube sampling (McKay, Beckman and Conover, Technometrics
 * 21(2), 1979), and each scheme is designed once per distinct draw of the inputs that affect it;
 * sample i uses design draw i mod designSamples with its own independent draw of the
 * assessment-only inputs (factors, waste, transport, rates, on-costs). Carbon and cost are linear
 * in the take-off, so each sample's tables are reduced to unit intensities once and applied to
 * every design (linear-assessment.ts); samples at the study's own assessment values use
 * assessDesign itself. Standard errors treat samples sharing a design draw as a cluster.
 * @throws Error naming the input for invalid risk settings, or naming samples, designSamples or seed
 * @throws RiskCancelledError when shouldStop returns true
 */
export function runRisk(study: RiskStudy, catalogue: Catalogue, options: RunRiskOptions = {}): RiskResult {
  const samples = checkCount(options.samples ?? study.risk.samples, "samples", RISK_LIMITS.samples.min, RISK_LIMITS.samples.max);
  const seed = checkCount(options.seed ?? study.seed, "seed", 0, 2 ** 31 - 1);
  const designSamples = Math.min(samples, checkCount(options.designSamples ?? study.risk.designSamples, "designSamples", RISK_LIMITS.designSamples.min, RISK_LIMITS.designSamples.max));
  const check = checkRiskInputs(study);
  if (check.problems.length > 0) throw new Error(`invalid risk inputs: ${check.problems.map((p) => p.message).join("; ")}`);

  const plan = planInputs(study, check.resolved, samples, designSamples, options);
  const rng = createPrng(seed);
  const poolU = latinHypercube(plan, rng);
  const evaluated = new Map(evaluateStudy(study, catalogue).results.map((r) => [r.id, r]));
  const deterministic = new Map([...evaluated].map(([id, r]) => [id, r.figures]));
  const designs = drawDesigns(study, catalogue, plan, poolU, evaluated);
  const drawn = drawSamples(study, plan, poolU, designs, rng);

  const carbonOutputs = drawn.outputs.map((o) => o[1] as Float64Array);
  const costOutputs = drawn.outputs.map((o) => o[2] as Float64Array);
  const lowestCarbon = lowestProbabilities(carbonOutputs, drawn.clusters);
  const lowestCost = lowestProbabilities(costOutputs, drawn.clusters);
  const ids = plan.models.map((m) => m.id);
  const warnings = [
    ...check.warnings,
    ...plan.models.filter((_, s) => designs.corrections[s]).map((m) => `${m.label}: each draw is designed by its fast first estimate (the closed form) and scaled by the ratio of the compare page's design (the 3D analysis) to that estimate at the study's own values; a 3D analysis per draw would take minutes`),
  ];
  const schemes: SchemeRisk[] = plan.models.map((model, s) => ({
    ...schemeSummary(plan, model, s, designs, drawn, deterministic.get(model.id), warnings),
    pLowestCarbon: lowestCarbon.p[s] as number,
    pLowestCost: lowestCost.p[s] as number,
    seLowestCarbon: lowestCarbon.se[s] as number,
    seLowestCost: lowestCost.se[s] as number,
  }));
  const { inputs, isDesign, models } = plan;
  return {
    samples,
    seed,
    designSamples,
    designsPerScheme: Object.fromEntries(models.map((m, s) => [m.id, (designs.entries[s] as DesignEntry[]).length])),
    samplesWithFeasible: lowestCarbon.samplesWithAny,
    schemes,
    pairwise: [...pairwiseProbabilities(ids, carbonOutputs, "carbonKgCO2ePerM2Floor"), ...pairwiseProbabilities(ids, costOutputs, "costPerM2Floor")],
    rankCorrelations: rankCorrelationsOf(plan, drawn),
    designInputs: inputs.filter((_, k) => isDesign[k]).map((i) => i.id),
    assessmentInputs: inputs.filter((_, k) => !isDesign[k]).map((i) => i.id),
    usedInputs: Object.fromEntries(models.map((m) => [m.id, study.risk.inputs.filter((i) => inputUsedBy(i, m.id, evaluated.get(m.id)?.design.takeoff ?? [])).map((i) => i.id)])),
    estimateClass: CONCEPT_SCREENING,
    coverage: RISK_COVERAGE,
    currency: study.cost.onCosts.currency,
    warnings,
  };
}

/** What a run draws: the inputs, their distributions and groups, the schemes, and the counts. */
type Plan = {
  inputs: readonly ResolvedInput[];
  distributions: Distribution[];
  isDesign: boolean[];
  models: SchemeModel[];
  /** Groups in order of first appearance, each input's group, and whether a group is drawn with the designs. */
  groupKeys: string[];
  groupOf: number[];
  designGroup: boolean[];
  samples: number;
  designSamples: number;
  options: RunRiskOptions;
};

/**
 * A scheme whose draws are designed as its proportion search screens it (the tension roofs by the
 * closed form: a 3D analysis per draw would take the risk run from seconds to minutes): each draw's
 * outputs are scaled by the ratio of its full design to its screening design at the study's own
 * values, each under the sample's own factors and rates.
 */
type Correction = { full: DesignEntry; screening: DesignEntry };
type Designs = { entries: DesignEntry[][]; entryOf: Int32Array[]; corrections: (Correction | null)[] };
type Drawn = { inputValues: Float64Array[]; outputs: Float64Array[][]; clusters: Clusters };

const every = (total: number) => Math.max(1, Math.floor(total / 100));

function planInputs(study: RiskStudy, inputs: readonly ResolvedInput[], samples: number, designSamples: number, options: RunRiskOptions): Plan {
  // Rows found by id, ranges made absolute around the study's values (the mode).
  const isDesign = inputs.map(affectsDesign);
  // Groups in order of first appearance; a group with any design-affecting input is drawn with the designs.
  const groupKeys: string[] = [];
  const groupOf = inputs.map((input) => {
    const key = input.group ?? `#${input.id}`;
    let g = groupKeys.indexOf(key);
    if (g < 0) g = groupKeys.push(key) - 1;
    return g;
  });
  return {
    inputs,
    distributions: inputs.map((i) => makeDistribution(i.distribution, i.low, i.mode, i.high)),
    isDesign,
    models: SCHEMES.filter((m) => study.schemes[m.id]?.enabled !== false),
    groupKeys,
    groupOf,
    designGroup: groupKeys.map((_, g) => inputs.some((_input, k) => groupOf[k] === g && isDesign[k])),
    samples,
    designSamples,
    options,
  };
}

/** Latin hypercube for the design groups: one stratum of width 1/designSamples per draw, shuffled per group. */
function latinHypercube(plan: Plan, rng: ReturnType<typeof createPrng>): (Float64Array | null)[] {
  const { designSamples } = plan;
  return plan.groupKeys.map((_, g) => {
    if (!plan.designGroup[g]) return null;
    const strata = Int32Array.from({ length: designSamples }, (_, j) => j);
    for (let j = designSamples - 1; j > 0; j--) {
      const r = Math.floor(rng.uniform() * (j + 1));
      const t = strata[j] as number;
      strata[j] = strata[r] as number;
      strata[r] = t;
    }
    return Float64Array.from(strata, (s) => (s + rng.uniform()) / designSamples);
  });
}

/**
 * Designs: once per scheme per distinct draw of the inputs that affect it, at the proportions the
 * pipeline chose for the study's own values (a draw changes loads and sizes, not the scheme's form).
 */
function drawDesigns(study: RiskStudy, catalogue: Catalogue, plan: Plan, poolU: readonly (Float64Array | null)[], evaluated: ReadonlyMap<string, SchemeResult>): Designs {
  const { inputs, models, designSamples, options } = plan;
  const designTotal = models.length * designSamples;
  const entries = models.map(() => [] as DesignEntry[]);
  const entryOf = models.map(() => new Int32Array(designSamples));
  const corrections = models.map((model) => correctionOf(study, model, evaluated.get(model.id), catalogue));
  let done = 0;
  models.forEach((model, s) => {
    const correction = corrections[s] ?? null;
    const relevant = inputs.map((input, k) => (affectsScheme(input, model.id) ? k : -1)).filter((k) => k >= 0);
    const paths = relevant.map((k) => (inputs[k] as ResolvedInput).path);
    const seen = new Map<string, number>();
    for (let j = 0; j < designSamples; j++) {
      const values = relevant.map((k) => (plan.distributions[k] as Distribution).quantile((poolU[plan.groupOf[k] as number] as Float64Array)[j] as number));
      const key = values.join(",");
      let index = seen.get(key);
      if (index === undefined) {
        const drawn = applyValues(study, paths, values);
        const options = correction ? screenedOptions(model, drawn.schemes[model.id]) : drawn.schemes[model.id]?.options;
        // a full design that fails at the study's own values fails in every draw, for its reason
        const design = correction && !correction.full.design.feasible ? correction.full.design : designWithChoice(model, drawn.brief, options, choiceOf(evaluated.get(model.id)), catalogue);
        index = (entries[s] as DesignEntry[]).push({ design, quantities: designQuantities(design) }) - 1;
        seen.set(key, index);
      }
      (entryOf[s] as Int32Array)[j] = index;
      done += 1;
      if (done % every(designTotal) === 0) {
        if (options.shouldStop?.()) throw new RiskCancelledError();
        options.onProgress?.({ phase: "designs", done, total: designTotal });
      }
    }
  });
  return { entries, entryOf, corrections };
}

/** The full and screening designs at the study's own values of a scheme whose full design is not the screening one (else null). */
function correctionOf(study: RiskStudy, model: SchemeModel, result: SchemeResult | undefined, catalogue: Catalogue): Correction | null {
  if (!result || !screensDifferently(model, study.schemes[model.id])) return null;
  const screening = designWithChoice(model, study.brief, screenedOptions(model, study.schemes[model.id]), choiceOf(result), catalogue);
  return { full: { design: result.design, quantities: designQuantities(result.design) }, screening: { design: screening, quantities: designQuantities(screening) } };
}

/** The proportions the pipeline chose for a scheme, with the span it chose them at. */
function choiceOf(result: SchemeResult | undefined): Parameters<typeof designWithChoice>[3] {
  return result?.proportions && result.brief ? { proportions: result.proportions, spanM: result.brief.spanM } : undefined;
}

/** Every input's value in sample i: design groups from their hypercube draw, the others from a fresh one. */
function drawInputs(plan: Plan, poolU: readonly (Float64Array | null)[], rng: ReturnType<typeof createPrng>, i: number, inputValues: Float64Array[]): void {
  const j = i % plan.designSamples;
  const sampleU = plan.groupKeys.map((_, g) => (plan.designGroup[g] ? ((poolU[g] as Float64Array)[j] as number) : rng.uniform()));
  // Inputs of one group with the same standardized shape share one quantile evaluation.
  const shared = new Map<string, number>();
  plan.distributions.forEach((d, k) => {
    const key = `${plan.groupOf[k] as number}|${d.shapeKey}`;
    let z = shared.get(key);
    if (z === undefined) {
      z = d.standardQuantile(sampleU[plan.groupOf[k] as number] as number);
      shared.set(key, z);
    }
    (inputValues[k] as Float64Array)[i] = d.high === d.low ? d.low : d.low + (d.high - d.low) * z;
  });
}

/** One sample's self-weight, carbon and cost per m² for one scheme's design (NaN when infeasible). */
function assessEntry(study: RiskStudy, entry: DesignEntry, intensities: ReturnType<typeof assessmentIntensities> | null): [number, number, number] {
  if (!entry.design.feasible) return [Number.NaN, Number.NaN, Number.NaN];
  if (intensities !== null) {
    const linear = linearAssessment(entry.quantities, intensities);
    return [entry.design.selfWeightKgPerM2, linear.carbonPerM2Floor, linear.costPerM2Floor];
  }
  if (!entry.direct) {
    const direct = assessDesign(entry.design, study);
    entry.direct = { carbon: direct.carbon?.perM2UsableFloor.perM2?.counted ?? Number.NaN, cost: direct.cost?.perM2UsableFloor?.total ?? Number.NaN };
  }
  return [entry.design.selfWeightKgPerM2, entry.direct.carbon, entry.direct.cost];
}

/** assessEntry, scaled by the correction's full ÷ screening outputs under the same intensities when the scheme has one. */
function assessCorrected(study: RiskStudy, entry: DesignEntry, correction: Correction | null, intensities: ReturnType<typeof assessmentIntensities> | null): [number, number, number] {
  const drawn = assessEntry(study, entry, intensities);
  if (!correction || entry === correction.full) return drawn;
  const full = assessEntry(study, correction.full, intensities);
  const screening = assessEntry(study, correction.screening, intensities);
  // a draw at the screening design's own outputs is the full design's exactly ((s · f) / s need not round to f)
  return drawn.map((x, m) => (x === screening[m] ? (full[m] as number) : (x * (full[m] as number)) / (screening[m] as number))) as [number, number, number];
}

/** The samples: each with its design draw and its own draw of the assessment-only inputs. */
function drawSamples(study: RiskStudy, plan: Plan, poolU: readonly (Float64Array | null)[], designs: Designs, rng: ReturnType<typeof createPrng>): Drawn {
  const { inputs, models, samples, designSamples, options } = plan;
  const materials = new Set<string>();
  const items = new Set<string>();
  for (const list of [...designs.entries, ...designs.corrections.flatMap((c) => (c ? [[c.full, c.screening]] : []))]) {
    for (const e of list) {
      for (const [m] of e.quantities.massKgByMaterial) materials.add(m);
      for (const [c] of e.quantities.quantityByItem) items.add(c);
    }
  }
  const assessIndex = inputs.map((_, k) => k).filter((k) => !plan.isDesign[k]);
  const assessPaths = compilePaths(assessIndex.map((k) => (inputs[k] as ResolvedInput).path));
  const baseValues = assessIndex.map((k) => getIn(study, (inputs[k] as ResolvedInput).path) as number);
  const inputValues = inputs.map(() => new Float64Array(samples));
  const outputs = models.map(() => RISK_METRICS.map(() => new Float64Array(samples)));
  const clusters: Clusters = { of: new Int32Array(samples), count: designSamples };
  const values = new Float64Array(assessIndex.length);
  for (let i = 0; i < samples; i++) {
    const j = i % designSamples;
    clusters.of[i] = j;
    drawInputs(plan, poolU, rng, i, inputValues);
    let atBase = true;
    assessIndex.forEach((k, a) => {
      values[a] = (inputValues[k] as Float64Array)[i] as number;
      if (values[a] !== baseValues[a]) atBase = false;
    });
    const intensities = atBase ? null : assessmentIntensities(applyValues(study, assessPaths, values), materials, items);
    models.forEach((_, s) => {
      const entry = (designs.entries[s] as DesignEntry[])[(designs.entryOf[s] as Int32Array)[j] as number] as DesignEntry;
      const metrics = assessCorrected(study, entry, designs.corrections[s] ?? null, intensities);
      (outputs[s] as Float64Array[]).forEach((out, m) => (out[i] = metrics[m] as number));
    });
    if ((i + 1) % every(samples) === 0) {
      if (options.shouldStop?.()) throw new RiskCancelledError();
      options.onProgress?.({ phase: "samples", done: i + 1, total: samples });
    }
  }
  return { inputValues, outputs, clusters };
}

/** Spearman rank correlation of each input with each scheme's outputs, where the input can move it. */
function rankCorrelationsOf(plan: Plan, drawn: Drawn): RankCorrelation[] {
  const { inputs, isDesign } = plan;
  const inputRanks = drawn.inputValues.map((x, k) => ((inputs[k] as ResolvedInput).low < (inputs[k] as ResolvedInput).high ? ranks(x) : null));
  const out: RankCorrelation[] = [];
  plan.models.forEach((model, s) => {
    RISK_METRICS.forEach((metric, m) => {
      // Only inputs that can move this output: self-weight only the design inputs of this scheme,
      // carbon and cost also every assessment input (another scheme's options would show noise).
      const usable = inputRanks.map((r, k) => {
        const input = inputs[k] as ResolvedInput;
        if (isDesign[k] && !affectsScheme(input, model.id)) return null;
        return metric === "selfWeightKgPerM2" && !isDesign[k] ? null : r;
      });
      const rho = rankCorrelationsWith((drawn.outputs[s] as Float64Array[])[m] as Float64Array, drawn.inputValues, usable);
      inputs.forEach((input, k) => {
        if (usable[k]) out.push({ scheme: model.id, metric, inputId: input.id, rho: rho[k] ?? null });
      });
    });
  });
  return out;
}

/** One scheme's share of feasible samples, its commonest reason, and each metric's summary; a warning when not always feasible. */
function schemeSummary(plan: Plan, model: SchemeModel, s: number, designs: Designs, drawn: Drawn, h: SchemeFigures | undefined, warnings: string[]) {
  const { samples, designSamples } = plan;
  const outputs = drawn.outputs[s] as Float64Array[];
  const feasibleSamples = outputs[0]?.reduce((n, x) => (Number.isFinite(x) ? n + 1 : n), 0) ?? 0;
  const reasons = new Map<string, number>();
  for (let j = 0; j < designSamples; j++) {
    const e = (designs.entries[s] as DesignEntry[])[(designs.entryOf[s] as Int32Array)[j] as number] as DesignEntry;
    if (!e.design.feasible) reasons.set(e.design.reason, (reasons.get(e.design.reason) ?? 0) + 1);
  }
  const commonReason = [...reasons].sort((a, b) => b[1] - a[1])[0]?.[0] ?? "";
  if (feasibleSamples < samples) warnings.push(`${model.label}: infeasible in ${samples - feasibleSamples} of ${samples} samples${commonReason ? ` (${commonReason})` : ""}`);
  const det: Record<RiskMetric, number | null> = {
    selfWeightKgPerM2: h?.feasible ? h.selfWeightKgPerM2 : null,
    carbonKgCO2ePerM2Floor: h?.feasible ? h.carbonKgCO2ePerM2Floor : null,
    costPerM2Floor: h?.feasible ? h.costPerM2Floor : null,
  };
  const metrics = Object.fromEntries(RISK_METRICS.map((metric, m) => [metric, summariseMetric(outputs[m] as Float64Array, drawn.clusters, det[metric])])) as Record<RiskMetric, SchemeRisk["metrics"][RiskMetric]>;
  return { id: model.id, label: model.label, pFeasible: feasibleSamples / samples, commonReason, metrics };
}
