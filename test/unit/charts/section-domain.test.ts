// The section's height scale holds the whole design drawn on it (audit8: on the client page the
// thin concrete shell, searched to a 45.6 m rise, and the glulam dome, 34.4 m, were cut off at the
// top, because the scale stopped a fifth above the brief's own 22 m rise).
import { describe, it, expect } from "vitest";
import { defaultStudy } from "../../../src/study";
import { sectionParts } from "../../../src/charts/section-chart";

const brief = defaultStudy().brief;
const briefTop = brief.eavesHeightM + brief.riseM;

describe("the section's height scale", () => {
  it("is the brief's roof top and a fifth more when nothing is drawn above it", () => {
    expect(sectionParts(brief, []).yDomain).toEqual([0, briefTop * 1.2]);
    expect(sectionParts(brief, [{ role: "truss", points: [[-10, brief.eavesHeightM], [10, briefTop - 1]] }]).yDomain).toEqual([0, briefTop * 1.2]);
  });

  it("reaches a fifth above the highest member when a design rises above the brief's roof", () => {
    const top = brief.eavesHeightM + 45.6;
    const { yDomain } = sectionParts(brief, [{ role: "shell", points: [[-brief.spanM / 2, brief.eavesHeightM], [0, top], [brief.spanM / 2, brief.eavesHeightM]] }]);
    expect(yDomain).toEqual([0, top * 1.2]);
  });
});
