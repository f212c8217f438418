import type { GlulamClass } from "../../catalogue/types";
import type { GlulamSection } from "./sections";
import { timberRelativeSlenderness, timberBucklingFactor, GLULAM_BETA_C } from "../../mechanics/timber-column-buckling";
import { timberDesignStrengthPa } from "../../mechanics/timber-gamma-m";
import { timberCompressionBendingUtilisation } from "../../mechanics/timber-combined-compression";
import { timberTensionBendingUtilisation } from "../../mechanics/timber-combined-tension";

/** One load case on a member: axial force (+ tension, − compression), N; strong-axis moment, N·m; and the k_mod of its shortest-acting action. */
export interface MemberDemand {
  forceN: number;
  momentNm: number;
  kMod: number;
  /** Name of the case, for the governing text. */
  label: string;
}

/** Buckling lengths of a member, m: about the strong axis (out of the roof surface) and the weak axis (in it). */
export interface BucklingLengths {
  strongM: number;
  weakM: number;
}

export interface MemberCheck {
  utilisation: number;
  governing: string;
  /** The case that governs. */
  demand: MemberDemand;
}

/**
 * Utilisation of a glulam member under one case: compression with bending and buckling
 * (EN 1995-1-1 §6.3.2 eqs 6.23/6.24, k_c from eqs 6.25–6.29 with β_c = 0.1) or tension with bending
 * (§6.2.3 eq. 6.17), design strengths k_mod·f_k/γ_M (eq. 2.14).
 */
export function memberUtilisation(section: GlulamSection, glulam: GlulamClass, lengths: BucklingLengths, demand: MemberDemand, gammaM: number): MemberCheck {
  const design = (fk: number) => timberDesignStrengthPa(fk, demand.kMod, gammaM);
  const bendingPa = Math.abs(demand.momentNm) / section.sectionModulusYM3;
  const axialPa = Math.abs(demand.forceN) / section.areaM2;
  if (demand.forceN >= 0) {
    const utilisation = timberTensionBendingUtilisation(axialPa, design(glulam.tensionPa), bendingPa, design(glulam.bendingPa));
    return { utilisation, governing: `tension and bending (${demand.label}), EN 1995-1-1 eq. 6.17`, demand };
  }
  const kc = (lengthM: number, secondMomentM4: number) =>
    timberBucklingFactor(timberRelativeSlenderness(lengthM / Math.sqrt(secondMomentM4 / section.areaM2), glulam.compressionPa, glulam.modulus5PctPa), GLULAM_BETA_C);
  const utilisation = timberCompressionBendingUtilisation({
    compressionPa: axialPa,
    compressionStrengthPa: design(glulam.compressionPa),
    kcY: kc(lengths.strongM, section.secondMomentYM4),
    kcZ: kc(lengths.weakM, section.secondMomentZM4),
    bendingYPa: bendingPa,
    bendingZPa: 0,
    bendingStrengthYPa: design(glulam.bendingPa),
    bendingStrengthZPa: design(glulam.bendingPa),
  });
  return { utilisation, governing: `compression, bending and buckling (${demand.label}), EN 1995-1-1 eqs 6.23/6.24`, demand };
}

/** The worst case of a member over its demands. */
export function worstCase(section: GlulamSection, glulam: GlulamClass, lengths: BucklingLengths, demands: readonly MemberDemand[], gammaM: number): MemberCheck {
  return demands
    .map((d) => memberUtilisation(section, glulam, lengths, d, gammaM))
    .reduce((worst, c) => (c.utilisation > worst.utilisation ? c : worst));
}

/**
 * The lightest section (list sorted by area) that passes every demand and an extra test (general
 * buckling of the lattice, deflection…); null when none does.
 */
export function pickGlulam(
  sections: readonly GlulamSection[],
  glulam: GlulamClass,
  lengths: BucklingLengths,
  demands: readonly MemberDemand[],
  gammaM: number,
  accept: (section: GlulamSection) => boolean = () => true,
): { section: GlulamSection; check: MemberCheck } | null {
  for (const section of sections) {
    const check = worstCase(section, glulam, lengths, demands, gammaM);
    if (check.utilisation <= 1 && accept(section)) return { section, check };
  }
  return null;
}
