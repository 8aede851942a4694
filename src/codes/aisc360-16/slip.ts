/**
 * Slip resistance of slip-critical connections, AISC 360-16 J3.8.
 */
import type { HoleType, SlotDirection } from "../../model/scenario.js";

/** Mean slip coefficient μ: Class A 0.30, Class B 0.50. AISC 360-16 J3.8 (definition of μ). */
export const SLIP_CLASSES = { A: 0.3, B: 0.5 } as const;

/** Ratio of mean installed to specified minimum pretension, Du = 1.13. AISC 360-16 J3.8. */
export const Du = 1.13;

/**
 * Resistance factor φ of slip by hole type: 1.00 standard holes and short slots perpendicular to the
 * force; 0.85 oversized holes and short slots parallel; 0.70 long slots. AISC 360-16 J3.8.
 */
export function phiSlip(hole: HoleType, slot: SlotDirection | undefined): number {
  if (hole === "standard" || (hole === "short-slot" && slot === "across")) return 1.0;
  if (hole === "oversize" || hole === "short-slot") return 0.85;
  return 0.7;
}

/**
 * Filler factor hf: 1.0 with no filler or one filler between the connected parts (or fillers
 * developed); 0.85 with two or more fillers. AISC 360-16 J3.8.
 */
export function hf(fillers: number): number {
  return fillers >= 2 ? 0.85 : 1.0;
}

/**
 * Design slip resistance of one bolt, φRn = φ·μ·Du·hf·Tb·ns (N). AISC 360-16 J3.8, Eq. J3-4.
 * @param Tb_N minimum bolt pretension, Table J3.1 / J3.1M
 * @param ns number of slip planes
 */
export function phiRnSlip(phi: number, mu: number, hf_value: number, Tb_N: number, ns: number): number {
  return phi * mu * Du * hf_value * Tb_N * ns;
}
