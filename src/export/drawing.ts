/**
 * The drawing of a splice as primitives in model coordinates (mm, x along the force, y up), shared by
 * the SVG and DXF writers so that both show the same thing. Pure.
 *
 * Views: a plan (plate outlines, holes at true diameter, centre lines, chain dimensions of end distance,
 * pitch, edge distance and gauge, the load, the cutting plane A–A, the hole callout, item references)
 * and, below it, SECTION A–A: a longitudinal cut on one gauge line showing the plate stack hatched part
 * by part, bolts, washers and nuts in view, the thicknesses and the bolt length dimensioned.
 *
 * Conventions (docs/drawing.md):
 * - ISO 128-20 line types: continuous wide for visible outlines, dashed narrow for hidden outlines,
 *   long-dash dot narrow for centre lines, continuous narrow for dimension, extension, leader and
 *   hatching lines, continuous narrow with a zigzag for break lines; wide : narrow = 2 : 1.
 * - ISO 128-40/-44 sections: the cutting plane by its wide ends with arrows in the viewing direction and
 *   letters; bolts, nuts and washers cut lengthwise are not hatched; ISO 128-50 hatching at 45°,
 *   adjacent parts in another direction or spacing.
 * - ISO 129-1 dimensioning: chain dimensions, values above the dimension line, extension lines starting
 *   a small gap off the outline and running a little past the dimension line; a centre line stands in
 *   for the extension line of a hole position.
 * - ISO 6433 item references: the part mark in a circle, its leader ending in a dot on the part.
 * - One datum: x from a plate's left end as drawn, y from its lower edge as drawn.
 */
import type { Hole, Joint, PlateId, PlatePiece } from "../model/joint.js";
import { dimensionText, type DisplayUnits } from "../report/format.js";
import type { BoltLengthLine } from "./bolt-list.js";

export type Layer = "outlines" | "hidden" | "holes" | "centre" | "dimensions" | "text" | "section" | "hatch" | "thin";
export type Point = [number, number];

/** What a line is for, where the layer alone does not say (the tests and the writers read it). */
export type LineRole = "cutting-plane" | "break" | "leader" | "extension";

export type Primitive =
  | { kind: "line"; layer: Layer; a: Point; b: Point; role?: LineRole; part?: PlateId }
  | { kind: "poly"; layer: Layer; points: Point[]; closed: boolean; plate?: PlateId; fill?: "section" | "white"; role?: LineRole }
  | { kind: "circle"; layer: Layer; c: Point; r: number; hole?: Hole; fill?: "black" }
  | { kind: "text"; layer: Layer; at: Point; height: number; text: string; anchor: "start" | "middle" | "end"; rotate?: number; role?: "title" | "subtitle" | "callout" | "mark" | "load" | "cutting-plane" }
  | { kind: "dim"; from: Point; to: Point; at: number; direction: "x" | "y"; value: number; text: string; extension: [boolean, boolean]; view: "plan" | "section"; textAt?: number; textLift_mm?: number }
  | { kind: "arrow"; layer: Layer; from: Point; to: Point; role?: "load" | "cutting-plane" }
  | { kind: "hatch"; part: PlateId; angle_deg: number; spacing_mm: number; lines: Array<[Point, Point]> };

export interface Drawing {
  primitives: Primitive[];
  /** Extents of everything, model mm. */
  min: Point;
  max: Point;
  /** Where the plan's and the section's titles sit, model mm. */
  planTitleAt: Point;
  sectionTitleAt: Point;
  /** The part marks (ISO 6433 item references) of the plates, in the parts list's order. */
  marks: Array<{ plate: PlateId; mark: string }>;
  /** The gauge line the section is cut on: y from the plate axis, and from the top plate's lower edge. */
  section: { gaugeY_mm: number; fromLowerEdge_mm: number; plate: PlateId };
}

export interface DrawingOptions {
  /** Drawing scale 1:k (k = 0.5 is 2:1); text and offsets are sized for it. */
  scale: number;
  loadText: string;
  /** The senses of the load: arrows point away from the splice in tension, toward it in compression, both ways for reversal (default tension). */
  senses?: ReadonlyArray<"tension" | "compression">;
  /** Dimension text: mm numbers, or US feet-inches-fractions (default SI). */
  units?: DisplayUnits;
}

/** ISO 3098 lettering on paper, mm: 3.5 for titles and notes, 2.5 for dimension values. */
export const LETTERING_MM = { text: 3.5, dimension: 2.5, title: 5 } as const;
/** Gap between an outline and the start of its extension line, and the overrun past the dimension line, paper mm (ISO 129-1, common practice). */
export const EXTENSION_GAP_MM = 1;
export const EXTENSION_OVERRUN_MM = 2;
/** Hatching: 45° to the outline; spacing on paper, mm (ISO 128-50: spacing to suit the area, common practice). */
export const HATCH_SPACING_MM = 1.5;

const fx = (v: number) => (Math.abs(v - Math.round(v)) < 1e-6 ? String(Math.round(v)) : v.toFixed(1));

