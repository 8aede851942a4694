/**
 * The calculation sheet on the terminal: the summary first, then the splice, the plates and every
 * check (twins once), the conventions and the caution. Laid out for a width (no line wider), with
 * PASS, FAIL and warnings emphasised when the style colours. `brief`: the summary and one line per check.
 */
import type { Joint } from "../model/joint.js";
import { boltWordsOf } from "../codes/words.js";
import type { CheckReport, CheckResult } from "../model/results.js";
import type { CheckableScenario } from "../model/scenario.js";
import { CAUTION } from "../report/check-json.js";
import { citationText } from "../report/citation.js";
import { forceText, lengthNumber, lengthText, ratioText, trimmed, type DisplayUnits } from "../report/format.js";
import { summarise, summaryRows, type SummaryRow } from "../report/summary.js";
import { foldTwins, type FoldedCheck } from "../report/twins.js";
import { inchBoltSize, inchSizeText } from "../catalogue/bolts.js";
import { toUnit } from "../units/units.js";
import { PLAIN_STYLE, type Style } from "./style.js";
import { columns, PIPED_WIDTH, wrap } from "./text.js";
import { spliceKindWords } from "../model/load.js";

export interface SheetOptions {
  width: number;
  style: Style;
  /** The summary and one line per check. */
  brief?: boolean;
}

const SPLICE_TEXT: Record<Joint["spliceType"], string> = {
  lap: "lap splice (two plates, single shear)",
  "butt-single-cover": "butt splice, one cover plate (single shear)",
  "butt-double-cover": "butt splice, two cover plates (double shear)",
};

/** Width of the label column of the summary ("Joint design strength:" and two spaces). */
const LABEL = 24;

const boltName = (d_mm: number) => {
  const inch = inchBoltSize(d_mm);
  return inch !== undefined ? inchSizeText(inch) : `M${d_mm}`;
};

function layoutText(scenario: CheckableScenario, joint: Joint, u: DisplayUnits): string {
  const len = (mm: number) => lengthText(mm, u);
  const l = scenario.layout;
  const butt = joint.spliceType !== "lap";
  const per = butt ? " per side of the butt" : "";
  if (l.kind === "holes") return `${joint.patternText}${per}; end distance at the far end ${len(l.endDistance_mm)}`;
  // Pitch and gauge only where there is more than one transverse line / gauge line.
  const lines = new Set(joint.holes.filter((h) => h.group === joint.holes[0]?.group).map((h) => h.x_mm)).size;
  const gaugeLines = new Set(joint.holes.map((h) => h.y_mm)).size;
  const parts = [
    `${joint.patternText}${per}`,
    ...(lines > 1 ? [`pitch ${len(l.pitch_mm)}`] : []),
    ...(gaugeLines > 1 ? [`gauge ${len(l.gauge_mm)}`] : []),
    `end distance ${len(l.endDistance_mm)}`,
  ];
  if (butt) parts.push(`end distance at the butt ${len(l.endDistanceAtButt_mm)}`);
  const ys = joint.holes.map((h) => h.y_mm);
  const narrow = Math.min(...joint.plates.filter((p) => p.role !== "packing").map((p) => p.spec.width_mm));
  parts.push(`edge distance ${len(narrow / 2 - Math.max(...ys))}`);
  return parts.join(", ");
}

/** The summary rows, label column and wrapped values; details under the value. */
function summaryLines(rows: SummaryRow[], width: number, style: Style): string[] {
  const out: string[] = [];
  const pad = " ".repeat(LABEL);
  for (const r of rows) {
    const label = `${r.label}:`.padEnd(LABEL);
    let value = r.value;
    if (r.key === "verdict") value = r.status === "fail" ? style.fail(value) : style.pass(value);
    else if (r.status === "fail") value = style.fail(value);
    else if (r.status === "warn") value = style.warn(value);
    out.push(...wrap(value, width, label, pad));
    for (const d of r.detail) out.push(...wrap(d, width, `${pad}`, `${pad}  `));
  }
  return out;
}

