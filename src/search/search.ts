/**
 * Layout search: the best layouts over the declared space, proven by best-first enumeration.
 *
 * Every node of the search carries a lower bound of the ranking key of everything below it; nodes
 * are taken from a heap in key order, so a layout is reported only when nothing not yet examined can
 * rank above it. Candidates are skipped only by admissible bounds (DEVELOPERS.md, "Search"); every
 * layout reported has passed the full checker (engine/check.ts) on its hole coordinates.
 */
import type { CostBreakdown, CostTable } from "../catalogue/costs.js";
import { boltPrice, spliceCost } from "../catalogue/costs.js";
import { boltSizeText } from "../catalogue/bolts.js";
import type { DesignCode, LayoutShape } from "../codes/types.js";
import { checkScenario } from "../engine/check.js";
import { buildJoint } from "../geometry/joint-builder.js";
import type { Joint } from "../model/joint.js";
import type { CheckKind, CheckReport } from "../model/results.js";
import type { CheckableScenario, LayoutSpec, Scenario } from "../model/scenario.js";
import { MinHeap } from "./heap.js";
import { arrangementText, compareKeys, fixedOrderText, lowerKey, rankKey, type Key, type RankBy } from "./ranking.js";
import { describeSpace, families, layoutOf, resolveSpace, scenarioOf, taperedGauges, type Family, type SearchSpace } from "./space.js";
import { anyOpenVector, nextTaperedCounts, type TaperedAnswer, type TaperedProblem } from "./tapered-ip.js";
import { assertWithinLimit, DEFAULT_MAX_CANDIDATES } from "./work-estimate.js";
import { loadBound, type SenseBound } from "../codes/sense-bound.js";
import { referenceLoad_N } from "../model/load.js";
import { citationText } from "../report/citation.js";

export interface Candidate {
  family: Family;
  layout: LayoutSpec;
  scenario: CheckableScenario;
  joint: Joint;
  report: CheckReport;
  cost: CostBreakdown;
  counts: number[];
  key: Key;
  /** How a tapered count vector was chosen. */
  chosenBy?: "ip" | "enumeration";
}

export interface SearchStats {
  families: number;
  familiesSkippedByBound: number;
  nodes: number;
  candidatesSkippedByBound: number;
  fullChecks: number;
  integerProgrammes: number;
  enumerationFallbacks: number;
  /** Candidate layouts of the declared space, counted before the search (work-estimate.ts). */
  declaredCandidates: number;
  elapsed_ms?: number;
}

export interface SearchOutcome {
  space: SearchSpace;
  spaceText: string[];
  results: Candidate[];
  stats: SearchStats;
  /** Why nothing complies, when results is empty. */
  noResultReason?: string;
  /**
   * Where the code's minimum design action lies above the load, the condition that sets the strength
   * every layout must reach, in words with its figure (IS 800:2007 cl. 10.7).
   */
  minimumDesignAction?: string;
}

export interface SearchOptions {
  top: number;
  rankBy: RankBy;
  /** Most candidate layouts the declared space may hold (default DEFAULT_MAX_CANDIDATES; work-estimate.ts). */
  maxCandidates?: number;
  /** Called now and then while the search runs (every PROGRESS_EVERY nodes), for a progress line. */
  onProgress?: (stats: SearchStats, results: number) => void;
  /**
   * false (the default): the best layout of each distinct arrangement (size, class, pattern, counts);
   * true: every variant (pitch, end distances, cover thickness), the best gauge of each.
   */
  variants?: boolean;
}

/** Nodes between two progress calls. */
export const PROGRESS_EVERY = 256;

/**
 * Checks whose result cannot change with the gauge, per pattern (proof in DEVELOPERS.md, "Search").
 * Used two ways over a sweep of gauges: a failure of one of them fails every gauge; a passing layout
 * governed by one of them cannot be beaten on efficiency by another gauge.
 */
const GAUGE_FREE: Record<"grid" | "staggered" | "tapered", ReadonlySet<CheckKind>> = {
  grid: new Set<CheckKind>(["bolt-shear", "bolt-bearing", "slip", "gross-yield", "grip-length", "min-end-distance", "max-pitch", "max-edge-line-pitch", "net-section", "group-centroid"]),
  staggered: new Set<CheckKind>(["bolt-shear", "bolt-bearing", "slip", "gross-yield", "grip-length", "min-end-distance", "max-pitch", "max-edge-line-pitch", "group-centroid"]),
  tapered: new Set<CheckKind>(["bolt-shear", "slip", "gross-yield", "grip-length", "min-end-distance", "max-pitch", "max-edge-line-pitch", "group-centroid"]),
};

/**
 * Sweep gauges in ascending order (the fixed tie order) through the full checker, pushing each passing
 * layout. Stops at a failure no gauge can mend, or at a pass whose governing check no gauge can raise.
 */
