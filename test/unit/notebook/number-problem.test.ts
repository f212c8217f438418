import { describe, it, expect } from "vitest";
import { numberProblem } from "../../../src/notebook/controls";
import { numberHint } from "../../../src/kernel/csv-table";

const coefficient = { label: "Net uplift pressure coefficient", unit: "–", min: 0, max: 2, step: 0.05 };
const span = { label: "Clear span (plan diameter)", unit: "m", min: 30, max: 500, step: 1 };

describe("what a number field says of a value it refuses (numberProblem)", () => {
  it("names the field, the value and the range, with the unit once each and none for a pure number", () => {
    expect(numberProblem("600", span)).toBe("Clear span (plan diameter): 600 m is out of range (allowed 30 to 500 m)");
    expect(numberProblem("3", coefficient)).toBe("Net uplift pressure coefficient: 3 is out of range (allowed 0 to 2)");
    expect(numberProblem("abc", coefficient)).toBe('Net uplift pressure coefficient: "abc" is not a number (allowed 0 to 2)');
  });
  it("says that the size alone is allowed when a minus sign was typed by habit (a suction written −0.8)", () => {
    expect(numberProblem("-0.8", coefficient)).toBe("Net uplift pressure coefficient: -0.8 is out of range (allowed 0 to 2; without the minus sign, 0.8 is allowed)");
    expect(numberProblem("-160", span)).toBe("Clear span (plan diameter): -160 m is out of range (allowed 30 to 500 m; without the minus sign, 160 m is allowed)");
  });
  it("says nothing of the sign where the size is out of range too", () => expect(numberProblem("-5", span)).toBe("Clear span (plan diameter): -5 m is out of range (allowed 30 to 500 m)"));
  it("takes a value in range", () => expect(numberProblem("0.8", coefficient)).toBeNull());
});

describe("the hint for a number written another way (numberHint)", () => {
  it.each([
    ["12,5", ": write the decimal with a point (12.5)"],
    ["-0,34", ": write the decimal with a point (-0.34)"],
    ["7,850", ": write it without the thousands separator (7850), or a decimal with a point (7.850)"],
    ["12,345,678", ": write it without the thousands separator (12345678)"],
    ["1,234.5", ": write it without the thousands separator (1234.5)"],
    ["5%", ': write the number alone (5), without "%"'],
    ["160 m", ': write the number alone (160), without "m"'],
    ["1.55 kgCO2e/kg", ': write the number alone (1.55), without "kgCO2e/kg"'],
  ])("%s → %s", (typed, hint) => expect(numberHint(typed)).toBe(hint));
  it.each(["1e2", "0x10", "160", " 160 ", "", "five", "12,5,6", "m5", "16o", "1l"])("nothing for %s (a number, or nothing to suggest)", (typed) => expect(numberHint(typed)).toBe(""));
  it("a number field says it: the decimal comma as before, the % sign too", () => {
    expect(numberProblem("12,5", span)).toBe('Clear span (plan diameter): "12,5" is not a number: write the decimal with a point (12.5)');
    expect(numberProblem("160m", span)).toBe('Clear span (plan diameter): "160m" is not a number: write the number alone (160), without "m"');
    expect(numberProblem("1e2", span)).toBeNull();
  });
});
