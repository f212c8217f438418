// The masts' site splices (issue 13 item 6, net6): a mast is shipped in segments no longer than
// road transport takes (MAST_SEGMENT_MAX_M, 12 m: common practice, no source) and spliced on site;
// each splice weighs MAST_SPLICE_TUBE_LENGTH_M of every tube it joins (an allowance, common
// practice, no source), taken off as its own row and carried in the mast's own weight.
import { describe, it, expect } from "vitest";
import { cableNet } from "../../../src/schemes/cable-net";
import { MAST_SEGMENT_MAX_M } from "../../../src/schemes/cable-net/laced-mast";
import { MAST_SPLICE_TUBE_LENGTH_M } from "../../../src/schemes/cable-net/sizing";
import { cableNetLayout } from "../../../src/schemes/cable-net/geometry";
import { DEFAULT_BRIEF } from "../../../src/brief";
import { defaultCatalogue } from "../../../src/catalogue/default-catalogue";
import { expectRelClose } from "../../helpers/close";

const catalogue = defaultCatalogue();
const o = cableNet.defaults;

describe("mast splices", () => {
  for (const spanM of [160, 300]) {
    it(`${spanM} m: one splice row, (segments − 1) joints a mast, each weighing ${MAST_SPLICE_TUBE_LENGTH_M} m of the four chords`, () => {
      const brief = { ...DEFAULT_BRIEF, spanM, riseM: (spanM * DEFAULT_BRIEF.riseM) / DEFAULT_BRIEF.spanM };
      const d = cableNet.design(brief, o, catalogue);
      const layout = cableNetLayout(brief, o.masts, o.mastRingRatio, o.mastHeightRatio, o.radialCablesPerMast, o.hangerSpacingM);
      const mast = d.members.find((m) => m.element === "masts")!;
      const chord = /4 × (CHS \S+) chords/.exec(mast.section)?.[1];
      expect(chord).toBeDefined(); // the default masts at these spans are laced
      const segments = Math.ceil(layout.mastLengthM / MAST_SEGMENT_MAX_M);
      expect(mast.section).toContain(`${segments} segments ≤ ${MAST_SEGMENT_MAX_M} m`);
      const rows = d.takeoff.filter((r) => r.element.startsWith("mast splices"));
      expect(rows).toHaveLength(1);
      const chordKgPerM = catalogue.chs.find((s) => s.designation === chord)!.massKgPerM;
      expectRelClose(rows[0]!.massKg, (segments - 1) * layout.masts * 4 * chordKgPerM * MAST_SPLICE_TUBE_LENGTH_M, 1e-9);
      expect(rows[0]!.element).toContain(`${(segments - 1) * layout.masts} site joints`);
      expect(rows[0]!.group).toBe(d.takeoff.find((r) => r.element === "masts")!.group);
    });
  }
});
