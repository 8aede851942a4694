/**
 * The fact the search's stagger span rests on (DEVELOPERS.md, "The stagger span across the butt"): in a
 * staggered butt splice under IS 800:2007 the holes of transverse line 1 of the two bolt groups are
 * consecutive on a gauge line of the covers, gap + 2·(e_butt + p) apart, and the checker's pitch limit
 * for them is min(16 t, 200 mm) with t the thinner cover (cl. 10.2.3.2). So every layout whose span is
 * past `SearchLimits.staggeredButtSpanMax_mm` fails the checker's maximum pitch, at every gauge, in
 * tension, compression alone and reversal. Checked on the footbridge search demo and generated
 * scenarios (invented data) through the full checker; the search against brute force
 * (search-optimality, compression-search, declared-space) guards the use.
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { parseCostTable } from "../src/io/costs.js";
import { parseScenario } from "../src/io/scenario.js";
import { checkScenario } from "../src/engine/check.js";
import { families, layoutOf, resolveSpace, scenarioOf } from "../src/search/space.js";
import { ROOT } from "./helpers/cli.js";
import { withSense } from "./helpers/senses.js";
import { smallSearchScenario } from "./helpers/generate.js";

const costs = parseCostTable(readFileSync(`${ROOT}/catalogue/costs.yaml`, "utf8"), "catalogue");


/**
 * Every staggered family's layouts at the least pitch past the span limit and at the pitch below it
 * (each end distance at the butt sampled, first and last gauge): those past it must fail `max-pitch`.
 * Returns [layouts past the limit checked, layouts below it that pass max-pitch].
 */
function checkSpan(yaml: string): [number, number] {
  const { scenario, code } = parseScenario(yaml);
  const space = resolveSpace(scenario, code, costs);
  const gap = scenario.splice.buttGap_mm;
  const fams = families(scenario, code, costs, space).filter((f) => f.pattern === "staggered");
  let past = 0;
  let belowPassing = 0;
  for (const f of fams) {
    const limit = f.limits.staggeredButtSpanMax_mm;
    if (scenario.splice.type === "lap") {
      expect(limit).toBe(Infinity);
      continue;
    }
    expect(limit).toBe(Math.min(200, ...f.base.plates.covers.map((c) => 16 * c.thickness_mm)));
    const gauges = [f.gauges_mm[0]!, f.gauges_mm[f.gauges_mm.length - 1]!];
    for (const eb of f.endsAtButt_mm) {
      const i = f.pitches_mm.findIndex((p) => gap + 2 * (eb! + p) > limit + 1e-6);
      for (const g of gauges) {
        const maxPitchFails = (p: number) => {
          const { report } = checkScenario(scenarioOf(f, layoutOf(f, p, g, f.ends_mm[0]!, eb)), code);
          return report.checks.some((c) => c.kind === "max-pitch" && !c.pass);
        };
        const label = `M${f.size_mm} ${f.propertyClass} ${f.across}×${f.lines} cover ${String(f.coverThickness_mm)} eb ${String(eb)} g ${g}`;
        if (i >= 0) {
          expect(maxPitchFails(f.pitches_mm[i]!), `${label} p ${f.pitches_mm[i]!}`).toBe(true);
          past++;
        }
        const below = i < 0 ? f.pitches_mm.length - 1 : i - 1;
        if (below >= 0 && !maxPitchFails(f.pitches_mm[below]!)) belowPassing++;
      }
    }
  }
  return [past, belowPassing];
}

describe("stagger span across the butt: past the code's limit every layout fails the maximum pitch", () => {
  for (const sense of ["tension", "compression", "reversal"] as const) {
    it(`footbridge-tie-search.yaml, ${sense}`, () => {
      const [past, belowPassing] = checkSpan(withSense(readFileSync(`${ROOT}/scenarios/footbridge-tie-search.yaml`, "utf8"), sense));
      expect(past).toBeGreaterThan(100);
      // The limit is not loose: in tension some layouts just below it pass the maximum pitch (in
      // compression the compression pitch rule, also of kind max-pitch, is stricter still).
      if (sense === "tension") expect(belowPassing).toBeGreaterThan(0);
    }, 300_000);
    it(`generated IS 800 scenarios, ${sense}`, () => {
      let past = 0;
      for (const seed of [6101, 6102, 6103, 6104, 6105, 6106, 6107, 6108]) past += checkSpan(withSense(smallSearchScenario(seed).yaml, sense))[0];
      expect(past).toBeGreaterThan(10);
    }, 300_000);
  }
});
