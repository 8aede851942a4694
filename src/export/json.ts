/**
 * The export as JSON: layout (plates and hole coordinates), every check, bolt lengths and the bill of
 * materials. The schema is schemas/export.schema.json. Pure.
 */
import type { Joint } from "../model/joint.js";
import type { CheckReport } from "../model/results.js";
import type { CheckableScenario } from "../model/scenario.js";
import { checkReportJson } from "../report/check-json.js";
import type { BillOfMaterials } from "./bolt-list.js";

export const EXPORT_SCHEMA_ID = "splicewright-export/1";

export function exportJson(scenario: CheckableScenario, joint: Joint, report: CheckReport, bom: BillOfMaterials, date: string) {
  const check = checkReportJson(scenario, joint, report);
  return {
    schema: EXPORT_SCHEMA_ID,
    date,
    units: { length: "mm", force: "kN", stress: "MPa", mass: "kg" },
    scenario: scenario.name,
    code: report.code,
    layout: {
      spliceType: joint.spliceType,
      pattern: joint.patternText,
      spliceLength_mm: joint.spliceLength_mm,
      buttGap_mm: joint.buttGap_mm,
      plates: joint.plates.map((p) => ({ id: p.id, role: p.role, label: p.label, width_mm: p.spec.width_mm, thickness_mm: p.spec.thickness_mm, grade: p.spec.grade, x0_mm: p.x0_mm, x1_mm: p.x1_mm, continues: p.continues, forceShare: p.forceShare })),
      holes: check.holes,
      coordinates: "x along the force, y across from the plate axis, mm; lap: x = 0 at plate B's end; butt: x = 0 at the middle of the butt gap",
    },
    result: { pass: check.pass, jointStrength_kN: check.jointStrength_kN, efficiency: check.efficiency, governing: check.governing, strengthUtilisation: check.strengthUtilisation, serviceUtilisation: check.serviceUtilisation, detailing: check.detailing },
    checks: check.checks,
    boltLengths: bom.lengths.map((l) => ({ ...l, length_mm: Number.isFinite(l.length_mm) ? l.length_mm : null, threadLength_mm: Number.isFinite(l.threadLength_mm) ? l.threadLength_mm : null })),
    billOfMaterials: { bolts: bom.bolts, nuts: bom.nuts, washers: bom.washers, plates: bom.plates, ok: bom.ok, notes: bom.notes },
    warnings: check.warnings,
    caution: check.caution,
  };
}
