/**
 * Bolt holes.
 * Standard clearance: IS 800:2007 cl. 10.2.1, Table 19 — +1 mm for d = 12–14, +2 mm for d = 16–24,
 *   +3 mm for d ≥ 27 (read in Table 19; the same clearances as EN 1090-2 Table 11).
 * Oversize and slotted holes, largest sizes allowed: IS 800:2007 cl. 17.2.4.3 — oversize ≤ min(1.25 d, d + 8);
 *   short slot: width of the standard hole, length ≤ 1.33 d; long slot: width of the standard hole,
 *   length ≤ 2.5 d. These largest sizes are used (conservative for net sections and end distances).
 */
import type { HoleType, SlotDirection } from "../../model/scenario.js";
import type { HoleDimensions } from "../../geometry/joint-builder.js";

/** Standard clearance hole diameter d0, IS 800:2007 Table 19. */
export function standardHoleDiameter_mm(d_mm: number): number {
  if (d_mm <= 14) return d_mm + 1;
  if (d_mm <= 24) return d_mm + 2;
  return d_mm + 3;
}

/** Hole dimensions across and along the force for each hole type (cl. 10.2.1, cl. 17.2.4.3). */
export function holeDimensions(d_mm: number, hole: HoleType, slot: SlotDirection | undefined): HoleDimensions {
  const standard = standardHoleDiameter_mm(d_mm);
  switch (hole) {
    case "standard":
      return { across_mm: standard, along_mm: standard };
    case "oversize": {
      const d0 = Math.min(1.25 * d_mm, d_mm + 8);
      return { across_mm: d0, along_mm: d0 };
    }
    case "short-slot":
    case "long-slot": {
      const length = Math.max(standard, (hole === "short-slot" ? 1.33 : 2.5) * d_mm);
      return slot === "across"
        ? { across_mm: length, along_mm: standard }
        : { across_mm: standard, along_mm: length };
    }
  }
}

/**
 * Hole factor Kh for slip resistance. IS 800:2007 cl. 10.4.3:
 * 1.0 clearance holes; 0.85 oversize, short slot, and long slot loaded perpendicular to the slot;
 * 0.7 long slot loaded parallel to the slot.
 */
export function holeFactorKh(hole: HoleType, slot: SlotDirection | undefined): number {
  if (hole === "standard") return 1.0;
  if (hole === "long-slot" && slot !== "across") return 0.7;
  return 0.85;
}

/**
 * Reduction of bearing resistance for the hole type. IS 800:2007 cl. 10.3.4: 0.7 for oversize and
 * short-slotted holes, 0.5 for long-slotted holes (from memory).
 */
export function bearingHoleFactor(hole: HoleType): number {
  if (hole === "oversize" || hole === "short-slot") return 0.7;
  if (hole === "long-slot") return 0.5;
  return 1.0;
}
