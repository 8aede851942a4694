/**
 * The joint as geometry: every plate with its extent, every hole as a coordinate.
 * Coordinates: x along the force, y across it from the plate axis (y = 0), mm.
 * Every code check works from these coordinates, never from the pattern that made them.
 */
import type { PlateSpec, SpliceType } from "./scenario.js";

/** Bolt groups: "J" the single group of a lap splice; "A" and "B" the two sides of a butt splice. */
export type GroupId = "J" | "A" | "B";

export type PlateId = "mainA" | "mainB" | "coverA" | "coverB" | "packing";

export interface Hole {
  id: string;
  group: GroupId;
  x_mm: number;
  y_mm: number;
  /** Hole dimension across the force (deducted on net sections), mm. */
  across_mm: number;
  /** Hole dimension along the force (used for end distances and kb), mm. */
  along_mm: number;
}

/** How a plate takes load from one bolt group: the bolts bear toward the plate end at endX. */
export interface PlateConnection {
  group: GroupId;
  /** x of the plate end that the bolts of this group bear toward, mm. */
  endX_mm: number;
  /** +1 when that end lies at larger x than the bolts, −1 when at smaller x. */
  towardEnd: 1 | -1;
}

export interface PlatePiece {
  id: PlateId;
  role: "main" | "cover" | "packing";
  label: string;
  spec: PlateSpec;
  fy_MPa: number;
  fu_MPa: number;
  /** The thickness band and source of fy, fu. */
  materialNote: string;
  /** Extent along the force; a main plate continues beyond its far end (continues = true). */
  x0_mm: number;
  x1_mm: number;
  continues: "left" | "right" | "none";
  /** Fraction of the joint tension this plate carries (covers share by area). */
  forceShare: number;
  connections: PlateConnection[];
  /** Position in the plate stack, 0 at the top face. */
  stackIndex: number;
}

export interface BoltGroupGeometry {
  id: GroupId;
  holeIds: string[];
  /** The group's holes, in the order of the joint's hole list (shared with it: read, never modify). */
  holes: readonly Hole[];
  /** Shear planes each bolt of the group crosses. */
  shearPlanes: number;
  /** Plates the bolts of this group pass through, top to bottom. */
  stack: PlateId[];
  /** Grip length: total thickness the bolt clamps, packing included, mm. */
  grip_mm: number;
  /** Packing thickness the bolts of this group pass through, mm (0 if none). */
  packing_mm: number;
}

export interface Joint {
  spliceType: SpliceType;
  boltDiameter_mm: number;
  plates: PlatePiece[];
  /** Every hole, group by group (the joint builder's own list: measurements are keyed on it, so read only). */
  holes: readonly Hole[];
  groups: BoltGroupGeometry[];
  /** Butt splices: gap between the main plate ends, mm. */
  buttGap_mm: number;
  /** Overall length of the splice (lap overlap or cover plate length), mm. */
  spliceLength_mm: number;
  /** Human-readable description of the pattern, e.g. "3 across × 4 along". */
  patternText: string;
}
