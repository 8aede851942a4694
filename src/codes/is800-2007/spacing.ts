/**
 * Spacing, end and edge rules of IS 800:2007 cl. 10.2 and the grip limit of cl. 10.3.3.2, as pass/fail
 * checks measured on the hole coordinates. Each result prints the governing value and its limit.
 */
import { groupHoles, groupIndex, holesOfPlate, sameEnd } from "../../geometry/joint-builder.js";
import { mapped, pushAll } from "../../model/lists.js";
import { distance, fartherThan, gaugeLines, sortedByXThenY, transverseLineEnd, type Line } from "../../geometry/lines.js";
import type { Hole, Joint, PlatePiece } from "../../model/joint.js";
import type { RuleCheck } from "../../model/results.js";
import type { CheckableScenario } from "../../model/scenario.js";
import { f } from "../format.js";
import { beatsWorst, connects, forEachHolePair, PairSet, groupCentroidRule, holePlates, outsidePlates, PairThickness, worstRule, type Worst } from "../rule-measures.js";
import { fixedCl } from "./citation.js";
import { epsilon } from "./materials.js";

/** The citations of the rules below, made once (frozen; results share them). */
const MIN_SPACING_CITATION = fixedCl("10.2.2");
const MAX_SPACING_CITATION = fixedCl("10.2.3.1");
const MAX_PITCH_CITATION = fixedCl("10.2.3.2");
const EDGE_LINE_CITATION = fixedCl("10.2.3.3");
/** cl. 10.2.3.4 is cited only where its 50 % relaxation for staggered fasteners set the governing limit. */
const RELAXED = { also: ["10.2.3.4 (staggered, g ≤ 75 mm)"] };
const MAX_PITCH_RELAXED_CITATION = fixedCl("10.2.3.2", RELAXED);
const EDGE_LINE_RELAXED_CITATION = fixedCl("10.2.3.3", RELAXED);
const MIN_DISTANCE_CITATION = fixedCl("10.2.4.2");
const MAX_EDGE_CITATION = fixedCl("10.2.4.3");
const GRIP_CITATION = fixedCl("10.3.3.2");
const CENTROID_CITATION = Object.freeze({ standard: "general", clause: "concentric bolt group, assumed by the IS 800:2007 checks of Section 6 and cl. 10.3, 10.4" });

/**
 * Whether a plate's fasteners are staggered at equal intervals (cl. 10.2.3.4): consecutive transverse
 * lines share no gauge line and are equally spaced. Returns the gauge (least distance between adjacent
 * gauge lines) too. `gauge`: the gauge lines of these holes, when the caller has them already.
 * The transverse lines are those of transverseLines (holes within the line tolerance of a line's first
 * x, in order of x then y), read as runs of one sorted list: a full grid answers at its first two lines.
 */
export function staggerOf(holes: readonly Hole[], gauge: readonly Line[] = gaugeLines(holes)): { staggered: boolean; gauge_mm: number } {
  let gauge_mm = Infinity;
  for (let i = 1; i < gauge.length; i++) gauge_mm = Math.min(gauge_mm, gauge[i]!.at_mm - gauge[i - 1]!.at_mm);
  const sorted = sortedByXThenY(holes);
  const n = sorted.length;
  // Line a is sorted[a0 .. a1), the next line b is sorted[a1 .. b1).
  let a0 = 0;
  let a1 = transverseLineEnd(sorted, 0);
  if (a1 >= n) return { staggered: false, gauge_mm };
  let b1 = transverseLineEnd(sorted, a1);
  const spacing = sorted[a1]!.x_mm - sorted[0]!.x_mm;
  for (;;) {
    if (sharesGaugeLine(sorted, a0, a1, b1)) return { staggered: false, gauge_mm };
    if (Math.abs(sorted[a1]!.x_mm - sorted[a0]!.x_mm - spacing) > 1e-6) return { staggered: false, gauge_mm };
    if (b1 >= n) return { staggered: true, gauge_mm };
    a0 = a1;
    a1 = b1;
    b1 = transverseLineEnd(sorted, a1);
  }
}

