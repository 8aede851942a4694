/**
 * Spacing, end and edge rules of AISC 360-16 J3.3–J3.5 and the filler limit of J5.2, as pass/fail checks
 * measured on the hole coordinates. Each result prints the governing value and its limit.
 */
import { inchBoltSize } from "../../catalogue/bolts.js";
import { groupHoles } from "../../geometry/joint-builder.js";
import { distance, fartherThan, gaugeLines, type Line } from "../../geometry/lines.js";
import type { Hole, Joint, PlatePiece } from "../../model/joint.js";
import type { RuleCheck, Warning } from "../../model/results.js";
import type { CheckableScenario, Scenario } from "../../model/scenario.js";
import { beatsWorst, connects, forEachHolePair, groupCentroidRule, holePlates, PairThickness, platesHoles, worstRule, type Worst } from "../rule-measures.js";
import { fixedCl } from "./citation.js";
import { unitText, type UnitText } from "./display.js";
import { MM_PER_IN } from "./factors.js";
import { mapped, pushAll } from "../../model/lists.js";

/** Minimum spacing between centres of standard, oversized or slotted holes, 2⅔ d (3 d preferred). AISC 360-16 J3.3. */
export function minSpacing_mm(d_mm: number): number {
  return (8 / 3) * d_mm;
}

/** Table J3.4, in, by bolt size in inches. */
const MIN_EDGE_J34_IN: Readonly<Record<string, number>> = Object.freeze({ "0.5": 0.75, "0.625": 0.875, "0.75": 1, "0.875": 1.125, "1": 1.25, "1.125": 1.5 });
/** Table J3.4M, mm, by bolt size in mm. */
const MIN_EDGE_J34M_MM: Readonly<Record<number, number>> = Object.freeze({ 16: 22, 20: 26, 22: 28, 24: 30, 27: 34, 30: 38, 36: 46 });

/**
 * Minimum edge distance from the centre of a standard hole to an edge of a connected part, mm.
 * AISC 360-16 Table J3.4 (in: ½ → ¾, ⅝ → ⅞, ¾ → 1, ⅞ → 1⅛, 1 → 1¼, 1⅛ → 1½, over 1¼ → 1¼ d) and
 * Table J3.4M (M16 22, M20 26, M22 28, M24 30, M27 34, M30 38, M36 46, over M36 1.25 d).
 */
export function minEdge_mm(d_mm: number): number {
  const inch = inchBoltSize(d_mm);
  if (inch !== undefined) return (MIN_EDGE_J34_IN[String(inch)] ?? 1.25 * inch) * MM_PER_IN;
  return MIN_EDGE_J34M_MM[d_mm] ?? 1.25 * d_mm;
}

/** Maximum edge distance: 12 t of the part, not above 6 in (150 mm). AISC 360-16 J3.5. */
export function maxEdge_mm(t_mm: number, inch: boolean): number {
  return Math.min(12 * t_mm, inch ? 6 * MM_PER_IN : 150);
}

/**
 * Maximum spacing of fasteners in parts in contact: painted, or unpainted not subject to corrosion,
 * 24 t of the thinner part and 12 in (305 mm); unpainted weathering steel subject to atmospheric corrosion
 * (here: options.exposed_to_corrosion), 14 t and 7 in (180 mm). AISC 360-16 J3.5(a), (b).
 */
export function maxSpacing_mm(t_mm: number, inch: boolean, corrosion: boolean): number {
  return corrosion ? Math.min(14 * t_mm, inch ? 7 * MM_PER_IN : 180) : Math.min(24 * t_mm, inch ? 12 * MM_PER_IN : 305);
}

const isInch = (joint: Joint) => inchBoltSize(joint.boltDiameter_mm) !== undefined;

/*
 * Governing measurements are made by small functions called only for a new worst: a text closure
 * written inside a loop over holes would make V8 allocate the loop's variables at every turn.
 */

