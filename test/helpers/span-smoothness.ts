// The span-smoothness property (test/property/span-smoothness*.test.ts), shared so its slowest
// schemes run in files of their own, side by side in the node project's workers.
import { describe, expect, it } from "vitest";
import { defaultCatalogue } from "../../src/catalogue/default-catalogue";
import { SCHEMES } from "../../src/schemes";
import type { SchemeId } from "../../src/schemes/types";
import { runSpanStudy, type SpanPoint } from "../../src/comparison";
import { readFileSync } from "node:fs";
import { studyFromJson, type Study } from "../../src/study";

// Issue 12 item 5: along 40–400 m in 5 m steps no metric of a feasible, in-range scheme changes by
// more than 15 % between neighbouring spans, unless the scheme names a regime change there.
const METRICS = ["selfWeightKgPerM2", "carbonKgCO2ePerM2Floor", "costPerM2Floor", "massToAir"] as const;
const LIMIT = 0.15;

/**
 * Schemes that still jump at the time of writing (issue 12 item 5 open for them): the test runs
 * them and expects the failure, so the day one becomes smooth this test says so and it must be
 * moved back to the list that holds. A jump is allowed only where the scheme's named regime
 * (Design.regime) changes, and the regime must not flip back within 3 steps.
 */
// Measured at 11:40 on 3 Dec (smooth4: within 2 % of the least the proportions nearest their
// reference are kept; the net's mast count scanned every 3rd value with its reference growing with
// span): cable net holds (3 → 13 masts rising monotonically, largest jump 7.1 %); the cable dome
// jumped 15.9–16 % in mass ÷ air (100 m, 180 m) while its ring-height reference (0.06) sat below the
// flat part of its objective — with the reference at 0.11 × span (12:10, lead) it holds, largest jump
// 12.2 % (0.10 would not: 15.1 % at 40→45 m; see its declaration). Truss (4 %) and shell (smooth to
// 115 m, ribbed from 120 m; 13.5 %) hold. Geodesic dome (9 jumps, largest 38 %) and timber dome (11,
// 25 %) jumped in mass ÷ air while their rise wandered between about 0.15 and 0.3 × span, following
// the ±5 % steps of the objective from one mesh frequency to the next; since search5 (13:20) their
// rise is chosen on the trend of the objective (a least-squares quadratic through six rises,
// src/pipeline/rise-trend.ts) and both hold: geodesic largest jump 12.5 %, timber 7.8 %.
export const KNOWN_FAILING: readonly SchemeId[] = [];

/** Every neighbour-to-neighbour change over the limit, where both ends are feasible and in range and the regime is the same. */
function jumps(points: readonly SpanPoint[]): { from: number; to: number; metric: string; change: number }[] {
  const sorted = [...points].sort((a, b) => a.spanM - b.spanM);
  const out: { from: number; to: number; metric: string; change: number }[] = [];
  sorted.forEach((p, i) => {
    const q = sorted[i - 1];
    if (!q || q.status !== "feasible" || p.status !== "feasible" || q.regime !== p.regime) return;
    for (const m of METRICS) {
      const change = Math.abs(p[m] - q[m]) / Math.abs(q[m]);
      if (Number.isFinite(change) && change > LIMIT) out.push({ from: q.spanM, to: p.spanM, metric: m, change });
    }
  });
  return out;
}

/** Where the named regime flips back within 3 steps (A at one span, B at the next, A again at most 3 steps on), among feasible points. */
function flips(points: readonly SpanPoint[]): { from: number; to: number; regimes: string }[] {
  const sorted = [...points].filter((p) => p.status === "feasible").sort((a, b) => a.spanM - b.spanM);
  const out: { from: number; to: number; regimes: string }[] = [];
  sorted.forEach((p, i) => {
    const q = sorted[i + 1];
    if (!q || q.regime === p.regime) return;
    const back = sorted.slice(i + 2, i + 4).find((r) => r.regime === p.regime);
    if (back) out.push({ from: p.spanM, to: back.spanM, regimes: `${p.regime} → ${q.regime} → ${back.regime}` });
  });
  return out;
}

/** A jump over the limit that is known and explained: the test expects exactly these (no other, and not fewer: the day one goes, the record must). */
export interface KnownJump {
  id: SchemeId;
  from: number;
  to: number;
  metric: (typeof METRICS)[number];
}

/**
 * The cable net's known jumps on the default study: none since its mast count is refined on 3D designs
 * (5 Dec, lead). Before, self-weight stepped +18.9 % at 65 → 70 m (carbon per m² of floor, the
 * objective, +5.9 %): at 65 m the inner bay gained its third circumferential cable (geometry.ts
 * evenlyBetween) and with 3 masts its prestress was then set by a circumferential cable under wind
 * uplift; the 3D designs choose 4–5 masts there, where the step is gone.
 *
 * Since the mast ring carries the mast height with it (5 Dec, lead: declaration.ts, `carries`) one
 * self-weight step of +15.1 % at 110 → 115 m (6.30 → 7.25 kg/m²; carbon, the objective, 82.1 → 81.0
 * kgCO2e/m² of floor, −1.3 %): the 3D objective has a flat diagonal valley of (ring, mast height)
 * pairs, and the two spans land at different ends of it, 0.65/0.13 and 0.55/0.18. At 110 m the other
 * end is within the 2 % band (0.55/0.18: 81.4 against 82.1, 7.21 kg/m²), so the self-weight there can
 * be either, measured.
 */
