/**
 * Slip resistance of friction-grip (HSFG) bolts.
 */
import { PARTIAL_FACTORS } from "./factors.js";

/**
 * Minimum bolt tension at installation (proof load), F0 = Anb · f0 with f0 = 0.70 fub (N).
 * IS 800:2007, cl. 10.4.3.
 */
export function F0(Anb_mm2: number, fub_MPa: number): number {
  return Anb_mm2 * 0.7 * fub_MPa;
}

/**
 * Design slip resistance of one friction-grip bolt, Vdsf (N).
 * IS 800:2007, cl. 10.4.3.
 * Vnsf = μf · ne · Kh · F0;  Vdsf = Vnsf / γmf (γmf 1.10 slip at service, 1.25 slip at ultimate, Table 5).
 * The long-joint factor βlj of cl. 10.3.3.1 is applied to long joints as well (from memory).
 */
export function Vdsf(mu_f: number, ne: number, Kh: number, F0_N: number, slipAt: "service" | "ultimate", beta_lj: number): number {
  const gamma_mf = slipAt === "service" ? PARTIAL_FACTORS.gamma_mf_service : PARTIAL_FACTORS.gamma_mf_ultimate;
  return (mu_f * ne * Kh * F0_N * beta_lj) / gamma_mf;
}
