// @vitest-environment happy-dom
// The study store in a simulated page (happy-dom): what is written to browser storage and when,
// links, other tabs, and the controls' refusals (issue 10, items 3, 4, 6, 7, 8).
import { describe, it, expect, beforeEach, afterEach, vi } from "vitest";
import demo from "../../../data/demo-study.json";
import { createStudyStore, SAVE_QUIET_MS } from "../../../src/notebook/study-store";
import { numberControl, selectControl } from "../../../src/notebook/controls";
import { briefControls } from "../../../src/notebook/brief-controls";
import { schemeOptionControls } from "../../../src/notebook/scheme-panel";
import { SCHEMES } from "../../../src/schemes";
import {
  defaultStudy,
  encodeStudyLink,
  setIn,
  studyFromJson,
  studyToJson,
  validateStudy,
  STORAGE_KEY,
  UNREADABLE_KEY,
  BEFORE_LINK_KEY,
  type Study,
} from "../../../src/study";

const open = () => createStudyStore({ initial: demo, persist: true });
const stored = (): Study | null => {
  const text = localStorage.getItem(STORAGE_KEY);
  const result = text === null ? null : studyFromJson(text);
  return result?.ok ? result.study : null;
};
function type(input: HTMLInputElement, text: string, commit = false): void {
  input.focus();
  input.value = text;
  input.dispatchEvent(new Event("input", { bubbles: true }));
  if (commit) input.dispatchEvent(new Event("change", { bubbles: true }));
}
const field = (id: string) => document.getElementById(id) as HTMLInputElement;
const messageOf = (id: string) => document.getElementById(`${id}-message`)?.textContent ?? "";

/** The hand stops: the quiet time passes and the waiting save runs. */
const settle = () => vi.advanceTimersByTime(SAVE_QUIET_MS);

beforeEach(() => {
  vi.useFakeTimers();
  localStorage.clear();
  history.replaceState(null, "", "/compare.html");
  document.body.replaceChildren();
});
afterEach(() => {
  vi.runOnlyPendingTimers(); // no store left with a save waiting for the next test
  vi.useRealTimers();
});

