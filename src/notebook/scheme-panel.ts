import type { Design, OptionSpec, OptionValue, SchemeDeclaration } from "../schemes/types";
import { ON_DEMAND_ANALYSIS_OPTION, SCHEME_DECLARATIONS } from "../schemes/declarations";
import { onDemandAnalysesOn } from "../study/on-demand";
import type { Study } from "../study/study";
import { h, type ComponentChild } from "preact";
import { useLayoutEffect, useMemo, useRef } from "preact/hooks";
import { computed, effect } from "@preact/signals-core";
import { setIn } from "../kernel/patch";
import type { SchemeResult } from "../pipeline";
import { materialInfo } from "../materials";
import { tableElement, fmt } from "./format";
import { statusOf, metricValue } from "../comparison/verdict";
import { keyValues } from "./key-values";
import { NumberControl, SelectControl, ToggleControl, ControlGroup, mount } from "./controls";
import type { StudyStore } from "./study-store";

/**
 * A free proportion's "pinned" box (issue 12 item 4): pinned, the search leaves the option at its
 * value; pinning takes the value the search chose (`chosen`), so the design does not move, in one
 * checked edit of the study. Unpinned, a note beside the box names the value the design shown uses
 * (`chosen` read in an effect: a function that reads the design's signal keeps the note current).
 */
function PinControl({ store, model, optionKey, chosen }: { store: StudyStore; model: SchemeDeclaration; optionKey: string; chosen: (key: string) => OptionValue | undefined }): ComponentChild {
  const binding = useMemo(() => {
    const pinned = computed(() => store.study.value.schemes[model.id]?.pinned ?? []);
    return {
      value: computed(() => pinned.value.includes(optionKey)),
      set(on: boolean): void {
        const study = store.study.peek();
        const list = pinned.peek().filter((k) => k !== optionKey);
        const value = chosen(optionKey);
        const withValue = on && value !== undefined ? setIn(study, ["schemes", model.id, "options", optionKey], value) : study;
        const problem = store.replace(setIn(withValue, ["schemes", model.id, "pinned"], on ? [...list, optionKey] : list));
        if (problem !== null) store.notice.value = `Pinning ${optionKey}: ${problem}`;
      },
    };
  }, [store, model, optionKey, chosen]);
  // unpinned, the field keeps the study's value while the design shown uses the search's: say which
  const note = useRef<HTMLSpanElement>(null);
  useLayoutEffect(
    () =>
      effect(() => {
        const value = binding.value.value ? undefined : chosen(optionKey);
        if (note.current) note.current.textContent = typeof value === "number" ? `searched: the design shown uses ${fmt.sig3(value)}` : "";
      }),
    [binding, chosen, optionKey],
  );
  return h("div", { className: "pin" }, [h(ToggleControl, { binding, id: `${model.id}-${optionKey}-pinned`, label: "pinned (not searched)" }), h("span", { className: "chosen-note", ref: note })]);
}

/** One option's control, bound to the study at the scheme's option path. */
function OptionControl({ store, model, spec }: { store: StudyStore; model: SchemeDeclaration; spec: OptionSpec }): ComponentChild {
  const path = ["schemes", model.id, "options", spec.key];
  const id = `${model.id}-${spec.key}`;
  switch (spec.kind) {
    case "number":
      return h(NumberControl, { binding: store.bind<number>(path), id, label: spec.label, unit: spec.unit, min: spec.min, max: spec.max, step: spec.step, integer: spec.integer ?? false, hint: spec.source });
    case "select":
      return h(SelectControl, { binding: store.bind<string>(path), id, label: spec.label, choices: spec.choices });
    case "toggle":
      return h(ToggleControl, { binding: store.bind<boolean>(path), id, label: spec.label });
  }
}

/** The option controls of one scheme, from its OptionSpecs, bound to the study; a free one has a "pinned" box beside it. */
export function SchemeOptions({ store, model, chosen }: { store: StudyStore; model: SchemeDeclaration; chosen: (key: string) => OptionValue | undefined }): ComponentChild {
  return h(
    ControlGroup,
    { title: `${model.label}: options` },
    model.options.map((spec) =>
      spec.free === true
        ? h("div", { key: spec.key, className: "free-option" }, [h(OptionControl, { store, model, spec }), h(PinControl, { store, model, optionKey: spec.key, chosen })])
        : h(OptionControl, { key: spec.key, store, model, spec }),
    ),
  );
}

