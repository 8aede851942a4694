/**
 * Bounded work through the built CLI: the declared space refused before every kind of search (schedule
 * per splice, compare, export and report --rank), --max-candidates, bounded options; progress on a
 * terminal; big tables. Scenarios are the bundled demos or generated jobs (invented).
 */
import { spawnSync } from "node:child_process";
import { existsSync, readFileSync } from "node:fs";
import Table from "cli-table3";
import { describe, expect, it } from "vitest";
import { parseCostTable } from "../src/io/costs.js";
import { parseScenario } from "../src/io/scenario.js";
import { ProgressBar, pulseLine } from "../src/cli/schedule-progress.js";
import { SearchProgress, searchProgressLine } from "../src/cli/search-progress.js";
import { boxTable, displayWidth } from "../src/cli/text-table.js";
import { PROGRESS_EVERY, searchLayouts, type SearchStats } from "../src/search/search.js";
import { BIN, cli, ROOT, scenarioPath, tempScenario } from "./helpers/cli.js";

const searchText = readFileSync(scenarioPath("footbridge-tie-search.yaml"), "utf8");
const projectText = readFileSync(scenarioPath("warehouse-roof-project.yaml"), "utf8");

function oneLine(r: { code: number; stdout: string; stderr: string }, pattern: RegExp) {
  expect(r.code, r.stderr).toBe(2);
  expect(r.stdout).toBe("");
  const lines = r.stderr.trimEnd().split("\n");
  expect(lines).toHaveLength(1);
  expect(lines[0]).toMatch(/^splicewright: error: /);
  expect(lines[0]).toMatch(pattern);
}