describe("item 3: controls check the candidate study against the schema", () => {
  it("refuses rise 100 m at span 160 m with the schema's message, and applies nothing", () => {
    const store = open();
    document.body.append(briefControls(store));
    const before = store.study.value;
    type(field("riseM"), "100");
    expect(store.study.value).toBe(before);
    expect(messageOf("riseM")).toMatch(/100 m \(expected 0 < rise ≤ span\/2 = 80 m\)/);
    expect(localStorage.getItem(STORAGE_KEY)).toBeNull();
  });

  it("refuses a span that would leave the rise above span/2, naming the rise", () => {
    const store = open();
    document.body.append(briefControls(store));
    type(field("spanM"), "40");
    expect(store.study.value.brief.spanM).toBe(160);
    expect(messageOf("spanM")).toMatch(/it would leave brief\.riseM at 22 m \(expected 0 < rise ≤ span\/2 = 20 m\) — not applied; in force: 160 m/);
  });

  it("refuses an odd number of radial cables per mast with an odd number of masts", () => {
    const store = open();
    const net = SCHEMES.find((m) => m.id === "cable-net");
    if (!net) throw new Error("no cable net");
    document.body.append(schemeOptionControls(store, net));
    type(field("cable-net-masts"), "3", true);
    expect(store.study.value.schemes["cable-net"].options.masts).toBe(3);
    const cables = store.study.value.schemes["cable-net"].options.radialCablesPerMast;
    type(field("cable-net-radialCablesPerMast"), "3");
    expect(store.study.value.schemes["cable-net"].options.radialCablesPerMast).toBe(cables);
    expect(messageOf("cable-net-radialCablesPerMast")).toMatch(/3 with 3 masts \(expected an even number/);
    expect(validateStudy(store.study.value).ok).toBe(true);
  });

  it("a select whose choice the binding refuses goes back and says why", () => {
    const store = open();
    const binding = { value: store.bind<string>(["brief", "terrain"]).value, set: () => undefined, check: () => "not today" };
    document.body.append(selectControl(binding, { id: "t", label: "Terrain", choices: [{ value: "II", label: "II" }, { value: "III", label: "III" }] }));
    const select = document.getElementById("t") as HTMLSelectElement;
    select.value = "II";
    select.dispatchEvent(new Event("change"));
    expect(select.value).toBe(store.study.value.brief.terrain);
    expect(messageOf("t")).toMatch(/not today/);
  });
});

describe("item 8: a field that ends invalid never leaves a valid prefix applied", () => {
  it("typing 1e308 into rise keeps the rise in force before the edit and says so", () => {
    const store = open();
    document.body.append(briefControls(store));
    const rise = field("riseM");
    rise.focus();
    for (const prefix of ["1", "1e", "1e3", "1e30", "1e308"]) type(rise, prefix);
    // The demo study's rise is 22 m.
    expect(store.study.value.brief.riseM).toBe(22);
    expect(messageOf("riseM")).toMatch(/not applied; in force: 22 m/);
    rise.dispatchEvent(new Event("change"));
    expect(rise.value).toBe("22");
    expect(stored()?.brief.riseM ?? 22).toBe(22);
  });

  it("a valid value typed and committed stays applied; the slider still drives the study", () => {
    const store = open();
    document.body.append(briefControls(store));
    type(field("riseM"), "30", true);
    expect(store.study.value.brief.riseM).toBe(30);
    const slider = document.querySelector<HTMLInputElement>("#riseM ~ input[type=range]");
    if (!slider) throw new Error("no slider");
    slider.value = "35";
    slider.dispatchEvent(new Event("input"));
    expect(store.study.value.brief.riseM).toBe(35);
    expect(field("riseM").value).toBe("35");
    slider.value = "90"; // beyond span/2: refused, slider back
    slider.dispatchEvent(new Event("input"));
    expect(store.study.value.brief.riseM).toBe(35);
    expect(slider.value).toBe("35");
    expect(messageOf("riseM")).toMatch(/expected 0 < rise ≤ span\/2/);
  });

  it("a plain signal binding (no check) still works", () => {
    let value = 5;
    const binding = { value: { value: 5, peek: () => value } as never, set: (x: number) => (value = x) };
    document.body.append(numberControl(binding, { id: "n", label: "N", unit: "", min: 0, max: 10, step: 1 }));
    type(field("n"), "7");
    expect(value).toBe(7);
  });
});

describe("item 4: a stored study that fails validation is never overwritten", () => {
  it("keeps the entry, backs it up, offers a download, and writes nothing until a change", () => {
    const newer = JSON.stringify({ ...defaultStudy(), schemaVersion: 99, brief: { ...defaultStudy().brief, spanM: 123 } });
    localStorage.setItem(STORAGE_KEY, newer);
    const store = open();
    expect(localStorage.getItem(STORAGE_KEY)).toBe(newer);
    expect(localStorage.getItem(UNREADABLE_KEY)).toBe(newer);
    const banner = store.banners.value.find((b) => b.id === "unreadable");
    expect(banner?.text).toMatch(/could not be used \(schemaVersion.*kept in browser storage under "spanbook\.study\.unreadable"/s);
    expect(banner?.actions.map((a) => a.label)).toEqual(["Download the unreadable study"]);
    store.bind<number>(["brief", "spanM"]).set(150);
    settle();
    expect(stored()?.brief.spanM).toBe(150);
    expect(localStorage.getItem(UNREADABLE_KEY)).toBe(newer);
  });

  it("a link opened over an unreadable entry is shown but not saved until a change", () => {
    localStorage.setItem(STORAGE_KEY, "{garbage");
    history.replaceState(null, "", `/compare.html#s=${encodeStudyLink(setIn(defaultStudy(), ["brief", "spanM"], 90), defaultStudy())}`);
    const store = open();
    expect(store.study.value.brief.spanM).toBe(90);
    expect(localStorage.getItem(STORAGE_KEY)).toBe("{garbage");
    expect(localStorage.getItem(UNREADABLE_KEY)).toBe("{garbage");
  });

  it("opening a page writes nothing to storage", () => {
    open();
    expect(localStorage.length).toBe(0);
  });
});

describe("item 7: a shared link keeps the local study as a backup", () => {
  it("keeps the local study, says so, and restores it", () => {
    const local = setIn(defaultStudy(), ["meta", "title"], "My local study");
    localStorage.setItem(STORAGE_KEY, studyToJson(local));
    const shared = setIn(setIn(defaultStudy(), ["meta", "title"], "Shared"), ["brief", "spanM"], 90);
    history.replaceState(null, "", `/compare.html#s=${encodeStudyLink(shared, defaultStudy())}`);
    const store = open();
    expect(store.study.value.brief.spanM).toBe(90);
    expect(studyFromJson(localStorage.getItem(BEFORE_LINK_KEY) ?? "").ok && stored()?.meta.title).toBe("Shared");
    const banner = store.banners.value.find((b) => b.id === "link");
    expect(banner?.text).toMatch(/“My local study”.*kept/);
    banner?.actions.find((a) => a.label === "Restore previous study")?.run();
    expect(store.study.value.meta.title).toBe("My local study");
    expect(stored()?.meta.title).toBe("My local study");
    const swapped = studyFromJson(localStorage.getItem(BEFORE_LINK_KEY) ?? "");
    expect(swapped.ok && swapped.study.meta.title).toBe("Shared");
  });
});

describe("a link made against other defaults", () => {
  it("a link made against other defaults opens with a notice saying its untouched values are today's", () => {
    const today = defaultStudy();
    const before = setIn(today, ["brief", "servicesKPa"], today.brief.servicesKPa + 0.1);
    history.replaceState(null, "", `/compare.html#s=${encodeStudyLink(setIn(before, ["brief", "spanM"], 90), before)}`);
    const store = open();
    expect(store.study.value.brief.spanM).toBe(90);
    expect(store.notice.value).toMatch(/This link was made when spanbook's defaults .* were different/);
    history.replaceState(null, "", `/compare.html#s=${encodeStudyLink(setIn(today, ["brief", "spanM"], 90), today)}`);
    expect(open().notice.value).not.toMatch(/defaults .* were different/);
  });
});

describe("item 6: another tab's save", () => {
  it("is taken over with a banner offering this tab's version back, and is not written again", () => {
    const store = open();
    store.bind<number>(["brief", "spanM"]).set(150);
    const other = setIn(store.study.value, ["brief", "riseM"], 30);
    const text = studyToJson(other);
    localStorage.setItem(STORAGE_KEY, text);
    window.dispatchEvent(new StorageEvent("storage", { key: STORAGE_KEY, newValue: text, oldValue: null }));
    expect(store.study.value.brief.riseM).toBe(30);
    const banner = store.banners.value.find((b) => b.id === "other-tab");
    expect(banner?.text).toMatch(/Another tab changed the study/);
    banner?.actions[0]?.run();
    expect(store.study.value.brief.riseM).toBe(22);
    expect(stored()?.brief.riseM).toBe(22);
  });

  it("an unreadable save from another tab is kept, not applied", () => {
    const store = open();
    localStorage.setItem(STORAGE_KEY, "{nope");
    window.dispatchEvent(new StorageEvent("storage", { key: STORAGE_KEY, newValue: "{nope", oldValue: null }));
    expect(store.study.value.brief.spanM).toBe(160);
    expect(localStorage.getItem(UNREADABLE_KEY)).toBe("{nope");
    store.bind<number>(["brief", "spanM"]).set(150);
    settle();
    expect(stored()?.brief.spanM).toBe(150);
  });
});

describe("issue 14: saved once the hand stops, and never lost when the page goes", () => {
  const drag = (store: ReturnType<typeof open>, spans: readonly number[]) => {
    const span = store.bind<number>(["brief", "spanM"]);
    for (const x of spans) {
      span.set(x);
      vi.advanceTimersByTime(16);
    }
  };
  const spans = Array.from({ length: 20 }, (_, k) => 100 + k);

  it("a drag of 20 steps writes nothing to browser storage until the quiet time after the last step, then the last span", () => {
    const store = open();
    const span = store.bind<number>(["brief", "spanM"]);
    for (const x of spans) {
      span.set(x);
      vi.advanceTimersByTime(16);
      expect(localStorage.getItem(STORAGE_KEY)).toBeNull();
    }
    vi.advanceTimersByTime(SAVE_QUIET_MS - 17);
    expect(localStorage.getItem(STORAGE_KEY)).toBeNull();
    vi.advanceTimersByTime(1);
    expect(stored()?.brief.spanM).toBe(119);
  });

  it("while an edit waits the address carries no study; once saved it carries the study's link", async () => {
    const store = open();
    expect(location.hash).toMatch(/^#s=/);
    drag(store, spans);
    expect(location.hash).toBe("");
    // "Copy link" reads the store's link: always the current study, saved or not.
    expect(store.link.value).toBe(`#s=${encodeStudyLink(store.study.value, defaultStudy())}`);
    settle();
    vi.advanceTimersToNextTimer();
    // the compressed link, once compressed (the plain one is written at once only as the page opens or goes)
    await vi.waitFor(() => expect(location.hash).toBe(store.link.value));
    expect(location.hash).toMatch(/^#s=z/);
  });

  it("after the quiet time the study is stored first and the address follows in a task of its own; an edit in between keeps the address empty", async () => {
    const store = open();
    drag(store, spans);
    vi.advanceTimersByTime(SAVE_QUIET_MS - 16);
    expect(stored()?.brief.spanM).toBe(119);
    expect(location.hash).toBe("");
    vi.advanceTimersToNextTimer();
    await vi.waitFor(() => expect(location.hash).toMatch(/^#s=z/));
    // the same again, with an edit between the save and the address's turn
    drag(store, [130]);
    vi.advanceTimersByTime(SAVE_QUIET_MS - 16);
    expect(stored()?.brief.spanM).toBe(130);
    store.bind<number>(["brief", "spanM"]).set(131);
    vi.advanceTimersToNextTimer();
    expect(location.hash).toBe("");
    settle();
    vi.advanceTimersToNextTimer();
    expect(stored()?.brief.spanM).toBe(131);
    await vi.waitFor(() => expect(location.hash).toBe(store.link.value));
  });

  it("pagehide saves the waiting edit at once", () => {
    const store = open();
    drag(store, spans);
    expect(stored()).toBeNull();
    window.dispatchEvent(new Event("pagehide"));
    expect(stored()?.brief.spanM).toBe(119);
    expect(location.hash).toMatch(/^#s=/);
  });

  it("the page going hidden saves the waiting edit at once", () => {
    const store = open();
    drag(store, spans);
    Object.defineProperty(document, "visibilityState", { value: "hidden", configurable: true });
    try {
      document.dispatchEvent(new Event("visibilitychange"));
    } finally {
      Object.defineProperty(document, "visibilityState", { value: "visible", configurable: true });
    }
    expect(stored()?.brief.spanM).toBe(119);
  });

  it("following a link on the page saves the waiting edit first; another click does not", () => {
    const store = open();
    const a = document.createElement("a");
    a.href = "#nowhere";
    a.append(document.createElement("span"));
    const button = document.createElement("button");
    document.body.append(a, button);
    drag(store, spans);
    button.click();
    expect(stored()).toBeNull();
    a.querySelector("span")?.click();
    expect(stored()?.brief.spanM).toBe(119);
  });

  it("another tab's save arriving while an edit waits is taken over; this tab's edit is offered back, not written over it", () => {
    const store = open();
    drag(store, [150]);
    const theirs = setIn(defaultStudy(), ["brief", "riseM"], 30);
    const text = studyToJson(theirs);
    localStorage.setItem(STORAGE_KEY, text);
    window.dispatchEvent(new StorageEvent("storage", { key: STORAGE_KEY, newValue: text, oldValue: null }));
    settle();
    expect(localStorage.getItem(STORAGE_KEY)).toBe(text);
    expect(store.study.value.brief.riseM).toBe(30);
    store.banners.value.find((b) => b.id === "other-tab")?.actions[0]?.run();
    expect(stored()?.brief.spanM).toBe(150);
    expect(stored()?.brief.riseM).toBe(22);
  });
});
