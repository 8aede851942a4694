import type { Citation } from "../../model/results.js";

export const STANDARD = "IS 800:2007";

/** A citation of IS 800:2007. */
export function cl(clause: string, extra?: Omit<Citation, "standard" | "clause">): Citation {
  return extra ? { standard: STANDARD, clause, ...extra } : { standard: STANDARD, clause };
}

/**
 * A citation made once and shared by every result that cites it (frozen, its cross-references too):
 * a check cites the same clauses every time, and no output changes a citation it reads.
 */
export function fixedCl(clause: string, extra?: Omit<Citation, "standard" | "clause">): Readonly<Citation> {
  const c = cl(clause, extra);
  if (c.also) Object.freeze(c.also);
  return Object.freeze(c);
}
