import type { GlulamClass } from "../../catalogue/types";
import type { GlulamSection } from "./sections";
import { timberRelativeSlenderness, timberBucklingFactor, GLULAM_BETA_C } from "../../mechanics/timber-column-buckling";
import { timberDesignStrengthPa } from "../../mechanics/timber-gamma-m";
import { timberCompressionBendingUtilisation } from "../../mechanics/timber-combined-compression";
import { timberTensionBendingUtilisation } from "../../mechanics/timber-combined-tension";
import { LTB_LENGTH_RATIO_UDL, timberCriticalBendingStressPa, timberLateralTorsionalFactor, timberShearUtilisation } from "../../mechanics/timber-beam-stability";

/** One load case on a member: axial force (+ tension, − compression), N; strong-axis moment, N·m; and the k_mod of its shortest-acting action. */
export interface MemberDemand {
  forceN: number;
  momentNm: number;
  kMod: number;
  /** Name of the case, for the governing text. */
  label: string;
  /** Shear force at the supports, N (absent: shear not checked, a member with no transverse load). */
  shearN?: number;
  /**
   * Effective length for lateral-torsional buckling of the edge the moment compresses, m
   * (EN 1995-1-1 §6.3.3, Table 6.1); absent: that edge is held sideways along its length
   * (k_crit = 1, §6.3.3(5)).
   */
  torsionalLengthM?: number;
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
 * Effective length for lateral-torsional buckling of a member of span L under a case: a net
 * upward load compresses the lower edge, free along the span, ℓ_ef = 0.9 L (EN 1995-1-1 Table 6.1,
 * simply supported, uniform load); a downward one compresses the upper edge, held sideways every
 * `heldEveryM` (a lattice member by the purlins framing into it; a purlin by the deck: 0, held
 * throughout, k_crit = 1 by §6.3.3(5)), ℓ_ef = that spacing (common practice, no source).
 */
export function torsionalLengthM(c: { surfacePa: number; planPa: number }, spanM: number, heldEveryM: number): number | undefined {
  if (c.surfacePa + c.planPa < 0) return LTB_LENGTH_RATIO_UDL * spanM;
  return heldEveryM > 0 ? Math.min(spanM, heldEveryM) : undefined;
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

/** k_crit of a section for a demand's unrestrained compression edge (EN 1995-1-1 eqs 6.30–6.34), 1 where it is held. */
function kCritOf(section: GlulamSection, glulam: GlulamClass, demand: MemberDemand): number {
  if (demand.torsionalLengthM === undefined || demand.momentNm === 0) return 1;
  return timberLateralTorsionalFactor(glulam.bendingPa, timberCriticalBendingStressPa(section.widthM, section.depthM, demand.torsionalLengthM, glulam.modulus5PctPa));
}

/** A member's check under one demand in its three parts (partsOf). */
interface CheckParts {
  strength: number;
  torsional: number;
  shear: number;
}
/** partsOf's answer, written over at each call, not a new object: the section search calls it some hundred thousand times a search. */
const PARTS: CheckParts = { strength: 0, torsional: 0, shear: 0 };

/** The three parts of a member's check under one demand: strength with buckling (eqs 6.17 or 6.23/6.24), lateral-torsional stability (eq. 6.33, or 6.35 with compression) and shear (eq. 6.13, 0 when not asked). */
function partsOf(section: GlulamSection, glulam: GlulamClass, buckling: SectionBuckling, demand: MemberDemand, gammaM: number): Readonly<CheckParts> {
  const bendingPa = Math.abs(demand.momentNm) / section.sectionModulusYM3;
  const axialPa = Math.abs(demand.forceN) / section.areaM2;
  const bendingStrengthPa = timberDesignStrengthPa(glulam.bendingPa, demand.kMod, gammaM);
  const kCrit = kCritOf(section, glulam, demand);
  const shear = demand.shearN === undefined ? 0 : timberShearUtilisation(demand.shearN, section.widthM, section.depthM, timberDesignStrengthPa(glulam.shearPa, demand.kMod, gammaM));
  PARTS.shear = shear;
  if (demand.forceN >= 0) {
    PARTS.strength = timberTensionBendingUtilisation(axialPa, timberDesignStrengthPa(glulam.tensionPa, demand.kMod, gammaM), bendingPa, bendingStrengthPa);
    // tension lessens lateral-torsional buckling: the bending alone against k_crit·f_m,d (eq. 6.33)
    PARTS.torsional = bendingPa / (kCrit * bendingStrengthPa);
    return PARTS;
  }
  const compressionStrengthPa = timberDesignStrengthPa(glulam.compressionPa, demand.kMod, gammaM);
  PARTS.strength = timberCompressionBendingUtilisation({
    compressionPa: axialPa,
    compressionStrengthPa,
    kcY: buckling.kcY,
    kcZ: buckling.kcZ,
    bendingYPa: bendingPa,
    bendingZPa: 0,
    bendingStrengthYPa: bendingStrengthPa,
    bendingStrengthZPa: bendingStrengthPa,
  });
  // eq. 6.35: (σ_m,d/(k_crit f_m,d))² + σ_c,d/(k_c,z f_c,0,d) ≤ 1
  PARTS.torsional = (bendingPa / (kCrit * bendingStrengthPa)) ** 2 + axialPa / (buckling.kcZ * compressionStrengthPa);
  return PARTS;
}

/** The utilisation number alone (no text), for the section search: the largest of the parts. */
function utilisationOf(section: GlulamSection, glulam: GlulamClass, buckling: SectionBuckling, demand: MemberDemand, gammaM: number): number {
  const p = partsOf(section, glulam, buckling, demand, gammaM);
  return Math.max(p.strength, p.torsional, p.shear);
}

function checkOf(section: GlulamSection, glulam: GlulamClass, buckling: SectionBuckling, demand: MemberDemand, gammaM: number): MemberCheck {
  const p = partsOf(section, glulam, buckling, demand, gammaM);
  const utilisation = Math.max(p.strength, p.torsional, p.shear);
  // no axial force (a purlin): eq. 6.17 is then σ_m,d ≤ f_m,d, eq. 6.11
  const governing =
    p.shear > Math.max(p.strength, p.torsional) ? `shear (${demand.label}), EN 1995-1-1 eq. 6.13`
    : p.torsional > p.strength ? `lateral-torsional buckling (${demand.label}), EN 1995-1-1 eq. ${demand.forceN >= 0 ? "6.33" : "6.35"}`
    : demand.forceN === 0 ? `bending (${demand.label}), EN 1995-1-1 eq. 6.11`
    : demand.forceN > 0 ? `tension and bending (${demand.label}), EN 1995-1-1 eq. 6.17`
    : `compression, bending and buckling (${demand.label}), EN 1995-1-1 eqs 6.23/6.24`;
  return { utilisation, governing, demand };
}

/**
 * Utilisation of a glulam member under one case: compression with bending and buckling
 * (EN 1995-1-1 §6.3.2 eqs 6.23/6.24, k_c from eqs 6.25–6.29 with β_c = 0.1) or tension with bending
 * (§6.2.3 eq. 6.17); lateral-torsional buckling where the demand's compressed edge is free
 * (§6.3.3 eq. 6.33, with compression eq. 6.35; k_crit from eqs 6.30, 6.32, 6.34); shear where the
 * demand gives it (§6.1.7 eq. 6.13, k_cr = 0.67); design strengths k_mod·f_k/γ_M (eq. 2.14).
 */
export function memberUtilisation(section: GlulamSection, glulam: GlulamClass, lengths: BucklingLengths, demand: MemberDemand, gammaM: number): MemberCheck {
  return checkOf(section, glulam, sectionBuckling(section, glulam, lengths), demand, gammaM);
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
  return checkOf(section, glulam, buckling, demands[at]!, gammaM);
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
