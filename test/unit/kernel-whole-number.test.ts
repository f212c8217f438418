import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { wholeNumber } from "../../src/kernel/units";

describe("whole numbers as the cautions write them (wholeNumber)", () => {
  it("rounds and sets the thousands apart", () => {
    expect(wholeNumber(0)).toBe("0");
    expect(wholeNumber(999.4)).toBe("999");
    expect(wholeNumber(999.5)).toBe("1,000");
    expect(wholeNumber(18604.4)).toBe("18,604");
    expect(wholeNumber(1234567)).toBe("1,234,567");
  });
  it("writes a minus sign (U+2212) before a negative, none before a negative rounded to 0", () => {
    expect(wholeNumber(-1782)).toBe("−1,782");
    expect(wholeNumber(-0.3)).toBe("0");
  });
  it("writes what is not finite as it is", () => expect(wholeNumber(Number.NaN)).toBe("NaN"));
  it("reads back as the rounded number, as en-GB groups it", () =>
    fc.assert(
      fc.property(fc.double({ min: -1e12, max: 1e12, noNaN: true }), (x) => {
        const text = wholeNumber(x);
        expect(Number(text.replace(/,/g, "").replace("−", "-"))).toBe(Math.round(x) || 0);
        expect(text).toBe(Math.round(x) === 0 ? "0" : Math.round(x).toLocaleString("en-GB").replace("-", "−"));
      }),
    ));
});