/** Part marks in the parts list's order: covers, packing, then the main plates (members). */
const MARK_ORDER: PlateId[] = ["coverA", "coverB", "packing", "mainA", "mainB"];
export function partMarks(joint: Joint): Array<{ plate: PlateId; mark: string }> {
  return MARK_ORDER.filter((id) => joint.plates.some((p) => p.id === id)).map((plate, i) => ({ plate, mark: String(i + 1) }));
}

function topPlate(joint: Joint): PlatePiece {
  return joint.plates.reduce((a, b) => (b.stackIndex < a.stackIndex ? b : a));
}

/** Drawn extent of a plate: a main plate continues beyond the splice, shown for `ext` mm up to a break line. */
function drawnExtent(p: PlatePiece, ext: number): [number, number] {
  if (p.continues === "left") return [p.x0_mm - ext, p.x1_mm];
  if (p.continues === "right") return [p.x0_mm, p.x1_mm + ext];
  return [p.x0_mm, p.x1_mm];
}

/** Split a segment along x (at fixed y) into parts inside and outside a rectangle. */
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

/** What every view needs: scale, sizes, the stub length of the main plates, the text of a dimension. */
interface Ctx {
  joint: Joint;
  k: number;
  units: DisplayUnits;
  W: number;
  ext: number;
  top: PlatePiece;
  xs: number[];
  ys: number[];
  spliceX0: number;
  spliceX1: number;
  xLeft: number;
  xRight: number;
  dimText: (mm: number) => string;
  loadText: string;
  prims: Primitive[];
}

function context(joint: Joint, options: DrawingOptions): Ctx {
  const k = options.scale;
  const units = options.units ?? "si";
  const W = Math.max(...joint.plates.map((p) => p.spec.width_mm));
  const ext = Math.max(40, 0.3 * W, 28 * k);
  const spliceX0 = joint.spliceType === "lap" ? 0 : -joint.spliceLength_mm / 2;
  const spliceX1 = joint.spliceType === "lap" ? joint.spliceLength_mm : joint.spliceLength_mm / 2;
  return {
    joint, k, units, W, ext, top: topPlate(joint), spliceX0, spliceX1,
    xs: [...new Set(joint.holes.map((h) => h.x_mm))].sort((a, b) => a - b),
    ys: [...new Set(joint.holes.map((h) => h.y_mm))].sort((a, b) => a - b),
    xLeft: Math.min(...joint.plates.map((p) => drawnExtent(p, ext)[0])),
    xRight: Math.max(...joint.plates.map((p) => drawnExtent(p, ext)[1])),
    dimText: (mm) => dimensionText(mm, units),
    loadText: options.loadText,
    prims: [],
  };
}

export function buildDrawing(joint: Joint, lengths: readonly BoltLengthLine[], options: DrawingOptions): Drawing {
  const c = context(joint, options);
  const marks = partMarks(joint);
  planOutlines(c);
  planCentreLines(c);
  planDimensions(c);
  const gaugeY = sectionGauge(c);
  planAnnotations(c, options, marks, gaugeY);
  // Under the plan: its title at the left, the top plate's mark and the hole callout (about 11 mm on paper).
  const planTitleAt: Point = [c.xLeft, -c.W / 2 - 9 * c.k];
  c.prims.push({ kind: "text", layer: "text", at: planTitleAt, height: LETTERING_MM.title * c.k, text: "PLAN", anchor: "start", role: "title" });
  const sectionBottom = drawSection(c, lengths, marks, gaugeY, -c.W / 2 - 13 * c.k);
  const sectionTitleAt: Point = [c.xLeft, sectionBottom - 6 * c.k];
  const fromLowerEdge = gaugeY + c.top.spec.width_mm / 2;
  const title = "SECTION A–A";
  c.prims.push({ kind: "text", layer: "text", at: sectionTitleAt, height: LETTERING_MM.title * c.k, text: title, anchor: "start", role: "title" });
  const subX = c.xLeft + (0.75 * LETTERING_MM.title * title.length + 3) * c.k; // past the title in a wide CAD font too
  c.prims.push({ kind: "text", layer: "text", at: [subX, sectionTitleAt[1]], height: LETTERING_MM.dimension * c.k, text: `cut on the gauge line ${c.dimText(fromLowerEdge)} from the lower edge of ${c.top.label}`, anchor: "start", role: "subtitle" });
  const bounds = extents(c.prims, c.k);
  return { primitives: c.prims, min: bounds.min, max: bounds.max, planTitleAt, sectionTitleAt, marks, section: { gaugeY_mm: gaugeY, fromLowerEdge_mm: fromLowerEdge, plate: c.top.id } };
}

