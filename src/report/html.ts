/**
 * The calculation report: one self-contained HTML file (inline styles, inline SVG drawing, system
 * fonts, no network requests), laid out as a plain calculation sheet that prints cleanly to A4. Pure.
 */
import type { Joint } from "../model/joint.js";
import { boltWordsOf } from "../codes/words.js";
import type { CheckReport, CheckResult } from "../model/results.js";
import type { CheckableScenario } from "../model/scenario.js";
import type { BillOfMaterials } from "../export/bolt-list.js";
import { renderSvg } from "../export/svg.js";
import { boltSizeText } from "../catalogue/bolts.js";
import { CAUTION } from "./check-json.js";
import { citationText } from "./citation.js";
import { lengthNumber, lengthText, trimmed } from "./format.js";
import { summarise, summaryRows } from "./summary.js";
import { foldTwins, type FoldedCheck } from "./twins.js";
import { xmlText } from "../text/escape.js";
import { loadLabel } from "../model/load.js";

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

const SPLICE_TEXT: Record<Joint["spliceType"], string> = {
  lap: "Lap splice: two plates, bolts in single shear",
  "butt-single-cover": "Butt splice with one cover plate: bolts in single shear",
  "butt-double-cover": "Butt splice with two cover plates: bolts in double shear",
};

/** Which section of the report a check belongs to (twins: the section of their folded component). */
function componentOf(f: FoldedCheck): string {
  const c = f.check;
  if (c.kind === "bolt-shear" || c.kind === "slip" || c.kind === "grip-length") return "Bolts";
  if (c.type === "rule") return "Spacing, end and edge rules";
  return f.component.replace(/, (each side|side [AB])$/, "").replace(/^./, (m) => m.toUpperCase());
}

function demandText(c: CheckResult): string {
  return c.type === "strength" ? `${fx(c.demand_N / 1000)} kN` : lengthText(c.value_mm);
}

function resistanceText(c: CheckResult): string {
  return c.type === "strength" ? `${fx(c.resistance_N / 1000)} kN` : `${c.bound === "min" ? "≥" : "≤"} ${lengthText(c.limit_mm)}`;
}

/** Strength checks: the utilisation as a bar. Rules: the margin to the limit, never a utilisation. */
function bar(c: CheckResult): string {
  if (c.type === "rule") {
    const margin = c.bound === "min" ? c.value_mm - c.limit_mm : c.limit_mm - c.value_mm;
    const text = Math.abs(margin) < 0.005 ? "at the limit" : margin > 0 ? `${lengthText(margin)} to spare` : `${lengthText(-margin)} ${c.bound === "min" ? "short" : "over"}`;
    return `<span class="margin">${esc(text)}</span>`;
  }
  if (c.loadRatio === 0) return `<span class="margin">condition ${c.pass ? "holds" : "does not hold"}</span>`;
  const u = Number.isFinite(c.utilisation) ? c.utilisation : 9.99;
  const width = Math.min(100, Math.max(0, u * 100));
  return `<div class="bar${c.pass ? "" : " over"}" role="img" aria-label="utilisation ${fx(u, 2)}"><span style="width:${fx(width, 1)}%"></span></div><span class="u">${fx(u, 2)}</span>`;
}

function checkRows(folded: FoldedCheck[], governing: string): string {
  return folded
    .map(({ check: c, members, component }) => ({ c, component, governs: members.some((m) => m.id === governing), ids: members.map((m) => m.id).join(" ") }))
    .map(
      ({ c, component, governs, ids }) => `<tr class="${c.pass ? "pass" : "fail"}${governs ? " governing" : ""}" data-check="${esc(ids)}">
  <td class="clause">${esc(citationText(c.citation))}</td>
  <td><b>${esc(c.title)}</b><br><span class="muted">${esc(component)}</span></td>
  <td class="formula"><div>${esc(c.formula)}</div><div class="subst">${esc(c.substituted)}</div>${c.notes.length ? `<div class="muted">${esc(c.notes.join("; "))}</div>` : ""}</td>
  <td class="num">${esc(demandText(c))}</td>
  <td class="num">${esc(resistanceText(c))}</td>
  <td class="util">${bar(c)}</td>
  <td class="result">${c.pass ? "pass" : "FAIL"}${governs ? "<br><span class=\"muted\">governs</span>" : ""}</td>
</tr>`,
    )
    .join("\n");
}

