/**
 * Build the joint geometry from a scenario: plates with their extents and every hole as a coordinate.
 *
 * Lap splice: plate B runs from its end at x = 0 to the right (pulled toward +x); plate A comes from the
 * left and ends at x = L (pulled toward −x). One bolt group "J" passes through both.
 *
 * Butt splice: the butt gap is centred on x = 0. Main plate B starts at x = +gap/2 and continues right;
 * main plate A ends at x = −gap/2. Group B's holes sit at x = gap/2 + x_local, group A mirrors them.
 * The cover(s) run from −Lc/2 to +Lc/2. Packing (if any) lies under the thinner main plate, between it
 * and cover A.
 */
import type { CheckableScenario, HoleType, PlateSpec, SlotDirection } from "../model/scenario.js";
import { mapped } from "../model/lists.js";
import type { BoltGroupGeometry, GroupId, Hole, Joint, PlateConnection, PlateId, PlatePiece } from "../model/joint.js";
import { describePattern, loadedEndDistance, patternHoles, type LocalHole } from "./patterns.js";

export interface HoleDimensions {
  across_mm: number;
  along_mm: number;
}

/** What geometry needs from the design code: hole sizes and plate strengths. */
export interface GeometryCode {
  holeDimensions(d_mm: number, hole: HoleType, slot: SlotDirection | undefined): HoleDimensions;
  plateStrength(spec: PlateSpec): { fy_MPa: number; fu_MPa: number; note: string };
}

