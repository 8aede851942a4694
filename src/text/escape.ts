/**
 * Text from the user (scenario and project names, ids, marks, descriptions, currency) on its way into
 * an output: one module, used by every writer, so that no name can break the format it is written in.
 * Pure.
 *
 * - terminal: no escape sequence reaches the terminal (ESC, CR, backspace … are shown as symbols);
 * - XML/SVG and HTML: well-formed whatever the text (entities, no character XML 1.0 forbids);
 * - DXF: a group value stays on its one line (a line break would start a new group code);
 * - CSV: quoted per RFC 4180, comment lines kept to one line.
 * JSON needs nothing: JSON.stringify escapes every control character.
 */

/** C0 controls, DEL and C1 controls. */
const CONTROLS = /[\u0000-\u001f\u007f-\u009f]/g;
/** Bidirectional embeddings, overrides, isolates and marks: they reorder what a reader sees. */
const BIDI = /[\u061c\u200e\u200f\u202a-\u202e\u2066-\u2069]/g;
/** Surrogate halves without their partner, and the non-characters U+FFFE and U+FFFF (not XML, not UTF-8 text). */
const UNPAIRED = /[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]|[\ufffe\uffff]/g;

/** The visible stand-in of a control character: its Unicode control picture (␛ for ESC), else U+FFFD. */
export function controlPicture(ch: string): string {
  const code = ch.charCodeAt(0);
  if (code <= 0x1f) return String.fromCharCode(0x2400 + code);
  if (code === 0x7f) return "\u2421";
  return "\ufffd";
}

/** The first character a one-line free-text field must not hold (a control, a bidi control, a lone surrogate), or null. */
export function forbiddenCharacter(text: string): { index: number; code: string } | null {
  for (const pattern of [CONTROLS, BIDI, UNPAIRED]) {
    pattern.lastIndex = 0;
    const m = pattern.exec(text);
    pattern.lastIndex = 0;
    if (m) return { index: m.index, code: `U+${m[0].charCodeAt(0).toString(16).toUpperCase().padStart(4, "0")}` };
  }
  return null;
}

/** One line of plain text: line breaks and tabs become spaces, other controls their pictures, bidi controls and lone surrogates U+FFFD. */
export function plainLine(text: string): string {
  return text
    .replace(/\r\n|[\r\n\t\u2028\u2029]/g, " ")
    .replace(CONTROLS, controlPicture)
    .replace(BIDI, "\ufffd")
    .replace(UNPAIRED, "\ufffd");
}

/** Text for XML (SVG) and HTML character data and attribute values: one line, the five entities escaped. */
export function xmlText(text: string): string {
  return plainLine(text).replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;").replace(/'/g, "&#39;");
}

/**
 * Text for a DXF group value: one line, and the caret written as "^ " (in DXF text "^" followed by a
 * letter stands for a control character; "^ " is a literal caret).
 */
export function dxfText(text: string): string {
  return plainLine(text).replace(/\^/g, "^ ");
}

/**
 * Text for the terminal: every control character except the line break (and tab) made visible, so that
 * no escape sequence, carriage return or backspace in a name can rewrite what the terminal shows.
 */
export function terminalText(text: string): string {
  return text
    .replace(/[\u0000-\u0008\u000b-\u001f\u007f-\u009f]/g, controlPicture)
    .replace(BIDI, "\ufffd")
    .replace(UNPAIRED, "\ufffd");
}

/** A CSV field (RFC 4180): quoted when it holds a comma, quote or line break; controls other than line breaks shown as pictures. */
export function csvField(value: string | number): string {
  const s = typeof value === "number" ? String(value) : value.replace(/[\u0000-\u0009\u000b\u000c\u000e-\u001f\u007f-\u009f]/g, controlPicture).replace(BIDI, "\ufffd").replace(UNPAIRED, "\ufffd");
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}
