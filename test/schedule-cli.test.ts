/**
 * `splicewright schedule` as a user runs it (the built CLI, worker threads and HiGHS worker included):
 * the demo project with K = 1, 2, 3, every scheduled layout passed again through `splicewright check`,
 * totals and the order list against each other, exports, exit codes and bad-input one-liners.
 */
import { existsSync, mkdtempSync, readFileSync, readdirSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { stringify, parse } from "yaml";
import { describe, expect, it } from "vitest";
import { cli, scenarioPath, tempScenario } from "./helpers/cli.js";
import { ProgressBar, progressLine } from "../src/cli/schedule-progress.js";

const DEMO = scenarioPath("warehouse-roof-project.yaml");
const demoFile = parse(readFileSync(DEMO, "utf8")) as { splices: Array<Record<string, unknown> & { id: string }> };

const run = (args: string[]) => {
  const r = cli(["schedule", ...args]);
  return { ...r, json: r.code === 0 && args.includes("--json") ? JSON.parse(r.stdout) : null };
};

const demo = new Map([1, 2, 3].map((k) => [k, run([DEMO, "--max-types", String(k), "--json"])]));

interface Row {
  id: string;
  quantity: number;
  type: string;
  bolts: number;
  boltsEach: number;
  cost: number;
  costEach: number;
  premium: number;
  ownOptimum: { costEach: number };
  layout: { pattern: string; size_mm: number; class: string; acrossPerLine: number[]; along: number; pitch_mm: number | null; gauge_mm: number | null; endDistance_mm: number; endDistanceAtButt_mm: number | null; coverThickness_mm: number | null };
}

describe("schedule: the demo project with K = 1, 2, 3", () => {
  it.each([1, 2, 3])("K = %i: proven optimal, at most K types, every splice scheduled, totals add up", (k) => {
    const r = demo.get(k)!;
    expect(r.code, r.stderr).toBe(0);
    const j = r.json;
    expect(j.proven).toBe(true);
    expect(j.types.length).toBeLessThanOrEqual(k);
    expect(j.splices).toHaveLength(demoFile.splices.length);
    expect(demoFile.splices.length).toBeGreaterThanOrEqual(30);
    // One class per diameter (the demo's rule) among the types used.
    const sizes = j.types.map((t: { size: string }) => t.size);
    expect(new Set(sizes).size).toBe(sizes.length);
    const rows = j.splices as Row[];
    const sum = (f: (r: Row) => number) => rows.reduce((s, x) => s + f(x), 0);
    // JSON money is rounded to 0.01: sums of rounded values agree to half a cent per term.
    const near = (a: number, b: number, terms: number) => expect(Math.abs(a - b)).toBeLessThanOrEqual(0.005 * terms + 1e-9);
    near(sum((x) => x.cost), j.totals.layoutCost, rows.length + 1);
    expect(j.totals.total).toBeCloseTo(j.totals.layoutCost + j.types.length * j.rules.costPerType, 1);
    expect(sum((x) => x.quantity * x.boltsEach)).toBe(j.totals.bolts);
    for (const x of rows) {
      expect(j.types.map((t: { type: string }) => t.type)).toContain(x.type);
      expect(x.costEach).toBeGreaterThanOrEqual(x.ownOptimum.costEach - 1e-6);
      near(x.premium, (x.costEach - x.ownOptimum.costEach) * x.quantity, 2 * x.quantity + 1);
    }
    // The bolts to order per type are the bolts of the splices given that type.
    for (const t of j.types as Array<{ type: string; bolts: number }>) {
      const ordered = (j.order as Array<{ type: string; kind: string; quantity: number }>).filter((o) => o.type === t.type && o.kind === "bolt").reduce((s, o) => s + o.quantity, 0);
      expect(ordered).toBe(t.bolts);
      expect(t.bolts).toBe(rows.filter((x) => x.type === t.type).reduce((s, x) => s + x.bolts, 0));
    }
  });

  it("more types allowed never cost more; the premium against each splice's own optimum falls", () => {
    const totals = [1, 2, 3].map((k) => demo.get(k)!.json.totals);
    expect(totals[0].total).toBeGreaterThanOrEqual(totals[1].total - 1e-6);
    expect(totals[1].total).toBeGreaterThanOrEqual(totals[2].total - 1e-6);
    expect(totals[0].premium).toBeGreaterThan(0);
    for (const t of totals) expect(t.ownOptimum.layoutCost).toBeCloseTo(totals[0].ownOptimum.layoutCost, 6);
  });

  it("every scheduled layout passes `splicewright check` on its own, with the bolts the schedule counts", () => {
    const rows = demo.get(2)!.json.splices as Row[];
    // A lap, a single-cover and a double-cover splice, and a staggered one.
    const picks = ["RB-06", "TW-01", "BC-04", "ST-01"].map((id) => rows.find((x) => x.id === id)!);
    for (const x of picks) {
      const source = demoFile.splices.find((s) => s.id === x.id)!;
      const l = x.layout;
      const plates = structuredClone(source.plates) as Record<string, Record<string, unknown>>;
      if (l.coverThickness_mm !== null) plates.cover!.thickness = l.coverThickness_mm;
      const layout: Record<string, unknown> = { pattern: l.pattern, end_distance: l.endDistance_mm };
      if (l.pattern === "tapered") layout.across_per_line = l.acrossPerLine;
      else Object.assign(layout, { across: l.acrossPerLine[0], along: l.along });
      if (l.pitch_mm !== null) layout.pitch = l.pitch_mm;
      if (l.gauge_mm !== null) layout.gauge = l.gauge_mm;
      if (l.endDistanceAtButt_mm !== null) layout.end_distance_at_butt = l.endDistanceAtButt_mm;
      const scenario = { name: x.id, code: "is800-2007", splice: source.splice, plates, load: source.load, bolts: { size: l.size_mm, class: l.class }, layout };
      const r = cli(["check", tempScenario(stringify(scenario)), "--json"]);
      expect(r.code, `${x.id}: ${r.stdout.slice(0, 400)}`).toBe(0);
      const report = JSON.parse(r.stdout);
      expect(report.pass).toBe(true);
      expect(report.holes.length).toBe(x.boltsEach);
    }
  });

  it("the integer programme (HiGHS in a worker thread) reaches the enumeration's optimum", () => {
    const mip = run([DEMO, "--max-types", "3", "--method", "mip", "--json"]);
    expect(mip.code, mip.stderr).toBe(0);
    expect(mip.json.method).toBe("integer programme");
    expect(mip.json.proven).toBe(true);
    expect(mip.json.totals.total).toBeCloseTo(demo.get(3)!.json.totals.total, 2);
  });

  it("the text table shows the choice, the proof, totals, premium and bolts to order with lengths", () => {
    const r = run([DEMO]);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain("Bolt types chosen:");
    expect(r.stdout).toContain("proven optimal");
    expect(r.stdout).toContain("premium of rationalising");
    expect(r.stdout).toMatch(/M\d+ × \d+ class \d+\.\d hexagon head bolt/);
    expect(r.stdout).toContain("RB-01");
    expect(r.stdout).toContain("qualified engineer");
    // Not a terminal: no progress bar on stderr.
    expect(r.stderr).toBe("");
  });
});

const SMALL = {
  project: "Small test job (invented)",
  code: "is800-2007",
  search: { sizes: ["M16", "M20"], classes: ["4.6", "8.8"], step: 10, max_along: 3 },
  splices: [
    { id: "A", mark: "A1", splice: { type: "lap" }, plates: { main: { width: 100, thickness: 10, grade: "E250" } }, load: { factored_tension: 100 } },
    { id: "B", quantity: 3, splice: { type: "lap" }, plates: { main: { width: 120, thickness: 10, grade: "E250" } }, load: { factored_tension: 180 } },
    { id: "C", splice: { type: "butt-single-cover" }, plates: { main: { width: 120, thickness: 10, grade: "E250" }, cover: { width: 120, thickness: 12, grade: "E250" } }, load: { factored_tension: 150 } },
  ],
};
const small = (change: (p: typeof SMALL & Record<string, unknown>) => void = () => {}) => {
  const p = structuredClone(SMALL) as typeof SMALL & Record<string, unknown>;
  change(p);
  return tempScenario(stringify(p), "job.yaml");
};

describe("schedule: results and files", () => {
  it("worker threads and the main thread give the same schedule", () => {
    const file = small();
    const a = run([file, "--json", "--workers", "2"]);
    const b = run([file, "--json", "--workers", "0"]);
    expect(a.code).toBe(0);
    for (const j of [a.json, b.json]) {
      delete j.effort;
      delete j.elapsed_ms;
    }
    expect(a.json).toEqual(b.json);
  });

  it("--out writes the schedule CSV, the order CSV and the JSON, and never overwrites without --force", () => {
    const file = small();
    const dir = mkdtempSync(join(tmpdir(), "splicewright-schedule-"));
    const r = run([file, "--out", dir]);
    expect(r.code).toBe(0);
    expect(readdirSync(dir).sort()).toEqual(["job-order.csv", "job-schedule.csv", "job-schedule.json"]);
    const csv = readFileSync(join(dir, "job-schedule.csv"), "utf8").replace(/^\ufeff/, "").trim().split("\r\n");
    expect(csv[0]).toMatch(/^id,mark,quantity,description,plates,factored_tension_kN,type,/);
    expect(csv.filter((l) => /^[ABC],/.test(l))).toHaveLength(3);
    const order = readFileSync(join(dir, "job-order.csv"), "utf8");
    expect(order).toMatch(/,bolt,M\d+ × \d+ class/);
    const json = JSON.parse(readFileSync(join(dir, "job-schedule.json"), "utf8"));
    expect(json.splices.map((s: { id: string }) => s.id)).toEqual(["A", "B", "C"]);
    const before = readFileSync(join(dir, "job-schedule.csv"), "utf8");
    const again = run([file, "--out", dir]);
    expect(again.code).toBe(2);
    expect(again.stderr.trim().split("\n")).toHaveLength(1);
    expect(again.stderr).toContain("already exists");
    expect(readFileSync(join(dir, "job-schedule.csv"), "utf8")).toBe(before);
    expect(run([file, "--out", dir, "--force", "--max-types", "1"]).code).toBe(0);
  });

  it("exit 1 naming the splice that has no compliant layout; nothing written", () => {
    const file = small((p) => {
      p.splices[1]!.load.factored_tension = 2000;
    });
    const dir = join(mkdtempSync(join(tmpdir(), "splicewright-schedule-")), "out");
    const r = run([file, "--out", dir]);
    expect(r.code).toBe(1);
    expect(r.stdout).toContain("splice B");
    expect(r.stdout).toContain("no compliant layout");
    expect(r.stderr).toContain("splice B");
    expect(existsSync(dir)).toBe(false);
  });

  it("exit 1 when no choice of K types serves every splice, with the fewest that would", () => {
    const file = small((p) => {
      p.splices.push({ id: "F", splice: { type: "lap" }, plates: { main: { width: 120, thickness: 10, grade: "E250" } }, load: { factored_tension: 120, service_tension: 80 } as never, bolts: { type: "friction-grip", slip_factor: 0.48 } } as never);
    });
    const r = run([file, "--max-types", "1"]);
    expect(r.code).toBe(1);
    expect(r.stdout).toContain("No schedule");
    expect(r.stdout).toContain("the fewest bolt types that serve every splice");
    expect(r.stdout).toMatch(/: 2 \(--max-types 1\)/);
    const two = run([file, "--max-types", "2", "--json"]);
    expect(two.code).toBe(0);
    expect(two.json.types.map((t: { assembly: string }) => t.assembly).sort()).toEqual(["bearing", "friction-grip"]);
  });

  it("the minimum-bolts rule goes to the integer programme, and every type used carries the minimum", () => {
    const r = run([small(), "--min-bolts-per-type", "6", "--json"]);
    expect(r.code).toBe(0);
    expect(r.json.method).toBe("integer programme");
    for (const t of r.json.types) expect(t.bolts).toBeGreaterThanOrEqual(6);
  });
});

describe("schedule: bad input gives one line naming the field, exit 2, nothing else", () => {
  const cases: Array<[string, () => string, string[], RegExp]> = [
    ["an unknown field in a splice", () => small((p) => Object.assign(p.splices[1]!, { colour: "red" })), [], /^splicewright: error: splices\[1\]\.colour: unknown field/],
    ["an unknown top-level field", () => small((p) => (p.colour = 1)), [], /^splicewright: error: colour: unknown field/],
    ["a bad project-level search default", () => small((p) => (p.search.step = "ten" as never)), [], /^splicewright: error: search\.step: /],
    ["a bad splice-level search override", () => small((p) => Object.assign(p.splices[0]!, { search: { step: -5 } })), [], /^splicewright: error: splices\[0\]\.search\.step: /],
    ["a size in the project's bolts", () => small((p) => (p.bolts = { size: 20 })), [], /^splicewright: error: bolts\.size: unknown field/],
    ["a duplicate id", () => small((p) => (p.splices[2]!.id = "A")), [], /^splicewright: error: splices\[2\]\.id: "A" is already the id of splices\[0\]/],
    ["a zero quantity", () => small((p) => (p.splices[1]!.quantity = 0)), [], /^splicewright: error: splices\[1\]\.quantity: must be at least 1/],
    ["an unknown grade", () => small((p) => (p.splices[0]!.plates.main.grade = "E999")), [], /^splicewright: error: splices\[0\]\.plates\.main\.grade: unknown IS 2062 grade/],
    ["a missing load", () => small((p) => delete (p.splices[0] as Record<string, unknown>).load), [], /^splicewright: error: splices\[0\]\.load: required/],
    ["a cover on a lap splice", () => small((p) => Object.assign(p.splices[0]!.plates, { cover: { width: 100, thickness: 8, grade: "E250" } })), [], /^splicewright: error: splices\[0\]\.plates\.cover: a lap splice has no cover plate/],
    ["friction grip without a slip factor, from the project's bolts", () => small((p) => (p.bolts = { type: "friction-grip" })), [], /^splicewright: error: bolts\.slip_factor: required/],
    ["a negative price", () => small((p) => (p.costs = { hole: -1 })), [], /^splicewright: error: costs\.hole: must not be negative/],
    ["a bad schedule rule", () => small((p) => (p.schedule = { max_types: 0 })), [], /^splicewright: error: schedule\.max_types: must be at least 1/],
    ["an unknown schedule rule", () => small((p) => (p.schedule = { max_kinds: 2 })), [], /^splicewright: error: schedule\.max_kinds: unknown field/],
    ["no splices", () => small((p) => (p.splices = [])), [], /^splicewright: error: splices: list at least one splice/],
    ["a YAML syntax error", () => tempScenario("project: x\nsplices: [\n", "job.yaml"), [], /^splicewright: error: line \d+, column \d+: YAML syntax error/],
    ["--max-types 0", () => small(), ["--max-types", "0"], /^splicewright: error: --max-types: must be a whole number from 1 to 2000, got "0"/],
    ["a negative --cost-per-type", () => small(), ["--cost-per-type", "-3"], /^splicewright: error: --cost-per-type: must be a number from 0 to 1000000000, got "-3"/],
    ["enumeration asked for with the minimum-bolts rule", () => small(), ["--method", "enumerate", "--min-bolts-per-type", "5"], /^splicewright: error: --method: enumerate cannot apply the minimum-bolts rule/],
    ["a missing file", () => "/nonexistent/job.yaml", [], /^splicewright: error: \/nonexistent\/job\.yaml: cannot read the file/],
    ["a scenario file instead of a project", () => scenarioPath("footbridge-tie.yaml"), [], /^splicewright: error: splices: required — this is a scenario file \(one splice\); `schedule` reads a project file/],
  ];
  it.each(cases)("%s", (_, file, args, message) => {
    const r = run([file(), ...args]);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe("");
    const lines = r.stderr.trim().split("\n");
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatch(message);
  });
});

describe("progress bar", () => {
  const stream = (isTTY: boolean) => {
    const written: string[] = [];
    return { written, isTTY, columns: 80, write: (s: string) => (written.push(s), true) };
  };
  it("is wanted only on a terminal and for more than 20 splices", () => {
    expect(ProgressBar.wanted(stream(true), 21)).toBe(true);
    expect(ProgressBar.wanted(stream(true), 20)).toBe(false);
    expect(ProgressBar.wanted(stream(false), 500)).toBe(false);
  });
  it("draws on one line and clears it at the end; draws nothing when disabled", () => {
    const tty = stream(true);
    const bar = new ProgressBar(tty, "schedule", 50, true);
    bar.update(50);
    bar.finish();
    expect(tty.written[0]).toMatch(/^\rschedule \[#+\] 50\/50/);
    expect(tty.written[1]).toBe("\r\u001b[K");
    const pipe = stream(false);
    const off = new ProgressBar(pipe, "schedule", 50, false);
    off.update(10);
    off.finish();
    expect(pipe.written).toEqual([]);
  });
  it("fills in proportion", () => {
    expect(progressLine("x", 5, 10, 3, 60)).toMatch(/^x \[#{10,20}-{10,20}\] 5\/10  3 s$/);
    const line = progressLine("x", 5, 10, 3, 60);
    expect(line.split("#").length - 1).toBe(line.split("-").length - 1);
  });
});