/** SchemeOptions mounted on an element of its own, for the compare page's hand-built cells. */
export function schemeOptionControls(store: StudyStore, model: SchemeDeclaration, chosen: (key: string) => OptionValue | undefined = () => undefined): HTMLElement {
  return mount(h(SchemeOptions, { store, model, chosen }));
}

/**
 * Where a page designs every span or draw without the on-demand analysis (withoutOnDemandAnalyses):
 * the sentence that says so when the study has it switched on, else "". `where`: "here (…)" or "of the draws (…)".
 */
export function onDemandLeftOutText(study: Study, where: string): string {
  const on = onDemandAnalysesOn(study).map((id) => `the ${SCHEME_DECLARATIONS.find((d) => d.id === id)?.label.toLowerCase() ?? id}`);
  return on.length === 0 ? "" : `The on-demand 3D analysis of ${new Intl.ListFormat("en", { type: "conjunction" }).format(on)}, switched on in this study, is left out ${where}.`;
}

/** The scheme's on-demand analysis option, or null when it offers none. */
export function onDemandAnalysisOption(model: SchemeDeclaration): OptionSpec | null {
  return model.options.find((o) => o.key === ON_DEMAND_ANALYSIS_OPTION && o.kind === "toggle") ?? null;
}

/**
 * Where a scheme's 3D model would be drawn but its analysis runs on demand: what it gives and a
 * button that switches the option on (as the Options panel's toggle does, kept in the study); once
 * on, that it is running (`current`: the design shown is for the study as it is), or why a current
 * design has none (its cautions say).
 */
export function onDemandAnalysis(store: StudyStore, model: SchemeDeclaration, spec: OptionSpec, current: boolean): HTMLElement {
  const binding = store.bind<boolean>(["schemes", model.id, "options", spec.key]);
  const wrap = document.createElement("div");
  wrap.className = "on-demand";
  const p = document.createElement("p");
  wrap.append(p);
  if (binding.value.value === true) {
    p.textContent = current ? "The 3D analysis is switched on but did not run for this design: the cautions above say why." : "The 3D analysis of the lattice is running (it takes seconds)…";
    return wrap;
  }
  p.textContent = `The 3D analysis of this lattice runs only when asked, as it takes seconds: a rigid-jointed frame of the actual net, with its lowest buckling factor, and its deformed shape and buckling mode drawn here. It is the option “${spec.label}” under Options (on the command line, --buckling).`;
  const button = document.createElement("button");
  button.type = "button";
  button.id = `${model.id}-run-analysis`;
  button.textContent = "Run the 3D analysis";
  button.addEventListener("click", () => binding.set(true));
  wrap.append(button);
  return wrap;
}

/** The member table of a design: forces (kN or MN) or, for a member in bending, moments (kNm), sections, utilisations, governing checks. */
export function memberTable(design: Design): HTMLElement {
  return tableElement(
    ["Element", "Count", "Length (m)", "Section", "Design force or moment", "Resistance", "Utilisation", "Governing check"],
    design.members.map((m) => [m.element, m.count, m.lengthM, m.section, m.bending ? fmt.moment(m.bending.designMomentNm) : fmt.force(m.designForceN), m.bending ? fmt.moment(m.bending.resistanceNm) : fmt.force(m.resistanceN), fmt.two(m.utilisation), fmt.plain(m.governing)]),
    { caption: "Members (force + tension, − compression; a member in bending by its moment)", numeric: [false, true, true, false, true, true, true, false] },
  );
}

/** The checks of a design with their clauses; forces in kN or MN, stresses and pressures in kPa or MPa. */
export function checkTable(design: Design): HTMLElement {
  return tableElement(
    ["Check", "Clause / source", "Demand", "Capacity", "Utilisation", "Passes"],
    design.checks.map((c) => [fmt.plain(c.name), fmt.plain(c.clause), fmt.quantity(c.demand, c.unit), fmt.quantity(c.capacity, c.unit), fmt.two(c.utilisation), c.passed ? "yes" : "NO"]),
    { caption: "Checks", numeric: [false, false, true, true, true, false], whole: [false, true] },
  );
}

