import type { Brief } from "../../brief";
import type { DrawingLine, FloorEnvelope } from "../types";
import { usableFloorAreaM2 } from "../../mechanics/usable-floor";

/** Rings the plan radius is divided into for the usable floor (error ≤ one ring's area per crossing). */
const FLOOR_RINGS = 2000;

/** Whether each soffit's radii never decrease (then the first point at or beyond r is found by bisection). */
const ascending = new WeakMap<FloorEnvelope["soffit"], boolean>();

function isAscending(soffit: FloorEnvelope["soffit"]): boolean {
  let known = ascending.get(soffit);
  if (known === undefined) {
    known = soffit.every((p, i) => i === 0 || (soffit[i - 1] as readonly [number, number])[0] <= p[0]);
    ascending.set(soffit, known);
  }
  return known;
}

/** Index of the first point from 1 on whose radius is at least r (soffit.length when none). */
function firstAtOrBeyond(soffit: FloorEnvelope["soffit"], rM: number): number {
  if (!isAscending(soffit)) {
    for (let i = 1; i < soffit.length; i++) if (rM <= (soffit[i] as readonly [number, number])[0]) return i;
    return soffit.length;
  }
  let lo = 1;
  let hi = soffit.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (rM <= (soffit[mid] as readonly [number, number])[0]) hi = mid;
    else lo = mid + 1;
  }
  return lo;
}

/** Height of the soffit above the floor at plan radius r: linear between the given points, flat beyond the ends. */
export function soffitHeightAtM(soffit: FloorEnvelope["soffit"], rM: number): number {
  if (soffit.length === 0) throw new RangeError("invalid floor.soffit: empty (expected at least one (radius, height) point)");
  const first = soffit[0] as readonly [number, number];
  if (rM <= first[0]) return first[1];
  return heightBefore(soffit, firstAtOrBeyond(soffit, rM), rM);
}

/** The soffit's height at r, given i: the first point from 1 on whose radius is at least r (r beyond the first point). */
function heightBefore(soffit: FloorEnvelope["soffit"], i: number, rM: number): number {
  if (i >= soffit.length) return (soffit[soffit.length - 1] as readonly [number, number])[1];
  const [r0, z0] = soffit[i - 1] as readonly [number, number];
  const [r1, z1] = soffit[i] as readonly [number, number];
  return r1 > r0 ? z0 + ((z1 - z0) * (rM - r0)) / (r1 - r0) : Math.min(z0, z1);
}

/**
 * soffitHeightAtM for radii asked in increasing order (the floor's rings, 2,000 of them per design):
 * an ascending soffit is walked forward from the last point found instead of bisected for each
 * ring — the same point, so the same heights. A radius smaller than the last starts again.
 */
function soffitHeightOutwards(soffit: FloorEnvelope["soffit"]): (rM: number) => number {
  if (soffit.length === 0 || !isAscending(soffit)) return (rM) => soffitHeightAtM(soffit, rM);
  const first = soffit[0] as readonly [number, number];
  let i = 1;
  let lastM = -Infinity;
  return (rM) => {
    if (rM <= first[0]) return first[1];
    if (rM < lastM) i = 1;
    lastM = rM;
    while (i < soffit.length && rM > (soffit[i] as readonly [number, number])[0]) i++;
    return heightBefore(soffit, i, rM);
  };
}

/**
 * usableFloorAreaM2 on FLOOR_RINGS rings for an ascending soffit, the same rings counted (a ring is
 * usable when the soffit at its mid-radius leaves the clear height) without asking each ring: where
 * the soffit is clear (or not) at both ends of one of its straight pieces it is so all along it, and
 * every ring whose middle lies on that piece is counted (or left) without asking its height. Only the
 * rings on a piece that crosses the clear height are asked one by one. The per-ring scan was a sixth
 * of the cable net's proportion search (its soffit has 201 points, the floor 2,000 rings).
 */
function ringsUnderSoffitM2(a: number, soffit: FloorEnvelope["soffit"], minClearM: number): number {
  const dr = a / FLOOR_RINGS;
  const last = soffit.length - 1;
  const radius = (j: number) => (soffit[j] as readonly [number, number])[0];
  const height = (j: number) => (soffit[j] as readonly [number, number])[1];
  let area = 0;
  let j = 1; // the piece (j − 1, j) holding the ring's middle; j = 0 before the first point, soffit.length beyond the last
  // a ring's middle as usableFloorAreaM2 takes it, to the last bit
  const middleOf = (k: number) => k * dr + dr / 2;
  const ring = (k: number) => {
    const r0 = k * dr;
    const r1 = r0 + dr;
    return Math.PI * (r1 * r1 - r0 * r0);
  };
  for (let i = 0; i < FLOOR_RINGS; ) {
    const middle = middleOf(i);
    if (middle <= radius(0)) j = 0;
    else while (j < soffit.length && !(j >= 1 && middle <= radius(j))) j++;
    // the heights at the ends of the piece, and the last ring whose middle is on it
    const [from, to, end] = j === 0 ? [height(0), height(0), radius(0)] : j > last ? [height(last), height(last), Infinity] : [height(j - 1), height(j), radius(j)];
    let lastRing = Math.min(FLOOR_RINGS - 1, Math.max(i, Math.floor(end / dr - 0.5)));
    while (lastRing > i && middleOf(lastRing) > end) lastRing--;
    while (lastRing + 1 < FLOOR_RINGS && middleOf(lastRing + 1) <= end) lastRing++;
    if (from >= minClearM && to >= minClearM) {
      // each ring's annulus added as usableFloorAreaM2 adds it, so the sum is the same to the last bit
      for (; i <= lastRing; i++) area += ring(i);
    } else if (from < minClearM && to < minClearM) {
      i = lastRing + 1;
    } else {
      if (heightBefore(soffit, Math.max(1, j), middle) >= minClearM) area += ring(i);
      i += 1;
    }
  }
  return area;
}

