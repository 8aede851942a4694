/**
 * Plate steels. Yield strength falls with thickness; ultimate strength does not within a grade.
 */
import { ownEntry } from "./lookup.js";

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
  const steel = ownEntry(IS2062_GRADES, grade);
  if (!steel) throw new RangeError(`unknown IS 2062 grade "${grade}"`);
  // Band edges: t < 20 is the first band; 20..40 inclusive the second; above 40 the third.
  const band =
    t_mm < 20 ? steel.bands[0] : t_mm <= 40 ? steel.bands[1] : steel.bands[2];
  if (!band) throw new RangeError(`grade ${grade} has no band for t = ${t_mm} mm`);
  return { grade, fy_MPa: band.fy_MPa, fu_MPa: steel.fu_MPa, band: band.label, source: steel.source };
}

/** Where fy and fu of an EN 10025-2 plate come from (EN 1993-1-1, 3.2.1(1) allows either; the national annex may choose). */
export type En10025Convention = "en10025-2" | "en1993-1-1";
export const EN10025_CONVENTIONS: readonly En10025Convention[] = ["en10025-2", "en1993-1-1"];

export type En10025Grade = "S235" | "S275" | "S355";

interface EnBand {
  /** The band holds over_mm < t ≤ upTo_mm. */
  over_mm: number;
  upTo_mm: number;
  fy_MPa: number;
  fu_MPa: number;
}

/** Quality (impact-test) designations of each grade; they do not change fy or fu. EN 10025-2, Table 1 (from memory). */
const EN10025_QUALITIES: Record<En10025Grade, readonly string[]> = {
  S235: ["JR", "J0", "J2"],
  S275: ["JR", "J0", "J2"],
  S355: ["JR", "J0", "J2", "K2"],
};

/**
 * Non-alloy structural steels, EN 10025-2 (the product standard): minimum yield strength ReH by nominal
 * thickness (≤ 16, 16–40, 40–63, 63–80, 80–100 mm) and the lower limit of the tensile strength Rm for
 * 3 ≤ t ≤ 100 mm. S275 and S355 up to 40 mm and their Rm: read in the published table (see ../shared
 * check values); S235 and the bands beyond 40 mm: EN 10025-2, from memory.
 */
export const EN10025_2_GRADES: Record<En10025Grade, EnBand[]> = {
  S235: [
    { over_mm: 0, upTo_mm: 16, fy_MPa: 235, fu_MPa: 360 },
    { over_mm: 16, upTo_mm: 40, fy_MPa: 225, fu_MPa: 360 },
    { over_mm: 40, upTo_mm: 63, fy_MPa: 215, fu_MPa: 360 },
    { over_mm: 63, upTo_mm: 80, fy_MPa: 215, fu_MPa: 360 },
    { over_mm: 80, upTo_mm: 100, fy_MPa: 215, fu_MPa: 360 },
  ],
  S275: [
    { over_mm: 0, upTo_mm: 16, fy_MPa: 275, fu_MPa: 410 },
    { over_mm: 16, upTo_mm: 40, fy_MPa: 265, fu_MPa: 410 },
    { over_mm: 40, upTo_mm: 63, fy_MPa: 255, fu_MPa: 410 },
    { over_mm: 63, upTo_mm: 80, fy_MPa: 245, fu_MPa: 410 },
    { over_mm: 80, upTo_mm: 100, fy_MPa: 235, fu_MPa: 410 },
  ],
  S355: [
    { over_mm: 0, upTo_mm: 16, fy_MPa: 355, fu_MPa: 470 },
    { over_mm: 16, upTo_mm: 40, fy_MPa: 345, fu_MPa: 470 },
    { over_mm: 40, upTo_mm: 63, fy_MPa: 335, fu_MPa: 470 },
    { over_mm: 63, upTo_mm: 80, fy_MPa: 325, fu_MPa: 470 },
    { over_mm: 80, upTo_mm: 100, fy_MPa: 315, fu_MPa: 470 },
  ],
};

/** Rm of EN 10025-2 below 3 mm (the product standard tabulates thin products apart), MPa; from memory. */
const EN10025_2_FU_BELOW_3MM: Record<En10025Grade, number> = { S235: 360, S275: 430, S355: 510 };

/**
 * The simplified nominal values of EN 1993-1-1, Table 3.1 for the EN 10025-2 grades: t ≤ 40 mm and
 * 40 < t ≤ 80 mm. S275 and S355 for t ≤ 40 mm: read in the published table (see ../shared check values);
 * S235 and the 40–80 mm band: from memory.
 */
