/**
 * The job schedule: every splice with its layout of the chosen type, totals, the premium of
 * rationalising against each splice's own optimum, and the bolts to order per type with their lengths.
 * Every scheduled layout is run through the checker again and its cost recomputed from its joint. Pure.
 */
import { boltSizeText } from "../catalogue/bolts.js";
import { spliceCost, type CostTable } from "../catalogue/costs.js";
import type { DesignCode } from "../codes/types.js";
import { checkScenario } from "../engine/check.js";
import { billOfMaterials } from "../export/bolt-list.js";
import type { EfficiencyBasis, Scenario } from "../model/scenario.js";
import { resultRow, type ResultRow } from "../report/search-json.js";
import { lengthNumber } from "../report/format.js";
import type { TypeOption } from "./options.js";
import { COST_TOLERANCE, evaluateAssignment, ownOptima, typeLabel, type SelectionProblem, type SelectionRules } from "./selection.js";
import type { SolvedSelection } from "./solve.js";

/** One splice of a job (one row of the project file). */
export interface ScheduleSplice {
  id: string;
  mark?: string;
  description?: string;
  /** Identical splices of this row. */
  quantity: number;
  scenario: Scenario;
}

export interface ScheduleRow {
  id: string;
  mark: string;
  description: string;
  quantity: number;
  /** The plates as scheduled: "200 × 16 E250; 2 covers 200 × 10 E250" (the cover thickness the search chose). */
  plates: string;
  /** Factored tension (and service tension, if given), kN. */
  factoredTension_kN: number;
  serviceTension_kN: number | null;
  /** The efficiency basis of this splice (options.efficiency_basis). */
  efficiencyBasis: EfficiencyBasis;
  type: string;
  layout: ResultRow;
  /** Bolts in one splice, and in all of this row's splices. */
  boltsEach: number;
  bolts: number;
  boltLengths: Array<{ length_mm: number; quantity: number }>;
  costEach: number;
  cost: number;
  ownType: string;
  ownCostEach: number;
  premiumEach: number;
  premium: number;
}

export interface TypeUse {
  type: string;
  size: string;
  class: string;
  assembly: string;
  /** Rows of the schedule using it, and splices (with quantities). */
  rows: number;
  splices: number;
  bolts: number;
  layoutCost: number;
}

export interface OrderLine {
  type: string;
  kind: "bolt" | "nut" | "washer";
  item: string;
  length_mm: number | null;
  quantity: number;
  standard: string;
}

export interface ScheduleTotals {
  rows: number;
  splices: number;
  bolts: number;
  typesUsed: number;
  layoutCost: number;
  stockingCost: number;
  total: number;
  /** Every splice at its own optimum, each type it uses stocked. */
  own: { layoutCost: number; typesUsed: number; stockingCost: number; total: number };
  /** Σ quantity × (cost − own optimum), layouts only. */
  premium: number;
  /** total − own.total (stocking included). */
  premiumWithStocking: number;
}

export interface Schedule {
  project: string;
  rules: SelectionRules;
  selection: SolvedSelection;
  types: TypeUse[];
  rows: ScheduleRow[];
  totals: ScheduleTotals;
  order: OrderLine[];
  notes: string[];
}

export interface ScheduleInput {
  project: string;
  splices: readonly ScheduleSplice[];
  problem: SelectionProblem;
  /** Per splice and job type (problem.types), its best layout. */
  options: ReadonlyArray<ReadonlyArray<TypeOption | null>>;
  selection: SolvedSelection & { assignment: number[] };
  code: DesignCode;
  costs: CostTable;
  /** Called after each splice is re-checked (for a progress bar). */
  onProgress?: (done: number, total: number) => void;
}

/** The plates of a splice in a few words: main plate(s), then cover plate(s), sizes as they are. */
export function platesText(s: Scenario): string {
  const plate = (p: Scenario["plates"]["mainA"]) => `${lengthNumber(p.width_mm)} × ${lengthNumber(p.thickness_mm)} ${p.grade}`;
  const { mainA, mainB, covers } = s.plates;
  const main = plate(mainA) === plate(mainB) ? plate(mainA) : `${plate(mainA)} / ${plate(mainB)}`;
  if (covers.length === 0) return main;
  const cover = covers.every((c) => plate(c) === plate(covers[0]!)) ? `${covers.length === 2 ? "2 covers" : "cover"} ${plate(covers[0]!)}` : `covers ${covers.map(plate).join(" / ")}`;
  return `${main}; ${cover}`;
}

const near = (a: number, b: number) => Math.abs(a - b) <= COST_TOLERANCE * 1e3 * Math.max(1, Math.abs(a), Math.abs(b));

