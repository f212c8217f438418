import type { Brief } from "../../brief";
import type { DrawingLine } from "../kit";
import { sphericalCap, capHeightAt } from "../../mechanics/spherical-cap";

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

/** The plan: the edge ring. */
export function shellPlan(a: number): DrawingLine[] {
  return [{ role: "ring", points: Array.from({ length: 73 }, (_, i) => [a * Math.cos((i * Math.PI) / 36), a * Math.sin((i * Math.PI) / 36)] as [number, number]) }];
}
