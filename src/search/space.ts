/**
 * The declared search space: every choice the search makes, with its range, from the scenario's
 * search section, the cost catalogue and the design code's own limits. The output states it in full.
 */
import { boltPrice, type CostTable } from "../catalogue/costs.js";
import { boltWordsOf } from "../codes/words.js";
import { boltGradeUnder, boltSizeText, INCH_BOLT_SIZES_IN, inchBoltSize, sizeOfKey, type PropertyClass } from "../catalogue/bolts.js";
import { lengthNumber, lengthText } from "../report/format.js";
import type { DesignCode, RangeTop, SearchLimits } from "../codes/types.js";
import type { BoltAssembly, BoltSpec, CheckableScenario, LayoutSpec, PlateSpec, Scenario } from "../model/scenario.js";

export type SearchPattern = "grid" | "staggered" | "tapered";
export const SEARCH_PATTERNS: readonly SearchPattern[] = ["grid", "staggered", "tapered"];

/** Defaults of the declared space where the scenario is silent. */
export const SEARCH_DEFAULTS = {
  step_mm: 5,
  maxAlong: 12,
  /** At least two bolts in each group (common practice: a single bolt has no redundancy). */
  minBolts: 2,
  /**
   * At least two bolts across wherever the narrowest plate fits two at the minimum gauge and edge
   * distance (common practice: a single gauge line on a plate wide enough for two puts the whole
   * force through one line of holes with no redundancy across the width); 1 on narrower plates.
   */
  minAcross: 2,
  /** Step for a scenario in US customary units (`units: us`): ¼ in (common practice). */
  stepUs_mm: 6.35,
} as const;

export interface SearchSpace {
  sizes_mm: number[];
  classes: PropertyClass[];
  assembly: BoltAssembly;
  patterns: SearchPattern[];
  step_mm: number;
  /** Most transverse lines along the force (per side of the butt). */
  maxAlong: number;
  /** Fewest bolts in each bolt group (per side of the butt). */
  minBolts: number;
  maxAcross?: number;
  /** Declared fewest bolts across (search.min_across); absent: the default rule (SEARCH_DEFAULTS.minAcross). */
  minAcross?: number;
  maxSpliceLength_mm?: number;
  maxEndDistance_mm?: number;
  fixedGauge_mm?: number;
  /** Cover plate thicknesses tried (butt splices); the scenario's own cover thickness if none listed. */
  coverThicknesses_mm: number[];
}

/** One family: a bolt, a pattern with its counts, a cover thickness. Dimensions vary within it. */
export interface Family {
  index: number;
  size_mm: number;
  propertyClass: PropertyClass;
  pattern: SearchPattern;
  /** Bolts on each transverse line (grid and staggered); for tapered, chosen later (lines only). */
  countsPerLine: number[] | null;
  lines: number;
  /** Grid and staggered: the across count as the layout spec takes it. */
  across: number;
  /** Fewest bolts on the fullest transverse line in this family (tapered: the line at the butt). */
  minAcross: number;
  coverThickness_mm: number | undefined;
  limits: SearchLimits;
  pitches_mm: number[];
  ends_mm: number[];
  /** Butt splices: end distances at the butt; lap splices: [undefined]. */
  endsAtButt_mm: Array<number | undefined>;
  /** Gauges for the family's number of gauge lines (tapered: computed per counts). */
  gauges_mm: number[];
  /** The scenario with this family's bolt and cover thickness, layout to be filled. */
  base: Scenario & { bolts: BoltSpec };
}

const up = (v: number, step: number) => Math.ceil(v / step - 1e-9) * step;
const down = (v: number, step: number) => Math.floor(v / step + 1e-9) * step;

/** Values v0, v0 + step, … up to v1 on the step grid (empty when v1 < v0). */
export function stepRange(from_mm: number, to_mm: number, step_mm: number): number[] {
  const out: number[] = [];
  const a = up(from_mm, step_mm);
  const b = down(to_mm, step_mm);
  for (let v = a; v <= b + 1e-9; v += step_mm) out.push(Math.round(v * 1e6) / 1e6);
  return out;
}

