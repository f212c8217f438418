import { describe, expect, it } from "vitest";
import { searchProportions, riseSettingFor, commonRiseM, FORM_TIE_FRACTION, MAX_EVALUATIONS, PROPORTION_TIE_FRACTION, type RiseSetting } from "../../../src/pipeline/proportions";
import { infeasibleDesign } from "../../../src/schemes/kit";
import { DEFAULT_BRIEF } from "../../../src/brief";
import type { Design, OptionSpec, SchemeModel, SchemeOptions } from "../../../src/schemes/types";

// The search on made-up objective functions whose minimum is known (no scheme involved).
const spec = (key: string, min: number, max: number, step: number, integer = false): OptionSpec => ({ key, label: key, kind: "number", unit: "", min, max, step, integer, source: "test", free: true });
const model = (options: OptionSpec[], defaults: SchemeOptions, riseSpanRatio?: SchemeModel["riseSpanRatio"]): SchemeModel =>
  ({ id: "cable-dome", label: "Test", colour: "#000", description: "", clientNotes: ["test"], validSpanM: { min: 0, max: 1000 }, options, defaults, ...(riseSpanRatio ? { riseSpanRatio } : {}), design: () => { throw new Error("not used"); } }) as SchemeModel;
const feasible = (): Design => ({ ...infeasibleDesign("cable-dome", DEFAULT_BRIEF, ""), status: "feasible", feasible: true });
const fixed: RiseSetting = { kind: "fixed", riseM: 20, source: "common" };
/** Of a grid, the value nearest `reference` whose objective is within PROPORTION_TIE_FRACTION of the least (the search's rule on a proportion). */
const nearestInBand = (grid: readonly number[], objective: (x: number) => number, reference: number): number => {
  const least = Math.min(...grid.map(objective));
  const band = grid.filter((x) => objective(x) <= least + PROPORTION_TIE_FRACTION * Math.abs(least));
  return band.reduce((a, b) => (Math.abs(b - reference) < Math.abs(a - reference) ? b : a));
};
const grid = (min: number, max: number, step: number) => Array.from({ length: Math.round((max - min) / step) + 1 }, (_, i) => Number((min + i * step).toFixed(9)));

