/**
 * What the layout search needs from EN 1993-1-8: the limits that declare its search space, and an
 * admissible upper bound on the joint strength of a layout family (used only to skip candidates that
 * cannot pass; every reported layout passes the full checker). The bound calls the same clause
 * functions as the checks; the proof that it never lies below the checker is in DEVELOPERS.md.
 */
import { boltNetArea_mm2, shankArea_mm2 } from "../../catalogue/bolts.js";
import type { CheckableScenario, PlateSpec, Scenario } from "../../model/scenario.js";
import type { LayoutShape, RangeTop, SearchLimits, StrengthBound } from "../types.js";
import { BoundBuilder, searchLimitsWith } from "../bound-builder.js";
import { alpha_b, alpha_d_end, alpha_d_inner, Fb_Rd, singleLapLimit } from "./bearing.js";
import { alpha_v, beta_Lf, beta_p, Fv_Rd, smallBoltHoleFactor } from "./bolt-shear.js";
import { bearingHoleFactor, holeDimensions, holeWidth, ks, normalClearance_mm } from "./holes.js";
import { boltStrength, plateStrength } from "./materials.js";
import { Npl_Rd, Nnet_Rd, Nu_Rd } from "./members.js";
import type { Ec3Settings } from "./settings.js";
import { Fp_C, Fs_Rd } from "./slip.js";

/** The plates at the faces of the bolt stacks: the outer connected parts of Table 3.3, note 3. */
function outerPlates(scenario: Scenario): PlateSpec[] {
  const { type } = scenario.splice;
  if (type === "butt-double-cover") return scenario.plates.covers;
  return [scenario.plates.mainA, scenario.plates.mainB, ...scenario.plates.covers];
}

/**
 * Search-space limits for bolt diameter d (the checker still applies every rule), from Table 3.3:
 * pitch from 2.2 d0 (staggered: 1.1 d0, so that holes on one gauge line are 2.2 d0 apart), gauge from
 * 2.4 d0 for tapered patterns, end distance from 1.2 d0 (slots: 1.5 d0), edge distance from 1.2 d0.
 * Declared narrowings (stated in the output): grid and staggered gauges from 3 d0 and edge distances
 * from 1.5 d0, where k1 of Table 3.4 reaches its cap of 2.5, so that bearing does not change with the
 * gauge (the search's gauge sweep relies on it). Exposed to corrosion, every top is a Table 3.3 maximum:
 * e ≤ 4t + 40, p1 and p2 ≤ min(14t, 200). Not exposed, Table 3.3 sets no maximum (note 1), so the tops are
 * declared: end distances to the first step at or beyond 3 d0 (αd's e1 term reaches 1), pitch and gauge
 * to the first step at or beyond min(14t, 200 mm); block tearing and staggered paths still grow past them.
 */
export function searchLimits(scenario: Scenario, d_mm: number, pattern: "grid" | "staggered" | "tapered", s: Ec3Settings): SearchLimits {
  const hole = holeDimensions(d_mm, scenario.bolts?.hole ?? "standard", scenario.bolts?.slotDirection, s.smallBoltClearance_mm);
  const d0 = holeWidth(hole);
  const reach = (hole.across_mm - d0) / 2;
  const slot = hole.across_mm !== hole.along_mm;
  const factor = slot ? 1.5 : 1.2;
  const tOut = Math.min(...outerPlates(scenario).map((p) => p.thickness_mm));
  const exposed = scenario.options.exposedToCorrosion;
  const p1Outer = Math.min(14 * tOut, 200);
  const eMax = exposed ? 4 * tOut + 40 : Infinity;
  const capped = pattern !== "tapered";
  const endMin = factor * d0;
  const endMax = exposed ? eMax : Math.max(endMin, 3 * d0);
  // Butt splices exposed: the holes either side of the butt lie on the covers' outer gauge lines at
  // 2·e + gap, a p1,0 of Table 3.3.
  const covers = scenario.plates.covers.length > 0;
  const endAtButtMax = covers && exposed ? Math.min(endMax, (p1Outer - scenario.splice.buttGap_mm) / 2) : endMax;
  const top: RangeTop = exposed ? { kind: "rule" } : { kind: "declared", ruleMax_mm: Infinity };
  const limits = {
    pitchMin_mm: pattern === "staggered" ? 1.1 * d0 : 2.2 * d0,
    pitchMax_mm: pattern === "staggered" ? p1Outer / 2 : p1Outer,
    gaugeMin_mm: capped ? 3 * d0 : 2.4 * d0,
    gaugeMax_mm: p1Outer,
    endMin_mm: endMin,
    endMax_mm: endMax,
    endAtButtMax_mm: endAtButtMax,
    edgeMin_mm: (capped ? Math.max(factor, 1.5) : factor) * d0 + reach,
    edgeMax_mm: eMax,
    tops: { pitch: top, gauge: top, end: top, endAtButt: top },
  };
  // The range statement, written when the output reads it.
  return searchLimitsWith(limits, () => (
    `pitch ${pattern === "staggered" ? "1.1 d0 (2.2 d0 on a gauge line)" : "2.2 d0"} … min(14t, 200)${pattern === "staggered" ? "/2" : ""}; ` +
    `gauge ${capped ? "3 d0 (declared: k1 = 2.5, so bearing does not change with the gauge)" : "2.4 d0"} … min(14t, 200); ` +
    `end ${factor} d0 … ${exposed ? "4t + 40" : "the first step at or beyond 3 d0 (declared: αd's e1 term reaches 1; block tearing still grows)"}; edge ${capped ? "1.5 d0 (declared, k1 = 2.5)" : `${factor} d0`}${exposed ? " … 4t + 40" : ""} ` +
    `(EN 1993-1-8 Table 3.3${exposed ? ", exposed to corrosion: every top a code maximum" : "; not exposed: Table 3.3 note 1 sets no maximum, so pitch and gauge run to the first step at or beyond min(14t, 200), a declared bound"})${covers && exposed ? "; at the butt also 2·e + gap ≤ min(14t, 200)" : ""}`
  ));
}

