/**
 * The schedule as JSON and CSV (the CSV form of export/csv.ts, docs/csv.md). Pure: text out, the CLI writes the files.
 */
import { CAUTION } from "../report/check-json.js";
import type { Schedule } from "./schedule.js";
import { csvDocument, type CsvCell } from "../export/csv.js";
import { roundedNumber } from "../report/format.js";
import { efficiencyBasisNote, UTILISATION_DEFINITIONS } from "../report/summary.js";

const money = (v: number) => Number(v.toFixed(2));

function rulesText(s: Schedule): string[] {
  const r = s.rules;
  return [
    r.maxTypes === undefined ? "no limit on the number of bolt types" : `at most ${r.maxTypes} bolt type${r.maxTypes === 1 ? "" : "s"}`,
    `fixed cost per type stocked: ${r.costPerType}`,
    `one property class per diameter: ${r.oneClassPerDiameter ? "yes" : "no"}`,
    `minimum bolts per type used: ${r.minBoltsPerType || "none"}`,
  ];
}

export function scheduleJson(s: Schedule, meta: { code: string; currency: string; elapsed_ms?: Record<string, number> }) {
  const t = s.totals;
  return {
    project: s.project,
    code: meta.code,
    currency: meta.currency,
    rules: { maxTypes: s.rules.maxTypes ?? null, costPerType: s.rules.costPerType, oneClassPerDiameter: s.rules.oneClassPerDiameter, minBoltsPerType: s.rules.minBoltsPerType },
    rulesText: rulesText(s),
    method: s.selection.method,
    proven: s.selection.proven,
    provenStatement: s.selection.statement,
    ...(s.selection.subsets !== undefined ? { subsetsEvaluated: s.selection.subsets } : {}),
    ...(s.selection.solver ? { solver: s.selection.solver } : {}),
    definitions: UTILISATION_DEFINITIONS,
    efficiencyNote: efficiencyNote(s),
    types: s.types.map((u) => ({ ...u, layoutCost: money(u.layoutCost) })),
    splices: s.rows.map((r) => ({
      id: r.id,
      mark: r.mark,
      description: r.description,
      quantity: r.quantity,
      plates: r.plates,
      factoredTension_kN: r.factoredTension_kN,
      serviceTension_kN: r.serviceTension_kN,
      type: r.type,
      layout: r.layout,
      boltsEach: r.boltsEach,
      bolts: r.bolts,
      boltLengths: r.boltLengths,
      costEach: money(r.costEach),
      cost: money(r.cost),
      ownOptimum: { type: r.ownType, costEach: money(r.ownCostEach) },
      premiumEach: money(r.premiumEach),
      premium: money(r.premium),
    })),
    totals: {
      rows: t.rows,
      splices: t.splices,
      bolts: t.bolts,
      typesUsed: t.typesUsed,
      layoutCost: money(t.layoutCost),
      stockingCost: money(t.stockingCost),
      total: money(t.total),
      ownOptimum: { layoutCost: money(t.own.layoutCost), typesUsed: t.own.typesUsed, stockingCost: money(t.own.stockingCost), total: money(t.own.total) },
      premium: money(t.premium),
      premiumWithStocking: money(t.premiumWithStocking),
    },
    order: s.order,
    notes: s.notes,
    ...(meta.elapsed_ms ? { elapsed_ms: meta.elapsed_ms } : {}),
    caution: CAUTION,
  };
}

const SCHEDULE_HEADER = ["id", "mark", "quantity", "description", "plates", "factored_tension_kN", "type", "pattern", "counts", "pitch_mm", "gauge_mm", "end_distance_mm", "end_distance_at_butt_mm", "edge_distance_mm", "cover_thickness_mm", "bolts_each", "bolts", "bolt_lengths", "joint_strength_kN", "strength_utilisation", "service_utilisation", "efficiency_percent", "detailing", "governing_check", "cost_each", "cost", "own_optimum_type", "own_optimum_cost_each", "premium_each", "premium"] as const;

const mm = (v: number | null) => (v === null ? null : roundedNumber(v, 2));
const kN = (v: number | null) => (v === null ? null : roundedNumber(v, 2));
const ratio = (v: number | null) => (v === null || !Number.isFinite(v) ? null : roundedNumber(v, 4));

/** One splice row of the schedule CSV. */
function scheduleRow(r: Schedule["rows"][number]): CsvCell[] {
  const l = r.layout;
  const g = l.governingCheck;
  const lengths = r.boltLengths.map((b) => `${b.quantity} × ${b.length_mm} mm`).join("; ");
  return [r.id, r.mark, r.quantity, r.description, r.plates, kN(r.factoredTension_kN), r.type, l.pattern, l.counts, mm(l.pitch_mm), mm(l.gauge_mm), mm(l.endDistance_mm), mm(l.endDistanceAtButt_mm), mm(l.edgeDistance_mm), mm(l.coverThickness_mm), r.boltsEach, r.bolts, lengths, kN(l.jointStrength_kN), ratio(l.strengthUtilisation), ratio(l.serviceUtilisation), l.efficiency === null ? null : Number((100 * l.efficiency).toFixed(2)), l.detailingText, g ? `${g.title}, ${g.component} (${g.clause})` : "", money(r.costEach), money(r.cost), r.ownType, money(r.ownCostEach), money(r.premiumEach), money(r.premium)];
}

/**
 * The schedule as CSV (docs/csv.md): one row per splice of the project file (so that a spreadsheet's
 * SUM of a column is the job's figure), then note rows (project, totals, rules and proof, definitions, caution).
 */
export function scheduleCsv(s: Schedule): string {
  const t = s.totals;
  return csvDocument(SCHEDULE_HEADER, s.rows.map(scheduleRow), [
    `schedule: ${s.project}`,
    `total: ${t.splices} splices, ${t.bolts} bolts, ${t.typesUsed} bolt type${t.typesUsed === 1 ? "" : "s"}; layout cost ${money(t.layoutCost)} (the sum of the cost column); every splice at its own optimum ${money(t.own.layoutCost)}; rationalisation premium ${money(t.premium)}`,
    `${rulesText(s).join("; ")}; ${s.selection.proven ? "proven optimal" : "NOT proven optimal"} (${s.selection.method})`,
    `strength_utilisation: factored tension / joint design strength; service_utilisation: service tension / slip resistance at service; detailing: the rules (all pass) and the one closest to its limit; ${efficiencyNote(s)}`,
    `caution: ${CAUTION}`,
  ]);
}

/** The efficiency basis of the job's splices (one line; "mixed" when splices differ). */
function efficiencyNote(s: Schedule): string {
  const bases = [...new Set(s.rows.map((r) => r.efficiencyBasis))];
  return bases.length === 1 ? efficiencyBasisNote(bases[0]!) : `Eff.: efficiency bases differ between splices (${bases.join(", ")}; options.efficiency_basis)`;
}

/** The bolts, nuts and washers to order per bolt type, as CSV (docs/csv.md). */
export function orderCsv(s: Schedule): string {
  const rows: CsvCell[][] = s.order.map((o) => [o.type, o.kind, o.item, mm(o.length_mm), o.quantity, o.standard]);
  return csvDocument(["type", "kind", "item", "length_mm", "quantity", "standard"], rows, [`bolts to order: ${s.project}`, `caution: ${CAUTION}`]);
}
