/**
 * The typed scenario, in core units (N, mm, MPa). Produced by src/io from a YAML file; the core never sees YAML.
 */
import type { AstmBoltGrade, NetAreaConvention, BoltStrengthBasis, PropertyClass } from "../catalogue/bolts.js";
import type { En10025Convention } from "../catalogue/steels.js";

/** The unperforated plate strength that efficiency divides by. */
export type EfficiencyBasis = "lesser" | "rupture" | "yield";
export const EFFICIENCY_BASES: readonly EfficiencyBasis[] = ["lesser", "rupture", "yield"];

export type SpliceType = "lap" | "butt-single-cover" | "butt-double-cover";

/**
 * Edge preparation of a plate edge. IS 800:2007 cl. 10.2.4.2 sets 1.5 d0 for rolled, machine flame cut,
 * sawn and planed edges, and 1.7 d0 for sheared or hand flame cut edges.
 */
export type EdgePreparation = "rolled" | "machine-flame-cut" | "sawn" | "planed" | "sheared" | "hand-flame-cut";
export const EDGE_PREPARATIONS: readonly EdgePreparation[] = [
  "rolled",
  "machine-flame-cut",
  "sawn",
  "planed",
  "sheared",
  "hand-flame-cut",
];

export interface PlateSpec {
  width_mm: number;
  thickness_mm: number;
  grade: string;
  edges: EdgePreparation;
}

export type HoleType = "standard" | "oversize" | "short-slot" | "long-slot";
export const HOLE_TYPES: readonly HoleType[] = ["standard", "oversize", "short-slot", "long-slot"];

/** Direction of the long axis of a slotted hole relative to the force. */
export type SlotDirection = "along" | "across";

export type BoltAssembly = "bearing" | "friction-grip";

export interface BoltSpec {
  size_mm: number;
  propertyClass: PropertyClass;
  /**
   * AISC 360-16 scenarios: the ASTM grade named (F3125 A325 / A490, A307); propertyClass then holds the
   * ISO class of the same strength level for code-neutral parts (costs, bill of materials).
   */
  astmGrade?: AstmBoltGrade;
  assembly: BoltAssembly;
  /**
   * Bearing-type bolts tightened to their preload (EN 1993-1-8 Category A with preloaded bolts; AISC
   * 360-16 pretensioned bearing-type): the same checks, the preloaded assembly. Friction-grip bolts are
   * preloaded anyway and leave this out.
   */
  preloaded?: boolean;
  /** Slip factor μf (friction-grip only), IS 800:2007 Table 20. */
  slipFactor?: number;
  /** Friction-grip joints: design against slip at the service or at the factored load (γmf 1.10 / 1.25). */
  slipAt?: "service" | "ultimate";
  /** Threads intercept every shear plane (true) or none (false). */
  threadsInShearPlanes: boolean;
  hole: HoleType;
  slotDirection?: SlotDirection;
}

/** A bolt pattern. Counts are named for what they count: "across" the width, "along" the force. */
export type LayoutSpec =
  | {
      kind: "grid";
      /** Bolts across the width on each transverse line. */
      across: number;
      /** Transverse lines along the force (per side of the butt for butt splices). */
      along: number;
      pitch_mm: number;
      gauge_mm: number;
      endDistance_mm: number;
      /** Butt splices: end distance of the main plate at the butt (defaults to endDistance). */
      endDistanceAtButt_mm: number;
    }
  | {
      kind: "staggered";
      /** Bolts on the first (and every odd) transverse line; even lines carry one fewer, set midway between. */
      across: number;
      along: number;
      /** Stagger pitch s: distance along the force between consecutive transverse lines. */
      pitch_mm: number;
      /** Gauge g: distance across the force between adjacent gauge lines. */
      gauge_mm: number;
      endDistance_mm: number;
      endDistanceAtButt_mm: number;
    }
  | {
      kind: "tapered";
      /** Bolts on each transverse line, first line nearest the plate end; each line symmetric about the axis. */
      acrossPerLine: number[];
      pitch_mm: number;
      gauge_mm: number;
      endDistance_mm: number;
      endDistanceAtButt_mm: number;
    }
  | {
      kind: "holes";
      /**
       * Hole centres of one bolt group: x along the force, measured from the loaded plate's end
       * (lap: from the end of plate B; butt: from the butt end of main plate B, mirrored for side A),
       * y across, measured from the plate axis.
       */
      holes: Array<{ x_mm: number; y_mm: number }>;
      /** Distance from the last hole line to the far end (lap: end of plate A; butt: end of the cover). */
      endDistance_mm: number;
    };

export interface SearchSpec {
  patterns?: Array<"grid" | "staggered" | "tapered">;
  maxAlong?: number;
  minBolts?: number;
  sizes_mm?: number[];
  classes?: PropertyClass[];
  step_mm?: number;
  maxSpliceLength_mm?: number;
  /** Largest end distance (both ends) the detailer accepts: a declared narrowing below the code's maximum. */
  maxEndDistance_mm?: number;
  maxAcross?: number;
  /**
   * Fewest bolts across on the fullest transverse line (grid: every line; staggered: the odd lines;
   * tapered: the line at the butt). Default: 2 where the narrowest plate fits two, else 1.
   */
  minAcross?: number;
  fixedGauge_mm?: number;
  coverThicknesses_mm?: number[];
}

