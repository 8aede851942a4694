/**
 * Hostile input: every file of test/fixtures/bad/ through the built CLI. Each must give exactly one
 * line naming the field path and the reason, exit code 2, no stack trace, and nothing written.
 * The expected message of each fixture is on its first line ("# expect: <regex>"); a second line
 * "# command: search --top 5" runs another command than `check` (the file's path goes after its name).
 */
import { existsSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { cliAsync, ROOT } from "./helpers/cli.js";

const dir = join(ROOT, "test", "fixtures", "bad");
const fixtures = readdirSync(dir).filter((f) => f.endsWith(".yaml")).sort();

function expected(file: string): RegExp {
  const first = readFileSync(join(dir, file), "utf8").split("\n")[0] ?? "";
  const m = /^# expect: (.*)$/.exec(first);
  if (!m) throw new Error(`${file} has no "# expect:" line`);
  return new RegExp(m[1]!);
}

/** The command line of a fixture: `check FILE`, or its "# command:" line with the file after the command name. */
function commandOf(file: string): string[] {
  const second = readFileSync(join(dir, file), "utf8").split("\n")[1] ?? "";
  const m = /^# command: (\S+)(.*)$/.exec(second);
  if (!m) return ["check", join(dir, file)];
  return [m[1]!, join(dir, file), ...m[2]!.trim().split(/\s+/).filter(Boolean)];
}
const checkOnly = (file: string) => commandOf(file)[0] === "check";

function assertOneLine(r: { code: number; stdout: string; stderr: string }, pattern: RegExp) {
  expect(r.code).toBe(2);
  expect(r.stdout).toBe("");
  const lines = r.stderr.trimEnd().split("\n");
  expect(lines, r.stderr).toHaveLength(1);
  expect(lines[0]).toMatch(/^splicewright: error: /);
  expect(lines[0]).toMatch(pattern);
  expect(r.stderr).not.toMatch(/\n\s+at |Error:|node:internal/);
}

describe("bad scenario files", () => {
  it("the corpus has at least 40 files", () => {
    expect(fixtures.length).toBeGreaterThanOrEqual(40);
  });

  it.concurrent.each(fixtures)("%s: one line, exit 2", async (file) => {
    assertOneLine(await cliAsync(commandOf(file)), expected(file));
  });

  it.concurrent.each(fixtures.filter(checkOnly).filter((_, i) => i % 3 === 0))("%s: export writes nothing", async (file) => {
    const out = join(mkdtempSync(join(tmpdir(), "splicewright-bad-")), "out");
    const r = await cliAsync(["export", join(dir, file), "--format", "all", "--out", out]);
    assertOneLine(r, expected(file));
    expect(existsSync(out) ? readdirSync(out) : []).toEqual([]);
  });

  it("a very large file (over 1 MB) is refused", async () => {
    const big = join(mkdtempSync(join(tmpdir(), "splicewright-bad-")), "big.yaml");
    writeFileSync(big, `name: big\n# ${"x".repeat(1_100_000)}\n`);
    assertOneLine(await cliAsync(["check", big]), /file is larger than 1000000 bytes/);
  });
});
