/**
 * Plate steels. Yield strength falls with thickness; ultimate strength does not within a grade.
 */

export interface SteelStrength {
  grade: string;
  fy_MPa: number;
  fu_MPa: number;
  /** The thickness band the yield strength came from, e.g. "t < 20 mm". */
  band: string;
  source: string;
}

interface ThicknessBand {
  /** Upper bound of the band, mm; the band holds t < upTo_mm (or t ≤ for the last band, see below). */
  upTo_mm: number;
  fy_MPa: number;
  label: string;
}

interface SteelGrade {
  fu_MPa: number;
  bands: ThicknessBand[];
  source: string;
}

/**
 * IS 2062 (hot-rolled structural steel) grades used with IS 800:2007.
 * IS 2062 Table 2: yield stress for t < 20 mm, 20–40 mm, > 40 mm.
 * E250 values: IS 2062 (read in the table; see ../shared check values). E350 values: IS 2062 Table 2, from memory.
 */
export const IS2062_GRADES: Record<string, SteelGrade> = {
  E250: {
    fu_MPa: 410,
    bands: [
      { upTo_mm: 20, fy_MPa: 250, label: "t < 20 mm" },
      { upTo_mm: 40, fy_MPa: 240, label: "20 ≤ t ≤ 40 mm" },
      { upTo_mm: Infinity, fy_MPa: 230, label: "t > 40 mm" },
    ],
    source: "IS 2062, Table 2",
  },
  E350: {
    fu_MPa: 490,
    bands: [
      { upTo_mm: 20, fy_MPa: 350, label: "t < 20 mm" },
      { upTo_mm: 40, fy_MPa: 330, label: "20 ≤ t ≤ 40 mm" },
      { upTo_mm: Infinity, fy_MPa: 320, label: "t > 40 mm" },
    ],
    source: "IS 2062, Table 2 (from memory)",
  },
};

/**
 * fy and fu of an IS 2062 plate of thickness t.
 * IS 2062 Table 2 bands: t < 20, 20 ≤ t ≤ 40, t > 40 mm.
 * @throws RangeError for an unknown grade.
 */
export function is2062Strength(grade: string, t_mm: number): SteelStrength {
  const steel = IS2062_GRADES[grade];
  if (!steel) throw new RangeError(`unknown IS 2062 grade "${grade}"`);
  // Band edges: t < 20 is the first band; 20..40 inclusive the second; above 40 the third.
  const band =
    t_mm < 20 ? steel.bands[0] : t_mm <= 40 ? steel.bands[1] : steel.bands[2];
  if (!band) throw new RangeError(`grade ${grade} has no band for t = ${t_mm} mm`);
  return { grade, fy_MPa: band.fy_MPa, fu_MPa: steel.fu_MPa, band: band.label, source: steel.source };
}
