/**
 * The summary of a check, as data: verdict, factored load against the joint design strength, the
 * strength utilisation (ultimate) and the service utilisation (slip at service), the governing check,
 * efficiency with its basis, the state of the detailing rules and the warnings. Every shell (terminal
 * sheet, HTML report, drawing title block, JSON, search, compare and schedule tables) takes its figures
 * from here, so no output ever shows one number for both strength and detailing. Pure.
 *
 * Definitions (README, "Reading the results"):
 * - strength utilisation = T / joint design strength, T the factored tension and the joint design
 *   strength the least joint tension any loaded ultimate-limit-state check allows (resistance /
 *   loadRatio). It equals the highest demand/resistance of those checks.
 * - service utilisation = service tension / the joint's slip resistance at service: the highest
 *   demand/resistance of the serviceability checks (friction-grip bolts designed against slip at
 *   service); null where there is none.
 * - detailing: the spacing, end and edge, grip and group rules (lengths against limits) and the
 *   conditions that set no load (loadRatio 0, e.g. EN 1993-1-8 3.6.1(5)); they pass or fail, by a
 *   margin in mm, and never enter either utilisation.
 */
import { BASIS_WORDS } from "../codes/efficiency.js";
import { loadWords, referenceLoad_N } from "../model/load.js";
import { boltWordsOf } from "../codes/words.js";
import type { CheckKind, CheckReport, CheckResult, StrengthCheck, Warning } from "../model/results.js";
import type { CheckableScenario, EfficiencyBasis } from "../model/scenario.js";
import { citationText } from "./citation.js";
import { forceText, lengthText, ratioText, type DisplayUnits } from "./format.js";
import { foldTwins, type FoldedCheck } from "./twins.js";

export interface CheckRef {
  id: string;
  title: string;
  component: string;
  clause: string;
}

/** A detailing rule or a condition, with how far it is inside (or beyond) its limit. */
export interface DetailingItem extends CheckRef {
  kind: "rule" | "condition";
  checkKind: CheckKind;
  pass: boolean;
  /** Rules: the measured value and its limit, mm; which way the limit binds. */
  value_mm?: number;
  limit_mm?: number;
  bound?: "min" | "max";
  /** Rules: inside the limit by this much (negative: beyond it), mm. */
  margin_mm?: number;
  /** Conditions: the two forces the condition compares, N. */
  demand_N?: number;
  resistance_N?: number;
  /** How close to its limit, as the check states it (1 at the limit); never a strength utilisation. */
  ratio: number;
}

export interface DetailingState {
  total: number;
  passing: number;
  /** Every failing rule or condition (twins once), in report order. */
  failures: DetailingItem[];
  /** The passing rule or condition closest to its limit (highest ratio), or null when there is none. */
  tightest: DetailingItem | null;
}

export interface ServiceFigure {
  utilisation: number;
  serviceTension_N: number;
  /** The joint's slip resistance at service, as a service tension. */
  resistance_N: number;
  check: CheckRef;
}

export interface StrengthFigures {
  factoredTension_N: number;
  /** The factored compression (compression or reversal), else null. */
  factoredCompression_N: number | null;
  /** Per sense, the least force of that sense any ultimate check allows (compression or reversal), else null. */
  strengthBySense: { tension?: number; compression?: number } | null;
  /** The load of both senses, as the scenario gives it (worded by model/load.ts). */
  load: CheckableScenario["load"];
  jointStrength_N: number;
  /** T / joint design strength (ultimate limit state). */
  strengthUtilisation: number;
  /** Slip at service, where the bolts are designed against it. */
  service: ServiceFigure | null;
}

export interface Summary extends StrengthFigures {
  /** The service tension the scenario gives, if any. */
  serviceTension_N: number | null;
  pass: boolean;
  verdict: "PASS" | "FAIL";
  codeTitle: string;
  governing: CheckRef | null;
  /** The loaded checks (ULS and SLS): how many, how many pass, and those that fail. */
  strengthChecks: { total: number; passing: number; failures: Array<CheckRef & { utilisation: number }> };
  detailing: DetailingState;
  efficiency: number;
  efficiencyBasis: EfficiencyBasis;
  efficiencyDefinition: string;
  warnings: Warning[];
  /** Why the service row is empty, when it is. */
  serviceNote: string;
}

