import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { readFileSync } from "node:fs";
import { studyFromJson, setIn, type Study } from "../../src/study";
import { defaultCatalogue } from "../../src/catalogue/default-catalogue";
import { SCHEMES } from "../../src/schemes";
import { runRisk, RISK_METRICS, type UncertainInput } from "../../src/risk";

// Small runs (tens of samples, a few design draws) keep these fast; the invariants do not depend on N.
const catalogue = defaultCatalogue();
function demo(): Study {
  const r = studyFromJson(readFileSync("data/demo-study.json", "utf8"));
  if (!r.ok) throw new Error("demo study invalid");
  return r.study;
}
const base = demo();
const small = { designSamples: 3 };
const withInputs = (study: Study, inputs: UncertainInput[]): Study => setIn(study, ["risk", "inputs"], inputs);
// Ranges are stored around the study's value: a point range is factor 1 (or offset 0) at both ends.
const pointInputs = (study: Study) => study.risk.inputs.map((i) => ({ ...i, low: i.scale === "factor" ? 1 : 0, high: i.scale === "factor" ? 1 : 0 }));

describe(`runRisk invariants (schemes registered: ${SCHEMES.map((s) => s.id).join(", ")})`, () => {
  it("P10 ≤ P50 ≤ P90 for every scheme and metric", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 2 ** 31 - 1 }), fc.integer({ min: 10, max: 40 }), (seed, samples) => {
        const result = runRisk(base, catalogue, { samples, seed, ...small });
        for (const s of result.schemes) {
          for (const metric of RISK_METRICS) {
            const m = s.metrics[metric];
            if (!m) continue;
            expect(m.p10).toBeLessThanOrEqual(m.p50);
            expect(m.p50).toBeLessThanOrEqual(m.p90);
          }
        }
      }),
      { numRuns: 4 },
    );
  });

  it("the probabilities of being lowest sum to 1 over the feasible schemes, in carbon and in cost", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 2 ** 31 - 1 }), (seed) => {
        const result = runRisk(base, catalogue, { samples: 30, seed, ...small });
        if (result.samplesWithFeasible === 0) return;
        expect(result.schemes.reduce((sum, s) => sum + s.pLowestCarbon, 0)).toBeCloseTo(1, 12);
        expect(result.schemes.reduce((sum, s) => sum + s.pLowestCost, 0)).toBeCloseTo(1, 12);
        for (const pair of result.pairwise) {
          const reverse = result.pairwise.find((p) => p.metric === pair.metric && p.a === pair.b && p.b === pair.a);
          if (pair.n > 0) expect(pair.pABeatsB + (reverse?.pABeatsB ?? Number.NaN)).toBeCloseTo(1, 12);
        }
      }),
      { numRuns: 4 },
    );
  });

  it("ranges of zero width reproduce the deterministic result exactly", () => {
    const study = withInputs(base, pointInputs(base));
    const result = runRisk(study, catalogue, { samples: 12, seed: 1, ...small });
    for (const s of result.schemes) {
      for (const metric of RISK_METRICS) {
        const m = s.metrics[metric];
        if (!m) continue;
        expect(m.p10).toBe(m.deterministic);
        expect(m.p50).toBe(m.deterministic);
        expect(m.p90).toBe(m.deterministic);
      }
    }
  });

  it("widening a range about its mode never narrows P10–P90 (same seed)", () => {
    // One carbon factor uncertain, the rest fixed: carbon is then linear in it, so the theorem holds.
    const carbonInputs = base.risk.inputs.filter((i) => i.path[0] === "carbon" && i.path[3] === "a1a3KgCO2ePerKg" && i.scale === "factor");
    fc.assert(
      fc.property(fc.integer({ min: 0, max: carbonInputs.length - 1 }), fc.double({ min: 1, max: 3, noNaN: true }), fc.integer({ min: 0, max: 1e6 }), (index, k, seed) => {
        const chosen = carbonInputs[index] as UncertainInput;
        const others = pointInputs(base).filter((i) => i.id !== chosen.id);
        // Factors on the study's value: the mode is 1.
        const factor = Math.min(k, 1 / (1 - chosen.low)); // stay ≥ 0
        const wider = { ...chosen, low: Math.max(0, 1 - factor * (1 - chosen.low)), high: 1 + factor * (chosen.high - 1) };
        const narrow = runRisk(withInputs(base, [...others, chosen]), catalogue, { samples: 40, seed, ...small });
        const wide = runRisk(withInputs(base, [...others, wider]), catalogue, { samples: 40, seed, ...small });
        narrow.schemes.forEach((s, i) => {
          const a = s.metrics.carbonKgCO2ePerM2Floor;
          const b = wide.schemes[i]?.metrics.carbonKgCO2ePerM2Floor;
          if (!a || !b) return;
          expect(b.p90 - b.p10).toBeGreaterThanOrEqual((a.p90 - a.p10) * (1 - 1e-9) - 1e-9);
        });
      }),
      { numRuns: 5 },
    );
  });

  it("the same study and seed repeat byte for byte; another seed differs", () => {
    const a = JSON.stringify(runRisk(base, catalogue, { samples: 25, seed: 99, ...small }));
    expect(JSON.stringify(runRisk(base, catalogue, { samples: 25, seed: 99, ...small }))).toBe(a);
    expect(JSON.stringify(runRisk(base, catalogue, { samples: 25, seed: 100, ...small }))).not.toBe(a);
  });
});
