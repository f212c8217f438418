// The compare page's answer in words (issue 14, "the answer first"), from the pure verdict.
import type { SchemeResult } from "../pipeline";
import { verdict, carbonDriver, VERDICT_METRICS, type VerdictMetric } from "../comparison/verdict";
import { fmt } from "./format";

/** A scheme's label inside a sentence: "the cable dome". */
export function inSentence(label: string): string {
  return `the ${label.charAt(0).toLowerCase()}${label.slice(1)}`;
}

function capitalised(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/** A metric's value with its unit, per m² of usable floor. */
export function metricText(metric: VerdictMetric, value: number, currency: string): string {
  if (metric === "cost") return `${fmt.money(value, currency)}/m²`;
  if (metric === "carbon") return `${fmt.sig3(value)} kgCO2e/m²`;
  return `${fmt.sig3(value)} kg/m²`;
}

export interface AnswerPart {
  /** The sentence. */
  text: string;
  /** For tests and styling: the winner's id and the metrics it wins, or "excluded". */
  winner?: { id: string; metrics: VerdictMetric[] };
}

/**
 * One sentence per winning scheme (a scheme that wins two measures gets one sentence), with the
 * margin against the next and the main reason (its governing check and the material that carries
 * most of its carbon), then one sentence on the schemes left out and why.
 */
export function answerParts(results: readonly SchemeResult[], currency: string): AnswerPart[] {
  const v = verdict(results);
  const byWinner = new Map<string, typeof v.winners>();
  for (const w of v.winners) byWinner.set(w.id, [...(byWinner.get(w.id) ?? []), w]);
  const parts: AnswerPart[] = [];
  for (const [id, wins] of byWinner) {
    const result = results.find((r) => r.id === id);
    if (!result) continue;
    const clauses = wins.map((w) => {
      const quality = VERDICT_METRICS.find((m) => m.key === w.metric)?.quality ?? w.metric;
      const margin = w.next ? marginText(w.value, w.next.value, `${inSentence(w.next.label)} at ${metricText(w.metric, w.next.value, currency)}`) : "the only scheme ranked";
      return `${quality} at ${metricText(w.metric, w.value, currency)} (${margin})`;
    });
    const last = clauses.pop();
    const list = clauses.length > 0 ? `${clauses.join(", ")} and ${last}` : last;
    parts.push({ text: `${capitalised(inSentence(result.label))} is ${list}. ${reasonText(result)}`, winner: { id, metrics: wins.map((w) => w.metric) } });
  }
  if (parts.length === 0) parts.push({ text: "No scheme is feasible and inside its method's valid range at this brief, so none is ranked." });
  if (v.excluded.length > 0) {
    parts.push({ text: `Left out of the ranking: ${v.excluded.map((e) => `${inSentence(e.label)} (${fmt.plain(e.reason)})`).join("; ")}.` });
  }
  return parts;
}

/**
 * The lead over the next scheme. Under 1 % it is not written as "0 % below", which reads as a
 * misprint: it says the two are level, well inside what a feasibility estimate can tell apart.
 */
export function marginText(value: number, next: number, nextText: string): string {
  const gap = 1 - value / next;
  if (gap < 0.01) return `less than 1 % below ${nextText}: level within the accuracy of these estimates`;
  return `${fmt.pct(gap)} below ${nextText}`;
}

/** The main reason behind a winner: its governing check and the material that carries most of its carbon. */
function reasonText(result: SchemeResult): string {
  const d = result.design;
  const bits: string[] = [];
  if (d.governing) bits.push(`its governing check is “${fmt.plain(d.governing)}” (utilisation ${fmt.two(d.maxUtilisation)})`);
  const driver = carbonDriver(result);
  if (driver) bits.push(`${driver.kind} carries ${fmt.pct(driver.share)} of its carbon`);
  return bits.length > 0 ? `${capitalised(bits.join("; "))}.` : "";
}