/** Plan outlines: the top plate visible; edges of the plates beneath it hidden where it covers them; break lines across the main plates. */
function planOutlines(c: Ctx): void {
  const { top, ext, prims, k } = c;
  const [tx0, tx1] = drawnExtent(top, ext);
  const topRect = { x0: tx0, x1: tx1, y0: -top.spec.width_mm / 2, y1: top.spec.width_mm / 2 };
  for (const p of c.joint.plates) {
    const [x0, x1] = drawnExtent(p, ext);
    const h = p.spec.width_mm / 2;
    const ends = [x0, x1].filter((x) => !(p.continues === "left" && x === x0) && !(p.continues === "right" && x === x1));
    if (p === top) {
      prims.push({ kind: "line", layer: "outlines", a: [x0, -h], b: [x1, -h], part: p.id });
      prims.push({ kind: "line", layer: "outlines", a: [x0, h], b: [x1, h], part: p.id });
      for (const x of ends) prims.push({ kind: "line", layer: "outlines", a: [x, -h], b: [x, h], part: p.id });
    } else {
      for (const y of [-h, h]) {
        for (const part of splitHorizontal(x0, x1, y, topRect)) {
          if (part.inside || Math.abs(Math.abs(y) - top.spec.width_mm / 2) > 1e-9 || part.a < topRect.x0 - 1e-9 || part.b > topRect.x1 + 1e-9) {
            prims.push({ kind: "line", layer: part.inside ? "hidden" : "outlines", a: [part.a, y], b: [part.b, y], part: p.id });
          }
        }
      }
      for (const x of ends) {
        const inside = x > topRect.x0 + 1e-9 && x < topRect.x1 - 1e-9;
        prims.push({ kind: "line", layer: inside ? "hidden" : "outlines", a: [x, -h], b: [x, h], part: p.id });
      }
    }
    if (p.continues !== "none") breakLine(c, p.continues === "left" ? x0 : x1, -h - 2 * k, h + 2 * k, p.id);
  }
  for (const hole of c.joint.holes) prims.push({ kind: "circle", layer: "holes", c: [hole.x_mm, hole.y_mm], r: hole.across_mm / 2, hole });
}

/** A break line across a plate at x (ISO 128-20 type 01.1 with a zigzag), from y0 to y1. */
function breakLine(c: Ctx, x: number, y0: number, y1: number, part: PlateId): void {
  const z = Math.min(3 * c.k, (y1 - y0) / 6);
  const ym = (y0 + y1) / 2;
  c.prims.push({ kind: "poly", layer: "thin", role: "break", plate: part, closed: false, points: [[x, y0], [x, ym - z], [x + 0.8 * z, ym - 0.3 * z], [x - 0.8 * z, ym + 0.3 * z], [x, ym + z], [x, y1]] });
}

/** Centre lines: the plate axis, every gauge line (run on to the gauge dimensions), every transverse line (run up to the dimension line). */
function planCentreLines(c: Ctx): void {
  const { k, W, prims, xs, ys } = c;
  const over = 0.3 * (c.joint.holes[0]?.across_mm ?? 20) + 2 * k;
  prims.push({ kind: "line", layer: "centre", a: [c.xLeft - 2 * k, 0], b: [c.xRight + 2 * k, 0] });
  for (const y of ys) if (Math.abs(y) > 1e-9) prims.push({ kind: "line", layer: "centre", a: [Math.min(...xs) - over, y], b: [Math.max(...xs) + over, y] });
  for (const x of xs) prims.push({ kind: "line", layer: "centre", a: [x, -W / 2 - 2 * k], b: [x, W / 2 + (8 + EXTENSION_OVERRUN_MM) * k] });
}

/**
 * Where values of a chain dimension are wider than their spaces (inch values at a small scale), each
 * second one of a run of such values is set a row higher, so that neighbours never overprint (ISO 129-1
 * lets a value stand off its line where space is short). Returns each value's lift on paper, mm.
 */
export function chainTextLifts(values: ReadonlyArray<{ text: string; space_mm: number }>): number[] {
  const row = LETTERING_MM.dimension + 1;
  const lifts: number[] = [];
  let previousTight = false;
  for (const v of values) {
    const tight = TEXT_WIDTH_PER_HEIGHT * LETTERING_MM.dimension * v.text.length > v.space_mm - 0.5;
    lifts.push(tight && previousTight && lifts[lifts.length - 1] === 0 ? row : 0);
    previousTight = tight;
  }
  return lifts;
}

