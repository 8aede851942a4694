/**
 * Lines of holes measured from coordinates: gauge lines (along the force, equal y) and
 * transverse lines (across the force, equal x).
 */
import type { Hole } from "../model/joint.js";

/** Coordinates closer than this are the same line, mm. */
export const LINE_TOLERANCE_MM = 1e-6;

export interface Line {
  /** The shared coordinate: y for a gauge line, x for a transverse line. */
  at_mm: number;
  /** Holes on the line, sorted by the other coordinate. */
  holes: Hole[];
}

/*
 * The two kinds of line are written out separately, each with its own plain comparisons: sorting holes
 * is the hottest loop of the rules, and fixed property names keep it fast.
 */

/**
 * The holes sorted by y, then x, stable (equal holes keep their order), by insertion (a joint has tens
 * of holes, where insertion beats the general sort), with the comparison a.y − b.y || a.x − b.x written
 * in place, so that the hottest sort of the rules and the net path calls no function per step.
 */
export function sortedByYThenX(holes: readonly Hole[]): Hole[] {
  const out = holes.slice();
  for (let i = 1; i < out.length; i++) {
    const h = out[i]!;
    let j = i - 1;
    while (j >= 0 && (out[j]!.y_mm - h.y_mm || out[j]!.x_mm - h.x_mm) > 0) {
      out[j + 1] = out[j]!;
      j--;
    }
    out[j + 1] = h;
  }
  return out;
}

/** The holes sorted by x, then y, stable, by insertion: a.x − b.x || a.y − b.y written in place. */
export function sortedByXThenY(holes: readonly Hole[]): Hole[] {
  const out = holes.slice();
  for (let i = 1; i < out.length; i++) {
    const h = out[i]!;
    let j = i - 1;
    while (j >= 0 && (out[j]!.x_mm - h.x_mm || out[j]!.y_mm - h.y_mm) > 0) {
      out[j + 1] = out[j]!;
      j--;
    }
    out[j + 1] = h;
  }
  return out;
}

/** Gauge lines (holes of equal y), sorted by y; each line's holes sorted by x. */
export function gaugeLines(holes: readonly Hole[]): Line[] {
  const sorted = sortedByYThenX(holes);
  const lines: Line[] = [];
  let last: Line | undefined;
  for (const h of sorted) {
    if (last && Math.abs(h.y_mm - last.at_mm) <= LINE_TOLERANCE_MM) last.holes.push(h);
    else {
      last = { at_mm: h.y_mm, holes: [h] };
      lines.push(last);
    }
  }
  // Sorted by y, then x: a line's holes are in x order already unless their y differ within the tolerance.
  for (const line of lines) if (!inOrderOfX(line.holes)) line.holes.sort((a, b) => a.x_mm - b.x_mm);
  return lines;
}

/** Transverse lines (holes of equal x), sorted by x; each line's holes sorted by y. */
export function transverseLines(holes: readonly Hole[]): Line[] {
  const sorted = sortedByXThenY(holes);
  const lines: Line[] = [];
  for (let start = 0; start < sorted.length; ) {
    const end = transverseLineEnd(sorted, start);
    lines.push({ at_mm: sorted[start]!.x_mm, holes: sorted.slice(start, end) });
    start = end;
  }
  // Sorted by x, then y: a line's holes are in y order already unless their x differ within the tolerance.
  for (const line of lines) if (!inOrderOfY(line.holes)) line.holes.sort((a, b) => a.y_mm - b.y_mm);
  return lines;
}

/**
 * End (exclusive) of the transverse line that starts at sorted[start] in holes sorted by x: the holes
 * within the line tolerance of its first hole's x (one definition of a transverse line for every reader).
 */
export function transverseLineEnd(sorted: readonly Hole[], start: number): number {
  if (start >= sorted.length) return start;
  const x = sorted[start]!.x_mm;
  let end = start + 1;
  while (end < sorted.length && Math.abs(sorted[end]!.x_mm - x) <= LINE_TOLERANCE_MM) end++;
  return end;
}

/** Whether holes are in ascending x (then the stable sort by x would leave them as they are). */
function inOrderOfX(holes: readonly Hole[]): boolean {
  for (let k = 1; k < holes.length; k++) if (holes[k - 1]!.x_mm > holes[k]!.x_mm) return false;
  return true;
}

/** Whether holes are in ascending y. */
function inOrderOfY(holes: readonly Hole[]): boolean {
  for (let k = 1; k < holes.length; k++) if (holes[k - 1]!.y_mm > holes[k]!.y_mm) return false;
  return true;
}

/** Centre-to-centre distance of two holes, mm. */
export function distance(a: Hole, b: Hole): number {
  return Math.hypot(a.x_mm - b.x_mm, a.y_mm - b.y_mm);
}

/**
 * Whether two holes are certainly farther apart than s_mm, from the squared distance with a margin far
 * above rounding: a walk for the least distance of many pairs measures `distance` (Math.hypot, slower)
 * only for pairs that might be nearer than the least so far.
 */
export function fartherThan(a: Hole, b: Hole, s_mm: number): boolean {
  const dx = a.x_mm - b.x_mm;
  const dy = a.y_mm - b.y_mm;
  return dx * dx + dy * dy > s_mm * s_mm * (1 + 1e-9);
}

/** Long-joint length: distance between the first and last transverse lines of a group, mm. */
export function jointLength_mm(holes: readonly Hole[]): number {
  if (holes.length === 0) return 0;
  let first = Infinity;
  let last = -Infinity;
  for (const h of holes) {
    first = Math.min(first, h.x_mm);
    last = Math.max(last, h.x_mm);
  }
  return last - first;
}
