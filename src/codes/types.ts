/**
 * The interface every design-code module implements. No global state: the code object is passed
 * into every call.
 */
import type { GeometryCode } from "../geometry/joint-builder.js";
import type { Joint } from "../model/joint.js";
import type { CheckResult, Warning } from "../model/results.js";
import type { CheckableScenario, PlateSpec, Scenario } from "../model/scenario.js";

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

export interface DesignCode extends GeometryCode {
  id: string;
  title: string;
  /** Steel grades the code's material tables hold. */
  grades: readonly string[];
  /** Inputs this code cannot check (grade unknown to it, a bolt class not allowed for friction grip...). */
  scopeErrors(scenario: Scenario): ScopeError[];
  /** Run every check on the joint's geometry. */
  checkJoint(joint: Joint, scenario: CheckableScenario): CodeChecks;
  /**
   * Design tension strength of an unperforated plate under this code, the denominator of efficiency.
   */
  unperforatedStrength(spec: PlateSpec): { value_N: number; definition: string };
}
