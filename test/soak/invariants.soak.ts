/**
 * Soak: every property invariant of test/properties.test.ts (helpers/invariants.ts) over many generated
 * scenarios per design code — `npm run soak`, outside `npm test` and CI for its time. SOAK_RUNS sets the
 * scenarios per invariant and code (default 1000); SOAK_SEED the first fast-check seed (default 1).
 * The figures (cases, time) are printed per invariant and written to soak-report.json.
 */
import { writeFileSync } from "node:fs";
import { afterAll, describe, expect, it } from "vitest";
import { classMonotone, CODE_CASES, loadMonotone, searchResultsPassCheck, thicknessMonotone, unitRoundTrips } from "../helpers/invariants.js";

const RUNS = Number(process.env.SOAK_RUNS ?? 1000);
const SEED = Number(process.env.SOAK_SEED ?? 1);
if (!Number.isInteger(RUNS) || RUNS < 1) throw new Error(`SOAK_RUNS must be a whole number of 1 or more, got ${process.env.SOAK_RUNS}`);

const figures: Array<{ code: string; invariant: string; cases: number; exercised: number | null; seconds: number }> = [];
function timed(code: string, invariant: string, run: () => number | void, cases = RUNS): number | void {
  const t0 = performance.now();
  const exercised = run();
  const seconds = (performance.now() - t0) / 1000;
  figures.push({ code, invariant, cases, exercised: exercised ?? null, seconds: Number(seconds.toFixed(1)) });
  console.log(`soak ${code} ${invariant}: ${cases} cases${exercised !== undefined ? ` (${exercised} exercised)` : ""} in ${seconds.toFixed(1)} s`);
  return exercised;
}

describe.each(Object.entries(CODE_CASES))("soak: %s", (name, c) => {
  // A share of the generated scenarios is infeasible or friction grip by design; the rest must exercise the invariant.
  it(`every search result passes check (${RUNS} scenarios)`, () => {
    expect(timed(name, "search results pass check", () => searchResultsPassCheck(c, RUNS, SEED))).toBeGreaterThan(RUNS / 4);
  });
  it(`load monotonicity (${RUNS} scenarios)`, () => {
    expect(timed(name, "load monotonicity", () => loadMonotone(c, RUNS, SEED + 1))).toBeGreaterThan(RUNS / 10);
  });
  it(`class monotonicity (${RUNS} scenarios)`, () => {
    expect(timed(name, "class monotonicity", () => classMonotone(c, RUNS, SEED + 2))).toBeGreaterThan(RUNS / 10);
  });
  it(`thickness within a strength band (${RUNS} cases)`, () => {
    timed(name, "thickness monotonicity", () => thicknessMonotone(c, RUNS, SEED + 3));
  });
});

describe("soak: units", () => {
  it(`unit round trips (${RUNS * 10} values)`, () => {
    timed("all", "unit round trips", () => unitRoundTrips(RUNS * 10, SEED + 4), RUNS * 10);
  });
});

afterAll(() => {
  writeFileSync("soak-report.json", JSON.stringify({ runs: RUNS, seed: SEED, figures }, null, 2) + "\n");
});
