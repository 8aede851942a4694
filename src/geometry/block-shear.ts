/**
 * Block shear (block tearing) shapes of a plate, measured from hole coordinates.
 *
 * Local frame: u = distance from the plate end that the bolts bear toward (u ≥ 0 at the bolts), y across.
 * A block is torn out along shear planes on gauge lines (from the end, u = 0, to the last hole of the block)
 * and tension planes across the force at that last transverse line. Shapes, for a pattern with gauge lines
 * 0 … G−1:
 *   - central block between gauge lines a < b: two shear planes (a and b), tension plane from a to b;
 *   - edge strips on both sides, gauge lines 0 … a and m … G−1 (a < m): shear planes on a and m,
 *     tension planes from each side edge to a and to m;
 *   - one edge strip, gauge lines 0 … a or a … G−1: one shear plane, one tension plane to a side edge;
 *     with every line in it, the one-sided block (shear plane along an outer line, tension plane across
 *     every line to the far edge) — also the block of a single gauge line.
 * A hole whose centre lies inside a plane is deducted whole, one at the plane's end by half (the plane
 * ends at the hole centre). Bolts on a block's boundary lines count as bolts of the block, so the block
 * takes the share (bolts in block / bolts in group) of the plate's force — conservative for those lines —
 * or, by the scenario's choice (options.block_shear_load: full), the whole plate force.
 */
import type { Hole, PlateConnection } from "../model/joint.js";
import { LINE_TOLERANCE_MM } from "./lines.js";

export interface BlockShape {
  description: string;
  /** Shear planes along the force: gross and net length, mm (multiply by t for areas). */
  shearGross_mm: number;
  shearNet_mm: number;
  /** Tension planes across the force: gross and net length, mm. */
  tensionGross_mm: number;
  tensionNet_mm: number;
  boltsInBlock: number;
}

const near = (a: number, b: number) => Math.abs(a - b) <= LINE_TOLERANCE_MM;

/** Weight of a hole on a plane from p0 to p1 (coordinate t along the plane): 1 inside, ½ at an end, 0 off. */
function weight(t: number, p0: number, p1: number): number {
  if (near(t, p0) || near(t, p1)) return 0.5;
  return t > p0 && t < p1 ? 1 : 0;
}

/*
 * The holes of one plate end are read from the flat frame (see localFrame): hole k has u = frame[4k],
 * y = frame[4k + 1], width across = frame[4k + 2] and along = frame[4k + 3]. Its gauge line is
 * lineOf[k]. Holes off a plane add nothing to its deduction, so only the holes on it are summed, in the
 * group's order.
 */

/**
 * Deduction of the holes of gauge line `line` (at y) on its shear plane from u = 0 to u = uLast (net
 * length = uLast − deduction). A hole at u = 0 cannot exist (end distance > 0), so the ½ weight applies
 * only at uLast.
 */
function shearDeduction(frame: readonly number[], lineOf: readonly number[], line: number, y: number, uLast: number): number {
  let deduction = 0;
  for (let k = 0; k < lineOf.length; k++) {
    if (lineOf[k] === line && near(frame[4 * k + 1]!, y)) deduction += weight(frame[4 * k]!, 0, uLast) * frame[4 * k + 3]!;
  }
  return deduction;
}

/**
 * Deduction of the holes on a tension plane across the force at u = uLast, from y0 to y1 (y0 < y1;
 * either may be a plate edge): net length = (y1 − y0) − deduction.
 */
function tensionDeduction(frame: readonly number[], uLast: number, y0: number, y1: number): number {
  let deduction = 0;
  for (let k = 0; k < frame.length; k += 4) if (near(frame[k]!, uLast)) deduction += weight(frame[k + 1]!, y0, y1) * frame[k + 2]!;
  return deduction;
}

/** Which of the shapes above a block is; with the gauge lines it spans, it names the block. */
type BlockForm = "central" | "edge-strips" | "lower-strip" | "upper-strip";

/** The words for a block (written only when a sheet reads them). */
function describeBlock(form: BlockForm, a: number, b: number, G: number): string {
  switch (form) {
    case "central":
      return `central block between gauge lines ${a + 1} and ${b + 1} of ${G}`;
    case "edge-strips":
      return a === 0 ? "edge strips outside the outer gauge lines" : `edge strips, gauge lines 1–${a + 1} and ${b + 1}–${G} of ${G}`;
    case "lower-strip":
      return a === G - 1 ? `one-sided block, shear plane on gauge line ${G} of ${G}, tension plane to the ${G === 1 ? "edge at −y" : "far edge (−y)"}` : `one edge strip, gauge lines 1–${a + 1} of ${G}`;
    case "upper-strip":
      return a === 0 ? `one-sided block, shear plane on gauge line 1 of ${G}, tension plane to the ${G === 1 ? "edge at +y" : "far edge (+y)"}` : `one edge strip, gauge lines ${a + 1}–${G} of ${G}`;
  }
}

