import type { SphericalCap } from "../mechanics/spherical-cap";
import type { PressureCase } from "./load-case";
import { withinRadius } from "./dome-coordinates";

/** One line of EN 1991-1-4 Fig. 7.12: c_pe,10 at f/d = 0 and at f/d = 0.5 for one h/d, read as straight. */
interface CpeLine {
  hOverD: number;
  atFlat: number;
  atHemisphere: number;
}

/**
 * External pressure coefficients c_pe,10 of a dome on a circular base, EN 1991-1-4 §7.2.8
 * Fig. 7.12, at the windward base A, the crown B and the leeward base C, as lines in f/d for a few
 * h/d. FROM MEMORY: the figure could not be read here; these values are recalled, its curves are
 * taken as straight between f/d = 0 and 0.5, and they must be replaced by values read from the
 * standard before any use beyond feasibility. The figure gives A for 0 ≤ h/d ≤ 1 and B, C for
 * 0 ≤ h/d ≤ 0.5 (beyond, the last line is used).
 */
export const DOME_CPE_FROM_MEMORY: Readonly<Record<"A" | "B" | "C", readonly CpeLine[]>> = {
  A: [
    { hOverD: 0, atFlat: 0.0, atHemisphere: 0.8 },
    { hOverD: 0.25, atFlat: -0.5, atHemisphere: 0.6 },
    { hOverD: 1, atFlat: -0.9, atHemisphere: 0.4 },
  ],
  B: [
    { hOverD: 0, atFlat: -0.6, atHemisphere: -1.2 },
    { hOverD: 0.25, atFlat: -0.8, atHemisphere: -1.3 },
    { hOverD: 0.5, atFlat: -1.0, atHemisphere: -1.4 },
  ],
  C: [
    { hOverD: 0, atFlat: 0.0, atHemisphere: -0.4 },
    { hOverD: 0.25, atFlat: -0.3, atHemisphere: -0.5 },
    { hOverD: 0.5, atFlat: -0.4, atHemisphere: -0.5 },
  ],
};

/** c_pe,10 at the windward base A, the crown B and the leeward base C. */
export interface DomeCpe {
  A: number;
  B: number;
  C: number;
}

function readLines(lines: readonly CpeLine[], fOverD: number, hOverD: number): number {
  const at = (line: CpeLine) => line.atFlat + ((line.atHemisphere - line.atFlat) * fOverD) / 0.5;
  let below = lines[0]!;
  for (const line of lines) {
    if (hOverD <= line.hOverD) {
      if (line === below) return at(line);
      const t = (hOverD - below.hOverD) / (line.hOverD - below.hOverD);
      return at(below) + t * (at(line) - at(below));
    }
    below = line;
  }
  return at(below);
}

/**
 * c_pe,10 at A, B and C for a dome of rise f on walls of height h and base diameter d, read from
 * `table` (default DOME_CPE_FROM_MEMORY) linearly in f/d and between its h/d lines.
 * @throws when f/d is outside 0 … 0.5 or h/d is negative
 */
export function domeCpe(fOverD: number, hOverD: number, table = DOME_CPE_FROM_MEMORY): DomeCpe {
  if (!(fOverD >= 0 && fOverD <= 0.5)) throw new RangeError(`invalid dome rise ratio f/d: ${fOverD} (expected 0 to 0.5, EN 1991-1-4 Fig. 7.12)`);
  if (!(hOverD >= 0)) throw new RangeError(`invalid wall height ratio h/d: ${hOverD} (expected ≥ 0)`);
  return { A: readLines(table.A, fOverD, hOverD), B: readLines(table.B, fOverD, hOverD), C: readLines(table.C, fOverD, hOverD) };
}

/**
 * c_pe at plan position x along the wind, EN 1991-1-4 §7.2.8(2): constant along arcs perpendicular
 * to the wind (the planes x = const) and linear between A, B and C along the arc parallel to the
 * wind through the crown — linear in the angle from the crown φ = asin(|x|/R), from B at the crown
 * to A (x < 0) or C (x > 0) at the edge angle φ0.
 */
export function domeCpeAt(cpe: DomeCpe, cap: SphericalCap, xM: number): number {
  const t = Math.min(1, Math.asin(Math.min(1, Math.abs(xM) / cap.radiusM)) / cap.edgeAngleRad);
  return cpe.B + ((xM < 0 ? cpe.A : cpe.C) - cpe.B) * t;
}

/**
 * Internal pressure coefficients for a building without a dominant face, EN 1991-1-4 §7.2.9(6)
 * note 2: the more onerous of +0.2 and −0.3.
 */
export const INTERNAL_PRESSURE_COEFFICIENTS = { pressure: 0.2, suction: -0.3 } as const;

export type InternalPressure = keyof typeof INTERNAL_PRESSURE_COEFFICIENTS;

/**
 * Wind on the dome as a net pressure map, EN 1991-1-4 §5.2 eq. 5.5 and §7.2.8–7.2.9:
 * w = q_p(z_e) (c_pe − c_pi), normal to the surface, positive inward, with z_e = h + f (Fig. 7.12)
 * and c_pi = +0.2 ("internal pressure", governs uplift) or −0.3 ("internal suction", governs
 * inward pressure). Uniform equivalent: the peak suction (internal pressure) or the peak inward
 * pressure (internal suction) over the whole roof — it bounds the resultant and the axisymmetric
 * membrane forces in the sense that governs, not the bending of the antisymmetric part.
 */
export function windCase(cap: SphericalCap, cpe: DomeCpe, peakVelocityPressureKPa: number, internal: InternalPressure): PressureCase {
  if (!(peakVelocityPressureKPa >= 0)) throw new RangeError(`invalid peak velocity pressure: ${peakVelocityPressureKPa} kPa (expected ≥ 0)`);
  const cpi = INTERNAL_PRESSURE_COEFFICIENTS[internal];
  const q = peakVelocityPressureKPa;
  const values = [cpe.A, cpe.B, cpe.C].map((c) => q * (c - cpi));
  const peakKPa = Math.max(...values);
  const minKPa = Math.min(...values);
  const governing = internal === "pressure" ? minKPa : peakKPa;
  return {
    kind: "pressure",
    id: internal === "pressure" ? "wind-internal-pressure" : "wind-internal-suction",
    label: internal === "pressure" ? "wind with internal pressure" : "wind with internal suction",
    action: "wind",
    direction: "normal",
    atPlanKPa: (x, y) => (withinRadius(cap, x, y) ? q * (domeCpeAt(cpe, cap, x) - cpi) : 0),
    peakKPa,
    minKPa,
    radialBreaksM: [],
    uniformEquivalent: {
      kPa: governing,
      rule: internal === "pressure"
        ? "the peak net suction over the whole roof: bounds the uplift resultant and the axisymmetric membrane forces of uplift; not the bending of the antisymmetric part"
        : "the peak net inward pressure over the whole roof: bounds the downward resultant and axisymmetric membrane forces; not the bending of the antisymmetric part",
    },
    source: `EN 1991-1-4 §7.2.8 Fig. 7.12 (c_pe,10 at A, B, C — values FROM MEMORY), linear along the wind; §7.2.9(6) note 2: c_pi = ${cpi > 0 ? "+" : "−"}${Math.abs(cpi)}; q_p at z_e = h + f (§4.5)`,
  };
}
