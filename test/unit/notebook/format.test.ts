// The one formatting module (issue 14, "words a project lead uses").
import { describe, it, expect } from "vitest";
import { fmt, unbrokenRuns } from "../../../src/notebook/format";

describe("fmt", () => {
  it("sig3 gives three significant figures and keeps the size of large numbers", () => {
    expect(fmt.sig3(42_519_682)).toBe("42,500,000");
    expect(fmt.sig3(123.456)).toBe("123");
    expect(fmt.sig3(12.345)).toBe("12.3");
    expect(fmt.sig3(0.012345)).toBe("0.0123");
    expect(fmt.sig3(0)).toBe("0");
    expect(fmt.sig3(Number.NaN)).toBe("–");
  });
  it("force writes N as kN below 1 MN and MN above, moment N·m as kNm and MNm", () => {
    expect(fmt.force(42_519_682)).toBe("42.5 MN");
    expect(fmt.force(812_345)).toBe("812 kN");
    expect(fmt.moment(86_420)).toBe("86.4 kNm");
    expect(fmt.moment(2_345_000)).toBe("2.35 MNm");
    expect(fmt.quantity(-1_500, "N")).toBe("−1.5 kN");
    expect(fmt.quantity(11_000, "m2")).toBe("11,000 m²");
  });
  it("quantity writes stresses in MPa, pressures in kPa and line forces in kN/m, each value in its own multiple", () => {
    // the shell's checks read "4,170,000 Pa" against "20,000,000 Pa" and "397,000 N/m" against "447,000 N/m"
    expect(fmt.quantity(4_170_000, "Pa")).toBe("4.17 MPa");
    expect(fmt.quantity(7_220, "Pa")).toBe("7.22 kPa");
    expect(fmt.quantity(500, "Pa")).toBe("0.5 kPa");
    expect(fmt.quantity(397_000, "N/m")).toBe("397 kN/m");
    expect(fmt.quantity(950_000, "Pa")).toBe("950 kPa");
    expect(fmt.quantity(896_000, "N")).toBe("896 kN");
    expect(fmt.quantity(0.126, "m")).toBe("0.126 m");
  });
  it("money puts the currency on every cost", () => {
    expect(fmt.money(1234.5, "GBP")).toBe("1,230 GBP");
    expect(fmt.money(20_912_345, "EUR")).toBe("20.9 million EUR");
  });
  it("plain drops internal wording and writes m² and m³", () => {
    expect(fmt.plain("could not be computed: self-weight did not converge")).toBe("self-weight did not converge");
    expect(fmt.plain("thin concrete shells above about 100 m span are rare (from memory): falsework dominates")).toBe("thin concrete shells above about 100 m span are rare: falsework dominates");
    expect(fmt.plain("deck area 300 m2, volume 20 m3")).toBe("deck area 300 m², volume 20 m³");
  });
  it("versusBest names the best and the difference of the others", () => {
    expect(fmt.versusBest(10, 10)).toBe("best");
    expect(fmt.versusBest(11.2, 10)).toBe("+12 %");
    expect(fmt.versusBest(25, 10)).toBe("2.5× the best");
  });
});

describe("unbrokenRuns: what a table cell keeps whole", () => {
  const whole = (text: string) => unbrokenRuns(text).filter((r) => r.whole).map((r) => r.text);
  it("keeps a standard's reference whole (its clause may go to the next line), and a command-line flag", () => {
    expect(whole("strand tension, EN 1993-1-11:2006 §6.2")).toEqual(["EN 1993-1-11:2006"]);
    expect(whole("flexural buckling, EN 1993-1-1 §6.3.1; EN 1990 Table A1.2(A)")).toEqual(["EN 1993-1-1", "EN 1990"]);
    expect(whole("bending, EN 1995-1-1 eq. 6.11")).toEqual(["EN 1995-1-1"]);
    expect(whole("on the command line, --buckling; or --sweep F:T:S")).toEqual(["--buckling", "--sweep"]);
  });
  it("leaves words with hyphens, minus signs and plain text alone, and the runs joined are the text", () => {
    for (const text of ["well-kept mid-height", "−12.7 MN", "", "ten-year x--y", "EN 1993-1-11:2006 §6.2 and then --buckling."]) {
      expect(unbrokenRuns(text).map((r) => r.text).join("")).toBe(text);
    }
    expect(whole("well-kept mid-height")).toEqual([]);
    expect(whole("x--y")).toEqual([]);
  });
});
