/**
 * Bolt lengths and the bill of materials of a checked joint. Pure.
 *
 * Length = grip (plates and packing) + washers + nut height + thread projection, rounded up to the
 * preferred length series. When the scenario declares the threads excluded from the shear planes,
 * the plain shank (length − thread length) must reach past the deepest shear plane; if the rounded
 * length does not, the next length that does is taken, with extra washers under the nut so that the
 * nut still clamps; if none does, the thread check fails.
 */
import { STEEL_DENSITY_KG_PER_MM3 } from "../catalogue/costs.js";
import {
  HEX_NUT_HEIGHT_MM,
  HSFG_DIMENSIONS,
  iso4014ThreadLength_mm,
  nutClassFor,
  PLAIN_WASHER_MM,
  PREFERRED_LENGTHS_MM,
  threadProjection_mm,
} from "../catalogue/fasteners.js";
import type { GroupId, Joint } from "../model/joint.js";
import type { CheckableScenario } from "../model/scenario.js";

/** Most washers under one nut to take up a longer plain shank (common practice). */
export const MAX_WASHERS_UNDER_NUT = 3;

export interface BoltLengthLine {
  group: GroupId;
  count: number;
  grip_mm: number;
  washersUnderHead: number;
  washersUnderNut: number;
  washer_mm: number;
  nut_mm: number;
  projection_mm: number;
  /** grip + washers + nut + projection, before rounding. */
  required_mm: number;
  length_mm: number;
  threadLength_mm: number;
  /** Depth of the deepest shear plane below the underside of the head, mm. */
  deepestShearPlane_mm: number;
  /** Threads excluded from the shear planes: whether the chosen length keeps them out. */
  threadsClear: boolean | null;
  note: string;
  standard: string;
}

export interface BillOfMaterials {
  bolts: Array<{ item: string; size: string; class: string; length_mm: number; quantity: number; standard: string }>;
  nuts: Array<{ item: string; size: string; class: string; quantity: number; standard: string }>;
  washers: Array<{ item: string; size: string; thickness_mm: number; quantity: number; standard: string }>;
  plates: Array<{ id: string; item: string; grade: string; width_mm: number; thickness_mm: number; length_mm: number; quantity: number; mass_kg: number; holes: number; holeDiameter_mm: number }>;
  lengths: BoltLengthLine[];
  /** True when every group has a valid bolt length (and, where required, threads clear). */
  ok: boolean;
  notes: string[];
}

function roundUpToSeries(v: number): number | null {
  return PREFERRED_LENGTHS_MM.find((l) => l >= v - 1e-9) ?? null;
}

export function boltLengths(joint: Joint, scenario: CheckableScenario): BoltLengthLine[] {
  const b = scenario.bolts;
  const d = b.size_mm;
  const hsfg = b.assembly === "friction-grip";
  const hs = HSFG_DIMENSIONS[d];
  const washer = hsfg && hs ? hs.washer_mm : PLAIN_WASHER_MM[d] ?? 4;
  const nut = hsfg && hs ? hs.nut_mm : HEX_NUT_HEIGHT_MM[d] ?? d;
  const underHead = hsfg ? 1 : 0; // hardened washers under head and nut for friction grip (common practice)
  const projection = threadProjection_mm(d);
  const threadOf = (l: number) => (hsfg && hs ? (l < 100 ? hs.threadShort_mm : hs.threadLong_mm) : iso4014ThreadLength_mm(d, l));
  const standard = hsfg ? "IS 3757 bolt, IS 6623 nut, IS 6649 washers (dimensions as tabulated in Indian design aids)" : "ISO 4014 bolt, ISO 4032 nut, ISO 7089 washer (dimensions from memory)";
  return joint.groups.map((g) => {
    const thickness = (id: string) => joint.plates.find((p) => p.id === id)?.spec.thickness_mm ?? 0;
    const last = g.stack[g.stack.length - 1]!;
    const deepest = underHead * washer + g.grip_mm - thickness(last);
    let washersUnderNut = 1;
    const required = g.grip_mm + (underHead + washersUnderNut) * washer + nut + projection;
    let length = roundUpToSeries(required);
    let note = "";
    let threadsClear: boolean | null = null;
    if (length !== null && !b.threadsInShearPlanes) {
      // The plain shank must pass the deepest shear plane: length − b ≥ deepest.
      let l: number | null = length;
      while (l !== null && l - threadOf(l) < deepest - 1e-9) l = PREFERRED_LENGTHS_MM.find((x) => x > l!) ?? null;
      if (l === null) {
        threadsClear = false;
        note = "no length of the series keeps the thread out of every shear plane";
      } else {
        // The nut must still clamp: the thread has to start before the nut's seat.
        const seat = (w: number) => (underHead + w) * washer + g.grip_mm;
        while (washersUnderNut <= MAX_WASHERS_UNDER_NUT && l - threadOf(l) > seat(washersUnderNut) - 1e-9) washersUnderNut++;
        if (washersUnderNut > MAX_WASHERS_UNDER_NUT) {
          threadsClear = false;
          note = `a length that keeps the thread out of the shear planes (${l} mm) needs more than ${MAX_WASHERS_UNDER_NUT} washers under the nut`;
        } else {
          threadsClear = true;
          if (l !== length) note = `lengthened from ${length} to ${l} mm so that the thread stays out of every shear plane; ${washersUnderNut} washers under the nut`;
          length = l;
        }
      }
    }
    if (length === null) note = `required length ${required.toFixed(1)} mm is beyond the series (max ${PREFERRED_LENGTHS_MM[PREFERRED_LENGTHS_MM.length - 1]} mm)`;
    return {
      group: g.id,
      count: g.holeIds.length,
      grip_mm: g.grip_mm,
      washersUnderHead: underHead,
      washersUnderNut,
      washer_mm: washer,
      nut_mm: nut,
      projection_mm: projection,
      required_mm: required,
      length_mm: length ?? NaN,
      threadLength_mm: length === null ? NaN : threadOf(length),
      deepestShearPlane_mm: deepest,
      threadsClear,
      note,
      standard,
    };
  });
}

