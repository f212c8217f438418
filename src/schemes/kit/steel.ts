import type { BucklingCurve } from "../../mechanics/flexural-buckling";

/** Structural steel grades offered: f_y for t ≤ 40 mm (EN 1993-1-1 Table 3.1) and the hot-finished CHS buckling curve (Table 6.2). */
export const STEEL_GRADES = {
  S275: { yieldPa: 275e6, curve: "a" as BucklingCurve },
  S355: { yieldPa: 355e6, curve: "a" as BucklingCurve },
  S460: { yieldPa: 460e6, curve: "a0" as BucklingCurve },
} as const;
export type SteelGrade = keyof typeof STEEL_GRADES;

/** The steel of a grade option (a value the options check has already accepted). */
export function steelGrade(value: string): { yieldPa: number; curve: BucklingCurve } {
  return STEEL_GRADES[value as SteelGrade];
}
