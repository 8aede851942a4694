/**
 * Bolt, nut and washer dimensions for bolt lengths and the bill of materials.
 * Sources beside each table. Lengths in mm.
 */

/** Coarse thread pitch P. ISO 261 / ISO 262 (coarse series). */
export const THREAD_PITCH_MM: Record<number, number> = { 12: 1.75, 16: 2, 18: 2.5, 20: 2.5, 22: 2.5, 24: 3, 27: 3, 30: 3.5, 36: 4 };

/**
 * Hexagon bolts (bearing type): nut height m (max) of ISO 4032 style 1 nuts (BS EN ISO 4032:2001 Tables 1
 * and 2, as reproduced at https://ns2.engineersedge.com/hardware/bs_en_iso_4032_hexagon_nuts__14571.htm and
 * https://www.trojansf.co.uk/standards/iso-4032), washer thickness h of ISO 7089 plain washers (as tabulated
 * at https://engineeringhardware.com/guide/standard/iso-7089-cad-svg-086-washer/; M22 and M27, not listed
 * there, from memory); thread length b (reference) of ISO 4014:
 * b = 2d + 6 (l ≤ 125), 2d + 12 (125 < l ≤ 200), 2d + 25 (l > 200) (the EN ISO 4014 table of b: M12
 * 30/36/49, M20 46/52/65, M24 54/60/73).
 */
export const HEX_NUT_HEIGHT_MM: Record<number, number> = { 12: 10.8, 16: 14.8, 18: 15.8, 20: 18, 22: 19.4, 24: 21.5, 27: 23.8, 30: 25.6, 36: 31 };
export const PLAIN_WASHER_MM: Record<number, number> = { 12: 2.5, 16: 3, 18: 3, 20: 3, 22: 3, 24: 4, 27: 4, 30: 4, 36: 5 };

export function iso4014ThreadLength_mm(d: number, length_mm: number): number {
  if (length_mm <= 125) return 2 * d + 6;
  if (length_mm <= 200) return 2 * d + 12;
  return 2 * d + 25;
}

/**
 * High-strength friction-grip bolts: nut thickness, washer thickness and thread length as tabulated for
 * IS 3757 bolts, IS 6623 nuts and IS 6649 washers in Indian design aids (thread length for l < 100 mm
 * and for l > 100 mm).
 */
export const HSFG_DIMENSIONS: Record<number, { nut_mm: number; washer_mm: number; threadShort_mm: number; threadLong_mm: number }> = {
  16: { nut_mm: 13, washer_mm: 4, threadShort_mm: 31, threadLong_mm: 38 },
  20: { nut_mm: 16, washer_mm: 4, threadShort_mm: 36, threadLong_mm: 43 },
  22: { nut_mm: 18, washer_mm: 4, threadShort_mm: 38, threadLong_mm: 45 },
  24: { nut_mm: 19, washer_mm: 4, threadShort_mm: 41, threadLong_mm: 48 },
  27: { nut_mm: 22, washer_mm: 5, threadShort_mm: 44, threadLong_mm: 51 },
  30: { nut_mm: 24, washer_mm: 5, threadShort_mm: 49, threadLong_mm: 56 },
  36: { nut_mm: 26, washer_mm: 5, threadShort_mm: 56, threadLong_mm: 63 },
};

/**
 * Preferred nominal lengths of ISO 4014 / ISO 4017 bolts: 5 mm steps to 70, 10 mm to 160, 20 mm to 300
 * (the R-series the standards list; common practice).
 */
export const PREFERRED_LENGTHS_MM: readonly number[] = [
  20, 25, 30, 35, 40, 45, 50, 55, 60, 65, 70, 80, 90, 100, 110, 120, 130, 140, 150, 160, 180, 200, 220, 240, 260, 280, 300,
];
