/**
 * Shear capacity of bearing-type bolts, with the long-joint, large-grip and packing reductions.
 */
import { PARTIAL_FACTORS } from "./factors.js";

/**
 * Long-joint reduction factor βlj.
 * IS 800:2007, cl. 10.3.3.1.
 * βlj = 1.075 − 0.005 lj/d, with 0.75 ≤ βlj ≤ 1.0, applied when lj > 15 d; else 1.0.
 * @param lj_mm distance between the first and last transverse lines of bolts along the force, mm
 * @param d_mm nominal bolt diameter, mm
 */
export function beta_lj(lj_mm: number, d_mm: number): number {
  if (lj_mm <= 15 * d_mm) return 1.0;
  return Math.min(1.0, Math.max(0.75, 1.075 - (0.005 * lj_mm) / d_mm));
}

/**
 * Large-grip reduction factor βlg.
 * IS 800:2007, cl. 10.3.3.2.
 * βlg = 8 / (3 + lg/d) for lg > 5 d, and βlg ≤ βlj; else 1.0. Grips over 8 d are not allowed (checked apart).
 * @param lg_mm grip length: total thickness of the connected plates and packing, mm
 */
export function beta_lg(lg_mm: number, d_mm: number, beta_lj_value: number): number {
  if (lg_mm <= 5 * d_mm) return 1.0;
  return Math.min(8 / (3 + lg_mm / d_mm), beta_lj_value);
}

/**
 * Packing-plate reduction factor βpkg.
 * IS 800:2007, cl. 10.3.3.3.
 * βpkg = 1 − 0.0125 tpk for packing thicker than 6 mm; else 1.0.
 * @param tpk_mm thickness of the thicker packing, mm
 */
export function beta_pkg(tpk_mm: number): number {
  return tpk_mm > 6 ? 1 - 0.0125 * tpk_mm : 1.0;
}

export interface BoltShearInput {
  fub_MPa: number;
  /** Shear planes through threads (nn) and through the shank (ns). */
  nn: number;
  ns: number;
  /** Net area at threads Anb, shank area Asb, mm². */
  Anb_mm2: number;
  Asb_mm2: number;
  beta_lj: number;
  beta_lg: number;
  beta_pkg: number;
}

/**
 * Design shear capacity of one bearing-type bolt, Vdsb (N).
 * IS 800:2007, cl. 10.3.3.
 * Vnsb = fub/√3 · (nn·Anb + ns·Asb) · βlj · βlg · βpkg;  Vdsb = Vnsb / γmb.
 */
export function Vdsb(input: BoltShearInput): number {
  const Vnsb =
    (input.fub_MPa / Math.sqrt(3)) *
    (input.nn * input.Anb_mm2 + input.ns * input.Asb_mm2) *
    input.beta_lj *
    input.beta_lg *
    input.beta_pkg;
  return Vnsb / PARTIAL_FACTORS.gamma_mb;
}
