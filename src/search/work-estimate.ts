/**
 * The work of a search, estimated from its declared space before it starts. Pure.
 *
 * The estimate is the number of candidate layouts in the declared space — what `bruteForceLayouts`
 * would check: for grid and staggered families (size, class, cover thickness, counts) every pitch ×
 * end distance × end distance at the butt × gauge of the family's ranges; for tapered families every
 * count vector of the declared shape (one parity, never rising away from the butt, not uniform) that
 * the widest line allows, × the same dimensions × every gauge. The best-first search checks far fewer,
 * but it can approach this when the bounds cut little, so a space is refused above a limit rather than
 * run for minutes. The ranges are the declared space's own (`dimensionRanges`, `gaugesFor`,
 * `taperedGaugesFor` in space.ts, whose lists are short: src/io refuses a step below 1 mm, 1/16 in);
 * counting multiplies their lengths, building no family. `test/work-estimate.test.ts` checks the count
 * against the families' own ranges.
 */
import { boltPrice, type CostTable } from "../catalogue/costs.js";
import { WorkLimitError } from "./work-limit.js";
import type { DesignCode, SearchLimits } from "../codes/types.js";
import type { Scenario, SearchSpec } from "../model/scenario.js";
import { boltSpecFor, dimensionRanges, gaugesFor, minAcrossOf, narrowestWidth, resolveSpace, taperedGaugesFor, withCover, type SearchPattern, type SearchSpace } from "./space.js";

/**
 * Candidate layouts a search may have in its declared space without --max-candidates: 10¹¹. The bundled
 * demos hold 1.2 × 10⁸ to 2.4 × 10⁸ and a 600 mm plate with the default 12 lines about 3.3 × 10¹⁰; the
 * best-first search checks a tiny share of them (DEVELOPERS.md, "Work bounds", has the measurements).
 */
export const DEFAULT_MAX_CANDIDATES = 100_000_000_000;

/** The search fields an engineer can narrow, in the order the message prefers them on a tie. */
export const SEARCH_FIELDS = ["step", "max_along", "max_across", "sizes", "classes", "patterns", "cover_thicknesses"] as const;
export type SearchField = (typeof SEARCH_FIELDS)[number];

/** Values on the step grid from `from` to `to`, as `stepRange` lists them, counted without the list. */
export function stepCount(from_mm: number, to_mm: number, step_mm: number): number {
  const first = Math.ceil(from_mm / step_mm - 1e-9);
  const last = Math.floor(to_mm / step_mm + 1e-9);
  return Math.max(0, last - first + 1);
}

/** Gauges of G gauge lines on a plate of width W (the declared space's own list). */
function gaugeCount(G: number, width_mm: number, limits: SearchLimits, space: SearchSpace): number {
  return gaugesFor(G, width_mm, limits, space).length;
}

/** n choose k as a floating-point number (Infinity when it overflows). */
function choose(n: number, k: number): number {
  let c = 1;
  for (let i = 1; i <= Math.min(k, n - k); i++) c = (c * (n - Math.min(k, n - k) + i)) / i;
  return c;
}

/**
 * Tapered count vectors of m lines with at most kcap bolts on a line and at least minFirst on line 0 (the
 * fullest): non-increasing sequences of one parity (v values of that parity give C(m + v − 1, m)
 * sequences), less those whose first count is below minFirst, the uniform ones (grids) left out.
 */
export function taperedVectorCount(m: number, kcap: number, minFirst = 1): number {
  const below = Math.max(0, minFirst - 1);
  const parity = (offset: 0 | 1, cap: number) => Math.floor((cap + offset) / 2); // values of one parity up to cap (odd: offset 1)
  const sequences = (v: number) => (v > 0 ? choose(m + v - 1, m) : 0);
  let total = 0;
  for (const offset of [1, 0] as const) {
    const all = parity(offset, kcap);
    const small = parity(offset, Math.min(below, kcap));
    total += sequences(all) - sequences(small) - (all - small);
  }
  return total;
}

/** The dimension lattice of a family's ranges: (pitches, end distances, end distances at the butt). */
function dimensionCounts(limits: SearchLimits, space: SearchSpace, butt: boolean): { pitches: number; ends: number; endsAtButt: number } {
  const r = dimensionRanges(limits, space, butt);
  return { pitches: r.pitches.length, ends: r.ends.length, endsAtButt: r.endsAtButt.length };
}