export function buildJoint(scenario: CheckableScenario, code: GeometryCode): Joint {
  const { layout, bolts, splice, plates } = scenario;
  const holeDims = code.holeDimensions(bolts.size_mm, bolts.hole, bolts.slotDirection);
  const butt = splice.type !== "lap";
  const local = patternHoles(layout, loadedEndDistance(layout, butt));
  const farEnd = layout.endDistance_mm;
  let xMaxLocal = -Infinity;
  for (const h of local) xMaxLocal = Math.max(xMaxLocal, h.x_mm);
  const patternText = describePattern(layout, local.length);

  const piece = (
    id: PlateId,
    role: PlatePiece["role"],
    label: string,
    spec: PlateSpec,
    extent: Pick<PlatePiece, "x0_mm" | "x1_mm" | "continues">,
    forceShare: number,
    connections: PlatePiece["connections"],
    stackIndex: number,
  ): PlatePiece => {
    const m = code.plateStrength(spec);
    return platePiece(id, role, label, spec, m.fy_MPa, m.fu_MPa, m.note, extent.x0_mm, extent.x1_mm, extent.continues, forceShare, connections, stackIndex);
  };

  if (!butt) {
    const L = xMaxLocal + farEnd;
    const holes = groupHolesAt(local, "J", 0, 1, holeDims);
    const pieces: PlatePiece[] = [
      piece("mainA", "main", "main plate A", plates.mainA, { x0_mm: 0, x1_mm: L, continues: "left" }, 1,
        [{ group: "J", endX_mm: L, towardEnd: 1 }], 0),
      piece("mainB", "main", "main plate B", plates.mainB, { x0_mm: 0, x1_mm: L, continues: "right" }, 1,
        [{ group: "J", endX_mm: 0, towardEnd: -1 }], 1),
    ];
    const group: BoltGroupGeometry = {
      id: "J",
      holeIds: holeIdsOf(holes),
      holes,
      shearPlanes: 1,
      stack: ["mainA", "mainB"],
      grip_mm: plates.mainA.thickness_mm + plates.mainB.thickness_mm,
      packing_mm: 0,
    };
    return jointOf(splice.type, bolts.size_mm, pieces, holes, [group], 0, L, patternText);
  }

  const halfGap = splice.buttGap_mm / 2;
  const halfCover = halfGap + xMaxLocal + farEnd;
  const holesB = groupHolesAt(local, "B", halfGap, 1, holeDims);
  const holesA = groupHolesAt(local, "A", halfGap, -1, holeDims);
  const doubleCover = splice.type === "butt-double-cover";
  const coverSpecs = plates.covers;
  const coverArea = mapped(coverSpecs, (c) => c.width_mm * c.thickness_mm);
  let totalCoverArea = 0;
  for (const a of coverArea) totalCoverArea += a;

  const tA = plates.mainA.thickness_mm;
  const tB = plates.mainB.thickness_mm;
  const packing = scenario.packing_mm;
  const packedSide: "A" | "B" | null = packing > 0 ? (tA <= tB ? "A" : "B") : null;

  // Stack, top to bottom: cover A, packing (if any), main plates, cover B (double cover only).
  const pieces: PlatePiece[] = [];
  let stack = 0;
  const coverExtent = { x0_mm: -halfCover, x1_mm: halfCover, continues: "none" as const };
  const coverConnections: PlatePiece["connections"] = [
    { group: "A", endX_mm: -halfCover, towardEnd: -1 },
    { group: "B", endX_mm: halfCover, towardEnd: 1 },
  ];
  const coverA = coverSpecs[0];
  if (!coverA) throw new RangeError("a butt splice needs a cover plate");
  pieces.push(
    piece("coverA", "cover", doubleCover ? "cover plate A" : "cover plate", coverA, coverExtent,
      (coverArea[0] ?? 0) / totalCoverArea, coverConnections, stack++),
  );
  if (packedSide) {
    const extent =
      packedSide === "B"
        ? { x0_mm: halfGap, x1_mm: halfCover, continues: "none" as const }
        : { x0_mm: -halfCover, x1_mm: -halfGap, continues: "none" as const };
    const packedMain = packedSide === "A" ? plates.mainA : plates.mainB;
    pieces.push(
      piece("packing", "packing", "packing", { ...packedMain, thickness_mm: packing }, extent, 0, [], stack++),
    );
  }
  const mainStack = stack++;
  pieces.push(
    piece("mainA", "main", "main plate A", plates.mainA, { x0_mm: -halfCover, x1_mm: -halfGap, continues: "left" }, 1,
      [{ group: "A", endX_mm: -halfGap, towardEnd: 1 }], mainStack),
    piece("mainB", "main", "main plate B", plates.mainB, { x0_mm: halfGap, x1_mm: halfCover, continues: "right" }, 1,
      [{ group: "B", endX_mm: halfGap, towardEnd: -1 }], mainStack),
  );
  if (doubleCover) {
    const coverB = coverSpecs[1] ?? coverA;
    pieces.push(
      piece("coverB", "cover", "cover plate B", coverB, coverExtent, (coverArea[1] ?? 0) / totalCoverArea,
        coverConnections, stack++),
    );
  }

  let coverThickness = 0;
  for (const c of coverSpecs) coverThickness += c.thickness_mm;
  const groupFor = (id: "A" | "B", holes: Hole[]): BoltGroupGeometry => {
    const pack = packedSide === id ? packing : 0;
    const mainId: PlateId = id === "A" ? "mainA" : "mainB";
    const stackIds: PlateId[] = ["coverA"];
    if (pack > 0) stackIds.push("packing");
    stackIds.push(mainId);
    if (doubleCover) stackIds.push("coverB");
    return {
      id,
      holeIds: holeIdsOf(holes),
      holes,
      shearPlanes: doubleCover ? 2 : 1,
      stack: stackIds,
      grip_mm: coverThickness + pack + (id === "A" ? tA : tB),
      packing_mm: pack,
    };
  };

  return jointOf(splice.type, bolts.size_mm, pieces, [...holesA, ...holesB], [groupFor("A", holesA), groupFor("B", holesB)], splice.buttGap_mm, 2 * halfCover, patternText);
}

/**
 * The holes of one group from the pattern's local centres: x = side·(offset + x_local) (side +1 for
 * group B and a lap's group, −1 for the mirror-image group A), y as in the pattern; each hole's fields
 * written in one order (one shape for every hole).
 */
function groupHolesAt(local: readonly LocalHole[], group: GroupId, offset_mm: number, side: 1 | -1, dims: HoleDimensions): Hole[] {
  const holes: Hole[] = [];
  for (let i = 0; i < local.length; i++) {
    const h = local[i]!;
    holes.push({ id: holeId(group, i), group, x_mm: side > 0 ? offset_mm + h.x_mm : -(offset_mm + h.x_mm), y_mm: h.y_mm, across_mm: dims.across_mm, along_mm: dims.along_mm });
  }
  return holes;
}

