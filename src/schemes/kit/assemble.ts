import type { Brief } from "../../brief";
import type { Check, Design, DesignAnalysis, DesignStatus, DrawingLine, FloorEnvelope, MassByGroupKg, MemberGroup, SchemeId, SchemeModel, SummaryItem } from "../types";
import type { TakeoffGroup, TakeoffRow } from "../../takeoff/takeoff-row";
import { usableFloorLines, usableFloorM2 } from "./usable-floor";
import { sphericalCap, type SphericalCap } from "../../mechanics/spherical-cap";
import { enclosedAirMassKg } from "../../mechanics/air";
import { withSection } from "./lazy-drawing";

export interface DesignParts {
  summary: SummaryItem[];
  members: MemberGroup[];
  takeoff: TakeoffRow[];
  checks: Check[];
  warnings: string[];
  iterations: number;
  /** Usable floor, m² — or give `floor` and the kit finds it by the one rule (usableFloorM2). */
  usableFloorM2?: number;
  /** Soffit and supports on the floor: the usable floor by the one rule, drawn on the section. */
  floor?: FloorEnvelope;
  /** Name of the design combination that governed ("" by default). */
  governingLoadCase?: string;
  /** The 3D analysis, where the scheme ran one. */
  analysis?: DesignAnalysis;
  /** The structural regime the design is in, named ("single layer", "double layer"); see Design.regime. */
  regime?: string;
  roofSurfaceM2: number;
  /** Enclosed volume, m³ (walls to eaves plus the roof's own volume). */
  enclosedVolumeM3: number;
  drawing: Design["drawing"];
  /** A reason the scheme cannot be built, beyond failed checks ("" if none). */
  reason?: string;
}

/** The envelope of a roof on the brief's spherical cap: its surface, and the volume enclosed by the walls to the eaves and the cap. */
export function capEnvelope(cap: SphericalCap, eavesHeightM: number): Pick<DesignParts, "roofSurfaceM2" | "enclosedVolumeM3"> {
  return { roofSurfaceM2: cap.surfaceM2, enclosedVolumeM3: cap.planAreaM2 * eavesHeightM + cap.volumeM3 };
}

/** Cost items whose rows are envelope when a scheme gives no group. */
const ENVELOPE_ITEMS: readonly string[] = ["fabric-ptfe-glass", "fabric-pvc-polyester", "etfe-cushion", "glazing", "metal-deck", "timber-deck", "roofing-membrane"];

/**
 * A row's group: its own, else by its cost item and element — anchors, columns and foundations
 * substructure; perimeter rings (steel or concrete, with their reinforcement and tendons; not a
 * central hub ring) and edge beams perimeter; fabric, cladding and decks envelope; the rest structure.
 */
export function takeoffGroupOf(row: TakeoffRow): TakeoffGroup {
  if (row.group) return row.group;
  const element = row.element.toLowerCase();
  if (row.costItem === "anchor" || row.costItem === "steel-column" || /\b(anchors?|columns?|foundations?)\b/.test(element)) return "substructure";
  if (ENVELOPE_ITEMS.includes(row.costItem)) return "envelope";
  if (/\bcentral\b/.test(element)) return "structure";
  if (row.costItem === "steel-ring" || /\bring\b/.test(element) || /\bedge beams?\b/.test(element)) return "perimeter";
  return "structure";
}

/** Take-off rows that are substructure, not roof: ground anchors, columns and dead-weight foundations. */
export function isSubstructure(row: TakeoffRow): boolean {
  return takeoffGroupOf(row) === "substructure";
}

/** Mass by the four groups, kg. */
export function massByGroupKg(takeoff: readonly TakeoffRow[]): MassByGroupKg {
  const mass: MassByGroupKg = { structure: 0, perimeter: 0, substructure: 0, envelope: 0 };
  for (const row of takeoff) mass[takeoffGroupOf(row)] += row.massKg;
  return mass;
}

/** The status from the verdicts: infeasible when there is a reason, else out-of-range outside the valid span, else feasible. */
export function designStatus(reason: string, outsideValidRange: boolean): DesignStatus {
  return reason !== "" ? "infeasible" : outsideValidRange ? "out-of-range" : "feasible";
}

/**
 * Completes a Design from its parts: totals, self-weight per m² of plan, the governing check, the
 * valid-range flag and the feasibility verdict (infeasible when any check fails or a reason is given).
 */
