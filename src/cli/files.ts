/**
 * Writing output files safely: refuse to overwrite without --force, create the folder, and never leave
 * a half-written file (write to a temporary name in the same folder, then rename).
 */
import { existsSync, mkdirSync, renameSync, rmSync, writeFileSync } from "node:fs";
import { dirname, basename, join } from "node:path";
import { InputError } from "../io/yaml.js";

export function writeFileSafely(path: string, content: string | Uint8Array, force: boolean): void {
  if (existsSync(path) && !force) throw new InputError(path, "already exists (use --force to overwrite)");
  const dir = dirname(path);
  mkdirSync(dir, { recursive: true });
  const temp = join(dir, `.${basename(path)}.${process.pid}.tmp`);
  try {
    writeFileSync(temp, content);
    renameSync(temp, path);
  } catch (e) {
    rmSync(temp, { force: true });
    throw new InputError(path, `cannot write the file: ${e instanceof Error ? e.message : String(e)}`);
  }
}

/**
 * Write several files as one: refuse before writing anything if one exists (without --force), then
 * write each through a temporary name; on a failure remove what this call wrote.
 */
export function writeFilesSafely(files: Array<{ path: string; content: string }>, force: boolean): void {
  if (!force) for (const f of files) if (existsSync(f.path)) throw new InputError(f.path, "already exists (use --force to overwrite)");
  const written: string[] = [];
  try {
    for (const f of files) {
      writeFileSafely(f.path, f.content, true);
      written.push(f.path);
    }
  } catch (e) {
    for (const p of written) rmSync(p, { force: true });
    throw e;
  }
}
