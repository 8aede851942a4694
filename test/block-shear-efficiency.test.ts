/**
 * Block shear shapes, the block-shear load convention and the efficiency basis, on whole joints of all
 * three codes. Expected values are worked by hand from the clauses (IS 800:2007 cl. 6.4.1, 6.2, 6.3.1;
 * EN 1993-1-8 3.10.2(2), EN 1993-1-1 6.2.3; AISC 360-16 J4.3, D2), written beside each.
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { checkScenario } from "../src/engine/check.js";
import { parseScenario, requireCheckable } from "../src/io/scenario.js";
import type { CheckReport, StrengthCheck } from "../src/model/results.js";
import { scenarioPath } from "./helpers/cli.js";

function run(yaml: string) {
  const { scenario, code } = parseScenario(yaml);
  return checkScenario(requireCheckable(scenario, code), code).report;
}
const sc = (r: CheckReport, id: string) => r.checks.find((c) => c.id === id) as StrengthCheck;
const demo = (name: string, options: string) => readFileSync(scenarioPath(name), "utf8").replace(/^options:.*$/m, (line) => `${line}\n  ${options}`);
const kN = (n: number) => n / 1000;

/** An invented IS 800 lap splice: 100 × 10 E250 plates, M20 4.6, one gauge line on the axis. */
const singleLine = (pitch: number, along: number) => `
name: one gauge line
code: is800-2007
splice: { type: lap }
plates: { main: { width: 100, thickness: 10, grade: E250 } }
load: { factored_tension: 100 }
bolts: { size: M20, class: "4.6" }
layout: { pattern: grid, across: 1, along: ${along}, pitch: ${pitch}, end_distance: 35 }
`;

describe("the one-sided block (IS 800:2007 cl. 6.4.1): when it governs and when it does not", () => {
  it("short joint, 2 bolts at p 50, e 35: Avg = 850, Avn = (85 − 33) × 10 = 520, Atg = 500, Atn = 390 mm²; Tdb2 = 0.9 × 520 × 410/(√3 × 1.25) + 500 × 250/1.1 = 202.3 kN < the net section 0.9 × 780 × 410/1.25 = 230.3 kN", () => {
    const r = run(singleLine(50, 2));
    const block = sc(r, "block-shear:mainA:J");
    const tdb2 = (0.9 * 520 * 410) / (Math.sqrt(3) * 1.25) + (500 * 250) / 1.1;
    expect(block.resistance_N).toBeCloseTo(tdb2, 6);
    expect(kN(block.resistance_N)).toBeCloseTo(202.3, 1);
    expect(kN(sc(r, "net-section:mainA").resistance_N)).toBeCloseTo(230.26, 2);
    expect(block.resistance_N / block.loadRatio).toBeLessThan(sc(r, "net-section:mainA").resistance_N);
    expect(block.substituted).toMatch(/one-sided block/);
  });
  it("long joint, 5 bolts at p 60: Lv = 35 + 240 = 275 → Tdb2 = 0.9 × (275 − 99) × 10 × 410/(√3 × 1.25) + 113.6 = 413.6 kN > the net section 230.3 kN", () => {
    const r = run(singleLine(60, 5));
    const block = sc(r, "block-shear:mainA:J");
    const tdb1 = (2750 * 250) / (Math.sqrt(3) * 1.1) + (0.9 * 390 * 410) / 1.25;
    const tdb2 = (0.9 * 1760 * 410) / (Math.sqrt(3) * 1.25) + (500 * 250) / 1.1;
    expect(block.resistance_N).toBeCloseTo(Math.min(tdb1, tdb2), 6);
    expect(block.resistance_N).toBeGreaterThan(sc(r, "net-section:mainA").resistance_N);
  });
});

describe("options.block_shear_load", () => {
  it("share (default): the footbridge main plate's governing block is the one-sided block over 3 lines (6 of 6 bolts), 810.8 kN, and the sheet states the k/n convention", () => {
    const r = run(readFileSync(scenarioPath("footbridge-tie.yaml"), "utf8"));
    expect(kN(sc(r, "block-shear:mainA:A").resistance_N)).toBeCloseTo(810.8, 1);
    expect(r.conventions.join("\n")).toMatch(/carries k\/n of its plate's force/);
  });
  it("full: every block carries the whole plate force; the edge strip outside line 1 (Avg 1680, Avn 1152, Atg 640, Atn 464 mm²) has Tdb2 = 0.9 × 1152 × 410/(√3 × 1.25) + 640 × 250/1.1 = 341.8 kN < 620 kN: fails", () => {
    const r = run(demo("footbridge-tie.yaml", "block_shear_load: full"));
    const block = sc(r, "block-shear:mainA:A");
    expect(kN(block.resistance_N)).toBeCloseTo((0.9 * 1152 * 410) / (Math.sqrt(3) * 1.25) / 1000 + (640 * 250) / 1.1 / 1000, 6);
    expect(block.loadRatio).toBe(1);
    expect(block.pass).toBe(false);
    expect(r.conventions.join("\n")).toMatch(/whole force \(options\.block_shear_load: full/);
  });
});

describe("options.efficiency_basis", () => {
  // Footbridge: Ag = 220 × 16 = 3520 mm²; yield 3520 × 250/1.1 = 800.0 kN; rupture 0.9 × 3520 × 410/1.25 = 1039.1 kN; joint 727.37 kN
  it("IS 800, lesser (default): 727.37 / 800.0 = 0.909", () => {
    const r = run(readFileSync(scenarioPath("footbridge-tie.yaml"), "utf8"));
    expect(r.efficiency).toBeCloseTo(727.37 / 800, 3);
    expect(r.efficiencyDefinition).toMatch(/basis: the lesser of gross yield and rupture/);
  });
  it("IS 800, rupture: 727.37 / 1039.1 = 0.700", () => {
    const r = run(demo("footbridge-tie.yaml", "efficiency_basis: rupture"));
    expect(r.efficiency).toBeCloseTo(727.37 / ((0.9 * 3520 * 410) / 1.25 / 1000), 3);
    expect(r.efficiencyDefinition).toMatch(/0\.9·Ag·fu\/γm1/);
  });
  it("IS 800, yield: 727.37 / 800.0 = 0.909, defined as Ag·fy/γm0", () => {
    const r = run(demo("footbridge-tie.yaml", "efficiency_basis: yield"));
    expect(r.efficiency).toBeCloseTo(727.37 / 800, 3);
    expect(r.efficiencyDefinition).toMatch(/basis: gross yield .* = Ag·fy\/γm0/);
  });
  it("EN 1993-1-8, yield: 1050.39 / (4160 × 355/1.0 = 1476.8) = 0.711; lesser: 1050.39 / 1407.74 = 0.746", () => {
    expect(run(demo("sports-hall-chord-ec3.yaml", "efficiency_basis: yield")).efficiency).toBeCloseTo(1050.39 / 1476.8, 3);
    expect(run(readFileSync(scenarioPath("sports-hall-chord-ec3.yaml"), "utf8")).efficiency).toBeCloseTo(1050.39 / 1407.744, 3);
  });
  it("AISC 360-16, rupture: φPn = 0.75 × 65 × 4.0 = 195 kips; lesser min(0.9 × 50 × 4, 195) = 180 kips", () => {
    const lesser = run(readFileSync(scenarioPath("canopy-tie-us.yaml"), "utf8"));
    const rupture = run(demo("canopy-tie-us.yaml", "efficiency_basis: rupture"));
    expect(rupture.efficiency / lesser.efficiency).toBeCloseTo(180 / 195, 6);
  });
});
