/**
 * The export as JSON: layout (plates and hole coordinates), every check, bolt lengths and the bill of
 * materials. The schema is schemas/export.schema.json. Pure.
 */
import type { Joint, PlatePiece } from "../model/joint.js";
import { plateDatum, plateHoles } from "./csv.js";
import type { CheckReport } from "../model/results.js";
import type { CheckableScenario } from "../model/scenario.js";
import { checkReportJson } from "../report/check-json.js";
import type { BillOfMaterials } from "./bolt-list.js";

export const EXPORT_SCHEMA_ID = "splicewright-export/1";

/** How each plate's `holes` are measured: the hole schedule's and the drawing's datum. */
export const PLATE_DATUM_TEXT =
  "each plate's holes: x from the plate's left end as drawn on the plan (increasing rightward), y from its lower edge as drawn (increasing upward), mm; datum = that corner in the joint coordinates; a plate that continues leftward (main plate A) is measured from the left end of its length within the splice";

/** To 0.0001 mm: no float noise, and an inch dimension (1/16 in = 1.5875 mm) given exactly. */
const r4 = (v: number) => Number(v.toFixed(4));

/**
 * Lengths without float noise (9.524999999999999 → 9.525): every number of a plain object rounded to
 * 1e-6 mm, far below any tolerance, so inch-derived sizes read as written. Non-finite numbers are kept.
 */
function denoised<T>(value: T): T {
  if (typeof value === "number") return (Number.isFinite(value) ? Number(value.toFixed(6)) : value) as T;
  if (Array.isArray(value)) return value.map(denoised) as T;
  if (value && typeof value === "object") return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, denoised(v)])) as T;
  return value;
}

/** A plate of the layout: its extent in the joint coordinates, and its holes in its own datum (the hole schedule's). */
function plateJson(joint: Joint, p: PlatePiece) {
  const d = plateDatum(p);
  return {
    id: p.id,
    role: p.role,
    label: p.label,
    width_mm: p.spec.width_mm,
    thickness_mm: p.spec.thickness_mm,
    grade: p.spec.grade,
    x0_mm: p.x0_mm,
    x1_mm: p.x1_mm,
    continues: p.continues,
    forceShare: p.forceShare,
    length_mm: r4(d.length_mm),
    datum: { x_mm: d.x_mm, y_mm: d.y_mm },
    holes: plateHoles(joint, p).map((h) => ({ id: h.id, x_from_left_end_mm: r4(h.x_mm), y_from_lower_edge_mm: r4(h.y_mm), diameter_mm: r4(h.diameter_mm), slotLength_mm: h.slotLength_mm === null ? null : r4(h.slotLength_mm), slotDirection: h.slotDirection })),
  };
}

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
      buttGap_mm: denoised(joint.buttGap_mm),
      plates: joint.plates.map((p) => denoised(plateJson(joint, p))),
      holes: check.holes,
      coordinates: "x along the force, y across from the plate axis, mm; lap: x = 0 at plate B's end; butt: x = 0 at the middle of the butt gap",
      plateDatum: PLATE_DATUM_TEXT,
    },
    result: { pass: check.pass, jointStrength_kN: check.jointStrength_kN, efficiency: check.efficiency, governing: check.governing, strengthUtilisation: check.strengthUtilisation, serviceUtilisation: check.serviceUtilisation, detailing: check.detailing },
    checks: check.checks,
    boltLengths: bom.lengths.map((l) => denoised({ ...l, length_mm: Number.isFinite(l.length_mm) ? l.length_mm : null, threadLength_mm: Number.isFinite(l.threadLength_mm) ? l.threadLength_mm : null })),
    billOfMaterials: denoised({ bolts: bom.bolts, nuts: bom.nuts, washers: bom.washers, plates: bom.plates, ok: bom.ok, notes: bom.notes }),
    warnings: check.warnings,
    caution: check.caution,
  };
}
