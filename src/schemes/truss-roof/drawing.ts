import type { Brief } from "../../brief";
import type { DrawingLine } from "../kit";

/** Elevation of the longest truss (chords and diagonals) on its columns. */
export function trussSection(brief: Brief, spansM: number[], depthsM: number[]): DrawingLine[] {
  const k = spansM.indexOf(Math.max(...spansM));
  const L = spansM[k]!;
  const d = depthsM[k]!;
  const e = brief.eavesHeightM;
  const panels = Math.max(2, 2 * Math.round(L / (2 * Math.max(d, 1))));
  const web: [number, number][] = [];
  for (let i = 0; i <= panels; i++) web.push([-L / 2 + (i * L) / panels, i % 2 === 0 ? e : e + d]);
  return [
    { role: "chord", points: [[-L / 2, e], [L / 2, e]] },
    { role: "chord", points: [[-L / 2, e + d], [L / 2, e + d]] },
    { role: "web", points: web },
    { role: "column", points: [[-L / 2, 0], [-L / 2, e]] },
    { role: "column", points: [[L / 2, 0], [L / 2, e]] },
  ];
}

/** The plan: the edge and one line per truss. */
export function trussPlan(spanM: number, offsetsM: number[], spansM: number[]): DrawingLine[] {
  const a = spanM / 2;
  const edge: [number, number][] = Array.from({ length: 73 }, (_, i) => [a * Math.cos((i * Math.PI) / 36), a * Math.sin((i * Math.PI) / 36)]);
  return [{ role: "edge", points: edge }, ...offsetsM.map((y, k) => ({ role: "truss", points: [[-spansM[k]! / 2, y], [spansM[k]! / 2, y]] as [number, number][] }))];
}
