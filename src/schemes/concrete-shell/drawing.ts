import type { Brief } from "../../brief";
import type { DrawingLine } from "../kit";
import { sphericalCap, capHeightAt, type SphericalCap } from "../../mechanics/spherical-cap";

/** The section: the shell's two faces (thickened towards the edge) and the edge ring, heights above the floor. */
export function shellSection(brief: Brief, thicknessM: number, thickening = 1, edgeWidthM = 0, ringSideM = 0): DrawingLine[] {
  const cap = sphericalCap(brief.spanM, brief.riseM);
  const e = brief.eavesHeightM;
  const xs = Array.from({ length: 41 }, (_, i) => -cap.baseRadiusM + (i / 40) * 2 * cap.baseRadiusM);
  const lines: DrawingLine[] = [
    { role: "shell", points: xs.map((x) => [x, e + capHeightAt(cap, x)] as [number, number]) },
    {
      role: "shell",
      points: xs.map((x) => {
        const fromEdge = cap.baseRadiusM - Math.abs(x);
        const extra = edgeWidthM > 0 && fromEdge < edgeWidthM ? (thickening - 1) * thicknessM * (1 - fromEdge / edgeWidthM) : 0;
        return [x, e + capHeightAt(cap, x) - thicknessM - extra] as [number, number];
      }),
    },
  ];
  if (ringSideM > 0) {
    for (const side of [-1, 1]) {
      const x0 = side * cap.baseRadiusM;
      const x1 = x0 - side * ringSideM;
      lines.push({ role: "ring", points: [[x0, e], [x1, e], [x1, e - ringSideM], [x0, e - ringSideM], [x0, e]] });
    }
  }
  return lines;
}

/**
 * The plan: the edge ring and, for a ribbed shell, its three-way grid of ribs (ribbed.ts): three
 * families of ribs in vertical planes at 60° to each other, each family `ribSpacingM` apart on the
 * shell across them through the crown (the plane k spacings out stands at R·sin(k·s/R) in plan), so
 * the drawn ribs close up towards the edge as the shell steepens.
 */
export function shellPlan(cap: SphericalCap, ribSpacingM = 0): DrawingLine[] {
  const a = cap.baseRadiusM;
  const lines: DrawingLine[] = [{ role: "ring", points: Array.from({ length: 73 }, (_, i) => [a * Math.cos((i * Math.PI) / 36), a * Math.sin((i * Math.PI) / 36)] as [number, number]) }];
  if (!(ribSpacingM > 0)) return lines;
  const R = cap.radiusM;
  const offsets: number[] = [];
  for (let k = 0; k * ribSpacingM < R * cap.edgeAngleRad; k++) {
    const d = R * Math.sin((k * ribSpacingM) / R);
    offsets.push(...(k === 0 ? [0] : [d, -d]));
  }
  for (const angle of [0, Math.PI / 3, (2 * Math.PI) / 3]) {
    const [ux, uy] = [Math.cos(angle), Math.sin(angle)];
    for (const d of offsets) {
      const half = Math.sqrt(Math.max(0, a * a - d * d));
      if (half <= 0) continue;
      // the chord at offset d across the family's direction (ux, uy)
      lines.push({ role: "rib", points: [[d * -uy - half * ux, d * ux - half * uy], [d * -uy + half * ux, d * ux + half * uy]] });
    }
  }
  return lines;
}
