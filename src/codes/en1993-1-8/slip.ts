/**
 * Slip resistance of preloaded bolts (Categories B and C).
 */

/**
 * Preloading force, Fp,C = 0.7 · fub · As (N).
 * EN 1993-1-8, 3.9.1(2), equation (3.7).
 */
export function Fp_C(fub_MPa: number, As_mm2: number): number {
  return 0.7 * fub_MPa * As_mm2;
}

/**
 * Design slip resistance of one preloaded bolt, Fs,Rd (N).
 * EN 1993-1-8, 3.9.1(1), equation (3.6): Fs,Rd = ks · n · μ / γM3 · Fp,C; at the serviceability limit
 * state (Category B) with γM3,ser instead of γM3.
 * @param ks hole factor, Table 3.6; n friction surfaces; mu slip factor, Table 3.7
 */
export function Fs_Rd(ks_value: number, n: number, mu: number, FpC_N: number, gamma_M3: number): number {
  return (ks_value * n * mu * FpC_N) / gamma_M3;
}
