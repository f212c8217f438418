import type { RiskStudy } from "./risk-study";
import type { Catalogue } from "../catalogue/types";
import type { Design, SchemeId } from "../schemes/types";
import { SCHEMES } from "../schemes";
import { designAtBestProportions, designWithChoice, schemeResult, screensDifferently, screenedOptions } from "../pipeline";
import { setIn } from "../kernel/patch";
import { checkRiskInputs } from "./check-risk-inputs";
import type { ResolvedInput } from "./resolve-inputs";

/** One bar of a tornado: the output with one input at its low and at its high end, the others at the study's values. */
export type TornadoBar = {
  inputId: string;
  label: string;
  /** Output with the input at its low end (NaN: infeasible or not assessed there). */
  atLow: number;
  atHigh: number;
  /** |atHigh − atLow| (NaN when either end is NaN). */
  swing: number;
};

/** The tornado of one scheme and metric: bars sorted by swing, largest first (NaN swings last). */
export type Tornado = { scheme: SchemeId; metric: "carbonKgCO2ePerM2Floor" | "costPerM2Floor"; base: number; bars: TornadoBar[] };

function metricsOf(design: Design, study: Pick<RiskStudy, "carbon" | "cost">): { carbon: number; cost: number } {
  if (!design.feasible) return { carbon: Number.NaN, cost: Number.NaN };
  const f = schemeResult(design.schemeId, design.schemeId, design, study).figures;
  return { carbon: f.carbonKgCO2ePerM2Floor ?? Number.NaN, cost: f.costPerM2Floor ?? Number.NaN };
}

/**
 * One-at-a-time sensitivity (a tornado diagram): for every scheme and for carbon and cost per m²
 * of usable floor, each uncertain input set to its low and to its high end with all others at
 * the study's values, by the pipeline itself (the scheme at the proportions the pipeline chose for the
 * study's values, designed again only when the input changes that scheme's design, then assessDesign); bars sorted by swing. It shows each input alone; it does
 * not show interactions or joint extremes (the Monte Carlo does).
 * @throws Error naming the input for invalid risk settings
 */
export function riskTornado(study: RiskStudy, catalogue: Catalogue): Tornado[] {
  const check = checkRiskInputs(study);
  if (check.problems.length > 0) throw new Error(`invalid risk inputs: ${check.problems.map((p) => p.message).join("; ")}`);
  const inputs = check.resolved.filter((i) => i.low < i.high);
  const out: Tornado[] = [];
  for (const model of SCHEMES.filter((m) => study.schemes[m.id]?.enabled !== false)) {
    const searched = designAtBestProportions(model, study.brief, study.schemes[model.id], study, catalogue);
    const choice = { proportions: searched.proportions, spanM: searched.brief.spanM };
    const baseDesign = searched.design;
    const base = metricsOf(baseDesign, study);
    // the tension roofs with the 3D analysis: each end designed by the closed form and scaled by the
    // 3D design's ratio to it at the study's values (as the Monte Carlo's draws, run-risk.ts)
    const screening = screensDifferently(model, study.schemes[model.id]);
    const screenBase = screening ? designWithChoice(model, study.brief, screenedOptions(model, study.schemes[model.id]), choice, catalogue) : baseDesign;
    const ends = (input: ResolvedInput, value: number) => {
      const moved = setIn(study, input.path, value);
      const changesDesign = input.path[0] === "brief" || (input.path[0] === "schemes" && input.path[1] === model.id);
      const options = screening ? screenedOptions(model, moved.schemes[model.id]) : moved.schemes[model.id]?.options;
      const at = metricsOf(changesDesign ? designWithChoice(model, moved.brief, options, choice, catalogue) : screenBase, moved);
      if (!screening) return at;
      const full = metricsOf(baseDesign, moved);
      const closed = metricsOf(screenBase, moved);
      return { carbon: (at.carbon * full.carbon) / closed.carbon, cost: (at.cost * full.cost) / closed.cost };
    };
    const bars = inputs.map((input) => ({ input, low: ends(input, input.low), high: ends(input, input.high) }));
    for (const metric of ["carbonKgCO2ePerM2Floor", "costPerM2Floor"] as const) {
      const pick = (m: { carbon: number; cost: number }) => (metric === "carbonKgCO2ePerM2Floor" ? m.carbon : m.cost);
      const list: TornadoBar[] = bars.map(({ input, low, high }) => ({ inputId: input.id, label: input.label, atLow: pick(low), atHigh: pick(high), swing: Math.abs(pick(high) - pick(low)) }));
      list.sort((a, b) => (Number.isNaN(a.swing) ? 1 : 0) - (Number.isNaN(b.swing) ? 1 : 0) || b.swing - a.swing || a.inputId.localeCompare(b.inputId));
      out.push({ scheme: model.id, metric, base: pick(base), bars: list });
    }
  }
  return out;
}
