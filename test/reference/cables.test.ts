import { describe, it } from "vitest";
import { parabolicCable, parabolaLengthM, membraneStripForceNPerM } from "../../src/mechanics";
import { strandResistanceN } from "../../src/catalogue";
import { expectAbsClose, expectRelClose } from "../helpers/close";

describe("parabolicCable (Irvine, Cable Structures 1981, ch. 1)", () => {
  // w = 2 kN/m, L = 100 m, f = 10 m. By hand: H = wL²/(8f) = 2·100²/80 = 250 kN;
  // V = wL/2 = 100 kN; T_max = √(250² + 100²) = 269.26 kN.
  const cable = parabolicCable(2000, 100, 10);
  it("H = 250 kN", () => expectRelClose(cable.horizontalN, 250_000, 1e-12));
  it("V = 100 kN", () => expectRelClose(cable.verticalN, 100_000, 1e-12));
  it("T_max = 269.26 kN", () => expectAbsClose(cable.maxTensionN, 269_258, 1));
  // Irvine ch. 1: length of a shallow parabola ≈ L(1 + 8/3 (f/L)² − 32/5 (f/L)⁴): 100(1 + 0.026667 − 0.00064) = 102.603 m;
  // the exact arc length is 102.606 m, within the series' next term.
  it("length agrees with Irvine's series to its truncation", () => expectAbsClose(parabolaLengthM(100, 10), 100 * (1 + (8 / 3) * 0.01 - (32 / 5) * 0.0001), 0.005));
  it("rejects a sag larger than half the span", () => {
    let message = "";
    try {
      parabolicCable(2000, 100, 60);
    } catch (e) {
      message = (e as Error).message;
    }
    if (!message.startsWith("invalid cable sag: 60 m")) throw new Error(`unexpected message: ${message}`);
  });
});

describe("membraneStripForceNPerM (parabolic strip, Irvine 1981 ch. 1)", () => {
  // p = 1 kPa, s = 10 m, f = 1 m: n = p s²/(8f) = 1000·100/8 = 12.5 kN/m.
  it("12.5 kN/m", () => expectRelClose(membraneStripForceNPerM(1000, 10, 1), 12_500, 1e-12));
});

describe("strandResistanceN (EN 1993-1-11:2006 §6.2 eq. 6.1, first term, from memory)", () => {
  // F_Rd = F_uk/(1.5 γR): 2358 kN (FLC 50 row of data/strands.csv) / 1.5 = 1572 kN at γR = 1.0; / (1.5·0.9) = 1746.7 kN.
  it("γR = 1.0", () => expectRelClose(strandResistanceN(2_358_000), 2_358_000 / 1.5, 1e-12));
  it("γR = 0.9", () => expectRelClose(strandResistanceN(2_358_000, 0.9), 2_358_000 / (1.5 * 0.9), 1e-12));
});
