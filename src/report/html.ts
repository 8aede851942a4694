/**
 * The calculation report: one self-contained HTML file (inline styles, inline SVG drawing, system
 * fonts, no network requests), laid out as a calculation sheet that prints to A4: page 1 carries the
 * sign-off block, the summary and the design basis; the drawing has a landscape page of its own at a
 * scale true on the printed page (ISO 5455); every check keeps its formula row with it. Pure.
 *
 * US customary scenarios (`units: us`) print kips, ksi and inches throughout; texts the core writes in
 * SI (formula texts, notes, conventions) are converted at display by `displayText`.
 */
import type { Joint } from "../model/joint.js";
import { boltWordsOf } from "../codes/words.js";
import type { CheckReport, CheckResult } from "../model/results.js";
import type { CheckableScenario } from "../model/scenario.js";
import type { BillOfMaterials } from "../export/bolt-list.js";
import { renderViewsSvg } from "../export/svg.js";
import { partMarks, scaleText } from "../export/drawing.js";
import { boltSizeText } from "../catalogue/bolts.js";
import { CAUTION } from "./check-json.js";
import { citationText } from "./citation.js";
import { designBasis } from "./design-basis.js";
import { dimensionText, displayText, forceText, lengthNumber, lengthText, stressText, trimmed, type DisplayUnits } from "./format.js";
import { summarise, summaryRows, type SummaryRow } from "./summary.js";
import { foldTwins, type FoldedCheck } from "./twins.js";
import { xmlText } from "../text/escape.js";
import { DRAWING_BOX_MM, drawingPrint, REPORT_CSS, scaleBarSvg, type DrawingPrint } from "./print.js";
import { spliceKindWords } from "../model/load.js";

export interface ReportInput {
  scenario: CheckableScenario;
  joint: Joint;
  report: CheckReport;
  bom: BillOfMaterials;
  date: string;
  version: string;
  /** Where the layout came from: the scenario's own, or a search result. */
  origin: string;
}

/** Every text into the page goes through xmlText (entities, no control characters). */
const esc = xmlText;
const fx = (v: number, d = 1) => (Number.isFinite(v) ? v.toFixed(d) : "∞");
const KG_TO_LB = 1 / 0.45359237; // exact definition of the pound (common practice)

const SPLICE_TEXT: Record<Joint["spliceType"], string> = {
  lap: "Lap splice: two plates, bolts in single shear",
  "butt-single-cover": "Butt splice with one cover plate: bolts in single shear",
  "butt-double-cover": "Butt splice with two cover plates: bolts in double shear",
};

/** What every writer below needs: the units and the text of core strings in them. */
interface Ctx {
  u: DisplayUnits;
  /** A core text (SI words) as this report shows it, escaped. The user's own free text (names, document fields) is only escaped. */
  t(s: string): string;
}

/** Which section of the report a check belongs to (twins: the section of their folded component). */
function componentOf(f: FoldedCheck): string {
  const c = f.check;
  if (c.kind === "bolt-shear" || c.kind === "slip" || c.kind === "grip-length") return "Bolts";
  if (c.type === "rule") return "Spacing, end and edge rules";
  return f.component.replace(/, (each side|side [AB])$/, "").replace(/^./, (m) => m.toUpperCase());
}

function demandText(c: CheckResult, u: DisplayUnits): string {
  return c.type === "strength" ? forceText(c.demand_N, u) : lengthText(c.value_mm, u);
}

function resistanceText(c: CheckResult, u: DisplayUnits): string {
  return c.type === "strength" ? forceText(c.resistance_N, u) : `${c.bound === "min" ? "≥" : "≤"} ${lengthText(c.limit_mm, u)}`;
}

