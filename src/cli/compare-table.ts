/** The compare columns as a terminal table (one column per choice). */
import Table from "cli-table3";
import type { CompareColumn } from "../compare/compare.js";
import { CAUTION, citationText } from "../report/check-json.js";
import { resultRow } from "../report/search-json.js";
import { lengthNumber } from "../report/format.js";
import { efficiencyBasisNote } from "../report/summary.js";
import type { CheckableScenario, EfficiencyBasis } from "../model/scenario.js";
import { boltWordsOf } from "../codes/words.js";
import { assemblyOf } from "../export/bolt-list.js";
import { PIPED_WIDTH, strengthUtilisationWords, wrap } from "./text.js";

const fx = (v: number | null | undefined, d = 0) => (v === null || v === undefined ? "—" : v.toFixed(d));
const dim = (v: number | null | undefined) => (v === null || v === undefined ? "—" : lengthNumber(v));

/** A column's bolt type and threads in the words of the column's own code. */
function boltTypeCell(c: CompareColumn): string {
  const words = boltWordsOf(c.code.id);
  const b = c.best?.scenario.bolts ?? c.scenario.bolts;
  return b ? `${words.boltType(b)}; ${words.threads(b.threadsInShearPlanes)}` : words.assembly("bearing");
}

/** The bolt, nut and washer standards of a column's assembly under its own code. */
function assemblyText(scenario: CheckableScenario): string {
  const a = assemblyOf(scenario);
  return `${a.boltStandard}; ${a.nutStandard}; ${a.washerStandard}`;
}

export function compareRows(columns: CompareColumn[]): Array<[string, string[]]> {
  const service = columns.some((c) => c.best && resultRow(c.best, 1).serviceUtilisation !== null);
  const rows: Array<[string, (c: CompareColumn) => string]> = [
    ["Code", (c) => c.code.id],
    ["Bolt", (c) => (c.best ? resultRow(c.best, 1).bolt : "—")],
    ["Bolt type", (c) => boltTypeCell(c)],
    ["Assembly", (c) => (c.best ? assemblyText(c.best.scenario) : "—")],
    ["Pattern", (c) => (c.best ? c.best.family.pattern : "—")],
    ["Counts", (c) => (c.best ? resultRow(c.best, 1).counts : "—")],
    ["Pitch / gauge (mm)", (c) => (c.best ? `${dim(resultRow(c.best, 1).pitch_mm)} / ${dim(resultRow(c.best, 1).gauge_mm)}` : "—")],
    ["End / edge (mm)", (c) => (c.best ? `${dim(resultRow(c.best, 1).endDistance_mm)} / ${dim(resultRow(c.best, 1).edgeDistance_mm)}` : "—")],
    ["Bolt count", (c) => (c.best ? String(c.best.joint.holes.length) : "—")],
    ["Splice length (mm)", (c) => (c.best ? dim(c.best.joint.spliceLength_mm) : "—")],
    ["Joint strength (kN)", (c) => (c.best ? fx(c.best.report.jointStrength_N / 1000, 1) : "—")],
    ["Strength utilisation", (c) => (c.best ? fx(resultRow(c.best, 1).strengthUtilisation, 2) : "—")],
    ...(service ? ([["Service utilisation", (c: CompareColumn) => (c.best ? fx(resultRow(c.best, 1).serviceUtilisation, 2) : "—")]] as Array<[string, (c: CompareColumn) => string]>) : []),
    ["Detailing rules", (c) => (c.best ? resultRow(c.best, 1).detailingText : "—")],
    ["Efficiency", (c) => (c.best ? `${fx(c.best.report.efficiency * 100, 1)} %` : "—")],
    ["Cost", (c) => (c.best ? fx(c.best.cost.total, 1) : "—")],
    ["Cost above cheapest", (c) => (c.costDifference === null ? "—" : c.costDifference === 0 ? "cheapest" : `+${fx(c.costDifference, 1)}`)],
    [
      "Governing check",
      (c) => {
        const g = c.best?.report.checks.find((x) => x.id === c.best?.report.governing);
        return g ? `${g.title}, ${g.component} (${citationText(g.citation)})` : c.outcome.noResultReason ? "no compliant layout" : "—";
      },
    ],
  ];
  return rows.map(([name, f]) => [name, columns.map(f)]);
}

/** Narrowest column of choices, characters: below it a column's words would break mid-word. */
const MIN_CHOICE_COLUMN = 18;

/**
 * Column widths that fit the table to `width` columns: the row names as they are, the choices sharing
 * the rest equally (at least MIN_CHOICE_COLUMN each, so many choices may still run wider), never wider
 * than their widest cell.
 */
function columnWidths(rows: Array<[string, string[]]>, labels: string[], width: number): number[] {
  const nameWidth = Math.max(...rows.map(([name]) => name.length)) + 2;
  const share = Math.floor((width - nameWidth - (labels.length + 2)) / labels.length);
  return [nameWidth, ...labels.map((label, i) => Math.min(Math.max(MIN_CHOICE_COLUMN, share), Math.max(label.length, ...rows.map(([, cells]) => cells[i]!.length)) + 2))];
}

/** The compare table and its notes, laid out for `width` columns (cells wrap within their columns). */
export function formatCompare(title: string, columns: CompareColumn[], currency: string, basis: EfficiencyBasis, load: { factoredCompression_N?: number } = {}, width = PIPED_WIDTH): string {
  const rows = compareRows(columns);
  const labels = columns.map((c) => c.label);
  const table = new Table({ head: ["", ...labels], style: { head: [], border: [] }, wordWrap: true, colWidths: columnWidths(rows, labels, width) });
  for (const [name, cells] of rows) table.push([name, ...cells]);
  const text = (t: string, indent = "") => wrap(t, width, indent, indent);
  const out = [
    ...text(`splicewright — compare: ${title}`),
    "",
    table.toString(),
    ...text(`Cost in ${currency}. Each column is the best layout of \`splicewright search\` with that choice alone, proven over the declared space.`),
    ...text(`Strength utilisation: ${strengthUtilisationWords(load)}; service utilisation: service tension / slip resistance at service. Detailing rules: all pass in every column; the cell names the one closest to its limit (by the ratio of value to limit) and its margin in length.`),
    ...text(efficiencyBasisNote(basis)),
  ];
  const mapped = columns.filter((c) => c.mapping.length);
  if (mapped.length) {
    out.push("", ...text("Mapping of materials between codes (nearest equivalents — these are not identical materials; strengths, thickness bands and testing differ):"));
    for (const c of mapped) out.push(...wrap(`${c.code.id}: ${c.mapping.join("; ")}`, width, "  ", "    "));
  }
  for (const c of columns) if (!c.best && c.outcome.noResultReason) out.push(...text(`${c.label}: ${c.outcome.noResultReason}`));
  out.push("", ...text(`CAUTION: ${CAUTION}`));
  return out.join("\n");
}
