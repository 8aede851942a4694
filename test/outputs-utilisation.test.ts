/**
 * Every output gives the strength utilisation (factored tension / joint design strength) and, apart
 * from it, the state of the detailing rules — never one number for both: check (sheet and JSON),
 * search (table and JSON), compare, schedule (table, CSV, JSON), the drawing's title block, the export
 * JSON and the HTML report. Internal check ids never reach a user-facing table or CSV.
 * The test splice is the mezzanine hanger with its end distance at the minimum 1.5 d0 = 27 mm (IS 800:2007
 * cl. 10.2.4.2, M16 in 18 mm holes, Table 19): the rule sits at its limit (the old mixed figure read
 * 1.00) while the strength utilisation is 150 / 173.85 = 0.863 (bolt shear, cl. 10.3.3:
 * 6 × 400/√3 × 0.78 × π × 16²/4 / 1.25 = 173.85 kN).
 */
import { mkdtempSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { stringify } from "yaml";
import { describe, expect, it } from "vitest";
import { cli, scenarioPath, tempScenario } from "./helpers/cli.js";

const AT_LIMIT = tempScenario(readFileSync(scenarioPath("mezzanine-hanger.yaml"), "utf8").replace("end_distance: 35", "end_distance: 27"), "hanger.yaml");
const U = 150 / ((6 * (400 / Math.sqrt(3)) * 0.78 * Math.PI * 64) / 1.25 / 1000);
const SEARCH = scenarioPath("footbridge-tie-search.yaml");
/** An internal check id such as "bearing:mainA:J" or "net-section:cover1". */
const CHECK_ID = /\b(bolt-shear|bearing|slip|net-section|gross-yield|block-shear|min-[a-z-]+|max-[a-z-]+|grip-length|group-centroid):[A-Za-z]/;

describe("check", () => {
  it("the sheet prints the strength utilisation and the rule at its limit, and no mixed figure", () => {
    const r = cli(["check", AT_LIMIT]);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(new RegExp(`Strength utilisation: +${U.toFixed(3)} = T / joint design strength`));
    expect(r.stdout).toMatch(/Service utilisation: +none: bearing type bolts have no service slip check/);
    expect(r.stdout).toMatch(/tightest: Minimum end distance, .*27 mm ≥ 27 mm, at\s+the limit/s);
    expect(r.stdout).not.toMatch(/Highest utilisation|Util\./);
  });

  it("the JSON carries strengthUtilisation, serviceUtilisation and the detailing state, with their definitions", () => {
    const j = JSON.parse(cli(["check", AT_LIMIT, "--json"]).stdout);
    expect(j.strengthUtilisation).toBeCloseTo(U, 4);
    expect(j.serviceUtilisation).toBeNull();
    expect(j.detailing.allPass).toBe(true);
    expect(j.detailing.tightest).toMatchObject({ id: "min-end-distance", value_mm: 27, limit_mm: 27, margin_mm: 0 });
    expect(j).not.toHaveProperty("maxUtilisation");
    expect(j.summary.definitions.strengthUtilisation).toMatch(/factored tension \/ joint design strength/);
    expect(j.checks.length).toBeGreaterThan(10); // every check, twins included
  });
});

describe("drawing, export JSON and report", () => {
  const dir = mkdtempSync(join(tmpdir(), "splicewright-util-"));
  const out = cli(["export", AT_LIMIT, "--format", "svg,json", "--out", dir]);
  const report = join(dir, "hanger.html");
  const rep = cli(["report", AT_LIMIT, "--out", report]);

  it("the title block's strength field gives the strength utilisation and the rules, not the mixed figure", () => {
    expect(out.code).toBe(0);
    const svg = readFileSync(join(dir, "hanger.svg"), "utf8");
    const field = /data-field="Joint strength">([^<]*)</.exec(svg)![1]!;
    expect(field).toContain(`strength utilisation ${U.toFixed(2)}`);
    expect(field).toContain("rules all pass");
    expect(field).not.toMatch(/utilisation 1\.00/);
  });

  it("the export JSON's result carries both", () => {
    const j = JSON.parse(readFileSync(join(dir, "hanger.json"), "utf8"));
    expect(j.result.strengthUtilisation).toBeCloseTo(U, 4);
    expect(j.result.detailing.allPass).toBe(true);
    expect(j.result).not.toHaveProperty("maxUtilisation");
  });

  it("the HTML report: the summary and the result section give both; rules show their margin, not a utilisation", () => {
    expect(rep.code).toBe(0);
    const html = readFileSync(report, "utf8");
    expect(html).toMatch(new RegExp(`data-row="strength-utilisation"><td>Strength utilisation</td><td>${U.toFixed(3)} = T / joint design strength`));
    expect(html).toContain('data-row="detailing"');
    expect(html).toMatch(/<span class="margin">at the limit<\/span>/);
    expect(html).not.toContain("Highest utilisation");
    expect(html.indexOf('id="summary"')).toBeLessThan(html.indexOf('id="inputs"')); // page 1 carries the summary; the inputs follow
  });
});

describe("search and compare", () => {
  it("search: table and JSON rows carry the strength utilisation and the tightest rule; the efficiency basis is printed", () => {
    const t = cli(["search", SEARCH, "--top", "3"]).stdout;
    const j = JSON.parse(cli(["search", SEARCH, "--top", "3", "--json"]).stdout);
    expect(t).toContain("Str. util.");
    expect(t).toContain("Tightest rule (all pass)");
    expect(t).not.toMatch(/│ Util\. /);
    // Notes wrap to the output width: read them with line breaks as spaces.
    expect(t.replace(/\s+/g, " ")).toMatch(/Eff\.: efficiency = joint design strength \/ design tension strength of the unperforated thinner main plate, basis lesser/);
    expect(j.efficiencyBasis).toBe("lesser");
    for (const row of j.results) {
      expect(row.strengthUtilisation).toBeCloseTo(620 / row.jointStrength_kN, 3);
      expect(t).toContain(`│ ${row.strengthUtilisation.toFixed(2)} `);
      expect(t).toContain(row.tightestRule);
      expect(row.governingCheck.title.length).toBeGreaterThan(0);
    }
    expect(t).not.toMatch(CHECK_ID);
  });

  it("compare: rows for the strength utilisation and the detailing rules, the governing check by title and component, the basis", () => {
    const r = cli(["compare", SEARCH, "--classes", "8.8,10.9"]);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/│ Strength utilisation +│ 0\.\d\d /);
    expect(r.stdout).toMatch(/│ Detailing rules +│ all pass; /);
    expect(r.stdout).toContain("basis lesser");
    expect(r.stdout).not.toMatch(CHECK_ID);
    const j = JSON.parse(cli(["compare", SEARCH, "--classes", "8.8,10.9", "--json"]).stdout);
    for (const c of j.columns) expect(c.best.strengthUtilisation).toBeCloseTo(620 / c.best.jointStrength_kN, 3);
    expect(j.efficiencyBasis).toBe("lesser");
  });
});

