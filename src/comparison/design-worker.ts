// Module worker: designs schemes off the main thread so the compare page stays responsive while
// designs run (issue 14: the main thread is never blocked for more than 50 ms by a design).
import { exposeWorker } from "../kernel/worker-call";
import { designScheme } from "../pipeline";
import { SCHEMES } from "../schemes";
import { defaultCatalogue } from "../catalogue/default-catalogue";
import type { Brief } from "../brief";
import type { Design, SchemeId, SchemeOptions } from "../schemes/types";

const catalogue = defaultCatalogue();

export const designWorkerApi = {
  /** The scheme's design for a brief and its options (defaults fill the rest). */
  design(schemeId: SchemeId, brief: Brief, options: SchemeOptions | undefined): Design {
    const model = SCHEMES.find((m) => m.id === schemeId);
    if (!model) throw new Error(`unknown scheme: ${schemeId}`);
    return designScheme(model, brief, options, catalogue);
  },
};
export type DesignWorkerApi = typeof designWorkerApi;

exposeWorker(designWorkerApi);
