/**
 * Hole schedule and bill of materials as CSV for a spreadsheet, and the CSV document form every CSV of
 * splicewright shares (the schedule and order list too). Pure. docs/csv.md lists the columns.
 *
 * Document form: UTF-8 with a byte-order mark (so a spreadsheet reads × and Ø as written), RFC 4180
 * quoting, CRLF line ends; the header on the first row; one row per item, every row as many cells as
 * the header; numbers in numeric columns only, rounded (mm to 0.01, inches to 0.0001, masses to 0.01);
 * after the data, note rows (scenario, datum, units, caution): "#" alone in the first cell, the note in
 * the second, empty cells after it — a parser's comment option ("#") drops them, a spreadsheet shows
 * them below the table.
 *
 * Hole schedule datum, the same for every plate and the same as the drawing's: x from the plate's left
 * end as drawn on the plan, increasing rightward; y from the plate's lower edge as drawn, increasing
 * upward. Main plate A continues leftward beyond the splice: its left end as drawn is the left end of
 * its length within the splice (plate_length), and its own end, in the splice, lies at x = plate_length.
 * So that every hole is also measured from a real plate end, `marking_end` names the end the shop marks
 * from (main plate A: its right end, in the splice; every other plate: its left end) and
 * `x_from_marking_end` the hole's distance from it.
 */
import type { Joint, PlatePiece } from "../model/joint.js";
import { holesOfPlate } from "../geometry/joint-builder.js";
import type { BillOfMaterials } from "./bolt-list.js";
import { csvField, plainLine } from "../text/escape.js";
import { lengthValue, massValue, unitSuffix, usDimensionText, type DisplayUnits } from "../report/format.js";
import { CAUTION } from "../report/check-json.js";
import { STEEL_DENSITY_KG_PER_MM3 } from "../catalogue/costs.js";

/** The byte-order mark that tells a spreadsheet the file is UTF-8. */
export const UTF8_BOM = "\ufeff";

export type CsvCell = string | number | null;

/**
 * A text cell a spreadsheet will not run as a formula: one that begins with =, +, -, @, a tab or a
 * carriage return gets a leading apostrophe (OWASP "CSV injection" advice; common practice). Numbers
 * are written as numbers and never altered.
 */
function inert(text: string): string {
  return /^[=+\-@\t\r]/.test(text) ? `'${text}` : text;
}

/**
 * A CSV document: BOM, header, data rows, then one note row per note ("#", the note on one line).
 * Every row is padded or checked to the header's width.
 */
export function csvDocument(header: readonly string[], rows: readonly CsvCell[][], notes: readonly string[]): string {
  const width = header.length;
  const line = (cells: readonly CsvCell[]) => {
    if (cells.length > width) throw new Error(`CSV row of ${cells.length} cells under a header of ${width}`);
    return [...cells, ...Array<CsvCell>(width - cells.length).fill(null)].map((c) => csvField(c === null ? "" : typeof c === "string" ? inert(c) : c)).join(",");
  };
  const lines = [line(header), ...rows.map(line), ...notes.map((n) => line(["#", plainLine(n)]))];
  return UTF8_BOM + lines.join("\r\n") + "\r\n";
}

/**
 * The datum of a plate's hole schedule, in the joint's coordinates: its left end as drawn (x_mm) and its
 * lower edge (y_mm), and the plate's length from that end; every plate is measured rightward.
 */
export function plateDatum(p: PlatePiece): { x_mm: number; y_mm: number; length_mm: number } {
  return { x_mm: p.x0_mm, y_mm: -p.spec.width_mm / 2, length_mm: p.x1_mm - p.x0_mm };
}

/** Every hole of a plate in the plate's datum, in drilling order (along the plate, then up). */
export function plateHoles(joint: Joint, p: PlatePiece) {
  const d = plateDatum(p);
  return holesOfPlate(joint, p)
    .map((h) => {
      const slotted = Math.abs(h.along_mm - h.across_mm) > 1e-9;
      return {
        id: h.id,
        group: h.group,
        x_mm: h.x_mm - d.x_mm,
        y_mm: h.y_mm - d.y_mm,
        diameter_mm: Math.min(h.across_mm, h.along_mm),
        slotLength_mm: slotted ? Math.max(h.along_mm, h.across_mm) : null,
        /** The slot's long axis: along the force (x) or across it (y); null for a round hole. */
        slotDirection: slotted ? (h.along_mm > h.across_mm ? ("along" as const) : ("across" as const)) : null,
      };
    })
    .sort((a, b) => a.x_mm - b.x_mm || a.y_mm - b.y_mm);
}