/** A loaded strength check (it scales with the joint tension). */
const loaded = (c: CheckResult): c is StrengthCheck => c.type === "strength" && c.loadRatio > 0;

function refOf(c: CheckResult, component = c.component): CheckRef {
  return { id: c.id, title: c.title, component, clause: citationText(c.citation) };
}

/** Strength and service utilisation of a checked layout (cheap: the search calls it for every row). */
export function strengthFigures(scenario: CheckableScenario, report: CheckReport): StrengthFigures {
  const T = referenceLoad_N(scenario.load);
  const strength = report.jointStrength_N;
  const C = scenario.load.factoredCompression_N ?? null;
  let service: ServiceFigure | null = null;
  for (const c of report.checks) {
    if (c.type !== "strength" || c.limitState !== "SLS" || !(c.loadRatio > 0)) continue;
    if (service && c.utilisation <= service.utilisation) continue;
    const Ts = c.sense === "compression" ? c.demand_N : (scenario.load.serviceTension_N ?? c.demand_N);
    service = { utilisation: c.utilisation, serviceTension_N: Ts, resistance_N: c.utilisation > 0 ? Ts / c.utilisation : Infinity, check: refOf(c) };
  }
  return {
    factoredTension_N: scenario.load.factoredTension_N,
    factoredCompression_N: C,
    strengthBySense: C !== null ? (report.strengthBySense ?? null) : null,
    load: scenario.load,
    jointStrength_N: strength, strengthUtilisation: Number.isFinite(strength) && strength > 0 ? T / strength : 0, service };
}

function detailingItem(f: FoldedCheck): DetailingItem {
  const c = f.check;
  const base = { ...refOf(c, f.component), checkKind: c.kind, pass: c.pass, ratio: c.utilisation };
  if (c.type === "rule") {
    const margin = c.bound === "min" ? c.value_mm - c.limit_mm : c.limit_mm - c.value_mm;
    return { ...base, kind: "rule", value_mm: c.value_mm, limit_mm: c.limit_mm, bound: c.bound, margin_mm: margin };
  }
  return { ...base, kind: "condition", demand_N: c.demand_N, resistance_N: c.resistance_N };
}

/** The detailing rules and conditions: how many pass, which fail, the tightest. Twins count once. */
export function detailingState(report: CheckReport, folded: FoldedCheck[] = foldTwins(report.checks)): DetailingState {
  const items = folded.filter((f) => !loaded(f.check)).map(detailingItem);
  let tightest: DetailingItem | null = null;
  for (const i of items) if (i.pass && (!tightest || i.ratio > tightest.ratio + 1e-12)) tightest = i;
  return { total: items.length, passing: items.filter((i) => i.pass).length, failures: items.filter((i) => !i.pass), tightest };
}

/** The summary of a checked layout. */
export function summarise(scenario: CheckableScenario, report: CheckReport): Summary {
  const folded = foldTwins(report.checks);
  const figures = strengthFigures(scenario, report);
  const strong = folded.filter((f) => loaded(f.check));
  const governingCheck = report.checks.find((c) => c.id === report.governing);
  const governingFold = folded.find((f) => f.members.some((m) => m.id === report.governing));
  const b = scenario.bolts;
  const serviceNote =
    b.assembly === "bearing"
      ? `none: ${boltWordsOf(scenario.code).noServiceSlip}`
      : figures.service
        ? ""
        : "none: slip is checked at the factored load (an ultimate check)";
  if (figures.service) {
    const id = figures.service.check.id;
    const fold = folded.find((f) => f.members.some((m) => m.id === id));
    if (fold) figures.service.check.component = fold.component;
  }
  return {
    ...figures,
    serviceTension_N: scenario.load.serviceTension_N ?? null,
    pass: report.pass,
    verdict: report.pass ? "PASS" : "FAIL",
    codeTitle: report.codeTitle,
    governing: governingCheck ? refOf(governingCheck, governingFold?.component ?? governingCheck.component) : null,
    strengthChecks: {
      total: strong.length,
      passing: strong.filter((f) => f.check.pass).length,
      failures: strong.filter((f) => !f.check.pass).map((f) => ({ ...refOf(f.check, f.component), utilisation: f.check.utilisation })),
    },
    detailing: detailingState(report, folded),
    efficiency: report.efficiency,
    efficiencyBasis: scenario.options.efficiencyBasis,
    efficiencyDefinition: report.efficiencyDefinition,
    warnings: report.warnings,
    serviceNote,
  };
}

