/**
 * The calculation sheet as terminal tables.
 */
import Table from "cli-table3";
import type { Joint } from "../model/joint.js";
import type { CheckReport, CheckResult } from "../model/results.js";
import type { CheckableScenario } from "../model/scenario.js";
import { CAUTION, citationText } from "../report/check-json.js";
import { inchBoltSize, inchSizeText } from "../catalogue/bolts.js";
import { toUnit } from "../units/units.js";

const SPLICE_TEXT: Record<Joint["spliceType"], string> = {
  lap: "lap splice (two plates, single shear)",
  "butt-single-cover": "butt splice, one cover plate (single shear)",
  "butt-double-cover": "butt splice, two cover plates (double shear)",
};

const fx = (v: number, d = 1) => (Number.isFinite(v) ? v.toFixed(d) : "∞");

/** Display units of the sheet: SI (mm, kN, MPa) or, for a scenario with `units: us`, in, kips, ksi. */
let us = false;
const len = (mm: number) => (us ? `${fx(toUnit(mm, "in", "length"), 3)} in` : `${fx(mm)} mm`);
const force = (N: number) => (us ? `${fx(toUnit(N, "kip", "force"), 1)} kips` : `${fx(N / 1000)} kN`);
const stress = (MPa: number) => (us ? fx(toUnit(MPa, "ksi", "stress"), 1) : String(MPa));
const boltName = (d_mm: number) => {
  const inch = inchBoltSize(d_mm);
  return inch !== undefined ? inchSizeText(inch) : `M${d_mm}`;
};

function demandText(c: CheckResult): string {
  return c.type === "strength" ? force(c.demand_N) : len(c.value_mm);
}

function resistanceText(c: CheckResult): string {
  if (c.type === "strength") return force(c.resistance_N);
  return `${c.bound === "min" ? "≥" : "≤"} ${len(c.limit_mm)}`;
}

function layoutText(scenario: CheckableScenario, joint: Joint): string {
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

export function formatSheet(scenario: CheckableScenario, joint: Joint, report: CheckReport): string {
  const out: string[] = [];
  us = scenario.units === "us";
  const b = scenario.bolts;
  const holeDia = joint.holes[0]?.across_mm ?? 0;
  out.push("splicewright — calculation sheet: bolted tension splice");
  out.push(`Scenario: ${scenario.name}${scenario.project ? `   Project: ${scenario.project}` : ""}`);
  out.push(`Code:     ${report.codeTitle}`);
  out.push(`Splice:   ${SPLICE_TEXT[joint.spliceType]}${joint.spliceType !== "lap" ? `; butt gap ${len(joint.buttGap_mm)}; ${joint.holes.length / 2} bolts each side of the butt` : `; ${joint.holes.length} bolts`}`);
  out.push(`Load:     factored tension T = ${force(scenario.load.factoredTension_N)}${scenario.load.serviceTension_N !== undefined ? `; service tension ${force(scenario.load.serviceTension_N)}` : ""}`);
  out.push(
    `Bolts:    ${boltName(b.size_mm)} ${b.astmGrade ? `ASTM ${b.astmGrade}` : `class ${b.propertyClass}`}, ${b.assembly === "bearing" ? "bearing type" : b.astmGrade ? `slip-critical (μ ${b.slipFactor})` : `friction grip (μf ${b.slipFactor}, slip at ${b.slipAt})`}, ` +
      `threads ${b.threadsInShearPlanes ? "in" : "excluded from"} the shear planes, ${b.hole} holes Ø${len(holeDia)}`,
  );
  out.push(`Layout:   ${layoutText(scenario, joint)}; splice length ${len(joint.spliceLength_mm)}`);
  out.push("");

  const plates = new Table({ head: ["Plate", us ? "Width × t (in)" : "Width × t (mm)", "Steel", us ? "Fy / Fu (ksi)" : "fy / fu (MPa)", "Edges", "Share of T"], style: { head: [], border: [] } });
  const bare = (mm: number) => (us ? fx(toUnit(mm, "in", "length"), 3) : fx(mm));
  for (const p of joint.plates) {
    plates.push([p.label, `${bare(p.spec.width_mm)} × ${bare(p.spec.thickness_mm)}`, p.spec.grade, `${stress(p.fy_MPa)} / ${stress(p.fu_MPa)}`, p.spec.edges, p.role === "packing" ? "—" : fx(p.forceShare, 3)]);
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
  out.push(`Joint design strength:  ${force(report.jointStrength_N)}  (governed by ${governing ? `${governing.title}, ${governing.component}, ${citationText(governing.citation)}` : "—"})`);
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
