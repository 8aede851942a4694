/**
 * The largest values a scenario file may give, in a module of their own: the command line's option
 * definitions read them without building the schema (schema.ts).
 */

/** Largest values accepted, to stop absurd input before it reaches the core. */
export const LIMITS = {
  length_mm: 20_000,
  thickness_mm: 200,
  width_mm: 5_000,
  force_kN: 1_000_000,
  boltsAcross: 50,
  linesAlong: 100,
  holes: 2_000,
} as const;