interface PatternInput {
  pattern: SearchPattern;
  limits: SearchLimits;
  space: SearchSpace;
  width_mm: number;
  butt: boolean;
}

/** Most bolts across a family of these limits may have (as `families`). */
function acrossLimit(limits: SearchLimits, space: SearchSpace, width_mm: number): number {
  return Math.min(space.maxAcross ?? Infinity, Math.floor((width_mm - 2 * limits.edgeMin_mm) / limits.gaugeMin_mm + 1e-9) + 1);
}

/** Candidates of one pattern for one bolt and cover thickness, over every count of the space. */
function patternCandidates({ pattern, limits, space, width_mm, butt }: PatternInput): number {
  const d = dimensionCounts(limits, space, butt);
  if (d.ends === 0 || d.endsAtButt === 0) return 0;
  const perFamily = (lines: number) => (lines > 1 ? d.pitches : 1) * d.ends * d.endsAtButt;
  const maxAcross = acrossLimit(limits, space, width_mm);
  const minAcross = minAcrossOf(space, Math.floor((width_mm - 2 * limits.edgeMin_mm) / limits.gaugeMin_mm + 1e-9) + 1);
  let total = 0;
  if (pattern === "tapered") {
    if (maxAcross < Math.max(2, minAcross)) return 0;
    const gaugeList = taperedGaugesFor(limits, width_mm, space);
    const gMin = gaugeList[0] ?? Infinity;
    const gauges = gaugeList.length;
    const kcap = Math.min(space.maxAcross ?? Infinity, Math.floor((width_mm - 2 * limits.edgeMin_mm) / (space.fixedGauge_mm ?? gMin) + 1e-9) + 1);
    if (kcap < 2) return 0;
    for (let m = 2; m <= space.maxAlong; m++) total += taperedVectorCount(m, kcap, minAcross) * perFamily(m) * gauges;
    return total;
  }
  for (let a = pattern === "grid" ? minAcross : Math.max(2, minAcross); a <= maxAcross; a++) {
    const gauges = gaugeCount(pattern === "grid" ? a : 2 * a - 1, width_mm, limits, space);
    if (gauges === 0) continue;
    for (let m = pattern === "grid" ? 1 : 2; m <= space.maxAlong; m++) {
      const bolts = pattern === "grid" ? m * a : m * a - Math.floor(m / 2);
      if (bolts >= space.minBolts) total += gauges * perFamily(m);
    }
  }
  return total;
}

/** Candidate layouts of a resolved space (see the module comment), and the most bolts across any family has. */
function tally(scenario: Scenario, code: DesignCode, costs: CostTable, space: SearchSpace): { candidates: number; maxAcross: number } {
  const width_mm = narrowestWidth(scenario);
  const butt = scenario.splice.type !== "lap";
  const covers: Array<number | undefined> = butt ? space.coverThicknesses_mm : [undefined];
  let candidates = 0;
  let maxAcross = 1;
  for (const d of space.sizes_mm) {
    for (const c of space.classes) {
      if (boltPrice(costs, d, c) === undefined) continue;
      for (const t of covers) {
        const base = { ...withCover(scenario, t), bolts: boltSpecFor(scenario, d, c, space.assembly) };
        for (const pattern of space.patterns) {
          const limits = code.searchLimits(base, d, pattern);
          candidates += patternCandidates({ pattern, limits, space, width_mm, butt });
          maxAcross = Math.max(maxAcross, acrossLimit(limits, space, width_mm));
        }
      }
    }
  }
  return { candidates, maxAcross };
}

/** Candidate layouts of a resolved space (see the module comment). */
export function countCandidates(scenario: Scenario, code: DesignCode, costs: CostTable, space: SearchSpace): number {
  return tally(scenario, code, costs, space).candidates;
}

/** The field whose narrowing shrinks a space most, and what it leaves. */
export interface Narrowing {
  field: SearchField;
  candidates: number;
  /** The change in words: "doubling search.step". */
  change: string;
}

