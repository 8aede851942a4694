/**
 * Shear resistance of bolts and its reductions for long joints, packing and M12/M14 bolts in 2 mm
 * clearance holes.
 */
import type { PropertyClass } from "../../catalogue/bolts.js";

/** αv with the shear plane through the threads, by property class (Table 3.4). */
const ALPHA_V_THREADED = Object.freeze({ "4.6": 0.6, "5.6": 0.6, "8.8": 0.6, "10.9": 0.5 } as const satisfies Record<PropertyClass, number>);

/**
 * Factor αv of the shear resistance.
 * EN 1993-1-8, 3.6.1, Table 3.4.
 * Shear plane through the threads: αv = 0.6 for classes 4.6, 5.6 and 8.8; 0.5 for 4.8, 5.8, 6.8 and 10.9.
 * Through the unthreaded shank: αv = 0.6.
 */
export function alpha_v(propertyClass: PropertyClass, threadsInPlane: boolean): number {
  if (!threadsInPlane) return 0.6;
  return ALPHA_V_THREADED[propertyClass];
}

/**
 * Design shear resistance of one bolt per shear plane, Fv,Rd (N).
 * EN 1993-1-8, 3.6.1, Table 3.4.
 * Fv,Rd = αv · fub · A / γM2, with A = As (tensile stress area) where the plane passes the threads and
 * A = π d²/4 (gross area) where it passes the shank.
 * @param fub_MPa ultimate tensile strength of the bolt, MPa
 * @param A_mm2 As or the gross area, mm²
 */
export function Fv_Rd(alpha_v_value: number, fub_MPa: number, A_mm2: number, gamma_M2: number): number {
  return (alpha_v_value * fub_MPa * A_mm2) / gamma_M2;
}

/**
 * Long-joint reduction factor βLf.
 * EN 1993-1-8, 3.8(1), equation (3.5).
 * βLf = 1 − (Lj − 15 d)/(200 d), with 0.75 ≤ βLf ≤ 1.0, where Lj > 15 d; else 1.0.
 * @param Lj_mm distance between the centres of the end fasteners, measured along the force, mm
 * @param d_mm nominal bolt diameter, mm
 */
export function beta_Lf(Lj_mm: number, d_mm: number): number {
  if (Lj_mm <= 15 * d_mm) return 1.0;
  return Math.min(1.0, Math.max(0.75, 1 - (Lj_mm - 15 * d_mm) / (200 * d_mm)));
}

/**
 * Packing reduction factor βp.
 * EN 1993-1-8, 3.6.1(12), equation (3.3).
 * βp = 9 d / (8 d + 3 tp), with βp ≤ 1, where the packing is thicker than d/3; else 1.0.
 * @param tp_mm total thickness of the packing the bolt passes, mm
 */
export function beta_p(tp_mm: number, d_mm: number): number {
  if (tp_mm <= d_mm / 3) return 1.0;
  return Math.min(1.0, (9 * d_mm) / (8 * d_mm + 3 * tp_mm));
}

/**
 * Factor on Fv,Rd for M12 and M14 bolts in 2 mm clearance holes.
 * EN 1993-1-8, 3.6.1(5): 0.85 for classes 4.8, 5.8, 6.8, 8.8 and 10.9 (of the catalogue: 8.8 and 10.9);
 * 1.0 otherwise.
 * @param clearance_mm nominal clearance of the hole, mm
 */
export function smallBoltHoleFactor(d_mm: number, clearance_mm: number, propertyClass: PropertyClass): number {
  const reduced = propertyClass === "8.8" || propertyClass === "10.9";
  return d_mm <= 14 && clearance_mm >= 2 - 1e-9 && reduced ? 0.85 : 1.0;
}
