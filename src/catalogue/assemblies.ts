/**
 * Bolt assemblies of each design code: the product standards of the bolt, nut and washer, their
 * dimensions, the washers the system asks for, the length series and how a length is found. The bolt
 * length rule (export/bolt-list.ts) runs on these numbers only. Lengths in mm (inch values × 25.4).
 *
 * Sources, beside each table below:
 *   - ISO 4014 / 4017 bolts, ISO 4032 nuts, ISO 7089 washers (EN 15048 non-preloaded assemblies; also the
 *     IS 800 bearing-type bolts of IS 1363/1364, which follow the ISO dimensions) — sources in fasteners.ts
 *     (that IS 1363/1364 follow the ISO dimensions: from memory);
 *   - EN 14399-3 (HR bolt and nut) with EN 14399-6 washers for preloaded EN 1993-1-8 assemblies — washer
 *     thicknesses and the four threads as sourced at en14399Hr below; the HR nut and thread lengths from memory;
 *   - IS 3757 / IS 6623 / IS 6649 friction-grip assemblies as tabulated in Indian design aids;
 *   - ASTM F3125 heavy hex structural bolts with ASTM A563 heavy hex nuts and ASTM F436 washers; the length
 *     found by the "add to grip" values of the RCSC Specification (Table C-2.1, reproduced in the AISC
 *     Manual) plus 5/32 in for each F436 washer (CISC, "Bolt length selection aid",
 *     https://www.cisc-icca.ca/bolt-length-selection-aid/), rounded up to the next 1/4 in — the add-to-grip
 *     values and the rounding from memory.
 */
import { inchBoltSize } from "./bolts.js";
import { hyphenatedInches } from "../units/units.js";
import { HEX_NUT_HEIGHT_MM, HSFG_DIMENSIONS, iso4014ThreadLength_mm, PLAIN_WASHER_MM, PREFERRED_LENGTHS_MM, THREAD_PITCH_MM } from "./fasteners.js";

const IN = 25.4;

/** Which assembly family a joint's bolts belong to (one per code and bolt type). */
export type AssemblyId = "iso-non-preloaded" | "is-hsfg" | "en-14399-hr" | "astm-f3125" | "astm-f3125m";

export interface AssemblySystem {
  id: AssemblyId;
  /** The standards as the order list names them. */
  boltStandard: string;
  nutStandard: string;
  washerStandard: string;
  nut_mm: number;
  washer_mm: number;
  washersUnderHead: number;
  /** Washers under the nut before any are added to take up a plain shank. */
  washersUnderNut: number;
  /** Length needed for a grip and a number of washers, before rounding to the series, mm. */
  required_mm(grip_mm: number, washers: number): number;
  /** Thread length b of a bolt of nominal length L, mm. */
  threadLength_mm(length_mm: number): number;
  /** Full threads that must stay between the nut's seat and the plain shank, mm (the nut must clamp). */
  threadBelowNut_mm: number;
  /** The nominal lengths the standard lists, ascending, mm. */
  lengths_mm: readonly number[];
  /** How a length is written on the order list ("65", "2-1/4 in"). */
  lengthText(length_mm: number): string;
  /** The bolt, nut and washer as the order list names them, in the code's own words. */
  boltItem(length_mm: number): string;
  nutItem: string;
  washerItem: string;
  /** The nut's grade where the nut standard names its own (ASTM A563 Grade C / DH, A563M 8S / 10S); else the ISO nut class of the bolt class applies. */
  nutClass?: string;
}

/** What the assembly is chosen from. */
export interface AssemblyInput {
  code: string;
  d_mm: number;
  /** ISO property class, or the ASTM grade named (A325, A490, A307). */
  grade: string;
  preloaded: boolean;
}

/** An inch length as a US shop writes it, to 1/16 in: 2-1/4 in. */
export function inchFractionText(mm: number): string {
  return `${hyphenatedInches(Math.round((mm / IN) * 16))} in`;
}

const mmText = (l: number) => `${Number(l.toFixed(1))} mm`;
const pitch = (d: number) => THREAD_PITCH_MM[d] ?? 3;

