/**
 * Integer programme for tapered patterns (javascript-lp-solver): for a fixed bolt, pitch, number of
 * transverse lines, gauge and plates, choose the bolts on each line.
 *
 * Variables: x[i][k] ∈ {0, 1} — line i carries k bolts (k = 1 … kmax_i).
 * Constraints:
 *   one count per line:        Σ_k x[i][k] = 1                       for every line i
 *   bolt total:                Σ_i Σ_k k·x[i][k] = N                 (N fixed per solve, raised from
 *                                                                     the bolt-group lower bound)
 *   straight net section of every line of every plate, load already transferred or not:
 *     full:        s·T ≤ Rn·(b − d0·n_i)                    → kmax_i
 *     transferred: s·T·Σ_{l ≤ i} n_l ≤ N·Rn·(b − d0·n_i)    (lines l at or nearer the plate's end)
 *     with Rn = 0.9·t·fu/γm1 per mm of net width (the code's Tdn per mm), s the plate's share of T;
 *   fewest bolts on line 0:    Σ_k k·x[0][k] ≥ min_across (search.min_across; line 0, at the butt, is
 *                              the fullest line of the declared shape)
 *   no-good cuts:              Σ_i x[i][v_i] ≤ lines − 1            for every vector v already returned
 *                                                                     (uniform vectors are grid layouts)
 *   the declared tapered shape: one parity on every line, Σ_{k odd} x[i][k] = Σ_{k odd} x[0][k], and
 *   counts never rising away from line 0, n_{i+1} − n_i ≤ 0 — so the holes of every gauge line are
 *   on consecutive transverse lines and start at the butt (or at plate B's end in a lap splice).
 * Objective: minimise Σ_i i·n_i / (lines·N) — any feasible vector is acceptable; the small weight makes
 * the answer deterministic (fewer bolts on lines far from main plate B's end first).
 * Every answer is checked for `feasible` and `isIntegral`; zig-zag paths, block shear and every rule are
 * then run by the checker. If the solver gives no integral answer, the same vectors are enumerated
 * directly (exact, slower), so every answer stays proven.
 */
import lpModule from "javascript-lp-solver";

/** The solver object (its types describe a CommonJS default, its ESM build exports it directly). */
const solver = ((lpModule as unknown as { default?: unknown }).default ?? lpModule) as { Solve(model: object): unknown };

export interface TaperedNetRow {
  /** Share of the joint tension in the plate. */
  share: number;
  /** Design rupture strength per mm of net width, N/mm (0.9·t·fu/γm1 for IS 800). */
  perWidth_N_per_mm: number;
  width_mm: number;
  /** For each line i, the lines at or nearer this plate's end (indices into the line list). */
  atOrNearer: number[][];
}

export interface TaperedProblem {
  lines: number;
  /** Largest count each line can take (gauge and edge distance on the narrowest plate). */
  kmax: number[];
  /** Fewest bolts on line 0, the fullest line (search.min_across); absent: 1. */
  minFirst?: number;
  holeAcross_mm: number;
  tension_N: number;
  transferred: boolean;
  rows: TaperedNetRow[];
}

export interface TaperedAnswer {
  counts: number[];
  /** How the answer was found: the integer programme, or the fallback enumeration. */
  by: "ip" | "enumeration";
}

const v = (i: number, k: number) => `x_${i}_${k}`;

/** Whether a count vector meets the programme's constraints (used by the fallback and by tests). */
export function meetsConstraints(p: TaperedProblem, counts: number[]): boolean {
  const N = counts.reduce((a, b) => a + b, 0);
  for (let i = 0; i < p.lines; i++) if ((counts[i] ?? 0) < 1 || (counts[i] ?? 0) > (p.kmax[i] ?? 0)) return false;
  if ((counts[0] ?? 0) < (p.minFirst ?? 1)) return false;
  for (let i = 1; i < p.lines; i++) if (counts[i]! > counts[i - 1]! || counts[i]! % 2 !== counts[0]! % 2) return false;
  for (const row of p.rows) {
    for (let i = 0; i < p.lines; i++) {
      const capacity = row.perWidth_N_per_mm * (row.width_mm - p.holeAcross_mm * counts[i]!);
      const demand = p.transferred ? (row.share * p.tension_N * row.atOrNearer[i]!.reduce((s, l) => s + counts[l]!, 0)) / N : row.share * p.tension_N;
      if (demand > capacity * (1 + 1e-12)) return false;
    }
  }
  return true;
}

