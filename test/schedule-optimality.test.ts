/**
 * Optimality of the bolt-type choice against brute force. Generated selection problems (invented
 * costs, bolt counts and quantities) are solved by the bounded enumeration and by HiGHS on the LP text
 * the core writes; both must reach the least cost found by trying every assignment of a type to every
 * splice, with and without each rule, and their assignments must cost that much when priced by the
 * independent evaluator written here. Larger problems compare the enumeration with an exhaustive pass
 * over every subset and with HiGHS.
 */
import { readFileSync } from "node:fs";
import { parse as parseYaml } from "yaml";
import { describe, expect, it } from "vitest";
import { parseCostTable } from "../src/io/costs.js";
import { parseProject } from "../src/io/project.js";
import { selectionProblem, spliceOptions } from "../src/schedule/options.js";
import { bruteForceLayouts } from "../src/search/brute-force.js";
import { ROOT } from "./helpers/cli.js";
import { smallSearchScenario } from "./helpers/generate.js";
import type { PropertyClass } from "../src/catalogue/bolts.js";
import { seeded } from "../src/schedule/generate.js";
import { selectionLp } from "../src/schedule/mip.js";
import { enumerateSelection, evaluateAssignment, type Assignment, type SelectionProblem, type SelectionRules } from "../src/schedule/selection.js";
import { acceptMipAnswer, solveByEnumeration, type SolvedSelection } from "../src/schedule/solve.js";

type Highs = { solve: (lp: string, o: Record<string, unknown>) => { Status: string; ObjectiveValue: number; Columns: Record<string, { Primal?: number }> } };
const highsModule = (await import("highs")) as unknown as { default: () => Promise<Highs> };
const highs = await highsModule.default();

function viaHighs(p: SelectionProblem): SolvedSelection {
  const lp = selectionLp(p);
  const r = highs.solve(lp.text, { mip_rel_gap: 0, output_flag: false, time_limit: 60 });
  const primal: Record<string, number> = {};
  for (const [k, v] of Object.entries(r.Columns ?? {})) if (typeof v.Primal === "number") primal[k] = v.Primal;
  return acceptMipAnswer(p, lp, { status: r.Status, objective: r.Status === "Infeasible" ? null : r.ObjectiveValue, primal });
}

/** The test's own pricing of an assignment: Infinity when it breaks a rule. Written apart from the core. */
function price(p: SelectionProblem, a: Assignment): number {
  const used = new Set(a);
  const r = p.rules;
  if (r.maxTypes !== undefined && used.size > r.maxTypes) return Infinity;
  if (r.oneClassPerDiameter) {
    for (const t of used) for (const u of used) if (p.types[t]!.size_mm === p.types[u]!.size_mm && p.types[t]!.propertyClass !== p.types[u]!.propertyClass) return Infinity;
  }
  let cost = r.costPerType * used.size;
  const bolts = new Map<number, number>();
  for (let m = 0; m < a.length; m++) {
    const o = p.splices[m]!.options[a[m]!];
    if (!o) return Infinity;
    cost += p.splices[m]!.quantity * o.cost;
    bolts.set(a[m]!, (bolts.get(a[m]!) ?? 0) + p.splices[m]!.quantity * o.bolts);
  }
  for (const t of used) if ((bolts.get(t) ?? 0) < r.minBoltsPerType) return Infinity;
  return cost;
}

/** Least cost over every assignment of a type to every splice (T^M of them). */
function bruteForce(p: SelectionProblem): number {
  const T = p.types.length;
  const a: Assignment = Array(p.splices.length).fill(0);
  let best = Infinity;
  const walk = (m: number) => {
    if (m === a.length) {
      best = Math.min(best, price(p, a));
      return;
    }
    for (let t = 0; t < T; t++) {
      if (!p.splices[m]!.options[t]) continue;
      a[m] = t;
      walk(m + 1);
    }
  };
  walk(0);
  return best;
}

const POOL: Array<[number, PropertyClass]> = [
  [16, "4.6"], [16, "8.8"], [20, "4.6"], [20, "8.8"], [20, "10.9"], [24, "8.8"], [24, "10.9"], [27, "8.8"], [30, "10.9"],
];

function problem(seed: number, M: number, T: number, rules: SelectionRules, missing = 0.2): SelectionProblem {
  const r = seeded(seed);
  const start = Math.floor(r() * (POOL.length - T + 1));
  const types = POOL.slice(start, start + T).map(([size_mm, propertyClass]) => ({ size_mm, propertyClass, assembly: "bearing" as const }));
  const bias = types.map(() => 0.7 + 0.6 * r());
  const splices = Array.from({ length: M }, (_, m) => {
    const base = 60 + 400 * r();
    return {
      id: `S${m}`,
      quantity: 1 + Math.floor(r() * 4),
      // Some types cannot serve some splices; costs in cents, so ties happen as they do in practice.
      options: types.map((_, t) => (r() < missing ? null : { cost: Math.round(base * bias[t]! * (0.8 + 0.4 * r()) * 100) / 100, bolts: 2 + Math.floor(r() * 10) })),
    };
  });
  return { types, splices, rules };
}