/** Chain dimensions along the force above the plan and across it to the right of the main plate's break (ISO 129-1). */
function planDimensions(c: Ctx): void {
  const { joint, k, W, prims, xs, spliceX0, spliceX1, top } = c;
  const stops = new Map<number, boolean>([[spliceX0, true], [spliceX1, true]]); // true: a plate end (extension line), false: a hole (its centre line)
  for (const x of xs) if (!stops.has(x)) stops.set(x, false);
  if (joint.spliceType !== "lap") for (const x of [-joint.buttGap_mm / 2, joint.buttGap_mm / 2]) stops.set(x, true);
  const chain = [...stops.keys()].sort((a, b) => a - b);
  const yDim1 = W / 2 + 8 * k;
  const edgeAt = (x: number) => (x === spliceX0 || x === spliceX1 ? top.spec.width_mm / 2 : W / 2);
  const spans: Array<[number, number]> = [];
  for (let i = 1; i < chain.length; i++) if (chain[i]! - chain[i - 1]! >= 1e-6) spans.push([chain[i - 1]!, chain[i]!]);
  const lifts = chainTextLifts(spans.map(([a, b]) => ({ text: c.dimText(b - a), space_mm: (b - a) / k })));
  spans.forEach(([a, b], i) => {
    const lift = lifts[i]! > 0 ? { textLift_mm: lifts[i]! } : {};
    prims.push({ kind: "dim", view: "plan", from: [a, edgeAt(a)], to: [b, edgeAt(b)], at: yDim1, direction: "x", value: b - a, text: c.dimText(b - a), extension: [stops.get(a)!, stops.get(b)!], ...lift });
  });
  // The overall dimension 7 mm above the chain, and clear of its second row of values where there is one.
  const yDim2 = yDim1 + (7 + Math.max(0, ...lifts)) * k;
  prims.push({ kind: "dim", view: "plan", from: [spliceX0, top.spec.width_mm / 2], to: [spliceX1, top.spec.width_mm / 2], at: yDim2, direction: "x", value: spliceX1 - spliceX0, text: c.dimText(spliceX1 - spliceX0), extension: [true, true] });

  // Across: edge, gauges, edge on the narrowest loaded plate, measured at the main plate's break, the
  // gauge lines run on as centre lines; then the width.
  const loaded = joint.plates.filter((p) => p.role !== "packing");
  // The narrowest loaded plate, of equals the one reaching farthest right: its edges' extension lines never run along another plate's edge.
  const narrow = loaded.reduce((a, b) => (b.spec.width_mm < a.spec.width_mm - 1e-9 || (Math.abs(b.spec.width_mm - a.spec.width_mm) < 1e-9 && drawnExtent(b, c.ext)[1] > drawnExtent(a, c.ext)[1]) ? b : a));
  const xEdge = drawnExtent(narrow, c.ext)[1];
  const xDim1 = c.xRight + loadSpace(c) + 6 * k;
  const xDim2 = xDim1 + 7 * k;
  const h = narrow.spec.width_mm / 2;
  const ychain = [-h, ...c.ys, h];
  for (let i = 1; i < ychain.length; i++) {
    const a = ychain[i - 1]!;
    const b = ychain[i]!;
    if (b - a < 1e-6) continue;
    prims.push({ kind: "dim", view: "plan", from: [xEdge, a], to: [xEdge, b], at: xDim1, direction: "y", value: b - a, text: c.dimText(b - a), extension: [i === 1, i === ychain.length - 1] });
  }
  prims.push({ kind: "dim", view: "plan", from: [xEdge, -h], to: [xEdge, h], at: xDim2, direction: "y", value: 2 * h, text: c.dimText(2 * h), extension: [true, true] });
  for (const y of c.ys) prims.push({ kind: "line", layer: "centre", a: [Math.max(...xs) + 0.3 * (joint.holes[0]?.across_mm ?? 20) + 2 * k, y], b: [xDim1 + EXTENSION_OVERRUN_MM * k, y] });
}

/** Room to the right of the main plate for the load arrow and its text, model mm. */
function loadSpace(c: Ctx): number {
  return (loadArrowOffset(c, sectionGauge(c)) + 5 + Math.max(16, TEXT_WIDTH_PER_HEIGHT * LETTERING_MM.text * c.loadText.length)) * c.k;
}

/** How far past the main plate's break the load arrow starts, paper mm: past the cutting-plane end and its letter when the cut is on the axis. */
function loadArrowOffset(c: Ctx, gaugeY: number): number {
  return Math.abs(gaugeY) < 8 * c.k ? 13 : 4;
}

/** The gauge line the section is cut on: the one with the most holes, the lowest of equals. */
function sectionGauge(c: Ctx): number {
  const count = (y: number) => c.joint.holes.filter((h) => h.y_mm === y).length;
  return c.ys.reduce((best, y) => (count(y) > count(best) ? y : best), c.ys[0] ?? 0);
}

