/**
 * Bolt-type rationalisation for a whole job: choose the bolt types to stock and give every splice one of
 * them, at least total cost, under the shop's rules. Pure.
 *
 * Data: for splice m and type t, c[m][t] = cost of the splice's best compliant layout of that type (or
 * none), n[m][t] its bolt count, q[m] the number of identical splices. An assignment a gives each splice a
 * type; the types used are U(a) = {a[m]}. Cost(a) = F·|U| + Σ_m q[m]·c[m][a[m]]. Rules, each optional:
 * |U| ≤ K; one property class per diameter among U; Σ_{m: a[m] = t} q[m]·n[m][t] ≥ B for every t in U.
 *
 * Without the minimum-bolts rule the problem is one over subsets S of types: every splice takes its
 * cheapest type in S, and Cost(S) = F·|S| + Σ_m q[m]·min_{t∈S} c[m][t]. `enumerateSelection` searches the
 * subsets exactly, depth first with a bound (proof in DEVELOPERS.md, "Schedule"); the integer programme
 * (mip.ts) covers large K and the minimum-bolts rule. `evaluateAssignment` is the one cost evaluator
 * every answer is re-checked by, whichever method found it.
 */
import { boltSizeText } from "../catalogue/bolts.js";
import { boltWordsOf } from "../codes/words.js";
import type { BoltType } from "../search/per-type.js";

export interface SelectionRules {
  /** At most this many types used (undefined: no limit). */
  maxTypes?: number;
  /** Fixed cost of each type stocked (0: rule off). */
  costPerType: number;
  /** Never two property classes of one diameter among the types used. */
  oneClassPerDiameter: boolean;
  /** Every type used carries at least this many bolts over the job (0: rule off). */
  minBoltsPerType: number;
}

/** One splice's best layout of one type: its cost (one splice) and bolt count. */
export interface TypeChoice {
  cost: number;
  bolts: number;
}

export interface SelectionProblem {
  types: BoltType[];
  splices: Array<{ id: string; quantity: number; options: Array<TypeChoice | null> }>;
  rules: SelectionRules;
}

/** The type index each splice takes. */
export type Assignment = number[];

export interface Evaluation {
  ok: boolean;
  cost: number;
  used: number[];
  /** Every rule the assignment breaks, in words. */
  problems: string[];
}

/** Relative tolerance of cost comparisons (floating-point sums of the same terms in another order). */
export const COST_TOLERANCE = 1e-9;
const tol = (v: number) => (Number.isFinite(v) ? COST_TOLERANCE * Math.max(1, Math.abs(v)) : 0);

/** A bolt type as the schedule names it, in the words of the job's code (its tag: HSFG, preloaded, SC). */
export const typeLabel = (t: BoltType, codeId = "is800-2007"): string => {
  const tag = boltWordsOf(codeId).tag(t.assembly);
  return `${boltSizeText(t.size_mm)} ${t.propertyClass}${tag ? ` ${tag}` : ""}`;
};

/** The one cost evaluator: total cost of an assignment and every rule it breaks. */
export function evaluateAssignment(p: SelectionProblem, a: Assignment): Evaluation {
  const problems: string[] = [];
  const bolts = new Map<number, number>();
  let cost = 0;
  p.splices.forEach((s, m) => {
    const t = a[m];
    const choice = t === undefined ? null : s.options[t] ?? null;
    if (t === undefined || !choice) {
      problems.push(`splice ${s.id} has no compliant layout of the type given to it`);
      return;
    }
    cost += s.quantity * choice.cost;
    bolts.set(t, (bolts.get(t) ?? 0) + s.quantity * choice.bolts);
  });
  const used = [...bolts.keys()].sort((x, y) => x - y);
  cost += p.rules.costPerType * used.length;
  const { maxTypes, oneClassPerDiameter, minBoltsPerType } = p.rules;
  if (maxTypes !== undefined && used.length > maxTypes) problems.push(`${used.length} types used, more than ${maxTypes}`);
  if (oneClassPerDiameter) {
    const classOf = new Map<number, string>();
    for (const t of used) {
      const type = p.types[t]!;
      const seen = classOf.get(type.size_mm);
      if (seen !== undefined && seen !== type.propertyClass) problems.push(`${boltSizeText(type.size_mm)} in two classes (${seen} and ${type.propertyClass})`);
      classOf.set(type.size_mm, type.propertyClass);
    }
  }
  if (minBoltsPerType > 0) {
    for (const t of used) if ((bolts.get(t) ?? 0) < minBoltsPerType) problems.push(`${typeLabel(p.types[t]!)} carries ${bolts.get(t)} bolts, fewer than ${minBoltsPerType}`);
  }
  return { ok: problems.length === 0, cost, used, problems };
}

/** Every splice's cheapest type within a set (ties: the lower type index), or null if one has none. */
export function cheapestWithin(p: SelectionProblem, set: readonly number[]): Assignment | null {
  const order = [...set].sort((x, y) => x - y);
  const a: Assignment = [];
  for (const s of p.splices) {
    let best = -1;
    let bestCost = Infinity;
    for (const t of order) {
      const c = s.options[t]?.cost;
      if (c !== undefined && c < bestCost) {
        best = t;
        bestCost = c;
      }
    }
    if (best < 0) return null;
    a.push(best);
  }
  return a;
}

/** Each splice's own optimum: its cheapest type of all (ties: the lower type index). */
export function ownOptima(p: SelectionProblem): Assignment | null {
  return cheapestWithin(p, p.types.map((_, t) => t));
}

