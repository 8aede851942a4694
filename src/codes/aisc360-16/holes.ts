/**
 * Bolt holes of AISC 360-16 Table J3.3 (inch) and J3.3M (metric): standard, oversized, short-slotted
 * and long-slotted nominal dimensions (width × length). Standard values as in ../shared check values
 * (J3.3M). Inch standard holes d + 1/16, d ≥ 1 in: d + 1/8 for 360-16 as summarised in the
 * wcfrobert.github.io "Primer: AISC 360-16 Chapter J Connection Design" (2023); every inch and metric
 * size here is also printed in AISC 360-22 Tables J3.3 / J3.3M (the 1 in short-slot length not read).
 * The 360-16 oversize and slot sizes themselves from memory.
 */
import { inchBoltSize } from "../../catalogue/bolts.js";
import type { HoleDimensions } from "../../geometry/joint-builder.js";
import type { HoleType, SlotDirection } from "../../model/scenario.js";
import { MM_PER_IN } from "./factors.js";

/** Nominal hole dimensions [width, length] in inches for an inch bolt, Table J3.3. */
export function holeJ33_in(d_in: number, hole: HoleType): [number, number] {
  const small = d_in <= 0.875 + 1e-9;
  const std = small ? d_in + 1 / 16 : d_in + 1 / 8;
  switch (hole) {
    case "standard":
      return [std, std];
    case "oversize": {
      const table: Record<string, number> = { "0.5": 5 / 8, "0.625": 13 / 16, "0.75": 15 / 16, "0.875": 17 / 16, "1": 1.25 };
      const o = table[String(d_in)] ?? d_in + 5 / 16;
      return [o, o];
    }
    case "short-slot": {
      const table: Record<string, number> = { "0.5": 11 / 16, "0.625": 7 / 8, "0.75": 1, "0.875": 1 + 1 / 8, "1": 1 + 5 / 16 };
      return [std, table[String(d_in)] ?? d_in + 3 / 8];
    }
    case "long-slot": {
      const table: Record<string, number> = { "0.5": 1.25, "0.625": 1 + 9 / 16, "0.75": 1 + 7 / 8, "0.875": 2 + 3 / 16, "1": 2.5 };
      return [std, table[String(d_in)] ?? 2.5 * d_in];
    }
  }
}

/** Nominal hole dimensions [width, length] in mm for a metric bolt, Table J3.3M. */
export function holeJ33M_mm(d_mm: number, hole: HoleType): [number, number] {
  const std: Record<number, number> = { 16: 18, 20: 22, 22: 24, 24: 27, 27: 30, 30: 33 };
  const over: Record<number, number> = { 16: 20, 20: 24, 22: 28, 24: 30, 27: 35, 30: 38 };
  const short: Record<number, number> = { 16: 22, 20: 26, 22: 30, 24: 32, 27: 37, 30: 40 };
  const long: Record<number, number> = { 16: 40, 20: 50, 22: 55, 24: 60, 27: 67, 30: 75 };
  const s = std[d_mm] ?? d_mm + 3;
  switch (hole) {
    case "standard":
      return [s, s];
    case "oversize": {
      const o = over[d_mm] ?? d_mm + 8;
      return [o, o];
    }
    case "short-slot":
      return [s, short[d_mm] ?? d_mm + 10];
    case "long-slot":
      return [s, long[d_mm] ?? 2.5 * d_mm];
  }
}

/** Hole dimensions across and along the force, mm (Table J3.3 for inch bolts, J3.3M for metric). */
export function holeDimensions(d_mm: number, hole: HoleType, slot: SlotDirection | undefined): HoleDimensions {
  const inch = inchBoltSize(d_mm);
  const [width, length] = inch !== undefined ? holeJ33_in(inch, hole) : holeJ33M_mm(d_mm, hole);
  const toMm = inch !== undefined ? MM_PER_IN : 1;
  // Inch sizes converted exactly; metric sizes as printed (× 1 changes no figure).
  return slot === "across" ? { across_mm: length * toMm, along_mm: width * toMm } : { across_mm: width * toMm, along_mm: length * toMm };
}

/**
 * Width of a hole taken in net areas: the nominal dimension plus 1/16 in (2 mm for metric bolts).
 * AISC 360-16 B4.3b.
 */
export function netAllowance_mm(d_mm: number): number {
  return inchBoltSize(d_mm) !== undefined ? MM_PER_IN / 16 : 2;
}
