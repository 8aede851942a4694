/**
 * Ranking of layouts. Keys compare lexicographically: numbers first, then a fixed text order.
 *   cost:       cost, bolts, −efficiency, then the fixed order
 *   bolts:      bolts, cost, −efficiency, then the fixed order
 *   efficiency: −efficiency, bolts, cost, then the fixed order
 *   length:     splice length, bolts, −efficiency, cost, then the fixed order
 * The fixed order: size, class, pattern, counts, pitch, gauge, end distance, end distance at the butt,
 * cover thickness.
 */
export type RankBy = "cost" | "bolts" | "efficiency" | "length";
export const RANK_BY: readonly RankBy[] = ["cost", "bolts", "efficiency", "length"];

export interface Key {
  numbers: number[];
  text: string;
}

export interface Measures {
  cost: number;
  bolts: number;
  efficiency: number;
  length_mm: number;
}

/** Keys are rounded so that the same value computed two ways compares equal. */
const r = (v: number) => (Number.isFinite(v) ? Math.round(v * 1e6) / 1e6 : v);

/** The numbers of a key, rounded in place (the array is the key's own). */
function rounded(numbers: number[]): number[] {
  for (let i = 0; i < numbers.length; i++) numbers[i] = r(numbers[i]!);
  return numbers;
}

/**
 * The key of a checked layout. `text` (the fixed order) is written on first read: the heap reads it only
 * when the numbers tie, and the output for the layouts reported.
 */
export function rankKey(rankBy: RankBy, m: Measures, text: () => string): Key {
  const numbers =
    rankBy === "cost"
      ? [m.cost, m.bolts, -m.efficiency]
      : rankBy === "bolts"
        ? [m.bolts, m.cost, -m.efficiency]
        : rankBy === "efficiency"
          ? [-m.efficiency, m.bolts, m.cost]
          : [m.length_mm, m.bolts, -m.efficiency, m.cost];
  return new SearchKey(rounded(numbers), text);
}

/**
 * A key of the search: a checked layout's, its fixed-order text a prototype getter written on first
 * read, or a node's lower bound, its text "" (a class: an object literal with a getter is built on V8's
 * slow path, and a search makes one key per full check; one class for both kinds keeps the heap's
 * comparisons on one object shape).
 */
class SearchKey implements Key {
  #text: (() => string) | string;
  constructor(
    readonly numbers: number[],
    text: (() => string) | string,
  ) {
    this.#text = text;
  }
  get text(): string {
    if (typeof this.#text === "function") this.#text = this.#text();
    return this.#text;
  }
}

/**
 * A lower bound of every key below a search node: known leading measures, then −∞.
 * `known` holds lower bounds of its descendants' values (efficiencyUpper an upper bound). The bolt
 * count of a node is a lower bound of its descendants', and where it is exact the cost follows it.
 */
export function lowerKey(rankBy: RankBy, known: { cost?: number; bolts?: number; efficiencyUpper?: number; length_mm?: number }): Key {
  const lo = -Infinity;
  const c = known.cost ?? lo;
  const b = known.bolts ?? lo;
  const e = known.efficiencyUpper === undefined ? lo : -known.efficiencyUpper;
  const l = known.length_mm ?? lo;
  const numbers =
    rankBy === "cost" ? [c, lo, lo] : rankBy === "bolts" ? [b, known.bolts === undefined ? lo : c, lo] : rankBy === "efficiency" ? [e, b, known.bolts === undefined ? lo : c] : [l, lo, lo, lo];
  return new SearchKey(rounded(numbers), "");
}

export function compareKeys(a: Key, b: Key): number {
  const n = Math.max(a.numbers.length, b.numbers.length);
  for (let i = 0; i < n; i++) {
    const x = a.numbers[i] ?? -Infinity;
    const y = b.numbers[i] ?? -Infinity;
    if (x < y) return -1;
    if (x > y) return 1;
  }
  return a.text < b.text ? -1 : a.text > b.text ? 1 : 0;
}

const pad = (v: number | undefined) => (v === undefined ? "-" : v.toFixed(1).padStart(8, "0"));

/**
 * An arrangement: bolt size and class, pattern, counts across × along — what a detailer chooses
 * between. Its text is the head of the fixed order.
 */
export function arrangementText(size_mm: number, propertyClass: string, pattern: string, counts: readonly number[]): string {
  return [pad(size_mm), propertyClass.padStart(4, "0"), pattern, counts.map((c) => String(c).padStart(2, "0")).join("-")].join("|");
}

/** The fixed order of the remaining fields, as text that sorts the same way. */
export function fixedOrderText(f: { size_mm: number; propertyClass: string; pattern: string; counts: number[]; pitch_mm: number; gauge_mm: number; end_mm: number; endAtButt_mm: number | undefined; coverThickness_mm: number | undefined }): string {
  return [arrangementText(f.size_mm, f.propertyClass, f.pattern, f.counts), pad(f.pitch_mm), pad(f.gauge_mm), pad(f.end_mm), pad(f.endAtButt_mm), pad(f.coverThickness_mm)].join("|");
}
