import type { Brief } from "../brief";
import type { Catalogue } from "../catalogue/types";
import type { MaterialId } from "../materials";
import type { TakeoffGroup, TakeoffRow } from "../takeoff/takeoff-row";

import type { SchemeId } from "./ids";

export type { SchemeId };

/** A scheme option's value as the study file stores it. */
export type OptionValue = number | string | boolean;
export type SchemeOptions = Record<string, OptionValue>;

/**
 * What kind of uncertain quantity a number option is, for the risk defaults: a load, a buckling
 * knock-down, a design allowance (nodes, connections, seams), a creep coefficient or a
 * reinforcement rate. Options without one are design choices, not uncertainties.
 */
export type UncertaintyKind = "load" | "knock-down" | "allowance" | "creep" | "reinforcement";

/** How an option is shown and validated. Every option has a default, a unit and where it comes from. */
export type OptionSpec =
  | {
      key: string;
      label: string;
      kind: "number";
      unit: string;
      min: number;
      max: number;
      step: number;
      /** Whole numbers only (counts). */
      integer?: boolean;
      source: string;
      /** Set when the value is uncertain at concept stage (the risk page offers it a range). */
      uncertainty?: UncertaintyKind;
      /** A free proportion: the pipeline may search it within [min, max] (step / integer respected) unless the user pins it. */
      free?: boolean;
      /** A free proportion only while another option has this value (rib spacing while the shell is ribbed); else neither searched nor reported. */
      freeWhen?: { key: string; value: string | boolean };
      /**
       * The search's reference for a free option, per metre of span: it starts there and, among
       * candidates of equal merit, keeps the nearest to it (the cable net's mast count grows with the
       * span); without it the reference is the set value.
       */
      referencePerSpanM?: number;
      /**
       * The search's reference for a free option where it is not the default: the default design
       * keeps its value, while the search, within its band of equal merit, keeps the candidate nearest
       * this one (the cable dome's ring height: flat objective above about 0.09 × span).
       */
      searchReference?: number;
      /** The least value the search tries, where values below it ask the scheme to choose (the cable dome's 0 hoops = automatic): the search stands in for that choice and reports the real value. */
      searchMin?: number;
    }
  | { key: string; label: string; kind: "select"; unit: ""; choices: readonly { value: string; label: string }[]; source: string; free?: boolean }
  | { key: string; label: string; kind: "toggle"; unit: ""; source: string; free?: boolean };

/** A number the page shows in the scheme's summary. */
export interface SummaryItem {
  key: string;
  label: string;
  value: number;
  unit: string;
}

/** A group of alike members, sized together. Forces signed: + tension, − compression. */
export interface MemberGroup {
  element: string;
  material: MaterialId;
  count: number;
  /** Length of one member (mean where they vary), m. */
  lengthM: number;
  /** Section chosen from the catalogue (designation). */
  section: string;
  /** Design force of the worst member, N (+ tension, − compression). */
  designForceN: number;
  /** Design resistance for the governing check, N (positive). */
  resistanceN: number;
  /** designForce / resistance, absolute. */
  utilisation: number;
  /** The check that governs, with its clause, e.g. "flexural buckling, EN 1993-1-1 §6.3.1". */
  governing: string;
  /**
   * A member sized in bending alone (a purlin): its design moment and the moment resistance of its
   * bending check, N·m, shown in place of the force and resistance (0 for such a member).
   */
  bending?: { designMomentNm: number; resistanceNm: number };
}

/** One design check. */
export interface Check {
  name: string;
  /** Clause or published source of the check. */
  clause: string;
  demand: number;
  capacity: number;
  unit: string;
  utilisation: number;
  passed: boolean;
}

/** A polyline for a drawing; x horizontal from the centre, y up (section) or plan y, m. */
export interface DrawingLine {
  /** What it is, e.g. "ridge cable", "post", "shell"; the chart colours by role. */
  role: string;
  points: readonly (readonly [number, number])[];
}

