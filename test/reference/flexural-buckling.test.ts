import { describe, it } from "vitest";
import { bucklingReduction } from "../../src/mechanics";
import { expectAbsClose } from "../helpers/close";

describe("bucklingReduction (EN 1993-1-1 eq. 6.49)", () => {
  // χ at λ̄ = 1.0 for curves a0, a, b, c, d (EN 1993-1-1 Fig. 6.4 / eq. 6.49 by hand):
  // Φ = 0.5(1 + α·0.8 + 1); χ = 1/(Φ + √(Φ² − 1)).
  const expected = { a0: 0.7253, a: 0.6656, b: 0.597, c: 0.5399, d: 0.4671 } as const;
  for (const [curve, chi] of Object.entries(expected)) {
    it(`χ(1.0, ${curve}) = ${chi}`, () => expectAbsClose(bucklingReduction(1.0, curve as keyof typeof expected), chi, 1e-4));
  }
  it("χ = 1 at and below λ̄ = 0.2", () => expectAbsClose(bucklingReduction(0.2, "c"), 1, 1e-12));
});
