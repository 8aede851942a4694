/** Number formatting for substituted formulas: fixed decimals, no trailing noise. */
export function f(value: number, decimals = 1): string {
  if (!Number.isFinite(value)) return String(value);
  return value.toFixed(decimals);
}

/** Force in kN from N. */
export function kN(value_N: number, decimals = 1): string {
  return `${f(value_N / 1000, decimals)} kN`;
}

/** Utilisation as demand / resistance, guarding zero resistance. */
export function utilisation(demand: number, resistance: number): number {
  if (resistance <= 0) return demand > 0 ? Infinity : 0;
  return demand / resistance;
}
