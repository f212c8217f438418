import type { Design, DrawingLine } from "../types";

type Drawing = Design["drawing"];

/** A drawing's lines given at once, or built when first read. */
export type Lines = DrawingLine[] | (() => DrawingLine[]);

/** `lines` as a function building them once (a list is returned as it is). */
export function once(lines: Lines): () => DrawingLine[] {
  if (typeof lines !== "function") return () => lines;
  let built: DrawingLine[] | undefined;
  return () => (built ??= lines());
}

/** A property read through a getter that builds its value once (enumerable, so JSON, a spread and a worker's message see it). */
function lazyProperty(build: () => DrawingLine[]): PropertyDescriptor {
  return { enumerable: true, configurable: true, get: once(build) };
}

/**
 * A drawing whose section and plan are built when first read: the proportion search designs
 * dozens of candidates and keeps one, and each candidate's section (with the usable floor drawn
 * on it) and plan (two thousand struts and more on a fine lattice mesh) were built for every
 * one of them. Reading them (a page, a worker's message, JSON) builds each once.
 */
export function drawingWithLazyPlan(section: Lines, plan: () => DrawingLine[]): Drawing {
  return Object.defineProperties({} as Drawing, { section: lazyProperty(once(section)), plan: lazyProperty(plan) });
}

/** The drawing with another section (built when first read); its plan kept as it is, built or still to be built (a spread would build it). */
export function withSection(drawing: Drawing, section: () => DrawingLine[]): Drawing {
  return Object.defineProperties({} as Drawing, { ...Object.getOwnPropertyDescriptors(drawing), section: lazyProperty(section) });
}