/** Strength checks: the utilisation as a bar. Rules: the margin to the limit, never a utilisation. */
function bar(c: CheckResult, u: DisplayUnits): string {
  if (c.type === "rule") {
    const margin = c.bound === "min" ? c.value_mm - c.limit_mm : c.limit_mm - c.value_mm;
    const text = Math.abs(margin) < 0.005 ? "at the limit" : margin > 0 ? `${lengthText(margin, u)} to spare` : `${lengthText(-margin, u)} ${c.bound === "min" ? "short" : "over"}`;
    return `<span class="margin">${esc(text)}</span>`;
  }
  if (c.loadRatio === 0) return `<span class="margin">condition ${c.pass ? "holds" : "does not hold"}</span>`;
  const v = Number.isFinite(c.utilisation) ? c.utilisation : 9.99;
  const width = Math.min(100, Math.max(0, v * 100));
  return `<div class="bar${c.pass ? "" : " over"}" role="img" aria-label="utilisation ${fx(v, 2)}"><span style="width:${fx(width, 1)}%"></span></div><span class="u">${fx(v, 2)}</span>`;
}

/** Each check as its own tbody: the figures row and, under it, the formula row across the table (kept together). */
function checkRows(folded: FoldedCheck[], governing: string, x: Ctx): string {
  return folded
    .map(({ check: c, members, component }) => {
      const governs = members.some((m) => m.id === governing);
      const ids = members.map((m) => m.id).join(" ");
      return `<tbody class="check">
<tr class="${c.pass ? "pass" : "fail"}${governs ? " governing" : ""}" data-check="${esc(ids)}">
  <td class="clause">${esc(citationText(c.citation))}</td>
  <td><b>${x.t(c.title)}</b><br><span class="muted">${x.t(component)}</span></td>
  <td class="num">${esc(demandText(c, x.u))}</td>
  <td class="num">${esc(resistanceText(c, x.u))}</td>
  <td class="util">${bar(c, x.u)}</td>
  <td class="result">${c.pass ? "pass" : "FAIL"}${governs ? "<br><span class=\"muted\">governs</span>" : ""}</td>
</tr>
<tr class="formula-row${governs ? " governing" : ""}"><td colspan="6" class="formula"><div>${x.t(c.formula)}</div><div class="subst">${x.t(c.substituted)}</div>${c.notes.length ? `<div class="muted">${x.t(c.notes.join("; "))}</div>` : ""}</td></tr>
</tbody>`;
    })
    .join("\n");
}

/** The sign-off block: the scenario's document fields, a blank line to fill in where one is absent. */
function signOff(scenario: CheckableScenario, runDate: string, x: Ctx): string {
  const d = scenario.document ?? {};
  const cell = (v: string | undefined, key: string) => (v && v.trim() ? `<td data-field="${key}">${esc(v)}</td>` : `<td data-field="${key}" class="blank"></td>`);
  return `<table class="signoff" id="sign-off">
<tr><th>Job</th>${cell(d.job, "job")}<th>Calculation no.</th>${cell(d.calculationNumber, "calculation")}<th>Revision</th>${cell(d.revision, "revision")}</tr>
<tr class="sign"><th>Prepared by<br><span class="muted">name, signature</span></th>${cell(d.preparedBy, "prepared")}<th>Checked by<br><span class="muted">name, signature</span></th>${cell(d.checkedBy, "checked")}<th>Date</th>${cell(d.date ?? runDate, "date")}</tr>
</table>`;
}

/** Page 1 lists at most this many failing checks per row; the checks and result sections list them all. */
const PAGE1_LIST = 3;

/** A list cut for page 1: the first items, then how many more and where they are. */
function page1List(items: string[]): string[] {
  if (items.length <= PAGE1_LIST) return items;
  return [...items.slice(0, PAGE1_LIST - 1), `… and ${items.length - PAGE1_LIST + 1} more: every one in 3. Checks and 4. Result`];
}

/** The verdict for page 1: FAIL with the failing checks named, or counted where there are many (the rows below name them). */
function page1Verdict(verdict: SummaryRow): string {
  const m = /^(FAIL — \d+ checks? fail): (.*)$/.exec(verdict.value);
  if (!m || m[2]!.split("; ").length <= 2) return verdict.value;
  return `${m[1]}: the strength and detailing rows below name them`;
}

function summaryTable(rows: SummaryRow[], x: Ctx): string {
  return `<table class="kv summary">
${rows
  .slice(1)
  .map((r) => `<tr class="${r.status}" data-row="${r.key}"><td>${esc(r.label)}</td><td>${x.t(r.value)}${page1List(r.detail).map((d) => `<br><span class="muted">${x.t(d)}</span>`).join("")}</td></tr>`)
  .join("\n")}
</table>`;
}