/**
 * ISO 4014 / 4017 bolt, ISO 4032 nut, ISO 7089 washer under the nut: EN 15048 non-preloaded assemblies
 * under EN 1993-1-8 and the IS 1363/1364 bearing-type bolts of IS 800 (ISO dimensions: sources in
 * fasteners.ts; that IS 1363/1364 follow them, from memory).
 * Length = grip + washer + nut + two thread pitches beyond the nut; ISO 4014 thread b = 2d + 6, 2d + 12
 * or 2d + 25 by length.
 */
function isoNonPreloaded(d: number, grade: string, standards: { bolt: string; nut: string; washer: string; words: "is" | "en" }): AssemblySystem {
  const nut = HEX_NUT_HEIGHT_MM[d] ?? d;
  const washer = PLAIN_WASHER_MM[d] ?? 4;
  return {
    id: "iso-non-preloaded",
    boltStandard: standards.bolt,
    nutStandard: standards.nut,
    washerStandard: standards.washer,
    nut_mm: nut,
    washer_mm: washer,
    washersUnderHead: 0,
    washersUnderNut: 1,
    required_mm: (grip, washers) => grip + washers * washer + nut + 2 * pitch(d),
    threadLength_mm: (l) => iso4014ThreadLength_mm(d, l),
    threadBelowNut_mm: 0,
    lengths_mm: PREFERRED_LENGTHS_MM,
    lengthText: mmText,
    boltItem: (l) => (standards.words === "is" ? `M${d} × ${l} class ${grade} hexagon head bolt` : `M${d} × ${l} hexagon head bolt, property class ${grade}`),
    nutItem: standards.words === "is" ? `M${d} hexagon nut, class ${nutClassOf(grade)}` : `M${d} hexagon nut, property class ${nutClassOf(grade)}`,
    washerItem: `M${d} plain washer, ${washer} mm`,
  };
}

/** Nut property class matched to a bolt class (ISO 898-2, common practice): 5 for 4.6/5.6, 8 for 8.8, 10 for 10.9. */
export function nutClassOf(boltClass: string): string {
  if (boltClass === "10.9") return "10";
  if (boltClass === "8.8") return "8";
  return "5";
}

/**
 * EN 14399-3 (system HR) preloaded assembly with EN 14399-6 chamfered washers under head and nut (the
 * washers the system is used with under EN 1090-2 for class 10.9, taken for 8.8 as well: the reading
 * that gives the longer bolt). HR nuts take the ISO 4032 heights and HR bolts the ISO 4014 thread
 * lengths (from memory; EN 14399-7, the countersunk HR assembly, states "regular nut height ... EN ISO 4032"
 * and "thread length ... ISO 888" in its scope, iteh.us). At least four full threads stay between the nut's
 * seat and the plain shank: BS EN 1090-2:2008, 8.2.2. Washer thickness
 * h nominal of EN 14399-6 (M12 3, M16–M24 4, M27–M30 5, M36 6): the BS EN 14399-6 dimension table as a supplier
 * reproduces it, https://torqbolt.com/bs-en-14399-6-chamfered-washers-plain-chamfered-washers-suppliers-manufacturers.
 */
const EN14399_6_WASHER_MM: Record<number, number> = { 12: 3, 16: 4, 18: 4, 20: 4, 22: 4, 24: 4, 27: 5, 30: 5, 36: 6 };

function en14399Hr(d: number, grade: string): AssemblySystem {
  const nut = HEX_NUT_HEIGHT_MM[d] ?? d;
  const washer = EN14399_6_WASHER_MM[d] ?? 5;
  return {
    id: "en-14399-hr",
    boltStandard: "EN 14399-3 (system HR) bolt",
    nutStandard: "EN 14399-3 (system HR) nut",
    washerStandard: "EN 14399-6 washer",
    nut_mm: nut,
    washer_mm: washer,
    washersUnderHead: 1,
    washersUnderNut: 1,
    required_mm: (grip, washers) => grip + washers * washer + nut + 2 * pitch(d),
    threadLength_mm: (l) => iso4014ThreadLength_mm(d, l),
    threadBelowNut_mm: 4 * pitch(d),
    lengths_mm: PREFERRED_LENGTHS_MM,
    lengthText: mmText,
    boltItem: (l) => `M${d} × ${l} HR ${grade} preloadable bolt (EN 14399-3)`,
    nutItem: `M${d} HR nut, property class ${grade === "10.9" ? "10" : "8"} (EN 14399-3)`,
    washerItem: `M${d} chamfered washer, ${washer} mm, hardened (EN 14399-6)`,
  };
}

