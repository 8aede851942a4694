/**
 * Bolt data: metric ISO sizes and property classes.
 * Every value carries its source beside it.
 */
import { hyphenatedInches } from "../units/units.js";

/** Metric bolt sizes the catalogue knows (nominal diameter, mm). */
export const BOLT_SIZES_MM = [12, 16, 18, 20, 22, 24, 27, 30, 36] as const;
export type BoltSize = (typeof BOLT_SIZES_MM)[number];

/**
 * ISO tensile stress area As (mm²) of coarse-pitch threads.
 * Source: ISO 898-1, table of stress areas (As = π/4 · ((d2 + d3)/2)²).
 */
export const ISO_STRESS_AREA_MM2: Record<BoltSize, number> = {
  12: 84.3,
  16: 157,
  18: 192,
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

/** fub and fyb, MPa, nominal (ISO 898-1 nominal values, EN 1993-1-8 Table 3.1). */
const NOMINAL_STRENGTHS: Readonly<Record<PropertyClass, readonly [number, number]>> = {
  "4.6": [400, 240],
  "5.6": [500, 300],
  "8.8": [800, 640],
  "10.9": [1000, 900],
};
/**
 * fub and fyb, MPa, minimum (EN ISO 898-1:2013 Table 3, as reproduced at
 * http://nfgab.se/en/technology-quality/technical-pages/mechanical-properties-for-fasteners/mechanical-properties-screws-and-studs-en-iso-898-12013/);
 * class 8.8 up to M16 here, above M16 next. Table 3's footnotes give structural bolting the d > 16 column
 * from M12; that is not applied here: the Indian design aids tabulate 800 MPa up to M16 (../shared check
 * values), and the lower figure is the reading that refuses more.
 */
const MINIMUM_STRENGTHS: Readonly<Record<PropertyClass, readonly [number, number]>> = {
  "4.6": [400, 240],
  "5.6": [500, 300],
  "8.8": [800, 640],
  "10.9": [1040, 940],
};
const MINIMUM_8_8_ABOVE_M16 = [830, 660] as const;

/**
 * Ultimate (fub) and yield (fyb) strength of a bolt property class.
 * "nominal": ISO 898-1 nominal values (the class numbers: 8.8 → 800/640), as EN 1993-1-8 Table 3.1.
 * "minimum": ISO 898-1 minimum values, as IS 1367-3 lists them (8.8, d > 16 mm → 830/660; 10.9 → 1040/940),
 *   the figures Indian design aids use with IS 800.
 * Source: ISO 898-1, Table 3 (nominal and minimum Rm, ReL/Rp0.2) — minimum values as EN ISO 898-1:2013
 *   Table 3 (reproduction cited above); nominal values EN 1993-1-8 Table 3.1.
 */
export function boltMaterial(propertyClass: PropertyClass, d_mm: number, basis: BoltStrengthBasis): BoltMaterial {
  if (basis === "nominal") {
    const [fub, fyb] = NOMINAL_STRENGTHS[propertyClass];
    return { fub_MPa: fub, fyb_MPa: fyb, source: "ISO 898-1 nominal values, EN 1993-1-8 Table 3.1" };
  }
  const [fub, fyb] = propertyClass === "8.8" && d_mm > 16 ? MINIMUM_8_8_ABOVE_M16 : MINIMUM_STRENGTHS[propertyClass];
  return { fub_MPa: fub, fyb_MPa: fyb, source: "ISO 898-1 Table 3 minimum values, IS 1367-3" };
}

/** Nominal shank (gross) area of the bolt, π d²/4 (mm²). */
export function shankArea_mm2(d_mm: number): number {
  return (Math.PI * d_mm * d_mm) / 4;
}

/** How the net (threaded) area Anb of a bolt is taken. */
export type NetAreaConvention = "0.78-gross" | "iso-stress-area";

/**
 * Net tensile stress area of the bolt at the threads, Anb (mm²).
 * "0.78-gross": 0.78 · π d²/4, the approximation Indian design aids tabulate for ISO threads (common
 *   practice; IS 800:2007 cl. 10.3.3 defines Anb at the threads and gives no factor); equals the ISO stress
 *   area for M16, M20 and M24 only.
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

/**
 * Inch bolt sizes the catalogue knows (nominal diameter, in): ½, ⅝, ¾, ⅞, 1, 1⅛. Used with AISC 360-16;
 * the core carries them in mm (d × 25.4). AISC takes the nominal unthreaded body area Ab = π d²/4
 * (AISC 360-16 J3.6), so no stress-area table is needed.
 */
export const INCH_BOLT_SIZES_IN = [0.5, 0.625, 0.75, 0.875, 1, 1.125] as const;

/** The inch size (in) of a diameter in mm, when it is one of the catalogue's inch sizes. */
export function inchBoltSize(d_mm: number): number | undefined {
  return INCH_BOLT_SIZES_IN.find((d) => Math.abs(d * 25.4 - d_mm) < 1e-6);
}

/** An inch size as the trade writes it: "3/4 in", "1-1/8 in". */
export function inchSizeText(d_in: number): string {
  return `${hyphenatedInches(Math.round(d_in * 16))} in`;
}

/**
 * ASTM bolt grades used with AISC 360-16: ASTM F3125 Grade A325 (Group A), Grade A490 (Group B), and
 * ASTM A307 Grade A. `iso` is the ISO 898-1 property class of the same strength level (A325 ↔ 8.8,
 * A490 ↔ 10.9, A307 ↔ 4.6; common practice, as the metric F3125 grades A325M/A490M correspond to 8.8/10.9),
 * which code-neutral parts (cost table, bill of materials) key by. Fu: specified minimum tensile strength,
 * ksi (ASTM F3125: 120 ksi for Grade A325 in every size — the 105 ksi above 1 in was the withdrawn ASTM A325's;
 * 150 ksi A490; A307 60 ksi). No check reads Fu of a bolt under AISC 360-16: Table J3.2 gives Fnt and Fnv.
 */
export const ASTM_BOLT_GRADES = ["A307", "A325", "A490"] as const;
export type AstmBoltGrade = (typeof ASTM_BOLT_GRADES)[number];
export const ASTM_ISO_EQUIVALENT: Record<AstmBoltGrade, PropertyClass> = { A307: "4.6", A325: "8.8", A490: "10.9" };

/** "A325", "F3125 A325", "ASTM F3125 Grade A325", "A325M" → "A325"; undefined when not an ASTM grade. */
export function astmBoltGrade(text: string): AstmBoltGrade | undefined {
  const key = text.trim().toUpperCase().replace(/\s+/g, " ").replace(/^ASTM /, "").replace(/^F3125 (GRADE |GR\.? ?)?/, "");
  const m = /^(A307|A325|A490)M?$/.exec(key);
  return m ? (m[1] as AstmBoltGrade) : undefined;
}

/** A bolt size as the trade writes it: "M20", or an inch size "3/4 in". */
export function boltSizeText(d_mm: number): string {
  const inch = inchBoltSize(d_mm);
  return inch !== undefined ? inchSizeText(inch) : `M${d_mm}`;
}

/** The grade of a bolt as printed: the ISO class, or for an inch bolt its ASTM grade (A325 for 8.8…). */
export function boltGradeText(propertyClass: PropertyClass, d_mm: number): string {
  if (inchBoltSize(d_mm) === undefined) return propertyClass;
  const astm = (Object.keys(ASTM_ISO_EQUIVALENT) as AstmBoltGrade[]).find((g) => ASTM_ISO_EQUIVALENT[g] === propertyClass);
  return astm ?? propertyClass;
}

/**
 * The grade of a bolt as printed under a design code: under AISC 360-16 the ASTM grade of the class's
 * strength level, A325M / A490M for a metric size (ASTM F3125; A307 has no metric grade, so a metric
 * 4.6 bolt keeps its class); elsewhere as boltGradeText.
 */
export function boltGradeUnder(code: string, propertyClass: PropertyClass, d_mm: number): string {
  if (code !== "aisc360-16" || inchBoltSize(d_mm) !== undefined) return boltGradeText(propertyClass, d_mm);
  const astm = (Object.keys(ASTM_ISO_EQUIVALENT) as AstmBoltGrade[]).find((g) => ASTM_ISO_EQUIVALENT[g] === propertyClass);
  return astm === undefined || astm === "A307" ? propertyClass : `${astm}M`;
}

/** The size of a cost-table key ("M20", "3/4 in", "1-1/8 in", "1 in"), mm; undefined if not a size. */
export function sizeOfKey(key: string): number | undefined {
  const metric = /^M(\d+)$/.exec(key);
  if (metric) return Number(metric[1]);
  const inch = /^(?:(\d+)-)?(?:(\d+)\/(\d+)|(\d+)) in$/.exec(key.trim());
  if (!inch) return undefined;
  const whole = Number(inch[1] ?? 0) + Number(inch[4] ?? 0);
  const frac = inch[2] ? Number(inch[2]) / Number(inch[3]) : 0;
  const d_in = whole + frac;
  return INCH_BOLT_SIZES_IN.some((d) => Math.abs(d - d_in) < 1e-9) ? d_in * 25.4 : undefined;
}
