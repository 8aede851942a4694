/**
 * Proof of optimality: on generated scenarios over a reduced space (2 sizes × 2 classes, 10 mm steps,
 * at most 3 lines), the best-first search returns exactly the layouts a plain brute-force enumeration
 * through the same checker returns, in the same order. The scenarios are generated data, not real jobs.
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { parseCostTable } from "../src/io/costs.js";
import { parseScenario } from "../src/io/scenario.js";
import { bruteForceLayouts } from "../src/search/brute-force.js";
import type { RankBy } from "../src/search/ranking.js";
import { searchLayouts } from "../src/search/search.js";
import { ROOT } from "./helpers/cli.js";
import { smallSearchScenario } from "./helpers/generate.js";

const costs = parseCostTable(readFileSync(`${ROOT}/catalogue/costs.yaml`, "utf8"), "catalogue");

function compare(seed: number, rankBy: RankBy, top: number) {
  const g = smallSearchScenario(seed);
  const { scenario, code } = parseScenario(g.yaml);
  const ctx = { scenario, code, costs };
  const fast = searchLayouts(ctx, { top, rankBy });
  const brute = bruteForceLayouts(ctx, top, rankBy);
  const line = (c: { key: { numbers: number[]; text: string } }) => `${c.key.numbers.join(" ")} ${c.key.text}`;
  return { g, fast: fast.results.map(line), brute: brute.results.map(line), checksFast: fast.stats.fullChecks, checksBrute: brute.checks, passAll: fast.results.every((c) => c.report.pass) };
}

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
