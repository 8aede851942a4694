/**
 * The calculation sheet as terminal tables.
 */
import Table from "cli-table3";
import type { Joint } from "../model/joint.js";
import type { CheckReport, CheckResult } from "../model/results.js";
import type { CheckableScenario } from "../model/scenario.js";
import { CAUTION, citationText } from "../report/check-json.js";

const SPLICE_TEXT: Record<Joint["spliceType"], string> = {
  lap: "lap splice (two plates, single shear)",
  "butt-single-cover": "butt splice, one cover plate (single shear)",
  "butt-double-cover": "butt splice, two cover plates (double shear)",
};

const fx = (v: number, d = 1) => (Number.isFinite(v) ? v.toFixed(d) : "∞");

function demandText(c: CheckResult): string {
  return c.type === "strength" ? `${fx(c.demand_N / 1000)} kN` : `${fx(c.value_mm)} mm`;
}

function resistanceText(c: CheckResult): string {
  if (c.type === "strength") return `${fx(c.resistance_N / 1000)} kN`;
  return `${c.bound === "min" ? "≥" : "≤"} ${fx(c.limit_mm)} mm`;
}

function layoutText(scenario: CheckableScenario, joint: Joint): string {
  const l = scenario.layout;
  const butt = joint.spliceType !== "lap";
  const per = butt ? " per side of the butt" : "";
  if (l.kind === "holes") return `${joint.patternText}${per}; end distance at the far end ${fx(l.endDistance_mm)} mm`;
  const parts = [
    `${joint.patternText}${per}`,
    `pitch ${fx(l.pitch_mm)} mm`,
    `gauge ${fx(l.gauge_mm)} mm`,
    `end distance ${fx(l.endDistance_mm)} mm`,
  ];
  if (butt) parts.push(`end distance at the butt ${fx(l.endDistanceAtButt_mm)} mm`);
  const ys = joint.holes.map((h) => h.y_mm);
  const narrow = Math.min(...joint.plates.filter((p) => p.role !== "packing").map((p) => p.spec.width_mm));
  parts.push(`edge distance ${fx(narrow / 2 - Math.max(...ys))} mm`);
  return parts.join(", ");
}

export function formatSheet(scenario: CheckableScenario, joint: Joint, report: CheckReport): string {
  const out: string[] = [];
  const b = scenario.bolts;
  const holeDia = joint.holes[0]?.across_mm ?? 0;
  out.push("splicewright — calculation sheet: bolted tension splice");
  out.push(`Scenario: ${scenario.name}${scenario.project ? `   Project: ${scenario.project}` : ""}`);
  out.push(`Code:     ${report.codeTitle}`);
  out.push(`Splice:   ${SPLICE_TEXT[joint.spliceType]}${joint.spliceType !== "lap" ? `; butt gap ${fx(joint.buttGap_mm)} mm; ${joint.holes.length / 2} bolts each side of the butt` : `; ${joint.holes.length} bolts`}`);
  out.push(`Load:     factored tension T = ${fx(scenario.load.factoredTension_N / 1000)} kN${scenario.load.serviceTension_N !== undefined ? `; service tension ${fx(scenario.load.serviceTension_N / 1000)} kN` : ""}`);
  out.push(
    `Bolts:    M${b.size_mm} class ${b.propertyClass}, ${b.assembly === "bearing" ? "bearing type" : `friction grip (μf ${b.slipFactor}, slip at ${b.slipAt})`}, ` +
      `threads ${b.threadsInShearPlanes ? "in" : "excluded from"} the shear planes, ${b.hole} holes Ø${fx(holeDia)} mm`,
  );
  out.push(`Layout:   ${layoutText(scenario, joint)}; splice length ${fx(joint.spliceLength_mm)} mm`);
  out.push("");

  const plates = new Table({ head: ["Plate", "Width × t (mm)", "Steel", "fy / fu (MPa)", "Edges", "Share of T"], style: { head: [], border: [] } });
  for (const p of joint.plates) {
    plates.push([p.label, `${fx(p.spec.width_mm)} × ${fx(p.spec.thickness_mm)}`, p.spec.grade, `${p.fy_MPa} / ${p.fu_MPa}`, p.spec.edges, p.role === "packing" ? "—" : fx(p.forceShare, 3)]);
  }
  out.push(plates.toString());
  out.push("");

  const checks = new Table({
    head: ["#", "Check", "Component", "Clause", "Demand", "Resistance / limit", "Util.", "Result"],
    style: { head: [], border: [] },
    colWidths: [4, 26, 24, 26, 11, 19, 7, 8],
    wordWrap: true,
  });
  report.checks.forEach((c, i) => {
    checks.push([String(i + 1), c.title, c.component, citationText(c.citation), demandText(c), resistanceText(c), fx(c.utilisation, 2), c.pass ? "pass" : "FAIL"]);
    checks.push([{ colSpan: 8, content: `    ${c.formula}\n    ${c.substituted}${c.notes.length ? `\n    ${c.notes.join("; ")}` : ""}` }]);
  });
  out.push(checks.toString());
  out.push("");

  const governing = report.checks.find((c) => c.id === report.governing);
  out.push(`Joint design strength:  ${fx(report.jointStrength_N / 1000)} kN  (governed by ${governing ? `${governing.title}, ${governing.component}, ${citationText(governing.citation)}` : "—"})`);
  out.push(`Efficiency:             ${fx(report.efficiency * 100)} %`);
  out.push(`                        ${report.efficiencyDefinition}`);
  out.push(`Highest utilisation:    ${fx(report.maxUtilisation, 3)}`);
  const failed = report.checks.filter((c) => !c.pass);
  out.push(
    `Verdict:                ${report.pass ? "PASS — every check passes" : `FAIL — ${failed.length} check${failed.length > 1 ? "s" : ""} fail: ${failed.map((c) => `${c.title} (${c.component})`).join("; ")}`}`,
  );
  if (report.warnings.length) {
    out.push("");
    out.push("Warnings:");
    for (const w of report.warnings) out.push(`  - [${w.id}] ${w.message}`);
  }
  out.push("");
  out.push("Conventions:");
  for (const c of report.conventions) out.push(`  - ${c}`);
  out.push("");
  out.push(`CAUTION: ${CAUTION}`);
  return out.join("\n");
}
