import type { Study } from "../study/study";
import type { Catalogue } from "../catalogue/types";
import { assumptionsRecord, type Assumption } from "../study/assumptions";
import { setIn } from "../kernel/patch";
import { evaluateStudy, headline, type Headline } from "../pipeline";

/** The headline numbers a change is judged by. */
export const HEADLINE_METRICS = [
  { key: "self_weight_kg_per_m2", label: "self-weight", unit: "kg/m² plan" },
  { key: "carbon_kgco2e_per_m2_floor", label: "carbon", unit: "kgCO2e/m² floor" },
  { key: "cost_per_m2_floor", label: "cost", unit: "per m² floor" },
] as const;

export type MetricKey = (typeof HEADLINE_METRICS)[number]["key"];

/** One scheme's headline numbers in study A and B. */
export interface SchemeDelta {
  id: string;
  label: string;
  feasibleA: boolean;
  feasibleB: boolean;
  a: Record<MetricKey, number | null>;
  b: Record<MetricKey, number | null>;
}

/** One input that differs, and what that change alone does to each scheme (A with only this input taken from B). */
export interface InputChange {
  key: string;
  group: string;
  label: string;
  unit: string;
  valueA: string;
  valueB: string;
  /** Per scheme, the headline numbers with only this change; null when it cannot be applied alone. */
  effect: SchemeDelta[] | null;
}

export interface StudyComparison {
  changes: InputChange[];
  /** A and B as a whole. */
  overall: SchemeDelta[];
  /** Inputs present in only one of the studies (rows added or removed). */
  onlyInA: string[];
  onlyInB: string[];
  /** Changes beyond `maxEffects` are listed without their one-at-a-time effect. */
  effectsTruncated: boolean;
}

function metrics(h: Headline | undefined): Record<MetricKey, number | null> {
  return {
    self_weight_kg_per_m2: h && h.feasible ? h.self_weight_kg_per_m2 : null,
    carbon_kgco2e_per_m2_floor: h && h.feasible ? h.carbon_kgco2e_per_m2_floor : null,
    cost_per_m2_floor: h && h.feasible ? h.cost_per_m2_floor : null,
  };
}

function deltas(a: Headline[], b: Headline[]): SchemeDelta[] {
  const ids = [...new Set([...a.map((h) => h.id), ...b.map((h) => h.id)])];
  return ids.map((id) => {
    const ha = a.find((h) => h.id === id);
    const hb = b.find((h) => h.id === id);
    return { id, label: (ha ?? hb)?.label ?? id, feasibleA: ha?.feasible ?? false, feasibleB: hb?.feasible ?? false, a: metrics(ha), b: metrics(hb) };
  });
}

function parsePath(path: string): (string | number)[] {
  return path.split(/\.|(?=\[)/).map((part) => (part.startsWith("[") ? Number(part.slice(1, -1)) : part));
}

/**
 * What changed between two studies, and what each change does: every differing input with its
 * values in A and B and, for the first `maxEffects` changes, each scheme's headline numbers with
 * that change alone applied to A; plus the whole of A against the whole of B.
 */
export function compareStudies(a: Study, b: Study, catalogue: Catalogue, maxEffects = 40): StudyComparison {
  const recordA = new Map(assumptionsRecord(a).map((r) => [r.key, r]));
  const recordB = new Map(assumptionsRecord(b).map((r) => [r.key, r]));
  const headA = evaluateStudy(a, catalogue).results.map(headline);
  const headB = evaluateStudy(b, catalogue).results.map(headline);
  const differing: [Assumption, Assumption][] = [];
  for (const [key, ra] of recordA) {
    const rb = recordB.get(key);
    if (rb && rb.value !== ra.value) differing.push([ra, rb]);
  }
  const changes = differing.map(([ra, rb], index): InputChange => {
    let effect: SchemeDelta[] | null = null;
    if (index < maxEffects) {
      try {
        const single = setIn(a, parsePath(ra.path), rb.raw);
        effect = deltas(headA, evaluateStudy(single, catalogue).results.map(headline));
      } catch {
        effect = null;
      }
    }
    return { key: ra.key, group: ra.group, label: ra.label, unit: ra.unit, valueA: ra.value, valueB: rb.value, effect };
  });
  return {
    changes,
    overall: deltas(headA, headB),
    onlyInA: [...recordA.keys()].filter((k) => !recordB.has(k)),
    onlyInB: [...recordB.keys()].filter((k) => !recordA.has(k)),
    effectsTruncated: differing.length > maxEffects,
  };
}
