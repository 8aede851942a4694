/**
 * Hand-worked checks of each bundled demo scenario (the scenarios are invented demos; the expected
 * values below are worked by hand from IS 800:2007 clauses, the working written beside each).
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { checkScenario } from "../src/engine/check.js";
import { parseScenario, requireCheckable } from "../src/io/scenario.js";
import type { CheckReport, StrengthCheck } from "../src/model/results.js";
import { scenarioPath } from "./helpers/cli.js";

function run(name: string) {
  const { scenario, code } = parseScenario(readFileSync(scenarioPath(name), "utf8"));
  return checkScenario(requireCheckable(scenario, code), code);
}

function strength(report: CheckReport, id: string): StrengthCheck {
  const c = report.checks.find((x) => x.id === id);
  if (!c || c.type !== "strength") throw new Error(`no strength check ${id}`);
  return c;
}

const kN = (n: number) => n / 1000;

describe("footbridge-tie.yaml: butt splice, two 10 mm covers on 220 × 16 E250, M20 8.8, 3 across × 2 along", () => {
  const { report, joint } = run("footbridge-tie.yaml");

  it("bolt shear: Vdsb = 830/√3 × 2 × 245.04 / 1.25 = 187.88 kN (design aids: 187.89 double shear); 6 bolts → 1127.3 kN", () => {
    expect(kN(strength(report, "bolt-shear:B").resistance_N)).toBeCloseTo(1127.3, 1);
  });

  it("bearing on the main plate: kb = min(40/66, 65/66 − 0.25, 830/410, 1) = 0.606; 6 × 2.5 × 0.606 × 20 × 16 × 410/1.25 = 954.2 kN", () => {
    expect(kN(strength(report, "bearing:mainB:B").resistance_N)).toBeCloseTo(954.2, 1);
  });

  it("bearing on a cover: the same kb, t = 10 → 596.4 kN against half of T = 310 kN", () => {
    const c = strength(report, "bearing:coverA:B");
    expect(kN(c.resistance_N)).toBeCloseTo(596.4, 1);
    expect(kN(c.demand_N)).toBeCloseTo(310, 6);
  });

  it("net section of a main plate: (220 − 3 × 22) × 16 = 2464 mm²; 0.9 × 2464 × 410/1.25 = 727.4 kN — governs", () => {
    expect(kN(strength(report, "net-section:mainA").resistance_N)).toBeCloseTo(727.37, 1);
    expect(report.governing).toMatch(/^net-section:main/);
    expect(kN(report.jointStrength_N)).toBeCloseTo(727.37, 1);
  });

  it("block shear, main plate: the one-sided block over all 3 lines (6 of 6 bolts) governs: Avg = 105×16 = 1680, Atn = (180 − 2.5×22)×16 = 2000; Tdb1 = 1680×250/(√3×1.1) + 0.9×2000×410/1.25 = 810.8 kN, permitting 810.8 kN of joint tension", () => {
    const c = strength(report, "block-shear:mainB:B");
    expect(kN(c.resistance_N)).toBeCloseTo((1680 * 250) / (Math.sqrt(3) * 1.1) / 1000 + (0.9 * 2000 * 410) / 1.25 / 1000, 6);
    expect(kN(c.resistance_N)).toBeCloseTo(810.8, 1);
    expect(c.loadRatio).toBe(1);
    // the edge strip over lines 2–3 (4 of 6 bolts): Tdb1 = 1680×250/(√3×1.1) + 0.9×1232×410/1.25 = 584.1 kN permits 584.1 × 6/4 = 876.2 kN > 810.8
    expect(c.substituted).toMatch(/joint tension it permits = R × n\/k = R × 6\/6 = 810\.8 kN/);
  });

  it("efficiency = 727.4 / min(3520 × 250/1.1, 0.9 × 3520 × 410/1.25) = 727.4 / 800.0 = 0.909", () => {
    expect(report.efficiency).toBeCloseTo(727.37 / 800, 3);
    expect(report.pass).toBe(true);
  });

  it("geometry: 12 holes, cover length 2 × (5 + 40 + 65 + 40) = 300 mm; pitch across the butt 40 + 10 + 40 = 90 mm", () => {
    expect(joint.holes).toHaveLength(12);
    expect(joint.spliceLength_mm).toBe(300);
    const pitch = report.checks.find((c) => c.id === "max-pitch");
    expect(pitch && pitch.type === "rule" ? pitch.value_mm : NaN).toBe(90);
  });
});

describe("mezzanine-hanger.yaml: lap splice, 120 × 10 E250, M16 4.6, 2 across × 3 along", () => {
  const { report } = run("mezzanine-hanger.yaml");

  it("bolt shear governs: 6 × 400/√3 × 156.83/1.25 = 6 × 28.974 = 173.85 kN (design aids: 28.98 kN per bolt)", () => {
    expect(report.governing).toBe("bolt-shear:J");
    expect(kN(report.jointStrength_N)).toBeCloseTo(173.85, 1);
  });

  it("bearing: kb = min(35/54, 50/54 − 0.25, 400/410, 1) = 0.648; 6 × 2.5 × 0.648 × 16 × 10 × 410/1.25 = 510.2 kN", () => {
    expect(kN(strength(report, "bearing:mainA:J").resistance_N)).toBeCloseTo(6 * 2.5 * (35 / 54) * 16 * 10 * 410 / 1.25 / 1000, 6);
    expect(kN(strength(report, "bearing:mainA:J").resistance_N)).toBeCloseTo(510.2, 1);
  });

  it("net section: (120 − 2 × 18) × 10 = 840 mm² → 248.0 kN; gross 1200 × 250/1.1 = 272.7 kN; efficiency 173.85/272.7 = 0.638", () => {
    expect(kN(strength(report, "net-section:mainA").resistance_N)).toBeCloseTo(247.97, 1);
    expect(report.efficiency).toBeCloseTo(173.86 / 272.73, 3);
  });

  it("edge distance (120 − 60)/2 = 30 mm ≥ 1.5 × 18 = 27 mm (sawn edge, cl. 10.2.4.2) — passes", () => {
    const edge = report.checks.find((c) => c.id === "min-edge-distance");
    expect(edge?.pass).toBe(true);
    expect(edge && edge.type === "rule" ? [edge.value_mm, edge.limit_mm] : []).toEqual([30, 27]);
    expect(report.warnings.map((w) => w.id)).toContain("eccentric-single-shear");
  });
});

describe("truss-chord-staggered.yaml: single-cover butt splice, E350 20 → 16 mm, 4 mm packing, friction-grip M20 10.9", () => {
  const { report, joint } = run("truss-chord-staggered.yaml");

  it("packing = 20 − 16 = 4 mm under the thinner plate: βpkg stays 1.0 (≤ 6 mm, cl. 10.3.3.3)", () => {
    expect(joint.groups.find((g) => g.id === "B")?.packing_mm).toBe(4);
    expect(report.warnings.map((w) => w.id)).not.toContain("packing-over-6mm");
  });

  it("slip at service: F0 = 0.7 × 1040 × 245.04 = 178.4 kN; Vdsf = 0.48 × 1 × 1 × 178.4/1.10 = 77.84 kN; 10 bolts = 778.4 kN vs 540 kN", () => {
    const slip = strength(report, "slip:B");
    expect(slip.limitState).toBe("SLS");
    expect(kN(slip.resistance_N)).toBeCloseTo(778.4, 1);
    expect(kN(slip.demand_N)).toBe(540);
  });

  it("zig-zag net section of main plate B governs: (260 − 5 × 22 + 4 × 40²/(4 × 45)) × 16 = 2968.9 mm² → 1047.4 kN", () => {
    expect(report.governing).toBe("net-section:mainB");
    expect(kN(report.jointStrength_N)).toBeCloseTo(1047.4, 1);
  });

  it("efficiency against the thinner plate: 1047.4 / min(4160 × 350/1.1, 0.9 × 4160 × 490/1.25) = 1047.4/1323.6 = 0.791", () => {
    expect(report.efficiency).toBeCloseTo(0.7913, 3);
    expect(report.pass).toBe(true);
  });
});
