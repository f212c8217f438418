import { wholeNumber } from "../kernel/units";
import * as Plot from "@observablehq/plot";
import type { AnalysisView } from "../schemes/types";

export type ModelProjection = "plan" | "oblique";

export interface Model3dChartInput {
  view: AnalysisView;
  projection: ModelProjection;
  title: string;
  caption: string;
  /** Scale on the displacements (or the mode shape) as drawn; default: the largest drawn as 4 % of the model's extent, rounded to 1, 2 or 5 × 10ⁿ. */
  magnification?: number;
  /** Draw the mode shape instead of the displacements (when the view has one). */
  mode?: boolean;
  /** Share of the members marked as the most utilised (by utilisation, else by |force|), default 0.05. */
  mostUtilisedShare?: number;
  width?: number;
}

/** Oblique view: azimuth −35° about the vertical, elevation 25° (a fixed, stated viewpoint). */
const AZIMUTH_RAD = (-35 * Math.PI) / 180;
const ELEVATION_RAD = (25 * Math.PI) / 180;

type P3 = readonly [number, number, number];

function project(p: P3, projection: ModelProjection): [number, number] {
  if (projection === "plan") return [p[0], p[1]];
  const u = p[0] * Math.cos(AZIMUTH_RAD) - p[1] * Math.sin(AZIMUTH_RAD);
  const depth = p[0] * Math.sin(AZIMUTH_RAD) + p[1] * Math.cos(AZIMUTH_RAD);
  return [u, depth * Math.sin(ELEVATION_RAD) + p[2] * Math.cos(ELEVATION_RAD)];
}

function roundMagnification(m: number): number {
  if (!(m > 0 && Number.isFinite(m))) return 1;
  const decade = 10 ** Math.floor(Math.log10(m));
  const step = [1, 2, 5, 10].find((s) => s * decade >= m * 0.999) ?? 10;
  return step * decade;
}

/** A drawn length in metres, to two significant figures. */
function fmtLength(m: number): string {
  return `${Number(m.toPrecision(2))} m`;
}

/** The shape drawn (displacements or mode shape) and its largest length, m (or mode units). */
function shapeOf(input: Model3dChartInput): { shape: readonly P3[] | undefined; largest: number; label: string } {
  const shape = input.mode && input.view.modeShape ? input.view.modeShape : input.view.displacementsM;
  const largest = shape ? Math.max(0, ...shape.map((d) => Math.hypot(d[0], d[1], d[2]))) : 0;
  return { shape, largest, label: input.mode && input.view.modeShape ? "buckling mode" : "deformed shape" };
}

/** The magnification a chart of this view uses (the given one, or the automatic one). */
export function model3dMagnification(input: Pick<Model3dChartInput, "view" | "magnification" | "mode">): number {
  if (input.magnification !== undefined) return input.magnification;
  const { largest } = shapeOf({ ...input, projection: "plan", title: "", caption: "" });
  const xs = input.view.nodes.map((p) => p[0]);
  const ys = input.view.nodes.map((p) => p[1]);
  const extent = Math.max(Math.max(...xs) - Math.min(...xs), Math.max(...ys) - Math.min(...ys), 1);
  return largest > 0 ? roundMagnification((0.04 * extent) / largest) : 1;
}

/** How a member is drawn, each state in its one colour. */
const MEMBER_STATES = [
  { state: "cable", colour: "#0072B2" },
  { state: "strut", colour: "#555555" },
  { state: "beam", colour: "#009E73" },
  { state: "slack cable", colour: "#D55E00" },
  { state: "most utilised", colour: "#E69F00" },
] as const;

/** Whether the chart draws the buckling mode (asked for, and the view has one) rather than the deformed shape. */
function drawsModeOf(input: Pick<Model3dChartInput, "mode">, view: AnalysisView): boolean {
  return input.mode === true && view.modeShape !== undefined;
}

/**
 * Plot options for a 3D pin-jointed or frame model (an AnalysisView) drawn in plan or in a stated
 * oblique projection: the model as built in light grey, the deformed shape (or the buckling mode)
 * at the stated magnification coloured by member kind, slack cables dashed, and the most utilised
 * members marked. The accessible name and description say what is drawn. Pure: no DOM access.
 */