export function billOfMaterials(joint: Joint, scenario: CheckableScenario): BillOfMaterials {
  const b = scenario.bolts;
  const size = `M${b.size_mm}`;
  const lengths = boltLengths(joint, scenario);
  const hsfg = b.assembly === "friction-grip";
  const bolts = new Map<number, number>();
  const washers = new Map<number, number>();
  let nutCount = 0;
  for (const l of lengths) {
    bolts.set(l.length_mm, (bolts.get(l.length_mm) ?? 0) + l.count);
    washers.set(l.washer_mm, (washers.get(l.washer_mm) ?? 0) + l.count * (l.washersUnderHead + l.washersUnderNut));
    nutCount += l.count;
  }
  const standard = lengths[0]?.standard ?? "";
  const kind = hsfg ? "high-strength friction-grip hexagon bolt" : "hexagon head bolt";
  const holeDia = joint.holes[0]?.across_mm ?? 0;
  const plates = joint.plates
    .filter((p) => p.role === "cover" || p.role === "packing")
    .map((p) => {
      const length = p.x1_mm - p.x0_mm;
      const groups = new Set(p.role === "packing" ? joint.groups.filter((g) => g.packing_mm > 0).map((g) => g.id) : p.connections.map((c) => c.group));
      return {
        id: p.id,
        item: p.label,
        grade: p.spec.grade,
        width_mm: p.spec.width_mm,
        thickness_mm: p.spec.thickness_mm,
        length_mm: length,
        quantity: 1,
        mass_kg: Number((length * p.spec.width_mm * p.spec.thickness_mm * STEEL_DENSITY_KG_PER_MM3).toFixed(2)),
        holes: joint.holes.filter((h) => groups.has(h.group)).length,
        holeDiameter_mm: holeDia,
      };
    });
  const notes: string[] = [];
  for (const l of lengths) if (l.note) notes.push(`${joint.spliceType === "lap" ? "bolts" : `side ${l.group}`}: ${l.note}`);
  return {
    bolts: [...bolts.entries()].sort((a, c) => a[0] - c[0]).map(([length, quantity]) => ({ item: `${size} × ${length} class ${b.propertyClass} ${kind}`, size, class: b.propertyClass, length_mm: length, quantity, standard })),
    nuts: [{ item: `${size} hexagon nut, class ${hsfg ? (b.propertyClass === "10.9" ? "10" : "8") : nutClassFor(b.propertyClass)}`, size, class: nutClassFor(b.propertyClass), quantity: nutCount, standard }],
    washers: [...washers.entries()].map(([t, quantity]) => ({ item: `${size} ${hsfg ? "hardened" : "plain"} washer, ${t} mm`, size, thickness_mm: t, quantity, standard })),
    plates,
    lengths,
    ok: lengths.every((l) => Number.isFinite(l.length_mm) && l.threadsClear !== false),
    notes,
  };
}
