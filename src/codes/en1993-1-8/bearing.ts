/**
 * Bearing resistance of one bolt on one plate, and of a group of bolts.
 * The factors are written as one fraction each (e.g. (28 e2 − 17 d0)/(10 d0) for 2.8 e2/d0 − 1.7) so that
 * a dimension at a round multiple of d0 gives the factor's cap exactly.
 */

/**
 * αd of an end bolt (no bolt ahead of it toward the plate end).
 * EN 1993-1-8, Table 3.4: αd = e1 / (3 d0).
 */
export function alpha_d_end(e1_mm: number, d0_mm: number): number {
  return e1_mm / (3 * d0_mm);
}

/**
 * αd of an inner bolt (a bolt ahead of it at p1).
 * EN 1993-1-8, Table 3.4: αd = p1 / (3 d0) − 1/4.
 */
export function alpha_d_inner(p1_mm: number, d0_mm: number): number {
  return (4 * p1_mm - 3 * d0_mm) / (12 * d0_mm);
}

/**
 * αb, in the direction of load transfer.
 * EN 1993-1-8, Table 3.4: αb = min(αd, fub/fu, 1.0) (never below zero).
 */
export function alpha_b(alpha_d: number, fub_MPa: number, fu_MPa: number): number {
  return Math.max(0, Math.min(alpha_d, fub_MPa / fu_MPa, 1.0));
}

/**
 * k1 of an edge bolt (no bolt between it and a side edge), perpendicular to the load transfer.
 * EN 1993-1-8, Table 3.4: k1 = min(2.8 e2/d0 − 1.7, 1.4 p2/d0 − 1.7, 2.5); the p2 term only where there is
 * another gauge line (p2 null: none). Never below zero.
 */
export function k1_edge(e2_mm: number, p2_mm: number | null, d0_mm: number): number {
  const eTerm = (28 * e2_mm - 17 * d0_mm) / (10 * d0_mm);
  const pTerm = p2_mm === null ? Infinity : (14 * p2_mm - 17 * d0_mm) / (10 * d0_mm);
  return Math.max(0, Math.min(eTerm, pTerm, 2.5));
}

/**
 * k1 of an inner bolt (bolts on both sides of it across the force).
 * EN 1993-1-8, Table 3.4: k1 = min(1.4 p2/d0 − 1.7, 2.5). Never below zero.
 */
export function k1_inner(p2_mm: number, d0_mm: number): number {
  return Math.max(0, Math.min((14 * p2_mm - 17 * d0_mm) / (10 * d0_mm), 2.5));
}

/**
 * Design bearing resistance of one bolt on one plate, Fb,Rd (N).
 * EN 1993-1-8, 3.6.1, Table 3.4: Fb,Rd = k1 · αb · fu · d · t / γM2, times the hole factor of note 1
 * (0.8 oversize, 0.6 slots across the force).
 * @param fu_MPa ultimate strength of the plate, MPa; d_mm bolt diameter; t_mm plate thickness
 */
export function Fb_Rd(k1: number, alpha_b_value: number, fu_MPa: number, d_mm: number, t_mm: number, gamma_M2: number, holeFactor = 1): number {
  return (k1 * alpha_b_value * fu_MPa * d_mm * t_mm * holeFactor) / gamma_M2;
}

/**
 * Limit on the bearing resistance of each bolt in a single lap joint with one transverse line of bolts (N).
 * EN 1993-1-8, 3.6.1(10), equation (3.2): Fb,Rd ≤ 1.5 · fu · d · t / γM2 (washers under head and nut).
 */
export function singleLapLimit(fu_MPa: number, d_mm: number, t_mm: number, gamma_M2: number): number {
  return (1.5 * fu_MPa * d_mm * t_mm) / gamma_M2;
}

export interface GroupResistance {
  resistance_N: number;
  /** "sum": ΣFb,Rd (every Fv,Rd ≥ its Fb,Rd); "least": n × the least min(Fv,Rd, Fb,Rd). */
  rule: "sum" | "least";
}

/**
 * Design resistance of a group of fasteners in bearing (N).
 * EN 1993-1-8, 3.7(1): ΣFb,Rd where the design shear resistance Fv,Rd of every fastener is at least its
 * design bearing resistance Fb,Rd; otherwise n × the smallest design resistance of any fastener,
 * min over the fasteners of min(Fv,Rd, Fb,Rd).
 * @param bearing_N Fb,Rd of each fastener, N
 * @param shear_N Fv,Rd of one fastener (the shear planes that carry this plate's force), N
 */
export function groupResistance(bearing_N: readonly number[], shear_N: number): GroupResistance {
  let sum = 0;
  let least = shear_N;
  let shearCoversEvery = true;
  for (const b of bearing_N) {
    sum += b;
    least = Math.min(least, b);
    if (shear_N < b - 1e-9) shearCoversEvery = false;
  }
  if (shearCoversEvery) return { resistance_N: sum, rule: "sum" };
  return { resistance_N: bearing_N.length * least, rule: "least" };
}
