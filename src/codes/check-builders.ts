/**
 * Builders of check results shared by every design-code module: the utilisation, the pass verdict and
 * the lazily written text (a search runs thousands of checks and prints a few; the figures are the same
 * either way).
 *
 * Each result is an object of one fixed shape with its numbers as plain fields; the substituted-values
 * text and the notes are getters (from LazyText) that write the text on first read from closures over
 * the same numbers. No number is ever computed from a text.
 */
import { LazyText, type Citation, type RuleCheck, type StrengthCheck, type CheckResult, type Warning } from "../model/results.js";
import type { CodeChecks } from "./types.js";
import { utilisation } from "./format.js";

type StrengthInput = Omit<StrengthCheck, "type" | "utilisation" | "pass" | "notes" | "substituted"> & { substituted: () => string; notes?: () => string[] };
type RuleInput = Omit<RuleCheck, "type" | "utilisation" | "pass" | "notes" | "substituted"> & { substituted: () => string; notes?: () => string[] };

const NO_NOTES = (): string[] => [];

/** A strength check: demand and resistance in N, the load ratio demand / joint tension. */
class StrengthResult extends LazyText implements StrengthCheck {
  readonly type = "strength" as const;
  id: string;
  kind: StrengthCheck["kind"];
  title: string;
  component: string;
  citation: Citation;
  formula: string;
  limitState: StrengthCheck["limitState"];
  declare sense?: "tension" | "compression";
  demand_N: number;
  resistance_N: number;
  loadRatio: number;
  utilisation: number;
  pass: boolean;
  constructor(
    id: string,
    kind: StrengthCheck["kind"],
    title: string,
    component: string,
    citation: Citation,
    formula: string,
    limitState: StrengthCheck["limitState"],
    sense: "tension" | "compression" | undefined,
    demand_N: number,
    resistance_N: number,
    loadRatio: number,
    substituted: () => string,
    notes: () => string[],
  ) {
    super(substituted, notes);
    this.id = id;
    this.kind = kind;
    this.title = title;
    this.component = component;
    this.citation = citation;
    this.formula = formula;
    this.limitState = limitState;
    if (sense !== undefined) this.sense = sense;
    this.demand_N = demand_N;
    this.resistance_N = resistance_N;
    this.loadRatio = loadRatio;
    this.utilisation = utilisation(demand_N, resistance_N);
    this.pass = this.utilisation <= 1 + 1e-9;
  }
}

/** A rule check: a measured length against a limit, mm. */
class RuleResult extends LazyText implements RuleCheck {
  readonly type = "rule" as const;
  id: string;
  kind: RuleCheck["kind"];
  title: string;
  component: string;
  citation: Citation;
  formula: string;
  value_mm: number;
  limit_mm: number;
  bound: RuleCheck["bound"];
  declare sense?: "tension" | "compression";
  utilisation: number;
  pass: boolean;
  constructor(
    id: string,
    kind: RuleCheck["kind"],
    title: string,
    component: string,
    citation: Citation,
    formula: string,
    value_mm: number,
    limit_mm: number,
    bound: RuleCheck["bound"],
    sense: "tension" | "compression" | undefined,
    substituted: () => string,
    notes: () => string[],
  ) {
    super(substituted, notes);
    this.id = id;
    this.kind = kind;
    this.title = title;
    this.component = component;
    this.citation = citation;
    this.formula = formula;
    this.value_mm = value_mm;
    this.limit_mm = limit_mm;
    this.bound = bound;
    if (sense !== undefined) this.sense = sense;
    this.utilisation = bound === "max" ? value_mm / limit_mm : value_mm > 0 ? limit_mm / value_mm : Infinity;
    this.pass = bound === "max" ? value_mm <= limit_mm + 1e-9 : value_mm >= limit_mm - 1e-9;
  }
}

/**
 * A strength check result. The substituted-values text and the notes are written only when read, from
 * the same numbers.
 */
export function strength(p: StrengthInput): StrengthCheck {
  return new StrengthResult(p.id, p.kind, p.title, p.component, p.citation, p.formula, p.limitState, p.sense, p.demand_N, p.resistance_N, p.loadRatio, p.substituted, p.notes ?? NO_NOTES);
}

/** A rule check result: a measured length against a limit, with the bound saying which way it binds. */
export function rule(r: RuleInput): RuleCheck {
  return new RuleResult(r.id, r.kind, r.title, r.component, r.citation, r.formula, r.value_mm, r.limit_mm, r.bound, r.sense, r.substituted, r.notes ?? NO_NOTES);
}

/**
 * A check's result for one sense of the load (engine/senses.ts): a new result of the same shape with
 * another id, title and sense, a strength check's load ratio multiplied by `scale`, the same demand,
 * resistance, measured value and limit, and its text and notes from the given closures.
 */
export function relabelled(c: CheckResult, id: string, title: string, sense: "tension" | "compression", scale: number, substituted: () => string, notes: () => string[]): CheckResult {
  if (c.type === "strength") return new StrengthResult(id, c.kind, title, c.component, c.citation, c.formula, c.limitState, sense, c.demand_N, c.resistance_N, c.loadRatio * scale, substituted, notes);
  return new RuleResult(id, c.kind, title, c.component, c.citation, c.formula, c.value_mm, c.limit_mm, c.bound, sense, substituted, notes);
}

/** A code's checks of one joint, with the statements of its conventions written on first read. */
class CodeCheckList implements CodeChecks {
  #conventions: (() => string[]) | string[];
  constructor(
    readonly checks: CheckResult[],
    readonly warnings: Warning[],
    conventions: () => string[],
  ) {
    this.#conventions = conventions;
  }
  get conventions(): string[] {
    if (typeof this.#conventions === "function") this.#conventions = this.#conventions();
    return this.#conventions;
  }
}

/**
 * The checks and warnings of one joint under a code, with the conventions it used as words written only
 * when an output reads them (a search checks thousands of joints and prints a few).
 */
export function codeChecks(checks: CheckResult[], warnings: Warning[], conventions: () => string[]): CodeChecks {
  return new CodeCheckList(checks, warnings, conventions);
}

/** The bolt-group checks of a joint alone (DesignCode.checkJoint with scope "bolts"): no warnings, no conventions. */
export function boltChecksOnly(checks: CheckResult[]): CodeChecks {
  return new CodeCheckList(checks, [], NO_NOTES);
}