export function buildSchedule(input: ScheduleInput): Schedule {
  const { problem, options, selection, code, costs } = input;
  const a = selection.assignment;
  const ev = evaluateAssignment(problem, a);
  if (!ev.ok || !near(ev.cost, selection.cost)) throw new Error(`the selection failed its re-check (${ev.problems[0] ?? `cost ${ev.cost} against ${selection.cost}`})`);
  const own = ownOptima(problem);
  if (!own) throw new Error("a splice without a compliant layout reached the schedule");
  const F = problem.rules.costPerType;
  const notes: string[] = [];
  const uses = new Map<number, TypeUse>();
  const order = new Map<string, OrderLine>();
  const addOrder = (line: OrderLine) => {
    const key = `${line.type}|${line.kind}|${line.item}`;
    const seen = order.get(key);
    if (seen) seen.quantity += line.quantity;
    else order.set(key, { ...line });
  };
  const rows = input.splices.map((s, m): ScheduleRow => {
    const t = a[m]!;
    const o = options[m]![t]!;
    const mine = options[m]![own[m]!]!;
    // The layout once more through the one checker, and its cost from its own joint.
    const { joint, report } = checkScenario(o.scenario, code);
    if (!report.pass) throw new Error(`the layout scheduled for splice ${s.id} fails ${report.governing} on re-check`);
    const cost = spliceCost(joint, costs, o.type.propertyClass, o.type.assembly).total;
    if (!near(cost, o.cost)) throw new Error(`the cost of splice ${s.id} is ${cost} on re-check, not ${o.cost}`);
    const label = typeLabel(o.type, code.id);
    const bom = billOfMaterials(joint, o.scenario);
    for (const n of bom.notes) notes.push(`${s.id}: ${n}`);
    if (!bom.ok) notes.push(`${s.id}: no valid bolt length for every group (see \`splicewright export\` of this layout)`);
    for (const b of bom.bolts) addOrder({ type: label, kind: "bolt", item: b.item, length_mm: b.length_mm, quantity: b.quantity * s.quantity, standard: b.standard });
    for (const n of bom.nuts) addOrder({ type: label, kind: "nut", item: n.item, length_mm: null, quantity: n.quantity * s.quantity, standard: n.standard });
    for (const w of bom.washers) addOrder({ type: label, kind: "washer", item: w.item, length_mm: null, quantity: w.quantity * s.quantity, standard: w.standard });
    const use = uses.get(t) ?? { type: label, size: boltSizeText(o.type.size_mm), class: o.type.propertyClass, assembly: o.type.assembly, rows: 0, splices: 0, bolts: 0, layoutCost: 0 };
    use.rows++;
    use.splices += s.quantity;
    use.bolts += o.bolts * s.quantity;
    use.layoutCost += cost * s.quantity;
    uses.set(t, use);
    input.onProgress?.(m + 1, input.splices.length);
    return {
      id: s.id,
      mark: s.mark ?? "",
      description: s.description ?? "",
      quantity: s.quantity,
      plates: platesText(o.scenario),
      factoredTension_kN: Number((o.scenario.load.factoredTension_N / 1000).toFixed(2)),
      efficiencyBasis: o.scenario.options.efficiencyBasis,
      serviceTension_kN: o.scenario.load.serviceTension_N !== undefined ? Number((o.scenario.load.serviceTension_N / 1000).toFixed(2)) : null,
      type: label,
      layout: resultRow({ ...o.arrangement, scenario: o.scenario, joint, report, cost: { total: o.cost } }, 1),
      boltsEach: o.bolts,
      bolts: o.bolts * s.quantity,
      boltLengths: bom.bolts.map((b) => ({ length_mm: b.length_mm, quantity: b.quantity })),
      costEach: cost,
      cost: cost * s.quantity,
      ownType: typeLabel(mine.type, code.id),
      ownCostEach: mine.cost,
      premiumEach: cost - mine.cost,
      premium: (cost - mine.cost) * s.quantity,
    };
  });
  const layoutCost = rows.reduce((x, r) => x + r.cost, 0);
  const ownLayout = rows.reduce((x, r) => x + r.ownCostEach * r.quantity, 0);
  const ownTypes = new Set(own).size;
  const totals: ScheduleTotals = {
    rows: rows.length,
    splices: rows.reduce((x, r) => x + r.quantity, 0),
    bolts: rows.reduce((x, r) => x + r.bolts, 0),
    typesUsed: uses.size,
    layoutCost,
    stockingCost: F * uses.size,
    total: layoutCost + F * uses.size,
    own: { layoutCost: ownLayout, typesUsed: ownTypes, stockingCost: F * ownTypes, total: ownLayout + F * ownTypes },
    premium: rows.reduce((x, r) => x + r.premium, 0),
    premiumWithStocking: layoutCost + F * uses.size - (ownLayout + F * ownTypes),
  };
  if (!near(totals.total, ev.cost)) throw new Error(`the schedule's total ${totals.total} differs from the evaluated cost ${ev.cost}`);
  const typeOrder = [...uses.keys()].sort((x, y) => x - y);
  const lines = [...order.values()];
  const kindOrder = { bolt: 0, nut: 1, washer: 2 } as const;
  const typeRank = new Map(typeOrder.map((t, i) => [uses.get(t)!.type, i]));
  lines.sort((x, y) => typeRank.get(x.type)! - typeRank.get(y.type)! || kindOrder[x.kind] - kindOrder[y.kind] || (x.length_mm ?? 0) - (y.length_mm ?? 0) || (x.item < y.item ? -1 : x.item > y.item ? 1 : 0));
  return { project: input.project, rules: problem.rules, selection, types: typeOrder.map((t) => uses.get(t)!), rows, totals, order: lines, notes };
}
