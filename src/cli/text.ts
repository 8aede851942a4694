/**
 * Text that fits a terminal: the output width and word wrapping with a hanging indent. No line this
 * module returns is wider than the width it is given (escape codes of colour do not count).
 */

/** Narrowest width the sheets are laid out for. */
export const MIN_WIDTH = 80;
/** Width when the output is not a terminal (a pipe or a file). */
export const PIPED_WIDTH = 100;

/** The width to lay out for: the terminal's columns (at least 80), or 100 when piped; `override` wins. */
export function outputWidth(stream: { isTTY?: boolean; columns?: number }, override?: number): number {
  if (override !== undefined) return override;
  if (stream.isTTY === true && typeof stream.columns === "number" && stream.columns > 0) return Math.max(MIN_WIDTH, stream.columns);
  return PIPED_WIDTH;
}

// eslint-disable-next-line no-control-regex
const ANSI = /\u001b\[[0-9;]*m/g;

/** Visible length in columns: code points, escape codes left out. */
export function visibleLength(s: string): number {
  return Array.from(s.replace(ANSI, "")).length;
}

/** A unit never starts a line ("40 mm" stays together), nor does a clause number leave its "cl.". */
const UNIT = /^(mm|mm²|kN|kips?|in|MPa|ksi|N|%)[,;:.)]*$/;
const GLUE_NEXT = /(^|\()(cl\.|Sect\.|Eq\.|Table|Tables)$/;

function words(paragraph: string): string[] {
  const out: string[] = [];
  for (const w of paragraph.split(" ")) {
    if (w.length === 0) continue;
    if (out.length > 0 && (UNIT.test(w) || GLUE_NEXT.test(out[out.length - 1]!))) out[out.length - 1] += ` ${w}`;
    else out.push(w);
  }
  return out;
}

/**
 * Wrap `text` to `width` columns. The first line starts with `first` (its length counts), later lines
 * with `rest`; a newline in the text starts a new line. Breaks at spaces; a word longer than a line
 * is cut.
 */
export function wrap(text: string, width: number, first = "", rest = first): string[] {
  const out: string[] = [];
  let prefix = first;
  for (const paragraph of text.split("\n")) {
    let line = prefix;
    let hasWord = false;
    for (const word of words(paragraph)) {
      if (hasWord && visibleLength(line) + 1 + visibleLength(word) <= width) {
        line += ` ${word}`;
        continue;
      }
      if (hasWord) {
        out.push(line);
        line = rest;
      }
      let chars = Array.from(word);
      while (visibleLength(line) + visibleLength(chars.join("")) > width) {
        const room = Math.max(1, width - visibleLength(line));
        out.push(line + chars.slice(0, room).join(""));
        chars = chars.slice(room);
        line = rest;
      }
      line += chars.join("");
      hasWord = true;
    }
    out.push(line.replace(/ +$/, ""));
    prefix = rest;
  }
  return out;
}

/** Lay rows out in columns separated by two spaces; null when they do not fit the width. */
export function columns(rows: string[][], width: number, gap = 2): string[] | null {
  const n = Math.max(...rows.map((r) => r.length));
  const widths = Array.from({ length: n }, (_, i) => Math.max(...rows.map((r) => visibleLength(r[i] ?? ""))));
  const total = widths.reduce((a, b) => a + b, 0) + gap * (n - 1);
  if (total > width) return null;
  return rows.map((r) =>
    r
      .map((cell, i) => (i === r.length - 1 ? cell : cell + " ".repeat(widths[i]! - visibleLength(cell) + gap)))
      .join("")
      .replace(/ +$/, ""),
  );
}

/** What the strength utilisation divides, in words: tension alone, or the worse sense under compression or reversal. */
export function strengthUtilisationWords(load: { factoredCompression_N?: number }): string {
  return load.factoredCompression_N === undefined
    ? "factored tension / joint design strength"
    : "the highest demand/resistance of either sense of the load (tension and compression checked separately)";
}

/**
 * Lines of a plain-text output laid out for `width`: table lines (box drawing) kept as they are, any
 * other line longer than the width wrapped with a hanging indent under its label ("Rules:    …") or
 * two spaces past its own indent.
 */
export function wrapProse(lines: readonly string[], width: number): string[] {
  const out: string[] = [];
  for (const line of lines.flatMap((l) => l.split("\n"))) {
    if (visibleLength(line) <= width || /^[┌│├└╔║╟╚]/.test(line)) {
      out.push(line);
      continue;
    }
    const label = /^(\s*)([A-Za-z][\w ]*:\s+)?/.exec(line)!;
    const prefix = label[0];
    const rest = label[2] ? " ".repeat(visibleLength(prefix)) : `${label[1]}  `;
    out.push(...wrap(line.slice(prefix.length), width, prefix, rest));
  }
  return out;
}
