/** Run the built CLI (dist/, built by `npm test`'s pretest) as a user would. */
import { execFile, spawnSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";

export const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), "..", "..");
export const BIN = join(ROOT, "bin", "splicewright.js");

export interface CliResult {
  code: number;
  stdout: string;
  stderr: string;
}

/** Run the CLI; `env` adds variables, `uid`/`gid` run it as another user (when the tests run as root). */
export function cli(args: string[], cwd: string = ROOT, env: Record<string, string> = {}, as: { uid?: number; gid?: number } = {}): CliResult {
  const r = spawnSync(process.execPath, [BIN, ...args], { cwd, encoding: "utf8", env: { ...process.env, ...env }, ...as });
  return { code: r.status ?? -1, stdout: r.stdout, stderr: r.stderr };
}

/** Write YAML text to a fresh temporary folder and return its path. */
export function tempScenario(text: string, name = "scenario.yaml"): string {
  const dir = mkdtempSync(join(tmpdir(), "splicewright-test-"));
  const file = join(dir, name);
  writeFileSync(file, text);
  return file;
}

export function scenarioPath(name: string): string {
  return join(ROOT, "scenarios", name);
}

/** The built CLI, without blocking: lets a table of cases run concurrently. */
export function cliAsync(args: string[], cwd: string = ROOT): Promise<CliResult> {
  return new Promise((resolvePromise) => {
    execFile(process.execPath, [BIN, ...args], { cwd, encoding: "utf8" }, (error, stdout, stderr) => {
      const code = error ? (typeof error.code === "number" ? error.code : -1) : 0;
      resolvePromise({ code, stdout, stderr });
    });
  });
}
