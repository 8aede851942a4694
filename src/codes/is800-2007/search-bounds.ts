/**
 * What the layout search needs from IS 800:2007: the limits that declare its search space, and an
 * admissible upper bound on the joint strength of a layout family (used only to skip candidates that
 * cannot pass; every reported layout passes the full checker). The bound calls the same clause
 * functions as the checks; the proof that it never lies below the checker is in DEVELOPERS.md.
 */
import { boltMaterial, boltNetArea_mm2, shankArea_mm2 } from "../../catalogue/bolts.js";
import type { CheckableScenario, PlateSpec, Scenario } from "../../model/scenario.js";
import type { LayoutShape, RangeTop, SearchLimits, StrengthBound } from "../types.js";
import { BoundBuilder, searchLimitsWith, groupGrips } from "../bound-builder.js";
import { kb as kbFactor, Vdpb } from "./bearing.js";
import { beta_lg, beta_lj, beta_pkg, Vdsb } from "./bolt-shear.js";
import { bearingHoleFactor, holeDimensions, holeFactorKh } from "./holes.js";
import { epsilon, plateStrength } from "./materials.js";
import { F0, Vdsf } from "./slip.js";
import { Tdg, Tdn } from "./tension-member.js";

function loadedPlates(scenario: Scenario): PlateSpec[] {
  return [scenario.plates.mainA, scenario.plates.mainB, ...scenario.plates.covers];
}

function outsidePlates(scenario: Scenario): PlateSpec[] {
  const { type } = scenario.splice;
  if (type === "lap") return [scenario.plates.mainA, scenario.plates.mainB];
  if (type === "butt-single-cover") return [scenario.plates.mainA, scenario.plates.mainB, ...scenario.plates.covers];
  return scenario.plates.covers;
}

const RULE: RangeTop = { kind: "rule" };

const roughEdge = (p: PlateSpec) => p.edges === "sheared" || p.edges === "hand-flame-cut";

/**
 * Search-space limits from cl. 10.2 for bolt diameter d (the checker still applies every rule):
 * pitch and gauge from 2.5 d (staggered: 1.25 d, so that the same-line spacing 2s ≥ 2.5 d) to
 * min(16 t, 200) along (staggered: ×1.5 per cl. 10.2.3.4, halved to the stagger pitch) and
 * min(32 t, 300) across; end and edge distances from 1.5 d0 or 1.7 d0 (cl. 10.2.4.2) up to the code
 * maximum 12 t ε (40 + 4 t exposed; cl. 10.2.4.3), so that block shear, which still grows after kb's
 * e/3d0 term reaches 1 at 3 d0, is searched to the end. Every top is a rule: the space is the code's.
 */
export function searchLimits(scenario: Scenario, d_mm: number, pattern: "grid" | "staggered" | "tapered"): SearchLimits {
  const d0 = holeDimensions(d_mm, scenario.bolts?.hole ?? "standard", scenario.bolts?.slotDirection).along_mm;
  const plates = loadedPlates(scenario);
  const tMin = Math.min(...plates.map((p) => p.thickness_mm));
  const outside = outsidePlates(scenario);
  const tOut = Math.min(...outside.map((p) => p.thickness_mm));
  const fyMax = Math.max(...plates.map((p) => plateStrength(p).fy_MPa));
  const along = Math.min(16 * tMin, 200, 100 + 4 * tOut);
  const across = Math.min(32 * tMin, 300);
  const factor = plates.some(roughEdge) ? 1.7 : 1.5;
  const maxEdge = scenario.options.exposedToCorrosion ? 40 + 4 * tOut : 12 * tOut * epsilon(fyMax);
  const staggered = pattern === "staggered";
  // Butt splices: the pitch across the butt in the cover plates, 2·e(butt) + gap, is a pitch along a
  // gauge line of the covers (cl. 10.2.3.2, and 10.2.3.3 for an outside cover), never relaxed for stagger.
  const covers = scenario.plates.covers;
  const endAtButtMax =
    covers.length > 0
      ? (Math.min(200, ...covers.map((c) => 16 * c.thickness_mm), ...covers.filter((c) => outside.includes(c)).map((c) => 100 + 4 * c.thickness_mm)) - scenario.splice.buttGap_mm) / 2
      : Infinity;
  // Staggered butt splices: the holes of transverse line 1 of the two groups are consecutive on a gauge
  // line of the covers, gap + 2·(e(butt) + p) apart, in no group and on no edge line: the checker's pitch
  // limit for them is min(16 t, 200) with t the thinner cover (cl. 10.2.3.2; maxSpacingRules, pitchRules).
  const staggeredButtSpanMax = staggered && covers.length > 0 ? Math.min(200, ...covers.map((c) => 16 * c.thickness_mm)) : Infinity;
  const limits = {
    pitchMin_mm: staggered ? 1.25 * d_mm : 2.5 * d_mm,
    pitchMax_mm: staggered ? Math.min(1.5 * along, across) / 2 : along,
    gaugeMin_mm: staggered ? 1.25 * d_mm : 2.5 * d_mm,
    gaugeMax_mm: across,
    endMin_mm: factor * d0,
    endMax_mm: maxEdge,
    endAtButtMax_mm: Math.min(maxEdge, endAtButtMax),
    edgeMin_mm: factor * d0,
    edgeMax_mm: maxEdge,
    staggeredButtSpanMax_mm: staggeredButtSpanMax,
    tops: { pitch: RULE, gauge: RULE, end: RULE, endAtButt: RULE },
  };
  // The range statement, written when the output reads it.
  return searchLimitsWith(limits, () => (
    `pitch ${staggered ? "1.25d" : "2.5d"} … ${staggered ? "min(1.5 × min(16t, 200, 100 + 4t), 32t, 300)/2" : "min(16t, 200, 100 + 4t)"}; gauge ${staggered ? "1.25d" : "2.5d"} … min(32t, 300) (cl. 10.2.2, 10.2.3); ` +
    `end and edge ${factor}d0 … ${scenario.options.exposedToCorrosion ? "40 + 4t" : "12tε"} (cl. 10.2.4), end distances to the same maximum (kb's e-term stops growing at 3d0, block shear does not)${covers.length > 0 ? "; at the butt also 2·e + gap within the covers' pitch limit" : ""}; every top a code maximum`
  ));
}