/** A rule or condition against its limit: "40 mm ≥ 33 mm, 7 mm to spare", "30 mm < 33 mm, 3 mm short". */
export function detailingText(i: DetailingItem, units: DisplayUnits = "si"): string {
  if (i.kind === "condition") {
    const holds = i.pass;
    return `${forceText(i.demand_N ?? 0, units)} ${holds ? "≤" : ">"} ${forceText(i.resistance_N ?? 0, units)}${holds ? "" : ": the condition does not hold"}`;
  }
  const v = lengthText(i.value_mm ?? 0, units);
  const l = lengthText(i.limit_mm ?? 0, units);
  const m = i.margin_mm ?? 0;
  if (i.pass) return `${v} ${i.bound === "min" ? "≥" : "≤"} ${l}, ${Math.abs(m) < 0.005 ? "at the limit" : `${lengthText(m, units)} to spare`}`;
  return `${v} ${i.bound === "min" ? "<" : ">"} ${l}, ${lengthText(-m, units)} ${i.bound === "min" ? "short" : "over"}`;
}

/** Short names of the detailing rules for table cells. */
export const RULE_SHORT: Record<CheckKind, string> = {
  "bolt-shear": "bolt shear",
  "bolt-bearing": "bearing condition",
  slip: "slip",
  "net-section": "net section",
  "gross-yield": "gross yield",
  "block-shear": "block shear",
  "grip-length": "grip length",
  "min-spacing": "min. spacing",
  "max-spacing": "max. spacing",
  "max-pitch": "max. pitch",
  "max-edge-line-pitch": "max. edge-line pitch",
  "min-end-distance": "min. end distance",
  "min-edge-distance": "min. edge distance",
  "max-edge-distance": "max. edge distance",
  "group-centroid": "group on axis",
  "minimum-design-action": "minimum action",
  "filler-thickness": "filler thickness",
  "gross-compression": "gross section in compression",
  "strut-buckling": "cover strut",
  "ply-buckling": "ply buckling",
};

/** The tightest passing rule in a table cell: "min. end distance at limit", "max. pitch +8 mm". */
export function tightestCell(d: DetailingState, units: DisplayUnits = "si"): string {
  const t = d.tightest;
  if (!t) return "—";
  const spare = t.kind === "rule" ? (Math.abs(t.margin_mm ?? 0) < 0.005 ? "at limit" : `+${lengthText(t.margin_mm ?? 0, units)}`) : `ratio ${ratioText(t.ratio)}`;
  return `${RULE_SHORT[t.checkKind]} ${spare}`;
}

/** The detailing state in a table cell: "all pass; min. end distance at limit", "1 fail: min. pitch 3 mm short". */
export function detailingCell(d: DetailingState, units: DisplayUnits = "si"): string {
  if (d.failures.length > 0) {
    const f = d.failures[0]!;
    return `${d.failures.length} fail: ${RULE_SHORT[f.checkKind]}${f.kind === "rule" ? ` ${lengthText(-(f.margin_mm ?? 0), units)} ${f.bound === "min" ? "short" : "over"}` : ""}`;
  }
  return d.tightest ? `all pass; ${tightestCell(d, units)}` : `all ${d.total} pass`;
}

/** The efficiency basis in a few words, for tables that cannot print the whole definition. */
export function efficiencyBasisNote(basis: EfficiencyBasis): string {
  return (
    `Eff.: efficiency = joint design strength / design tension strength of the unperforated thinner main plate, ` +
    `basis ${basis}: ${BASIS_WORDS[basis]} (options.efficiency_basis); \`splicewright check\` prints its formula and numbers.`
  );
}

