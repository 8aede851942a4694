/**
 * A progress line on stderr for a search that runs longer than SEARCH_PROGRESS_AFTER_MS, drawn only when
 * stderr is a terminal (never in pipes, logs or tests' captured output). The best-first search cannot
 * know how far it is from its proof, so the line counts what it has done against the declared space.
 */
import type { SearchStats } from "../search/search.js";
import { countText } from "../search/work-estimate.js";
import type { ProgressStream } from "./schedule-progress.js";

/** A search shows progress once it has run this long. */
export const SEARCH_PROGRESS_AFTER_MS = 2000;

/** One progress line: layouts checked, nodes, results found, elapsed seconds. */
export function searchProgressLine(label: string, stats: SearchStats, results: number, wanted: number, elapsed_s: number): string {
  return `${label}: ${countText(stats.fullChecks)} layouts checked of ${countText(stats.declaredCandidates)} declared, ${countText(stats.nodes)} nodes, ${results}/${wanted} proven, ${elapsed_s.toFixed(0)} s`;
}

export class SearchProgress {
  private readonly t0 = performance.now();
  private last = -Infinity;
  private shown = false;

  constructor(
    private readonly stream: ProgressStream,
    private readonly label: string,
    private readonly wanted: number,
    private readonly after_ms: number = SEARCH_PROGRESS_AFTER_MS,
  ) {}

  /** Redraw the line (at most ten times a second, and only after SEARCH_PROGRESS_AFTER_MS on a terminal). */
  update = (stats: SearchStats, results: number): void => {
    if (this.stream.isTTY !== true) return;
    const now = performance.now();
    if (now - this.t0 < this.after_ms || now - this.last < 100) return;
    this.last = now;
    this.shown = true;
    const line = searchProgressLine(this.label, stats, results, this.wanted, (now - this.t0) / 1000);
    this.stream.write(`\r${line.slice(0, Math.max(20, (this.stream.columns || 80) - 1))}\u001b[K`);
  };

  /** Clear the line. */
  finish(): void {
    if (this.shown) this.stream.write("\r\u001b[K");
    this.shown = false;
  }
}

/** A search with a progress line on a terminal after 2 s (search, and --rank of export and report). */
export function withProgress<T>(top: number, run: (onProgress: SearchProgress["update"]) => T): T {
  const progress = new SearchProgress(process.stderr, "searching", top);
  try {
    return run(progress.update);
  } finally {
    progress.finish();
  }
}
