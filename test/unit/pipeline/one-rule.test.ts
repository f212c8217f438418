// @vitest-environment happy-dom
// One rule for every consumer (issue 12 items 2 and 4): the pages' reactive designs, the risk
// analysis and a scheme's screening options all give the design evaluateStudy gives.
import { describe, it, expect } from "vitest";
import demo from "../../../data/demo-study.json";
import { defaultStudy, setIn } from "../../../src/study";
import { defaultCatalogue } from "../../../src/catalogue/default-catalogue";
import { designAtBestProportions, designWithChoice, evaluateStudy } from "../../../src/pipeline";
import { createStudyStore } from "../../../src/notebook/study-store";
import { workerStudySignals, type Designer } from "../../../src/notebook/worker-scheme-signals";
import { designJob } from "../../../src/comparison/design-job";
import { effect } from "@preact/signals-core";
import { SCHEMES, infeasibleDesign } from "../../../src/schemes";
import { DEFAULT_BRIEF } from "../../../src/brief";
import type { Design, OptionSpec, SchemeModel, SchemeOptions } from "../../../src/schemes/types";

const catalogue = defaultCatalogue();
const ownRule = setIn(defaultStudy(), ["brief", "riseRule"], "own");
const evaluated = evaluateStudy(ownRule, catalogue).results;

describe("one rule: each scheme at its best proportions, everywhere", () => {
  it("a page's reactive results are evaluateStudy's figures, proportions and rise", async () => {
    localStorage.clear();
    const store = createStudyStore({ initial: demo, persist: false });
    store.replace(ownRule);
    // the pages' signals with the design worker's own job run in-process
    const inProcess: Designer = async (id, brief, setting, tables) => designJob(id, brief, setting, tables, catalogue);
    const { results } = workerStudySignals(store, [inProcess]);
    const page = await new Promise<NonNullable<typeof results.value>>((resolve) => {
      const stop = effect(() => {
        const list = results.value;
        if (list !== null) queueMicrotask(() => (stop(), resolve(list)));
      });
    });
    const pipeline = evaluated;
    expect(page.map((r) => r.id)).toEqual(pipeline.map((r) => r.id));
    pipeline.forEach((r, i) => {
      expect(page[i]?.figures).toEqual(r.figures);
      expect(page[i]?.proportions).toEqual(r.proportions);
      expect(page[i]?.brief?.riseM).toBe(r.brief?.riseM);
    });
    // the search really chose something: at least one scheme's rise is its own, not the brief's
    expect(pipeline.some((r) => r.proportions?.riseSource === "searched" && r.brief?.riseM !== ownRule.brief.riseM)).toBe(true);
  });

  it("a draw at the study's own values designs every scheme exactly as the pipeline chose it (the risk analysis's base)", () => {
    for (const r of evaluated) {
      const model = SCHEMES.find((m) => m.id === r.id)!;
      const again = designWithChoice(model, ownRule.brief, ownRule.schemes[r.id]?.options, { proportions: r.proportions!, spanM: r.brief!.spanM }, catalogue);
      expect(again.totalMassKg).toBe(r.design.totalMassKg);
      expect(again.usableFloorM2).toBe(r.design.usableFloorM2);
    }
  });

  it("a draw at another span keeps a searched rise's rise ÷ span and the searched options", () => {
    const r = evaluated.find((x) => x.proportions?.riseSource === "searched")!;
    const model = SCHEMES.find((m) => m.id === r.id)!;
    let seen: { riseM: number; options: SchemeOptions } | null = null;
    const spy = { ...model, design: (brief: typeof DEFAULT_BRIEF, options: SchemeOptions) => ((seen = { riseM: brief.riseM, options }), infeasibleDesign(model.id, brief, "spy")) } as SchemeModel;
    designWithChoice(spy, { ...ownRule.brief, spanM: 2 * r.brief!.spanM }, {}, { proportions: r.proportions!, spanM: r.brief!.spanM }, catalogue);
    expect(seen!.riseM).toBeCloseTo(2 * r.proportions!.riseM, 9);
    for (const key of r.proportions!.searched.filter((k) => k !== "riseM")) expect(seen!.options[key]).toEqual(r.proportions!.proportions[key]);
  });

  it("screening options design the candidates; the chosen proportions are designed once with the full options; a pinned option is never screened", () => {
    const depth: OptionSpec = { key: "depth", label: "depth", kind: "number", unit: "", min: 1, max: 9, step: 1, integer: true, source: "test", free: true };
    const fidelity: OptionSpec = { key: "analysis", label: "analysis", kind: "select", unit: "", choices: [{ value: "full", label: "full" }, { value: "quick", label: "quick" }], source: "test" };
    const calls: SchemeOptions[] = [];
    const model = {
      id: "cable-dome", label: "Test", colour: "#000", description: "", validSpanM: { min: 0, max: 1000 },
      options: [depth, fidelity], defaults: { depth: 2, analysis: "full" }, screeningOptions: { analysis: "quick" },
      design: (brief: typeof DEFAULT_BRIEF, options: SchemeOptions): Design => {
        calls.push(options);
        const d = options.depth as number;
        return { ...infeasibleDesign("cable-dome", brief, ""), status: "feasible", feasible: true, usableFloorM2: 1, totalMassKg: (d - 6) ** 2 + (options.analysis === "full" ? 100 : 1) };
      },
    } as unknown as SchemeModel;
    const brief = { ...DEFAULT_BRIEF, objective: "mass" as const };
    const { design, proportions } = designAtBestProportions(model, brief, { enabled: true, options: {} }, defaultStudy(), catalogue);
    expect(proportions.proportions.depth).toBe(6);
    expect(calls.slice(0, -1).every((o) => o.analysis === "quick")).toBe(true);
    expect(calls.at(-1)).toEqual({ depth: 6, analysis: "full" });
    expect(design.totalMassKg).toBe(100);
    expect(proportions.value).toBe(100);
    calls.length = 0;
    designAtBestProportions(model, brief, { enabled: true, options: { analysis: "full" }, pinned: ["analysis"] }, defaultStudy(), catalogue);
    expect(calls.every((o) => o.analysis === "full")).toBe(true);
  });

  it("options that already are the screening ones: the chosen candidate is the design, not designed a second time", () => {
    const depth: OptionSpec = { key: "depth", label: "depth", kind: "number", unit: "", min: 1, max: 9, step: 1, integer: true, source: "test", free: true };
    const fidelity: OptionSpec = { key: "analysis", label: "analysis", kind: "select", unit: "", choices: [{ value: "full", label: "full" }, { value: "quick", label: "quick" }], source: "test" };
    const calls: SchemeOptions[] = [];
    const model = {
      id: "cable-dome", label: "Test", colour: "#000", description: "", validSpanM: { min: 0, max: 1000 },
      options: [depth, fidelity], defaults: { depth: 2, analysis: "quick" }, screeningOptions: { analysis: "quick" },
      design: (brief: typeof DEFAULT_BRIEF, options: SchemeOptions): Design => {
        calls.push(options);
        const d = options.depth as number;
        return { ...infeasibleDesign("cable-dome", brief, ""), status: "feasible", feasible: true, usableFloorM2: 1, totalMassKg: (d - 6) ** 2 + 1 };
      },
    } as unknown as SchemeModel;
    const brief = { ...DEFAULT_BRIEF, objective: "mass" as const };
    const { design, proportions } = designAtBestProportions(model, brief, { enabled: true, options: {} }, defaultStudy(), catalogue);
    expect(proportions.proportions.depth).toBe(6);
    expect(design.totalMassKg).toBe(1);
    expect(calls.length).toBe(proportions.evaluations);
  });
});
