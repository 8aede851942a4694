/**
 * What spacing, end and edge rules of any design code measure on a joint: the plates a hole passes,
 * the outside plates of a bolt stack, and the governing (worst) measurement of a rule.
 */
import { connects, groupHoles, holesOfPlate } from "../geometry/joint-builder.js";
import type { Hole, Joint, PlatePiece } from "../model/joint.js";
import type { Citation, RuleCheck } from "../model/results.js";
import { rule } from "./check-builders.js";

export { connects } from "../geometry/joint-builder.js";

/** Plates (not packing) through which a hole passes. */
export function platesThrough(joint: Joint, hole: Hole): PlatePiece[] {
  return joint.plates.filter((p) => p.role !== "packing" && connects(p, hole.group));
}

/** Thickness of the thinner plate that two holes both pass through (Infinity: none). */
export function pairThickness(joint: Joint, a: Hole, b: Hole): number {
  let t = Infinity;
  for (const p of joint.plates) {
    if (p.role !== "packing" && connects(p, a.group) && connects(p, b.group)) t = Math.min(t, p.spec.thickness_mm);
  }
  return t;
}

/**
 * pairThickness of one check call, worked out once per pair of bolt groups: it reads only the two
 * holes' groups. Made afresh for every call (never kept between calls).
 */
export class PairThickness {
  readonly #groupA: Hole["group"][] = [];
  readonly #groupB: Hole["group"][] = [];
  readonly #thickness: number[] = [];
  constructor(private readonly joint: Joint) {}
  of(a: Hole, b: Hole): number {
    for (let k = 0; k < this.#thickness.length; k++) if (this.#groupA[k] === a.group && this.#groupB[k] === b.group) return this.#thickness[k]!;
    const t = pairThickness(this.joint, a, b);
    this.#groupA.push(a.group);
    this.#groupB.push(b.group);
    this.#thickness.push(t);
    return t;
  }
}

/** Plates at either face of some bolt group's stack (the "outside" or "outer" plates of the codes). */
export function outsidePlates(joint: Joint): PlatePiece[] {
  const ids: string[] = [];
  const add = (id: string | undefined) => {
    if (id && id !== "packing" && !ids.includes(id)) ids.push(id);
  };
  for (const g of joint.groups) {
    add(g.stack[0]);
    add(g.stack[g.stack.length - 1]);
  }
  return joint.plates.filter((p) => ids.includes(p.id));
}

/** The plates that carry load (every plate but packing). */
export function holePlates(joint: Joint): PlatePiece[] {
  return joint.plates.filter((p) => p.role !== "packing");
}

/**
 * Every hole of every bolt group a plate connects to, in the joint's hole order: the joint builder's
 * own arrays (a group's list, or the joint's list for a cover joined to both groups), shared, so only
 * read; none for packing, which takes no load.
 */
export function platesHoles(joint: Joint, plate: PlatePiece): readonly Hole[] {
  return plate.connections.length === 0 ? [] : holesOfPlate(joint, plate);
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
  return worstRatio(next.value, next.limit, bound) > worstRatio(current.value, current.limit, bound) + 1e-12 ? next : current;
}

/** How near a measurement is to its limit: value/limit for a maximum, limit/value for a minimum. */
function worstRatio(value: number, limit: number, bound: "min" | "max"): number {
  return bound === "max" ? value / limit : limit / value;
}

/**
 * Whether a measurement would replace the current worst (keepWorst's test, without building the
 * measurement): for loops over many hole pairs that build the text closure only for a new worst.
 */
export function beatsWorst(current: Worst | null, value: number, limit: number, bound: "min" | "max"): boolean {
  return !current || worstRatio(value, limit, bound) > worstRatio(current.value, current.limit, bound) + 1e-12;
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
    const holes = groupHoles(joint, g.id);
    const yc = holes.reduce((a, h) => a + h.y_mm, 0) / holes.length;
    if (beatsWorst(worst, Math.abs(yc), 0.5, "max")) worst = { value: Math.abs(yc), limit: 0.5, where: joint.spliceType === "lap" ? "bolts" : `bolts, side ${g.id}`, detail: () => `centroid offset from the plate axis ${Math.abs(yc).toFixed(2)} mm vs 0.5 mm` };
  }
  return worstRule("group-centroid", "group-centroid", "Bolt group on the plate axis", citation, "|y centroid| ≤ 0.5 mm", "max", worst);
}

/**
 * Every pair of holes that lie in one plate together, each pair once (a pair in several plates is
 * visited with the first of them), with that plate and its holes.
 */
export function forEachHolePair(joint: Joint, visit: (plate: PlatePiece, a: Hole, b: Hole, holes: readonly Hole[]) => void): void {
  const plates = holePlates(joint);
  for (let k = 0; k < plates.length; k++) {
    const plate = plates[k]!;
    // Every pair of a plate whose groups an earlier plate joins too (cover B after cover A) was visited.
    if (joinedEarlier(plates, k)) continue;
    const holes = platesHoles(joint, plate);
    for (let i = 0; i < holes.length; i++) {
      for (let j = i + 1; j < holes.length; j++) {
        const a = holes[i]!;
        const b = holes[j]!;
        // The pair was visited with an earlier plate if one holds both holes' groups.
        if (!sharedEarlier(plates, k, a.group, b.group)) visit(plate, a, b, holes);
      }
    }
  }
}

/** Whether a plate before plates[k] connects to every group plates[k] connects to. */
function joinedEarlier(plates: readonly PlatePiece[], k: number): boolean {
  const groups = plates[k]!.connections;
  for (let m = 0; m < k; m++) if (groups.every((c) => connects(plates[m]!, c.group))) return true;
  return false;
}

/** Whether a plate before plates[k] connects to both groups. */
function sharedEarlier(plates: readonly PlatePiece[], k: number, groupA: Hole["group"], groupB: Hole["group"]): boolean {
  for (let m = 0; m < k; m++) if (connects(plates[m]!, groupA) && connects(plates[m]!, groupB)) return true;
  return false;
}

/** Pairs of a joint's holes (ordered: a then b), for rules that must measure each pair once. */
export class PairSet {
  readonly #holes: readonly Hole[];
  /** Keys (index of a × hole count + index of b) of the pairs added: a rule adds tens, so a list. */
  readonly #keys: number[] = [];
  constructor(holes: readonly Hole[]) {
    this.#holes = holes;
  }
  /** Adds the pair; false when it was there already. */
  addNew(a: Hole, b: Hole): boolean {
    const key = this.#holes.indexOf(a) * this.#holes.length + this.#holes.indexOf(b);
    if (this.#keys.includes(key)) return false;
    this.#keys.push(key);
    return true;
  }
}