/** A block's plane lengths and bolts, with its description written on first read. */
class Block implements BlockShape {
  constructor(
    private readonly form: BlockForm,
    private readonly lineA: number,
    private readonly lineB: number,
    private readonly lineCount: number,
    readonly shearGross_mm: number,
    readonly shearNet_mm: number,
    readonly tensionGross_mm: number,
    readonly tensionNet_mm: number,
    readonly boltsInBlock: number,
  ) {}
  get description(): string {
    return describeBlock(this.form, this.lineA, this.lineB, this.lineCount);
  }
}

/**
 * The gauge lines of a frame, sorted by y (holes within the line tolerance share a line, at the least
 * y of them): each line's y, its bolts and its farthest hole from the plate end; and the line of each
 * hole (`lineOf`, in the group's order).
 */
class BlockGaugeLines {
  readonly y: number[] = [];
  readonly bolts: number[] = [];
  readonly maxU: number[] = [];
  readonly lineOf: number[] = [];
  constructor(frame: readonly number[]) {
    const ys: number[] = [];
    for (let k = 1; k < frame.length; k += 4) ys.push(frame[k]!);
    // Insertion sort: a group has tens of holes.
    for (let i = 1; i < ys.length; i++) {
      const y = ys[i]!;
      let j = i - 1;
      while (j >= 0 && ys[j]! > y) {
        ys[j + 1] = ys[j]!;
        j--;
      }
      ys[j + 1] = y;
    }
    for (const y of ys) {
      if (this.y.length === 0 || !near(this.y[this.y.length - 1]!, y)) {
        this.y.push(y);
        this.bolts.push(0);
        this.maxU.push(-Infinity);
      }
    }
    for (let k = 0; k < frame.length; k += 4) {
      const hy = frame[k + 1]!;
      let line = 0;
      while (line < this.y.length && !(hy >= this.y[line]! - LINE_TOLERANCE_MM && hy <= this.y[line]! + LINE_TOLERANCE_MM)) line++;
      if (line >= this.y.length) throw new RangeError("a hole lies on no gauge line");
      this.lineOf.push(line);
      this.bolts[line]!++;
      this.maxU[line] = Math.max(this.maxU[line]!, frame[k]!);
    }
  }
  /** Bolts on gauge lines lo … hi. */
  boltsOn(lo: number, hi: number): number {
    let bolts = 0;
    for (let k = lo; k <= hi; k++) bolts += this.bolts[k]!;
    return bolts;
  }
  /** The farthest hole of gauge lines lo … hi from the plate end: where the block's tension plane lies. */
  lastU(lo: number, hi: number): number {
    let uLast = -Infinity;
    for (let k = lo; k <= hi; k++) uLast = Math.max(uLast, this.maxU[k]!);
    return uLast;
  }
  /** Net length of the shear plane along gauge line `line` from u = 0 to u = uLast (only that line's holes lie on it). */
  shearNetOn(frame: readonly number[], line: number, uLast: number): number {
    return uLast - shearDeduction(frame, this.lineOf, line, this.y[line]!, uLast);
  }
}

/** One measured set of block shapes and what it was measured from. */
interface MeasuredShapes {
  /** The joint's own hole list (the joint builder's array): an answer is handed on within its joint only. */
  jointHoles: readonly Hole[];
  /** Each hole's u, y, width across and along, in the group's order: everything the shapes depend on. */
  local: readonly number[];
  width_mm: number;
  shapes: readonly BlockShape[];
}

/** The last few shape sets measured (newest last): enough for the plates of one joint. */
const recentShapes: MeasuredShapes[] = [];
const RECENT_SHAPES = 6;

/** The holes in the local frame of one plate end, flat: u, y, across, along of each hole in turn. */
function localFrame(holes: readonly Hole[], connection: PlateConnection): number[] {
  // Built by push, a packed list of numbers (a list made at its length is holey, slower to read).
  const local: number[] = [];
  for (let k = 0; k < holes.length; k++) {
    const h = holes[k]!;
    local.push(connection.towardEnd * (connection.endX_mm - h.x_mm), h.y_mm, h.across_mm, h.along_mm);
  }
  return local;
}

/** Whether the holes seen from this plate end have exactly the numbers of a frame measured before. */
function sameFrame(frame: readonly number[], holes: readonly Hole[], connection: PlateConnection): boolean {
  if (frame.length !== 4 * holes.length) return false;
  for (let k = 0; k < holes.length; k++) {
    const h = holes[k]!;
    if (frame[4 * k] !== connection.towardEnd * (connection.endX_mm - h.x_mm) || frame[4 * k + 1] !== h.y_mm || frame[4 * k + 2] !== h.across_mm || frame[4 * k + 3] !== h.along_mm) return false;
  }
  return true;
}

