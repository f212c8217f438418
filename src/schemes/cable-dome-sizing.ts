import type { Brief } from "../study/brief";
import type { Catalogue, Fabric } from "../catalogue/types";
import type { RoofActions } from "../loads/roof-actions";
import { designPressures } from "../loads/roof-actions";
import { cableDomeLoadState, cableDomeSelfStress, combineCableDomeStates, type CableDomeTrussForces } from "../mechanics/cable-dome-truss";
import { membraneStripForceNPerM } from "../mechanics/membrane-strip";
import { pickLightestStrand, type StrandChoice } from "../catalogue/pick-strand";
import { pickLightestChs, type ChsChoice } from "../catalogue/pick-chs";
import { STEEL_DENSITY_KG_PER_M3 } from "../catalogue/chs";
import { cableDomeNodalLoads, type CableDomeLayout } from "./cable-dome-geometry";
import { kPaOfMass } from "../mechanics/gravity";

/** A design step that cannot be completed (no section is strong enough, geometry cannot be prestressed). */
export class SizingError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "SizingError";
  }
}

export type DomeMemberKind = "ridge" | "diagonal" | "hoop" | "post" | "central ring";

export interface DomeMemberGroup {
  kind: DomeMemberKind;
  /** e.g. "ridge cable 2". */
  name: string;
  count: number;
  lengthM: number;
  /** Design force: largest tension for cables, most negative for posts, N. */
  designForceN: number;
  designation: string;
  resistanceN: number;
  utilisation: number;
  governing: string;
  massKg: number;
  /** Metallic area of the strand group (cables), m². */
  areaM2: number;
  /** Strand modulus (cables), Pa. */
  modulusPa: number;
}

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
  const { brief, actions, layout, catalogue, fabric } = input;
  const g = layout.truss;
  const N = layout.trusses;
  const n = layout.hoops;
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

  const head = (i: number): [number, number] => (i > n ? [g.ringRadiusM, g.ringHeightM] : [g.radiiM[i] as number, g.topM[i] as number]);
  const foot = (i: number): [number, number] => [g.radiiM[i] as number, g.bottomM[i] as number];
  const groups: DomeMemberGroup[] = [];
  const strandGroup = (kind: DomeMemberKind, name: string, count: number, lengthM: number, forceN: number) => {
    const choice: StrandChoice | null = pickLightestStrand(catalogue.strands, forceN, { gammaR: input.gammaR });
    if (!choice) throw new SizingError(`no strand group in the catalogue carries ${name} (${(forceN / 1e6).toFixed(1)} MN): add larger strands or more radial trusses`);
    groups.push({
      kind, name, count, lengthM, designForceN: forceN, designation: choice.designation, resistanceN: choice.resistanceN,
      utilisation: choice.utilisation, governing: choice.governing, massKg: choice.massKgPerM * lengthM * count,
      areaM2: choice.count * choice.strand.metallicAreaM2, modulusPa: choice.strand.modulusPa,
    });
  };
  for (let i = 1; i <= n + 1; i++) {
    strandGroup("ridge", `ridge cable ${i}`, N, distance(head(i - 1), head(i)), Math.max(gravity.ridgeN[i - 1] as number, uplift.ridgeN[i - 1] as number));
    strandGroup("diagonal", `diagonal ${i}`, N, distance(foot(i - 1), head(i)), Math.max(gravity.diagonalN[i - 1] as number, uplift.diagonalN[i - 1] as number));
  }
  const chord = (r: number) => 2 * N * r * Math.sin(Math.PI / N);
  for (let i = 1; i <= n; i++) {
    strandGroup("hoop", `hoop ${i}`, 1, chord(g.radiiM[i] as number), Math.max(gravity.hoopN[i - 1] as number, uplift.hoopN[i - 1] as number));
  }
  for (let i = 0; i <= n; i++) {
    const force = Math.min(gravity.postN[i] as number, uplift.postN[i] as number);
    const height = (g.topM[i] as number) - (g.bottomM[i] as number);
    const name = i === 0 ? "central drum strut" : `post ${i}`;
    const choice: ChsChoice | null = pickLightestChs(catalogue.chs, { forceN: force, effectiveLengthM: height, yieldPa: input.yieldPa });
    if (!choice) throw new SizingError(`no hollow section in the catalogue carries ${name} (${(force / 1e6).toFixed(2)} MN over ${height.toFixed(1)} m): lower the post height ratio or add hoops`);
    groups.push({
      kind: "post", name, count: N, lengthM: height, designForceN: force, designation: choice.section.designation, resistanceN: choice.resistanceN,
      utilisation: choice.utilisation, governing: choice.governing, massKg: choice.section.massKgPerM * height * N, areaM2: choice.section.areaM2, modulusPa: 0,
    });
  }
  const r0 = g.radiiM[0] as number;
  for (const [name, force] of [
    ["central upper ring", Math.max(gravity.centralTopRingN, uplift.centralTopRingN)],
    ["central lower ring", Math.max(gravity.centralBottomRingN, uplift.centralBottomRingN)],
  ] as const) {
    const area = Math.ceil((Math.max(force, 0) / input.yieldPa) * 1e4) / 1e4; // EN 1993-1-1 eq. 6.6, γ_M0 = 1.0; next whole cm²
    groups.push({
      kind: "central ring", name, count: 1, lengthM: 2 * Math.PI * r0, designForceN: force, designation: `steel ring, ${(area * 1e4).toFixed(0)} cm²`,
      resistanceN: area * input.yieldPa, utilisation: area > 0 ? Math.max(force, 0) / (area * input.yieldPa) : 0, governing: "tension, EN 1993-1-1 §6.2.3", massKg: area * 2 * Math.PI * r0 * STEEL_DENSITY_KG_PER_M3, areaM2: area, modulusPa: 0,
    });
  }
  const fabricAreaM2 = layout.cap.surfaceM2 * (1 + input.fabricAllowancePct / 100);
  const fabricMassKg = fabricAreaM2 * fabric.massKgPerM2;
  const fabricSpanM = (2 * Math.PI * g.ringRadiusM) / N;
  const sag = input.fabricSagRatio * fabricSpanM;
  const gravityChar = (permanentKPa + actions.leadingVariableKPa) * 1000;
  const upliftChar = Math.max(0, actions.upliftKPa - permanentKPa) * 1000;
  const structureKg = groups.reduce((sum, m) => sum + m.massKg, 0) + fabricMassKg;
  return {
    prestressN: alpha,
    gravityPa,
    upliftPa,
    gravityExpression: pressures.gravity.expression,
    gravity,
    uplift,
    ringCompressionN: Math.max(-gravity.compressionRingN, -uplift.compressionRingN, 0),
    groups,
    fabricAreaM2,
    fabricMassKg,
    fabricGravityNPerM: membraneStripForceNPerM(gravityChar, fabricSpanM, sag),
    fabricUpliftNPerM: membraneStripForceNPerM(upliftChar, fabricSpanM, sag),
    fabricSpanM,
    selfWeightKPa: kPaOfMass(structureKg, layout.cap.planAreaM2),
  };
}
