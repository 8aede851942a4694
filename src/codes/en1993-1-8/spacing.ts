/**
 * Spacing, end and edge distances of EN 1993-1-8, Table 3.3, as pass/fail checks measured on the hole
 * coordinates. Minimum values always; maximum values where the steel is exposed to the weather or other
 * corrosive influences (Table 3.3, note 1: for tension members not exposed they are unlimited).
 * d0 is the hole's diameter (a slot's width); t the thinner outer connected part (note 3).
 */
import { groupHoles, holesOfPlate } from "../../geometry/joint-builder.js";
import { distance, fartherThan, gaugeLines, LINE_TOLERANCE_MM } from "../../geometry/lines.js";
import type { Hole, Joint, PlateConnection, PlatePiece } from "../../model/joint.js";
import type { RuleCheck } from "../../model/results.js";
import type { CheckableScenario } from "../../model/scenario.js";
import { f } from "../format.js";
import { beatsWorst, forEachHolePair, groupCentroidRule, holePlates, keepWorst, outsidePlates, platesHoles, worstRule, type Worst } from "../rule-measures.js";
import { cl, fixed } from "./citation.js";
import { holeWidth } from "./holes.js";

const slotted = (h: Hole) => Math.abs(h.across_mm - h.along_mm) > 1e-9;

/** Table 3.3 citations, made once and shared by every result (frozen). */
const TABLE_3_3 = fixed(cl("3.5", { table: "Table 3.3" }));
const TABLE_3_3_NOTE_5 = fixed(cl("3.5", { table: "Table 3.3, note 5" }));
const TABLE_3_3_EXPOSED = fixed(cl("3.5", { table: "Table 3.3, exposed to corrosion" }));
const CONCENTRIC_GROUP = fixed({ standard: "general", clause: "concentric bolt group, assumed by EN 1993-1-8 3.7, 3.10.2(2) and EN 1993-1-1 6.2.3" });

/** Thickness of the thinner outer connected part of the groups a plate's holes belong to (Table 3.3, note 3). */
export function outerThickness(joint: Joint, plate: PlatePiece): number {
  const groups = new Set(plate.connections.map((c) => c.group));
  return Math.min(...outsidePlates(joint).filter((p) => p.connections.some((c) => groups.has(c.group))).map((p) => p.spec.thickness_mm));
}

/*
 * Governing measurements are made by small functions called only for a new worst: a text closure
 * written inside a loop over holes would make V8 allocate the loop's variables at every turn.
 */

/** A hole's end or edge distance (`name`: e1…e4) against factor × d0 (Table 3.3); `to`: "" or " to the plate end". */
function minDistanceWorst(plate: PlatePiece, h: Hole, to: string, name: string, e: number, factor: number, d0: number): Worst {
  return { value: e, limit: factor * d0, where: plate.label, detail: () => `hole ${h.id}${to}: ${name} = ${f(e)} mm vs ${factor} d0 = ${factor} × ${f(d0)} = ${f(factor * d0)} mm` };
}

/** A pair's spacing (`what`: "p1 = 60", "(staggered): L = 56.6"…) against factor × d0 (Table 3.3). */
function pairWorst(plate: PlatePiece, a: Hole, b: Hole, staggered: boolean, symbol: string, value: number, factor: number, d0: number): Worst {
  return { value, limit: factor * d0, where: plate.label, detail: () => `holes ${a.id}–${b.id}${staggered ? " (staggered)" : ""}: ${symbol} = ${f(value)} mm vs ${factor} d0 = ${factor} × ${f(d0)} = ${f(factor * d0)} mm` };
}

/**
 * Minimum end and edge distances. EN 1993-1-8, Table 3.3: e1 ≥ 1.2 d0 and e2 ≥ 1.2 d0; slotted holes
 * e3 ≥ 1.5 d0 (slot axis to the end) and e4 ≥ 1.5 d0 (centre of the end radius to the edge).
 */
