import type { SchemeId } from "../schemes/types";

/** One colour per scheme, the same on every page and export (colour-blind-safe set, Okabe–Ito). */
export const SCHEME_COLOURS: Readonly<Record<SchemeId, string>> = {
  "cable-dome": "#0072B2",
  "cable-net": "#009E73",
  "geodesic-dome": "#E69F00",
  "truss-roof": "#CC79A7",
  "concrete-shell": "#7f7f7f",
};
