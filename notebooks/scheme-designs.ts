// The designs of the study's enabled schemes, recomputed only when the brief or the scheme
// settings change (not when a carbon factor or a rate is edited). Shared by the carbon and rates pages.
import { computed, type ReadonlySignal } from "../src/notebook";
import type { StudyStore } from "../src/notebook";
import { SCHEMES, type Design } from "../src/schemes";
import { designScheme } from "../src/pipeline";
import { defaultCatalogue } from "../src/catalogue/default-catalogue";

export type SchemeDesign = { id: string; label: string; design: Design };

export function schemeDesigns(store: StudyStore): ReadonlySignal<SchemeDesign[]> {
  const brief = computed(() => store.study.value.brief);
  const schemes = computed(() => store.study.value.schemes);
  const catalogue = defaultCatalogue();
  return computed(() => {
    const b = brief.value;
    const s = schemes.value;
    return SCHEMES.filter((m) => s[m.id]?.enabled !== false).map((m) => ({ id: m.id, label: m.label, design: designScheme(m, b, s[m.id]?.options, catalogue) }));
  });
}

/** The areas of a design the assessments divide by. */
export function designAreas(design: Design) {
  return { usableFloorM2: design.usableFloorM2, planAreaM2: design.planAreaM2, roofSurfaceM2: design.roofSurfaceM2 };
}
