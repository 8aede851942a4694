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
import type { Hole, PlateConnection, PlatePiece } from "../model/joint.js";
import { sameEnd } from "./joint-builder.js";
import { LINE_TOLERANCE_MM, sortedByYThenX } from "./lines.js";

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

/** Limits on the paths searched: which holes a path may use, and tags it must collect. */
export interface PathFilter {
  /** Holes a path may pass through (default: all). */
  allowed?: (h: Hole) => boolean;
  /** Bit tags of a hole; a path collects the OR of its holes' tags (default 0). */
  tag?: (h: Hole) => number;
  /** Tags a path must have collected to count (default 0: any path, the hole-free one included). */
  required?: number;
}

/**
 * The path of least net width across a plate of width b centred on y = 0, over every path through
 * the plate's holes; optionally only paths through allowed holes that collect the required tags.
 * Returns null when no path meets the filter.
 */
export function leastNetPath(holes: readonly Hole[], width_mm: number): NetPath;
export function leastNetPath(holes: readonly Hole[], width_mm: number, filter: PathFilter): NetPath | null;
export function leastNetPath(holes: readonly Hole[], width_mm: number, filter: PathFilter = NO_FILTER): NetPath | null {
  const half = width_mm / 2;
  const allowed = filter.allowed;
  const sorted = sortedByYThenX(allowed ? holes.filter(allowed) : holes);
  const tagOf = filter.tag;
  const required = filter.required ?? 0;
  const masks = required === 0 && !tagOf ? 1 : 4;
  const n = sorted.length;
  // The filter's functions are all called here, before the walk writes the module's lists.
  const tags: number[] | null = masks === 1 ? null : [];
  if (tags) for (const h of sorted) tags.push(tagOf ? tagOf(h) & 3 : 0);
  // best[j * masks + m]: least partial width from the lower edge to hole j having collected tags m.
  // Lists of this module, written afresh for each path (a search makes thousands of paths).
  const best = bestScratch;
  const previous = previousScratch;
  for (let k = 0; k < n * masks; k++) {
    best[k] = Infinity;
    previous[k] = -1;
  }
  for (let j = 0; j < n; j++) {
    const hj = sorted[j]!;
    const tj = tags ? tags[j]! : 0;
    const fromEdge = hj.y_mm + half - hj.across_mm;
    if (fromEdge < best[j * masks + tj]!) best[j * masks + tj] = fromEdge;
    for (let i = 0; i < j; i++) {
      const hi = sorted[i]!;
      if (hj.y_mm - hi.y_mm <= LINE_TOLERANCE_MM) continue; // same gauge line: no leg
      const leg = legCost(hi, hj) - hj.across_mm;
      for (let m = 0; m < masks; m++) {
        const c = best[i * masks + m]!;
        if (c === Infinity) continue;
        const to = j * masks + (m | tj);
        if (c + leg < best[to]! - 1e-12) {
          best[to] = c + leg;
          previous[to] = i * masks + m;
        }
      }
    }
  }
  let bestWidth = required === 0 ? width_mm : Infinity;
  let last = -1;
  for (let j = 0; j < n; j++) {
    for (let m = 0; m < masks; m++) {
      if ((m & required) !== required) continue;
      const w = best[j * masks + m]! + (half - sorted[j]!.y_mm);
      if (w < bestWidth - 1e-12) {
        bestWidth = w;
        last = j * masks + m;
      }
    }
  }
  if (bestWidth === Infinity) return null;
  // The path's holes, from the upper end back to the lower edge, then turned to rising y.
  const path: Hole[] = [];
  for (let k = last; k >= 0; k = previous[k]!) path.push(sorted[Math.floor(k / masks)]!);
  path.reverse();
  return netPathOf(path, width_mm);
}

/** No limits on the paths searched. */
const NO_FILTER: PathFilter = Object.freeze({});

/*
 * Plain arrays, not typed ones: a typed array of more than 64 bytes gets a backing store outside the
 * heap. Kept by this module and overwritten by each leastNetPath (never read before written there).
 */
const bestScratch: number[] = [];
const previousScratch: number[] = [];

/** Net width of a given path (holes in order of rising y). */
export function describePath(path: readonly Hole[], width_mm: number): NetPath {
  return netPathOf([...path], width_mm);
}

