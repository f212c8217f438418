import { describe, it, expect } from "vitest";
import { sphericalCap, capHeightAt } from "../../../src/mechanics/spherical-cap";
import { SCHEMES } from "../../../src/schemes";
import { designScheme } from "../../../src/pipeline";
import { defaultCatalogue } from "../../../src/catalogue/default-catalogue";
import { DEFAULT_BRIEF } from "../../../src/study";

/** Paths of every number in x that is not finite. */
function nonFinite(x: unknown, path = ""): string[] {
  if (typeof x === "number") return Number.isFinite(x) ? [] : [path];
  if (x !== null && typeof x === "object") return Object.entries(x).flatMap(([k, v]) => nonFinite(v, `${path}.${k}`));
  return [];
}

// Issue 10, hardening: at rise = span/2 the sphere radius equals the base radius and R² − a² rounds
// to a tiny negative at spans such as 100.7 m and 46.2 m, which put NaN into the section drawings.
describe("a hemisphere (rise exactly span/2)", () => {
  it("has its edge on the base plane, not NaN", () => {
    for (let k = 300; k <= 5000; k++) {
      const span = k / 10;
      const cap = sphericalCap(span, span / 2);
      const edge = capHeightAt(cap, span / 2);
      expect(Number.isFinite(edge)).toBe(true);
      expect(Math.abs(edge)).toBeLessThan(1e-6 * span);
    }
  });

  it("gives no NaN or infinity anywhere in any scheme's design, drawings included", () => {
    const catalogue = defaultCatalogue();
    for (const span of [46.2, 100.7, 184.8]) {
      for (const model of SCHEMES) {
        const design = designScheme(model, { ...DEFAULT_BRIEF, spanM: span, riseM: span / 2 }, undefined, catalogue);
        expect({ scheme: model.id, span, bad: nonFinite(design) }).toEqual({ scheme: model.id, span, bad: [] });
      }
    }
  });
});
