import type { Study } from "../study/study";

/** The caption every chart carries: the study's title, span, a brief summary and the factor set it was drawn with. */
export function chartCaption(study: Study, extra = ""): string {
  const b = study.brief;
  const parts = [
    study.meta.title,
    `Span ${b.spanM} m, rise ${b.riseM} m, eaves ${b.eavesHeightM} m, ≥ ${b.minClearHeightM} m clear`,
    `s_k ${b.snowGroundKPa} kPa, v_b ${b.windBasicMPerS} m/s terrain ${b.terrain}`,
    `carbon factors: ${study.carbon.settings.factorSetName}`,
  ];
  return `${parts.join(" · ")}${extra ? ` · ${extra}` : ""}. Feasibility-stage estimate.`;
}