/** Net width of a path (holes in order of rising y), keeping the list it is given. */
function netPathOf(path: Hole[], width_mm: number): NetPath {
  let deduction = 0;
  let stagger = 0;
  for (let k = 0; k < path.length; k++) {
    const h = path[k]!;
    deduction += h.across_mm;
    if (k > 0) {
      const prev = path[k - 1]!;
      const g = h.y_mm - prev.y_mm;
      const s = h.x_mm - prev.x_mm;
      stagger += (s * s) / (4 * g);
    }
  }
  return {
    holes: path,
    netWidth_mm: width_mm - deduction + stagger,
    grossWidth_mm: width_mm,
    holeDeduction_mm: deduction,
    staggerAddition_mm: stagger,
  };
}

/**
 * The governing net path when load already handed to bolts is discounted.
 * A hole's level k/n counts the bolts of its group at or nearer the plate end the group bears toward
 * (the load comes from the far side); a path carries its plate force times the highest level among
 * its holes (its most loaded line). For each level, the least path whose holes stay at or below that
 * level and reach it; the governing one has the highest level/width. In a cover plate a path that
 * mixes holes of both groups crosses the butt and carries the whole cover force.
 */
export function governingNetPath(plate: PlatePiece, holes: readonly Hole[]): { path: NetPath; fraction: number } {
  const width = plate.spec.width_mm;
  const level = new Map<Hole, number>();
  for (const c of plate.connections) {
    const own = holes.filter((h) => h.group === c.group);
    const u = (h: Hole) => c.towardEnd * (c.endX_mm - h.x_mm);
    for (const h of own) level.set(h, own.filter((k) => u(k) <= u(h) + 1e-9).length / own.length);
  }
  let best: { path: NetPath; fraction: number } = { path: leastNetPath([], width), fraction: 1 };
  const consider = (path: NetPath | null, fraction: number) => {
    if (path && fraction / path.netWidth_mm > best.fraction / best.path.netWidth_mm + 1e-15) best = { path, fraction };
  };
  for (const c of plate.connections) {
    const own = holes.filter((h) => h.group === c.group);
    for (const lv of [...new Set(own.map((h) => level.get(h)!))]) {
      consider(leastNetPath(own, width, { allowed: (h) => level.get(h)! <= lv + 1e-12, tag: (h) => (Math.abs(level.get(h)! - lv) <= 1e-12 ? 1 : 0), required: 1 }), lv);
    }
  }
  if (plate.connections.length === 2) {
    const [a, b] = plate.connections;
    consider(leastNetPath(holes, width, { tag: (h) => (h.group === a!.group ? 1 : h.group === b!.group ? 2 : 0), required: 3 }), 1);
  }
  return best;
}

/** One governing net path and what it was measured from. */
interface MeasuredPath {
  holes: readonly Hole[];
  width_mm: number;
  load: "full" | "transferred";
  /** The plate's connections (group and end): read by the "transferred" path only. */
  connections: readonly PlateConnection[];
  answer: { path: NetPath; fraction: number };
}

/** The last few net paths measured (newest last): enough for the plates of one joint. */
const recentPaths: MeasuredPath[] = [];
const RECENT_PATHS = 4;

const sameEnds = (a: readonly PlateConnection[], b: readonly PlateConnection[]): boolean =>
  a.length === b.length && a.every((c, i) => sameEnd(c, b[i]!));

/**
 * The net path a check uses: the least path with the whole plate force ("full", the clauses as
 * written), or the governing path with load already transferred ("transferred"). Plates of the same
 * width with the same holes (the same array from the joint builder) — both cover plates of a butt
 * splice, both plates of a lap — have the same path, so it is measured once and handed again to the
 * next plate that asks ("transferred" also needs the same groups and ends). The answer is only read.
 */
export function netPathFor(plate: PlatePiece, holes: readonly Hole[], load: "full" | "transferred"): { path: NetPath; fraction: number } {
  const width_mm = plate.spec.width_mm;
  for (const m of recentPaths) {
    if (m.holes === holes && m.width_mm === width_mm && m.load === load && (load === "full" || sameEnds(m.connections, plate.connections))) return m.answer;
  }
  const answer = load === "transferred" ? governingNetPath(plate, holes) : { path: leastNetPath(holes, width_mm), fraction: 1 };
  recentPaths.push({ holes, width_mm, load, connections: plate.connections, answer });
  if (recentPaths.length > RECENT_PATHS) recentPaths.shift();
  return answer;
}

/** The holes of a path as the sheet names them: "holes A1–A4–A2", or "no hole". */
export function pathLabel(path: NetPath): string {
  return path.holes.length === 0 ? "no hole" : `holes ${path.holes.map((h) => h.id).join("–")}`;
}
