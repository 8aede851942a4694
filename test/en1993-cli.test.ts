/**
 * The built CLI under EN 1993-1-8: the sheet, JSON, exit codes and one-line bad input, on the invented
 * demo scenarios sports-hall-chord-ec3*.yaml (hand-worked in en1993-joint.test.ts).
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { cli, scenarioPath, tempScenario } from "./helpers/cli.js";

const demo = readFileSync(scenarioPath("sports-hall-chord-ec3.yaml"), "utf8");

describe("splicewright check, code: en1993-1-8", () => {
  it("prints clause-referenced checks of EN 1993-1-8 and EN 1993-1-1, the partial factors and the verdict; exit 0", () => {
    const r = cli(["check", scenarioPath("sports-hall-chord-ec3.yaml")]);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain("EN 1993-1-8:2005");
    for (const clause of ["EN 1993-1-8 cl. 3.6.1", "EN 1993-1-8 cl. 3.7", "EN 1993-1-1 cl.", "6.2.3(2)b", "3.10.2(2)"]) expect(r.stdout).toContain(clause);
    expect(r.stdout).toContain("γM0 1.00, γM2 1.25, γM3 1.25, γM3,ser 1.10");
    expect(r.stdout).toMatch(/Verdict:\s+PASS/);
    expect(r.stdout).toMatch(/Efficiency:\s+74\.6 %/);
  });

  it("--json: joint strength 1050.39 kN from the net section; bearing checks per plate with the 3.7 citation", () => {
    const j = JSON.parse(cli(["check", scenarioPath("sports-hall-chord-ec3.yaml"), "--json"]).stdout);
    expect(j.code).toBe("en1993-1-8");
    expect(j.jointStrength_kN).toBeCloseTo(1050.39, 2);
    expect(j.governing).toMatch(/^net-section:main/);
    const bearing = j.checks.filter((c: { kind: string }) => c.kind === "bolt-bearing");
    expect(bearing).toHaveLength(6);
    expect(bearing.every((c: { clause: string }) => c.clause.startsWith("EN 1993-1-8 cl. 3.7"))).toBe(true);
  });

  it("exit 1 when the load exceeds the joint strength (1100 kN > 1050.39 kN)", () => {
    const r = cli(["check", tempScenario(demo.replace("factored_tension: 950 kN", "factored_tension: 1100 kN"))]);
    expect(r.code).toBe(1);
    expect(r.stdout).toContain("Net-section rupture (main plate A)");
  });

  it.each([
    ["grade: S355           #", "grade: S690           #", /^plates\.main\.grade: unknown EN 10025 grade "S690"/],
    ["#   gamma_m2: 1.25", "  gamma_m2: 0.95", /^factors\.gamma_m2: must be at least 1\.0/],
    ["steel_strengths: en10025-2 ", "steel_strengths: en10025-9 ", /^options\.steel_strengths: /],
  ])("bad input %s → one line, exit 2", (from, to, message) => {
    let text = demo.replace(from, to);
    if (from.startsWith("#   gamma")) text = text.replace("# factors:", "factors:");
    const r = cli(["check", tempScenario(text)]);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe("");
    expect(r.stderr.trim().split("\n")).toHaveLength(1);
    expect(r.stderr.trim().replace(/^(splicewright: )?error: /, "")).toMatch(message);
  });
});

describe("splicewright search, code: en1993-1-8", () => {
  it("sports-hall-chord-ec3-search.yaml: 10 layouts, the space stated with the EN 1993-1-8 limits, exit 0", () => {
    const r = cli(["search", scenarioPath("sports-hall-chord-ec3-search.yaml")]);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain("EN 1993-1-8 Table 3.3");
    expect(r.stdout).toContain("k1 = 2.5");
    expect(r.stdout).toContain("Proven");
  });

  it("--json and --save: the best layout written back passes check under EN 1993-1-8", () => {
    const j = JSON.parse(cli(["search", scenarioPath("sports-hall-chord-ec3-search.yaml"), "--json", "--top", "3"]).stdout);
    expect(j.results).toHaveLength(3);
    const out = tempScenario("", "saved.yaml");
    const saved = cli(["search", scenarioPath("sports-hall-chord-ec3-search.yaml"), "--save", out, "--force"]);
    expect(saved.code).toBe(0);
    const again = cli(["check", out, "--json"]);
    expect(again.code).toBe(0);
    expect(JSON.parse(again.stdout).code).toBe("en1993-1-8");
  });
});
