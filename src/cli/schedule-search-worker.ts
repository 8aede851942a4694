/**
 * Worker thread: the per-type layout searches of the splices it is sent. It parses the project text
 * itself (design codes are objects with functions, which cannot cross threads) and answers with plain data.
 */
import { parentPort, workerData } from "node:worker_threads";
import type { CostTable } from "../catalogue/costs.js";
import { parseProject } from "../io/project.js";
import { spliceOptions } from "../schedule/options.js";

const { projectText, costs, maxCandidates } = workerData as { projectText: string; costs: CostTable; maxCandidates?: number };
const project = parseProject(projectText);

parentPort!.on("message", (index: number) => {
  const splice = project.splices[index]!;
  parentPort!.postMessage({ index, result: spliceOptions(splice.scenario, project.code, costs, maxCandidates) });
});
