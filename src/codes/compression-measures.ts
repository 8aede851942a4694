/**
 * What the compression checks of every code measure on a joint: the pitch along each gauge line of a
 * plate, the unbraced length of a cover across the butt, the area of a plate in compression, and the
 * force each plate carries in compression.
 */
import { groupHoles } from "../geometry/joint-builder.js";
import { gaugeLines, transverseLines } from "../geometry/lines.js";
import type { Hole, Joint, PlatePiece } from "../model/joint.js";
import type { CheckableScenario } from "../model/scenario.js";
import { beatsWorst, holePlates, pairThickness, platesHoles, type Worst } from "./rule-measures.js";

/** Effective length factor of a cover plate strut held by bolts at both ends: fixed-fixed, 0.65 (common practice). */
export const COVER_STRUT_K = 0.65;

/** A pitch against its compression limit, its working written on demand (made only for a new worst, so the loop below allocates nothing per pair for it). */
function compressionPitchWorst(plate: PlatePiece, a: Hole, b: Hole, s: number, t: number, limit_mm: number, text: () => string): Worst {
  return { value: s, limit: limit_mm, where: plate.label, detail: () => `holes ${a.id}–${b.id}: ${s.toFixed(1)} mm vs ${text()} with t = ${t.toFixed(1)} → ${limit_mm.toFixed(1)} mm` };
}

/**
 * The worst pitch along the force against a limit that depends on the thinner plate of the pair.
 * Pairs are consecutive holes of one gauge line in one plate (across the butt too, on the covers).
 */
export function worstCompressionPitch(joint: Joint, limitOf: (t_mm: number) => { limit_mm: number; text: () => string }): Worst | null {
  let worst: Worst | null = null;
  for (const plate of holePlates(joint)) {
    for (const line of gaugeLines(platesHoles(joint, plate))) {
      for (let k = 1; k < line.holes.length; k++) {
        const a = line.holes[k - 1]!;
        const b = line.holes[k]!;
        const s = b.x_mm - a.x_mm;
        const t = pairThickness(joint, a, b);
        const { limit_mm, text } = limitOf(t);
        if (beatsWorst(worst, s, limit_mm, "max")) worst = compressionPitchWorst(plate, a, b, s, t, limit_mm, text);
      }
    }
  }
  return worst;
}

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
  const a = groupHoles(joint, "A").map((h) => h.x_mm);
  const b = groupHoles(joint, "B").map((h) => h.x_mm);
  return Math.min(...b) - Math.max(...a);
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
