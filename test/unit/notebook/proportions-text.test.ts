// The chosen proportions in words (issue 12 item 4): each searched proportion with its label and
// unit, the goal, the pins, where the rise came from, and the runner-up's difference.
import { describe, it, expect } from "vitest";
import { geodesicDome } from "../../../src/schemes/geodesic-dome";
import { cableDome } from "../../../src/schemes/cable-dome";
import type { SchemeModel } from "../../../src/schemes/types";
import type { ProportionChoice } from "../../../src/pipeline/proportions";
import { proportionsSentences, proportionText } from "../../../src/notebook/proportions-text";

const model = geodesicDome as unknown as SchemeModel;
// A choice as the search reports one (its numbers are inputs to the wording, not check values).
const choice: ProportionChoice = {
  objective: "carbon",
  searched: ["targetStrutLengthM", "riseM"],
  pinned: ["doubleLayerDepthPct"],
  proportions: { targetStrutLengthM: 6.5, doubleLayerDepthPct: 2, riseM: 22.4 },
  riseM: 22.4,
  riseSource: "searched",
  value: 120,
  evaluations: 17,
  runnerUp: { proportions: { targetStrutLengthM: 7, doubleLayerDepthPct: 2, riseM: 22.4 }, riseM: 22.4, value: 121.5, differencePct: 1.25 },
};

describe("proportions in words", () => {
  it("names each proportion with its label and unit", () => {
    expect(proportionText(model, "targetStrutLengthM", 6.5)).toBe("Target strut length 6.5 m");
    expect(proportionText(model, "riseM", 22.4)).toBe("rise 22.4 m");
  });

  it("says what was chosen for which goal, what is pinned, and how much the runner-up differs in what", () => {
    const text = proportionsSentences(model, choice).join(" ");
    expect(text).toContain("least embodied carbon");
    expect(text).toContain("Target strut length 6.5 m");
    expect(text).toContain("rise 22.4 m (searched)");
    expect(text).toContain("17 designs tried");
    expect(text).toContain("Pinned by you: Double-layer depth 2 % of span.");
    expect(text).toContain("The runner-up (Target strut length 7 m) is 1.3 % higher.");
  });

  it("says so when nothing was searched, when nothing feasible was found, and when no runner-up was feasible", () => {
    expect(proportionsSentences(model, { ...choice, searched: [], pinned: [], riseSource: "common", runnerUp: null }).join(" ")).toContain("Nothing to search");
    expect(proportionsSentences(model, { ...choice, value: Number.POSITIVE_INFINITY }).join(" ")).toContain("No feasible proportions were found among the 17 designs tried");
    expect(proportionsSentences(model, { ...choice, runnerUp: null }).join(" ")).toContain("No other proportions tried were feasible");
  });

  it("calls a runner-up of the same value as good rather than '0.0 % higher'", () => {
    const tie = { ...choice, runnerUp: { ...choice.runnerUp!, value: 120, differencePct: 0 } };
    const text = proportionsSentences(model, tie).join(" ");
    expect(text).toContain("is as good (within 0.05 %)");
    expect(text).not.toContain("0.0 % higher");
  });

  it("says when the least found is lower and the proportions nearer their reference were kept within the band", () => {
    const lower = { ...choice, runnerUp: { ...choice.runnerUp!, value: 118.2, differencePct: -1.5 } };
    const text = proportionsSentences(model, lower).join(" ");
    expect(text).toContain("The least found (Target strut length 7 m) is 1.5 % lower: within 2 % of it the proportions nearest their reference are kept");
    expect(text).not.toContain("as good");
  });

  it("says when the candidates were compared on the fast first estimate and the chosen ones designed in full, with what was chosen again", () => {
    const dome = cableDome as unknown as SchemeModel;
    const full = { ...choice, searched: ["postHeightRatio", "riseM"], pinned: [], proportions: { postHeightRatio: 0.35, riseM: 12.8 }, riseM: 12.8, full: { screening: { analysis: "closed-form" }, options: { analysis: "3d" }, refined: ["riseM", "postHeightRatio"], evaluations: 8 } };
    const text = proportionsSentences(dome, full).join(" ");
    expect(text).toContain("The candidates were compared with Analysis: Closed form only (the fast first estimate); the chosen ones are designed with Analysis: 3D nonlinear (sizes from the analysed forces), where the rise and Diagonal rise per bay");
    expect(text).toContain("were chosen again on 8 such designs");
    expect(text).toContain("On the first estimate: the runner-up");
    // without refinements only the two analyses are named
    expect(proportionsSentences(dome, { ...full, full: { ...full.full, refined: [] } }).join(" ")).toContain("designed with Analysis: 3D nonlinear (sizes from the analysed forces).");
  });
});
