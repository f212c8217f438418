import type { Study } from "../study/study";
import { DEFAULT_RATE_SET_NAME } from "../cost/rate-table";

/** The caption every chart carries: span, a brief summary, the factor set (and the rate set when it is not the bundled one) and the study's title it was drawn with. */
export function chartCaption(study: Study, extra = ""): string {
  const b = study.brief;
  const parts = [
    `Span ${b.spanM} m, ${b.riseRule === "own" ? "each scheme its own rise" : `rise ${b.riseM} m`}, eaves ${b.eavesHeightM} m, ≥ ${b.minClearHeightM} m clear`,
    `s_k ${b.snowGroundKPa} kPa, v_b ${b.windBasicMPerS} m/s terrain ${b.terrain}`,
    `carbon factors: ${study.carbon.settings.factorSetName}`,
    // The rate set is named once it is not the bundled one (an import or an edited name).
    ...(study.cost.onCosts.rateSetName && study.cost.onCosts.rateSetName !== DEFAULT_RATE_SET_NAME ? [`rates: ${study.cost.onCosts.rateSetName}`] : []),
    `study: ${study.meta.title}`,
  ];
  return `${parts.join(" · ")}${extra ? ` · ${extra}` : ""}. Feasibility-stage estimate.`;
}