function designBasisSection(input: ReportInput, x: Ctx): string {
  const { scenario, report, bom } = input;
  const basis = designBasis(scenario, report, bom);
  const factorRows = basis.factors.map((f) => `<tr data-factor="${esc(f.symbol)}"><td class="sym">${esc(f.symbol)}</td><td class="num">${f.value.toFixed(2)}</td><td>${esc(f.use)}</td><td class="src">${esc(f.source)}</td></tr>`).join("\n");
  return `<section id="design-basis">
<h2>Design basis</h2>
<table class="kv">
<tr><td>Design code</td><td>${esc(report.codeTitle)}</td></tr>
<tr><td>${esc(basis.factorsTitle)}</td><td><table class="factors" id="factors"><tbody>${factorRows}</tbody></table><span class="muted">${esc(basis.factorsNote)}</span></td></tr>
<tr><td>Plate material</td><td>${basis.plates.map((p) => esc(p)).join("<br>")}</td></tr>
<tr><td>Bolts</td><td>${esc(basis.bolts.join("; "))}</td></tr>
<tr><td>Units</td><td>${x.u === "us" ? "lengths in inches, forces in kips, stresses in ksi (US customary); the checks compute in SI units and convert exactly (1 in = 25.4 × 10⁻³ m)" : "lengths in mm, forces in kN, stresses in MPa"}</td></tr>
<tr><td>Conventions</td><td><ul class="conventions">${report.conventions.map((c) => `<li>${x.t(c)}</li>`).join("")}</ul></td></tr>
</table>
</section>`;
}

/** Page 1: title, sign-off, summary, design basis, caution. */
function firstPage(input: ReportInput, rows: SummaryRow[], x: Ctx): string {
  const { scenario, report } = input;
  return `<section id="page-1">
<header class="sheet">
  <h1>Calculation report — bolted ${spliceKindWords(scenario.load)}</h1>
  <div class="meta">${esc(input.date)}<br>splicewright ${esc(input.version)}</div>
  <div class="scenario"><b>${esc(scenario.name)}</b>${scenario.project ? ` — ${esc(scenario.project)}` : ""}<br><span class="muted">${esc(report.codeTitle)}; ${esc(SPLICE_TEXT[input.joint.spliceType])}; layout: ${esc(input.origin)}</span></div>
</header>
${signOff(scenario, input.date, x)}
<section id="summary">
<h2>Summary</h2>
<div class="verdict ${report.pass ? "is-pass" : "is-fail"}" id="summary-verdict">${x.t(page1Verdict(rows[0]!))}</div>
${summaryTable(rows, x)}
</section>
${designBasisSection(input, x)}
<div class="caution"><b>Caution.</b> ${esc(CAUTION)}</div>
</section>`;
}

function loadRows(scenario: CheckableScenario, x: Ctx): string {
  const l = scenario.load;
  const F = (N: number) => forceText(N, x.u);
  return [
    l.factoredTension_N > 0 ? `<tr><td>Factored tension T</td><td>${F(l.factoredTension_N)}</td></tr>` : "",
    l.serviceTension_N !== undefined ? `<tr><td>Service tension</td><td>${F(l.serviceTension_N)}</td></tr>` : "",
    l.factoredCompression_N !== undefined ? `<tr><td>Factored compression C</td><td>${F(l.factoredCompression_N)}${l.factoredTension_N > 0 ? " (the load reverses: every check in both senses)" : ""}</td></tr>` : "",
    l.serviceCompression_N !== undefined ? `<tr><td>Service compression</td><td>${F(l.serviceCompression_N)}</td></tr>` : "",
    l.factoredCompression_N !== undefined && scenario.splice.type !== "lap" ? `<tr><td>Butt ends</td><td>${scenario.splice.endsInContact ? "in contact (prepared for bearing)" : "not in contact: the bolts and covers carry the whole compression"}</td></tr>` : "",
  ].filter(Boolean).join("\n");
}

