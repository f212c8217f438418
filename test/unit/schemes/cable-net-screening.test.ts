// The rule that lets the net's 3D analysis leave out the lighter uniform combinations
// (kit unboundedCombinations): at the prestress the design found, each lighter uniform combination,
// solved anyway, moves the net less and keeps every cable at least as taut as the heaviest uniform
// one, and pulls no cable harder than the combinations kept do (so the sizes are unchanged). Our
// rule, no source: checked here on the scheme's own model. (Against the heaviest uniform one alone
// a member force is not strictly bounded: a circumferential cable of the 160 m net pulls 0.3 % more
// under the imposed load than under the heavier uniform snow.)
import { describe, it, expect } from "vitest";
import { cableNet } from "../../../src/schemes/cable-net";
import { netNodeLoads } from "../../../src/schemes/cable-net/analysis";
import { solveCableModel } from "../../../src/analysis/cable-solver";
import { planCombinations, unboundedCombinations, uniformPressurePa } from "../../../src/schemes/kit";
import { designBasis } from "../../../src/loads";
import { DEFAULT_BRIEF } from "../../../src/brief";
import { cableNetDesignModel } from "../../helpers/cable-net-design-model";
import { defaultCatalogue } from "../../../src/catalogue/default-catalogue";

const catalogue = defaultCatalogue();

describe("unboundedCombinations (the default brief's 14 combinations)", () => {
  const brief = { ...DEFAULT_BRIEF, spanM: 160, riseM: 16 };
  const combinations = planCombinations(brief);
  it("marks as uniform only the maps with one value over the plan", () => {
    const uniform = combinations.filter((c) => c.uniform).map((c) => c.name);
    expect(uniform).toEqual(expect.arrayContaining(["imposed (6.10b)", "uniform snow (6.10b)", "permanent only (6.10a)", "uniform snow (6.10a)"]));
    expect(uniform.some((n) => n.includes("drifted") || n.includes("wind"))).toBe(false);
  });
  it("keeps every non-uniform map and only the heaviest uniform downward one", () => {
    const kept = unboundedCombinations(combinations, 0.11);
    const uniform = combinations.filter((c) => c.uniform);
    const heaviest = uniform.reduce((h, c) => (uniformPressurePa(c, 0.11) > uniformPressurePa(h, 0.11) ? c : h));
    expect(kept).toContain(heaviest);
    expect(kept.filter((c) => c.uniform)).toEqual([heaviest]);
    expect(kept.length).toBe(combinations.length - uniform.length + 1);
  });
});

describe.each([60, 160])("the screened uniform combinations are bounded by the heaviest on the %i m net", (spanM) => {
  const brief = { ...DEFAULT_BRIEF, spanM, riseM: (spanM * DEFAULT_BRIEF.riseM) / DEFAULT_BRIEF.spanM };
  const o = cableNet.defaults;
  const d = cableNet.design(brief, { ...o, analysis: "3d" }, catalogue);
  it("and the design reports which it left out", () => {
    expect(d.reason).toBe("");
    expect(d.warnings.some((w) => w.startsWith("not analysed, bounded by the heaviest uniform combination"))).toBe(true);
  });
  it("moves less, stays as taut and pulls no cable harder than the combinations kept", () => {
    const { selfWeightKPa, net } = cableNetDesignModel(brief, o, d);
    const basis = designBasis(brief);
    const combinations = planCombinations(brief, basis);
    const kept = unboundedCombinations(combinations, selfWeightKPa);
    const screened = combinations.filter((c) => !kept.includes(c));
    expect(screened.length).toBeGreaterThan(0);
    const heaviest = kept.find((c) => c.uniform)!;
    const s0 = net.model.members.map((m) => m.initialForceN ?? 0);
    const response = (c: (typeof combinations)[number]) => {
      const s = solveCableModel({ ...net.model, loads: netNodeLoads({ basis, selfWeightKPa }, net, c) }, { steps: 1, maxIterations: 30 });
      expect(s.converged).toBe(true);
      let displacement = 0;
      for (let k = 0; k < s.displacementsM.length; k += 3) displacement = Math.max(displacement, Math.hypot(s.displacementsM[k]!, s.displacementsM[k + 1]!, s.displacementsM[k + 2]!));
      const leastShare = Math.min(...s.forcesN.map((f, j) => (s0[j]! > 0 ? f / s0[j]! : Infinity)));
      const family: Record<string, number> = {};
      s.forcesN.forEach((f, j) => {
        const t = net.tags[j]!;
        const key = `${t.family} ${t.index}`;
        family[key] = Math.max(family[key] ?? 0, f);
      });
      return { displacement, leastShare, family };
    };
    const bound = response(heaviest);
    const envelope: Record<string, number> = {};
    for (const c of kept) for (const [key, f] of Object.entries(response(c).family)) envelope[key] = Math.max(envelope[key] ?? 0, f);
    for (const c of screened) {
      const r = response(c);
      expect(r.displacement, c.name).toBeLessThanOrEqual(bound.displacement);
      expect(r.leastShare, c.name).toBeGreaterThanOrEqual(bound.leastShare);
      for (const [key, f] of Object.entries(r.family)) expect(f, `${c.name}: ${key}`).toBeLessThanOrEqual(envelope[key]!);
    }
  });
});
