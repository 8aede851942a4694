/**
 * Plates in compression under AISC 360-16: connecting elements (J4.4) and members (Chapter E, E3).
 * Pure clause functions; forces in N, stresses in MPa.
 */

/** Modulus of elasticity E = 29,000 ksi = 199,948 MPa. AISC 360-16, Symbols. */
export const E_STEEL_MPA = 29000 * 6.894757;

/**
 * Critical stress of flexural buckling (MPa). AISC 360-16 E3, Eq. E3-2 (KL/r ≤ 4.71√(E/Fy)):
 * Fcr = 0.658^(Fy/Fe)·Fy; else Eq. E3-3, Fcr = 0.877·Fe; Fe = π²E/(KL/r)², Eq. E3-4.
 */
export function Fcr_MPa(Fy_MPa: number, slenderness: number): { Fcr_MPa: number; Fe_MPa: number; inelastic: boolean } {
  if (slenderness <= 0) return { Fcr_MPa: Fy_MPa, Fe_MPa: Infinity, inelastic: true };
  const Fe = (Math.PI ** 2 * E_STEEL_MPA) / slenderness ** 2;
  const inelastic = slenderness <= 4.71 * Math.sqrt(E_STEEL_MPA / Fy_MPa);
  return { Fcr_MPa: inelastic ? 0.658 ** (Fy_MPa / Fe) * Fy_MPa : 0.877 * Fe, Fe_MPa: Fe, inelastic };
}

/**
 * Design compressive strength of a connecting element, φPn (N), φ = 0.90. AISC 360-16 J4.4:
 * Lc/r ≤ 25: Pn = Fy·Ag (Eq. J4-6); Lc/r > 25: Chapter E (E3).
 */
export function phiPnCompressionElement(Ag_mm2: number, Fy_MPa: number, slenderness: number): { phiPn_N: number; Fcr_MPa: number; chapterE: boolean } {
  if (slenderness <= 25) return { phiPn_N: 0.9 * Fy_MPa * Ag_mm2, Fcr_MPa: Fy_MPa, chapterE: false };
  const { Fcr_MPa: Fcr } = Fcr_MPa(Fy_MPa, slenderness);
  return { phiPn_N: 0.9 * Fcr * Ag_mm2, Fcr_MPa: Fcr, chapterE: true };
}
