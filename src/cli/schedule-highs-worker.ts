/**
 * Worker thread: one HiGHS solve (it blocks its thread until done). Answers with the status, the
 * objective and the primal value of every column.
 */
import { parentPort, workerData } from "node:worker_threads";
import * as highsModule from "highs";
import type { Highs } from "highs";

const { lp, timeLimit_s } = workerData as { lp: string; timeLimit_s: number };
// The package declares CommonJS types for its ES module build, whose default export is the loader.
const loadHighs = (highsModule as unknown as { default: () => Promise<Highs> }).default;
const highs = await loadHighs();
const r = highs.solve(lp, { mip_rel_gap: 0, time_limit: timeLimit_s, output_flag: false });
const primal: Record<string, number> = {};
for (const [name, column] of Object.entries(r.Columns ?? {})) {
  const value = (column as { Primal?: number }).Primal;
  if (typeof value === "number") primal[name] = value;
}
const hasSolution = r.Status !== "Infeasible" && Number.isFinite(r.ObjectiveValue);
parentPort!.postMessage({ status: r.Status, objective: hasSolution ? r.ObjectiveValue : null, primal, version: highs.version?.string ?? "unknown" });
