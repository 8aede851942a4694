/**
 * The drawing of a splice as primitives in model coordinates (mm, x along the force, y up), shared by
 * the SVG and DXF writers so that both show the same thing. Pure.
 *
 * Views: a plan (plate outlines, holes at true diameter, centre lines, chain dimensions of end distance,
 * pitch, edge distance and gauge, the load) and, below it, a longitudinal section through one gauge line
 * showing the plate stack with bolts, washers and nuts. Line types follow ISO 128: continuous wide for
 * visible outlines, dashed narrow for hidden outlines, long-dash dot narrow for centre lines, continuous
 * narrow for dimension and extension lines. Dimensioning follows ISO 129 (chain dimensions, values above
 * the dimension line).
 */
import type { Hole, Joint, PlatePiece } from "../model/joint.js";
import type { BoltLengthLine } from "./bolt-list.js";

export type Layer = "outlines" | "hidden" | "holes" | "centre" | "dimensions" | "text" | "section";
export type Point = [number, number];

export type Primitive =
  | { kind: "line"; layer: Layer; a: Point; b: Point }
  | { kind: "poly"; layer: Layer; points: Point[]; closed: boolean; plate?: string; fill?: "section" }
  | { kind: "circle"; layer: Layer; c: Point; r: number; hole?: Hole }
  | { kind: "text"; layer: Layer; at: Point; height: number; text: string; anchor: "start" | "middle" | "end"; rotate?: number }
  | { kind: "dim"; from: Point; to: Point; at: number; direction: "x" | "y"; value: number }
  | { kind: "arrow"; layer: Layer; from: Point; to: Point };

export interface Drawing {
  primitives: Primitive[];
  /** Extents of everything, model mm. */
  min: Point;
  max: Point;
  /** Where the plan's and the section's labels sit, model mm. */
  planTitleAt: Point;
  sectionTitleAt: Point;
}

/** Text height in model mm for a given paper height and scale 1:k. */
export interface DrawingOptions {
  scale: number;
  loadText: string;
  /** The senses of the load: arrows point away from the splice in tension, toward it in compression, both ways for reversal (default tension). */
  senses?: ReadonlyArray<"tension" | "compression">;
}

const fx = (v: number) => (Math.abs(v - Math.round(v)) < 1e-6 ? String(Math.round(v)) : v.toFixed(1));

function topPlate(joint: Joint): PlatePiece {
  return joint.plates.reduce((a, b) => (b.stackIndex < a.stackIndex ? b : a));
}

/** Drawn extent of a plate: a main plate continues beyond the splice, shown for `ext` mm with a break. */
function drawnExtent(p: PlatePiece, ext: number): [number, number] {
  if (p.continues === "left") return [p.x0_mm - ext, p.x1_mm];
  if (p.continues === "right") return [p.x0_mm, p.x1_mm + ext];
  return [p.x0_mm, p.x1_mm];
}

/** Split a segment along x (at fixed y) or y (at fixed x) into parts inside and outside a rectangle. */
function splitHorizontal(x0: number, x1: number, y: number, r: { x0: number; x1: number; y0: number; y1: number }): Array<{ a: number; b: number; inside: boolean }> {
  const insideY = y > r.y0 + 1e-9 && y < r.y1 - 1e-9;
  if (!insideY) return [{ a: x0, b: x1, inside: false }];
  const parts: Array<{ a: number; b: number; inside: boolean }> = [];
  const a = Math.max(x0, r.x0);
  const b = Math.min(x1, r.x1);
  if (b <= a) return [{ a: x0, b: x1, inside: false }];
  if (a > x0) parts.push({ a: x0, b: a, inside: false });
  parts.push({ a, b, inside: true });
  if (b < x1) parts.push({ a: b, b: x1, inside: false });
  return parts;
}

