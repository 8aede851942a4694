/**
 * Materials under IS 800:2007: plates of IS 2062 (cl. 2.2.4, Table 1), bolts of IS 1367-3 / ISO 898-1.
 */
import { is2062Strength, IS2062_GRADES } from "../../catalogue/steels.js";
import type { PlateSpec } from "../../model/scenario.js";

export const GRADES = Object.keys(IS2062_GRADES);

/** fy, fu and their note by grade and thickness, each looked up once (a check asks for them about ten times, a search with every candidate). */
const strengthsByGrade = new Map<string, Map<number, Readonly<{ fy_MPa: number; fu_MPa: number; note: string }>>>();

/** fy and fu of an IS 2062 plate by its thickness band, with the note printed beside them (IS 2062 Table 2). */
export function plateStrength(spec: PlateSpec): Readonly<{ fy_MPa: number; fu_MPa: number; note: string }> {
  const known = strengthsByGrade.get(spec.grade)?.get(spec.thickness_mm);
  if (known) return known;
  const s = is2062Strength(spec.grade, spec.thickness_mm); // throws for a grade outside the table: nothing kept
  const m = Object.freeze({ fy_MPa: s.fy_MPa, fu_MPa: s.fu_MPa, note: `${s.grade}, ${s.band}: fy ${s.fy_MPa}, fu ${s.fu_MPa} MPa (${s.source})` });
  let byThickness = strengthsByGrade.get(spec.grade);
  if (!byThickness) strengthsByGrade.set(spec.grade, (byThickness = new Map()));
  byThickness.set(spec.thickness_mm, m);
  return m;
}

/** ε = (250 / fy)^0.5, IS 800:2007 Table 2. */
export function epsilon(fy_MPa: number): number {
  return Math.sqrt(250 / fy_MPa);
}
