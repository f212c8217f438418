import { materialInfo, type MaterialKind } from "../materials";
import type { SchemeResult } from "./evaluate";

/** The headline numbers of one scheme, with the keys the command line prints (units in the names). */
export interface Headline {
  id: string;
  label: string;
  feasible: boolean;
  reason: string;
  self_weight_kg_per_m2: number;
  steel_t: number;
  cable_t: number;
  fabric_m2: number;
  fabric_t: number;
  concrete_m3: number;
  rebar_t: number;
  cladding_t: number;
  total_mass_t: number;
  /** Roof mass without substructure (anchors), t; self-weight and mass ÷ air use this. */
  roof_mass_t: number;
  enclosed_air_t: number;
  mass_to_air: number;
  usable_floor_m2: number;
  plan_area_m2: number;
  governing: string;
  max_utilisation: number;
  iterations: number;
  carbon_a1a3_kgco2e: number | null;
  carbon_a1a5_kgco2e: number | null;
  carbon_total_kgco2e: number | null;
  carbon_kgco2e_per_m2_floor: number | null;
  carbon_kgco2e_per_m2_plan: number | null;
  module_d_kgco2e: number | null;
  cost_total: number | null;
  cost_per_m2_floor: number | null;
  currency: string | null;
  warnings: string[];
}

function massByKind(result: SchemeResult, kind: MaterialKind): number {
  return result.design.takeoff.filter((r) => r.material !== null && materialInfo(r.material)?.kind === kind).reduce((s, r) => s + r.massKg, 0);
}

/** Headline numbers of a scheme result: tonnages by kind, carbon, cost, per m². */
export function headline(result: SchemeResult): Headline {
  const { design, carbon, cost } = result;
  const fabricRows = design.takeoff.filter((r) => r.material !== null && materialInfo(r.material)?.kind === "fabric");
  const concreteM3 = design.takeoff.filter((r) => r.material !== null && materialInfo(r.material)?.kind === "concrete" && r.unit === "m3").reduce((s, r) => s + r.quantity, 0);
  return {
    id: result.id,
    label: result.label,
    feasible: design.feasible,
    reason: design.reason,
    self_weight_kg_per_m2: design.selfWeightKgPerM2,
    steel_t: massByKind(result, "steel") / 1000,
    cable_t: massByKind(result, "cable") / 1000,
    fabric_m2: fabricRows.filter((r) => r.unit === "m2").reduce((s, r) => s + r.quantity, 0),
    fabric_t: massByKind(result, "fabric") / 1000,
    concrete_m3: concreteM3,
    rebar_t: massByKind(result, "rebar") / 1000,
    cladding_t: massByKind(result, "cladding") / 1000,
    total_mass_t: design.totalMassKg / 1000,
    enclosed_air_t: design.enclosedAirKg / 1000,
    roof_mass_t: design.roofMassKg / 1000,
    mass_to_air: design.enclosedAirKg > 0 ? design.roofMassKg / design.enclosedAirKg : Number.NaN,
    usable_floor_m2: design.usableFloorM2,
    plan_area_m2: design.planAreaM2,
    governing: design.governing,
    max_utilisation: design.maxUtilisation,
    iterations: design.iterations,
    carbon_a1a3_kgco2e: carbon ? carbon.totals.a1a3 : null,
    carbon_a1a5_kgco2e: carbon ? carbon.totals.a1a3 + carbon.totals.a4 + carbon.totals.a5 : null,
    carbon_total_kgco2e: carbon ? carbon.totals.counted : null,
    carbon_kgco2e_per_m2_floor: carbon?.perM2UsableFloor.perM2 ? carbon.perM2UsableFloor.perM2.counted : null,
    carbon_kgco2e_per_m2_plan: carbon?.perM2Plan.perM2 ? carbon.perM2Plan.perM2.counted : null,
    module_d_kgco2e: carbon ? carbon.totals.moduleD : null,
    cost_total: cost ? cost.totals.total : null,
    cost_per_m2_floor: cost?.perM2UsableFloor ? cost.perM2UsableFloor.total : null,
    currency: cost ? cost.currency : null,
    warnings: design.warnings,
  };
}