/**
 * Whether some count vector with N bolts meets the constraints and is not excluded. An exact walk over
 * the declared shape only (line 0 from min_across, every count of line 0's parity, never rising from
 * line 0, within kmax; each complete vector then tested by `meetsConstraints`), so it visits far fewer
 * vectors than `enumerateNext`. Every answer `nextTaperedCounts` returns meets the constraints, has N
 * bolts and is not excluded; so where this is false it can only return null, and the caller skips it.
 */
export function anyOpenVector(p: TaperedProblem, N: number, excluded: readonly number[][]): boolean {
  const counts = new Array<number>(p.lines).fill(0);
  const isExcluded = () => excluded.some((v) => v.length === counts.length && v.every((k, i) => k === counts[i]));
  /** Lines i… take `remaining` bolts, each at most the line before and of the parity of `least`. */
  const walk = (i: number, remaining: number, least: number): boolean => {
    if (i === p.lines) return remaining === 0 && meetsConstraints(p, counts) && !isExcluded();
    const rest = p.lines - i - 1;
    let top = Math.min(counts[i - 1]!, p.kmax[i] ?? 0);
    if ((top - least) % 2 !== 0) top--;
    for (let k = top; k >= least; k -= 2) {
      if (remaining - k < least * rest || remaining - k > k * rest) continue;
      counts[i] = k;
      if (walk(i + 1, remaining - k, least)) return true;
    }
    return false;
  };
  for (let k0 = Math.max(p.minFirst ?? 1, 1); k0 <= (p.kmax[0] ?? 0); k0++) {
    const least = k0 % 2 === 1 ? 1 : 2;
    const rest = p.lines - 1;
    if (N - k0 < least * rest || N - k0 > k0 * rest) continue;
    counts[0] = k0;
    if (walk(1, N - k0, least)) return true;
  }
  return false;
}

function key(counts: number[]): string {
  return counts.join(",");
}

/**
 * The next count vector with exactly N bolts that meets the constraints and is not excluded, or null.
 * Solved as a 0-1 integer programme; if the solver does not return an integral answer within its time,
 * the vectors are enumerated instead.
 */
