/**
 * What the layout search needs from IS 800:2007: the limits that declare its search space, and an
 * admissible upper bound on the joint strength of a layout family (used only to skip candidates that
 * cannot pass; every reported layout passes the full checker). The bound calls the same clause
 * functions as the checks; the proof that it never lies below the checker is in DEVELOPERS.md.
 */
import { boltMaterial, boltNetArea_mm2, shankArea_mm2 } from "../../catalogue/bolts.js";
import type { CheckableScenario, PlateSpec, Scenario } from "../../model/scenario.js";
import type { LayoutShape, RangeTop, SearchLimits, StrengthBound } from "../types.js";
import { BoundBuilder, groupGrips } from "../bound-builder.js";
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
  return {
    pitchMin_mm: staggered ? 1.25 * d_mm : 2.5 * d_mm,
    pitchMax_mm: staggered ? Math.min(1.5 * along, across) / 2 : along,
    gaugeMin_mm: staggered ? 1.25 * d_mm : 2.5 * d_mm,
    gaugeMax_mm: across,
    endMin_mm: factor * d0,
    endMax_mm: maxEdge,
    endAtButtMax_mm: Math.min(maxEdge, endAtButtMax),
    edgeMin_mm: factor * d0,
    edgeMax_mm: maxEdge,
    tops: { pitch: RULE, gauge: RULE, end: RULE, endAtButt: RULE },
    statement:
      `pitch ${staggered ? "1.25d" : "2.5d"} … ${staggered ? "min(1.5 × min(16t, 200, 100 + 4t), 32t, 300)/2" : "min(16t, 200, 100 + 4t)"}; gauge ${staggered ? "1.25d" : "2.5d"} … min(32t, 300) (cl. 10.2.2, 10.2.3); ` +
      `end and edge ${factor}d0 … ${scenario.options.exposedToCorrosion ? "40 + 4t" : "12tε"} (cl. 10.2.4), end distances to the same maximum (kb's e-term stops growing at 3d0, block shear does not)${covers.length > 0 ? "; at the butt also 2·e + gap within the covers' pitch limit" : ""}; every top a code maximum`,
  };
}

/**
 * Upper bound on the joint strength of any layout of the given shape (cl. 10.3.3, 10.3.4, 10.4.3,
 * 6.2, 6.3.1). Unknown dimensions take their most favourable value: no pitch → βlj = 1 and no p-term
 * in kb; each end distance at the value passed.
 */
export function strengthBound(scenario: CheckableScenario, shape: LayoutShape): StrengthBound {
  const { bolts, options, load, plates, splice } = scenario;
  const d = bolts.size_mm;
  const hole = holeDimensions(d, bolts.hole, bolts.slotDirection);
  const mat = boltMaterial(bolts.propertyClass, d, options.boltStrength);
  const Anb = boltNetArea_mm2(d, options.boltNetArea);
  const n = shape.countsPerLine.reduce((a, b) => a + b, 0);
  const m = shape.countsPerLine.length;
  const butt = splice.type !== "lap";
  const planes = splice.type === "butt-double-cover" ? 2 : 1;
  const lj = shape.pitch_mm === undefined ? 0 : (m - 1) * shape.pitch_mm;
  const blj = beta_lj(lj, d);
  const bound = new BoundBuilder(n);

  // Bolt shear and slip, per group (both groups of a butt splice have n bolts; packing on one side).
  const { grips, packs } = groupGrips(scenario);
  const friction = bolts.assembly === "friction-grip";
  grips.forEach((grip, i) => {
    const nn = bolts.threadsInShearPlanes ? planes : 0;
    const v = Vdsb({ fub_MPa: mat.fub_MPa, nn, ns: planes - nn, Anb_mm2: Anb, Asb_mm2: shankArea_mm2(d), beta_lj: blj, beta_lg: beta_lg(grip, d, blj), beta_pkg: beta_pkg(packs[i] ?? 0) });
    bound.bolt(n * v, "bolt-shear");
    if (friction) {
      const v = Vdsf(bolts.slipFactor ?? 0, planes, holeFactorKh(bolts.hole, bolts.slotDirection), F0(Anb, mat.fub_MPa), bolts.slipAt ?? "service", blj);
      if (bolts.slipAt === "ultimate") bound.bolt(n * v, "slip");
      else if (n * v < (load.serviceTension_N ?? load.factoredTension_N)) bound.serviceFails();
    }
  });

  // Per plate: gross yield, bearing with an upper bound of kb, the straight net path through a line.
  const coverArea = plates.covers.map((c) => c.width_mm * c.thickness_mm);
  const totalCover = coverArea.reduce((a, b) => a + b, 0);
  interface P { spec: PlateSpec; share: number; end: number | undefined; fullLine: number }
  // fullLine: the line carrying the whole plate force (farthest from the end its bolts bear toward).
  const list: P[] = butt
    ? [
        { spec: plates.mainA, share: 1, end: shape.endDistanceAtButt_mm, fullLine: m - 1 },
        { spec: plates.mainB, share: 1, end: shape.endDistanceAtButt_mm, fullLine: m - 1 },
        ...plates.covers.map((c, i) => ({ spec: c, share: (coverArea[i] ?? 0) / totalCover, end: shape.endDistance_mm, fullLine: 0 })),
      ]
    : [
        { spec: plates.mainA, share: 1, end: shape.endDistance_mm, fullLine: 0 },
        { spec: plates.mainB, share: 1, end: shape.endDistance_mm, fullLine: m - 1 },
      ];
  const widest = Math.max(...shape.countsPerLine);
  for (const p of list) {
    const st = plateStrength(p.spec);
    const t = p.spec.thickness_mm;
    bound.plate(Tdg(p.spec.width_mm * t, st.fy_MPa) / p.share, "gross-yield");
    const holesOnLine = options.netSectionLoad === "transferred" ? (shape.countsPerLine[p.fullLine] ?? widest) : widest;
    // No net-section rupture in compression (the compression bound: DEVELOPERS.md).
    if (shape.sense !== "compression") bound.plate(Tdn((p.spec.width_mm - holesOnLine * hole.across_mm) * t, st.fu_MPa) / p.share, "net-section");
    if (p.end !== undefined) {
      // Holes on the line at the plate end have no hole ahead: their e-term is always in kb.
      let kbUpper = Math.min(p.end / (3 * hole.along_mm), mat.fub_MPa / st.fu_MPa, 1.0);
      // Grid: every second-line hole has one straight ahead at p; staggered: at 2s on its own gauge line.
      if (shape.pitch_mm !== undefined && shape.pattern !== "tapered" && m >= (shape.pattern === "staggered" ? 3 : 2)) {
        const p_eff = shape.pattern === "staggered" ? 2 * shape.pitch_mm : shape.pitch_mm;
        kbUpper = kbFactor(p.end, p_eff, hole.along_mm, mat.fub_MPa, st.fu_MPa);
      }
      bound.bolt((n * Vdpb(kbUpper, d, t, st.fu_MPa, bearingHoleFactor(bolts.hole))) / p.share, "bolt-bearing");
    }
  }
  return bound.result;
}