export function model3dChartOptions(input: Model3dChartInput): Plot.PlotOptions {
  const { view, projection } = input;
  const magnification = model3dMagnification(input);
  const { shape, largest, label } = shapeOf(input);
  const moved = view.nodes.map((p, k) => {
    const d = shape?.[k] ?? [0, 0, 0];
    return [p[0] + magnification * d[0], p[1] + magnification * d[1], p[2] + magnification * d[2]] as const;
  });
  const score = view.members.map((m) => m.utilisation ?? Math.abs(m.forceN));
  const threshold = [...score].sort((a, b) => b - a)[Math.max(0, Math.ceil((input.mostUtilisedShare ?? 0.05) * score.length) - 1)] ?? Infinity;
  const segment = (points: readonly P3[]) =>
    view.members.map((m, j) => {
      const [x1, y1] = project(points[m.a] as P3, projection);
      const [x2, y2] = project(points[m.b] as P3, projection);
      const state = m.slack ? "slack cable" : (score[j] as number) >= threshold && (score[j] as number) > 0 ? "most utilised" : m.kind;
      return { x1, y1, x2, y2, state, forceKN: m.forceN / 1000 };
    });
  const built = segment(view.nodes);
  const deformed = segment(moved);
  const slack = view.members.filter((m) => m.slack).length;
  // the legend names what is drawn (a cable dome has no beam); whether any cable went slack, the caption says
  const states = new Set(deformed.map((d) => d.state));
  const legend = MEMBER_STATES.filter((k) => states.has(k.state));
  const cables = view.members.some((m) => m.kind === "cable");
  const slackWords = !cables || drawsModeOf(input, view) ? "" : slack === 0 ? "; no cable slack" : `; ${slack} slack cable${slack === 1 ? "" : "s"} dashed`;
  // a mode shape has no size of its own: say how large it is drawn rather than a magnification of arbitrary units
  const drawsMode = drawsModeOf(input, view);
  const scale = drawsMode ? `its largest movement drawn as ${fmtLength(magnification * largest)} (a buckling mode has no size of its own)` : `magnified ${magnification}×`;
  const description = `${view.members.length} members and ${view.nodes.length} nodes in ${projection === "plan" ? "plan" : "an oblique view (azimuth −35°, elevation 25°)"}; ${label} under ${view.caseName}, ${drawsMode ? scale : `${scale} (largest ${largest.toFixed(3)} m)`}; ${slack} slack cables dashed; the most utilised members marked.`;
  return {
    title: input.title,
    caption: `${input.caption} ${label[0]?.toUpperCase()}${label.slice(1)} under ${view.caseName}, ${scale}${slackWords}; grey: as built.`,
    ariaLabel: input.title,
    ariaDescription: description,
    width: input.width ?? 460,
    height: projection === "plan" ? (input.width ?? 460) : Math.round((input.width ?? 460) * 0.6),
    x: { label: projection === "plan" ? "x (m)" : "across the view (m)" },
    y: { label: projection === "plan" ? "y (m)" : "up the view (m)" },
    aspectRatio: 1,
    color: { legend: true, domain: legend.map((k) => k.state), range: legend.map((k) => k.colour) },
    marks: [
      Plot.link(built, { x1: "x1", y1: "y1", x2: "x2", y2: "y2", stroke: "#c8c8c8", strokeWidth: 0.5 }),
      Plot.link(deformed.filter((d) => d.state !== "slack cable"), {
        x1: "x1", y1: "y1", x2: "x2", y2: "y2", stroke: "state",
        strokeWidth: (d: { state: string }) => (d.state === "most utilised" ? 2 : 0.8),
        title: (d: { state: string; forceKN: number }) => `${d.state}: ${wholeNumber(d.forceKN)} kN`,
      }),
      Plot.link(deformed.filter((d) => d.state === "slack cable"), { x1: "x1", y1: "y1", x2: "x2", y2: "y2", stroke: "state", strokeWidth: 1.2, strokeDasharray: "4 3" }),
    ],
  };
}
