// The cable net's prestress search (issue 13 item 6, net6): a secant on the worst margin in 1/α on
// the governing combinations, then every combination checked once. Its answer must be the least
// prestress that passes, to within the tolerance the bisection it replaced had (about 6 %: three
// halvings of a bracket that grew by 1.5× a round).
import { describe, it, expect } from "vitest";
import { analyseNet, learnStart, netRoundAt, type NetAnalysisInput, type NetSearchRound } from "../../../src/schemes/cable-net/analysis";
import { cableNetLayout } from "../../../src/schemes/cable-net/geometry";
import { cableNet } from "../../../src/schemes/cable-net";
import { planCombinations, unboundedCombinations } from "../../../src/schemes/kit";
import { designBasis } from "../../../src/loads";
import { DEFAULT_BRIEF } from "../../../src/brief";

const o = cableNet.defaults;

function inputAt(spanM: number, heldCentre: boolean): NetAnalysisInput {
  const brief = { ...DEFAULT_BRIEF, spanM, riseM: spanM / 10 };
  return {
    brief, basis: designBasis(brief), layout: cableNetLayout(brief, o.masts, o.mastRingRatio, o.mastHeightRatio, o.radialCablesPerMast, o.hangerSpacingM),
    combinations: planCombinations(brief), selfWeightKPa: 0.1, seedPrestressN: 20e3, residualPrestress: 0.1, displacementLimitM: spanM / 100,
    maxPrestressN: 100e6, eaN: { outer: 1e9, inner: 1e9, hoop: 5e8, ring: 1e10 }, heldCentre,
  };
}

/** The least passing prestress by plain bisection on the pass/fail of every checked combination (the slow way), to 1 %. */
function bisected(input: NetAnalysisInput, lo: number, hi: number): number {
  expect(netRoundAt(input, hi).pass).toBe(true);
  expect(netRoundAt(input, lo).pass).toBe(false);
  while (hi / lo > 1.01) {
    const mid = Math.sqrt(lo * hi);
    if (netRoundAt(input, mid).pass) hi = mid;
    else lo = mid;
  }
  return hi;
}

describe("the net's prestress search at 60 m", () => {
  for (const held of [true, false]) {
    it(`${held ? "held" : "free"} centre: the prestress found passes every combination and is within 5 % of the least that does (bisection to 1 %)`, () => {
      const input = inputAt(60, held);
      const rounds: NetSearchRound[] = [];
      const a = analyseNet(input, (r) => rounds.push(r));
      expect(a.reason).toBe("");
      const found = a.prestressN;
      const every = netRoundAt(input, found, unboundedCombinations(input.combinations, input.selfWeightKPa));
      expect(every.pass).toBe(true);
      const least = bisected(input, found / 2, found * 1.5);
      expect(found).toBeGreaterThanOrEqual(least / 1.01);
      expect(found / least - 1).toBeLessThan(0.05);
      // the last round reported is the check of every combination at the prestress found
      expect(rounds.at(-1)).toMatchObject({ alphaN: found, pass: true, combinations: every.solved.length });
    });
  }
});

describe("where the net's prestress search starts (learned from the last design of its kind)", () => {
  it("changes the rounds it runs, not the prestress it finds (80 m, held centre)", () => {
    const input = inputAt(80, true);
    const found = analyseNet(input).prestressN;
    const searched = (start: number | null) => {
      if (start !== null) learnStart(input, start);
      const rounds: NetSearchRound[] = [];
      return { prestressN: analyseNet(input, (r) => rounds.push(r)).prestressN, rounds: rounds.length };
    };
    // from well below and well above the answer: the same grid point, to the last bit
    expect(searched(0.6 * found).prestressN).toBe(found);
    expect(searched(1.7 * found).prestressN).toBe(found);
    // learned from that search: the next one starts at its answer and needs the round there, the one a grid step below and the check of every combination
    const again = searched(null);
    expect(again.prestressN).toBe(found);
    expect(again.rounds).toBeLessThanOrEqual(3);
  });
});

describe("what sets the net's prestress (analyseNet governs)", () => {
  it("names the cable, the combination and the share of prestress that the least margin of every combination gives (60 m, held centre)", () => {
    const input = inputAt(60, true);
    const a = analyseNet(input);
    expect(a.reason).toBe("");
    // recomputed here from the forces of every checked combination at the prestress found: the least f/f0 of any prestressed cable
    const every = netRoundAt(input, a.prestressN, unboundedCombinations(input.combinations, input.selfWeightKPa));
    let least = { share: Infinity, combination: "" };
    for (const { c, s } of every.solved) {
      every.net.model.members.forEach((m, j) => {
        const f0 = m.initialForceN ?? 0;
        const share = (s.forcesN[j] as number) / f0;
        if (f0 > 0 && share < least.share) least = { share, combination: c.name };
      });
    }
    const moved = Math.max(...every.solved.map(({ s }) => Math.max(...Array.from({ length: s.displacementsM.length / 3 }, (_, k) => Math.hypot(s.displacementsM[3 * k]!, s.displacementsM[3 * k + 1]!, s.displacementsM[3 * k + 2]!)))));
    // whichever criterion is nearer its limit is the one named (each as the search normalises it: worstOf)
    const cableMargin = (least.share - input.residualPrestress) / (1 - input.residualPrestress);
    const moveMargin = 1 - moved / input.displacementLimitM;
    if (cableMargin <= moveMargin) {
      expect(a.governs).toContain(`under ${least.combination}: it keeps ${(100 * least.share).toFixed(1)} % of its`);
      expect(a.governs).toMatch(/against 10 % required$/);
      expect(least.share).toBeGreaterThanOrEqual(input.residualPrestress);
    } else {
      expect(a.governs).toContain(`${moved.toFixed(2)} m, against a limit of ${input.displacementLimitM.toFixed(2)} m`);
    }
  });
});
