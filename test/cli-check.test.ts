/**
 * The built CLI as a user runs it: calculation sheet, JSON, exit codes, units and bad input.
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { cli, scenarioPath, tempScenario } from "./helpers/cli.js";

const base = readFileSync(scenarioPath("mezzanine-hanger.yaml"), "utf8");

describe("splicewright check", () => {
  it("prints a calculation sheet with clauses, the verdict and the caution; exit 0 when all pass", () => {
    const r = cli(["check", scenarioPath("footbridge-tie.yaml")]);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain("IS 800:2007 cl. 10.3.3");
    expect(r.stdout).toContain("IS 800:2007 cl. 6.3.1");
    expect(r.stdout).toContain("3 across × 2 along");
    expect(r.stdout).toMatch(/Verdict:\s+PASS/);
    expect(r.stdout).toMatch(/Efficiency:\s+90\.9 %/);
    expect(r.stdout).toContain("qualified engineer");
  });

  it("--json carries jointStrength_kN, efficiency, governing, pass and every check", () => {
    const r = cli(["check", scenarioPath("footbridge-tie.yaml"), "--json"]);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout);
    expect(j.jointStrength_kN).toBeCloseTo(727.37, 1);
    expect(j.efficiency).toBeCloseTo(0.909, 3);
    expect(j.governing).toMatch(/^net-section:main/);
    expect(j.pass).toBe(true);
    for (const c of j.checks) {
      expect(c).toHaveProperty("id");
      expect(c).toHaveProperty("clause");
      expect(c).toHaveProperty("demand_kN");
      expect(c).toHaveProperty("resistance_kN");
      expect(c).toHaveProperty("utilisation");
      expect(c).toHaveProperty("pass");
    }
  });

  it("exit 1 and FAIL when a check fails (the load above the bolt shear strength of 173.85 kN)", () => {
    const file = tempScenario(base.replace("factored_tension: 150 kN", "factored_tension: 180 kN"));
    const r = cli(["check", file]);
    expect(r.code).toBe(1);
    expect(r.stdout).toMatch(/Verdict:\s+FAIL/);
    expect(r.stdout).toContain("Bolt shear (bolts)");
  });

  it("a failing spacing rule prints the value and its limit: pitch 38 mm < 2.5 × 16 = 40 mm (IS 800:2007 cl. 10.2.2)", () => {
    const file = tempScenario(base.replace("pitch: 50", "pitch: 38"));
    const j = JSON.parse(cli(["check", file, "--json"]).stdout);
    const rule = j.checks.find((c: { id: string }) => c.id === "min-spacing");
    expect(rule.pass).toBe(false);
    expect(rule.value_mm).toBe(38);
    expect(rule.limit_mm).toBe(40);
  });

  it("units: the same hanger in inches and kips gives the same strength (1 in = 25.4 mm, 1 kip = 4.448 kN)", () => {
    const inch = base
      .replace("width: 120", "width: 120 mm")
      .replace("factored_tension: 150 kN", `factored_tension: "${(150 / 4.4482216152605).toFixed(6)} kip"`)
      .replace("pitch: 50", `pitch: "${(50 / 25.4).toFixed(8)} in"`)
      .replace("end_distance: 35", `end_distance: "${(35 / 25.4).toFixed(8)} in"`);
    const a = JSON.parse(cli(["check", scenarioPath("mezzanine-hanger.yaml"), "--json"]).stdout);
    const b = JSON.parse(cli(["check", tempScenario(inch), "--json"]).stdout);
    expect(b.jointStrength_kN).toBeCloseTo(a.jointStrength_kN, 2);
    expect(b.factoredTension_kN).toBeCloseTo(150, 3);
  });

  it("--help lists the check command and its --json option", () => {
    const r = cli(["check", "--help"]);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain("--json");
  });
});

describe("bad input: one line naming the field and the reason, exit 2, no stack trace", () => {
  const cases: Array<[string, string, RegExp]> = [
    ["wrong type", base.replace("thickness: 10", "thickness: [10]"), /plates\.main\.thickness: .*number/],
    ["missing field", base.replace(/load:\n  factored_tension: 150 kN\n/, ""), /^splicewright: error: load: required/],
    ["zero size", base.replace("width: 120", "width: 0"), /plates\.main\.width: must be greater than zero/],
    ["negative size", base.replace("thickness: 10", "thickness: -10"), /plates\.main\.thickness: must be greater than zero/],
    ["unknown grade", base.replace("grade: E250", "grade: E999"), /plates\.main\.grade: unknown IS 2062 grade "E999"/],
    ["a project file instead of a scenario", readFileSync(scenarioPath("warehouse-roof-project.yaml"), "utf8"), /^splicewright: error: splices: unknown field — this is a project file \(a list of splices\);.* a project goes to `splicewright schedule`$/],
    ["beyond the largest width, the limit in mm", base.replace("width: 120", "width: 220 in"), /plates\.main\.width: 220 in is beyond the largest accepted value, 5000 mm$/],
    ["unknown unit", base.replace("pitch: 50", 'pitch: "50 furlongs"'), /layout\.pitch: unknown length unit "furlongs"/],
    ["force unit for a length", base.replace("pitch: 50", 'pitch: "50 kN"'), /layout\.pitch: unknown length unit "kN"/],
    ["YAML syntax error", base.replace("type: lap", "type: [lap"), /YAML syntax error/],
    ["duplicate key", base.replace("  type: lap\n", "  type: lap\n  type: lap\n"), /YAML syntax error: .*unique/i],
    ["unknown field", base.replace("  type: lap\n", "  type: lap\n  colour: red\n"), /splice\.colour: unknown field/],
    ["unknown bolt size", base.replace("size: M16", "size: M17"), /bolts\.size: M17 is not in the catalogue/],
    ["unknown property class", base.replace('class: "4.6"', 'class: "7.7"'), /bolts\.class: unknown property class "7.7"/],
    ["unknown splice type", base.replace("type: lap", "type: welded"), /splice\.type: /],
    ["unknown code", base.replace("code: is800-2007", "code: bs5950"), /code: unknown design code "bs5950"/],
    ["gauge and edge disagree", base.replace("  end_distance: 35\n", "  end_distance: 35\n  edge_distance: 25\n"), /layout\.edge_distance: 25 mm disagrees with the gauge/],
    ["holes outside the plate", base.replace("gauge: 60", "gauge: 110"), /layout: hole J\d+ .* falls outside the 120 mm wide main plate/],
    ["friction grip in class 4.6", base.replace("type: bearing", "type: friction-grip\n  slip_factor: 0.3\n  slip_at: ultimate"), /bolts\.class: friction-grip bolts must be class 8\.8 or 10\.9/],
    ["not a number", base.replace("pitch: 50", "pitch: .nan"), /layout\.pitch: .*finite/],
  ];
  it.each(cases)("%s", (_name, text, expected) => {
    const r = cli(["check", tempScenario(text)]);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe("");
    const lines = r.stderr.trim().split("\n");
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatch(expected);
    expect(r.stderr).not.toMatch(/\n\s+at /);
  });

  it.each([["--brief"], ["--width", "120"]])("%s with --json is one line naming the option, exit 2 (it lays out the sheet, which --json replaces)", (...option) => {
    const r = cli(["check", scenarioPath("footbridge-tie.yaml"), "--json", ...option]);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe("");
    expect(r.stderr.trim().split("\n")).toHaveLength(1);
    expect(r.stderr).toMatch(new RegExp(`^splicewright: error: ${option[0]}: lays out the calculation sheet, and --json prints every check in full instead`));
  });

  it("a missing file names the file", () => {
    const r = cli(["check", "no-such-file.yaml"]);
    expect(r.code).toBe(2);
    expect(r.stderr.trim()).toMatch(/^splicewright: error: no-such-file\.yaml: cannot read the file/);
  });

  it("a scenario without a layout is valid for search but check asks for the layout", () => {
    const noLayout = base.replace(/layout:[\s\S]*$/, "");
    const r = cli(["check", tempScenario(noLayout)]);
    expect(r.code).toBe(2);
    expect(r.stderr.trim()).toMatch(/^splicewright: error: layout: required for check/);
  });

  it("an unknown command or option exits 2", () => {
    expect(cli(["frobnicate"]).code).toBe(2);
    expect(cli(["check", scenarioPath("footbridge-tie.yaml"), "--colour"]).code).toBe(2);
  });
});
