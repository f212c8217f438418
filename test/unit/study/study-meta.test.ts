// Issue 10, item 2 (and item 1's "last changed"): the study's details are checked by the study
// schema, one rule for the editor, files and links; edits are stamped with when they were made.
import { describe, it, expect } from "vitest";
import { signal } from "@preact/signals-core";
import { defaultStudy, validateStudy, metaFieldProblem, setIn, encodeStudyLink, decodeStudyLink, type Study } from "../../../src/study";
import { stampEdits } from "../../../src/notebook/stamp-edits";
import { chartCaption } from "../../../src/charts";
import { describeChangedAt, studyDetailItems } from "../../../src/notebook/study-details";

describe("the study's details", () => {
  it("the editor's check is the schema's: a title is required, a date is YYYY-MM-DD, notes are capped", () => {
    expect(metaFieldProblem("title", "Riverside Hall")).toBeNull();
    expect(metaFieldProblem("title", "")).toMatch(/empty title/);
    expect(metaFieldProblem("title", "x".repeat(201))).toMatch(/at most 200/);
    expect(metaFieldProblem("author", "")).toBeNull();
    expect(metaFieldProblem("date", "2026-12-01")).toBeNull();
    expect(metaFieldProblem("date", "2026-13-40")).toMatch(/YYYY-MM-DD/);
    expect(metaFieldProblem("notes", "x".repeat(5001))).toMatch(/at most 5000/);
    const bad = validateStudy(setIn(defaultStudy(), ["meta", "title"], ""));
    expect(bad.ok ? [] : bad.problems.map((p) => p.path)).toEqual(["meta.title"]);
  });

  it("a study without changedAt is valid (files saved before it was recorded); a malformed one is refused, naming the field", () => {
    expect(validateStudy(defaultStudy()).ok).toBe(true);
    expect(validateStudy(setIn(defaultStudy(), ["meta", "changedAt"], "2026-12-02T20:15:00.000Z")).ok).toBe(true);
    const bad = validateStudy(setIn(defaultStudy(), ["meta", "changedAt"], "yesterday"));
    expect(bad.ok ? "" : bad.problems[0]?.path).toBe("meta.changedAt");
  });

  it("the details and when the study was last changed travel in a link", () => {
    const study = setIn(setIn(defaultStudy(), ["meta", "title"], "Riverside Hall"), ["meta", "changedAt"], "2026-12-02T20:15:00.000Z");
    const back = decodeStudyLink(encodeStudyLink(study, defaultStudy()), defaultStudy());
    expect(back.ok && back.study.meta).toMatchObject({ title: "Riverside Hall", changedAt: "2026-12-02T20:15:00.000Z" });
  });

  it("the chart caption names the study", () => {
    expect(chartCaption(setIn(defaultStudy(), ["meta", "title"], "Riverside Hall"))).toMatch(/^Span .* · study: Riverside Hall\. Feasibility-stage estimate\.$/);
  });

  it("says when the study was last changed, or that it was not recorded", () => {
    expect(describeChangedAt(setIn(defaultStudy(), ["meta", "changedAt"], "2026-12-02T20:05:09.123Z"))).toBe("2 Dec 2026, 20:05 UTC");
    expect(describeChangedAt(defaultStudy())).toMatch(/^not recorded/);
    expect(studyDetailItems(defaultStudy()).map(([k]) => k)).toEqual(["Title", "Prepared by", "Date", "Last changed", "Notes"]);
  });
});

describe("stampEdits", () => {
  const at = (iso: string) => () => new Date(iso);

  it("stamps every edit with its time, but not the study the page opened with", () => {
    const study = signal<Study>(defaultStudy());
    stampEdits(study, at("2026-12-02T20:15:00.000Z"));
    expect(study.value.meta.changedAt).toBeUndefined();
    study.value = setIn(study.value, ["brief", "spanM"], 90);
    expect(study.value.brief.spanM).toBe(90);
    expect(study.value.meta.changedAt).toBe("2026-12-02T20:15:00.000Z");
  });

  it("keeps the time an opened study carries", () => {
    const study = signal<Study>(defaultStudy());
    let now = "2026-12-02T20:15:00.000Z";
    stampEdits(study, () => new Date(now));
    study.value = setIn(study.value, ["brief", "spanM"], 90);
    const opened = setIn(defaultStudy(), ["meta", "changedAt"], "2026-11-30T08:00:00.000Z");
    study.value = opened;
    expect(study.value.meta.changedAt).toBe("2026-11-30T08:00:00.000Z");
    now = "2026-12-02T21:00:00.000Z";
    study.value = setIn(study.value, ["brief", "spanM"], 100);
    expect(study.value.meta.changedAt).toBe("2026-12-02T21:00:00.000Z");
  });
});
