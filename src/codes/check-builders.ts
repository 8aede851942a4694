/**
 * Builders of check results shared by every design-code module: the utilisation, the pass verdict and
 * the lazily written text (a search runs thousands of checks and prints a few; the figures are the same
 * either way).
 */
import { withLazyText, type RuleCheck, type StrengthCheck } from "../model/results.js";
import { utilisation } from "./format.js";

/**
 * A strength check result. The substituted-values text and the notes are written only when read, from
 * the same numbers.
 */
export function strength(
  partial: Omit<StrengthCheck, "type" | "utilisation" | "pass" | "notes" | "substituted"> & { substituted: () => string; notes?: () => string[] },
): StrengthCheck {
  const { substituted, notes, ...numbers } = partial;
  const u = utilisation(numbers.demand_N, numbers.resistance_N);
  return withLazyText({ type: "strength", ...numbers, utilisation: u, pass: u <= 1 + 1e-9 }, substituted, notes ?? (() => []));
}

/** A rule check result: a measured length against a limit, with the bound saying which way it binds. */
export function rule(r: Omit<RuleCheck, "type" | "utilisation" | "pass" | "notes" | "substituted"> & { substituted: () => string }): RuleCheck {
  const { substituted, ...numbers } = r;
  const u = r.bound === "max" ? r.value_mm / r.limit_mm : r.value_mm > 0 ? r.limit_mm / r.value_mm : Infinity;
  const pass = r.bound === "max" ? r.value_mm <= r.limit_mm + 1e-9 : r.value_mm >= r.limit_mm - 1e-9;
  return withLazyText({ type: "rule" as const, ...numbers, utilisation: u, pass }, substituted, () => []);
}