function sweepGauges(ctx: SearchContext, f: Family, gauges: readonly number[], layoutAt: (g: number) => LayoutSpec, counts: number[], rankBy: RankBy, stats: SearchStats, found: (c: Candidate) => void, rejected: (r: CheckReport) => void): void {
  const gaugeFree = GAUGE_FREE[f.pattern];
  for (const g of gauges) {
    const { candidate, report } = evaluate(ctx, f, layoutAt(g), counts, rankBy, stats);
    if (candidate) {
      found(candidate);
      const governing = report.checks.find((c) => c.id === report.governing);
      if (governing && gaugeFree.has(governing.kind)) return;
    } else {
      rejected(report);
      if (report.checks.some((c) => !c.pass && gaugeFree.has(c.kind))) return;
    }
  }
}

/** Cost and splice length are linear in pitch and end distances within a family: fitted from joints. */
interface LinearModel {
  /** Exact added cost of one more bolt in each group (tapered families). */
  cb: number;
  c0: number;
  cp: number;
  ce: number;
  ceb: number;
  l0: number;
  lp: number;
  le: number;
  leb: number;
}

/**
 * A node of the search. Every kind has the same fields, made in the same order by `nodeOf`: one object
 * shape, so the heap and the loop read nodes at one place each (fields a kind does not use are 0 or null).
 */
interface NodeFields {
  kind: "family" | "dims" | "tapered" | "result";
  key: Key;
  f: Family;
  ip: number;
  ie: number;
  ieb: number;
  gauges: number[] | null;
  stream: TaperedStream | null;
  index: number;
  c: Candidate | null;
}

type Node = NodeFields & ({ kind: "family" } | { kind: "dims" } | { kind: "tapered"; gauges: number[]; stream: TaperedStream } | { kind: "result"; c: Candidate });

function nodeOf(kind: Node["kind"], key: Key, f: Family, ip: number, ie: number, ieb: number, gauges: number[] | null, stream: TaperedStream | null, index: number, c: Candidate | null): Node {
  return { kind, key, f, ip, ie, ieb, gauges, stream, index, c } as Node;
}

export interface SearchContext {
  scenario: Scenario;
  code: DesignCode;
  costs: CostTable;
}

function narrowest(s: Scenario): number {
  return Math.min(s.plates.mainA.width_mm, s.plates.mainB.width_mm, ...s.plates.covers.map((c) => c.width_mm));
}

/** Evaluate one layout through the full checker; null when it fails. */
export function evaluate(ctx: SearchContext, f: Family, layout: LayoutSpec, counts: number[], rankBy: RankBy, stats: SearchStats): { candidate: Candidate | null; report: CheckReport } {
  const scenario = scenarioOf(f, layout);
  stats.fullChecks++;
  const { joint, report } = checkScenario(scenario, ctx.code);
  if (!report.pass) return { candidate: null, report };
  const cost = spliceCost(joint, ctx.costs, f.propertyClass, f.base.bolts.assembly);
  const pitch = layout.kind === "holes" ? 0 : layout.pitch_mm;
  const gauge = layout.kind === "holes" ? 0 : layout.gauge_mm;
  const end = layout.endDistance_mm;
  const endAtButt = layout.kind === "holes" || ctx.scenario.splice.type === "lap" ? undefined : layout.endDistanceAtButt_mm;
  const text = () => fixedOrderText({ size_mm: f.size_mm, propertyClass: f.propertyClass, pattern: f.pattern, counts, pitch_mm: pitch, gauge_mm: gauge, end_mm: end, endAtButt_mm: endAtButt, coverThickness_mm: f.coverThickness_mm });
  const key = rankKey(rankBy, { cost: cost.total, bolts: joint.holes.length, efficiency: report.efficiency, length_mm: joint.spliceLength_mm }, text);
  return { candidate: { family: f, layout, scenario, joint, report, cost, counts, key }, report };
}

/** The identity of a layout apart from its gauge: results keep the best gauge of each. */
export function identityOf(c: Candidate): string {
  const parts = c.key.text.split("|");
  parts.splice(5, 1); // drop the gauge field of the fixed order
  return parts.join("|");
}

/** The arrangement of a layout (size, class, pattern, counts): by default results keep the best of each. */
export function arrangementOf(c: Candidate): string {
  return arrangementText(c.family.size_mm, c.family.propertyClass, c.family.pattern, c.counts);
}

function fitLinear(ctx: SearchContext, f: Family, counts: number[]): LinearModel | null {
  const p0 = f.pitches_mm[0] ?? 0;
  const e0 = f.ends_mm[0];
  if (e0 === undefined) return null;
  const eb0 = f.endsAtButt_mm[0];
  const g = f.gauges_mm[0] ?? 0;
  const measure = (p: number, e: number, eb: number | undefined, c: number[]) => {
    const joint = buildJoint(scenarioOf(f, layoutOf(f, p, g, e, eb, c)), ctx.code); // geometry only: the joint the checker builds
    return { cost: spliceCost(joint, ctx.costs, f.propertyClass, f.base.bolts.assembly).total, length: joint.spliceLength_mm };
  };
  const atCounts = (c: number[]) => measure(p0, e0, eb0, c);
  const at = (p: number, e: number, eb: number | undefined) => measure(p, e, eb, counts);
  const base = at(p0, e0, eb0);
  const dp = at(p0 + 1, e0, eb0);
  const de = at(p0, e0 + 1, eb0);
  const deb = eb0 === undefined ? base : at(p0, e0, eb0 + 1);
  const oneMore = f.countsPerLine ? base : atCounts([counts[0]! + 1, ...counts.slice(1)]);
  return {
    cb: oneMore.cost - base.cost,
    c0: base.cost - (dp.cost - base.cost) * p0 - (de.cost - base.cost) * e0 - (deb.cost - base.cost) * (eb0 ?? 0),
    cp: dp.cost - base.cost,
    ce: de.cost - base.cost,
    ceb: deb.cost - base.cost,
    l0: base.length - (dp.length - base.length) * p0 - (de.length - base.length) * e0 - (deb.length - base.length) * (eb0 ?? 0),
    lp: dp.length - base.length,
    le: de.length - base.length,
    leb: deb.length - base.length,
  };
}