export const EN1993_1_1_TABLE_3_1: Record<En10025Grade, EnBand[]> = {
  S235: [
    { over_mm: 0, upTo_mm: 40, fy_MPa: 235, fu_MPa: 360 },
    { over_mm: 40, upTo_mm: 80, fy_MPa: 215, fu_MPa: 360 },
  ],
  S275: [
    { over_mm: 0, upTo_mm: 40, fy_MPa: 275, fu_MPa: 430 },
    { over_mm: 40, upTo_mm: 80, fy_MPa: 255, fu_MPa: 410 },
  ],
  S355: [
    { over_mm: 0, upTo_mm: 40, fy_MPa: 355, fu_MPa: 510 },
    { over_mm: 40, upTo_mm: 80, fy_MPa: 335, fu_MPa: 470 },
  ],
};

/** Thickness range each convention covers, mm (Table 3.1 stops at 80 mm). */
export const EN10025_THICKNESS_RANGE: Record<En10025Convention, { min_mm: number; max_mm: number }> = {
  "en10025-2": { min_mm: 0, max_mm: 100 },
  "en1993-1-1": { min_mm: 0, max_mm: 80 },
};

/** The grade of a name such as "S355" or "S355J2" (quality letters allowed, case-insensitive); undefined if unknown. */
export function en10025Grade(name: string): En10025Grade | undefined {
  const m = /^(S235|S275|S355)(JR|J0|J2|K2)?$/.exec(name.trim().toUpperCase());
  if (!m) return undefined;
  const grade = m[1] as En10025Grade;
  if (m[2] && !EN10025_QUALITIES[grade].includes(m[2])) return undefined;
  return grade;
}

/** Every designation `en10025Grade` accepts, for messages. */
export const EN10025_NAMES: readonly string[] = (Object.keys(EN10025_QUALITIES) as En10025Grade[]).flatMap((g) => [g, ...EN10025_QUALITIES[g].map((q) => g + q)]);

/**
 * fy and fu of an EN 10025-2 plate of thickness t under a convention: the product standard's values by
 * thickness, or EN 1993-1-1 Table 3.1.
 * @throws RangeError for an unknown grade or a thickness outside the convention's range.
 */
export function en10025Strength(name: string, t_mm: number, convention: En10025Convention): SteelStrength {
  const grade = en10025Grade(name);
  if (!grade) throw new RangeError(`unknown EN 10025-2 grade "${name}"`);
  const range = EN10025_THICKNESS_RANGE[convention];
  const bands = convention === "en10025-2" ? EN10025_2_GRADES[grade] : EN1993_1_1_TABLE_3_1[grade];
  const band = t_mm > range.min_mm ? bands.find((b) => t_mm > b.over_mm && t_mm <= b.upTo_mm) : undefined;
  if (!band) throw new RangeError(`t = ${t_mm} mm is outside ${range.min_mm}–${range.max_mm} mm for ${grade} under ${convention}`);
  const thin = convention === "en10025-2" && t_mm < 3;
  return {
    grade: name.trim().toUpperCase(),
    fy_MPa: band.fy_MPa,
    fu_MPa: thin ? EN10025_2_FU_BELOW_3MM[grade] : band.fu_MPa,
    band: thin ? "t < 3 mm" : band.over_mm === 0 ? `t ≤ ${band.upTo_mm} mm` : `${band.over_mm} < t ≤ ${band.upTo_mm} mm`,
    source: convention === "en10025-2" ? "EN 10025-2, ReH and Rm by thickness" : "EN 1993-1-1, Table 3.1",
  };
}

/**
 * ASTM plate steels used with AISC 360-16: specified minimum yield Fy and tensile strength Fu (ksi),
 * one value for every thickness the splices here use (A36 plates up to 8 in; A572 Grade 50 up to 4 in).
 * Source: AISC Steel Construction Manual, Table 2-5 (ASTM A36; ASTM A572 Grade 50) — common practice
 * values: A36 Fy 36 ksi, Fu 58 ksi; A572 Gr 50 Fy 50 ksi, Fu 65 ksi.
 */
export const ASTM_PLATE_GRADES: Record<string, { Fy_ksi: number; Fu_ksi: number; maxThickness_in: number; source: string }> = {
  A36: { Fy_ksi: 36, Fu_ksi: 58, maxThickness_in: 8, source: "ASTM A36 (AISC Manual Table 2-5)" },
  "A572-50": { Fy_ksi: 50, Fu_ksi: 65, maxThickness_in: 4, source: "ASTM A572 Grade 50 (AISC Manual Table 2-5)" },
};

/** Accepted spellings of the ASTM plate grades ("A572 Gr 50", "A572-50", "a36"). */
export function astmPlateGrade(name: string): string | undefined {
  const key = name.trim().toUpperCase().replace(/\s+/g, " ");
  if (key === "A36" || key === "ASTM A36") return "A36";
  if (/^(ASTM )?A572[- ]?(GR\.? ?|GRADE ?)?50$/.test(key)) return "A572-50";
  return undefined;
}
