import type { DesignStatus } from "../schemes/types";

/** One span's value of a metric for each scheme (NaN or missing where the scheme is infeasible). */
export interface SpanValues {
  spanM: number;
  values: Readonly<Record<string, number>>;
  /** Each scheme's status there: only "feasible" ones can be best (a scheme without one counts by its value alone). */
  status?: Readonly<Record<string, DesignStatus>>;
}

/** A change of the best (lowest) scheme between two consecutive spans. */
export interface Crossover {
  /** Last span at which `from` was best, m. */
  fromSpanM: number;
  /** First span at which `to` is best, m. */
  toSpanM: number;
  from: string | null;
  to: string | null;
}

/**
 * The scheme with the lowest finite value at one span, or null when none is feasible. A scheme
 * whose status is given and is not "feasible" (out of its method's range, or infeasible) is never best.
 */
export function bestAt(values: Readonly<Record<string, number>>, status?: Readonly<Record<string, DesignStatus>>): string | null {
  let best: string | null = null;
  let bestValue = Number.POSITIVE_INFINITY;
  for (const [id, value] of Object.entries(values)) {
    const ranked = status?.[id] === undefined || status[id] === "feasible";
    if (ranked && Number.isFinite(value) && value < bestValue) {
      best = id;
      bestValue = value;
    }
  }
  return best;
}

/** Within this fraction of the lowest value the scheme that was best at the previous span stays best (a tie is no crossover). */
export const CROSSOVER_TIE = 0.02;

/**
 * The best scheme at each span, with hysteresis: the previous span's best stays best while it is
 * within CROSSOVER_TIE of the lowest value, so two schemes within a whisker of each other do not
 * flip-flop between neighbouring spans (issue 14).
 */
export function steadyBest(rows: readonly SpanValues[], tie = CROSSOVER_TIE): { spanM: number; best: string | null }[] {
  const sorted = [...rows].sort((a, b) => a.spanM - b.spanM);
  const out: { spanM: number; best: string | null }[] = [];
  let previous: string | null = null;
  for (const row of sorted) {
    const lowest = bestAt(row.values, row.status);
    const keptRanked: boolean = previous !== null && (row.status?.[previous] === undefined || row.status[previous] === "feasible");
    const kept: number | undefined = keptRanked && previous !== null ? row.values[previous] : undefined;
    const low = lowest === null ? Number.NaN : (row.values[lowest] ?? Number.NaN);
    const best: string | null = kept !== undefined && Number.isFinite(kept) && kept <= low * (1 + tie) ? previous : lowest;
    out.push({ spanM: row.spanM, best });
    previous = best;
  }
  return out;
}

/**
 * The spans at which the best (lowest) scheme changes, scanning the spans in order, with
 * near-ties kept with the previous best (see steadyBest). Between two sampled spans the change is known
 * only to lie in that interval; both ends are reported.
 */
export function crossovers(rows: readonly SpanValues[]): Crossover[] {
  const out: Crossover[] = [];
  let previous: { spanM: number; best: string | null } | undefined;
  for (const step of steadyBest(rows)) {
    if (previous && step.best !== previous.best) out.push({ fromSpanM: previous.spanM, toSpanM: step.spanM, from: previous.best, to: step.best });
    previous = step;
  }
  return out;
}

/** The crossovers in words, e.g. "the cable dome is lightest up to 120 m; from 130 m the cable net is". */
export function describeCrossovers(rows: readonly SpanValues[], quality: string, label: (id: string) => string): string {
  const sorted = [...rows].sort((a, b) => a.spanM - b.spanM);
  const first = sorted[0];
  const last = sorted[sorted.length - 1];
  if (!first || !last) return "No spans were evaluated.";
  const changes = crossovers(sorted);
  const name = (id: string | null) => (id === null ? "no scheme" : label(id));
  const start = steadyBest(sorted)[0]?.best ?? null;
  const sentence = (text: string) => `${text.charAt(0).toUpperCase()}${text.slice(1)}`;
  if (changes.length === 0) return sentence(`${name(start)} is ${quality} across the whole range (${first.spanM}–${last.spanM} m).`);
  const parts = [`${name(start)} is ${quality} from ${first.spanM} m`];
  for (const c of changes) parts.push(`${name(c.to)} from ${c.toSpanM} m (the change lies between ${c.fromSpanM} and ${c.toSpanM} m)`);
  return sentence(`${parts.join("; then ")}, up to ${last.spanM} m.`);
}
