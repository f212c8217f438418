import { wholeNumber } from "../../kernel/units";
import type { Brief } from "../../brief";
import type { Catalogue } from "../../catalogue/types";
import type { BucklingCurve } from "../../mechanics/flexural-buckling";
import type { RoofActions } from "../../loads/roof-actions";
import type { UniformCombination } from "../kit";
import { sizeTruss, type TrussResult } from "./truss";
import { bracingRestraintLoadNPerM, pickChsForMoment, pickColumn, sizePurlin, type PurlinResult } from "./secondary";
import { pickChs } from "../kit";
import { kPaFromKgPerM2 } from "../../mechanics/gravity";
import type { ChsChoice } from "../../catalogue/pick-chs";
import type { ChsSection } from "../../catalogue/types";

/** Net wall pressure coefficient for the wind that the roof bracing collects: zone D +0.7 and zone E −0.3 for h/d ≤ 0.25 (EN 1991-1-4 Table 7.1, from memory). */
export const WALL_NET_PRESSURE_COEFFICIENT = 1.0;

/** Parallel trusses across a circular plan: offsets from the centre line and their chord spans, m. */
export function trussLayout(spanM: number, spacingM: number): { spacingM: number; offsetsM: number[]; spansM: number[] } {
  const a = spanM / 2;
  const count = Math.max(1, Math.round(spanM / spacingM) - 1);
  const s = spanM / (count + 1);
  const offsetsM = Array.from({ length: count }, (_, k) => -a + (k + 1) * s);
  return { spacingM: s, offsetsM, spansM: offsetsM.map((y) => 2 * Math.sqrt(Math.max(0, a * a - y * y))) };
}

export interface TrussRoofInputs {
  brief: Brief;
  /** Wind reference (q_p at the roof) for the bracing. */
  actions: RoofActions;
  /** The design combinations with their uniform equivalents on the flat roof. */
  combinations: readonly UniformCombination[];
  /** Characteristic variable load for serviceability (the flat roof's snow or the imposed load), kPa. */
  slsVariableKPa: number;
  catalogue: Catalogue;
  steel: { yieldPa: number; curve: BucklingCurve };
  spacingM: number;
  spansM: number[];
  spanDepthRatio: number;
  purlinSpacingM: number;
  zones: number;
  webAllowance: number;
  deflectionLimit: number;
  deflectionLimitTotal: number;
  connectionAllowance: number;
  deckKgPerM2: number;
}

export interface TrussRoofResult {
  trusses: TrussResult[];
  depthsM: number[];
  failure: string;
  trussMassKg: number;
  connectionMassKg: number;
  purlin: PurlinResult;
  purlinLengthM: number;
  purlinMassKg: number;
  bracing: ChsChoice | null;
  bracingLengthM: number;
  bracingMassKg: number;
  edgeBeam: ChsSection | null;
  edgeBeamMomentNm: number;
  edgeBeamMassKg: number;
  trussColumn: ChsChoice | null;
  trussColumnForceN: number;
  postCount: number;
  post: ChsChoice | null;
  postForceN: number;
  columnMassKg: number;
  deckMassKg: number;
  ulsKPa: number;
  /** The gravity combination of largest load (it sizes the trusses) and the uplift combination of largest suction. */
  governingCase: string;
  upliftCase: string;
}

/** The heaviest gravity combination and the most upward uplift combination at a roof self-weight (kPa of plan). */
function trussLoads(input: TrussRoofInputs, permanentKPa: number) {
  const total = (c: UniformCombination) => c.permanentFactor * permanentKPa + c.variableKPa;
  const gravity = input.combinations.filter((c) => c.purpose === "gravity");
  const uplift = input.combinations.filter((c) => c.purpose === "uplift");
  const heaviest = gravity.reduce((w, c) => (total(c) > total(w) ? c : w));
  const lightest = uplift.length > 0 ? uplift.reduce((w, c) => (total(c) < total(w) ? c : w)) : null;
  return { ulsKPa: total(heaviest), upliftKPa: lightest ? total(lightest) : permanentKPa, governingCase: heaviest.name, upliftCase: lightest?.name ?? "" };
}

