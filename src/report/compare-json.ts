/** The comparison as JSON: one entry per column, the best layout's row, the mapping. Pure. */
import type { CompareColumn } from "../compare/compare.js";
import { CAUTION } from "./check-json.js";
import { resultRow } from "./search-json.js";
import { UTILISATION_DEFINITIONS } from "./summary.js";
import type { CheckableScenario, EfficiencyBasis } from "../model/scenario.js";
import { assemblyOf } from "../export/bolt-list.js";

/** The bolt, nut and washer standards of a column's assembly under its own code. */
function assemblyStandards(scenario: CheckableScenario) {
  const a = assemblyOf(scenario);
  return { bolt: a.boltStandard, nut: a.nutStandard, washer: a.washerStandard };
}

export function compareJson(name: string, columns: CompareColumn[], currency: string, basis: EfficiencyBasis) {
  return {
    scenario: name,
    currency,
    efficiencyBasis: basis,
    definitions: UTILISATION_DEFINITIONS,
    columns: columns.map((c) => ({
      label: c.label,
      code: c.code.id,
      best: c.best ? resultRow(c.best, 1) : null,
      assembly: c.best ? assemblyStandards(c.best.scenario) : null,
      costDifference: c.costDifference === null ? null : Number(c.costDifference.toFixed(2)),
      mapping: c.mapping,
      ...(c.best ? {} : { noResult: c.outcome.noResultReason ?? null }),
    })),
    mappingCaveat: "mapped materials are nearest equivalents, not identical materials",
    caution: CAUTION,
  };
}