/** The plates, twins (identical plates) once. */
function plateLines(joint: Joint, u: DisplayUnits, width: number): string[] {
  const us = u === "us";
  const groups: Array<{ label: string; cells: string[] }> = [];
  for (const p of joint.plates) {
    const cells = [
      `${lengthNumber(p.spec.width_mm, u)} × ${lengthNumber(p.spec.thickness_mm, u)}`,
      p.spec.grade,
      us ? `${trimmed(toUnit(p.fy_MPa, "ksi", "stress"), 1)}/${trimmed(toUnit(p.fu_MPa, "ksi", "stress"), 1)}` : `${p.fy_MPa}/${p.fu_MPa}`,
      p.spec.edges,
      p.role === "packing" ? "—" : trimmed(p.forceShare, 3),
    ];
    const twin = groups.find((g) => g.cells.join("|") === cells.join("|") && p.role === "cover" && g.label.startsWith("cover plate"));
    if (twin) twin.label = "both cover plates";
    else groups.push({ label: p.label, cells });
  }
  const head = ["plate", `b × t (${us ? "in" : "mm"})`, "steel", `${us ? "Fy/Fu (ksi)" : "fy/fu (MPa)"}`, "edges", "share of T"];
  const rows = [head, ...groups.map((g) => [g.label, ...g.cells.slice(0, 4), g.label === "both cover plates" ? `${g.cells[4]} each` : g.cells[4]!])];
  const laid = columns(rows.map((r) => ["  " + r[0]!, ...r.slice(1)]), width);
  if (laid) return laid;
  return groups.flatMap((g) => wrap(`${g.label}: ${head.slice(1).map((h, i) => `${h} ${g.cells[i]}`).join("; ")}`, width, "  ", "    "));
}

/** The figures of a check on one line: demand against resistance, or value against limit. */
function figureText(c: CheckResult, u: DisplayUnits): string {
  if (c.type === "rule") return `${lengthText(c.value_mm, u)} ${c.pass ? (c.bound === "min" ? "≥" : "≤") : c.bound === "min" ? "<" : ">"} ${lengthText(c.limit_mm, u)}`;
  const rel = c.pass ? "≤" : ">";
  if (c.loadRatio === 0) return `${forceText(c.demand_N, u)} ${rel} ${forceText(c.resistance_N, u)} (a condition: it sets no load)`;
  return `${forceText(c.demand_N, u)} ${rel} ${forceText(c.resistance_N, u)}, utilisation ${ratioText(c.utilisation)}${c.limitState === "SLS" ? " (service)" : ""}`;
}

function resultWord(c: CheckResult, style: Style): string {
  return c.pass ? style.pass("pass") : style.fail("FAIL");
}

function checkBlock(f: FoldedCheck, i: number, governing: string, u: DisplayUnits, width: number, style: Style): string[] {
  const c = f.check;
  const number = `${String(i + 1).padStart(2)}  `;
  const head = `${c.title} · ${f.component} · ${clauseOf(c)}`;
  const out = wrap(style.strong(head), width, number, "      ");
  const governs = f.members.some((m) => m.id === governing) ? " — governs" : "";
  out.push(...wrap(`${figureText(c, u)}: ${resultWord(c, style)}${governs}`, width, "    ", "      "));
  out.push(...wrap(c.formula, width, "    ", "      "));
  out.push(...wrap(c.substituted, width, "    ", "      "));
  for (const n of c.notes) out.push(...wrap(n, width, "    ", "      "));
  return out;
}

const clauseOf = (c: CheckResult) => citationText(c.citation);

/**
 * One line per check (wrapped only when it cannot fit): result, figure, check, component and clause
 * (without the code's own standard, which the header names).
 */