export function buildDrawing(joint: Joint, lengths: readonly BoltLengthLine[], options: DrawingOptions): Drawing {
  const k = options.scale;
  const text = 3.5 * k; // ISO 3098 lettering 3.5 mm on paper
  const prims: Primitive[] = [];
  const loaded = joint.plates.filter((p) => p.role !== "packing");
  const W = Math.max(...joint.plates.map((p) => p.spec.width_mm));
  const ext = Math.max(60, 0.5 * W);
  const top = topPlate(joint);
  const [tx0, tx1] = drawnExtent(top, ext);
  const topRect = { x0: tx0, x1: tx1, y0: -top.spec.width_mm / 2, y1: top.spec.width_mm / 2 };

  // Plan: outlines. The top plate is visible; edges of the plates beneath it are hidden where it covers them.
  for (const p of joint.plates) {
    const [x0, x1] = drawnExtent(p, ext);
    const h = p.spec.width_mm / 2;
    if (p === top) {
      prims.push({ kind: "poly", layer: "outlines", points: [[x0, -h], [x1, -h], [x1, h], [x0, h]], closed: true, plate: p.id });
    } else {
      for (const y of [-h, h]) {
        for (const part of splitHorizontal(x0, x1, y, topRect)) {
          if (part.inside || Math.abs(Math.abs(y) - top.spec.width_mm / 2) > 1e-9 || part.a < topRect.x0 - 1e-9 || part.b > topRect.x1 + 1e-9) {
            prims.push({ kind: "line", layer: part.inside ? "hidden" : "outlines", a: [part.a, y], b: [part.b, y] });
          }
        }
      }
      for (const x of [x0, x1]) {
        const inside = x > topRect.x0 + 1e-9 && x < topRect.x1 - 1e-9;
        prims.push({ kind: "line", layer: inside ? "hidden" : "outlines", a: [x, -h], b: [x, h] });
      }
    }
    // Break line where a main plate continues.
    if (p.continues !== "none") {
      const xb = p.continues === "left" ? x0 : x1;
      const z = 0.06 * W;
      prims.push({ kind: "poly", layer: "outlines", points: [[xb, -h], [xb, -z], [xb - z, -z / 2], [xb + z, z / 2], [xb, z], [xb, h]], closed: false });
    }
  }

  // Holes at true diameter (slots drawn as their bounding ellipse-free rectangle with rounded ends is
  // beyond the scope here: a circle of the across dimension, the slot length stated in the schedule).
  for (const hole of joint.holes) prims.push({ kind: "circle", layer: "holes", c: [hole.x_mm, hole.y_mm], r: hole.across_mm / 2, hole });

  // Centre lines: the plate axis, every gauge line, every transverse line.
  const xs = [...new Set(joint.holes.map((h) => h.x_mm))].sort((a, b) => a - b);
  const ys = [...new Set(joint.holes.map((h) => h.y_mm))].sort((a, b) => a - b);
  const over = 0.3 * (joint.holes[0]?.across_mm ?? 20) + 2 * k;
  const xMin = Math.min(...xs);
  const xMax = Math.max(...xs);
  prims.push({ kind: "line", layer: "centre", a: [Math.min(...joint.plates.map((p) => drawnExtent(p, ext)[0])) - 2 * k, 0], b: [Math.max(...joint.plates.map((p) => drawnExtent(p, ext)[1])) + 2 * k, 0] });
  for (const y of ys) if (Math.abs(y) > 1e-9) prims.push({ kind: "line", layer: "centre", a: [xMin - over, y], b: [xMax + over, y] });
  for (const x of xs) prims.push({ kind: "line", layer: "centre", a: [x, -W / 2 - 2 * k], b: [x, W / 2 + 2 * k] });

  // Chain dimensions along the force, above the plan: splice ends, transverse lines, butt ends.
  const spliceX0 = joint.spliceType === "lap" ? 0 : -joint.spliceLength_mm / 2;
  const spliceX1 = joint.spliceType === "lap" ? joint.spliceLength_mm : joint.spliceLength_mm / 2;
  const stops = new Set<number>([spliceX0, spliceX1, ...xs]);
  if (joint.spliceType !== "lap") {
    stops.add(-joint.buttGap_mm / 2);
    stops.add(joint.buttGap_mm / 2);
  }
  const chain = [...stops].sort((a, b) => a - b);
  const yDim1 = W / 2 + 10 * k;
  const yDim2 = W / 2 + 20 * k;
  for (let i = 1; i < chain.length; i++) {
    const a = chain[i - 1]!;
    const b = chain[i]!;
    if (b - a < 1e-6) continue;
    prims.push({ kind: "dim", from: [a, a === spliceX0 || a === spliceX1 ? top.spec.width_mm / 2 : W / 2], to: [b, W / 2], at: yDim1, direction: "x", value: b - a });
  }
  prims.push({ kind: "dim", from: [spliceX0, W / 2], to: [spliceX1, W / 2], at: yDim2, direction: "x", value: spliceX1 - spliceX0 });

  // Chain dimensions across the force, to the right: edge, gauges, edge (on the narrowest plate).
  const narrow = Math.min(...loaded.map((p) => p.spec.width_mm));
  const xDim1 = Math.max(...joint.plates.map((p) => drawnExtent(p, ext)[1])) + 30 * k; // past the load arrow
  const xDim2 = xDim1 + 10 * k;
  const ychain = [-narrow / 2, ...ys, narrow / 2];
  for (let i = 1; i < ychain.length; i++) {
    const a = ychain[i - 1]!;
    const b = ychain[i]!;
    if (b - a < 1e-6) continue;
    prims.push({ kind: "dim", from: [spliceX1, a], to: [spliceX1, b], at: xDim1, direction: "y", value: b - a });
  }
  const xRight = Math.max(...joint.plates.map((p) => drawnExtent(p, ext)[1]));
  prims.push({ kind: "dim", from: [xRight, -narrow / 2], to: [xRight, narrow / 2], at: xDim2, direction: "y", value: narrow });

  // Load arrows at the main plates' far ends.
  const mains = joint.plates.filter((p) => p.role === "main");
  for (const p of mains) {
    const [x0, x1] = drawnExtent(p, ext);
    const dir = p.continues === "left" ? -1 : 1;
    const xe = (dir < 0 ? x0 : x1) + dir * (0.06 * W + 2 * k); // clear of the break line
    const senses = options.senses ?? ["tension"];
    if (senses.includes("tension")) prims.push({ kind: "arrow", layer: "text", from: [xe, 0], to: [xe + dir * 18 * k, 0] });
    if (senses.includes("compression")) prims.push({ kind: "arrow", layer: "text", from: [xe + dir * 18 * k, 0], to: [xe, 0] });
    prims.push({ kind: "text", layer: "text", at: [xe, 2.5 * k], height: text, text: options.loadText, anchor: dir < 0 ? "end" : "start" });
  }
  // Plate labels.
  for (const p of joint.plates) {
    const [x0, x1] = drawnExtent(p, ext);
    const label = `${p.label} ${fx(p.spec.width_mm)} × ${fx(p.spec.thickness_mm)} ${p.spec.grade}`;
    if (p.role === "main") {
      const x = p.continues === "left" ? x0 + 2 * k : x1 - 2 * k;
      prims.push({ kind: "text", layer: "text", at: [x, -p.spec.width_mm / 2 - 6 * k], height: 0.8 * text, text: label, anchor: p.continues === "left" ? "start" : "end" }); // below the plate, clear of the holes
    } else if (p.role === "cover" && p.stackIndex === top.stackIndex) {
      prims.push({ kind: "text", layer: "text", at: [(x0 + x1) / 2, -p.spec.width_mm / 2 - 11 * k], height: 0.8 * text, text: label, anchor: "middle" });
    }
  }
  const planTitleAt: Point = [spliceX0, -W / 2 - 18 * k];

  // Section: a longitudinal cut along the gauge line with the most holes, below the plan.
  const gaugeY = ys.reduce((best, y) => (joint.holes.filter((h) => h.y_mm === y).length > joint.holes.filter((h) => h.y_mm === best).length ? y : best), ys[0] ?? 0);
  const stackTotal = stackThickness(joint);
  const zTop = -W / 2 - 30 * k; // top face of the stack in model y
  const zOf = zFaces(joint, zTop);
  for (const p of joint.plates) {
    const [x0, x1] = drawnExtent(p, ext);
    const [zt, zb] = zOf.get(p.id)!;
    prims.push({ kind: "poly", layer: "section", points: [[x0, zb], [x1, zb], [x1, zt], [x0, zt]], closed: true, plate: p.id, fill: "section" });
  }
  const d = joint.boltDiameter_mm;
  for (const hole of joint.holes.filter((h) => h.y_mm === gaugeY)) {
    const line = lengths.find((l) => l.group === hole.group);
    const group = joint.groups.find((g) => g.id === hole.group)!;
    const [zt] = zOf.get(group.stack[0]!)!;
    const [, zb] = zOf.get(group.stack[group.stack.length - 1]!)!;
    const head = 0.65 * d;
    const washer = line?.washer_mm ?? 3;
    const nut = line?.nut_mm ?? 0.8 * d;
    const L = Number.isFinite(line?.length_mm) ? line!.length_mm : zt - zb + nut + washer;
    const x = hole.x_mm;
    const underHead = (line?.washersUnderHead ?? 0) * washer;
    const zHead = zt + underHead;
    // head, washers, shank, nut
    prims.push({ kind: "poly", layer: "section", points: [[x - 0.8 * d, zHead], [x + 0.8 * d, zHead], [x + 0.8 * d, zHead + head], [x - 0.8 * d, zHead + head]], closed: true });
    if (underHead > 0) prims.push({ kind: "poly", layer: "section", points: [[x - d, zt], [x + d, zt], [x + d, zHead], [x - d, zHead]], closed: true });
    const wn = (line?.washersUnderNut ?? 1) * washer;
    prims.push({ kind: "poly", layer: "section", points: [[x - d, zb - wn], [x + d, zb - wn], [x + d, zb], [x - d, zb]], closed: true });
    prims.push({ kind: "poly", layer: "section", points: [[x - 0.8 * d, zb - wn - nut], [x + 0.8 * d, zb - wn - nut], [x + 0.8 * d, zb - wn], [x - 0.8 * d, zb - wn]], closed: true });
    prims.push({ kind: "poly", layer: "section", points: [[x - d / 2, zHead - L], [x + d / 2, zHead - L], [x + d / 2, zHead], [x - d / 2, zHead]], closed: true });
    prims.push({ kind: "line", layer: "centre", a: [x, zHead + head + 2 * k], b: [x, zHead - L - 2 * k] });
  }
  const sectionTitleAt: Point = [spliceX0, zTop - stackTotal - 40 - 10 * k];

  prims.push({ kind: "text", layer: "text", at: planTitleAt, height: text, text: "PLAN", anchor: "start" });
  prims.push({ kind: "text", layer: "text", at: sectionTitleAt, height: text, text: `SECTION ON GAUGE LINE y = ${fx(gaugeY)}`, anchor: "start" });

  const bounds = extents(prims, text);
  return { primitives: prims, min: bounds.min, max: bounds.max, planTitleAt, sectionTitleAt };
}

