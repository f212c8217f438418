// The brief's roof section as a plain drawing (issue 14, "a slider that keeps up"): the same
// roof, walls, usable floor and axes as the Plot section of section-chart.ts, laid out here in
// pixels directly. Plot took ~55 % of each span-slider step's script to lay this small figure out;
// this takes a fraction of a millisecond. Pure: the page turns it into SVG elements.
import { scaleLinear } from "d3";
import type { Brief } from "../brief";
import { sectionParts, SECTION_STYLE } from "./section-chart";

/** One thing drawn, in pixels. */
export type OutlineMark =
  | { kind: "rect"; x: number; y: number; width: number; height: number; fill: string; opacity: number }
  | { kind: "path"; d: string; stroke: string; width: number; dash?: string }
  | { kind: "text"; x: number; y: number; text: string; fill: string };

export interface SectionOutline {
  title: string;
  caption: string;
  width: number;
  height: number;
  /** The plotting frame in px: left, right, top, bottom (the floor line). */
  frame: { left: number; right: number; top: number; bottom: number };
  xTicks: { at: number; label: string }[];
  yTicks: { at: number; label: string }[];
  xLabel: string;
  yLabel: string;
  marks: OutlineMark[];
}

/** Margins as the Plot section has them (Plot's defaults, 50 px on the left). */
const MARGIN = { left: 50, right: 20, top: 20, bottom: 30 } as const;
/** Px per tick, as Plot chooses how many ticks an axis has. */
const PX_PER_TICK = { x: 80, y: 35 } as const;

const r3 = (x: number) => Math.round(x * 1000) / 1000;

/** The brief's roof section (no members) as pixel geometry at `width` × `height`. */
export function sectionOutline(input: { brief: Brief; title: string; caption: string; width: number; height: number }): SectionOutline {
  const { brief, width, height } = input;
  const parts = sectionParts(brief, []);
  const frame = { left: MARGIN.left, right: width - MARGIN.right, top: MARGIN.top, bottom: height - MARGIN.bottom };
  const x = scaleLinear().domain(parts.xDomain).range([frame.left, frame.right]);
  const y = scaleLinear().domain(parts.yDomain).range([frame.bottom, frame.top]);
  const ticks = (scale: typeof x, count: number) => {
    const format = scale.tickFormat(count);
    return scale.ticks(count).map((t) => ({ at: scale(t), label: format(t) }));
  };
  const path = (points: readonly { x: number; y: number }[]) => points.map((p, k) => `${k === 0 ? "M" : "L"}${r3(x(p.x))},${r3(y(p.y))}`).join("");
  const clearY = y(brief.minClearHeightM);
  const marks: OutlineMark[] = [
    ...parts.usableSpans.map((s): OutlineMark => ({ kind: "rect", x: x(s.x1), y: y(s.y2), width: x(s.x2) - x(s.x1), height: y(s.y1) - y(s.y2), fill: SECTION_STYLE.usableFill, opacity: SECTION_STYLE.usableOpacity })),
    { kind: "path", d: `M${frame.left},${clearY}L${frame.right},${clearY}`, stroke: SECTION_STYLE.clearStroke, width: 1, dash: SECTION_STYLE.clearDash },
    { kind: "text", x: x(0), y: clearY + SECTION_STYLE.floorLabelDy, text: parts.usableLabel, fill: SECTION_STYLE.clearStroke },
    ...(["left", "right"] as const).map((side): OutlineMark => ({ kind: "path", d: path(parts.walls.filter((w) => w.side === side)), stroke: SECTION_STYLE.wallStroke, width: SECTION_STYLE.lineWidth })),
    { kind: "path", d: path(parts.roof), stroke: SECTION_STYLE.roofStroke, width: SECTION_STYLE.lineWidth },
  ];
  return {
    title: input.title,
    caption: input.caption,
    width,
    height,
    frame,
    xTicks: ticks(x, (frame.right - frame.left) / PX_PER_TICK.x),
    yTicks: ticks(y, (frame.bottom - frame.top) / PX_PER_TICK.y),
    xLabel: `${SECTION_STYLE.xLabel} →`,
    yLabel: `↑ ${SECTION_STYLE.yLabel}`,
    marks,
  };
}