describe("proportion search", () => {
  // The rule changed with the preference band (smooth4): within PROPORTION_TIE_FRACTION of the least,
  // the proportion nearest its reference (the set value) is chosen, no longer the exact least.
  it("of a smooth bowl over two free options finds the least count and, of the depths within the band of the least, the one nearest the set value", () => {
    const m = model([spec("hoops", 1, 12, 1, true), spec("depth", 0.05, 0.5, 0.01)], { hoops: 3, depth: 0.1 });
    let calls = 0;
    const bowl = (o: SchemeOptions) => 10 + ((o.hoops as number) - 7) ** 2 + 100 * ((o.depth as number) - 0.31) ** 2;
    const { choice } = searchProportions(m, m.defaults, [], fixed, "mass", (o) => {
      calls++;
      return { ...feasible(), totalMassKg: bowl(o) };
    }, (d) => d.totalMassKg);
    expect(choice.proportions.hoops).toBe(7);
    // between the band's point nearest the set value 0.1 (0.27) and the least (0.31), moved toward 0.1 by a bisection of few designs
    expect(choice.proportions.depth).toBeGreaterThanOrEqual(nearestInBand(grid(0.05, 0.5, 0.01), (d) => bowl({ hoops: 7, depth: d }), 0.1) - 1e-9);
    expect(choice.proportions.depth).toBeLessThan(0.31);
    expect(choice.value).toBeLessThanOrEqual(10 * (1 + PROPORTION_TIE_FRACTION));
    expect(choice.searched).toEqual(["hoops", "depth"]);
    expect(calls).toBeLessThanOrEqual(MAX_EVALUATIONS);
    expect(choice.runnerUp).not.toBeNull();
    // the runner-up may now be the least itself, lower by at most the band
    expect(choice.runnerUp!.differencePct).not.toBe(0);
    expect(choice.runnerUp!.differencePct).toBeGreaterThanOrEqual(-100 * PROPORTION_TIE_FRACTION);
  });

  it("leaves a pinned option where the user set it, and skips infeasible candidates", () => {
    const m = model([spec("hoops", 1, 12, 1, true), spec("depth", 0.05, 0.5, 0.01)], { hoops: 3, depth: 0.1 });
    const { choice, chosen } = searchProportions(m, { hoops: 4, depth: 0.1 }, ["hoops"], fixed, "carbon", (o) => {
      const bad = (o.depth as number) > 0.2; // the least value lies where the design is infeasible
      return { ...(bad ? infeasibleDesign("cable-dome", DEFAULT_BRIEF, "fails") : feasible()), totalMassKg: 1 - (o.depth as number) };
    }, (d) => d.totalMassKg);
    expect(chosen.options.hoops).toBe(4);
    expect(choice.pinned).toEqual(["hoops"]);
    expect(choice.searched).toEqual(["depth"]);
    expect(choice.proportions.depth).toBeCloseTo(nearestInBand(grid(0.05, 0.2, 0.01), (d) => 1 - d, 0.1), 9); // 0.19: the least feasible is 0.2, within the band
  });

  it("searches the rise within the scheme's rise/span range and the height limit under the 'own' rule", () => {
    const m = model([], {}, { min: 0.05, max: 0.3, preferred: 0.15 });
    const brief = { ...DEFAULT_BRIEF, spanM: 160, riseM: 24, eavesHeightM: 12, heightLimitM: 40, riseRule: "own" as const };
    const rise = riseSettingFor(m, brief, 160, undefined);
    expect(rise).toMatchObject({ kind: "search", minM: 8, maxM: 28 }); // 0.3 × 160 = 48 cut to 40 − 12
    const { choice } = searchProportions(m, {}, [], rise as RiseSetting, "mass", (_o, riseM) => ({ ...feasible(), totalMassKg: (riseM - 25) ** 2 }), (d) => d.totalMassKg);
    expect(choice.riseM).toBeCloseTo(25, 0);
    expect(choice.riseSource).toBe("searched");
    expect(riseSettingFor(m, brief, 160, 18)).toEqual({ kind: "fixed", riseM: 18, source: "pinned" });
    expect(riseSettingFor(m, { ...brief, riseRule: "common" }, 160, undefined)).toEqual({ kind: "fixed", riseM: 24, source: "common" });
    expect(riseSettingFor(m, { ...brief, heightLimitM: 18 }, 160, undefined)).toMatchObject({ kind: "none", reason: expect.stringMatching(/height limit 18 m/) });
  });

  it("with nothing to search designs once and assesses nothing", () => {
    const m = model([], {});
    let assessed = 0;
    const { choice } = searchProportions(m, {}, [], fixed, "carbon", () => feasible(), () => ++assessed);
    expect(assessed).toBe(0);
    expect(choice.evaluations).toBe(1);
    expect(choice.runnerUp).toBeNull();
  });

  it("tries every value of a count: finds the least of a bumpy objective the descent alone stalls on", () => {
    // a count with a local minimum at 3 next to the start and the global one at 9, and a smooth proportion
    const m = model([spec("masts", 3, 12, 1, true), spec("ratio", 0.3, 0.9, 0.05)], { masts: 4, ratio: 0.6 });
    const bumpy: Record<number, number> = { 3: 40, 4: 41, 5: 42, 6: 43, 7: 42, 8: 41, 9: 38, 10: 39, 11: 40, 12: 41 };
    let calls = 0;
    const { choice } = searchProportions(m, m.defaults, [], fixed, "mass", (o) => {
      calls++;
      return { ...feasible(), totalMassKg: bumpy[o.masts as number]! + 50 * ((o.ratio as number) - 0.45) ** 2 };
    }, (d) => d.totalMassKg);
    expect(choice.proportions.masts).toBe(9);
    expect(choice.proportions.ratio).toBeCloseTo(nearestInBand(grid(0.3, 0.9, 0.05), (r) => 38 + 50 * (r - 0.45) ** 2, 0.6), 9); // 0.55 (least at 0.45)
    expect(calls).toBe(choice.evaluations);
    expect(calls).toBeLessThanOrEqual(MAX_EVALUATIONS);
  });

  it("of forms within the tie band chooses the simplest (first declared, fewer), and outside it the least", () => {
    const m = model([{ key: "form", label: "form", kind: "select", unit: "", choices: [{ value: "plain", label: "" }, { value: "fancy", label: "" }], source: "test", free: true }], { form: "fancy" });
    const run = (fancyBetterBy: number) =>
      searchProportions(m, m.defaults, [], fixed, "mass", (o) => ({ ...feasible(), totalMassKg: o.form === "plain" ? 100 : 100 * (1 - fancyBetterBy) }), (d) => d.totalMassKg).choice.proportions.form;
    expect(run(FORM_TIE_FRACTION / 2)).toBe("plain");
    expect(run(FORM_TIE_FRACTION * 2)).toBe("fancy");
  });

  it("searches and reports a proportion declared free only while its condition holds", () => {
    const form: OptionSpec = { key: "form", label: "form", kind: "select", unit: "", choices: [{ value: "smooth", label: "" }, { value: "ribbed", label: "" }], source: "test", free: true };
    const ribs = { ...spec("ribs", 3, 20, 0.5), freeWhen: { key: "form", value: "ribbed" } } as OptionSpec;
    const m = model([form, ribs], { form: "smooth", ribs: 8 });
    const cost = (ribbedBest: number) => (o: SchemeOptions) => ({ ...feasible(), totalMassKg: o.form === "smooth" ? 100 : ribbedBest + ((o.ribs as number) - 6) ** 2 });
    const smooth = searchProportions(m, m.defaults, [], fixed, "mass", cost(120), (d) => d.totalMassKg).choice;
    expect(smooth.proportions).toEqual({ form: "smooth" });
    expect(smooth.searched).toEqual(["form"]);
    const ribbed = searchProportions(m, m.defaults, [], fixed, "mass", cost(80), (d) => d.totalMassKg).choice;
    expect(ribbed.proportions).toEqual({ form: "ribbed", ribs: nearestInBand(grid(3, 20, 0.5), (r) => 80 + (r - 6) ** 2, 8) }); // 7 (least at 6)
    expect(ribbed.searched).toEqual(["form", "ribs"]);
  });

  it("reports a rise only for a scheme with a rise of its own", () => {
    const m = model([spec("depth", 0.05, 0.5, 0.01)], { depth: 0.1 });
    const { choice } = searchProportions(m, m.defaults, [], fixed, "mass", (o) => ({ ...feasible(), totalMassKg: o.depth as number }), (d) => d.totalMassKg);
    expect(Object.keys(choice.proportions)).toEqual(["depth"]);
    const withRise = model([spec("depth", 0.05, 0.5, 0.01)], { depth: 0.1 }, { min: 0.1, max: 0.2, preferred: 0.15 });
    expect(Object.keys(searchProportions(withRise, withRise.defaults, [], fixed, "mass", () => feasible(), (d) => d.totalMassKg).choice.proportions)).toEqual(["depth", "riseM"]);
  });

  it("the common rise keeps the brief's rise/span ratio within the height limit", () => {
    const brief = { ...DEFAULT_BRIEF, spanM: 160, riseM: 24, eavesHeightM: 12, heightLimitM: 60 };
    expect(commonRiseM(brief, 160)).toBe(24);
    expect(commonRiseM(brief, 80)).toBe(12);
    expect(commonRiseM(brief, 400)).toBe(48); // 60 would pass the 60 m limit over 12 m eaves
  });

  it("scans a count of more values than MAX_FORMS at every k-th value, then next to the best: finds a least between the scanned ones", () => {
    const m = model([spec("masts", 3, 48, 1, true)], { masts: 3 });
    const bumpy = (n: number) => 50 + 2 * Math.abs(n - 20); // 20 is not on the every-3rd grid from 3 (…, 18, 21, …)
    let calls = 0;
    const { choice } = searchProportions(m, m.defaults, [], fixed, "mass", (o) => {
      calls++;
      return { ...feasible(), totalMassKg: bumpy(o.masts as number) };
    }, (d) => d.totalMassKg);
    expect(choice.proportions.masts).toBe(20);
    expect(calls).toBeLessThanOrEqual(MAX_EVALUATIONS);
  });

  it("of counts of equal merit keeps the one nearest its reference, which grows with the span when declared per metre of span", () => {
    const masts = { ...spec("masts", 3, 48, 1, true), referencePerSpanM: 12 / 365 } as OptionSpec;
    const m = model([masts], { masts: 12 });
    const flat = (o: SchemeOptions) => ({ ...feasible(), totalMassKg: 40 + 0.001 * (o.masts as number) }); // within the tie band across all counts
    const at = (spanM: number) => searchProportions(m, m.defaults, [], fixed, "mass", flat, (d) => d.totalMassKg, spanM).choice.proportions.masts;
    expect(at(365)).toBe(12);
    expect(at(160)).toBe(5); // 12 × 160 / 365 = 5.26
    expect(at(60)).toBe(3); // 1.97, below the least count 3
    expect(searchProportions(model([spec("masts", 3, 48, 1, true)], { masts: 12 }), { masts: 12 }, [], fixed, "mass", flat, (d) => d.totalMassKg, 160).choice.proportions.masts).toBe(12); // no per-span reference: the set value
  });

  it("does not try a count below its searchMin (the value that asks the scheme to choose) and reports the real count", () => {
    const hoops = { ...spec("hoops", 0, 8, 1, true), searchMin: 1 } as OptionSpec;
    const m = model([hoops], { hoops: 0 });
    const tried: number[] = [];
    const { choice } = searchProportions(m, m.defaults, [], fixed, "mass", (o) => {
      tried.push(o.hoops as number);
      return { ...feasible(), totalMassKg: 10 + Math.abs((o.hoops as number) - 2) };
    }, (d) => d.totalMassKg);
    expect(tried).not.toContain(0);
    expect(choice.proportions.hoops).toBe(2);
  });
});

