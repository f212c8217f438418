// @vitest-environment happy-dom
// Issue 10: any sequence of edits that the controls accept leaves a study that validates, the
// field and the study agree (or the field says which value is in force), and saving then
// reopening (a reload) gives the same study.
import { describe, it, expect } from "vitest";
import fc from "fast-check";
import demo from "../../data/demo-study.json";
import { createStudyStore } from "../../src/notebook/study-store";
import { briefControls } from "../../src/notebook/brief-controls";
import { schemeOptionControls } from "../../src/notebook/scheme-panel";
import { SCHEMES } from "../../src/schemes";
import { validateStudy, readStoredStudy, defaultStudy, getIn } from "../../src/study";

/** The number fields on the page: id and the study path each is bound to. */
function fields(): { id: string; path: (string | number)[] }[] {
  const brief = ["spanM", "riseM", "eavesHeightM", "minClearHeightM", "snowGroundKPa", "windBasicMPerS", "upliftCoefficient", "imposedRoofKPa", "servicesKPa"].map((k) => ({ id: k, path: ["brief", k] }));
  const factors = ["gammaGSup", "gammaGInf", "gammaQ", "xi"].map((k) => ({ id: k, path: ["brief", "factors", k] }));
  const options = SCHEMES.flatMap((m) => m.options.filter((o) => o.kind === "number").map((o) => ({ id: `${m.id}-${o.key}`, path: ["schemes", m.id, "options", o.key] })));
  return [...brief, ...factors, ...options];
}

const FIELDS = fields();
const edit = fc.record({
  field: fc.integer({ min: 0, max: FIELDS.length - 1 }),
  // Typed text: plausible numbers, extremes, prefixes of exponents, junk.
  text: fc.oneof(
    fc.integer({ min: -5, max: 600 }).map(String),
    fc.double({ min: -10, max: 600, noNaN: true }).map((x) => String(Math.round(x * 100) / 100)),
    fc.constantFrom("", "1e", "1e308", "-0", "abc", "0x10", "2.5e1", "Infinity"),
  ),
  // One keystroke at a time (each prefix is an input event) or pasted at once; committed or not.
  keystrokes: fc.boolean(),
  commit: fc.boolean(),
});

describe("edits through the controls (fast-check, happy-dom)", () => {
  it("leave a valid study, a field that agrees with it, and the same study after a reload", () => {
    fc.assert(
      fc.property(fc.array(edit, { minLength: 1, maxLength: 20 }), (edits) => {
        localStorage.clear();
        history.replaceState(null, "", "/compare.html");
        const store = createStudyStore({ initial: demo, persist: true });
        document.body.replaceChildren(briefControls(store), ...SCHEMES.map((m) => schemeOptionControls(store, m)));
        for (const e of edits) {
          const spec = FIELDS[e.field];
          if (!spec) continue;
          const input = document.getElementById(spec.id) as HTMLInputElement;
          input.focus();
          const steps = e.keystrokes ? Array.from(e.text, (_, i) => e.text.slice(0, i + 1)) : [e.text];
          for (const text of steps.length ? steps : [""]) {
            input.value = text;
            input.dispatchEvent(new Event("input"));
          }
          if (e.commit) input.dispatchEvent(new Event("change"));
          expect(validateStudy(store.study.value).ok).toBe(true);
          const inStudy = getIn(store.study.value, spec.path);
          const message = document.getElementById(`${spec.id}-message`)?.textContent ?? "";
          if (message === "") expect(Number(input.value) === inStudy).toBe(true); // === : the field may show "-0" for 0
          else expect(message).toMatch(new RegExp(`in force: ${String(inStudy).replace(/[.+]/g, "\\$&")}`));
          input.blur();
        }
        store.flush(); // the page is left (pagehide): a save waiting for the hand to stop is written now
        const reopened = readStoredStudy(localStorage, defaultStudy);
        expect(reopened?.message ?? null).toBeNull();
        expect(reopened ? reopened.study : store.study.value).toEqual(store.study.value);
        const reload = createStudyStore({ initial: demo, persist: true });
        expect(reload.study.value).toEqual(store.study.value);
      }),
      { numRuns: 30 },
    );
  });
});
