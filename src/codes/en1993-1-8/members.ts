/**
 * Plates as members in tension (EN 1993-1-1, 6.2.3) and block tearing (EN 1993-1-8, 3.10.2).
 */

/**
 * Design plastic resistance of the gross cross-section, Npl,Rd = A · fy / γM0 (N).
 * EN 1993-1-1, 6.2.3(2)a, equation (6.6).
 */
export function Npl_Rd(A_mm2: number, fy_MPa: number, gamma_M0: number): number {
  return (A_mm2 * fy_MPa) / gamma_M0;
}

/**
 * Design ultimate resistance of the net cross-section at holes, Nu,Rd = 0.9 · Anet · fu / γM2 (N).
 * EN 1993-1-1, 6.2.3(2)b, equation (6.7); Anet by 6.2.2.2 (staggered holes: the least of every path,
 * deducting Σ d0 − Σ s²/4p, times t).
 */
export function Nu_Rd(Anet_mm2: number, fu_MPa: number, gamma_M2: number): number {
  return (0.9 * Anet_mm2 * fu_MPa) / gamma_M2;
}

/**
 * Design tension resistance of the net section of Category C (slip-resistant at ULS) connections,
 * Nnet,Rd = Anet · fy / γM0 (N).
 * EN 1993-1-1, 6.2.3(4), equation (6.8).
 */
export function Nnet_Rd(Anet_mm2: number, fy_MPa: number, gamma_M0: number): number {
  return (Anet_mm2 * fy_MPa) / gamma_M0;
}

/**
 * Design block tearing resistance of a concentrically loaded bolt group, Veff,1,Rd (N).
 * EN 1993-1-8, 3.10.2(2), equation (3.9): Veff,1,Rd = fu · Ant / γM2 + (1/√3) · fy · Anv / γM0.
 * @param Ant_mm2 net area in tension, mm²; Anv_mm2 net area in shear, mm²
 */
export function Veff_1_Rd(Ant_mm2: number, Anv_mm2: number, fy_MPa: number, fu_MPa: number, gamma_M0: number, gamma_M2: number): number {
  return (fu_MPa * Ant_mm2) / gamma_M2 + (fy_MPa * Anv_mm2) / (Math.sqrt(3) * gamma_M0);
}
