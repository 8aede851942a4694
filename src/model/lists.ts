/**
 * Lists for the checker's hot paths.
 */

/**
 * `xs` mapped by `f`, into a list built by push. The lists the checker's functions read are made this
 * way, not by Array.prototype.map: the built-in map makes a holey array where the optimised one makes a
 * packed one, and every function that had read the first kind is thrown out when the second arrives (a
 * round of deoptimisations in the first thousand checks of a process, and again when a search starts).
 */
export function mapped<T, U>(xs: readonly T[], f: (x: T, index: number) => U): U[] {
  const out: U[] = [];
  for (let i = 0; i < xs.length; i++) out.push(f(xs[i]!, i));
  return out;
}

/** Appends each of `more` to `list`, in order (no spread into the arguments of push). */
export function pushAll<T>(list: T[], more: readonly T[]): void {
  for (let i = 0; i < more.length; i++) list.push(more[i]!);
}