/**
 * Every block shape that can form in a plate of width b for one bolt group (`holes`) bearing toward one
 * plate end. The shapes depend only on the holes as seen from that end (u, y and hole widths) and the
 * plate width, so within one joint (`jointHoles`: the joint builder's own hole list; default the
 * group's holes) a set is measured once and handed again to the next plate that asks with the same
 * numbers: both cover plates of a butt splice, and the mirror-image groups of its two main plates (and
 * of each cover's two ends). Every joint measures its own (a check never reads an earlier joint's
 * answer). The shapes hold numbers only, never hole names, and are only read.
 */
export function blockShapes(holes: readonly Hole[], connection: PlateConnection, width_mm: number, jointHoles: readonly Hole[] = holes): readonly BlockShape[] {
  for (const m of recentShapes) if (m.jointHoles === jointHoles && m.width_mm === width_mm && sameFrame(m.local, holes, connection)) return m.shapes;
  const local = localFrame(holes, connection);
  const shapes = measureBlockShapes(local, width_mm);
  recentShapes.push({ jointHoles, local, width_mm, shapes });
  if (recentShapes.length > RECENT_SHAPES) recentShapes.shift();
  return shapes;
}

function measureBlockShapes(frame: readonly number[], width_mm: number): BlockShape[] {
  const lines = new BlockGaugeLines(frame);
  const ys = lines.y;
  const G = ys.length;
  const half = width_mm / 2;
  const shapes: BlockShape[] = [];
  // Plane lengths are numbers, not objects: a search measures thousands of shapes. Gross shear planes
  // run from the end (u = 0) to uLast; a tension plane from y0 to y1 is y1 − y0 gross.

  // Central blocks between gauge lines a < b.
  for (let a = 0; a < G; a++) {
    for (let b = a + 1; b < G; b++) {
      const uLast = lines.lastU(a, b);
      const tension = ys[b]! - ys[a]!;
      const tensionNet = tension - tensionDeduction(frame, uLast, ys[a]!, ys[b]!);
      shapes.push(new Block("central", a, b, G, uLast + uLast, lines.shearNetOn(frame, a, uLast) + lines.shearNetOn(frame, b, uLast), tension, tensionNet, lines.boltsOn(a, b)));
    }
  }

  // Edge strips on both sides: lines 0..a and m..G−1 with m = G−1−a, a < m.
  for (let a = 0; a < G; a++) {
    const m = G - 1 - a;
    if (a >= m) break;
    const uLast = Math.max(lines.lastU(0, a), lines.lastU(m, G - 1));
    const low = ys[a]! - -half;
    const high = half - ys[m]!;
    const lowNet = low - tensionDeduction(frame, uLast, -half, ys[a]!);
    const highNet = high - tensionDeduction(frame, uLast, ys[m]!, half);
    const bolts = lines.boltsOn(0, a) + lines.boltsOn(m, G - 1);
    shapes.push(new Block("edge-strips", a, m, G, uLast + uLast, lines.shearNetOn(frame, a, uLast) + lines.shearNetOn(frame, m, uLast), low + high, lowNet + highNet, bolts));
  }

  // One edge strip, bounded by one side edge: lines 0..a with its shear plane on line a and its tension
  // plane from the lower edge, or lines a..G−1 from the upper edge. With a spanning every line it is the
  // one-sided block: the shear plane along one outer line, the tension plane from it across every line
  // to the far edge (for a single gauge line, the shear plane along it and the tension plane to one edge).
  for (let a = 0; a < G; a++) {
    const y = ys[a]!;
    const lowerU = lines.lastU(0, a);
    const lower = y - -half;
    shapes.push(new Block("lower-strip", a, a, G, lowerU, lines.shearNetOn(frame, a, lowerU), lower, lower - tensionDeduction(frame, lowerU, -half, y), lines.boltsOn(0, a)));
    const upperU = lines.lastU(a, G - 1);
    const upper = half - y;
    shapes.push(new Block("upper-strip", a, a, G, upperU, lines.shearNetOn(frame, a, upperU), upper, upper - tensionDeduction(frame, upperU, y, half), lines.boltsOn(a, G - 1)));
  }
  return shapes;
}

/** How much of its plate's force a block carries: k/n of it (equal bolt shares) or all of it. */
export type BlockShearLoad = "share" | "full";

/** The governing block of a plate, with the joint tension it permits. */
export interface GoverningBlock<D> {
  shape: BlockShape;
  /** Block demand per unit joint tension: share·k/n, or share with the full plate force. */
  ratio: number;
  value_N: number;
  /** The joint tension at which this block fails: value / ratio, N. */
  permits_N: number;
  detail: D;
}

