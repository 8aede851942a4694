/**
 * The error of a search refused for its size, in a module of its own so that the command line can tell
 * it from other errors without loading the search.
 */

/** A search refused for its size: bad input of the field it names (exit 2 in the CLI). */
export class WorkLimitError extends Error {
  constructor(
    readonly path: string,
    readonly reason: string,
    readonly candidates: number,
  ) {
    super(`${path}: ${reason}`);
  }
}
