import { describe, it, expect } from "vitest";
import { clientExportHtml, escapeHtml } from "../../src/notebook/client-export";

describe("clientExportHtml", () => {
  const html = clientExportHtml({
    title: "Arena <roof> & co",
    subtitle: "sub",
    caution: "Feasibility-stage estimates",
    css: "body{color:red}",
    table: { caption: "Table", header: ["Scheme", "kg/m²"], rows: [["A", "12.5"]] },
    chartsHtml: ['<figure><svg xmlns="http://www.w3.org/2000/svg"><rect/></svg></figure>'],
    assumptions: [{ heading: "Brief", items: [["Span", "160 m"]] }],
    generated: "now",
  });
  it("is self-contained: no script, no external reference, a CSP that forbids the network", () => {
    expect(html).not.toMatch(/<script/i);
    expect(html).not.toMatch(/(src|href)=["']https?:/i);
    expect(html).toContain("default-src 'none'");
  });
  it("holds the table, the charts, the cautions and the styles", () => {
    expect(html).toContain("<svg");
    expect(html).toContain("<td class=\"num\">12.5</td>");
    expect(html).toContain("Feasibility-stage estimates");
    expect(html).toContain("body{color:red}");
  });
  it("escapes text", () => {
    expect(html).toContain("Arena &lt;roof&gt; &amp; co");
    expect(escapeHtml(`"'`)).toBe("&quot;&#39;");
  });
});

describe("clientExportHtml: the study's details and the table's print shape", () => {
  const html = clientExportHtml({
    title: "Riverside Hall",
    subtitle: "sub",
    details: [["Prepared by", "A. Lead"], ["Last changed", "2 Dec 2026, 20:05 UTC"]],
    caution: "c",
    css: "",
    table: { caption: "Table", header: ["Scheme", "kg/m²", "Warnings"], rows: [["A", "12.5", "1"], ["B", "3", "0"]] },
    chartsHtml: [],
    assumptions: [],
    generated: "now",
  });
  it("shows the study's details under the title", () => {
    expect(html).toContain("<dt>Prepared by</dt><dd>A. Lead</dd><dt>Last changed</dt><dd>2 Dec 2026, 20:05 UTC</dd>");
  });
  it("marks the headline table with its numbers of fields and schemes for the A4 layout", () => {
    expect(html).toContain('<table class="headline" style="--fields: 3; --schemes: 2">');
  });
});
