// The chosen proportions in words (issue 12 item 4): each searched proportion with its label and
// unit, the goal, the pins, where the rise came from, and the runner-up's difference.
import { describe, it, expect } from "vitest";
import { geodesicDome } from "../../../src/schemes/geodesic-dome";
import { cableDome } from "../../../src/schemes/cable-dome";
import { cableNet } from "../../../src/schemes/cable-net";
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
    // without the field's note in brackets ("Hoops (0 = automatic)"); a bracket inside the name stays
    expect(proportionText(cableDome as unknown as SchemeModel, "hoops", 1)).toBe("Hoops 1");
    expect(proportionText(cableNet as unknown as SchemeModel, "hangerSpacingM", 6)).toBe("Hanger (circumferential cable) spacing, at most 6 m");
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
    expect(text).toContain("The least found (Target strut length 7 m) is 1.5 % lower: the search keeps the proportions nearest their reference among those within 2 % of the best it settles on");
    expect(text).not.toContain("as good");
  });

  it("says when the candidates were compared on the fast first estimate and the chosen ones designed in full, with what was chosen again", () => {
    const dome = cableDome as unknown as SchemeModel;
    // the first estimate chose 0.53 (its runner-up, 0.45, 1 % lower); the full designs moved it to 0.35, 0.4 being 3 % higher
    const first = { proportions: { postHeightRatio: 0.53, riseM: 12.8 }, riseM: 12.8 };
    const full = {
      ...choice,
      searched: ["postHeightRatio", "riseM"],
      pinned: [],
      proportions: { postHeightRatio: 0.35, riseM: 12.8 },
      riseM: 12.8,
      runnerUp: { proportions: { postHeightRatio: 0.45, riseM: 12.8 }, riseM: 12.8, value: 118.8, differencePct: -1 },
      full: { screening: { analysis: "closed-form" }, options: { analysis: "3d" }, refined: ["riseM", "postHeightRatio"], evaluations: 8, first, runnerUp: { proportions: { postHeightRatio: 0.4, riseM: 12.8 }, riseM: 12.8, value: 123.6, differencePct: 3 } },
    };
    const text = proportionsSentences(dome, full).join(" ");
    expect(text).toContain("The candidates were compared with Analysis: Closed form only (the fast first estimate); the chosen ones are designed with Analysis: 3D nonlinear (sizes from the analysed forces), where the rise and Diagonal rise per bay");
    expect(text).toContain("were chosen again on 8 such designs");
    // the field's note in brackets stays on the field, not in the sentence
    expect(text).not.toContain("(post depth");
    const post = "Diagonal rise per bay";
    expect(text).toContain(`Of those designs: the runner-up (${post} 0.4) is 3.0 % higher.`);
    // the first estimate's runner-up is named against what the first estimate chose, not against the final choice
    expect(text).toContain(`On the first estimate, which chose ${post} 0.53: the least found (${post} 0.45) is 1.0 % lower`);
    // where the full designs kept the first estimate's choice, it is not repeated; where none of the others was feasible, that is said
    const kept = proportionsSentences(dome, { ...full, proportions: first.proportions, full: { ...full.full, runnerUp: null } }).join(" ");
    expect(kept).toContain(`On the first estimate: the least found (${post} 0.45)`);
    expect(kept).toContain("Of those designs: no other proportions tried were feasible.");
    // where both runner-ups are lower, the band is explained once
    const both = proportionsSentences(dome, { ...full, full: { ...full.full, runnerUp: { ...full.full.runnerUp, value: 117.6, differencePct: -2 } } }).join(" ");
    expect(both).toContain(`Of those designs: the least found (${post} 0.4) is 2.0 % lower: the search keeps the proportions nearest their reference`);
    expect(both).toContain(`the least found (${post} 0.45) is 1.0 % lower (the same rule as above).`);
    expect(both.match(/the search keeps/g)).toHaveLength(1);
    // without refinements only the two analyses are named
    const unrefined = proportionsSentences(dome, { ...full, full: { ...full.full, refined: [] } }).join(" ");
    expect(unrefined).toContain("designed with Analysis: 3D nonlinear (sizes from the analysed forces).");
    expect(unrefined).not.toContain("Of those designs");
    // three proportions chosen again are listed with commas and a last "and"
    const net = cableNet as unknown as SchemeModel;
    const three = proportionsSentences(net, { ...full, searched: ["masts", "mastRingRatio", "mastHeightRatio"], proportions: { masts: 6, mastRingRatio: 0.6, mastHeightRatio: 0.15 }, runnerUp: null, full: { ...full.full, refined: ["masts", "mastHeightRatio", "mastRingRatio"], runnerUp: null } }).join(" ");
    expect(three).toContain("where Masts, Mast height above roof / span and Mast ring radius / plan radius were chosen again on 8 such designs");
  });
});
