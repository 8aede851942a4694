// The old path for the bench's ratios: commit 71608d4 (before the speed work of issue 16), exported with
// `git archive` into a temporary folder and compiled there with this checkout's TypeScript. The bench
// times it in the same run as the current build; src/ keeps one checker.
import { execFileSync } from "node:child_process";
import { existsSync, mkdirSync, symlinkSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";

export const BASELINE_COMMIT = "71608d4";

/** Folder of the built baseline (dist/, bin/, scenarios/, catalogue/); built on first use. */
export function baselineRoot(root) {
  const dir = join(tmpdir(), `splicewright-bench-baseline-${BASELINE_COMMIT}`);
  if (existsSync(join(dir, "dist", "engine", "check.js"))) return dir;
  mkdirSync(dir, { recursive: true });
  const archive = execFileSync("git", ["-C", root, "archive", BASELINE_COMMIT], { maxBuffer: 1 << 28 });
  execFileSync("tar", ["-x", "-C", dir], { input: archive });
  if (!existsSync(join(dir, "node_modules"))) symlinkSync(join(root, "node_modules"), join(dir, "node_modules"), "dir");
  execFileSync(process.execPath, [join(root, "node_modules", "typescript", "bin", "tsc"), "-p", join(dir, "tsconfig.json")], { stdio: "inherit" });
  return dir;
}