export function assembleDesign(model: Pick<SchemeModel, "id" | "validSpanM" | "label">, brief: Brief, parts: DesignParts): Design {
  const planAreaM2 = Math.PI * (brief.spanM / 2) ** 2;
  const floor = parts.floor;
  const takeoff = parts.takeoff.map((row) => ({ ...row, group: takeoffGroupOf(row) }));
  const byGroup = massByGroupKg(takeoff);
  const totalMassKg = takeoff.reduce((sum, row) => sum + row.massKg, 0);
  const roofMassKg = totalMassKg - byGroup.substructure;
  const governingCheck = parts.checks.reduce<Check | undefined>((worst, c) => (worst === undefined || c.utilisation > worst.utilisation ? c : worst), undefined);
  const failed = parts.checks.filter((c) => !c.passed);
  const outsideValidRange = brief.spanM < model.validSpanM.min || brief.spanM > model.validSpanM.max;
  const warnings = [...parts.warnings];
  if (outsideValidRange) {
    warnings.unshift(`span ${brief.spanM} m is outside the method's valid range for ${model.label.toLowerCase()} (${model.validSpanM.min}–${model.validSpanM.max} m)`);
  }
  const reason =
    parts.reason && parts.reason.length > 0
      ? parts.reason
      : failed.length > 0
        ? `fails ${failed.map((c) => `${c.name} (utilisation ${c.utilisation.toFixed(2)})`).join(", ")}`
        : "";
  return {
    schemeId: model.id,
    feasible: reason === "",
    status: designStatus(reason, outsideValidRange),
    governingLoadCase: parts.governingLoadCase ?? "",
    reason,
    outsideValidRange,
    summary: parts.summary,
    members: parts.members,
    takeoff,
    massByGroupKg: byGroup,
    checks: parts.checks,
    warnings,
    iterations: parts.iterations,
    totalMassKg,
    roofMassKg,
    selfWeightKgPerM2: roofMassKg / planAreaM2,
    usableFloorM2: floor ? usableFloorM2(brief, floor) : (parts.usableFloorM2 ?? 0),
    planAreaM2,
    roofSurfaceM2: parts.roofSurfaceM2,
    enclosedAirKg: enclosedAirMassKg(parts.enclosedVolumeM3),
    governing: governingCheck ? governingCheck.name : "",
    maxUtilisation: governingCheck ? governingCheck.utilisation : 0,
    // The section carries the usable floor exactly as counted (role "usable floor").
    drawing: floor ? withSection(parts.drawing, () => [...parts.drawing.section, ...usableFloorLines(brief, floor)]) : parts.drawing,
    ...(parts.analysis ? { analysis: parts.analysis } : {}),
    ...(parts.regime ? { regime: parts.regime } : {}),
  };
}

/** An infeasible Design for a scheme that could not be computed at all (e.g. self-weight diverged). */
export function infeasibleDesign(id: SchemeId, brief: Brief, reason: string, warnings: string[] = [], section: DrawingLine[] = []): Design {
  const cap = sphericalCap(brief.spanM, brief.riseM);
  return {
    schemeId: id,
    feasible: false,
    status: "infeasible",
    governingLoadCase: "",
    reason,
    outsideValidRange: false,
    summary: [],
    members: [],
    takeoff: [],
    massByGroupKg: { structure: 0, perimeter: 0, substructure: 0, envelope: 0 },
    checks: [],
    warnings,
    iterations: 0,
    totalMassKg: 0,
    roofMassKg: 0,
    selfWeightKgPerM2: 0,
    usableFloorM2: 0,
    planAreaM2: cap.planAreaM2,
    roofSurfaceM2: cap.surfaceM2,
    enclosedAirKg: enclosedAirMassKg(cap.planAreaM2 * brief.eavesHeightM + cap.volumeM3),
    governing: "",
    maxUtilisation: 0,
    drawing: { section },
  };
}

/** A check record from demand and capacity (utilisation = demand / capacity, passed when ≤ 1). */
export function check(name: string, clause: string, demand: number, capacity: number, unit: string): Check {
  const utilisation = capacity > 0 ? Math.abs(demand) / capacity : Number.POSITIVE_INFINITY;
  return { name, clause, demand, capacity, unit, utilisation, passed: utilisation <= 1 };
}