export interface EnumerationResult {
  assignment: Assignment | null;
  cost: number;
  /** Subsets whose cost was evaluated. */
  subsets: number;
}

/**
 * Exact least-cost subset of at most K types (rules: fixed cost per type, one class per diameter), by
 * depth-first enumeration with a bound. Not valid with the minimum-bolts rule (which links splices).
 *
 * Types are visited in a fixed order (cheapest alone first); a node is a set S whose last type sits at
 * position i. Every set below it is S ∪ A with A drawn from positions after i, so its cost is at least
 * F·(|S| + 1) + Σ_m q[m]·min(min_{t∈S} c[m][t], min_{t after i} c[m][t]): the node's descendants are
 * skipped when that is not below the best cost found. Siblings further right have larger suffix minima,
 * so the bound only rises along the loop and the loop may stop at the first sibling it rejects.
 */
export function enumerateSelection(p: SelectionProblem): EnumerationResult {
  if (p.rules.minBoltsPerType > 0) throw new RangeError("the minimum-bolts rule links splices: use the integer programme");
  const M = p.splices.length;
  const T = p.types.length;
  const F = p.rules.costPerType;
  const K = Math.min(p.rules.maxTypes ?? T, T);
  const weight = (t: number) => {
    const w = new Float64Array(M);
    p.splices.forEach((s, m) => {
      const c = s.options[t]?.cost;
      w[m] = c === undefined ? Infinity : s.quantity * c;
    });
    return w;
  };
  const sum = (w: Float64Array) => w.reduce((a, b) => a + b, 0);
  const alone = Array.from({ length: T }, (_, t) => ({ t, w: weight(t) })).map((x) => ({ ...x, cost: sum(x.w), covers: x.w.filter(Number.isFinite).length }));
  // Visit order: types that serve every splice by their cost alone, then the rest by how many they serve.
  alone.sort((x, y) => (Number.isFinite(x.cost) || Number.isFinite(y.cost) ? x.cost - y.cost || x.t - y.t : y.covers - x.covers || x.t - y.t));
  const order = alone.map((x) => x.t);
  const w = alone.map((x) => x.w);
  const suffix: Float64Array[] = Array.from({ length: T + 1 }, () => new Float64Array(M).fill(Infinity));
  for (let i = T - 1; i >= 0; i--) for (let m = 0; m < M; m++) suffix[i]![m] = Math.min(w[i]![m]!, suffix[i + 1]![m]!);

  let best = Infinity;
  let bestSet: number[] = [];
  let subsets = 0;
  const chosen: number[] = [];
  const classAt = new Map<number, string>();
  const levels = Array.from({ length: K + 1 }, () => new Float64Array(M).fill(Infinity));
  const boundOf = (cur: Float64Array, from: number, size: number) => {
    let b = F * size;
    const suf = suffix[from]!;
    for (let m = 0; m < M; m++) b += Math.min(cur[m]!, suf[m]!);
    return b;
  };

  const visit = (from: number, depth: number) => {
    const cur = levels[depth]!;
    const next = levels[depth + 1]!;
    for (let i = from; i < T; i++) {
      // Every set through this sibling or one further right costs at least this much.
      if (boundOf(cur, i, depth + 1) >= best - tol(best)) return;
      const type = p.types[order[i]!]!;
      const held = classAt.get(type.size_mm);
      if (p.rules.oneClassPerDiameter && held !== undefined && held !== type.propertyClass) continue;
      const wi = w[i]!;
      let cost = F * (depth + 1);
      for (let m = 0; m < M; m++) {
        const v = Math.min(cur[m]!, wi[m]!);
        next[m] = v;
        cost += v;
      }
      subsets++;
      chosen.push(order[i]!);
      if (cost < best - tol(best)) {
        best = cost;
        bestSet = [...chosen];
      }
      if (depth + 1 < K && boundOf(next, i + 1, depth + 2) < best - tol(best)) {
        classAt.set(type.size_mm, type.propertyClass);
        visit(i + 1, depth + 1);
        if (held === undefined) classAt.delete(type.size_mm);
      }
      chosen.pop();
    }
  };
  if (M > 0 && K > 0) visit(0, 0);
  const assignment = Number.isFinite(best) ? cheapestWithin(p, bestSet) : null;
  return { assignment, cost: assignment ? evaluateAssignment(p, assignment).cost : Infinity, subsets };
}

/** Σ_{k=1..K} C(T, k): the subsets of at most K of T types (capped at `cap`). */
export function subsetCount(T: number, K: number, cap = Number.MAX_SAFE_INTEGER): number {
  let total = 0;
  let c = 1;
  for (let k = 1; k <= Math.min(K, T); k++) {
    c = (c * (T - k + 1)) / k;
    total += c;
    if (total >= cap) return cap;
  }
  return Math.round(total);
}

/**
 * The fewest types that give every splice a compliant layout under the one-class rule (ignoring cost,
 * the type limit and the minimum-bolts rule), or null when even all types together do not. Used to say
 * why a type limit cannot be met.
 */
export function fewestTypes(p: SelectionProblem): number | null {
  const cover: SelectionProblem = {
    types: p.types,
    splices: p.splices.map((s) => ({ id: s.id, quantity: 1, options: s.options.map((o) => (o ? { cost: 0, bolts: o.bolts } : null)) })),
    rules: { costPerType: 1, oneClassPerDiameter: p.rules.oneClassPerDiameter, minBoltsPerType: 0 },
  };
  const r = enumerateSelection(cover);
  return r.assignment ? Math.round(r.cost) : null;
}
