import { h, type ComponentChild } from "preact";
import { NumberControl, SelectControl, ControlGroup, mount } from "./controls";
import type { StudyStore } from "./study-store";
import { BRIEF_FIELDS, type BriefField } from "../brief";

/** One field of the brief, bound to the study at brief.<key>. */
function BriefFieldControl({ store, field }: { store: StudyStore; field: BriefField }): ComponentChild {
  const path = ["brief", ...field.key.split(".")];
  const id = path[path.length - 1];
  if (field.kind === "choice") return h(SelectControl, { binding: store.bind<string>(path), id, label: field.label, choices: field.choices });
  const { label, unit, min, max, step } = field;
  return h(NumberControl, { binding: store.bind<number>(path), id, label, unit, min, max, step, ...("slider" in field ? { slider: field.slider } : {}), ...("hint" in field ? { hint: field.hint } : {}) });
}

/** The brief's controls, bound to the study, one group after another, made from BRIEF_FIELDS. */
export function BriefControls({ store }: { store: StudyStore }): ComponentChild {
  const groups = [...new Set(BRIEF_FIELDS.map((f) => f.group))].filter((g) => g !== null);
  return h(
    "div",
    { className: "grid" },
    groups.map((group) => h(ControlGroup, { key: group, title: group }, BRIEF_FIELDS.filter((f) => f.group === group).map((f) => h(BriefFieldControl, { key: f.key, store, field: f })))),
  );
}

/** BriefControls mounted on an element of its own, for the pages' hand-built cells. */
export function briefControls(store: StudyStore): HTMLElement {
  return mount(h(BriefControls, { store }));
}
