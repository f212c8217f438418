import type { Brief } from "../../brief";
import type { DrawingLine } from "../kit";
import { sphericalCap, capHeightAt, type SphericalCap } from "../../mechanics/spherical-cap";

/** One bay of radial cables from the mast heads: outwards to the edge, or inwards to the central ring. */
export interface NetBay {
  /** Plan span of the cable, m. */
  spanM: number;
  /** Height of the mast head above the cable's other end, m (≥ 0). */
  riseM: number;
  /** Sag of the suspension cable below its chord at mid-span: the deepest that keeps the cable on or above the roof, m. */
  sagM: number;
  /** Plan radius of the cable's lower end, m. */
  endRadiusM: number;
  /** Height above the eaves of the cable's lower end, m. */
  endHeightM: number;
  /** Plan area carried by the bay (all masts), m². */
  areaM2: number;
}

/** Geometry of a mast-supported cable net (heights above the eaves, m). */
export interface CableNetLayout {
  cap: SphericalCap;
  masts: number;
  /** Radial cables per mast and side (inner and outer). */
  cablesPerSide: number;
  mastRadiusM: number;
  /** Mast head above the eaves, m. */
  mastHeadM: number;
  /** Mast length, floor to head, m. */
  mastLengthM: number;
  centralRingRadiusM: number;
  outer: NetBay;
  inner: NetBay;
  /** Backstay: plan run from mast to ground anchor, and its length, m. */
  backstayRunM: number;
  backstayLengthM: number;
  /** Radii of the circumferential cables, m. */
  hoopRadiiM: number[];
}

/** Central ring radius / plan radius (common practice, no source). */
export const NET_CENTRAL_RING_RATIO = 0.06;
/** Backstay slope, from the horizontal, rad (45°, common practice, no source). */
export const BACKSTAY_SLOPE_RAD = Math.PI / 4;

/**
 * Radii strictly between `from` and `to` (a bay: central ring to mast ring, or mast ring to edge),
 * evenly spaced, as few as keep them at most `spacingM` apart. Laid out per bay, no circumferential
 * cable passes beside the mast heads: laid out every `spacingM` from the central ring (as before
 * this rule), one passed 0.3 m outside the mast ring at 60 m (default brief, 3 masts at 0.65 × the
 * plan radius); it pulled the outer cables' first segments inwards, the mast-head balance then left
 * the inner radial cables 3.4 % of the radial prestress at the ring (9.8 % at 65 m), and the least
 * prestress that keeps them taut in the 3D analysis, with the anchors that hold it, jumped (3D
 * self-weight 7.5 → 10.6 → 7.5 kg/m² at 55, 60, 65 m; at fixed proportions 60–120 m every 5 m, it
 * followed the hoops against the mast ring by ±12–41 %, and by at most 11.6 % laid out per bay).
 */
function evenlyBetween(from: number, to: number, spacingM: number): number[] {
  const count = Math.max(0, Math.ceil((to - from) / spacingM - 1e-9) - 1);
  return Array.from({ length: count }, (_, i) => from + ((i + 1) * (to - from)) / (count + 1));
}

/**
 * Lays out the net on the brief's cap (the fabric's mean surface): masts on a ring of radius
 * ratio × a with heads `mastAboveRoofRatio × span` above the roof; half of each mast's radial cables
 * run out to the edge at the eaves, half in to a central ring at the crown. Each suspension cable is
 * the deepest parabola on its chord that stays on or above the roof (hangers carry the fabric).
 * Circumferential cables at most `hangerSpacingM` apart, evenly in each bay (see evenlyBetween).
 */
