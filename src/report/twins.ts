/**
 * Twins: checks that say the same thing word for word about symmetric parts of a splice — side A and
 * side B of a butt, cover plate A and cover plate B, main plate A and main plate B — are printed once
 * ("bolts, each side", "both cover plates, each side"). Only checks whose every printed figure and
 * text is identical fold; the JSON outputs keep every check. Pure.
 */
import type { CheckResult } from "../model/results.js";
import { citationText } from "./citation.js";

export interface FoldedCheck {
  /** The first of the twins (its id, figures and text stand for all of them). */
  check: CheckResult;
  /** Every check folded into this entry, in report order (one for a check without a twin). */
  members: CheckResult[];
  /** The component of all the members: "bolts, each side", "both cover plates, each side". */
  component: string;
}

interface Part {
  base: "bolts" | "cover plate" | "main plate";
  plate: "A" | "B" | undefined;
  side: "A" | "B" | undefined;
}

const PART = /^(bolts|cover plate|main plate)(?: ([AB]))?(?:, side ([AB]))?$/;

function partOf(component: string): Part | null {
  const m = PART.exec(component);
  if (!m) return null;
  return { base: m[1] as Part["base"], plate: m[2] as Part["plate"], side: m[3] as Part["side"] };
}

/** Every printed field of a check but its id and component; figures to 9 significant digits. */
function signature(c: CheckResult): string {
  const n = (v: number) => (Number.isFinite(v) ? Number(v.toPrecision(9)) : String(v));
  const figures = c.type === "strength" ? [c.limitState, n(c.demand_N), n(c.resistance_N), n(c.loadRatio)] : [c.bound, n(c.value_mm), n(c.limit_mm)];
  return JSON.stringify([c.type, c.kind, c.title, citationText(c.citation), c.formula, c.substituted, c.notes, n(c.utilisation), c.pass, ...figures]);
}

/** The one component label of a set of parts of the same base that form every plate × side pair. */
function productLabel(parts: Part[]): string | null {
  const base = parts[0]!.base;
  // A main plate's side is its own letter: main plate A lies on side A only.
  const side = (p: Part) => (base === "main plate" && p.side === p.plate ? undefined : p.side);
  const plates = [...new Set(parts.map((p) => p.plate))];
  const sides = [...new Set(parts.map(side))];
  if (plates.length * sides.length !== parts.length) return null;
  const seen = new Set(parts.map((p) => `${p.plate}|${side(p)}`));
  if (seen.size !== parts.length) return null;
  const plural = base === "bolts" ? "bolts" : `both ${base}s`;
  const platePart = plates.length === 2 ? plural : plates[0] ? `${base} ${plates[0]}` : base;
  const sidePart = sides.length === 2 ? ", each side" : sides[0] ? `, side ${sides[0]}` : "";
  return platePart + sidePart;
}

/** Fold twins, keeping the order of first appearance. */
export function foldTwins(checks: readonly CheckResult[]): FoldedCheck[] {
  const groups = new Map<string, CheckResult[]>();
  const order: string[] = [];
  checks.forEach((c, i) => {
    const part = partOf(c.component);
    const key = part ? `${signature(c)}|${part.base}` : `#${i}`;
    if (!groups.has(key)) {
      groups.set(key, []);
      order.push(key);
    }
    groups.get(key)!.push(c);
  });
  const out: FoldedCheck[] = [];
  for (const key of order) {
    const members = groups.get(key)!;
    if (members.length === 1) {
      out.push({ check: members[0]!, members, component: members[0]!.component });
      continue;
    }
    const parts = members.map((m) => partOf(m.component)!);
    const label = productLabel(parts);
    if (label !== null) {
      out.push({ check: members[0]!, members, component: label });
      continue;
    }
    // Not a full product: fold per plate (its sides), else print each.
    const byPlate = new Map<string, CheckResult[]>();
    for (const m of members) {
      const k = partOf(m.component)!.plate ?? "";
      byPlate.set(k, [...(byPlate.get(k) ?? []), m]);
    }
    for (const sub of byPlate.values()) {
      const subLabel = sub.length > 1 ? productLabel(sub.map((m) => partOf(m.component)!)) : null;
      if (subLabel !== null) out.push({ check: sub[0]!, members: sub, component: subLabel });
      else for (const m of sub) out.push({ check: m, members: [m], component: m.component });
    }
  }
  return out;
}