/**
 * The governing block of a plate: the shape with the least joint tension at which it fails, when a
 * block holding k of a group's n bolts takes share·k/n of the joint tension (load "share") or the
 * plate's whole force, share·T (load "full"). Null when no shape forms.
 * @param resist the code's design resistance of a shape, N
 * @param detailOf whatever the code's text needs of the governing shape (worked out for it alone)
 */
export function governingBlock<D>(
  shapes: readonly BlockShape[],
  bolts: number,
  share: number,
  load: BlockShearLoad,
  resist: (shape: BlockShape) => number,
  detailOf: (shape: BlockShape) => D,
): GoverningBlock<D> | null {
  let best = -1;
  let bestRatio = 0;
  let bestValue = 0;
  let bestPermits = Infinity;
  for (let i = 0; i < shapes.length; i++) {
    const shape = shapes[i]!;
    const value = resist(shape);
    const ratio = load === "full" ? share : (share * shape.boltsInBlock) / bolts;
    const permits = value / ratio;
    if (best < 0 || permits < bestPermits - 1e-9) {
      best = i;
      bestRatio = ratio;
      bestValue = value;
      bestPermits = permits;
    }
  }
  if (best < 0) return null;
  const shape = shapes[best]!;
  return { shape, ratio: bestRatio, value_N: bestValue, permits_N: bestPermits, detail: detailOf(shape) };
}

/** A code's governing block of a set of shapes in a plate of thickness t with strengths fy, fu (governingBlock with its resistance). */
export type GoverningOf<D> = (shapes: readonly BlockShape[], bolts: number, t_mm: number, fy_MPa: number, fu_MPa: number, share: number, load: BlockShearLoad) => GoverningBlock<D> | null;

/**
 * The governing blocks of one check call, each worked out once: a plate with the same block shapes (the
 * same array from blockShapes), bolt count, t, fy, fu, share and block load as an earlier plate of the
 * call (both covers of a butt splice; the mirror-image main plates) has the same governing block, only
 * read. Made afresh for every check call, never kept between calls.
 */
export class GoverningBlocksOfCall<D> {
  readonly #measured: Array<{ shapes: readonly BlockShape[]; bolts: number; t_mm: number; fy_MPa: number; fu_MPa: number; share: number; load: BlockShearLoad; best: GoverningBlock<D> | null }> = [];
  constructor(private readonly governingOf: GoverningOf<D>) {}
  of(shapes: readonly BlockShape[], bolts: number, t_mm: number, fy_MPa: number, fu_MPa: number, share: number, load: BlockShearLoad): GoverningBlock<D> | null {
    for (const m of this.#measured) {
      if (m.shapes === shapes && m.bolts === bolts && m.t_mm === t_mm && m.fy_MPa === fy_MPa && m.fu_MPa === fu_MPa && m.share === share && m.load === load) return m.best;
    }
    const best = this.governingOf(shapes, bolts, t_mm, fy_MPa, fu_MPa, share, load);
    this.#measured.push({ shapes, bolts, t_mm, fy_MPa, fu_MPa, share, load, best });
    return best;
  }
}

/** The block's share of the load and the joint tension it permits, in words (every code's block text). */
export function blockLoadText(b: GoverningBlock<unknown>, bolts: number, share: number, load: BlockShearLoad, kN: (n: number) => string): string {
  const k = b.shape.boltsInBlock;
  const fraction = load === "full" ? "the whole plate force" : `k/n = ${k}/${bolts} of the plate force`;
  const permits = load === "full" ? `R${share !== 1 ? ` / ${share.toFixed(3)}` : ""}` : `R × n/k${share !== 1 ? ` / ${share.toFixed(3)}` : ""} = R × ${bolts}/${k}${share !== 1 ? ` / ${share.toFixed(3)}` : ""}`;
  return `the block carries ${fraction}: joint tension it permits = ${permits} = ${kN(b.permits_N)}`;
}

/** The block-shear load convention in words, stated on every sheet (`name`: the code's term for the check). */
export function blockShearConvention(load: BlockShearLoad, name: string): string {
  const shapes = `${name}: every shape the holes form (central blocks, edge strips, one-sided blocks)`;
  return load === "full"
    ? `${shapes}; every block carries its plate's whole force (options.block_shear_load: full, the conservative office convention); the joint tension a block permits is R / the plate's share`
    : `${shapes}; a block holding k of a group's n bolts carries k/n of its plate's force — each bolt an equal share, the basis of the bolt-group checks (options.block_shear_load: share; "full" puts the whole plate force on every block); the joint tension a block permits is R × n/k`;
}