describe("schedule: description, plates, load, cover thickness, both figures; no internal ids", () => {
  const project = {
    project: "Small test job (invented)",
    code: "is800-2007",
    search: { sizes: ["M16", "M20"], classes: ["8.8"], step: 10, max_along: 3 },
    splices: [
      { id: "A", description: "invented bracing flat", splice: { type: "lap" }, plates: { main: { width: 100, thickness: 10, grade: "E250" } }, load: { factored_tension: 100 } },
      { id: "C", description: "invented chord splice", splice: { type: "butt-double-cover" }, plates: { main: { width: 160, thickness: 12, grade: "E250" }, cover: { width: 160, thickness: 8, grade: "E250" } }, load: { factored_tension: 260 } },
    ],
  };
  const file = tempScenario(stringify(project), "job.yaml");
  const dir = mkdtempSync(join(tmpdir(), "splicewright-schedule-util-"));
  const table = cli(["schedule", file, "--workers", "0", "--out", dir]);

  it("the table", () => {
    expect(table.code, table.stderr).toBe(0);
    for (const head of ["Description", "Plates", "T kN", "Cover t", "Str. util.", "Tightest rule (all pass)"]) expect(table.stdout).toContain(head);
    expect(table.stdout).toContain("invented chord splice");
    expect(table.stdout).toContain("160 × 12 E250; 2 covers 160 × 8 E250");
    expect(table.stdout).toContain("260.0");
    expect(table.stdout).not.toMatch(/│ Util\. /);
    expect(table.stdout.replace(/\s+/g, " ")).toMatch(/Eff\.: efficiency = .*basis lesser/);
    expect(table.stdout).not.toMatch(CHECK_ID);
  });

  it("the CSV: the new columns, the governing check by title and component, and no internal id", () => {
    const csv = readFileSync(join(dir, "job-schedule.csv"), "utf8");
    expect(csv).not.toMatch(CHECK_ID);
    const lines = csv.replace(/^\ufeff/, "").trim().split("\r\n");
    const head = lines.find((l) => l.startsWith("id,"))!.split(",");
    for (const k of ["description", "plates", "factored_tension_kN", "cover_thickness_mm", "joint_strength_kN", "strength_utilisation", "service_utilisation", "detailing", "governing_check"]) expect(head).toContain(k);
    const rowC = lines.find((l) => l.startsWith("C,"))!;
    expect(rowC).toContain("invented chord splice");
    expect(rowC).toMatch(/,260,/);
  });

  it("the JSON", () => {
    const j = JSON.parse(readFileSync(join(dir, "job-schedule.json"), "utf8"));
    for (const s of j.splices) {
      expect(s.layout.strengthUtilisation).toBeCloseTo(s.factoredTension_kN / s.layout.jointStrength_kN, 3);
      expect(s.layout.detailing.allPass).toBe(true);
      expect(typeof s.plates).toBe("string");
    }
    expect(j.definitions.strengthUtilisation).toMatch(/factored tension/);
  });
});