export function renderReportHtml(input: ReportInput): string {
  const { scenario, joint, report, bom } = input;
  const b = scenario.bolts;
  const svg = renderSvg({ scenario, joint, report, bom, date: input.date }).replace(/^<\?xml[^>]*>\s*/, "");
  const folded = foldTwins(report.checks);
  const groups = new Map<string, FoldedCheck[]>();
  for (const f of folded) {
    const key = componentOf(f);
    groups.set(key, [...(groups.get(key) ?? []), f]);
  }
  const summary = summarise(scenario, report);
  const rows = summaryRows(summary);
  const failed = folded.filter((f) => !f.check.pass);
  const verdict = report.pass ? "PASS — every check passes" : `FAIL — ${failed.length} check${failed.length > 1 ? "s" : ""} fail`;
  const plateRows = joint.plates
    .map((p) => `<tr><td>${esc(p.label)}</td><td class="num">${lengthNumber(p.spec.width_mm)}</td><td class="num">${lengthNumber(p.spec.thickness_mm)}</td><td>${esc(p.spec.grade)}</td><td class="num">${p.fy_MPa} / ${p.fu_MPa}</td><td>${esc(p.spec.edges)}</td><td class="num">${p.role === "packing" ? "—" : trimmed(p.forceShare, 3)}</td></tr>`)
    .join("\n");
  const l = scenario.layout;
  const layoutRows: Array<[string, string]> = [["Pattern", joint.patternText + (joint.spliceType !== "lap" ? " per side of the butt" : "")]];
  if (l.kind !== "holes") {
    layoutRows.push(["Pitch", lengthText(l.pitch_mm)], ["Gauge", lengthText(l.gauge_mm)], ["End distance", lengthText(l.endDistance_mm)]);
    if (joint.spliceType !== "lap") layoutRows.push(["End distance at the butt", lengthText(l.endDistanceAtButt_mm)], ["Butt gap", lengthText(joint.buttGap_mm)]);
  }
  layoutRows.push(["Bolts", `${joint.holes.length}`], ["Splice length", lengthText(joint.spliceLength_mm)], ["Holes", `Ø${lengthText(joint.holes[0]?.across_mm ?? 0)} (${b.hole})`]);
  const bomRows = [
    ...bom.bolts.map((x) => `<tr><td>${esc(x.item)}</td><td class="num">${x.quantity}</td><td>${esc(x.standard)}</td></tr>`),
    ...bom.nuts.map((x) => `<tr><td>${esc(x.item)}</td><td class="num">${x.quantity}</td><td>${esc(x.standard)}</td></tr>`),
    ...bom.washers.map((x) => `<tr><td>${esc(x.item)}</td><td class="num">${x.quantity}</td><td>${esc(x.standard)}</td></tr>`),
    ...bom.plates.map((x) => `<tr><td>${esc(`${x.item} ${lengthNumber(x.width_mm)} × ${lengthNumber(x.thickness_mm)} × ${lengthNumber(x.length_mm)} ${x.grade}`)}</td><td class="num">${x.quantity}</td><td>${fx(x.mass_kg, 2)} kg, ${x.holes} holes Ø${x.holeDiameter_mm}</td></tr>`),
  ].join("\n");

  return `<!DOCTYPE html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="generator" content="splicewright ${esc(input.version)}">
<title>${esc(scenario.name)} — calculation report</title>
<style>
  :root { --ink: #111; --muted: #555; --rule: #999; }
  * { box-sizing: border-box; }
  body { font-family: "DejaVu Sans", "Liberation Sans", Arial, Helvetica, sans-serif; color: var(--ink); margin: 0 auto; max-width: 1100px; padding: 16px 24px; font-size: 13px; line-height: 1.35; }
  header.sheet { border: 1.5px solid var(--ink); display: grid; grid-template-columns: 1fr auto; margin-bottom: 12px; }
  header.sheet h1 { font-size: 18px; margin: 0; padding: 8px 10px; border-right: 1px solid var(--ink); }
  header.sheet .meta { padding: 6px 10px; font-size: 12px; }
  h2 { font-size: 15px; border-bottom: 1.5px solid var(--ink); padding-bottom: 2px; margin: 18px 0 8px; }
  h3 { font-size: 13px; margin: 14px 0 4px; }
  table { border-collapse: collapse; width: 100%; margin: 4px 0 10px; }
  th, td { border: 1px solid var(--rule); padding: 3px 6px; vertical-align: top; text-align: left; }
  th { background: #eee; font-weight: 600; }
  td.num { text-align: right; white-space: nowrap; }
  td.clause { font-size: 12px; min-width: 8em; max-width: 13em; }
  td.formula { font-family: "DejaVu Sans Mono", "Liberation Mono", Consolas, monospace; font-size: 11px; }
  td.formula .subst { margin-top: 2px; }
  .muted { color: var(--muted); font-size: 11px; font-family: inherit; }
  td.util { width: 130px; white-space: nowrap; }
  .bar { display: inline-block; width: 80px; height: 10px; border: 1px solid var(--ink); vertical-align: middle; position: relative; }
  .bar span { display: block; height: 100%; background: #444; }
  .bar.over span { background: repeating-linear-gradient(45deg, #000 0 3px, #fff 3px 5px); }
  .u { margin-left: 6px; font-variant-numeric: tabular-nums; }
  tr.fail td.result { font-weight: bold; }
  tr.governing td { border-top: 2px solid var(--ink); border-bottom: 2px solid var(--ink); }
  .kv td:first-child { width: 32%; color: var(--muted); }
  figure.drawing { margin: 0; border: 1px solid var(--rule); }
  figure.drawing svg { width: 100%; height: auto; display: block; }
  .verdict { border: 2px solid var(--ink); padding: 8px 12px; font-size: 16px; font-weight: bold; margin: 8px 0; }
  .verdict.is-pass { border-color: #1a6b2a; color: #1a6b2a; }
  .verdict.is-fail { border-color: #b00020; color: #b00020; border-width: 3px; }
  table.summary tr.fail td:last-child { color: #b00020; font-weight: bold; }
  table.summary tr.warn td:last-child { color: #8a5a00; }
  tr.fail td.result { color: #b00020; }
  .caution { border: 1px solid var(--ink); padding: 8px 12px; font-size: 12px; margin-top: 16px; }
  footer { margin-top: 18px; font-size: 11px; color: var(--muted); }
  @page { size: A4; margin: 14mm 12mm 16mm; @bottom-right { content: "page " counter(page) " of " counter(pages); font-size: 9pt; } @bottom-left { content: "splicewright calculation report"; font-size: 9pt; } }
  @media print {
    body { max-width: none; padding: 0; font-size: 10pt; }
    section.page { break-before: page; }
    tr, .verdict, .caution, figure.drawing { break-inside: avoid; }
    thead { display: table-header-group; }
    a { color: inherit; text-decoration: none; }
  }
</style>
</head>
<body>
<header class="sheet">
  <h1>Calculation report — bolted ${scenario.load.factoredCompression_N !== undefined ? (scenario.load.factoredTension_N > 0 ? "splice under reversing load" : "splice in compression") : "tension splice"}</h1>
  <div class="meta">${esc(input.date)}<br>splicewright ${esc(input.version)}</div>
</header>

<section id="summary">
<h2>Summary</h2>
<div class="verdict ${report.pass ? "is-pass" : "is-fail"}" id="summary-verdict">${esc(rows[0]!.value)}</div>
<table class="kv summary">
${rows
  .slice(1)
  .map((r) => `<tr class="${r.status}" data-row="${r.key}"><td>${esc(r.label)}</td><td>${esc(r.value)}${r.detail.map((d) => `<br><span class="muted">${esc(d)}</span>`).join("")}</td></tr>`)
  .join("\n")}
</table>
</section>

<section id="project">
<h2>1. Project and scenario</h2>
<table class="kv">
<tr><td>Scenario</td><td>${esc(scenario.name)}</td></tr>
<tr><td>Project</td><td>${esc(scenario.project ?? "—")}</td></tr>
<tr><td>Design code</td><td>${esc(report.codeTitle)}</td></tr>
<tr><td>Splice</td><td>${esc(SPLICE_TEXT[joint.spliceType])}</td></tr>
<tr><td>Layout</td><td>${esc(input.origin)}</td></tr>
</table>
</section>

<section id="inputs">
<h2>2. Inputs</h2>
<h3>Load</h3>
<table class="kv">
${scenario.load.factoredTension_N > 0 ? `<tr><td>Factored tension T</td><td>${fx(scenario.load.factoredTension_N / 1000)} kN</td></tr>` : ""}
${scenario.load.serviceTension_N !== undefined ? `<tr><td>Service tension</td><td>${fx(scenario.load.serviceTension_N / 1000)} kN</td></tr>` : ""}
${scenario.load.factoredCompression_N !== undefined ? `<tr><td>Factored compression C</td><td>${fx(scenario.load.factoredCompression_N / 1000)} kN${scenario.load.factoredTension_N > 0 ? " (the load reverses: every check in both senses)" : ""}</td></tr>` : ""}
${scenario.load.serviceCompression_N !== undefined ? `<tr><td>Service compression</td><td>${fx(scenario.load.serviceCompression_N / 1000)} kN</td></tr>` : ""}
${scenario.load.factoredCompression_N !== undefined && scenario.splice.type !== "lap" ? `<tr><td>Butt ends</td><td>${scenario.splice.endsInContact ? "in contact (prepared for bearing)" : "not in contact: the bolts and covers carry the whole compression"}</td></tr>` : ""}
</table>
<h3>Plates</h3>
<table>
<thead><tr><th>Plate</th><th>Width (mm)</th><th>Thickness (mm)</th><th>Steel</th><th>fy / fu (MPa)</th><th>Edges</th><th>Share of T</th></tr></thead>
<tbody>${plateRows}</tbody>
</table>
<h3>Bolts and layout</h3>
<table class="kv">
<tr><td>Bolts</td><td>${esc(boltSizeText(b.size_mm))} ${b.astmGrade ? `ASTM ${b.astmGrade}` : `property class ${b.propertyClass} (ISO 898-1)`}, ${esc(boltWordsOf(scenario.code).boltType(b))}; ${esc(boltWordsOf(scenario.code).threads(b.threadsInShearPlanes))}</td></tr>
${layoutRows.map(([k, v]) => `<tr><td>${esc(k)}</td><td>${esc(v)}</td></tr>`).join("\n")}
</table>
<h3>Options</h3>
<table class="kv">
<tr><td>Exposed to corrosion</td><td>${scenario.options.exposedToCorrosion ? "yes" : "no"}</td></tr>
<tr><td>Bolt net area Anb</td><td>${esc(scenario.options.boltNetArea)}</td></tr>
<tr><td>Bolt strength basis</td><td>ISO 898-1 ${esc(scenario.options.boltStrength)} values</td></tr>
<tr><td>Efficiency basis</td><td>${esc(scenario.options.efficiencyBasis)}</td></tr>
<tr><td>Net-section load</td><td>${scenario.options.netSectionLoad === "transferred" ? "load already transferred to bolts ahead of each path" : "the whole plate force on every path"}</td></tr>
</table>
</section>

<section id="drawing" class="page">
<h2>3. Drawing</h2>
<figure class="drawing">${svg}</figure>
<h3>Bill of materials</h3>
<table>
<thead><tr><th>Item</th><th>Quantity</th><th>Standard / notes</th></tr></thead>
<tbody>${bomRows}</tbody>
</table>
${bom.notes.length ? `<p>${bom.notes.map(esc).join("<br>")}</p>` : ""}
</section>

<section id="checks" class="page">
<h2>4. Checks</h2>
${folded.length < report.checks.length ? `<p class="muted">${report.checks.length} checks; twins — the same check with the same figures on each side of the butt or on both cover plates — are printed once ("each side", "both cover plates"). The JSON export lists every check.</p>` : ""}
${[...groups.entries()]
  .map(
    ([name, checks]) => `<h3>${esc(name)}</h3>
<table class="checks">
<thead><tr><th>Clause</th><th>Check</th><th>Formula and substituted values</th><th>Demand</th><th>Resistance / limit</th><th>Utilisation (rules: margin)</th><th>Result</th></tr></thead>
<tbody>
${checkRows(checks, report.governing)}
</tbody>
</table>`,
  )
  .join("\n")}
</section>

<section id="result" class="page">
<h2>5. Result</h2>
<table class="kv">
<tr><td>Joint design strength</td><td>${report.strengthBySense && scenario.load.factoredCompression_N !== undefined ? esc(Object.entries(report.strengthBySense).map(([k, v]) => `in ${k} ${fx(v / 1000)} kN`).join("; ") + ` for ${loadLabel(scenario.load)}`) : `${fx(report.jointStrength_N / 1000)} kN for a factored tension of ${fx(scenario.load.factoredTension_N / 1000)} kN`}</td></tr>
<tr><td>Governing check</td><td>${summary.governing ? esc(`${summary.governing.title}, ${summary.governing.component} — ${summary.governing.clause}`) : "—"}</td></tr>
<tr><td>Efficiency</td><td>${fx(report.efficiency * 100)} %<br><span class="muted">${esc(report.efficiencyDefinition)}</span></td></tr>
${rows
  .filter((r) => r.key === "strength-utilisation" || r.key === "service-utilisation" || r.key === "detailing")
  .map((r) => `<tr><td>${esc(r.label)}</td><td>${esc(r.value)}${r.detail.map((d) => `<br><span class="muted">${esc(d)}</span>`).join("")}</td></tr>`)
  .join("\n")}
</table>
${report.warnings.length ? `<h3>Warnings</h3><ul>${report.warnings.map((w) => `<li><b>${esc(w.id)}</b>: ${esc(w.message)}</li>`).join("")}</ul>` : ""}
<h3>Conventions</h3>
<ul>${report.conventions.map((c) => `<li>${esc(c)}</li>`).join("")}</ul>
<div class="verdict" id="verdict">Verdict: ${esc(verdict)}</div>
${failed.length ? `<p>Failing: ${failed.map((f) => esc(`${f.check.title} (${f.component})`)).join("; ")}</p>` : ""}
<div class="caution"><b>Caution.</b> ${esc(CAUTION)}</div>
</section>
<footer>Generated by splicewright ${esc(input.version)} on ${esc(input.date)}. All dimensions in mm, forces in kN, stresses in MPa.</footer>
</body>
</html>
`;
}
