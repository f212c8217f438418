/** Load-duration classes of EN 1995-1-1 Table 2.1. */
export const LOAD_DURATION_CLASSES = ["permanent", "long-term", "medium-term", "short-term", "instantaneous"] as const;
export type LoadDurationClass = (typeof LOAD_DURATION_CLASSES)[number];

/** Service classes 1–3 of EN 1995-1-1 §2.3.1.3. */
export type ServiceClass = 1 | 2 | 3;

/**
 * k_mod for solid timber and glued laminated timber, EN 1995-1-1 Table 3.1 (the rows for EN 14081-1
 * solid timber and EN 14080 glulam are the same), by service class then load-duration class.
 */
export const GLULAM_K_MOD: Readonly<Record<ServiceClass, Readonly<Record<LoadDurationClass, number>>>> = {
  1: { permanent: 0.6, "long-term": 0.7, "medium-term": 0.8, "short-term": 0.9, instantaneous: 1.1 },
  2: { permanent: 0.6, "long-term": 0.7, "medium-term": 0.8, "short-term": 0.9, instantaneous: 1.1 },
  3: { permanent: 0.5, "long-term": 0.55, "medium-term": 0.65, "short-term": 0.7, instantaneous: 0.9 },
};

/**
 * Modification factor k_mod of glued laminated timber for a load-duration class and a service
 * class, EN 1995-1-1 Table 3.1. A combination takes the k_mod of its shortest-acting action
 * (§3.1.3(2)).
 * @throws RangeError naming an unknown class
 * @example glulamKMod("short-term", 2) // 0.9
 */
export function glulamKMod(duration: LoadDurationClass, serviceClass: ServiceClass): number {
  const row = GLULAM_K_MOD[serviceClass];
  if (row === undefined) throw new RangeError(`invalid service class: ${String(serviceClass)} (expected 1, 2 or 3)`);
  const value = row[duration];
  if (value === undefined) throw new RangeError(`invalid load-duration class: ${String(duration)} (expected one of ${LOAD_DURATION_CLASSES.join(", ")})`);
  return value;
}
