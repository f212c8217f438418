import type { MaterialId } from "../materials";

/** A steel circular hollow section; dimensions from EN 10210-2, properties computed from D and t. */
export interface ChsSection {
  /** e.g. "CHS 219.1×8.0". */
  designation: string;
  /** Outside diameter D, m. */
  diameterM: number;
  /** Wall thickness t, m. */
  thicknessM: number;
  /** Cross-section area, m². */
  areaM2: number;
  /** Second moment of area, m⁴. */
  secondMomentM4: number;
  /** Radius of gyration, m. */
  radiusOfGyrationM: number;
  /** Elastic section modulus, m³. */
  elasticModulusM3: number;
  /** Plastic section modulus, m³. */
  plasticModulusM3: number;
  /** Mass per metre at 7850 kg/m³, kg/m. */
  massKgPerM: number;
}

/** A steel strand or wire rope: spiral strand or full-locked coil. */
export interface Strand {
  designation: string;
  /** Nominal diameter, m. */
  diameterM: number;
  /** Metallic cross-section area, m². */
  metallicAreaM2: number;
  /** Minimum breaking force F_uk, N. */
  minBreakingForceN: number;
  /** Mass per metre, kg/m. */
  massKgPerM: number;
  /** Modulus of elasticity of the strand, Pa. */
  modulusPa: number;
  source: string;
}

/** A coated fabric or foil for a tensioned roof. */
export interface Fabric {
  id: string;
  label: string;
  material: MaterialId;
  /** Mass per m², kg/m². */
  massKgPerM2: number;
  /** Tensile strength, warp, N/m (strip tensile). */
  tensileWarpNPerM: number;
  /** Tensile strength, weft, N/m. */
  tensileWeftNPerM: number;
  source: string;
}

/** A roof covering for the rigid schemes (lattice dome, truss roof). */
export interface Cladding {
  id: string;
  label: string;
  material: MaterialId;
  /** Mass per m² of roof surface, kg/m². */
  massKgPerM2: number;
  source: string;
}

/** A glued laminated timber strength class, EN 14080:2013 Table 5 (characteristic values). */
export interface GlulamClass {
  /** e.g. "GL24h". */
  strengthClass: string;
  /** f_m,g,k, bending, Pa. */
  bendingPa: number;
  /** f_t,0,g,k, tension parallel to grain, Pa. */
  tensionPa: number;
  /** f_c,0,g,k, compression parallel to grain, Pa. */
  compressionPa: number;
  /** f_v,g,k, shear, Pa. */
  shearPa: number;
  /** E_0,g,mean, Pa. */
  modulusMeanPa: number;
  /** E_0,g,05, 5 % fractile, Pa. */
  modulus5PctPa: number;
  /** ρ_g,k, characteristic density, kg/m³. */
  densityCharacteristicKgPerM3: number;
  /** ρ_g,mean, mean density, kg/m³. */
  densityMeanKgPerM3: number;
  source: string;
}

/** Everything a scheme designer may pick from. */
export interface Catalogue {
  chs: ChsSection[];
  strands: Strand[];
  fabrics: Fabric[];
  claddings: Cladding[];
  glulam: GlulamClass[];
}
