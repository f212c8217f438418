import type { Design, SchemeModel } from "../schemes/types";
import type { SchemeResult } from "../pipeline";
import { materialInfo } from "../materials";
import { tableElement, fmt } from "./format";
import { keyValues } from "./key-values";
import { numberControl, selectControl, toggleControl, controlGroup } from "./controls";
import type { StudyStore } from "./study-store";

/** The option controls of one scheme, from its OptionSpecs, bound to the study. */
export function schemeOptionControls(store: StudyStore, model: SchemeModel): HTMLElement {
  const controls = model.options.map((spec) => {
    const path = ["schemes", model.id, "options", spec.key];
    const id = `${model.id}-${spec.key}`;
    const hint = spec.source;
    switch (spec.kind) {
      case "number":
        return numberControl(store.bind<number>(path), { id, label: spec.label, unit: spec.unit, min: spec.min, max: spec.max, step: spec.step, integer: spec.integer ?? false, hint });
      case "select":
        return selectControl(store.bind<string>(path), { id, label: spec.label, choices: spec.choices });
      case "toggle":
        return toggleControl(store.bind<boolean>(path), { id, label: spec.label });
    }
  });
  return controlGroup(`${model.label}: options`, controls);
}

const N_TO_KN = 1e-3;

/** The member table of a design: forces, sections, utilisations, governing checks. */
export function memberTable(design: Design): HTMLElement {
  return tableElement(
    ["Element", "Count", "Length (m)", "Section", "Design force (kN)", "Resistance (kN)", "Utilisation", "Governing check"],
    design.members.map((m) => [m.element, m.count, m.lengthM, m.section, m.designForceN * N_TO_KN, m.resistanceN * N_TO_KN, fmt.two(m.utilisation), m.governing]),
    { caption: "Members (force + tension, − compression)", numeric: [false, true, true, false, true, true, true, false] },
  );
}

/** The checks of a design with their clauses. */
export function checkTable(design: Design): HTMLElement {
  return tableElement(
    ["Check", "Clause / source", "Demand", "Capacity", "Unit", "Utilisation", "Passes"],
    design.checks.map((c) => [c.name, c.clause, c.demand, c.capacity, c.unit, fmt.two(c.utilisation), c.passed ? "yes" : "NO"]),
    { caption: "Checks", numeric: [false, false, true, true, false, true, false] },
  );
}

/** The take-off: quantities and masses by element, with kg/m² of plan. */
export function takeoffTable(design: Design): HTMLElement {
  return tableElement(
    ["Element", "Material", "Quantity", "Unit", "Mass (t)", "kg/m² plan"],
    design.takeoff.map((r) => [r.element, r.material === null ? "—" : (materialInfo(r.material)?.label ?? r.material), r.quantity, r.unit, r.massKg / 1000, r.massKg / design.planAreaM2]),
    { caption: `Take-off (total ${fmt.int(design.totalMassKg / 1000)} t${design.roofMassKg < design.totalMassKg ? `; roof without anchors ${fmt.int(design.roofMassKg / 1000)} t` : ""}, ${fmt.one(design.selfWeightKgPerM2)} kg/m² of plan)`, numeric: [false, false, true, false, true, true] },
  );
}

/** Summary, verdict and warnings of one scheme result. */
export function schemeSummary(result: SchemeResult): HTMLElement {
  const { design } = result;
  const wrap = document.createElement("div");
  const verdict = document.createElement("p");
  verdict.className = design.feasible ? "feasible" : "infeasible";
  verdict.textContent = design.feasible
    ? `Feasible. Governing: ${design.governing} at utilisation ${fmt.two(design.maxUtilisation)}; self-weight converged in ${design.iterations} iterations.`
    : `Not feasible: ${design.reason}`;
  wrap.append(verdict);
  const items: [string, string][] = design.summary.map((s) => [s.label, `${fmt.sig3(s.value)}${s.unit ? ` ${s.unit}` : ""}`]);
  items.push(["Self-weight", `${fmt.one(design.selfWeightKgPerM2)} kg/m² of plan`], ["Usable floor", `${fmt.int(design.usableFloorM2)} m²`], ["Roof mass ÷ enclosed air", fmt.two(design.roofMassKg / design.enclosedAirKg)]);
  if (result.carbon?.perM2UsableFloor.perM2) items.push(["Embodied carbon (counted modules)", `${fmt.int(result.carbon.totals.counted / 1000)} tCO2e, ${fmt.int(result.carbon.perM2UsableFloor.perM2.counted)} kgCO2e/m² floor`]);
  if (result.cost?.perM2UsableFloor) items.push(["Cost", `${fmt.one(result.cost.totals.total / 1e6)} million ${result.cost.currency}, ${fmt.int(result.cost.perM2UsableFloor.total)} ${result.cost.currency}/m² floor`]);
  if (result.error) items.push(["Assessment", result.error]);
  wrap.append(keyValues(items));
  if (design.warnings.length > 0) {
    const ul = document.createElement("ul");
    ul.className = "warnings";
    for (const w of design.warnings) {
      const li = document.createElement("li");
      li.textContent = w;
      ul.append(li);
    }
    wrap.append(ul);
  }
  return wrap;
}
