// Module worker: runs span-study points off the main thread (its calls through the one typed worker interface).
import { exposeWorker } from "../kernel/worker-call";
import { runSpanStudy, schemesDesignedAgain, screeningGroups, type SpanPoint } from "./span-study";
import { defaultCatalogue } from "../catalogue/default-catalogue";
import type { Study } from "../study/study";
import type { SchemeId } from "../schemes/types";

const catalogue = defaultCatalogue();

export const spanWorkerApi = {
  /**
   * The study's enabled schemes at each of these spans: "screening", every scheme as its proportion
   * search screens it (the tension roofs by their closed form, the fast first pass); "again", only the
   * schemes whose full design differs (the tension roofs by the 3D analysis), fully, each from its
   * screening point's search (`screened`: the first pass's points at these spans) without searching again.
   * A first pass may be asked for some of the schemes only (`schemeIds`: one of screeningGroups).
   */
  run(study: Study, spans: number[], pass: "screening" | "again", screened: SpanPoint[] = [], schemeIds?: SchemeId[]): SpanPoint[] {
    if (pass === "screening") return runSpanStudy(study, catalogue, spans, { depth: "screening", ...(schemeIds ? { schemeIds } : {}) });
    const again = schemesDesignedAgain(study);
    return again.length === 0 ? [] : runSpanStudy(study, catalogue, spans, { schemeIds: again, screenedPoints: screened });
  },
  /** The enabled schemes the second pass designs again (their labels are on the page). */
  designedAgain(study: Study): string[] {
    return schemesDesignedAgain(study);
  },
  /** The groups of schemes workers may take apart in the first pass (screeningGroups). */
  screeningGroups(study: Study): SchemeId[][] {
    return screeningGroups(study);
  },
};
export type SpanWorkerApi = typeof spanWorkerApi;

exposeWorker(spanWorkerApi);
