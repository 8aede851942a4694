/**
 * `compare`: every column is the ordinary search with that choice alone; the code mapping is printed;
 * unknown choices are one-line errors.
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { compareChoices } from "../src/compare/compare.js";
import { parseCostTable } from "../src/io/costs.js";
import { parseScenario } from "../src/io/scenario.js";
import { searchLayouts } from "../src/search/search.js";
import { cli, ROOT, scenarioPath, tempScenario } from "./helpers/cli.js";

const costs = parseCostTable(readFileSync(`${ROOT}/catalogue/costs.yaml`, "utf8"), "catalogue");
const demo = scenarioPath("footbridge-tie-search.yaml");

describe("compare by class and size", () => {
  const { scenario, code } = parseScenario(readFileSync(demo, "utf8"));

  it("a column equals search run with that class alone", () => {
    const columns = compareChoices(scenario, code, costs, ["4.6", "8.8", "10.9"], []);
    expect(columns.map((c) => c.label)).toEqual(["class 4.6", "class 8.8", "class 10.9"]);
    for (const [i, cls] of (["4.6", "8.8", "10.9"] as const).entries()) {
      const alone = searchLayouts({ scenario: { ...scenario, search: { ...scenario.search, classes: [cls] } }, code, costs }, { top: 1, rankBy: "cost" });
      expect(columns[i]!.best?.key).toEqual(alone.results[0]?.key);
    }
    const cheapest = Math.min(...columns.map((c) => c.best!.cost.total));
    for (const c of columns) expect(c.costDifference).toBeCloseTo(c.best!.cost.total - cheapest, 9);
  });

  it("classes × sizes give one column per pair, each the search with that pair alone", () => {
    const columns = compareChoices(scenario, code, costs, ["8.8"], [20, 24]);
    expect(columns.map((c) => c.label)).toEqual(["M20 class 8.8", "M24 class 8.8"]);
    const alone = searchLayouts({ scenario: { ...scenario, search: { ...scenario.search, classes: ["8.8"], sizes_mm: [24] } }, code, costs }, { top: 1, rankBy: "cost" });
    expect(columns[1]!.best?.key).toEqual(alone.results[0]?.key);
  });
});

describe("splicewright compare (CLI)", () => {
  it("prints one column per class with layout, bolts, length, efficiency, strength, cost, governing check and difference", () => {
    const r = cli(["compare", demo, "--classes", "4.6,8.8,10.9"]);
    expect(r.code).toBe(0);
    for (const row of ["Counts", "Bolt count", "Splice length", "Efficiency", "Joint strength", "Cost above cheapest", "Governing check"]) expect(r.stdout).toContain(row);
    expect(r.stdout).toContain("cheapest");
    expect(r.stdout).toContain("qualified engineer");
  });

  it("--json has one entry per column", () => {
    const j = JSON.parse(cli(["compare", demo, "--sizes", "M20,24", "--json"]).stdout);
    expect(j.columns.map((c: { label: string }) => c.label)).toEqual(["M20", "M24"]);
    expect(j.columns[0].best.bolt).toMatch(/^M20 /);
  });

  it.each([
    [["--classes", "7.7"], /--classes: unknown or not allowed property class "7.7"/],
    [["--sizes", "M17"], /--sizes: unknown bolt size "M17"/],
    [["--codes", "bs5950"], /--codes: unknown design code "bs5950"/],
    [[], /compare: give --classes, --sizes or --codes/],
  ])("bad choice %j → one line, exit 2", (args, expected) => {
    const r = cli(["compare", demo, ...(args as string[])]);
    expect(r.code).toBe(2);
    expect(r.stderr.trim().split("\n")).toHaveLength(1);
    expect(r.stderr).toMatch(expected as RegExp);
  });
});

describe("compare by design code", () => {
  it("prints the mapping of materials with its caveat, one column per code", () => {
    const r = cli(["compare", demo, "--codes", "is800,en1993"]);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain("steel E250 → S275");
    expect(r.stdout).toMatch(/these are not identical materials/);
    expect(r.stdout).toContain("en1993-1-8");
  });

  it("maps to AISC 360-16 (E250 → A36, 8.8 → A325) and finds a layout under it", () => {
    const j = JSON.parse(cli(["compare", demo, "--codes", "is800,aisc360", "--json"]).stdout);
    const aisc = j.columns.find((c: { code: string }) => c.code === "aisc360-16");
    expect(aisc.mapping).toContain("steel E250 → A36");
    expect(aisc.mapping).toContain("bolt class 8.8 → A325");
    expect(aisc.best).not.toBeNull();
    // A metric bolt under AISC 360-16 is named by its ASTM F3125 metric grade (A325M for 8.8), not its ISO class.
    expect(aisc.best.bolt).toMatch(/^M\d+ A325M$/);
    const is800 = j.columns.find((c: { code: string }) => c.code === "is800-2007");
    expect(is800.best.bolt).toMatch(/^M\d+ 8\.8$/);
  });

  it("piped, the table and its notes keep to 100 columns (cells wrap within their columns)", () => {
    const r = cli(["compare", demo, "--codes", "is800,en1993,aisc360"]);
    expect(r.code).toBe(0);
    const widest = Math.max(...r.stdout.split("\n").map((l) => Array.from(l).length));
    expect(widest).toBeLessThanOrEqual(100);
    expect(r.stdout).toContain("Governing check");
  });

  it("the Eurocode column equals search run on the mapped scenario under that code alone", async () => {
    const { compareCodes, mapScenario } = await import("../src/compare/compare.js");
    const { parseMappingText } = await import("../src/io/equivalents.js");
    const { findCode } = await import("../src/codes/registry.js");
    const { scenario, code } = parseScenario(readFileSync(demo, "utf8"));
    const table = parseMappingText(readFileSync(`${ROOT}/catalogue/equivalents.yaml`, "utf8"), "equivalents");
    const ec3 = findCode("en1993")!;
    const [, column] = compareCodes(scenario, code, [code, ec3], costs, table);
    const { scenario: mapped } = mapScenario(scenario, code, ec3, table);
    const bound = ec3.settings ? ec3.settings.bind(mapped) : ec3;
    const alone = searchLayouts({ scenario: mapped, code: bound, costs }, { top: 1, rankBy: "cost" });
    expect(column!.best?.key).toEqual(alone.results[0]?.key);
    expect(column!.best?.report.code).toBe("en1993-1-8");
  });

  it("a grade with no equivalent in the mapping is a one-line error naming the field", () => {
    const text = readFileSync(demo, "utf8") + 'compare:\n  steel: [{ is800-2007: E350, en1993-1-8: S355 }]\n  bolts: [{ is800-2007: "8.8", en1993-1-8: "8.8" }]\n';
    const r = cli(["compare", tempScenario(text), "--codes", "en1993"]);
    expect(r.code).toBe(2);
    expect(r.stderr.trim()).toMatch(/^splicewright: error: plates\.main\.grade: no en1993-1-8 equivalent of steel E250 in the mapping$/);
  });
});
