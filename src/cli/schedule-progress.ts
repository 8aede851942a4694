/**
 * A progress bar on stderr for long jobs, drawn only when stderr is a terminal (never in pipes, logs or
 * tests' captured output).
 */

/** Jobs above this many splices show a bar. */
export const PROGRESS_MIN_SPLICES = 20;

export interface ProgressStream {
  isTTY?: boolean;
  columns?: number;
  write(text: string): boolean;
}

/** One line of the bar: label, bar, count, elapsed seconds. */
export function progressLine(label: string, done: number, total: number, elapsed_s: number, columns: number): string {
  const tail = ` ${done}/${total}  ${elapsed_s.toFixed(0)} s`;
  const width = Math.max(10, Math.min(40, columns - label.length - tail.length - 4));
  const filled = total > 0 ? Math.round((width * done) / total) : width;
  return `${label} [${"#".repeat(filled)}${"-".repeat(width - filled)}]${tail}`;
}

/** One line of a phase whose length is unknown: a marker that moves with the time. */
export function pulseLine(label: string, elapsed_s: number, columns: number): string {
  const tail = `  ${elapsed_s.toFixed(0)} s`;
  const width = Math.max(10, Math.min(40, columns - label.length - tail.length - 4));
  const at = Math.floor(elapsed_s * 4) % width;
  return `${label} [${"-".repeat(at)}#${"-".repeat(width - at - 1)}]${tail}`;
}

export class ProgressBar {
  private readonly t0 = performance.now();
  private last = -Infinity;
  private shown = false;

  constructor(
    private readonly stream: ProgressStream,
    private label: string,
    private total: number,
    readonly enabled: boolean,
  ) {}

  /** Move on to the next phase of the job (its own label and count); the clock keeps running. */
  phase(label: string, total: number): void {
    this.label = label;
    this.total = total;
    this.last = -Infinity;
    this.update(0);
  }

  /** Redraw a phase of unknown length (a moving marker and the elapsed time). */
  pulse(): void {
    if (!this.enabled) return;
    this.shown = true;
    this.stream.write(`\r${pulseLine(this.label, (performance.now() - this.t0) / 1000, this.stream.columns || 80)}\u001b[K`);
  }

  /** Whether a job of `splices` splices on this stream gets a bar. */
  static wanted(stream: ProgressStream, splices: number): boolean {
    return stream.isTTY === true && splices > PROGRESS_MIN_SPLICES;
  }

  update(done: number): void {
    if (!this.enabled) return;
    const now = performance.now();
    if (done < this.total && now - this.last < 100) return;
    this.last = now;
    this.shown = true;
    this.stream.write(`\r${progressLine(this.label, done, this.total, (now - this.t0) / 1000, this.stream.columns || 80)}\u001b[K`);
  }

  /** Clear the bar's line. */
  finish(): void {
    if (this.shown) this.stream.write("\r\u001b[K");
    this.shown = false;
  }
}