export function nextTaperedCounts(p: TaperedProblem, N: number, excluded: readonly number[][], timeout_ms = 250): TaperedAnswer | null {
  const constraints: Record<string, { equal?: number; max?: number; min?: number }> = { total: { equal: N } };
  const variables: Record<string, Record<string, number>> = {};
  const binaries: Record<string, 1> = {};
  for (let i = 0; i < p.lines; i++) {
    constraints[`line_${i}`] = { equal: 1 };
    for (let k = 1; k <= (p.kmax[i] ?? 0); k++) {
      const name = v(i, k);
      variables[name] = { obj: (i * k) / (p.lines * N), [`line_${i}`]: 1, total: k };
      binaries[name] = 1;
    }
  }
  if ((p.minFirst ?? 1) > 1) {
    // the fullest line carries at least min_across bolts: Σ_k k·x[0][k] ≥ minFirst
    constraints.first = { min: p.minFirst! };
    for (let k = 1; k <= (p.kmax[0] ?? 0); k++) variables[v(0, k)]!.first = k;
  }
  for (let i = 1; i < p.lines; i++) {
    constraints[`parity_${i}`] = { equal: 0 };
    constraints[`taper_${i}`] = { max: 0 };
    for (let k = 1; k <= (p.kmax[i] ?? 0); k++) {
      if (k % 2 === 1) variables[v(i, k)]![`parity_${i}`] = 1;
      variables[v(i, k)]![`taper_${i}`] = k;
    }
    for (let k = 1; k <= (p.kmax[i - 1] ?? 0); k++) variables[v(i - 1, k)]![`taper_${i}`] = (variables[v(i - 1, k)]![`taper_${i}`] ?? 0) - k;
    for (let k = 1; k <= (p.kmax[0] ?? 0); k += 2) variables[v(0, k)]![`parity_${i}`] = (variables[v(0, k)]![`parity_${i}`] ?? 0) - 1;
  }
  p.rows.forEach((row, r) => {
    for (let i = 0; i < p.lines; i++) {
      const c = `net_${r}_${i}`;
      if (p.transferred) {
        // s·T·Σ_{l ≤ i} n_l + N·Rn·d0·n_i ≤ N·Rn·b
        constraints[c] = { max: N * row.perWidth_N_per_mm * row.width_mm };
        for (const l of row.atOrNearer[i]!) {
          for (let k = 1; k <= (p.kmax[l] ?? 0); k++) variables[v(l, k)]![c] = (variables[v(l, k)]![c] ?? 0) + row.share * p.tension_N * k;
        }
        for (let k = 1; k <= (p.kmax[i] ?? 0); k++) variables[v(i, k)]![c] = (variables[v(i, k)]![c] ?? 0) + N * row.perWidth_N_per_mm * p.holeAcross_mm * k;
      } else {
        // s·T ≤ Rn·(b − d0·n_i)  ⇔  d0·n_i ≤ b − s·T/Rn
        constraints[c] = { max: row.width_mm - (row.share * p.tension_N) / row.perWidth_N_per_mm };
        for (let k = 1; k <= (p.kmax[i] ?? 0); k++) variables[v(i, k)]![c] = p.holeAcross_mm * k;
      }
    }
  });
  excluded.forEach((counts, j) => {
    if (counts.reduce((a, b) => a + b, 0) !== N) return;
    const c = `cut_${j}`;
    constraints[c] = { max: p.lines - 1 };
    counts.forEach((k, i) => {
      const name = v(i, k);
      if (variables[name]) variables[name]![c] = 1;
    });
  });
  const model = { optimize: "obj", opType: "min" as const, constraints, variables, binaries, options: { timeout: timeout_ms, tolerance: 0 } };
  const result = solver.Solve(model) as { feasible?: boolean; isIntegral?: boolean; [k: string]: unknown };
  if (result.feasible === true && result.isIntegral === true) {
    const counts: number[] = [];
    for (let i = 0; i < p.lines; i++) {
      let chosen = 0;
      for (let k = 1; k <= (p.kmax[i] ?? 0); k++) if (Math.round(Number(result[v(i, k)] ?? 0)) === 1) chosen = k;
      counts.push(chosen);
    }
    const excludedKeys = new Set(excluded.map(key));
    if (counts.every((c) => c >= 1) && counts.reduce((a, b) => a + b, 0) === N && meetsConstraints(p, counts) && !excludedKeys.has(key(counts))) {
      return { counts, by: "ip" };
    }
    return enumerateNext(p, N, excluded);
  }
  if (result.feasible === false && result.isIntegral !== false) {
    // Proven infeasible by the solver; confirm cheaply by enumeration only when the space is small.
    return spaceSize(p) <= 4096 ? enumerateNext(p, N, excluded) : null;
  }
  return enumerateNext(p, N, excluded);
}

function spaceSize(p: TaperedProblem): number {
  return p.kmax.reduce((a, k) => a * Math.max(1, k), 1);
}

/** Fallback: the first vector (in a fixed order) with N bolts meeting the constraints, not excluded. */
export function enumerateNext(p: TaperedProblem, N: number, excluded: readonly number[][]): TaperedAnswer | null {
  const excludedKeys = new Set(excluded.map(key));
  const counts = Array(p.lines).fill(1);
  const walk = (i: number, remaining: number): boolean => {
    if (i === p.lines) return remaining === 0 && !excludedKeys.has(key(counts)) && meetsConstraints(p, counts);
    const left = p.lines - i - 1;
    for (let k = 1; k <= (p.kmax[i] ?? 0); k++) {
      if (remaining - k < left) break;
      counts[i] = k;
      if (walk(i + 1, remaining - k)) return true;
    }
    return false;
  };
  return walk(0, N) ? { counts: [...counts], by: "enumeration" } : null;
}