/** IS 3757 friction-grip bolt, IS 6623 nut, IS 6649 hardened washers under head and nut (Indian design aids). */
function isHsfg(d: number, grade: string): AssemblySystem {
  const hs = HSFG_DIMENSIONS[d];
  const nut = hs?.nut_mm ?? d;
  const washer = hs?.washer_mm ?? 5;
  return {
    id: "is-hsfg",
    boltStandard: "IS 3757 high-strength friction-grip bolt",
    nutStandard: "IS 6623 nut",
    washerStandard: "IS 6649 hardened washer",
    nut_mm: nut,
    washer_mm: washer,
    washersUnderHead: 1,
    washersUnderNut: 1,
    required_mm: (grip, washers) => grip + washers * washer + nut + 2 * pitch(d),
    threadLength_mm: (l) => (hs ? (l < 100 ? hs.threadShort_mm : hs.threadLong_mm) : iso4014ThreadLength_mm(d, l)),
    threadBelowNut_mm: 0,
    lengths_mm: PREFERRED_LENGTHS_MM,
    lengthText: mmText,
    boltItem: (l) => `M${d} × ${l} class ${grade} high-strength friction-grip hexagon bolt (HSFG)`,
    nutItem: `M${d} HSFG nut, class ${grade === "10.9" ? "10" : "8"}`,
    washerItem: `M${d} hardened washer, ${washer} mm`,
  };
}

/**
 * ASTM F3125 heavy hex structural bolts (inch), ASTM A563 heavy hex nuts, ASTM F436 washers.
 * Add-to-grip values of the RCSC Specification (nut height plus the stick-out and tolerances), in:
 * ½ 11/16, ⅝ 7/8, ¾ 1, ⅞ 1-1/8, 1 1-1/4, 1⅛ 1-1/2 (from memory); F436 washer 5/32 in nominal (CISC bolt
 * length aid, https://www.cisc-icca.ca/bolt-length-selection-aid/); heavy hex nut heights ½ 31/64, ⅝ 39/64,
 * ¾ 47/64, ⅞ 55/64, 1 63/64, 1⅛ 1-7/64 in (ASME B18.2.2 heavy hex nut table); heavy hex structural bolt
 * thread lengths ½ 1,
 * ⅝ 1-1/4, ¾ 1-3/8, ⅞ 1-1/2, 1 1-3/4, 1⅛ 2 in (Portland Bolt, "Bolt thread length",
 * http://www.portlandbolt.com/faqs/bolt-thread-lengths/); lengths in 1/4 in steps from 1 to 8 in (from memory).
 */
const ASTM_INCH: Record<string, { addToGrip: number; nut: number; thread: number }> = {
  "0.5": { addToGrip: 11 / 16, nut: 31 / 64, thread: 1 },
  "0.625": { addToGrip: 7 / 8, nut: 39 / 64, thread: 1.25 },
  "0.75": { addToGrip: 1, nut: 47 / 64, thread: 1.375 },
  "0.875": { addToGrip: 1.125, nut: 55 / 64, thread: 1.5 },
  "1": { addToGrip: 1.25, nut: 63 / 64, thread: 1.75 },
  "1.125": { addToGrip: 1.5, nut: 1 + 7 / 64, thread: 2 },
};
const F436_WASHER_IN = 5 / 32;
const ASTM_LENGTHS_MM: readonly number[] = Array.from({ length: 29 }, (_, i) => (1 + i / 4) * IN);