/** Whether two consecutive transverse lines, sorted[a0 .. a1) and sorted[a1 .. b1), have a hole at the same y (the same gauge line). */
function sharesGaugeLine(sorted: readonly Hole[], a0: number, a1: number, b1: number): boolean {
  for (let i = a1; i < b1; i++) for (let j = a0; j < a1; j++) if (sorted[i]!.y_mm === sorted[j]!.y_mm) return true;
  return false;
}

/** A bolt group's gauge lines and stagger (cl. 10.2.3.4). */
interface GroupLines {
  gaugeLines: Line[];
  stagger: { staggered: boolean; gauge_mm: number };
}

/**
 * What the spacing and edge rules of one check measure on its joint, worked out once and handed to
 * each rule of the same call (never kept between calls): the plates that carry load, the outside
 * plates of the bolt stacks, each plate's holes, each group's gauge lines and stagger, and the
 * thickness of the thinner plate each pair of groups passes through.
 */
export interface SpacingLayout {
  plates: PlatePiece[];
  outside: PlatePiece[];
  /** The holes through plates[k], every group it connects to, in the joint's order (holesOfPlate: the joint's own lists, read only). */
  holesOf: (readonly Hole[])[];
  /** Each group's lines, in the order of joint.groups. */
  groups: GroupLines[];
  /** The thinner plate two holes both pass through (pairThickness), once per pair of groups. */
  pairThickness: PairThickness;
}

/** The joint's spacing layout (see SpacingLayout). */
export function spacingLayout(joint: Joint): SpacingLayout {
  const plates = holePlates(joint);
  const holesOf = mapped(plates, (plate) => holesOfPlate(joint, plate));
  const groups = mapped(joint.groups, (g): GroupLines => {
    const lines = gaugeLines(g.holes);
    return { gaugeLines: lines, stagger: staggerOf(g.holes, lines) };
  });
  return { plates, outside: outsidePlates(joint), holesOf, groups, pairThickness: new PairThickness(joint) };
}

/** The lines of a group, from the layout. */
function linesOfGroup(joint: Joint, layout: SpacingLayout, group: Hole["group"]): GroupLines {
  return layout.groups[groupIndex(joint, group)]!;
}

/** Thickness of the thinner plate both holes pass through (pairThickness), from the layout. */
function thinnerPlate(layout: SpacingLayout, a: Hole, b: Hole): number {
  return layout.pairThickness.of(a, b);
}

/*
 * The measurements below are made by small functions called only for a new worst: a closure written
 * inside a loop over holes would make V8 allocate the loop's variables for it at every turn, whether
 * or not the closure is made (the checker's largest allocation before round 3).
 */

/** A pair's centre distance against 2.5 d (cl. 10.2.2), its working written on demand. */
function spacingWorst(plate: PlatePiece, a: Hole, b: Hole, s: number, d: number): Worst {
  return { value: s, limit: 2.5 * d, where: plate.label, detail: () => `holes ${a.id}–${b.id}: ${f(s)} mm vs 2.5d = 2.5 × ${d} = ${f(2.5 * d)} mm` };
}

/** Minimum spacing between fastener centres, 2.5 d. IS 800:2007, cl. 10.2.2. */
export function minSpacingRule(joint: Joint): RuleCheck[] {
  const d = joint.boltDiameter_mm;
  let worst: Worst | null = null;
  forEachHolePair(joint, (plate, a, b) => {
    // The limit is the same for every pair: only a pair nearer than the nearest so far can govern.
    if (worst !== null && fartherThan(a, b, (worst as Worst).value)) return;
    const s = distance(a, b);
    if (beatsWorst(worst, s, 2.5 * d, "min")) worst = spacingWorst(plate, a, b, s, d);
  });
  return worstRule("min-spacing", "min-spacing", "Minimum spacing", MIN_SPACING_CITATION, "s ≥ 2.5 d", "min", worst);
}

/**
 * Maximum spacing. IS 800:2007, cl. 10.2.3.1–10.2.3.4:
 *  - any two adjacent fasteners (here: adjacent gauge lines across the force) ≤ min(32 t, 300 mm);
 *  - pitch along the force in tension members ≤ min(16 t, 200 mm);
 *  - on a line next to an edge of an outside plate ≤ min(100 + 4 t, 200 mm);
 *  - staggered at equal intervals with gauge ≤ 75 mm: the last two limits × 1.5, not above min(32 t, 300).
 */
