import type { StudyInputs } from "../pipeline/study-inputs";
import { BRIEF_LIMITS } from "../brief";
import { SCHEME_DECLARATIONS, type UncertaintyKind } from "../schemes/declarations";
import { materialInfo, type MaterialKind } from "../materials";
import { FACTOR_LIMITS } from "../carbon";
import { MAX_RATE } from "../cost";
import { RISK_LIMITS, type RiskSettings, type UncertainInput, type PathStep } from "./risk-settings";
import { tidy } from "./resolve-inputs";
import { readableUnit } from "../kernel/units";

/** A default range as multiples of the study's value, with where it comes from. */
type Spread = { low: number; high: number; source: string };

/**
 * The default spreads. Every one is common practice for a concept-stage risk register, no source:
 * they say how far the study's own values might plausibly be off, and should be replaced by the
 * project's own judgement.
 */
export const DEFAULT_SPREADS = {
  snow: { low: 0.75, high: 1.5, source: "site value and national annex not yet confirmed (common practice, no source)" },
  wind: { low: 0.9, high: 1.15, source: "site value and national annex not yet confirmed (common practice, no source)" },
  services: { low: 0.6, high: 2, source: "hung loads tend to grow through design (common practice, no source)" },
  knockDown: { low: 0.8, high: 1.1, source: "buckling knock-down factors scatter widely in tests (common practice, no source)" },
  allowance: { low: 0.5, high: 1.5, source: "design-stage allowances (common practice, no source)" },
  reinforcement: { low: 0.75, high: 1.5, source: "reinforcement rates before detailing (common practice, no source)" },
  creep: { low: 0.75, high: 1.3, source: "creep coefficient before the mix and programme are known (common practice, no source)" },
  steelCarbon: { low: 0.6, high: 1.3, source: "between recycled-content electric-arc and blast-furnace routes (common practice, no source)" },
  concreteCarbon: { low: 0.75, high: 1.3, source: "mix design and cement supply (common practice, no source)" },
  fabricCarbon: { low: 0.6, high: 1.6, source: "few published EPDs for coated fabrics (common practice, no source)" },
  otherCarbon: { low: 0.7, high: 1.4, source: "generic inventory value (common practice, no source)" },
  waste: { low: 0.5, high: 2, source: "site waste rates (common practice, no source)" },
  transport: { low: 0.5, high: 2, source: "supplier not yet known (common practice, no source)" },
  onCost: { low: 0.67, high: 1.33, source: "on-cost percentages at concept stage (common practice, no source)" },
} as const satisfies Record<string, Spread>;

/** The default spread of each kind of uncertain scheme option (declared with the option, `uncertainty`). */
const OPTION_SPREADS: Record<UncertaintyKind, Spread> = {
  "knock-down": DEFAULT_SPREADS.knockDown,
  allowance: DEFAULT_SPREADS.allowance,
  reinforcement: DEFAULT_SPREADS.reinforcement,
  load: DEFAULT_SPREADS.services,
  creep: DEFAULT_SPREADS.creep,
};

/** Material kinds whose factors get default ranges, with the group name and spread. */
const CARBON_KINDS: Partial<Record<MaterialKind, { group: string; spread: Spread }>> = {
  steel: { group: "steel", spread: DEFAULT_SPREADS.steelCarbon },
  cable: { group: "steel", spread: DEFAULT_SPREADS.steelCarbon },
  rebar: { group: "steel", spread: DEFAULT_SPREADS.steelCarbon },
  concrete: { group: "concrete", spread: DEFAULT_SPREADS.concreteCarbon },
  fabric: { group: "fabric", spread: DEFAULT_SPREADS.fabricCarbon },
  cladding: { group: "cladding", spread: DEFAULT_SPREADS.otherCarbon },
};

const STEEL_RATE_ITEMS = new Set(["steel-lattice", "steel-truss", "steel-secondary", "steel-column", "steel-ring", "steel-mast"]);
const FABRIC_RATE_ITEMS = new Set(["fabric-ptfe-glass", "fabric-pvc-polyester"]);

function clamp(x: number, min: number, max: number): number {
  return Math.min(max, Math.max(min, x));
}

function spreadInput(
  id: string,
  label: string,
  path: PathStep[],
  value: number,
  spread: Spread,
  limits: { min: number; max: number },
  group: string | null,
): UncertainInput | null {
  if (!(Number.isFinite(value) && value > 0)) return null;
  // Stored as factors on the study's value (so the range follows the study); the first ends are
  // kept inside the field's limits, and a run clamps them to the limits again as the value moves.
  const low = Math.min(1, tidy(clamp(value * spread.low, limits.min, limits.max) / value));
  const high = Math.max(1, tidy(clamp(value * spread.high, limits.min, limits.max) / value));
  if (low === high) return null;
  return { id, label, path, scale: "factor", low, high, distribution: "pert", group };
}

/**
 * Default uncertain inputs for a study, all Beta-PERT with the study's own value as the mode, each
 * range stored as factors on (or, for inflation, offsets from) the study's value so that it
 * follows the study when a value is edited; table rows are addressed by material or cost item id:
 * snow, wind and services loads; the buckling knock-downs, design allowances (nodes, connections,
 * fabric seams), reinforcement rates, creep and finishes loads the registered scheme modules offer
 * as options (each option declares its kind of uncertainty); A1–A3 factors, waste rates and road distances of steel, strand,
 * rebar, concrete, fabric and cladding (grouped by kind: all steel factors move together); the
 * carbon quantity allowance; every unit rate over its own low–high range (steel rates grouped,
 * the two fabric rates grouped); and the on-cost percentages. Span, rise and the other brief
 * geometry stay fixed. The spreads are DEFAULT_SPREADS (common practice, no source).
 */
