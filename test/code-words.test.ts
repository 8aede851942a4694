/**
 * Every output of each demo speaks its own code's words and names its own code's assembly standards,
 * and no other code's (issue 17). The references outside the project:
 *   - EN 1993-1-8:2005, 3.4.1: Categories A (bearing type), B (slip-resistant at serviceability),
 *     C (slip-resistant at ultimate); 3.1.2: preloaded bolts; EN 15048 (non-preloaded assemblies) and
 *     EN 14399 (preloaded systems) are the product standards it refers to (1.2.4, 3.1.2);
 *   - AISC 360-16, J3.1 (snug-tight, pretensioned), J3.8 (slip-critical connections), Table J3.2
 *     (threads not excluded / excluded from the shear planes; the N / X designations, e.g. A325-N, are
 *     common practice); J3.1 names ASTM F3125 bolts, A563 nuts, F436 washers;
 *   - IS 800:2007, cl. 10.3 (bearing type bolts), cl. 10.4 (high strength friction grip bolts, HSFG);
 *     IS 3757 / IS 6623 / IS 6649 the Indian HSFG bolt, nut and washer standards.
 * The CLI's main runs in this process (as bin/splicewright.js runs it) to spare Node start-ups.
 */
import { mkdtempSync, readdirSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { main } from "../src/cli/main.js";
import { parseScenario } from "../src/io/scenario.js";
import { assemblyOf } from "../src/export/bolt-list.js";
import type { CheckableScenario } from "../src/model/scenario.js";
import { cliAsync, scenarioPath } from "./helpers/cli.js";

async function run(args: string[]): Promise<{ code: number; stdout: string; stderr: string }> {
  const out: string[] = [];
  const err: string[] = [];
  const code = await main(["node", "splicewright", ...args], { out: (t) => out.push(t), err: (t) => err.push(t) });
  return { code, stdout: out.join("\n"), stderr: err.join("\n") };
}

/** Words and standards that belong to one code only (see the header for their clauses). */
const OWN = {
  is: /IS 3757|IS 6623|IS 6649|IS 1364|HSFG|friction grip|bearing type bolts/,
  en: /EN 14399|EN 15048|Category [ABC]|preloaded|[Pp]reloadable/,
  aisc: /F3125|A563|F436|slip-critical|snug-tight|pretensioned|threads (included in|excluded from) the shear planes \([NX]\)/,
} as const;
type Family = keyof typeof OWN;
const FOREIGN = (own: Family): RegExp[] => (Object.keys(OWN) as Family[]).filter((k) => k !== own).map((k) => OWN[k]);

/** Every output a demo produces today: check, --brief, --json, export (all formats), report. */
async function outputsOf(file: string, withDrawings: boolean): Promise<Array<[string, string]>> {
  const outs: Array<[string, string]> = [];
  for (const args of [["check"], ["check", "--brief"], ["check", "--json"]]) {
    const r = await run([...args, scenarioPath(file)]);
    expect(r.code, `${args.join(" ")} ${file}: ${r.stderr}`).toBeLessThan(2);
    outs.push([`${args.join(" ")} ${file}`, r.stdout + r.stderr]);
  }
  if (withDrawings) {
    const dir = mkdtempSync(join(tmpdir(), "splicewright-words-"));
    const e = await run(["export", scenarioPath(file), "--format", "all", "--out", dir]);
    expect(e.code, e.stderr).toBeLessThan(2);
    const r = await run(["report", scenarioPath(file), "--out", join(dir, "report.html")]);
    expect(r.code, r.stderr).toBeLessThan(2);
    for (const f of readdirSync(dir).sort()) outs.push([`${file} → ${f}`, readFileSync(join(dir, f), "utf8")]);
  }
  return outs;
}

async function searchOutputs(file: string): Promise<Array<[string, string]>> {
  const outs: Array<[string, string]> = [];
  for (const args of [["search"], ["search", "--json"]]) {
    const r = await run([...args, scenarioPath(file)]);
    expect(r.code, r.stderr).toBe(0);
    outs.push([`${args.join(" ")} ${file}`, r.stdout]);
  }
  return outs;
}

function expectOnly(own: Family, outs: Array<[string, string]>): void {
  for (const [name, text] of outs) for (const re of FOREIGN(own)) expect(text, `${name} carries another code's words (${re})`).not.toMatch(re);
}

describe("IS 800 demos: IS words and assemblies only", () => {
  it.each(["footbridge-tie.yaml", "mezzanine-hanger.yaml", "truss-chord-staggered.yaml"])("%s: check, brief, JSON, SVG, DXF, CSV, JSON export, report", async (file) => {
    const outs = await outputsOf(file, true);
    expectOnly("is", outs);
    // IS 800:2007 cl. 10.3 / 10.4: the sheet names the bolt type in IS 800's words.
    expect(outs[0]![1]).toMatch(file.startsWith("truss") ? /HSFG \(friction grip\), μf 0\.48, slip at service load/ : /, bearing type, threads in the shear planes/);
    const bom = outs.find(([n]) => n.endsWith("-bom.csv"))![1];
    expect(bom).toMatch(file.startsWith("truss") ? /IS 3757/ : /IS 1364/);
  }, 60_000);
  it("footbridge-tie-search.yaml: search table and JSON", async () => {
    const outs = await searchOutputs("footbridge-tie-search.yaml");
    expectOnly("is", outs);
    expect(outs[0]![1]).toMatch(/property classes: .*\(bearing type\)/);
  }, 60_000);
  it("warehouse-roof-project.yaml: schedule table, JSON and the schedule and order CSVs", async () => {
    const dir = mkdtempSync(join(tmpdir(), "splicewright-words-schedule-"));
    // The schedule's search workers are built modules: the built CLI runs it (as a user does).
    const r = await cliAsync(["schedule", scenarioPath("warehouse-roof-project.yaml"), "--max-types", "2", "--out", dir]);
    expect(r.code, r.stderr).toBe(0);
    const outs: Array<[string, string]> = [["schedule", r.stdout]];
    for (const f of readdirSync(dir).sort()) outs.push([`schedule → ${f}`, readFileSync(join(dir, f), "utf8")]);
    expect(outs.length).toBeGreaterThanOrEqual(4);
    expectOnly("is", outs);
  }, 120_000);
  it("compare of property classes under IS 800 (one code)", async () => {
    const r = await run(["compare", scenarioPath("footbridge-tie.yaml"), "--classes", "8.8,10.9"]);
    expect(r.code, r.stderr).toBe(0);
    expectOnly("is", [["compare", r.stdout]]);
    expect(r.stdout).toMatch(/IS 1364/);
  }, 60_000);
});

describe("EN 1993-1-8 demos: EN words and assemblies only", () => {
  it("sports-hall-chord-ec3.yaml: check, brief, JSON, SVG, DXF, CSV, JSON export, report", async () => {
    const outs = await outputsOf("sports-hall-chord-ec3.yaml", true);
    expectOnly("en", outs);
    // EN 1993-1-8 3.4.1 (Category A) and Table 3.4 (shear plane through the threaded portion).
    expect(outs[0]![1]).toMatch(/Category A: bearing type, shear planes through the threaded portion/);
    expect(outs.find(([n]) => n.endsWith("-bom.csv"))![1]).toMatch(/EN 15048/);
  }, 60_000);
  it("sports-hall-chord-ec3-search.yaml: search table and JSON", async () => {
    const outs = await searchOutputs("sports-hall-chord-ec3-search.yaml");
    expectOnly("en", outs);
    expect(outs[0]![1]).toMatch(/property classes: .*\(Category A, bearing type\)/);
  }, 60_000);
});

describe("AISC 360-16 demos: AISC words and ASTM assemblies only", () => {
  it("canopy-tie-us.yaml: check, brief, JSON, drawing, DXF, CSV, export JSON and report", async () => {
    const outs = await outputsOf("canopy-tie-us.yaml", true);
    expectOnly("aisc", outs);
    // AISC 360-16 Table J3.2: threads not excluded from the shear planes, the N designation (common practice).
    expect(outs[0]![1]).toMatch(/bearing-type, snug-tight, threads included in the shear planes \(N\)/);
  }, 60_000);
  it("canopy-tie-us-search.yaml: search table and JSON", async () => {
    const outs = await searchOutputs("canopy-tie-us-search.yaml");
    expectOnly("aisc", outs);
    expect(outs[0]![1]).toMatch(/\(bearing-type\)/);
  }, 60_000);
});

describe("compare across codes: each column in its own code's words and assemblies; the caveat stays", () => {
  it("sports hall chord under IS 800, EN 1993-1-8 and AISC 360-16", async () => {
    const args = ["compare", scenarioPath("sports-hall-chord-ec3.yaml"), "--codes", "is800,en1993,aisc360"];
    const json = JSON.parse((await run([...args, "--json"])).stdout) as { columns: Array<{ code: string; best: { boltType: string } | null; assembly: { bolt: string; nut: string; washer: string } | null }>; mappingCaveat: string };
    const family = (id: string): Family => (id.startsWith("en") ? "en" : id.startsWith("aisc") ? "aisc" : "is");
    expect(json.columns.map((c) => c.code)).toEqual(["is800-2007", "en1993-1-8", "aisc360-16"]);
    for (const c of json.columns) {
      expect(c.best, c.code).not.toBeNull();
      const cell = JSON.stringify({ boltType: c.best!.boltType, assembly: c.assembly });
      for (const re of FOREIGN(family(c.code))) expect(cell, `${c.code} column`).not.toMatch(re);
    }
    expect(json.columns[0]!.best!.boltType).toBe("bearing type");
    expect(json.columns[1]!.best!.boltType).toBe("Category A: bearing type");
    expect(json.columns[1]!.assembly!.bolt).toMatch(/EN 15048/);
    expect(json.columns[2]!.best!.boltType).toBe("bearing-type, snug-tight");
    expect(json.mappingCaveat).toMatch(/nearest equivalents/);
    const text = (await run(args)).stdout;
    expect(text).toMatch(/Mapping of materials between codes \(nearest equivalents/);
    expect(text).toMatch(/Bolt type/);
  }, 120_000);
});

describe("the code's own words as input: one internal meaning", () => {
  const en = readFileSync(scenarioPath("sports-hall-chord-ec3.yaml"), "utf8").replace(/factored_tension: (.*)/, "factored_tension: $1\n  service_tension: 600 kN");
  const us = readFileSync(scenarioPath("canopy-tie-us.yaml"), "utf8").replace(/ +threads_in_shear_planes: .*\n/, "");
  const is = readFileSync(scenarioPath("footbridge-tie.yaml"), "utf8");
  const bolts = (text: string) => parseScenario(text).scenario.bolts!;
  const withBolts = (text: string, extra: string) => text.replace(/( +)type: bearing.*\n/, (_m, sp: string) => extra.split("\n").map((l) => `${sp}${l}\n`).join(""));
  const error = (text: string) => {
    try {
      parseScenario(text);
    } catch (e) {
      return (e as Error).message;
    }
    return "";
  };

  it("EN 1993-1-8 3.4.1: category B is friction-grip with slip at service, C at ultimate, A bearing type — as the shared spelling", () => {
    expect(bolts(withBolts(en, "category: B\nslip_factor: 0.4"))).toEqual(bolts(withBolts(en, "type: friction-grip\nslip_at: service\nslip_factor: 0.4")));
    expect(bolts(withBolts(en, "category: C\nslip_factor: 0.4"))).toEqual(bolts(withBolts(en, "type: friction-grip\nslip_at: ultimate\nslip_factor: 0.4")));
    expect(bolts(withBolts(en, "category: A"))).toEqual(bolts(withBolts(en, "type: bearing")));
    expect(bolts(withBolts(en, "preloaded: true\nslip_factor: 0.4"))).toEqual(bolts(withBolts(en, "type: friction-grip\nslip_factor: 0.4")));
  });
  it("EN 1993-1-8 3.1.2 / 3.4.1: Category A with preloaded bolts keeps the bearing checks and takes the EN 14399 assembly", () => {
    const p = parseScenario(withBolts(en, "category: A\npreloaded: true"));
    expect(p.scenario.bolts!.assembly).toBe("bearing");
    expect(assemblyOf(p.scenario as CheckableScenario).boltStandard).toMatch(/EN 14399-3/);
    expect(error(withBolts(en, "category: B\npreloaded: false\nslip_factor: 0.4"))).toMatch(/^bolts\.preloaded: Category B needs preloaded bolts/);
    expect(error(withBolts(en, "category: B\ntype: bearing"))).toMatch(/^bolts\.category: disagrees with bolts\.type: bearing/);
    expect(error(withBolts(en.replace('class: "8.8"', 'class: "4.6"'), "category: A\npreloaded: true"))).toMatch(/^bolts\.class: preloaded bolts must be class 8\.8 or 10\.9/);
  });
  it("AISC 360-16 J3.1, J3.8, Table J3.2: joint slip-critical is friction-grip; threads X is threads excluded; pretensioned keeps bearing-type", () => {
    expect(bolts(withBolts(us, "joint: slip-critical\nslip_factor: 0.30"))).toEqual(bolts(withBolts(us, "type: friction-grip\nslip_factor: 0.30")));
    expect(bolts(withBolts(us, "threads: X")).threadsInShearPlanes).toBe(false);
    expect(bolts(withBolts(us, "joint: snug-tight\nthreads: N"))).toEqual(bolts(withBolts(us, "type: bearing")));
    const p = bolts(withBolts(us, "joint: pretensioned"));
    expect([p.assembly, p.preloaded]).toEqual(["bearing", true]);
    expect(error(withBolts(us, "threads: X\nthreads_in_shear_planes: true"))).toMatch(/^bolts\.threads: disagrees with bolts\.threads_in_shear_planes: true/);
  });
  it("a code's own words are refused under another code, naming the field", () => {
    expect(error(withBolts(is, "category: B"))).toMatch(/^bolts\.category: not read by is800-2007/);
    expect(error(withBolts(en, "joint: slip-critical"))).toMatch(/^bolts\.joint: not read by en1993-1-8/);
    expect(error(withBolts(us, "preloaded: true"))).toMatch(/^bolts\.preloaded: not read by aisc360-16/);
  });
});
