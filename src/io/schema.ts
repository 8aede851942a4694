/**
 * The scenario file's schema (zod), with unit conversion at the boundary.
 * A bare number means the documented unit of the field (mm, kN, MPa); strings such as "12 mm",
 * "450 kN", "0.75 in", "100 kip" are converted. Fields are snake_case in the file.
 */
import { z } from "zod";
import { DEFAULT_INPUT_UNIT, parseQuantity, type Quantity, toUnit, UnitError, US_INPUT_UNIT } from "../units/units.js";
import { EDGE_PREPARATIONS, HOLE_TYPES } from "../model/scenario.js";
import { EN10025_CONVENTIONS } from "../catalogue/steels.js";
import { freeText } from "./text-field.js";
import { LIMITS } from "./limits.js";
import { memo } from "./memo.js";

export { LIMITS };

/** What a bare number means while one file is validated (`units: us` → in, kip, ksi); SI otherwise. */
let inputUnits: Record<Quantity, string> = DEFAULT_INPUT_UNIT;

/** Run a validation with bare numbers read in the file's unit system (synchronous; restored after). */
export function withInputUnits<T>(system: "si" | "us", run: () => T): T {
  const saved = inputUnits;
  inputUnits = system === "us" ? US_INPUT_UNIT : DEFAULT_INPUT_UNIT;
  try {
    return run();
  } finally {
    inputUnits = saved;
  }
}

/** A limit in core units as the file would write it: "5000 mm", "1000000 kN"; with `units: us` also in the file's unit. */
function limitText(q: Quantity, core: number): string {
  const si = `${+toUnit(core, DEFAULT_INPUT_UNIT[q], q).toFixed(3)} ${DEFAULT_INPUT_UNIT[q]}`;
  return inputUnits === US_INPUT_UNIT ? `${+toUnit(core, US_INPUT_UNIT[q], q).toFixed(3)} ${US_INPUT_UNIT[q]} (${si})` : si;
}

function quantity(q: Quantity, opts: { positive?: boolean; nonNegative?: boolean; max?: number; min?: () => { value: number; text: string } } = {}) {
  return z.unknown().transform((value, ctx): number => {
    if (value === undefined) {
      ctx.addIssue({ code: "custom", message: "required" });
      return z.NEVER;
    }
    let v: number;
    try {
      v = parseQuantity(value, q, inputUnits);
    } catch (e) {
      ctx.addIssue({ code: "custom", message: e instanceof UnitError ? e.message : String(e) });
      return z.NEVER;
    }
    if (!Number.isFinite(v)) {
      ctx.addIssue({ code: "custom", message: "must be a finite number" });
      return z.NEVER;
    }
    if (opts.positive && !(v > 0)) {
      ctx.addIssue({ code: "custom", message: `must be greater than zero, got ${String(value)}` });
      return z.NEVER;
    }
    if (opts.nonNegative && v < 0) {
      ctx.addIssue({ code: "custom", message: `must not be negative, got ${String(value)}` });
      return z.NEVER;
    }
    const min = opts.min?.();
    if (min && v < min.value - 1e-9) {
      ctx.addIssue({ code: "custom", message: `${String(value)} is below the smallest accepted value, ${min.text}` });
      return z.NEVER;
    }
    if (opts.max !== undefined && v > opts.max) {
      ctx.addIssue({ code: "custom", message: `${String(value)} is beyond the largest accepted value, ${limitText(q, opts.max)}` });
      return z.NEVER;
    }
    return v;
  });
}

const length = (max: number = LIMITS.length_mm) => quantity("length", { positive: true, max });
const lengthOrZero = (max: number = LIMITS.length_mm) => quantity("length", { nonNegative: true, max });
const force = () => quantity("force", { positive: true, max: LIMITS.force_kN * 1000 });

const count = (max: number) => z.number().int("must be a whole number").min(1, "must be at least 1").max(max, `must be at most ${max}`);

const plate = memo(() => z.strictObject({
  width: length(LIMITS.width_mm),
  thickness: length(LIMITS.thickness_mm),
  grade: z.string().min(1),
  edges: z.enum(EDGE_PREPARATIONS as [string, ...string[]]).default("rolled"),
}));

