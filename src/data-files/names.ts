/** The bundled data files the core parses (all under data/). */
export const DATA_FILE_NAMES = ["carbon-factors.csv", "cost-rates.csv", "chs-sections.csv", "strands.csv", "fabrics.csv", "claddings.csv", "glulam.csv"] as const;
export type DataFileName = (typeof DATA_FILE_NAMES)[number];
