import type { Study } from "../study/study";

/** The caption every chart carries: span, a brief summary, the factor set and the study's title it was drawn with. */
export function chartCaption(study: Study, extra = ""): string {
  const b = study.brief;
  const parts = [
    `Span ${b.spanM} m, rise ${b.riseM} m, eaves ${b.eavesHeightM} m, ≥ ${b.minClearHeightM} m clear`,
    `s_k ${b.snowGroundKPa} kPa, v_b ${b.windBasicMPerS} m/s terrain ${b.terrain}`,
    `carbon factors: ${study.carbon.settings.factorSetName}`,
    `study: ${study.meta.title}`,
  ];
  return `${parts.join(" · ")}${extra ? ` · ${extra}` : ""}. Feasibility-stage estimate.`;
}
