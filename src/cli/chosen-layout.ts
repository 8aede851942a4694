/**
 * The layout `export` and `report` work on: the scenario's own, or the rank-th row of the search over
 * its space (io/layout-choice.ts).
 */
import { layoutToExport } from "../io/layout-choice.js";
import { parseScenario } from "../io/scenario.js";
import { loadCosts, readScenarioText } from "./inputs.js";
import { withProgress } from "./search-progress.js";

export interface LayoutChoice {
  rank?: number;
  costs?: string;
  maxCandidates?: number;
  variants?: boolean;
}

/** A scenario for export and report (metric bolts only). */
export function parseForDrawing(file: string) {
  const { scenario, code } = parseScenario(readScenarioText(file));
  return { scenario, code };
}

/** The scenario's own layout, or the rank-th row of the search over its space. */
export function chooseLayout({ scenario, code }: ReturnType<typeof parseForDrawing>, opts: LayoutChoice) {
  const limit = opts.maxCandidates === undefined ? {} : { maxCandidates: opts.maxCandidates };
  return withProgress(opts.rank ?? 1, (onProgress) => layoutToExport(scenario, code, opts.rank, () => loadCosts(opts.costs, scenario.costs), { variants: opts.variants ?? false, onProgress, ...limit }));
}
