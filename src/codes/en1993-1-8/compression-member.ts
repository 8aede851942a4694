/**
 * Plates in compression under EN 1993-1-1: the cross-section (6.2.4) and flexural buckling of a cover
 * plate across the butt or of a ply between fasteners (6.3.1). Pure clause functions.
 */

/** Elastic modulus E, MPa. EN 1993-1-1, 3.2.6. */
export const E_STEEL_MPA = 210000;

/** Imperfection factor α of the buckling curves. EN 1993-1-1, 6.3.1.2, Table 6.1. */
export const IMPERFECTION: Record<"a0" | "a" | "b" | "c" | "d", number> = { a0: 0.13, a: 0.21, b: 0.34, c: 0.49, d: 0.76 };

/**
 * Design resistance of the cross-section in compression, Nc,Rd = A·fy/γM0 (N). EN 1993-1-1, 6.2.4(2),
 * equation (6.10); fastener holes filled by fasteners are not deducted, oversize and slotted holes are
 * (6.2.4(3), from memory).
 */
export function Nc_Rd(A_mm2: number, fy_MPa: number, gamma_M0: number): number {
  return (A_mm2 * fy_MPa) / gamma_M0;
}

/**
 * Reduction factor χ for flexural buckling. EN 1993-1-1, 6.3.1.2, equation (6.49):
 * χ = 1/(Φ + √(Φ² − λ̄²)) ≤ 1, Φ = 0.5·[1 + α(λ̄ − 0.2) + λ̄²], λ̄ = (Lcr/i)/(π√(E/fy)).
 * For λ̄ ≤ 0.2 buckling may be ignored (6.3.1.2(4)): χ = 1.
 */
export function chi(slenderness: number, fy_MPa: number, alpha: number): { chi: number; lambdaBar: number; Phi: number } {
  const lambdaBar = slenderness / (Math.PI * Math.sqrt(E_STEEL_MPA / fy_MPa));
  const Phi = 0.5 * (1 + alpha * (lambdaBar - 0.2) + lambdaBar ** 2);
  if (lambdaBar <= 0.2) return { chi: 1, lambdaBar, Phi };
  return { chi: Math.min(1, 1 / (Phi + Math.sqrt(Phi ** 2 - lambdaBar ** 2))), lambdaBar, Phi };
}

/**
 * Design buckling resistance of a compression member, Nb,Rd = χ·A·fy/γM1 (N). EN 1993-1-1, 6.3.1.1,
 * equation (6.47) (class 1–3 cross-sections).
 */
export function Nb_Rd(chiValue: number, A_mm2: number, fy_MPa: number, gamma_M1: number): number {
  return (chiValue * A_mm2 * fy_MPa) / gamma_M1;
}
