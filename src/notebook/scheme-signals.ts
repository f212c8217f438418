import { computed, type ReadonlySignal } from "@preact/signals-core";
import type { StudyStore } from "./study-store";
import { SCHEMES, type Design, type SchemeModel } from "../schemes";
import { designScheme, schemeResult, type SchemeResult } from "../pipeline";
import { defaultCatalogue } from "../catalogue/default-catalogue";

export interface SchemeSignals {
  model: SchemeModel;
  enabled: ReadonlySignal<boolean>;
  /** Re-designed only when the brief or this scheme's options change. */
  design: ReadonlySignal<Design>;
  /** Re-assessed when the design or the carbon or cost tables change. */
  result: ReadonlySignal<SchemeResult>;
}

export interface StudySignals {
  schemes: SchemeSignals[];
  /** Results of the enabled schemes, in registry order. */
  results: ReadonlySignal<SchemeResult[]>;
}

/**
 * Per-scheme reactive designs and results for a page: a carbon edit re-assesses every scheme but
 * re-designs none; a scheme option re-designs that scheme only.
 */
export function studySignals(store: StudyStore): StudySignals {
  const catalogue = defaultCatalogue();
  const brief = computed(() => store.study.value.brief);
  const carbon = computed(() => store.study.value.carbon);
  const cost = computed(() => store.study.value.cost);
  const schemes = SCHEMES.map((model): SchemeSignals => {
    const setting = computed(() => store.study.value.schemes[model.id]);
    const enabled = computed(() => setting.value?.enabled !== false);
    const options = computed(() => setting.value?.options);
    const design = computed(() => designScheme(model, brief.value, options.value, catalogue));
    const result = computed((): SchemeResult => schemeResult(model.id, model.label, design.value, { carbon: carbon.value, cost: cost.value }));
    return { model, enabled, design, result };
  });
  const results = computed(() => schemes.filter((s) => s.enabled.value).map((s) => s.result.value));
  return { schemes, results };
}
