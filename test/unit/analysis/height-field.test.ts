import { describe, expect, it } from "vitest";
import { heightFieldMeasure } from "../../../src/analysis/height-field";
import type { Vec3 } from "../../../src/analysis/model";

describe("heightFieldMeasure", () => {
  it("a square pyramid: base 2b × 2b: lateral area 4 faces × ½ · 2b · √(b² + h²), volume (2b)²h/3 (solid geometry, closed form)", () => {
    const [b, h] = [30, 12];
    const points: Vec3[] = [[-b, -b, 0], [b, -b, 0], [b, b, 0], [-b, b, 0], [0, 0, h]];
    const m = heightFieldMeasure(points);
    expect(m.planM2).toBeCloseTo(4 * b * b, 9);
    expect(m.surfaceM2).toBeCloseTo(4 * b * Math.hypot(b, h), 9);
    expect(m.volumeM3).toBeCloseTo((4 * b * b * h) / 3, 9);
  });

  it("a tilted plane over a grid: area = plan × √(1 + α² + β²) exactly", () => {
    const [alpha, beta] = [0.4, -0.7];
    const points: Vec3[] = [];
    for (let i = 0; i <= 6; i++) for (let j = 0; j <= 4; j++) {
      const [x, y] = [i * 5 + 0.3 * (j % 2), j * 7];
      points.push([x, y, 3 + alpha * x + beta * y]);
    }
    const m = heightFieldMeasure(points);
    expect(m.surfaceM2 / m.planM2).toBeCloseTo(Math.sqrt(1 + alpha ** 2 + beta ** 2), 12);
  });

  it("a right circular cone on 96 rays: lateral area π a √(a² + h²) within the polygon's 0.1 % (closed form)", () => {
    const [a, h, rays] = [80, 28, 96];
    const points: Vec3[] = [[0, 0, h]];
    for (let k = 0; k < rays; k++) for (let s = 1; s <= 8; s++) {
      const r = (a * s) / 8;
      const t = (2 * Math.PI * k) / rays;
      points.push([r * Math.cos(t), r * Math.sin(t), h * (1 - r / a)]);
    }
    const m = heightFieldMeasure(points);
    // the inscribed polygon's plan area is (rays/2π)·sin(2π/rays) of the circle's; its surface the same share of the cone's
    const polygon = (rays / (2 * Math.PI)) * Math.sin((2 * Math.PI) / rays);
    expect(m.planM2 / (Math.PI * a * a * polygon)).toBeCloseTo(1, 9);
    expect(m.surfaceM2 / (Math.PI * a * Math.hypot(a, h) * polygon)).toBeCloseTo(1, 3);
    expect(m.volumeM3 / ((Math.PI * a * a * h * polygon) / 3)).toBeCloseTo(1, 3);
  });

  it("refuses points on one line in plan", () => {
    expect(() => heightFieldMeasure([[0, 0, 0], [1, 1, 2], [2, 2, 5]])).toThrow(RangeError);
  });
});
