/**
 * Emphasis on the terminal: FAIL, PASS, the verdict and warnings stand out. Colour only when the
 * output stream is a terminal and NO_COLOR is unset or empty (no-color.org); piped output and files
 * stay plain text. Plain SGR codes (bold, green, red, yellow), written by the terminal shell; no library.
 */

export interface Style {
  pass(text: string): string;
  fail(text: string): string;
  warn(text: string): string;
  strong(text: string): string;
  /** Whether the style adds escape codes. */
  readonly colour: boolean;
}

const plain: Style = { pass: (s) => s, fail: (s) => s, warn: (s) => s, strong: (s) => s, colour: false };

/** Whether to colour output written to `stream`. */
export function wantsColour(stream: { isTTY?: boolean }, env: Record<string, string | undefined> = process.env): boolean {
  return stream.isTTY === true && !(env.NO_COLOR !== undefined && env.NO_COLOR !== "");
}

/**
 * Emphasis marks: private-use characters that stand for the SGR codes until the terminal shell
 * (output.ts) has made every control character of the text itself visible; then they become colour.
 * Kept apart from the text so that a name holding an escape sequence can never colour the terminal.
 */
const MARKS: Record<string, string> = {
  "\uF8F1": "\u001b[1m\u001b[32m", // bold green
  "\uF8F2": "\u001b[1m\u001b[31m", // bold red
  "\uF8F3": "\u001b[1m\u001b[33m", // bold yellow
  "\uF8F4": "\u001b[1m", // bold
  "\uF8F0": "\u001b[39m\u001b[22m", // back to plain
};
const MARK = /[\uF8F0-\uF8F4]/g;
const mark = (open: string) => (s: string) => `${open}${s}\uF8F0`;

/** Output text with the emphasis marks turned into SGR codes. */
export function styleMarksToAnsi(text: string): string {
  return text.replace(MARK, (m) => MARKS[m] ?? "");
}

/** Output text with the emphasis marks removed (plain streams). */
export function stripStyleMarks(text: string): string {
  return text.replace(MARK, "");
}

/** The style for a stream: marks when the stream is a terminal that wants colour, plain text otherwise. */
export function styleFor(stream: { isTTY?: boolean }, env: Record<string, string | undefined> = process.env): Style {
  if (!wantsColour(stream, env)) return plain;
  return { pass: mark("\uF8F1"), fail: mark("\uF8F2"), warn: mark("\uF8F3"), strong: mark("\uF8F4"), colour: true };
}

export const PLAIN_STYLE: Style = plain;
