/**
 * `splicewright compare`: the same splice side by side under other bolt classes, sizes or design codes.
 * Loaded only when the command runs (main.ts holds its options).
 */
import { compareRequest } from "../io/compare-request.js";
import { parseScenario } from "../io/scenario.js";
import { compareJson } from "../report/compare-json.js";
import { formatCompare } from "./compare-table.js";
import { BUNDLED_EQUIVALENTS, loadCosts, readScenarioText } from "./inputs.js";
import type { Io } from "./output.js";
import { outputWidth } from "./text.js";

export interface CompareCommandOptions {
  classes?: string;
  sizes?: string;
  codes?: string;
  costs?: string;
  maxCandidates?: number;
  json?: boolean;
}

/** Print the comparison; the exit code is 0 when some column has a compliant layout, 1 otherwise. */
export function runCompare(file: string, opts: CompareCommandOptions, io: Io): number {
  const { scenario, code } = parseScenario(readScenarioText(file));
  const costs = loadCosts(opts.costs, scenario.costs);
  const columns = compareRequest(scenario, code, opts, costs, () => readScenarioText(BUNDLED_EQUIVALENTS), opts.maxCandidates === undefined ? {} : { maxCandidates: opts.maxCandidates });
  const basis = scenario.options.efficiencyBasis;
  io.out(opts.json ? JSON.stringify(compareJson(scenario.name, columns, costs.currency, basis), null, 2) : formatCompare(scenario.name, columns, costs.currency, basis, scenario.load, outputWidth(io.stdout ?? {})));
  return columns.some((c) => c.best) ? 0 : 1;
}
