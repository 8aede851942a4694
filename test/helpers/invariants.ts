/**
 * The property invariants, written once: test/properties.test.ts runs them on a few dozen generated
 * scenarios in every `npm test`, and `npm run soak` (test/soak/invariants.soak.ts) on thousands per code.
 * Each returns how often it was exercised (not vacuously true), for the caller to require. The scenarios
 * are generated data (invented).
 */
import { readFileSync } from "node:fs";
import fc from "fast-check";
import { expect } from "vitest";
import type { PropertyClass } from "../../src/catalogue/bolts.js";
import { checkScenario } from "../../src/engine/check.js";
import { parseCostTable } from "../../src/io/costs.js";
import { parseScenario } from "../../src/io/scenario.js";
import type { StrengthCheck } from "../../src/model/results.js";
import type { CheckableScenario, Scenario } from "../../src/model/scenario.js";
import { searchLayouts } from "../../src/search/search.js";
import { fromUnit, toUnit } from "../../src/units/units.js";
import { ROOT } from "./cli.js";
import { aiscScenario as smallAiscScenario, ec3Scenario as smallEc3Scenario, smallSearchScenario, type Generated } from "./generate.js";

const costs = parseCostTable(readFileSync(`${ROOT}/catalogue/costs.yaml`, "utf8"), "catalogue");
const seeds = fc.integer({ min: 1, max: 1_000_000 });

/** One design code's generators and the plate case of its thickness invariant. */
export interface CodeCase {
  code: string;
  generate: (seed: number) => Generated;
  /** Bearing-type classes in order of strength, as the code allows them. */
  classes: PropertyClass[];
  /** A splice whose main plate thickness t varies within one strength band [tMin, tMax]. */
  plate: (t: number) => string;
  tMin: number;
  tMax: number;
}

const plateSplice = (code: string, grade: string, coverGrade: string, bolts: string) => (t: number) => `
name: thickness property
code: ${code}
splice: { type: butt-double-cover }
plates:
  main: { width: 200, thickness: ${t}, grade: ${grade} }
  cover: { width: 200, thickness: 8, grade: ${coverGrade} }
load: { factored_tension: 100 }
bolts: ${bolts}
layout: { pattern: staggered, across: 3, along: 3, pitch: 35, gauge: 45, end_distance: 40, end_distance_at_butt: 40 }
`;

export const CODE_CASES: Record<"is800" | "en1993" | "aisc360", CodeCase> = {
  // IS 2062 Table 2: E250 fy 250 MPa for t < 20 mm.
  is800: { code: "is800-2007", generate: smallSearchScenario, classes: ["4.6", "5.6", "8.8", "10.9"], plate: plateSplice("is800-2007", "E250", "E250", '{ size: M20, class: "8.8" }'), tMin: 6, tMax: 19.9 },
  // EN 10025-2: S275 ReH 275 MPa for t ≤ 16 mm, Rm one band from 3 to 100 mm.
  en1993: { code: "en1993-1-8", generate: smallEc3Scenario, classes: ["4.6", "5.6", "8.8", "10.9"], plate: plateSplice("en1993-1-8", "S275", "S275", '{ size: M20, class: "8.8" }'), tMin: 6, tMax: 16 },
  // ASTM A36: Fy 36 ksi, Fu 58 ksi for every thickness to 8 in (AISC Manual Table 2-5, common practice). A307, A325, A490.
  aisc360: { code: "aisc360-16", generate: smallAiscScenario, classes: ["4.6", "8.8", "10.9"], plate: plateSplice("aisc360-16", "A36", "A36", "{ size: M20, class: A325 }"), tMin: 6, tMax: 50 },
};

function generated(c: CodeCase, seed: number) {
  return parseScenario(c.generate(seed).yaml);
}
function withLoad(s: Scenario, factor: number): Scenario {
  const load = { ...s.load, factoredTension_N: s.load.factoredTension_N * factor };
  if (s.load.serviceTension_N !== undefined) load.serviceTension_N = s.load.serviceTension_N * factor;
  return { ...s, load };
}

/** Every layout the search returns passes `check` on its own, with the same joint strength. Returns layouts re-checked. */
export function searchResultsPassCheck(c: CodeCase, runs: number, seed: number): number {
  let checked = 0;
  fc.assert(
    fc.property(seeds, (s) => {
      const { scenario, code } = generated(c, s);
      for (const r of searchLayouts({ scenario, code, costs }, { top: 3, rankBy: "cost" }).results) {
        checked++;
        const again = checkScenario(r.scenario, code);
        expect(again.report.pass).toBe(true);
        expect(again.report.jointStrength_N).toBeCloseTo(r.report.jointStrength_N, 6);
      }
    }),
    { numRuns: runs, seed },
  );
  return checked;
}