function briefLines(folded: FoldedCheck[], codeTitle: string, u: DisplayUnits, width: number, style: Style): string[] {
  const out: string[] = [];
  folded.forEach((f, i) => {
    const c = f.check;
    const rel = c.pass ? (c.type === "rule" && c.bound === "min" ? "≥" : "≤") : c.type === "rule" && c.bound === "min" ? "<" : ">";
    const figure = c.type === "rule" ? `${lengthNumber(c.value_mm, u)} ${rel} ${lengthText(c.limit_mm, u)}` : c.loadRatio === 0 ? "condition" : ratioText(c.utilisation);
    const lead = `${String(i + 1).padStart(3)}  ${resultWord(c, style)}  ${figure.padEnd(14)}  `;
    const clause = codeTitle.startsWith(c.citation.standard) ? clauseOf(c).slice(c.citation.standard.length + 1) : clauseOf(c);
    out.push(...wrap(`${c.title} · ${f.component} · ${clause}`, width, lead, " ".repeat(27)));
  });
  return out;
}

export function formatSheet(scenario: CheckableScenario, joint: Joint, report: CheckReport, options: SheetOptions = { width: PIPED_WIDTH, style: PLAIN_STYLE }): string {
  const { width, style } = options;
  const u: DisplayUnits = scenario.units === "us" ? "us" : "si";
  const out: string[] = [];
  const line = (label: string, text: string) => out.push(...wrap(text, width, label.padEnd(10), " ".repeat(10)));
  out.push(...wrap(`splicewright — calculation sheet: bolted ${spliceKindWords(scenario.load)}${options.brief ? " (brief)" : ""}`, width));
  line("Scenario:", scenario.name);
  if (scenario.project) line("Project:", scenario.project);
  line("Code:", report.codeTitle);
  out.push("");

  const summary = summarise(scenario, report);
  const rows = summaryRows(summary, u);
  out.push(style.strong("SUMMARY"));
  out.push(...summaryLines(rows, width, style));
  out.push("");

  const folded = foldTwins(report.checks);
  const twins = folded.length < report.checks.length ? `; twins once ("each side", "both cover plates") — --json lists all ${report.checks.length}` : "";
  if (options.brief) {
    const of = folded.length < report.checks.length ? ` of ${report.checks.length}, twins once` : "";
    out.push(...wrap(style.strong(`CHECKS (${folded.length}${of}; figure: utilisation, or value against limit)`), width));
    out.push(...briefLines(folded, report.codeTitle, u, width, style));
    out.push("");
    out.push(...wrap(`CAUTION: ${CAUTION}`, width));
    return out.join("\n");
  }

  const b = scenario.bolts;
  const holeDia = joint.holes[0]?.across_mm ?? 0;
  out.push(style.strong("SPLICE"));
  line("Splice:", `${SPLICE_TEXT[joint.spliceType]}${joint.spliceType !== "lap" ? `; butt gap ${lengthText(joint.buttGap_mm, u)}; ${joint.holes.length / 2} bolts each side of the butt` : `; ${joint.holes.length} bolts`}`);
  line(
    "Bolts:",
    `${boltName(b.size_mm)} ${b.astmGrade ? `ASTM ${b.astmGrade}` : `class ${b.propertyClass}`}, ${boltWordsOf(scenario.code).boltType(b)}, ` +
      `${boltWordsOf(scenario.code).threads(b.threadsInShearPlanes)}, ${b.hole} holes Ø${lengthText(holeDia, u)}`,
  );
  line("Layout:", `${layoutText(scenario, joint, u)}; splice length ${lengthText(joint.spliceLength_mm, u)}`);
  out.push("Plates:");
  out.push(...plateLines(joint, u, width));
  out.push("");

  out.push(...wrap(style.strong(`CHECKS (${folded.length}${twins})`), width));
  folded.forEach((f, i) => {
    out.push(...checkBlock(f, i, report.governing, u, width, style));
    out.push("");
  });

  out.push(style.strong("CONVENTIONS"));
  for (const c of report.conventions) out.push(...wrap(c, width, "  - ", "    "));
  out.push("");
  out.push(...wrap(`CAUTION: ${CAUTION}`, width));
  return out.join("\n");
}