/**
 * The step values of a range from `from` to a top: a rule top is never passed (the last step at or below
 * it); a declared top is reached (the first step at or beyond it), never past its rule maximum.
 */
export function rangeTo(from_mm: number, top_mm: number, top: RangeTop, step_mm: number): number[] {
  if (top.kind === "rule") return stepRange(from_mm, top_mm, step_mm);
  return stepRange(from_mm, Math.min(up(top_mm, step_mm), top.ruleMax_mm ?? Infinity), step_mm);
}

/** The narrowest plate of the splice, mm. */
export function narrowestWidth(s: Scenario): number {
  return Math.min(s.plates.mainA.width_mm, s.plates.mainB.width_mm, ...s.plates.covers.map((c) => c.width_mm));
}

/** Gauges for G gauge lines on the narrowest plate: edge distance within [edgeMin, edgeMax]. */
export function gaugesFor(G: number, width_mm: number, limits: SearchLimits, space: SearchSpace): number[] {
  if (G <= 1) return [0];
  if (space.fixedGauge_mm !== undefined) return [space.fixedGauge_mm];
  const byEdgeMin = (width_mm - 2 * limits.edgeMin_mm) / (G - 1);
  const byEdgeMax = (width_mm - 2 * limits.edgeMax_mm) / (G - 1);
  const lo = Math.max(limits.gaugeMin_mm, byEdgeMax);
  if (byEdgeMin < limits.gaugeMax_mm) return stepRange(lo, byEdgeMin, space.step_mm); // the edge minimum is a rule
  return rangeTo(lo, limits.gaugeMax_mm, limits.tops.gauge, space.step_mm).filter((g) => g <= byEdgeMin + 1e-9);
}

/**
 * Gauges of a tapered family on the narrowest plate: from the code minimum to the code maximum (its
 * top kind decides the rounding), leaving the minimum edge distance beside the widest line's two bolts.
 */
export function taperedGauges(f: Family, width_mm: number, space: SearchSpace): number[] {
  return taperedGaugesFor(f.limits, width_mm, space);
}

/** Tapered gauges from the code's limits (see taperedGauges). */
export function taperedGaugesFor(limits: SearchLimits, width_mm: number, space: SearchSpace): number[] {
  if (space.fixedGauge_mm !== undefined) return [space.fixedGauge_mm];
  const byEdgeMin = width_mm - 2 * limits.edgeMin_mm;
  return rangeTo(limits.gaugeMin_mm, limits.gaugeMax_mm, limits.tops.gauge, space.step_mm).filter((g) => g <= byEdgeMin + 1e-9);
}

/** A family's dimension ranges from the code's limits: pitches, end distances, end distances at the butt. */
export function dimensionRanges(limits: SearchLimits, space: SearchSpace, butt: boolean): { pitches: number[]; ends: number[]; endsAtButt: Array<number | undefined> } {
  const userMax = space.maxEndDistance_mm ?? Infinity;
  return {
    pitches: rangeTo(limits.pitchMin_mm, limits.pitchMax_mm, limits.tops.pitch, space.step_mm),
    ends: rangeTo(limits.endMin_mm, limits.endMax_mm, limits.tops.end, space.step_mm).filter((e) => e <= userMax + 1e-9),
    endsAtButt: butt ? rangeTo(limits.endMin_mm, Math.max(limits.endAtButtMax_mm, 0), limits.tops.endAtButt, space.step_mm).filter((e) => e <= userMax + 1e-9) : [undefined],
  };
}

