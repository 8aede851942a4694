/**
 * Standard output and standard error of the process: text made safe for a terminal (no escape sequence
 * from a name reaches it), a reader that goes away (`| head`) ends the output quietly, and an output
 * that cannot be written (`> /dev/full`, a closed terminal) is one line on stderr and exit code 4 — a
 * code of its own, never one that means an engineering result (0, 1) or bad input (2).
 */
import { terminalText } from "../text/escape.js";
import { stripStyleMarks, styleMarksToAnsi } from "./style.js";

/** Exit code when the output could not be written. */
export const EXIT_OUTPUT_ERROR = 4;

export interface Io {
  out: (text: string) => void;
  err: (text: string) => void;
  /** The stream `out` writes to: its width and whether it is a terminal (colour). */
  stdout?: { isTTY?: boolean; columns?: number };
}

/**
 * An Io whose every line is made safe for a terminal (JSON stays JSON: it holds no raw control
 * characters). The project's own emphasis (style.ts) travels as private-use marks and becomes colour
 * only here, after every escape sequence in the text itself has been made visible.
 */
export function terminalSafe(io: Io): Io {
  const safe: Io = { out: (s) => io.out(styleMarksToAnsi(terminalText(s))), err: (s) => io.err(terminalText(stripStyleMarks(s))) };
  if (io.stdout) safe.stdout = io.stdout;
  return safe;
}

interface StreamState {
  closed: boolean;
  failed: string | null;
}

const stdoutState: StreamState = { closed: false, failed: null };
const stderrState: StreamState = { closed: false, failed: null };

/** Whether standard output failed (not merely closed by its reader). */
export function outputFailed(): boolean {
  return stdoutState.failed !== null;
}

function watch(stream: NodeJS.WriteStream, state: StreamState, onFailure: (reason: string) => void): void {
  stream.on("error", (e: NodeJS.ErrnoException) => {
    if (state.closed || state.failed) return;
    if (e.code === "EPIPE") {
      state.closed = true; // the reader has gone: stop writing, quietly
      return;
    }
    state.failed = e.message;
    onFailure(state.failed);
  });
}

/**
 * Watch the process's standard streams (once, from the entry point). A write error on stdout prints one
 * line on stderr and sets exit code 4, whenever it arrives (the streams report errors asynchronously).
 */
export function watchStandardStreams(): void {
  watch(process.stdout, stdoutState, (reason) => {
    writeLine(process.stderr, stderrState, `splicewright: error: cannot write the output (${reason})`);
    process.exitCode = EXIT_OUTPUT_ERROR;
  });
  watch(process.stderr, stderrState, () => undefined);
}

function writeLine(stream: NodeJS.WriteStream, state: StreamState, text: string): void {
  if (state.closed || state.failed) return;
  stream.write(`${text}\n`);
}

/** The process's own Io: lines to stdout and stderr, dropped once a stream is closed or failed. */
export const PROCESS_IO: Io = {
  out: (s) => writeLine(process.stdout, stdoutState, s),
  err: (s) => writeLine(process.stderr, stderrState, s),
  stdout: process.stdout,
};
