/**
 * The search skips the tapered integer programme at a bolt total where `anyOpenVector` finds no vector
 * (DEVELOPERS.md, "Tapered patterns: the integer programme"). That is exact only if the walk answers
 * the same as the full enumeration (`enumerateNext`: every vector of 1…kmax on every line, tested by
 * `meetsConstraints`). Checked on generated problems (invented plates and loads): both net-section
 * treatments, tight and loose net rows, min_across, and exclusion lists made of the stream's own
 * vectors and the uniform (grid) vectors, as the search builds them.
 */
import { describe, expect, it } from "vitest";
import { anyOpenVector, enumerateNext, type TaperedProblem } from "../src/search/tapered-ip.js";
import { rng } from "./helpers/generate.js";

function problem(seed: number): TaperedProblem {
  const r = rng(seed);
  const lines = 2 + Math.floor(r() * 4); // 2 … 5 lines
  const kmax = 2 + Math.floor(r() * 5); // 2 … 6 across
  const width_mm = 100 + Math.floor(r() * 200);
  const hole_mm = 18 + Math.floor(r() * 8);
  const perWidth = 2000 + r() * 6000; // N per mm of net width (invented)
  const tension_N = perWidth * width_mm * (0.3 + 0.7 * r());
  const nearer = (i: number, towardLow: boolean) => Array.from({ length: lines }, (_, l) => l).filter((l) => (towardLow ? l <= i : l >= i));
  const row = (share: number, towardLow: boolean) => ({ share, perWidth_N_per_mm: perWidth, width_mm, atOrNearer: Array.from({ length: lines }, (_, i) => nearer(i, towardLow)) });
  const p: TaperedProblem = { lines, kmax: Array(lines).fill(kmax), holeAcross_mm: hole_mm, tension_N, transferred: r() < 0.5, rows: [row(1, true), row(0.5, false)] };
  if (r() < 0.4) p.minFirst = 1 + Math.floor(r() * kmax);
  return p;
}

describe("anyOpenVector answers as the full enumeration does", () => {
  it("on 300 generated problems, every bolt total, excluding the vectors found so far", () => {
    let withVector = 0;
    let without = 0;
    for (let seed = 1; seed <= 300; seed++) {
      const p = problem(seed);
      const excluded: number[][] = Array.from({ length: p.kmax[0]! }, (_, i) => Array(p.lines).fill(i + 1));
      const maxN = p.kmax.reduce((a, b) => a + b, 0);
      for (let N = p.lines; N <= maxN; N++) {
        for (;;) {
          const found = enumerateNext(p, N, excluded);
          expect(anyOpenVector(p, N, excluded), `seed ${seed}, N ${N}, excluded ${JSON.stringify(excluded)}`).toBe(found !== null);
          if (!found) {
            without++;
            break;
          }
          withVector++;
          excluded.push(found.counts);
        }
      }
    }
    expect(withVector).toBeGreaterThan(100);
    expect(without).toBeGreaterThan(100);
  });
});
