/**
 * Worker thread: one HiGHS solve (it blocks its thread until done). Answers with the status, the
 * objective and the primal value of every column.
 */
import { parentPort, workerData } from "node:worker_threads";
import * as highsModule from "highs";
import type { Highs } from "highs";
import { highsAnswerOf, highsOptions } from "../schedule/run.js";

const { lp, timeLimit_s } = workerData as { lp: string; timeLimit_s: number };
// The package declares CommonJS types for its ES module build, whose default export is the loader.
const loadHighs = (highsModule as unknown as { default: () => Promise<Highs> }).default;
const highs = await loadHighs();
const r = highs.solve(lp, highsOptions(timeLimit_s));
parentPort!.postMessage(highsAnswerOf(r as unknown as Parameters<typeof highsAnswerOf>[0], highs.version?.string ?? "unknown"));