const RULES: Array<[string, SelectionRules]> = [
  ["no rule", { costPerType: 0, oneClassPerDiameter: false, minBoltsPerType: 0 }],
  ["K = 1", { maxTypes: 1, costPerType: 0, oneClassPerDiameter: false, minBoltsPerType: 0 }],
  ["K = 2", { maxTypes: 2, costPerType: 0, oneClassPerDiameter: false, minBoltsPerType: 0 }],
  ["K = 3", { maxTypes: 3, costPerType: 0, oneClassPerDiameter: false, minBoltsPerType: 0 }],
  ["cost per type", { costPerType: 120, oneClassPerDiameter: false, minBoltsPerType: 0 }],
  ["K = 2 + cost per type", { maxTypes: 2, costPerType: 60, oneClassPerDiameter: false, minBoltsPerType: 0 }],
  ["one class per diameter", { costPerType: 0, oneClassPerDiameter: true, minBoltsPerType: 0 }],
  ["K = 2 + one class per diameter", { maxTypes: 2, costPerType: 0, oneClassPerDiameter: true, minBoltsPerType: 0 }],
  ["minimum bolts", { costPerType: 0, oneClassPerDiameter: false, minBoltsPerType: 12 }],
  ["K = 2 + minimum bolts", { maxTypes: 2, costPerType: 0, oneClassPerDiameter: false, minBoltsPerType: 20 }],
  ["every rule", { maxTypes: 3, costPerType: 40, oneClassPerDiameter: true, minBoltsPerType: 15 }],
];

const close = (a: number, b: number) => (Number.isFinite(a) && Number.isFinite(b) ? Math.abs(a - b) <= 1e-6 * Math.max(1, Math.abs(b)) : a === b);

function expectOptimal(p: SelectionProblem, s: SolvedSelection, best: number) {
  if (!Number.isFinite(best)) {
    expect(s.assignment).toBeNull();
    expect(s.proven).toBe(true);
    return;
  }
  expect(s.assignment).not.toBeNull();
  expect(s.proven).toBe(true);
  expect(close(price(p, s.assignment!), best), `priced ${price(p, s.assignment!)} against brute force ${best}`).toBe(true);
  expect(close(s.cost, best)).toBe(true);
  expect(evaluateAssignment(p, s.assignment!).ok).toBe(true);
}

describe("type choice = brute force over every assignment (6 splices, 6 types)", () => {
  const seeds = Array.from({ length: 12 }, (_, i) => 7100 + i);
  for (const [name, rules] of RULES) {
    it.each(seeds)(`${name}, seed %i`, (seed) => {
      const p = problem(seed, 6, 6, rules);
      const best = bruteForce(p);
      if (rules.minBoltsPerType === 0) expectOptimal(p, solveByEnumeration(p), best);
      else expect(() => enumerateSelection(p)).toThrow(/minimum-bolts/);
      expectOptimal(p, viaHighs(p), best);
    });
  }

  it("the generated problems exercise the rules: some bind, some leave nothing feasible", () => {
    let binding = 0;
    let infeasible = 0;
    for (const seed of seeds) {
      const free = bruteForce(problem(seed, 6, 6, RULES[0]![1]));
      for (const [, rules] of RULES.slice(1)) {
        const b = bruteForce(problem(seed, 6, 6, rules));
        if (!Number.isFinite(b)) infeasible++;
        else if (b > free + 1e-6) binding++;
      }
    }
    expect(binding).toBeGreaterThan(50);
    expect(infeasible).toBeGreaterThan(0);
  });
});

/** Every subset of at most K types, each splice at its cheapest in it: the plain version of the enumeration. */
function everySubset(p: SelectionProblem): number {
  const T = p.types.length;
  let best = Infinity;
  for (let mask = 1; mask < 1 << T; mask++) {
    const set = [...Array(T).keys()].filter((t) => mask & (1 << t));
    if (p.rules.maxTypes !== undefined && set.length > p.rules.maxTypes) continue;
    if (p.rules.oneClassPerDiameter && set.some((t) => set.some((u) => p.types[t]!.size_mm === p.types[u]!.size_mm && p.types[t]!.propertyClass !== p.types[u]!.propertyClass))) continue;
    let cost = p.rules.costPerType * set.length;
    for (const s of p.splices) cost += s.quantity * Math.min(...set.map((t) => s.options[t]?.cost ?? Infinity));
    best = Math.min(best, cost);
  }
  return best;
}

describe("larger jobs: bounded enumeration = every subset = HiGHS (300 splices, 9 types)", () => {
  it.each([
    [8101, RULES[2]![1]],
    [8102, RULES[3]![1]],
    [8103, RULES[5]![1]],
    [8104, RULES[7]![1]],
    [8105, { maxTypes: 4, costPerType: 300, oneClassPerDiameter: true, minBoltsPerType: 0 }],
  ] as Array<[number, SelectionRules]>)("seed %i", (seed, rules) => {
    const p = problem(seed, 300, 9, rules, 0.01);
    const plain = everySubset(p);
    expect(Number.isFinite(plain)).toBe(true);
    const enumerated = solveByEnumeration(p);
    expectOptimal(p, enumerated, plain);
    expectOptimal(p, viaHighs(p), plain);
    // The bound does its work: far fewer subsets evaluated than exist.
    expect(enumerated.subsets!).toBeLessThan(2 ** 9);
  });
});

