/**
 * The interface every design-code module implements. No global state: the code object is passed
 * into every call.
 */
import type { GeometryCode } from "../geometry/joint-builder.js";
import type { Joint } from "../model/joint.js";
import type { CheckResult, StrengthCheck, Warning } from "../model/results.js";
import type { CheckableScenario, CheckOptions, EfficiencyBasis, PlateSpec, Scenario } from "../model/scenario.js";

/** An input the code cannot accept, with the scenario path it concerns. */
export interface ScopeError {
  path: string;
  message: string;
}

export interface CodeChecks {
  checks: CheckResult[];
  warnings: Warning[];
  conventions: string[];
}

/**
 * How the top of a searched range is set. "rule": a code maximum — a larger value fails a check, so the
 * range ends at the last step value at or below it. "declared": the point where the terms a larger value
 * could raise stop growing (a stated narrowing) — the range ends at the first step value at or beyond
 * it, never past the rule maximum given beside it.
 */
export interface RangeTop {
  kind: "rule" | "declared";
  /** For a declared top: the code's own maximum, which the rounded-up range never passes (Infinity: none). */
  ruleMax_mm?: number;
}

/** The declared search-space limits the code sets for one bolt size and pattern, mm. */
export interface SearchLimits {
  pitchMin_mm: number;
  pitchMax_mm: number;
  gaugeMin_mm: number;
  gaugeMax_mm: number;
  endMin_mm: number;
  /** Largest end distance searched. */
  endMax_mm: number;
  /** Largest end distance at the butt searched (butt splices). */
  endAtButtMax_mm: number;
  edgeMin_mm: number;
  edgeMax_mm: number;
  /**
   * Staggered patterns of butt splices: the largest gap + 2·(e_butt + p) the code's pitch rule admits
   * between the two groups' holes of transverse line 1, which are consecutive on a gauge line of the
   * covers (Infinity: the search takes no such limit). Not a range: a layout beyond it fails the
   * checker's maximum pitch, and so does every layout with a larger pitch or end distance at the butt
   * (DEVELOPERS.md, "The stagger span across the butt").
   */
  staggeredButtSpanMax_mm: number;
  /** Whether each top is a code rule or a declared cap (see RangeTop). */
  tops: { pitch: RangeTop; gauge: RangeTop; end: RangeTop; endAtButt: RangeTop };
  /** The limits in words, with their clauses, for the output. */
  statement: string;
}

/** A layout family as the strength bound sees it: counts per transverse line and known dimensions. */
export interface LayoutShape {
  pattern: "grid" | "staggered" | "tapered";
  /** Bolts on each transverse line of one group, line 0 nearest the end of main plate B. */
  countsPerLine: number[];
  /** "compression": bound the checks of the compression sense (no net section; see DEVELOPERS.md). */
  sense?: "tension" | "compression";
  /** Undefined: not yet chosen (the bound takes the most favourable value). */
  pitch_mm?: number;
  endDistance_mm?: number;
  endDistanceAtButt_mm?: number;
}

/**
 * An upper bound on the checker's joint strength for every layout of a shape (admissible: never
 * below what the checker would find), and whether the service-load checks can pass at all.
 */
export interface StrengthBound {
  jointStrength_N: number;
  check: string;
  serviceOk: boolean;
  /**
   * Upper bound of what one bolt can carry in the bolt-group checks (shear, bearing, slip at the
   * factored load), expressed as joint tension per bolt: no layout of n bolts carries more than
   * n times this.
   */
  perBolt_N: number;
  /** The least of the plate checks alone (gross yield, net section) in the bound, N. */
  plates_N: number;
}

/**
 * What a code reads from a scenario beyond the fields every code reads (EN 1993-1-8: partial factors of
 * a national annex, the steel-strength convention). A code without such settings leaves it out.
 */
