/**
 * Proof of optimality: on generated scenarios over a reduced space (2 sizes × 2 classes, 10 mm steps,
 * at most 3 lines), the best-first search returns exactly the layouts a plain brute-force enumeration
 * through the same checker returns, in the same order — the best of each distinct arrangement (the
 * default), every variant (--variants), and with search.min_across set. The scenarios are generated
 * data, not real jobs.
 */
import { readFileSync } from "node:fs";
import { parse, stringify } from "yaml";
import { describe, expect, it } from "vitest";
import { parseCostTable } from "../src/io/costs.js";
import { parseScenario } from "../src/io/scenario.js";
import { bruteForceLayouts } from "../src/search/brute-force.js";
import type { RankBy } from "../src/search/ranking.js";
import { searchLayouts } from "../src/search/search.js";
import { ROOT } from "./helpers/cli.js";
import { smallSearchScenario } from "./helpers/generate.js";

const costs = parseCostTable(readFileSync(`${ROOT}/catalogue/costs.yaml`, "utf8"), "catalogue");

function compare(seed: number, rankBy: RankBy, top: number, options: { variants?: boolean; minAcross?: number; tensionFactor?: number } = {}) {
  const g = smallSearchScenario(seed);
  const file = parse(g.yaml) as { search: Record<string, unknown>; load: Record<string, number> };
  if (options.minAcross !== undefined) file.search.min_across = options.minAcross;
  if (options.tensionFactor !== undefined) {
    for (const k of ["factored_tension", "service_tension"]) if (file.load[k] !== undefined) file.load[k] = Math.max(1, Math.round(file.load[k]! * options.tensionFactor));
  }
  const { scenario, code } = parseScenario(stringify(file));
  const ctx = { scenario, code, costs };
  const variants = options.variants ?? false;
  const fast = searchLayouts(ctx, { top, rankBy, variants });
  const brute = bruteForceLayouts(ctx, top, rankBy, { variants });
  const line = (c: { key: { numbers: number[]; text: string } }) => `${c.key.numbers.join(" ")} ${c.key.text}`;
  return { g, scenario, fast: fast.results.map(line), brute: brute.results.map(line), checksFast: fast.stats.fullChecks, checksBrute: brute.checks, passAll: fast.results.every((c) => c.report.pass), reports: fast.results.map((c) => c.report) };
}

describe("search = brute force where the minimum design action governs (light loads; IS 800:2007 cl. 10.7, from memory)", () => {
  // A tenth of the generated load: below 0.3 × the main plate's capacity, so the condition, not the load,
  // sets the strength a layout must reach — and the search's bounds test against it.
  it.each([1000, 1001, 1002, 1003, 1004, 1005])("seed %i, load × 0.1", (seed) => {
    const r = compare(seed, "cost", 5, { tensionFactor: 0.1 });
    expect(r.fast, r.g.description).toEqual(r.brute);
    expect(r.passAll).toBe(true);
    for (const report of r.reports) {
      const minimum = report.checks.find((c) => c.id === "minimum-design-action");
      expect(minimum && minimum.type === "strength" && minimum.demand_N > r.scenario.load.factoredTension_N).toBe(true);
    }
  });
});

describe("search = brute force on generated scenarios (ranked by cost)", () => {
  const seeds = Array.from({ length: 24 }, (_, i) => 1000 + i);
  it.each(seeds)("seed %i", (seed) => {
    const r = compare(seed, "cost", 5);
    expect(r.fast, r.g.description).toEqual(r.brute);
    expect(r.passAll).toBe(true);
  });
});

describe("search = brute force for the other rankings", () => {
  it.each([
    [2001, "bolts"],
    [2002, "length"],
    [2003, "efficiency"],
    [2004, "bolts"],
    [2005, "length"],
  ] as Array<[number, RankBy]>)("seed %i by %s", (seed, rankBy) => {
    const r = compare(seed, rankBy, 4);
    expect(r.fast, r.g.description).toEqual(r.brute);
  });
});

describe("search = brute force, every variant (--variants)", () => {
  it.each([3002, 3003, 3004, 3006, 3007, 3008])("seed %i", (seed) => {
    const r = compare(seed, "cost", 5, { variants: true });
    expect(r.fast, r.g.description).toEqual(r.brute);
  });
});

describe("search = brute force with search.min_across", () => {
  it.each([
    [4001, 1],
    [4002, 1],
    [4003, 3],
    [4004, 3],
    [4005, 4],
    [4006, 2],
  ] as Array<[number, number]>)("seed %i, min_across %i", (seed, minAcross) => {
    const r = compare(seed, "cost", 4, { minAcross });
    expect(r.fast, r.g.description).toEqual(r.brute);
  });
});
