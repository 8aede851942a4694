/**
 * One splice's options for the schedule: its best compliant layout per bolt type (from the proven
 * per-type search), as plain data that can cross a worker-thread boundary. Pure.
 */
import type { CostTable } from "../catalogue/costs.js";
import type { DesignCode } from "../codes/types.js";
import type { CheckableScenario, Scenario } from "../model/scenario.js";
import type { RowSource } from "../report/search-json.js";
import { bestPerBoltType, type BoltType } from "../search/per-type.js";
import type { SelectionProblem, SelectionRules } from "./selection.js";

/** The best layout of one bolt type for one splice. */
export interface TypeOption {
  type: BoltType;
  /** Cost of one splice with this layout. */
  cost: number;
  bolts: number;
  /**
   * The arrangement of the layout (bolt, pattern, counts, layout spec): with the re-check of `scenario`
   * it gives the layout's result row (schedule.ts), written only for the layout that is scheduled.
   */
  arrangement: Omit<RowSource, "scenario" | "joint" | "report" | "cost">;
  /** The layout as a checkable scenario (re-checked before it is scheduled). */
  scenario: CheckableScenario;
}

export interface SpliceOptions {
  options: TypeOption[];
  /** Types of the splice's space with no compliant layout, and why. */
  none: Array<{ type: BoltType; reason: string }>;
  /** Full checks the searches made. */
  checks: number;
}

/** One splice's best layout per bolt type; its declared space held to `maxCandidates` (work-estimate.ts). */
export function spliceOptions(scenario: Scenario, code: DesignCode, costs: CostTable, maxCandidates?: number): SpliceOptions {
  const out: SpliceOptions = { options: [], none: [], checks: 0 };
  for (const entry of bestPerBoltType({ scenario, code, costs }, maxCandidates)) {
    out.checks += entry.stats.fullChecks;
    const c = entry.best;
    if (c) out.options.push({ type: entry.type, cost: c.cost.total, bolts: c.joint.holes.length, arrangement: arrangementOf(c), scenario: c.scenario });
    else out.none.push({ type: entry.type, reason: entry.noResultReason ?? "no layout of this type passes every check" });
  }
  return out;
}

/** The plain fields of a candidate's arrangement that its result row reads (search-json.ts, RowSource). */
function arrangementOf(c: RowSource): TypeOption["arrangement"] {
  const f = c.family;
  const arrangement: TypeOption["arrangement"] = {
    family: { size_mm: f.size_mm, propertyClass: f.propertyClass, pattern: f.pattern, coverThickness_mm: f.coverThickness_mm, base: { bolts: f.base.bolts } },
    layout: c.layout,
    counts: c.counts,
  };
  if (c.chosenBy) arrangement.chosenBy = c.chosenBy;
  return arrangement;
}

const ASSEMBLY_ORDER = { bearing: 0, "friction-grip": 1 } as const;

export const sameType = (a: BoltType, b: BoltType): boolean => a.size_mm === b.size_mm && a.propertyClass === b.propertyClass && a.assembly === b.assembly;

/** The job's bolt types: every type some splice has a layout of, by assembly, size, class. */
export function jobTypes(searches: readonly SpliceOptions[]): BoltType[] {
  const types: BoltType[] = [];
  for (const s of searches) for (const o of s.options) if (!types.some((t) => sameType(t, o.type))) types.push(o.type);
  return types.sort((a, b) => ASSEMBLY_ORDER[a.assembly] - ASSEMBLY_ORDER[b.assembly] || a.size_mm - b.size_mm || Number(a.propertyClass) - Number(b.propertyClass));
}

/** The selection problem of a job: per splice and job type, the best layout's cost and bolts. */
export function selectionProblem(splices: ReadonlyArray<{ id: string; quantity: number }>, searches: readonly SpliceOptions[], rules: SelectionRules): { problem: SelectionProblem; options: Array<Array<TypeOption | null>> } {
  const types = jobTypes(searches);
  const options = searches.map((s) => types.map((t) => s.options.find((o) => sameType(o.type, t)) ?? null));
  const problem: SelectionProblem = {
    types,
    splices: splices.map((s, m) => ({ id: s.id, quantity: s.quantity, options: options[m]!.map((o) => (o ? { cost: o.cost, bolts: o.bolts } : null)) })),
    rules,
  };
  return { problem, options };
}