/** A plate's part of the bound that does not depend on the layout. */
interface PlateBasis {
  width_mm: number;
  thickness_mm: number;
  fu_MPa: number;
  /** fub/fu, the material cap of kb. */
  fubOverFu: number;
  /** Share of the joint tension in the plate. */
  share: number;
  /** Gross yield (cl. 6.2) over the share, N. */
  grossYield_N: number;
  /** Its bolts' end distance is the one at the butt (main plates of a butt splice). */
  endAtButt: boolean;
  /** The line carrying the whole plate force is the last (else line 0): farthest from the end its bolts bear toward. */
  fullLineLast: boolean;
}

/** The parts of the bound that depend on the scenario only (bolt, plates, options, load), worked out once. */
interface BoundBasis {
  d_mm: number;
  hole: { across_mm: number; along_mm: number };
  fub_MPa: number;
  Anb_mm2: number;
  Asb_mm2: number;
  planes: number;
  /** Shear planes through the threads. */
  nn: number;
  groups: Array<{ grip_mm: number; beta_pkg: number }>;
  /** Friction-grip bolts: μf, Kh, F0 and the slip design of cl. 10.4.3. */
  slip: { mu_f: number; Kh: number; F0_N: number; at: "service" | "ultimate" } | null;
  /** Service tension the slip resistance must reach (slip at service), N. */
  slipDemand_N: number;
  bearingFactor: number;
  transferred: boolean;
  plates: PlateBasis[];
}

/**
 * Bases by scenario. Scenarios are values (never changed once parsed or built), and the search asks
 * for thousands of bounds of the same few (one per bolt and cover thickness), so each is worked out once.
 */
const bases = new WeakMap<CheckableScenario, BoundBasis>();

function basisOf(scenario: CheckableScenario): BoundBasis {
  const known = bases.get(scenario);
  if (known) return known;
  const { bolts, options, load, plates, splice } = scenario;
  const d = bolts.size_mm;
  const mat = boltMaterial(bolts.propertyClass, d, options.boltStrength);
  const Anb = boltNetArea_mm2(d, options.boltNetArea);
  const butt = splice.type !== "lap";
  const planes = splice.type === "butt-double-cover" ? 2 : 1;
  const { grips, packs } = groupGrips(scenario);
  const coverArea = plates.covers.map((c) => c.width_mm * c.thickness_mm);
  const totalCover = coverArea.reduce((a, b) => a + b, 0);
  const plate = (spec: PlateSpec, share: number, endAtButt: boolean, fullLineLast: boolean): PlateBasis => {
    const st = plateStrength(spec);
    const t = spec.thickness_mm;
    return { width_mm: spec.width_mm, thickness_mm: t, fu_MPa: st.fu_MPa, fubOverFu: mat.fub_MPa / st.fu_MPa, share, grossYield_N: Tdg(spec.width_mm * t, st.fy_MPa) / share, endAtButt, fullLineLast };
  };
  const basis: BoundBasis = {
    d_mm: d,
    hole: holeDimensions(d, bolts.hole, bolts.slotDirection),
    fub_MPa: mat.fub_MPa,
    Anb_mm2: Anb,
    Asb_mm2: shankArea_mm2(d),
    planes,
    nn: bolts.threadsInShearPlanes ? planes : 0,
    groups: grips.map((grip, i) => ({ grip_mm: grip, beta_pkg: beta_pkg(packs[i] ?? 0) })),
    slip: bolts.assembly === "friction-grip" ? { mu_f: bolts.slipFactor ?? 0, Kh: holeFactorKh(bolts.hole, bolts.slotDirection), F0_N: F0(Anb, mat.fub_MPa), at: bolts.slipAt ?? "service" } : null,
    slipDemand_N: load.serviceTension_N ?? load.factoredTension_N,
    bearingFactor: bearingHoleFactor(bolts.hole),
    transferred: options.netSectionLoad === "transferred",
    // fullLine: the line carrying the whole plate force (farthest from the end its bolts bear toward).
    plates: butt
      ? [plate(plates.mainA, 1, true, true), plate(plates.mainB, 1, true, true), ...plates.covers.map((c, i) => plate(c, (coverArea[i] ?? 0) / totalCover, false, false))]
      : [plate(plates.mainA, 1, false, false), plate(plates.mainB, 1, false, true)],
  };
  bases.set(scenario, basis);
  return basis;
}

