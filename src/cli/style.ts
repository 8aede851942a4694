/**
 * Emphasis on the terminal: FAIL, PASS, the verdict and warnings stand out. Colour only when the
 * output stream is a terminal and NO_COLOR is unset or empty (no-color.org); piped output and files
 * stay plain text. Uses Node's own util.styleText (Node 20.12+), no library.
 */
import { styleText } from "node:util";

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

/** The style for a stream; the decision is taken here, so styleText is told not to take it again. */
export function styleFor(stream: { isTTY?: boolean }, env: Record<string, string | undefined> = process.env): Style {
  if (!wantsColour(stream, env)) return plain;
  const opts = { validateStream: false };
  return {
    pass: (s) => styleText(["bold", "green"], s, opts),
    fail: (s) => styleText(["bold", "red"], s, opts),
    warn: (s) => styleText(["bold", "yellow"], s, opts),
    strong: (s) => styleText("bold", s, opts),
    colour: true,
  };
}

export const PLAIN_STYLE: Style = plain;
