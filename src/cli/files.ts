/**
 * Writing output files safely (the only module that writes them):
 *
 * - targets are checked before any work starts (`checkTargets`): the folder exists or can be created, a
 *   target that exists — a dangling symbolic link included — is refused without --force, and --force
 *   replaces regular files only (never a folder, a device, a pipe or a symbolic link);
 * - a set of files is written all or nothing (`writeFileSet`): every file goes to a temporary name in
 *   its folder first; with --force the old files are moved aside and put back if any step fails;
 * - SIGINT and SIGTERM during a write roll it back (no temporary files, no partial set), then the
 *   process ends by that signal.
 *
 * A SIGKILL or a power cut between two renames can still leave a partial set: no program can prevent that.
 */
import { accessSync, constants, lstatSync, statSync, type Stats } from "node:fs";
import { mkdir, rename, rm, writeFile } from "node:fs/promises";
import { basename, dirname, join, resolve } from "node:path";
import { InputError } from "../io/input-error.js";

export interface OutputFile {
  path: string;
  content: string | Uint8Array;
}

/** What a path is, for messages. */
function kindOf(st: Stats): string {
  if (st.isFile()) return "a file";
  if (st.isDirectory()) return "a folder";
  if (st.isSymbolicLink()) return "a symbolic link";
  if (st.isCharacterDevice() || st.isBlockDevice()) return "a device";
  if (st.isFIFO()) return "a named pipe";
  if (st.isSocket()) return "a socket";
  return "not a regular file";
}

/** The path's own status (a symbolic link is not followed), or null when nothing is there (a file in the way of a folder included). */
function lstatOrNull(path: string): Stats | null {
  try {
    return lstatSync(path, { throwIfNoEntry: false }) ?? null;
  } catch (e) {
    if ((e as NodeJS.ErrnoException).code === "ENOTDIR") return null;
    throw new InputError(path, `cannot be read: ${(e as Error).message}`);
  }
}

/** The folder exists and can be written in, or its nearest existing ancestor is a folder that can. */
export function checkFolder(dir: string): void {
  let existing = resolve(dir);
  while (lstatOrNull(existing) === null && dirname(existing) !== existing) existing = dirname(existing);
  let st: Stats;
  try {
    st = statSync(existing);
  } catch {
    throw new InputError(dir, `cannot be created: ${existing} cannot be read`);
  }
  const own = existing === resolve(dir);
  if (!st.isDirectory()) throw new InputError(dir, own ? `is ${kindOf(st)}, not a folder` : `cannot be created: ${existing} is ${kindOf(st)}, not a folder`);
  try {
    accessSync(existing, constants.W_OK | constants.X_OK);
  } catch {
    throw new InputError(dir, own ? "cannot be written in (no permission)" : `cannot be created: no permission to write in ${existing}`);
  }
}

/**
 * Check every target before any work: its folder can hold it; it does not exist (without `force`); and
 * with `force` it is a regular file (a symbolic link, folder or device is never replaced).
 */
export function checkTargets(paths: readonly string[], force: boolean): void {
  for (const path of paths) {
    const st = lstatOrNull(path);
    if (st === null) {
      checkFolder(dirname(path));
      continue;
    }
    if (!force) throw new InputError(path, st.isFile() ? "already exists (use --force to overwrite)" : `already exists and is ${kindOf(st)}: give a file name that is free (--force replaces regular files only)`);
    if (!st.isFile()) throw new InputError(path, `is ${kindOf(st)}: --force replaces regular files only`);
  }
}

/**
 * Create a folder and its missing parents, one level at a time, so that any level that cannot be made
 * fails at once (Node's recursive mkdir retries for ever on some special file systems, e.g. under /proc).
 */
async function makeFolders(dir: string): Promise<void> {
  const missing: string[] = [];
  for (let at = resolve(dir); lstatOrNull(at) === null; at = dirname(at)) {
    missing.push(at);
    if (dirname(at) === at) break;
  }
  for (const folder of missing.reverse()) await mkdir(folder);
}

