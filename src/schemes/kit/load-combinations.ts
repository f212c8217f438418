import type { Brief } from "../../brief";
import type { DesignBasis } from "../../loads/design-basis";
import type { Combination, VariableCaseId } from "../../loads/design-combinations";
import { designBasis } from "../../loads/design-basis";

/** The actions of a combination that set a timber member's load duration. */
export type VariableAction = "imposed" | "snow" | "wind";

/**
 * A design combination of the shared basis (src/loads designCombinations) reduced to uniform loads,
 * for methods that can only take a uniform load: each case enters by its stated conservative
 * uniform equivalent (PressureCase.uniformEquivalent).
 */
export interface UniformCombination {
  /** The combination's name, as Design.governingLoadCase reports it. */
  name: string;
  purpose: "gravity" | "uplift";
  /** Factor on G_k = self-weight + services. */
  permanentFactor: number;
  /** Σ factor × uniform equivalent of each variable case, kPa, vertical on plan, downward positive (negative = net uplift). */
  variableKPa: number;
  /** The variable actions present (load duration of timber). */
  actions: readonly VariableAction[];
}

/** The wording every scheme that uses uniform equivalents puts in its warnings. */
export const UNIFORM_EQUIVALENT_WARNING =
  "every design combination of the shared basis is checked with the conservative uniform equivalents of its cases (drifted snow: its peak μ3 s_k over the whole plan; wind: its peak inward pressure or peak suction over the whole roof, taken vertical on plan): this bounds the axisymmetric membrane forces but not the bending of the asymmetric part";

function actionOf(id: VariableCaseId): VariableAction {
  return id === "imposed" ? "imposed" : id.startsWith("snow") ? "snow" : "wind";
}

/**
 * The combinations of a design basis that can govern a roof that is not temperature-sensitive,
 * each with its cases' uniform equivalents summed. `equivalentKPa` overrides a case's uniform
 * equivalent (a flat roof's snow, say), kPa.
 */
export function uniformCombinations(basis: DesignBasis, equivalentKPa: Partial<Record<VariableCaseId, number>> = {}): UniformCombination[] {
  return basis.combinations
    .filter((c) => !c.temperatureSensitiveOnly)
    .map((c) => ({
      name: c.name,
      purpose: c.purpose,
      permanentFactor: c.permanentFactor,
      variableKPa: c.terms.reduce((sum, t) => sum + t.factor * (equivalentKPa[t.caseId] ?? basis.cases[t.caseId].uniformEquivalent.kPa), 0),
      actions: [...new Set(c.terms.map((t) => actionOf(t.caseId)))],
    }));
}

/** The largest characteristic gravity variable load as a uniform equivalent (imposed or snow, either case), kPa of plan: for serviceability. */
export function characteristicVariableKPa(basis: DesignBasis): number {
  const c = basis.cases;
  return Math.max(c.imposed.uniformEquivalent.kPa, c["snow-uniform"].uniformEquivalent.kPa, c["snow-drifted"].uniformEquivalent.kPa);
}

/** The uniform combinations of the brief's own design basis (its span and rise). */
export function briefCombinations(brief: Brief): UniformCombination[] {
  return uniformCombinations(designBasis(brief));
}

/** A combination as a membrane method takes it: a load per m² of surface (self-weight) and one per m² of plan, Pa. */
export interface MembraneLoadCase {
  name: string;
  purpose: "gravity" | "uplift";
  surfacePa: number;
  planPa: number;
  actions: readonly VariableAction[];
}

/**
 * The membrane load cases of the combinations for a self-weight g (kPa of surface) and services
 * (kPa of plan): gravity as γ g on the surface plus γ services + Q on plan; uplift as the net
 * load γ_G,inf (g + services) + W (negative upward) taken as a surface load, as before.
 */
export function membraneLoadCases(combinations: readonly UniformCombination[], selfWeightKPa: number, servicesKPa: number): MembraneLoadCase[] {
  return combinations.map((c) =>
    c.purpose === "gravity"
      ? { name: c.name, purpose: c.purpose, surfacePa: c.permanentFactor * selfWeightKPa * 1000, planPa: (c.permanentFactor * servicesKPa + c.variableKPa) * 1000, actions: c.actions }
      : { name: c.name, purpose: c.purpose, surfacePa: (c.permanentFactor * (selfWeightKPa + servicesKPa) + c.variableKPa) * 1000, planPa: 0, actions: c.actions },
  );
}

/** The gravity case of largest total pressure (surface + plan). */
export function heaviestCase<T extends { purpose: "gravity" | "uplift"; surfacePa: number; planPa: number }>(cases: readonly T[]): T {
  const gravity = cases.filter((c) => c.purpose === "gravity");
  if (gravity.length === 0) throw new RangeError("no gravity combination in the design basis");
  return gravity.reduce((worst, c) => (c.surfacePa + c.planPa > worst.surfacePa + worst.planPa ? c : worst));
}

/**
 * Of the given combinations, the one whose total load is largest by its cases' uniform equivalents
 * (γ_G × (self-weight + services) + Σ factor × equivalent, kPa): a cheap ranking, after which an
 * analysis takes the chosen combination's distribution on plan.
 */
export function heaviestByUniformEquivalent(basis: DesignBasis, combinations: readonly Combination[], selfWeightKPa: number): Combination {
  const size = (c: Combination) => c.permanentFactor * (selfWeightKPa + basis.cases.services.peakKPa) + c.terms.reduce((sum, t) => sum + t.factor * basis.cases[t.caseId].uniformEquivalent.kPa, 0);
  const first = combinations[0];
  if (!first) throw new RangeError("invalid combinations: none to choose from");
  return combinations.reduce((w, c) => (size(c) > size(w) ? c : w), first);
}
