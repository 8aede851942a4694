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

/** An IS 2062 grade: fu, and fy in the bands of Table 2 (t < 20, 20 ≤ t ≤ 40, t > 40 mm). */
function is2062Grade(fu_MPa: number, fy_MPa: [number, number, number], source: string): SteelGrade {
  return {
    fu_MPa,
    bands: [
      { upTo_mm: 20, fy_MPa: fy_MPa[0], label: "t < 20 mm" },
      { upTo_mm: 40, fy_MPa: fy_MPa[1], label: "20 ≤ t ≤ 40 mm" },
      { upTo_mm: Infinity, fy_MPa: fy_MPa[2], label: "t > 40 mm" },
    ],
    source,
  };
}

/**
 * IS 2062 (hot-rolled structural steel) grades used with IS 800:2007.
 * IS 2062 Table 2: yield stress for t < 20 mm, 20–40 mm, > 40 mm.
 * E250 values: IS 2062 (read in the table; see ../shared check values). E275, E300, E350, E410, E450: fu and
 * fy for t < 20 mm as IS 2062:2011 lists them at https://infralens.in/handbook/structural-steel-grades; fy for
 * 20–40 mm of E300–E450 as IS 800:2007 Table 1 is reproduced at https://infralens.in/code/IS-800-2007/clause/table-1;
 * E275 from 20 mm and every t > 40 mm value other than E250's: from memory (E450: the E450A tensile strength,
 * 570 MPa, the lower of its two qualities).
 */