/** Load arrows, the cutting plane A–A, the hole callout and the plan's item references. */
function planAnnotations(c: Ctx, options: DrawingOptions, marks: Array<{ plate: PlateId; mark: string }>, gaugeY: number): void {
  const { k, prims, joint } = c;
  const text = LETTERING_MM.text * k;
  // Load arrows at the main plates' far ends, clear of the break line and the cutting-plane ends.
  for (const p of joint.plates.filter((q) => q.role === "main")) {
    const dir = p.continues === "left" ? -1 : 1;
    const xe = (dir < 0 ? c.xLeft : c.xRight) + dir * loadArrowOffset(c, gaugeY) * k;
    const senses = options.senses ?? ["tension"];
    const tip: Point = [xe + dir * 16 * k, 0];
    if (senses.includes("tension")) prims.push({ kind: "arrow", layer: "text", from: [xe, 0], to: tip, role: "load" });
    if (senses.includes("compression")) prims.push({ kind: "arrow", layer: "text", from: tip, to: [xe, 0], role: "load" });
    prims.push({ kind: "text", layer: "text", at: [xe, 2 * k], height: text, text: options.loadText, anchor: dir < 0 ? "end" : "start", role: "load" });
  }
  // Cutting plane A–A on the gauge line (ISO 128-40): wide ends outside the outline, arrows in the viewing direction (+y: the section is seen from below the plan), letters.
  for (const [x0, dir] of [[c.xLeft - EXTENSION_GAP_MM * k, -1], [c.xRight + EXTENSION_GAP_MM * k, 1]] as Array<[number, number]>) {
    const x1 = x0 + dir * 6 * k;
    prims.push({ kind: "line", layer: "outlines", a: [x0, gaugeY], b: [x1, gaugeY], role: "cutting-plane" });
    prims.push({ kind: "arrow", layer: "text", from: [x1, gaugeY], to: [x1, gaugeY + 7 * k], role: "cutting-plane" });
    prims.push({ kind: "text", layer: "text", at: [x1 + dir * 1.5 * k, gaugeY + 4 * k], height: text, text: "A", anchor: dir < 0 ? "end" : "start", role: "cutting-plane" });
  }
  prims.push({ kind: "line", layer: "centre", a: [c.xLeft - EXTENSION_GAP_MM * k, gaugeY], b: [c.xRight + EXTENSION_GAP_MM * k, gaugeY], role: "cutting-plane" });
  // Hole callout: leader from the lowest hole nearest the middle of the splice, down and to the right.
  const d0 = joint.holes[0]?.across_mm ?? 0;
  const mid = (c.spliceX0 + c.spliceX1) / 2;
  const lowY = c.ys[0] ?? 0;
  const hole = joint.holes.filter((h) => h.y_mm === lowY && h.x_mm >= mid).sort((a, b) => a.x_mm - b.x_mm)[0] ?? joint.holes[0];
  if (hole) {
    const r = d0 / 2;
    const a: Point = [hole.x_mm + r * Math.SQRT1_2, hole.y_mm - r * Math.SQRT1_2];
    const yEnd = -c.W / 2 - 6 * k;
    const b: Point = [a[0] + (a[1] - yEnd), yEnd];
    prims.push({ kind: "line", layer: "thin", a, b, role: "leader" });
    prims.push({ kind: "line", layer: "thin", a: b, b: [b[0] + 2 * k, yEnd], role: "leader" });
    prims.push({ kind: "text", layer: "text", at: [b[0] + 3 * k, yEnd - 0.3 * text], height: text, text: holeCallout(c), anchor: "start", role: "callout" });
  }
  // Item references of the plates seen in plan: main plates above their stubs (clear of the dimensions), the top plate below its end.
  for (const p of joint.plates) {
    if (p.role !== "main" && p !== c.top) continue;
    const [x0, x1] = drawnExtent(p, c.ext);
    const h = p.spec.width_mm / 2;
    const inset = 0.25 * Math.min(p.spec.width_mm, 40 * k);
    if (p.continues !== "none") {
      const x = p.continues === "left" ? x0 + 0.4 * c.ext : x1 - 0.4 * c.ext;
      balloon(c, [x, h - inset], [x, c.W / 2 + 7 * k], markOf(marks, p.id));
    } else {
      const x = x0 + Math.min(0.5 * ((c.xs[0] ?? x0) - x0), 20 * k);
      balloon(c, [x, -h + inset], [x, -c.W / 2 - 7 * k], markOf(marks, p.id));
    }
  }
}

function markOf(marks: Array<{ plate: PlateId; mark: string }>, id: PlateId): string {
  return marks.find((m) => m.plate === id)?.mark ?? "?";
}

/** "12 holes Ø22" (mm) or "8 holes Ø13/16"" (US), the count of every hole in the joint. */
export function holeCallout(c: { joint: Joint; dimText: (mm: number) => string }): string {
  const h = c.joint.holes[0];
  if (!h) return "no holes";
  const slot = h.along_mm !== h.across_mm ? ` × ${c.dimText(Math.max(h.along_mm, h.across_mm))} slot` : "";
  return `${c.joint.holes.length} holes Ø${c.dimText(Math.min(h.across_mm, h.along_mm))}${slot}`;
}

/** An item reference (ISO 6433): a dot on the part, a leader, the mark in a circle at `at`. */
function balloon(c: Ctx, onPart: Point, at: Point, mark: string): void {
  const r = 3.5 * c.k;
  const L = Math.hypot(onPart[0] - at[0], onPart[1] - at[1]) || 1;
  const start: Point = [at[0] + ((onPart[0] - at[0]) / L) * r, at[1] + ((onPart[1] - at[1]) / L) * r];
  c.prims.push({ kind: "circle", layer: "thin", c: onPart, r: 0.5 * c.k, fill: "black" });
  c.prims.push({ kind: "line", layer: "thin", a: onPart, b: start, role: "leader" });
  c.prims.push({ kind: "circle", layer: "thin", c: at, r });
  c.prims.push({ kind: "text", layer: "text", at: [at[0], at[1] - 0.35 * LETTERING_MM.text * c.k], height: LETTERING_MM.text * c.k, text: mark, anchor: "middle", role: "mark" });
}