/** The names of the holes, in their order. */
function holeIdsOf(holes: readonly Hole[]): string[] {
  const ids: string[] = [];
  for (const h of holes) ids.push(h.id);
  return ids;
}

/**
 * The name of a hole: its group and its place in the group, from 1 ("A1", "B12"), each written once
 * per process (the same words for every joint).
 */
function holeId(group: GroupId, index: number): string {
  const names = HOLE_NAMES[group];
  for (let k = names.length; k <= index; k++) names.push(`${group}${k + 1}`);
  return names[index]!;
}

const HOLE_NAMES: Record<GroupId, string[]> = { J: [], A: [], B: [] };

/** A joint, its fields written in one order (one shape for every joint, built here or with other plates). */
function jointOf(spliceType: Joint["spliceType"], boltDiameter_mm: number, plates: PlatePiece[], holes: readonly Hole[], groups: BoltGroupGeometry[], buttGap_mm: number, spliceLength_mm: number, patternText: string): Joint {
  return { spliceType, boltDiameter_mm, plates, holes, groups, buttGap_mm, spliceLength_mm, patternText };
}

/** The same joint with other plates (the plates with the bearing directions of another sense of the load). */
export function withPlates(joint: Joint, plates: PlatePiece[]): Joint {
  return jointOf(joint.spliceType, joint.boltDiameter_mm, plates, joint.holes, joint.groups, joint.buttGap_mm, joint.spliceLength_mm, joint.patternText);
}

/**
 * A plate of the joint, its fields written one by one in one order: every plate, built here or with
 * its connections changed (`withConnections`), has the same shape (hidden class), so the checks see
 * one kind of plate object.
 */
function platePiece(
  id: PlateId,
  role: PlatePiece["role"],
  label: string,
  spec: PlateSpec,
  fy_MPa: number,
  fu_MPa: number,
  materialNote: string,
  x0_mm: number,
  x1_mm: number,
  continues: PlatePiece["continues"],
  forceShare: number,
  connections: PlatePiece["connections"],
  stackIndex: number,
): PlatePiece {
  return { id, role, label, spec, fy_MPa, fu_MPa, materialNote, x0_mm, x1_mm, continues, forceShare, connections, stackIndex };
}

/** The same plate with other connections (the bearing directions of another sense of the load). */
export function withConnections(p: PlatePiece, connections: PlatePiece["connections"]): PlatePiece {
  return platePiece(p.id, p.role, p.label, p.spec, p.fy_MPa, p.fu_MPa, p.materialNote, p.x0_mm, p.x1_mm, p.continues, p.forceShare, connections, p.stackIndex);
}

/** Holes that pass through a plate: every hole of every group the plate connects to, or the packing's side. */
export function holesOfPlate(joint: Joint, plate: PlatePiece): readonly Hole[] {
  if (plate.role === "packing") {
    const group = joint.groups.find((g) => g.packing_mm > 0);
    return group ? group.holes : [];
  }
  if (plate.connections.length === 1) return groupHoles(joint, plate.connections[0]!.group);
  // A plate joined to every group (the covers of a butt splice) has the joint's own hole list, one
  // array for both covers, so measurements made from it can be shared (net-section.ts, netPathFor).
  if (joint.groups.every((g) => connects(plate, g.id))) return joint.holes;
  return joint.holes.filter((h) => connects(plate, h.group));
}

/** Whether a plate takes load from a bolt group (its holes pass through the plate). */
export function connects(plate: PlatePiece, group: GroupId): boolean {
  for (const c of plate.connections) if (c.group === group) return true;
  return false;
}

/** The holes of one bolt group, as the joint builder sorted them (no filtering per call). */
export function groupHoles(joint: Joint, group: GroupId): readonly Hole[] {
  for (const g of joint.groups) if (g.id === group) return g.holes;
  return [];
}

/** Whether two connections are of one bolt group bearing toward the same plate end. */
export function sameEnd(a: PlateConnection, b: PlateConnection): boolean {
  return a.group === b.group && a.endX_mm === b.endX_mm && a.towardEnd === b.towardEnd;
}

/** The place of a bolt group in the joint's group list. */
export function groupIndex(joint: Joint, group: GroupId): number {
  for (let k = 0; k < joint.groups.length; k++) if (joint.groups[k]!.id === group) return k;
  throw new RangeError(`no bolt group ${group} in the joint`);
}
