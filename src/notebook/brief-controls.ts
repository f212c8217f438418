import { numberControl, selectControl, controlGroup } from "./controls";
import type { StudyStore } from "./study-store";
import { BRIEF_LIMITS as L, TERRAIN_CATEGORIES } from "../study";

/** The brief's controls, bound to the study: geometry, loads, factors. */
export function briefControls(store: StudyStore): HTMLElement {
  const b = (key: string) => store.bind<number>(["brief", key]);
  const wrap = document.createElement("div");
  wrap.className = "grid";
  wrap.append(
    controlGroup("Geometry", [
      numberControl(b("spanM"), { id: "spanM", label: "Clear span (plan diameter)", unit: "m", ...L.spanM, step: 1, slider: true }),
      numberControl(b("riseM"), { id: "riseM", label: "Rise of the roof above the eaves", unit: "m", ...L.riseM, step: 0.5, slider: true, hint: "at most half the span" }),
      numberControl(b("eavesHeightM"), { id: "eavesHeightM", label: "Eaves height", unit: "m", ...L.eavesHeightM, step: 0.5 }),
      numberControl(b("minClearHeightM"), { id: "minClearHeightM", label: "Minimum clear height for usable floor", unit: "m", ...L.minClearHeightM, step: 0.5 }),
    ]),
    controlGroup("Site loads (characteristic)", [
      numberControl(b("snowGroundKPa"), { id: "snowGroundKPa", label: "Ground snow load s_k", unit: "kPa", ...L.snowGroundKPa, step: 0.05 }),
      numberControl(b("windBasicMPerS"), { id: "windBasicMPerS", label: "Basic wind velocity v_b", unit: "m/s", ...L.windBasicMPerS, step: 0.5 }),
      selectControl(store.bind<string>(["brief", "terrain"]), {
        id: "terrain",
        label: "Terrain category (EN 1991-1-4 Table 4.1)",
        choices: TERRAIN_CATEGORIES.map((t) => ({ value: t, label: `Category ${t}` })),
      }),
      numberControl(b("upliftCoefficient"), { id: "upliftCoefficient", label: "Net uplift pressure coefficient", unit: "–", ...L.upliftCoefficient, step: 0.05, hint: "editable assumption for a domed roof" }),
      numberControl(b("imposedRoofKPa"), { id: "imposedRoofKPa", label: "Roof imposed load, category H", unit: "kPa", ...L.imposedRoofKPa, step: 0.05 }),
      numberControl(b("servicesKPa"), { id: "servicesKPa", label: "Services and hung load (permanent)", unit: "kPa", ...L.servicesKPa, step: 0.05 }),
    ]),
    controlGroup("Partial factors (EN 1990 Table A1.2(B))", [
      numberControl(store.bind<number>(["brief", "factors", "gammaGSup"]), { id: "gammaGSup", label: "γ_G,sup", unit: "–", min: 1, max: 2, step: 0.05 }),
      numberControl(store.bind<number>(["brief", "factors", "gammaGInf"]), { id: "gammaGInf", label: "γ_G,inf", unit: "–", min: 0, max: 1.5, step: 0.05 }),
      numberControl(store.bind<number>(["brief", "factors", "gammaQ"]), { id: "gammaQ", label: "γ_Q", unit: "–", min: 1, max: 2, step: 0.05 }),
      numberControl(store.bind<number>(["brief", "factors", "xi"]), { id: "xi", label: "ξ (eq. 6.10b)", unit: "–", min: 0.5, max: 1, step: 0.01 }),
      selectControl(store.bind<string>(["brief", "ulsExpression"]), {
        id: "ulsExpression",
        label: "ULS expression",
        choices: [
          { value: "6.10a/b", label: "less favourable of 6.10a and 6.10b" },
          { value: "6.10", label: "6.10" },
        ],
      }),
    ]),
  );
  return wrap;
}
