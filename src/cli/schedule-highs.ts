/**
 * HiGHS in a worker thread: its solve blocks the thread it runs on, so the shell's event loop (progress,
 * signals) stays free. One worker per solve; the answer is plain data for `acceptMipAnswer`.
 */
import { Worker } from "node:worker_threads";
import type { HighsAnswer } from "../schedule/run.js";

export type { HighsAnswer };

export function solveWithHighs(lp: string, timeLimit_s: number): Promise<HighsAnswer> {
  return new Promise((resolve, reject) => {
    const worker = new Worker(new URL("./schedule-highs-worker.js", import.meta.url), { workerData: { lp, timeLimit_s } });
    let answered = false;
    worker.once("message", (answer: HighsAnswer) => {
      answered = true;
      resolve(answer);
      void worker.terminate();
    });
    worker.once("error", (e) => reject(new Error(`the HiGHS worker failed: ${e.message}`)));
    worker.once("exit", (code) => {
      if (!answered) reject(new Error(`the HiGHS worker stopped (exit code ${code}) without an answer`));
    });
  });
}
