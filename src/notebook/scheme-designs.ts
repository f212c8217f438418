// The designs of the study's enabled schemes for the carbon and rates pages: each scheme's design
// is the per-scheme signal of studySignals, so a factor or rate edit re-designs nothing.
import { computed, type ReadonlySignal } from "@preact/signals-core";
import { studySignals } from "./scheme-signals";
import type { StudyStore } from "./study-store";
import type { Design } from "../schemes";

export type SchemeDesign = { id: string; label: string; design: Design };

export function schemeDesigns(store: StudyStore): ReadonlySignal<SchemeDesign[]> {
  const { schemes } = studySignals(store);
  return computed(() => schemes.filter((s) => s.enabled.value).map((s) => ({ id: s.model.id, label: s.model.label, design: s.design.value })));
}

/** The areas of a design the assessments divide by. */
export function designAreas(design: Design) {
  return { usableFloorM2: design.usableFloorM2, planAreaM2: design.planAreaM2, roofSurfaceM2: design.roofSurfaceM2 };
}
