import type { PartialFactors, UlsExpression } from "../brief";
import type { LoadCaseId } from "./load-case";

/**
 * Combination factors ψ0 for buildings, EN 1990 Table A1.1 (recommended values). Snow and wind
 * come from the study's factors (whose defaults are these); imposed category H and temperature are
 * fixed here.
 */
export const PSI0_TABLE_A1_1 = {
  /** Category H, roofs: ψ0 = 0. */
  imposedRoof: 0,
  /** Snow, sites at altitude H ≤ 1000 m a.s.l. (other than Finland, Iceland, Norway, Sweden): ψ0 = 0.5. */
  snow: 0.5,
  /** Wind loads on buildings: ψ0 = 0.6. */
  wind: 0.6,
  /** Temperature (non-fire) in buildings: ψ0 = 0.6. */
  temperature: 0.6,
} as const;

/** The pressure cases a combination can hold (the permanent load G is apart: the scheme's self-weight plus services). */
export type VariableCaseId = Exclude<LoadCaseId, "services" | "temperature">;

export interface CombinationTerm {
  caseId: VariableCaseId;
  /** Design factor on the case's characteristic value (γ_Q, or γ_Q ψ0). */
  factor: number;
}

/** One EN 1990 §6.4.3.2 combination of the design basis. */
export interface Combination {
  /** Stable id, e.g. "drifted-snow-wind-6-10b". */
  id: string;
  /** Name a scheme reports: "drifted snow + wind (6.10b)". */
  name: string;
  expression: "6.10" | "6.10a" | "6.10b";
  /** "gravity": permanent action unfavourable; "uplift": permanent action favourable. */
  purpose: "gravity" | "uplift";
  /** The leading variable case; null in 6.10a, where every variable action is accompanying. */
  leading: VariableCaseId | "temperature" | null;
  /** Factor on G_k = self-weight + services (γ_G,sup, ξ γ_G,sup or γ_G,inf). */
  permanentFactor: number;
  terms: CombinationTerm[];
  /** Factor on the temperature case, for temperature-sensitive schemes (cable roofs) only: γ_Q ψ0,T, or γ_Q where it leads. */
  temperatureFactor: number;
  /** True for the combination that only temperature-sensitive schemes need check. */
  temperatureSensitiveOnly: boolean;
  /** The combination written out: "1.15 G + 1.5 S_drift + 0.9 W_suction". */
  formula: string;
}

/** Symbols of the cases in the written-out formulas. */
const SYMBOL: Record<VariableCaseId | "temperature", string> = {
  imposed: "Q_H",
  "snow-uniform": "S_unif",
  "snow-drifted": "S_drift",
  "wind-internal-suction": "W_suction",
  "wind-internal-pressure": "W_pressure",
  temperature: "ΔT",
};

/** Names of the cases in combination names. */
const NAME: Record<VariableCaseId | "temperature", string> = {
  imposed: "imposed",
  "snow-uniform": "uniform snow",
  "snow-drifted": "drifted snow",
  "wind-internal-suction": "wind",
  "wind-internal-pressure": "wind uplift",
  temperature: "temperature",
};

/** The order of actions in a 6.10a name, where none leads (so equal sets get equal names). */
const ORDER = Object.keys(NAME);

interface ActionSet {
  leading: VariableCaseId | "temperature";
  accompanying: VariableCaseId[];
  purpose: "gravity" | "uplift";
}

/**
 * The variable-action sets that can govern a roof. Gravity (G unfavourable): imposed alone (EN
 * 1991-1-1 §3.3.2(1): not combined with snow or wind); uniform or drifted snow leading, with and
 * without wind as accompanying (wind with internal suction c_pi = −0.3, the sense that adds to
 * gravity; "without" because most of a dome's wind is suction, and a variable action that is
 * favourable is left out, EN 1990 Table A1.2(B) note); wind leading with either snow. Uplift (G
 * favourable): wind with internal pressure c_pi = +0.2 leading, snow left out as favourable; and,
 * for temperature-sensitive schemes, temperature leading with that wind.
 */
