/**
 * What spacing, end and edge rules of any design code measure on a joint: the plates a hole passes,
 * the outside plates of a bolt stack, and the governing (worst) measurement of a rule.
 */
import type { Hole, Joint, PlatePiece } from "../model/joint.js";
import type { Citation, RuleCheck } from "../model/results.js";
import { rule } from "./check-builders.js";

/** Plates (not packing) through which a hole passes. */
export function platesThrough(joint: Joint, hole: Hole): PlatePiece[] {
  return joint.plates.filter((p) => p.role !== "packing" && p.connections.some((c) => c.group === hole.group));
}

/** Thickness of the thinner plate that two holes both pass through. */
export function pairThickness(joint: Joint, a: Hole, b: Hole): number {
  const shared = platesThrough(joint, a).filter((p) => platesThrough(joint, b).includes(p));
  return Math.min(...shared.map((p) => p.spec.thickness_mm));
}

/** Plates at either face of some bolt group's stack (the "outside" or "outer" plates of the codes). */
export function outsidePlates(joint: Joint): PlatePiece[] {
  const ids = new Set<string>();
  for (const g of joint.groups) {
    const ends = [g.stack[0], g.stack[g.stack.length - 1]];
    for (const id of ends) if (id && id !== "packing") ids.add(id);
  }
  return joint.plates.filter((p) => ids.has(p.id));
}

/** The plates that carry load (every plate but packing). */
export function holePlates(joint: Joint): PlatePiece[] {
  return joint.plates.filter((p) => p.role !== "packing");
}

/** Every hole of every bolt group a plate connects to. */
export function platesHoles(joint: Joint, plate: PlatePiece): Hole[] {
  const groups = new Set(plate.connections.map((c) => c.group));
  return joint.holes.filter((h) => groups.has(h.group));
}

/** One measurement of a rule: the value, its limit, where, and the text of its working (built on demand). */
export interface Worst {
  value: number;
  limit: number;
  where: string;
  /** Text of the substituted values, built only for the governing case. */
  detail: () => string;
}

/** The worse of two measurements: the higher value/limit for a maximum, limit/value for a minimum. */
export function keepWorst(current: Worst | null, next: Worst, bound: "min" | "max"): Worst {
  if (!current) return next;
  const ratio = (w: Worst) => (bound === "max" ? w.value / w.limit : w.limit / w.value);
  return ratio(next) > ratio(current) + 1e-12 ? next : current;
}

/** The rule check of the governing measurement, or nothing when the rule measured nothing. */
export function worstRule(
  id: string,
  kind: RuleCheck["kind"],
  title: string,
  citation: Citation,
  formula: string,
  bound: "min" | "max",
  worst: Worst | null,
): RuleCheck[] {
  if (!worst) return [];
  return [
    rule({
      id,
      kind,
      title,
      component: worst.where,
      citation,
      formula,
      substituted: worst.detail,
      value_mm: worst.value,
      limit_mm: worst.limit,
      bound,
    }),
  ];
}

/**
 * The bolt group's centroid on the plate axis (within 0.5 mm). The codes' checks assume a concentric
 * group; an eccentric group is reported as failing rather than accepted silently.
 * @param citation the assumption as the calling code states it
 */
export function groupCentroidRule(joint: Joint, citation: Citation): RuleCheck[] {
  let worst: Worst | null = null;
  for (const g of joint.groups) {
    const holes = joint.holes.filter((h) => h.group === g.id);
    const yc = holes.reduce((a, h) => a + h.y_mm, 0) / holes.length;
    worst = keepWorst(worst, { value: Math.abs(yc), limit: 0.5, where: joint.spliceType === "lap" ? "bolts" : `bolts, side ${g.id}`, detail: () => `centroid offset from the plate axis ${Math.abs(yc).toFixed(2)} mm vs 0.5 mm` }, "max");
  }
  return worstRule("group-centroid", "group-centroid", "Bolt group on the plate axis", citation, "|y centroid| ≤ 0.5 mm", "max", worst);
}

/**
 * Every pair of holes that lie in one plate together, each pair once (a pair in several plates is
 * visited with the first of them), with that plate and its holes.
 */
export function forEachHolePair(joint: Joint, visit: (plate: PlatePiece, a: Hole, b: Hole, holes: readonly Hole[]) => void): void {
  const seen = new Set<string>();
  for (const plate of holePlates(joint)) {
    const holes = platesHoles(joint, plate);
    for (let i = 0; i < holes.length; i++) {
      for (let j = i + 1; j < holes.length; j++) {
        const a = holes[i]!;
        const b = holes[j]!;
        const key = `${a.id}|${b.id}`;
        if (seen.has(key)) continue;
        seen.add(key);
        visit(plate, a, b, holes);
      }
    }
  }
}
