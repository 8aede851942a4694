/**
 * What the layout search needs from AISC 360-16: the limits that declare its search space and an
 * admissible upper bound on the joint strength of a layout family (only used to skip candidates; every
 * reported layout passes the full checker). The bound calls the same clause functions as the checks;
 * its proof is in DEVELOPERS.md ("AISC 360-16").
 */
import { inchBoltSize } from "../../catalogue/bolts.js";
import type { CheckableScenario, PlateSpec, Scenario } from "../../model/scenario.js";
import type { LayoutShape, RangeTop, SearchLimits, StrengthBound } from "../types.js";

const RULE: RangeTop = { kind: "rule" };
import { BoundBuilder, searchLimitsWith, groupGrips } from "../bound-builder.js";
import { bearingCoefficients, phiRnBearing, phiRnTearout } from "./bearing.js";
import { a307GripFactor, fillerFactor, longJointFactor, phiRnShear } from "./bolt-shear.js";
import { netAllowance_mm, holeDimensions } from "./holes.js";
import { aiscBolt } from "./joint-checks.js";
import { plateStrength, Tb_N } from "./materials.js";
import { hf, phiRnSlip, phiSlip } from "./slip.js";
import { maxEdge_mm, maxSpacing_mm, minEdge_mm, minSpacing_mm } from "./spacing.js";
import { phiPnRupture, phiPnYield, spliceEffectiveArea } from "./tension.js";

const loaded = (s: Scenario): PlateSpec[] => [s.plates.mainA, s.plates.mainB, ...s.plates.covers];

/**
 * Search-space limits from J3.3–J3.5 for bolt diameter d: pitch and gauge from 2⅔ d (staggered: 1⅓ d,
 * so that the same-line spacing 2s ≥ 2⅔ d) to the J3.5 maximum spacing (staggered: half of it, the
 * same-line spacing being 2s); end and edge distances from Table J3.4 up to the J3.5 maximum, end
 * distances too: tearout stops growing at lc = 2 d (e = 2 d + dh/2), block shear does not. Every top is a
 * rule, so the space is the code's.
 */
export function searchLimits(scenario: Scenario, d_mm: number, pattern: LayoutShape["pattern"]): SearchLimits {
  const inch = inchBoltSize(d_mm) !== undefined;
  const plates = loaded(scenario);
  const tMin = Math.min(...plates.map((p) => p.thickness_mm));
  const spacingMax = maxSpacing_mm(tMin, inch, scenario.options.exposedToCorrosion);
  const narrowest = Math.min(...plates.map((p) => p.width_mm));
  const edgeMax = Math.max(...plates.filter((p) => p.width_mm === narrowest).map((p) => maxEdge_mm(p.thickness_mm, inch)));
  const endMaxRule = Math.max(...plates.map((p) => maxEdge_mm(p.thickness_mm, inch)));
  const edgeMin = minEdge_mm(d_mm);
  const staggered = pattern === "staggered";
  const covers = scenario.plates.covers;
  // Butt splices: the two holes either side of the butt lie on one gauge line of the covers at 2·e + gap (J3.5).
  const endAtButtMax = covers.length > 0 ? (Math.min(...covers.map((c) => maxSpacing_mm(c.thickness_mm, inch, scenario.options.exposedToCorrosion))) - scenario.splice.buttGap_mm) / 2 : Infinity;
  // End distances run to the J3.5 maximum: tearout stops growing at lc = 2d (e = 2d + dh/2), block shear does not.
  const endMax = endMaxRule;
  const limits = {
    pitchMin_mm: staggered ? minSpacing_mm(d_mm) / 2 : minSpacing_mm(d_mm),
    pitchMax_mm: staggered ? spacingMax / 2 : spacingMax,
    gaugeMin_mm: staggered ? minSpacing_mm(d_mm) / 2 : minSpacing_mm(d_mm),
    gaugeMax_mm: spacingMax,
    endMin_mm: edgeMin,
    endMax_mm: endMax,
    endAtButtMax_mm: Math.min(endMax, endAtButtMax),
    edgeMin_mm: edgeMin,
    edgeMax_mm: edgeMax,
    tops: { pitch: RULE, gauge: RULE, end: RULE, endAtButt: RULE },
  };
  // The range statement, written when the output reads it.
  return searchLimitsWith(limits, () => (
    `pitch ${staggered ? "1⅓d" : "2⅔d"} … ${staggered ? "min(24t, 12 in)/2" : "min(24t, 12 in)"}; gauge ${staggered ? "1⅓d" : "2⅔d"} … min(24t, 12 in) (J3.3, J3.5); ` +
    `end and edge from Table J3.4 to min(12t, 6 in) (J3.4, J3.5): end distances to the maximum, since block shear still grows after tearout reaches bearing at lc = 2d; every top a code maximum` +
    (covers.length > 0 ? "; at the butt also 2·e + gap within the covers' maximum spacing" : "")
  ));
}

/**
 * Upper bound of the joint strength of every layout of a shape (J3.6, J3.8, J3.10, D2, J4.1). Unknown
 * dimensions take their most favourable value: no pitch → no long-joint reduction; no end distance →
 * no tearout term.
 */
