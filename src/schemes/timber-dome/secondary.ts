import type { GlulamClass } from "../../catalogue/types";
import { simplySupportedMomentNm, simplySupportedUdl } from "../../mechanics/beam";
import { timberDesignStrengthPa } from "../../mechanics/timber-gamma-m";
import { pickGlulam, torsionalLengthM, type MemberCheck, type MemberDemand } from "./member-design";
import type { GlulamSection } from "./sections";

/** Deflection limit of secondary members, span/250: EN 1995-1-1 Table 7.2 gives l/250 to l/350 for w_net,fin (from memory). */
export const DEFLECTION_LIMIT_RATIO = 250;
/** Smallest deck board thickness, m (common practice, no source: 38 mm tongue-and-groove boards). */
export const MIN_DECK_THICKNESS_M = 0.038;

export interface PurlinResult {
  section: GlulamSection;
  check: MemberCheck;
  deflectionM: number;
  limitM: number;
}

/**
 * Purlins between the lattice members, simply supported over the longest panel side L (the longest
 * line across a triangular panel, the safe side), at spacing s: M = wL²/8 and V = wL/2 with
 * w = |q|·s per case; the deck holds the upper edge, so only a net uplift can buckle a purlin
 * sideways (its lower edge free, torsionalLengthM); deflection under characteristic load with the
 * creep-reduced modulus ≤ L/250.
 * @param casesPa ULS load cases, per m² of roof (negative: net uplift), with their k_mod
 * @param serviceLoadPa characteristic load per m² of roof for the deflection check, Pa
 */
export function sizePurlins(
  sections: readonly GlulamSection[],
  glulam: GlulamClass,
  casesPa: readonly { pressurePa: number; kMod: number; label: string }[],
  serviceLoadPa: number,
  spanM: number,
  spacingM: number,
  creepModulusPa: number,
  gammaM: number,
): PurlinResult | null {
  const demands: MemberDemand[] = casesPa.map((c) => {
    const lineLoad = Math.abs(c.pressurePa) * spacingM;
    const torsionalLength = torsionalLengthM({ surfacePa: c.pressurePa, planPa: 0 }, spanM, 0);
    return { forceN: 0, momentNm: simplySupportedMomentNm(lineLoad, spanM), shearN: (lineLoad * spanM) / 2, kMod: c.kMod, label: c.label, ...(torsionalLength === undefined ? {} : { torsionalLengthM: torsionalLength }) };
  });
  const limitM = spanM / DEFLECTION_LIMIT_RATIO;
  const deflection = (s: GlulamSection) => simplySupportedUdl(serviceLoadPa * spacingM, spanM, creepModulusPa * s.secondMomentYM4).deflectionM;
  const pick = pickGlulam(sections, glulam, { strongM: spanM, weakM: spacingM }, demands, gammaM, (s) => deflection(s) <= limitM);
  return pick && { ...pick, deflectionM: deflection(pick.section), limitM };
}

/**
 * Thickness of a board deck spanning the purlin spacing s, per metre width, simply supported (the
 * safe side of continuous boards): the thinnest, in 5 mm steps from 38 mm, with M = |q|s²/8 ≤ f_m,d·t²/6
 * (EN 1995-1-1 eq. 6.11) in every case and deflection ≤ s/250 under characteristic load; null when
 * even 300 mm is not enough.
 */
export function deckThicknessM(
  board: { bendingPa: number },
  casesPa: readonly { pressurePa: number; kMod: number }[],
  serviceLoadPa: number,
  spacingM: number,
  creepModulusPa: number,
  gammaM: number,
): number | null {
  // the moments and strengths do not depend on the thickness: worked out once, not at each step
  const cases = casesPa.map((c) => ({ momentNm: simplySupportedMomentNm(Math.abs(c.pressurePa), spacingM), strengthPa: timberDesignStrengthPa(board.bendingPa, c.kMod, gammaM) }));
  for (let t = MIN_DECK_THICKNESS_M; t <= 0.3 + 1e-9; t += 0.005) {
    const strong = cases.every((c) => c.momentNm <= (c.strengthPa * t * t) / 6);
    const stiff = simplySupportedUdl(serviceLoadPa, spacingM, (creepModulusPa * t ** 3) / 12).deflectionM <= spacingM / DEFLECTION_LIMIT_RATIO;
    if (strong && stiff) return t;
  }
  return null;
}
