import type { RiskStudy } from "./risk-study";
import { validateStudyInputs } from "../pipeline/inputs-schema";
import { validateWith } from "../kernel/validate";
import { RiskSettingsSchema, type RiskSettings } from "./risk-settings";
import { applyValues } from "./apply-values";
import { formatPath, resolveRiskInputs, type ResolvedInput, type RiskInputProblem } from "./resolve-inputs";

export { formatPath, type RiskInputProblem } from "./resolve-inputs";

export type RiskInputCheck = {
  /** Problems that stop a run. */
  problems: RiskInputProblem[];
  /** Things to know that do not stop a run. */
  warnings: string[];
  /** The inputs as a run samples them (index paths, absolute ranges); complete only when there are no problems. */
  resolved: ResolvedInput[];
};

function schemaProblems(settings: RiskSettings, problems: { path: string; message: string }[]): RiskInputProblem[] {
  return problems.map((p) => {
    const index = /^inputs\[(\d+)\]/.exec(p.path)?.[1];
    const input = index === undefined ? undefined : settings.inputs?.[Number(index)];
    return { inputId: input?.id ?? null, message: p.message.startsWith("input ") ? p.message : `${input ? `input "${input.id}": ` : ""}risk.${p.path}: ${p.message}` };
  });
}

/**
 * Checks the risk settings against the study before any work: the settings' own schema (factor
 * and offset ranges that hold the study's value, unique ids and paths); every path finds its row
 * by id and leads to a finite number in the study; no two inputs vary the same value; and the
 * study's brief, schemes and tables (where every path leads) stay valid with every input at its
 * low end and with every input at its high end (every field's limits are intervals, so then every
 * sample is valid too). Messages name the input.
 */
export function checkRiskInputs(study: RiskStudy, settings: RiskSettings = study.risk): RiskInputCheck {
  const schema = validateWith(RiskSettingsSchema, settings);
  if (!schema.ok) return { problems: schemaProblems(settings, schema.problems), warnings: [], resolved: [] };
  const { inputs, problems } = resolveRiskInputs(study, settings);
  if (problems.length > 0) return { problems, warnings: [], resolved: inputs };
  const seen = new Map<string, string>();
  for (const input of inputs) {
    const key = JSON.stringify(input.path);
    const other = seen.get(key);
    if (other !== undefined) problems.push({ inputId: input.id, message: `input "${input.id}" varies the same study value (${formatPath(input.path)}) as input "${other}" (expected each value once)` });
    seen.set(key, input.id);
  }
  if (problems.length > 0) return { problems, warnings: [], resolved: inputs };

  const paths = inputs.map((i) => i.path);
  for (const end of ["low", "high"] as const) {
    const moved = applyValues(study, paths, inputs.map((i) => i[end]));
    const result = validateStudyInputs(moved);
    if (result.ok) continue;
    for (const problem of result.problems) {
      // The input whose value sits at the problem's path, or in the same row (a rate above its row's high).
      const owner =
        inputs.find((i) => formatPath(i.path) === problem.path) ??
        inputs.find((i) => problem.path.startsWith(`${formatPath(i.path.slice(0, -1))}.`) || problem.path.startsWith(`${formatPath(i.path.slice(0, -1))}[`));
      problems.push({
        inputId: owner?.id ?? null,
        message: `${owner ? `input "${owner.id}": ` : ""}${end} ${owner ? owner[end] : ""} not allowed: ${problem.path}: ${problem.message}`.replace(/ {2}/g, " "),
      });
    }
  }
  return { problems, warnings: [], resolved: inputs };
}