function layoutRows(input: ReportInput, x: Ctx): string {
  const { scenario, joint } = input;
  const b = scenario.bolts;
  const L = (mm: number) => lengthText(mm, x.u);
  const l = scenario.layout;
  const rows: Array<[string, string]> = [["Pattern", joint.patternText + (joint.spliceType !== "lap" ? " per side of the butt" : "")]];
  if (l.kind !== "holes") {
    rows.push(["Pitch", L(l.pitch_mm)], ["Gauge", L(l.gauge_mm)], ["End distance", L(l.endDistance_mm)]);
    if (joint.spliceType !== "lap") rows.push(["End distance at the butt", L(l.endDistanceAtButt_mm)], ["Butt gap", L(joint.buttGap_mm)]);
  }
  rows.push(["Bolts", `${joint.holes.length}`], ["Splice length", L(joint.spliceLength_mm)], ["Holes", `Ø${L(joint.holes[0]?.across_mm ?? 0)} (${b.hole})`]);
  const words = boltWordsOf(scenario.code);
  const grade = b.astmGrade ? `ASTM ${b.astmGrade}` : `property class ${b.propertyClass} (ISO 898-1)`;
  return `<tr><td>Bolts</td><td>${esc(boltSizeText(b.size_mm))} ${esc(grade)}, ${esc(words.boltType(b))}; ${esc(words.threads(b.threadsInShearPlanes))}</td></tr>
${rows.map(([k, v]) => `<tr><td>${esc(k)}</td><td>${x.t(v)}</td></tr>`).join("\n")}`;
}

function inputsSection(input: ReportInput, x: Ctx): string {
  const { scenario, joint } = input;
  const unit = x.u === "us" ? "in" : "mm";
  const plateRows = joint.plates
    .map((p) => `<tr><td>${esc(p.label)}</td><td class="num">${lengthNumber(p.spec.width_mm, x.u)}</td><td class="num">${lengthNumber(p.spec.thickness_mm, x.u)}</td><td>${esc(p.spec.grade)}</td><td class="num">${esc(`${stressText(p.fy_MPa, x.u)} / ${stressText(p.fu_MPa, x.u)}`)}</td><td>${esc(p.spec.edges)}</td><td class="num">${p.role === "packing" ? "—" : trimmed(p.forceShare, 3)}</td></tr>`)
    .join("\n");
  return `<section id="inputs" class="page">
<h2>1. Inputs</h2>
<div class="keep"><h3>Load</h3>
<table class="kv">
${loadRows(scenario, x)}
</table></div>
<div class="keep"><h3>Plates</h3>
<table class="plates">
<thead><tr><th>Plate</th><th>Width (${unit})</th><th>Thickness (${unit})</th><th>Steel</th><th>fy / fu</th><th>Edges</th><th>Share of T</th></tr></thead>
<tbody>${plateRows}</tbody>
</table></div>
<div class="keep"><h3>Bolts and layout</h3>
<table class="kv">
${layoutRows(input, x)}
</table></div>
<div class="keep"><h3>Options</h3>
<table class="kv">
${optionRows(scenario)}
</table></div>
${bomSection(input.bom, x)}
</section>`;
}

/** The scenario's options that its code's checks read. */
function optionRows(scenario: CheckableScenario): string {
  const o = scenario.options;
  const rows: Array<[string, string]> = [["Exposed to corrosion", o.exposedToCorrosion ? "yes" : "no"]];
  if (scenario.code.startsWith("is800")) rows.push(["Bolt net area Anb", o.boltNetArea], ["Bolt strength basis", `ISO 898-1 ${o.boltStrength} values`]);
  if (scenario.code.startsWith("en1993")) rows.push(["Plate fy, fu", o.steelStrengths === "en1993-1-1" ? "EN 1993-1-1 Table 3.1" : "the product standard by thickness (EN 10025-2)"]);
  if (scenario.code.startsWith("aisc")) {
    rows.push(["Deformation at the bolt hole at service", o.bearingDeformation === "not-considered" ? "not a design consideration (J3.10(a)(1)(ii), (a)(2)(ii))" : "a design consideration (J3.10(a)(1)(i), (a)(2)(i))"]);
    rows.push(["Fillers", o.fillersDeveloped ? "developed (J5.2(b))" : "not developed"]);
  }
  rows.push(["Efficiency basis", o.efficiencyBasis], ["Net-section load", o.netSectionLoad === "transferred" ? "load already transferred to bolts ahead of each path" : "the whole plate force on every path"]);
  return rows.map(([k, v]) => `<tr><td>${esc(k)}</td><td>${esc(v)}</td></tr>`).join("\n");
}

