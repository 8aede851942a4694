/**
 * Plates as tension members: gross yield, net-section rupture, block shear.
 */
import { PARTIAL_FACTORS } from "./factors.js";

/**
 * Design strength due to yielding of the gross section, Tdg = Ag · fy / γm0 (N).
 * IS 800:2007, cl. 6.2.
 */
export function Tdg(Ag_mm2: number, fy_MPa: number): number {
  return (Ag_mm2 * fy_MPa) / PARTIAL_FACTORS.gamma_m0;
}

/**
 * Design strength in tension of a plate due to rupture of the net section, Tdn = 0.9 · An · fu / γm1 (N).
 * IS 800:2007, cl. 6.3.1. An = [b − n·dh + Σ psi²/(4 gi)] · t, the least over all paths.
 */
export function Tdn(An_mm2: number, fu_MPa: number): number {
  return (0.9 * An_mm2 * fu_MPa) / PARTIAL_FACTORS.gamma_m1;
}

export interface BlockShearResult {
  Tdb1_N: number;
  Tdb2_N: number;
  Tdb_N: number;
}

/**
 * Block shear strength of a bolted connection, Tdb = min(Tdb1, Tdb2) (N).
 * IS 800:2007, cl. 6.4.1.
 * Tdb1 = Avg·fy/(√3 γm0) + 0.9·Atn·fu/γm1;   Tdb2 = 0.9·Avn·fu/(√3 γm1) + Atg·fy/γm0.
 */
export function Tdb(Avg_mm2: number, Avn_mm2: number, Atg_mm2: number, Atn_mm2: number, fy_MPa: number, fu_MPa: number): BlockShearResult {
  const Tdb1 = Tdb1_N(Avg_mm2, Atn_mm2, fy_MPa, fu_MPa);
  const Tdb2 = Tdb2_N(Avn_mm2, Atg_mm2, fy_MPa, fu_MPa);
  return { Tdb1_N: Tdb1, Tdb2_N: Tdb2, Tdb_N: Math.min(Tdb1, Tdb2) };
}

/** Block shear, yield of the gross shear planes with rupture of the net tension planes (cl. 6.4.1): Tdb1 = Avg·fy/(√3 γm0) + 0.9·Atn·fu/γm1 (N). */
export function Tdb1_N(Avg_mm2: number, Atn_mm2: number, fy_MPa: number, fu_MPa: number): number {
  const { gamma_m0, gamma_m1 } = PARTIAL_FACTORS;
  return (Avg_mm2 * fy_MPa) / (Math.sqrt(3) * gamma_m0) + (0.9 * Atn_mm2 * fu_MPa) / gamma_m1;
}

/** Block shear, rupture of the net shear planes with yield of the gross tension planes (cl. 6.4.1): Tdb2 = 0.9·Avn·fu/(√3 γm1) + Atg·fy/γm0 (N). */
export function Tdb2_N(Avn_mm2: number, Atg_mm2: number, fy_MPa: number, fu_MPa: number): number {
  const { gamma_m0, gamma_m1 } = PARTIAL_FACTORS;
  return (0.9 * Avn_mm2 * fu_MPa) / (Math.sqrt(3) * gamma_m1) + (Atg_mm2 * fy_MPa) / gamma_m0;
}
