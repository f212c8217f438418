// The arrow keys of a number field that is a text field (audit8: a number input rewrote "12,5" as 125):
// one step up or down on the step grid from min, within min and max, as a number input steps.
import { describe, it, expect } from "vitest";
import { steppedValue } from "../../../src/notebook/controls";

describe("steppedValue", () => {
  const span = { min: 40, max: 400, step: 1 };
  it("steps by one step and stops at the ends", () => {
    expect(steppedValue("160", 1, span)).toBe("161");
    expect(steppedValue("160", -1, span)).toBe("159");
    expect(steppedValue("400", 1, span)).toBe("400");
    expect(steppedValue("40", -1, span)).toBe("40");
  });
  it("goes to the next point of the step grid from an off-grid value, as a number input does", () => {
    expect(steppedValue("160.4", 1, span)).toBe("161");
    expect(steppedValue("160.4", -1, span)).toBe("160");
  });
  it("keeps a decimal step's decimals, without float noise", () => {
    expect(steppedValue("0.3", 1, { min: 0, max: 1, step: 0.1 })).toBe("0.4");
    expect(steppedValue("0.7", -1, { min: 0.05, max: 0.9, step: 0.05 })).toBe("0.65");
    expect(steppedValue("0.5", -1, { min: -1, max: 1, step: 0.5 })).toBe("0.0");
  });
  it("does nothing on a field that holds no number", () => {
    expect(steppedValue("", 1, span)).toBeNull();
    expect(steppedValue("16o", 1, span)).toBeNull();
  });
});
