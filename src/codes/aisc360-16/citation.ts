import { frozenCitation, type Citation } from "../../model/results.js";

export const STANDARD = "AISC 360-16";

/** A citation of ANSI/AISC 360-16, Specification for Structural Steel Buildings (LRFD). */
export function cl(clause: string, extra?: Omit<Citation, "standard" | "clause">): Citation {
  return extra ? { standard: STANDARD, clause, ...extra } : { standard: STANDARD, clause };
}

/** A citation made once, at module load, and shared by every result that cites it (frozenCitation). */
export function fixedCl(clause: string, extra?: Omit<Citation, "standard" | "clause">): Readonly<Citation> {
  return frozenCitation(cl(clause, extra));
}
