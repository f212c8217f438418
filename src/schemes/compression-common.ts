import type { Brief } from "../study/brief";
import type { Catalogue, ChsSection, Cladding } from "../catalogue/types";
import type { CostItemId } from "../takeoff/takeoff-row";
import type { BucklingCurve } from "../mechanics/flexural-buckling";
import { chsResistance, type ChsChoice } from "../catalogue/pick-chs";
import { ulsGravity } from "../loads/combinations";

/** Structural steel grades offered: f_y for t ≤ 40 mm (EN 1993-1-1 Table 3.1) and the hot-finished CHS buckling curve (Table 6.2). */
export const STEEL_GRADES = {
  S275: { yieldPa: 275e6, curve: "a" as BucklingCurve },
  S355: { yieldPa: 355e6, curve: "a" as BucklingCurve },
  S460: { yieldPa: 460e6, curve: "a0" as BucklingCurve },
} as const;
export type SteelGrade = keyof typeof STEEL_GRADES;
export const STEEL_GRADE_CHOICES = [
  { value: "S275", label: "S275" },
  { value: "S355", label: "S355" },
  { value: "S460", label: "S460" },
] as const;

/** Roof coverings of data/claddings.csv offered to the rigid schemes. */
export const CLADDING_CHOICES = [
  { value: "metal-deck", label: "Insulated metal deck" },
  { value: "etfe-cushion", label: "ETFE cushions" },
  { value: "glazing", label: "Laminated glazing" },
] as const;

/** The cladding with this id. @throws when the catalogue has none */
export function findCladding(catalogue: Catalogue, id: string): Cladding {
  const cladding = catalogue.claddings.find((c) => c.id === id);
  if (!cladding) throw new RangeError(`invalid cladding: ${id} (expected one of ${catalogue.claddings.map((c) => c.id).join(", ")})`);
  return cladding;
}

/** The rate-table item a cladding is priced with. */
export function claddingCostItem(cladding: Cladding): CostItemId {
  if (cladding.material === "etfe-foil") return "etfe-cushion";
  if (cladding.material === "glazing") return "glazing";
  return "metal-deck";
}

/** The partial factors that the governing EN 1990 expression applies to permanent and variable load. */
export interface UlsFactors {
  /** Factor on permanent load (γ_G, or ξ γ_G in 6.10b). */
  permanent: number;
  /** Factor on the leading variable load (γ_Q, or γ_Q ψ0 in 6.10a). */
  variable: number;
  expression: "6.10" | "6.10a" | "6.10b";
}

/**
 * Splits the ULS gravity combination into its permanent and variable factors, so that load per unit
 * surface (self-weight) and per unit plan (snow) can be carried apart: the expression is the one
 * EN 1990 (Table A1.2(B), eqs 6.10, 6.10a/b) makes govern for the given totals.
 */
export function ulsFactors(brief: Brief, permanentKPa: number, variableKPa: number): UlsFactors {
  const f = brief.factors;
  const expression = ulsGravity(permanentKPa, variableKPa, 0, f, brief.ulsExpression).expression;
  return {
    permanent: expression === "6.10b" ? f.xi * f.gammaGSup : f.gammaGSup,
    variable: expression === "6.10a" ? f.gammaQ * f.psi0Snow : f.gammaQ,
    expression,
  };
}

/**
 * The lightest CHS (catalogue sorted by mass) that carries every axial demand (EN 1993-1-1 §6.2.3
 * tension, §6.3.1 flexural buckling) and passes an extra test (general buckling, deflection…).
 * Returns the governing choice, or null when no section suffices.
 */
export function pickChsFor(
  sections: readonly ChsSection[],
  demands: readonly { forceN: number; effectiveLengthM: number }[],
  steel: { yieldPa: number; curve: BucklingCurve },
  accept: (section: ChsSection) => boolean = () => true,
  minMassKgPerM = 0,
): ChsChoice | null {
  // No resistance exceeds A f_y (γ_M = 1 here), so smaller areas can be skipped without a check.
  const areaNeededM2 = demands.reduce((m, d) => Math.max(m, Math.abs(d.forceN)), 0) / steel.yieldPa;
  for (const section of sections) {
    if (section.massKgPerM < minMassKgPerM || section.areaM2 < areaNeededM2) continue;
    let worst: ChsChoice | null = null;
    let ok = true;
    for (const d of demands) {
      const c = chsResistance(section, { forceN: d.forceN, effectiveLengthM: d.effectiveLengthM, yieldPa: steel.yieldPa, curve: steel.curve });
      if (c === null || c.utilisation > 1) {
        ok = false;
        break;
      }
      if (worst === null || c.utilisation > worst.utilisation) worst = c;
    }
    if (ok && worst !== null && accept(section)) return worst;
  }
  return null;
}
