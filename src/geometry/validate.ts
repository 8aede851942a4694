/**
 * Geometry that cannot be built: holes outside a plate, holes that overlap, a bolt group that does not fit.
 * These are input errors (exit 2), not failed checks.
 */
import type { Joint } from "../model/joint.js";
import { distance } from "./lines.js";

export interface GeometryError {
  path: string;
  message: string;
}

export function geometryErrors(joint: Joint): GeometryError[] {
  const errors: GeometryError[] = [];
  for (const plate of joint.plates) {
    if (plate.role === "packing") continue;
    const half = plate.spec.width_mm / 2;
    const groups = new Set(plate.connections.map((c) => c.group));
    for (const h of joint.holes) {
      if (!groups.has(h.group)) continue;
      if (Math.abs(h.y_mm) + h.across_mm / 2 > half + 1e-9) {
        errors.push({ path: "layout", message: `hole ${h.id} at y = ${h.y_mm} mm (Ø${h.across_mm}) falls outside the ${plate.spec.width_mm} mm wide ${plate.label}` });
        return errors;
      }
      for (const c of plate.connections) {
        if (c.group !== h.group) continue;
        const u = c.towardEnd * (c.endX_mm - h.x_mm);
        if (u - h.along_mm / 2 <= 1e-9) {
          errors.push({ path: "layout", message: `hole ${h.id} at x = ${h.x_mm} mm cuts through the end of the ${plate.label}` });
          return errors;
        }
      }
    }
  }
  for (let i = 0; i < joint.holes.length; i++) {
    for (let j = i + 1; j < joint.holes.length; j++) {
      const a = joint.holes[i]!;
      const b = joint.holes[j]!;
      if (a.group !== b.group) continue;
      if (distance(a, b) < Math.max(a.across_mm, b.across_mm) - 1e-9) {
        errors.push({ path: "layout", message: `holes ${a.id} and ${b.id} overlap (centres ${distance(a, b).toFixed(1)} mm apart, hole Ø${a.across_mm} mm)` });
        return errors;
      }
    }
  }
  return errors;
}
