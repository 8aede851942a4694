/**
 * Bolt holes under EN 1993-1-8: nominal clearances of EN 1090-2, Table 11 (the execution standard
 * EN 1993-1-8 refers to in 1.2.7, Reference Standards Group 7), and the factors the hole type sets on
 * bearing (Table 3.4 notes) and slip (Table 3.6).
 *
 * EN 1090-2 Table 11, nominal clearance, mm:
 *   normal round holes  +1 for M12–M14, +2 for M16–M24, +3 for M27 and above (read in the table; see ../shared
 *                       check values); M12 and M14 may take 2 mm under EN 1993-1-8, 3.6.1(5)
 *   oversize round      +3 for M12–M14, +4 for M16–M22, +6 for M24, +8 for M27 and above
 *   short slots         length +4 for M12–M14, +6 for M16–M22, +8 for M24, +10 for M27 and above; width as a
 *                       normal hole
 *   long slots          length + 1.5 d; width as a normal hole
 * Oversize and slot rows: EN 1090-2 Table 11 as reproduced in a fabricator's holing procedure
 * (edition not stated there; its footnotes on d < 12 and d > 36 mm suggest the 2018 one); the M14 column
 * read with an EN 1993-1-8 bolt data sheet (M14 oversize 17, short slot 18 mm).
 */
import type { HoleDimensions } from "../../geometry/joint-builder.js";
import type { HoleType, SlotDirection } from "../../model/scenario.js";

/** Nominal clearance of a normal round hole, mm. EN 1090-2, Table 11 (with EN 1993-1-8, 3.6.1(5) for M12/M14). */
export function normalClearance_mm(d_mm: number, smallBoltClearance_mm: 1 | 2): number {
  if (d_mm <= 14) return smallBoltClearance_mm;
  if (d_mm <= 24) return 2;
  return 3;
}

/** Clearance of an oversize round hole, mm. EN 1090-2, Table 11 (source in the header). */
export function oversizeClearance_mm(d_mm: number): number {
  if (d_mm <= 14) return 3;
  if (d_mm <= 22) return 4;
  if (d_mm <= 24) return 6;
  return 8;
}

/** Clearance along the length of a short slot, mm. EN 1090-2, Table 11 (source in the header). */
export function shortSlotClearance_mm(d_mm: number): number {
  if (d_mm <= 14) return 4;
  if (d_mm <= 22) return 6;
  if (d_mm <= 24) return 8;
  return 10;
}

/**
 * Hole dimensions across and along the force for each hole type, mm.
 * EN 1090-2, Table 11. Slots are as wide as a normal hole; their length lies along `slot`.
 */
export function holeDimensions(d_mm: number, hole: HoleType, slot: SlotDirection | undefined, smallBoltClearance_mm: 1 | 2): HoleDimensions {
  const normal = d_mm + normalClearance_mm(d_mm, smallBoltClearance_mm);
  switch (hole) {
    case "standard":
      return { across_mm: normal, along_mm: normal };
    case "oversize": {
      const d0 = d_mm + oversizeClearance_mm(d_mm);
      return { across_mm: d0, along_mm: d0 };
    }
    case "short-slot":
    case "long-slot": {
      const length = d_mm + (hole === "short-slot" ? shortSlotClearance_mm(d_mm) : 1.5 * d_mm);
      return slot === "along" ? { across_mm: normal, along_mm: length } : { across_mm: length, along_mm: normal };
    }
  }
}

/**
 * Factor on the bearing resistance for the hole type.
 * EN 1993-1-8, Table 3.4, note 1: 0.8 in oversize holes; 0.6 in slotted holes whose long axis lies across
 * the force. Slots along the force have no bearing resistance in Table 3.4 (refused by scopeErrors).
 * @throws RangeError for a slot along the force.
 */
export function bearingHoleFactor(hole: HoleType, slot: SlotDirection | undefined): number {
  if (hole === "standard") return 1.0;
  if (hole === "oversize") return 0.8;
  if (slot === "across") return 0.6;
  throw new RangeError("EN 1993-1-8 Table 3.4 gives no bearing resistance for slots along the force");
}

/**
 * Hole factor ks of the slip resistance.
 * EN 1993-1-8, 3.9.1, Table 3.6: 1.0 normal holes; 0.85 oversize holes and short slots across the force;
 * 0.7 long slots across the force; 0.76 short slots along the force; 0.63 long slots along the force.
 */
export function ks(hole: HoleType, slot: SlotDirection | undefined): number {
  switch (hole) {
    case "standard":
      return 1.0;
    case "oversize":
      return 0.85;
    case "short-slot":
      return slot === "along" ? 0.76 : 0.85;
    case "long-slot":
      return slot === "along" ? 0.63 : 0.7;
  }
}

/** The hole's own diameter d0: the round hole's diameter or the slot's width, mm. */
export function holeWidth(h: { across_mm: number; along_mm: number }): number {
  return Math.min(h.across_mm, h.along_mm);
}
