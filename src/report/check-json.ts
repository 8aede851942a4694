/**
 * The check report as a plain JSON-ready object (units in field names: kN, mm). Pure.
 */
import type { Joint } from "../model/joint.js";
import { boltWordsOf } from "../codes/words.js";
import type { CheckReport } from "../model/results.js";
import type { CheckableScenario } from "../model/scenario.js";
import { inchBoltSize, inchSizeText } from "../catalogue/bolts.js";
import { toUnit } from "../units/units.js";
import { citationText } from "./citation.js";
import { summarise, summaryJson, utilisationJson } from "./summary.js";

export { citationText };

export const CAUTION =
  "splicewright is an aid to design. Its results must be verified by a qualified engineer against the governing edition of the design code, its national annex and local regulations. Bolt installation, corrosion and fatigue are outside the checks unless stated.";

const round = (v: number, digits = 3): number | null => (Number.isFinite(v) ? Number(v.toFixed(digits)) : null);

/**
 * The JSON of a check. The SI fields (kN, mm) are always present; a scenario with `units: us` adds the
 * same figures in US customary units beside them (`_kip`, `_in` fields) and `units: "us"`.
 */
export function checkReportJson(scenario: CheckableScenario, joint: Joint, report: CheckReport) {
  const us = scenario.units === "us";
  const kip = (N: number) => round(toUnit(N, "kip", "force"), 2);
  const inch = (mm: number) => round(toUnit(mm, "in", "length"), 4);
  const inchSize = inchBoltSize(scenario.bolts.size_mm);
  const summary = summarise(scenario, report);
  return {
    units: us ? "us" : "si",
    scenario: scenario.name,
    ...(scenario.project !== undefined ? { project: scenario.project } : {}),
    code: report.code,
    codeTitle: report.codeTitle,
    spliceType: joint.spliceType,
    pattern: joint.patternText,
    bolt: {
      size: inchSize !== undefined ? inchSizeText(inchSize) : `M${scenario.bolts.size_mm}`,
      class: scenario.bolts.propertyClass,
      ...(scenario.bolts.astmGrade ? { astmGrade: scenario.bolts.astmGrade } : {}),
      assembly: scenario.bolts.assembly,
      boltType: boltWordsOf(scenario.code).boltType(scenario.bolts),
      threads: boltWordsOf(scenario.code).threads(scenario.bolts.threadsInShearPlanes),
      count: joint.holes.length,
    },
    spliceLength_mm: round(joint.spliceLength_mm, 4),
    ...(us ? { spliceLength_in: inch(joint.spliceLength_mm) } : {}),
    pass: report.pass,
    jointStrength_kN: round(report.jointStrength_N / 1000, 2),
    factoredTension_kN: round(scenario.load.factoredTension_N / 1000, 2),
    ...(scenario.load.factoredCompression_N !== undefined ? { factoredCompression_kN: round(scenario.load.factoredCompression_N / 1000, 2), senses: report.senses ?? [] } : {}),
    ...(us ? { jointStrength_kip: kip(report.jointStrength_N), factoredTension_kip: kip(scenario.load.factoredTension_N) } : {}),
    governing: report.governing,
    efficiency: round(report.efficiency, 4),
    efficiencyBasis: scenario.options.efficiencyBasis,
    efficiencyDefinition: report.efficiencyDefinition,
    ...utilisationJson(summary),
    detailing: summaryJson(summary).detailing,
    summary: summaryJson(summary),
    checks: report.checks.map((c) => ({
      id: c.id,
      kind: c.kind,
      title: c.title,
      component: c.component,
      ...(c.sense !== undefined ? { sense: c.sense } : {}),
      clause: citationText(c.citation),
      citation: c.citation,
      formula: c.formula,
      substituted: c.substituted,
      limitState: c.type === "strength" ? c.limitState : "rule",
      demand_kN: c.type === "strength" ? round(c.demand_N / 1000, 2) : null,
      resistance_kN: c.type === "strength" ? round(c.resistance_N / 1000, 2) : null,
      value_mm: c.type === "rule" ? round(c.value_mm, 2) : null,
      limit_mm: c.type === "rule" ? round(c.limit_mm, 2) : null,
      ...(us
        ? {
            demand_kip: c.type === "strength" ? kip(c.demand_N) : null,
            resistance_kip: c.type === "strength" ? kip(c.resistance_N) : null,
            value_in: c.type === "rule" ? inch(c.value_mm) : null,
            limit_in: c.type === "rule" ? inch(c.limit_mm) : null,
          }
        : {}),
      utilisation: round(c.utilisation, 4),
      pass: c.pass,
      notes: c.notes,
    })),
    warnings: report.warnings,
    conventions: report.conventions,
    // Coordinates to 0.0001 mm, so that an inch layout (1/16 in = 1.5875 mm) is given exactly.
    holes: joint.holes.map((h) => ({
      id: h.id,
      group: h.group,
      x_mm: round(h.x_mm, 4),
      y_mm: round(h.y_mm, 4),
      across_mm: round(h.across_mm, 4),
      along_mm: round(h.along_mm, 4),
      ...(us ? { x_in: inch(h.x_mm), y_in: inch(h.y_mm), across_in: inch(h.across_mm), along_in: inch(h.along_mm) } : {}),
    })),
    caution: CAUTION,
  };
}