describe("when no form works", () => {
  it("reports the last form tried in declaration order, whose reason says what lies beyond the scheme (a 300 m shell said 'choose the ribbed form' while that failed too)", () => {
    const form: OptionSpec = { key: "form", label: "form", kind: "select", unit: "", choices: [{ value: "smooth", label: "smooth" }, { value: "ribbed", label: "ribbed" }], source: "test", free: true };
    const m = model([form, spec("depth", 0.05, 0.5, 0.05)], { form: "smooth", depth: 0.1 });
    const { chosen, choice } = searchProportions(m, m.defaults, [], fixed, "carbon", (o) =>
      infeasibleDesign("cable-dome", DEFAULT_BRIEF, o.form === "smooth" ? "choose the ribbed form" : "choose another scheme"), (d) => d.totalMassKg);
    expect(chosen.design.reason).toBe("choose another scheme");
    expect(choice.proportions.form).toBe("ribbed");
    expect(Number.isFinite(choice.value)).toBe(false);
  });

  it("leaves the choice alone when some candidate works", () => {
    const form: OptionSpec = { key: "form", label: "form", kind: "select", unit: "", choices: [{ value: "smooth", label: "smooth" }, { value: "ribbed", label: "ribbed" }], source: "test", free: true };
    const m = model([form], { form: "smooth" });
    const { chosen } = searchProportions(m, m.defaults, [], fixed, "mass", (o) => (o.form === "smooth" ? { ...feasible(), totalMassKg: 5 } : infeasibleDesign("cable-dome", DEFAULT_BRIEF, "fails")), (d) => d.totalMassKg);
    expect(chosen.options.form).toBe("smooth");
  });
});

describe("a search reference apart from the default", () => {
  it("on a flat objective keeps the candidate nearest searchReference, not the default", () => {
    const ring: OptionSpec = { ...spec("ring", 0, 0.15, 0.005), searchReference: 0.11 } as OptionSpec;
    const m = model([ring], { ring: 0.06 });
    const { choice } = searchProportions(m, m.defaults, [], fixed, "mass", () => ({ ...feasible(), totalMassKg: 7 }), (d) => d.totalMassKg);
    expect(choice.proportions.ring).toBeCloseTo(0.11, 9);
  });
});
