import * as Plot from "@observablehq/plot";
import type { Brief } from "../brief";
import type { DrawingLine } from "../schemes/types";
import { roofProfile, envelope } from "../takeoff/envelope";
import { joinByRole } from "./join-lines";

export interface SectionChartInput {
  brief: Brief;
  /** Scheme members to draw over the roof line (half or full section, x from the centre). */
  lines?: readonly DrawingLine[];
  title: string;
  caption: string;
  width?: number;
  /** Member roles in colour order, shared with the plan so a role has one colour in both. */
  roles?: readonly string[];
  /** A fixed height (px) instead of one that follows the section's proportions (see sectionChartOptions). */
  height?: number;
}

/**
 * Plot options for the roof section: roof profile, walls, the floor with its usable part, and the
 * minimum clear height; optionally a scheme's members. Pure: no DOM access.
 */
export function sectionChartOptions(input: SectionChartInput): Plot.PlotOptions {
  const { brief } = input;
  const a = brief.spanM / 2;
  const env = envelope(brief);
  const roof = roofProfile(brief).map(([x, y]) => ({ x, y }));
  const walls = [
    { x: -a, y: 0, side: "left" },
    { x: -a, y: brief.eavesHeightM, side: "left" },
    { x: a, y: 0, side: "right" },
    { x: a, y: brief.eavesHeightM, side: "right" },
  ];
  // A design that gives its floor carries the usable floor it counted as lines (role "usable floor",
  // "support zone"): those are shaded, exactly; otherwise the brief's envelope under the roof surface.
  const isFloorLine = (l: DrawingLine) => l.role === "usable floor" || l.role === "support zone";
  const floorLines = (input.lines ?? []).filter(isFloorLine);
  const members = joinByRole((input.lines ?? []).filter((l) => !isFloorLine(l)));
  const usableSpans = floorLines.some((l) => l.role === "usable floor")
    ? floorLines.filter((l) => l.role === "usable floor").map((l) => ({ x1: Math.min(...l.points.map((p) => p[0])), x2: Math.max(...l.points.map((p) => p[0])), y1: 0, y2: brief.minClearHeightM }))
    : [{ x1: -env.usableRadiusM, x2: env.usableRadiusM, y1: 0, y2: brief.minClearHeightM }];
  const supportZones = floorLines.filter((l) => l.role === "support zone").map((l) => ({ x1: Math.min(...l.points.map((p) => p[0])), x2: Math.max(...l.points.map((p) => p[0])), y1: 0, y2: brief.minClearHeightM }));
  const usableLabel = floorLines.length > 0 ? `usable floor (as counted) at ≥ ${brief.minClearHeightM} m clear` : `usable floor ⌀ ${(2 * env.usableRadiusM).toFixed(0)} m at ≥ ${brief.minClearHeightM} m clear`;
  const top = brief.eavesHeightM + brief.riseM;
  return {
    title: input.title,
    caption: input.caption,
    width: input.width ?? 760,
    height: input.height ?? Math.max(220, Math.min(420, 760 * ((top * 1.25) / brief.spanM) + 120)),
    marginLeft: 50,
    x: { label: "Distance from centre (m)", domain: [-a * 1.05, a * 1.05] },
    y: { label: "Height above floor (m)", domain: [0, top * 1.2] },
    color: { legend: members.length > 0, ...(input.roles ? { domain: [...input.roles] } : {}) },
    marks: [
      Plot.ruleY([0]),
      Plot.rect(usableSpans, { x1: "x1", x2: "x2", y1: "y1", y2: "y2", fill: "#c9e3c5", fillOpacity: 0.6 }),
      ...(supportZones.length > 0 ? [Plot.rect(supportZones, { x1: "x1", x2: "x2", y1: "y1", y2: "y2", fill: "#b8b8b8", fillOpacity: 0.8 })] : []),
      Plot.ruleY([brief.minClearHeightM], { stroke: "#3a7d32", strokeDasharray: "4 3" }),
      Plot.text([{ x: 0, y: brief.minClearHeightM }], { x: "x", y: "y", text: () => usableLabel, dy: -6, fill: "#3a7d32" }),
      Plot.line(walls, { x: "x", y: "y", z: "side", stroke: "#555", strokeWidth: 2 }),
      Plot.line(roof, { x: "x", y: "y", stroke: "#1b1f24", strokeWidth: 2 }),
      ...(members.length > 0 ? [Plot.line(members, { x: "x", y: "y", z: "role", stroke: "role", strokeWidth: 1.2 })] : []),
    ],
  };
}
