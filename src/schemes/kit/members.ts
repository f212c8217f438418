import type { MaterialId } from "../../materials";
import type { CostItemId, TakeoffRow } from "../../takeoff/takeoff-row";
import type { Strand } from "../../catalogue/types";
import type { MemberGroup } from "../types";
import { pickLightestStrand, type StrandChoice } from "../../catalogue/pick-strand";
import { STEEL_DENSITY_KG_PER_M3 } from "../../catalogue/chs";
import { SizingError } from "./errors";

/**
 * A member group as a scheme's sizing produces it: the Design's MemberGroup (the one member-group
 * type) with the scheme's own kind and the group's mass, plus whatever else the scheme needs.
 */
export type SizedGroup<K extends string, Extra = unknown> = MemberGroup & { kind: K; massKg: number } & Extra;

/** The MemberGroup of a sized group, without the sizing's own fields. */
export function memberOf(g: MemberGroup): MemberGroup {
  return {
    element: g.element,
    material: g.material,
    count: g.count,
    lengthM: g.lengthM,
    section: g.section,
    designForceN: g.designForceN,
    resistanceN: g.resistanceN,
    utilisation: g.utilisation,
    governing: g.governing,
  };
}

/** Total mass of the groups of the given kinds, kg. */
export function massOfKinds<K extends string>(groups: readonly SizedGroup<K>[], kinds: readonly K[]): number {
  return groups.filter((g) => kinds.includes(g.kind)).reduce((s, g) => s + g.massKg, 0);
}

/** A take-off row measured in tonnes. */
export function tonnesRow(element: string, material: MaterialId, costItem: CostItemId, massKg: number): TakeoffRow {
  return { element, material, costItem, quantity: massKg / 1000, unit: "t", massKg };
}

/** The lightest strand group for a force (EN 1993-1-11), or a SizingError with the scheme's advice. */
export function pickStrandGroup(strands: readonly Strand[], forceN: number, gammaR: number, failure: string): StrandChoice {
  const choice = pickLightestStrand(strands, forceN, { gammaR });
  if (!choice) throw new SizingError(failure);
  return choice;
}

/**
 * A steel tension ring: A = N/f_y (EN 1993-1-1 eq. 6.6, γ_M0 = 1.0) rounded up to the next whole cm²,
 * over its length.
 */
export function steelTensionRing(forceN: number, yieldPa: number, lengthM: number): Pick<MemberGroup, "section" | "resistanceN" | "utilisation" | "governing"> & { areaM2: number; massKg: number } {
  const areaM2 = Math.ceil((Math.max(forceN, 0) / yieldPa) * 1e4) / 1e4;
  return {
    section: `steel ring, ${(areaM2 * 1e4).toFixed(0)} cm²`,
    resistanceN: areaM2 * yieldPa,
    utilisation: areaM2 > 0 ? Math.max(forceN, 0) / (areaM2 * yieldPa) : 0,
    governing: "tension, EN 1993-1-1 §6.2.3",
    areaM2,
    massKg: areaM2 * lengthM * STEEL_DENSITY_KG_PER_M3,
  };
}
