/**
 * The two facts the search's sub-lattice bounds rest on (DEVELOPERS.md, "Sub-lattice bounds"), on the
 * declared spaces of the three search demos and of generated scenarios of each code (invented data), in
 * tension, compression alone and reversal: for every grid and staggered family sampled,
 *   (1) the bound with the pitch left out is never below the bound at any pitch of the family's range,
 *       at the same end distances (a service check that passes at some pitch passes without one);
 *   (2) the bound with the pitch left out never falls as the end distance rises to its largest.
 * With (1) a failing pitch-free bound rules out a whole pitch chain; with (1) and (2) a failing bound at
 * the largest end distance rules out every layout at that end distance at the butt.
 * The search against brute force (search-optimality, en1993-search, compression-search) guards the use.
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { parseCostTable } from "../src/io/costs.js";
import { parseScenario } from "../src/io/scenario.js";
import { loadBound } from "../src/codes/sense-bound.js";
import { families, resolveSpace } from "../src/search/space.js";
import type { CheckableScenario } from "../src/model/scenario.js";
import type { LayoutShape } from "../src/codes/types.js";
import { ROOT } from "./helpers/cli.js";
import { withSense } from "./helpers/senses.js";
import { aiscScenario, ec3Scenario, smallSearchScenario } from "./helpers/generate.js";

const costs = parseCostTable(readFileSync(`${ROOT}/catalogue/costs.yaml`, "utf8"), "catalogue");


/** Checks (1) and (2) on every `every`-th grid or staggered family; returns the comparisons made. */
function checkFacts(yaml: string, every: number): number {
  const { scenario, code } = parseScenario(yaml);
  const space = resolveSpace(scenario, code, costs);
  const fams = families(scenario, code, costs, space).filter((f) => f.countsPerLine !== null && f.lines > 1);
  let compared = 0;
  fams.forEach((f, i) => {
    if (i % every !== 0) return;
    const s = f.base as CheckableScenario;
    const counts = f.countsPerLine!;
    const eMax = f.ends_mm[f.ends_mm.length - 1]!;
    const at = (p: number | undefined, e: number, eb: number | undefined) => {
      const shape: LayoutShape = { pattern: f.pattern, countsPerLine: counts, endDistance_mm: e, endDistanceAtButt_mm: eb ?? e };
      if (p !== undefined) shape.pitch_mm = p;
      return loadBound(code, s, shape);
    };
    const ends = [f.ends_mm[0]!, f.ends_mm[Math.floor(f.ends_mm.length / 2)]!, eMax];
    const pitches = [f.pitches_mm[0]!, f.pitches_mm[Math.floor(f.pitches_mm.length / 2)]!, f.pitches_mm[f.pitches_mm.length - 1]!];
    for (const eb of [f.endsAtButt_mm[0], f.endsAtButt_mm[f.endsAtButt_mm.length - 1]]) {
      const atLargest = at(undefined, eMax, eb);
      for (const e of ends) {
        const free = at(undefined, e, eb);
        const label = `${f.size_mm} ${f.propertyClass} ${f.pattern} ${counts.join("-")} e ${e} eb ${String(eb)}`;
        expect(atLargest.jointStrength_N, `(2) ${label}`).toBeGreaterThanOrEqual(free.jointStrength_N * (1 - 1e-12));
        if (free.serviceOk) expect(atLargest.serviceOk, `(2) service ${label}`).toBe(true);
        for (const p of pitches) {
          const known = at(p, e, eb);
          expect(free.jointStrength_N, `(1) ${label} p ${p}`).toBeGreaterThanOrEqual(known.jointStrength_N * (1 - 1e-12));
          if (known.serviceOk) expect(free.serviceOk, `(1) service ${label} p ${p}`).toBe(true);
          compared++;
        }
      }
    }
  });
  return compared;
}

const demos = ["footbridge-tie-search.yaml", "sports-hall-chord-ec3-search.yaml", "canopy-tie-us-search.yaml"];
const generated = [
  ...[6101, 6102, 6103, 6104].map((s) => [`IS 800 seed ${s}`, smallSearchScenario(s).yaml] as const),
  ...[6201, 6202, 6203, 6204].map((s) => [`EN 1993-1-8 seed ${s}`, ec3Scenario(s).yaml] as const),
  ...[6301, 6302, 6303].map((s) => [`AISC 360-16 seed ${s}`, aiscScenario(s).yaml] as const),
];

describe("sub-lattice bounds: the pitch-free bound bounds every pitch, and rises with the end distance", () => {
  for (const sense of ["tension", "compression", "reversal"] as const) {
    it.each(demos)(`%s, ${sense}`, (file) => {
      const yaml = readFileSync(`${ROOT}/scenarios/${file}`, "utf8");
      expect(checkFacts(withSense(yaml, sense), 7)).toBeGreaterThan(100);
    }, 120_000);
    it.each(generated)(`%s, ${sense}`, (_label, yaml) => {
      expect(checkFacts(withSense(yaml, sense), 1)).toBeGreaterThan(10);
    }, 120_000);
  }
});
