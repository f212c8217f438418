// The section's height scale holds the whole design drawn on it (audit8: on the client page the
// thin concrete shell, searched to a 45.6 m rise, and the glulam dome, 34.4 m, were cut off at the
// top, because the scale stopped a fifth above the brief's own 22 m rise).
import { describe, it, expect } from "vitest";
import { defaultStudy } from "../../../src/study";
import { schemeObservable10 } from "d3";
import { drawnRoles, sectionChartOptions, sectionParts } from "../../../src/charts/section-chart";
import { planChartOptions } from "../../../src/charts/plan-chart";
import { concreteShell } from "../../../src/schemes/concrete-shell";
import { cableNet } from "../../../src/schemes/cable-net";
import { geodesicDome } from "../../../src/schemes/geodesic-dome";
import { timberDome } from "../../../src/schemes/timber-dome";
import { defaultCatalogue } from "../../../src/catalogue/default-catalogue";

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

describe("the section's width", () => {
  it("is a little beyond the walls, or beyond the farthest member where one runs past them (a backstay to its ground anchor)", () => {
    const a = brief.spanM / 2;
    expect(sectionParts(brief, []).xDomain).toEqual([-a * 1.05, a * 1.05]);
    const design = cableNet.design(brief, { ...cableNet.defaults, analysis: "closed-form" }, defaultCatalogue());
    const farthest = Math.max(...design.drawing.section.flatMap((l) => (l.role === "usable floor" || l.role === "support zone" ? [] : l.points.map((p) => Math.abs(p[0])))));
    expect(farthest).toBeGreaterThan(a);
    expect(sectionParts(brief, design.drawing.section).xDomain).toEqual([-farthest * 1.05, farthest * 1.05]);
  });
});

describe("the legend of a scheme's section and plan", () => {
  it("names the members drawn as lines, not the floor the section shades and labels (its swatch matched nothing drawn)", () => {
    const design = cableNet.design(brief, { ...cableNet.defaults, analysis: "closed-form" }, defaultCatalogue());
    const lines = [...design.drawing.section, ...(design.drawing.plan ?? [])];
    expect(lines.some((l) => l.role === "usable floor")).toBe(true);
    const roles = drawnRoles(lines);
    expect(roles).not.toContain("usable floor");
    expect(roles).not.toContain("support zone");
    expect(roles).toContain("mast");
    expect(roles).toEqual([...roles].sort());
  });

  it("gives a lattice dome's members one name in its section and its plan (the plan called them struts: two legend entries, two colours)", () => {
    const designs = { [geodesicDome.id]: geodesicDome.design(brief, geodesicDome.defaults, defaultCatalogue()), [timberDome.id]: timberDome.design(brief, timberDome.defaults, defaultCatalogue()) };
    for (const [id, design] of Object.entries(designs)) {
      expect(design.status, id).toBe("feasible");
      expect(drawnRoles([...design.drawing.section, ...(design.drawing.plan ?? [])]), id).toEqual(["lattice", "ring", "support"]);
    }
  });

  it("lists in each drawing only the roles it draws, each in the colour the shared order gives it (the shell's plan listed \"shell\", drawn only in the section)", () => {
    const design = concreteShell.design(brief, concreteShell.defaults, defaultCatalogue());
    const plan = design.drawing.plan ?? [];
    const roles = drawnRoles([...design.drawing.section, ...plan]);
    expect(roles).toContain("shell");
    const planScale = planChartOptions({ brief, lines: plan, roles, title: "", caption: "" }).color as { domain: string[]; range: string[] };
    const sectionScale = sectionChartOptions({ brief, lines: design.drawing.section, roles, title: "", caption: "" }).color as { domain: string[]; range: string[] };
    expect(planScale.domain).not.toContain("shell");
    expect(planScale.domain).toEqual(roles.filter((r) => plan.some((l) => l.role === r)));
    expect(sectionScale.domain).toContain("shell");
    for (const scale of [planScale, sectionScale]) scale.domain.forEach((r, i) => expect(scale.range[i], r).toBe(schemeObservable10[roles.indexOf(r)]));
    // a role drawn in both keeps its colour
    const both = planScale.domain.filter((r) => sectionScale.domain.includes(r));
    expect(both.length).toBeGreaterThan(0);
    for (const r of both) expect(planScale.range[planScale.domain.indexOf(r)]).toBe(sectionScale.range[sectionScale.domain.indexOf(r)]);
  });
});
