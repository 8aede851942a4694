import { frozenCitation, type Citation } from "../../model/results.js";

export const STANDARD = "IS 800:2007";

/** A citation of IS 800:2007. */
export function cl(clause: string, extra?: Omit<Citation, "standard" | "clause">): Citation {
  return extra ? { standard: STANDARD, clause, ...extra } : { standard: STANDARD, clause };
}

/** A citation made once, at module load, and shared by every result that cites it (frozenCitation). */
export function fixedCl(clause: string, extra?: Omit<Citation, "standard" | "clause">): Readonly<Citation> {
  return frozenCitation(cl(clause, extra));
}
