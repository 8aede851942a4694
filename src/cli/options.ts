/**
 * Numbers given on the command line, each bounded: bad values are one-line input errors (exit 2).
 */
import { availableParallelism } from "node:os";
import { InputError } from "../io/input-error.js";

/** Most layouts `search --top` shows and the deepest `--rank` (search, export, report): 1000. */
export const MAX_TOP = 1000;

/** Longest `--time-limit` of the integer programme: one hour. */
export const MAX_TIME_LIMIT_S = 3600;

/** Largest `--cost-per-type`: 10⁹ cost units (as the project file's cost_per_type). */
export const MAX_AMOUNT = 1_000_000_000;

/** Most worker threads: twice the machine's cores, at least 4, never above 64. */
export function maxWorkers(): number {
  return Math.min(64, Math.max(4, 2 * availableParallelism()));
}

/** A parser of a whole-number option within [min, max]. */
export function wholeNumber(name: string, min: number, max: number | (() => number)) {
  return (v: string): number => {
    const hi = typeof max === "function" ? max() : max;
    if (!/^\d+$/.test(v.trim()) || Number(v) < min || Number(v) > hi) throw new InputError(`--${name}`, `must be a whole number from ${min} to ${hi}, got "${v}"`);
    return Number(v);
  };
}

/** A parser of a non-negative amount within [0, max]. */
export function amount(name: string, max: number) {
  return (v: string): number => {
    const n = Number(v);
    if (v.trim() === "" || !Number.isFinite(n) || n < 0 || n > max) throw new InputError(`--${name}`, `must be a number from 0 to ${max}, got "${v}"`);
    return n;
  };
}

/** `--max-candidates`: the declared space a search may hold, lifted knowingly (work-estimate.ts). */
export const maxCandidatesOption = ["--max-candidates <n>", "search a declared space of up to n candidate layouts (default 10^11; see README, Limits)", wholeNumber("max-candidates", 1, Number.MAX_SAFE_INTEGER)] as const;
