/**
 * `splicewright search` as a user runs it: the ranked table, JSON, --save round trip through `check`,
 * "nothing complies" with its reason, and bad options.
 */
import { readFileSync } from "node:fs";
import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { cli, scenarioPath, tempScenario } from "./helpers/cli.js";

const demo = scenarioPath("footbridge-tie-search.yaml");

describe("splicewright search", () => {
  const json = JSON.parse(cli(["search", demo, "--json"]).stdout);

  it("shows the best 10 arrangements by cost with the declared space and the proof statement", () => {
    const r = cli(["search", demo]);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain("Search space (declared):");
    expect(r.stdout).toContain("Best 10 arrangements (the best layout of each; --variants shows every variant) by cost");
    expect(r.stdout).toMatch(/Proven over the declared space above: the best layout of each distinct arrangement/);
    expect(r.stdout).toContain("qualified engineer");
  });

  it("JSON rows carry size, class, pattern, counts, dimensions, bolts, length, strength, efficiency, both utilisations, the rules, cost", () => {
    expect(json.results).toHaveLength(10);
    expect(json.proven).toBe(true);
    expect(json.rows).toBe("best of each arrangement");
    for (const row of json.results) {
      for (const k of ["bolt", "pattern", "counts", "endDistance_mm", "edgeDistance_mm", "bolts", "spliceLength_mm", "jointStrength_kN", "efficiency", "strengthUtilisation", "serviceUtilisation", "detailing", "cost"]) expect(row).toHaveProperty(k);
      expect(row).not.toHaveProperty("utilisation");
      expect(row.jointStrength_kN).toBeGreaterThanOrEqual(620);
      // Strength utilisation = T / joint design strength, T = 620 kN (the demo's factored tension).
      expect(row.strengthUtilisation).toBeCloseTo(620 / row.jointStrength_kN, 3);
      expect(row.serviceUtilisation).toBeNull();
      expect(row.detailing.allPass).toBe(true);
    }
    const costs = json.results.map((r: { cost: number }) => r.cost);
    expect([...costs].sort((a, b) => a - b)).toEqual(costs);
  });

  it.each([1, 2, 5])("--save --rank %i writes a scenario that check passes with the same strength", (rank) => {
    const dir = mkdtempSync(join(tmpdir(), "splicewright-save-"));
    const file = join(dir, "chosen.yaml");
    const s = cli(["search", demo, "--save", file, "--rank", String(rank), "--top", "5", "--json"]);
    expect(s.code).toBe(0);
    const row = JSON.parse(s.stdout).results[rank - 1];
    const c = cli(["check", file, "--json"]);
    expect(c.code).toBe(0);
    const report = JSON.parse(c.stdout);
    expect(report.pass).toBe(true);
    expect(report.jointStrength_kN).toBeCloseTo(row.jointStrength_kN, 2);
    expect(report.efficiency).toBeCloseTo(row.efficiency, 3);
    expect(report.bolt.count).toBe(row.bolts);
    // The layout is found: the saved scenario (and every sheet made from it) drops "(layout to be found)".
    const saved = readFileSync(file, "utf8");
    expect(saved).toMatch(/^name: Footbridge FB-2 bottom tie, mid-span splice T1$/m);
    expect(saved).not.toMatch(/layout to be found/);
  });

  it("--save refuses to overwrite without --force and leaves the file as it was", () => {
    const file = tempScenario("keep me\n", "existing.yaml");
    const r = cli(["search", demo, "--save", file, "--top", "1"]);
    expect(r.code).toBe(2);
    expect(r.stderr.trim()).toMatch(/already exists \(use --force to overwrite\)/);
    expect(readFileSync(file, "utf8")).toBe("keep me\n");
    expect(cli(["search", demo, "--save", file, "--top", "1", "--force"]).code).toBe(0);
    expect(readFileSync(file, "utf8")).toContain("layout:");
  });

  it("--rank-by bolts orders by bolt count", () => {
    const r = JSON.parse(cli(["search", demo, "--rank-by", "bolts", "--top", "5", "--json"]).stdout);
    const bolts = r.results.map((x: { bolts: number }) => x.bolts);
    expect([...bolts].sort((a, b) => a - b)).toEqual(bolts);
  });

  it("piped, every line but the table's keeps to 100 columns", () => {
    const r = cli(["search", demo, "--top", "3"]);
    expect(r.code).toBe(0);
    const prose = r.stdout.split("\n").filter((l) => !/^[┌│├└]/.test(l));
    expect(prose.length).toBeGreaterThan(20);
    for (const l of prose) expect(Array.from(l).length, l).toBeLessThanOrEqual(100);
  });

  it("nothing complies: the load beyond the unperforated plate → exit 1 and the reason", () => {
    const text = readFileSync(demo, "utf8").replace("factored_tension: 620 kN", "factored_tension: 900 kN");
    const r = cli(["search", tempScenario(text)]);
    expect(r.code).toBe(1);
    // Unperforated 220 × 16 E250: min(3520 × 250/1.1, 0.9 × 3520 × 410/1.25) = 800.0 kN (IS 800:2007 cl. 6.2, 6.3.1)
    // The reason wraps to the output width: read it with its line breaks as spaces.
    expect(r.stdout.replace(/\s+/g, " ")).toMatch(/exceeds the design strength of the unperforated main plate, 800\.0 kN/);
  });

  it("nothing complies within a small space: the rule that eliminated the last candidates is named", () => {
    const text = readFileSync(demo, "utf8")
      .replace("sizes: [M16, M20, M22, M24, M27, M30]", "sizes: [M16]")
      .replace('classes: ["4.6", "5.6", "8.8", "10.9"]', 'classes: ["4.6"]')
      .replace("max_along: 8", "max_along: 2");
    const r = cli(["search", tempScenario(text)]);
    expect(r.code).toBe(1);
    expect(r.stdout).toMatch(/No compliant layout: no layout in the declared space passes every check \(/);
  });

  it("nothing complies because of the minimum design action: the reason gives the condition, its clause and its figure", () => {
    const text = [
      "name: light lap",
      "code: is800-2007",
      "splice: { type: lap }",
      "plates:",
      "  main: { width: 200, thickness: 12, grade: E250, edges: sawn }",
      "load: { factored_tension: 20 kN }",
      'search: { sizes: [12], classes: ["4.6"], max_along: 1, patterns: [grid] }',
    ].join("\n");
    const r = cli(["search", tempScenario(text)]);
    expect(r.code).toBe(1);
    // 0.3 × min(2400 × 250/1.10, 0.9 × 2400 × 410/1.25) = 0.3 × 545.45 = 163.6 kN (IS 800:2007 cl. 10.7, from memory; cl. 6.2, 6.3.1)
    expect(r.stdout.replace(/\s+/g, " ")).toMatch(/ruled out by the minimum design action on the connection \(IS 800:2007 cl\. 10\.7: 163\.6 kN\) bound/);
  });

  it("a load below the minimum design action: the search says the condition sets the least strength, and every row reaches it", () => {
    const text = readFileSync(demo, "utf8").replace("factored_tension: 620 kN", "factored_tension: 100 kN");
    const file = tempScenario(text);
    const r = cli(["search", file]);
    expect(r.code).toBe(0);
    // 0.3 × min(220 × 16 × 250/1.10, 0.9 × 3520 × 410/1.25) = 0.3 × 800.0 = 240.0 kN (IS 800:2007 cl. 10.7, from memory; cl. 6.2, 6.3.1)
    expect(r.stdout.replace(/\s+/g, " ")).toContain("Note: every layout must also reach the minimum design action on the connection (IS 800:2007 cl. 10.7: 240.0 kN), above the load");
    const json = JSON.parse(cli(["search", file, "--json"]).stdout);
    expect(json.minimumDesignAction).toMatch(/240\.0 kN/);
    for (const row of json.results) expect(row.jointStrength_kN).toBeGreaterThanOrEqual(240);
  });

  it("bad options exit 2 with one line", () => {
    const r = cli(["search", demo, "--rank-by", "beauty"]);
    expect(r.code).toBe(2);
    expect(cli(["search", demo, "--top", "0"]).code).toBe(2);
  });

  it("works on a scenario that already has a layout (search ignores it) and on every bundled demo", () => {
    for (const f of ["footbridge-tie.yaml", "mezzanine-hanger.yaml", "truss-chord-staggered.yaml"]) {
      const r = cli(["search", scenarioPath(f), "--top", "3", "--json"]);
      expect(r.code, f).toBe(0);
      expect(JSON.parse(r.stdout).results.length).toBe(3);
    }
  });
});


describe("search in US units with inch bolts (AISC 360-16)", () => {
  const us = scenarioPath("canopy-tie-us-search.yaml");

  it("searches inch A325/A490 bolts, prints inches and kips, and --save round-trips through check", () => {
    const dir = mkdtempSync(join(tmpdir(), "splicewright-us-"));
    const file = join(dir, "chosen.yaml");
    const r = cli(["search", us, "--top", "3", "--save", file]);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/bolt sizes: 5\/8 in, 3\/4 in, 7\/8 in, 1 in/);
    expect(r.stdout).toMatch(/Strength kips/);
    expect(r.stdout).toMatch(/│ 1 │ (5\/8|3\/4|7\/8|1) in A(325|490) /);
    const j = JSON.parse(cli(["search", us, "--top", "1", "--json"]).stdout);
    const c = JSON.parse(cli(["check", file, "--json"]).stdout);
    expect(c.pass).toBe(true);
    expect(c.jointStrength_kN).toBeCloseTo(j.results[0].jointStrength_kN, 2);
    expect(readFileSync(file, "utf8")).toMatch(/class: A(325|490)/);
  });
});

describe("search of a US customary scenario speaks inches and ASTM grades", () => {
  it("the declared space is stated in inches with the ASTM F3125 grades (AISC 360-16 J3.1), with no mm anywhere", () => {
    const r = cli(["search", scenarioPath("canopy-tie-us-search.yaml")]);
    expect(r.code).toBe(0);
    // The demo declares a 1/4 in step and 5/16, 3/8, 1/2 in cover plates; A325/A490 are the F3125 grades of 8.8/10.9 strength (AISC 360-16 Table J3.2).
    expect(r.stdout).toContain("dimensions on a 0.25 in step");
    expect(r.stdout).toMatch(/bolt grades \(ASTM F3125 \/ A307\): A325, A490/);
    expect(r.stdout).not.toMatch(/property classes/);
    expect(r.stdout).not.toMatch(/\d\s?mm\b|\(mm\)/);
  });
});

describe("search under load reversal words the utilisation for both senses", () => {
  it("the footnote does not call the demand factored tension", () => {
    const r = cli(["search", scenarioPath("truss-top-chord-reversal.yaml")]);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain("strength utilisation = the highest demand/resistance of either sense of the load");
  });
});