/** feasible: checks pass and the span is in range; out-of-range: outside the method's valid span; infeasible: a reason. */
export type DesignStatus = "feasible" | "out-of-range" | "infeasible";

/** Mass by the four groups of the one accounting, kg. */
export type MassByGroupKg = Record<TakeoffGroup, number>;

/**
 * What stands over and on the floor, for the usable floor by one rule: `soffit` = (radius from the
 * centre, m; height of the structure's lowest members above the floor, m) along a radius;
 * `supports` = things standing on the floor inside the plan (masts) with their clear zones.
 */
export interface FloorEnvelope {
  soffit: readonly (readonly [number, number])[];
  supports: readonly { radiusM: number; clearRadiusM: number; count: number }[];
}

/** A 3D model drawn in projection: nodes (x, y, z m, z up from the floor), members with their forces under `caseName`. */
export interface AnalysisView {
  caseName: string;
  nodes: readonly (readonly [number, number, number])[];
  members: readonly { a: number; b: number; kind: "cable" | "strut" | "beam"; forceN: number; utilisation?: number; slack?: boolean }[];
  displacementsM?: readonly (readonly [number, number, number])[];
  modeShape?: readonly (readonly [number, number, number])[];
}

/** What a scheme's 3D analysis found, per design combination. */
export interface DesignAnalysis {
  loadCases: { name: string; iterations: number; converged: boolean; maxDisplacementM: number; slackMembers: number }[];
  prestressKN?: number;
  bucklingFactor?: number;
  continuumBucklingFactor?: number;
  view?: AnalysisView;
}

/** The preliminary design of one scheme for one brief: plain data, comparable and serialisable. */
export interface Design {
  schemeId: SchemeId;
  feasible: boolean;
  /** Only "feasible" is ranked, called best, used in crossovers and on the Pareto front. */
  status: DesignStatus;
  /** Name of the design combination that governed (src/loads designCombinations), "" when none. */
  governingLoadCase: string;
  /** Why it is infeasible, in words a person can act on; "" when feasible. */
  reason: string;
  /** Span outside the method's valid range (still computed where possible). */
  outsideValidRange: boolean;
  summary: SummaryItem[];
  members: MemberGroup[];
  takeoff: TakeoffRow[];
  checks: Check[];
  warnings: string[];
  /** Self-weight iterations to converge. */
  iterations: number;
  /** Mass by group (structure, perimeter, substructure, envelope), kg; sums to totalMassKg. */
  massByGroupKg: MassByGroupKg;
  /** Total structure and envelope mass, kg (sum of take-off masses, substructure included). */
  totalMassKg: number;
  /** Mass of the roof itself, kg: the total less substructure (ground anchors, dead-weight blocks). */
  roofMassKg: number;
  /** Self-weight of the roof per m² of plan, kg/m² (roofMassKg / plan; substructure excluded). */
  selfWeightKgPerM2: number;
  /** Plan area with at least the brief's clear height under the structure, m². */
  usableFloorM2: number;
  /** Plan area inside the roof edge, m². */
  planAreaM2: number;
  /** Roof surface area, m². */
  roofSurfaceM2: number;
  /** Mass of the air enclosed, kg. */
  enclosedAirKg: number;
  /** Name of the check with the highest utilisation. */
  governing: string;
  maxUtilisation: number;
  drawing: { section: DrawingLine[]; plan?: DrawingLine[] };
  /** The 3D analysis, where the scheme ran one. */
  analysis?: DesignAnalysis;
  /** The structural regime the design is in, named (e.g. "single layer", "double layer"); a change of it between spans explains a jump. */
  regime?: string;
}

/** How the search samples the trend of the objective across the rise range (see ../pipeline/rise-trend.ts). */
export interface RiseTrend {
  /** Rises sampled at equal steps of rise ÷ span across the range (at least 3: a quadratic is fitted through them). */
  samples: number;
  /**
   * The other free proportions (a lattice's member length) the rises are sampled at: "searched", the
   * best a descent finds at the preferred rise (a noisy local optimum that can step from one span to
   * the next); "reference", their reference values at every span (no descent: the same proportions
   * at every span, so the samples move smoothly with span; right only when the reference is not far
   * from the optimum).
   */
  sampledAt: "searched" | "reference";
}

