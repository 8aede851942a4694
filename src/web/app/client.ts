/**
 * The page's side of its workers. Workers are made from a Blob URL of the bundled worker script, so the
 * page works from disk (file://), where Chromium refuses module scripts and workers loaded by URL.
 * HiGHS, large, is loaded only when a schedule needs it, from a classic script beside the page.
 */
import WORKER_SOURCE from "virtual:worker-source";
import type { Problem, Progress, Reply, Request } from "../protocol.js";

let workerUrl: string | undefined;

/** One Blob URL for every worker (a schedule's worker starts its pool from the same URL). */
function url(): string {
  workerUrl ??= URL.createObjectURL(new Blob([WORKER_SOURCE], { type: "text/javascript" }));
  return workerUrl;
}

export class Failure extends Error {
  constructor(readonly problem: Problem) {
    super(problem.message);
  }
}

export class Cancelled extends Error {
  constructor() {
    super("cancelled");
  }
}

interface Pending {
  resolve: (v: unknown) => void;
  reject: (e: Error) => void;
  onProgress?: (p: Progress) => void;
}

export class WorkerClient {
  private readonly worker = new Worker(url());
  private readonly pending = new Map<number, Pending>();
  private next = 1;
  private highs: Worker | undefined;
  private pool: Worker[] = [];

  constructor() {
    this.worker.onmessage = (e: MessageEvent<Reply>) => this.receive(e.data);
    this.worker.onerror = (e) => this.failAll(new Failure({ kind: "internal", message: `the worker failed: ${e.message}` }));
  }

  request<T>(req: Request, onProgress?: (p: Progress) => void): Promise<T> {
    const id = this.next++;
    return new Promise<T>((resolve, reject) => {
      this.pending.set(id, { resolve: resolve as (v: unknown) => void, reject, ...(onProgress ? { onProgress } : {}) });
      this.worker.postMessage({ id, ...req });
    });
  }

  /** End the worker and everything it started; pending requests reject with Cancelled. */
  terminate(): void {
    this.worker.terminate();
    this.highs?.terminate();
    for (const w of this.pool) w.terminate();
    this.pool = [];
    this.failAll(new Cancelled());
  }

  private failAll(e: Error): void {
    for (const p of this.pending.values()) p.reject(e);
    this.pending.clear();
  }

  private receive(m: Reply): void {
    const p = this.pending.get(m.id);
    if (!p) return;
    if (m.type === "progress") p.onProgress?.(m.progress);
    else if (m.type === "highs") this.solveHighs(m.id, m.lp, m.timeLimit_s);
    else if (m.type === "pool") this.runPool(m.id, m.stage, m.requests, m.weights, m.workers, p.onProgress);
    else {
      this.pending.delete(m.id);
      if (m.type === "done") p.resolve(m.value);
      else p.reject(new Failure(m.problem));
    }
  }

  /** A HiGHS solve the worker asked for, in a HiGHS worker of its own. */
  private solveHighs(id: number, lp: string, timeLimit_s: number): void {
    loadHighsSource().then(
      (source) => {
        this.highs = new Worker(URL.createObjectURL(new Blob([source], { type: "text/javascript" })));
        this.highs.onmessage = (e: MessageEvent<{ ok: boolean; answer?: unknown; message?: string }>) => {
          this.highs?.terminate();
          this.highs = undefined;
          if (e.data.ok) this.worker.postMessage({ id, op: "highs-answer", answer: e.data.answer });
          else this.fail(id, `HiGHS failed: ${e.data.message ?? "no answer"}`);
        };
        this.highs.onerror = (e) => this.fail(id, `HiGHS failed: ${e.message}`);
        this.highs.postMessage({ lp, timeLimit_s });
      },
      (e: Error) => this.fail(id, e.message),
    );
  }

  /** Requests a worker asked to have run, on a pool of workers; the answers go back in order. */
  private runPool(id: number, stage: string, requests: Request[], weights: number[], size: number, onProgress?: (p: Progress) => void): void {
    const results: unknown[] = Array(requests.length);
    const total = weights.reduce((a, b) => a + b, 0);
    let next = 0;
    let finished = 0;
    let done = 0;
    let last = -Infinity;
    const feed = (w: Worker) => {
      const i = next++;
      if (i < requests.length) w.postMessage({ id: i, ...requests[i] });
    };
    const finish = () => {
      for (const w of this.pool) w.terminate();
      this.pool = [];
    };
    for (let k = 0; k < Math.max(1, Math.min(size, requests.length)); k++) {
      const w = new Worker(url());
      this.pool.push(w);
      w.onmessage = (e: MessageEvent<Reply>) => {
        const m = e.data;
        if (m.type === "failed") {
          finish();
          return this.fail(id, `a search worker failed: ${m.problem.message}`);
        }
        if (m.type !== "done") return;
        results[m.id] = m.value;
        done += weights[m.id] ?? 1;
        const now = performance.now();
        if (now - last > 100 || done === total) {
          last = now;
          onProgress?.({ stage, done, total });
        }
        if (++finished === requests.length) {
          finish();
          this.worker.postMessage({ id, op: "pool-answer", results });
        } else feed(w);
      };
      w.onerror = (e) => {
        finish();
        this.fail(id, `a search worker failed: ${e.message}`);
      };
      feed(w);
    }
  }

  private fail(id: number, message: string): void {
    const p = this.pending.get(id);
    this.pending.delete(id);
    p?.reject(new Failure({ kind: "internal", message }));
  }
}

let highsSource: Promise<string> | undefined;

/** highs-worker.js sets the HiGHS worker's source on the page (a classic script works from disk). */
function loadHighsSource(): Promise<string> {
  highsSource ??= new Promise<string>((resolve, reject) => {
    const script = document.createElement("script");
    script.src = "highs-worker.js";
    script.onload = () => {
      const source = (window as unknown as { splicewrightHighsWorker?: string }).splicewrightHighsWorker;
      if (source) resolve(source);
      else reject(new Error("highs-worker.js did not define the HiGHS worker"));
    };
    script.onerror = () => reject(new Error("highs-worker.js could not be loaded (it must sit beside index.html)"));
    document.head.append(script);
  });
  return highsSource;
}
