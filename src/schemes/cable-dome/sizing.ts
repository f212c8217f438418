import type { Brief } from "../../brief";
import type { Catalogue, Fabric } from "../../catalogue/types";
import type { RoofActions } from "../../loads/roof-actions";
import type { DesignBasis } from "../../loads";
import { cableDomeLoadState, cableDomeSelfStress, combineCableDomeStates, type CableDomeTrussForces } from "../../mechanics/cable-dome-truss";
import { membraneStripForceNPerM } from "../../mechanics/membrane-strip";
import { kPaOfMass } from "../../mechanics/gravity";
import { fabricCover, pickChs, pickStrandGroup, SizingError, steelTensionRing, uniformPressurePa, type SizedGroup, type PlanCombination } from "../kit";
import { cableDomeNodalLoads, type CableDomeLayout } from "./geometry";

export type DomeMemberKind = "ridge" | "diagonal" | "hoop" | "post" | "central ring";

/** A member group of the dome; for cables also the metallic area, m², and the strand modulus, Pa (0 otherwise). */
export type DomeMemberGroup = SizedGroup<DomeMemberKind, { areaM2: number; modulusPa: number; caseName: string }>;

/** One design combination's forces in a radial truss (prestress included), with its uniform pressure on plan. */
export interface DomeCaseState {
  name: string;
  pressurePa: number;
  forces: CableDomeTrussForces;
}

export interface DomeSizing {
  /** Prestress: force in the central upper ring, N. */
  prestressN: number;
  /** Each design combination at its uniform equivalent. */
  states: DomeCaseState[];
  /** The combination that sets the prestress (the one that would slacken a cable first). */
  prestressCase: string;
  /** Ring force, compression positive, design (worst case), N, and the combination giving it. */
  ringCompressionN: number;
  ringCase: string;
  groups: DomeMemberGroup[];
  fabricAreaM2: number;
  fabricMassKg: number;
  /** Membrane force in the widest panel, characteristic gravity / uplift, N/m. */
  fabricGravityNPerM: number;
  fabricUpliftNPerM: number;
  fabricSpanM: number;
  /** Self-weight carried by the cables (everything but the compression ring), kPa on plan. */
  selfWeightKPa: number;
}

export type DomeSizingInput = {
  brief: Brief;
  actions: RoofActions;
  combinations: readonly PlanCombination[];
  basis: DesignBasis;
  layout: CableDomeLayout;
  catalogue: Catalogue;
  fabric: Fabric;
  residualPrestress: number;
  gammaR: number;
  yieldPa: number;
  fabricAllowancePct: number;
  fabricSagRatio: number;
};

const distance = (a: readonly [number, number], b: readonly [number, number]) => Math.hypot(b[0] - a[0], b[1] - a[1]);

/** The cable forces of a state in one order: ridges, diagonals, hoops, central rings. */
export const domeCableForces = (f: CableDomeTrussForces) => [...f.ridgeN, ...f.diagonalN, ...f.hoopN, f.centralTopRingN, f.centralBottomRingN];

/**
 * The least prestress α (central upper-ring force of the self-stress state) that keeps every cable
 * at least `margin` × its prestress force under every uniform pressure, and the pressure that sets it.
 * @throws SizingError when the layout has a cable in compression under prestress
 */
export function leastDomePrestress(selfStress: CableDomeTrussForces, unitLoad: CableDomeTrussForces, pressuresPa: readonly number[], margin: number): { alpha: number; index: number } {
  const s = domeCableForces(selfStress);
  const l = domeCableForces(unitLoad);
  let alpha = 0;
  let index = -1;
  s.forEach((si, j) => {
    if (!(si > 0)) throw new SizingError(`the cable layout cannot be prestressed (cable ${j + 1} of the radial truss would be in compression under prestress): raise the post height ratio or the roof rise`);
    pressuresPa.forEach((p, k) => {
      const need = (-p * (l[j] as number)) / ((1 - margin) * si);
      if (need > alpha) [alpha, index] = [need, k];
    });
  });
  return alpha > 0 ? { alpha, index } : { alpha: 1, index: -1 }; // no load reverses any cable: a nominal prestress
}

