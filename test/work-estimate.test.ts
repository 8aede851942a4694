/**
 * The work estimate (src/search/work-estimate.ts): its count of the declared space against the space's
 * own lists (families(), stepRange, the brute force's tapered vectors), and the limit it enforces before
 * any search. The scenarios are generated or bundled demo data (invented).
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { compareChoices } from "../src/compare/compare.js";
import { parseCostTable } from "../src/io/costs.js";
import { parseScenario } from "../src/io/scenario.js";
import { bruteForceLayouts, taperedVectors } from "../src/search/brute-force.js";
import { bestPerBoltType } from "../src/search/per-type.js";
import { searchLayouts } from "../src/search/search.js";
import { families, resolveSpace, stepRange, taperedGauges } from "../src/search/space.js";
import { assertWithinLimit, countCandidates, countText, DEFAULT_MAX_CANDIDATES, stepCount, taperedVectorCount, WorkLimitError } from "../src/search/work-estimate.js";
import { ROOT, scenarioPath } from "./helpers/cli.js";
import { rng, smallSearchScenario } from "./helpers/generate.js";

const costs = parseCostTable(readFileSync(`${ROOT}/catalogue/costs.yaml`, "utf8"), "catalogue");
const demo = (name: string) => parseScenario(readFileSync(scenarioPath(name), "utf8"));

/** The candidates of a space counted from the families' own lists, the way the brute force walks them. */
function listedCandidates(scenario: ReturnType<typeof demo>["scenario"], code: ReturnType<typeof demo>["code"]): number {
  const space = resolveSpace(scenario, code, costs);
  const width = Math.min(scenario.plates.mainA.width_mm, scenario.plates.mainB.width_mm, ...scenario.plates.covers.map((c) => c.width_mm));
  let n = 0;
  for (const f of families(scenario, code, costs, space)) {
    const dims = f.pitches_mm.length * f.ends_mm.length * f.endsAtButt_mm.length;
    if (f.countsPerLine) n += dims * f.gauges_mm.length;
    else {
      const gauges = taperedGauges(f, width, space);
      const kcap = Math.min(space.maxAcross ?? Infinity, Math.floor((width - 2 * f.limits.edgeMin_mm) / gauges[0]! + 1e-9) + 1);
      n += dims * gauges.length * taperedVectors(f.lines, kcap).filter((v) => v[0]! >= f.minAcross).length;
    }
  }
  return n;
}

describe("counting the declared space without listing it", () => {
  it("stepCount equals the length of stepRange (random ranges and steps)", () => {
    const r = rng(41);
    for (let i = 0; i < 500; i++) {
      const from = r() * 200;
      const to = from + r() * 400 - 50;
      const step = [1, 2.5, 5, 6.35, 10, 1.5875][i % 6]!;
      expect(stepCount(from, to, step)).toBe(stepRange(from, to, step).length);
    }
  });

  it("taperedVectorCount equals the brute force's list of tapered vectors (one parity, never rising, not uniform)", () => {
    for (let m = 2; m <= 6; m++) {
      for (let k = 1; k <= 8; k++) {
        for (let first = 1; first <= k + 1; first++) expect(taperedVectorCount(m, k, first), `${m} lines, ${k} across, at least ${first} on line 0`).toBe(taperedVectors(m, k).filter((v) => v[0]! >= first).length);
      }
    }
  });

  it.each(["footbridge-tie-search.yaml", "sports-hall-chord-ec3-search.yaml", "canopy-tie-us-search.yaml"])("%s: the count equals the families' own lists, pattern by pattern", (name) => {
    const { scenario, code } = demo(name);
    for (const pattern of ["grid", "staggered", "tapered"] as const) {
      const s = { ...scenario, search: { ...scenario.search, patterns: [pattern], maxAlong: pattern === "tapered" ? 4 : 8 } };
      expect(countCandidates(s, code, costs, resolveSpace(s, code, costs)), pattern).toBe(listedCandidates(s, code));
    }
  });

  it("generated IS 800 spaces: the count equals the lists, and is never below the brute force's full checks", () => {
    for (let seed = 900; seed < 905; seed++) {
      const { scenario, code } = parseScenario(smallSearchScenario(seed).yaml);
      const count = countCandidates(scenario, code, costs, resolveSpace(scenario, code, costs));
      expect(count).toBe(listedCandidates(scenario, code));
      expect(bruteForceLayouts({ scenario, code, costs }, 1, "cost").checks).toBeLessThanOrEqual(count);
    }
  });

  it("a grid-and-staggered space is checked whole by the brute force: its full checks equal the count", () => {
    const { scenario, code } = parseScenario(smallSearchScenario(905).yaml);
    const s = { ...scenario, search: { ...scenario.search, patterns: ["grid" as const, "staggered" as const] } };
    expect(bruteForceLayouts({ scenario: s, code, costs }, 1, "cost").checks).toBe(countCandidates(s, code, costs, resolveSpace(s, code, costs)));
  });

  it("the bundled demos hold 1.2 × 10^8 to 2.4 × 10^8 candidates, below the default limit of 10^11", () => {
    const counts = ["footbridge-tie-search.yaml", "sports-hall-chord-ec3-search.yaml", "canopy-tie-us-search.yaml"].map((n) => {
      const { scenario, code } = demo(n);
      return countCandidates(scenario, code, costs, resolveSpace(scenario, code, costs));
    });
    for (const c of counts) expect(c).toBeLessThan(DEFAULT_MAX_CANDIDATES);
    expect(Math.max(...counts)).toBeGreaterThan(1e6);
  });

  it("countText", () => {
    expect(countText(12400)).toBe("12 400");
    expect(countText(3.14e9)).toBe("3.1 × 10^9");
    expect(countText(Infinity)).toBe("more than 10^300");
  });
});

