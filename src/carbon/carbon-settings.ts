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

/** A benchmark band the consultant enters: a named range of kgCO2e per m² on a stated area basis (e.g. a client's or a published rating's band). */
export type BenchmarkBand = {
  label: string;
  fromKgCO2ePerM2: number;
  toKgCO2ePerM2: number;
  basis: AreaBasis;
};

/** At most this many bands (a chart stays readable). */
export const MAX_BENCHMARK_BANDS = 8;

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
  /** Name of the factor set, for captions. */
  factorSetName: string;
  /**
   * Benchmark bands (kgCO2e/m² on their own area basis; issue 14: bands the consultant enters, not
   * one target). Optional, default none. A study saved before bands existed reads unchanged; one
   * saved with the single target of that time reads it as a band (see CarbonSettingsSchema).
   */
  benchmarks?: BenchmarkBand[];
};

export const TransportModeSchema = v.object({
  mode: oneOf(["road", "sea", "rail"]),
  kgCO2ePerTonneKm: numberIn(0, 5, "kgCO2e/t·km"),
  wellToTankIncluded: flag(),
  source: textUpTo(300),
});

export const BenchmarkBandSchema = v.pipe(
  v.object({
    label: v.pipe(v.string(), v.trim(), v.minLength(1, () => "empty (expected a name for the band, e.g. \"good practice\")"), v.maxLength(60, (i) => `${JSON.stringify(i.input)} is too long (expected at most 60 characters)`)),
    fromKgCO2ePerM2: numberIn(0, 100000, "kgCO2e/m²"),
    toKgCO2ePerM2: numberIn(0, 100000, "kgCO2e/m²"),
    basis: oneOf(AREA_BASES),
  }),
  v.forward(
    v.check((b) => b.fromKgCO2ePerM2 < b.toKgCO2ePerM2, (i) => {
      const b = i.input as BenchmarkBand;
      return `from ${b.fromKgCO2ePerM2} is not below to ${b.toKgCO2ePerM2} (expected from < to)`;
    }),
    ["toKgCO2ePerM2"],
  ),
);

/**
 * The one target of studies saved before the benchmark bands, read as the band "Target" from 0 to
 * it on the study's own area basis, put first; nothing else changes, and nothing is lost.
 */
function targetAsBand<T extends { targetKgCO2ePerM2?: number | null | undefined; benchmarks: BenchmarkBand[]; areaBasis: AreaBasis }>(settings: T): Omit<T, "targetKgCO2ePerM2"> {
  const { targetKgCO2ePerM2: target, ...rest } = settings;
  if (target === undefined || target === null) return rest;
  return { ...rest, benchmarks: [{ label: "Target", fromKgCO2ePerM2: 0, toKgCO2ePerM2: target, basis: settings.areaBasis }, ...settings.benchmarks] };
}

const tooManyBands = () => `more than ${MAX_BENCHMARK_BANDS} bands (expected at most ${MAX_BENCHMARK_BANDS})`;

export const CarbonSettingsSchema = v.pipe(v.object({
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
  /** Read from studies saved before the bands, and turned into one (targetAsBand); never written. */
  targetKgCO2ePerM2: v.optional(v.nullable(numberIn(0, 100000, "kgCO2e/m²"))),
  factorSetName: textUpTo(120),
  benchmarks: v.optional(v.pipe(v.array(BenchmarkBandSchema, () => "expected a list of benchmark bands"), v.maxLength(MAX_BENCHMARK_BANDS, tooManyBands)), () => []),
}), v.transform(targetAsBand), v.forward(v.check((s) => s.benchmarks.length <= MAX_BENCHMARK_BANDS, tooManyBands), ["benchmarks"]));

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
  factorSetName: DEFAULT_FACTOR_SET_NAME,
  benchmarks: [],
};
