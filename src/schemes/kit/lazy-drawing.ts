import type { Design, DrawingLine } from "../types";

type Drawing = Design["drawing"];

/**
 * A drawing whose plan is built when first read: the proportion search designs twenty or more
 * candidates of a lattice dome and keeps one, and the plan of a fine mesh (two thousand struts and
 * more) was built for each. Reading it (a page, a worker's message, JSON) builds it once.
 */
export function drawingWithLazyPlan(section: DrawingLine[], plan: () => DrawingLine[]): Drawing {
  let built: DrawingLine[] | undefined;
  return Object.defineProperty({ section }, "plan", { enumerable: true, get: () => (built ??= plan()) });
}

/** The drawing with another section; its plan kept as it is, built or still to be built (a spread would build it). */
export function withSection(drawing: Drawing, section: DrawingLine[]): Drawing {
  return Object.defineProperties({} as Drawing, { ...Object.getOwnPropertyDescriptors(drawing), section: { value: section, enumerable: true, writable: true, configurable: true } });
}