function astmF3125(d_in: number, grade: string, pretensioned: boolean): AssemblySystem {
  const t = ASTM_INCH[String(d_in)] ?? { addToGrip: d_in + 0.375, nut: d_in, thread: 2 * d_in };
  const size = inchFractionText(d_in * IN);
  const nutGrade = grade === "A490" ? "DH" : grade === "A307" ? "A" : "C";
  const boltName = grade === "A307" ? "ASTM A307 Grade A hex bolt" : `ASTM F3125 Grade ${grade} heavy hex structural bolt`;
  return {
    id: "astm-f3125",
    boltStandard: grade === "A307" ? "ASTM A307" : "ASTM F3125",
    nutStandard: "ASTM A563 heavy hex nut",
    washerStandard: "ASTM F436 hardened washer",
    nut_mm: t.nut * IN,
    washer_mm: F436_WASHER_IN * IN,
    washersUnderHead: 0,
    washersUnderNut: 1,
    required_mm: (grip, washers) => grip + (t.addToGrip + washers * F436_WASHER_IN) * IN,
    threadLength_mm: () => t.thread * IN,
    threadBelowNut_mm: 0,
    lengths_mm: ASTM_LENGTHS_MM,
    lengthText: inchFractionText,
    boltItem: (l) => `${size} × ${inchFractionText(l)} ${boltName}${pretensioned ? ", pretensioned" : ""}`,
    nutItem: `${size} ASTM A563 Grade ${nutGrade} heavy hex nut`,
    nutClass: nutGrade,
    washerItem: `${size} ASTM F436 hardened flat washer, 5/32 in`,
  };
}

/**
 * Metric AISC work: ASTM F3125M heavy hex structural bolts with A563M nuts and F436M washers. Heavy hex
 * nut heights and structural bolt thread lengths of the metric heavy hex standards (the same figures as
 * the IS 3757 heavy hex tables, from memory); length = grip + washer + nut + two pitches; 5 mm steps.
 */
function astmF3125M(d: number, grade: string, pretensioned: boolean): AssemblySystem {
  const hs = HSFG_DIMENSIONS[d];
  const nut = { 16: 17.1, 20: 20.7, 22: 23.6, 24: 24.2, 27: 27.6, 30: 30.7, 36: 36.6 }[d] ?? d;
  const washer = { 16: 4, 20: 4, 22: 4, 24: 4, 27: 5, 30: 5, 36: 5 }[d] ?? 5;
  return {
    id: "astm-f3125m",
    boltStandard: "ASTM F3125M",
    nutStandard: "ASTM A563M heavy hex nut",
    washerStandard: "ASTM F436M hardened washer",
    nut_mm: nut,
    washer_mm: washer,
    washersUnderHead: 0,
    washersUnderNut: 1,
    required_mm: (grip, washers) => grip + washers * washer + nut + 2 * pitch(d),
    threadLength_mm: (l) => (hs ? (l < 100 ? hs.threadShort_mm : hs.threadLong_mm) : iso4014ThreadLength_mm(d, l)),
    threadBelowNut_mm: 0,
    lengths_mm: PREFERRED_LENGTHS_MM,
    lengthText: mmText,
    boltItem: (l) => `M${d} × ${l} ASTM F3125 Grade ${grade}M heavy hex structural bolt${pretensioned ? ", pretensioned" : ""}`,
    nutItem: `M${d} ASTM A563M Class ${grade === "A490" ? "10S" : "8S"} heavy hex nut`,
    nutClass: grade === "A490" ? "10S" : "8S",
    washerItem: `M${d} ASTM F436M hardened washer, ${washer} mm`,
  };
}

/** The assembly of a joint's bolts under its code. */
export function assemblyFor(input: AssemblyInput): AssemblySystem {
  const { code, d_mm: d, grade, preloaded } = input;
  if (code.startsWith("aisc")) {
    const inch = inchBoltSize(d);
    return inch !== undefined ? astmF3125(inch, grade, preloaded) : astmF3125M(d, grade, preloaded);
  }
  if (code.startsWith("en1993")) {
    if (preloaded) return en14399Hr(d, grade);
    return isoNonPreloaded(d, grade, { bolt: "ISO 4014/4017 bolt (EN 15048-1 assembly)", nut: "ISO 4032 nut", washer: "ISO 7089 washer", words: "en" });
  }
  if (preloaded) return isHsfg(d, grade);
  return isoNonPreloaded(d, grade, { bolt: "IS 1364 (ISO 4014) bolt", nut: "ISO 4032 nut", washer: "ISO 7089 washer", words: "is" });
}
