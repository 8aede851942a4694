/**
 * Invariants over generated scenarios (fast-check), check by check. The scenarios are generated data.
 */
import { readFileSync } from "node:fs";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { checkScenario } from "../src/engine/check.js";
import { parseCostTable } from "../src/io/costs.js";
import { parseScenario } from "../src/io/scenario.js";
import type { StrengthCheck } from "../src/model/results.js";
import type { CheckableScenario, Scenario } from "../src/model/scenario.js";
import { searchLayouts } from "../src/search/search.js";
import { fromUnit, toUnit } from "../src/units/units.js";
import { ROOT } from "./helpers/cli.js";
import { smallSearchScenario } from "./helpers/generate.js";

const costs = parseCostTable(readFileSync(`${ROOT}/catalogue/costs.yaml`, "utf8"), "catalogue");
const seeds = fc.integer({ min: 1, max: 1_000_000 });

function generated(seed: number) {
  return parseScenario(smallSearchScenario(seed).yaml);
}
function withLoad(s: Scenario, factor: number): Scenario {
  const load = { ...s.load, factoredTension_N: s.load.factoredTension_N * factor };
  if (s.load.serviceTension_N !== undefined) load.serviceTension_N = s.load.serviceTension_N * factor;
  return { ...s, load };
}

describe("search invariants", () => {
  it("every layout search returns passes check on its own", () => {
    let checked = 0;
    fc.assert(
      fc.property(seeds, (seed) => {
        const { scenario, code } = generated(seed);
        for (const c of searchLayouts({ scenario, code, costs }, { top: 3, rankBy: "cost" }).results) {
          checked++;
          const again = checkScenario(c.scenario, code);
          expect(again.report.pass).toBe(true);
          expect(again.report.jointStrength_N).toBeCloseTo(c.report.jointStrength_N, 6);
        }
      }),
      { numRuns: 12, seed: 11 },
    );
    expect(checked).toBeGreaterThan(10); // the property was exercised, not vacuous
  });

  it("raising the load never lowers the optimum's cost nor the least compliant bolt count", () => {
    let compared = 0;
    fc.assert(
      fc.property(seeds, fc.double({ min: 1.05, max: 1.6, noNaN: true }), (seed, factor) => {
        const { scenario, code } = generated(seed);
        const heavier = withLoad(scenario, factor);
        const cost = (s: Scenario) => searchLayouts({ scenario: s, code, costs }, { top: 1, rankBy: "cost" }).results[0]?.cost.total ?? Infinity;
        const bolts = (s: Scenario) => searchLayouts({ scenario: s, code, costs }, { top: 1, rankBy: "bolts" }).results[0]?.joint.holes.length ?? Infinity;
        const [c0, c1] = [cost(scenario), cost(heavier)];
        if (Number.isFinite(c1)) compared++;
        expect(c1).toBeGreaterThanOrEqual(c0 - 1e-9);
        expect(bolts(heavier)).toBeGreaterThanOrEqual(bolts(scenario));
      }),
      { numRuns: 8, seed: 12 },
    );
    expect(compared).toBeGreaterThan(2);
  });

  it("a stronger bolt class never needs more bolts for the same size and pattern", () => {
    let exercised = 0;
    fc.assert(
      fc.property(seeds, fc.constantFrom("grid", "staggered"), (seed, pattern) => {
        const { scenario, code } = generated(seed);
        if (scenario.bolts?.assembly === "friction-grip") return;
        const d = scenario.search?.sizes_mm?.[1] ?? 20;
        const least = (cls: "4.6" | "5.6" | "8.8" | "10.9") =>
          searchLayouts({ scenario: { ...scenario, search: { ...scenario.search, sizes_mm: [d], classes: [cls], patterns: [pattern] } }, code, costs }, { top: 1, rankBy: "bolts" }).results[0]?.joint.holes.length ?? Infinity;
        const counts = (["4.6", "5.6", "8.8", "10.9"] as const).map(least);
        if (Number.isFinite(counts[3]!)) exercised++;
        for (let i = 1; i < counts.length; i++) expect(counts[i]!).toBeLessThanOrEqual(counts[i - 1]!);
      }),
      { numRuns: 6, seed: 13 },
    );
    expect(exercised).toBeGreaterThan(2);
  });
});

