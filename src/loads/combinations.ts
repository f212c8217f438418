import type { PartialFactors, UlsExpression } from "../brief";

export interface UlsResult {
  valueKPa: number;
  /** Which expression gave the value. */
  expression: "6.10" | "6.10a" | "6.10b";
}

/**
 * EN 1990 eq. 6.10 (Table A1.2(B)): γ_G G + γ_Q Q_1 + γ_Q ψ0,w W.
 * @example eq610(0.5, 0.8, 0.4, factors) // 2.235 with the recommended factors
 */
export function eq610(g: number, leading: number, wind: number, f: PartialFactors): number {
  return f.gammaGSup * g + f.gammaQ * leading + f.gammaQ * f.psi0Wind * wind;
}

/** EN 1990 eq. 6.10a: γ_G G + γ_Q ψ0,s Q_1 + γ_Q ψ0,w W (every variable action as accompanying). */
export function eq610a(g: number, snow: number, wind: number, f: PartialFactors): number {
  return f.gammaGSup * g + f.gammaQ * f.psi0Snow * snow + f.gammaQ * f.psi0Wind * wind;
}

/** EN 1990 eq. 6.10b: ξ γ_G G + γ_Q Q_1 + γ_Q ψ0,w W. */
export function eq610b(g: number, leading: number, wind: number, f: PartialFactors): number {
  return f.xi * f.gammaGSup * g + f.gammaQ * leading + f.gammaQ * f.psi0Wind * wind;
}

/**
 * ULS gravity pressure: eq. 6.10, or the larger of 6.10a and 6.10b, with snow leading and wind
 * accompanying (downward wind is usually zero on a dome; it is passed in so the reference check can
 * run the textbook case).
 */
export function ulsGravity(g: number, leading: number, wind: number, f: PartialFactors, expression: UlsExpression): UlsResult {
  if (expression === "6.10") return { valueKPa: eq610(g, leading, wind, f), expression: "6.10" };
  const a = eq610a(g, leading, wind, f);
  const b = eq610b(g, leading, wind, f);
  return a >= b ? { valueKPa: a, expression: "6.10a" } : { valueKPa: b, expression: "6.10b" };
}

/**
 * ULS uplift case γ_G,inf G − γ_Q W (EN 1990 Table A1.2(B), permanent action favourable):
 * the net downward pressure, kPa; negative means net uplift.
 */
export function ulsUplift(g: number, upliftKPa: number, f: PartialFactors): number {
  return f.gammaGInf * g - f.gammaQ * upliftKPa;
}
