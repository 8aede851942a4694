/**
 * Plates in compression under IS 800:2007: the gross section, and a cover plate as a strut across the
 * butt (cl. 7.1.2). Pure clause functions; the splice checks that use them are in joint-checks.
 */
import { PARTIAL_FACTORS } from "./factors.js";

/** Elastic modulus of steel E, MPa. IS 800:2007, cl. 2.2.4.1. */
export const E_STEEL_MPA = 2.0e5;

/** Imperfection factor α of the buckling classes. IS 800:2007, cl. 7.1.2.1, Table 7. */
export const IMPERFECTION: Record<"a" | "b" | "c" | "d", number> = { a: 0.21, b: 0.34, c: 0.49, d: 0.76 };

/**
 * Design compressive stress fcd of a member (MPa). IS 800:2007, cl. 7.1.2.1:
 * fcd = (fy/γm0) / (φ + √(φ² − λ²)) ≤ fy/γm0, φ = 0.5·[1 + α(λ − 0.2) + λ²], λ = √(fy/fcc),
 * fcc = π²E/(KL/r)².
 */
export function fcd_MPa(fy_MPa: number, slenderness: number, alpha: number): { fcd_MPa: number; lambda: number; phi: number } {
  const { gamma_m0 } = PARTIAL_FACTORS;
  if (slenderness <= 0) return { fcd_MPa: fy_MPa / gamma_m0, lambda: 0, phi: 0.5 };
  const fcc = (Math.PI ** 2 * E_STEEL_MPA) / slenderness ** 2;
  const lambda = Math.sqrt(fy_MPa / fcc);
  const phi = 0.5 * (1 + alpha * (lambda - 0.2) + lambda ** 2);
  const fcd = fy_MPa / gamma_m0 / (phi + Math.sqrt(phi ** 2 - lambda ** 2));
  return { fcd_MPa: Math.min(fcd, fy_MPa / gamma_m0), lambda, phi };
}

/**
 * Design compressive strength of the gross section, Ag·fy/γm0 (N): a short element (the plate between
 * bolts, holes filled by bolts not deducted — IS 800:2007 cl. 7.3.2, from memory; oversize and slotted
 * holes deducted). IS 800:2007, cl. 7.1.2 with λ → 0.
 */
export function Pd_gross(A_mm2: number, fy_MPa: number): number {
  return (A_mm2 * fy_MPa) / PARTIAL_FACTORS.gamma_m0;
}
