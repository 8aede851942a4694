/**
 * The senses of the load a splice carries: tension, compression, or both (a load that reverses).
 * Every strength check's loadRatio is its demand per unit of the reference load: the factored tension
 * when there is one, else the factored compression. Checks of both senses are scaled together, so the
 * joint strength (least resistance / loadRatio) is the reference load at which the worse sense reaches
 * utilisation 1, and reference load / joint strength is the highest utilisation of either sense.
 */
import type { Scenario } from "./scenario.js";

export type LoadSense = "tension" | "compression";

/** The senses present, tension first. */
export function loadSenses(load: Scenario["load"]): LoadSense[] {
  const senses: LoadSense[] = [];
  if (load.factoredTension_N > 0) senses.push("tension");
  if ((load.factoredCompression_N ?? 0) > 0) senses.push("compression");
  return senses;
}

/** The factored force of one sense, N (0 when absent). */
export function factoredOf(load: Scenario["load"], sense: LoadSense): number {
  return sense === "tension" ? load.factoredTension_N : (load.factoredCompression_N ?? 0);
}

/** The reference load that every loadRatio divides by: the factored tension, else the compression, N. */
export function referenceLoad_N(load: Scenario["load"]): number {
  return load.factoredTension_N > 0 ? load.factoredTension_N : (load.factoredCompression_N ?? 0);
}

/** The load in words: "T = 450 kN; service tension 300 kN; C = 380 kN (reversal)". */
export function loadWords(load: Scenario["load"], F: (N: number) => string): string {
  const parts: string[] = [];
  if (load.factoredTension_N > 0) parts.push(`T = ${F(load.factoredTension_N)}${load.serviceTension_N !== undefined ? `; service tension ${F(load.serviceTension_N)}` : ""}`);
  const C = load.factoredCompression_N;
  if (C !== undefined && C > 0) parts.push(`C = ${F(C)}${load.serviceCompression_N !== undefined ? `; service compression ${F(load.serviceCompression_N)}` : ""}`);
  return parts.join("; ") + (parts.length === 2 ? " (load reverses: each check in both senses)" : "");
}

/** The load as a drawing labels it: "T = 620 kN", "C = 500 kN", or "T = 620 kN / C = 500 kN" (reversal). */
export function loadLabel(load: Scenario["load"]): string {
  const kN = (N: number) => `${(N / 1000).toFixed(0)} kN`;
  const parts: string[] = [];
  if (load.factoredTension_N > 0) parts.push(`T = ${kN(load.factoredTension_N)}`);
  if ((load.factoredCompression_N ?? 0) > 0) parts.push(`C = ${kN(load.factoredCompression_N ?? 0)}`);
  return parts.join(" / ");
}

/** The splice by the sense of its load, for titles: "tension splice", "splice in compression", "splice under reversing load". */
export function spliceKindWords(load: Scenario["load"]): string {
  if (load.factoredCompression_N === undefined) return "tension splice";
  return load.factoredTension_N > 0 ? "splice under reversing load" : "splice in compression";
}
