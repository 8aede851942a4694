/**
 * What the compression checks of every code measure on a joint: the pitch along each gauge line of a
 * plate, the unbraced length of a cover across the butt, the area of a plate in compression, and the
 * force each plate carries in compression.
 */
import { groupHoles } from "../geometry/joint-builder.js";
import { gaugeLines, transverseLines, type Line } from "../geometry/lines.js";
import type { Hole, Joint, PlatePiece } from "../model/joint.js";
import type { CheckableScenario } from "../model/scenario.js";
import { beatsWorst, PairThickness, platesHoles, type Worst } from "./rule-measures.js";

/** Effective length factor of a cover plate strut held by bolts at both ends: fixed-fixed, 0.65 (common practice). */
export const COVER_STRUT_K = 0.65;

/** A pitch against its compression limit, its working written on demand (made only for a new worst, so the loop below allocates nothing per pair for it). */
function compressionPitchWorst(plate: PlatePiece, a: Hole, b: Hole, s: number, t: number, limit_mm: number, text: () => string): Worst {
  return { value: s, limit: limit_mm, where: plate.label, detail: () => `holes ${a.id}–${b.id}: ${s.toFixed(1)} mm vs ${text()} with t = ${t.toFixed(1)} → ${limit_mm.toFixed(1)} mm` };
}

/**
 * The worst pitch along the force against a limit that depends on the thinner plate of the pair.
 * Pairs are consecutive holes of one gauge line in one plate (across the butt too, on the covers).
 * Within one call, plates with the same hole list (both covers of a butt splice) read one set of gauge
 * lines, the thinner plate is found once per pair of groups, and `limitOf` is asked once per thickness
 * (it is a function of t alone).
 */
export function worstCompressionPitch(joint: Joint, limitOf: (t_mm: number) => { limit_mm: number; text: () => string }): Worst | null {
  let worst: Worst | null = null;
  const thinner = new PairThickness(joint);
  const measuredHoles: (readonly Hole[])[] = [];
  const measuredLines: Line[][] = [];
  let limitT = NaN;
  let limit = { limit_mm: NaN, text: NO_TEXT };
  for (const plate of joint.plates) {
    if (plate.role === "packing") continue;
    const holes = platesHoles(joint, plate);
    let m = measuredHoles.indexOf(holes);
    if (m < 0) {
      m = measuredHoles.length;
      measuredHoles.push(holes);
      measuredLines.push(gaugeLines(holes));
    }
    for (const line of measuredLines[m]!) {
      for (let k = 1; k < line.holes.length; k++) {
        const a = line.holes[k - 1]!;
        const b = line.holes[k]!;
        const s = b.x_mm - a.x_mm;
        const t = thinner.of(a, b);
        if (t !== limitT) {
          limit = limitOf(t);
          limitT = t;
        }
        if (beatsWorst(worst, s, limit.limit_mm, "max")) worst = compressionPitchWorst(plate, a, b, s, t, limit.limit_mm, limit.text);
      }
    }
  }
  return worst;
}

const NO_TEXT = (): string => "";

/** The largest pitch along the force between consecutive holes of one group in a plate, mm (0: one line). */
export function largestPitch_mm(joint: Joint, plate: PlatePiece): number {
  let p = 0;
  for (const line of gaugeLines(platesHoles(joint, plate))) {
    for (let k = 1; k < line.holes.length; k++) {
      const a = line.holes[k - 1]!;
      const b = line.holes[k]!;
      if (a.group === b.group) p = Math.max(p, b.x_mm - a.x_mm);
    }
  }
  return p;
}

/**
 * Unbraced length of a cover across the butt: from the innermost hole line of side A to that of side
 * B (2 × end distance at the butt + gap for patterns mirrored about the butt), mm.
 */
export function coverStrutLength_mm(joint: Joint): number {
  let innermostA = -Infinity;
  for (const h of groupHoles(joint, "A")) innermostA = Math.max(innermostA, h.x_mm);
  let innermostB = Infinity;
  for (const h of groupHoles(joint, "B")) innermostB = Math.min(innermostB, h.x_mm);
  return innermostB - innermostA;
}

/**
 * Area of a plate in compression, mm²: the gross area where the holes are standard (filled by the
 * bolts), else less the holes of the fullest transverse line (oversize and slotted holes are deducted).
 */
export function compressionArea(joint: Joint, plate: PlatePiece, holesFilled: boolean): { A_mm2: number; deducted: number; holes: Hole[] } {
  const Ag = plate.spec.width_mm * plate.spec.thickness_mm;
  if (holesFilled) return { A_mm2: Ag, deducted: 0, holes: [] };
  const lines = transverseLines(platesHoles(joint, plate));
  const fullest = lines.reduce((m, l) => (l.holes.length > m.length ? l.holes : m), [] as Hole[]);
  const deducted = fullest.reduce((s, h) => s + h.across_mm * plate.spec.thickness_mm, 0);
  return { A_mm2: Ag - deducted, deducted, holes: fullest };
}

/**
 * Compression each plate carries per unit of the factored compression: a main plate the whole force
 * (beside the splice it is the member), a cover its share of what the splice carries.
 */
export function compressionShare(plate: PlatePiece, spliceShare: number): number {
  return plate.role === "main" ? 1 : plate.forceShare * spliceShare;
}

/** Factored compression, N. */
export function compressionOf(scenario: CheckableScenario): number {
  return scenario.load.factoredCompression_N ?? 0;
}

/** Radius of gyration of a flat plate about its weak axis, t/√12, mm. */
export const plateRadius_mm = (t_mm: number): number => t_mm / Math.sqrt(12);
