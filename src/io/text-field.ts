/**
 * Free-text fields of the input files (names, ids, marks, descriptions, currency): plain text only.
 * A control character, a bidirectional control or a lone surrogate is refused with its position, so
 * that no name can carry an escape sequence or a line break into a sheet, a drawing or a DXF file (the
 * writers escape such text as well: src/text/escape.ts).
 */
import { z } from "zod";
import { forbiddenCharacter } from "../text/escape.js";

/** The reason a free-text value is refused, or null. Descriptions may hold line breaks and tabs. */
export function freeTextProblem(text: string, lines: boolean): string | null {
  const probe = lines ? text.replace(/\r\n|[\r\n\t]/g, " ") : text;
  const bad = forbiddenCharacter(probe);
  if (!bad) return null;
  return `holds a control character (${bad.code} at position ${bad.index + 1}): ${lines ? "plain text" : "one line of plain text"} only`;
}

/** A zod string of plain text: one line, or (with `lines`) line breaks and tabs allowed. */
export function freeText(opts: { lines?: boolean } = {}) {
  return z.string().superRefine((text, ctx) => {
    const problem = freeTextProblem(text, opts.lines ?? false);
    if (problem) ctx.addIssue({ code: "custom", message: problem });
  });
}
