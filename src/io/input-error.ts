/**
 * The one error type for bad input, in a module of its own so that the command line's option parsers
 * can throw it without loading the YAML reader.
 */

/** Bad input: the field path and the reason. Printed as one line, exit code 2. */
export class InputError extends Error {
  constructor(
    readonly path: string,
    readonly reason: string,
  ) {
    super(path ? `${path}: ${reason}` : reason);
  }
}