/** Raising the load never lowers the optimum's cost nor the least compliant bolt count. Returns comparisons with a layout. */
export function loadMonotone(c: CodeCase, runs: number, seed: number): number {
  let compared = 0;
  fc.assert(
    fc.property(seeds, fc.double({ min: 1.05, max: 1.6, noNaN: true }), (s, factor) => {
      const { scenario, code } = generated(c, s);
      const heavier = withLoad(scenario, factor);
      const cost = (x: Scenario) => searchLayouts({ scenario: x, code, costs }, { top: 1, rankBy: "cost" }).results[0]?.cost.total ?? Infinity;
      const bolts = (x: Scenario) => searchLayouts({ scenario: x, code, costs }, { top: 1, rankBy: "bolts" }).results[0]?.joint.holes.length ?? Infinity;
      const [c0, c1] = [cost(scenario), cost(heavier)];
      if (Number.isFinite(c1)) compared++;
      expect(c1).toBeGreaterThanOrEqual(c0 - 1e-9);
      expect(bolts(heavier)).toBeGreaterThanOrEqual(bolts(scenario));
    }),
    { numRuns: runs, seed },
  );
  return compared;
}

/** A stronger bolt class never needs more bolts for the same size and pattern (bearing bolts). Returns cases with a layout. */
export function classMonotone(c: CodeCase, runs: number, seed: number): number {
  let exercised = 0;
  fc.assert(
    fc.property(seeds, fc.constantFrom("grid" as const, "staggered" as const), (s, pattern) => {
      const { scenario, code } = generated(c, s);
      if (scenario.bolts?.assembly === "friction-grip") return;
      const d = scenario.search?.sizes_mm?.[1] ?? 20;
      const least = (cls: PropertyClass) =>
        searchLayouts({ scenario: { ...scenario, search: { ...scenario.search, sizes_mm: [d], classes: [cls], patterns: [pattern] } }, code, costs }, { top: 1, rankBy: "bolts" }).results[0]?.joint.holes.length ?? Infinity;
      const counts = c.classes.map(least);
      if (Number.isFinite(counts[counts.length - 1]!)) exercised++;
      for (let i = 1; i < counts.length; i++) expect(counts[i]!).toBeLessThanOrEqual(counts[i - 1]!);
    }),
    { numRuns: runs, seed },
  );
  return exercised;
}

function resistances(c: CodeCase, t: number) {
  const { scenario, code } = parseScenario(c.plate(t));
  const { report } = checkScenario(scenario as CheckableScenario, code);
  const r = (id: string) => (report.checks.find((x) => x.id === id) as StrengthCheck).resistance_N;
  return { gross: r("gross-yield:mainA"), net: r("net-section:mainA"), bearing: r("bearing:mainA:A"), block: r("block-shear:mainA:A") };
}

/** Within one strength band, gross yield, net section, bearing and block shear never fall as the main plate thickens. */
export function thicknessMonotone(c: CodeCase, runs: number, seed: number): void {
  fc.assert(
    fc.property(fc.double({ min: c.tMin, max: c.tMax - 0.1, noNaN: true }), fc.double({ min: 0.05, max: 1.4, noNaN: true }), (t, dt) => {
      const a = resistances(c, t);
      const b = resistances(c, Math.min(c.tMax, t + dt));
      for (const k of ["gross", "net", "bearing", "block"] as const) expect(b[k]).toBeGreaterThanOrEqual(a[k] - 1e-6);
    }),
    { numRuns: runs, seed },
  );
}

/** kN ↔ kip, mm ↔ in, MPa ↔ ksi return what went in. */
export function unitRoundTrips(runs: number, seed: number): void {
  fc.assert(
    fc.property(fc.double({ min: 1e-3, max: 1e7, noNaN: true }), (v) => {
      expect(fromUnit(toUnit(v, "kip", "force"), "kip", "force")).toBeCloseTo(v, 6);
      expect(fromUnit(toUnit(v, "in", "length"), "in", "length")).toBeCloseTo(v, 6);
      expect(fromUnit(toUnit(v, "ksi", "stress"), "ksi", "stress")).toBeCloseTo(v, 6);
    }),
    { numRuns: runs, seed },
  );
}
