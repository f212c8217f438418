import * as Plot from "@observablehq/plot";
import type { Brief } from "../brief";
import type { DrawingLine } from "../schemes/types";
import { roofProfile, envelope } from "../takeoff/envelope";
import { joinByRole, roleColours } from "./join-lines";

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
  /** Draw the brief's roof profile (default true); a scheme's own members alone when false (a flat truss under a domed line misleads). */
  briefRoof?: boolean;
}

/** A rectangle of floor from x1 to x2 (m from the centre), y1 to y2 high (m). */
export interface FloorSpan {
  x1: number;
  x2: number;
  y1: number;
  y2: number;
}

/** A line that marks the floor (the usable floor as counted, a support's clear zone): shaded on the section, not drawn as a member. */
const isFloorLine = (l: DrawingLine) => l.role === "usable floor" || l.role === "support zone";

/**
 * The member roles a scheme's section and plan draw as lines, sorted: one colour order for both
 * drawings. The floor's lines are left out: the section shades the floor and labels it, so a legend
 * swatch for it matched nothing drawn.
 */
export function drawnRoles(lines: readonly DrawingLine[]): string[] {
  return [...new Set(lines.filter((l) => !isFloorLine(l)).map((l) => l.role))].sort();
}

/**
 * What the roof section draws, in metres: the roof profile, the walls, the usable
 * floor (with the support zones and its label), the roof top and a design's members by role.
 * One place for the drawing of the section and the brief's outline (see section-outline.ts).
 */
export function sectionParts(brief: Brief, lines: readonly DrawingLine[]) {
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
  const floorLines = lines.filter(isFloorLine);
  const members = joinByRole(lines.filter((l) => !isFloorLine(l)));
  const spanOf = (l: DrawingLine): FloorSpan => ({ x1: Math.min(...l.points.map((p) => p[0])), x2: Math.max(...l.points.map((p) => p[0])), y1: 0, y2: brief.minClearHeightM });
  const usableSpans: FloorSpan[] = floorLines.some((l) => l.role === "usable floor")
    ? floorLines.filter((l) => l.role === "usable floor").map(spanOf)
    : [{ x1: -env.usableRadiusM, x2: env.usableRadiusM, y1: 0, y2: brief.minClearHeightM }];
  const supportZones = floorLines.filter((l) => l.role === "support zone").map(spanOf);
  const usableLabel = floorLines.length > 0 ? `usable floor (as counted) at ≥ ${brief.minClearHeightM} m clear` : `usable floor ⌀ ${(2 * env.usableRadiusM).toFixed(0)} m at ≥ ${brief.minClearHeightM} m clear`;
  // the top of the drawing: the brief's roof, or a design's members where they rise above it (a
  // scheme at its own searched rise, masts), so nothing drawn is cut off
  const top = members.reduce((most, p) => (Number.isFinite(p.y) && p.y > most ? p.y : most), brief.eavesHeightM + brief.riseM);
  // the axes' extents: a little beyond the walls or the farthest member (a cable net's backstays run
  // out past the walls to their ground anchors, and were drawn over the height axis's labels), a
  // fifth above the top
  const reach = members.reduce((most, p) => (Number.isFinite(p.x) && Math.abs(p.x) > most ? Math.abs(p.x) : most), a);
  const xDomain: [number, number] = [-reach * 1.05, reach * 1.05];
  const yDomain: [number, number] = [0, top * 1.2];
  return { roof, walls, usableSpans, supportZones, usableLabel, top, members, xDomain, yDomain };
}

/** The section's axis labels and colours, shared with the brief's outline. */
export const SECTION_STYLE = {
  xLabel: "Distance from centre (m)",
  yLabel: "Height above floor (m)",
  usableFill: "#c9e3c5",
  usableOpacity: 0.6,
  clearStroke: "#3a7d32",
  clearDash: "4 3",
  wallStroke: "#555",
  roofStroke: "#1b1f24",
  lineWidth: 2,
  /** The usable floor's label sits inside the shaded floor, under the clear-height line (px): above it, it ran through a truss roof's members at the eaves. */
  floorLabelDy: 13,
} as const;

/**
 * The roof line named under it, half-way out on the right: with a scheme's members over it, the line
 * is the brief's cap at the drawn rise (what the loads are mapped on and the usable floor is taken
 * under), which a scheme's own surface (a cable net's tent) may stand well above.
 */
function roofLabel(roof: readonly { x: number; y: number }[], brief: Brief): Plot.Markish[] {
  const at = roof.reduce((best, p) => (Math.abs(p.x - brief.spanM / 4) < Math.abs(best.x - brief.spanM / 4) ? p : best), roof[0]!);
  if (!at || brief.riseM <= 0) return [];
  return [Plot.text([at], { x: "x", y: "y", text: () => `roof cap, rise ${brief.riseM.toFixed(1)} m`, dy: 10, textAnchor: "start", fill: SECTION_STYLE.roofStroke })];
}

/**
 * Plot options for the roof section: roof profile, walls, the floor with its usable part, and the
 * minimum clear height; optionally a scheme's members. Pure: no DOM access.
 */
export function sectionChartOptions(input: SectionChartInput): Plot.PlotOptions {
  const { brief } = input;
  const { roof, walls, usableSpans, supportZones, usableLabel, top, members, xDomain, yDomain } = sectionParts(brief, input.lines ?? []);
  return {
    title: input.title,
    caption: input.caption,
    width: input.width ?? 760,
    height: input.height ?? Math.max(220, Math.min(420, 760 * ((top * 1.25) / brief.spanM) + 120)),
    marginLeft: 50,
    x: { label: SECTION_STYLE.xLabel, domain: xDomain },
    y: { label: SECTION_STYLE.yLabel, domain: yDomain },
    color: { legend: members.length > 0, ...roleColours((input.lines ?? []).filter((l) => !isFloorLine(l)), input.roles) },
    marks: [
      Plot.ruleY([0]),
      Plot.rect(usableSpans, { x1: "x1", x2: "x2", y1: "y1", y2: "y2", fill: SECTION_STYLE.usableFill, fillOpacity: SECTION_STYLE.usableOpacity }),
      ...(supportZones.length > 0 ? [Plot.rect(supportZones, { x1: "x1", x2: "x2", y1: "y1", y2: "y2", fill: "#b8b8b8", fillOpacity: 0.8 })] : []),
      Plot.ruleY([brief.minClearHeightM], { stroke: SECTION_STYLE.clearStroke, strokeDasharray: SECTION_STYLE.clearDash }),
      Plot.text([{ x: 0, y: brief.minClearHeightM }], { x: "x", y: "y", text: () => usableLabel, dy: SECTION_STYLE.floorLabelDy, fill: SECTION_STYLE.clearStroke }),
      Plot.line(walls, { x: "x", y: "y", z: "side", stroke: SECTION_STYLE.wallStroke, strokeWidth: SECTION_STYLE.lineWidth }),
      ...(input.briefRoof === false && members.length > 0 ? [] : [Plot.line(roof, { x: "x", y: "y", stroke: SECTION_STYLE.roofStroke, strokeWidth: SECTION_STYLE.lineWidth }), ...roofLabel(roof, brief)]),
      ...(members.length > 0 ? [Plot.line(members, { x: "x", y: "y", z: "role", stroke: "role", strokeWidth: 1.2 })] : []),
    ],
  };
}
