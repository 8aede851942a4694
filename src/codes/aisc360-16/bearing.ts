/**
 * Bearing and tearout at bolt holes, AISC 360-16 J3.10(a).
 */
import type { HoleType, SlotDirection } from "../../model/scenario.js";
import { PHI } from "./factors.js";

/** One case of J3.10(a): the bearing and tearout coefficients and the equations that print them. */
export interface BearingCoefficients {
  readonly cb: number;
  readonly ct: number;
  readonly equation: string;
}

/** J3.10(a)(1)(i), (a)(2)(i): deformation at service a design consideration, Eq. J3-6a, J3-6c. */
const DEFORMATION_CONSIDERED: BearingCoefficients = Object.freeze({ cb: 2.4, ct: 1.2, equation: "J3-6a, J3-6c" });
/** J3.10(a)(1)(ii), (a)(2)(ii): deformation not a consideration, Eq. J3-6b, J3-6d. */
const DEFORMATION_NOT_CONSIDERED: BearingCoefficients = Object.freeze({ cb: 3.0, ct: 1.5, equation: "J3-6b, J3-6d" });
/** J3.10(a)(3): long slots perpendicular to the force, Eq. J3-6e, J3-6f. */
const LONG_SLOT_ACROSS: BearingCoefficients = Object.freeze({ cb: 2.0, ct: 1.0, equation: "J3-6e, J3-6f" });

/** The three cases of J3.10(a), for text made once per case. */
export const BEARING_CASES: readonly BearingCoefficients[] = Object.freeze([DEFORMATION_CONSIDERED, DEFORMATION_NOT_CONSIDERED, LONG_SLOT_ACROSS]);

/**
 * Coefficients of J3.10(a): bearing Rn = cb·d·t·Fu, tearout Rn = ct·lc·t·Fu.
 * (1) standard, oversized, short-slotted holes, or long slots parallel to the force, deformation at
 *     service a design consideration: cb 2.4, ct 1.2 (Eq. J3-6a, J3-6c);
 * (2) the same, deformation not a consideration: cb 3.0, ct 1.5 (Eq. J3-6b, J3-6d);
 * (3) long slots perpendicular to the force: cb 2.0, ct 1.0 (Eq. J3-6e, J3-6f).
 * AISC 360-16 J3.10(a).
 */
export function bearingCoefficients(deformationConsidered: boolean, hole: HoleType, slot: SlotDirection | undefined): BearingCoefficients {
  if (hole === "long-slot" && slot === "across") return LONG_SLOT_ACROSS;
  return deformationConsidered ? DEFORMATION_CONSIDERED : DEFORMATION_NOT_CONSIDERED;
}

/** Design bearing strength of one bolt on one plate, φ·cb·d·t·Fu (N). AISC 360-16 J3.10(a); φ = 0.75. */
export function phiRnBearing(cb: number, d_mm: number, t_mm: number, Fu_MPa: number): number {
  return PHI.bearing * cb * d_mm * t_mm * Fu_MPa;
}

/**
 * Design tearout strength of one bolt on one plate, φ·ct·lc·t·Fu (N). AISC 360-16 J3.10(a); φ = 0.75.
 * @param lc_mm clear distance along the force from the edge of the hole to the edge of the adjacent hole or of the material
 */
export function phiRnTearout(ct: number, lc_mm: number, t_mm: number, Fu_MPa: number): number {
  return PHI.bearing * ct * Math.max(0, lc_mm) * t_mm * Fu_MPa;
}

/**
 * Clear distance lc of a hole: to the plate end, the end distance less half the hole length; to the
 * hole ahead, the spacing less the hole length (both holes of one size). AISC 360-16 J3.10.
 */
export function clearDistance_mm(toEnd_mm: number, toHoleAhead_mm: number | null, holeLength_mm: number): number {
  return toHoleAhead_mm === null ? toEnd_mm - holeLength_mm / 2 : toHoleAhead_mm - holeLength_mm;
}
