import { describe, it, expect } from "vitest";
import { SCHEMES, checkSchemeOptions } from "../../../src/schemes";
import { DEFAULT_BRIEF } from "../../../src/brief";
import { defaultCatalogue } from "../../../src/catalogue/default-catalogue";
import { materialInfo } from "../../../src/materials";
import { expectRelClose } from "../../helpers/close";

// The contract every registered scheme keeps. It loops over the registry: a new scheme is tested
// here without editing this file.
const catalogue = defaultCatalogue();

describe("the scheme registry", () => {
  it("has unique ids, labels and colours", () => {
    for (const key of ["id", "label", "colour"] as const) expect(new Set(SCHEMES.map((m) => m[key])).size).toBe(SCHEMES.length);
  });
});

for (const model of SCHEMES) {
  describe(`${model.id} (contract)`, () => {
    it("describes itself: a label, a paragraph, a CSS colour and a valid span range", () => {
      expect(model.label.length).toBeGreaterThan(0);
      expect(model.description.length).toBeGreaterThan(40);
      expect(model.colour).toMatch(/^#[0-9a-fA-F]{6}$/);
      expect(model.validSpanM.min).toBeLessThan(model.validSpanM.max);
    });

    it("declares every option once, with a source, and a default its own check accepts", () => {
      expect(new Set(model.options.map((o) => o.key)).size).toBe(model.options.length);
      expect(Object.keys(model.defaults).sort()).toEqual(model.options.map((o) => o.key).sort());
      for (const spec of model.options) expect(spec.source.length, spec.key).toBeGreaterThan(0);
      expect(() => checkSchemeOptions(model.options, model.defaults)).not.toThrow();
    });

    it("marks only whole-range number options as uncertain", () => {
      for (const spec of model.options) {
        if (spec.kind === "number" && spec.uncertainty !== undefined) expect(spec.integer ?? false, spec.key).toBe(false);
      }
    });

    it("refuses an option outside its range with a message naming it (nothing is designed)", () => {
      const spec = model.options.find((o) => o.kind === "number");
      if (spec === undefined || spec.kind !== "number") return;
      expect(() => model.design(DEFAULT_BRIEF, { ...model.defaults, [spec.key]: spec.max + 1 }, catalogue)).toThrow(new RegExp(`invalid ${spec.key}`));
    });

    const d = model.design(DEFAULT_BRIEF, model.defaults, catalogue);
    it("designs the demo brief: its own id, a reason exactly when infeasible", () => {
      expect(d.schemeId).toBe(model.id);
      expect(d.feasible).toBe(d.reason === "");
    });

    it("takes off rows whose masses sum to the total, each with a known material or none", () => {
      expectRelClose(d.takeoff.reduce((s, r) => s + r.massKg, 0), d.totalMassKg, 1e-12);
      for (const row of d.takeoff) {
        if (row.material !== null) expect(materialInfo(row.material), row.material).toBeDefined();
        expect(row.quantity, row.element).toBeGreaterThanOrEqual(0);
      }
    });

    it("reports its governing check and the roof's own weight without substructure", () => {
      if (d.checks.length > 0) expect(d.maxUtilisation).toBe(Math.max(...d.checks.map((c) => c.utilisation)));
      expect(d.roofMassKg).toBeLessThanOrEqual(d.totalMassKg);
      expectRelClose(d.selfWeightKgPerM2, d.roofMassKg / d.planAreaM2, 1e-12);
    });

    it("answers a span far outside its range with a design, not a throw", () => {
      const spanM = model.validSpanM.max * 1.5;
      const out = model.design({ ...DEFAULT_BRIEF, spanM, riseM: (DEFAULT_BRIEF.riseM / DEFAULT_BRIEF.spanM) * spanM }, model.defaults, catalogue);
      expect(out.feasible || out.reason.length > 0).toBe(true);
    });
  });
}