/**
 * Sizes a cable dome for an assumed self-weight (kPa on plan): every design combination of the
 * study's basis at its conservative uniform equivalent (the closed form takes only axisymmetric
 * load: the peak of a gravity map, the most upward value of an uplift map, over the whole plan), the
 * load state for each, the prestress (a multiple α of the self-stress state) that keeps every cable
 * at least `residualPrestress` × its prestress under all of them, then strands (EN 1993-1-11), posts
 * (CHS, flexural buckling over their height), central rings (steel, A f_y) and fabric. Prestress is a
 * permanent action taken with γ_P = 1.0 (from memory, EN 1990 §6.4.3.2(4) leaves it to the material
 * codes, which recommend 1.0). A uniform temperature change does not change the forces of an
 * all-steel dome (cables, posts and ring expand alike); with a concrete ring the difference of
 * expansion coefficients is small and is left out (stated in the warnings).
 * @throws SizingError when the geometry cannot be prestressed or a member cannot be sized
 */
export function sizeCableDome(input: DomeSizingInput, selfWeightKPa: number): DomeSizing {
  const { brief, actions, layout, fabric } = input;
  const g = layout.truss;
  const permanentKPa = selfWeightKPa + brief.servicesKPa;
  const pressures = input.combinations.map((c) => uniformPressurePa(c, selfWeightKPa));
  const unit = cableDomeNodalLoads(layout, 1);
  const selfStress = cableDomeSelfStress(g, 1);
  const loadState = cableDomeLoadState(g, unit.loads);
  const { alpha, index } = leastDomePrestress(selfStress, loadState, pressures, input.residualPrestress);
  const states = pressures.map((p, k) => ({ name: (input.combinations[k] as PlanCombination).name, pressurePa: p, forces: combineCableDomeStates(alpha, selfStress, p, loadState) }));
  // the prestress-setting combination first, so a force the load does not change (the central upper ring) is reported under it
  const groups = domeMembers(input, index > 0 ? [states[index] as DomeCaseState, ...states.filter((_, k) => k !== index)] : states);
  const fabricCut = fabricCover(layout.cap.surfaceM2, input.fabricAllowancePct, fabric);
  const fabricSpanM = (2 * Math.PI * g.ringRadiusM) / layout.trusses;
  const sag = input.fabricSagRatio * fabricSpanM;
  const gravityChar = (permanentKPa + actions.leadingVariableKPa) * 1000;
  const upliftChar = Math.max(0, actions.upliftKPa - permanentKPa) * 1000;
  const structureKg = groups.reduce((sum, m) => sum + m.massKg, 0) + fabricCut.massKg;
  const ring = states.reduce((worst, st) => (-st.forces.compressionRingN > worst.n ? { n: -st.forces.compressionRingN, name: st.name } : worst), { n: 0, name: "" });
  return {
    prestressN: alpha,
    states,
    prestressCase: index >= 0 ? (states[index] as DomeCaseState).name : "",
    ringCompressionN: ring.n,
    ringCase: ring.name,
    groups,
    fabricAreaM2: fabricCut.areaM2,
    fabricMassKg: fabricCut.massKg,
    fabricGravityNPerM: membraneStripForceNPerM(gravityChar, fabricSpanM, sag),
    fabricUpliftNPerM: membraneStripForceNPerM(upliftChar, fabricSpanM, sag),
    fabricSpanM,
    selfWeightKPa: kPaOfMass(structureKg, layout.cap.planAreaM2),
  };
}

/**
 * The members of one radial truss for the worst of the gravity and uplift states: ridge cables,
 * diagonals and hoops (strands, EN 1993-1-11), posts (CHS, flexural buckling over their height)
 * and the central rings (steel, A f_y).
 * @throws SizingError when a member cannot be sized
 */