/**
 * Upper bound on the joint strength of any layout of the given shape (Table 3.4, 3.7, 3.8, 3.9.1,
 * EN 1993-1-1 6.2.3). Unknown dimensions take their most favourable value: no pitch → βLf = 1 and no p1
 * term; k1 at its cap of 2.5.
 */
export function strengthBound(
  scenario: CheckableScenario,
  shape: LayoutShape,
  s: Ec3Settings,
  strengthOf: (spec: PlateSpec) => { fy_MPa: number; fu_MPa: number } = (spec) => plateStrength(spec, s.steel),
): StrengthBound {
  const { bolts, load, plates, splice } = scenario;
  const { gamma_M0, gamma_M2 } = s.factors;
  const d = bolts.size_mm;
  const hole = holeDimensions(d, bolts.hole, bolts.slotDirection, s.smallBoltClearance_mm);
  const d0 = holeWidth(hole);
  const fub = boltStrength(bolts.propertyClass, d).fub_MPa;
  const As = boltNetArea_mm2(d, "iso-stress-area");
  const counts = shape.countsPerLine;
  const n = counts.reduce((a, b) => a + b, 0);
  const m = counts.length;
  const planes = splice.type === "butt-double-cover" ? 2 : 1;
  const Lj = shape.pitch_mm === undefined ? 0 : (m - 1) * shape.pitch_mm;
  const threads = bolts.threadsInShearPlanes;
  const clearance = bolts.hole === "standard" ? normalClearance_mm(d, s.smallBoltClearance_mm) : 0;
  const FvBase = Fv_Rd(alpha_v(bolts.propertyClass, threads), fub, threads ? As : shankArea_mm2(d), gamma_M2) * beta_Lf(Lj, d) * smallBoltHoleFactor(d, clearance, bolts.propertyClass);
  const bound = new BoundBuilder(n);

  // Groups: packing lies on the thinner main plate's side (as the joint builder places it).
  const butt = splice.type !== "lap";
  const tA = plates.mainA.thickness_mm;
  const tB = plates.mainB.thickness_mm;
  const packingOn = (side: "A" | "B") => (scenario.packing_mm > 0 && (tA <= tB ? "A" : "B") === side ? scenario.packing_mm : 0);
  const sides: Array<"A" | "B" | "J"> = butt ? ["A", "B"] : ["J"];
  const FvPlane = (side: "A" | "B" | "J") => FvBase * beta_p(side === "J" ? 0 : packingOn(side), d);

  if (s.category !== "C") {
    for (const side of sides) {
      const v = n * planes * FvPlane(side);
      bound.bolt(v, "bolt-shear");
    }
  }
  if (s.category !== "A") {
    const gamma = s.category === "B" ? s.factors.gamma_M3_ser : s.factors.gamma_M3;
    const v = n * Fs_Rd(ks(bolts.hole, bolts.slotDirection), planes, bolts.slipFactor ?? 0, Fp_C(fub, As), gamma);
    if (s.category === "C") {
      bound.bolt(v, "slip");
    } else if (v < (load.serviceTension_N ?? load.factoredTension_N)) bound.serviceFails();
  }

  // Plates: gross yield, the straight net path through one line, bearing with k1 at 2.5.
  interface P { spec: PlateSpec; share: number; end: number | undefined; endLine: number; fullLine: number; outer: boolean; sides: Array<"A" | "B" | "J"> }
  const coverArea = plates.covers.map((c) => c.width_mm * c.thickness_mm);
  const totalCover = coverArea.reduce((a, b) => a + b, 0);
  const doubleCover = splice.type === "butt-double-cover";
  const list: P[] = butt
    ? [
        { spec: plates.mainA, share: 1, end: shape.endDistanceAtButt_mm, endLine: 0, fullLine: m - 1, outer: !doubleCover, sides: ["A"] },
        { spec: plates.mainB, share: 1, end: shape.endDistanceAtButt_mm, endLine: 0, fullLine: m - 1, outer: !doubleCover, sides: ["B"] },
        ...plates.covers.map((c, i): P => ({ spec: c, share: (coverArea[i] ?? 0) / totalCover, end: shape.endDistance_mm, endLine: m - 1, fullLine: 0, outer: true, sides: ["A", "B"] })),
      ]
    : [
        { spec: plates.mainA, share: 1, end: shape.endDistance_mm, endLine: m - 1, fullLine: 0, outer: true, sides: ["J"] },
        { spec: plates.mainB, share: 1, end: shape.endDistance_mm, endLine: 0, fullLine: m - 1, outer: true, sides: ["J"] },
      ];
  const widest = Math.max(...counts);
  const oneLineLap = planes === 1 && m === 1;
  const factor = bearingHoleFactor(bolts.hole, bolts.slotDirection);
  for (const p of list) {
    const st = strengthOf(p.spec);
    const t = p.spec.thickness_mm;
    const A = p.spec.width_mm * t;
    bound.plate(Npl_Rd(A, st.fy_MPa, gamma_M0) / p.share, "gross-yield");
    const holesOnLine = scenario.options.netSectionLoad === "transferred" ? (counts[p.fullLine] ?? widest) : widest;
    const Anet = (p.spec.width_mm - holesOnLine * hole.across_mm) * t;
    // No net-section resistance in compression (the compression bound: DEVELOPERS.md).
    if (shape.sense !== "compression") bound.plate((s.category === "C" ? Nnet_Rd(Anet, st.fy_MPa, gamma_M0) : Nu_Rd(Anet, st.fu_MPa, gamma_M2)) / p.share, "net-section");
    // Bearing: each bolt's Fb,Rd is at most 2.5·αb·fu·d·t/γM2 with αb ≤ min(fub/fu, 1); the bolts on the
    // line at the plate end have no bolt ahead (αd = e1/3d0); in a grid every other bolt has one straight
    // ahead at p; in a staggered pattern, from the third line on, one on its own gauge line at 2s.
    const cap = oneLineLap ? singleLapLimit(st.fu_MPa, d, t, gamma_M2) : Infinity;
    const Fb = (ad: number) => Math.min(Fb_Rd(2.5, alpha_b(ad, fub, st.fu_MPa), st.fu_MPa, d, t, gamma_M2, factor), cap);
    let sum = 0;
    counts.forEach((c, i) => {
      const k = Math.abs(i - p.endLine);
      let ad = Infinity;
      if (k === 0 && p.end !== undefined) ad = alpha_d_end(p.end, d0);
      else if (k >= 1 && shape.pitch_mm !== undefined && shape.pattern === "grid") ad = alpha_d_inner(shape.pitch_mm, d0);
      else if (k >= 2 && shape.pitch_mm !== undefined && shape.pattern === "staggered") ad = alpha_d_inner(2 * shape.pitch_mm, d0);
      sum += c * Fb(ad);
    });
    for (const side of p.sides) {
      // 3.7: the group resistance is at most ΣFb,Rd and at most n × Fv,Rd of the planes carrying this plate.
      const Fv = (p.outer ? 1 : planes) * FvPlane(side);
      bound.bolt(Math.min(sum, n * Fv) / p.share, "bolt-bearing", Math.min(Fb(Infinity), Fv) / p.share);
    }
  }
  return bound.result;
}