/** Roof bracing: two braced bays across the span, horizontal trusses of depth s, panels s × s, for wind on the walls plus the restraint load. */
function roofBracing(input: TrussRoofInputs, trusses: readonly TrussResult[], depthsM: readonly number[]): { choice: ChsChoice | null; lengthM: number; massKg: number; failure: string } {
  const { brief, actions, catalogue, steel } = input;
  const s = input.spacingM;
  const longest = Math.max(...input.spansM);
  const deepest = Math.max(...depthsM);
  const windLineNPerM = actions.peakWindKPa * 1000 * WALL_NET_PRESSURE_COEFFICIENT * (brief.eavesHeightM / 2 + deepest);
  const restrained = Math.max(1, Math.ceil(input.spansM.length / 2));
  const topCompressionN = Math.max(...trusses.map((t) => Math.abs(t.topCompressionN)));
  const bayLoadNPerM = windLineNPerM / 2 + bracingRestraintLoadNPerM(topCompressionN, longest, restrained);
  const bayShearN = (bayLoadNPerM * longest) / 2;
  const diagonalM = s * Math.SQRT2;
  const choice = pickChs(catalogue.chs, [{ forceN: -bayShearN * Math.SQRT2, effectiveLengthM: diagonalM / 2 }], steel);
  const failure = choice === null ? `no catalogue hollow section carries the roof bracing force of ${wholeNumber((bayShearN * Math.SQRT2) / 1000)} kN` : "";
  const lengthM = 2 * 2 * Math.ceil(longest / s) * diagonalM;
  return { choice, lengthM, massKg: choice ? lengthM * choice.section.massKgPerM : 0, failure };
}

/** The perimeter edge beam between posts at the truss spacing (half a purlin span on it), and the columns to the eaves: two per truss, posts round the rest. */
function edgeBeamAndColumns(input: TrussRoofInputs, trusses: readonly TrussResult[], ulsKPa: number) {
  const { brief, catalogue, steel } = input;
  const sections = catalogue.chs;
  const s = input.spacingM;
  const a = brief.spanM / 2;
  let failure = "";
  const edgeLineNPerM = ulsKPa * 1000 * (s / 2);
  const edgeBeamMomentNm = (edgeLineNPerM * s * s) / 8;
  const edgeBeam = pickChsForMoment(sections, edgeBeamMomentNm, steel.yieldPa);
  if (edgeBeam === null) failure = "no catalogue hollow section carries the perimeter edge beam moment";
  const edgeBeamMassKg = edgeBeam ? 2 * Math.PI * a * edgeBeam.massKgPerM : 0;
  const trussColumnForceN = Math.max(...trusses.map((t) => t.reactionN)) + edgeLineNPerM * s;
  const postForceN = edgeLineNPerM * s;
  const postCount = Math.max(0, Math.ceil((2 * Math.PI * a) / s) - 2 * input.spansM.length);
  let trussColumn: ChsChoice | null = null;
  let post: ChsChoice | null = null;
  let columnMassKg = 0;
  if (brief.eavesHeightM > 0) {
    trussColumn = pickColumn(sections, trussColumnForceN, brief.eavesHeightM, steel);
    post = postCount > 0 ? pickColumn(sections, postForceN, brief.eavesHeightM, steel) : null;
    if ((trussColumn === null || (postCount > 0 && post === null)) && failure === "") failure = `no catalogue hollow section carries the column load of ${wholeNumber(trussColumnForceN / 1000)} kN over ${brief.eavesHeightM} m`;
    columnMassKg = brief.eavesHeightM * (2 * input.spansM.length * (trussColumn?.section.massKgPerM ?? 0) + postCount * (post?.section.massKgPerM ?? 0));
  }
  return { edgeBeam, edgeBeamMomentNm, edgeBeamMassKg, trussColumn, trussColumnForceN, postCount, post, postForceN, columnMassKg, failure };
}