/** Best `top` layouts over the declared space, ranked by `rankBy`, proven by best-first search. */
export function searchLayouts(ctx: SearchContext, options: SearchOptions): SearchOutcome {
  const { scenario, code } = ctx;
  const space = resolveSpace(scenario, code, ctx.costs);
  // The work is estimated from the declared space and bounded before anything is built.
  const declaredCandidates = assertWithinLimit(scenario, code, ctx.costs, options.maxCandidates ?? DEFAULT_MAX_CANDIDATES);
  const fams = families(scenario, code, ctx.costs, space);
  // The reference load: every bound and joint strength is in its terms (model/load.ts).
  const T = referenceLoad_N(scenario.load);
  const stats: SearchStats = { families: fams.length, familiesSkippedByBound: 0, nodes: 0, candidatesSkippedByBound: 0, fullChecks: 0, integerProgrammes: 0, enumerationFallbacks: 0, declaredCandidates };
  const heap = new MinHeap<Node>((a, b) => compareKeys(a.key, b.key) < 0);
  const models = new Map<Family, LinearModel | null>();
  const streams = new Map<Family, TaperedStream>();
  /**
   * The programme's constraints do not depend on pitch or end distances, so one stream of count vectors
   * per family serves every dimension of it.
   */
  const streamFor = (f: Family, kcap: number): TaperedStream => {
    let stream = streams.get(f);
    if (!stream) {
      stream = new TaperedStream(f, taperedProblem(ctx, f, kcap, transferred), taperedNmin(f), stats);
      streams.set(f, stream);
    }
    return stream;
  };
  const boundReasons = new Map<string, number>();
  /**
   * The code's minimum design action for family f: a condition on the joint's design strength in
   * tension (IS 800 cl. 10.7), 0 where the code sets none or the load has no tension sense. Its figure
   * is the demand of the condition the checker itself lists (code.minimumDesignAction, whose demand
   * does not depend on the joint strength it is given), once per family scenario.
   */
  const minimumByBase = new Map<Family["base"], { minimum_N: number; words: string }>();
  const minimumOf = (f: Family): { minimum_N: number; words: string } => {
    let known = minimumByBase.get(f.base);
    if (known === undefined) {
      const minimum = scenario.load.factoredTension_N > 0 && code.minimumDesignAction ? code.minimumDesignAction(f.base as CheckableScenario, 0) : null;
      known = minimum
        ? { minimum_N: minimum.demand_N, words: `${minimum.title.replace(/ \(tension\)$/, "").toLowerCase()} (${citationText(minimum.citation)}: ${(minimum.demand_N / 1000).toFixed(1)} kN)` }
        : { minimum_N: 0, words: "" };
      minimumByBase.set(f.base, known);
    }
    return known;
  };
  const tensionOnly = scenario.load.factoredTension_N > 0 && !((scenario.load.factoredCompression_N ?? 0) > 0);
  /**
   * Whether no layout under a bound can pass: the bound is below the load T, or its tension sense's
   * bound is below the minimum design action (a layout's strength in tension is at most that bound).
   */
  const belowRequired = (f: Family, bound: SenseBound): boolean =>
    bound.jointStrength_N < T * (1 - 1e-9) || (bound.tension_N !== null && bound.tension_N < minimumOf(f).minimum_N * (1 - 1e-9));
  /**
   * The least joint strength any layout of f must reach, for the bounds that are the lesser of the
   * senses' (plates, per bolt): T, or under tension alone the minimum design action where higher.
   */
  const requiredOf = (f: Family): number => (tensionOnly ? Math.max(T, minimumOf(f).minimum_N) : T);
  /** The bound's reason for a family it rules out: its governing check, or the minimum design action. */
  const reasonOf = (f: Family, strengthUpper_N: number, tension_N: number | null, check: string): string =>
    strengthUpper_N >= T * (1 - 1e-9) && (tension_N ?? Infinity) < minimumOf(f).minimum_N * (1 - 1e-9) ? minimumOf(f).words : check;
  const rankBy = options.rankBy;
  const width = narrowest(scenario);
  const transferred = scenario.options.netSectionLoad === "transferred";

  // The lesser of yield and rupture bounds every joint strength; efficiency divides by the chosen basis,
  // never below it (on every basis the denominator is at least the lesser for the same plate).
  const unperforated = Math.min(
    code.unperforatedStrength(scenario.plates.mainA).value_N,
    code.unperforatedStrength(scenario.plates.mainB).value_N,
  );
  const basis = scenario.options.efficiencyBasis;
  const denominator = Math.min(
    code.unperforatedStrength(scenario.plates.mainA, basis).value_N,
    code.unperforatedStrength(scenario.plates.mainB, basis).value_N,
  );

  // No layout can carry more than the unperforated main plate (every joint strength is at most its gross
  // yield and its net rupture, each at most the unperforated strength): say so at once.
  if (scenario.load.factoredTension_N > unperforated * (1 + 1e-9)) {
    const outcome = outcomeOf(space, fams, scenario, [], stats);
    outcome.noResultReason = explainNothing(ctx, unperforated, new Map(), null, space);
    return outcome;
  }

  const shapeOf = (f: Family, counts: number[], p?: number, e?: number, eb?: number): LayoutShape => {
    const shape: LayoutShape = { pattern: f.pattern, countsPerLine: counts };
    if (p !== undefined && f.lines > 1) shape.pitch_mm = p;
    const eMax = f.ends_mm[f.ends_mm.length - 1];
    const ebMax = f.endsAtButt_mm[f.endsAtButt_mm.length - 1];
    const end = e ?? eMax;
    const endB = eb ?? ebMax ?? end;
    if (end !== undefined) shape.endDistance_mm = end;
    if (endB !== undefined) shape.endDistanceAtButt_mm = endB;
    return shape;
  };

  const model = (f: Family, counts: number[]) => {
    if (!models.has(f)) models.set(f, fitLinear(ctx, f, counts));
    return models.get(f)!;
  };
  const costAt = (m: LinearModel, p: number, e: number, eb: number | undefined) => m.c0 + m.cp * p + m.ce * e + m.ceb * (eb ?? 0);
  const lengthAt = (m: LinearModel, p: number, e: number, eb: number | undefined) => m.l0 + m.lp * p + m.le * e + m.leb * (eb ?? 0);

  /**
   * Tapered families: the plate checks bound the strength whatever the counts — the fully loaded line
   * carries at least 1 hole (transferred) or the widest line at least 2 (full load: two distinct counts).
   */
  const taperedPlateBound = (f: Family): number => {
    const counts = Array(f.lines).fill(1);
    if (!transferred) counts[0] = 2;
    return loadBound(code, f.base as CheckableScenario, shapeOf(f, counts)).plates_N;
  };

  /** Tapered lower bound on the bolt count from the per-bolt capacity (dimensions most favourable). */
  const familyNmin = new Map<Family, number>();
  const taperedNmin = (f: Family, p?: number, e?: number, eb?: number): number => {
    const known = p === undefined ? familyNmin.get(f) : undefined;
    if (known !== undefined) return known;
    const b = loadBound(code, f.base as CheckableScenario, shapeOf(f, Array(f.lines).fill(1), p, e, eb));
    const N = Math.max(f.lines, space.minBolts, Math.ceil(requiredOf(f) / b.perBolt_N - 1e-9));
    if (p === undefined) familyNmin.set(f, N);
    return N;
  };

  /** perBoltCost by family scenario (one per bolt and cover thickness): the price looked up once. */
  const perBoltCosts = new Map<Family["base"], number>();
  const perBoltCostOf = (f: Family): number => {
    let cost = perBoltCosts.get(f.base);
    if (cost === undefined) perBoltCosts.set(f.base, (cost = perBoltCost(ctx, f)));
    return cost;
  };

  // Seed: one node per family, keyed by a lower bound of its members; families a bound rules out are skipped.
  for (const f of fams) {
    if (f.ends_mm.length === 0 || f.pitches_mm.length === 0) continue;
    const counts = f.countsPerLine ?? Array(f.lines).fill(1);
    const bound = f.countsPerLine ? loadBound(code, f.base as CheckableScenario, shapeOf(f, counts)) : null;
    // Tapered families: the plates' bound, whatever the counts (worked out once per family).
    const strengthUpper_N = bound ? bound.jointStrength_N : taperedPlateBound(f);
    const infeasible = (bound ? belowRequired(f, bound) : strengthUpper_N < requiredOf(f) * (1 - 1e-9)) || (bound !== null && !bound.serviceOk);
    if (infeasible) {
      stats.familiesSkippedByBound++;
      const tension_N = bound ? bound.tension_N : tensionOnly ? strengthUpper_N : null;
      const check = reasonOf(f, strengthUpper_N, tension_N, bound ? bound.check : "plate (gross yield or net section)");
      boundReasons.set(check, (boundReasons.get(check) ?? 0) + 1);
      continue;
    }
    // Seed key: the family's bolts and holes (plate mass left out: a lower bound of every member).
    const N = f.countsPerLine ? counts.reduce((a, b) => a + b, 0) : taperedNmin(f);
    // The joint strength is at most the thinner plate's gross yield and its net rupture, each at most the
    // unperforated strength (the lesser); grid and staggered families have a tighter bound. Efficiency
    // divides it by the basis's strength of the thinner plate, never below `denominator`.
    // In compression alone the joint strength can pass the unperforated tension strength (no net section).
    const cap = scenario.load.factoredTension_N > 0 ? unperforated : Infinity;
    const efficiencyUpper = Math.min(cap, strengthUpper_N) / denominator;
    heap.push(nodeOf("family", lowerKey(rankBy, { cost: totalBolts(f, N) * perBoltCostOf(f) / sidesOf(f), bolts: totalBolts(f, N), efficiencyUpper, length_mm: 0 }), f, 0, 0, 0, null, null, 0, null));
  }

  const results: Candidate[] = [];
  const seen = new Set<string>();
  const maxLength = space.maxSpliceLength_mm ?? Infinity;

  const pushDims = (f: Family, ip: number, ie: number, ieb: number, efficiencyUpper: number) => {
    const p = f.pitches_mm[ip];
    const e = f.ends_mm[ie];
    const eb = f.endsAtButt_mm[ieb];
    if (p === undefined || e === undefined || (ieb > 0 && eb === undefined)) return;
    const counts = f.countsPerLine ?? Array(f.lines).fill(1);
    const m = model(f, counts)!;
    const length = lengthAt(m, p, e, eb);
    if (length > maxLength + 1e-9) return; // longer in every successor too
    const N = f.countsPerLine ? counts.reduce((a, b) => a + b, 0) : taperedOpenN(f);
    if (N === null) return; // a tapered family with nothing left to report
    heap.push(nodeOf("dims", dimsKey(f, m, p, e, eb, N, efficiencyUpper, length), f, ip, ie, ieb, null, null, 0, null));
  };
  const dimsKey = (f: Family, m: LinearModel, p: number, e: number, eb: number | undefined, N: number, efficiencyUpper: number, length: number) =>
    lowerKey(rankBy, { cost: costAt(m, p, e, eb) + (f.countsPerLine ? 0 : (N - f.lines) * m.cb), bolts: totalBolts(f, N), efficiencyUpper, length_mm: length });

  /**
   * Tapered families: a lower bound on the bolts of any layout still to be reported — the family's
   * least count, raised (distinct arrangements) to the first count vector of its stream not yet
   * reported; null when none is left. The reported set only grows, so the bound stays valid.
   */
  const taperedOpenN = (f: Family): number | null => {
    const least = taperedNmin(f);
    const stream = streams.get(f);
    if (variants || !stream) return least;
    const open = stream.openLowerN((i) => seen.has(stream.arrangementAt(i)));
    if (open === null) finished.add(f);
    return open === null ? null : Math.max(least, open);
  };

  /** Whether the bound of a shape (dimensions left out at their most favourable) is below the load or a service check fails. */
  const boundFails = (f: Family, counts: number[], p: number | undefined, e: number | undefined, eb: number | undefined): boolean => {
    const bound = loadBound(code, f.base as CheckableScenario, shapeOf(f, counts, p, e, eb));
    return belowRequired(f, bound) || !bound.serviceOk;
  };
  /**
   * Grid and staggered families, at a node (0, ie, ieb) of the lattice: which sub-lattice below it no
   * layout of can pass (DEVELOPERS.md, "Sub-lattice bounds"). "end at butt": every layout at this end
   * distance at the butt (the bound with the pitch unknown and the largest end distance fails; only
   * ie = 0 roots them all); "pitch chain": every pitch at these end distances (the bound with the pitch
   * unknown fails); "none": neither.
   */
  const subLatticeFails = (f: Family, counts: number[], ie: number, ieb: number): "end at butt" | "pitch chain" | "none" => {
    const eb = f.endsAtButt_mm[ieb];
    // At the last end distance at the butt the first test is the family's own seed bound: it passed.
    if (ie === 0 && ieb < f.endsAtButt_mm.length - 1 && boundFails(f, counts, undefined, undefined, eb)) return "end at butt";
    return f.lines > 1 && boundFails(f, counts, undefined, f.ends_mm[ie], eb) ? "pitch chain" : "none";
  };

  /**
   * Staggered butt splices: whether the holes of transverse line 1 of the two groups lie farther apart
   * on the covers' gauge line, gap + 2·(e_butt + p), than the code's pitch limit for them
   * (`SearchLimits.staggeredButtSpanMax_mm`; proof in DEVELOPERS.md, "The stagger span across the butt").
   * The margin of 1e-6 mm lies far above the checker's tolerances and the coordinates' rounding.
   */
  const staggerSpanFails = (f: Family, p: number, eb: number | undefined): boolean =>
    f.pattern === "staggered" && eb !== undefined && scenario.splice.buttGap_mm + 2 * (eb + p) > f.limits.staggeredButtSpanMax_mm + 1e-6;

  let lastRejection: { check: string; value: string } | null = null;
  const found = (c: Candidate) => heap.push(nodeOf("result", c.key, c.family, 0, 0, 0, null, null, 0, c));
  const rejected = (report: CheckReport) => {
    const first = report.checks.find((c) => !c.pass);
    if (first) {
      lastRejection = {
        check: `${first.title} (${first.component})`,
        value: first.type === "strength" ? `${(first.demand_N / 1000).toFixed(1)} kN > ${(first.resistance_N / 1000).toFixed(1)} kN` : `${first.value_mm.toFixed(1)} mm against a limit of ${first.limit_mm.toFixed(1)} mm`,
      };
    }
  };

  const variants = options.variants ?? false;
  /** Tapered families with no layout left to report (no count vector, or every one reported). */
  const finished = new Set<Family>();
  /** The arrangement of every member of a grid or staggered family, written once per family (by index). */
  const familyArrangements: Array<string | undefined> = [];
  const familyArrangement = (f: Family & { countsPerLine: number[] }): string =>
    (familyArrangements[f.index] ??= arrangementText(f.size_mm, f.propertyClass, f.pattern, f.countsPerLine));
  // Distinct arrangements: a node whose every layout belongs to an arrangement already reported is
  // dropped unexpanded — none of its layouts could be reported. (Tapered families hold many.)
  const familyReported = (f: Family): boolean => !variants && f.countsPerLine !== null && seen.has(familyArrangement(f as Family & { countsPerLine: number[] }));
  while (heap.size > 0 && results.length < options.top) {
    const node = heap.pop()!;
    stats.nodes++;
    if (options.onProgress && stats.nodes % PROGRESS_EVERY === 0) options.onProgress(stats, results.length);
    if (node.kind === "result") {
      const fc = node.c.family;
      const id = variants ? identityOf(node.c) : fc.countsPerLine ? familyArrangement(fc as Family & { countsPerLine: number[] }) : arrangementOf(node.c);
      if (seen.has(id)) continue;
      seen.add(id);
      results.push(node.c);
      continue;
    }
    if (finished.has(node.f) || (node.kind !== "tapered" && familyReported(node.f))) continue;
    if (node.kind === "family") {
      const effUpper = -(node.key.numbers[0] ?? 0);
      if (model(node.f, node.f.countsPerLine ?? Array(node.f.lines).fill(1))) pushDims(node.f, 0, 0, 0, rankBy === "efficiency" ? effUpper : Infinity);
      continue;
    }
    const f = node.f;
    const effUpper = rankBy === "efficiency" ? -(node.key.numbers[0] ?? 0) : Infinity;
    if (node.kind === "dims" && !f.countsPerLine && !variants) {
      // Distinct arrangements: the key may have risen since the node was pushed (more vectors reported).
      const N = taperedOpenN(f);
      if (N === null) continue;
      const p = f.pitches_mm[node.ip]!;
      const e = f.ends_mm[node.ie]!;
      const eb = f.endsAtButt_mm[node.ieb];
      const m = model(f, Array(f.lines).fill(1))!;
      const fresh = dimsKey(f, m, p, e, eb, N, effUpper, lengthAt(m, p, e, eb));
      if (compareKeys(fresh, node.key) > 0) {
        node.key = fresh; // popped, so no longer in the heap: it goes back with its new key
        heap.push(node);
        continue;
      }
    }
    if (node.kind === "dims") {
      const p = f.pitches_mm[node.ip]!;
      const e = f.ends_mm[node.ie]!;
      const eb = f.endsAtButt_mm[node.ieb];
      // Beyond the stagger span across the butt every layout of this node's sub-lattice fails the
      // maximum pitch (its pitch and end distance at the butt are at least this node's): nothing is pushed.
      if (staggerSpanFails(f, p, eb)) {
        stats.candidatesSkippedByBound++;
        continue;
      }
      // Lattice successors: each (pitch, end, end at butt) exactly once, keys never decreasing — less
      // the sub-lattices a bound rules out whole (grid and staggered: subLatticeFails).
      const skipped = f.countsPerLine && node.ip === 0 ? subLatticeFails(f, f.countsPerLine, node.ie, node.ieb) : "none";
      if (skipped === "none") pushDims(f, node.ip + 1, node.ie, node.ieb, effUpper);
      if (node.ip === 0 && skipped !== "end at butt") pushDims(f, 0, node.ie + 1, node.ieb, effUpper);
      if (node.ip === 0 && node.ie === 0) pushDims(f, 0, 0, node.ieb + 1, effUpper);
      if (skipped !== "none") {
        stats.candidatesSkippedByBound++;
        continue;
      }
      if (f.countsPerLine) {
        if (boundFails(f, f.countsPerLine, p, e, eb)) {
          stats.candidatesSkippedByBound++;
          continue;
        }
        sweepGauges(ctx, f, f.gauges_mm, (g) => layoutOf(f, p, g, e, eb), f.countsPerLine, rankBy, stats, found, rejected);
      } else {
        // Tapered: one count-vector generator for these dimensions; each vector is tried at every gauge
        // that fits its widest line.
        const N0dims = taperedNmin(f, p, e, eb);
        const gauges = taperedGauges(f, width, space);
        const gMin = gauges[0];
        if (gMin === undefined) continue;
        const kcap = Math.min(space.maxAcross ?? Infinity, Math.floor((width - 2 * f.limits.edgeMin_mm) / gMin + 1e-9) + 1);
        if (kcap < Math.max(2, f.minAcross)) continue;
        const stream = streamFor(f, kcap);
        // The stream does not depend on the dimensions: a family without a vector (or, for distinct
        // arrangements, whose every vector is already reported) has no layout left to report.
        const open = stream.at(0) === null ? null : taperedOpenN(f);
        if (open === null) {
          finished.add(f);
          continue;
        }
        const N0 = Math.max(N0dims, open);
        const m = model(f, Array(f.lines).fill(1))!;
        const key = lowerKey(rankBy, { cost: costAt(m, p, e, eb) + (N0 - f.lines) * m.cb, bolts: totalBolts(f, N0), efficiencyUpper: effUpper, length_mm: lengthAt(m, p, e, eb) });
        // Vectors before the stream's first open one are all reported.
        heap.push(nodeOf("tapered", key, f, node.ip, node.ie, node.ieb, gauges, stream, variants ? 0 : stream.firstOpen, null));
      }
      continue;
    }
    // Tapered generator: the family's next count vector (bolt totals never fall along the stream).
    const p = f.pitches_mm[node.ip]!;
    const e = f.ends_mm[node.ie]!;
    const eb = f.endsAtButt_mm[node.ieb];
    const answer = node.stream.at(node.index);
    if (!answer) continue;
    const N = answer.counts.reduce((a, b) => a + b, 0);
    const m = model(f, Array(f.lines).fill(1))!;
    const vectorKey = lowerKey(rankBy, { cost: costAt(m, p, e, eb) + (N - f.lines) * m.cb, bolts: totalBolts(f, N), efficiencyUpper: effUpper, length_mm: lengthAt(m, p, e, eb) });
    if (compareKeys(vectorKey, node.key) > 0) {
      node.key = vectorKey; // this vector has more bolts: wait for its turn
      heap.push(node);
      continue;
    }
    heap.push(nodeOf("tapered", vectorKey, f, node.ip, node.ie, node.ieb, node.gauges, node.stream, node.index + 1, null));
    if (!variants && seen.has(node.stream.arrangementAt(node.index))) continue;
    const vectorBound = loadBound(code, f.base as CheckableScenario, shapeOf(f, answer.counts, p, e, eb));
    if (belowRequired(f, vectorBound) || !vectorBound.serviceOk) {
      stats.candidatesSkippedByBound++;
      continue;
    }
    const widest = Math.max(...answer.counts);
    const fitting = node.gauges.filter((g) => width - (widest - 1) * g >= 2 * f.limits.edgeMin_mm - 1e-9);
    sweepGauges(ctx, f, fitting, (g) => layoutOf(f, p, g, e, eb, answer.counts), answer.counts, rankBy, stats, (c) => {
      c.chosenBy = answer.by;
      found(c);
    }, rejected);
  }

  const outcome = outcomeOf(space, fams, scenario, results, stats);
  if (results.length === 0) outcome.noResultReason = explainNothing(ctx, unperforated, boundReasons, lastRejection, space);
  const first = fams[0];
  if (first && minimumOf(first).minimum_N > T) {
    outcome.minimumDesignAction = tensionOnly
      ? `every layout must also reach the ${minimumOf(first).words}, above the load: it, not the load, sets the least joint strength`
      : `every layout's design strength in tension must also reach the ${minimumOf(first).words}, above the factored tension`;
  }
  return outcome;
}