/** Bolt size: "M20" or 20; an inch size "3/4 in", "0.75 in" (or 0.75 with units: us), as mm. */
const boltSize = memo(() => z.union([z.number(), z.string()]).transform((v, ctx): number => {
  const text = String(v).trim();
  if (inputUnits === US_INPUT_UNIT && typeof v === "number") return v * 25.4;
  if (/in$/i.test(text)) {
    try {
      return parseQuantity(text, "length");
    } catch (e) {
      ctx.addIssue({ code: "custom", message: e instanceof UnitError ? e.message : String(e) });
      return z.NEVER;
    }
  }
  const m = /^M?(\d+(?:\.\d+)?)$/i.exec(text);
  if (!m) {
    ctx.addIssue({ code: "custom", message: `"${text}" is not a metric bolt size such as M20` });
    return z.NEVER;
  }
  return Number(m[1]);
}));

/** Property class "8.8" (a YAML number 8.8 is accepted too). */
const propertyClass = memo(() => z.union([z.number(), z.string()]).transform((v) => (typeof v === "number" ? v.toFixed(1) : v.trim())));

const bolts = memo(() => z.strictObject({
  size: boltSize(),
  class: propertyClass(),
  // No default: the bolt type may be given in the code's own words instead (src/io/bolt-words.ts).
  type: z.enum(["bearing", "friction-grip"]).optional(),
  /** EN 1993-1-8 3.4.1: Category A (bearing type), B (slip-resistant at SLS), C (slip-resistant at ULS). */
  category: z.enum(["A", "B", "C"]).optional(),
  /** EN 1993-1-8 3.1.2: preloaded bolts. */
  preloaded: z.boolean().optional(),
  /** AISC 360-16 J3.1, J3.8: a snug-tight, pretensioned or slip-critical joint. */
  joint: z.enum(["snug-tight", "pretensioned", "slip-critical"]).optional(),
  /** AISC 360-16 Table J3.2: threads not excluded (N) or excluded (X) from the shear planes. */
  threads: z.enum(["N", "X"]).optional(),
  slip_factor: z.number().gt(0, "must be greater than zero").optional(),
  slip_at: z.enum(["service", "ultimate"]).optional(),
  threads_in_shear_planes: z.boolean().optional(),
  hole: z.enum(HOLE_TYPES as [string, ...string[]]).default("standard"),
  slot_direction: z.enum(["along", "across"]).optional(),
}));

const holePoint = memo(() => z.union([
  z.strictObject({ x: lengthOrZero(), y: quantity("length", { max: LIMITS.width_mm }) }),
  z.tuple([lengthOrZero(), quantity("length", { max: LIMITS.width_mm })]).transform(([x, y]) => ({ x, y })),
]));

const layout = memo(() => z.strictObject({
  pattern: z.enum(["grid", "staggered", "tapered", "holes"]),
  across: count(LIMITS.boltsAcross).optional(),
  along: count(LIMITS.linesAlong).optional(),
  across_per_line: z.array(count(LIMITS.boltsAcross)).min(1).max(LIMITS.linesAlong).optional(),
  pitch: length().optional(),
  gauge: length().optional(),
  end_distance: length().optional(),
  end_distance_at_butt: length().optional(),
  edge_distance: length().optional(),
  holes: z.array(holePoint()).min(1).max(LIMITS.holes).optional(),
}));

/**
 * The smallest search step: 1 mm, or 1/16 in (1.5875 mm) for a file in US units — finer steps than a
 * fabricator can mark only multiply the work (common practice).
 */
export const MIN_SEARCH_STEP = { si: { value: 1, text: "1 mm" }, us: { value: 25.4 / 16, text: "1/16 in" } } as const;

/** Longest lists of the search section (sizes, classes, cover thicknesses), beyond any real choice. */
export const MAX_SEARCH_LIST = 20;

