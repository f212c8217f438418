// Compare page: the brief, the loads and geometry it implies, and the schemes side by side.
import "../src/notebook/style.css";
import demoStudy from "../data/demo-study.json";
import { startPage, reactiveCell, staticCell, briefControls, keyValues, chartFigure, computed, fmt } from "../src/notebook";
import { roofActions, designPressures } from "../src/loads";
import { envelope } from "../src/takeoff";
import { sectionChartOptions, chartCaption } from "../src/charts";

const { store, main } = startPage({
  id: "compare",
  demoStudy,
  intro:
    "Set the brief; every scheme is designed for it from published methods and compared on weight, embodied carbon and cost per m² of usable floor. Everything below updates as you type.",
});

const brief = computed(() => store.study.value.brief);
const actions = computed(() => roofActions(brief.value));
const env = computed(() => envelope(brief.value));

staticCell(main, { id: "brief", title: "Brief" }, briefControls(store));

reactiveCell(main, { id: "loads", title: "Design loads" }, () => {
  const a = actions.value;
  const b = brief.value;
  // Unit permanent load of 1 kPa shows the ULS factors at work; schemes add their own self-weight.
  const perKPa = designPressures(b, a, b.servicesKPa + 1);
  return keyValues([
    ["Snow shape μ1 (EN 1991-1-3 Table 5.2)", fmt.two(a.mu1)],
    ["Snow shape μ3, curved roof (§5.3.5)", fmt.two(a.mu3)],
    ["Snow on plan, uniform equivalent", `${fmt.two(a.snowKPa)} kPa (μ = ${fmt.two(a.muUniform)})`],
    ["Leading variable action", `${a.leadingVariable}, ${fmt.two(a.leadingVariableKPa)} kPa`],
    ["Peak velocity pressure q_p at crown (EN 1991-1-4 eq. 4.8)", `${fmt.two(a.peakWindKPa)} kPa at ${fmt.one(a.windHeightM)} m`],
    ["Characteristic net uplift", `${fmt.two(a.upliftKPa)} kPa`],
    ["ULS gravity for G_k = services + 1 kPa", `${fmt.two(perKPa.gravity.valueKPa)} kPa (eq. ${perKPa.gravity.expression})`],
    ["ULS uplift 1.0 G − 1.5 W for the same G_k", `${fmt.two(perKPa.upliftNetKPa)} kPa (negative = net uplift)`],
  ]);
});

reactiveCell(main, { id: "geometry", title: "Roof geometry and floor" }, () => {
  const e = env.value;
  return keyValues([
    ["Sphere radius R", `${fmt.one(e.cap.radiusM)} m`],
    ["Edge angle φ0", `${fmt.one((e.cap.edgeAngleRad * 180) / Math.PI)}°`],
    ["Roof surface", `${fmt.int(e.cap.surfaceM2)} m²`],
    ["Covered plan", `${fmt.int(e.planAreaM2)} m²`],
    ["Usable floor (under the roof surface)", `${fmt.int(e.usableFloorM2)} m² (${fmt.pct(e.usableFloorM2 / e.planAreaM2)} of plan)`],
    ["Enclosed volume", `${fmt.int(e.enclosedVolumeM3)} m³`],
    ["Enclosed air (ISA sea level, 1.225 kg/m³)", `${fmt.int(e.enclosedAirKg / 1000)} t`],
  ]);
});

reactiveCell(main, { id: "section", title: "Roof section" }, () =>
  chartFigure(
    sectionChartOptions({
      brief: brief.value,
      title: "Roof section through the centre: roof surface, walls and usable floor",
      caption: chartCaption(store.study.value),
    }),
    "roof-section",
  ),
);