export interface CheckOptions {
  /** IS 800:2007 cl. 10.2.4.3: exposed to corrosive influences (limits edge distance to 40 + 4t). */
  exposedToCorrosion: boolean;
  boltNetArea: NetAreaConvention;
  boltStrength: BoltStrengthBasis;
  /**
   * Net-section demand. "full": every path carries the whole plate force (cl. 6.3.1 as written).
   * "transferred": a path carries only what its plate has not yet passed to bolts ahead of it.
   */
  netSectionLoad: "full" | "transferred";
  /**
   * Block shear demand. "share": a block holding k of a group's n bolts carries k/n of its plate's force
   * (equal bolt shares, as the bolt-group checks assume). "full": every block carries the whole plate force.
   */
  blockShearLoad: "share" | "full";
  /** Denominator of efficiency: the unperforated plate's lesser of yield and rupture, or one of them. */
  efficiencyBasis: EfficiencyBasis;
  /** EN 1993-1-8 scenarios: fy and fu from EN 10025-2 by thickness, or from EN 1993-1-1 Table 3.1. */
  steelStrengths?: En10025Convention;
  /** EN 1993-1-8 scenarios: normal-hole clearance of M12 and M14 bolts, 1 mm (EN 1090-2) or 2 mm (EN 1993-1-8, 3.6.1(5)). */
  smallBoltClearance_mm?: 1 | 2;
  /** AISC 360-16 scenarios: deformation at the bolt hole at service load a design consideration (J3.10(a)(1)(i), (a)(2)(i)) or not ((a)(1)(ii), (a)(2)(ii)). */
  bearingDeformation?: "considered" | "not-considered";
  /** AISC 360-16 scenarios: fillers (packing) developed by extension and extra bolts (J5.2(b)); default false. */
  fillersDeveloped?: boolean;
}

/** Partial factors a scenario sets (a national annex); absent ones take the code's recommended values. */
export interface PartialFactorSettings {
  gammaM0?: number;
  gammaM1?: number;
  gammaM2?: number;
  gammaM3?: number;
  gammaM3ser?: number;
}

/** Units of a scenario file's bare numbers and of the output: SI (mm, kN, MPa) or US customary (in, kip, ksi). */
export type UnitSystem = "si" | "us";

export interface Scenario {
  name: string;
  /** Input and display units (default SI); the core still works in N, mm, MPa. */
  units?: UnitSystem;
  code: string;
  /**
   * endsInContact (butt splices): the butt ends are prepared for bearing (machined or sawn) and in contact;
   * default false, when the bolts and covers carry the whole compression.
   */
  splice: { type: SpliceType; buttGap_mm: number; endsInContact?: boolean };
  plates: {
    mainA: PlateSpec;
    mainB: PlateSpec;
    /** Cover plates (butt splices): one for single-cover, two (coverA one face, coverB the other) for double. */
    covers: PlateSpec[];
  };
  /** Packing thickness under the thinner main plate (butt splices), mm. */
  packing_mm: number;
  /**
   * factoredTension_N is 0 when the splice carries no tension (compression only). A compression beside a
   * tension means reversal: every check runs for each sense and the worse governs.
   */
  load: { factoredTension_N: number; serviceTension_N?: number; factoredCompression_N?: number; serviceCompression_N?: number };
  bolts?: BoltSpec;
  layout?: LayoutSpec;
  search?: SearchSpec;
  options: CheckOptions;
  /** Partial factors of the national annex (EN 1993-1-8 scenarios). */
  factors?: PartialFactorSettings;
  /** The scenario's own table of equivalent materials for `compare --codes` (validated in src/io). */
  compare?: unknown;
  /** The scenario's own cost entries (validated by src/io/costs.ts), applied over the catalogue. */
  costs?: unknown;
  /** Free text the engineer wants carried into the output (project, member mark). */
  project?: string;
  /** Title-block and sign-off fields (job, drawing and calculation numbers, revision, names, date). */
  document?: DocumentInfo;
}

/** Title-block and sign-off fields, free text as the office writes them; each optional. */
export interface DocumentInfo {
  job?: string;
  drawingNumber?: string;
  calculationNumber?: string;
  revision?: string;
  drawnBy?: string;
  preparedBy?: string;
  checkedBy?: string;
  /** The document's date as the office writes it; the run's date is used when absent. */
  date?: string;
}

/** A scenario ready for `check`: bolts and layout present. */
export interface CheckableScenario extends Scenario {
  bolts: BoltSpec;
  layout: LayoutSpec;
}

/** Every plate of a scenario with its path in the file (for messages that name the field). */
export function platesWithPaths(scenario: Scenario): Array<[string, PlateSpec]> {
  return [
    ["plates.main", scenario.plates.mainA],
    ["plates.main_b", scenario.plates.mainB],
    ...scenario.plates.covers.map((c, i): [string, PlateSpec] => [i === 0 ? "plates.cover" : "plates.cover_b", c]),
  ];
}
