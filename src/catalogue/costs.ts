/**
 * Cost of a splice from a cost table: bolt assemblies, holes, splice plate, friction-grip tightening.
 * The bundled table (catalogue/costs.yaml) holds invented, illustrative prices.
 */
import type { Joint } from "../model/joint.js";
import type { BoltAssembly } from "../model/scenario.js";
import { boltSizeText, type PropertyClass } from "./bolts.js";

/** Steel density, kg/mm³ (7850 kg/m³, common practice). */
export const STEEL_DENSITY_KG_PER_MM3 = 7.85e-6;

export interface CostTable {
  currency: string;
  /** Price of one bolt assembly by size ("M20", or "3/4 in") and property class ("8.8"; inch bolts by the ISO class of their ASTM grade: A307 4.6, A325 8.8, A490 10.9). */
  boltAssembly: Record<string, Partial<Record<PropertyClass, number>>>;
  /** Price per hole per plate drilled. */
  hole: number;
  /** Price per kg of splice plate. */
  platePerKg: number;
  /** Extra per friction-grip bolt. */
  frictionGripExtra: number;
}

export interface CostBreakdown {
  bolts: number;
  holes: number;
  plate: number;
  frictionGrip: number;
  total: number;
  plateMass_kg: number;
  holeCount: number;
}

/** Price of one bolt assembly, or undefined when the table has none for that size and class. */
export function boltPrice(table: CostTable, d_mm: number, propertyClass: PropertyClass): number | undefined {
  return table.boltAssembly[boltSizeText(d_mm)]?.[propertyClass];
}

/**
 * Splice plate mass: cover plates and packing over their length; for a lap splice, the overlap of
 * plate B (the length the lap adds to the member), kg.
 */
export function splicePlateMass_kg(joint: Joint): number {
  let volume = 0;
  for (const p of joint.plates) {
    if (p.role === "cover" || p.role === "packing") volume += (p.x1_mm - p.x0_mm) * p.spec.width_mm * p.spec.thickness_mm;
  }
  if (joint.spliceType === "lap") {
    const b = joint.plates.find((p) => p.id === "mainB");
    if (b) volume += joint.spliceLength_mm * b.spec.width_mm * b.spec.thickness_mm;
  }
  return volume * STEEL_DENSITY_KG_PER_MM3;
}

/** Holes drilled: each bolt's hole in every plate of its stack (packing included). */
export function holeCount(joint: Joint): number {
  return joint.groups.reduce((sum, g) => sum + g.holeIds.length * g.stack.length, 0);
}

export function spliceCost(joint: Joint, table: CostTable, propertyClass: PropertyClass, assembly: BoltAssembly): CostBreakdown {
  const price = boltPrice(table, joint.boltDiameter_mm, propertyClass);
  if (price === undefined) throw new RangeError(`the cost table has no price for ${boltSizeText(joint.boltDiameter_mm)} class ${propertyClass}`);
  const n = joint.holes.length;
  const holes = holeCount(joint);
  const mass = splicePlateMass_kg(joint);
  const bolts = n * price;
  const holeCost = holes * table.hole;
  const plate = mass * table.platePerKg;
  const frictionGrip = assembly === "friction-grip" ? n * table.frictionGripExtra : 0;
  return { bolts, holes: holeCost, plate, frictionGrip, total: bolts + holeCost + plate + frictionGrip, plateMass_kg: mass, holeCount: holes };
}