/** Resolve the declared space of a scenario. */
export function resolveSpace(scenario: Scenario, code: DesignCode, costs: CostTable): SearchSpace {
  const s = scenario.search ?? {};
  const assembly = scenario.bolts?.assembly ?? "bearing";
  const allowed = code.classesFor(assembly) as readonly string[];
  const priced = (d: number, c: PropertyClass) => boltPrice(costs, d, c) !== undefined;
  // Default sizes: the priced sizes of the scenario's own unit system (inch bolts for `units: us`).
  const catalogueSizes = [...new Set(Object.keys(costs.boltAssembly).map(sizeOfKey).filter((d): d is number => d !== undefined))]
    .filter((d) => (inchBoltSize(d) !== undefined) === (scenario.units === "us") && code.boltSizes_mm.some((c) => Math.abs(c - d) < 1e-6))
    .sort((a, b) => a - b);
  const sizes = s.sizes_mm ?? catalogueSizes;
  const classes = (s.classes ?? (["4.6", "5.6", "8.8", "10.9"] as PropertyClass[])).filter((c) => allowed.includes(c));
  const space: SearchSpace = {
    sizes_mm: sizes.filter((d) => classes.some((c) => priced(d, c))),
    classes,
    assembly,
    patterns: s.patterns ?? [...SEARCH_PATTERNS],
    step_mm: s.step_mm ?? (scenario.units === "us" ? SEARCH_DEFAULTS.stepUs_mm : SEARCH_DEFAULTS.step_mm),
    maxAlong: s.maxAlong ?? SEARCH_DEFAULTS.maxAlong,
    minBolts: s.minBolts ?? SEARCH_DEFAULTS.minBolts,
    coverThicknesses_mm: scenario.splice.type === "lap" ? [] : s.coverThicknesses_mm ?? [scenario.plates.covers[0]!.thickness_mm],
  };
  if (s.maxAcross !== undefined) space.maxAcross = s.maxAcross;
  if (s.minAcross !== undefined) space.minAcross = s.minAcross;
  if (s.maxSpliceLength_mm !== undefined) space.maxSpliceLength_mm = s.maxSpliceLength_mm;
  if (s.maxEndDistance_mm !== undefined) space.maxEndDistance_mm = s.maxEndDistance_mm;
  if (s.fixedGauge_mm !== undefined) space.fixedGauge_mm = s.fixedGauge_mm;
  return space;
}

/** The bolt of a family: the searched size and class with the scenario's assembly, threads and holes. */
export function boltSpecFor(scenario: Scenario, d: number, c: PropertyClass, assembly: BoltAssembly): BoltSpec {
  const given = scenario.bolts;
  const spec: BoltSpec = {
    size_mm: d,
    propertyClass: c,
    assembly,
    threadsInShearPlanes: given?.threadsInShearPlanes ?? true,
    hole: given?.hole ?? "standard",
  };
  if (given?.slotDirection) spec.slotDirection = given.slotDirection;
  if (assembly === "bearing" && given?.assembly === "bearing" && given.preloaded) spec.preloaded = true;
  if (assembly === "friction-grip") {
    if (given?.slipFactor !== undefined) spec.slipFactor = given.slipFactor;
    spec.slipAt = given?.slipAt ?? "service";
  }
  return spec;
}

/** The scenario with every cover plate at thickness t (butt splices), or as it is. */
export function withCover(scenario: Scenario, t: number | undefined): Scenario {
  if (t === undefined) return scenario;
  const covers: PlateSpec[] = scenario.plates.covers.map((c) => ({ ...c, thickness_mm: t }));
  return { ...scenario, plates: { ...scenario.plates, covers } };
}

/** Counts per line of a staggered pattern: a, a − 1, a, … */
export function staggeredCounts(across: number, lines: number): number[] {
  const counts = new Array<number>(lines);
  for (let i = 0; i < lines; i++) counts[i] = i % 2 === 0 ? across : across - 1;
  return counts;
}

