/**
 * Worker thread: the per-type layout searches of the splices it is sent. The main thread has parsed and
 * validated the project once; each message brings one splice's scenario (plain data). The design code is
 * bound here again from the scenario the project's code was bound by (design codes are objects with
 * functions, which cannot cross threads). It answers with plain data.
 */
import { parentPort, workerData } from "node:worker_threads";
import type { CostTable } from "../catalogue/costs.js";
import { boundCode, findCode } from "../codes/registry.js";
import type { Scenario } from "../model/scenario.js";
import { spliceOptions } from "../schedule/options.js";

const { codeScenario, costs, maxCandidates } = workerData as { codeScenario: Scenario; costs: CostTable; maxCandidates?: number };
const registered = findCode(codeScenario.code);
if (!registered) throw new Error(`a search worker was given an unknown design code "${codeScenario.code}"`);
const code = boundCode(registered, codeScenario);

parentPort!.on("message", ({ index, scenario }: { index: number; scenario: Scenario }) => {
  parentPort!.postMessage({ index, result: spliceOptions(scenario, code, costs, maxCandidates) });
});
