import { frozenCitation, type Citation } from "../../model/results.js";

export const STANDARD = "EN 1993-1-8";

/** A citation of EN 1993-1-8 (design of joints). */
export function cl(clause: string, extra?: Omit<Citation, "standard" | "clause">): Citation {
  return extra ? { standard: STANDARD, clause, ...extra } : { standard: STANDARD, clause };
}

/** A citation of EN 1993-1-1 (general rules: members in tension). */
export function cl11(clause: string, extra?: Omit<Citation, "standard" | "clause">): Citation {
  return extra ? { standard: "EN 1993-1-1", clause, ...extra } : { standard: "EN 1993-1-1", clause };
}

/** A citation made once and shared by every result that cites it (frozenCitation). */
export const fixed = frozenCitation;