/** A pair's centre distance against 2⅔ d (J3.3), 3 d preferred. */
function spacingWorst(u: UnitText, plate: PlatePiece, a: Hole, b: Hole, s: number, limit: number, d_mm: number): Worst {
  return { value: s, limit, where: plate.label, detail: () => `holes ${a.id}–${b.id}: ${u.len(s)} vs 2⅔ d = ${u.len(limit)} (3 d = ${u.len(3 * d_mm)} preferred)` };
}

/** A pitch between holes a–b, or hole a's distance (b null; `to`: "" or " to the plate end"), against a limit. */
function pairWorst(u: UnitText, plate: PlatePiece, a: Hole, b: Hole | null, to: string, value: number, limit: number): Worst {
  return { value, limit, where: plate.label, detail: () => `${b ? `holes ${a.id}–${b.id}` : `hole ${a.id}`}${to}: ${u.len(value)} vs ${u.len(limit)}` };
}

/** A hole's side edge distance against 12 t, not above 6 in (150 mm) (J3.5). */
function sideEdgeWorst(u: UnitText, plate: PlatePiece, h: Hole, e: number, maxLimit: number, inch: boolean): Worst {
  return { value: e, limit: maxLimit, where: plate.label, detail: () => `hole ${h.id} to the side edge: ${u.len(e)} vs 12 t = 12 × ${u.len(plate.spec.thickness_mm)}, ≤ ${inch ? "6 in" : "150 mm"} → ${u.len(maxLimit)}` };
}

const MIN_SPACING_CITATION = fixedCl("J3.3");

/**
 * One walk over the hole pairs for J3.3: the governing pair against 2⅔ d, and the least centre
 * distance of all pairs (for the 3 d preference). A pair is measured only when it may be nearer than
 * the governing one so far; a pair farther than that one cannot be the least either.
 */
function measureSpacing(joint: Joint, u: UnitText): { worst: Worst | null; least_mm: number } {
  const limit = minSpacing_mm(joint.boltDiameter_mm);
  let worst: Worst | null = null;
  let least = Infinity;
  forEachHolePair(joint, (plate, a, b) => {
    // The limit is the same for every pair: only a pair nearer than the nearest so far can govern.
    if (worst !== null && fartherThan(a, b, (worst as Worst).value)) return;
    const s = distance(a, b);
    least = Math.min(least, s);
    if (beatsWorst(worst, s, limit, "min")) worst = spacingWorst(u, plate, a, b, s, limit, joint.boltDiameter_mm);
  });
  return { worst, least_mm: least };
}

/** The rule of the governing pair. AISC 360-16 J3.3. */
function minSpacingOf(worst: Worst | null): RuleCheck[] {
  return worstRule("min-spacing", "min-spacing", "Minimum spacing", MIN_SPACING_CITATION, "s ≥ 2⅔ d", "min", worst);
}

/**
 * Minimum spacing between fastener centres, 2⅔ d, and the preferred 3 d (a warning, not a failed check,
 * when the least centre distance is below it: "a distance of 3d is preferred"), from one walk over the
 * hole pairs. AISC 360-16 J3.3.
 */
export function spacingRuleAndWarning(joint: Joint, scenario: Scenario): { rules: RuleCheck[]; warning: Warning | null } {
  const u = unitText(scenario);
  const m = measureSpacing(joint, u);
  return { rules: minSpacingOf(m.worst), warning: preferredSpacingOf(joint, u, m.least_mm) };
}

/** The 3 d warning for the least centre distance (AISC 360-16 J3.3). */
function preferredSpacingOf(joint: Joint, u: UnitText, least: number): Warning | null {
  const d = joint.boltDiameter_mm;
  if (!(least < 3 * d - 1e-9)) return null;
  return { id: "spacing-below-3d", message: `least bolt spacing ${u.len(least)} is below the preferred 3 d = ${u.len(3 * d)} (AISC 360-16 J3.3; the minimum 2⅔ d is checked)` };
}

