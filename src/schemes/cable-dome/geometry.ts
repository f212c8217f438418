import type { Brief } from "../../brief";
import type { DrawingLine } from "../kit";
import { sphericalCap, capHeightAt, type SphericalCap } from "../../mechanics/spherical-cap";
import type { CableDomeTrussGeometry, CableDomeTrussLoads } from "../../mechanics/cable-dome-truss";

/** Layout of a cable dome: counts and the radial-truss geometry (heights above the eaves, m). */
export interface CableDomeLayout {
  cap: SphericalCap;
  truss: CableDomeTrussGeometry;
  /** Number of radial trusses N. */
  trusses: number;
  /** Number of hoops n. */
  hoops: number;
  /** Radial bay length (a − r_0)/(n + 1), m. */
  bayM: number;
}

/** Perimeter spacing of the ridges the automatic truss count aims at, m (common practice for fabric panels, no source). */
export const AUTO_RIDGE_SPACING_M = 12;

/** Automatic number of radial trusses: the even count giving a perimeter ridge spacing ≤ the given spacing (≤ 12 m), at least 12. */
export function autoTrussCount(spanM: number, maxSpacingM = AUTO_RIDGE_SPACING_M): number {
  const spacing = Math.min(AUTO_RIDGE_SPACING_M, maxSpacingM);
  return Math.max(12, 2 * Math.ceil((Math.PI * spanM) / 2 / spacing));
}

/** Automatic number of hoops: one per 27.5 m of radius (the middle of the 20–35 m common practice, no source), 1 to 8. */
export function autoHoopCount(spanM: number): number {
  return Math.min(8, Math.max(1, Math.round(spanM / 2 / 27.5)));
}

/**
 * Geometry of a cable dome: the post heads lie on the roof's spherical cap (brief rise over the
 * eaves); posts stand at equal radial bays between the central ring (radius ratio × a) and the
 * compression ring at the eaves; each post is long enough that the diagonal from its foot rises by
 * postHeightRatio × bay to the head of the next post (or to the ring).
 */
export function cableDomeLayout(brief: Brief, trussesOption: number, hoopsOption: number, centralRingRatio: number, postHeightRatio: number, maxRidgeSpacingM = AUTO_RIDGE_SPACING_M): CableDomeLayout {
  const cap = sphericalCap(brief.spanM, brief.riseM);
  const a = cap.baseRadiusM;
  const trusses = trussesOption > 0 ? trussesOption : autoTrussCount(brief.spanM, maxRidgeSpacingM);
  const hoops = hoopsOption > 0 ? hoopsOption : autoHoopCount(brief.spanM);
  const r0 = centralRingRatio * a;
  const bayM = (a - r0) / (hoops + 1);
  const radiiM = Array.from({ length: hoops + 1 }, (_, i) => r0 + i * bayM);
  const topM = radiiM.map((r) => capHeightAt(cap, r));
  const headAt = (i: number) => (i < radiiM.length ? (topM[i] as number) : 0);
  const bottomM = radiiM.map((_, i) => Math.min(headAt(i + 1), headAt(i)) - postHeightRatio * bayM);
  return { cap, trusses, hoops, bayM, truss: { trusses, radiiM, topM, bottomM, ringRadiusM: a, ringHeightM: 0 } };
}

/**
 * Nodal loads per truss for a uniform pressure on plan (Pa): each post head carries the annulus
 * between the mid-points of its bays, the centre node also the disc inside the ring; the outer
 * half-bay goes straight to the compression ring (returned apart). Feet carry nothing (self-weight is
 * smeared over the plan with the rest of the permanent load).
 */
export function cableDomeNodalLoads(layout: CableDomeLayout, pressurePa: number): { loads: CableDomeTrussLoads; toRingN: number } {
  const { radiiM, ringRadiusM } = layout.truss;
  const N = layout.trusses;
  const edges = [0, ...radiiM.slice(1).map((r, i) => (r + (radiiM[i] as number)) / 2), ((radiiM[radiiM.length - 1] as number) + ringRadiusM) / 2];
  const topN = radiiM.map((_, i) => (pressurePa * Math.PI * ((edges[i + 1] as number) ** 2 - (edges[i] as number) ** 2)) / N);
  const outer = edges[edges.length - 1] as number;
  return { loads: { topN, bottomN: radiiM.map(() => 0) }, toRingN: (pressurePa * Math.PI * (ringRadiusM ** 2 - outer ** 2)) / N };
}

