import { ringBucklingForceN } from "../../mechanics/ring-buckling";
import { bucklingReduction, STEEL_E_PA } from "../../mechanics/flexural-buckling";
import { concreteProperties, concreteDesignStrengthPa, rebarDesignStrengthPa, type ConcreteClass } from "../../mechanics/concrete";
import { STEEL_DENSITY_KG_PER_M3 } from "../../catalogue/chs";

export type RingMaterial = "concrete" | "steel";

export interface RingDemand {
  /** Design compression in the ring (positive number), N. */
  compressionN: number;
  radiusM: number;
  /** Radial stiffness of the cables on the ring, N/m per m of ring. */
  foundationNPerM2: number;
  /** Number of cable points around the ring. */
  spokes: number;
  material: RingMaterial;
  /** Steel yield strength for a steel box ring, Pa. */
  yieldPa: number;
  concreteClass?: ConcreteClass;
  /** Factor on the bare ring's critical force: 1 for cable pull normal to the ring (3EI/r³), 1.5 for a pull that stays directed to the centre (4.5EI/r³); default 1. */
  bareRingFactor?: number;
}

export interface RingDesign {
  /** e.g. "box 1.20 × 1.20 × 0.040 m" or "concrete 2.40 × 1.44 m, 1 % steel". */
  designation: string;
  areaM2: number;
  resistanceN: number;
  utilisation: number;
  governing: string;
  /** Steel in the ring (box plate, or reinforcement), kg. */
  steelKg: number;
  /** Concrete volume, m³ (0 for steel). */
  concreteM3: number;
  /** Critical in-plane ring force, N. */
  criticalN: number;
}

/** Reinforcement ratio of a concrete ring, – (common practice for compression members, no source; ≥ EN 1992-1-1 §9.5.2 minimum). */
export const RING_REBAR_RATIO = 0.01;
/** Effective creep ratio for the ring's stiffness (the prestress is permanent), – (assumption, from memory). */
export const RING_CREEP_RATIO = 1.0;

/**
 * The smallest ring section that carries the compression with in-plane buckling. Steel: a square
 * welded box b × b, t = b/30 (class 3 at S355 for internal parts in compression, EN 1993-1-1
 * Table 5.2), N_b,Rd = χ A f_y (curve b, EN 1993-1-1 Table 6.2 welded box) with λ̄ = √(A f_y / N_cr).
 * Concrete: a rectangle b wide (in plan) × 0.6 b deep with 1 % steel, N_Rd = A_c f_cd + A_s f_yd;
 * stiffness EI = 0.3/(1 + 0.5 φ_ef) E_cd I_c (EN 1992-1-1 §5.8.7.2 eq. 5.26, E_cd = E_cm/1.2); the
 * imperfection e_i = l0/400 (§5.2(7)) magnified by 1/(1 − N/N_B) (§5.8.7.3), combined as an
 * equivalent axial load N(1 + e·A/W·magnifier) ≤ N_Rd (a simplification of the N–M check).
 * N_cr from ringBucklingForceN (classical 3EI/R² without cable restraint).
 * Returns null when no section up to 8 m wide works.
 */
export function designCompressionRing(d: RingDemand): RingDesign | null {
  const N = Math.abs(d.compressionN);
  const perimeterM = 2 * Math.PI * d.radiusM;
  for (let b = 0.3; b <= 8.0001; b += 0.01) {
    if (d.material === "steel") {
      const t = b / 30;
      const area = b * b - (b - 2 * t) ** 2;
      const second = (b ** 4 - (b - 2 * t) ** 4) / 12;
      const critical = (d.foundationNPerM2 > 0 ? 1 : (d.bareRingFactor ?? 1)) * ringBucklingForceN(STEEL_E_PA * second, d.radiusM, d.foundationNPerM2, d.spokes).forceN;
      const chi = bucklingReduction(Math.sqrt((area * d.yieldPa) / critical), "b");
      const resistance = chi * area * d.yieldPa;
      if (resistance >= N) {
        return {
          designation: `steel box ${b.toFixed(2)} × ${b.toFixed(2)} × ${(t * 1000).toFixed(0)} mm`,
          areaM2: area,
          resistanceN: resistance,
          utilisation: N / resistance,
          governing: "ring compression with in-plane buckling, EN 1993-1-1 §6.3.1 (N_cr of the ring)",
          steelKg: area * perimeterM * STEEL_DENSITY_KG_PER_M3,
          concreteM3: 0,
          criticalN: critical,
        };
      }
      continue;
    }
    const props = concreteProperties(d.concreteClass ?? "C40/50");
    const depth = 0.6 * b;
    const area = b * depth;
    const second = (depth * b ** 3) / 12;
    const modulus = (depth * b * b) / 6;
    const stiffness = (0.3 / (1 + 0.5 * RING_CREEP_RATIO)) * (props.ecmPa / 1.2) * second;
    const critical = (d.foundationNPerM2 > 0 ? 1 : (d.bareRingFactor ?? 1)) * ringBucklingForceN(stiffness, d.radiusM, d.foundationNPerM2, d.spokes).forceN;
    if (N >= critical) continue;
    const squash = area * (1 - RING_REBAR_RATIO) * concreteDesignStrengthPa(props.fckPa) + area * RING_REBAR_RATIO * rebarDesignStrengthPa();
    const l0 = Math.PI * Math.sqrt(stiffness / critical);
    const amplified = N * (1 + ((l0 / 400) * area) / modulus / (1 - N / critical));
    if (amplified <= squash) {
      return {
        designation: `concrete ${b.toFixed(2)} × ${depth.toFixed(2)} m, ${(RING_REBAR_RATIO * 100).toFixed(0)} % steel`,
        areaM2: area,
        resistanceN: (squash * N) / amplified,
        utilisation: amplified / squash,
        governing: "ring compression with in-plane buckling, EN 1992-1-1 §5.8.7 (N_B of the ring)",
        steelKg: area * RING_REBAR_RATIO * perimeterM * STEEL_DENSITY_KG_PER_M3,
        concreteM3: area * (1 - RING_REBAR_RATIO) * perimeterM,
        criticalN: critical,
      };
    }
  }
  return null;
}
