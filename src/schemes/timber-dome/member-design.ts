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

/** Instability factors k_c of a section about both axes for its buckling lengths (EN 1995-1-1 eqs 6.21/6.22, 6.25–6.29, β_c = 0.1): they depend on the section, not the load. */
interface SectionBuckling {
  kcY: number;
  kcZ: number;
}

function kcAbout(section: GlulamSection, glulam: GlulamClass, lengthM: number, secondMomentM4: number): number {
  return timberBucklingFactor(timberRelativeSlenderness(lengthM / Math.sqrt(secondMomentM4 / section.areaM2), glulam.compressionPa, glulam.modulus5PctPa), GLULAM_BETA_C);
}

function sectionBuckling(section: GlulamSection, glulam: GlulamClass, lengths: BucklingLengths): SectionBuckling {
  return { kcY: kcAbout(section, glulam, lengths.strongM, section.secondMomentYM4), kcZ: kcAbout(section, glulam, lengths.weakM, section.secondMomentZM4) };
}

/** The utilisation number alone (no text), for the section search. */
function utilisationOf(section: GlulamSection, glulam: GlulamClass, buckling: SectionBuckling, demand: MemberDemand, gammaM: number): number {
  const bendingPa = Math.abs(demand.momentNm) / section.sectionModulusYM3;
  const axialPa = Math.abs(demand.forceN) / section.areaM2;
  const bendingStrengthPa = timberDesignStrengthPa(glulam.bendingPa, demand.kMod, gammaM);
  if (demand.forceN >= 0) return timberTensionBendingUtilisation(axialPa, timberDesignStrengthPa(glulam.tensionPa, demand.kMod, gammaM), bendingPa, bendingStrengthPa);
  return timberCompressionBendingUtilisation({
    compressionPa: axialPa,
    compressionStrengthPa: timberDesignStrengthPa(glulam.compressionPa, demand.kMod, gammaM),
    kcY: buckling.kcY,
    kcZ: buckling.kcZ,
    bendingYPa: bendingPa,
    bendingZPa: 0,
    bendingStrengthYPa: bendingStrengthPa,
    bendingStrengthZPa: bendingStrengthPa,
  });
}

function checkOf(utilisation: number, demand: MemberDemand): MemberCheck {
  // no axial force (a purlin): eq. 6.17 is then σ_m,d ≤ f_m,d, eq. 6.11
  const governing = demand.forceN === 0 ? `bending (${demand.label}), EN 1995-1-1 eq. 6.11` : demand.forceN > 0 ? `tension and bending (${demand.label}), EN 1995-1-1 eq. 6.17` : `compression, bending and buckling (${demand.label}), EN 1995-1-1 eqs 6.23/6.24`;
  return { utilisation, governing, demand };
}

/**
 * Utilisation of a glulam member under one case: compression with bending and buckling
 * (EN 1995-1-1 §6.3.2 eqs 6.23/6.24, k_c from eqs 6.25–6.29 with β_c = 0.1) or tension with bending
 * (§6.2.3 eq. 6.17), design strengths k_mod·f_k/γ_M (eq. 2.14).
 */
export function memberUtilisation(section: GlulamSection, glulam: GlulamClass, lengths: BucklingLengths, demand: MemberDemand, gammaM: number): MemberCheck {
  return checkOf(utilisationOf(section, glulam, sectionBuckling(section, glulam, lengths), demand, gammaM), demand);
}

/**
 * The worst case of a member over its demands (the first of equal ones); with `limit`, null as soon
 * as one demand exceeds it (the section search needs no more).
 */
function worstOf(section: GlulamSection, glulam: GlulamClass, lengths: BucklingLengths, demands: readonly MemberDemand[], gammaM: number, limit?: number): MemberCheck | null {
  const buckling = sectionBuckling(section, glulam, lengths);
  let worst = -Infinity;
  let at = 0;
  for (let i = 0; i < demands.length; i++) {
    const u = utilisationOf(section, glulam, buckling, demands[i]!, gammaM);
    if (limit !== undefined && !(u <= limit)) return null;
    if (i === 0 || u > worst) [worst, at] = [u, i];
  }
  return checkOf(worst, demands[at]!);
}

/** The worst case of a member over its demands. */
export function worstCase(section: GlulamSection, glulam: GlulamClass, lengths: BucklingLengths, demands: readonly MemberDemand[], gammaM: number): MemberCheck {
  if (demands.length === 0) throw new TypeError("worstCase needs at least one demand");
  return worstOf(section, glulam, lengths, demands, gammaM)!;
}

/**
 * The lightest section (list sorted by area) that passes every demand and an extra test (general
 * buckling of the lattice, deflection…); null when none does. The extra test is a few operations, so
 * it is asked first; a section is dropped at its first demand over 1.
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
    if (!accept(section)) continue;
    const check = worstOf(section, glulam, lengths, demands, gammaM, 1);
    if (check !== null) return { section, check };
  }
  return null;
}
