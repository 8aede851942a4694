/**
 * Plates in tension: members (Chapter D) and connecting elements (J4).
 */
import { PHI } from "./factors.js";

/** Design tensile yield strength φt·Fy·Ag (N). AISC 360-16 D2(a), Eq. D2-1; J4.1(a), Eq. J4-1; φ = 0.90. */
export function phiPnYield(Ag_mm2: number, Fy_MPa: number): number {
  return PHI.yield * Fy_MPa * Ag_mm2;
}

/**
 * Design tensile rupture strength φt·Fu·Ae (N), Ae = U·An. AISC 360-16 D2(b), Eq. D2-2 (members, with D3)
 * and J4.1(b), Eq. J4-2 (connecting elements, Ae = An ≤ 0.85 Ag for bolted splice plates); φ = 0.75.
 */
export function phiPnRupture(Ae_mm2: number, Fu_MPa: number): number {
  return PHI.rupture * Fu_MPa * Ae_mm2;
}

/** Effective net area of a bolted splice plate: An, not above 0.85·Ag. AISC 360-16 J4.1(b). */
export function spliceEffectiveArea(An_mm2: number, Ag_mm2: number): number {
  return Math.min(An_mm2, 0.85 * Ag_mm2);
}

export interface BlockShearResult {
  rupture_N: number;
  yield_N: number;
  phiRn_N: number;
}

/** Block shear rupture, φ·(0.60·Fu·Anv + Ubs·Fu·Ant) (N). AISC 360-16 J4.3, Eq. J4-5 (first term); φ = 0.75. */
function blockShearRupture_N(Anv: number, Ant: number, Fu_MPa: number, Ubs: number): number {
  return PHI.blockShear * (0.6 * Fu_MPa * Anv + Ubs * Fu_MPa * Ant);
}

/** Block shear with shear yielding, φ·(0.60·Fy·Agv + Ubs·Fu·Ant) (N). AISC 360-16 J4.3, Eq. J4-5 (the limit); φ = 0.75. */
function blockShearYield_N(Agv: number, Ant: number, Fy_MPa: number, Fu_MPa: number, Ubs: number): number {
  return PHI.blockShear * (0.6 * Fy_MPa * Agv + Ubs * Fu_MPa * Ant);
}

/**
 * Design block shear strength φRn = φ·min(0.60·Fu·Anv + Ubs·Fu·Ant, 0.60·Fy·Agv + Ubs·Fu·Ant) (N).
 * AISC 360-16 J4.3, Eq. J4-5; φ = 0.75; Ubs = 1 (uniform tension stress).
 */
export function phiRnBlockShear(Agv: number, Anv: number, Ant: number, Fy_MPa: number, Fu_MPa: number, Ubs = 1): BlockShearResult {
  const rupture = blockShearRupture_N(Anv, Ant, Fu_MPa, Ubs);
  const yieldN = blockShearYield_N(Agv, Ant, Fy_MPa, Fu_MPa, Ubs);
  return { rupture_N: rupture, yield_N: yieldN, phiRn_N: Math.min(rupture, yieldN) };
}

/** φRn of Eq. J4-5 alone, the same figure as phiRnBlockShear(...).phiRn_N (for comparing many shapes). AISC 360-16 J4.3. */
export function phiRnBlockShear_N(Agv: number, Anv: number, Ant: number, Fy_MPa: number, Fu_MPa: number, Ubs = 1): number {
  return Math.min(blockShearRupture_N(Anv, Ant, Fu_MPa, Ubs), blockShearYield_N(Agv, Ant, Fy_MPa, Fu_MPa, Ubs));
}
