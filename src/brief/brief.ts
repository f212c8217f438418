/**
 * The brief: what the client asks the roof to do. SI units inside (m, kPa = kN/m², m/s).
 * Every field documents its unit and where its default comes from.
 */

/** EN 1991-1-4 Table 4.1 terrain categories. */
export type TerrainCategory = "0" | "I" | "II" | "III" | "IV";
export const TERRAIN_CATEGORIES: readonly TerrainCategory[] = ["0", "I", "II", "III", "IV"];

/** Partial and combination factors, EN 1990 Table A1.2(B) (recommended values) and Table A1.1. */
export interface PartialFactors {
  /** γ_G,sup, unfavourable permanent action (EN 1990 Table A1.2(B): 1.35). */
  gammaGSup: number;
  /** γ_G,inf, favourable permanent action (EN 1990 Table A1.2(B): 1.00). */
  gammaGInf: number;
  /** γ_Q, variable action (EN 1990 Table A1.2(B): 1.50). */
  gammaQ: number;
  /** ξ, reduction on unfavourable permanent actions in eq. 6.10b (EN 1990 Table A1.2(B): 0.85). */
  xi: number;
  /** ψ0 for snow, sites below 1000 m (EN 1990 Table A1.1: 0.5). */
  psi0Snow: number;
  /** ψ0 for wind (EN 1990 Table A1.1: 0.6). */
  psi0Wind: number;
}

/** Which EN 1990 expression sets the ULS gravity load: 6.10 alone, or the less favourable of 6.10a and 6.10b. */
export type UlsExpression = "6.10" | "6.10a/b";

/**
 * How each scheme's rise is set: "own" — each scheme's rise is searched within its rise ÷ span range
 * and the height limit; "common" — every scheme takes the brief's rise (in proportion at other spans,
 * within the height limit).
 */
export type RiseRule = "own" | "common";
export const RISE_RULES: readonly RiseRule[] = ["own", "common"];

/** What the proportion search minimises per m² of usable floor. */
export type SearchObjective = "carbon" | "mass" | "cost";
export const SEARCH_OBJECTIVES: readonly SearchObjective[] = ["carbon", "mass", "cost"];

export interface Brief {
  /** Clear span of the circular plan (diameter), m. Allowed 30–500. */
  spanM: number;
  /** Rise of the roof crown above the eaves, m. Allowed 0 < rise ≤ span/2. */
  riseM: number;
  /** Height of the roof edge (eaves) above the floor, m. */
  eavesHeightM: number;
  /** Minimum clear height under the structure for floor to count as usable, m. */
  minClearHeightM: number;
  /** Highest the roof may reach above the floor (the planning envelope), m. Eaves + rise ≤ this. */
  heightLimitM: number;
  /** Each scheme at its own rise, or one common rise for all. */
  riseRule: RiseRule;
  /** What each scheme's free proportions are chosen to minimise, per m² of usable floor. */
  objective: SearchObjective;
  /** Characteristic ground snow load s_k, kPa (EN 1991-1-3 §4). */
  snowGroundKPa: number;
  /** Fundamental basic wind velocity v_b, m/s (EN 1991-1-4 §4.2). */
  windBasicMPerS: number;
  /** Terrain category (EN 1991-1-4 Table 4.1). */
  terrain: TerrainCategory;
  /** Air density for the wind pressure, kg/m³ (EN 1991-1-4 §4.5 note 2: 1.25). */
  airDensityKgPerM3: number;
  /** Net uplift pressure coefficient on the roof (positive = suction), editable assumption, –. */
  upliftCoefficient: number;
  /** Roof imposed load, category H (not accessible except for maintenance), kPa (EN 1991-1-1 Table 6.10: q_k 0–1.0, recommended 0.4). */
  imposedRoofKPa: number;
  /** Services and hung load, permanent, on plan, kPa. */
  servicesKPa: number;
  /** Partial factors (EN 1990 Table A1.2(B)). */
  factors: PartialFactors;
  /** Which ULS expression governs gravity design. */
  ulsExpression: UlsExpression;
}

export const DEFAULT_FACTORS: PartialFactors = {
  gammaGSup: 1.35,
  gammaGInf: 1.0,
  gammaQ: 1.5,
  xi: 0.85,
  psi0Snow: 0.5,
  psi0Wind: 0.6,
};

/** Defaults: a mid-size arena brief. Site values are placeholders to be replaced by the project's own. */
export const DEFAULT_BRIEF: Brief = {
  spanM: 160,
  riseM: 24, // span/rise ≈ 6.7, common practice for domes (no source)
  eavesHeightM: 12,
  minClearHeightM: 10,
  heightLimitM: 60, // a planning envelope placeholder for the demo arena, to be replaced by the project's own
  riseRule: "own",
  objective: "carbon",
  snowGroundKPa: 0.6,
  windBasicMPerS: 24,
  terrain: "III",
  airDensityKgPerM3: 1.25, // EN 1991-1-4 §4.5 note 2
  upliftCoefficient: 0.8, // net suction on a shallow dome, editable assumption (from memory: EN 1991-1-4 Fig. 7.12 crown c_pe ≈ −0.8)
  imposedRoofKPa: 0.4, // EN 1991-1-1 Table 6.10 recommended, category H
  servicesKPa: 0.15, // lighting, rigging and ducts, common practice, no source
  factors: DEFAULT_FACTORS,
  ulsExpression: "6.10a/b",
};