/**
 * Upper bound on the joint strength of any layout of the given shape (cl. 10.3.3, 10.3.4, 10.4.3,
 * 6.2, 6.3.1). Unknown dimensions take their most favourable value: no pitch → βlj = 1 and no p-term
 * in kb; each end distance at the value passed.
 */
export function strengthBound(scenario: CheckableScenario, shape: LayoutShape): StrengthBound {
  const b = basisOf(scenario);
  const d = b.d_mm;
  const counts = shape.countsPerLine;
  let n = 0;
  let widest = 0;
  for (const k of counts) {
    n += k;
    widest = Math.max(widest, k);
  }
  const m = counts.length;
  const lj = shape.pitch_mm === undefined ? 0 : (m - 1) * shape.pitch_mm;
  const blj = beta_lj(lj, d);
  const bound = new BoundBuilder(n);

  // Bolt shear and slip, per group (both groups of a butt splice have n bolts; packing on one side).
  // Friction-grip bolts are checked in bolt shear and bearing whatever their slip design.
  for (const g of b.groups) {
    const v = Vdsb({ fub_MPa: b.fub_MPa, nn: b.nn, ns: b.planes - b.nn, Anb_mm2: b.Anb_mm2, Asb_mm2: b.Asb_mm2, beta_lj: blj, beta_lg: beta_lg(g.grip_mm, d, blj), beta_pkg: g.beta_pkg });
    bound.bolt(n * v, "bolt-shear");
    if (b.slip) {
      const v = Vdsf(b.slip.mu_f, b.planes, b.slip.Kh, b.slip.F0_N, b.slip.at, blj);
      if (b.slip.at === "ultimate") bound.bolt(n * v, "slip");
      else if (n * v < b.slipDemand_N) bound.serviceFails();
    }
  }

  // Per plate: gross yield, bearing with an upper bound of kb, the straight net path through a line.
  for (const p of b.plates) {
    const t = p.thickness_mm;
    bound.plate(p.grossYield_N, "gross-yield");
    const holesOnLine = b.transferred ? (counts[p.fullLineLast ? m - 1 : 0] ?? widest) : widest;
    // No net-section rupture in compression (the compression bound: DEVELOPERS.md).
    if (shape.sense !== "compression") bound.plate(Tdn((p.width_mm - holesOnLine * b.hole.across_mm) * t, p.fu_MPa) / p.share, "net-section");
    const end = p.endAtButt ? shape.endDistanceAtButt_mm : shape.endDistance_mm;
    if (end !== undefined) {
      // Holes on the line at the plate end have no hole ahead: their e-term is always in kb.
      let kbUpper = Math.min(end / (3 * b.hole.along_mm), p.fubOverFu, 1.0);
      // Grid: every second-line hole has one straight ahead at p; staggered: at 2s on its own gauge line.
      if (shape.pitch_mm !== undefined && shape.pattern !== "tapered" && m >= (shape.pattern === "staggered" ? 3 : 2)) {
        const p_eff = shape.pattern === "staggered" ? 2 * shape.pitch_mm : shape.pitch_mm;
        kbUpper = kbFactor(end, p_eff, b.hole.along_mm, b.fub_MPa, p.fu_MPa);
      }
      bound.bolt((n * Vdpb(kbUpper, d, t, p.fu_MPa, b.bearingFactor)) / p.share, "bolt-bearing");
    }
  }
  return bound.result;
}