/** A search's outcome; the statement of its space is written when the output reads it. */
function outcomeOf(space: SearchSpace, fams: Family[], scenario: Scenario, results: Candidate[], stats: SearchStats): SearchOutcome {
  let text: string[] | undefined;
  return {
    space,
    get spaceText(): string[] {
      return (text ??= describeSpace(space, fams, scenario));
    },
    results,
    stats,
  };
}

/**
 * The count vectors of one tapered family in order of bolt total, each found by the integer programme
 * (or its enumeration fallback) with every earlier vector excluded by a no-good cut; kept for reuse.
 */
class TaperedStream {
  private readonly vectors: TaperedAnswer[] = [];
  /** Arrangement text of each vector found, written when first asked. */
  private readonly arrangements: string[] = [];
  private readonly tried: number[][];
  private N: number;
  private readonly maxN: number;
  constructor(
    private readonly family: Family,
    private readonly problem: TaperedProblem,
    N0: number,
    private readonly stats: SearchStats,
  ) {
    // Uniform vectors are grid layouts: excluded from the start.
    this.tried = Array.from({ length: problem.kmax[0] ?? 0 }, (_, i) => Array(problem.lines).fill(i + 1));
    this.N = N0;
    this.maxN = problem.kmax.reduce((a, b) => a + b, 0);
  }

