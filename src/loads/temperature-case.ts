import type { TemperatureCase } from "./load-case";

/** Member temperatures of an exposed cable roof, °C. */
export interface TemperatureOptions {
  /** Installation (initial) temperature T0, °C. */
  installationC: number;
  /** Lowest uniform member temperature T_e,min, °C. */
  minMemberC: number;
  /** Highest uniform member temperature T_e,max (shade air plus solar gain on the cables), °C. */
  maxMemberC: number;
}

/**
 * Defaults: T0 = 10 °C (EN 1991-1-5 Annex A.1(3): the initial temperature where none is known —
 * from memory); T_e,min = −20 °C and T_e,max = +50 °C for exposed steel cables on a temperate site
 * (shade air about −20 to +35 °C with about 15 K of solar gain on the strands — common practice,
 * no source; the national annex's isotherms replace them for a real site).
 */
export const TEMPERATURE_DEFAULTS: TemperatureOptions = { installationC: 10, minMemberC: -20, maxMemberC: 50 };

/**
 * The uniform temperature case of a cable roof, EN 1991-1-5 §6.1.3.3: contraction
 * ΔT_N,con = T0 − T_e,min and expansion ΔT_N,exp = T_e,max − T0, here as a fall and a rise from T0.
 * It matters where the structure's force depends on member length (prestressed cables between stiff
 * rings); the schemes that are not temperature-sensitive ignore it.
 * @throws unless minMemberC < installationC < maxMemberC
 */
export function temperatureCase(options: TemperatureOptions = TEMPERATURE_DEFAULTS): TemperatureCase {
  const { installationC, minMemberC, maxMemberC } = options;
  if (!(minMemberC < installationC && installationC < maxMemberC)) {
    throw new RangeError(`invalid temperatures: T_e,min ${minMemberC} °C, T0 ${installationC} °C, T_e,max ${maxMemberC} °C (expected T_e,min < T0 < T_e,max)`);
  }
  return {
    kind: "temperature",
    id: "temperature",
    label: "temperature",
    action: "temperature",
    installationC,
    fallK: minMemberC - installationC,
    riseK: maxMemberC - installationC,
    source: "EN 1991-1-5 §6.1.3.3 uniform component; T0 = 10 °C (Annex A.1(3), from memory); member temperatures −20 / +50 °C — common practice, no source",
  };
}
