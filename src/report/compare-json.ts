/** The comparison as JSON: one entry per column, the best layout's row, the mapping. Pure. */
import type { CompareColumn } from "../compare/compare.js";
import { CAUTION } from "./check-json.js";
import { resultRow } from "./search-json.js";
import { UTILISATION_DEFINITIONS } from "./summary.js";
import type { EfficiencyBasis } from "../model/scenario.js";

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
      costDifference: c.costDifference === null ? null : Number(c.costDifference.toFixed(2)),
      mapping: c.mapping,
      ...(c.best ? {} : { noResult: c.outcome.noResultReason ?? null }),
    })),
    mappingCaveat: "mapped materials are nearest equivalents, not identical materials",
    caution: CAUTION,
  };
}