/** The narrowing of a field in words. */
function changeText(field: SearchField, space: SearchSpace): string {
  if (field === "step") return "doubling search.step";
  if (field === "patterns" && space.patterns.includes("tapered")) return "leaving tapered out of search.patterns";
  if (field === "max_along" || field === "max_across") return `halving search.${field}`;
  return `halving the list search.${field}`;
}

/** The scenario's search section with one field narrowed: step doubled, counts and lists halved. */
function narrowed(spec: SearchSpec, space: SearchSpace, field: SearchField, maxAcrossNow: number): SearchSpec | null {
  const half = <T>(xs: readonly T[]) => (xs.length > 1 ? xs.slice(0, Math.ceil(xs.length / 2)) : null);
  const out: SearchSpec = { ...spec };
  if (field === "step") out.step_mm = space.step_mm * 2;
  else if (field === "max_along") {
    if (space.maxAlong < 2) return null;
    out.maxAlong = Math.ceil(space.maxAlong / 2);
  } else if (field === "max_across") {
    if (maxAcrossNow < 2) return null;
    out.maxAcross = Math.ceil(maxAcrossNow / 2);
  } else {
    const list = field === "sizes" ? half(space.sizes_mm) : field === "classes" ? half(space.classes) : field === "patterns" ? (space.patterns.includes("tapered") ? space.patterns.filter((p) => p !== "tapered") : half(space.patterns)) : half(space.coverThicknesses_mm);
    if (!list || list.length === 0) return null;
    if (field === "sizes") out.sizes_mm = list as number[];
    else if (field === "classes") out.classes = list as SearchSpace["classes"];
    else if (field === "patterns") out.patterns = list as SearchPattern[];
    else out.coverThicknesses_mm = list as number[];
  }
  return out;
}

/** The search field whose narrowing (step doubled, a count or list halved) shrinks the space most. */
export function bestNarrowing(scenario: Scenario, code: DesignCode, costs: CostTable): Narrowing {
  const space = resolveSpace(scenario, code, costs);
  const now = tally(scenario, code, costs, space);
  let best: Narrowing = { field: "step", candidates: now.candidates, change: changeText("step", space) };
  for (const field of SEARCH_FIELDS) {
    const spec = narrowed(scenario.search ?? {}, space, field, now.maxAcross);
    if (!spec) continue;
    const s = { ...scenario, search: spec };
    const n = countCandidates(s, code, costs, resolveSpace(s, code, costs));
    if (n < best.candidates) best = { field, candidates: n, change: changeText(field, space) };
  }
  return best;
}

export { WorkLimitError };

/** A count in words: "12 400", or "3.1 × 10^9" from ten million up. */
export function countText(n: number): string {
  if (!Number.isFinite(n)) return "more than 10^300";
  if (n < 1e7) return String(Math.round(n)).replace(/\B(?=(\d{3})+(?!\d))/g, " ");
  const e = Math.floor(Math.log10(n));
  return `${(n / 10 ** e).toFixed(1)} × 10^${e}`;
}

/**
 * The error for a declared space of `candidates` above `limit`: it names the search field of `scenario`
 * whose narrowing shrinks it most (`prefix` places it: "search" or "splices[3].search").
 */
export function workLimitError(scenario: Scenario, code: DesignCode, costs: CostTable, candidates: number, limit: number, prefix = "search", what = "the declared search space holds"): WorkLimitError {
  const n = bestNarrowing(scenario, code, costs);
  const lift = candidates <= Number.MAX_SAFE_INTEGER ? ` or pass --max-candidates ${Math.ceil(candidates)} to search it knowingly` : " (too large to search at all)";
  return new WorkLimitError(
    `${prefix}.${n.field}`,
    `${what} about ${countText(candidates)} candidate layouts, more than the limit of ${countText(limit)}; narrow it (${n.change} leaves about ${countText(n.candidates)}${what.startsWith("the declared") ? "" : " in the largest"})${lift}`,
    candidates,
  );
}

/** Count the candidates of a scenario's declared space and refuse it above `limit`, before any search. Returns the count. */
export function assertWithinLimit(scenario: Scenario, code: DesignCode, costs: CostTable, limit: number, prefix = "search"): number {
  const candidates = countCandidates(scenario, code, costs, resolveSpace(scenario, code, costs));
  if (candidates > limit) throw workLimitError(scenario, code, costs, candidates, limit, prefix);
  return candidates;
}
