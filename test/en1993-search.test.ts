/**
 * The layout search under EN 1993-1-8: exact against brute force, an admissible strength bound, and the
 * gauge-independence the search's gauge sweep relies on (under the declared narrowing k1 = 2.5).
 * The scenarios are generated data (invented), not real jobs.
 */
import { readFileSync } from "node:fs";
import { stringify } from "yaml";
import { describe, expect, it } from "vitest";
import { checkScenario } from "../src/engine/check.js";
import { parseCostTable } from "../src/io/costs.js";
import { parseScenario, requireCheckable } from "../src/io/scenario.js";
import type { CheckableScenario, LayoutSpec } from "../src/model/scenario.js";
import { bruteForceLayouts } from "../src/search/brute-force.js";
import type { RankBy } from "../src/search/ranking.js";
import { searchLayouts } from "../src/search/search.js";
import { families, layoutOf, resolveSpace, scenarioOf, staggeredCounts } from "../src/search/space.js";
import { ROOT, scenarioPath } from "./helpers/cli.js";
import { ec3Scenario, rng } from "./helpers/generate.js";

const costs = parseCostTable(readFileSync(`${ROOT}/catalogue/costs.yaml`, "utf8"), "catalogue");
const pick = <T>(r: () => number, xs: readonly T[]): T => xs[Math.floor(r() * xs.length)]!;


function compare(seed: number, rankBy: RankBy, top: number) {
  const g = ec3Scenario(seed);
  const { scenario, code } = parseScenario(g.yaml);
  const ctx = { scenario, code, costs };
  const fast = searchLayouts(ctx, { top, rankBy });
  const brute = bruteForceLayouts(ctx, top, rankBy);
  const line = (c: { key: { numbers: number[]; text: string } }) => `${c.key.numbers.join(" ")} ${c.key.text}`;
  return { g, fast: fast.results.map(line), brute: brute.results.map(line), passAll: fast.results.every((c) => c.report.pass) };
}

const exactCases: Array<[number, RankBy, number]> = [
  ...Array.from({ length: 24 }, (_, i): [number, RankBy, number] => [5000 + i, "cost", 5]),
  [6001, "bolts", 4],
  [6002, "length", 4],
  [6003, "efficiency", 4],
  [6004, "efficiency", 4],
  [6005, "bolts", 4],
];

describe("EN 1993-1-8 search = brute force on generated scenarios, in order", () => {
  it.each(exactCases)("seed %i ranked by %s, best %i", (seed, rankBy, top) => {
    const { g, fast, brute, passAll } = compare(seed, rankBy, top);
    expect(fast, g.description).toEqual(brute);
    expect(passAll).toBe(true);
  });
});

/** Every layout of a scenario's declared space at a few dimensions (grid and staggered), through the checker. */
function sampleLayouts(seed: number) {
  const g = ec3Scenario(seed);
  const { scenario, code } = parseScenario(g.yaml);
  const space = resolveSpace(scenario, code, costs);
  const out: Array<{ s: CheckableScenario; counts: number[]; gauges: number[]; layoutAt: (gauge: number) => LayoutSpec }> = [];
  for (const f of families(scenario, code, costs, space)) {
    if (!f.countsPerLine) continue;
    const p = f.pitches_mm[Math.floor(f.pitches_mm.length / 2)] ?? 0;
    const e = f.ends_mm[0]!;
    const eb = f.endsAtButt_mm[f.endsAtButt_mm.length - 1];
    const counts = f.countsPerLine;
    out.push({ s: scenarioOf(f, layoutOf(f, p, f.gauges_mm[0] ?? 0, e, eb)), counts, gauges: f.gauges_mm, layoutAt: (gauge) => layoutOf(f, p, gauge, e, eb) });
  }
  return { code, out, description: g.description };
}