export function defaultRiskSettings(study: StudyInputs): RiskSettings {
  const inputs: UncertainInput[] = [];
  const add = (input: UncertainInput | null) => {
    if (input) inputs.push(input);
  };
  const b = study.brief;
  add(spreadInput("snow", "Ground snow load s_k (kPa)", ["brief", "snowGroundKPa"], b.snowGroundKPa, DEFAULT_SPREADS.snow, BRIEF_LIMITS.snowGroundKPa, null));
  add(spreadInput("wind", "Basic wind velocity v_b (m/s)", ["brief", "windBasicMPerS"], b.windBasicMPerS, DEFAULT_SPREADS.wind, BRIEF_LIMITS.windBasicMPerS, null));
  add(spreadInput("services", "Services and hung load (kPa)", ["brief", "servicesKPa"], b.servicesKPa, DEFAULT_SPREADS.services, BRIEF_LIMITS.servicesKPa, null));

  for (const model of SCHEME_DECLARATIONS) {
    for (const spec of model.options) {
      if (spec.kind !== "number" || spec.integer) continue;
      if (!spec.uncertainty) continue;
      const spread = OPTION_SPREADS[spec.uncertainty];
      const value = study.schemes[model.id]?.options[spec.key] ?? model.defaults[spec.key];
      if (typeof value !== "number") continue;
      const unit = spec.unit ? ` (${spec.unit})` : "";
      add(spreadInput(`${model.id}.${spec.key}`, `${model.label}: ${spec.label}${unit}`, ["schemes", model.id, "options", spec.key], value, spread, spec, null));
    }
  }

  study.carbon.factors.forEach((row) => {
    const at = (field: string): PathStep[] => ["carbon", "factors", { material: row.material }, field];
    const kind = materialInfo(row.material)?.kind;
    const rule = kind ? CARBON_KINDS[kind] : undefined;
    if (!rule) return;
    // The two coated fabrics move together; ETFE foil is a different product.
    const group = rule.group === "fabric" && !row.material.startsWith("fabric-") ? null : rule.group;
    add(spreadInput(`carbon-${row.material}`, `A1–A3: ${row.label} (kgCO2e/kg)`, at("a1a3KgCO2ePerKg"), row.a1a3KgCO2ePerKg, rule.spread, FACTOR_LIMITS.a1a3KgCO2ePerKg, group === null ? null : `${group}-carbon`));
    add(spreadInput(`waste-${row.material}`, `Waste rate: ${row.label} (%)`, at("wasteRatePct"), row.wasteRatePct, DEFAULT_SPREADS.waste, FACTOR_LIMITS.wasteRatePct, `${rule.group}-waste`));
    add(spreadInput(`transport-${row.material}`, `Road transport: ${row.label} (km)`, at("transportKmRoad"), row.transportKmRoad, DEFAULT_SPREADS.transport, FACTOR_LIMITS.transportKmRoad, `${rule.group}-transport`));
  });
  add(spreadInput("quantity-allowance", "Carbon quantity allowance (%)", ["carbon", "settings", "quantityAllowancePct"], study.carbon.settings.quantityAllowancePct, DEFAULT_SPREADS.allowance, { min: 0, max: 50 }, null));

  const currency = study.cost.onCosts.currency;
  study.cost.rates.forEach((row) => {
    if (!(row.low < row.high)) return;
    const group = STEEL_RATE_ITEMS.has(row.item) ? "steel-rates" : FABRIC_RATE_ITEMS.has(row.item) ? "fabric-rates" : null;
    // The row's own low–high, as factors on the rate (offsets for a zero rate); a run keeps the ends inside the row's range.
    const high = Math.min(row.high, MAX_RATE);
    const range = row.rate > 0 ? { scale: "factor" as const, low: tidy(row.low / row.rate), high: tidy(high / row.rate) } : { scale: "offset" as const, low: row.low - row.rate, high: high - row.rate };
    inputs.push({ id: `rate-${row.item}`, label: `Rate: ${row.label} (${currency}/${readableUnit(row.unit)})`, path: ["cost", "rates", { item: row.item }, "rate"], ...range, distribution: "pert", group });
  });
  const oc = study.cost.onCosts;
  const onCost = (field: "preliminariesPct" | "overheadsProfitPct" | "designFeesPct" | "riskPct", label: string, max: number) =>
    add(spreadInput(`oncost-${field}`, `${label} (%)`, ["cost", "onCosts", field], oc[field], DEFAULT_SPREADS.onCost, { min: 0, max }, null));
  onCost("preliminariesPct", "Preliminaries", 50);
  onCost("overheadsProfitPct", "Overheads and profit", 50);
  onCost("designFeesPct", "Design fees", 50);
  onCost("riskPct", "Risk allowance", 100);
  // Inflation: programme slip moves it up more readily than down (common practice, no source).
  inputs.push({ id: "oncost-inflationPct", label: "Inflation to mid-point (%)", path: ["cost", "onCosts", "inflationPct"], scale: "offset", low: Math.max(-20, oc.inflationPct - 2) - oc.inflationPct, high: Math.min(100, oc.inflationPct + 8) - oc.inflationPct, distribution: "pert", group: null });

  return { inputs, samples: RISK_LIMITS.samples.default, designSamples: RISK_LIMITS.designSamples.default };
}
