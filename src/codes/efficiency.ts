/**
 * The denominator of efficiency: the design tension strength of the unperforated plate, on the basis
 * the scenario chooses (options.efficiency_basis). Offices and textbooks define it three ways: by
 * gross yield, by rupture of the unperforated section (An = Ag), or by the lesser of the two.
 */
import type { EfficiencyBasis } from "../model/scenario.js";

/** One code's two strengths of an unperforated plate, each with its formula in symbols and numbers. */
export interface UnperforatedTerms {
  yield_N: number;
  rupture_N: number;
  /** e.g. "Ag·fy/γm0" and "200 × 12 × 250/1.1" (the numbers written only when the definition is read). */
  yieldSymbols: string;
  yieldNumbers: () => string;
  ruptureSymbols: string;
  ruptureNumbers: () => string;
  /** The value taken for "lesser" when the code defines it otherwise (EN 1993-1-8 Category C). */
  lesser?: { value_N: number; text: () => string };
}

/** The basis of efficiency in words, as every output names it. */
export const BASIS_WORDS: Record<EfficiencyBasis, string> = {
  lesser: "the lesser of gross yield and rupture",
  rupture: "rupture",
  yield: "gross yield",
};

/** The unperforated strength and its definition in words, written on first read. */
class Unperforated {
  #definition: (() => string) | string;
  constructor(
    readonly value_N: number,
    definition: () => string,
  ) {
    this.#definition = definition;
  }
  get definition(): string {
    if (typeof this.#definition === "function") this.#definition = this.#definition();
    return this.#definition;
  }
}

/** The unperforated strength's value on a basis: gross yield, rupture, or the lesser (the code's own lesser where it defines one). */
export function valueOnBasis(terms: Pick<UnperforatedTerms, "yield_N" | "rupture_N" | "lesser">, basis: EfficiencyBasis): number {
  if (basis === "yield") return terms.yield_N;
  if (basis === "rupture") return terms.rupture_N;
  return terms.lesser ? terms.lesser.value_N : Math.min(terms.yield_N, terms.rupture_N);
}

/**
 * The unperforated strength on a basis, with the definition every output prints beside efficiency
 * (the words are written only when read; the value never depends on them).
 * @param force formats a force in the output's units
 */
export function unperforatedOnBasis(terms: UnperforatedTerms, basis: EfficiencyBasis, force: (n: number) => string): { value_N: number; definition: string } {
  const head = () => `efficiency = joint design strength / design tension strength of the unperforated thinner main plate, basis: ${BASIS_WORDS[basis]} (options.efficiency_basis: ${basis}) = `;
  const value = valueOnBasis(terms, basis);
  if (basis === "yield") return new Unperforated(value, () => `${head()}${terms.yieldSymbols} = ${terms.yieldNumbers()} = ${force(value)}`);
  if (basis === "rupture") return new Unperforated(value, () => `${head()}${terms.ruptureSymbols} = ${terms.ruptureNumbers()} = ${force(value)}`);
  const lesser = terms.lesser;
  if (lesser) return new Unperforated(value, () => `${head()}${lesser.text()} = ${force(value)}`);
  return new Unperforated(value, () => `${head()}min(${terms.yieldSymbols}, ${terms.ruptureSymbols}) = min(${terms.yieldNumbers()}, ${terms.ruptureNumbers()}) = ${force(value)}`);
}
