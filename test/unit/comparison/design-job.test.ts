// The compare page's workers design by the one rule (issue 12 item 4): for the demo study, at its
// own span and at another, the worker's job gives evaluateStudy's designs, proportions and figures.
import { readFileSync } from "node:fs";
import { describe, it, expect } from "vitest";
import { studyFromJson, setIn, type Study } from "../../../src/study";
import { defaultCatalogue } from "../../../src/catalogue/default-catalogue";
import { evaluateStudy, briefAtSpan, schemeResult } from "../../../src/pipeline";
import { designJob } from "../../../src/comparison/design-job";

const catalogue = defaultCatalogue();
function demo(): Study {
  const r = studyFromJson(readFileSync("data/demo-study.json", "utf8"));
  if (!r.ok) throw new Error("demo study invalid");
  return r.study;
}

describe("compare = span study = command line", () => {
  for (const [name, study] of [
    ["demo study, common rise", demo()],
    ["demo study, each scheme's own rise", setIn(demo(), ["brief", "riseRule"], "own")],
  ] as const) {
    it(`${name}: the worker's designs are evaluateStudy's at the study's span and at 120 m`, () => {
      for (const spanM of [undefined, 120]) {
        const brief = spanM === undefined ? study.brief : briefAtSpan(study.brief, spanM);
        const pipeline = evaluateStudy(study, catalogue, spanM === undefined ? {} : { spanM }).results;
        expect(pipeline.length).toBeGreaterThan(0);
        for (const r of pipeline) {
          const job = designJob(r.id, brief, study.schemes[r.id], study, catalogue);
          const page = schemeResult(r.id, r.label, job.design, study);
          expect(page.figures, `${r.id} at ${brief.spanM} m`).toEqual(r.figures);
          expect(job.proportions, `${r.id} at ${brief.spanM} m`).toEqual(r.proportions);
          expect(job.brief.riseM, `${r.id} at ${brief.spanM} m`).toBe(r.brief?.riseM);
        }
      }
    });
  }
});
