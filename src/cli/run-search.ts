/**
 * `splicewright search`: the best layouts over the scenario's declared search space, and `--save` of
 * the chosen one. Loaded only when the command runs (main.ts holds its options).
 */
import { parseScenario } from "../io/scenario.js";
import { savedScenarioText } from "../io/save-scenario.js";
import { InputError, parseYaml } from "../io/yaml.js";
import { searchJson } from "../report/search-json.js";
import type { RankBy } from "../search/ranking.js";
import { searchLayouts } from "../search/search.js";
import { checkTargets, writeFileSet } from "./files.js";
import { loadCosts, readScenarioText } from "./inputs.js";
import type { Io } from "./output.js";
import { outputWidth } from "./text.js";
import { withProgress } from "./search-progress.js";
import { formatSearch } from "./search-table.js";

export interface SearchCommandOptions {
  top: number;
  rankBy: RankBy;
  costs?: string;
  save?: string;
  rank: number;
  force?: boolean;
  maxCandidates?: number;
  json?: boolean;
  variants?: boolean;
}

/** Run the search and print it; the exit code is 0 when a layout complies, 1 when none does. */
export async function runSearch(file: string, opts: SearchCommandOptions, io: Io): Promise<number> {
  const text = readScenarioText(file);
  const { scenario, code } = parseScenario(text);
  const costs = loadCosts(opts.costs, scenario.costs);
  if (opts.save) checkTargets([opts.save], opts.force ?? false); // before the search, not after it
  const t0 = performance.now();
  const top = Math.max(opts.top, opts.save ? opts.rank : 1);
  const limit = opts.maxCandidates === undefined ? {} : { maxCandidates: opts.maxCandidates };
  const outcome = withProgress(top, (onProgress) => searchLayouts({ scenario, code, costs }, { top, rankBy: opts.rankBy, variants: opts.variants ?? false, onProgress, ...limit }));
  const elapsed = performance.now() - t0;
  outcome.stats.elapsed_ms = Number(elapsed.toFixed(1));
  if (opts.save) {
    const chosen = outcome.results[opts.rank - 1];
    if (chosen) await writeFileSet([{ path: opts.save, content: savedScenarioText(parseYaml(text) as Record<string, unknown>, chosen, opts.rank) }], opts.force ?? false);
    else if (outcome.results.length > 0) throw new InputError("--rank", `there are only ${outcome.results.length} results`);
  }
  const shown = { ...outcome, results: outcome.results.slice(0, opts.top) };
  const variants = opts.variants ?? false;
  io.out(
    opts.json
      ? JSON.stringify(searchJson(scenario.name, shown, opts.rankBy, costs.currency, { variants, efficiencyBasis: scenario.options.efficiencyBasis }), null, 2)
      : formatSearch(scenario, shown, opts.rankBy, costs.currency, code.title, elapsed, variants, outputWidth(io.stdout ?? {})),
  );
  if (opts.save && outcome.results[opts.rank - 1]) io.err(`saved result ${opts.rank} to ${opts.save}`);
  return outcome.results.length > 0 ? 0 : 1;
}