function bomSection(bom: BillOfMaterials, x: Ctx): string {
  const line = (item: string, quantity: number, notes: string) => `<tr><td>${x.t(item)}</td><td class="num">${quantity}</td><td>${x.t(notes)}</td></tr>`;
  const D = (mm: number) => dimensionText(mm, x.u);
  const mass = (kg: number) => (x.u === "us" ? `${fx(kg * KG_TO_LB, 1)} lb` : `${fx(kg, 2)} kg`);
  const rows = [
    ...bom.bolts.map((b) => line(b.item, b.quantity, b.standard)),
    ...bom.nuts.map((b) => line(b.item, b.quantity, b.standard)),
    ...bom.washers.map((b) => line(b.item, b.quantity, b.standard)),
    ...bom.plates.map((p) => line(`${p.item} ${D(p.width_mm)} × ${D(p.thickness_mm)} × ${D(p.length_mm)} ${p.grade}`, p.quantity, `${mass(p.mass_kg)}, ${p.holes} holes Ø${D(p.holeDiameter_mm)}`)),
  ].join("\n");
  return `<div class="keep"><h3>Bill of materials</h3>
<table class="bom">
<thead><tr><th>Item${x.u === "us" ? "" : " (plates: width × thickness × length, mm)"}</th><th>Quantity</th><th>Standard / notes</th></tr></thead>
<tbody>${rows}</tbody>
</table>
${bom.notes.length ? `<p class="muted">${bom.notes.map((n) => x.t(n)).join("<br>")}</p>` : ""}</div>`;
}

/** The drawing's part marks in words: "1 cover plate A, 2 cover plate B, 3 main plate A (member) …". */
function marksText(joint: Joint): string {
  return partMarks(joint)
    .map(({ plate, mark }) => {
      const p = joint.plates.find((q) => q.id === plate)!;
      return `${mark} ${p.label}${p.role === "main" ? " (member)" : ""}`;
    })
    .join(", ");
}

function drawingSection(svg: string, print: DrawingPrint | null, joint: Joint, x: Ctx): string {
  const marks = `Marks: ${esc(marksText(joint))}; bolts, nuts and washers as in the bill of materials. `;
  const caption = marks + (print
    ? `Plan and section printed on A4 at <b id="print-scale">${scaleText(print.printDenominator)}</b> (ISO 5455)${print.factor !== 1 ? `, reduced to ${trimmed(print.factor * 100, 1)} % from 1:${print.sheetDenominator}` : ""}, lettering at its ISO 3098 height; the title block and parts list are this report's header and bill of materials (the A3 sheet with both: <code>splicewright export</code>). Print at 100 % (no "fit to page") for the scale to hold; the bar gives a check.`
    : `<b id="print-scale">Not to scale</b>: the drawing is fitted to the page.`);
  return `<section id="drawing" class="landscape">
<h2>2. Drawing</h2>
<figure class="drawing${print ? " to-scale" : ""}">${svg}</figure>
<p class="drawing-caption">${caption}${print ? ` ${scaleBarSvg(print, x.u)}` : ""}</p>
</section>`;
}

function checksSection(input: ReportInput, folded: FoldedCheck[], x: Ctx): string {
  const { report } = input;
  const groups = new Map<string, FoldedCheck[]>();
  for (const f of folded) groups.set(componentOf(f), [...(groups.get(componentOf(f)) ?? []), f]);
  return `<section id="checks" class="page">
<h2>3. Checks</h2>
${folded.length < report.checks.length ? `<p class="muted">${report.checks.length} checks; twins — the same check with the same figures on each side of the butt or on both cover plates — are printed once ("each side", "both cover plates"). The JSON export lists every check.</p>` : ""}
${[...groups.entries()]
  .map(
    ([name, checks]) => `<h3>${x.t(name)}</h3>
<table class="checks">
<colgroup><col class="c-clause"><col class="c-check"><col class="c-demand"><col class="c-resist"><col class="c-util"><col class="c-result"></colgroup>
<thead><tr><th>Clause</th><th>Check</th><th>Demand</th><th>Resistance / limit</th><th>Utilisation (rules: margin)</th><th>Result</th></tr></thead>
${checkRows(checks, report.governing, x)}
</table>`,
  )
  .join("\n")}
</section>`;
}

