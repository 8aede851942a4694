/** The job schedule as terminal text. */
import { CAUTION } from "../report/check-json.js";
import { BoxTable } from "./text-table.js";
import { PIPED_WIDTH, wrapProse } from "./text.js";
import type { Schedule } from "../schedule/schedule.js";
import { lengthNumber } from "../report/format.js";
import { efficiencyBasisNote } from "../report/summary.js";

const fx = (v: number | null, d = 0) => (v === null ? "—" : v.toFixed(d));
/** A dimension with the precision it has (62.5 stays 62.5). */
const dim = (mm: number | null) => (mm === null ? "—" : lengthNumber(mm));
const pct = (part: number, whole: number) => (whole > 0 ? `${((100 * part) / whole).toFixed(1)} %` : "—");
/** Linear-time boxed tables (text-table.ts): a job's schedule may have thousands of rows. */
const table = (head: string[]) => new BoxTable(head);

export interface ScheduleEffort {
  searched: number;
  workers: number;
  typesSearched: number;
  checks: number;
  search_ms: number;
  selection_ms: number;
}

/** Which splice each row is: id, mark, quantity, description and plates. */
function spliceListTable(s: Schedule): BoxTable {
  const t = table(["Id", "Mark", "Qty", "Description", "Plates", "T kN"]);
  for (const row of s.rows) t.push([row.id, row.mark, String(row.quantity), row.description, row.plates, row.factoredTension_kN.toFixed(1)]);
  return t;
}

/** Each row's layout: bolt type, pattern, counts, dimensions, utilisation and the tightest rule. */
function layoutTable(s: Schedule, service: boolean): BoxTable {
  const t = table(["Id", "Bolt", "Pattern", "Counts", "Pitch", "Gauge", "End", "Cover t", "Bolts", "Str. util.", ...(service ? ["SLS util."] : []), "Tightest rule (all pass)"]);
  for (const row of s.rows) {
    const l = row.layout;
    t.push([
      row.id,
      row.type,
      l.pattern,
      l.counts,
      dim(l.pitch_mm),
      dim(l.gauge_mm),
      l.endDistanceAtButt_mm !== null ? `${dim(l.endDistance_mm)} / ${dim(l.endDistanceAtButt_mm)}` : dim(l.endDistance_mm),
      dim(l.coverThickness_mm),
      String(row.boltsEach),
      fx(l.strengthUtilisation, 2),
      ...(service ? [fx(l.serviceUtilisation, 2)] : []),
      l.tightestRule,
    ]);
  }
  return t;
}

/** Each row's cost against the splice's own optimum (its best bolt type alone). */
function costTable(s: Schedule): BoxTable {
  const t = table(["Id", "Qty", "Cost", "Row cost", "Own optimum", "Premium"]);
  for (const row of s.rows) t.push([row.id, String(row.quantity), fx(row.costEach, 1), fx(row.cost, 1), `${row.ownType} ${fx(row.ownCostEach, 1)}`, row.premium > 0 ? `+${fx(row.premium, 1)}` : "0"]);
  return t;
}

