import type { Catalogue } from "./types";
import { parseChsCatalogue } from "./chs";
import { parseCladdingCatalogue, parseFabricCatalogue, parseStrandCatalogue } from "./tables";
import { parseGlulamCatalogue } from "./glulam";

/** The CSV texts of the catalogue files in `data/`. */
export interface CatalogueTexts {
  chs: string;
  strands: string;
  fabrics: string;
  claddings: string;
  glulam: string;
}

/** Builds the catalogue from the texts of its CSV files (the page bundles them; the CLI reads them). */
export function buildCatalogue(texts: CatalogueTexts): Catalogue {
  return {
    chs: parseChsCatalogue(texts.chs),
    strands: parseStrandCatalogue(texts.strands),
    fabrics: parseFabricCatalogue(texts.fabrics),
    claddings: parseCladdingCatalogue(texts.claddings),
    glulam: parseGlulamCatalogue(texts.glulam),
  };
}
