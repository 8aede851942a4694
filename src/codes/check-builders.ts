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
  constructor(p: StrengthInput) {
    super(p.substituted, p.notes ?? NO_NOTES);
    this.id = p.id;
    this.kind = p.kind;
    this.title = p.title;
    this.component = p.component;
    this.citation = p.citation;
    this.formula = p.formula;
    this.limitState = p.limitState;
    if (p.sense !== undefined) this.sense = p.sense;
    this.demand_N = p.demand_N;
    this.resistance_N = p.resistance_N;
    this.loadRatio = p.loadRatio;
    this.utilisation = utilisation(p.demand_N, p.resistance_N);
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
  constructor(r: RuleInput) {
    super(r.substituted, r.notes ?? NO_NOTES);
    this.id = r.id;
    this.kind = r.kind;
    this.title = r.title;
    this.component = r.component;
    this.citation = r.citation;
    this.formula = r.formula;
    this.value_mm = r.value_mm;
    this.limit_mm = r.limit_mm;
    this.bound = r.bound;
    if (r.sense !== undefined) this.sense = r.sense;
    this.utilisation = r.bound === "max" ? r.value_mm / r.limit_mm : r.value_mm > 0 ? r.limit_mm / r.value_mm : Infinity;
    this.pass = r.bound === "max" ? r.value_mm <= r.limit_mm + 1e-9 : r.value_mm >= r.limit_mm - 1e-9;
  }
}

/**
 * A strength check result. The substituted-values text and the notes are written only when read, from
 * the same numbers.
 */
export function strength(partial: StrengthInput): StrengthCheck {
  return new StrengthResult(partial);
}

/** A rule check result: a measured length against a limit, with the bound saying which way it binds. */
export function rule(r: RuleInput): RuleCheck {
  return new RuleResult(r);
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
