import { numberControl, selectControl, controlGroup } from "./controls";
import type { StudyStore } from "./study-store";
import { BRIEF_FIELDS, type BriefField } from "../brief";

function fieldControl(store: StudyStore, field: BriefField): HTMLElement {
  const path = ["brief", ...field.key.split(".")];
  const id = path[path.length - 1];
  if (field.kind === "choice") return selectControl(store.bind<string>(path), { id, label: field.label, choices: field.choices });
  const { label, unit, min, max, step } = field;
  return numberControl(store.bind<number>(path), { id, label, unit, min, max, step, ...("slider" in field ? { slider: field.slider } : {}), ...("hint" in field ? { hint: field.hint } : {}) });
}

/** The brief's controls, bound to the study, one group after another, made from BRIEF_FIELDS. */
export function briefControls(store: StudyStore): HTMLElement {
  const wrap = document.createElement("div");
  wrap.className = "grid";
  const groups = [...new Set(BRIEF_FIELDS.map((f) => f.group))].filter((g) => g !== null);
  for (const group of groups) {
    wrap.append(controlGroup(group, BRIEF_FIELDS.filter((f) => f.group === group).map((f) => fieldControl(store, f))));
  }
  return wrap;
}
