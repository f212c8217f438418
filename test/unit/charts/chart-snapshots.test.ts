// Deterministic snapshots of chart output: fixed inputs (test/helpers/fixtures.ts), pinned number
// format (d3's en-US), no randomness.
import { describe, it, expect } from "vitest";
import { Window } from "happy-dom";
import * as Plot from "@observablehq/plot";
import { defaultStudy } from "../../../src/study";
import { sectionChartOptions, massByMaterialChart, carbonVsCostChart, carbonByModuleChart, costPerM2Chart, spanMetricChart, chartCaption } from "../../../src/charts";
import { fixtureResults, fixtureSpanPoints } from "../../helpers/fixtures";

const window = new Window();
const document = window.document as unknown as Document;
const render = (options: Plot.PlotOptions) => (Plot.plot({ ...options, document }) as unknown as HTMLElement).outerHTML;

const study = defaultStudy();
const results = fixtureResults();
const caption = chartCaption(study);

describe("chart specifications (snapshots)", () => {
  it("roof section", () => {
    expect(render(sectionChartOptions({ brief: study.brief, title: "Roof section", caption }))).toMatchSnapshot();
  });
  it("mass by material", () => {
    const html = render(massByMaterialChart(results, { title: "Mass", caption }));
    for (const r of results) expect(html).toContain(r.label);
    expect(html).toMatchSnapshot();
  });
  it("carbon against cost rings the schemes not beaten on both and says what the rings are", () => {
    const chart = carbonVsCostChart(results, { title: "Carbon against cost", caption });
    const html = render(chart);
    expect(html).toContain("ringed: no other scheme is both cheaper and lower in carbon");
    // one ring: the cable dome is both cheaper and lower in carbon than the geodesic dome here
    expect(html.match(/r="11"/g)).toHaveLength(1);
    expect(chart.ariaDescription).toContain("Not beaten on both cost and carbon: Cable dome.");
    expect(html).toMatchSnapshot();
  });
  it("span study lines carry labelled axes", () => {
    const points = fixtureSpanPoints();
    const html = render(spanMetricChart(points, "selfWeightKgPerM2", "Self-weight (kg/m² of plan)", { title: "Self-weight against span", caption }));
    expect(html).toContain("Clear span (m)");
    expect(html).toContain("Self-weight (kg/m² of plan)");
    expect(html).toMatchSnapshot();
  });
  it("span study marks where a scheme's named form changes, with the new form's name, and nowhere else", () => {
    const points = fixtureSpanPoints().map((p) => (p.id === "truss-roof" ? { ...p, regime: p.spanM < 90 ? "single layer" : "double layer" } : p));
    const options = spanMetricChart(points, "selfWeightKgPerM2", "Self-weight (kg/m² of plan)", { title: "Self-weight against span", caption });
    const html = render(options);
    expect(html.match(/double layer/g)).toHaveLength(1);
    expect(html).not.toContain("single layer");
    expect(options.ariaDescription).toMatch(/diamond marks where a scheme changes its form/);
    expect(spanMetricChart(fixtureSpanPoints(), "selfWeightKgPerM2", "Self-weight", { title: "t", caption }).ariaDescription).not.toMatch(/diamond/);
  });
  it("a form that does not hold (4 masts at one span between 3 masts) gets its diamond but not its name, so flipping counts do not write over one another", () => {
    const points = fixtureSpanPoints().map((p) => (p.id === "truss-roof" ? { ...p, regime: p.spanM === 90 ? "4 masts" : "3 masts" } : p));
    // the truss is out of its range at 120 m in the fixture: brought into the chart to draw that span
    const html = render(spanMetricChart(points, "selfWeightKgPerM2", "Self-weight (kg/m² of plan)", { title: "Self-weight against span", caption, includeExcluded: true }));
    expect(html).not.toContain("4 masts");
    expect(html.match(/3 masts/g)).toHaveLength(1); // back to 3 masts at 120 m, held to the end of the range
  });
  it("a log axis reads in plain numbers, not SI prefixes (a mass ratio of 0.4 once read \"400m\", as if metres)", () => {
    // ratios from 0.3 to 30 and self-weights from 20 to 2,000: a log scale (more than ten times apart) across 1 in both
    const points = fixtureSpanPoints().map((p) => ({ ...p, massToAir: p.id === "cable-dome" ? 0.3 : 30, selfWeightKgPerM2: p.id === "cable-dome" ? 20 : 2000 }));
    const ticks = (metric: "massToAir" | "selfWeightKgPerM2") => {
      const options = spanMetricChart(points, metric, "y", { title: "t", caption });
      expect((options.y as { type?: string }).type).toBe("log");
      const figure = Plot.plot({ ...options, document }) as unknown as HTMLElement;
      return [...figure.querySelectorAll('[aria-label="y-axis tick label"] text')].map((t) => t.textContent ?? "");
    };
    const ratio = ticks("massToAir");
    expect(ratio).toContain("0.4");
    expect(ratio).toContain("10");
    const weight = ticks("selfWeightKgPerM2");
    expect(weight).toContain("1,000");
    for (const label of [...ratio, ...weight]) expect(label).toMatch(/^(|[\d,.]+)$/);
  });
  it("captions name the span, the brief and the factor set", () => {
    expect(caption).toMatch(/^Span 160 m, each scheme its own rise, eaves/); // the default study's rise rule is "own"
    expect(chartCaption({ ...study, brief: { ...study.brief, riseRule: "common" } })).toMatch(/^Span 160 m, rise 24 m/);
    expect(caption).toContain(study.carbon.settings.factorSetName);
  });
  it("the carbon and cost bars say in their titles what their ticks and lines are, on every page that draws them", () => {
    const carbon = carbonByModuleChart(results, { title: "Carbon", caption });
    expect(carbon.title).toMatch(/^Carbon \(dashed: module D, .*reported apart and not subtracted\)$/);
    expect(render(carbon)).toContain('stroke-dasharray="3 2"');
    const cost = costPerM2Chart(results, { title: "Cost", caption });
    expect(cost.title).toBe("Cost (bar: estimate; line: low–high rates)");
  });
});
