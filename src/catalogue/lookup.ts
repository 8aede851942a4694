/**
 * Lookups of user text in the catalogue's tables. A plain object also answers for the names it inherits
 * (`constructor`, `toString`, `__proto__`), so every lookup of a grade, unit, code or size typed by a user
 * goes through `ownEntry`, which sees the table's own entries only. Pure.
 */

/** The table's own entry for `key`, or undefined (inherited names are not entries). */
export function ownEntry<V>(table: Readonly<Record<string, V>>, key: string): V | undefined {
  return Object.hasOwn(table, key) ? table[key] : undefined;
}
