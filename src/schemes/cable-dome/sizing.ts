import type { Brief } from "../../brief";
import type { Catalogue, Fabric } from "../../catalogue/types";
import type { RoofActions } from "../../loads/roof-actions";
import { designPressures } from "../../loads/roof-actions";
import { cableDomeLoadState, cableDomeSelfStress, combineCableDomeStates, type CableDomeTrussForces } from "../../mechanics/cable-dome-truss";
import { membraneStripForceNPerM } from "../../mechanics/membrane-strip";
import { kPaOfMass } from "../../mechanics/gravity";
import { fabricCover, pickChs, pickStrandGroup, SizingError, steelTensionRing, type SizedGroup } from "../kit";
import { cableDomeNodalLoads, type CableDomeLayout } from "./geometry";

export type DomeMemberKind = "ridge" | "diagonal" | "hoop" | "post" | "central ring";

/** A member group of the dome; for cables also the metallic area, m², and the strand modulus, Pa (0 otherwise). */
export type DomeMemberGroup = SizedGroup<DomeMemberKind, { areaM2: number; modulusPa: number }>;

export interface DomeSizing {
  /** Prestress: force in the central upper ring, N. */
  prestressN: number;
  gravityPa: number;
  upliftPa: number;
  gravityExpression: string;
  gravity: CableDomeTrussForces;
  uplift: CableDomeTrussForces;
  /** Ring force, compression positive, design (worst case), N; and the load straight to the ring per truss. */
  ringCompressionN: number;
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

/**
 * Sizes a cable dome for an assumed self-weight (kPa on plan): ULS gravity and uplift pressures
 * (EN 1990 via designPressures), the load state for each, the prestress (a multiple α of the
 * self-stress state) that keeps every cable at least `residualPrestress` × its prestress under both,
 * then strands (EN 1993-1-11), posts (CHS, flexural buckling over their height), central rings
 * (steel, A f_y) and fabric. Prestress is a permanent action taken with γ_P = 1.0 (from memory,
 * EN 1990 §6.4.3.2(4) leaves it to the material codes, which recommend 1.0).
 * @throws SizingError when the geometry cannot be prestressed or a member cannot be sized
 */
export function sizeCableDome(input: DomeSizingInput, selfWeightKPa: number): DomeSizing {
  const { brief, actions, layout, fabric } = input;
  const g = layout.truss;
  const permanentKPa = selfWeightKPa + brief.servicesKPa;
  const pressures = designPressures(brief, actions, permanentKPa);
  const gravityPa = pressures.gravity.valueKPa * 1000;
  const upliftPa = pressures.upliftNetKPa * 1000;
  const unit = cableDomeNodalLoads(layout, 1);
  const selfStress = cableDomeSelfStress(g, 1);
  const loadState = cableDomeLoadState(g, unit.loads);
  const cables = (f: CableDomeTrussForces) => [...f.ridgeN, ...f.diagonalN, ...f.hoopN, f.centralTopRingN, f.centralBottomRingN];
  const s = cables(selfStress);
  const l = cables(loadState);
  const margin = input.residualPrestress;
  let alpha = 0;
  s.forEach((si, j) => {
    if (!(si > 0)) throw new SizingError(`the cable layout cannot be prestressed (cable ${j + 1} of the radial truss would be in compression under prestress): raise the post height ratio or the roof rise`);
    for (const p of [gravityPa, upliftPa]) alpha = Math.max(alpha, (-p * (l[j] as number)) / ((1 - margin) * si));
  });
  if (!(alpha > 0)) alpha = 1; // no load reverses any cable: a nominal prestress
  const gravity = combineCableDomeStates(alpha, selfStress, gravityPa, loadState);
  const uplift = combineCableDomeStates(alpha, selfStress, upliftPa, loadState);
  const groups = domeMembers(input, gravity, uplift);
  const fabricCut = fabricCover(layout.cap.surfaceM2, input.fabricAllowancePct, fabric);
  const fabricSpanM = (2 * Math.PI * g.ringRadiusM) / layout.trusses;
  const sag = input.fabricSagRatio * fabricSpanM;
  const gravityChar = (permanentKPa + actions.leadingVariableKPa) * 1000;
  const upliftChar = Math.max(0, actions.upliftKPa - permanentKPa) * 1000;
  const structureKg = groups.reduce((sum, m) => sum + m.massKg, 0) + fabricCut.massKg;
  return {
    prestressN: alpha,
    gravityPa,
    upliftPa,
    gravityExpression: pressures.gravity.expression,
    gravity,
    uplift,
    ringCompressionN: Math.max(-gravity.compressionRingN, -uplift.compressionRingN, 0),
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
function domeMembers(input: DomeSizingInput, gravity: CableDomeTrussForces, uplift: CableDomeTrussForces): DomeMemberGroup[] {
  const { layout, catalogue } = input;
  const g = layout.truss;
  const N = layout.trusses;
  const n = layout.hoops;
  const head = (i: number): [number, number] => (i > n ? [g.ringRadiusM, g.ringHeightM] : [g.radiiM[i] as number, g.topM[i] as number]);
  const foot = (i: number): [number, number] => [g.radiiM[i] as number, g.bottomM[i] as number];
  const groups: DomeMemberGroup[] = [];
  const strandGroup = (kind: DomeMemberKind, element: string, count: number, lengthM: number, forceN: number) => {
    const choice = pickStrandGroup(catalogue.strands, forceN, input.gammaR, `no strand group in the catalogue carries ${element} (${(forceN / 1e6).toFixed(1)} MN): add larger strands or more radial trusses`);
    groups.push({
      kind, element, material: "steel-strand", count, lengthM, section: choice.designation, designForceN: forceN, resistanceN: choice.resistanceN,
      utilisation: choice.utilisation, governing: choice.governing, massKg: choice.massKgPerM * lengthM * count,
      areaM2: choice.count * choice.strand.metallicAreaM2, modulusPa: choice.strand.modulusPa,
    });
  };
  const worst = (a: readonly number[], b: readonly number[], i: number) => Math.max(a[i] as number, b[i] as number);
  for (let i = 1; i <= n + 1; i++) {
    strandGroup("ridge", `ridge cable ${i}`, N, distance(head(i - 1), head(i)), worst(gravity.ridgeN, uplift.ridgeN, i - 1));
    strandGroup("diagonal", `diagonal ${i}`, N, distance(foot(i - 1), head(i)), worst(gravity.diagonalN, uplift.diagonalN, i - 1));
  }
  const chord = (r: number) => 2 * N * r * Math.sin(Math.PI / N);
  for (let i = 1; i <= n; i++) strandGroup("hoop", `hoop ${i}`, 1, chord(g.radiiM[i] as number), worst(gravity.hoopN, uplift.hoopN, i - 1));
  for (let i = 0; i <= n; i++) {
    const force = Math.min(gravity.postN[i] as number, uplift.postN[i] as number);
    const height = (g.topM[i] as number) - (g.bottomM[i] as number);
    const element = i === 0 ? "central drum strut" : `post ${i}`;
    const choice = pickChs(catalogue.chs, [{ forceN: force, effectiveLengthM: height }], { yieldPa: input.yieldPa, curve: "a" });
    if (!choice) throw new SizingError(`no hollow section in the catalogue carries ${element} (${(force / 1e6).toFixed(2)} MN over ${height.toFixed(1)} m): lower the post height ratio or add hoops`);
    groups.push({
      kind: "post", element, material: "steel-hot-finished-hollow", count: N, lengthM: height, section: choice.section.designation, designForceN: force, resistanceN: choice.resistanceN,
      utilisation: choice.utilisation, governing: choice.governing, massKg: choice.section.massKgPerM * height * N, areaM2: choice.section.areaM2, modulusPa: 0,
    });
  }
  const ringLengthM = 2 * Math.PI * (g.radiiM[0] as number);
  for (const [element, force] of [
    ["central upper ring", Math.max(gravity.centralTopRingN, uplift.centralTopRingN)],
    ["central lower ring", Math.max(gravity.centralBottomRingN, uplift.centralBottomRingN)],
  ] as const) {
    const ring = steelTensionRing(force, input.yieldPa, ringLengthM);
    groups.push({ kind: "central ring", element, material: "steel-plate", count: 1, lengthM: ringLengthM, designForceN: force, ...ring, modulusPa: 0 });
  }
  return groups;
}