function stackThickness(joint: Joint): number {
  return Math.max(...joint.groups.map((g) => g.grip_mm));
}

/** Top and bottom face (model y) of each plate in the section, stacked downward from zTop. */
function zFaces(joint: Joint, zTop: number): Map<string, [number, number]> {
  const out = new Map<string, [number, number]>();
  const plate = (id: string) => joint.plates.find((p) => p.id === id);
  const t = (id: string) => plate(id)?.spec.thickness_mm ?? 0;
  if (joint.spliceType === "lap") {
    out.set("mainA", [zTop, zTop - t("mainA")]);
    out.set("mainB", [zTop - t("mainA"), zTop - t("mainA") - t("mainB")]);
    return out;
  }
  out.set("coverA", [zTop, zTop - t("coverA")]);
  const zc = zTop - t("coverA");
  const pack = plate("packing");
  // The packing lies under the cover on the thinner main plate, which sits below it.
  const packedMain = pack ? (t("mainA") <= t("mainB") ? "mainA" : "mainB") : null;
  let bottom = zc;
  for (const id of ["mainA", "mainB"]) {
    const top = id === packedMain ? zc - t("packing") : zc;
    out.set(id, [top, top - t(id)]);
    bottom = Math.min(bottom, top - t(id));
  }
  if (pack) out.set("packing", [zc, zc - t("packing")]);
  if (plate("coverB")) out.set("coverB", [bottom, bottom - t("coverB")]);
  return out;
}

