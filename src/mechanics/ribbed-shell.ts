/**
 * Equivalent continuum of a shell of thickness t stiffened by a three-way grid of rectangular ribs
 * below it (ribs b wide, d deep, along the sides of equilateral triangles of side L), for the
 * general-buckling pressure 4√(D·B)/R² (continuumShellPressurePa).
 *
 * Derivation (the homogenisation of threeWayGridStiffness, rederived here with the shell as a
 * flange; the approach of Kollár & Dulácska, Buckling of Shells for Engineers, for ribbed shells,
 * recalled from memory): one family of ribs at spacing h = L√3/2 smears to an isotropic sheet with
 * membrane stiffness B_r = EA/h and, in any direction, the plate coefficient λ + 2μ = (9/8)EA/h
 * for stretching and (9/8)EI/h for bending. The shell adds B_s = E t and the plate stiffnesses
 * E t/(1 − ν²), E t³/(12(1 − ν²)). Bending is taken about the composite neutral surface, at z̄
 * below the shell's middle surface, z̄ = (9/8)(EA/h)e / (E t/(1 − ν²) + (9/8)(EA/h)), e = (t + d)/2
 * the rib centroid's offset; D = E t³/(12(1 − ν²)) + E t z̄²/(1 − ν²) + (9/8)(E I_r + E A (e − z̄)²)/h.
 * With no ribs (b d → 0) it is exactly the solid shell (Zoelly). Rib torsion is neglected (it would
 * stiffen); the ribs are assumed to act with the shell (no slip).
 */
export interface RibbedShell {
  /** Membrane stiffness B, N/m. */
  membraneNPerM: number;
  /** Flexural rigidity D, N·m. */
  bendingNm: number;
  /** Concrete volume of the ribs per m² of shell, m³/m² (three families: 2√3/L of rib per m²). */
  ribVolumePerM2: number;
}

function positive(name: string, value: number, unit: string): void {
  if (!(value > 0)) throw new RangeError(`invalid ${name}: ${value} ${unit} (expected > 0)`);
}

/**
 * Stiffness of a ribbed shell (see above).
 * @param modulusPa E, Pa; @param poissonRatio ν of the shell; @param shellThicknessM t, m
 * @param ribWidthM b, m (≥ 0); @param ribDepthM d below the shell, m (≥ 0); @param ribSpacingM L, the side of the triangles, m
 */
export function ribbedShellStiffness(modulusPa: number, poissonRatio: number, shellThicknessM: number, ribWidthM: number, ribDepthM: number, ribSpacingM: number): RibbedShell {
  positive("elastic modulus", modulusPa, "Pa");
  positive("shell thickness", shellThicknessM, "m");
  positive("rib spacing", ribSpacingM, "m");
  if (!(ribWidthM >= 0 && ribDepthM >= 0)) throw new RangeError(`invalid rib section: ${ribWidthM} × ${ribDepthM} m (expected ≥ 0)`);
  if (!(poissonRatio >= 0 && poissonRatio < 0.5)) throw new RangeError(`invalid poisson ratio: ${poissonRatio} (expected 0 ≤ ν < 0.5)`);
  const E = modulusPa;
  const t = shellThicknessM;
  const h = (ribSpacingM * Math.sqrt(3)) / 2;
  const area = ribWidthM * ribDepthM;
  const inertia = (ribWidthM * ribDepthM ** 3) / 12;
  const plate = 1 - poissonRatio * poissonRatio;
  const e = (t + ribDepthM) / 2;
  const ribStretch = (9 / 8) * ((E * area) / h);
  const zBar = (ribStretch * e) / ((E * t) / plate + ribStretch);
  const bendingNm = (E * t ** 3) / (12 * plate) + ((E * t) / plate) * zBar * zBar + ((9 / 8) * (E * inertia + E * area * (e - zBar) ** 2)) / h;
  return { membraneNPerM: E * t + (E * area) / h, bendingNm, ribVolumePerM2: (area * 2 * Math.sqrt(3)) / ribSpacingM };
}

/**
 * Buckling membrane force of the shell panel between ribs, taken as a flat plate, simply supported,
 * under equal biaxial compression: N_cr = 2π²D/L² — the square of side L (Timoshenko & Gere,
 * Theory of Elastic Stability, §9.2, k = 2 for a square under equal compression both ways, from
 * memory). The triangular panel of side L fits inside that square and the shell's curvature only
 * stiffens it, so this is a lower bound (a flat plate is not imperfection-sensitive: no knock-down).
 * @returns N/m
 */
export function ribbedPanelBucklingNPerM(modulusPa: number, poissonRatio: number, shellThicknessM: number, ribSpacingM: number): number {
  positive("elastic modulus", modulusPa, "Pa");
  positive("shell thickness", shellThicknessM, "m");
  positive("rib spacing", ribSpacingM, "m");
  const D = (modulusPa * shellThicknessM ** 3) / (12 * (1 - poissonRatio * poissonRatio));
  return (2 * Math.PI * Math.PI * D) / (ribSpacingM * ribSpacingM);
}
