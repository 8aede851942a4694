/**
 * Which layout `export` and `report` write: the scenario's own, or the rank-th of the search over its
 * space. Both shells call this. Throws InputError for a rank the search does not
 * reach.
 */
import type { CostTable } from "../catalogue/costs.js";
import type { DesignCode } from "../codes/types.js";
import type { CheckableScenario, Scenario } from "../model/scenario.js";
import { searchLayouts, type SearchOptions } from "../search/search.js";
import { requireCheckable } from "./scenario.js";
import { InputError } from "./yaml.js";

/** How a rank is searched: the work limit, every variant or the best of each arrangement, progress. */
export type RankSearch = Pick<SearchOptions, "maxCandidates" | "variants" | "onProgress">;

/** `costs` is called only when a rank asks for a search; the rank counts rows as `search` does. */
export function layoutToExport(scenario: Scenario, code: DesignCode, rank: number | undefined, costs: () => CostTable, search: RankSearch = {}): { checkable: CheckableScenario; code: DesignCode } {
  if (rank === undefined) return { checkable: requireCheckable(scenario, code), code };
  const outcome = searchLayouts({ scenario, code, costs: costs() }, { top: rank, rankBy: "cost", ...search });
  const chosen = outcome.results[rank - 1];
  if (!chosen) throw new InputError("--rank", outcome.results.length === 0 ? `the search found no compliant layout: ${outcome.noResultReason ?? ""}` : `the search found only ${outcome.results.length} layouts`);
  return { checkable: chosen.scenario, code };
}

/** Where the reported layout came from, in the report's words. */
export function reportOrigin(rank: number | undefined, variants = false): string {
  return rank !== undefined ? `result ${rank} of \`splicewright search${variants ? " --variants" : ""}\` (ranked by cost) over the scenario's declared space` : "the scenario's own layout";
}