describe("the answer is re-checked, never taken on trust", () => {
  it("a solver answer that breaks a rule is rejected", () => {
    const p = problem(9001, 5, 5, { maxTypes: 1, costPerType: 0, oneClassPerDiameter: false, minBoltsPerType: 0 });
    const lp = selectionLp(p);
    // Every type stocked: more than one type used, against K = 1.
    const primal = Object.fromEntries(p.types.map((_, t) => [`y${t}`, 1]));
    const s = acceptMipAnswer(p, lp, { status: "Optimal", objective: 0, primal });
    expect(s.proven).toBe(false);
    expect(s.assignment).toBeNull();
  });

  it("an objective that disagrees with the re-checked cost is not proven", () => {
    const p = problem(9002, 5, 5, { costPerType: 0, oneClassPerDiameter: false, minBoltsPerType: 0 });
    const lp = selectionLp(p);
    const good = solveByEnumeration(p);
    const primal = Object.fromEntries([...new Set(good.assignment!)].map((t) => [`y${t}`, 1]));
    expect(acceptMipAnswer(p, lp, { status: "Optimal", objective: good.cost, primal }).proven).toBe(true);
    expect(acceptMipAnswer(p, lp, { status: "Optimal", objective: good.cost - 1, primal }).proven).toBe(false);
    expect(acceptMipAnswer(p, lp, { status: "Time limit reached", objective: good.cost, primal }).proven).toBe(false);
  });
});

/**
 * Whole pipeline on generated jobs: each splice's best layout per bolt type from the per-type search
 * equals the first layout of that type in a brute-force enumeration of the splice's whole declared
 * space (every candidate through the checker, no bound), and the type choice on those costs equals the
 * brute force over every assignment, with and without each rule.
 */
describe("generated jobs end to end: per-type search = brute force, type choice = brute force", () => {
  const costs = parseCostTable(readFileSync(`${ROOT}/catalogue/costs.yaml`, "utf8"), "catalogue");
  /** The first `count` generated splices from `seed` on that have a compliant layout (the others end a job at once). */
  const job = (seed: number, count: number) => {
    const entries: Array<Record<string, unknown>> = [];
    for (let k = seed; entries.length < count; k++) {
      const s = parseYaml(smallSearchScenario(k).yaml) as Record<string, unknown>;
      const entry: Record<string, unknown> = { id: `S${k}`, quantity: 1 + (k % 3) };
      for (const key of ["splice", "plates", "load", "search", "options"]) if (s[key] !== undefined) entry[key] = s[key];
      if (s.bolts) {
        const { size: _size, class: _class, ...assembly } = s.bolts as Record<string, unknown>;
        entry.bolts = assembly;
      }
      const one = parseProject(JSON.stringify({ project: "probe", code: "is800-2007", splices: [entry] }));
      if (spliceOptions(one.splices[0]!.scenario, one.code, costs).options.length > 0) entries.push(entry);
    }
    return parseProject(JSON.stringify({ project: "generated job (invented)", code: "is800-2007", splices: entries }));
  };
  it.each([[1000], [3200]])("job from seed %i", (seed) => {
    const project = job(seed, 4);
    const fast = project.splices.map((s) => spliceOptions(s.scenario, project.code, costs));
    const { problem } = selectionProblem(project.splices, fast, RULES[0]![1]);
    // The brute-force cost of every (splice, type): its first layout of that type in the full ranking.
    project.splices.forEach((s, m) => {
      const all = bruteForceLayouts({ scenario: s.scenario, code: project.code, costs }, Infinity, "cost").results;
      problem.types.forEach((t, k) => {
        const first = all.find((c) => c.family.size_mm === t.size_mm && c.family.propertyClass === t.propertyClass && c.family.base.bolts.assembly === t.assembly);
        const mine = problem.splices[m]!.options[k];
        expect(mine?.cost, `${s.id} ${t.size_mm} ${t.propertyClass}`).toBe(first?.cost.total);
        expect(mine?.bolts).toBe(first?.joint.holes.length);
      });
      // The splice's own optimum over its whole space is the least over its types.
      const own = Math.min(...problem.splices[m]!.options.map((o) => o?.cost ?? Infinity));
      expect(own).toBe(all[0]?.cost.total ?? Infinity);
    });
    const free = bruteForce(problem);
    let binding = 0;
    for (const [, rules] of RULES) {
      const p = { ...problem, rules };
      const best = bruteForce(p);
      if (best > free + 1e-6) binding++;
      if (rules.minBoltsPerType === 0) expectOptimal(p, solveByEnumeration(p), best);
      expectOptimal(p, viaHighs(p), best);
    }
    // The job is one where the rules matter: several of them raise the cost.
    expect(problem.types.length).toBeGreaterThanOrEqual(4);
    expect(binding).toBeGreaterThanOrEqual(3);
  });
});
