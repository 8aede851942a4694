/**
 * Files and standard output: targets checked before any work, links and non-regular files, folders that
 * cannot be created, all-or-nothing sets with the old files restored, signals during a write, a closed
 * pipe and a full device. Scenarios are the bundled demos (invented).
 */
import { spawn, spawnSync } from "node:child_process";
import { EventEmitter } from "node:events";
import { chmodSync, existsSync, mkdirSync, mkdtempSync, openSync, readdirSync, readFileSync, symlinkSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { checkTargets, writeFileSet, WriteInterrupted, type SignalHooks } from "../src/cli/files.js";
import { BIN, cli, scenarioPath, tempScenario } from "./helpers/cli.js";

const fresh = () => mkdtempSync(join(tmpdir(), "splicewright-files-"));
const demo = scenarioPath("footbridge-tie.yaml");
const searchDemo = scenarioPath("footbridge-tie-search.yaml");
const project = scenarioPath("warehouse-roof-project.yaml");

function oneLine(r: { code: number; stdout: string; stderr: string }, pattern: RegExp) {
  expect(r.code, r.stderr).toBe(2);
  const lines = r.stderr.trimEnd().split("\n");
  expect(lines).toHaveLength(1);
  expect(lines[0]).toMatch(pattern);
  expect(r.stderr).not.toMatch(/\n\s+at |node:internal|internal error/);
}

/** Signals under the test's control: `fire` delivers one as the process would. */
function fakeSignals() {
  const emitter = new EventEmitter();
  const raised: string[] = [];
  const hooks: SignalHooks = { on: (s, l) => emitter.on(s, l), off: (s, l) => emitter.off(s, l), raise: (s) => void raised.push(s) };
  return { hooks, raised, fire: (s: NodeJS.Signals) => emitter.emit(s) };
}

describe("targets before any work", () => {
  it("a dangling symbolic link counts as existing (no --force), and --force never replaces a link", () => {
    const dir = fresh();
    symlinkSync(join(dir, "nowhere"), join(dir, "r.html"));
    oneLine(cli(["report", demo, "--out", join(dir, "r.html")]), /r\.html: already exists and is a symbolic link: give a file name that is free \(--force replaces regular files only\)/);
    oneLine(cli(["report", demo, "--out", join(dir, "r.html"), "--force"]), /r\.html: is a symbolic link: --force replaces regular files only/);
    expect(existsSync(join(dir, "nowhere"))).toBe(false);
  });
  it("--force never turns a device or a folder into a regular file", () => {
    oneLine(cli(["report", demo, "--out", "/dev/null", "--force"]), /\/dev\/null: is a device: --force replaces regular files only/);
    const dir = fresh();
    mkdirSync(join(dir, "footbridge-tie.svg"));
    oneLine(cli(["export", demo, "--format", "svg,csv", "--out", dir, "--force"]), /footbridge-tie\.svg: is a folder: --force replaces regular files only/);
    expect(readdirSync(dir)).toEqual(["footbridge-tie.svg"]);
  });
  it("a folder that cannot be created is one line, exit 2 (export, report, search --save, schedule --out)", () => {
    const dir = fresh();
    writeFileSync(join(dir, "file"), "in the way");
    const under = join(dir, "file", "sub");
    const reason = /cannot be created: .*file is a file, not a folder/;
    oneLine(cli(["export", demo, "--format", "all", "--out", under]), reason);
    oneLine(cli(["report", demo, "--out", join(under, "r.html")]), reason);
    oneLine(cli(["search", searchDemo, "--save", join(under, "s.yaml")]), reason);
    oneLine(cli(["schedule", project, "--out", under, "--workers", "0"]), reason);
  });
  it("no permission to create the folder is one line, exit 2 (run as an unprivileged user when the tests run as root)", () => {
    const dir = fresh();
    chmodSync(dir, 0o555);
    const as = process.getuid?.() === 0 ? { uid: 65534, gid: 65534 } : {};
    oneLine(cli(["export", demo, "--format", "svg", "--out", join(dir, "out")], undefined, {}, as), /out: cannot be created: no permission to write in /);
  });
  it.skipIf(!existsSync("/proc/self"))("a folder that cannot be made on a special file system (/proc) fails at once, one line, exit 2 — never Node's endless recursive mkdir as root", () => {
    // A hang is killed after 20 s (SIGKILL: the old loop ignored SIGTERM) and fails the test.
    const p = spawnSync(process.execPath, [BIN, "export", demo, "--format", "svg", "--out", `/proc/splicewright-test-${process.pid}/out`], { encoding: "utf8", timeout: 20_000, killSignal: "SIGKILL" });
    expect(p.signal, "killed after 20 s").toBeNull();
    oneLine({ code: p.status ?? -1, stdout: p.stdout, stderr: p.stderr }, /splicewright-test-\d+.*(cannot be created|cannot write the file)/);
  }, 30_000);
  it("the targets are checked before the search: --save, export --rank and schedule --out name the file, not the search", () => {
    const dir = fresh();
    const taken = join(dir, "taken.yaml");
    writeFileSync(taken, "mine");
    // --max-candidates 1 would refuse the search itself: the file's error must come first.
    oneLine(cli(["search", searchDemo, "--save", taken, "--max-candidates", "1"]), /taken\.yaml: already exists/);
    writeFileSync(join(dir, "footbridge-tie-search-rank1.svg"), "mine");
    oneLine(cli(["export", searchDemo, "--rank", "1", "--format", "svg", "--out", dir, "--max-candidates", "1"]), /rank1\.svg: already exists/);
    writeFileSync(join(dir, "warehouse-roof-project-order.csv"), "mine");
    oneLine(cli(["schedule", project, "--out", dir, "--max-candidates", "1"]), /project-order\.csv: already exists/);
    expect(readFileSync(taken, "utf8")).toBe("mine");
  });
  it("checkTargets: an existing regular file passes with force only", () => {
    const dir = fresh();
    writeFileSync(join(dir, "a"), "x");
    expect(() => checkTargets([join(dir, "a")], false)).toThrow(/already exists/);
    expect(() => checkTargets([join(dir, "a"), join(dir, "new", "b")], true)).not.toThrow();
  });
});

describe("a set of files, all or nothing", () => {
  const setIn = (dir: string) => ["a.txt", "b.txt", "c.txt"].map((n) => ({ path: join(dir, n), content: `new ${n}` }));
  const old = (dir: string) => {
    writeFileSync(join(dir, "a.txt"), "old a");
    writeFileSync(join(dir, "b.txt"), "old b");
  };
  const contents = (dir: string) => Object.fromEntries(readdirSync(dir).sort().map((n) => [n, readFileSync(join(dir, n), "utf8")]));

  it("writes every file and leaves no temporary or backup file", async () => {
    const dir = fresh();
    old(dir);
    await writeFileSet(setIn(dir), true, fakeSignals().hooks);
    expect(contents(dir)).toEqual({ "a.txt": "new a.txt", "b.txt": "new b.txt", "c.txt": "new c.txt" });
  });

  it.each(["wrote", "moved", "placed"])("with --force, a failure after a step that %s … restores the old files exactly", async (step) => {
    const dir = fresh();
    old(dir);
    let seen = 0;
    const fail = (s: string) => {
      if (s.startsWith(step) && ++seen === 2) throw new Error("disk gone");
    };
    await expect(writeFileSet(setIn(dir), true, fakeSignals().hooks, fail)).rejects.toThrow(/cannot write the file: disk gone; nothing was written/);
    expect(contents(dir)).toEqual({ "a.txt": "old a", "b.txt": "old b" });
  });

  it.each(["wrote", "moved", "placed"])("SIGTERM after a step that %s … rolls back, then ends the process by that signal", async (step) => {
    const dir = fresh();
    old(dir);
    const sig = fakeSignals();
    await expect(writeFileSet(setIn(dir), true, sig.hooks, (s) => s.startsWith(step) && sig.fire("SIGTERM"))).rejects.toBeInstanceOf(WriteInterrupted);
    expect(sig.raised).toEqual(["SIGTERM"]);
    expect(contents(dir)).toEqual({ "a.txt": "old a", "b.txt": "old b" });
  });

  it("SIGINT once the set is complete: the set stays whole, the old files go, then the signal ends the process", async () => {
    const dir = fresh();
    old(dir);
    const sig = fakeSignals();
    await writeFileSet(setIn(dir), true, sig.hooks, (s) => s === "committed" && sig.fire("SIGINT"));
    expect(sig.raised).toEqual(["SIGINT"]);
    expect(contents(dir)).toEqual({ "a.txt": "new a.txt", "b.txt": "new b.txt", "c.txt": "new c.txt" });
  });

  it("a real SIGTERM during a long search leaves no file and no temporary file", async () => {
    const dir = fresh();
    // A search of some seconds: a 1 mm step at a load near the plate's strength.
    const slow = tempScenario(readFileSync(searchDemo, "utf8").replace("step: 5 mm ", "step: 1 mm ").replace("620 kN", "760 kN"));
    const child = spawn(process.execPath, [BIN, "export", slow, "--rank", "1000", "--format", "all", "--out", join(dir, "out"), "--max-candidates", "1000000000000"], { stdio: "ignore" });
    await new Promise((r) => setTimeout(r, 1500));
    child.kill("SIGTERM");
    const [code, signal] = await new Promise<[number | null, string | null]>((r) => child.on("exit", (c, s) => r([c, s])));
    expect(signal === "SIGTERM" || code === 143).toBe(true);
    expect(existsSync(join(dir, "out")) ? readdirSync(join(dir, "out")) : []).toEqual([]);
  });
});

describe("standard output", () => {
  it("piped into a reader that closes at once (head), the schedule ends quietly with its own exit code", async () => {
    const child = spawn(process.execPath, [BIN, "schedule", project, "--workers", "0"], { stdio: ["ignore", "pipe", "pipe"] });
    child.stdout.destroy(); // the reader has gone before anything was written
    let stderr = "";
    child.stderr.on("data", (d) => (stderr += String(d)));
    const code = await new Promise<number | null>((r) => child.on("exit", (c) => r(c)));
    expect(stderr).toBe("");
    expect(code).toBe(0);
  });
  it("a full device on stdout is one line on stderr and exit code 4 (check, schedule --json)", () => {
    for (const args of [["check", demo], ["schedule", project, "--json", "--workers", "0"]]) {
      const full = openSync("/dev/full", "w");
      const r = spawnSync(process.execPath, [BIN, ...args], { stdio: ["ignore", full, "pipe"], encoding: "utf8" });
      expect(r.status).toBe(4);
      expect(r.stderr.trimEnd().split("\n")).toEqual([expect.stringMatching(/^splicewright: error: cannot write the output \(ENOSPC: no space left on device, write\)$/)]);
    }
  });
});
