import type { SchemeId, SchemeOptions } from "./types";

/**
 * Rules across a scheme's options (or on an option beyond its plain range) without which the
 * scheme's designer cannot compute at all. Found by reading the designers and sweeping every
 * option: each rule names the option it is reported on and says what is allowed.
 */
export interface OptionRule {
  scheme: SchemeId;
  /** The option the message is attached to. */
  option: string;
  /** The options the rule reads (a control editing any of them is checked). */
  reads: readonly string[];
  /** Null when the options are allowed, else `value (expected …)`. */
  problem(options: SchemeOptions): string | null;
}

export const OPTION_RULES: readonly OptionRule[] = [
  {
    // The truss layout needs ≥ 3 trusses (src/mechanics/cable-dome-truss.ts) and the compression
    // ring's in-plane buckling check ≥ 4 spokes (src/mechanics/ring-buckling.ts).
    scheme: "cable-dome",
    option: "radialTrusses",
    reads: ["radialTrusses"],
    problem: (o) => {
      const n = Number(o.radialTrusses);
      return n === 0 || n >= 4 ? null : `${n} (expected 0 for automatic, or at least 4 radial trusses: the compression ring needs four or more spokes)`;
    },
  },
  {
    // The central tension ring of the net is pulled at masts × radial cables per mast / 2 points,
    // which must be a whole number (the cable net's sizing, ringForceFromPullsN).
    scheme: "cable-net",
    option: "radialCablesPerMast",
    reads: ["masts", "radialCablesPerMast"],
    problem: (o) => {
      const masts = Number(o.masts);
      const cables = Number(o.radialCablesPerMast);
      return (masts * cables) % 2 === 0
        ? null
        : `${cables} with ${masts} masts (expected an even number of radial cables in all: with an odd number of masts, an even number of radial cables per mast)`;
    },
  },
];