export interface CodeSettings {
  /** Scenario fields only this code reads, as file paths ("factors", "options.steel_strengths"); any other code refuses them. */
  fields: readonly string[];
  /** The code's own defaults for shared options a scenario leaves out. */
  optionDefaults: Partial<Pick<CheckOptions, "boltNetArea" | "boltStrength">>;
  /**
   * The code bound to one scenario's settings: the methods that see only a plate or a bolt size
   * (plateStrength, holeDimensions, unperforatedStrength, netStrengthPerWidth) answer for that scenario.
   */
  bind(scenario: Scenario): DesignCode;
}

/** What a code adds for a splice in compression (its bolt checks run on the reversed joint). */
export interface CompressionChecks {
  /**
   * The part of the factored compression the bolts and covers carry (1 unless the butt ends bear), with
   * the clause in words: what the contact carries and what the splice still carries.
   */
  spliceShare(scenario: Scenario): { value: number; text: string };
  /**
   * Gross section of each plate in compression, each cover as a strut across the butt, the compression
   * pitch limits. Strength checks give loadRatio as demand per unit of the factored compression.
   */
  checks(joint: Joint, scenario: CheckableScenario, spliceShare: number): { checks: CheckResult[]; conventions: string[] };
}

/** Which of a code's checks of a joint to make (DesignCode.checkJoint). */
export type CheckScope = "all" | "bolts" | "layout";

export interface DesignCode extends GeometryCode {
  id: string;
  title: string;
  /** Steel grades the code's material tables hold. */
  grades: readonly string[];
  /** Bolt diameters the code's tables cover, mm (metric sizes, and inch sizes × 25.4 where it takes them). */
  boltSizes_mm: readonly number[];
  /** Inputs this code cannot check (grade unknown to it, a bolt class not allowed for friction grip...). */
  scopeErrors(scenario: Scenario): ScopeError[];
  /**
   * Run the checks on the joint's geometry: every check ("all", the default); the bolt-group checks
   * alone ("bolts": slip, bolt shear and bearing, made by the same functions and in the same order as in
   * "all"; no warnings or conventions), which is all the compression sense of the load reads from the
   * joint with its bearing directions reversed; or the layout's rules alone ("layout": the rule checks
   * of "all" in its order, with its warnings and conventions), which is all a splice in compression alone
   * reads from the check of the joint as built (engine/senses.ts).
   */
  checkJoint(joint: Joint, scenario: CheckableScenario, scope?: CheckScope): CodeChecks;
  /**
   * Design tension strength of an unperforated plate under this code, the denominator of efficiency, on
   * the basis given (default "lesser": the lesser of gross yield and rupture with An = Ag). Whatever the
   * basis, "lesser" bounds every joint strength from above.
   */
  unperforatedStrength(spec: PlateSpec, basis?: EfficiencyBasis): { value_N: number; definition: string };
  /** Search-space limits for a bolt size and pattern. */
  searchLimits(scenario: Scenario, d_mm: number, pattern: LayoutShape["pattern"]): SearchLimits;
  /** Admissible upper bound of the joint strength of a layout shape (see DEVELOPERS.md). */
  strengthBound(scenario: CheckableScenario, shape: LayoutShape): StrengthBound;
  /** Design rupture strength of net section per mm of net width, N/mm (IS 800: 0.9·t·fu/γm1). */
  netStrengthPerWidth(spec: PlateSpec): number;
  /** Property classes the code allows for an assembly (friction grip: 8.8 and 10.9 under IS 800). */
  classesFor(assembly: "bearing" | "friction-grip"): readonly string[];
  /**
   * The code's minimum design action on the connection of a tension member, as a condition on the
   * joint's design strength in tension (`jointTension_N`, worked out from every other check), called
   * when the load has a tension sense; absent or null: the code sets none here (engine/check.ts).
   */
  minimumDesignAction?: (scenario: CheckableScenario, jointTension_N: number) => StrengthCheck | null;
  /** Checks of a splice in compression (see engine/senses.ts); absent: the code checks tension only. */
  compression?: CompressionChecks;
  /** Scenario settings this code reads (absent: none). */
  settings?: CodeSettings;
}
