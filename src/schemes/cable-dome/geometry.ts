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
  /** Height of the compression ring above the brief's eaves, m (the cap springs from the ring). */
  ringRaiseM: number;
  /** Height of the eaves line the truss heights are measured from, above the floor, m. */
  baseM: number;
  /** Diagonal rise per bay asked for (the feet may be shortened to keep the floor). */
  postHeightRatio: number;
}

/** The least rise of a diagonal over its bay, as a share of the bay (the truss needs every diagonal to rise outwards; common practice, no source). */
export const MIN_DIAGONAL_RISE_RATIO = 0.05;

/** Perimeter spacing of the ridges the automatic truss count aims at, m (common practice for fabric panels, no source). */
export const AUTO_RIDGE_SPACING_M = 12;

/** Automatic number of radial trusses: the even count giving a perimeter ridge spacing ≤ the given spacing (≤ 12 m), at least 12. */
export function autoTrussCount(spanM: number, maxSpacingM = AUTO_RIDGE_SPACING_M): number {
  const spacing = Math.min(AUTO_RIDGE_SPACING_M, maxSpacingM);
  return Math.max(12, 2 * Math.ceil((Math.PI * spanM) / 2 / spacing));
}

/**
 * Radius per hoop the automatic count centres on, m: with the feet kept above the clear height the
 * lightest dome here has about one hoop per 55 m of radius (measured 40–250 m at the default brief;
 * the 20–35 m of common practice, no source, is for domes whose outer hoops hang low).
 */
export const AUTO_RADIUS_PER_HOOP_M = 55;

/** Automatic number of hoops: one per AUTO_RADIUS_PER_HOOP_M of radius, 1 to 8. */
export function autoHoopCount(spanM: number): number {
  return Math.min(8, Math.max(1, Math.round(spanM / 2 / AUTO_RADIUS_PER_HOOP_M)));
}

/**
 * Geometry of a cable dome: the compression ring stands `ringRaiseM` above the brief's eaves and the
 * post heads lie on the roof's spherical cap (brief rise) springing from it; posts stand at equal
 * radial bays between the central ring (radius ratio × a) and the compression ring. Each post is
 * long enough that the diagonal from its foot rises by postHeightRatio × bay to the head of the
 * next post (or to the ring) — but no foot hangs below the brief's clear height (the floor stays
 * usable: the post is shortened), unless the diagonal to the next head could then not rise by
 * MIN_DIAGONAL_RISE_RATIO × bay (then the foot drops just enough, and the floor under it is lost).
 * Heights are above the eaves line.
 */
export function cableDomeLayout(brief: Brief, trussesOption: number, hoopsOption: number, centralRingRatio: number, postHeightRatio: number, ringRaiseM = 0, maxRidgeSpacingM = AUTO_RIDGE_SPACING_M): CableDomeLayout {
  const cap = sphericalCap(brief.spanM, brief.riseM);
  const a = cap.baseRadiusM;
  const trusses = trussesOption > 0 ? trussesOption : autoTrussCount(brief.spanM, maxRidgeSpacingM);
  const hoops = hoopsOption > 0 ? hoopsOption : autoHoopCount(brief.spanM);
  const r0 = centralRingRatio * a;
  const bayM = (a - r0) / (hoops + 1);
  const radiiM = Array.from({ length: hoops + 1 }, (_, i) => r0 + i * bayM);
  const topM = radiiM.map((r) => ringRaiseM + capHeightAt(cap, r));
  const headAt = (i: number) => (i < radiiM.length ? (topM[i] as number) : ringRaiseM);
  const floorLevelM = brief.minClearHeightM - brief.eavesHeightM;
  const bottomM = radiiM.map((_, i) => {
    const next = Math.min(headAt(i + 1), headAt(i));
    return Math.min(Math.max(next - postHeightRatio * bayM, floorLevelM), next - MIN_DIAGONAL_RISE_RATIO * bayM);
  });
  return { cap, trusses, hoops, bayM, ringRaiseM, baseM: brief.eavesHeightM, postHeightRatio, truss: { trusses, radiiM, topM, bottomM, ringRadiusM: a, ringHeightM: ringRaiseM } };
}

/**
 * The soffit for the usable floor, heights above the floor: under the central drum its lower ring;
 * then each diagonal rising from a foot to the next head, and at each hoop the post's foot; the
 * last diagonal rises to the compression ring.
 */
export function cableDomeSoffit(layout: CableDomeLayout): [number, number][] {
  const { radiiM, topM, bottomM, ringRadiusM, ringHeightM } = layout.truss;
  const e = layout.baseM;
  const points: [number, number][] = [[0, e + (bottomM[0] as number)], [radiiM[0] as number, e + (bottomM[0] as number)]];
  for (let i = 1; i <= radiiM.length; i++) {
    const r = i < radiiM.length ? (radiiM[i] as number) : ringRadiusM;
    const head = i < radiiM.length ? (topM[i] as number) : ringHeightM;
    points.push([r * (1 - 1e-9), e + head]);
    if (i < radiiM.length) points.push([r, e + (bottomM[i] as number)]);
  }
  return points;
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
  both("ring", [[ringRadiusM, eavesM + ringHeightM], [ringRadiusM, eavesM + ringHeightM - ringDepth]]);
  // the wall or stand the raised ring sits on (substructure, an allowance): without it the ring floats above the eaves
  if (ringHeightM - ringDepth > 0) both("perimeter wall", [[ringRadiusM, eavesM], [ringRadiusM, eavesM + ringHeightM - ringDepth]]);
  lines.push({ role: "ring", points: [head(0), [-(radiiM[0] as number), (topM[0] as number) + eavesM]] });
  lines.push({ role: "ring", points: [foot(0), [-(radiiM[0] as number), (bottomM[0] as number) + eavesM]] });
  const steps = 40;
  const fabric: [number, number][] = [];
  for (let s = -steps; s <= steps; s++) {
    const x = (s / steps) * ringRadiusM;
    fabric.push([x, capHeightAt(layout.cap, Math.max(Math.abs(x), radiiM[0] as number)) + eavesM + layout.ringRaiseM]);
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