export function maxSpacingRules(joint: Joint, layout: SpacingLayout = spacingLayout(joint)): RuleCheck[] {
  const worst: MaxSpacingWorst = { across: null, pitch: null, edgeLine: null, pitchRelaxed: false, edgeLineRelaxed: false };
  const seen = new PairSet(joint.holes);
  const plates = layout.plates;
  const linesOf: Line[][] = [];
  for (let k = 0; k < plates.length; k++) {
    const plate = plates[k]!;
    // Joined to the same groups as an earlier plate (cover B after cover A): its gauges and pitches are
    // that plate's, already measured, and its lines the same; only its own edge-line limit (its thickness) is new.
    const earlier = sameGroupsEarlier(plates, k);
    const repeat = earlier >= 0;
    const lines = repeat ? linesOf[earlier]! : plate.connections.length === 1 ? linesOfGroup(joint, layout, plate.connections[0]!.group).gaugeLines : gaugeLines(layout.holesOf[k]!);
    linesOf.push(lines);
    const first = plate.connections[0];
    const stagger = first ? linesOfGroup(joint, layout, first.group).stagger : staggerOf(layout.holesOf[k]!);
    const relax = stagger.staggered && stagger.gauge_mm <= 75 ? 1.5 : 1.0;
    if (!repeat) {
      for (let g = 0; g < joint.groups.length; g++) if (connects(plate, joint.groups[g]!.id)) acrossRule(joint, layout, plate, layout.groups[g]!.gaugeLines, worst);
    }
    const isOutside = layout.outside.includes(plate);
    for (let index = 0; index < lines.length; index++) {
      const edge = index === 0 || index === lines.length - 1;
      pitchRules(joint, layout, plate, lines[index]!.holes, relax, !repeat, edge && isOutside, seen, worst);
    }
  }
  const rules = worstRule("max-spacing", "max-spacing", "Maximum spacing across the force", MAX_SPACING_CITATION, "g ≤ min(32 t, 300 mm)", "max", worst.across);
  pushAll(rules, worstRule("max-pitch", "max-pitch", "Maximum pitch along the force (tension member)", worst.pitchRelaxed ? MAX_PITCH_RELAXED_CITATION : MAX_PITCH_CITATION, "p ≤ min(16 t, 200 mm)", "max", worst.pitch));
  pushAll(rules, worstRule("max-edge-line-pitch", "max-edge-line-pitch", "Maximum pitch on a line next to an edge", worst.edgeLineRelaxed ? EDGE_LINE_RELAXED_CITATION : EDGE_LINE_CITATION, "p ≤ min(100 + 4 t, 200 mm)", "max", worst.edgeLine));
  return rules;
}


/** The governing measurements of the three maximum-spacing rules so far, and whether cl. 10.2.3.4 relaxed the governing limit. */
interface MaxSpacingWorst {
  across: Worst | null;
  pitch: Worst | null;
  edgeLine: Worst | null;
  pitchRelaxed: boolean;
  edgeLineRelaxed: boolean;
}

/** Index of an earlier plate joined to exactly the groups of plates[k], in the same order (−1: none). */
function sameGroupsEarlier(plates: readonly PlatePiece[], k: number): number {
  const mine = plates[k]!.connections;
  for (let m = 0; m < k; m++) {
    const theirs = plates[m]!.connections;
    if (theirs.length === mine.length && theirs.every((c, i) => c.group === mine[i]!.group)) return m;
  }
  return -1;
}

/** cl. 10.2.3.1 across the force: adjacent gauge lines of one group, ≤ min(32 t, 300 mm). */
function acrossRule(joint: Joint, layout: SpacingLayout, plate: PlatePiece, gl: readonly Line[], worst: MaxSpacingWorst): void {
  for (let i = 1; i < gl.length; i++) {
    const a = gl[i - 1]!.holes[0]!;
    const b = gl[i]!.holes[0]!;
    const t = thinnerPlate(layout, a, b);
    const limit = Math.min(32 * t, 300);
    const g = gl[i]!.at_mm - gl[i - 1]!.at_mm;
    if (beatsWorst(worst.across, g, limit, "max")) worst.across = acrossWorst(plate, gl[i - 1]!.at_mm, gl[i]!.at_mm, g, t, limit);
  }
}

