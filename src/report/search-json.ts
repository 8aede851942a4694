/**
 * Search results as plain rows (units in field names). Pure.
 */
import type { Candidate, SearchOutcome } from "../search/search.js";
import { boltWordsOf } from "../codes/words.js";
import type { RankBy } from "../search/ranking.js";
import { CAUTION } from "./check-json.js";
import { boltGradeUnder, boltSizeText } from "../catalogue/bolts.js";
import { citationText } from "./citation.js";
import { foldTwins } from "./twins.js";
import { detailingCell, detailingJson, tightestCell, detailingState, strengthFigures, UTILISATION_DEFINITIONS } from "./summary.js";
import type { BoltSpec, EfficiencyBasis } from "../model/scenario.js";
import type { Family } from "../search/space.js";

export interface ResultRow {
  rank: number;
  bolt: string;
  size_mm: number;
  class: string;
  assembly: string;
  /** The bolt type in the words of the row's code. */
  boltType: string;
  pattern: string;
  /** "3 across × 4 along", per side of the butt for butt splices. */
  counts: string;
  acrossPerLine: number[];
  along: number;
  pitch_mm: number | null;
  gauge_mm: number | null;
  endDistance_mm: number;
  endDistanceAtButt_mm: number | null;
  edgeDistance_mm: number;
  coverThickness_mm: number | null;
  bolts: number;
  spliceLength_mm: number;
  jointStrength_kN: number;
  efficiency: number;
  /** Factored tension / joint design strength (ultimate limit state). */
  strengthUtilisation: number;
  /** Service tension / slip resistance at service; null without a serviceability check. */
  serviceUtilisation: number | null;
  /** The detailing rules and conditions (all pass in a search row): the tightest and its margin. */
  detailing: ReturnType<typeof detailingJson>;
  /** A short statement of the detailing state ("all pass; max. pitch +8 mm"). */
  detailingText: string;
  /** The rule closest to its limit with its margin ("max. pitch +8 mm"), for table cells. */
  tightestRule: string;
  cost: number;
  /** The id of the governing check (machine use), and its title, component and clause (for people). */
  governing: string;
  governingCheck: { title: string; component: string; clause: string } | null;
  tapered_counts_by?: string;
}

const r = (v: number, d = 2) => Number(v.toFixed(d));

/**
 * What a result row reads of a candidate: its arrangement (bolt, pattern, counts, layout), its checked
 * scenario, joint and report, and its total cost. A schedule builds the row of a scheduled layout from
 * its re-check, so only these cross from the search worker.
 */
export type RowSource = Pick<Candidate, "layout" | "scenario" | "joint" | "report" | "counts" | "chosenBy"> & {
  family: Pick<Family, "size_mm" | "propertyClass" | "pattern" | "coverThickness_mm"> & { base: { bolts: BoltSpec } };
  cost: { total: number };
};

export function countsText(c: Pick<RowSource, "counts" | "family">): string {
  const counts = c.counts;
  const along = counts.length;
  if (c.family.pattern === "grid") return `${counts[0]} across × ${along} along`;
  if (c.family.pattern === "staggered") return `${counts[0]}/${(counts[0] ?? 1) - 1} across × ${along} along`;
  return `${counts.join("-")} across × ${along} along`;
}

export function resultRow(c: RowSource, rank: number): ResultRow {
  const l = c.layout;
  const ys = c.joint.holes.map((h) => Math.abs(h.y_mm));
  const narrow = Math.min(...c.joint.plates.filter((p) => p.role !== "packing").map((p) => p.spec.width_mm));
  const butt = c.joint.spliceType !== "lap";
  const figures = strengthFigures(c.scenario, c.report);
  const folded = foldTwins(c.report.checks);
  const detailing = detailingState(c.report, folded);
  const governingFold = folded.find((f) => f.members.some((m) => m.id === c.report.governing));
  const governing = governingFold?.check;
  const row: ResultRow = {
    rank,
    bolt: `${boltSizeText(c.family.size_mm)} ${boltGradeUnder(c.scenario.code, c.family.propertyClass, c.family.size_mm)}`,
    size_mm: c.family.size_mm,
    class: c.family.propertyClass,
    assembly: c.family.base.bolts.assembly,
    boltType: boltWordsOf(c.scenario.code).boltType(c.family.base.bolts),
    pattern: c.family.pattern,
    counts: countsText(c),
    acrossPerLine: c.counts,
    along: c.counts.length,
    pitch_mm: l.kind !== "holes" && c.counts.length > 1 ? l.pitch_mm : null,
    gauge_mm: l.kind !== "holes" && Math.max(...c.counts) > 1 ? l.gauge_mm : null,
    endDistance_mm: l.endDistance_mm,
    endDistanceAtButt_mm: butt && l.kind !== "holes" ? l.endDistanceAtButt_mm : null,
    edgeDistance_mm: r(narrow / 2 - Math.max(...ys), 2),
    coverThickness_mm: c.family.coverThickness_mm ?? null,
    bolts: c.joint.holes.length,
    spliceLength_mm: r(c.joint.spliceLength_mm, 2),
    jointStrength_kN: r(c.report.jointStrength_N / 1000),
    efficiency: r(c.report.efficiency, 4),
    strengthUtilisation: r(figures.strengthUtilisation, 4),
    serviceUtilisation: figures.service ? r(figures.service.utilisation, 4) : null,
    detailing: detailingJson(detailing),
    detailingText: detailingCell(detailing, c.scenario.units === "us" ? "us" : "si"),
    tightestRule: tightestCell(detailing, c.scenario.units === "us" ? "us" : "si"),
    cost: r(c.cost.total),
    governing: c.report.governing,
    governingCheck: governing ? { title: governing.title, component: governingFold!.component, clause: citationText(governing.citation) } : null,
  };
  if (c.chosenBy) row.tapered_counts_by = c.chosenBy === "ip" ? "integer programme" : "enumeration (solver fallback)";
  return row;
}

/** What the rows of a search are, and what is proven about them. */
export function provenStatement(variants: boolean): string {
  return variants
    ? "every variant (the best gauge of each): nothing in the declared search space ranks above the rows shown — every candidate that could was checked or excluded by an admissible bound"
    : "the best layout of each distinct arrangement (bolt size and class, pattern, counts across × along): each row is the best of its arrangement over the declared search space, and no arrangement not shown has a layout ranking above the last row — every candidate that could was checked or excluded by an admissible bound";
}

export function searchJson(name: string, outcome: SearchOutcome, rankBy: RankBy, currency: string, meta: { variants: boolean; efficiencyBasis: EfficiencyBasis }) {
  return {
    scenario: name,
    rankBy,
    rows: meta.variants ? "every variant" : "best of each arrangement",
    proven: true,
    provenStatement: `optimal over the declared search space: ${provenStatement(meta.variants)}`,
    efficiencyBasis: meta.efficiencyBasis,
    definitions: UTILISATION_DEFINITIONS,
    searchSpace: outcome.spaceText,
    currency,
    results: outcome.results.map((c, i) => resultRow(c, i + 1)),
    ...(outcome.noResultReason ? { noResult: outcome.noResultReason } : {}),
    ...(outcome.minimumDesignAction ? { minimumDesignAction: outcome.minimumDesignAction } : {}),
    stats: outcome.stats,
    caution: CAUTION,
  };
}
