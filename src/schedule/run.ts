/**
 * The steps of a whole-job schedule around the per-splice searches, shared by both shells (the CLI's
 * worker threads and the workbench's Web Workers): which splices to search, how their results are
 * spread over identical splices, the rules, the choice of types (enumeration, or HiGHS through a solver
 * the shell supplies) and what is said when no schedule exists. Pure.
 */
import type { Scenario } from "../model/scenario.js";
import { selectionLp } from "./mip.js";
import type { SpliceOptions } from "./options.js";
import { typeLabel, type SelectionProblem, type SelectionRules } from "./selection.js";
import { acceptMipAnswer, chooseMethod, solveByEnumeration, type MethodRequest, type SolvedSelection } from "./solve.js";

/** What a HiGHS solve returns, as plain data (the shell runs HiGHS where it does not block). */
export interface HighsAnswer {
  status: string;
  objective: number | null;
  primal: Record<string, number>;
  version: string;
}

/** HiGHS's options for the selection: a relative gap of 0 (the default 1e-4 would accept an answer 0.01 % above the optimum). */
export function highsOptions(timeLimit_s: number): { mip_rel_gap: number; time_limit: number; output_flag: boolean } {
  return { mip_rel_gap: 0, time_limit: timeLimit_s, output_flag: false };
}

/** HiGHS's result as plain data: status, objective (null without a solution) and every column's primal value. */
export function highsAnswerOf(r: { Status: string; ObjectiveValue: number; Columns?: Record<string, unknown> }, version: string): HighsAnswer {
  const primal: Record<string, number> = {};
  for (const [name, column] of Object.entries(r.Columns ?? {})) {
    const value = (column as { Primal?: number }).Primal;
    if (typeof value === "number") primal[name] = value;
  }
  const hasSolution = r.Status !== "Infeasible" && Number.isFinite(r.ObjectiveValue);
  return { status: r.Status, objective: hasSolution ? r.ObjectiveValue : null, primal, version };
}

/** Runs one HiGHS solve of CPLEX LP text with a time limit. */
export type HighsSolver = (lp: string, timeLimit_s: number) => Promise<HighsAnswer>;

/** What these steps read of a project: its name and its splices. */
export interface Job {
  name: string;
  splices: ReadonlyArray<{ id: string; mark?: string; scenario: Scenario }>;
}

/** A splice's identity for the search: its scenario without name and project. */
/** A splice's identity for the search: its scenario without name and project. */
export const spliceIdentity = (p: Job, m: number) => JSON.stringify({ ...p.splices[m]!.scenario, name: "", project: "" });

/** Identical splices (same plates, load, space and options) in groups: each group is searched once, by its first member. */
export function distinctSplices(project: Job): number[][] {
  const groups = new Map<string, number[]>();
  project.splices.forEach((_, m) => {
    const key = spliceIdentity(project, m);
    groups.set(key, [...(groups.get(key) ?? []), m]);
  });
  return [...groups.values()];
}

/** A group's search result for each of its members: the others get it under their own names. */
export function resultsOfGroup(project: Job, group: readonly number[], result: SpliceOptions): Array<[number, SpliceOptions]> {
  return group.map((m) => [m, m === group[0] ? result : renamed(result, project.splices[m]!.id)]);
}

function renamed(o: SpliceOptions, name: string): SpliceOptions {
  return { ...o, options: o.options.map((x) => ({ ...x, scenario: { ...x.scenario, name } })) };
}

export interface RuleOverrides {
  maxTypes?: number;
  costPerType?: number;
  oneClassPerDiameter?: boolean;
  minBoltsPerType?: number;
}

/** The project file's rules with the shell's choices (command line or form) over them. */
export function rulesWith(file: SelectionRules, over: RuleOverrides): SelectionRules {
  const rules: SelectionRules = {
    costPerType: over.costPerType ?? file.costPerType,
    oneClassPerDiameter: over.oneClassPerDiameter ?? file.oneClassPerDiameter,
    minBoltsPerType: over.minBoltsPerType ?? file.minBoltsPerType,
  };
  const K = over.maxTypes ?? file.maxTypes;
  if (K !== undefined) rules.maxTypes = K;
  return rules;
}

/** Why a requested method cannot serve these rules, or null. */
export function methodRefusal(rules: SelectionRules, method: MethodRequest): string | null {
  return rules.minBoltsPerType > 0 && method === "enumerate" ? "enumerate cannot apply the minimum-bolts rule (it links splices): use auto or mip" : null;
}

/** Splices with no compliant layout of any type, one line each (null when every splice has one). */
export function missingLayouts(project: Job, searches: readonly SpliceOptions[]): { lines: string[]; text: string; json: object } | null {
  const missing = project.splices.map((s, m) => ({ s, r: searches[m]! })).filter(({ r }) => r.options.length === 0);
  if (missing.length === 0) return null;
  const lines = missing.map(({ s, r }) => {
    const last = r.none[r.none.length - 1];
    return `splice ${s.id}${s.mark ? ` (mark ${s.mark})` : ""}: no compliant layout with any bolt type of its space${last ? ` — with ${typeLabel(last.type, s.scenario.code)}: ${last.reason}` : ""}`;
  });
  return {
    lines,
    text: [`No schedule: ${missing.length} splice${missing.length === 1 ? " has" : "s have"} no compliant layout.`, ...lines].join("\n"),
    json: { project: project.name, scheduled: false, noCompliantLayout: missing.map(({ s, r }) => ({ id: s.id, mark: s.mark ?? "", reasons: r.none.map((n) => ({ type: typeLabel(n.type, s.scenario.code), reason: n.reason })) })) },
  };
}

/** The choice of types: exact enumeration, or HiGHS through `solve`, its answer re-checked. */
export async function chooseBoltTypes(problem: SelectionProblem, request: MethodRequest, timeLimit_s: number, solve: HighsSolver): Promise<SolvedSelection> {
  const { method } = chooseMethod(problem, request);
  if (method === "enumeration") return solveByEnumeration(problem);
  const lp = selectionLp(problem);
  return acceptMipAnswer(problem, lp, await solve(lp.text, timeLimit_s));
}

/** Whether the choice of types will need the integer programme (HiGHS). */
export function needsHighs(problem: SelectionProblem, request: MethodRequest): boolean {
  return chooseMethod(problem, request).method === "integer programme";
}

/** Why there is no schedule, with the fewest types that would serve every splice under a type limit. */
export function noScheduleMessage(selection: SolvedSelection, rules: SelectionRules): string {
  const fewest = selection.fewestTypes;
  return (
    `No schedule: ${selection.statement}` +
    (fewest !== undefined && fewest !== null && rules.maxTypes !== undefined && fewest > rules.maxTypes ? `; the fewest bolt types that serve every splice${rules.oneClassPerDiameter ? " with one class per diameter" : ""}: ${fewest} (--max-types ${rules.maxTypes})` : "")
  );
}

/** The files `schedule --out` writes, by name. */
export function scheduleFileNames(base: string): { schedule: string; order: string; json: string } {
  return { schedule: `${base}-schedule.csv`, order: `${base}-order.csv`, json: `${base}-schedule.json` };
}
