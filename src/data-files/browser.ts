// The one place the bundled data files enter the code in the browser: Vite inlines each file's
// text (`?raw`). Node takes ./node.ts instead (package.json "imports", condition "node"), so the
// core needs no loader hook. Import it as "#data-files".
import carbonFactors from "../../data/carbon-factors.csv?raw";
import costRates from "../../data/cost-rates.csv?raw";
import chs from "../../data/chs-sections.csv?raw";
import strands from "../../data/strands.csv?raw";
import fabrics from "../../data/fabrics.csv?raw";
import claddings from "../../data/claddings.csv?raw";
import glulam from "../../data/glulam.csv?raw";
import type { DataFileName } from "./names";

const TEXTS: Record<DataFileName, string> = {
  "carbon-factors.csv": carbonFactors,
  "cost-rates.csv": costRates,
  "chs-sections.csv": chs,
  "strands.csv": strands,
  "fabrics.csv": fabrics,
  "claddings.csv": claddings,
  "glulam.csv": glulam,
};

/** The text of a bundled data file. */
export function dataFileText(name: DataFileName): string {
  return TEXTS[name];
}
