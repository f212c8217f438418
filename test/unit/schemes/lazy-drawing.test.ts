import { describe, expect, it } from "vitest";
import { drawingWithLazyPlan } from "../../../src/schemes/kit";
import { withSection } from "../../../src/schemes/kit/lazy-drawing";
import type { DrawingLine } from "../../../src/schemes/types";

const line = (role: string): DrawingLine => ({ role, points: [[0, 0], [1, 1]] });

describe("a drawing whose section and plan are built when first read", () => {
  it("builds the plan once, on the first read, and not when its section is replaced", () => {
    let built = 0;
    const drawing = drawingWithLazyPlan([line("lattice")], () => {
      built++;
      return [line("strut")];
    });
    const withFloor = withSection(drawing, () => [...drawing.section, line("usable floor")]);
    expect(built).toBe(0);
    expect(withFloor.section.map((l) => l.role)).toEqual(["lattice", "usable floor"]);
    expect(withFloor.plan).toEqual([line("strut")]);
    expect(withFloor.plan).toBe(withFloor.plan);
    expect(built).toBe(1);
  });

  it("builds a section given as a function once, on the first read, and never when it is not read", () => {
    let sections = 0;
    let floors = 0;
    const drawing = drawingWithLazyPlan(() => {
      sections++;
      return [line("lattice")];
    }, () => [line("strut")]);
    const withFloor = withSection(drawing, () => {
      floors++;
      return [...drawing.section, line("usable floor")];
    });
    withSection(drawingWithLazyPlan(() => {
      sections++;
      return [];
    }, () => []), () => []);
    expect([sections, floors]).toEqual([0, 0]);
    expect(withFloor.section.map((l) => l.role)).toEqual(["lattice", "usable floor"]);
    expect(withFloor.section).toBe(withFloor.section);
    expect(drawing.section).toBe(drawing.section);
    expect([sections, floors]).toEqual([1, 1]);
  });

  it("is plain data to a worker's message and to JSON: the plan is there", () => {
    const drawing = drawingWithLazyPlan([line("lattice")], () => [line("strut")]);
    expect(structuredClone(drawing)).toEqual({ section: [line("lattice")], plan: [line("strut")] });
    expect(JSON.parse(JSON.stringify(drawing))).toEqual({ section: [line("lattice")], plan: [line("strut")] });
    const lazy = withSection(drawingWithLazyPlan(() => [line("lattice")], () => [line("strut")]), () => [line("lattice"), line("usable floor")]);
    expect(structuredClone(lazy)).toEqual({ section: [line("lattice"), line("usable floor")], plan: [line("strut")] });
    expect(Object.keys(lazy)).toEqual(["section", "plan"]);
  });
});