export function minEndEdgeRules(joint: Joint): RuleCheck[] {
  let minEnd: Worst | null = null;
  let minEdge: Worst | null = null;
  const plates = holePlates(joint);
  for (let k = 0; k < plates.length; k++) {
    const plate = plates[k]!;
    // A plate with an earlier plate's width, holes and ends (cover B after cover A) measures the same
    // distances, and an equal measurement never replaces the worst: nothing of it can govern.
    if (sameAsEarlier(plates, k)) continue;
    const half = plate.spec.width_mm / 2;
    for (const h of holesOfPlate(joint, plate)) {
      const d0 = holeWidth(h);
      const slot = slotted(h);
      const factor = slot ? 1.5 : 1.2;
      const name = slot ? "e4" : "e2";
      const edge = half - Math.abs(h.y_mm) - (h.across_mm - d0) / 2;
      if (beatsWorst(minEdge, edge, factor * d0, "min")) minEdge = minDistanceWorst(plate, h, "", name, edge, factor, d0);
    }
    for (const c of plate.connections) {
      for (const h of groupHoles(joint, c.group)) {
        const d0 = holeWidth(h);
        const slot = slotted(h);
        const factor = slot ? 1.5 : 1.2;
        const name = slot ? "e3" : "e1";
        const end = c.towardEnd * (c.endX_mm - h.x_mm) - (h.along_mm - d0) / 2;
        if (beatsWorst(minEnd, end, factor * d0, "min")) minEnd = minDistanceWorst(plate, h, " to the plate end", name, end, factor, d0);
      }
    }
  }
  return [
    ...worstRule("min-end-distance", "min-end-distance", "Minimum end distance", TABLE_3_3, "e1 ≥ 1.2 d0 (slotted: e3 ≥ 1.5 d0)", "min", minEnd),
    ...worstRule("min-edge-distance", "min-edge-distance", "Minimum edge distance", TABLE_3_3, "e2 ≥ 1.2 d0 (slotted: e4 ≥ 1.5 d0)", "min", minEdge),
  ];
}

/**
 * Whether a plate before plates[k] has the same width and the same connections (the same groups, so the
 * same holes, toward the same plate ends).
 */
function sameAsEarlier(plates: readonly PlatePiece[], k: number): boolean {
  const plate = plates[k]!;
  for (let m = 0; m < k; m++) {
    const other = plates[m]!;
    if (other.spec.width_mm === plate.spec.width_mm && sameEnds(other.connections, plate.connections)) return true;
  }
  return false;
}

/** Connections of the same groups toward the same plate ends, in the same order. */
function sameEnds(a: readonly PlateConnection[], b: readonly PlateConnection[]): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) {
    if (a[i]!.group !== b[i]!.group || a[i]!.endX_mm !== b[i]!.endX_mm || a[i]!.towardEnd !== b[i]!.towardEnd) return false;
  }
  return true;
}

/**
 * The hole centres of a plate on a grid of the line tolerance: which cells hold a hole. Each hole's
 * column (rounded x) and row (rounded y) are numbered once, so that asking whether a hole sits at one
 * hole's x and another's y reads one entry of a table.
 */
