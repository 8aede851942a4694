/**
 * Bolt data: metric ISO sizes and property classes.
 * Every value carries its source beside it.
 */

/** Metric bolt sizes the catalogue knows (nominal diameter, mm). */
export const BOLT_SIZES_MM = [12, 16, 20, 22, 24, 27, 30, 36] as const;
export type BoltSize = (typeof BOLT_SIZES_MM)[number];

/**
 * ISO tensile stress area As (mm²) of coarse-pitch threads.
 * Source: ISO 898-1, table of stress areas (As = π/4 · ((d2 + d3)/2)²).
 */
export const ISO_STRESS_AREA_MM2: Record<BoltSize, number> = {
  12: 84.3,
  16: 157,
  20: 245,
  22: 303,
  24: 353,
  27: 459,
  30: 561,
  36: 817,
};

export const PROPERTY_CLASSES = ["4.6", "5.6", "8.8", "10.9"] as const;
export type PropertyClass = (typeof PROPERTY_CLASSES)[number];

/** Which strength figures of ISO 898-1 to use for the bolt material. */
export type BoltStrengthBasis = "minimum" | "nominal";

export interface BoltMaterial {
  fub_MPa: number;
  fyb_MPa: number;
  source: string;
}

/**
 * Ultimate (fub) and yield (fyb) strength of a bolt property class.
 * "nominal": ISO 898-1 nominal values (the class numbers: 8.8 → 800/640), as EN 1993-1-8 Table 3.1.
 * "minimum": ISO 898-1 minimum values, as IS 1367-3 lists them (8.8, d > 16 mm → 830/660; 10.9 → 1040/940),
 *   the figures Indian design aids use with IS 800.
 * Source: ISO 898-1, Table 3 (nominal and minimum Rm, ReL/Rp0.2) — minimum values from memory; nominal
 *   values EN 1993-1-8 Table 3.1.
 */
export function boltMaterial(propertyClass: PropertyClass, d_mm: number, basis: BoltStrengthBasis): BoltMaterial {
  if (basis === "nominal") {
    const nominal: Record<PropertyClass, [number, number]> = {
      "4.6": [400, 240],
      "5.6": [500, 300],
      "8.8": [800, 640],
      "10.9": [1000, 900],
    };
    const [fub, fyb] = nominal[propertyClass];
    return { fub_MPa: fub, fyb_MPa: fyb, source: "ISO 898-1 nominal values (EN 1993-1-8 Table 3.1)" };
  }
  const minimum: Record<PropertyClass, [number, number]> = {
    "4.6": [400, 240],
    "5.6": [500, 300],
    "8.8": d_mm > 16 ? [830, 660] : [800, 640],
    "10.9": [1040, 940],
  };
  const [fub, fyb] = minimum[propertyClass];
  return { fub_MPa: fub, fyb_MPa: fyb, source: "ISO 898-1 Table 3 minimum values / IS 1367-3 (from memory)" };
}

/** Nominal shank (gross) area of the bolt, π d²/4 (mm²). */
export function shankArea_mm2(d_mm: number): number {
  return (Math.PI * d_mm * d_mm) / 4;
}

/** How the net (threaded) area Anb of a bolt is taken. */
export type NetAreaConvention = "0.78-gross" | "iso-stress-area";

/**
 * Net tensile stress area of the bolt at the threads, Anb (mm²).
 * "0.78-gross": 0.78 · π d²/4, the approximation IS 800:2007 cl. 10.3.3 allows for ISO threads and which
 *   Indian design aids tabulate; equals the ISO stress area for M16, M20 and M24 only.
 * "iso-stress-area": the ISO 898-1 stress area As.
 */
export function boltNetArea_mm2(d_mm: number, convention: NetAreaConvention): number {
  if (convention === "0.78-gross") return 0.78 * shankArea_mm2(d_mm);
  const area = ISO_STRESS_AREA_MM2[d_mm as BoltSize];
  if (area === undefined) throw new RangeError(`no ISO stress area for M${d_mm}`);
  return area;
}

export function isBoltSize(d: number): d is BoltSize {
  return (BOLT_SIZES_MM as readonly number[]).includes(d);
}

export function isPropertyClass(c: string): c is PropertyClass {
  return (PROPERTY_CLASSES as readonly string[]).includes(c);
}
