/**
 * Equivalent continuum of a three-way grid of equal bars (equilateral triangles of side L).
 *
 * Derivation (homogenisation; the equivalent-plate method of Wright 1965 and of Kollár & Dulácska,
 * Buckling of Shells for Engineers, recalled from memory, rederived here): one family of parallel
 * bars at spacing h = L√3/2 gives stress resultants (EA/h)·ε_n·n⊗n. Summing three families at 60°
 * uses Σ nᵢnⱼnₖnₗ = (3/8)(δᵢⱼδₖₗ + δᵢₖδⱼₗ + δᵢₗδⱼₖ), i.e. an isotropic sheet with Lamé
 * constants λ = μ = (3/8)EA/h, so ν = 1/3 and a membrane stiffness (Young's modulus × thickness)
 * B = 8μ/3 = EA/h = 2EA/(√3 L). Bending of the bars about their in-plane axis has the same
 * structure, so D = D₁₁ = λ + 2μ = (9/8)·EI/h = (3√3/4)·EI/L. Bar torsion and joint flexibility are
 * neglected (torsion would stiffen, joint flexibility soften — rigid joints are assumed).
 */
export interface GridStiffness {
  /** Membrane stiffness B (E·t equivalent), N/m. */
  membraneNPerM: number;
  /** Flexural rigidity D, N·m. */
  bendingNm: number;
  /** Poisson's ratio of the equivalent sheet (1/3 for a three-way grid). */
  poissonRatio: number;
}

function positive(name: string, value: number, unit: string): void {
  if (!(value > 0)) throw new RangeError(`invalid ${name}: ${value} ${unit} (expected > 0)`);
}

/**
 * Equivalent membrane stiffness B = 2EA/(√3 L) and flexural rigidity D = (3√3/4) EI/L of a
 * single-layer three-way grid of bars of length L (see the derivation above).
 * @param axialStiffnessN EA, N; @param bendingStiffnessNm2 EI, N·m²; @param barLengthM L, m
 */
export function threeWayGridStiffness(axialStiffnessN: number, bendingStiffnessNm2: number, barLengthM: number): GridStiffness {
  positive("axial stiffness", axialStiffnessN, "N");
  positive("bending stiffness", bendingStiffnessNm2, "N·m²");
  positive("bar length", barLengthM, "m");
  return {
    membraneNPerM: (2 * axialStiffnessN) / (Math.sqrt(3) * barLengthM),
    bendingNm: ((3 * Math.sqrt(3)) / 4) * (bendingStiffnessNm2 / barLengthM),
    poissonRatio: 1 / 3,
  };
}

/**
 * Equivalent stiffness of a double-layer grid: two equal three-way grids at a distance d (webs
 * assumed shear-stiff). B = 2B₁; D = 2D₁ + B₁d²/(2(1 − ν²)) with ν = 1/3 (sandwich plate: each
 * face at d/2 from the middle surface, elementary plate theory).
 */
export function doubleLayerGridStiffness(layer: GridStiffness, depthM: number): GridStiffness {
  positive("double-layer depth", depthM, "m");
  const nu = layer.poissonRatio;
  return {
    membraneNPerM: 2 * layer.membraneNPerM,
    bendingNm: 2 * layer.bendingNm + (layer.membraneNPerM * depthM * depthM) / (2 * (1 - nu * nu)),
    poissonRatio: nu,
  };
}

/** Largest compression and tension in the bars of a three-way grid carrying membrane forces, N. */
export interface GridBarForces {
  /** Largest compression, N (≤ 0). */
  compressionN: number;
  /** Largest tension, N (≥ 0). */
  tensionN: number;
}

/**
 * Bar forces of a three-way grid under principal membrane forces N₁, N₂ (N/m), for the worst
 * orientation of the grid: inverting N = (1/h) Σ F_k n_k⊗n_k gives
 * F(n) = h[(4/3) n·N·n − (1/3)(N₁ + N₂)], extreme along a principal direction: h(N₁ − N₂/3) and
 * h(N₂ − N₁/3), with h = L√3/2. Under a hydrostatic state N₁ = N₂ = N this is F = N·L/√3 for
 * every bar (derived as for threeWayGridStiffness).
 */
export function threeWayGridBarForces(n1NPerM: number, n2NPerM: number, barLengthM: number): GridBarForces {
  positive("bar length", barLengthM, "m");
  if (!(Number.isFinite(n1NPerM) && Number.isFinite(n2NPerM))) throw new RangeError(`invalid membrane forces: ${n1NPerM}, ${n2NPerM} N/m (expected finite)`);
  const h = (barLengthM * Math.sqrt(3)) / 2;
  const a = h * (n1NPerM - n2NPerM / 3);
  const b = h * (n2NPerM - n1NPerM / 3);
  return { compressionN: Math.min(0, a, b), tensionN: Math.max(0, a, b) };
}
