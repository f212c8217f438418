import { describe, expect, it } from "vitest";
import { searchProportions, riseSettingFor, commonRiseM, MAX_EVALUATIONS, type RiseSetting } from "../../../src/pipeline/proportions";
import { infeasibleDesign } from "../../../src/schemes/kit";
import { DEFAULT_BRIEF } from "../../../src/brief";
import type { Design, OptionSpec, SchemeModel, SchemeOptions } from "../../../src/schemes/types";

// The search on made-up objective functions whose minimum is known (no scheme involved).
const spec = (key: string, min: number, max: number, step: number, integer = false): OptionSpec => ({ key, label: key, kind: "number", unit: "", min, max, step, integer, source: "test", free: true });
const model = (options: OptionSpec[], defaults: SchemeOptions, riseSpanRatio?: SchemeModel["riseSpanRatio"]): SchemeModel =>
  ({ id: "cable-dome", label: "Test", colour: "#000", description: "", validSpanM: { min: 0, max: 1000 }, options, defaults, ...(riseSpanRatio ? { riseSpanRatio } : {}), design: () => { throw new Error("not used"); } }) as SchemeModel;
const feasible = (): Design => ({ ...infeasibleDesign("cable-dome", DEFAULT_BRIEF, ""), status: "feasible", feasible: true });
const fixed: RiseSetting = { kind: "fixed", riseM: 20, source: "common" };

describe("proportion search", () => {
  it("finds the least of a smooth bowl over two free options, from the defaults", () => {
    const m = model([spec("hoops", 1, 12, 1, true), spec("depth", 0.05, 0.5, 0.01)], { hoops: 3, depth: 0.1 });
    let calls = 0;
    const bowl = (o: SchemeOptions) => 10 + ((o.hoops as number) - 7) ** 2 + 100 * ((o.depth as number) - 0.31) ** 2;
    const { choice } = searchProportions(m, m.defaults, [], fixed, "mass", (o) => {
      calls++;
      return { ...feasible(), totalMassKg: bowl(o) };
    }, (d) => d.totalMassKg);
    expect(choice.proportions.hoops).toBe(7);
    expect(choice.proportions.depth).toBeCloseTo(0.31, 2);
    expect(choice.searched).toEqual(["hoops", "depth"]);
    expect(calls).toBeLessThanOrEqual(MAX_EVALUATIONS);
    expect(choice.runnerUp).not.toBeNull();
    expect(choice.runnerUp!.differencePct).toBeGreaterThan(0);
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
    expect(choice.proportions.depth).toBeCloseTo(0.2, 9);
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

  it("the common rise keeps the brief's rise/span ratio within the height limit", () => {
    const brief = { ...DEFAULT_BRIEF, spanM: 160, riseM: 24, eavesHeightM: 12, heightLimitM: 60 };
    expect(commonRiseM(brief, 160)).toBe(24);
    expect(commonRiseM(brief, 80)).toBe(12);
    expect(commonRiseM(brief, 400)).toBe(48); // 60 would pass the 60 m limit over 12 m eaves
  });
});