/** A gauge between two lines against min(32 t, 300 mm) (cl. 10.2.3.1). */
function acrossWorst(plate: PlatePiece, y0: number, y1: number, g: number, t: number, limit: number): Worst {
  return { value: g, limit, where: plate.label, detail: () => `gauge between lines at y = ${f(y0)} and ${f(y1)}: ${f(g)} mm vs min(32t, 300) = min(32 × ${f(t)}, 300) = ${f(limit)} mm` };
}

/** A pitch against min(16 t, 200 mm), × 1.5 where staggered (cl. 10.2.3.2, 10.2.3.4). */
function pitchWorst(plate: PlatePiece, a: Hole, b: Hole, s: number, r: number, t: number, limit: number): Worst {
  return { value: s, limit, where: plate.label, detail: () => `holes ${a.id}–${b.id}: ${f(s)} mm vs min(16t, 200)${r > 1 ? " × 1.5 (staggered, g ≤ 75)" : ""} with t = ${f(t)} → ${f(limit)} mm` };
}

/** A pitch on a line next to an edge against min(100 + 4 t, 200 mm), × 1.5 where staggered (cl. 10.2.3.3, 10.2.3.4). */
function edgeLineWorst(plate: PlatePiece, a: Hole, b: Hole, s: number, r: number, tp: number, limit: number): Worst {
  return { value: s, limit, where: plate.label, detail: () => `holes ${a.id}–${b.id} on the edge line: ${f(s)} mm vs min(100 + 4t, 200)${r > 1 ? " × 1.5 (staggered, g ≤ 75)" : ""} with t = ${f(tp)} → ${f(limit)} mm` };
}

/**
 * cl. 10.2.3.2 and 10.2.3.3 along one gauge line: the pitch of consecutive holes ≤ min(16 t, 200 mm)
 * (each pair once over all plates), and on a line next to an edge of an outside plate ≤ min(100 + 4 t,
 * 200 mm) with that plate's t; × relax (cl. 10.2.3.4) within a group, not above min(32 t, 300 mm).
 */
function pitchRules(joint: Joint, layout: SpacingLayout, plate: PlatePiece, line: readonly Hole[], relax: number, measurePitch: boolean, edgeLine: boolean, seen: PairSet, worst: MaxSpacingWorst): void {
  for (let k = 1; k < line.length; k++) {
    const a = line[k - 1]!;
    const b = line[k]!;
    const s = b.x_mm - a.x_mm;
    const r = a.group === b.group ? relax : 1.0; // across the butt the stagger is not at equal intervals
    if (measurePitch && seen.addNew(a, b)) {
      const t = thinnerPlate(layout, a, b);
      const limit = Math.min(Math.min(16 * t, 200) * r, Math.min(32 * t, 300));
      if (beatsWorst(worst.pitch, s, limit, "max")) {
        worst.pitch = pitchWorst(plate, a, b, s, r, t, limit);
        worst.pitchRelaxed = r > 1;
      }
    }
    if (edgeLine) {
      const tp = plate.spec.thickness_mm;
      const limit = Math.min(Math.min(100 + 4 * tp, 200) * r, Math.min(32 * tp, 300));
      if (beatsWorst(worst.edgeLine, s, limit, "max")) {
        worst.edgeLine = edgeLineWorst(plate, a, b, s, r, tp, limit);
        worst.edgeLineRelaxed = r > 1;
      }
    }
  }
}

/** Thickness of the thinner outside plate of the bolt stacks a plate belongs to (cl. 10.2.4.3). */
function outerThickness(outside: readonly PlatePiece[], plate: PlatePiece): number {
  let t = Infinity;
  for (const p of outside) if (sharesGroup(p, plate)) t = Math.min(t, p.spec.thickness_mm);
  return t;
}

/** Whether two plates take load from a common bolt group. */
function sharesGroup(p: PlatePiece, q: PlatePiece): boolean {
  for (const c of p.connections) if (connects(q, c.group)) return true;
  return false;
}

/** The minimum end and edge distance factor on d0 of cl. 10.2.4.2: 1.7 for sheared or hand flame cut edges, else 1.5. */
function minDistanceFactor(plate: PlatePiece): number {
  const rough = plate.spec.edges === "sheared" || plate.spec.edges === "hand-flame-cut";
  return rough ? 1.7 : 1.5;
}

