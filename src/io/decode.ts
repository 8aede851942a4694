/**
 * The bytes of an input file → its text. UTF-8 (with or without a byte-order mark) and UTF-16 with a
 * byte-order mark are decoded; anything else that is not valid UTF-8 is refused in one line rather than
 * read with replacement characters. No file access here: the CLI reads the bytes.
 */
import { InputError } from "./yaml.js";

/** Decode with a byte-order mark's encoding, else strict UTF-8; `file` names the file in the error. */
export function decodeText(bytes: Uint8Array, file: string): string {
  const [a, b, c] = bytes;
  let encoding = "utf-8";
  let skip = 0;
  if (a === 0xef && b === 0xbb && c === 0xbf) skip = 3;
  else if (a === 0xff && b === 0xfe) [encoding, skip] = ["utf-16le", 2];
  else if (a === 0xfe && b === 0xff) [encoding, skip] = ["utf-16be", 2];
  const nul = encoding === "utf-8" ? bytes.indexOf(0) : -1;
  if (nul >= 0) throw new InputError(file, `holds a NUL byte at offset ${nul} (a binary file, or UTF-16 text without a byte-order mark?): save it as UTF-8 text`);
  try {
    return new TextDecoder(encoding, { fatal: true, ignoreBOM: true }).decode(bytes.subarray(skip));
  } catch {
    const at = encoding === "utf-8" ? firstInvalidUtf8(bytes, skip) : -1;
    throw new InputError(file, `is not ${encoding === "utf-8" ? "UTF-8" : encoding.toUpperCase()} text${at >= 0 ? ` (an invalid byte 0x${bytes[at]!.toString(16).padStart(2, "0")} at offset ${at})` : ""}: save it as UTF-8`);
  }
}

/**
 * Offset of the first byte that starts no well-formed UTF-8 sequence (lead byte and continuation bytes
 * only; overlong forms and surrogates are left to the decoder), or -1. For the message only.
 */
function firstInvalidUtf8(bytes: Uint8Array, from: number): number {
  let i = from;
  while (i < bytes.length) {
    const b = bytes[i]!;
    const follow = b < 0x80 ? 0 : b >= 0xc2 && b <= 0xdf ? 1 : b >= 0xe0 && b <= 0xef ? 2 : b >= 0xf0 && b <= 0xf4 ? 3 : -1;
    if (follow < 0) return i;
    for (let k = 1; k <= follow; k++) if (((bytes[i + k] ?? 0) & 0xc0) !== 0x80) return i;
    i += follow + 1;
  }
  return -1;
}
