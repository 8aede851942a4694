/**
 * Partial safety factors for materials.
 * IS 800:2007, cl. 5.4.1, Table 5.
 */
export const PARTIAL_FACTORS = {
  /** Resistance governed by yielding, γm0. */
  gamma_m0: 1.1,
  /** Resistance governed by ultimate stress (rupture), γm1. */
  gamma_m1: 1.25,
  /** Bearing-type bolts, γmb. */
  gamma_mb: 1.25,
  /** Friction-grip bolts, slip designed at the service load, γmf. */
  gamma_mf_service: 1.1,
  /** Friction-grip bolts, slip designed at the ultimate load, γmf. */
  gamma_mf_ultimate: 1.25,
} as const;
