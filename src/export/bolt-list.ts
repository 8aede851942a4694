/**
 * Bolt lengths and the bill of materials of a checked joint. Pure.
 *
 * Length: the assembly standard's own rule for the scenario's code (catalogue/assemblies.ts) — grip
 * (plates and packing) + washers + nut height + thread projection, or the RCSC add-to-grip values for
 * ASTM bolts — rounded up to that standard's length series. When the scenario declares the threads excluded from the shear planes,
 * the plain shank (length − thread length) must reach past the deepest shear plane; if the rounded
 * length does not, the next length that does is taken, with extra washers under the nut so that the
 * nut still clamps; if none does, the thread check fails.
 */
import { STEEL_DENSITY_KG_PER_MM3 } from "../catalogue/costs.js";
import { assemblyFor, nutClassOf, type AssemblySystem } from "../catalogue/assemblies.js";
import { ASTM_ISO_EQUIVALENT, boltSizeText, type AstmBoltGrade } from "../catalogue/bolts.js";
import { plateProductStandard } from "../catalogue/steels.js";
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
  /**
   * The plates the splice supplies (cover plates, packing): length along the force, width, thickness,
   * mass at 7850 kg/m³ (common practice), holes drilled, and the product standard of the grade (when
   * the catalogue holds it). The main plates are the members being spliced, not listed here.
   */
  plates: Array<{ id: string; item: string; grade: string; width_mm: number; thickness_mm: number; length_mm: number; quantity: number; mass_kg: number; holes: number; holeDiameter_mm: number; standard: string }>;
  lengths: BoltLengthLine[];
  /** True when every group has a valid bolt length (and, where required, threads clear). */
  ok: boolean;
  notes: string[];
}

/** The bolt grade in the terms of the scenario's code: the ASTM grade under AISC 360, else the ISO class. */
export function boltGradeOf(scenario: CheckableScenario): string {
  const b = scenario.bolts;
  if (!scenario.code.startsWith("aisc")) return b.propertyClass;
  return b.astmGrade ?? (Object.keys(ASTM_ISO_EQUIVALENT) as AstmBoltGrade[]).find((g) => ASTM_ISO_EQUIVALENT[g] === b.propertyClass) ?? b.propertyClass;
}

/** The assembly of a scenario's bolts under its own code. */
export function assemblyOf(scenario: CheckableScenario): AssemblySystem {
  const b = scenario.bolts;
  return assemblyFor({ code: scenario.code, d_mm: b.size_mm, grade: boltGradeOf(scenario), preloaded: b.assembly === "friction-grip" || b.preloaded === true });
}

const roundUpTo = (series: readonly number[], v: number): number | null => series.find((l) => l >= v - 1e-6) ?? null;

export function boltLengths(joint: Joint, scenario: CheckableScenario): BoltLengthLine[] {
  const b = scenario.bolts;
  const a = assemblyOf(scenario);
  const washer = a.washer_mm;
  const underHead = a.washersUnderHead;
  const standard = `${a.boltStandard}, ${a.nutStandard}, ${a.washerStandard}`;
  return joint.groups.map((g) => {
    const thickness = (id: string) => joint.plates.find((p) => p.id === id)?.spec.thickness_mm ?? 0;
    const last = g.stack[g.stack.length - 1]!;
    const deepest = underHead * washer + g.grip_mm - thickness(last);
    let washersUnderNut = a.washersUnderNut;
    const required = a.required_mm(g.grip_mm, underHead + washersUnderNut);
    let length = roundUpTo(a.lengths_mm, required);
    let note = "";
    let threadsClear: boolean | null = null;
    if (length !== null && !b.threadsInShearPlanes) {
      // The plain shank must pass the deepest shear plane: length − b ≥ deepest.
      let l: number | null = length;
      while (l !== null && l - a.threadLength_mm(l) < deepest - 1e-9) l = a.lengths_mm.find((x) => x > l! + 1e-6) ?? null;
      if (l === null) {
        threadsClear = false;
        note = "no length of the series keeps the thread out of every shear plane";
      } else {
        // The nut must still clamp: the thread (with the threads the system keeps below the nut) has to
        // start before the nut's seat.
        const seat = (w: number) => (underHead + w) * washer + g.grip_mm - a.threadBelowNut_mm;
        while (washersUnderNut <= MAX_WASHERS_UNDER_NUT && l - a.threadLength_mm(l) > seat(washersUnderNut) - 1e-9) washersUnderNut++;
        if (washersUnderNut > MAX_WASHERS_UNDER_NUT) {
          threadsClear = false;
          note = `a length that keeps the thread out of the shear planes (${a.lengthText(l)}) needs more than ${MAX_WASHERS_UNDER_NUT} washers under the nut`;
        } else {
          threadsClear = true;
          if (l !== length) note = `lengthened from ${a.lengthText(length)} to ${a.lengthText(l)} so that the thread stays out of every shear plane; ${washersUnderNut} washer${washersUnderNut === 1 ? "" : "s"} under the nut`;
          length = l;
        }
      }
    }
    if (length === null) note = `required length ${a.lengthText(required)} is beyond the series (max ${a.lengthText(a.lengths_mm[a.lengths_mm.length - 1]!)})`;
    return {
      group: g.id,
      count: g.holeIds.length,
      grip_mm: g.grip_mm,
      washersUnderHead: underHead,
      washersUnderNut,
      washer_mm: washer,
      nut_mm: a.nut_mm,
      projection_mm: required - g.grip_mm - (underHead + a.washersUnderNut) * washer - a.nut_mm,
      required_mm: required,
      length_mm: length ?? NaN,
      threadLength_mm: length === null ? NaN : a.threadLength_mm(length),
      deepestShearPlane_mm: deepest,
      threadsClear,
      note,
      standard,
    };
  });
}

export function billOfMaterials(joint: Joint, scenario: CheckableScenario): BillOfMaterials {
  const b = scenario.bolts;
  const a = assemblyOf(scenario);
  const size = boltSizeText(b.size_mm);
  const grade = boltGradeOf(scenario);
  const lengths = boltLengths(joint, scenario);
  const bolts = new Map<number, number>();
  const washers = new Map<number, number>();
  let nutCount = 0;
  for (const l of lengths) {
    bolts.set(l.length_mm, (bolts.get(l.length_mm) ?? 0) + l.count);
    washers.set(l.washer_mm, (washers.get(l.washer_mm) ?? 0) + l.count * (l.washersUnderHead + l.washersUnderNut));
    nutCount += l.count;
  }
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
        standard: plateProductStandard(p.spec.grade) ?? "",
      };
    });
  const notes: string[] = [];
  for (const l of lengths) if (l.note) notes.push(`${joint.spliceType === "lap" ? "bolts" : `side ${l.group}`}: ${l.note}`);
  return {
    bolts: [...bolts.entries()].sort((x, y) => x[0] - y[0]).map(([length, quantity]) => ({ item: a.boltItem(length), size, class: grade, length_mm: length, quantity, standard: a.boltStandard })),
    nuts: [{ item: a.nutItem, size, class: a.nutClass ?? nutClassOf(b.propertyClass), quantity: nutCount, standard: a.nutStandard }],
    washers: [...washers.entries()].map(([t, quantity]) => ({ item: a.washerItem, size, thickness_mm: t, quantity, standard: a.washerStandard })),
    plates,
    lengths,
    ok: lengths.every((l) => Number.isFinite(l.length_mm) && l.threadsClear !== false),
    notes,
  };
}
