import { computed, type ReadonlySignal } from "@preact/signals-core";
import type { StudyStore } from "./study-store";
import { SCHEMES, type Design, type SchemeModel } from "../schemes";
import { designAtBestProportions, schemeResult, type SchemeResult, type SchemeSetting, type SearchedDesign } from "../pipeline";
import { defaultCatalogue } from "../catalogue/default-catalogue";

export interface SchemeSignals {
  model: SchemeModel;
  enabled: ReadonlySignal<boolean>;
  /**
   * The scheme at its best proportions (the one rule of evaluateStudy): searched again when the
   * brief or this scheme's setting changes, or a table the search actually read (carbon or cost,
   * by the brief's objective) changes.
   */
  searched: ReadonlySignal<SearchedDesign>;
  design: ReadonlySignal<Design>;
  /** Re-assessed when the design or the carbon or cost tables change. */
  result: ReadonlySignal<SchemeResult>;
}

export interface StudySignals {
  schemes: SchemeSignals[];
  /** Results of the enabled schemes, in registry order. */
  results: ReadonlySignal<SchemeResult[]>;
}

/** Enabling or disabling a scheme changes its setting but not what it is designed with. */
function sameSetting(a: SchemeSetting, b: SchemeSetting): boolean {
  return a.options === b.options && a.pinned === b.pinned && a.riseM === b.riseM;
}

/**
 * Per-scheme reactive designs and results for a page, each scheme at its best proportions as
 * evaluateStudy designs it: a scheme option re-designs that scheme only; a carbon edit re-assesses
 * every scheme and re-designs only those whose search read the carbon table (a search for the
 * least mass, or a scheme with nothing free, never reads it: the tables reach the search through
 * getters, so a signal is read only when a candidate is assessed).
 */
export function studySignals(store: StudyStore): StudySignals {
  const catalogue = defaultCatalogue();
  const brief = computed(() => store.study.value.brief);
  const carbon = computed(() => store.study.value.carbon);
  const cost = computed(() => store.study.value.cost);
  const schemes = SCHEMES.map((model): SchemeSignals => {
    const setting = computed(() => store.study.value.schemes[model.id]);
    const enabled = computed(() => setting.value?.enabled !== false);
    let last: SchemeSetting | undefined;
    const designSetting = computed(() => {
      const next = setting.value;
      if (last === undefined || next === undefined || !sameSetting(last, next)) last = next;
      return last;
    });
    const tables = { get carbon() { return carbon.value; }, get cost() { return cost.value; } };
    const searched = computed(() => designAtBestProportions(model, brief.value, designSetting.value, tables, catalogue));
    const design = computed(() => searched.value.design);
    const result = computed((): SchemeResult => ({
      ...schemeResult(model.id, model.label, design.value, { carbon: carbon.value, cost: cost.value }),
      brief: searched.value.brief,
      proportions: searched.value.proportions,
    }));
    return { model, enabled, searched, design, result };
  });
  const results = computed(() => schemes.filter((s) => s.enabled.value).map((s) => s.result.value));
  return { schemes, results };
}
