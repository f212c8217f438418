// Issue 14, "short links": a link with one edited factor fits in an e-mail; old links still open.
import { describe, it, expect } from "vitest";
import demo from "../../../data/demo-study.json";
import { defaultStudy, validateStudy, encodeStudyLink, decodeStudyLink, compressStudyLink, inflateStudyLink, type Study } from "../../../src/study";
import { defaultsFingerprint } from "../../../src/study/link";
import { diff, setIn } from "../../../src/kernel/patch";

/** A link as format 1 made it (before issue 14): the whole diff with arrays whole, risk left out, no compression. */
function formatOneLink(study: Study, defaults: Study): string {
  const { risk: _r, ...rest } = study;
  const { risk: _d, ...base } = defaults;
  const bytes = new TextEncoder().encode(JSON.stringify({ v: study.schemaVersion, d: diff(base, rest) ?? {} }));
  return Buffer.from(bytes).toString("base64url");
}

function demoStudy(): Study {
  const checked = validateStudy(demo);
  if (!checked.ok) throw new Error("demo study invalid");
  return checked.study;
}

/** The length of the address fragment "#s=…" a page writes for a study. */
async function linkLength(study: Study, defaults: Study): Promise<number> {
  return `#s=${await compressStudyLink(encodeStudyLink(study, defaults))}`.length;
}

describe("short study links (issue 14)", () => {
  const defaults = defaultStudy();
  const base = demoStudy();
  const factorIndex = base.carbon.factors.findIndex((f) => f.material === "steel-hot-finished-hollow");
  const factorPath = ["carbon", "factors", factorIndex, "a1a3KgCO2ePerKg"];
  const oneFactor = setIn(base, factorPath, 2.02);
  const oneSnow = setIn(base, ["brief", "snowGroundKPa"], 1.2);
  const oneRange = setIn(base, ["risk", "inputs", 0, "high"], 1.8);

  it("one edited factor, one snow change or one risk range keeps the link under 1,000 characters and reopens the same study", async () => {
    for (const study of [oneFactor, oneSnow, oneRange]) {
      expect(await linkLength(study, defaults)).toBeLessThan(1000);
      const packed = await compressStudyLink(encodeStudyLink(study, defaults));
      expect(packed.startsWith("z")).toBe(true);
      const back = decodeStudyLink(await inflateStudyLink(packed), defaults);
      expect(back.ok && back.study).toEqual(study);
    }
  });

  it("the factor edited is a row of the demo study", () => {
    expect(factorIndex).toBeGreaterThanOrEqual(0);
  });

  it("an edited factor puts one leaf in the link, not the whole table", () => {
    const plain = encodeStudyLink(oneFactor, defaults);
    const json = Buffer.from(plain, "base64url").toString("utf8");
    expect(json).toContain("2.02");
    expect(json).not.toContain("steel-open-section");
  });

  it("links of format 1 (before compression) still open", () => {
    for (const study of [base, oneSnow, setIn(defaults, ["brief", "spanM"], 210)]) {
      const back = decodeStudyLink(formatOneLink(study, defaults), defaults);
      expect(back.ok && back.study.brief).toEqual(study.brief);
      expect(back.ok && back.study.carbon).toEqual(study.carbon);
    }
  });

  it("a damaged compressed link is refused when inflated, and a plain link passes through unchanged", async () => {
    await expect(inflateStudyLink("zAAAA-not-deflate")).rejects.toThrow();
    const plain = encodeStudyLink(base, defaults);
    expect(await inflateStudyLink(plain)).toBe(plain);
  });
});

describe("a link made against other defaults (they record only what differs from them)", () => {
  const today = defaultStudy();
  const hollow = today.carbon.factors.findIndex((f) => f.material === "steel-hot-finished-hollow");
  // the defaults as they were before 5 Dec 2026: the hollow-section factor 1.94, since set to its read value 2.13
  const before = setIn(today, ["carbon", "factors", hollow, "a1a3KgCO2ePerKg"], 1.94);
  const edited = setIn(before, ["brief", "spanM"], 120);
  it("opens, says so, and its untouched values are today's defaults", () => {
    const back = decodeStudyLink(encodeStudyLink(edited, before), today);
    expect(back.ok && back.otherDefaults).toBe(true);
    if (!back.ok) return;
    expect(back.study.brief.spanM).toBe(120);
    expect(back.study.carbon.factors[hollow]?.a1a3KgCO2ePerKg).toBe(today.carbon.factors[hollow]?.a1a3KgCO2ePerKg);
  });
  it("made against today's defaults, or before links recorded them, it opens without a word", () => {
    const same = decodeStudyLink(encodeStudyLink(edited, today), today);
    expect(same.ok && same.otherDefaults).toBeFalsy();
    const payload = JSON.parse(Buffer.from(encodeStudyLink(edited, before), "base64url").toString("utf8")) as Record<string, unknown>;
    expect(typeof payload.b).toBe("string");
    delete payload.b;
    const older = decodeStudyLink(Buffer.from(JSON.stringify(payload)).toString("base64url"), today);
    expect(older.ok && older.otherDefaults).toBeFalsy();
  });
  it("the fingerprint moves with any default and not with the risk settings, which links derive", () => {
    expect(defaultsFingerprint(before)).not.toBe(defaultsFingerprint(today));
    expect(defaultsFingerprint(setIn(today, ["brief", "snowGroundKPa"], 0.9))).not.toBe(defaultsFingerprint(today));
    expect(defaultsFingerprint({ ...today, risk: { ...today.risk, samples: 77 } })).toBe(defaultsFingerprint(today));
    expect(defaultsFingerprint(today)).toMatch(/^[0-9a-f]{8}$/);
  });
});
