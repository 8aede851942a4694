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
 *   - one edge strip, gauge lines 0 … a or a … G−1 (not all lines): one shear plane, one tension plane.
 * A hole whose centre lies inside a plane is deducted whole, one at the plane's end by half (the plane
 * ends at the hole centre). Bolts on a block's boundary lines count as bolts of the block, so the block
 * takes the share (bolts in block / bolts in group) of the plate's force — conservative for those lines.
 */
import type { Hole, PlateConnection } from "../model/joint.js";
import { LINE_TOLERANCE_MM } from "./lines.js";

export interface BlockPlane {
  gross_mm: number;
  net_mm: number;
}

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

interface LocalHole {
  u: number;
  y: number;
  across: number;
  along: number;
}

/** Weight of a hole on a plane from p0 to p1 (coordinate t along the plane): 1 inside, ½ at an end, 0 off. */
function weight(t: number, p0: number, p1: number): number {
  if (near(t, p0) || near(t, p1)) return 0.5;
  return t > p0 && t < p1 ? 1 : 0;
}

/** Shear plane along gauge line y from u = 0 to u = uLast. */
function shearPlane(holes: LocalHole[], y: number, uLast: number): BlockPlane {
  let deduction = 0;
  for (const h of holes) if (near(h.y, y)) deduction += weight(h.u, 0, uLast) * h.along;
  // A hole at u = 0 cannot exist (end distance > 0), so the ½ weight applies only at uLast.
  return { gross_mm: uLast, net_mm: uLast - deduction };
}

/** Tension plane across the force at u = uLast, from y0 to y1 (y0 < y1; either may be a plate edge). */
function tensionPlane(holes: LocalHole[], uLast: number, y0: number, y1: number): BlockPlane {
  let deduction = 0;
  for (const h of holes) if (near(h.u, uLast)) deduction += weight(h.y, y0, y1) * h.across;
  return { gross_mm: y1 - y0, net_mm: y1 - y0 - deduction };
}

/**
 * Every block shape that can form in a plate of width b for one bolt group bearing toward one plate end.
 */
export function blockShapes(holes: readonly Hole[], connection: PlateConnection, width_mm: number): BlockShape[] {
  const local: LocalHole[] = holes.map((h) => ({
    u: connection.towardEnd * (connection.endX_mm - h.x_mm),
    y: h.y_mm,
    across: h.across_mm,
    along: h.along_mm,
  }));
  const ys: number[] = [];
  for (const y of [...local.map((h) => h.y)].sort((a, b) => a - b)) {
    if (ys.length === 0 || !near(ys[ys.length - 1]!, y)) ys.push(y);
  }
  const G = ys.length;
  const half = width_mm / 2;
  const shapes: BlockShape[] = [];
  const inLines = (lo: number, hi: number) => local.filter((h) => h.y >= ys[lo]! - LINE_TOLERANCE_MM && h.y <= ys[hi]! + LINE_TOLERANCE_MM);
  const lastU = (hs: LocalHole[]) => Math.max(...hs.map((h) => h.u));

  // Central blocks between gauge lines a < b.
  for (let a = 0; a < G; a++) {
    for (let b = a + 1; b < G; b++) {
      const block = inLines(a, b);
      const uLast = lastU(block);
      const sa = shearPlane(local, ys[a]!, uLast);
      const sb = shearPlane(local, ys[b]!, uLast);
      const t = tensionPlane(local, uLast, ys[a]!, ys[b]!);
      shapes.push({
        description: `central block between gauge lines ${a + 1} and ${b + 1} of ${G}`,
        shearGross_mm: sa.gross_mm + sb.gross_mm,
        shearNet_mm: sa.net_mm + sb.net_mm,
        tensionGross_mm: t.gross_mm,
        tensionNet_mm: t.net_mm,
        boltsInBlock: block.length,
      });
    }
  }

  // Edge strips on both sides: lines 0..a and m..G−1 with m = G−1−a, a < m.
  for (let a = 0; a < G; a++) {
    const m = G - 1 - a;
    if (a >= m) break;
    const block = [...inLines(0, a), ...inLines(m, G - 1)];
    const uLast = lastU(block);
    const sa = shearPlane(local, ys[a]!, uLast);
    const sm = shearPlane(local, ys[m]!, uLast);
    const t0 = tensionPlane(local, uLast, -half, ys[a]!);
    const t1 = tensionPlane(local, uLast, ys[m]!, half);
    shapes.push({
      description: a === 0 ? "edge strips outside the outer gauge lines" : `edge strips, gauge lines 1–${a + 1} and ${m + 1}–${G} of ${G}`,
      shearGross_mm: sa.gross_mm + sm.gross_mm,
      shearNet_mm: sa.net_mm + sm.net_mm,
      tensionGross_mm: t0.gross_mm + t1.gross_mm,
      tensionNet_mm: t0.net_mm + t1.net_mm,
      boltsInBlock: block.length,
    });
  }

  // One edge strip: lines 0..a (lower side) or a..G−1 (upper side), not every line.
  for (let a = 0; a < G - 1; a++) {
    const lower = inLines(0, a);
    const uL = lastU(lower);
    const sL = shearPlane(local, ys[a]!, uL);
    const tL = tensionPlane(local, uL, -half, ys[a]!);
    shapes.push({
      description: `one edge strip, gauge lines 1–${a + 1} of ${G}`,
      shearGross_mm: sL.gross_mm,
      shearNet_mm: sL.net_mm,
      tensionGross_mm: tL.gross_mm,
      tensionNet_mm: tL.net_mm,
      boltsInBlock: lower.length,
    });
    const b = a + 1;
    const upper = inLines(b, G - 1);
    const uU = lastU(upper);
    const sU = shearPlane(local, ys[b]!, uU);
    const tU = tensionPlane(local, uU, ys[b]!, half);
    shapes.push({
      description: `one edge strip, gauge lines ${b + 1}–${G} of ${G}`,
      shearGross_mm: sU.gross_mm,
      shearNet_mm: sU.net_mm,
      tensionGross_mm: tU.gross_mm,
      tensionNet_mm: tU.net_mm,
      boltsInBlock: upper.length,
    });
  }
  return shapes;
}

/**
 * The governing block of a plate: the shape with the least joint tension at which it fails, when a
 * block holding k of a group's n bolts takes share·k/n of the joint tension. Null when no shape forms.
 * @param resist the code's design resistance of a shape (N), with whatever detail its text needs
 */
export function governingBlock<D>(
  shapes: readonly BlockShape[],
  bolts: number,
  share: number,
  resist: (shape: BlockShape) => { value_N: number; detail: D },
): { shape: BlockShape; ratio: number; value_N: number; detail: D } | null {
  let best: { shape: BlockShape; ratio: number; value_N: number; detail: D; capacity: number } | null = null;
  for (const shape of shapes) {
    const r = resist(shape);
    const ratio = (share * shape.boltsInBlock) / bolts;
    const capacity = r.value_N / ratio;
    if (!best || capacity < best.capacity - 1e-9) best = { shape, ratio, value_N: r.value_N, detail: r.detail, capacity };
  }
  return best && { shape: best.shape, ratio: best.ratio, value_N: best.value_N, detail: best.detail };
}
