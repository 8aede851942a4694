/**
 * The per-splice searches of a job on worker threads. Identical splices (same plates, load, space and
 * options) are searched once. Results come back in splice order whatever order the workers finish in.
 * The project is parsed once, here; each worker is sent the scenarios of the splices it searches.
 */
import { availableParallelism } from "node:os";
import { Worker } from "node:worker_threads";
import type { CostTable } from "../catalogue/costs.js";
import { codeSpliceOf, type Project } from "../io/project.js";
import { spliceOptions, type SpliceOptions } from "../schedule/options.js";
import { distinctSplices, resultsOfGroup } from "../schedule/run.js";

export interface PoolOptions {
  /** Worker threads; 0 runs every search on the main thread. */
  workers: number;
  onProgress?: (done: number, total: number) => void;
  /** The limit on each splice's declared space (checked before the searches; work-estimate.ts). */
  maxCandidates?: number;
}

export interface PoolResult {
  results: SpliceOptions[];
  /** Distinct splices searched. */
  searched: number;
  workers: number;
}

export const defaultWorkers = (): number => availableParallelism();

export async function searchSplices(project: Project, costs: CostTable, opts: PoolOptions): Promise<PoolResult> {
  const tasks = distinctSplices(project);
  const total = project.splices.length;
  const found: Array<SpliceOptions | undefined> = Array(total);
  let done = 0;
  const store = (task: number[], result: SpliceOptions) => {
    for (const [m, r] of resultsOfGroup(project, task, result)) found[m] = r;
    done += task.length;
    opts.onProgress?.(done, total);
  };
  const W = Math.min(opts.workers, tasks.length);
  if (W <= 0) {
    for (const task of tasks) store(task, spliceOptions(project.splices[task[0]!]!.scenario, project.code, costs, opts.maxCandidates));
  } else {
    await new Promise<void>((resolve, reject) => {
      const workers: Worker[] = [];
      let next = 0;
      let finished = 0;
      let failed = false;
      const stop = (e: Error) => {
        if (failed) return;
        failed = true;
        for (const w of workers) void w.terminate();
        reject(e);
      };
      const feed = (w: Worker) => {
        if (next >= tasks.length) return;
        const index = tasks[next++]![0]!;
        w.postMessage({ index, scenario: project.splices[index]!.scenario });
      };
      const byFirst = new Map(tasks.map((t) => [t[0]!, t]));
      for (let i = 0; i < W; i++) {
        const w = new Worker(new URL("./schedule-search-worker.js", import.meta.url), { workerData: { codeScenario: codeSpliceOf(project).scenario, costs, maxCandidates: opts.maxCandidates } });
        workers.push(w);
        w.on("message", (msg: { index: number; result: SpliceOptions }) => {
          store(byFirst.get(msg.index)!, msg.result);
          finished++;
          if (finished === tasks.length) {
            for (const x of workers) void x.terminate();
            resolve();
          } else feed(w);
        });
        w.on("error", (e) => stop(new Error(`a search worker failed: ${e.message}`)));
        w.on("exit", (code) => {
          if (finished < tasks.length) stop(new Error(`a search worker stopped (exit code ${code}) before the searches were done`));
        });
        feed(w);
      }
    });
  }
  return { results: found as SpliceOptions[], searched: tasks.length, workers: Math.max(0, W) };
}