export const KNOWN_JUMPS: readonly KnownJump[] = [{ id: "cable-net", from: 110, to: 115, metric: "selfWeightKgPerM2" }];
/** The demo study's: none (before the mast count was refined on 3D designs its step at 65 → 70 m was 15.0 %, just under the limit). */
export const KNOWN_JUMPS_DEMO: readonly KnownJump[] = [];

/** A regime that flips back and is known and explained (flips): expected exactly, like the known jumps. */
export interface KnownFlip {
  id: SchemeId;
  from: number;
  to: number;
  regimes: string;
}

/**
 * The cable net's mast count is chosen on 3D designs (5 Dec, lead: src/pipeline/refine-in-full.ts,
 * chosenCount): the least of the counts designed. Over 100–400 m the 3D objective is flat across 5–7
 * masts, the neighbours within 1–2 % of each other (demo study, at the screened mast height: 125 m,
 * 5 masts 118.6, 6 masts 114.8 kgCO2e/m² of floor; 255 m, 132.1 and 129.7), so where two counts cross
 * the count flips to the other for a span and back; no metric moves more than the limit there. Other
 * rules flipped as often or more on the demo study (the screened count kept unless a sample was better
 * by 2 %: 3 flips; the fewest within 3 % of the least: 16; the quadratic trend's choice: 6), so these
 * few are recorded. Measured. With the cited factors as defaults (5 Dec, later: hollow sections 2.13
 * where 1.94 was held, so a catalogue mast no longer undercuts a fabricated one by as much) the default
 * study's two flips (350 → 360 and 375 → 385 m, 6 → 7 → 6 masts) and the demo's at 300 → 315 m went.
 */
export const KNOWN_FLIPS: readonly KnownFlip[] = [];
export const KNOWN_FLIPS_DEMO: readonly KnownFlip[] = [
  { id: "cable-net", from: 370, to: 380, regimes: "6 masts → 5 masts → 6 masts" },
];

/** The property for the given schemes on one study's brief; the schemes in `knownFailing` are expected to fail (it.fails); `knownJumps` and `knownFlips` are expected exactly. */
export function smoothnessSuite(title: string, study: () => Study, knownFailing: readonly SchemeId[], schemeIds: (id: SchemeId) => boolean, knownJumps: readonly KnownJump[] = [], knownFlips: readonly KnownFlip[] = []): void {
  describe(title, () => {
    const catalogue = defaultCatalogue();
    for (const model of SCHEMES.filter((m) => schemeIds(m.id))) {
      const run = knownFailing.includes(model.id) ? it.fails : it;
      run(`${model.id}: no metric jumps more than 15 % between neighbours without a named regime change (but the known ones), and the regime does not flip back`, () => {
        const points = runSpanStudy(study(), catalogue, { fromM: 40, toM: 400, stepM: 5 }, { schemeIds: [model.id] });
        const known = knownJumps.filter((j) => j.id === model.id).map(({ from, to, metric }) => ({ from, to, metric }));
        expect(jumps(points).map(({ from, to, metric }) => ({ from, to, metric }))).toEqual(known);
        expect(flips(points)).toEqual(knownFlips.filter((f) => f.id === model.id).map(({ from, to, regimes }) => ({ from, to, regimes })));
      }, 400_000); // each scheme: 73 spans, each with its proportion search (about 3–170 s here)
    }
  });
}

// The same property on the demo study's brief (the Quillbridge arena: another eaves height, clear
// height and height limit), not only on the default one. Found at 18:00 on 3 Dec (lead, CLI sweep):
// the geodesic dome jumps 19.4 % in mass ÷ air (self-weight +13.9 %) at 220 → 225 m with no regime
// change, where its trend-chosen rise drops from 40.7 to 37.9 m and its struts go from 12.5 to
// 13.5 m; the same at the start of that stop (75b9e13). Cause (search7): the rise trend was sampled
// at the strut length a descent found at the reference rise, a noisy local optimum that stepped
// between spans. Since search8 (20:10) the geodesic declares its trend sampled at its reference
// proportions (7 rises at the 5 m reference strut, no descent first) and holds on both studies:
// largest jump 12.9 % (demo, mass ÷ air, 225→230 m), 10.6 % (default, 170→175 m). The timber dome
// keeps its samples at the searched member length (at its reference they jumped 32–42 %).
export const KNOWN_FAILING_DEMO: readonly SchemeId[] = [];

export function demoStudy(): Study {
  const loaded = studyFromJson(readFileSync("data/demo-study.json", "utf8"));
  if (!loaded.ok) throw new Error("the demo study does not load");
  return loaded.study;
}
