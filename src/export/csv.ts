/**
 * Hole schedule and bill of materials as CSV (RFC 4180 quoting). Pure.
 *
 * Hole schedule datum, per plate: x from the plate's left end as drawn in the plan (for a main plate
 * that continues, from its end inside the splice, measured into the plate), y from the plate's lower
 * edge as drawn. Every hole of a plate is listed, with its diameter (and slot length where slotted).
 */
import type { Joint, PlatePiece } from "../model/joint.js";
import { holesOfPlate } from "../geometry/joint-builder.js";
import type { BillOfMaterials } from "./bolt-list.js";
import { csvField, plainLine } from "../text/escape.js";

const row = (cells: Array<string | number>) => cells.map(csvField).join(",");
const mm = (v: number) => Number(v.toFixed(2));

/** The datum of a plate's hole schedule: its end inside the splice, and its lower edge. */
export function plateDatum(p: PlatePiece): { x_mm: number; sense: 1 | -1; text: string } {
  if (p.continues === "left") return { x_mm: p.x1_mm, sense: -1, text: "x from the plate's end in the splice (its right end as drawn), measured into the plate" };
  return { x_mm: p.x0_mm, sense: 1, text: "x from the plate's left end as drawn" };
}

export function holeScheduleCsv(joint: Joint, title: string): string {
  const lines: string[] = [
    `# splicewright hole schedule: ${plainLine(title)}`,
    "# datum per plate: x along the force from the plate end inside the splice (main plate A: its right end, measured leftward into the plate; every other plate: its left end as drawn), y across from the plate's lower edge as drawn; mm",
    row(["plate", "hole", "x_mm", "y_mm", "diameter_mm", "slot_length_mm", "datum"]),
  ];
  for (const p of joint.plates) {
    const datum = plateDatum(p);
    const holes = holesOfPlate(joint, p)
      .map((h) => ({ h, x: datum.sense * (h.x_mm - datum.x_mm), y: h.y_mm + p.spec.width_mm / 2 }))
      .sort((a, b) => a.x - b.x || a.y - b.y); // in drilling order along the plate
    for (const { h, x, y } of holes) {
      const slot = Math.abs(h.along_mm - h.across_mm) > 1e-9 ? mm(Math.max(h.along_mm, h.across_mm)) : "";
      lines.push(row([p.id, h.id, mm(x), mm(y), mm(Math.min(h.across_mm, h.along_mm)), slot, datum.text]));
    }
  }
  return lines.join("\n") + "\n";
}

export function billOfMaterialsCsv(bom: BillOfMaterials, title: string): string {
  const lines: string[] = [`# splicewright bill of materials: ${plainLine(title)}`, row(["kind", "item", "size", "class_or_grade", "length_mm", "thickness_mm", "width_mm", "quantity", "mass_kg", "standard"])];
  for (const b of bom.bolts) lines.push(row(["bolt", b.item, b.size, b.class, b.length_mm, "", "", b.quantity, "", b.standard]));
  for (const n of bom.nuts) lines.push(row(["nut", n.item, n.size, n.class, "", "", "", n.quantity, "", n.standard]));
  for (const w of bom.washers) lines.push(row(["washer", w.item, w.size, "", "", w.thickness_mm, "", w.quantity, "", w.standard]));
  for (const p of bom.plates) lines.push(row(["plate", p.item, "", p.grade, mm(p.length_mm), p.thickness_mm, p.width_mm, p.quantity, p.mass_kg, `${p.holes} holes Ø${p.holeDiameter_mm}`]));
  for (const n of bom.notes) lines.push(row(["note", n, "", "", "", "", "", "", "", ""]));
  return lines.join("\n") + "\n";
}
