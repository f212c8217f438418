// The catalogue bundled from data/ (its texts come through the one data-file boundary, #data-files).
import { dataFileText } from "#data-files";
import { buildCatalogue } from "./build-catalogue";
import type { Catalogue } from "./types";

let cached: Catalogue | undefined;

/** The default catalogue, parsed once. */
export function defaultCatalogue(): Catalogue {
  cached ??= buildCatalogue({
    chs: dataFileText("chs-sections.csv"),
    strands: dataFileText("strands.csv"),
    fabrics: dataFileText("fabrics.csv"),
    claddings: dataFileText("claddings.csv"),
    glulam: dataFileText("glulam.csv"),
  });
  return cached;
}