export interface SummaryRow {
  key: "verdict" | "load" | "strength" | "strength-utilisation" | "service-utilisation" | "governing" | "efficiency" | "detailing" | "warnings";
  label: string;
  value: string;
  /** Further lines: definitions, the failing checks, warning messages. */
  detail: string[];
  status: "pass" | "fail" | "warn" | "info";
}

/** The joint design strength in words: one figure in tension, one per sense with compression. */
function strengthWords(s: StrengthFigures, F: (N: number) => string): string {
  const b = s.strengthBySense;
  if (!b) return `${F(s.jointStrength_N)} (the least joint tension any ultimate check allows)`;
  const parts = [
    ...(b.tension !== undefined ? [`in tension ${F(b.tension)}`] : []),
    ...(b.compression !== undefined ? [`in compression ${F(b.compression)}`] : []),
  ];
  return `${parts.join("; ")} (the least force of each sense any ultimate check allows)`;
}

/** The summary as labelled rows, worded once for every shell (terminal, HTML, browser). */
export function summaryRows(s: Summary, units: DisplayUnits = "si"): SummaryRow[] {
  const F = (N: number) => forceText(N, units);
  const failures = [...s.strengthChecks.failures.map((f) => `${f.title} (${f.component})`), ...s.detailing.failures.map((f) => `${f.title} (${f.component})`)];
  const rows: SummaryRow[] = [
    {
      key: "verdict",
      label: "Verdict",
      value: s.pass ? "PASS — every check passes" : `FAIL — ${failures.length} check${failures.length === 1 ? "" : "s"} fail: ${failures.join("; ")}`,
      detail: [],
      status: s.pass ? "pass" : "fail",
    },
    { key: "load", label: "Factored load", value: loadWords(s.load, F), detail: [], status: "info" },
    { key: "strength", label: "Joint design strength", value: strengthWords(s, F), detail: [], status: "info" },
    {
      key: "strength-utilisation",
      label: "Strength utilisation",
      value: `${ratioText(s.strengthUtilisation, 3)} = ${s.strengthBySense ? "the highest demand/resistance of either sense" : "T / joint design strength"} (${s.strengthChecks.passing} of ${s.strengthChecks.total} strength checks pass)`,
      detail: s.strengthChecks.failures.map((f) => `fails: ${f.title}, ${f.component} (${f.clause}): utilisation ${ratioText(f.utilisation, 3)}`),
      status: s.strengthUtilisation > 1 + 1e-9 || s.strengthChecks.failures.length > 0 ? "fail" : "pass",
    },
    {
      key: "service-utilisation",
      label: "Service utilisation",
      value: s.service
        ? `${ratioText(s.service.utilisation, 3)} = service tension ${F(s.service.serviceTension_N)} / slip resistance at service ${F(s.service.resistance_N)}`
        : s.serviceNote,
      detail: s.service ? [`${s.service.check.title}, ${s.service.check.component} (${s.service.check.clause})`] : [],
      status: s.service ? (s.service.utilisation > 1 + 1e-9 ? "fail" : "pass") : "info",
    },
    {
      key: "governing",
      label: "Governing check",
      value: s.governing ? `${s.governing.title}, ${s.governing.component} (${s.governing.clause})` : "—",
      detail: [],
      status: "info",
    },
    {
      key: "efficiency",
      label: "Efficiency",
      value: `${(s.efficiency * 100).toFixed(1)} %`,
      detail: [s.efficiencyDefinition],
      status: "info",
    },
    detailingRow(s.detailing, units),
    {
      key: "warnings",
      label: "Warnings",
      value: s.warnings.length === 0 ? "none" : `${s.warnings.length}: ${s.warnings.map((w) => w.id).join(", ")}`,
      detail: s.warnings.map((w) => `[${w.id}] ${w.message}`),
      status: s.warnings.length === 0 ? "info" : "warn",
    },
  ];
  return rows;
}

