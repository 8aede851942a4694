/**
 * The workbench's shell logic, without a browser: the form covers the scenario file's schema, a file
 * filled in field by field reads back as the same scenario, the session shows what `check --json`
 * prints and writes what `export` and `report` write (byte for byte), and every bad file of the corpus
 * gives the CLI's own one-line message at a field of the form. The references outside the workbench:
 * the schema (src/io/schema.ts), the CLI (its `main`, run in this process as bin/splicewright.js runs
 * it, to spare the machine a hundred Node start-ups; the browser test runs the built binary), and
 * Node's own path module for file naming.
 */
import { readdirSync, readFileSync, mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { basename, extname, join } from "node:path";
import { describe, expect, it } from "vitest";
import { costSchema } from "../src/io/costs.js";
import { mappingSchema } from "../src/io/equivalents.js";
import { scenarioSchema } from "../src/io/schema.js";
import { parseScenario, parseYaml } from "../src/io/scenario.js";
import { costTableFor } from "../src/io/costs.js";
import { compareRequest } from "../src/io/compare-request.js";
import { searchLayouts } from "../src/search/search.js";
import { exportBase, exportDate, fileStem } from "../src/export/names.js";
import { ScenarioDocument } from "../src/web/document.js";
import { fieldKey, fieldOfPath, FIELDS, inputOfValue, valueAt, valueOfInput, type Field } from "../src/web/fields.js";
import { problemOf, Session } from "../src/web/session.js";
import { main } from "../src/cli/main.js";
import { ROOT, scenarioPath, tempScenario } from "./helpers/cli.js";

/** The CLI's main, as the binary calls it, with its output captured. */
async function cliRun(args: string[], env: Record<string, string> = {}): Promise<{ code: number; stdout: string; stderr: string }> {
  const out: string[] = [];
  const err: string[] = [];
  const saved = Object.fromEntries(Object.keys(env).map((k) => [k, process.env[k]]));
  Object.assign(process.env, env);
  try {
    const code = await main(["node", "splicewright", ...args], { out: (t) => out.push(t), err: (t) => err.push(t) });
    return { code, stdout: out.map((t) => `${t}\n`).join(""), stderr: err.map((t) => `${t}\n`).join("") };
  } finally {
    for (const [k, v] of Object.entries(saved)) {
      if (v === undefined) delete process.env[k];
      else process.env[k] = v;
    }
  }
}

type Def = { type: string; shape?: Record<string, unknown>; innerType?: unknown };
const defOf = (s: unknown): Def => (s as { _zod: { def: Def } })._zod.def;

/** Every field path a zod object schema accepts (objects walked, optional and default unwrapped). */
function schemaLeaves(schema: unknown, prefix: string[] = []): string[] {
  const def = defOf(schema);
  if (def.type === "object") return Object.entries(def.shape!).flatMap(([k, v]) => schemaLeaves(v, [...prefix, k]));
  if (def.type === "optional" || def.type === "default" || def.type === "nullable") return schemaLeaves(def.innerType, prefix);
  return [prefix.join(".")];
}

const SCENARIOS = readdirSync(join(ROOT, "scenarios")).filter((f) => f.endsWith(".yaml") && !f.includes("project")).sort();

/** A scenario with the fields the bundled demos leave out: holes, prices, a mapping, lists, options. */
const EVERY_KIND = `name: Workbench coverage (invented)
project: Test
code: en1993-1-8
splice: { type: butt-double-cover, butt_gap: "12 mm" }
plates:
  main: { width: 200, thickness: 16, grade: S355, edges: sheared }
  main_b: { width: 200, thickness: 12, grade: S355 }
  cover: { width: 200, thickness: 10, grade: S355 }
  cover_b: { width: 200, thickness: 12, grade: S275 }
packing: auto
load: { factored_tension: 420 kN, service_tension: 300 kN }
bolts: { size: M20, class: "10.9", type: friction-grip, slip_factor: 0.4, slip_at: ultimate, threads_in_shear_planes: false, hole: standard }
layout:
  pattern: holes
  holes: [[40, -50], [40, 50], [100, -50], ["100 mm", "50 mm"]]
  end_distance: 45
search:
  sizes: [M16, 20]
  classes: ["8.8", "10.9"]
  patterns: [grid, tapered]
  step: 5 mm
  max_along: 4
  min_bolts: 3
  max_across: 3
  max_splice_length: 600
  max_end_distance: 60
  gauge: 70
  cover_thicknesses: [8, 10]
costs:
  currency: EUR
  hole: 7
  plate_per_kg: 1.5
  friction_grip_extra: 10
  bolt_assembly: { M20: { "10.9": 41 } }
compare:
  steel: [{ en1993-1-8: S355, is800-2007: E350 }]
  bolts: [{ en1993-1-8: "10.9", is800-2007: "10.9" }]
options:
  exposed_to_corrosion: true
  bolt_net_area: iso-stress-area
  bolt_strength: nominal
  net_section_load: transferred
  block_shear_load: full
  efficiency_basis: yield
  steel_strengths: en1993-1-1
  small_bolt_clearance: 2
factors: { gamma_m0: 1.05, gamma_m2: 1.3, gamma_m3: 1.3, gamma_m3_ser: 1.15 }
`;

/** Fill a blank document the way the form does: each field's text (or table) through the field's own conversion. */
function fillFieldByField(file: Record<string, unknown>): ScenarioDocument {
  const doc = ScenarioDocument.blank();
  for (const f of FIELDS) {
    const v = valueAt(file, f.path);
    if (v === undefined) continue;
    doc.set(f.path, f.kind === "prices" || f.kind === "equivalents" ? v : valueOfInput(f, inputOfValue(f, v)));
  }
  return doc;
}

describe("the form covers the scenario file", () => {
  it("has one field for every field the schema accepts, and none it does not (costs and compare by their own schemas)", () => {
    const leaves = schemaLeaves(scenarioSchema()).filter((p) => p !== "costs" && p !== "compare");
    leaves.push(...schemaLeaves(costSchema()).map((p) => `costs.${p}`), ...schemaLeaves(mappingSchema()).map((p) => `compare.${p}`));
    expect(FIELDS.map((f: Field) => fieldKey(f.path)).sort()).toEqual([...new Set(leaves)].sort());
  });

  it.each([...SCENARIOS, "every-kind"])("%s filled in field by field reads back as the same scenario", (name) => {
    const text = name === "every-kind" ? EVERY_KIND : readFileSync(scenarioPath(name), "utf8");
    const file = parseYaml(text) as Record<string, unknown>;
    const filled = fillFieldByField(file).text();
    const a = parseScenario(text);
    const b = parseScenario(filled);
    expect(b.scenario).toEqual(a.scenario);
    expect(b.code.id).toBe(a.code.id);
  });

  it("a file opened and saved keeps its comments and reads back the same", () => {
    const text = readFileSync(scenarioPath("footbridge-tie.yaml"), "utf8");
    const saved = ScenarioDocument.open(text).text();
    expect(saved).toContain("# design code: is800-2007");
    expect(parseScenario(saved).scenario).toEqual(parseScenario(text).scenario);
  });

  it("an edit changes one value in place and keeps the comment beside it; clearing the last field of a section removes the section", () => {
    const doc = ScenarioDocument.open(readFileSync(scenarioPath("footbridge-tie.yaml"), "utf8"));
    doc.set(["plates", "main", "width"], "240 mm");
    expect(doc.text()).toMatch(/width: 240 mm +# mm/);
    doc.set(["bolts", "class"], "10.9");
    expect(doc.text()).toContain('class: "10.9"');
    for (const k of ["exposed_to_corrosion", "bolt_net_area", "bolt_strength", "net_section_load"]) doc.set(["options", k], undefined);
    expect(doc.plain().options).toBeUndefined();
  });
});

describe("the session shows and writes what the CLI does", () => {
  it.each(SCENARIOS.filter((s) => !s.includes("search")))("%s: the live check is `check --json`", async (name) => {
    const session = new Session();
    const state = session.open(readFileSync(scenarioPath(name), "utf8"), name);
    const r = await cliRun(["check", scenarioPath(name), "--json"]);
    expect(state.problem).toBeUndefined();
    expect(state.check!.json).toEqual(JSON.parse(r.stdout));
    expect(state.check!.summary.pass).toBe(r.code === 0);
    expect(state.check!.summary.jointStrength_N / 1000).toBeCloseTo(JSON.parse(r.stdout).jointStrength_kN, 2);
  });

  it("a scenario without bolts and layout is for the search: no check, no problem", () => {
    const state = new Session().open(readFileSync(scenarioPath("footbridge-tie-search.yaml"), "utf8"), "footbridge-tie-search.yaml");
    expect(state.searchOnly).toBe(true);
    expect(state.problem).toBeUndefined();
    expect(state.check).toBeUndefined();
  });

  it.each(["footbridge-tie.yaml", "truss-chord-staggered.yaml", "sports-hall-chord-ec3.yaml"])("%s: every download is byte for byte the CLI's export and report for the same date", async (name) => {
    const epoch = "1700000000"; // 2023-11-14T22:13:20Z
    const date = exportDate(epoch, new Date(0));
    expect(date).toBe("2023-11-14");
    const session = new Session();
    session.open(readFileSync(scenarioPath(name), "utf8"), name);
    session.setDate(date);
    const out = session.download(["svg", "dxf", "csv", "json", "report", "yaml"]);
    const dir = mkdtempSync(join(tmpdir(), "splicewright-wb-"));
    const run = async (args: string[]) => {
      const r = await cliRun(args, { SOURCE_DATE_EPOCH: epoch });
      expect(r.code, r.stderr).toBe(0);
    };
    await run(["export", scenarioPath(name), "--format", "all", "--out", dir]);
    await run(["report", scenarioPath(name), "--out", join(dir, `${exportBase(name)}-report.html`)]);
    const stem = exportBase(name);
    const expected = [`${stem}.svg`, `${stem}.dxf`, `${stem}-holes.csv`, `${stem}-bom.csv`, `${stem}.json`, `${stem}-report.html`];
    for (const f of expected) {
      const mine = out.files.find((x) => x.name === f);
      expect(mine, f).toBeDefined();
      expect(Buffer.from(mine!.content, "utf8").equals(readFileSync(join(dir, f))), f).toBe(true);
    }
    const yaml = out.files.find((x) => x.name === name)!;
    expect(parseScenario(yaml.content).scenario).toEqual(parseScenario(readFileSync(scenarioPath(name), "utf8")).scenario);
  });

  it("the summary separates the strength checks from the detailing rules", () => {
    const text = readFileSync(scenarioPath("footbridge-tie.yaml"), "utf8").replace("pitch: 65", "pitch: 45");
    const state = new Session().open(text, "x.yaml");
    const s = state.check!.summary;
    expect(s.pass).toBe(false);
    expect(s.strengthPass).toBe(true);
    expect(s.rulesPass).toBe(false);
    expect(s.failing.map((c) => c.clause)).toContain("IS 800:2007 cl. 10.2.2"); // minimum spacing 2.5 d = 50 mm > 45 mm
    // The strength utilisation is the load over the joint strength: 620 kN / 727.37 kN (the check's JSON).
    const json = state.check!.json as { factoredTension_kN: number; jointStrength_kN: number };
    expect(s.strengthUtilisation).toBeCloseTo(json.factoredTension_kN / json.jointStrength_kN, 3);
  });
});

describe("bad input gives the CLI's own message at a field", () => {
  const dir = join(ROOT, "test", "fixtures", "bad");
  const files = readdirSync(dir).filter((f) => f.endsWith(".yaml")).sort();

  /** A fixture's "# command:" line: the command and its options (the file goes after the command's name). */
  const commandOf = (text: string): string[] => {
    const m = /^# command: (\S+)(.*)$/m.exec(text.split("\n").slice(0, 3).join("\n"));
    return m ? [m[1]!, ...m[2]!.trim().split(/\s+/).filter(Boolean)] : ["check"];
  };
  const checkFiles = files.filter((f) => commandOf(readFileSync(join(dir, f), "utf8"))[0] === "check");
  const jobFiles = files.filter((f) => !checkFiles.includes(f));

  it.each(jobFiles)("%s: the file opens, and the job the page runs refuses it with the CLI's line", async (file) => {
    const text = readFileSync(join(dir, file), "utf8");
    const [command, ...options] = commandOf(text);
    const r = await cliRun([command!, join(dir, file), ...options]);
    expect(r.code).toBe(2);
    const state = new Session().open(text, file);
    expect(state.problem, file).toBeUndefined();
    const { scenario, code } = parseScenario(text);
    const costs = costTableFor(readFileSync(join(ROOT, "catalogue", "costs.yaml"), "utf8"), "catalogue/costs.yaml", scenario.costs);
    const value = (name: string) => options[options.indexOf(name) + 1];
    let refused: unknown;
    try {
      if (command === "search") {
        // --top and --max-candidates are the CLI's options: the page's search has its own bounded top and the default limit.
        if (options.length > 0) return expect(options[0]).toMatch(/^--(top|max-candidates)$/);
        searchLayouts({ scenario, code, costs }, { top: 5 });
      } else {
        compareRequest(scenario, code, { classes: value("--classes"), sizes: value("--sizes") }, costs, () => "");
      }
    } catch (e) {
      refused = e;
    }
    expect(refused, file).toBeInstanceOf(Error);
    expect(`splicewright: error: ${problemOf(refused).message}`).toBe(r.stderr.trim());
  });

  it.each(checkFiles)("%s", async (file) => {
    const text = readFileSync(join(dir, file), "utf8");
    const r = await cliRun(["check", join(dir, file)]);
    const line = r.stderr.trim();
    expect(r.code).toBe(2);
    let problem;
    try {
      problem = new Session().open(text, file).problem;
    } catch (e) {
      problem = problemOf(e);
    }
    expect(problem, file).toBeDefined();
    expect(`splicewright: error: ${problem!.message}`).toBe(line);
    // Where the form shows it: a field, the first field of the section named, or the banner above the
    // form: file-level problems, YAML syntax, and a field the form has no control for (it offers to remove it).
    const unknown = / unknown field /.test(line);
    expect(unknown ? fieldOfPath(problem!.kind === "input" ? problem!.path : "") : undefined).toBeUndefined();
    if (problem!.kind === "input" && problem!.path && !unknown && !/^line \d+/.test(problem!.path) && !problem!.path.startsWith("/")) {
      const placed = fieldOfPath(problem!.path) ?? FIELDS.find((f) => fieldKey(f.path).startsWith(`${problem!.path}.`));
      expect(placed, `${file}: ${problem!.path}`).toBeDefined();
    }
  });

  it("a value typed into a field gives the message the CLI gives for the same value in the file", async () => {
    const text = readFileSync(scenarioPath("footbridge-tie.yaml"), "utf8");
    for (const [path, typed, yamlLine] of [
      [["plates", "main", "width"], "-5", "    width: -5"],
      [["plates", "main", "thickness"], "16 mmm", "    thickness: 16 mmm"],
      [["layout", "across"], "2.5", "  across: 2.5"],
    ] as Array<[string[], string, string]>) {
      const field = FIELDS.find((f) => fieldKey(f.path) === path.join("."))!;
      const session = new Session();
      session.open(text, "footbridge-tie.yaml");
      const state = session.edit([{ path, value: valueOfInput(field, typed) }]);
      const file = tempScenario(replaceFirst(text, path, yamlLine)!);
      const r = await cliRun(["check", file]);
      expect(`splicewright: error: ${state.problem!.message}`).toBe(r.stderr.trim());
      expect(state.problem!.kind === "input" && state.problem!.path).toBe(path.join("."));
    }
  });
});

/** The file with the first line of the leaf under its parent section replaced. */
function replaceFirst(text: string, path: string[], line: string): string | null {
  const lines = text.split("\n");
  const parent = path.length > 1 ? path[path.length - 2]! : null;
  const leaf = path[path.length - 1]!;
  let inside = parent === null;
  for (let i = 0; i < lines.length; i++) {
    const l = lines[i]!;
    if (parent !== null && new RegExp(`^\\s*${parent}:`).test(l)) inside = true;
    else if (inside && new RegExp(`^\\s*${leaf}:`).test(l)) {
      lines[i] = line;
      return lines.join("\n");
    }
  }
  return null;
}

describe("file names and dates are the CLI's", () => {
  it("the stem of a file name is Node's basename without its extension", () => {
    for (const p of ["footbridge-tie.yaml", "dir/a.b.yaml", "/tmp/x/tie", ".yaml", "..a", "a.", "dir/", "a.yaml/", "x/.hidden.yml", "tie.YAML", "a..b", "...", "c:\\w\\t.yaml"]) {
      expect(fileStem(p), p).toBe(basename(p, extname(p)));
    }
    expect(exportBase("scenarios/footbridge-tie-search.yaml", 2)).toBe("footbridge-tie-search-rank2");
  });

  it("SOURCE_DATE_EPOCH names the date; anything but whole seconds is today", () => {
    expect(exportDate("0", new Date("2030-01-01T00:00:00Z"))).toBe("1970-01-01");
    expect(exportDate("86399", new Date())).toBe("1970-01-01");
    expect(exportDate("86400", new Date())).toBe("1970-01-02");
    expect(exportDate("soon", new Date("2030-06-01T12:00:00Z"))).toBe("2030-06-01");
    expect(exportDate(undefined, new Date("2030-06-01T23:59:59Z"))).toBe("2030-06-01");
  });
});
