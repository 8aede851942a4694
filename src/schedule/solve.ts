/**
 * Which exact method solves a selection, and how a solver's answer is accepted. Pure: the shell runs
 * HiGHS and hands its status, objective and primal values to `acceptMipAnswer`.
 */
import { readMipAnswer, type SelectionLp } from "./mip.js";
import { enumerateSelection, evaluateAssignment, fewestTypes, subsetCount, type Assignment, type SelectionProblem } from "./selection.js";
import { METHOD_REQUESTS, type Method, type MethodRequest } from "./method.js";

export { METHOD_REQUESTS, type Method, type MethodRequest };

/** Above this many candidate subsets `auto` uses the integer programme (../shared/solvers.md). */
export const ENUMERATION_LIMIT = 200_000;

/** Relative tolerance between HiGHS's objective and the re-checked cost (its gap and feasibility tolerances). */
export const MIP_TOLERANCE = 1e-6;

export interface SolvedSelection {
  /** Null when no assignment satisfies the rules (or none was found). */
  assignment: Assignment | null;
  cost: number;
  method: Method;
  /** True when the answer is proven optimal (or no assignment is proven to exist). */
  proven: boolean;
  /** How it was solved and proven, in words. */
  statement: string;
  subsets?: number;
  solver?: { status: string; objective: number | null };
  /** When nothing satisfies the rules: the fewest types that serve every splice (one-class rule only). */
  fewestTypes?: number | null;
}

export function chooseMethod(p: SelectionProblem, requested: MethodRequest): { method: Method; why: string } {
  const offered = p.types.filter((_, t) => p.splices.some((s) => s.options[t])).length;
  const K = Math.min(p.rules.maxTypes ?? offered, offered);
  const subsets = subsetCount(offered, K, ENUMERATION_LIMIT + 1);
  if (p.rules.minBoltsPerType > 0) {
    if (requested === "enumerate") throw new RangeError("the minimum-bolts rule links splices to each other; only the integer programme solves it (use --method mip or auto)");
    return { method: "integer programme", why: "the minimum-bolts rule needs binary assignments" };
  }
  if (requested === "enumerate") return { method: "enumeration", why: "requested" };
  if (requested === "mip") return { method: "integer programme", why: "requested" };
  return subsets > ENUMERATION_LIMIT
    ? { method: "integer programme", why: `more than ${ENUMERATION_LIMIT} subsets of at most ${K} of ${offered} types` }
    : { method: "enumeration", why: `${subsets} subsets of at most ${K} of ${offered} types` };
}

function withFewest(p: SelectionProblem, s: SolvedSelection): SolvedSelection {
  if (!s.assignment && s.proven) s.fewestTypes = fewestTypes(p);
  return s;
}

export function solveByEnumeration(p: SelectionProblem): SolvedSelection {
  const r = enumerateSelection(p);
  return withFewest(p, {
    assignment: r.assignment,
    cost: r.cost,
    method: "enumeration",
    proven: true,
    subsets: r.subsets,
    statement: r.assignment
      ? `proven optimal: exact enumeration of the type subsets with an admissible bound (${r.subsets} subset${r.subsets === 1 ? "" : "s"} evaluated), re-checked by the cost evaluator`
      : "proven: no choice of types within the rules gives every splice a compliant layout (exact enumeration)",
  });
}

/** Accept HiGHS's answer only as far as the cost evaluator confirms it. */
export function acceptMipAnswer(p: SelectionProblem, lp: SelectionLp, result: { status: string; objective: number | null; primal: Readonly<Record<string, number>> }): SolvedSelection {
  const solver = { status: result.status, objective: result.objective };
  const base = { method: "integer programme" as const, solver };
  if (result.status === "Infeasible") {
    return withFewest(p, { ...base, assignment: null, cost: Infinity, proven: true, statement: "HiGHS proves that no choice of types within the rules gives every splice a compliant layout" });
  }
  const a = Object.keys(result.primal).length > 0 ? readMipAnswer(p, lp, result.primal) : null;
  const ev = a ? evaluateAssignment(p, a) : null;
  if (!a || !ev || !ev.ok) {
    const why = ev && !ev.ok ? `its answer breaks a rule on re-check (${ev.problems[0]})` : "no assignment could be read from its answer";
    return { ...base, assignment: null, cost: Infinity, proven: false, statement: `HiGHS status "${result.status}": ${why}; no schedule` };
  }
  const objective = result.objective;
  const agrees = objective !== null && Math.abs(ev.cost - objective) <= MIP_TOLERANCE * Math.max(1, Math.abs(objective));
  if (result.status === "Optimal" && agrees) {
    return { ...base, assignment: a, cost: ev.cost, proven: true, statement: "proven optimal by HiGHS (relative gap 0) and re-checked by the cost evaluator: the same cost from the answer's own assignment" };
  }
  const reason = result.status === "Optimal" ? `HiGHS's objective ${objective} disagrees with the re-checked cost ${ev.cost}` : `HiGHS stopped with status "${result.status}"`;
  return { ...base, assignment: a, cost: ev.cost, proven: false, statement: `NOT proven optimal: ${reason}; the schedule shown satisfies every rule (re-checked)` };
}