export function cableNetLayout(brief: Brief, masts: number, mastRingRatio: number, mastAboveRoofRatio: number, radialCablesPerMast: number, hangerSpacingM: number): CableNetLayout {
  const cap = sphericalCap(brief.spanM, brief.riseM);
  const a = cap.baseRadiusM;
  const rm = mastRingRatio * a;
  const rc = NET_CENTRAL_RING_RATIO * a;
  const head = capHeightAt(cap, rm) + mastAboveRoofRatio * brief.spanM;
  const bay = (endR: number): NetBay => {
    const endH = capHeightAt(cap, endR);
    const spanM = Math.abs(endR - rm);
    // The deepest parabola that stays on or above the roof everywhere (it touches the roof once; hangers
    // carry the fabric elsewhere): f = min over the span of (chord − roof) / (4t(1 − t)).
    let sagM = Number.POSITIVE_INFINITY;
    for (let i = 1; i < 100; i++) {
      const t = i / 100;
      const chord = head + (endH - head) * t;
      const roof = capHeightAt(cap, rm + (endR - rm) * t);
      sagM = Math.min(sagM, (chord - roof) / (4 * t * (1 - t)));
    }
    return {
      spanM,
      riseM: head - endH,
      sagM,
      endRadiusM: endR,
      endHeightM: endH,
      areaM2: Math.PI * Math.abs(endR > rm ? a * a - rm * rm : rm * rm),
    };
  };
  const mastLengthM = head + brief.eavesHeightM;
  const backstayRunM = mastLengthM / Math.tan(BACKSTAY_SLOPE_RAD);
  const hoopRadiiM = [...evenlyBetween(rc, rm, hangerSpacingM), ...evenlyBetween(rm, a, hangerSpacingM)];
  return {
    cap,
    masts,
    cablesPerSide: radialCablesPerMast / 2,
    mastRadiusM: rm,
    mastHeadM: head,
    mastLengthM,
    centralRingRadiusM: rc,
    outer: bay(a),
    inner: bay(rc),
    backstayRunM,
    backstayLengthM: Math.hypot(backstayRunM, mastLengthM),
    hoopRadiiM,
  };
}

/**
 * Span of a circumferential cable at plan radius r between the radial cables that carry it: the
 * cables of one mast fan from its head to points spread evenly over its sector at the edge (outer)
 * or at the central ring (inner), so near the masts they are bunched and the widest gap is the one
 * between neighbouring masts' fans: 2πr/masts less the fan's own width at r (never below the even
 * spacing 2πr/(masts·cablesPerSide)).
 */
export function circumferentialSpanM(layout: CableNetLayout, rM: number): number {
  const { masts, cablesPerSide: n, mastRadiusM: rm, centralRingRadiusM: rc } = layout;
  const a = layout.cap.baseRadiusM;
  const spread = rM >= rm ? ((2 * Math.PI * a) / masts) * ((rM - rm) / (a - rm)) : ((2 * Math.PI * rc) / masts) * ((rm - rM) / (rm - rc));
  const gap = (2 * Math.PI * rM) / masts - ((n - 1) / n) * spread;
  return Math.max((2 * Math.PI * rM) / (masts * n), gap);
}

/** Points of a parabola with sag f below the chord between two points. */
function parabola(from: readonly [number, number], to: readonly [number, number], sagM: number, steps = 16): [number, number][] {
  return Array.from({ length: steps + 1 }, (_, i) => {
    const t = i / steps;
    return [from[0] + (to[0] - from[0]) * t, from[1] + (to[1] - from[1]) * t - 4 * sagM * t * (1 - t)] as [number, number];
  });
}

/**
 * The section through two masts, mirrored, heights above the floor. Without `radialCables` the
 * closed form's net: each bay's radial cable a parabola of the layout's sag, and the valley cable
 * that holds it down along the roof. With them (the form-found 3D net's radial cables of one mast,
 * each as (plan radius, height above the eaves) points, those nearest the section's plane first),
 * those instead, each circumferential cable marked at its radius on the first of its side, the fabric along
 * the first of each side (it spans from node to node of the net), and no valley cables: the 3D net
 * has none. `ring`: the 3D net's central ring (formFoundRing), drawn there instead of the closed form's.
 */