/**
 * Designs the whole truss roof for an assumed roof self-weight g (kPa of plan): every truss on its
 * own chord, purlins, roof bracing (wind on the walls plus the EN 1993-1-1 §5.3.3 restraint load),
 * the perimeter edge beam and the columns to the eaves.
 */
export function designTrussRoof(input: TrussRoofInputs, selfWeightKPa: number): TrussRoofResult {
  const { brief, actions, catalogue, steel } = input;
  const sections = catalogue.chs;
  const s = input.spacingM;
  const a = brief.spanM / 2;
  const planAreaM2 = Math.PI * a * a;
  const permanentKPa = selfWeightKPa + actions.servicesKPa;
  const variableKPa = input.slsVariableKPa;
  const { ulsKPa, upliftKPa, governingCase, upliftCase } = trussLoads(input, permanentKPa);
  const depthsM = input.spansM.map((L) => L / input.spanDepthRatio);
  let failure = "";
  const trusses = input.spansM.map((L, k) => {
    const depthM = depthsM[k]!;
    // Panel: the whole number of purlin spacings nearest the depth, so the diagonals lie near 63°.
    const panelM = input.purlinSpacingM * Math.max(1, Math.round(depthM / input.purlinSpacingM));
    const t = sizeTruss(
      {
        spanM: L,
        depthM,
        ulsNPerM: ulsKPa * s * 1000,
        upliftNPerM: upliftKPa * s * 1000,
        slsNPerM: variableKPa * s * 1000,
        slsTotalNPerM: (permanentKPa + variableKPa) * s * 1000,
        panelM,
        purlinSpacingM: input.purlinSpacingM,
        bottomRestraintM: 2 * input.purlinSpacingM, // fly brace at every other purlin (common practice, no source)
        zones: input.zones,
        webAllowance: input.webAllowance,
        deflectionLimit: input.deflectionLimit,
        deflectionLimitTotal: input.deflectionLimitTotal,
      },
      sections,
      steel,
    );
    if (t.failure !== "" && failure === "") failure = `truss of ${L.toFixed(0)} m span: ${t.failure}`;
    return t;
  });
  const trussMassKg = trusses.reduce((sum, t) => sum + t.massKg, 0);
  const connectionMassKg = input.connectionAllowance * trussMassKg;

  const purlin = sizePurlin(s, ulsKPa * input.purlinSpacingM * 1000, variableKPa * input.purlinSpacingM * 1000);
  const purlinLengthM = planAreaM2 / input.purlinSpacingM;
  const purlinMassKg = purlin.massKgPerM * purlinLengthM;

  const bracing = roofBracing(input, trusses, depthsM);
  const edge = edgeBeamAndColumns(input, trusses, ulsKPa);
  failure = failure || bracing.failure || edge.failure;
  return {
    trusses,
    depthsM,
    failure,
    trussMassKg,
    connectionMassKg,
    purlin,
    purlinLengthM,
    purlinMassKg,
    bracing: bracing.choice,
    bracingLengthM: bracing.lengthM,
    bracingMassKg: bracing.massKg,
    edgeBeam: edge.edgeBeam,
    edgeBeamMomentNm: edge.edgeBeamMomentNm,
    edgeBeamMassKg: edge.edgeBeamMassKg,
    trussColumn: edge.trussColumn,
    trussColumnForceN: edge.trussColumnForceN,
    postCount: edge.postCount,
    post: edge.post,
    postForceN: edge.postForceN,
    columnMassKg: edge.columnMassKg,
    deckMassKg: input.deckKgPerM2 * planAreaM2,
    ulsKPa,
    governingCase,
    upliftCase,
  };
}

/** Roof self-weight carried by the trusses (trusses, connections, purlins, bracing, edge beam, deck), kPa of plan. */
export function trussRoofSelfWeightKPa(r: TrussRoofResult, planAreaM2: number): number {
  return kPaFromKgPerM2((r.trussMassKg + r.connectionMassKg + r.purlinMassKg + r.bracingMassKg + r.edgeBeamMassKg + r.deckMassKg) / planAreaM2);
}
