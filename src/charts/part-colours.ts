import { schemeSet3, schemeTableau10 } from "d3";

/**
 * 22 distinguishable colours for stacked parts (elements, materials), so a stack of up to 22
 * parts never repeats a colour: d3's Tableau 10 followed by Set3 (12).
 */
export const PART_COLOURS: readonly string[] = [...schemeTableau10, ...schemeSet3];
