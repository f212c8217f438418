import type { Brief } from "../brief";
import { sphericalCap, type SphericalCap } from "../mechanics/spherical-cap";
import type { LoadCaseId, PressureCase, TemperatureCase } from "./load-case";
import { uniformSnowCase, driftedSnowCase } from "./snow-cases";
import { domeCpe, windCase, type DomeCpe } from "./dome-wind";
import { temperatureCase, TEMPERATURE_DEFAULTS, type TemperatureOptions } from "./temperature-case";
import { designCombinations, type Combination } from "./design-combinations";
import { domeWindReference } from "./wind";
import { memoLast } from "../kernel/memo";

/** The load cases and combinations every scheme of a study designs for. */
export interface DesignBasis {
  /** The roof surface the distributions are given on: the spherical cap of the brief's span and rise. */
  cap: SphericalCap;
  /** Wind: rise ÷ span f/d and wall (eaves) height ÷ span h/d, the arguments of EN 1991-1-4 Fig. 7.12. */
  fOverD: number;
  hOverD: number;
  /** c_pe,10 at A, B, C (values from memory). */
  cpe: DomeCpe;
  /** Reference height z_e = h + f (capped at z_max = 200 m), m, and q_p there, kPa. */
  windReferenceHeightM: number;
  peakVelocityPressureKPa: number;
  /** The pressure cases by id. */
  cases: Record<Exclude<LoadCaseId, "temperature">, PressureCase>;
  temperature: TemperatureCase;
  combinations: Combination[];
}

/** A load uniform on plan, vertical, over the whole roof. */
function uniformCase(id: "services" | "imposed", label: string, action: "permanent" | "imposed", valueKPa: number, source: string): PressureCase {
  return {
    kind: "pressure",
    id,
    label,
    action,
    direction: "vertical",
    atPlanKPa: () => valueKPa,
    peakKPa: valueKPa,
    minKPa: valueKPa,
    radialBreaksM: [],
    uniformEquivalent: { kPa: valueKPa, rule: "the case itself (uniform)" },
    source,
  };
}

/**
 * The design basis of a brief: services (permanent), imposed roof load, uniform and drifted snow,
 * wind with internal pressure and with internal suction as net pressure maps, a uniform temperature
 * change, and the EN 1990 combinations of the study's expression. The permanent load G of a
 * combination is the scheme's self-weight plus the services case.
 * The answer is remembered for the last few briefs and shared between callers: read only.
 * @throws when the brief's rise is not 0 < rise ≤ span/2 (from sphericalCap)
 */
export const designBasis: (brief: Brief, temperature?: TemperatureOptions) => DesignBasis = memoLast(
  (brief: Brief, temperature: TemperatureOptions = TEMPERATURE_DEFAULTS) => buildDesignBasis(brief, temperature),
  // the proportion search designs many candidates of one brief (one rise): each would rebuild the same basis
  (brief: Brief, temperature: TemperatureOptions = TEMPERATURE_DEFAULTS) => JSON.stringify([brief, temperature]),
);

function buildDesignBasis(brief: Brief, temperature: TemperatureOptions): DesignBasis {
  const cap = sphericalCap(brief.spanM, brief.riseM);
  const fOverD = brief.riseM / brief.spanM;
  const hOverD = brief.eavesHeightM / brief.spanM;
  const cpe = domeCpe(fOverD, hOverD);
  const { heightM: windReferenceHeightM, peakKPa: peakVelocityPressureKPa } = domeWindReference(brief);
  return {
    cap,
    fOverD,
    hOverD,
    cpe,
    windReferenceHeightM,
    peakVelocityPressureKPa,
    cases: {
      services: uniformCase("services", "services", "permanent", brief.servicesKPa, "the study's services and hung load, permanent, on plan"),
      imposed: uniformCase("imposed", "imposed", "imposed", brief.imposedRoofKPa, "EN 1991-1-1 Table 6.10, category H (maintenance only); not combined with snow or wind, §3.3.2(1)"),
      "snow-uniform": uniformSnowCase(cap, brief.snowGroundKPa),
      "snow-drifted": driftedSnowCase(cap, brief.snowGroundKPa),
      "wind-internal-pressure": windCase(cap, cpe, peakVelocityPressureKPa, "pressure"),
      "wind-internal-suction": windCase(cap, cpe, peakVelocityPressureKPa, "suction"),
    },
    temperature: temperatureCase(temperature),
    combinations: designCombinations(brief.factors, brief.ulsExpression),
  };
}
