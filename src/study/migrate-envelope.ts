// Study schema version 2 → 3: the brief's envelope (height limit, rise rule, search objective) and
// the pins of each scheme's proportions. Nothing stored is dropped; only fields are added.
import { SCHEME_DECLARATIONS } from "../schemes/declarations";
import { DEFAULT_BRIEF } from "../brief";

type Json = Record<string, unknown>;

function isObject(x: unknown): x is Json {
  return typeof x === "object" && x !== null && !Array.isArray(x);
}

/**
 * The brief gains a height limit (the default, raised to the stored eaves + rise where that is
 * higher, so the stored rise stays valid), the "common" rise rule (a study saved before keeps the
 * rise it was designed with) and the default objective.
 */
function migrateBrief(brief: unknown): unknown {
  if (!isObject(brief)) return brief;
  const eaves = typeof brief.eavesHeightM === "number" ? brief.eavesHeightM : 0;
  const rise = typeof brief.riseM === "number" ? brief.riseM : 0;
  return {
    ...brief,
    heightLimitM: brief.heightLimitM ?? Math.max(DEFAULT_BRIEF.heightLimitM, eaves + rise),
    riseRule: brief.riseRule ?? "common",
    objective: brief.objective ?? DEFAULT_BRIEF.objective,
  };
}

/** Each scheme's options a user changed from the default are pinned, so the search never moves a choice the study recorded. */
function migrateSchemes(schemes: unknown): unknown {
  if (!isObject(schemes)) return schemes;
  return Object.fromEntries(
    Object.entries(schemes).map(([id, setting]) => {
      const model = SCHEME_DECLARATIONS.find((m) => m.id === id);
      if (!model || !isObject(setting) || !isObject(setting.options) || setting.pinned !== undefined) return [id, setting];
      const options = setting.options;
      const pinned = Object.keys(options).filter((key) => key in model.defaults && options[key] !== model.defaults[key]);
      return [id, { ...setting, pinned }];
    }),
  );
}

export function migrateEnvelopeV2(study: Json): Json {
  return { ...study, brief: migrateBrief(study.brief), schemes: migrateSchemes(study.schemes) };
}
