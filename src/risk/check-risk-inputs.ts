import type { Study } from "../study/study";
import { validateStudy } from "../study/study-schema";
import { validateWith } from "../study/schema-helpers";
import { getIn } from "../study/patch";
import { RiskSettingsSchema, type PathStep, type RiskSettings } from "./risk-settings";
import { applyValues } from "./apply-values";

/** A problem with one uncertain input (or with the settings as a whole: inputId null). */
export type RiskInputProblem = { inputId: string | null; message: string };

export type RiskInputCheck = {
  /** Problems that stop a run. */
  problems: RiskInputProblem[];
  /** Things to know that do not stop a run (a mode that is not the study's own value). */
  warnings: string[];
};

/** A path as the study's problem messages write it: brief.snowGroundKPa, cost.rates[3].rate. */
export function formatPath(path: readonly PathStep[]): string {
  let out = "";
  for (const step of path) out += typeof step === "number" ? `[${step}]` : out === "" ? step : `.${step}`;
  return out;
}

/**
 * Checks the risk settings against the study before any work: the settings' own schema (ranges
 * low ≤ mode ≤ high, unique ids and paths); every path leads to a finite number in the study; and
 * the study stays valid with every input at its low end and with every input at its high end
 * (every field's limits are intervals, so then every sample is valid too). Messages name the input.
 * A mode that differs from the study's value is a warning: the deterministic column uses the
 * study's value.
 */
export function checkRiskInputs(study: Study, settings: RiskSettings = study.risk): RiskInputCheck {
  const schema = validateWith(RiskSettingsSchema, settings);
  if (!schema.ok) {
    return {
      problems: schema.problems.map((p) => {
        const index = /^inputs\[(\d+)\]/.exec(p.path)?.[1];
        const input = index === undefined ? undefined : settings.inputs?.[Number(index)];
        return { inputId: input?.id ?? null, message: p.message.startsWith("input ") ? p.message : `${input ? `input "${input.id}": ` : ""}risk.${p.path}: ${p.message}` };
      }),
      warnings: [],
    };
  }
  const problems: RiskInputProblem[] = [];
  const warnings: string[] = [];
  for (const input of settings.inputs) {
    const value = getIn(study, input.path);
    if (typeof value !== "number" || !Number.isFinite(value)) {
      problems.push({ inputId: input.id, message: `input "${input.id}": path ${formatPath(input.path)} does not lead to a number in the study (found ${value === undefined ? "nothing" : JSON.stringify(value)})` });
    } else if (value !== input.mode) {
      warnings.push(`input "${input.id}": mode ${input.mode} differs from the study's value ${value}; the deterministic result uses the study's value`);
    }
  }
  if (problems.length > 0) return { problems, warnings };

  const paths = settings.inputs.map((i) => i.path);
  for (const end of ["low", "high"] as const) {
    const moved = applyValues(study, paths, settings.inputs.map((i) => i[end]));
    const result = validateStudy(moved);
    if (result.ok) continue;
    for (const problem of result.problems) {
      // The input whose value sits at the problem's path, or in the same row (a rate above its row's high).
      const owner =
        settings.inputs.find((i) => formatPath(i.path) === problem.path) ??
        settings.inputs.find((i) => problem.path.startsWith(`${formatPath(i.path.slice(0, -1))}.`) || problem.path.startsWith(`${formatPath(i.path.slice(0, -1))}[`));
      problems.push({
        inputId: owner?.id ?? null,
        message: `${owner ? `input "${owner.id}": ` : ""}${end} ${owner ? owner[end] : ""} not allowed: ${problem.path}: ${problem.message}`.replace(/ {2}/g, " "),
      });
    }
  }
  return { problems, warnings };
}
