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
