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