  private open = 0;

  /** Index of the first vector found so far that `openLowerN`'s test did not pass over. */
  get firstOpen(): number {
    return this.open;
  }

  /** The arrangement (size, class, pattern, counts) of vector i, found already. */
  arrangementAt(i: number): string {
    const f = this.family;
    return (this.arrangements[i] ??= arrangementText(f.size_mm, f.propertyClass, f.pattern, this.vectors[i]!.counts));
  }

  /**
   * A lower bound on the bolt total of every vector whose index does not pass `test` (reported),
   * without solving more programmes: the first such vector found, else the level the stream has
   * reached; null when the stream is exhausted and every vector passes. `test` must stay true once true.
   */
  openLowerN(test: (index: number) => boolean): number | null {
    while (this.open < this.vectors.length && test(this.open)) this.open++;
    const v = this.vectors[this.open];
    if (v) return v.counts.reduce((a, b) => a + b, 0);
    return this.N > this.maxN ? null : this.N;
  }

  at(i: number): TaperedAnswer | null {
    while (this.vectors.length <= i && this.N <= this.maxN) {
      // A bolt total with no vector left is settled by the exact walk, without the programme.
      if (!anyOpenVector(this.problem, this.N, this.tried)) {
        this.N++;
        continue;
      }
      this.stats.integerProgrammes++;
      const answer = nextTaperedCounts(this.problem, this.N, this.tried);
      if (answer) {
        if (answer.by === "enumeration") this.stats.enumerationFallbacks++;
        this.vectors.push(answer);
        this.tried.push(answer.counts);
      } else {
        this.N++;
      }
    }
    return this.vectors[i] ?? null;
  }
}