/** The schedule as text; prose wraps to `width` columns (the tables keep one row per line). */
export function formatSchedule(s: Schedule, codeTitle: string, currency: string, effort: ScheduleEffort, width = PIPED_WIDTH): string {
  const out: string[] = [];
  const t = s.totals;
  const r = s.rules;
  out.push("splicewright — job schedule: bolted tension splices with few bolt types");
  out.push(`Project:  ${s.project}`);
  out.push(`Code:     ${codeTitle}`);
  out.push(`Splices:  ${t.rows} in the schedule, ${t.splices} to make (with quantities)`);
  out.push(
    `Rules:    ${r.maxTypes === undefined ? "no limit on bolt types" : `at most ${r.maxTypes} bolt type${r.maxTypes === 1 ? "" : "s"}`}; ` +
      `fixed cost per type stocked ${r.costPerType}; ${r.oneClassPerDiameter ? "one property class per diameter" : "classes of one diameter may mix"}; ` +
      `${r.minBoltsPerType > 0 ? `at least ${r.minBoltsPerType} bolts of every type used` : "no minimum bolts per type"}`,
  );
  out.push(`Choice:   ${s.selection.method}: ${s.selection.statement}`);
  out.push("");
  out.push("Bolt types chosen:");
  const types = table(["Type", "Schedule rows", "Splices", "Bolts", `Layout cost`]);
  for (const u of s.types) types.push([u.type, String(u.rows), String(u.splices), String(u.bolts), fx(u.layoutCost, 1)]);
  out.push(types.toString());
  out.push("");
  const service = s.rows.some((r) => r.layout.serviceUtilisation !== null);
  out.push("Splices of the job:");
  out.push(spliceListTable(s).toString());
  out.push("");
  out.push("Layouts (bolts per splice; counts per side of the butt for butt splices):");
  out.push(layoutTable(s, service).toString());
  out.push("");
  out.push("Costs (per splice; × qty for the row):");
  out.push(costTable(s).toString());
  out.push(`Dimensions in mm; costs in ${currency}. T: factored tension. End: end distance (/ at the butt). Every layout has passed every check of \`splicewright check\`, and was checked again before it was scheduled.`);
  out.push(
    `Str. util.: strength utilisation = factored tension / joint design strength${service ? "; SLS util.: service tension / slip resistance at service" : ""}. ` +
      "Tightest rule: every detailing rule passes; the cell names the one closest to its limit (by the ratio of value to limit) and its margin in length.",
  );
  const bases = [...new Set(s.rows.map((r) => r.efficiencyBasis))];
  out.push(bases.length === 1 ? efficiencyBasisNote(bases[0]!) : `Efficiency bases differ between splices (${bases.join(", ")}; options.efficiency_basis).`);
  out.push("");
  out.push("Totals:");
  out.push(`  layouts ${fx(t.layoutCost, 1)} + ${t.typesUsed} type${t.typesUsed === 1 ? "" : "s"} stocked × ${r.costPerType} = ${fx(t.total, 1)}; ${t.bolts} bolts`);
  out.push(`  each splice at its own optimum: layouts ${fx(t.own.layoutCost, 1)} with ${t.own.typesUsed} type${t.own.typesUsed === 1 ? "" : "s"} (stocked: ${fx(t.own.stockingCost, 1)}) = ${fx(t.own.total, 1)}`);
  out.push(`  premium of rationalising: layouts +${fx(t.premium, 1)} (${pct(t.premium, t.own.layoutCost)}); with stocking ${t.premiumWithStocking >= 0 ? "+" : ""}${fx(t.premiumWithStocking, 1)} (${pct(t.premiumWithStocking, t.own.total)})`);
  out.push("");
  out.push("Bolts to order (every splice of the job, quantities included):");
  const order = table(["Type", "Item", "Length", "Quantity"]);
  for (const o of s.order) order.push([o.type, o.item, o.length_mm === null ? "" : String(o.length_mm), String(o.quantity)]);
  out.push(order.toString());
  out.push("Lengths: grip + washers + nut + thread projection, rounded up to the preferred series (see `splicewright export`).");
  for (const n of s.notes) out.push(`note: ${n}`);
  out.push("");
  out.push(
    `Effort: ${effort.searched} distinct splices × their bolt types (${effort.typesSearched} type searches, ${effort.checks} full checks) on ${effort.workers === 0 ? "the main thread" : `${effort.workers} worker thread${effort.workers === 1 ? "" : "s"}`} in ${(effort.search_ms / 1000).toFixed(1)} s; ` +
      `choice of types in ${effort.selection_ms.toFixed(0)} ms.`,
  );
  out.push("");
  out.push(`CAUTION: ${CAUTION}`);
  return wrapProse(out, width).join("\n");
}
