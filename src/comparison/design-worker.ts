// Module worker: designs schemes off the main thread so the compare page stays responsive while
// designs run (issue 14: the main thread is never blocked for more than 50 ms by a design). Each
// design is the scheme at its best proportions by the pipeline's one rule (design-job.ts).
import { exposeWorker } from "../kernel/worker-call";
import { designJob } from "./design-job";
import { defaultCatalogue } from "../catalogue/default-catalogue";
import type { Brief } from "../brief";
import type { SearchedDesign, SchemeSetting, StudyInputs } from "../pipeline";
import type { SchemeId } from "../schemes/types";

const catalogue = defaultCatalogue();

export const designWorkerApi = {
  /** The scheme at its best proportions for a brief, its setting in the study and the study's tables. */
  design(schemeId: SchemeId, brief: Brief, setting: SchemeSetting | undefined, tables: Pick<StudyInputs, "carbon" | "cost">): SearchedDesign {
    return designJob(schemeId, brief, setting, tables, catalogue);
  },
};
export type DesignWorkerApi = typeof designWorkerApi;

exposeWorker(designWorkerApi);
