/**
 * Resistance factors φ of LRFD.
 * AISC 360-16: D2 (φt 0.90 yield, 0.75 rupture), J3.6 (bolt shear 0.75), J3.10 (bearing and tearout
 * 0.75), J4.1 (connecting elements 0.90 / 0.75), J4.3 (block shear 0.75), J3.8 (slip 1.00 / 0.85 / 0.70
 * by hole type, see slip.ts).
 */
export const PHI = {
  yield: 0.9,
  rupture: 0.75,
  boltShear: 0.75,
  bearing: 0.75,
  blockShear: 0.75,
} as const;

/** Exact conversions (common practice): 1 in = 25.4 mm, 1 ksi = 6.894757293168 MPa, 1 kip = 4448.2216152605 N. */
export const MM_PER_IN = 25.4;
export const MPA_PER_KSI = 6.894757293168;
export const N_PER_KIP = 4448.2216152605;
