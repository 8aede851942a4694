/**
 * Boxed terminal tables in linear time. cli-table3 lays out every cell against every earlier row (its
 * conflict check is quadratic in the rows), so a 5 000-splice schedule took seconds to print; this writer
 * draws the same box (cli-table3's characters, its compact style: one padding space each side, a rule
 * under the head only) in one pass. Cells are one line; width counts East Asian wide characters as two.
 */
import { plainLine } from "../text/escape.js";

/** Display width of one line of text: wide and full-width characters 2, combining marks 0, others 1. */
export function displayWidth(text: string): number {
  let w = 0;
  for (const ch of text) {
    const c = ch.codePointAt(0)!;
    if ((c >= 0x0300 && c <= 0x036f) || c === 0x200b || (c >= 0xfe00 && c <= 0xfe0f)) continue;
    const wide =
      (c >= 0x1100 && c <= 0x115f) || (c >= 0x2e80 && c <= 0xa4cf && c !== 0x303f) || (c >= 0xac00 && c <= 0xd7a3) || (c >= 0xf900 && c <= 0xfaff) ||
      (c >= 0xfe30 && c <= 0xfe4f) || (c >= 0xff00 && c <= 0xff60) || (c >= 0xffe0 && c <= 0xffe6) || (c >= 0x1f300 && c <= 0x1f64f) || (c >= 0x1f900 && c <= 0x1f9ff) || (c >= 0x20000 && c <= 0x3fffd);
    w += wide ? 2 : 1;
  }
  return w;
}

/** A table of one-line cells under a head, as text. */
export function boxTable(head: readonly string[], rows: ReadonlyArray<readonly string[]>): string {
  const widths = head.map((h) => displayWidth(h));
  for (const row of rows) row.forEach((cell, i) => (widths[i] = Math.max(widths[i] ?? 0, displayWidth(cell))));
  const rule = (left: string, mid: string, right: string) => left + widths.map((w) => "─".repeat(w + 2)).join(mid) + right;
  const line = (cells: readonly string[]) => "│" + widths.map((w, i) => ` ${cells[i] ?? ""}${" ".repeat(w - displayWidth(cells[i] ?? ""))} `).join("│") + "│";
  const out = [rule("┌", "┬", "┐"), line(head), rule("├", "┼", "┤")];
  for (const row of rows) out.push(line(row));
  out.push(rule("└", "┴", "┘"));
  return out.join("\n");
}

/** A table that collects rows (the part of cli-table3's interface the schedule uses). */
export class BoxTable {
  private readonly rows: string[][] = [];
  constructor(private readonly head: readonly string[]) {}
  /** Add a row; each cell is kept to one line (plainLine). */
  push(row: string[]): void {
    this.rows.push(row.map(plainLine));
  }
  toString(): string {
    return boxTable(this.head, this.rows);
  }
}
