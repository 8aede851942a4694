/**
 * The one checker. `check`, `search` and every export run a layout through here.
 */
import type { CodeChecks, DesignCode } from "../codes/types.js";
import { buildJoint } from "../geometry/joint-builder.js";
import { factoredOf, loadSenses, referenceLoad_N, type LoadSense } from "../model/load.js";
import { checksOfSenses } from "./senses.js";
import type { Joint } from "../model/joint.js";
import type { CheckReport, CheckResult, Warning } from "../model/results.js";
import type { CheckableScenario } from "../model/scenario.js";

export interface CheckOutcome {
  joint: Joint;
  report: CheckReport;
}

/**
 * The unperforated strength (efficiency basis of the scenario) of the thinner main plate; ties broken
 * by the lower unperforated strength, the lesser of yield and rupture.
 */
function thinnerPlateStrength(scenario: CheckableScenario, code: DesignCode): { value_N: number; definition: string } {
  const { mainA, mainB } = scenario.plates;
  const basis = scenario.options.efficiencyBasis;
  if (mainA.thickness_mm !== mainB.thickness_mm) return code.unperforatedStrength(mainA.thickness_mm < mainB.thickness_mm ? mainA : mainB, basis);
  // The same plate both sides (width, thickness and grade: all the strength reads): main plate A.
  if (mainA.width_mm === mainB.width_mm && mainA.grade === mainB.grade) return code.unperforatedStrength(mainA, basis);
  const a = code.unperforatedStrength(mainA);
  const b = code.unperforatedStrength(mainB);
  if (basis === "lesser") return a.value_N <= b.value_N ? a : b;
  return code.unperforatedStrength(a.value_N <= b.value_N ? mainA : mainB, basis);
}

/** Check a joint already built (the search builds joints itself and calls this). */
export function checkJoint(joint: Joint, scenario: CheckableScenario, code: DesignCode): CheckReport {
  const senses = loadSenses(scenario.load);
  const bySenseChecks = checksOfSenses(joint, scenario, code, senses);
  const checks = bySenseChecks.checks;
  let pass = true;
  let jointStrength = Infinity;
  let governing = "";
  // The least capacity (resistance / load ratio) of the ULS checks of each sense with a load ratio.
  let leastTension = Infinity;
  let leastCompression = Infinity;
  let maxUtilisation = 0;
  for (const c of checks) {
    maxUtilisation = Math.max(maxUtilisation, c.utilisation);
    if (!c.pass) pass = false;
    if (c.type !== "strength" || c.limitState !== "ULS") continue;
    const capacity = c.resistance_N / c.loadRatio;
    if (capacity < jointStrength - 1e-9) {
      jointStrength = capacity;
      governing = c.id;
    }
    if (!(c.loadRatio > 0)) continue;
    if ((c.sense ?? "tension") === "tension") leastTension = Math.min(leastTension, capacity);
    else leastCompression = Math.min(leastCompression, capacity);
  }
  const plain = thinnerPlateStrength(scenario, code);
  const ref = referenceLoad_N(scenario.load);
  const bySense: { tension?: number; compression?: number } = {};
  for (const sense of senses) bySense[sense] = (sense === "tension" ? leastTension : leastCompression) * (factoredOf(scenario.load, sense) / ref);
  // The code's minimum design action: a condition on the joint's design strength in tension, so made
  // once every other check has set it (it sets no load itself, and never the joint strength).
  const minimum = bySense.tension !== undefined && code.minimumDesignAction ? code.minimumDesignAction(scenario, bySense.tension) : null;
  if (minimum) {
    checks.push(minimum);
    maxUtilisation = Math.max(maxUtilisation, minimum.utilisation);
    if (!minimum.pass) pass = false;
  }
  return new JointReport(code, bySenseChecks, jointStrength, governing, senses, bySense, plain, maxUtilisation, pass);
}

/**
 * The report of one check: plain fields of one fixed shape; the efficiency definition and the
 * conventions in words are getters that write their text when an output asks (no number uses them).
 * A class, not an object literal with a getter: V8 builds such a literal on a slow path, which cost
 * about a sixth of a whole check (bench, DEVELOPERS.md "Performance").
 */
class JointReport implements CheckReport {
  readonly code: string;
  readonly codeTitle: string;
  readonly efficiency: number;
  readonly unperforatedStrength_N: number;
  readonly checks: CheckResult[];
  readonly warnings: Warning[];
  readonly #plain: { value_N: number; definition: string };
  readonly #codeChecks: CodeChecks;
  constructor(
    code: DesignCode,
    codeChecks: CodeChecks,
    readonly jointStrength_N: number,
    readonly governing: string,
    readonly senses: LoadSense[],
    readonly strengthBySense: { tension?: number; compression?: number },
    plain: { value_N: number; definition: string },
    readonly maxUtilisation: number,
    /** Whether every check passes (worked out in the walk over the checks). */
    readonly pass: boolean,
  ) {
    this.code = code.id;
    this.codeTitle = code.title;
    this.checks = codeChecks.checks;
    this.warnings = codeChecks.warnings;
    this.efficiency = jointStrength_N / plain.value_N;
    this.unperforatedStrength_N = plain.value_N;
    this.#plain = plain;
    this.#codeChecks = codeChecks;
  }
  get efficiencyDefinition(): string {
    return this.#plain.definition;
  }
  /** The conventions the checks used, in words (written when an output reads them). */
  get conventions(): string[] {
    return this.#codeChecks.conventions;
  }
}

/** Build the joint from the scenario's layout and run every check on it. */
export function checkScenario(scenario: CheckableScenario, code: DesignCode): CheckOutcome {
  const joint = buildJoint(scenario, code);
  return { joint, report: checkJoint(joint, scenario, code) };
}

/** Exit code of a check: 0 all pass, 1 any fails. */
export function exitCodeOf(report: CheckReport): 0 | 1 {
  return report.pass ? 0 : 1;
}