/** SECTION A–A below the plan, its top face at zTop less the bolt heads; returns the lowest model y used. */
function drawSection(c: Ctx, lengths: readonly BoltLengthLine[], marks: Array<{ plate: PlateId; mark: string }>, gaugeY: number, yTopOfView: number): number {
  const { joint, k, prims } = c;
  const d = joint.boltDiameter_mm;
  const cut = joint.holes.filter((h) => h.y_mm === gaugeY);
  const maxHead = Math.max(...lengths.map((l) => 0.65 * d + l.washersUnderHead * l.washer_mm), 0.65 * d);
  const zTop = yTopOfView - Math.max(maxHead, 10 * k);
  const zOf = zFaces(joint, zTop);
  sectionPlates(c, zOf, cut);
  let lowest = zTop - stackThickness(joint);
  let leftBolt: { x: number; zHead: number; L: number; washered: boolean } | null = null;
  for (const hole of cut) {
    const b = drawBolt(c, hole, lengths, zOf);
    lowest = Math.min(lowest, b.zHead - b.L - 2 * k);
    if (!leftBolt || hole.x_mm < leftBolt.x) leftBolt = { x: hole.x_mm, ...b };
  }
  // Bolt length: from under the head to the end of the shank, beside the leftmost bolt.
  if (leftBolt) {
    const xd = leftBolt.x - 1.6 * d - 2 * k;
    // The value sits beside the part of the shank below the plies, clear of the plates' edges.
    const zStackBottom = zTop - stackThickness(joint);
    const zEnd = leftBolt.zHead - leftBolt.L;
    const textAt = zStackBottom > zEnd ? (leftBolt.zHead - (zStackBottom + zEnd) / 2) / leftBolt.L : 0.5;
    prims.push({ kind: "dim", view: "section", from: [leftBolt.x - 0.8 * d, leftBolt.zHead], to: [leftBolt.x - d / 2, zEnd], at: xd, direction: "y", value: leftBolt.L, text: c.dimText(leftBolt.L), extension: [leftBolt.washered, true], textAt }); // under the head: the plies' face, or a washer's
  }
  thicknessDims(c, zOf);
  return Math.min(lowest, sectionMarks(c, zOf, marks, zTop));
}

/** Plates in section: each split at the holes on the cut (the shank fills the hole, bolts are not hatched), hatched part by part. */
function sectionPlates(c: Ctx, zOf: Map<string, [number, number]>, cut: Hole[]): void {
  const hatch = hatchStyles(c.joint);
  for (const p of c.joint.plates) {
    const [x0, x1] = drawnExtent(p, c.ext);
    const [zt, zb] = zOf.get(p.id)!;
    const holes = cut.filter((h) => h.x_mm > x0 && h.x_mm < x1).map((h) => [h.x_mm - h.along_mm / 2, h.x_mm + h.along_mm / 2] as [number, number]).sort((a, b) => a[0] - b[0]);
    const pieces: Array<[number, number]> = [];
    let from = x0;
    for (const [a, b] of holes) {
      if (a > from) pieces.push([from, a]);
      from = Math.max(from, b);
    }
    if (x1 > from) pieces.push([from, x1]);
    const style = hatch.get(p.id)!;
    const lines: Array<[Point, Point]> = [];
    for (const [a, b] of pieces) {
      const closedLeft = !(p.continues === "left" && a === x0);
      const closedRight = !(p.continues === "right" && b === x1);
      c.prims.push(...pieceOutline(p.id, a, b, zt, zb, closedLeft, closedRight));
      lines.push(...hatchLines(a, b, zb, zt, style.angle_deg, style.spacing_paper_mm * c.k));
    }
    c.prims.push({ kind: "hatch", part: p.id, angle_deg: style.angle_deg, spacing_mm: style.spacing_paper_mm * c.k, lines });
    if (p.continues !== "none") breakLine(c, p.continues === "left" ? x0 : x1, zb - 1.5 * c.k, zt + 1.5 * c.k, p.id);
  }
}

/** A plate piece in section: its faces wide, its ends wide unless the plate runs on (a break line there). */
function pieceOutline(id: PlateId, a: number, b: number, zt: number, zb: number, left: boolean, right: boolean): Primitive[] {
  const out: Primitive[] = [
    { kind: "poly", layer: "section", points: [[a, zb], [b, zb], [b, zt], [a, zt]], closed: true, plate: id, fill: "white" },
    { kind: "line", layer: "section", a: [a, zt], b: [b, zt], part: id },
    { kind: "line", layer: "section", a: [a, zb], b: [b, zb], part: id },
  ];
  if (left) out.push({ kind: "line", layer: "section", a: [a, zb], b: [a, zt], part: id });
  if (right) out.push({ kind: "line", layer: "section", a: [b, zb], b: [b, zt], part: id });
  return out;
}