/**
 * Least added cost of one more bolt on each side of the joint (tapered lower bounds): its assemblies,
 * friction-grip tightening, and the holes it makes in the plates it passes (at least the two plates
 * it joins).
 */
function perBoltCost(ctx: SearchContext, f: Family): number {
  const price = boltPrice(ctx.costs, f.size_mm, f.propertyClass) ?? 0;
  const sides = f.base.splice.type === "lap" ? 1 : 2;
  return sides * (price + (f.base.bolts.assembly === "friction-grip" ? ctx.costs.frictionGripExtra : 0) + 2 * ctx.costs.hole);
}

function sidesOf(f: Family): number {
  return f.base.splice.type === "lap" ? 1 : 2;
}

/** Bolts in the whole joint for n per group. */
function totalBolts(f: Family, perGroup: number): number {
  return f.base.splice.type === "lap" ? perGroup : 2 * perGroup;
}

function taperedProblem(ctx: SearchContext, f: Family, kmax: number, transferred: boolean): TaperedProblem {
  const s = f.base as CheckableScenario;
  const hole = ctx.code.holeDimensions(f.size_mm, s.bolts.hole, s.bolts.slotDirection);
  const lines = f.lines;
  const nearer = (i: number, towardLow: boolean) => Array.from({ length: lines }, (_, l) => l).filter((l) => (towardLow ? l <= i : l >= i));
  const rows: TaperedProblem["rows"] = [];
  const add = (spec: typeof s.plates.mainA, share: number, towardLow: boolean) => {
    rows.push({ share, perWidth_N_per_mm: ctx.code.netStrengthPerWidth(spec), width_mm: spec.width_mm, atOrNearer: Array.from({ length: lines }, (_, i) => nearer(i, towardLow)) });
  };
  // Lines are numbered from main plate B's end (local x). Main plates and lap plate B bear toward line 0;
  // cover plates and lap plate A bear toward the last line.
  if (s.splice.type === "lap") {
    add(s.plates.mainB, 1, true);
    add(s.plates.mainA, 1, false);
  } else {
    add(s.plates.mainA, 1, true);
    add(s.plates.mainB, 1, true);
    const areas = s.plates.covers.map((c) => c.width_mm * c.thickness_mm);
    const total = areas.reduce((a, b) => a + b, 0);
    s.plates.covers.forEach((c, i) => add(c, (areas[i] ?? 0) / total, false));
  }
  return { lines, kmax: Array(lines).fill(kmax), minFirst: f.minAcross, holeAcross_mm: hole.across_mm, tension_N: s.load.factoredTension_N, transferred, rows };
}


function explainNothing(ctx: SearchContext, unperforated: number, reasons: Map<string, number>, last: { check: string; value: string } | null, space: SearchSpace): string {
  const T = ctx.scenario.load.factoredTension_N;
  if (T > unperforated) {
    return `the factored tension ${(T / 1000).toFixed(1)} kN exceeds the design strength of the unperforated main plate, ${(unperforated / 1000).toFixed(1)} kN: no bolt layout can carry it`;
  }
  const top = [...reasons.entries()].sort((a, b) => b[1] - a[1])[0];
  const parts: string[] = [];
  if (top) parts.push(`${top[1]} families ruled out by the ${top[0]} bound`);
  if (last) parts.push(`the last candidates failed ${last.check}: ${last.value}`);
  return `no layout in the declared space passes every check (${parts.join("; ") || "no candidate in the space"}); widen the space (sizes ${space.sizes_mm.map(boltSizeText).join(", ")}, classes ${space.classes.join(", ")}, at most ${space.maxAlong} lines)`;
}