describe("the strength bound is admissible: never below the checker (generated layouts)", () => {
  it.each([7001, 7002, 7003, 7004, 7005, 7006, 7007, 7008])("seed %i", (seed) => {
    const { code, out, description } = sampleLayouts(seed);
    let compared = 0;
    for (const { s, counts } of out) {
      const layout = s.layout;
      if (layout.kind === "holes") continue;
      const shape = { pattern: layout.kind as "grid" | "staggered", countsPerLine: counts, pitch_mm: layout.pitch_mm, endDistance_mm: layout.endDistance_mm, endDistanceAtButt_mm: layout.endDistanceAtButt_mm };
      const bound = code.strengthBound(s, shape);
      const { report } = checkScenario(s, code);
      expect(bound.jointStrength_N, description).toBeGreaterThanOrEqual(report.jointStrength_N * (1 - 1e-9));
      // perBolt and plates_N: the least capacity of the bolt-group checks is at most n × perBolt, the
      // least of the plate checks at most plates_N.
      const n = counts.reduce((a, b) => a + b, 0);
      const least = (kinds: string[]) =>
        Math.min(...report.checks.filter((c) => c.type === "strength" && c.limitState === "ULS" && c.loadRatio > 0 && kinds.includes(c.kind)).map((c) => (c as { resistance_N: number }).resistance_N / (c as { loadRatio: number }).loadRatio));
      expect(n * bound.perBolt_N, description).toBeGreaterThanOrEqual(least(["bolt-shear", "bolt-bearing", "slip"]) * (1 - 1e-9));
      expect(bound.plates_N, description).toBeGreaterThanOrEqual(least(["gross-yield", "net-section"]) * (1 - 1e-9));
      // A service check the bound calls hopeless fails in the checker.
      if (!bound.serviceOk) expect(report.checks.some((c) => c.kind === "slip" && !c.pass)).toBe(true);
      compared++;
    }
    expect(compared).toBeGreaterThan(0);
  });
});

describe("under the declared narrowing (grid and staggered gauges ≥ 3 d0, edges ≥ 1.5 d0) bearing does not change with the gauge", () => {
  it.each([[8001, 8002, 8003], [8004, 8005, 8006], [8007, 8008, 8009]])("seeds %i, %i, %i: bolt shear, bearing and slip are equal at every gauge of a family", (...seeds) => {
    let swept = 0;
    for (const { code, out, description } of seeds.map(sampleLayouts)) for (const { s, gauges, layoutAt } of out) {
      if (gauges.length < 2) continue;
      const at = (g: number) => {
        const { report } = checkScenario({ ...s, layout: layoutAt(g) }, code);
        return report.checks.filter((c) => ["bolt-shear", "bolt-bearing", "slip"].includes(c.kind)).map((c) => `${c.id} ${(c as { resistance_N: number }).resistance_N.toFixed(6)}`);
      };
      const first = at(gauges[0]!);
      for (const g of gauges.slice(1)) expect(at(g), `${description}, gauge ${g}`).toEqual(first);
      swept++;
    }
    expect(swept).toBeGreaterThan(0);
  });
});

describe("the demo search scenario", () => {
  it("sports-hall-chord-ec3-search.yaml: the best layout passes `check` and the search stays well under a second", () => {
    const { scenario, code } = parseScenario(readFileSync(scenarioPath("sports-hall-chord-ec3-search.yaml"), "utf8"));
    const t0 = performance.now();
    const outcome = searchLayouts({ scenario, code, costs }, { top: 10, rankBy: "cost" });
    const elapsed = performance.now() - t0;
    expect(outcome.results.length).toBe(10);
    const best = outcome.results[0]!;
    const again = checkScenario(requireCheckable(best.scenario, code), code);
    expect(again.report.pass).toBe(true);
    expect(again.report.jointStrength_N).toBeGreaterThanOrEqual(950e3);
    expect(elapsed).toBeLessThan(5000); // generous: the bench measures speed, this only guards against a runaway
  });

  it("staggered counts of the space are what the bound is given (a, a − 1, a, …)", () => {
    expect(staggeredCounts(3, 4)).toEqual([3, 2, 3, 2]);
  });
});
