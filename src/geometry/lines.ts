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

function groupBy(holes: readonly Hole[], key: (h: Hole) => number, along: (h: Hole) => number): Line[] {
  const sorted = [...holes].sort((a, b) => key(a) - key(b) || along(a) - along(b));
  const lines: Line[] = [];
  for (const h of sorted) {
    const last = lines[lines.length - 1];
    if (last && Math.abs(key(h) - last.at_mm) <= LINE_TOLERANCE_MM) last.holes.push(h);
    else lines.push({ at_mm: key(h), holes: [h] });
  }
  for (const line of lines) line.holes.sort((a, b) => along(a) - along(b));
  return lines;
}

/** Gauge lines (holes of equal y), sorted by y; each line's holes sorted by x. */
export function gaugeLines(holes: readonly Hole[]): Line[] {
  return groupBy(holes, (h) => h.y_mm, (h) => h.x_mm);
}

/** Transverse lines (holes of equal x), sorted by x; each line's holes sorted by y. */
export function transverseLines(holes: readonly Hole[]): Line[] {
  return groupBy(holes, (h) => h.x_mm, (h) => h.y_mm);
}

export function distance(a: Hole, b: Hole): number {
  return Math.hypot(a.x_mm - b.x_mm, a.y_mm - b.y_mm);
}

/** Long-joint length: distance between the first and last transverse lines of a group, mm. */
export function jointLength_mm(holes: readonly Hole[]): number {
  if (holes.length === 0) return 0;
  const xs = holes.map((h) => h.x_mm);
  return Math.max(...xs) - Math.min(...xs);
}
