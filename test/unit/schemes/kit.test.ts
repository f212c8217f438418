import { describe, it, expect } from "vitest";
import { declareScheme, defineOptions, defineScheme, failWith, SchemeError, SizingError, isDesignAnswer, infeasibleDesign, convergeSelfWeight, ConvergenceError } from "../../../src/schemes/kit";
import { DEFAULT_BRIEF } from "../../../src/brief";
import { defaultCatalogue } from "../../../src/catalogue/default-catalogue";

const catalogue = defaultCatalogue();
const declared = defineOptions({
  count: { kind: "number", label: "Count", unit: "", min: 1, max: 9, step: 1, integer: true, default: 3, source: "test" },
  allowancePct: { kind: "number", label: "Allowance", unit: "%", min: 0, max: 30, step: 1, default: 10, source: "test", uncertainty: "allowance" },
  finish: { kind: "select", label: "Finish", choices: [{ value: "a", label: "A" }, { value: "b", label: "B" }], default: "b", source: "test" },
  braced: { kind: "toggle", label: "Braced", default: true, source: "test" },
});

describe("defineOptions", () => {
  it("gives the defaults and the specs, in declaration order, from one table", () => {
    expect(declared.defaults).toEqual({ count: 3, allowancePct: 10, finish: "b", braced: true });
    expect(declared.specs.map((s) => s.key)).toEqual(["count", "allowancePct", "finish", "braced"]);
    expect(declared.specs[1]).toEqual({ key: "allowancePct", kind: "number", label: "Allowance", unit: "%", min: 0, max: 30, step: 1, source: "test", uncertainty: "allowance" });
    expect(declared.specs[2]).toMatchObject({ kind: "select", unit: "", choices: [{ value: "a", label: "A" }, { value: "b", label: "B" }] });
  });
});

describe("the design template (defineScheme)", () => {
  const identity = { id: "truss-roof" as const, label: "Test", colour: "#000000", description: "a test scheme", clientNotes: ["test"] as const, validSpanM: { min: 1, max: 1000 } };
  const withDesign = (design: () => never) => defineScheme(declareScheme({ ...identity, options: declared }), design);

  it("checks the options before designing", () => {
    const model = withDesign(() => {
      throw new Error("not reached");
    });
    expect(() => model.design(DEFAULT_BRIEF, { ...model.defaults, count: 2.5 }, catalogue)).toThrow(/invalid count: 2.5/);
  });

  it("turns a SchemeError into an infeasible design with its reason, drawing and warnings", () => {
    const model = withDesign(() => {
      throw new SizingError("no section carries it: add more", { warnings: ["w"], section: [{ role: "x", points: [[0, 0]] }] });
    });
    const d = model.design(DEFAULT_BRIEF, model.defaults, catalogue);
    expect(d.feasible).toBe(false);
    expect(d.reason).toBe("no section carries it: add more");
    expect(d.warnings).toEqual(["w"]);
    expect(d.drawing.section).toHaveLength(1);
  });

  it("lets a programmer's error through: a TypeError is not a design reason", () => {
    const model = withDesign(() => {
      throw new TypeError("x is undefined");
    });
    expect(() => model.design(DEFAULT_BRIEF, model.defaults, catalogue)).toThrow(TypeError);
  });
});

describe("scheme errors", () => {
  it("failWith gives the scheme's reason and keeps the original as cause", () => {
    const original = new ConvergenceError("self-weight diverged");
    let caught: unknown;
    try {
      failWith(original, (m) => `${m}: a lighter roof is needed`);
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(SchemeError);
    expect((caught as SchemeError).message).toBe("self-weight diverged: a lighter roof is needed");
    expect((caught as SchemeError).cause).toBe(original);
  });

  it("failWith rethrows anything that is not a scheme's failure unchanged", () => {
    const bug = new TypeError("bug");
    expect(() => failWith(bug, (m) => m)).toThrow(bug);
  });

  it("convergeSelfWeight turns a diverging weight into the scheme's reason with its drawing", () => {
    const section = [{ role: "shell", points: [[0, 0]] as [number, number][] }];
    try {
      convergeSelfWeight((g) => ({ value: g, selfWeightKPa: 2 * g + 1 }), 1, { section, reason: (m) => `${m}: thinner` });
      expect.fail("should not converge");
    } catch (e) {
      expect(e).toBeInstanceOf(SchemeError);
      expect((e as SchemeError).message).toMatch(/^self-weight diverged.*: thinner$/);
      expect((e as SchemeError).section).toBe(section);
      expect((e as SchemeError).cause).toBeInstanceOf(ConvergenceError);
    }
  });

  it("answers (shown to the user) are scheme failures and refused inputs, not bugs", () => {
    expect(isDesignAnswer(new SchemeError("x"))).toBe(true);
    expect(isDesignAnswer(new RangeError("invalid fabric: paper"))).toBe(true);
    expect(isDesignAnswer(new TypeError("bug"))).toBe(false);
    expect(infeasibleDesign("cable-net", DEFAULT_BRIEF, "why").reason).toBe("why");
  });
});
