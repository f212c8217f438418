// The catalogue bundled from data/ (Vite and Vitest resolve `?raw`; the CLI reads the files itself).
import chs from "../../data/chs-sections.csv?raw";
import strands from "../../data/strands.csv?raw";
import fabrics from "../../data/fabrics.csv?raw";
import claddings from "../../data/claddings.csv?raw";
import glulam from "../../data/glulam.csv?raw";
import { buildCatalogue } from "./build-catalogue";
import type { Catalogue } from "./types";

export const CATALOGUE_TEXTS = { chs, strands, fabrics, claddings, glulam };

let cached: Catalogue | undefined;

/** The default catalogue, parsed once. */
export function defaultCatalogue(): Catalogue {
  cached ??= buildCatalogue(CATALOGUE_TEXTS);
  return cached;
}