/** The factor in words: "1.5 d0 (sawn edge)". */
function minDistanceText(plate: PlatePiece): string {
  return `${minDistanceFactor(plate)} d0 (${plate.spec.edges} edge)`;
}

/** The maximum edge distance of cl. 10.2.4.3 with its numbers: "12tε = 12 × 10 × 1" or "40 + 4t = 40 + 4 × 10". */
function maxEdgeText(exposedToCorrosion: boolean, outerT: number, eps: number): string {
  return exposedToCorrosion ? `40 + 4t = 40 + 4 × ${f(outerT)}` : `12tε = 12 × ${f(outerT)} × ${f(eps, 3)}`;
}

/** A hole's edge or end distance against 1.5 d0 or 1.7 d0 (cl. 10.2.4.2); `to`: "" (edge) or " to the plate end". */
function minDistanceWorst(plate: PlatePiece, h: Hole, to: string, e: number, factor: number, d0: number, limit: number): Worst {
  return { value: e, limit, where: plate.label, detail: () => `hole ${h.id}${to}: ${f(e)} mm vs ${minDistanceText(plate)} = ${factor} × ${f(d0)} = ${f(limit)} mm` };
}

/** An edge or end distance against 12 t ε or 40 + 4 t (cl. 10.2.4.3); `what` names the distance. */
function maxDistanceWorst(plate: PlatePiece, what: string, e: number, maxLimit: number, exposed: boolean, outerT: number, eps: number): Worst {
  return { value: e, limit: maxLimit, where: plate.label, detail: () => `${what}: ${f(e)} mm vs ${maxEdgeText(exposed, outerT, eps)} = ${f(maxLimit)} mm` };
}

/** Index of an earlier plate (of layout.plates, before k) with plate k's holes, width, edge factor, outer thickness and fy: −1 none. */
function sameSidesEarlier(layout: SpacingLayout, k: number, factor: number, outerT: number): number {
  const plate = layout.plates[k]!;
  for (let m = 0; m < k; m++) {
    const p = layout.plates[m]!;
    if (layout.holesOf[m] !== layout.holesOf[k] || p.spec.width_mm !== plate.spec.width_mm || p.fy_MPa !== plate.fy_MPa) continue;
    if (minDistanceFactor(p) === factor && outerThickness(layout.outside, p) === outerT) return m;
  }
  return -1;
}

/** Whether a plate bears with connection c's group toward the same plate end as c. */
function bearsSameEnd(plate: PlatePiece, c: PlatePiece["connections"][number]): boolean {
  for (const e of plate.connections) if (sameEnd(e, c)) return true;
  return false;
}

/**
 * Minimum end and edge distances: 1.5 d0 (rolled, machine flame cut, sawn, planed edges) or 1.7 d0
 * (sheared or hand flame cut). IS 800:2007, cl. 10.2.4.2, with d0 from Table 19.
 * Maximum edge distance: 12 t ε (t of the thinner outer plate), or 40 + 4 t where exposed to corrosion.
 * IS 800:2007, cl. 10.2.4.3 — applied here to side edges and to plate ends.
 */
