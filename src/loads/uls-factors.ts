import type { Brief } from "../brief";
import { ulsGravity } from "./combinations";

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
 * @example ulsFactors({ factors: DEFAULT_FACTORS, ulsExpression: "6.10a/b" }, 0.5, 0.8) // 6.10b: permanent 1.1475, variable 1.5
 */
export function ulsFactors(brief: Pick<Brief, "factors" | "ulsExpression">, permanentKPa: number, variableKPa: number): UlsFactors {
  const f = brief.factors;
  const expression = ulsGravity(permanentKPa, variableKPa, 0, f, brief.ulsExpression).expression;
  return {
    permanent: expression === "6.10b" ? f.xi * f.gammaGSup : f.gammaGSup,
    variable: expression === "6.10a" ? f.gammaQ * f.psi0Snow : f.gammaQ,
    expression,
  };
}
