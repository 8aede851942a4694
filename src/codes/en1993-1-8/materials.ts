/**
 * Materials under EN 1993-1-8: plates of EN 10025-2 (S235, S275, S355), fy and fu by thickness from the
 * product standard or from EN 1993-1-1 Table 3.1 (EN 1993-1-1, 3.2.1(1)); bolts of ISO 898-1 property
 * classes with the nominal fub of EN 1993-1-8 Table 3.1.
 */
import { boltMaterial, type BoltMaterial, type PropertyClass } from "../../catalogue/bolts.js";
import { en10025Strength, type En10025Convention } from "../../catalogue/steels.js";
import type { PlateSpec } from "../../model/scenario.js";

/** fy and fu of a plate, with the note printed beside them. EN 1993-1-1, 3.2.1. */
export function plateStrength(spec: PlateSpec, convention: En10025Convention): { fy_MPa: number; fu_MPa: number; note: string } {
  const s = en10025Strength(spec.grade, spec.thickness_mm, convention);
  return { fy_MPa: s.fy_MPa, fu_MPa: s.fu_MPa, note: `${s.grade}, ${s.band}: fy ${s.fy_MPa}, fu ${s.fu_MPa} MPa (${s.source})` };
}

/**
 * Bolt strengths: the nominal values of ISO 898-1 as EN 1993-1-8, Table 3.1 lists them
 * (4.6 400/240, 5.6 500/300, 8.8 800/640, 10.9 1000/900 MPa), for every diameter.
 */
export function boltStrength(propertyClass: PropertyClass, d_mm: number): BoltMaterial {
  return boltMaterial(propertyClass, d_mm, "nominal");
}