/** Whether the soffit at radius r leaves the brief's clear height. */
function clearAt(brief: Brief, floor: FloorEnvelope, rM: number): boolean {
  return soffitHeightAtM(floor.soffit, rM) >= brief.minClearHeightM;
}

/** Length of the circle of radius r (about the plan centre) inside a disc of radius c centred R from the centre, m. */
function arcInsideDiscM(rM: number, centreM: number, clearM: number): number {
  if (rM + centreM <= clearM) return 2 * Math.PI * rM; // the whole circle lies in the disc
  if (Math.abs(rM - centreM) >= clearM || centreM <= 0) return 0;
  const cos = (rM * rM + centreM * centreM - clearM * clearM) / (2 * rM * centreM);
  return 2 * rM * Math.acos(Math.max(-1, Math.min(1, cos)));
}

/** Sub-annuli a support's zone is integrated on where only part of it is usable floor. */
const ZONE_RINGS = 64;

/**
 * Usable floor lost to one support's clear zone (a disc), m²: the whole disc where the floor
 * under all of it is otherwise usable; else the disc's area on the usable annuli, integrated by the
 * arc of each annulus inside the disc (a zone over the centre counts its whole circle there).
 */
function supportLossM2(brief: Brief, floor: FloorEnvelope, s: FloorEnvelope["supports"][number]): number {
  const a = brief.spanM / 2;
  const from = Math.max(0, s.radiusM - s.clearRadiusM);
  const to = Math.min(a, s.radiusM + s.clearRadiusM);
  if (!(to > from)) return 0;
  const dr = (to - from) / ZONE_RINGS;
  const usable = Array.from({ length: ZONE_RINGS }, (_, k) => clearAt(brief, floor, from + (k + 0.5) * dr));
  if (usable.every(Boolean) && s.radiusM + s.clearRadiusM <= a) return Math.PI * s.clearRadiusM ** 2;
  return usable.reduce((sum, ok, k) => sum + (ok ? arcInsideDiscM(from + (k + 0.5) * dr, s.radiusM, s.clearRadiusM) * dr : 0), 0);
}

/**
 * Usable floor by one rule: the plan area where the soffit of the structure's lowest members is at
 * least the brief's minimum clear height above the floor, less the clear zones of the supports that
 * stand on the floor inside the plan (each zone counted where the floor under it is otherwise usable).
 */
export function usableFloorM2(brief: Brief, floor: FloorEnvelope): number {
  const a = brief.spanM / 2;
  const underSoffit = isAscending(floor.soffit) && floor.soffit.length > 0 ? ringsUnderSoffitM2(a, floor.soffit, brief.minClearHeightM) : usableFloorAreaM2(a, soffitHeightOutwards(floor.soffit), brief.minClearHeightM, FLOOR_RINGS);
  let supportsM2 = 0;
  for (const s of floor.supports) {
    if (!(s.radiusM >= 0 && s.clearRadiusM >= 0 && Number.isInteger(s.count) && s.count >= 0)) {
      throw new RangeError(`invalid floor.supports entry: radius ${s.radiusM} m, clear radius ${s.clearRadiusM} m, count ${s.count} (expected radii ≥ 0 and a whole count ≥ 0)`);
    }
    supportsM2 += s.count * supportLossM2(brief, floor, s);
  }
  return Math.max(0, underSoffit - supportsM2);
}

/**
 * The usable floor drawn on the section (role "usable floor"): the stretches of the floor line where
 * the soffit leaves the clear height, mirrored about the centre (supports' zones are in the number,
 * not in the line: a section cuts at most two of them).
 */
export function usableFloorLines(brief: Brief, floor: FloorEnvelope, steps = 200): DrawingLine[] {
  const a = brief.spanM / 2;
  const lines: DrawingLine[] = [];
  let start: number | null = null;
  for (let i = 0; i <= steps; i++) {
    const r = (i / steps) * a;
    const ok = clearAt(brief, floor, r);
    if (ok && start === null) start = r;
    if ((!ok || i === steps) && start !== null) {
      const end = ok ? r : ((i - 1) / steps) * a;
      if (end > start) {
        lines.push({ role: "usable floor", points: [[start, 0], [end, 0]] });
        lines.push({ role: "usable floor", points: [[-start, 0], [-end, 0]] });
      }
      start = null;
    }
  }
  return lines;
}