class OccupiedCells {
  readonly #holes: readonly Hole[];
  /** Column and row number of each hole, in the order of the plate's holes. */
  readonly #column: number[] = [];
  readonly #row: number[] = [];
  readonly #columns: number;
  /** occupied[row × columns + column]: a hole there. */
  readonly #occupied: boolean[] = [];
  /** Every cell of the grid holds a hole (a full rectangular grid): no pair is a stagger. */
  readonly full: boolean;
  constructor(holes: readonly Hole[]) {
    this.#holes = holes;
    const xs: number[] = [];
    const ys: number[] = [];
    for (const h of holes) {
      this.#column.push(numberOf(xs, Math.round(h.x_mm / LINE_TOLERANCE_MM)));
      this.#row.push(numberOf(ys, Math.round(h.y_mm / LINE_TOLERANCE_MM)));
    }
    this.#columns = xs.length;
    for (let k = 0; k < xs.length * ys.length; k++) this.#occupied.push(false);
    let cellsHeld = 0;
    for (let i = 0; i < holes.length; i++) {
      const cell = this.#row[i]! * this.#columns + this.#column[i]!;
      if (!this.#occupied[cell]) cellsHeld++;
      this.#occupied[cell] = true;
    }
    this.full = cellsHeld === this.#occupied.length;
  }
  /**
   * Two holes of the plate staggered against each other: on different gauge lines and transverse
   * lines, with no hole of the plate at the other corners of their rectangle (a grid's diagonal is not
   * a stagger).
   */
  staggered(a: Hole, b: Hole): boolean {
    if (this.full) return false;
    const i = this.#holes.indexOf(a);
    const j = this.#holes.indexOf(b);
    return !this.#occupied[this.#row[j]! * this.#columns + this.#column[i]!] && !this.#occupied[this.#row[i]! * this.#columns + this.#column[j]!];
  }
}

/** The number of a grid line in a list of them, the line added when new. */
function numberOf(lines: number[], key: number): number {
  const k = lines.indexOf(key);
  if (k >= 0) return k;
  lines.push(key);
  return lines.length - 1;
}

/**
 * Minimum spacing. EN 1993-1-8, Table 3.3, for every pair of holes in a plate: on one gauge line
 * p1 ≥ 2.2 d0; on one transverse line p2 ≥ 2.4 d0; staggered pairs p2 ≥ 1.2 d0 with the distance
 * L ≥ 2.4 d0 (note 5).
 */
export function minSpacingRules(joint: Joint): RuleCheck[] {
  let pitch: Worst | null = null;
  let gauge: Worst | null = null;
  let staggerGauge: Worst | null = null;
  let staggerDistance: Worst | null = null;
  let occupiedPlate: PlatePiece | null = null;
  let occupied: OccupiedCells | null = null;
  forEachHolePair(joint, (plate, a, b, holes) => {
    const dx = Math.abs(a.x_mm - b.x_mm);
    const dy = Math.abs(a.y_mm - b.y_mm);
    if (dy <= LINE_TOLERANCE_MM) {
      const d0 = Math.max(holeWidth(a), holeWidth(b));
      if (beatsWorst(pitch, dx, 2.2 * d0, "min")) pitch = pairWorst(plate, a, b, false, "p1", dx, 2.2, d0);
    } else if (dx <= LINE_TOLERANCE_MM) {
      const d0 = Math.max(holeWidth(a), holeWidth(b));
      if (beatsWorst(gauge, dy, 2.4 * d0, "min")) gauge = pairWorst(plate, a, b, false, "p2", dy, 2.4, d0);
    } else {
      // The plate's grid, made at its first pair off the lines (the pairs come plate by plate).
      if (plate !== occupiedPlate) {
        occupiedPlate = plate;
        occupied = new OccupiedCells(holes);
      }
      // A full grid has no stagger. Otherwise whether the pair is a stagger is asked only when it could
      // govern one of the two stagger rules: its gauge, or its distance L (certainly not when L is beyond
      // the distance that would tie the worst).
      if (occupied!.full) return;
      const d0 = Math.max(holeWidth(a), holeWidth(b));
      const gaugeMayGovern = beatsWorst(staggerGauge, dy, 1.2 * d0, "min");
      const distanceMayGovern = staggerDistance === null || !fartherThan(a, b, (2.4 * d0 * (staggerDistance as Worst).value) / (staggerDistance as Worst).limit);
      if (!gaugeMayGovern && !distanceMayGovern) return;
      if (!occupied!.staggered(a, b)) return;
      const L = distance(a, b);
      if (beatsWorst(staggerGauge, dy, 1.2 * d0, "min")) staggerGauge = pairWorst(plate, a, b, true, "p2", dy, 1.2, d0);
      if (beatsWorst(staggerDistance, L, 2.4 * d0, "min")) staggerDistance = pairWorst(plate, a, b, true, "L", L, 2.4, d0);
    }
  });
  const citation = TABLE_3_3;
  return [
    ...worstRule("min-pitch", "min-spacing", "Minimum spacing along the force", citation, "p1 ≥ 2.2 d0", "min", pitch),
    ...worstRule("min-gauge", "min-spacing", "Minimum spacing across the force", citation, "p2 ≥ 2.4 d0", "min", gauge),
    ...worstRule("min-stagger-gauge", "min-spacing", "Minimum line spacing, staggered", TABLE_3_3_NOTE_5, "p2 ≥ 1.2 d0 (with L ≥ 2.4 d0)", "min", staggerGauge),
    ...worstRule("min-stagger-distance", "min-spacing", "Minimum distance between staggered holes", TABLE_3_3_NOTE_5, "L ≥ 2.4 d0", "min", staggerDistance),
  ];
}

/**
 * Maximum spacing, end and edge distances of members exposed to corrosion. EN 1993-1-8, Table 3.3 with
 * Figure 3.1(d) (tension members): e1, e2 ≤ 4t + 40 mm; p1 on the outer gauge lines (p1,0) ≤ min(14t,
 * 200 mm); p1 on inner gauge lines (p1,i) ≤ min(28t, 400 mm); p2 ≤ min(14t, 200 mm). None apply to tension
 * members not exposed (note 1). End distances are measured at every plate end a group bears on.
 */
export function maxRules(joint: Joint, scenario: CheckableScenario): RuleCheck[] {
  if (!scenario.options.exposedToCorrosion) return [];
  let edges: Worst | null = null;
  let outer: Worst | null = null;
  let inner: Worst | null = null;
  let across: Worst | null = null;
  const seen = new Set<string>();
  for (const plate of holePlates(joint)) {
    const holes = platesHoles(joint, plate);
    if (holes.length === 0) continue;
    const t = outerThickness(joint, plate);
    const eMax = 4 * t + 40;
    const half = plate.spec.width_mm / 2;
    const ys = holes.map((h) => h.y_mm);
    for (const [side, e] of [["lower", half + Math.min(...ys)], ["upper", half - Math.max(...ys)]] as const) {
      if (beatsWorst(edges, e, eMax, "max")) edges = { value: e, limit: eMax, where: plate.label, detail: () => `${side} edge to the nearest gauge line: e2 = ${f(e)} mm vs 4t + 40 = 4 × ${f(t)} + 40 = ${f(eMax)} mm` };
    }
    for (const c of plate.connections) {
      const nearest = Math.min(...holes.filter((h) => h.group === c.group).map((h) => c.towardEnd * (c.endX_mm - h.x_mm)));
      if (beatsWorst(edges, nearest, eMax, "max")) edges = { value: nearest, limit: eMax, where: plate.label, detail: () => `plate end to the nearest transverse line: e1 = ${f(nearest)} mm vs 4t + 40 = 4 × ${f(t)} + 40 = ${f(eMax)} mm` };
    }
    const lines = gaugeLines(holes);
    lines.forEach((line, index) => {
      const isOuter = index === 0 || index === lines.length - 1;
      const limit = isOuter ? Math.min(14 * t, 200) : Math.min(28 * t, 400);
      for (let k = 1; k < line.holes.length; k++) {
        const a = line.holes[k - 1]!;
        const b = line.holes[k]!;
        const key = `${a.id}|${b.id}`;
        if (seen.has(key)) continue;
        seen.add(key);
        const p = b.x_mm - a.x_mm;
        const w: Worst = { value: p, limit, where: plate.label, detail: () => `holes ${a.id}–${b.id} on ${isOuter ? "an outer" : "an inner"} gauge line: ${f(p)} mm vs ${isOuter ? "min(14t, 200)" : "min(28t, 400)"} with t = ${f(t)} → ${f(limit)} mm` };
        if (isOuter) outer = keepWorst(outer, w, "max");
        else inner = keepWorst(inner, w, "max");
      }
    });
    for (const group of new Set(holes.map((h) => h.group))) {
      const gl = gaugeLines(holes.filter((h) => h.group === group));
      for (let i = 1; i < gl.length; i++) {
        const g = gl[i]!.at_mm - gl[i - 1]!.at_mm;
        const limit = Math.min(14 * t, 200);
        if (beatsWorst(across, g, limit, "max")) across = { value: g, limit, where: plate.label, detail: () => `gauge lines at y = ${f(gl[i - 1]!.at_mm)} and ${f(gl[i]!.at_mm)}: p2 = ${f(g)} mm vs min(14t, 200) with t = ${f(t)} → ${f(limit)} mm` };
      }
    }
  }
  const citation = TABLE_3_3_EXPOSED;
  return [
    ...worstRule("max-edge-distance", "max-edge-distance", "Maximum end and edge distance (exposed)", citation, "e1, e2 ≤ 4t + 40 mm", "max", edges),
    ...worstRule("max-edge-line-pitch", "max-edge-line-pitch", "Maximum pitch on outer gauge lines (exposed)", citation, "p1,0 ≤ min(14t, 200 mm)", "max", outer),
    ...worstRule("max-pitch", "max-pitch", "Maximum pitch on inner gauge lines (exposed)", citation, "p1,i ≤ min(28t, 400 mm)", "max", inner),
    ...worstRule("max-spacing", "max-spacing", "Maximum spacing across the force (exposed)", citation, "p2 ≤ min(14t, 200 mm)", "max", across),
  ];
}

/** The bolt group on the plate axis: the concentric group every EN 1993-1-8 check here assumes. */
export function centroidRule(joint: Joint): RuleCheck[] {
  return groupCentroidRule(joint, CONCENTRIC_GROUP);
}