const plateYaml = (t: number, grade: string, tCover: number) => `
name: thickness property
code: is800-2007
splice: { type: butt-double-cover }
plates:
  main: { width: 200, thickness: ${t}, grade: ${grade} }
  cover: { width: 200, thickness: ${tCover}, grade: ${grade} }
load: { factored_tension: 100 }
bolts: { size: M20, class: "8.8" }
layout: { pattern: staggered, across: 3, along: 3, pitch: 35, gauge: 45, end_distance: 40, end_distance_at_butt: 40 }
`;
function resistances(t: number, grade = "E250", tCover = 8) {
  const { scenario, code } = parseScenario(plateYaml(t, grade, tCover));
  const { report } = checkScenario(scenario as CheckableScenario, code);
  const r = (id: string) => (report.checks.find((c) => c.id === id) as StrengthCheck).resistance_N;
  return { gross: r("gross-yield:mainA"), net: r("net-section:mainA"), bearing: r("bearing:mainA:A"), block: r("block-shear:mainA:A"), shear: r("bolt-shear:A") };
}

describe("plate resistances and thickness (IS 800:2007)", () => {
  it("within one yield band (t < 20 mm, E250 fy 250) gross yield, net section, bearing and block shear never fall as the plate thickens", () => {
    fc.assert(
      fc.property(fc.double({ min: 6, max: 18.5, noNaN: true }), fc.double({ min: 0.1, max: 1.4, noNaN: true }), (t, dt) => {
        const a = resistances(t);
        const b = resistances(t + dt);
        for (const k of ["gross", "net", "bearing", "block"] as const) expect(b[k]).toBeGreaterThanOrEqual(a[k] - 1e-6);
      }),
      { numRuns: 40, seed: 14 },
    );
  });

  it("the thickness step of fy is the code's: 19.5 mm at fy 250 yields more than 20 mm at fy 240 (IS 2062 Table 2)", () => {
    // Tdg = 200 × 19.5 × 250 / 1.1 = 886.4 kN > 200 × 20 × 240 / 1.1 = 872.7 kN
    expect(resistances(19.5).gross / 1000).toBeCloseTo(886.4, 1);
    expect(resistances(20).gross / 1000).toBeCloseTo(872.7, 1);
  });

  it("large grip: a thicker main plate lowers bolt shear once lg > 5d, as βlg = 8/(3 + lg/d) says (cl. 10.3.3.2)", () => {
    // M20: 5d = 100 mm. Covers 8 + 8: grip = t + 16. t = 80 → lg 96 (βlg 1); t = 100 → lg 116: βlg = 8/(3 + 5.8) = 0.909
    const a = resistances(80, "E250", 8).shear;
    const b = resistances(100, "E250", 8).shear;
    expect(b / a).toBeCloseTo(8 / (3 + 116 / 20), 6);
  });
});

describe("unit round trips", () => {
  it("kN ↔ kip, mm ↔ in, MPa ↔ ksi return what went in", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-3, max: 1e7, noNaN: true }), (v) => {
        expect(fromUnit(toUnit(v, "kip", "force"), "kip", "force")).toBeCloseTo(v, 6);
        expect(fromUnit(toUnit(v, "in", "length"), "in", "length")).toBeCloseTo(v, 6);
        expect(fromUnit(toUnit(v, "ksi", "stress"), "ksi", "stress")).toBeCloseTo(v, 6);
      }),
    );
  });
  it("1 in = 25.4 mm, 1 kip = 4.448222 kN, 1 ksi = 6.894757 MPa (exact definitions, common practice)", () => {
    expect(fromUnit(1, "in", "length")).toBe(25.4);
    expect(fromUnit(1, "kip", "force") / 1000).toBeCloseTo(4.448222, 6);
    expect(fromUnit(1, "ksi", "stress")).toBeCloseTo(6.894757, 6);
  });
});

describe("warnings", () => {
  it("a load below 0.3 × the member's tension capacity is warned about (IS 800:2007 cl. 10.7, from memory)", () => {
    const { scenario, code } = parseScenario(plateYaml(12, "E250", 8));
    const { report } = checkScenario(scenario as CheckableScenario, code);
    // 0.3 × min(200 × 12 × 250/1.1, 0.9 × 2400 × 410/1.25) = 0.3 × 545.5 = 163.6 kN > 100 kN
    expect(report.warnings.map((w) => w.id)).toContain("below-minimum-design-action");
  });
});