/** Whether a plate before plates[k] connects to the same bolt groups, in the same order. */
function repeatsEarlierPlate(plates: readonly PlatePiece[], k: number): boolean {
  for (let m = 0; m < k; m++) if (sameConnections(plates[m]!, plates[k]!)) return true;
  return false;
}

/** Whether two plates connect to the same bolt groups, in the same order. */
function sameConnections(a: PlatePiece, b: PlatePiece): boolean {
  if (a.connections.length !== b.connections.length) return false;
  for (let i = 0; i < a.connections.length; i++) if (a.connections[i]!.group !== b.connections[i]!.group) return false;
  return true;
}

/** The gap between adjacent gauge lines i−1 and i of a group against a limit (J3.5 applied across). */
function gaugeGapWorst(u: UnitText, plate: PlatePiece, lines: readonly Line[], i: number, g: number, limit: number): Worst {
  return { value: g, limit, where: plate.label, detail: () => `gauge lines at y = ${u.len(lines[i - 1]!.at_mm)} and ${u.len(lines[i]!.at_mm)}: ${u.len(g)} vs ${u.len(limit)}` };
}

/** J3.5(a) (painted, or not subject to corrosion) and J3.5(b) (weathering steel exposed to corrosion), with their formulas by bolt unit. */
const MAX_SPACING_TEXTS = {
  painted: { citation: fixedCl("J3.5(a)"), inch: "s ≤ min(24 t, 12 in)", metric: "s ≤ min(24 t, 305 mm)" },
  corrosion: {
    citation: fixedCl("J3.5(b)"),
    inch: "s ≤ min(14 t, 7 in) (unpainted weathering steel exposed to corrosion)",
    metric: "s ≤ min(14 t, 180 mm) (unpainted weathering steel exposed to corrosion)",
  },
} as const;

/** Maximum spacing along gauge lines and across between adjacent gauge lines. AISC 360-16 J3.5. */
export function maxSpacingRule(joint: Joint, scenario: CheckableScenario): RuleCheck[] {
  const u = unitText(scenario);
  const corrosion = scenario.options.exposedToCorrosion;
  const inch = isInch(joint);
  let along: Worst | null = null;
  let across: Worst | null = null;
  const plates = holePlates(joint);
  const groupLines = mapped(joint.groups, (g) => gaugeLines(g.holes));
  const thinner = new PairThickness(joint);
  const plateLines: Line[][] = [];
  const acrossWalked = mapped(joint.groups, () => false);
  for (let k = 0; k < plates.length; k++) {
    const plate = plates[k]!;
    plateLines.push(gaugeLinesOfPlate(joint, plates, plateLines, groupLines, k));
    // A plate with an earlier plate's groups (cover B after cover A) has its lines and pair thicknesses:
    // its equal spacings never replace the worst (a worse one must be worse by more than the tolerance).
    if (repeatsEarlierPlate(plates, k)) continue;
    for (const line of plateLines[k]!) {
      for (let n = 1; n < line.holes.length; n++) {
        const a = line.holes[n - 1]!;
        const b = line.holes[n]!;
        const limit = maxSpacing_mm(thinner.of(a, b), inch, corrosion);
        const s = b.x_mm - a.x_mm;
        if (beatsWorst(along, s, limit, "max")) along = pairWorst(u, plate, a, b, "", s, limit);
      }
    }
    for (let gi = 0; gi < joint.groups.length; gi++) {
      // A group's gaps (and their limits, from its groups alone) are walked with the first plate joined to it.
      if (acrossWalked[gi] || !connects(plate, joint.groups[gi]!.id)) continue;
      acrossWalked[gi] = true;
      const gl = groupLines[gi]!;
      for (let i = 1; i < gl.length; i++) {
        const limit = maxSpacing_mm(thinner.of(gl[i - 1]!.holes[0]!, gl[i]!.holes[0]!), inch, corrosion);
        const g = gl[i]!.at_mm - gl[i - 1]!.at_mm;
        if (beatsWorst(across, g, limit, "max")) across = gaugeGapWorst(u, plate, gl, i, g, limit);
      }
    }
  }
  const texts = corrosion ? MAX_SPACING_TEXTS.corrosion : MAX_SPACING_TEXTS.painted;
  const formula = inch ? texts.inch : texts.metric;
  const out = worstRule("max-pitch", "max-pitch", "Maximum spacing along the force", texts.citation, formula, "max", along);
  // J3.5 limits the longitudinal spacing; its limit is applied across the force too (the reading that refuses more).
  pushAll(out, worstRule("max-spacing", "max-spacing", "Maximum spacing across the force (J3.5's longitudinal limit, also applied across)", texts.citation, formula, "max", across));
  return out;
}