const LENGTHS_NOTE: Record<DisplayUnits, string> = { si: "units: lengths in mm", us: "units: lengths in decimal inches" };
const UNITS_NOTE: Record<DisplayUnits, string> = {
  si: "units: lengths in mm, masses in kg",
  us: "units: lengths in decimal inches, masses in lb",
};

export function holeScheduleCsv(joint: Joint, title: string, units: DisplayUnits = "si"): string {
  const u = unitSuffix("length", units);
  const len = (v: number) => lengthValue(v, units);
  const header = ["plate", "plate_name", "hole", `x_from_left_end_${u}`, `y_from_lower_edge_${u}`, `hole_diameter_${u}`, `slot_length_${u}`, "slot_direction", `plate_length_${u}`, `plate_width_${u}`, "marking_end", `x_from_marking_end_${u}`];
  const rows: CsvCell[][] = [];
  for (const p of joint.plates) {
    const d = plateDatum(p);
    const fromRight = p.continues === "left";
    for (const h of plateHoles(joint, p)) {
      const fromMarkingEnd_mm = fromRight ? d.length_mm - h.x_mm : h.x_mm;
      rows.push([p.id, p.label, h.id, len(h.x_mm), len(h.y_mm), len(h.diameter_mm), h.slotLength_mm === null ? null : len(h.slotLength_mm), h.slotDirection === null ? null : `${h.slotDirection} the force`, len(d.length_mm), len(p.spec.width_mm), fromRight ? "right" : "left", len(fromMarkingEnd_mm)]);
    }
  }
  const continuing = joint.plates.filter((p) => p.continues === "left").map((p) => `${p.label} continues leftward beyond the splice: its left end as drawn is the left end of its length within the splice, its own end lies at x = plate_length; mark its holes from that end (marking_end right, x_from_marking_end = plate_length − x)`);
  return csvDocument(header, rows, [
    `hole schedule: ${title}`,
    "datum, every plate: x from the plate's left end as drawn on the plan (increasing rightward), y from the plate's lower edge as drawn (increasing upward)",
    ...continuing,
    LENGTHS_NOTE[units],
    `caution: ${CAUTION}`,
  ]);
}

/** A plate as a bill of materials lists it: PL thickness × width × length (US: `PL 3/8" × 8" × 1'-0 3/8"`). */
export function plateSizeText(p: { thickness_mm: number; width_mm: number; length_mm: number }, units: DisplayUnits = "si"): string {
  const t = (v: number) => (units === "us" ? usDimensionText(v) : String(lengthValue(v, "si")));
  return `PL ${t(p.thickness_mm)} × ${t(p.width_mm)} × ${t(p.length_mm)}`;
}

export function billOfMaterialsCsv(bom: BillOfMaterials, title: string, units: DisplayUnits = "si"): string {
  const u = unitSuffix("length", units);
  const m = unitSuffix("mass", units);
  const len = (v: number) => lengthValue(v, units);
  const header = ["kind", "item", "size", "class_or_grade", `length_${u}`, `width_${u}`, `thickness_${u}`, "quantity", `mass_${m}`, "holes", `hole_diameter_${u}`, "standard"];
  const rows: CsvCell[][] = [];
  for (const b of bom.bolts) rows.push(["bolt", b.item, b.size, b.class, Number.isFinite(b.length_mm) ? len(b.length_mm) : null, null, null, b.quantity, null, null, null, b.standard]);
  for (const n of bom.nuts) rows.push(["nut", n.item, n.size, n.class, null, null, null, n.quantity, null, null, null, n.standard]);
  for (const w of bom.washers) rows.push(["washer", w.item, w.size, null, null, null, len(w.thickness_mm), w.quantity, null, null, null, w.standard]);
  for (const p of bom.plates) rows.push([p.id === "packing" ? "packing" : "plate", p.item, plateSizeText(p, units), p.grade, len(p.length_mm), len(p.width_mm), len(p.thickness_mm), p.quantity, massValue(p.length_mm * p.width_mm * p.thickness_mm * STEEL_DENSITY_KG_PER_MM3, units), p.holes, len(p.holeDiameter_mm), p.standard || null]);
  return csvDocument(header, rows, [
    `bill of materials: ${title}`,
    ...bom.notes,
    `the main plates are the members being spliced and are not listed; plate masses at ${units === "us" ? "0.2836 lb/in³ (490 lb/ft³)" : "7850 kg/m³"}`,
    UNITS_NOTE[units],
    `caution: ${CAUTION}`,
  ]);
}