function extents(prims: Primitive[], text: number): { min: Point; max: Point } {
  let x0 = Infinity;
  let y0 = Infinity;
  let x1 = -Infinity;
  let y1 = -Infinity;
  const add = (p: Point, pad = 0) => {
    x0 = Math.min(x0, p[0] - pad);
    y0 = Math.min(y0, p[1] - pad);
    x1 = Math.max(x1, p[0] + pad);
    y1 = Math.max(y1, p[1] + pad);
  };
  for (const p of prims) {
    if (p.kind === "line") (add(p.a), add(p.b));
    else if (p.kind === "poly") p.points.forEach((q) => add(q));
    else if (p.kind === "circle") add(p.c, p.r);
    else if (p.kind === "text") {
      // Width about 0.6 × height per character; anchored start, middle or end.
      const w = 0.6 * p.height * p.text.length;
      const x0t = p.anchor === "start" ? p.at[0] : p.anchor === "end" ? p.at[0] - w : p.at[0] - w / 2;
      add([x0t, p.at[1] - 0.3 * p.height]);
      add([x0t + w, p.at[1] + p.height]);
    }
    else if (p.kind === "arrow") (add(p.from), add(p.to));
    else if (p.kind === "dim") {
      add(p.from);
      add(p.to);
      add(p.direction === "x" ? [p.from[0], p.at + text] : [p.at + text, p.from[1]]);
    }
  }
  return { min: [x0, y0], max: [x1, y1] };
}

/** A filled arrowhead at `tip` pointing away from `from`, length `len`, width 1:3 (ISO 129): its corners. */
export function arrowHeadPoints(tip: Point, from: Point, len: number): Point[] {
  const dx = tip[0] - from[0];
  const dy = tip[1] - from[1];
  const L = Math.hypot(dx, dy) || 1;
  const ux = dx / L;
  const uy = dy / L;
  const bx = tip[0] - ux * len;
  const by = tip[1] - uy * len;
  const w = len / 6;
  return [tip, [bx - uy * w, by + ux * w], [bx + uy * w, by - ux * w]];
}

/** Drawing scales of ISO 5455 used here, smallest reduction first. */
export const SCALES = [1, 2, 5, 10, 20, 50];

/** The smallest reduction 1:k at which the drawing fits a paper area (mm). */
export function chooseScale(extentAt1: (k: number) => { width: number; height: number }, paperWidth: number, paperHeight: number): number {
  for (const k of SCALES) {
    const e = extentAt1(k);
    if (e.width / k <= paperWidth && e.height / k <= paperHeight) return k;
  }
  return SCALES[SCALES.length - 1]!;
}

export { fx as formatLength };