export const IS2062_GRADES: Record<string, SteelGrade> = {
  E250: is2062Grade(410, [250, 240, 230], "IS 2062, Table 2"),
  E275: is2062Grade(430, [275, 265, 255], "IS 2062:2011, Table 2; t ≥ 20 mm from memory"),
  E300: is2062Grade(440, [300, 290, 280], "IS 2062:2011, Table 2; t > 40 mm from memory"),
  E350: is2062Grade(490, [350, 330, 320], "IS 2062:2011, Table 2; t > 40 mm from memory"),
  E410: is2062Grade(540, [410, 390, 380], "IS 2062:2011, Table 2; t > 40 mm from memory"),
  E450: is2062Grade(570, [450, 430, 420], "IS 2062:2011, Table 2; t > 40 mm from memory"),
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

/**
 * EN 10025 grades the catalogue holds: the non-alloy steels of EN 10025-2 and the S460 fine-grain and
 * quenched steels of EN 10025-3 (N, NL), EN 10025-4 (M, ML) and EN 10025-6 (Q, QL, QL1). A plain "S460"
 * (no delivery condition) takes the lesser of the N and M values in every band.
 */
export type En10025Grade = "S235" | "S275" | "S355" | "S460N" | "S460M" | "S460Q" | "S460";

interface EnBand {
  /** The band holds over_mm < t ≤ upTo_mm. */
  over_mm: number;
  upTo_mm: number;
  fy_MPa: number;
  fu_MPa: number;
}

/**
 * Designations accepted for each grade; quality (impact-test) letters do not change fy or fu.
 * EN 10025-2: JR/J0/J2 for S235 and S275, JR/J0/J2/K2 for S355 (BS EN 10025-2:2004 Table 7 as reproduced
 * at https://readle.co.uk/references/steel-grades-eurocodes.php); EN 10025-3, -4, -6 from memory.
 */
const EN10025_DESIGNATIONS: Record<En10025Grade, readonly string[]> = {
  S235: ["S235", "S235JR", "S235J0", "S235J2"],
  S275: ["S275", "S275JR", "S275J0", "S275J2"],
  S355: ["S355", "S355JR", "S355J0", "S355J2", "S355K2"],
  S460N: ["S460N", "S460NL"],
  S460M: ["S460M", "S460ML"],
  S460Q: ["S460Q", "S460QL", "S460QL1"],
  S460: ["S460"],
};

/** The product standard of each grade, printed with its strengths. */
const PRODUCT_STANDARD: Record<En10025Grade, string> = {
  S235: "EN 10025-2",
  S275: "EN 10025-2",
  S355: "EN 10025-2",
  S460N: "EN 10025-3",
  S460M: "EN 10025-4",
  S460Q: "EN 10025-6",
  S460: "EN 10025-3/-4 (lesser of N and M)",
};

const bands = (rows: Array<[number, number, number, number]>): EnBand[] => rows.map(([over_mm, upTo_mm, fy_MPa, fu_MPa]) => ({ over_mm, upTo_mm, fy_MPa, fu_MPa }));

/**
 * The product standards' values: minimum yield strength ReH by nominal thickness and the lower limit of
 * the tensile strength Rm (3 ≤ t ≤ 100 mm). S235, S275 and S355, every band and their Rm: BS EN 10025-2:2004
 * Table 7 as reproduced at https://readle.co.uk/references/steel-grades-eurocodes.php (S275 and S355 to 40 mm
 * also in ../shared check values). Every S460 value: from memory (EN 10025-3 S460N Rm 540 throughout;
 * EN 10025-4 S460M Rm 540/530/510/500; EN 10025-6 S460Q ReH 460 to 50 mm, 440 to 100 mm, Rm 550).
 */
export const EN10025_2_GRADES: Record<En10025Grade, EnBand[]> = {
  S235: bands([[0, 16, 235, 360], [16, 40, 225, 360], [40, 63, 215, 360], [63, 80, 215, 360], [80, 100, 215, 360]]),
  S275: bands([[0, 16, 275, 410], [16, 40, 265, 410], [40, 63, 255, 410], [63, 80, 245, 410], [80, 100, 235, 410]]),
  S355: bands([[0, 16, 355, 470], [16, 40, 345, 470], [40, 63, 335, 470], [63, 80, 325, 470], [80, 100, 315, 470]]),
  S460N: bands([[0, 16, 460, 540], [16, 40, 440, 540], [40, 63, 430, 540], [63, 80, 410, 540], [80, 100, 400, 540]]),
  S460M: bands([[0, 16, 460, 540], [16, 40, 440, 540], [40, 63, 430, 530], [63, 80, 410, 510], [80, 100, 400, 500]]),
  S460Q: bands([[0, 50, 460, 550], [50, 100, 440, 550]]),
  S460: bands([[0, 16, 460, 540], [16, 40, 440, 540], [40, 63, 430, 530], [63, 80, 410, 510], [80, 100, 400, 500]]),
};

/**
 * Rm below 3 mm (the product standard tabulates thin products apart), MPa: the lower limits of 360–510,
 * 430–580 and 510–680 in BS EN 10025-2:2004 Table 7 (readle.co.uk reproduction, as above). S460 products
 * start at 3 mm (from memory).
 */
const EN10025_2_FU_BELOW_3MM: Partial<Record<En10025Grade, number>> = { S235: 360, S275: 430, S355: 510 };

/**
 * The simplified nominal values of EN 1993-1-1, Table 3.1: t ≤ 40 mm and 40 < t ≤ 80 mm. S275 and S355
 * for t ≤ 40 mm: read in the published table (see ../shared check values); the rest from memory
 * (S460N/NL 460/540, 430/540; S460M/ML 460/540, 430/530; S460Q/QL/QL1 460/570, 440/550).
 */
export const EN1993_1_1_TABLE_3_1: Record<En10025Grade, EnBand[]> = {
  S235: bands([[0, 40, 235, 360], [40, 80, 215, 360]]),
  S275: bands([[0, 40, 275, 430], [40, 80, 255, 410]]),
  S355: bands([[0, 40, 355, 510], [40, 80, 335, 470]]),
  S460N: bands([[0, 40, 460, 540], [40, 80, 430, 540]]),
  S460M: bands([[0, 40, 460, 540], [40, 80, 430, 530]]),
  S460Q: bands([[0, 40, 460, 570], [40, 80, 440, 550]]),
  S460: bands([[0, 40, 460, 540], [40, 80, 430, 530]]),
};

/** Thickness range each convention covers, mm (Table 3.1 stops at 80 mm). */
export const EN10025_THICKNESS_RANGE: Record<En10025Convention, { min_mm: number; max_mm: number }> = {
  "en10025-2": { min_mm: 0, max_mm: 100 },
  "en1993-1-1": { min_mm: 0, max_mm: 80 },
};

const DESIGNATION_TO_GRADE = new Map<string, En10025Grade>(
  (Object.entries(EN10025_DESIGNATIONS) as Array<[En10025Grade, readonly string[]]>).flatMap(([g, names]) => names.map((n): [string, En10025Grade] => [n, g])),
);

/** The grade of a designation such as "S355", "S355J2" or "S460NL" (case-insensitive); undefined if unknown. */
export function en10025Grade(name: string): En10025Grade | undefined {
  return DESIGNATION_TO_GRADE.get(name.trim().toUpperCase());
}

/** Every designation `en10025Grade` accepts, for messages. */
export const EN10025_NAMES: readonly string[] = [...DESIGNATION_TO_GRADE.keys()];

/**
 * fy and fu of an EN 10025 plate of thickness t under a convention: the product standard's values by
 * thickness, or EN 1993-1-1 Table 3.1.
 * @throws RangeError for an unknown grade or a thickness outside the convention's range.
 */
export function en10025Strength(name: string, t_mm: number, convention: En10025Convention): SteelStrength {
  const grade = en10025Grade(name);
  if (!grade) throw new RangeError(`unknown EN 10025 grade "${name}"`);
  const range = EN10025_THICKNESS_RANGE[convention];
  const table = convention === "en10025-2" ? EN10025_2_GRADES[grade] : EN1993_1_1_TABLE_3_1[grade];
  const thin = convention === "en10025-2" && t_mm < 3;
  const below3 = EN10025_2_FU_BELOW_3MM[grade];
  const band = t_mm > range.min_mm && !(thin && below3 === undefined) ? table.find((b) => t_mm > b.over_mm && t_mm <= b.upTo_mm) : undefined;
  if (!band) throw new RangeError(`t = ${t_mm} mm is outside ${thin ? "3" : range.min_mm}–${range.max_mm} mm for ${grade} under ${convention}`);
  return {
    grade: name.trim().toUpperCase(),
    fy_MPa: band.fy_MPa,
    fu_MPa: thin && below3 !== undefined ? below3 : band.fu_MPa,
    band: thin ? "t < 3 mm" : band.over_mm === 0 ? `t ≤ ${band.upTo_mm} mm` : `${band.over_mm} < t ≤ ${band.upTo_mm} mm`,
    source: convention === "en10025-2" ? `${PRODUCT_STANDARD[grade]}, ReH and Rm by thickness` : "EN 1993-1-1, Table 3.1",
  };
}

/**
 * ASTM plate steels used with AISC 360-16: specified minimum yield Fy and tensile strength Fu (ksi),
 * one value for every thickness the splices here use (A36 plates up to 8 in; A572 Grade 50 up to 4 in).
 * Source: AISC Steel Construction Manual, Table 2-5 (ASTM A36; ASTM A572 Grade 50) — common practice
 * values: A36 Fy 36 ksi, Fu 58 ksi; A572 Gr 50 Fy 50 ksi, Fu 65 ksi.
 */
export const ASTM_PLATE_GRADES: Record<string, { Fy_ksi: number; Fu_ksi: number; maxThickness_in: number; source: string }> = {
  A36: { Fy_ksi: 36, Fu_ksi: 58, maxThickness_in: 8, source: "ASTM A36, AISC Manual Table 2-5" },
  "A572-50": { Fy_ksi: 50, Fu_ksi: 65, maxThickness_in: 4, source: "ASTM A572 Grade 50, AISC Manual Table 2-5" },
};

/** Accepted spellings of the ASTM plate grades ("A572 Gr 50", "A572-50", "a36"). */
export function astmPlateGrade(name: string): string | undefined {
  const key = name.trim().toUpperCase().replace(/\s+/g, " ");
  if (key === "A36" || key === "ASTM A36") return "A36";
  if (/^(ASTM )?A572[- ]?(GR\.? ?|GRADE ?)?50$/.test(key)) return "A572-50";
  return undefined;
}

/**
 * The product standard a plate of this grade is ordered to, for the bill of materials: IS 2062 for the
 * IS grades, EN 10025-2/-3/-4/-6 for the EN grades, ASTM A36 / A572 for the ASTM grades; undefined for
 * a grade the catalogue does not hold.
 */
export function plateProductStandard(grade: string): string | undefined {
  if (ownEntry(IS2062_GRADES, grade.trim().toUpperCase())) return "IS 2062";
  const en = en10025Grade(grade);
  if (en) return PRODUCT_STANDARD[en];
  const astm = astmPlateGrade(grade);
  if (astm === "A36") return "ASTM A36";
  if (astm === "A572-50") return "ASTM A572";
  return undefined;
}
