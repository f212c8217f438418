import type { DrawingLine } from "../schemes/types";

/**
 * The points of many polylines as one series per role, with a NaN point between polylines so
 * that Plot draws one path per role with gaps (thousands of struts stay one SVG path).
 */
export function joinByRole(lines: readonly DrawingLine[]): { x: number; y: number; role: string }[] {
  const out: { x: number; y: number; role: string }[] = [];
  const roles = [...new Set(lines.map((l) => l.role))];
  for (const role of roles) {
    for (const line of lines) {
      if (line.role !== role) continue;
      for (const [x, y] of line.points) out.push({ x, y, role });
      out.push({ x: Number.NaN, y: Number.NaN, role });
    }
  }
  return out;
}