export function strengthBound(scenario: CheckableScenario, shape: LayoutShape): StrengthBound {
  const { bolts, options, plates, splice } = scenario;
  const bolt = aiscBolt(bolts);
  const d = bolt.d_mm;
  const inch = bolt.inch !== undefined;
  const hole = holeDimensions(d, bolts.hole, bolts.slotDirection);
  const n = shape.countsPerLine.reduce((a, b) => a + b, 0);
  const m = shape.countsPerLine.length;
  const butt = splice.type !== "lap";
  const planes = splice.type === "butt-double-cover" ? 2 : 1;
  const length = shape.pitch_mm === undefined ? 0 : (m - 1) * shape.pitch_mm;
  const lj = longJointFactor(length, inch);
  const bound = new BoundBuilder(n);
  const keep = (capacity: number, check: string, kind: "bolt" | "plate") => (kind === "bolt" ? bound.bolt(capacity, check) : bound.plate(capacity, check));
  const { grips, packs } = groupGrips(scenario);
  const perPlane = grips.map((grip, i) =>
    phiRnShear(bolt.Fnv_MPa, bolt.Ab_mm2, lj * fillerFactor(packs[i] ?? 0, options.fillersDeveloped ?? false) * a307GripFactor(bolt.group, grip, d)),
  );
  perPlane.forEach((v) => keep(n * planes * v, "bolt-shear", "bolt"));
  if (bolts.assembly === "friction-grip") {
    const group = bolt.group === "Group B" ? "Group B" : "Group A";
    packs.forEach((p) => keep(n * phiRnSlip(phiSlip(bolts.hole, bolts.slotDirection), bolts.slipFactor ?? 0, hf(p > 0 ? 1 : 0), Tb_N(d, group, bolt.inch) ?? 0, planes), "slip", "bolt"));
  }

  const considered = (options.bearingDeformation ?? "considered") === "considered";
  const { cb, ct } = bearingCoefficients(considered, bolts.hole, bolts.slotDirection);
  const coverArea = plates.covers.map((c) => c.width_mm * c.thickness_mm);
  const totalCover = coverArea.reduce((a, b) => a + b, 0);
  // end: the end distance its bolts bear toward; endLine: the transverse line nearest that end;
  // fullLine: the line that carries the whole plate force (farthest from that end).
  interface P { spec: PlateSpec; share: number; cover: boolean; end: number | undefined; endLine: number; fullLine: number; shear: number }
  const shearMin = Math.min(...perPlane);
  const list: P[] = butt
    ? [
        // Each main plate is loaded only by its own group's bolts: that group's shear (filler factor included).
        { spec: plates.mainA, share: 1, cover: false, end: shape.endDistanceAtButt_mm, endLine: 0, fullLine: m - 1, shear: planes * perPlane[0]! },
        { spec: plates.mainB, share: 1, cover: false, end: shape.endDistanceAtButt_mm, endLine: 0, fullLine: m - 1, shear: planes * perPlane[1]! },
        // A cover connects to both groups, laid out alike: the group with the smaller shear gives one of the checker's terms.
        ...plates.covers.map((c, i) => ({ spec: c, share: (coverArea[i] ?? 0) / totalCover, cover: true, end: shape.endDistance_mm, endLine: m - 1, fullLine: 0, shear: shearMin })),
      ]
    : [
        { spec: plates.mainA, share: 1, cover: false, end: shape.endDistance_mm, endLine: m - 1, fullLine: 0, shear: shearMin },
        { spec: plates.mainB, share: 1, cover: false, end: shape.endDistance_mm, endLine: 0, fullLine: m - 1, shear: shearMin },
      ];
  const widest = Math.max(...shape.countsPerLine);
  const allowance = netAllowance_mm(d);
  for (const p of list) {
    const st = plateStrength(p.spec);
    const t = p.spec.thickness_mm;
    const Ag = p.spec.width_mm * t;
    keep(phiPnYield(Ag, st.fy_MPa) / p.share, "gross-yield", "plate");
    const holesOnLine = options.netSectionLoad === "transferred" ? (shape.countsPerLine[p.fullLine] ?? widest) : widest;
    const An = (p.spec.width_mm - holesOnLine * (hole.across_mm + allowance)) * t;
    // No net-section rupture in compression (the compression bound: DEVELOPERS.md).
    if (shape.sense !== "compression") keep(phiPnRupture(p.cover ? spliceEffectiveArea(An, Ag) : An, st.fu_MPa) / p.share, "net-section", "plate");
    // Each bolt gives at most min(shear, bearing); the bolts on the line at the plate end have no hole
    // ahead, so their tearout has lc = e − dh/2 exactly.
    const each = Math.min(p.shear, phiRnBearing(cb, d, t, st.fu_MPa));
    const atEnd = p.end === undefined ? 0 : (shape.countsPerLine[p.endLine] ?? 0);
    const endEach = p.end === undefined ? each : Math.min(each, phiRnTearout(ct, p.end - hole.along_mm / 2, t, st.fu_MPa));
    // Per bolt (the tapered bolt-count bound): at most `each` whichever line a bolt is on — the share of
    // end bolts differs between count vectors, so the average over this shape would not bound them all.
    bound.bolt(((n - atEnd) * each + atEnd * endEach) / p.share, "bolt-bearing", each / p.share);
  }
  return bound.result;
}