const search = memo(() => z.strictObject({
  patterns: z.array(z.enum(["grid", "staggered", "tapered"])).min(1).max(MAX_SEARCH_LIST, `at most ${MAX_SEARCH_LIST} entries`).optional(),
  max_along: count(LIMITS.linesAlong).optional(),
  min_bolts: count(LIMITS.holes).optional(),
  sizes: z.array(boltSize()).min(1).max(MAX_SEARCH_LIST, `at most ${MAX_SEARCH_LIST} entries`).optional(),
  classes: z.array(propertyClass()).min(1).max(MAX_SEARCH_LIST, `at most ${MAX_SEARCH_LIST} entries`).optional(),
  step: quantity("length", { positive: true, max: 1000, min: () => (inputUnits === US_INPUT_UNIT ? MIN_SEARCH_STEP.us : MIN_SEARCH_STEP.si) }).optional(),
  max_splice_length: length().optional(),
  max_end_distance: length().optional(),
  max_across: count(LIMITS.boltsAcross).optional(),
  min_across: count(LIMITS.boltsAcross).optional(),
  gauge: length().optional(),
  cover_thicknesses: z.array(length(LIMITS.thickness_mm)).min(1).max(MAX_SEARCH_LIST, `at most ${MAX_SEARCH_LIST} entries`).optional(),
}));

const options = memo(() => z.strictObject({
  exposed_to_corrosion: z.boolean().default(false),
  // No default here: the design code supplies it (src/io/scenario.ts), so a code can tell an explicit choice.
  bolt_net_area: z.enum(["0.78-gross", "iso-stress-area"]).optional(),
  bolt_strength: z.enum(["minimum", "nominal"]).optional(),
  net_section_load: z.enum(["full", "transferred"]).default("full"),
  block_shear_load: z.enum(["share", "full"]).default("share"),
  efficiency_basis: z.enum(["lesser", "rupture", "yield"]).default("lesser"),
  bearing_deformation: z.enum(["considered", "not-considered"]).optional(),
  fillers_developed: z.boolean().optional(),
  steel_strengths: z.enum(EN10025_CONVENTIONS as [string, ...string[]]).optional(),
  small_bolt_clearance: z.number().refine((v) => v === 1 || v === 2, "must be 1 or 2 (mm: the normal-hole clearance of M12 and M14 bolts)").optional(),
}));

/** A partial factor of a national annex: a plain number from 1.0 to 2.0. */
const partialFactor = () => z.number().min(1, "must be at least 1.0").max(2, "must be at most 2.0");

const factors = memo(() => z.strictObject({
  gamma_m0: partialFactor().optional(),
  gamma_m1: partialFactor().optional(),
  gamma_m2: partialFactor().optional(),
  gamma_m3: partialFactor().optional(),
  gamma_m3_ser: partialFactor().optional(),
}));

/** The document fields a drawing's title block and a report's sign-off block carry (all optional, free text). */
const documentInfo = memo(() => z.strictObject({
  job: freeText().optional(),
  drawing_number: freeText().optional(),
  calculation_number: freeText().optional(),
  revision: freeText().optional(),
  drawn_by: freeText().optional(),
  prepared_by: freeText().optional(),
  checked_by: freeText().optional(),
  date: freeText().optional(),
}));

/** The scenario file's schema, built on first use (with its pieces above). */
export const scenarioSchema = memo(() => z.strictObject({
  name: freeText().pipe(z.string().min(1, "must not be empty")),
  project: freeText().optional(),
  document: documentInfo().optional(),
  units: z.enum(["si", "us"]).optional(),
  code: z.string().min(1),
  splice: z.strictObject({
    type: z.enum(["lap", "butt-single-cover", "butt-double-cover"]),
    butt_gap: lengthOrZero(1000).optional(),
    ends_in_contact: z.boolean().optional(),
  }),
  plates: z.strictObject({
    main: plate(),
    main_b: plate().optional(),
    cover: plate().optional(),
    cover_b: plate().optional(),
  }),
  packing: z.union([z.literal("auto"), lengthOrZero(LIMITS.thickness_mm)]).optional(),
  load: z.strictObject({
    factored_tension: force().optional(),
    service_tension: force().optional(),
    factored_compression: force().optional(),
    service_compression: force().optional(),
  }),
  bolts: bolts().optional(),
  layout: layout().optional(),
  search: search().optional(),
  costs: z.unknown().optional(),
  compare: z.unknown().optional(),
  options: options().default({ exposed_to_corrosion: false, net_section_load: "full", block_shear_load: "share", efficiency_basis: "lesser" }),
  factors: factors().optional(),
}));

export type ScenarioFile = z.infer<ReturnType<typeof scenarioSchema>>;
