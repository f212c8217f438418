import * as v from "valibot";
import { flag, numberIn, oneOf, textUpTo } from "../kernel/validate";
import { DEFAULT_FACTOR_SET_NAME } from "./factor-table";
import { AREA_BASES, type AreaBasis } from "../takeoff/assessment-areas";

/** A transport mode's carbon per tonne-kilometre (A4). */
export type TransportMode = {
  mode: "road" | "sea" | "rail";
  /** kgCO2e per tonne of goods per km. */
  kgCO2ePerTonneKm: number;
  /** Whether the factor includes well-to-tank (fuel production) emissions. */
  wellToTankIncluded: boolean;
  source: string;
};

/** The floor or roof area carbon and cost are divided by (defined with the areas, in src/takeoff/). */
export { AREA_BASES, type AreaBasis };

/**
 * Which life-cycle modules are counted and how the result is normalised. A1–A3 are always counted;
 * module D and biogenic carbon are always reported apart and never netted (IStructE, How to
 * calculate embodied carbon, 2nd ed. 2022, following EN 15978).
 */
export type CarbonSettings = {
  /** Count A4 (transport to site). */
  countA4: boolean;
  /** Count A5 (site wastage). */
  countA5: boolean;
  /** Count C1–C4 (end of life). */
  countC: boolean;
  /** Area the per-m² figure is divided by. */
  areaBasis: AreaBasis;
  /** Design-stage quantity allowance, % added to every mass (not to factors). */
  quantityAllowancePct: number;
  /** A4 mode factors; every mode a factor row uses (road, sea) must be listed once. */
  transportModes: TransportMode[];
  /** Target, kgCO2e per m² on the area basis (null for none). */
  targetKgCO2ePerM2: number | null;
  /** Name of the factor set, for captions. */
  factorSetName: string;
};

export const TransportModeSchema = v.object({
  mode: oneOf(["road", "sea", "rail"]),
  kgCO2ePerTonneKm: numberIn(0, 5, "kgCO2e/t·km"),
  wellToTankIncluded: flag(),
  source: textUpTo(300),
});

export const CarbonSettingsSchema = v.object({
  countA4: flag(),
  countA5: flag(),
  countC: flag(),
  areaBasis: oneOf(AREA_BASES),
  quantityAllowancePct: numberIn(0, 50, "%"),
  transportModes: v.pipe(
    v.array(TransportModeSchema, () => `expected a list of transport modes`),
    v.check((modes) => new Set(modes.map((m) => m.mode)).size === modes.length, () => `a transport mode is listed twice (expected each mode once)`),
    v.check((modes) => modes.some((m) => m.mode === "road") && modes.some((m) => m.mode === "sea"), () => `road and sea factors are required (the factor table gives road and sea distances)`),
  ),
  targetKgCO2ePerM2: v.nullable(numberIn(0, 100000, "kgCO2e/m²")),
  factorSetName: textUpTo(120),
});

/**
 * Defaults. Mode factors: UK Government GHG conversion factors for company reporting, freighting
 * goods — road HGV (all, average laden) 0.10749 and sea cargo 0.01614 kgCO2e/t·km, the values the
 * IStructE guide (2nd ed. 2022) uses for its default A4 scenarios (from memory; the conversion-factor
 * edition year is not recorded, and whether well-to-tank is included was not checked — taken as
 * not included). Quantity allowance 10 %: common practice for a concept design (no source).
 */
export const DEFAULT_CARBON_SETTINGS: CarbonSettings = {
  countA4: true,
  countA5: true,
  countC: true,
  areaBasis: "usable-floor",
  quantityAllowancePct: 10,
  transportModes: [
    {
      mode: "road",
      kgCO2ePerTonneKm: 0.10749,
      wellToTankIncluded: false,
      source: "UK Government GHG conversion factors, freighting goods, HGV all diesel average laden, as quoted by IStructE 2nd ed. 2022 (values from the brief; the conversion-factor edition year is not recorded: from memory)",
    },
    {
      mode: "sea",
      kgCO2ePerTonneKm: 0.01614,
      wellToTankIncluded: false,
      source: "UK Government GHG conversion factors, freighting goods, cargo ship average, as quoted by IStructE 2nd ed. 2022 (values from the brief; the conversion-factor edition year is not recorded: from memory)",
    },
  ],
  targetKgCO2ePerM2: null,
  factorSetName: DEFAULT_FACTOR_SET_NAME,
};
