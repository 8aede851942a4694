/**
 * The one checker. `check`, `search` and every export run a layout through here.
 */
import type { DesignCode } from "../codes/types.js";
import { buildJoint } from "../geometry/joint-builder.js";
import { factoredOf, loadSenses, referenceLoad_N } from "../model/load.js";
import { checksBySense } from "./senses.js";
import type { Joint } from "../model/joint.js";
import type { CheckReport, StrengthCheck } from "../model/results.js";
import type { CheckableScenario } from "../model/scenario.js";

export interface CheckOutcome {
  joint: Joint;
  report: CheckReport;
}

/** The thinner main plate (ties broken by the lower unperforated strength, the lesser of yield and rupture). */
function thinnerMainPlate(scenario: CheckableScenario, code: DesignCode) {
  const { mainA, mainB } = scenario.plates;
  if (mainA.thickness_mm !== mainB.thickness_mm) return mainA.thickness_mm < mainB.thickness_mm ? mainA : mainB;
  return code.unperforatedStrength(mainA).value_N <= code.unperforatedStrength(mainB).value_N ? mainA : mainB;
}

/** Check a joint already built (the search builds joints itself and calls this). */
export function checkJoint(joint: Joint, scenario: CheckableScenario, code: DesignCode): CheckReport {
  const { checks, warnings, conventions } = checksBySense(joint, scenario, code);
  const uls = checks.filter((c): c is StrengthCheck => c.type === "strength" && c.limitState === "ULS");
  let jointStrength = Infinity;
  let governing = "";
  for (const c of uls) {
    const capacity = c.resistance_N / c.loadRatio;
    if (capacity < jointStrength - 1e-9) {
      jointStrength = capacity;
      governing = c.id;
    }
  }
  const plain = code.unperforatedStrength(thinnerMainPlate(scenario, code), scenario.options.efficiencyBasis);
  const senses = loadSenses(scenario.load);
  const ref = referenceLoad_N(scenario.load);
  const bySense: { tension?: number; compression?: number } = {};
  for (const sense of senses) {
    const of = uls.filter((c) => (c.sense ?? "tension") === sense && c.loadRatio > 0);
    bySense[sense] = Math.min(...of.map((c) => c.resistance_N / c.loadRatio)) * (factoredOf(scenario.load, sense) / ref);
  }
  const maxUtilisation = checks.reduce((m, c) => Math.max(m, c.utilisation), 0);
  return {
    code: code.id,
    codeTitle: code.title,
    checks,
    jointStrength_N: jointStrength,
    governing,
    senses,
    strengthBySense: bySense,
    efficiency: jointStrength / plain.value_N,
    // The definition in words, written when an output reads it (the number above never uses it).
    get efficiencyDefinition() {
      return plain.definition;
    },
    unperforatedStrength_N: plain.value_N,
    maxUtilisation,
    pass: checks.every((c) => c.pass),
    warnings,
    conventions,
  };
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