/**
 * The gauge lines of plates[k]'s holes: a plate joined to one group has that group's lines; one joined
 * to the groups of an earlier plate, that plate's lines (`plateLines`, one per earlier plate).
 */
function gaugeLinesOfPlate(joint: Joint, plates: readonly PlatePiece[], plateLines: readonly Line[][], groupLines: readonly Line[][], k: number): Line[] {
  const plate = plates[k]!;
  for (let m = 0; m < k; m++) if (sameConnections(plates[m]!, plate)) return plateLines[m]!;
  if (plate.connections.length === 1) {
    const group = plate.connections[0]!.group;
    for (let gi = 0; gi < joint.groups.length; gi++) if (joint.groups[gi]!.id === group) return groupLines[gi]!;
    throw new RangeError(`plate ${plate.id} connects to bolt group ${group}, which the joint does not have`);
  }
  return gaugeLines(platesHoles(joint, plate));
}

/** The maximum edge distance at a plate end, hole h's distance e, against 12 t ≤ 6 in (150 mm) (J3.5). */
function endEdgeWorst(u: UnitText, plate: PlatePiece, h: Hole, e: number, maxLimit: number): Worst {
  return { value: e, limit: maxLimit, where: plate.label, detail: () => `hole ${h.id} to the plate end: ${u.len(e)} vs ${u.len(maxLimit)}` };
}

/** J3.4 with Table J3.4 (inch bolts) or J3.4M (metric), and J3.5 for the maximum. */
const EDGE_TEXTS = {
  inch: { min: fixedCl("J3.4", { table: "Table J3.4" }), minFormula: "e ≥ Table J3.4 value", max: fixedCl("J3.5"), maxFormula: "e ≤ min(12 t, 6 in)" },
  metric: { min: fixedCl("J3.4", { table: "Table J3.4M" }), minFormula: "e ≥ Table J3.4M value", max: fixedCl("J3.5"), maxFormula: "e ≤ min(12 t, 150 mm)" },
} as const;

/**
 * Minimum end and edge distances (Table J3.4 / J3.4M, standard holes) and the maximum edge distance
 * 12 t ≤ 6 in (J3.5), applied to side edges and to plate ends. AISC 360-16 J3.4, J3.5.
 */
