/**
 * What each hole of a bolt group sees toward the plate end it bears on: its distance to that end, and
 * the distance to the nearest hole ahead of it within its own tear-out strip (|Δy| below the hole's
 * width across). Bearing rules of every code read end distances and pitches from these.
 */
import type { Hole, PlateConnection } from "../model/joint.js";

/**
 * Per hole of one group in one plate, in the group's order: the distance from its centre to the plate
 * end the group bears toward, and to the nearest hole ahead (toward the end) in its own strip (null
 * when none), handed to `visit` without building a list (the bearing rules of a search read them for
 * every candidate).
 */
export function forEachTearOut(holes: readonly Hole[], connection: PlateConnection, visit: (hole: Hole, toEnd_mm: number, toHoleAhead_mm: number | null) => void): void {
  for (const h of holes) {
    // Measured from the hole itself, so that an end at infinity (a plate that continues) still sees the holes ahead.
    let ahead = Infinity;
    for (const k of holes) {
      if (k === h) continue;
      const dk = connection.towardEnd * (k.x_mm - h.x_mm);
      if (dk > 1e-9 && Math.abs(k.y_mm - h.y_mm) < h.across_mm) ahead = Math.min(ahead, dk);
    }
    visit(h, connection.towardEnd * (connection.endX_mm - h.x_mm), ahead === Infinity ? null : ahead);
  }
}