/** Every family of the declared space, in a fixed order. */
export function families(scenario: Scenario, code: DesignCode, costs: CostTable, space: SearchSpace): Family[] {
  const out: Family[] = [];
  const width = narrowestWidth(scenario);
  const butt = scenario.splice.type !== "lap";
  const covers: Array<number | undefined> = butt ? space.coverThicknesses_mm : [undefined];
  for (const d of space.sizes_mm) {
    for (const c of space.classes) {
      if (boltPrice(costs, d, c) === undefined) continue;
      for (const coverT of covers) {
        const base = { ...withCover(scenario, coverT), bolts: boltSpecFor(scenario, d, c, space.assembly) };
        for (const pattern of space.patterns) {
          const limits = code.searchLimits(base, d, pattern);
          const { pitches, ends, endsAtButt } = dimensionRanges(limits, space, butt);
          const maxAcrossByWidth = Math.floor((width - 2 * limits.edgeMin_mm) / limits.gaugeMin_mm + 1e-9) + 1;
          const maxAcross = Math.min(space.maxAcross ?? Infinity, maxAcrossByWidth);
          const minAcross = minAcrossOf(space, maxAcrossByWidth);
          // Gauges depend on the number of gauge lines only: one list per G, shared (read only).
          const gaugesByLines: number[][] = [];
          const push = (counts: number[] | null, lines: number, across: number, G: number) => {
            if (counts && counts.reduce((a, b) => a + b, 0) < space.minBolts) return;
            const gauges = pattern === "tapered" ? [] : (gaugesByLines[G] ??= gaugesFor(G, width, limits, space));
            if ((pattern !== "tapered" && gauges.length === 0) || endsAtButt.length === 0) return;
            out.push({
              index: out.length,
              size_mm: d,
              propertyClass: c,
              pattern,
              countsPerLine: counts,
              lines,
              across,
              minAcross,
              coverThickness_mm: coverT,
              limits,
              pitches_mm: lines > 1 ? pitches : [0],
              ends_mm: ends,
              endsAtButt_mm: endsAtButt,
              gauges_mm: gauges,
              base,
            });
          };
          for (let m = 1; m <= space.maxAlong; m++) {
            if (pattern === "grid") {
              for (let a = minAcross; a <= maxAcross; a++) push(Array(m).fill(a), m, a, a);
            } else if (pattern === "staggered") {
              if (m < 2) continue;
              for (let a = Math.max(2, minAcross); a <= maxAcross; a++) push(staggeredCounts(a, m), m, a, 2 * a - 1);
            } else if (m >= 2 && maxAcross >= Math.max(2, minAcross)) {
              push(null, m, 0, 0);
            }
          }
        }
      }
    }
  }
  return out;
}

/**
 * Fewest bolts across for a family whose pattern fits `byWidth` across the narrowest plate: the declared
 * search.min_across, else 2 where two fit and 1 where they do not (SEARCH_DEFAULTS.minAcross).
 */
export function minAcrossOf(space: SearchSpace, byWidth: number): number {
  return space.minAcross ?? Math.min(SEARCH_DEFAULTS.minAcross, Math.max(1, byWidth));
}

/** The layout spec of a family at given dimensions. */
export function layoutOf(f: Family, pitch: number, gauge: number, end: number, endAtButt: number | undefined, counts?: number[]): LayoutSpec {
  const eb = endAtButt ?? end;
  if (f.pattern === "grid") return { kind: "grid", across: f.across, along: f.lines, pitch_mm: pitch, gauge_mm: gauge, endDistance_mm: end, endDistanceAtButt_mm: eb };
  if (f.pattern === "staggered") return { kind: "staggered", across: f.across, along: f.lines, pitch_mm: pitch, gauge_mm: gauge, endDistance_mm: end, endDistanceAtButt_mm: eb };
  return { kind: "tapered", acrossPerLine: counts ?? [], pitch_mm: pitch, gauge_mm: gauge, endDistance_mm: end, endDistanceAtButt_mm: eb };
}

export function scenarioOf(f: Family, layout: LayoutSpec): CheckableScenario {
  return { ...f.base, layout };
}

