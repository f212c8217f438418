import * as Plot from "@observablehq/plot";
import type { Brief } from "../brief";
import type { DrawingLine } from "../schemes/types";
import { joinByRole, roleColours } from "./join-lines";

export interface PlanChartInput {
  brief: Brief;
  lines: readonly DrawingLine[];
  title: string;
  caption: string;
  width?: number;
  /** Member roles in colour order, shared with the section. */
  roles?: readonly string[];
}

/** Plot options for a scheme's plan (e.g. the geodesic pattern from its generated nodes), with the plan circle. Pure. */
export function planChartOptions(input: PlanChartInput): Plot.PlotOptions {
  const a = input.brief.spanM / 2;
  const circle = Array.from({ length: 121 }, (_, i) => ({ x: a * Math.cos((2 * Math.PI * i) / 120), y: a * Math.sin((2 * Math.PI * i) / 120) }));
  const segments = joinByRole(input.lines);
  const size = input.width ?? 460;
  return {
    title: input.title,
    caption: input.caption,
    width: size,
    height: size,
    x: { label: "x (m)", domain: [-a * 1.05, a * 1.05] },
    y: { label: "y (m)", domain: [-a * 1.05, a * 1.05] },
    color: { legend: true, ...roleColours(input.lines, input.roles) },
    marks: [Plot.line(circle, { x: "x", y: "y", stroke: "#999" }), Plot.line(segments, { x: "x", y: "y", z: "role", stroke: "role", strokeWidth: 0.6 })],
  };
}