/** Where signals come from and how the process ends by one (injectable for tests). */
export interface SignalHooks {
  on(signal: NodeJS.Signals, listener: () => void): unknown;
  off(signal: NodeJS.Signals, listener: () => void): unknown;
  /** End the process by this signal (after the rollback). */
  raise(signal: NodeJS.Signals): void;
}

const PROCESS_SIGNALS: SignalHooks = {
  on: (s, l) => process.on(s, l),
  off: (s, l) => process.off(s, l),
  raise: (s) => {
    process.kill(process.pid, s);
    process.exit(128 + (s === "SIGINT" ? 2 : 15));
  },
};

const WATCHED: NodeJS.Signals[] = ["SIGINT", "SIGTERM"];

/** A write interrupted by a signal (after its rollback). */
export class WriteInterrupted extends Error {
  constructor(readonly signal: NodeJS.Signals) {
    super(`interrupted by ${signal}; nothing was written`);
  }
}

interface Step {
  target: string;
  temp: string;
  backup: string | null;
  placed: boolean;
}

/** Undo a partly done write: old files back in place, new ones and temporary files gone. */
async function rollback(steps: readonly Step[]): Promise<void> {
  for (const s of steps) {
    if (s.placed && s.backup === null) await rm(s.target, { force: true });
    if (s.backup !== null) await rename(s.backup, s.target).catch(() => undefined);
    await rm(s.temp, { force: true });
  }
}

/**
 * Write a set of files as one: all of them, or none (and with --force the old ones untouched). Temporary
 * files, then the old files moved aside, then every temporary file renamed onto its target; a failure or
 * a SIGINT/SIGTERM before the last rename puts everything back. `hooks` replaces the process's signals
 * (tests); `afterStep` runs after each step (tests).
 */
export async function writeFileSet(files: readonly OutputFile[], force: boolean, hooks: SignalHooks = PROCESS_SIGNALS, afterStep?: (step: string) => void): Promise<void> {
  checkTargets(files.map((f) => f.path), force);
  let interrupted: NodeJS.Signals | null = null;
  const listeners = WATCHED.map((signal) => [signal, () => (interrupted ??= signal)] as const);
  for (const [signal, l] of listeners) hooks.on(signal, l);
  const steps: Step[] = files.map((f) => ({ target: f.path, temp: join(dirname(f.path), `.${basename(f.path)}.${process.pid}.tmp`), backup: null, placed: false }));
  const check = (step: string) => {
    afterStep?.(step);
    if (interrupted) throw new WriteInterrupted(interrupted);
  };
  let at = files[0]?.path ?? "";
  try {
    for (const [i, f] of files.entries()) {
      at = f.path;
      await makeFolders(dirname(f.path));
      await rm(steps[i]!.temp, { force: true }); // a stale one of an earlier process with this id
      await writeFile(steps[i]!.temp, f.content, { flag: "wx" });
      check(`wrote ${steps[i]!.temp}`);
    }
    for (const s of steps) {
      at = s.target;
      if (lstatOrNull(s.target) === null) continue;
      const backup = join(dirname(s.target), `.${basename(s.target)}.${process.pid}.old`);
      await rename(s.target, backup);
      s.backup = backup;
      check(`moved ${s.target} aside`);
    }
    for (const s of steps) {
      at = s.target;
      await rename(s.temp, s.target);
      s.placed = true;
      if (s !== steps[steps.length - 1]) check(`placed ${s.target}`);
    }
    afterStep?.("committed");
  } catch (e) {
    await rollback(steps);
    for (const [signal, l] of listeners) hooks.off(signal, l);
    if (e instanceof WriteInterrupted) {
      hooks.raise(e.signal);
      throw e;
    }
    throw new InputError(at, `cannot write the file: ${e instanceof Error ? e.message : String(e)}; nothing was written`);
  }
  // Committed: the old files are no longer needed. A signal from here on ends the process once they are gone.
  for (const s of steps) if (s.backup !== null) await rm(s.backup, { force: true });
  for (const [signal, l] of listeners) hooks.off(signal, l);
  const late: NodeJS.Signals | null = interrupted;
  if (late) hooks.raise(late);
}
