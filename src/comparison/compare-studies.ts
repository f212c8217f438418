import type { Study } from "../study/study";
import type { Catalogue } from "../catalogue/types";
import { assumptionsRecord, type Assumption } from "../study/assumptions";
import { setIn } from "../kernel/patch";
import { evaluateStudy, type SchemeFigures } from "../pipeline";

/** The figures a change is judged by. */
export const HEADLINE_METRICS = [
  { key: "selfWeightKgPerM2", label: "self-weight", unit: "kg/m² plan" },
  { key: "carbonKgCO2ePerM2Floor", label: "carbon", unit: "kgCO2e/m² floor" },
  { key: "costPerM2Floor", label: "cost", unit: "per m² floor" },
] as const satisfies readonly { key: keyof SchemeFigures; label: string; unit: string }[];

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

function metrics(f: SchemeFigures | undefined): Record<MetricKey, number | null> {
  return Object.fromEntries(HEADLINE_METRICS.map((m) => [m.key, f && f.feasible ? f[m.key] : null])) as Record<MetricKey, number | null>;
}

function figuresOf(study: Study, catalogue: Catalogue): SchemeFigures[] {
  return evaluateStudy(study, catalogue).results.map((r) => r.figures);
}

function deltas(a: SchemeFigures[], b: SchemeFigures[]): SchemeDelta[] {
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
  const headA = figuresOf(a, catalogue);
  const headB = figuresOf(b, catalogue);
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
        effect = deltas(headA, figuresOf(single, catalogue));
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