export function domeMembers(input: DomeSizingInput, states: readonly DomeCaseState[]): DomeMemberGroup[] {
  const { layout, catalogue } = input;
  const g = layout.truss;
  const N = layout.trusses;
  const n = layout.hoops;
  const head = (i: number): [number, number] => (i > n ? [g.ringRadiusM, g.ringHeightM] : [g.radiiM[i] as number, g.topM[i] as number]);
  const foot = (i: number): [number, number] => [g.radiiM[i] as number, g.bottomM[i] as number];
  const groups: DomeMemberGroup[] = [];
  const strandGroup = (kind: DomeMemberKind, element: string, count: number, lengthM: number, [forceN, caseName]: [number, string]) => {
    const choice = pickStrandGroup(catalogue.strands, forceN, input.gammaR, `no strand group in the catalogue carries ${element} (${(forceN / 1e6).toFixed(1)} MN): add larger strands or more radial trusses`);
    groups.push({
      kind, element, material: "steel-strand", count, lengthM, section: choice.designation, designForceN: forceN, resistanceN: choice.resistanceN,
      utilisation: choice.utilisation, governing: choice.governing, massKg: choice.massKgPerM * lengthM * count,
      areaM2: choice.count * choice.strand.metallicAreaM2, modulusPa: choice.strand.modulusPa, caseName,
    });
  };
  // the largest (or, for struts, the most negative) force of a member over the combinations, and which one
  const worst = (pick: (f: CableDomeTrussForces) => number, sign = 1): [number, string] =>
    states.reduce<[number, string]>((w, st) => (sign * pick(st.forces) > sign * w[0] ? [pick(st.forces), st.name] : w), [sign * -Infinity, ""]);
  for (let i = 1; i <= n + 1; i++) {
    strandGroup("ridge", `ridge cable ${i}`, N, distance(head(i - 1), head(i)), worst((f) => f.ridgeN[i - 1] as number));
    strandGroup("diagonal", `diagonal ${i}`, N, distance(foot(i - 1), head(i)), worst((f) => f.diagonalN[i - 1] as number));
  }
  const chord = (r: number) => 2 * N * r * Math.sin(Math.PI / N);
  for (let i = 1; i <= n; i++) strandGroup("hoop", `hoop ${i}`, 1, chord(g.radiiM[i] as number), worst((f) => f.hoopN[i - 1] as number));
  for (let i = 0; i <= n; i++) {
    const [force, caseName] = worst((f) => f.postN[i] as number, -1);
    const height = (g.topM[i] as number) - (g.bottomM[i] as number);
    const element = i === 0 ? "central drum strut" : `post ${i}`;
    const choice = pickChs(catalogue.chs, [{ forceN: force, effectiveLengthM: height }], { yieldPa: input.yieldPa, curve: "a" });
    if (!choice) throw new SizingError(`no hollow section in the catalogue carries ${element} (${(force / 1e6).toFixed(2)} MN over ${height.toFixed(1)} m): lower the post height ratio or add hoops`);
    groups.push({
      kind: "post", element, material: "steel-hot-finished-hollow", count: N, lengthM: height, section: choice.section.designation, designForceN: force, resistanceN: choice.resistanceN,
      utilisation: choice.utilisation, governing: choice.governing, massKg: choice.section.massKgPerM * height * N, areaM2: choice.section.areaM2, modulusPa: 0, caseName,
    });
  }
  const ringLengthM = 2 * Math.PI * (g.radiiM[0] as number);
  for (const [element, [force, caseName]] of [
    ["central upper ring", worst((f) => f.centralTopRingN)],
    ["central lower ring", worst((f) => f.centralBottomRingN)],
  ] as const) {
    const ring = steelTensionRing(force, input.yieldPa, ringLengthM);
    groups.push({ kind: "central ring", element, material: "steel-plate", count: 1, lengthM: ringLengthM, designForceN: force, ...ring, modulusPa: 0, caseName });
  }
  return groups;
}