export function edgeRules(joint: Joint, scenario: CheckableScenario, layout: SpacingLayout = spacingLayout(joint)): RuleCheck[] {
  let minEnd: Worst | null = null;
  let minEdge: Worst | null = null;
  let maxEdge: Worst | null = null;
  const outside = layout.outside;
  for (let k = 0; k < layout.plates.length; k++) {
    const plate = layout.plates[k]!;
    const holes = layout.holesOf[k]!;
    if (holes.length === 0) continue;
    const factor = minDistanceFactor(plate);
    const half = plate.spec.width_mm / 2;
    const outerT = outerThickness(outside, plate);
    const eps = epsilon(plate.fy_MPa);
    const maxLimit = scenario.options.exposedToCorrosion ? 40 + 4 * outerT : 12 * outerT * eps;
    const exposed = scenario.options.exposedToCorrosion;
    // An earlier plate with the same holes, width, edges, outer t and fy (cover B after cover A; the
    // second plate of a lap) measured the same side distances, and the same end distances toward each
    // end both bear on: equal measurements never replace the worst (beatsWorst), so they are not made again.
    const earlier = sameSidesEarlier(layout, k, factor, outerT);
    if (earlier < 0) {
      let yMin = Infinity;
      let yMax = -Infinity;
      for (const h of holes) {
        const edge = half - Math.abs(h.y_mm);
        const limit = factor * h.across_mm;
        if (beatsWorst(minEdge, edge, limit, "min")) minEdge = minDistanceWorst(plate, h, "", edge, factor, h.across_mm, limit);
        yMin = Math.min(yMin, h.y_mm);
        yMax = Math.max(yMax, h.y_mm);
      }
      const lower = half + yMin;
      if (beatsWorst(maxEdge, lower, maxLimit, "max")) maxEdge = maxDistanceWorst(plate, "lower edge to nearest gauge line", lower, maxLimit, exposed, outerT, eps);
      const upper = half - yMax;
      if (beatsWorst(maxEdge, upper, maxLimit, "max")) maxEdge = maxDistanceWorst(plate, "upper edge to nearest gauge line", upper, maxLimit, exposed, outerT, eps);
    }
    for (const c of plate.connections) {
      if (earlier >= 0 && bearsSameEnd(layout.plates[earlier]!, c)) continue;
      let nearest = Infinity;
      for (const h of groupHoles(joint, c.group)) {
        const u = c.towardEnd * (c.endX_mm - h.x_mm);
        nearest = Math.min(nearest, u);
        const limit = factor * h.along_mm;
        if (beatsWorst(minEnd, u, limit, "min")) minEnd = minDistanceWorst(plate, h, " to the plate end", u, factor, h.along_mm, limit);
      }
      if (beatsWorst(maxEdge, nearest, maxLimit, "max")) maxEdge = maxDistanceWorst(plate, "plate end to nearest transverse line", nearest, maxLimit, exposed, outerT, eps);
    }
  }
  const rules = worstRule("min-end-distance", "min-end-distance", "Minimum end distance", MIN_DISTANCE_CITATION, "e1 ≥ 1.5 d0 or 1.7 d0 by edge preparation (d0: cl. 10.2.1, Table 19; oversize and slotted holes cl. 17.2.4.3)", "min", minEnd);
  pushAll(rules, worstRule("min-edge-distance", "min-edge-distance", "Minimum edge distance", MIN_DISTANCE_CITATION, "e2 ≥ 1.5 d0 or 1.7 d0 by edge preparation (d0: cl. 10.2.1, Table 19; oversize and slotted holes cl. 17.2.4.3)", "min", minEdge));
  pushAll(rules, worstRule("max-edge-distance", "max-edge-distance", "Maximum edge and end distance", MAX_EDGE_CITATION, scenario.options.exposedToCorrosion ? "e ≤ 40 + 4 t (exposed to corrosion)" : "e ≤ 12 t ε", "max", maxEdge));
  return rules;
}

/** A group's grip against 8 d (cl. 10.3.3.2). */
function gripWorst(joint: Joint, g: Joint["groups"][number], d: number): Worst {
  return { value: g.grip_mm, limit: 8 * d, where: joint.spliceType === "lap" ? "bolts" : `bolts, side ${g.id}`, detail: () => `lg = ${f(g.grip_mm)} mm vs 8d = 8 × ${d} = ${f(8 * d)} mm` };
}

/** Grip length not above 8 d. IS 800:2007, cl. 10.3.3.2. */
export function gripRule(joint: Joint): RuleCheck[] {
  const d = joint.boltDiameter_mm;
  let worst: Worst | null = null;
  for (const g of joint.groups) {
    if (beatsWorst(worst, g.grip_mm, 8 * d, "max")) worst = gripWorst(joint, g, d);
  }
  return worstRule("grip-length", "grip-length", "Grip length", GRIP_CITATION, "lg ≤ 8 d", "max", worst);
}

/**
 * The bolt group's centroid on the plate axis. Every check here assumes a concentric group; an eccentric
 * group is reported as failing rather than accepted silently.
 */
export function centroidRule(joint: Joint): RuleCheck[] {
  return groupCentroidRule(joint, CENTROID_CITATION);
}