export function edgeRules(joint: Joint, scenario: CheckableScenario): RuleCheck[] {
  const u = unitText(scenario);
  const inch = isInch(joint);
  const minLimit = minEdge_mm(joint.boltDiameter_mm);
  let minEnd: Worst | null = null;
  let minEdge: Worst | null = null;
  let maxEdge: Worst | null = null;
  for (const plate of joint.plates) {
    if (plate.role === "packing") continue;
    const holes = platesHoles(joint, plate);
    if (holes.length === 0) continue;
    const half = plate.spec.width_mm / 2;
    const maxLimit = maxEdge_mm(plate.spec.thickness_mm, inch);
    for (const h of holes) {
      const e = half - Math.abs(h.y_mm);
      if (beatsWorst(minEdge, e, minLimit, "min")) minEdge = pairWorst(u, plate, h, null, "", e, minLimit);
      if (beatsWorst(maxEdge, e, maxLimit, "max")) maxEdge = sideEdgeWorst(u, plate, h, e, maxLimit, inch);
    }
    for (const c of plate.connections) {
      let nearest: Hole | null = null;
      let nearestE = Infinity;
      for (const h of groupHoles(joint, c.group)) {
        const e = c.towardEnd * (c.endX_mm - h.x_mm);
        if (beatsWorst(minEnd, e, minLimit, "min")) minEnd = pairWorst(u, plate, h, null, " to the plate end", e, minLimit);
        if (nearest === null || e < nearestE) {
          nearest = h;
          nearestE = e;
        }
      }
      if (nearest !== null && beatsWorst(maxEdge, nearestE, maxLimit, "max")) maxEdge = endEdgeWorst(u, plate, nearest, nearestE, maxLimit);
    }
  }
  const texts = inch ? EDGE_TEXTS.inch : EDGE_TEXTS.metric;
  const out = worstRule("min-end-distance", "min-end-distance", "Minimum end distance", texts.min, texts.minFormula, "min", minEnd);
  pushAll(out, worstRule("min-edge-distance", "min-edge-distance", "Minimum edge distance", texts.min, texts.minFormula, "min", minEdge));
  pushAll(out, worstRule("max-edge-distance", "max-edge-distance", "Maximum edge and end distance", texts.max, texts.maxFormula, "max", maxEdge));
  return out;
}

/** J5.2 and its limit on undeveloped fillers, by bolt unit. */
const FILLER_CITATION = fixedCl("J5.2", { also: ["J5.2(b) for developed fillers"] });
const FILLER_FORMULA_INCH = "t filler ≤ 3/4 in unless developed (the older text of J5.2; refuses more than 360-16 as recalled)";
const FILLER_FORMULA_METRIC = "t filler ≤ 19 mm unless developed (the older text of J5.2; refuses more than 360-16 as recalled)";

/**
 * Undeveloped fillers not over ¾ in (19 mm). The project's reading of J5.2 (AISC 360-16): fillers over
 * ¼ in reduce the bolt shear by 1 − 0.4(t − 0.25) (J5.2(a)), here with t capped at ¾ in and thicker
 * fillers refused unless developed (J5.2(b), extended and secured). That follows the older wording of
 * the provision; as recalled, 360-16 floors the factor at 0.85 and sets no ¾ in limit (from memory; AISC
 * 360-22 J5.2(a) prints "not less than 0.85" with no ¾ in limit), so this rule refuses more than 360-16 may.
 */
export function fillerRule(joint: Joint, scenario: CheckableScenario): RuleCheck[] {
  if (scenario.options.fillersDeveloped) return [];
  const u = unitText(scenario);
  const limit = 0.75 * MM_PER_IN;
  let worst: Worst | null = null;
  for (const g of joint.groups) {
    if (g.packing_mm <= 0) continue;
    if (beatsWorst(worst, g.packing_mm, limit, "max")) worst = { value: g.packing_mm, limit, where: joint.spliceType === "lap" ? "bolts" : `bolts, side ${g.id}`, detail: () => `filler ${u.len(g.packing_mm)} vs ${u.len(limit)} (undeveloped)` };
  }
  if (!worst) return [];
  return worstRule("filler-thickness", "filler-thickness", "Undeveloped filler thickness (the project's limit)", FILLER_CITATION, isInch(joint) ? FILLER_FORMULA_INCH : FILLER_FORMULA_METRIC, "max", worst);
}

/** The bolt group's centroid on the plate axis (every check assumes a concentric group). */
export function centroidRule(joint: Joint): RuleCheck[] {
  return groupCentroidRule(joint, { standard: "general", clause: "concentric bolt group, assumed by the AISC 360-16 checks of D2, J3 and J4" });
}