/** ISO 128-50: adjacent parts hatched in another direction or at another spacing. */
export function hatchStyles(joint: Joint): Map<PlateId, { angle_deg: number; spacing_paper_mm: number }> {
  const s = HATCH_SPACING_MM;
  const styles = new Map<PlateId, { angle_deg: number; spacing_paper_mm: number }>([
    ["coverA", { angle_deg: 45, spacing_paper_mm: s }],
    ["coverB", { angle_deg: 45, spacing_paper_mm: s }],
    ["mainA", { angle_deg: 135, spacing_paper_mm: s }],
    ["mainB", { angle_deg: 135, spacing_paper_mm: 1.6 * s }],
    ["packing", { angle_deg: 45, spacing_paper_mm: 0.6 * s }],
  ]);
  if (joint.spliceType === "lap") styles.set("mainB", { angle_deg: 45, spacing_paper_mm: s });
  return styles;
}

/** Hatching lines at angle (degrees from +x) and perpendicular spacing s, clipped to the rectangle [x0, x1] × [y0, y1]. */
export function hatchLines(x0: number, x1: number, y0: number, y1: number, angle_deg: number, s: number): Array<[Point, Point]> {
  const t = (angle_deg * Math.PI) / 180;
  const u: Point = [Math.cos(t), Math.sin(t)];
  const nrm: Point = [-u[1], u[0]];
  const corners: Point[] = [[x0, y0], [x1, y0], [x1, y1], [x0, y1]];
  const offs = corners.map((p) => p[0] * nrm[0] + p[1] * nrm[1]);
  const lo = Math.min(...offs);
  const hi = Math.max(...offs);
  const out: Array<[Point, Point]> = [];
  for (let o = Math.ceil(lo / s) * s; o <= hi; o += s) {
    const base: Point = [nrm[0] * o, nrm[1] * o];
    const seg = clipToRect(base, u, x0, x1, y0, y1);
    if (seg) out.push(seg);
  }
  return out;
}

/** The part of the line base + λu inside the rectangle (Liang–Barsky), or null. */
function clipToRect(base: Point, u: Point, x0: number, x1: number, y0: number, y1: number): [Point, Point] | null {
  let lo = -Infinity;
  let hi = Infinity;
  for (const [p, d, a, b] of [[base[0], u[0], x0, x1], [base[1], u[1], y0, y1]] as Array<[number, number, number, number]>) {
    if (Math.abs(d) < 1e-12) {
      if (p < a || p > b) return null;
      continue;
    }
    const l1 = (a - p) / d;
    const l2 = (b - p) / d;
    lo = Math.max(lo, Math.min(l1, l2));
    hi = Math.min(hi, Math.max(l1, l2));
  }
  if (hi - lo < 1e-9) return null;
  return [[base[0] + lo * u[0], base[1] + lo * u[1]], [base[0] + hi * u[0], base[1] + hi * u[1]]];
}

/** A bolt in view: head, washers, shank, nut, its centre line. Returns the underside of the head and the length. */
function drawBolt(c: Ctx, hole: Hole, lengths: readonly BoltLengthLine[], zOf: Map<string, [number, number]>): { zHead: number; L: number; washered: boolean } {
  const { joint, k, prims } = c;
  const d = joint.boltDiameter_mm;
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
  const wn = (line?.washersUnderNut ?? 1) * washer;
  const rect = (hw: number, z0: number, z1: number): Primitive => ({ kind: "poly", layer: "section", points: [[x - hw, z0], [x + hw, z0], [x + hw, z1], [x - hw, z1]], closed: true, fill: "white" });
  prims.push(rect(d / 2, zHead - L, zHead));
  prims.push(rect(0.8 * d, zHead, zHead + head));
  if (underHead > 0) prims.push(rect(d, zt, zHead));
  prims.push(rect(d, zb - wn, zb));
  prims.push(rect(0.8 * d, zb - wn - nut, zb - wn));
  prims.push({ kind: "line", layer: "centre", a: [x, zHead + head + 2 * k], b: [x, zHead - L - 2 * k] });
  return { zHead, L, washered: underHead > 0 };
}