/** The declared bolt strengths in the code's words: ISO property classes, or ASTM grades under AISC 360-16. */
function classesText(space: SearchSpace, scenario: Scenario): string {
  const assembly = boltWordsOf(scenario.code).assembly(space.assembly);
  if (scenario.code !== "aisc360-16") return `property classes: ${space.classes.join(", ")} (${assembly})`;
  const metric = space.sizes_mm.every((d) => inchBoltSize(d) === undefined);
  const grades = space.classes.map((c) => boltGradeUnder(scenario.code, c, metric ? space.sizes_mm[0]! : INCH_BOLT_SIZES_IN[0] * 25.4));
  return `bolt grades (ASTM F3125 / A307): ${grades.join(", ")} (${assembly})`;
}

export function describeSpace(space: SearchSpace, fams: Family[], scenario: Scenario): string[] {
  const units = scenario.units === "us" ? "us" : "si";
  const len = (mm: number) => lengthText(mm, units);
  const num = (mm: number) => lengthNumber(mm, units);
  const lines = [
    `bolt sizes: ${space.sizes_mm.map(boltSizeText).join(", ")}`,
    classesText(space, scenario),
    `patterns: ${space.patterns.join(", ")}${space.patterns.includes("tapered") ? " (tapered: each transverse line its own count, symmetric about the plate axis, all counts odd or all even and never rising away from the butt — lap: from plate B's end)" : ""}`,
    `bolts across: ${space.minAcross !== undefined ? `at least ${space.minAcross} (search.min_across)` : "at least 2 where the narrowest plate fits two at the minimum gauge and edge distance, else 1 (search.min_across, default: common practice)"} on the fullest transverse line (tapered: the line at the butt), up to what the narrowest plate fits${space.maxAcross !== undefined ? `, at most ${space.maxAcross}` : ""}`,
    `transverse lines along the force: 1 … ${space.maxAlong}${scenario.splice.type !== "lap" ? " per side of the butt" : ""}`,
    `at least ${space.minBolts} bolts${scenario.splice.type !== "lap" ? " each side of the butt" : ""} (common practice)`,
    `dimensions on a ${len(space.step_mm)} step; edge distances equal both sides (the group on the plate axis), so the edge distance follows from the gauge`,
    space.fixedGauge_mm !== undefined ? `gauge fixed at ${len(space.fixedGauge_mm)}` : "gauge: every step value whose edge distance lies within the code's limits",
  ];
  if (scenario.splice.type !== "lap") lines.push(`cover plate thickness: ${space.coverThicknesses_mm.map(num).join(", ")} ${units === "us" ? "in" : "mm"}`);
  if (space.maxSpliceLength_mm !== undefined) lines.push(`splice length at most ${len(space.maxSpliceLength_mm)}`);
  if (space.maxEndDistance_mm !== undefined) lines.push(`end distances at most ${len(space.maxEndDistance_mm)} (search.max_end_distance: a declared narrowing)`);
  // Ranges per pattern and size, from the code's limits (one line per pattern).
  const byPattern = new Map<string, { statement: string; ranges: string[]; seen: Set<number> }>();
  for (const f of fams) {
    let entry = byPattern.get(f.pattern);
    if (!entry) {
      entry = { statement: f.limits.statement, ranges: [], seen: new Set() };
      byPattern.set(f.pattern, entry);
    }
    if (entry.seen.has(f.size_mm)) continue;
    entry.seen.add(f.size_mm);
    const span = (v: Array<number | undefined>) => (v.length && v[0] !== undefined ? `${num(v[0])}–${num(v[v.length - 1]!)}` : "—");
    const pitches = rangeTo(f.limits.pitchMin_mm, f.limits.pitchMax_mm, f.limits.tops.pitch, space.step_mm);
    entry.ranges.push(`${boltSizeText(f.size_mm)}: pitch ${span(pitches)}, end ${span(f.ends_mm)}${scenario.splice.type !== "lap" ? `, at butt ${span(f.endsAtButt_mm)}` : ""}`);
  }
  for (const [pattern, entry] of byPattern) {
    lines.push(`${pattern}: ${entry.statement}`);
    lines.push(`${pattern} ranges (${units === "us" ? "in" : "mm"}): ${entry.ranges.join("; ")}`);
  }
  return lines;
}
