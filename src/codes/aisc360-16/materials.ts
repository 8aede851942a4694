/**
 * Materials under AISC 360-16: ASTM A36 and A572 Grade 50 plates; bolt groups of Table J3.2 from the
 * ASTM grade (or the ISO class of the same strength level, as the search names bolts).
 */
import { ownEntry } from "../../catalogue/lookup.js";
import { ASTM_ISO_EQUIVALENT, type AstmBoltGrade } from "../../catalogue/bolts.js";
import { ASTM_PLATE_GRADES, astmPlateGrade } from "../../catalogue/steels.js";
import type { BoltSpec, PlateSpec } from "../../model/scenario.js";
import { MPA_PER_KSI } from "./factors.js";

export const GRADES = Object.keys(ASTM_PLATE_GRADES);

/** Fy, Fu and their note by grade name as written, each looked up once (a check asks about ten times). */
const strengthsByGrade = new Map<string, Readonly<{ fy_MPa: number; fu_MPa: number; note: string }>>();

/**
 * Fy and Fu of an ASTM plate, MPa (exact conversion of the ksi values).
 * AISC 360-16 A3.1 (ASTM A36, A572); values from AISC Manual Table 2-5.
 * @throws RangeError for a grade outside the table.
 */
export function plateStrength(spec: PlateSpec): Readonly<{ fy_MPa: number; fu_MPa: number; note: string }> {
  let m = strengthsByGrade.get(spec.grade);
  if (!m) {
    const grade = astmPlateGrade(spec.grade);
    const steel = grade ? ownEntry(ASTM_PLATE_GRADES, grade) : undefined;
    if (!grade || !steel) throw new RangeError(`unknown ASTM plate grade "${spec.grade}"`);
    m = Object.freeze({
      fy_MPa: steel.Fy_ksi * MPA_PER_KSI,
      fu_MPa: steel.Fu_ksi * MPA_PER_KSI,
      note: `${grade}: Fy ${steel.Fy_ksi} ksi, Fu ${steel.Fu_ksi} ksi (${steel.source})`,
    });
    strengthsByGrade.set(spec.grade, m);
  }
  return m;
}


/** The bolt groups of AISC 360-16 Table J3.2. */
export type BoltGroup = "A307" | "Group A" | "Group B";

const ISO_TO_ASTM: Record<string, AstmBoltGrade> = Object.fromEntries(
  (Object.entries(ASTM_ISO_EQUIVALENT) as Array<[AstmBoltGrade, string]>).map(([astm, iso]) => [iso, astm]),
);

/** The ASTM grade of a bolt: the one named, else the grade of the ISO class's strength level (8.8 → A325). */
export function astmGradeOf(bolts: Pick<BoltSpec, "astmGrade" | "propertyClass">): AstmBoltGrade | undefined {
  return bolts.astmGrade ?? ISO_TO_ASTM[bolts.propertyClass];
}

/** Table J3.2 group of an ASTM grade: A325 Group A, A490 Group B (AISC 360-16 J3.1). */
export function boltGroupOf(grade: AstmBoltGrade): BoltGroup {
  return grade === "A307" ? "A307" : grade === "A325" ? "Group A" : "Group B";
}

/**
 * Pretension Tb of Table J3.1 (kips, inch bolts) and J3.1M (kN, metric bolts), Group A and Group B.
 * AISC 360-16 Table J3.1 / J3.1M (from memory: ¾ in Group A 28 kips is also in ../shared check values).
 * Every value here is printed in AISC 360-22 Tables J3.1 / J3.1M (Groups 120 / 150) and, except 1⅛ in
 * Group A (56 kips under the old 105 ksi A325), in 360-05 Tables J3.1 / J3.1M.
 */
const TB_KIPS: Record<string, Record<"Group A" | "Group B", number>> = {
  "0.5": { "Group A": 12, "Group B": 15 },
  "0.625": { "Group A": 19, "Group B": 24 },
  "0.75": { "Group A": 28, "Group B": 35 },
  "0.875": { "Group A": 39, "Group B": 49 },
  "1": { "Group A": 51, "Group B": 64 },
  "1.125": { "Group A": 64, "Group B": 80 },
};
const TB_KN: Record<number, Record<"Group A" | "Group B", number>> = {
  16: { "Group A": 91, "Group B": 114 },
  20: { "Group A": 142, "Group B": 179 },
  22: { "Group A": 176, "Group B": 221 },
  24: { "Group A": 205, "Group B": 257 },
  27: { "Group A": 267, "Group B": 334 },
  30: { "Group A": 326, "Group B": 408 },
  36: { "Group A": 475, "Group B": 595 },
};

/** Minimum bolt pretension Tb, N; undefined where Table J3.1/J3.1M has no entry. */
export function Tb_N(d_mm: number, group: "Group A" | "Group B", inch: number | undefined): number | undefined {
  if (inch !== undefined) {
    const kips = TB_KIPS[String(inch)]?.[group];
    return kips === undefined ? undefined : kips * 4448.2216152605;
  }
  const kN = TB_KN[d_mm]?.[group];
  return kN === undefined ? undefined : kN * 1000;
}