/** Height of the lowest structure above the eaves at plan radius r: the line joining the post feet, then the last diagonal to the ring (safe-sided). */
export function cableDomeUndersideM(layout: CableDomeLayout, rM: number): number {
  const { radiiM, bottomM, ringRadiusM, ringHeightM } = layout.truss;
  const xs = [...radiiM, ringRadiusM];
  const zs = [...bottomM, ringHeightM];
  if (rM <= (xs[0] as number)) return zs[0] as number;
  for (let i = 1; i < xs.length; i++) {
    const x0 = xs[i - 1] as number;
    const x1 = xs[i] as number;
    if (rM <= x1) return (zs[i - 1] as number) + (((zs[i] as number) - (zs[i - 1] as number)) * (rM - x0)) / (x1 - x0);
  }
  return ringHeightM;
}

/** The half-section x ∈ [0, a], mirrored to [−a, a], heights above the floor. */
export function cableDomeSection(layout: CableDomeLayout, eavesM: number): DrawingLine[] {
  const { radiiM, topM, bottomM, ringRadiusM, ringHeightM } = layout.truss;
  const lines: DrawingLine[] = [];
  const n = radiiM.length - 1;
  const head = (i: number): [number, number] => (i > n ? [ringRadiusM, ringHeightM + eavesM] : [radiiM[i] as number, (topM[i] as number) + eavesM]);
  const foot = (i: number): [number, number] => [radiiM[i] as number, (bottomM[i] as number) + eavesM];
  const both = (role: string, pts: [number, number][]) => {
    lines.push({ role, points: pts });
    lines.push({ role, points: pts.map(([x, y]) => [-x, y] as const) });
  };
  for (let i = 1; i <= n + 1; i++) {
    both("ridge cable", [head(i - 1), head(i)]);
    both("diagonal", [foot(i - 1), head(i)]);
  }
  for (let i = 0; i <= n; i++) both("post", [head(i), foot(i)]);
  const tick = ringRadiusM * 0.01;
  for (let i = 1; i <= n; i++) {
    const [x, y] = foot(i);
    both("hoop", [[x - tick, y], [x + tick, y]]);
  }
  const ringDepth = Math.max(1, ringRadiusM * 0.02);
  both("ring", [[ringRadiusM, eavesM], [ringRadiusM, eavesM - ringDepth]]);
  lines.push({ role: "ring", points: [head(0), [-(radiiM[0] as number), (topM[0] as number) + eavesM]] });
  lines.push({ role: "ring", points: [foot(0), [-(radiiM[0] as number), (bottomM[0] as number) + eavesM]] });
  const steps = 40;
  const fabric: [number, number][] = [];
  for (let s = -steps; s <= steps; s++) {
    const x = (s / steps) * ringRadiusM;
    fabric.push([x, capHeightAt(layout.cap, Math.max(Math.abs(x), radiiM[0] as number)) + eavesM]);
  }
  lines.push({ role: "fabric", points: fabric });
  return lines;
}

/** The plan: a ridge line per truss, the hoops and the rings as polygons through the truss lines (plan x, y, m). */
export function cableDomePlan(layout: CableDomeLayout): DrawingLine[] {
  const { radiiM, ringRadiusM } = layout.truss;
  const N = layout.trusses;
  const angle = (k: number) => (2 * Math.PI * k) / N;
  const polygon = (r: number) => Array.from({ length: N + 1 }, (_, k) => [r * Math.cos(angle(k)), r * Math.sin(angle(k))] as const);
  const lines: DrawingLine[] = [];
  for (let k = 0; k < N; k++) {
    const c = Math.cos(angle(k));
    const s = Math.sin(angle(k));
    lines.push({ role: "ridge cable", points: [[(radiiM[0] as number) * c, (radiiM[0] as number) * s], [ringRadiusM * c, ringRadiusM * s]] });
  }
  for (const r of radiiM.slice(1)) lines.push({ role: "hoop", points: polygon(r) });
  lines.push({ role: "ring", points: polygon(radiiM[0] as number) });
  lines.push({ role: "ring", points: polygon(ringRadiusM) });
  return lines;
}