function detailingRow(d: DetailingState, units: DisplayUnits): SummaryRow {
  const describe = (i: DetailingItem) => `${i.title}, ${i.component} (${i.clause}): ${detailingText(i, units)}`;
  if (d.failures.length > 0) {
    return {
      key: "detailing",
      label: "Detailing rules",
      value: `${d.failures.length} of ${d.total} fail (spacing, end and edge distances, grip, conditions)`,
      detail: d.failures.map((f) => `fails: ${describe(f)}`),
      status: "fail",
    };
  }
  return {
    key: "detailing",
    label: "Detailing rules",
    value: `all ${d.total} pass (spacing, end and edge distances, grip, conditions)`,
    detail: d.tightest ? [`tightest: ${describe(d.tightest)}`] : [],
    status: "pass",
  };
}

const r4 = (v: number): number | null => (Number.isFinite(v) ? Number(v.toFixed(4)) : null);
const r2 = (v: number): number | null => (Number.isFinite(v) ? Number(v.toFixed(2)) : null);

/** A detailing item as JSON (mm and kN). */
export function detailingItemJson(i: DetailingItem) {
  return {
    id: i.id,
    title: i.title,
    component: i.component,
    clause: i.clause,
    kind: i.kind,
    pass: i.pass,
    ...(i.kind === "rule" ? { value_mm: r2(i.value_mm ?? 0), limit_mm: r2(i.limit_mm ?? 0), bound: i.bound, margin_mm: r2(i.margin_mm ?? 0) } : { demand_kN: r2((i.demand_N ?? 0) / 1000), resistance_kN: r2((i.resistance_N ?? 0) / 1000) }),
  };
}

/** The detailing state as JSON. */
export function detailingJson(d: DetailingState) {
  return { total: d.total, passing: d.passing, allPass: d.failures.length === 0, failures: d.failures.map(detailingItemJson), tightest: d.tightest ? detailingItemJson(d.tightest) : null };
}

/** The two utilisation figures as JSON fields (the same names in every JSON output). */
export function utilisationJson(f: StrengthFigures) {
  return {
    strengthUtilisation: r4(f.strengthUtilisation),
    serviceUtilisation: f.service ? r4(f.service.utilisation) : null,
  };
}

/** Compression or reversal: the compression and each sense's strength, kN. */
function senseJson(s: StrengthFigures) {
  const b = s.strengthBySense ?? {};
  return {
    factoredCompression_kN: r2((s.factoredCompression_N ?? 0) / 1000),
    strengthBySense_kN: { ...(b.tension !== undefined ? { tension: r2(b.tension / 1000) } : {}), ...(b.compression !== undefined ? { compression: r2(b.compression / 1000) } : {}) },
  };
}

/** The summary as JSON (kN), beside the full check list. */
export function summaryJson(s: Summary) {
  return {
    verdict: s.verdict,
    factoredTension_kN: r2(s.factoredTension_N / 1000),
    jointStrength_kN: r2(s.jointStrength_N / 1000),
    ...(s.strengthBySense ? senseJson(s) : {}),
    ...utilisationJson(s),
    service: s.service ? { utilisation: r4(s.service.utilisation), serviceTension_kN: r2(s.service.serviceTension_N / 1000), slipResistance_kN: r2(s.service.resistance_N / 1000), check: s.service.check } : null,
    serviceNote: s.serviceNote || null,
    governing: s.governing,
    strengthChecks: { total: s.strengthChecks.total, passing: s.strengthChecks.passing, failures: s.strengthChecks.failures.map((f) => ({ ...f, utilisation: r4(f.utilisation) })) },
    detailing: detailingJson(s.detailing),
    efficiency: r4(s.efficiency),
    efficiencyBasis: s.efficiencyBasis,
    efficiencyDefinition: s.efficiencyDefinition,
    warnings: s.warnings.map((w) => w.id),
    definitions: UTILISATION_DEFINITIONS,
  };
}

/** The definitions every JSON output carries beside the figures. */
export const UTILISATION_DEFINITIONS = {
  strengthUtilisation: "factored tension / joint design strength (the least joint tension any loaded ultimate-limit-state check allows); the highest demand/resistance of those checks",
  serviceUtilisation: "service tension / the joint's slip resistance at service (bolts designed against slip at service); null where the bolts have no serviceability check",
  detailing: "spacing, end and edge distance, grip and bolt-group rules (mm against limits) and conditions that set no load: pass or fail by a margin, never part of either utilisation",
} as const;