/** Thicknesses of the plies (packing included) as a vertical chain just past a cover end, on the packed side if any. */
function thicknessDims(c: Ctx, zOf: Map<string, [number, number]>): void {
  const { joint, k, prims } = c;
  const packedGroup = joint.groups.find((g) => g.packing_mm > 0);
  const group = packedGroup ?? joint.groups.find((g) => g.id === "B") ?? joint.groups[0]!;
  const leftSide = joint.spliceType !== "lap" && group.id === "A";
  const xEnd = leftSide ? c.spliceX0 : c.spliceX1;
  const dir = leftSide ? -1 : 1;
  // In a lap splice the far end of the overlap shows the two plies; the top one ends there.
  const xAt = xEnd + dir * 5 * k;
  const faces = group.stack.map((id) => zOf.get(id)!);
  const zs = [...new Set(faces.flatMap(([t, b]) => [t, b]))].sort((a, b) => b - a);
  // A face that runs on past the dimension line (a main plate's) needs no extension line: the dimension line meets it.
  const runsOn = (z: number) => group.stack.some((id) => {
    const p = joint.plates.find((q) => q.id === id)!;
    const [x0, x1] = drawnExtent(p, c.ext);
    const [zt, zb] = zOf.get(id)!;
    return x0 < xAt && x1 > xAt && (Math.abs(zt - z) < 1e-9 || Math.abs(zb - z) < 1e-9);
  });
  for (let i = 1; i < zs.length; i++) {
    const a = zs[i - 1]!;
    const b = zs[i]!;
    prims.push({ kind: "dim", view: "section", from: [xEnd, a], to: [xEnd, b], at: xAt, direction: "y", value: a - b, text: c.dimText(a - b), extension: [i === 1 && !runsOn(a), i === zs.length - 1 && !runsOn(b)] });
  }
}

/**
 * Item references in the section, each leader to a clear place: cover A up and left over main plate A's
 * stub, the main plates down under their stubs, cover B down and right, the packing straight down.
 * Returns the lowest model y used.
 */
function sectionMarks(c: Ctx, zOf: Map<string, [number, number]>, marks: Array<{ plate: PlateId; mark: string }>, zTop: number): number {
  const { joint, k } = c;
  const r = 3.5 * k;
  let lowest = Infinity;
  const stackBottom = Math.min(...[...zOf.values()].map(([, b]) => b));
  for (const p of joint.plates) {
    const [x0, x1] = drawnExtent(p, c.ext);
    const [zt, zb] = zOf.get(p.id)!;
    const zm = (zt + zb) / 2;
    let on: Point;
    let at: Point;
    if (p.role === "main") {
      const x = p.continues === "left" ? x0 + 0.4 * c.ext : x1 - 0.4 * c.ext;
      on = [x, zm];
      at = [x, zb - 4 * k - r];
    } else if (p.role === "packing") {
      const near = p.x0_mm > 0 ? p.x0_mm : p.x1_mm;
      const hole = c.xs.filter((x) => x > p.x0_mm && x < p.x1_mm).sort((a, b) => Math.abs(a - near) - Math.abs(b - near))[0] ?? (x0 + x1) / 2;
      const x = (near + hole + (p.x0_mm > 0 ? -1 : 1) * joint.boltDiameter_mm) / 2;
      on = [x, zm];
      at = [x, stackBottom - 5 * k - r];
    } else if (p === c.top) {
      on = [x0 + Math.min(0.3 * ((c.xs[0] ?? x1) - x0), 8 * k), zm];
      at = [x0 - 7 * k, zTop + 3 * k + r];
    } else {
      on = [x1 - Math.min(0.3 * (x1 - (c.xs[c.xs.length - 1] ?? x0)), 8 * k), zm];
      at = [x1 + 9 * k, zb - 3 * k - r];
    }
    balloon(c, on, at, markOf(marks, p.id));
    lowest = Math.min(lowest, at[1] - r);
  }
  return lowest;
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

/** Width of a text on paper per unit height (a sans-serif's average advance, common practice). */
export const TEXT_WIDTH_PER_HEIGHT = 0.6;

function extents(prims: readonly Primitive[], k: number): { min: Point; max: Point } {
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
      const w = TEXT_WIDTH_PER_HEIGHT * p.height * p.text.length;
      const x0t = p.anchor === "start" ? p.at[0] : p.anchor === "end" ? p.at[0] - w : p.at[0] - w / 2;
      add([x0t, p.at[1] - 0.3 * p.height]);
      add([x0t + w, p.at[1] + p.height]);
    } else if (p.kind === "arrow") (add(p.from), add(p.to));
    else if (p.kind === "dim") {
      // The value sits beside the line: its height and a gap (paper mm) on either side, and the overrun.
      const room = (LETTERING_MM.dimension + EXTENSION_GAP_MM + EXTENSION_OVERRUN_MM) * k;
      add(p.from);
      add(p.to);
      if (p.direction === "x") (add([p.from[0], p.at - room]), add([p.to[0], p.at + room]));
      else (add([p.at - room, p.from[1]]), add([p.at + room, p.to[1]]));
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

/** Drawing scales of ISO 5455 tried, largest first: 2:1 (k = 0.5), 1:1, 1:2, 1:5, 1:10, 1:20, 1:50, 1:100. */
export const SCALES = [0.5, 1, 2, 5, 10, 20, 50, 100];

/** The scale as written: "1:5", "2:1". */
export function scaleText(k: number): string {
  return k < 1 ? `${fx(1 / k)}:1` : `1:${fx(k)}`;
}

