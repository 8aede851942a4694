/**
 * The bolt-type selection as a mixed-integer programme in CPLEX LP text (for HiGHS), and the reading of
 * its answer back into an assignment. Pure: the shell runs the solver.
 *
 *   min  F·Σ_t y_t + Σ_m Σ_t q_m·c_mt·x_mt
 *   s.t. Σ_t x_mt = 1                       every splice one type (only types it has a layout of)
 *        x_mt − y_t ≤ 0                      only stocked types (the strong form: one row per pair)
 *        Σ_t y_t ≤ K                         type limit
 *        y_t − z_dc ≤ 0,  Σ_c z_dc ≤ 1       one class per diameter d
 *        Σ_m q_m·n_mt·x_mt − B·y_t ≥ 0       minimum bolts per stocked type
 *        y, z binary; x ∈ [0, 1], binary only with the minimum-bolts rule.
 *
 * Without the minimum-bolts rule x may stay continuous: for fixed y the rows left are one choice per
 * splice among the stocked types, whose optimum is every splice at its cheapest stocked type. The answer
 * is read from y alone (`cheapestWithin`), so a fractional x never reaches the schedule.
 */
import { cheapestWithin, type Assignment, type SelectionProblem } from "./selection.js";

const num = (v: number) => {
  if (!Number.isFinite(v)) throw new RangeError(`non-finite coefficient ${v}`);
  return String(v);
};

/** Terms as LP text, several per line (the format lets an expression run over lines). */
function expression(terms: Array<[number, string]>): string {
  const parts = terms.map(([c, name], i) => `${c < 0 ? "-" : i === 0 ? "" : "+"} ${num(Math.abs(c))} ${name}`.trim());
  const lines: string[] = [];
  for (let i = 0; i < parts.length; i += 8) lines.push(parts.slice(i, i + 8).join(" "));
  return lines.join("\n   ");
}

export const yName = (t: number) => `y${t}`;
export const xName = (m: number, t: number) => `x${m}_${t}`;

export interface SelectionLp {
  text: string;
  /** Whether x is binary (the minimum-bolts rule). */
  binaryAssignments: boolean;
}

export function selectionLp(p: SelectionProblem): SelectionLp {
  const { costPerType: F, maxTypes: K, oneClassPerDiameter, minBoltsPerType: B } = p.rules;
  const binaryAssignments = B > 0;
  const offered = p.types.map((_, t) => p.splices.some((s) => s.options[t]));
  const types = p.types.map((_, t) => t).filter((t) => offered[t]);
  const objective: Array<[number, string]> = [];
  for (const t of types) if (F > 0) objective.push([F, yName(t)]);
  const rows: string[] = [];
  const bounds: string[] = [];
  const binaries: string[] = types.map(yName);
  p.splices.forEach((s, m) => {
    const own: Array<[number, string]> = [];
    s.options.forEach((o, t) => {
      if (!o) return;
      objective.push([s.quantity * o.cost, xName(m, t)]);
      own.push([1, xName(m, t)]);
      rows.push(` u${m}_${t}: ${xName(m, t)} - ${yName(t)} <= 0`);
      if (binaryAssignments) binaries.push(xName(m, t));
      else bounds.push(` 0 <= ${xName(m, t)} <= 1`);
    });
    rows.push(` a${m}: ${expression(own)} = 1`);
  });
  if (K !== undefined) rows.push(` k: ${expression(types.map((t) => [1, yName(t)]))} <= ${K}`);
  if (oneClassPerDiameter) {
    const sizes = new Map<number, Set<string>>();
    for (const t of types) {
      const { size_mm, propertyClass } = p.types[t]!;
      sizes.set(size_mm, (sizes.get(size_mm) ?? new Set()).add(propertyClass));
    }
    for (const [d, classes] of sizes) {
      if (classes.size < 2) continue;
      const z = (c: string) => `z${d}_${c.replace(".", "_")}`;
      for (const t of types) if (p.types[t]!.size_mm === d) rows.push(` c${t}: ${yName(t)} - ${z(p.types[t]!.propertyClass)} <= 0`);
      rows.push(` d${d}: ${expression([...classes].map((c) => [1, z(c)]))} <= 1`);
      binaries.push(...[...classes].map(z));
    }
  }
  if (B > 0) {
    for (const t of types) {
      const terms: Array<[number, string]> = [];
      p.splices.forEach((s, m) => {
        const o = s.options[t];
        if (o) terms.push([s.quantity * o.bolts, xName(m, t)]);
      });
      terms.push([-B, yName(t)]);
      rows.push(` n${t}: ${expression(terms)} >= 0`);
    }
  }
  const text = [
    "\\ splicewright: bolt types to stock for a job (generated)",
    "Minimize",
    ` obj: ${expression(objective)}`,
    "Subject To",
    ...rows,
    "Bounds",
    ...bounds,
    "Binary",
    ` ${binaries.join(" ")}`,
    "End",
    "",
  ].join("\n");
  return { text, binaryAssignments };
}

/**
 * The assignment a solver's primal values describe: with continuous x, every splice at its cheapest
 * stocked type (y read as 0/1 at 0.5); with binary x, each splice's x at 1. Null when they give none.
 */
export function readMipAnswer(p: SelectionProblem, lp: SelectionLp, primal: Readonly<Record<string, number>>): Assignment | null {
  const value = (name: string) => primal[name] ?? 0;
  if (!lp.binaryAssignments) {
    const stocked = p.types.map((_, t) => t).filter((t) => value(yName(t)) > 0.5);
    return cheapestWithin(p, stocked);
  }
  const a: Assignment = [];
  for (const [m, s] of p.splices.entries()) {
    let best = -1;
    s.options.forEach((o, t) => {
      if (o && value(xName(m, t)) > 0.5) best = t;
    });
    if (best < 0) return null;
    a.push(best);
  }
  return a;
}
