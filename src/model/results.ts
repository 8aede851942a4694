/**
 * Check results: data, never text printed by the core.
 */

/** A structured citation, never free text: shared by the results that cite it, so read only. */
export interface Citation {
  readonly standard: string;
  readonly clause: string;
  /** "Table 3.4", as the standard names it. */
  readonly table?: string;
  /** The equation number as the standard prints it: "(6.6)" (EN), "J3-1" (AISC). */
  readonly equation?: string;
  /** Other clauses the check applies alongside ("3.8, Eq. (3.5)"). */
  readonly also?: readonly string[];
}

/**
 * A citation made once and shared by every result that cites it (a module constant, not one object per
 * check): frozen, its cross-references too, so that no reader can change it for the others.
 */
export function frozenCitation(citation: Citation): Readonly<Citation> {
  if (citation.also) Object.freeze(citation.also);
  return Object.freeze(citation);
}

export type CheckKind =
  | "bolt-shear"
  | "bolt-bearing"
  | "slip"
  | "net-section"
  | "gross-yield"
  | "block-shear"
  | "grip-length"
  | "min-spacing"
  | "max-spacing"
  | "max-pitch"
  | "max-edge-line-pitch"
  | "min-end-distance"
  | "min-edge-distance"
  | "max-edge-distance"
  | "group-centroid"
  | "minimum-design-action"
  | "filler-thickness"
  | "gross-compression"
  | "strut-buckling"
  | "ply-buckling";

/**
 * Strength checks compare forces (N) and scale with the joint tension; rules compare lengths (mm).
 * For a strength check, loadRatio = demand / joint tension, so the joint tension at which the check
 * reaches utilisation 1 is resistance / loadRatio.
 */
export interface StrengthCheck {
  type: "strength";
  id: string;
  kind: CheckKind;
  title: string;
  component: string;
  citation: Citation;
  formula: string;
  substituted: string;
  limitState: "ULS" | "SLS";
  /** The sense of the load the check is for (absent: tension, the only sense before reversal). */
  sense?: "tension" | "compression";
  demand_N: number;
  resistance_N: number;
  loadRatio: number;
  utilisation: number;
  pass: boolean;
  notes: string[];
}

export interface RuleCheck {
  type: "rule";
  id: string;
  kind: CheckKind;
  title: string;
  component: string;
  citation: Citation;
  formula: string;
  substituted: string;
  /** The measured value and the limit, mm; bound says which way the limit binds. */
  value_mm: number;
  limit_mm: number;
  bound: "min" | "max";
  /** A rule that applies only to one sense of the load (absent: both). */
  sense?: "tension" | "compression";
  utilisation: number;
  pass: boolean;
  notes: string[];
}

export type CheckResult = StrengthCheck | RuleCheck;

export interface Warning {
  id: string;
  message: string;
}

export interface CheckReport {
  code: string;
  codeTitle: string;
  checks: CheckResult[];
  /** Least joint tension any ULS strength check allows, N. */
  jointStrength_N: number;
  /** The senses checked (tension, compression or both) and, per sense, the least force of that sense any ULS check allows, N. */
  senses?: Array<"tension" | "compression">;
  strengthBySense?: { tension?: number; compression?: number };
  /** The ULS strength check that sets jointStrength. */
  governing: string;
  /** Joint strength ÷ design tension strength of the unperforated thinner main plate. */
  efficiency: number;
  efficiencyDefinition: string;
  unperforatedStrength_N: number;
  /** Highest utilisation of any check. */
  maxUtilisation: number;
  pass: boolean;
  warnings: Warning[];
  /** Statements of conventions used (net area of bolts, net-section load treatment...). */
  conventions: string[];
}

/**
 * A result whose substituted-values text and notes are written on first read, from the same numbers.
 * A search runs thousands of checks and shows a few; the figures are identical either way.
 * (Getters live on the prototype: read them by name, as the report writers do.)
 */
export class LazyText {
  #substituted: (() => string) | string;
  #notes: (() => string[]) | string[];
  constructor(substituted: () => string, notes: () => string[]) {
    this.#substituted = substituted;
    this.#notes = notes;
  }
  get substituted(): string {
    if (typeof this.#substituted === "function") this.#substituted = this.#substituted();
    return this.#substituted;
  }
  get notes(): string[] {
    if (typeof this.#notes === "function") this.#notes = this.#notes();
    return this.#notes;
  }
}
