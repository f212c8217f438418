// The proportions the search chose for a scheme, in words (issue 12 item 4: "the page shows the
// chosen proportions and how much the runner-up differs"). Pure text: no DOM.
import { PROPORTION_TIE_FRACTION, RISE_KEY, usesRise, type ProportionChoice, type RunnerUp } from "../pipeline";
import type { OptionValue, SchemeDeclaration } from "../schemes/types";
import { fmt } from "./format";

const GOAL: Record<ProportionChoice["objective"], string> = { mass: "the least mass", carbon: "the least embodied carbon", cost: "the least cost" };

/**
 * An option's name in a sentence: its field label without the note in brackets at its end, which
 * helps whoever fills the field ("Hoops (0 = automatic)", "Diagonal rise per bay (post depth; feet
 * kept above the clear height)") but read as clutter in a list of chosen values ("Hoops (0 = automatic) 1").
 */
function nameOf(label: string): string {
  return label.replace(/\s*\([^()]*\)$/, "");
}

/** One proportion as "Target strut length 5.5 m", "rise 24.0 m", "Layers: double", "Hoops 1". */
export function proportionText(model: SchemeDeclaration, key: string, value: OptionValue | undefined): string {
  if (key === RISE_KEY) return `rise ${typeof value === "number" ? fmt.one(value) : String(value)} m`;
  const spec = model.options.find((s) => s.key === key);
  if (!spec) return `${key} ${String(value)}`;
  const name = nameOf(spec.label);
  if (spec.kind === "number") return `${name} ${typeof value === "number" ? fmt.sig3(value) : String(value)}${spec.unit ? ` ${spec.unit}` : ""}`;
  if (spec.kind === "select") return `${name}: ${spec.choices.find((c) => c.value === value)?.label ?? String(value)}`;
  return `${name}: ${value ? "on" : "off"}`;
}

/** The proportions that differ between two sets, as words (the runner-up against the chosen). */
function differences(model: SchemeDeclaration, chosen: Pick<RunnerUp, "proportions" | "riseM">, other: Pick<RunnerUp, "proportions" | "riseM">): string[] {
  const out = Object.keys(other.proportions)
    .filter((k) => k !== RISE_KEY && other.proportions[k] !== chosen.proportions[k])
    .map((k) => proportionText(model, k, other.proportions[k]));
  if (Math.abs(other.riseM - chosen.riseM) > 1e-6) out.push(proportionText(model, RISE_KEY, other.riseM));
  return out;
}

/**
 * Sentences for a scheme's panel: what was searched and chosen, for which goal, what the user pinned,
 * where the rise came from, and how much worse the runner-up is (or that there is none).
 */
export function proportionsSentences(model: SchemeDeclaration, choice: ProportionChoice): string[] {
  const searched = choice.searched.filter((k) => k !== RISE_KEY);
  // a scheme that uses no rise (the flat truss) reports none
  const riseWord = !usesRise(choice) ? [] : [
    choice.riseSource === "searched" ? `${proportionText(model, RISE_KEY, choice.riseM)} (searched)` : choice.riseSource === "pinned" ? `${proportionText(model, RISE_KEY, choice.riseM)} (pinned)` : `${proportionText(model, RISE_KEY, choice.riseM)} (the brief's common rise)`];
  const out: string[] = [];
  if (!Number.isFinite(choice.value)) out.push(`No feasible proportions were found among the ${choice.evaluations} designs tried.`);
  else if (choice.searched.length === 0) out.push(`Nothing to search: the design uses the options as set${riseWord.map((w) => `; ${w}`).join("")}.`);
  else {
    const chosen = searched.map((k) => proportionText(model, k, choice.proportions[k]));
    out.push(`Proportions chosen for ${GOAL[choice.objective]} per m² of usable floor (${choice.evaluations} designs tried): ${[...chosen, ...riseWord].join("; ")}.`);
  }
  const { full } = choice;
  // the band is explained once: where the 3D designs' runner-up is lower too, the first estimate's sentence refers to it
  let explained = false;
  if (full && Number.isFinite(choice.value)) {
    out.push(fullSentence(model, full));
    if (full.refined.length > 0) {
      out.push(`Of those designs: ${lowerFirst(runnerUpSentence(model, choice, full.runnerUp))}`);
      explained = full.runnerUp !== null && full.runnerUp.differencePct <= -0.05;
    }
  }
  if (choice.pinned.length > 0) out.push(`Pinned by you: ${choice.pinned.map((k) => proportionText(model, k, choice.proportions[k])).join("; ")}.`);
  if (choice.searched.length > 0 && Number.isFinite(choice.value)) {
    if (!full) out.push(runnerUpSentence(model, choice, choice.runnerUp));
    else {
      // the first estimate's runner-up is against what the first estimate chose, which the full designs may have moved
      const moved = differences(model, choice, full.first);
      const first = moved.length === 0 ? "On the first estimate" : `On the first estimate, which chose ${moved.join("; ")}`;
      out.push(`${first}: ${lowerFirst(runnerUpSentence(model, full.first, choice.runnerUp, explained))}`);
    }
  }
  return out;
}

const lowerFirst = (text: string) => text.charAt(0).toLowerCase() + text.slice(1);

/** "A, B and C": the proportions chosen again, listed as the page's text lists things. */
const listed = new Intl.ListFormat("en-GB", { type: "conjunction" });

/** How the candidates were compared (the screening options) and the chosen ones designed (the full options, some proportions chosen again). */
function fullSentence(model: SchemeDeclaration, full: NonNullable<ProportionChoice["full"]>): string {
  const words = (options: Record<string, OptionValue>) => Object.entries(options).map(([k, v]) => proportionText(model, k, v)).join("; ");
  const again = full.refined.length === 0 ? "" : `, where ${listed.format(full.refined.map((k) => (k === RISE_KEY ? "the rise" : nameOf(model.options.find((o) => o.key === k)?.label ?? k))))} ${full.refined.length > 1 ? "were" : "was"} chosen again on ${full.evaluations} such designs (how: Method and assumptions, Best proportions)`;
  return `The candidates were compared with ${words(full.screening)} (the fast first estimate); the chosen ones are designed with ${words(full.options)}${again}.`;
}

/**
 * The runner-up against the chosen proportions: higher; as good; or lower, where the chosen ones are
 * nearer the reference within the band. The band is measured from the least the search's descent or
 * trend reached, which need not be the least of all it tried: a lower one may be more than the band lower.
 */
function runnerUpSentence(model: SchemeDeclaration, chosen: Pick<RunnerUp, "proportions" | "riseM">, r: RunnerUp | null, explained = false): string {
  if (r === null || !Number.isFinite(r.value)) return "No other proportions tried were feasible.";
  const which = differences(model, chosen, r).join("; ") || "same proportions";
  if (r.differencePct <= -0.05 && explained) return `The least found (${which}) is ${fmt.one(-r.differencePct)} % lower (the same rule as above).`;
  if (r.differencePct <= -0.05) return `The least found (${which}) is ${fmt.one(-r.differencePct)} % lower: the search keeps the proportions nearest their reference among those within ${Math.round(1000 * PROPORTION_TIE_FRACTION) / 10} % of the best it settles on (a local least, or the least of a trend through samples, not always the lowest design tried), so that they do not wander from span to span.`;
  if (r.differencePct < 0.05) return `The runner-up (${which}) is as good (within 0.05 %): the choice between them does not matter here.`;
  return `The runner-up (${which}) is ${fmt.one(r.differencePct)} % higher.`;
}
