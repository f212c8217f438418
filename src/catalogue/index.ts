// Catalogues: sections, strands, fabrics and claddings read from data/.
export type { Catalogue, ChsSection, Strand, Fabric, Cladding, GlulamClass } from "./types";
export { chsFromDimensions, parseChsCatalogue, STEEL_DENSITY_KG_PER_M3 } from "./chs";
export { parseStrandCatalogue, parseFabricCatalogue, parseCladdingCatalogue } from "./tables";
export { parseGlulamCatalogue } from "./glulam";
export { buildCatalogue, type CatalogueTexts } from "./build-catalogue";
export { pickLightestChs, chsResistance, type ChsDemand, type ChsChoice } from "./pick-chs";
export { CsvError, listProblems, parseDecimal, csvCell, readCsvText, formatCsv, shown, notDecimal, type CsvProblem } from "../kernel/csv-table";
export { parseCsvTable, type ColumnSpec } from "../kernel/schema-csv";
export { pickLightestStrand, strandResistanceN, type StrandChoice, type StrandDesignOptions } from "./pick-strand";
export { defaultCatalogue } from "./default-catalogue";
