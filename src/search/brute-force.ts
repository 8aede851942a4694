/**
 * Brute-force reference for the search: every candidate of the declared space through the full checker,
 * no bound, no lattice, no integer programme. Used by the optimality tests and the bench only.
 */
import { compareKeys, type RankBy } from "./ranking.js";
import { arrangementOf, evaluate, identityOf, type Candidate, type SearchContext, type SearchStats } from "./search.js";
import { families, layoutOf, resolveSpace, taperedGauges } from "./space.js";
import { countCandidates } from "./work-estimate.js";

/** Every tapered count vector of the declared shape: one parity, never rising from line 0, not uniform. */
export function taperedVectors(lines: number, kmax: number): number[][] {
  const out: number[][] = [];
  const walk = (prefix: number[]) => {
    if (prefix.length === lines) {
      if (new Set(prefix).size > 1) out.push([...prefix]);
      return;
    }
    const last = prefix[prefix.length - 1];
    for (let k = 1; k <= (last ?? kmax); k++) {
      if (last !== undefined && k % 2 !== last % 2) continue;
      prefix.push(k);
      walk(prefix);
      prefix.pop();
    }
  };
  walk([]);
  return out;
}

function narrowest(ctx: SearchContext): number {
  const s = ctx.scenario;
  return Math.min(s.plates.mainA.width_mm, s.plates.mainB.width_mm, ...s.plates.covers.map((c) => c.width_mm));
}

/**
 * The best `top` layouts of the declared space by `rankBy`: by default the best of each distinct
 * arrangement (size, class, pattern, counts), with `variants` the best gauge of every variant — the
 * same two readings as `searchLayouts`.
 */
export function bruteForceLayouts(ctx: SearchContext, top: number, rankBy: RankBy, options: { variants?: boolean } = {}): { results: Candidate[]; checks: number } {
  const identity = options.variants ? identityOf : arrangementOf;
  const space = resolveSpace(ctx.scenario, ctx.code, ctx.costs);
  const fams = families(ctx.scenario, ctx.code, ctx.costs, space);
  const stats: SearchStats = { families: 0, familiesSkippedByBound: 0, nodes: 0, candidatesSkippedByBound: 0, fullChecks: 0, integerProgrammes: 0, enumerationFallbacks: 0, declaredCandidates: countCandidates(ctx.scenario, ctx.code, ctx.costs, space) };
  const width = narrowest(ctx);
  // The best `top` layouts of distinct identity so far (variants: a layout's identity leaves out its
  // gauge; otherwise its identity is its arrangement).
  const best: Candidate[] = [];
  const maxLength = space.maxSpliceLength_mm ?? Infinity;
  const keep = (c: Candidate | null) => {
    if (!c || c.joint.spliceLength_mm > maxLength + 1e-9) return;
    const id = identity(c);
    const same = best.findIndex((b) => identity(b) === id);
    if (same >= 0) {
      if (compareKeys(c.key, best[same]!.key) >= 0) return;
      best.splice(same, 1);
    }
    best.push(c);
    best.sort((a, b) => compareKeys(a.key, b.key));
    if (best.length > top) best.length = top;
  };
  for (const f of fams) {
    for (const p of f.pitches_mm) {
      for (const e of f.ends_mm) {
        for (const eb of f.endsAtButt_mm) {
          if (f.countsPerLine) {
            for (const g of f.gauges_mm) keep(evaluate(ctx, f, layoutOf(f, p, g, e, eb), f.countsPerLine, rankBy, stats).candidate);
          } else {
            const gauges = taperedGauges(f, width, space);
            const gMin = gauges[0];
            if (gMin === undefined) continue;
            const kcap = Math.min(space.maxAcross ?? Infinity, Math.floor((width - 2 * f.limits.edgeMin_mm) / gMin + 1e-9) + 1);
            for (const counts of taperedVectors(f.lines, kcap)) {
              if (counts.reduce((a, b) => a + b, 0) < space.minBolts || counts[0]! < f.minAcross) continue;
              const widest = Math.max(...counts);
              for (const g of gauges) {
                if (width - (widest - 1) * g < 2 * f.limits.edgeMin_mm - 1e-9) continue;
                keep(evaluate(ctx, f, layoutOf(f, p, g, e, eb, counts), counts, rankBy, stats).candidate);
              }
            }
          }
        }
      }
    }
  }
  return { results: best, checks: stats.fullChecks };
}