function resultSection(input: ReportInput, rows: SummaryRow[], folded: FoldedCheck[], x: Ctx): string {
  const { scenario, report } = input;
  const summary = summarise(scenario, report);
  const F = (N: number) => forceText(N, x.u);
  const failed = folded.filter((f) => !f.check.pass);
  const verdict = report.pass ? "PASS — every check passes" : `FAIL — ${failed.length} check${failed.length > 1 ? "s" : ""} fail`;
  const strength = report.strengthBySense && scenario.load.factoredCompression_N !== undefined
    ? Object.entries(report.strengthBySense).map(([k, v]) => `in ${k} ${F(v)}`).join("; ")
    : `${F(report.jointStrength_N)} for a factored tension of ${F(scenario.load.factoredTension_N)}`;
  return `<section id="result" class="keep">
<h2>4. Result</h2>
<table class="kv">
<tr><td>Joint design strength</td><td>${esc(strength)}</td></tr>
<tr><td>Governing check</td><td>${summary.governing ? x.t(`${summary.governing.title}, ${summary.governing.component} — ${summary.governing.clause}`) : "—"}</td></tr>
<tr><td>Efficiency</td><td>${fx(report.efficiency * 100)} %<br><span class="muted">${x.t(report.efficiencyDefinition)}</span></td></tr>
${rows
  .filter((r) => r.key === "strength-utilisation" || r.key === "service-utilisation" || r.key === "detailing")
  .map((r) => `<tr><td>${esc(r.label)}</td><td>${x.t(r.value)}${r.detail.map((d) => `<br><span class="muted">${x.t(d)}</span>`).join("")}</td></tr>`)
  .join("\n")}
</table>
${report.warnings.length ? `<h3>Warnings</h3><ul>${report.warnings.map((w) => `<li><b>${esc(w.id)}</b>: ${x.t(w.message)}</li>`).join("")}</ul>` : ""}
<div class="verdict" id="verdict">Verdict: ${esc(verdict)}</div>
${failed.length ? `<p>Failing: ${failed.map((f) => x.t(`${f.check.title} (${f.component})`)).join("; ")}</p>` : ""}
<div class="caution"><b>Caution.</b> ${esc(CAUTION)}</div>
</section>`;
}

export function renderReportHtml(input: ReportInput): string {
  const { scenario, joint, report, bom } = input;
  const u: DisplayUnits = scenario.units === "us" ? "us" : "si";
  const x: Ctx = { u, t: (s) => esc(displayText(s, u)) };
  const svg = renderViewsSvg({ scenario, joint, report, bom, date: input.date }, DRAWING_BOX_MM);
  const print = drawingPrint(svg);
  const folded = foldTwins(report.checks);
  const rows = summaryRows(summarise(scenario, report), u);
  const units = u === "us" ? "dimensions in inches, forces in kips, stresses in ksi" : "dimensions in mm, forces in kN, stresses in MPa";
  return `<!DOCTYPE html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="generator" content="splicewright ${esc(input.version)}">
<title>${esc(scenario.name)} — calculation report</title>
<style>
${REPORT_CSS}${print ? `\n  @media print { figure.drawing.to-scale { width: ${trimmed(print.width_mm, 2)}mm; } }` : ""}
</style>
</head>
<body>
${firstPage(input, rows, x)}
${inputsSection(input, x)}
${drawingSection(svg, print, joint, x)}
${checksSection(input, folded, x)}
${resultSection(input, rows, folded, x)}
<footer>Generated by splicewright ${esc(input.version)} on ${esc(input.date)}. All ${units}.</footer>
</body>
</html>
`;
}
