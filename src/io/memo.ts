/**
 * A value built on its first use and kept. The file schemas are built this way: a command builds only
 * the schemas of the files it reads, not every schema of every module it loads.
 */
export function memo<T>(build: () => T): () => T {
  let value: { built: T } | undefined;
  return () => (value ??= { built: build() }).built;
}
