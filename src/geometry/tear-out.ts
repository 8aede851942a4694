/**
 * What each hole of a bolt group sees toward the plate end it bears on: its distance to that end, and
 * the distance to the nearest hole ahead of it within its own tear-out strip (|Δy| below the hole's
 * width across). Bearing rules of every code read end distances and pitches from these.
 */
import type { Hole, PlateConnection } from "../model/joint.js";

export interface TearOut {
  hole: Hole;
  /** Distance from the hole centre to the plate end the group bears toward, mm. */
  toEnd_mm: number;
  /** Distance to the nearest hole ahead (toward the end) in the hole's own strip; null when none. */
  toHoleAhead_mm: number | null;
}

/** Per hole of one group in one plate: distance to the end and to the nearest hole ahead in its strip. */
export function tearOutDistances(holes: readonly Hole[], connection: PlateConnection): TearOut[] {
  const u = (h: Hole) => connection.towardEnd * (connection.endX_mm - h.x_mm);
  return holes.map((h) => {
    const uh = u(h);
    let ahead = -Infinity;
    for (const k of holes) {
      if (k === h) continue;
      const uk = u(k);
      if (uk < uh - 1e-9 && Math.abs(k.y_mm - h.y_mm) < h.across_mm) ahead = Math.max(ahead, uk);
    }
    return { hole: h, toEnd_mm: uh, toHoleAhead_mm: ahead === -Infinity ? null : uh - ahead };
  });
}