const ACTION_SETS: ActionSet[] = [
  { leading: "imposed", accompanying: [], purpose: "gravity" },
  { leading: "snow-uniform", accompanying: [], purpose: "gravity" },
  { leading: "snow-uniform", accompanying: ["wind-internal-suction"], purpose: "gravity" },
  { leading: "snow-drifted", accompanying: [], purpose: "gravity" },
  { leading: "snow-drifted", accompanying: ["wind-internal-suction"], purpose: "gravity" },
  { leading: "wind-internal-suction", accompanying: ["snow-uniform"], purpose: "gravity" },
  { leading: "wind-internal-suction", accompanying: ["snow-drifted"], purpose: "gravity" },
  { leading: "wind-internal-pressure", accompanying: [], purpose: "uplift" },
  { leading: "temperature", accompanying: ["wind-internal-pressure"], purpose: "uplift" },
];

function psi0(id: VariableCaseId, f: PartialFactors): number {
  if (id === "imposed") return PSI0_TABLE_A1_1.imposedRoof;
  return id.startsWith("snow") ? f.psi0Snow : f.psi0Wind;
}

const round = (v: number) => Number(v.toFixed(4));

function formulaOf(permanentFactor: number, terms: CombinationTerm[], temperatureFactor: number, temperatureLeads: boolean): string {
  const parts = [`${round(permanentFactor)} G`, ...terms.map((t) => `${round(t.factor)} ${SYMBOL[t.caseId]}`)];
  if (temperatureLeads) parts.splice(1, 0, `${round(temperatureFactor)} ΔT`);
  return parts.join(" + ");
}

function slug(text: string): string {
  return text.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "");
}

function make(set: ActionSet, expression: Combination["expression"], f: PartialFactors, allAccompanying: boolean): Combination {
  const leadFactor = allAccompanying ? null : f.gammaQ;
  const terms: CombinationTerm[] = [];
  if (set.leading !== "temperature") terms.push({ caseId: set.leading, factor: leadFactor ?? f.gammaQ * psi0(set.leading, f) });
  for (const id of set.accompanying) terms.push({ caseId: id, factor: f.gammaQ * psi0(id, f) });
  const kept = terms.filter((t) => t.factor > 0);
  const temperatureLeads = set.leading === "temperature";
  const temperatureFactor = temperatureLeads ? f.gammaQ : f.gammaQ * PSI0_TABLE_A1_1.temperature;
  const permanentFactor = set.purpose === "uplift" ? f.gammaGInf : expression === "6.10b" ? f.xi * f.gammaGSup : f.gammaGSup;
  const actions = [set.leading, ...set.accompanying].filter((id) => id === "temperature" || kept.some((t) => t.caseId === id));
  if (allAccompanying) actions.sort((p, q) => ORDER.indexOf(p) - ORDER.indexOf(q));
  const listed = actions.length === 0 ? "permanent only" : actions.map((id) => NAME[id]).join(" + ");
  const name = `${listed}${allAccompanying && actions.length > 1 ? ", all accompanying" : ""} (${expression})`;
  return {
    id: slug(name),
    name,
    expression,
    purpose: set.purpose,
    leading: allAccompanying ? null : set.leading,
    permanentFactor,
    terms: kept,
    temperatureFactor,
    temperatureSensitiveOnly: temperatureLeads,
    formula: formulaOf(permanentFactor, kept, temperatureFactor, temperatureLeads),
  };
}

/**
 * The EN 1990 combinations of the design basis for the study's expression: with "6.10", eq. 6.10
 * for each action set; with "6.10a/b", eq. 6.10b for each (ξ γ_G,sup G + γ_Q Q_1 + Σ γ_Q ψ0 Q_i)
 * and eq. 6.10a for each distinct set of gravity actions (γ_G,sup G + Σ γ_Q ψ0 Q_i, every variable
 * action accompanying). Uplift combinations use γ_G,inf on G (ξ applies only to unfavourable
 * permanent actions), and are labelled 6.10b under "6.10a/b". Factors from the study (EN 1990
 * Table A1.2(B) by default); ψ0 from Table A1.1.
 */
export function designCombinations(f: PartialFactors, expression: UlsExpression): Combination[] {
  const out: Combination[] = [];
  const leadingExpression = expression === "6.10" ? "6.10" : "6.10b";
  for (const set of ACTION_SETS) out.push(make(set, leadingExpression, f, false));
  if (expression === "6.10a/b") {
    for (const set of ACTION_SETS.filter((s) => s.purpose === "gravity")) {
      const combination = make(set, "6.10a", f, true);
      if (!out.some((c) => c.id === combination.id)) out.push(combination);
    }
  }
  return out;
}