describe("the limit, before any search starts", () => {
  const text = readFileSync(scenarioPath("footbridge-tie-search.yaml"), "utf8");
  const fine = parseScenario(text.replace("step: 5 mm ", "step: 1 mm "));
  const wide = parseScenario(text.replace(/width: 220/g, "width: 5000").replace("max_along: 8 ", "max_along: 100"));

  it("a 1 mm step on the demo is refused naming search.step, with the estimate and the flag", () => {
    const e = (() => {
      try {
        assertWithinLimit(fine.scenario, fine.code, costs, DEFAULT_MAX_CANDIDATES);
      } catch (x) {
        return x as WorkLimitError;
      }
      return null;
    })();
    expect(e).toBeInstanceOf(WorkLimitError);
    expect(e!.path).toBe("search.step");
    expect(e!.reason).toMatch(/about 1\.5 × 10\^11 candidate layouts, more than the limit of 1\.0 × 10\^11; narrow it \(doubling search\.step leaves about .*\) or pass --max-candidates \d+/);
  });

  it("a 5000 mm plate with 100 lines is refused by searchLayouts before its families are built, naming search.patterns", () => {
    expect(() => searchLayouts({ ...wide, costs }, { top: 1, rankBy: "cost" })).toThrow(/^search\.patterns: the declared search space holds about 1\.5 × 10\^52/);
  });

  it("maxCandidates lifts the limit knowingly (and a tighter one refuses the demo)", () => {
    const lifted = searchLayouts({ ...fine, costs }, { top: 1, rankBy: "cost", maxCandidates: 2e11 });
    expect(lifted.results.length).toBe(1);
    expect(lifted.stats.declaredCandidates).toBeGreaterThan(DEFAULT_MAX_CANDIDATES);
    const d = demo("footbridge-tie-search.yaml");
    expect(() => searchLayouts({ ...d, costs }, { top: 1, rankBy: "cost", maxCandidates: 1000 })).toThrow(WorkLimitError);
  });

  it("compare holds its columns together to the limit; the per-type search of a schedule holds the whole splice", () => {
    const d = demo("footbridge-tie-search.yaml");
    expect(() => compareChoices(d.scenario, d.code, costs, ["8.8", "10.9"], [], { maxCandidates: 1000 })).toThrow(/compared columns' search spaces hold together about/);
    expect(() => bestPerBoltType({ ...d, costs }, 1000)).toThrow(WorkLimitError);
  });
});
