/**
 * Materials under IS 800:2007: plates of IS 2062 (cl. 2.2.4, Table 1), bolts of IS 1367-3 / ISO 898-1.
 */
import { is2062Strength, IS2062_GRADES } from "../../catalogue/steels.js";
import type { PlateSpec } from "../../model/scenario.js";

export const GRADES = Object.keys(IS2062_GRADES);

export function plateStrength(spec: PlateSpec): { fy_MPa: number; fu_MPa: number; note: string } {
  const s = is2062Strength(spec.grade, spec.thickness_mm);
  return { fy_MPa: s.fy_MPa, fu_MPa: s.fu_MPa, note: `${s.grade}, ${s.band}: fy ${s.fy_MPa}, fu ${s.fu_MPa} MPa (${s.source})` };
}

/** ε = (250 / fy)^0.5, IS 800:2007 Table 2. */
export function epsilon(fy_MPa: number): number {
  return Math.sqrt(250 / fy_MPa);
}
