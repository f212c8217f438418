import { MATERIAL_KINDS, materialInfo, type MaterialKind } from "../materials";
import type { Design, DesignStatus, MassByGroupKg, SchemeId } from "../schemes/types";
import type { TakeoffRow } from "../takeoff";
import type { CarbonAssessment } from "../carbon";
import type { CostAssessment } from "../cost";

/**
 * The figures of one scheme that every table, chart, comparison and the command line read: one
 * typed record, units in the names (mass in kg, carbon in kgCO2e, cost in the rate table's currency).
 * A figure that could not be assessed (a table lacks a row) is null.
 */
export interface SchemeFigures {
  id: SchemeId;
  label: string;
  feasible: boolean;
  /** feasible, out-of-range (outside the method's valid span) or infeasible: only "feasible" is ranked. */
  status: DesignStatus;
  reason: string;
  /** The design combination that governed ("" when the scheme does not report one). */
  governingLoadCase: string;
  /** Mass by the four groups of the one accounting, kg. */
  massByGroupKg: MassByGroupKg;
  selfWeightKgPerM2: number;
  /** Take-off mass by material kind, kg (every kind, 0 where the scheme has none). */
  massByKindKg: Record<MaterialKind, number>;
  /** Fabric and foil area in the take-off, m². */
  fabricM2: number;
  /** Concrete volume in the take-off, m³. */
  concreteM3: number;
  totalMassKg: number;
  /** Roof mass without substructure (anchors), kg; self-weight and mass ÷ air use this. */
  roofMassKg: number;
  enclosedAirKg: number;
  /** Roof mass ÷ enclosed air mass (NaN when there is no air). */
  massToAir: number;
  usableFloorM2: number;
  planAreaM2: number;
  governing: string;
  maxUtilisation: number;
  iterations: number;
  carbonA1A3KgCO2e: number | null;
  carbonA1A5KgCO2e: number | null;
  /** Carbon of the modules counted (the study's boundary), kgCO2e. */
  carbonTotalKgCO2e: number | null;
  carbonKgCO2ePerM2Floor: number | null;
  carbonKgCO2ePerM2Plan: number | null;
  moduleDKgCO2e: number | null;
  costTotal: number | null;
  costPerM2Floor: number | null;
  currency: string | null;
  warnings: string[];
}

/** What the figures are read from: a scheme's design with its carbon and cost. */
export interface AssessedDesign {
  id: SchemeId;
  label: string;
  design: Design;
  carbon: CarbonAssessment | null;
  cost: CostAssessment | null;
}

function kindOf(row: TakeoffRow): MaterialKind | undefined {
  return row.material === null ? undefined : materialInfo(row.material)?.kind;
}

/** Take-off mass by material kind, kg, summed in take-off order. */
export function massByKind(takeoff: readonly TakeoffRow[]): Record<MaterialKind, number> {
  const out = Object.fromEntries(MATERIAL_KINDS.map((k) => [k.kind, 0])) as Record<MaterialKind, number>;
  for (const row of takeoff) {
    const kind = kindOf(row);
    if (kind) out[kind] += row.massKg;
  }
  return out;
}

function quantityOf(takeoff: readonly TakeoffRow[], kind: MaterialKind, unit: TakeoffRow["unit"]): number {
  return takeoff.filter((r) => kindOf(r) === kind && r.unit === unit).reduce((s, r) => s + r.quantity, 0);
}

function carbonFigures(carbon: CarbonAssessment | null) {
  return {
    carbonA1A3KgCO2e: carbon ? carbon.totals.a1a3 : null,
    carbonA1A5KgCO2e: carbon ? carbon.totals.a1a3 + carbon.totals.a4 + carbon.totals.a5 : null,
    carbonTotalKgCO2e: carbon ? carbon.totals.counted : null,
    carbonKgCO2ePerM2Floor: carbon?.perM2UsableFloor.perM2 ? carbon.perM2UsableFloor.perM2.counted : null,
    carbonKgCO2ePerM2Plan: carbon?.perM2Plan.perM2 ? carbon.perM2Plan.perM2.counted : null,
    moduleDKgCO2e: carbon ? carbon.totals.moduleD : null,
  };
}

/** The figures of an assessed design: tonnages by material kind, carbon, cost, per m². */
export function schemeFigures(result: AssessedDesign): SchemeFigures {
  const { design, carbon, cost } = result;
  return {
    id: result.id,
    label: result.label,
    feasible: design.feasible,
    status: design.status,
    reason: design.reason,
    governingLoadCase: design.governingLoadCase,
    massByGroupKg: design.massByGroupKg,
    selfWeightKgPerM2: design.selfWeightKgPerM2,
    massByKindKg: massByKind(design.takeoff),
    fabricM2: quantityOf(design.takeoff, "fabric", "m2"),
    concreteM3: quantityOf(design.takeoff, "concrete", "m3"),
    totalMassKg: design.totalMassKg,
    roofMassKg: design.roofMassKg,
    enclosedAirKg: design.enclosedAirKg,
    massToAir: design.enclosedAirKg > 0 ? design.roofMassKg / design.enclosedAirKg : Number.NaN,
    usableFloorM2: design.usableFloorM2,
    planAreaM2: design.planAreaM2,
    governing: design.governing,
    maxUtilisation: design.maxUtilisation,
    iterations: design.iterations,
    ...carbonFigures(carbon),
    costTotal: cost ? cost.totals.total : null,
    costPerM2Floor: cost?.perM2UsableFloor ? cost.perM2UsableFloor.total : null,
    currency: cost ? cost.currency : null,
    warnings: design.warnings,
  };
}
