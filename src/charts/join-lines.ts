import { schemeObservable10 } from "d3";
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

/**
 * The colour scale of a drawing's roles: its legend lists only the roles it draws, each in the
 * colour its place in the order shared by the section and the plan gives it (Plot's categorical
 * scheme, observable10), so a role keeps its colour across both and neither lists what only the
 * other draws (the shell's plan listed "shell", drawn only in the section). No shared order: Plot's own.
 */
export function roleColours(lines: readonly DrawingLine[], shared?: readonly string[]): { domain?: string[]; range?: string[] } {
  if (!shared) return {};
  const drawn = new Set(lines.map((l) => l.role));
  const domain = shared.filter((r) => drawn.has(r));
  return { domain, range: domain.map((r) => schemeObservable10[shared.indexOf(r) % schemeObservable10.length]!) };
}