/** The take-off: quantities and masses by element, with kg/m² of plan. */
export function takeoffTable(design: Design): HTMLElement {
  return tableElement(
    ["Element", "Material", "Quantity", "Unit", "Mass (t)", "kg/m² of plan"],
    design.takeoff.map((r) => [r.element, r.material === null ? "—" : (materialInfo(r.material)?.label ?? r.material), r.quantity, fmt.unit(r.unit), r.massKg / 1000, r.massKg / design.planAreaM2]),
    { caption: `Take-off (total ${fmt.mass(design.totalMassKg)}${design.roofMassKg < design.totalMassKg ? `; roof without anchors ${fmt.mass(design.roofMassKg)}` : ""}, ${fmt.sig3(design.selfWeightKgPerM2)} kg/m² of plan)`, numeric: [false, false, true, false, true, true] },
  );
}

/** One line on a scheme: its status and, where it has them, its carbon, cost and mass per m² of usable floor. */
export function schemeStatusLine(result: SchemeResult): HTMLElement {
  const { design } = result;
  const status = statusOf(design);
  const p = document.createElement("p");
  p.className = status === "feasible" ? "feasible" : status === "infeasible" ? "infeasible" : "out-of-range";
  const figures: string[] = [];
  const carbon = metricValue(result, "carbon");
  const cost = metricValue(result, "cost");
  const weight = metricValue(result, "weight");
  if (carbon !== null) figures.push(`${fmt.sig3(carbon)} kgCO2e/m²`);
  if (cost !== null && result.cost) figures.push(`${fmt.money(cost, result.cost.currency)}/m²`);
  if (weight !== null) figures.push(`${fmt.sig3(weight)} kg/m² of usable floor`);
  const lead =
    status === "infeasible"
      ? `Not feasible: ${fmt.plain(design.reason)}`
      : `${status === "feasible" ? "Feasible" : "Passes its checks, but the span is outside its method's valid range"}; governing check “${fmt.plain(design.governing)}” (utilisation ${fmt.two(design.maxUtilisation)})`;
  p.textContent = figures.length > 0 ? `${lead}. ${figures.join(" · ")}.` : `${lead}.`;
  return p;
}

/** The engineering figures of one scheme result, and its cautions in plain words. */
export function schemeSummary(result: SchemeResult): HTMLElement {
  const { design } = result;
  const wrap = document.createElement("div");
  const items: [string, string][] = design.summary.map((s) => [s.label, `${fmt.sig3(s.value)}${s.unit ? ` ${fmt.unit(s.unit)}` : ""}`]);
  items.push(["Self-weight", `${fmt.sig3(design.selfWeightKgPerM2)} kg/m² of plan`], ["Usable floor", `${fmt.sig3(design.usableFloorM2)} m²`], ["Roof mass ÷ enclosed air", fmt.two(design.roofMassKg / design.enclosedAirKg)]);
  if (design.iterations > 0) items.push(["Self-weight iterations", String(design.iterations)]);
  if (result.carbon?.perM2UsableFloor.perM2) items.push(["Embodied carbon (counted modules)", `${fmt.sig3(result.carbon.totals.counted / 1000)} tCO2e, ${fmt.sig3(result.carbon.perM2UsableFloor.perM2.counted)} kgCO2e/m² of usable floor`]);
  if (result.cost?.perM2UsableFloor) items.push(["Cost", `${fmt.money(result.cost.totals.total, result.cost.currency)}, ${fmt.money(result.cost.perM2UsableFloor.total, result.cost.currency)}/m² of usable floor`]);
  if (result.error) items.push(["Not assessed", fmt.plain(result.error)]);
  wrap.append(keyValues(items));
  if (design.warnings.length > 0) {
    const ul = document.createElement("ul");
    ul.className = "warnings";
    ul.setAttribute("aria-label", "Cautions");
    for (const w of design.warnings) {
      const li = document.createElement("li");
      li.textContent = fmt.plain(w);
      ul.append(li);
    }
    wrap.append(ul);
  }
  return wrap;
}