/**
 * What a scheme is, without its designer: who it is, its valid range, its options. The pages, the
 * study schema, the defaults, the palette and the risk defaults read only this (the declarations
 * registry, ../declarations.ts), so the main thread carries no design code.
 */
export interface SchemeDeclaration<O extends SchemeOptions = SchemeOptions, Id extends string = SchemeId> {
  id: Id;
  label: string;
  /** Colour of the scheme on every chart and export (CSS colour). */
  colour: string;
  /** One plain paragraph on the structural system. */
  description: string;
  /**
   * What a client should know of this kind of roof, in words a non-engineer reads (issue 14: the
   * client page's cautions in plain words, not the engineers' notes): at most two short sentences,
   * no codes, symbols or method names. The design's own warnings stay in the appendix.
   */
  clientNotes: readonly [string] | readonly [string, string];
  /** Span range in which the method is valid, m. */
  validSpanM: { min: number; max: number };
  /** The rise ÷ span the scheme may take when each scheme chooses its own rise. */
  riseSpanRatio?: {
    min: number;
    max: number;
    preferred: number;
    /** The search chooses the rise on the trend of the objective across the range, not among single samples (a lattice: each rise gives another mesh and other sections). */
    byTrend?: RiseTrend;
  };
  options: readonly OptionSpec[];
  defaults: O;
  /**
   * The cached meshes its designs cut (the geodesic spheres, built once per frequency in each
   * worker): the span study gives the schemes that name the same cache to the same worker in its
   * first pass, rather than every worker building every sphere.
   */
  meshCache?: "geodesic spheres";
  /**
   * Cheaper options the proportion search designs its candidates with (say, the closed form in
   * place of a 3D analysis); the chosen proportions are then designed once with the full options.
   * An option the user pinned is never overridden.
   */
  screeningOptions?: Partial<O>;
  /**
   * Free proportions the screening options judge badly (the cable dome's post depth and rise: the
   * closed form prefers deeper posts and a higher rise than the 3D analysis does): after the screened
   * search each, in this order, is chosen again on designs with the full options, on the trend of the
   * objective through these values of it (the same at every span; the rise, "riseM", as rise ÷ span),
   * the other proportions kept; of the values within the tie band of the fitted least, the nearest
   * `reference` (default: the option's search reference or default, the preferred rise). With
   * `descend`, the value so chosen then steps towards the best sample while each step's full design
   * is better by more than the tie band (the trend misjudged a steep, uneven objective). With
   * `beyond`, a choice at the outermost sample steps on past it, one grid value at a time, while each
   * step's full design is better by more than the tie band (the samples missed a better value outside
   * them). With `carries`, each of its values is designed with that proportion scaled by (1 − value) ÷
   * (1 − its value before): the net's mast height with its mast ring, so the outer radial cables keep
   * their slope. Where a proportion refined after one with `descend` moved the design, the `descend` one
   * steps again, from the better of where it was carried and where it was chosen. A count
   * declares `neighbours` (and `ratios`) instead: it is designed at the screened value, that many grid
   * steps either side and those multiples of it, steps on from the best to a neighbour while that is
   * better by more than the tie band, and takes the least of the counts designed.
   */
  refinedInFull?: readonly ({ key: (keyof O & string) | "riseM"; samples: readonly number[]; reference?: number; descend?: boolean; beyond?: boolean; carries?: keyof O & string } | { key: keyof O & string; neighbours: number; ratios?: readonly number[] })[];
}

/** A scheme: its declaration and its designer (the design registry, ./index.ts: the pipeline, the workers and the command line). */
export interface SchemeModel<O extends SchemeOptions = SchemeOptions, Id extends string = SchemeId> extends SchemeDeclaration<O, Id> {
  /** Preliminary design. Never throws for a valid brief: infeasible is an answer. */
  design(brief: Brief, options: O, catalogue: Catalogue): Design;
}
