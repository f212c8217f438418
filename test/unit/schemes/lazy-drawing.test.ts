import { describe, expect, it } from "vitest";
import { drawingWithLazyPlan } from "../../../src/schemes/kit";
import { withSection } from "../../../src/schemes/kit/lazy-drawing";
import type { DrawingLine } from "../../../src/schemes/types";

const line = (role: string): DrawingLine => ({ role, points: [[0, 0], [1, 1]] });

describe("a drawing whose plan is built when first read", () => {
  it("builds the plan once, on the first read, and not when its section is replaced", () => {
    let built = 0;
    const drawing = drawingWithLazyPlan([line("lattice")], () => {
      built++;
      return [line("strut")];
    });
    const withFloor = withSection(drawing, [line("lattice"), line("usable floor")]);
    expect(built).toBe(0);
    expect(withFloor.section.map((l) => l.role)).toEqual(["lattice", "usable floor"]);
    expect(withFloor.plan).toEqual([line("strut")]);
    expect(withFloor.plan).toBe(withFloor.plan);
    expect(built).toBe(1);
  });

  it("is plain data to a worker's message and to JSON: the plan is there", () => {
    const drawing = drawingWithLazyPlan([line("lattice")], () => [line("strut")]);
    expect(structuredClone(drawing)).toEqual({ section: [line("lattice")], plan: [line("strut")] });
    expect(JSON.parse(JSON.stringify(drawing))).toEqual({ section: [line("lattice")], plan: [line("strut")] });
  });
});