describe("the declared space, bounded before every search", () => {
  it("schedule: a splice's own wide plate is refused naming its own search field and the splice, before any search", () => {
    const wide = projectText.replace("- { id: RB-01, mark: RB1, quantity: 8,", "- { id: RB-01, mark: RB1, quantity: 8, search: { max_along: 100 },").replace("plates: { main: { width: 90, thickness: 8, grade: E250 } }, load: { factored_tension: 95 kN }", "plates: { main: { width: 4000, thickness: 8, grade: E250 } }, load: { factored_tension: 95 kN }");
    oneLine(cli(["schedule", tempScenario(wide), "--workers", "0"]), /^splicewright: error: splices\[0\]\.search\.patterns: splice RB-01: the declared search space holds about .* × 10\^\d+ candidate layouts, more than the limit of 1\.0 × 10\^11/);
  });
  it("schedule: a project default is blamed on the project's search section; --max-candidates lifts and lowers the limit", () => {
    const fine = projectText.replace("  step: 5 mm\n", "  step: 1 mm\n");
    const r = cli(["schedule", tempScenario(fine), "--workers", "0", "--max-candidates", "100000"]);
    oneLine(r, /^splicewright: error: search\.step: splice \S+: the declared search space holds about [\d ]+ candidate layouts, more than the limit of 100 000/);
    expect(cli(["schedule", scenarioPath("warehouse-roof-project.yaml"), "--workers", "0", "--max-candidates", "1000"]).code).toBe(2);
  });
  it("compare, export --rank and report --rank refuse a space above --max-candidates; search runs a lifted one", () => {
    const file = scenarioPath("footbridge-tie-search.yaml");
    oneLine(cli(["compare", file, "--classes", "8.8,10.9", "--max-candidates", "1000"]), /search\.\w+: the compared columns' search spaces hold together about/);
    oneLine(cli(["export", file, "--rank", "1", "--format", "svg", "--out", "/tmp/never-written-sw", "--max-candidates", "1000"]), /search\.\w+: the declared search space holds about/);
    oneLine(cli(["report", file, "--rank", "1", "--out", "/tmp/never-written-sw.html", "--max-candidates", "1000"]), /search\.\w+: the declared search space/);
    expect(existsSync("/tmp/never-written-sw") || existsSync("/tmp/never-written-sw.html")).toBe(false);
    const fine = tempScenario(searchText.replace("step: 5 mm ", "step: 1 mm "));
    oneLine(cli(["search", fine]), /^splicewright: error: search\.step: .*--max-candidates \d+ to search it knowingly/);
    const lifted = cli(["search", fine, "--top", "1", "--max-candidates", "200000000000", "--json"]);
    expect(lifted.code).toBe(0);
    expect(JSON.parse(lifted.stdout).results).toHaveLength(1);
  });
});

describe("options are bounded", () => {
  it.each([
    [["schedule", scenarioPath("warehouse-roof-project.yaml"), "--workers", "1000"], /--workers: must be a whole number from 0 to \d+, got "1000"/],
    [["schedule", scenarioPath("warehouse-roof-project.yaml"), "--time-limit", "100000"], /--time-limit: must be a whole number from 1 to 3600/],
    [["schedule", scenarioPath("warehouse-roof-project.yaml"), "--cost-per-type", "1e308"], /--cost-per-type: must be a number from 0 to 1000000000, got "1e308"/],
    [["schedule", scenarioPath("warehouse-roof-project.yaml"), "--max-types", "99999"], /--max-types: must be a whole number from 1 to 2000/],
    [["search", scenarioPath("footbridge-tie-search.yaml"), "--rank", "5000", "--save", "/tmp/never-sw.yaml"], /--rank: must be a whole number from 1 to 1000/],
    [["report", scenarioPath("footbridge-tie-search.yaml"), "--rank", "100000", "--out", "/tmp/never-sw.html"], /--rank: must be a whole number from 1 to 1000, got "100000"/],
    [["search", scenarioPath("footbridge-tie-search.yaml"), "--max-candidates", "lots"], /--max-candidates: must be a whole number/],
    [["compare", scenarioPath("footbridge-tie-search.yaml"), "--codes", " , "], /--codes: give at least one value/],
  ])("%j", (args, pattern) => {
    oneLine(cli(args as string[]), pattern as RegExp);
  });
  it("a project's cost_per_type and a price are finite and bounded", () => {
    oneLine(cli(["schedule", tempScenario(projectText.replace("cost_per_type: 150", "cost_per_type: 1e300"))]), /schedule\.cost_per_type: must be at most 1000000000/);
    oneLine(cli(["schedule", tempScenario(projectText.replace("code: is800-2007", "code: is800-2007\ncosts: { plate_per_kg: 1e308 }"))]), /costs\.plate_per_kg: must be at most 1000000/);
  });
});

describe("progress", () => {
  const tty = () => {
    const written: string[] = [];
    return { written, isTTY: true, columns: 200, write: (s: string) => (written.push(s), true) };
  };
  it("the search calls onProgress every PROGRESS_EVERY nodes with its counts", () => {
    const costs = parseCostTable(readFileSync(`${ROOT}/catalogue/costs.yaml`, "utf8"), "catalogue");
    const { scenario, code } = parseScenario(searchText.replace("620 kN", "760 kN"));
    const seen: number[] = [];
    const outcome = searchLayouts({ scenario, code, costs }, { top: 10, rankBy: "cost", onProgress: (s) => void seen.push(s.nodes) });
    expect(seen.length).toBe(Math.floor(outcome.stats.nodes / PROGRESS_EVERY));
    expect(seen.every((n, i) => n === (i + 1) * PROGRESS_EVERY)).toBe(true);
  });
  it("the search's line appears on a terminal only, after its delay, and is cleared", () => {
    const stats = { fullChecks: 12400, declaredCandidates: 5.7e7, nodes: 3000 } as SearchStats;
    const t = tty();
    const p = new SearchProgress(t, "searching", 10, 0);
    p.update(stats, 3);
    p.finish();
    expect(t.written[0]).toMatch(/^\rsearching: 12 400 layouts checked of 5\.7 × 10\^7 declared, 3 000 nodes, 3\/10 proven, \d+ s\u001b\[K$/);
    expect(t.written[1]).toBe("\r\u001b[K");
    const late = tty();
    new SearchProgress(late, "searching", 10).update(stats, 0); // 2 s have not passed
    const pipe = { ...tty(), isTTY: false };
    new SearchProgress(pipe, "searching", 10, 0).update(stats, 0);
    expect(late.written).toEqual([]);
    expect(pipe.written).toEqual([]);
    expect(searchProgressLine("s", stats, 1, 2, 5)).toContain("1/2 proven, 5 s");
  });
  it("the schedule's bar changes phase and pulses through a phase of unknown length", () => {
    const t = tty();
    const bar = new ProgressBar(t, "schedule: searching splices", 34, true);
    bar.update(34);
    bar.phase("schedule: choosing bolt types", 1);
    bar.pulse();
    bar.phase("schedule: re-checking", 34);
    bar.update(34);
    expect(t.written.map((w) => w.replace(/\[.*$/, ""))).toEqual(["\rschedule: searching splices ", "\rschedule: choosing bolt types ", "\rschedule: choosing bolt types ", "\rschedule: re-checking ", "\rschedule: re-checking "]);
    expect(pulseLine("x", 0, 60)).toMatch(/^x \[#-+\]  0 s$/);
    expect(pulseLine("x", 1, 60)).toMatch(/^x \[-{4}#-+\]  1 s$/);
  });
  it.skipIf(!existsSync("/usr/bin/script"))("on a terminal (a pty from util-linux script) the schedule's bar shows every phase", () => {
    const r = spawnSync("/usr/bin/script", ["-qec", `${process.execPath} ${BIN} schedule ${scenarioPath("warehouse-roof-project.yaml")} --method mip --workers 0 > /dev/null`, "/dev/null"], { encoding: "utf8" });
    const shown = new Set(r.stdout.split(/[\r\n]/).map((l) => /schedule: [a-z -]+/.exec(l)?.[0]?.trim()).filter(Boolean));
    expect([...shown].sort()).toEqual(["schedule: choosing bolt types", "schedule: re-checking the scheduled layouts", "schedule: searching splices", "schedule: writing the schedule"]);
  });
});

describe("big tables", () => {
  it("boxTable draws exactly what cli-table3 draws in its compact style (ASCII, dashes, ×, wide characters)", () => {
    const head = ["Id", "Mark", "Counts", "Cost"];
    const rows = Array.from({ length: 40 }, (_, i) => [`S-${i}`, i % 7 === 0 ? "—" : `M${i}`, `${i % 4} across × ${(i % 3) + 1} along`, i % 5 === 0 ? "桁 12" : (i * 13.7).toFixed(1)]);
    const t = new Table({ head, style: { head: [], border: [], compact: true } });
    for (const r of rows) t.push(r);
    expect(boxTable(head, rows)).toBe(t.toString());
    expect(displayWidth("桁 ×é")).toBe(5);
  });
  it("a 5000-row schedule table is drawn row for row (the count of lines grows with the rows only)", () => {
    const rows = Array.from({ length: 5000 }, (_, i) => [`S-${i}`, "x"]);
    const text = boxTable(["Id", "v"], rows);
    expect(text.split("\n")).toHaveLength(5004);
  });
});
