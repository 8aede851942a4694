import type { Citation } from "../../model/results.js";

export const STANDARD = "AISC 360-16";

/** A citation of ANSI/AISC 360-16, Specification for Structural Steel Buildings (LRFD). */
export function cl(clause: string, extra?: Omit<Citation, "standard" | "clause">): Citation {
  return extra ? { standard: STANDARD, clause, ...extra } : { standard: STANDARD, clause };
}

/**
 * A citation made once, at module load, and shared by every result that cites it: frozen (its `also`
 * list too), since results are only read. Same fields, in the same order, as `cl`.
 */
export function fixedCl(clause: string, extra?: Omit<Citation, "standard" | "clause">): Readonly<Citation> {
  const c = cl(clause, extra);
  if (c.also) Object.freeze(c.also);
  return Object.freeze(c);
}
