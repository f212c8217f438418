// The client page's summary (issue 14, "one page a non-engineer reads"): the options side by side,
// each with a small drawing, its figures in words and its cautions; the project lead's
// recommendation; a one-line glossary. Shared by the page and its one-file export.
import * as Plot from "@observablehq/plot";
import type { SchemeResult } from "../pipeline";
import type { Study } from "../study";
import { statusOf, metricValue } from "../comparison/verdict";
import { sectionChartOptions, SCHEME_COLOURS } from "../charts";
import { fmt } from "./format";
import { SCHEME_DECLARATIONS } from "../schemes/declarations";

/** The glossary line every summary carries. */
export function glossary(study: Study): string {
  return `Every "/m²" is per m² of usable floor. Usable floor: the floor area with at least ${study.brief.minClearHeightM} m of clear height under the roof. Embodied carbon: the greenhouse gases released in making, transporting, building and finally removing the roof's materials, in kilograms of CO2 equivalent (kgCO2e).`;
}

/** What a status means, for someone who is not an engineer. */
function plainStatus(result: SchemeResult): string {
  const status = statusOf(result.design);
  if (status === "feasible") return "Works at this span, on the checks made at this stage.";
  if (status === "out-of-range") return "Passes its checks, but this span is outside the range the method used here is meant for: treat its figures with more caution.";
  return `Does not work as set out: ${fmt.plain(result.design.reason)}.`;
}

/** The figures of one option in words. */
function figures(result: SchemeResult): [string, string][] {
  const out: [string, string][] = [];
  const carbon = metricValue(result, "carbon");
  const cost = metricValue(result, "cost");
  const weight = metricValue(result, "weight");
  if (carbon !== null) out.push(["Embodied carbon", `${fmt.sig3(carbon)} kgCO2e/m²`]);
  if (cost !== null && result.cost) out.push(["Cost", `${fmt.money(cost, result.cost.currency)}/m² (${fmt.money(result.cost.totals.total, result.cost.currency)} in all)`]);
  if (weight !== null) out.push(["Roof weight", `${fmt.sig3(weight)} kg/m²`]);
  if (result.design.usableFloorM2 > 0) out.push(["Usable floor", `${fmt.sig3(result.design.usableFloorM2)} m²`]);
  return out;
}

/**
 * The option's cautions in plain words: what its scheme declares a client should know of that kind
 * of roof (the design's own warnings are the engineers' notes, in method words: a first clause of
 * them read "Axisymmetric first-order closed form: …"), and where the design has notes, that they
 * are in the appendix.
 */
function cautions(result: SchemeResult): string[] {
  const declared = SCHEME_DECLARATIONS.find((d) => d.id === result.id)?.clientNotes ?? [];
  return [...declared, ...(result.design.warnings.length > 0 ? ["The engineers' notes on this option are in the appendix."] : [])];
}

/** A small section drawing of the option: its own members (not the brief's roof line, which drew a dome over the flat truss), no axes. */
function thumbnail(result: SchemeResult, study: Study): Element {
  const options = sectionChartOptions({ brief: study.brief, lines: result.design.drawing.section, title: "", caption: "", width: 240, briefRoof: false });
  const svg = Plot.plot({ ...options, title: undefined, caption: undefined, height: 110, marginLeft: 4, marginRight: 4, marginTop: 4, marginBottom: 4, x: { ...(options.x as object), axis: null }, y: { ...(options.y as object), axis: null }, color: { ...(options.color as object), legend: false }, ariaLabel: `${result.label}: section`, ariaDescription: `A small section through the centre of the ${result.label.toLowerCase()}.` });
  svg.setAttribute("role", "img");
  return svg;
}

/** One card per option, side by side. */
export function optionCards(results: readonly SchemeResult[], study: Study): HTMLElement {
  const grid = document.createElement("div");
  grid.className = "option-cards";
  for (const r of results) {
    const card = document.createElement("article");
    card.className = `option-card status-${statusOf(r.design)}`;
    card.dataset.id = r.id;
    const h = document.createElement("h3");
    h.textContent = r.label;
    h.style.borderLeftColor = SCHEME_COLOURS[r.id];
    const drawing = document.createElement("div");
    drawing.className = "thumb";
    if (r.design.drawing.section.length > 0) drawing.append(thumbnail(r, study));
    const status = document.createElement("p");
    status.className = "plain-status";
    status.textContent = plainStatus(r);
    const list = document.createElement("dl");
    list.className = "kv";
    for (const [k, v] of figures(r)) {
      const dt = document.createElement("dt");
      dt.textContent = k;
      const dd = document.createElement("dd");
      dd.textContent = v;
      list.append(dt, dd);
    }
    card.append(h, drawing, status, list);
    const notes = cautions(r);
    if (notes.length > 0) {
      const ul = document.createElement("ul");
      ul.className = "cautions";
      ul.setAttribute("aria-label", `Cautions for the ${r.label.toLowerCase()}`);
      for (const n of notes) {
        const li = document.createElement("li");
        li.textContent = n;
        ul.append(li);
      }
      card.append(ul);
    }
    grid.append(card);
  }
  return grid;
}

/** The project lead's recommendation, or a note that there is none yet. */
export function recommendationBlock(study: Study): HTMLElement {
  const box = document.createElement("div");
  box.className = "recommendation";
  box.id = "client-recommendation";
  const h = document.createElement("h3");
  h.textContent = study.meta.author ? `Recommendation of the project lead — ${study.meta.author}` : "Recommendation of the project lead";
  const text = (study.meta.recommendation ?? "").trim();
  box.append(h);
  for (const para of text === "" ? ["The project lead has not written a recommendation yet (it is written on the Compare page, under Study)."] : text.split(/\n{2,}/)) {
    const p = document.createElement("p");
    p.textContent = para;
    if (text === "") p.className = "intro";
    box.append(p);
  }
  return box;
}
