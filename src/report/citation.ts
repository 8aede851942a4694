/** Citations as printed text. Pure. */
import type { Citation } from "../model/results.js";

/**
 * A citation as one line: "EN 1993-1-1 cl. 6.2.3(2)a, Eq. (6.6)", "AISC 360-16 Sect. J3.6, Table J3.2,
 * Eq. J3-1; with J5.2". AISC 360 numbers its provisions by section; the other codes by clause.
 */
export function citationText(c: Citation): string {
  if (c.standard === "general") return c.clause;
  const word = c.standard.startsWith("AISC") ? "Sect." : "cl.";
  const parts = [`${c.standard} ${word} ${c.clause}`];
  if (c.table) parts.push(c.table);
  if (c.equation) parts.push(`Eq. ${c.equation}`);
  return parts.join(", ") + (c.also && c.also.length > 0 ? `; with ${c.also.join("; ")}` : "");
}
