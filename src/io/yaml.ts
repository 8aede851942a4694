/**
 * YAML text → plain value, and the one error type for bad input.
 */
import { parseDocument } from "yaml";

/** Bad input: the field path and the reason. Printed as one line, exit code 2. */
export class InputError extends Error {
  constructor(
    readonly path: string,
    readonly reason: string,
  ) {
    super(path ? `${path}: ${reason}` : reason);
  }
}

/** Largest scenario file accepted, bytes. */
export const MAX_FILE_BYTES = 1_000_000;

/** Parse YAML text into a plain value, rejecting syntax errors, duplicate keys and alias bombs. */
export function parseYaml(text: string): unknown {
  if (text.length > MAX_FILE_BYTES) throw new InputError("", `file is larger than ${MAX_FILE_BYTES} bytes`);
  const doc = parseDocument(text, { uniqueKeys: true, prettyErrors: true, strict: true });
  const err = doc.errors[0];
  if (err) {
    const line = err.linePos?.[0];
    const where = line ? `line ${line.line}, column ${line.col}` : "YAML";
    const reason = err.message.split("\n")[0]!.replace(/ at line \d+, column \d+:?$/, "");
    throw new InputError(where, `YAML syntax error: ${reason}`);
  }
  try {
    return doc.toJS({ maxAliasCount: 100 });
  } catch (e) {
    throw new InputError("", `YAML could not be read: ${e instanceof Error ? e.message.split("\n")[0] : String(e)}`);
  }
}