export function cableNetSection(layout: CableNetLayout, eavesM: number, radialCables?: readonly (readonly (readonly [number, number])[])[], ring?: { radiusM: number; heightM: number }): DrawingLine[] {
  const lines: DrawingLine[] = [];
  const both = (role: string, pts: [number, number][]) => {
    lines.push({ role, points: pts });
    lines.push({ role, points: pts.map(([x, y]) => [-x, y] as const) });
  };
  const headPt: [number, number] = [layout.mastRadiusM, layout.mastHeadM + eavesM];
  for (const cable of radialCables ?? []) both("radial cable", cable.map(([r, z]) => [r, z + eavesM]));
  for (const bay of radialCables ? [] : [layout.outer, layout.inner]) {
    const end: [number, number] = [bay.endRadiusM, bay.endHeightM + eavesM];
    both("radial cable", parabola(headPt, end, bay.sagM));
    const valley: [number, number][] = [];
    for (let i = 0; i <= 16; i++) {
      const r = bay.endRadiusM + ((layout.mastRadiusM - bay.endRadiusM) * i) / 16;
      valley.push([r, capHeightAt(layout.cap, r) + eavesM]);
    }
    both("valley cable", valley);
  }
  both("mast", [[layout.mastRadiusM, 0], headPt]);
  both("backstay", [headPt, [layout.mastRadiusM + layout.backstayRunM, 0]]);
  const a = layout.cap.baseRadiusM;
  both("anchor", [[a, 0], [a, eavesM]]);
  const steps = 40;
  const fabric: [number, number][] = [];
  const inner = radialCables?.find((c) => c.at(-1)![0] < layout.mastRadiusM);
  const outer = radialCables?.find((c) => c.at(-1)![0] > layout.mastRadiusM);
  if (inner && outer) {
    // the fabric spans from node to node of the 3D net: along the mast's own radial cables, flat over the ring
    const half = [...inner].reverse().concat(outer.slice(1)).map(([r, z]) => [r, z + eavesM] as [number, number]);
    fabric.push(...[...half].reverse().map(([r, z]) => [-r, z] as [number, number]), ...half);
  } else {
    for (let s = -steps; s <= steps; s++) {
      const x = (s / steps) * a;
      fabric.push([x, capHeightAt(layout.cap, x) + eavesM]);
    }
  }
  lines.push({ role: "fabric", points: fabric });
  // the closed form's ring, or the 3D net's where given (a free ring finds its own radius and height: at 160 m, 16 m above the closed form's)
  const { radiusM: rc, heightM: zc } = ring ?? { radiusM: layout.centralRingRadiusM, heightM: layout.inner.endHeightM };
  lines.push({ role: "ring", points: [[-rc, zc + eavesM], [rc, zc + eavesM]] });
  const tick = a * 0.005;
  // each circumferential cable at its radius: on the roof in the closed form; in 3D on the radial cable of its side nearest the section's plane (the first given)
  const onCable = (r: number): number => {
    const cable = radialCables?.find((c) => (c.at(-1)![0] < layout.mastRadiusM) === (r < layout.mastRadiusM));
    if (!cable) return capHeightAt(layout.cap, r);
    const k = cable.findIndex((p, i) => i > 0 && (p[0] - r) * (cable[i - 1]![0] - r) <= 0);
    if (k < 0) return capHeightAt(layout.cap, r);
    const [[r0, z0], [r1, z1]] = [cable[k - 1]!, cable[k]!];
    return r1 === r0 ? z1 : z0 + ((z1 - z0) * (r - r0)) / (r1 - r0);
  };
  for (const r of layout.hoopRadiiM) {
    const y = onCable(r) + eavesM;
    both("circumferential cable", [[r - tick, y], [r + tick, y]]);
  }
  return lines;
}

/** The plan: masts (a cross each), their radial cables fanned over each mast's sector, the circumferential cables and the rings (plan x, y, m). */
export function cableNetPlan(layout: CableNetLayout, ringRadiusM = layout.centralRingRadiusM): DrawingLine[] {
  const lines: DrawingLine[] = [];
  const a = layout.cap.baseRadiusM;
  const sector = (2 * Math.PI) / layout.masts;
  const circle = (r: number, steps = 96) => Array.from({ length: steps + 1 }, (_, k) => [r * Math.cos((2 * Math.PI * k) / steps), r * Math.sin((2 * Math.PI * k) / steps)] as const);
  const n = layout.cablesPerSide;
  for (let m = 0; m < layout.masts; m++) {
    const theta = m * sector;
    const mx = layout.mastRadiusM * Math.cos(theta);
    const my = layout.mastRadiusM * Math.sin(theta);
    const arm = a * 0.01;
    lines.push({ role: "mast", points: [[mx - arm, my], [mx + arm, my]] });
    lines.push({ role: "mast", points: [[mx, my - arm], [mx, my + arm]] });
    for (let j = 0; j < n; j++) {
      const phi = theta + sector * ((j + 0.5) / n - 0.5);
      lines.push({ role: "radial cable", points: [[mx, my], [a * Math.cos(phi), a * Math.sin(phi)]] });
      lines.push({ role: "radial cable", points: [[mx, my], [ringRadiusM * Math.cos(phi), ringRadiusM * Math.sin(phi)]] });
    }
  }
  for (const r of layout.hoopRadiiM) lines.push({ role: "circumferential cable", points: circle(r) });
  lines.push({ role: "ring", points: circle(ringRadiusM) });
  lines.push({ role: "fabric", points: circle(a) });
  return lines;
}
