/**
 * Least net width of a plate over every straight and zig-zag path through its holes.
 *
 * Net width of a path = b − Σ d0 + Σ s²/(4g)   (IS 800:2007 cl. 6.3.1; the same form in
 * EN 1993-1-1 6.2.2.2 and AISC 360-16 B4.3b), where each leg between two holes has gauge g (across)
 * and stagger s (along). A path runs from one side edge to the other and rises monotonically in y.
 *
 * Written leg by leg, net width = Σ legs (g + s²/4g) − Σ holes d0, with straight transverse legs from
 * the edges. With holes sorted by y that is a shortest path in a directed acyclic graph, solved exactly
 * by dynamic programming over every pair of holes — no list of "likely" paths.
 */
import type { Hole } from "../model/joint.js";
import { LINE_TOLERANCE_MM } from "./lines.js";

export interface NetPath {
  /** Holes on the path, from the lower edge (y = −b/2) to the upper. */
  holes: Hole[];
  netWidth_mm: number;
  grossWidth_mm: number;
  /** Σ d0 of the holes on the path, mm. */
  holeDeduction_mm: number;
  /** Σ s²/4g over the inclined legs, mm. */
  staggerAddition_mm: number;
}

/** Cost of a leg from hole a to hole b (b higher in y): g + s²/(4g). */
function legCost(a: Hole, b: Hole): number {
  const g = b.y_mm - a.y_mm;
  const s = b.x_mm - a.x_mm;
  return g + (s * s) / (4 * g);
}

/**
 * The path of least net width across a plate of width b centred on y = 0.
 * `holes` are the plate's holes; an optional filter limits which holes a path may pass through.
 */
export function leastNetPath(holes: readonly Hole[], width_mm: number): NetPath {
  const half = width_mm / 2;
  const sorted = [...holes].sort((a, b) => a.y_mm - b.y_mm || a.x_mm - b.x_mm);
  const n = sorted.length;
  const best = new Float64Array(n);
  const previous = new Int32Array(n).fill(-1);
  for (let j = 0; j < n; j++) {
    const hj = sorted[j]!;
    let cost = hj.y_mm + half; // straight leg from the lower edge
    let from = -1;
    for (let i = 0; i < j; i++) {
      const hi = sorted[i]!;
      if (hj.y_mm - hi.y_mm <= LINE_TOLERANCE_MM) continue; // same gauge line: no leg
      const c = best[i]! + legCost(hi, hj);
      if (c < cost - 1e-12) {
        cost = c;
        from = i;
      }
    }
    best[j] = cost - hj.across_mm;
    previous[j] = from;
  }
  let bestWidth = width_mm;
  let last = -1;
  for (let j = 0; j < n; j++) {
    const w = best[j]! + (half - sorted[j]!.y_mm);
    if (w < bestWidth - 1e-12) {
      bestWidth = w;
      last = j;
    }
  }
  const path: Hole[] = [];
  for (let k = last; k >= 0; k = previous[k]!) path.unshift(sorted[k]!);
  return describePath(path, width_mm);
}

/** Net width of a given path (holes in order of rising y). */
export function describePath(path: readonly Hole[], width_mm: number): NetPath {
  let deduction = 0;
  let stagger = 0;
  for (let k = 0; k < path.length; k++) {
    const h = path[k]!;
    deduction += h.across_mm;
    const prev = path[k - 1];
    if (prev) {
      const g = h.y_mm - prev.y_mm;
      const s = h.x_mm - prev.x_mm;
      stagger += (s * s) / (4 * g);
    }
  }
  return {
    holes: [...path],
    netWidth_mm: width_mm - deduction + stagger,
    grossWidth_mm: width_mm,
    holeDeduction_mm: deduction,
    staggerAddition_mm: stagger,
  };
}
