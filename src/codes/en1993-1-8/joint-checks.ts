/**
 * EN 1993-1-8 (with EN 1993-1-1) checks of a splice, run on the joint's hole coordinates.
 * Each function returns results (data); none prints, none throws for a failed check.
 */
import { boltNetArea_mm2, shankArea_mm2, type BoltMaterial } from "../../catalogue/bolts.js";
import { blockLoadText, blockShapes, governingBlock, GoverningBlocksOfCall, type BlockShape, type GoverningBlock } from "../../geometry/block-shear.js";
import { groupHoles, holesOfPlate, sameEnd } from "../../geometry/joint-builder.js";
import { jointLength_mm, LINE_TOLERANCE_MM } from "../../geometry/lines.js";
import { netPathFor, pathLabel } from "../../geometry/net-section.js";
import { forEachTearOut } from "../../geometry/tear-out.js";
import type { BoltGroupGeometry, Hole, Joint, PlateConnection, PlatePiece } from "../../model/joint.js";
import type { Citation, StrengthCheck } from "../../model/results.js";
import type { CheckableScenario } from "../../model/scenario.js";
import { strength } from "../check-builders.js";
import { f, kN } from "../format.js";
import { groupLabel } from "../is800-2007/joint-checks.js";
import { alpha_b, alpha_d_end, alpha_d_inner, Fb_Rd, groupResistance, k1_edge, k1_inner, singleLapLimit } from "./bearing.js";
import { alpha_v, beta_Lf, beta_p, Fv_Rd, smallBoltHoleFactor } from "./bolt-shear.js";
import { cl, cl11, fixed } from "./citation.js";
import { bearingHoleFactor, holeWidth, ks, normalClearance_mm } from "./holes.js";
import { boltStrength } from "./materials.js";
import { Npl_Rd, Nnet_Rd, Nu_Rd, Veff_1_Rd } from "./members.js";
import type { Ec3Settings } from "./settings.js";
import { Fp_C, Fs_Rd } from "./slip.js";

/** Cross-references for a citation, the false entries (clauses that do not apply) left out. */
function alsoOf(refs: Array<string | false>): { also?: string[] } {
  const also = refs.filter((r): r is string => r !== false);
  return also.length > 0 ? { also } : {};
}

/*
 * Citations and formulas that do not change from check to check are made once, here, and shared by
 * every result (frozen: no reader may change them).
 */

/** Bolt shear, 3.6.1 with Table 3.4 and the reductions that apply: βLf (3.8), βp (3.6.1(12)), × 0.85 (3.6.1(5)). */
const BOLT_SHEAR_CITATIONS: Citation[] = [];
for (const longJoint of [false, true]) {
  for (const packed of [false, true]) {
    for (const smallHole of [false, true]) {
      BOLT_SHEAR_CITATIONS.push(
        fixed(cl("3.6.1", { table: "Table 3.4", ...alsoOf([longJoint && "3.8, Eq. (3.5) (βLf)", packed && "3.6.1(12), Eq. (3.3) (βp)", smallHole && "3.6.1(5) (× 0.85)"]) })),
      );
    }
  }
}

/** The bolt-shear citation with the reductions that apply (in the order of the loops above). */
function boltShearCitation(longJoint: boolean, packed: boolean, smallHole: boolean): Citation {
  return BOLT_SHEAR_CITATIONS[(longJoint ? 4 : 0) + (packed ? 2 : 0) + (smallHole ? 1 : 0)]!;
}

/** Group bearing, 3.7 with Table 3.4; single lap with one transverse line also 3.6.1(10), Eq. (3.2). */
const BEARING_CITATION = fixed(cl("3.7", { table: "Table 3.4" }));
const BEARING_ONE_LINE_CITATION = fixed(cl("3.7", { table: "Table 3.4", ...alsoOf(["3.6.1(10), Eq. (3.2)"]) }));
const SMALL_HOLES_CITATION = fixed(cl("3.6.1(5)"));
const SLIP_CITATION = fixed(cl("3.9.1", { table: "Tables 3.6, 3.7", equation: "(3.6), (3.7)" }));
const GROSS_YIELD_CITATION = fixed(cl11("6.2.3(2)a", { equation: "(6.6)" }));
const NET_CITATION = fixed(cl11("6.2.3(2)b", { equation: "(6.7)", also: ["6.2.2.2 for Anet"] }));
const NET_CATEGORY_C_CITATION = fixed(cl11("6.2.3(4)", { equation: "(6.8)", also: ["6.2.2.2 for Anet"] }));
const BLOCK_CITATION = fixed(cl("3.10.2(2)", { equation: "(3.9)" }));

/** The net-section formula: whole force or load already transferred; Nu,Rd, or Nnet,Rd for Category C. */
function netFormulaOf(transferred: boolean, catC: boolean): string {
  return (
    (transferred ? "F·k/n ≤ " : "F ≤ ") +
    (catC ? "Nnet,Rd = Anet·fy / γM0" : "Nu,Rd = 0.9·Anet·fu / γM2") +
    ";  Anet = (b − Σd0 + Σ s²/4p)·t, " +
    (transferred ? "k = bolts not yet passed; highest demand/resistance over all paths" : "least over all paths")
  );
}
const NET_FORMULA = netFormulaOf(false, false);
const NET_FORMULA_C = netFormulaOf(false, true);
const NET_FORMULA_TRANSFERRED = netFormulaOf(true, false);
const NET_FORMULA_TRANSFERRED_C = netFormulaOf(true, true);

/** Block tearing with the whole plate force, or with k/n of it. */
const BLOCK_FORMULA_FULL = "F ≤ Veff,1,Rd = fu·Ant/γM2 + (1/√3)·fy·Anv/γM0";
const BLOCK_FORMULA_SHARE = "F·k/n ≤ Veff,1,Rd = fu·Ant/γM2 + (1/√3)·fy·Anv/γM0";

/** One bolt group with its shear resistance and the reductions that set it. */
export interface Ec3Group {
  group: BoltGroupGeometry;
  holes: readonly Hole[];
  /** Distance between the centres of the end fasteners along the force, mm (3.8). */
  Lj_mm: number;
  beta_Lf: number;
  beta_p: number;
  /** 0.85 for M12/M14 of class 8.8 or 10.9 in 2 mm clearance holes (3.6.1(5)), else 1. */
  smallHole: number;
  /** M12/M14 in 2 mm clearance holes, any class: the condition of 3.6.1(5) applies. */
  inSmallHoles: boolean;
  alpha_v: number;
  /** As where the planes pass the threads, π d²/4 where they pass the shank, mm². */
  A_mm2: number;
  bolt: BoltMaterial;
  /** Fv,Rd of one bolt in one shear plane with βLf, βp and the small-hole factor, N. */
  FvPlane_N: number;
  /** A single lap joint with one transverse line of bolts (3.6.1(10)). */
  oneLineLap: boolean;
  /** Each hole's neighbours across the force (k1 of Table 3.4), in the group's hole order. */
  across: HolesAcross;
}

/** The shear resistance of one group's bolts, from its hole coordinates (3.6.1, 3.8). */
export function groupOf(joint: Joint, scenario: CheckableScenario, s: Ec3Settings, group: BoltGroupGeometry): Ec3Group {
  const { bolts } = scenario;
  const d = bolts.size_mm;
  const holes = groupHoles(joint, group.id);
  const Lj = jointLength_mm(holes);
  const bolt = boltStrength(bolts.propertyClass, d);
  const threads = bolts.threadsInShearPlanes;
  const A = threads ? boltNetArea_mm2(d, "iso-stress-area") : shankArea_mm2(d);
  const av = alpha_v(bolts.propertyClass, threads);
  const clearance = bolts.hole === "standard" ? normalClearance_mm(d, s.smallBoltClearance_mm) : 0;
  const small = smallBoltHoleFactor(d, clearance, bolts.propertyClass);
  const bLf = beta_Lf(Lj, d);
  const bp = beta_p(group.packing_mm, d);
  return {
    group,
    holes,
    Lj_mm: Lj,
    beta_Lf: bLf,
    beta_p: bp,
    smallHole: small,
    inSmallHoles: d <= 14 && clearance >= 2 - 1e-9,
    alpha_v: av,
    A_mm2: A,
    bolt,
    FvPlane_N: Fv_Rd(av, bolt.fub_MPa, A, s.factors.gamma_M2) * bLf * bp * small,
    oneLineLap: singleLapOneLine(group, holes),
    across: holesAcross(holes),
  };
}

/** Shear planes that carry a plate's force into each bolt: one for a plate at a face of the stack, else all. */
export function planesCarrying(plate: PlatePiece, group: BoltGroupGeometry): number {
  const i = group.stack.indexOf(plate.id);
  return i === 0 || i === group.stack.length - 1 ? 1 : group.shearPlanes;
}

/**
 * Bolt shear of a bearing-type or Category B group: T ≤ n · Fv,Rd.
 * EN 1993-1-8, 3.6.1, Table 3.4, with 3.8 (βLf), 3.6.1(12) (βp) and 3.6.1(5) (0.85).
 * Fv,Rd = planes · αv · fub · A / γM2 · βLf · βp (N).
 */
export function boltShearCheck(joint: Joint, scenario: CheckableScenario, s: Ec3Settings, g: Ec3Group): StrengthCheck {
  const d = scenario.bolts.size_mm;
  const planes = g.group.shearPlanes;
  const perBolt = planes * g.FvPlane_N;
  const n = g.holes.length;
  const threads = scenario.bolts.threadsInShearPlanes;
  return strength({
    id: `bolt-shear:${g.group.id}`,
    kind: "bolt-shear",
    title: "Bolt shear",
    component: groupLabel(joint, g.group),
    citation: boltShearCitation(g.beta_Lf < 1, g.beta_p < 1, g.smallHole !== 1),
    formula: "T ≤ n·Fv,Rd;  Fv,Rd = planes · αv·fub·A/γM2 · βLf·βp",
    substituted: () =>
      `Fv,Rd = ${planes} × ${g.alpha_v} × ${g.bolt.fub_MPa} × ${f(g.A_mm2)} / ${f(s.factors.gamma_M2, 2)} × ${f(g.beta_Lf, 3)} × ${f(g.beta_p, 3)}` +
      (g.smallHole !== 1 ? ` × ${g.smallHole}` : "") +
      ` = ${kN(perBolt, 2)};  n·Fv,Rd = ${n} × ${kN(perBolt, 2)} = ${kN(n * perBolt)}`,
    limitState: "ULS",
    demand_N: scenario.load.factoredTension_N,
    resistance_N: n * perBolt,
    loadRatio: 1,
    notes: () => [
      `fub = ${g.bolt.fub_MPa} MPa (${g.bolt.source}); A = ${threads ? `As = ${f(g.A_mm2)} mm² (threads in the shear planes), αv = ${g.alpha_v}` : `π d²/4 = ${f(g.A_mm2)} mm² (shank in the shear planes), αv = 0.6`}`,
      `Lj = ${f(g.Lj_mm)} mm ${g.Lj_mm > 15 * d ? `> 15d = ${f(15 * d)} mm: βLf = 1 − (${f(g.Lj_mm)} − ${f(15 * d)})/(200 × ${d}) = ${f(g.beta_Lf, 3)} (limits 0.75–1.0)` : `≤ 15d = ${f(15 * d)} mm: βLf = 1.0`}`,
      g.group.packing_mm > d / 3
        ? `packing tp = ${f(g.group.packing_mm)} mm > d/3: βp = 9 × ${d}/(8 × ${d} + 3 × ${f(g.group.packing_mm)}) = ${f(g.beta_p, 3)}`
        : `packing ${f(g.group.packing_mm)} mm ≤ d/3 = ${f(d / 3)} mm: βp = 1.0`,
      ...(g.smallHole !== 1 ? [`M${d} class ${scenario.bolts.propertyClass} in 2 mm clearance holes: Fv,Rd × 0.85 (3.6.1(5))`] : []),
    ],
  });
}

/** One bolt's bearing on one plate, from its coordinates. */
export interface BoltBearing {
  hole: Hole;
  /** End bolt (no bolt ahead toward the plate end in its strip): αd from e1; else from p1. */
  end: boolean;
  /** e1 (end bolt) or p1 (inner bolt), mm. */
  along_mm: number;
  alpha_d: number;
  alpha_b: number;
  /** Edge bolt (no bolt between it and a side edge): k1 from e2 and p2; else from p2. */
  edge: boolean;
  e2_mm: number;
  p2_mm: number | null;
  k1: number;
  d0_mm: number;
  Fb_N: number;
  /** Limited to 1.5 fu d t / γM2 (3.6.1(10)). */
  limited: boolean;
}

/** Whether a group is a single lap joint with one transverse line of bolts (3.6.1(10)). */
export function singleLapOneLine(g: BoltGroupGeometry, holes: readonly Hole[]): boolean {
  if (g.shearPlanes !== 1 || holes.length === 0) return false;
  const x0 = holes[0]!.x_mm;
  return holes.every((h) => Math.abs(h.x_mm - x0) <= LINE_TOLERANCE_MM);
}

/**
 * Each hole's neighbours across the force within its group, for k1 of Table 3.4: whether a hole of
 * another gauge line lies below it (smaller y) and above it, and the distance p2 to the nearest other
 * gauge line. They depend on the group's holes alone, so a group measures them once for every plate.
 */
export interface HolesAcross {
  below: boolean[];
  above: boolean[];
  /** Distance to the nearest other gauge line, mm (Infinity: none). */
  p2_mm: number[];
}

/**
 * The neighbours across the force of every hole of a group, in the group's order (Table 3.4, k1),
 * measured against the group's distinct hole ordinates y (holes of equal y add nothing to "is there a
 * line below/above" or to the least distance to another line).
 */
export function holesAcross(holes: readonly Hole[]): HolesAcross {
  const ys: number[] = [];
  for (const h of holes) if (!ys.includes(h.y_mm)) ys.push(h.y_mm);
  const across: HolesAcross = { below: [], above: [], p2_mm: [] };
  for (const h of holes) {
    let below = false;
    let above = false;
    let p2 = Infinity;
    for (const y of ys) {
      const dy = y - h.y_mm;
      if (Math.abs(dy) <= LINE_TOLERANCE_MM) continue;
      if (dy < 0) below = true;
      else above = true;
      p2 = Math.min(p2, Math.abs(dy));
    }
    across.below.push(below);
    across.above.push(above);
    across.p2_mm.push(p2);
  }
  return across;
}

/**
 * Fb,Rd of every bolt of a group on one plate, each from its own coordinates.
 * EN 1993-1-8, Table 3.4: αb from the end distance e1 (end bolts) or the pitch p1 to the bolt ahead in
 * its strip (inner bolts) toward the plate end it bears on; k1 from the edge distance e2 and the
 * distance p2 to the nearest other gauge line (edge bolts: on an outermost gauge line) or from p2 alone
 * (inner bolts); the limit of 3.6.1(10) for single lap joints with one transverse line.
 */
export function boltBearings(
  holes: readonly Hole[],
  connection: PlateConnection,
  plate: PlatePiece,
  scenario: CheckableScenario,
  s: Ec3Settings,
  oneLineLap: boolean,
  across: HolesAcross = holesAcross(holes),
): BoltBearing[] {
  const { bolts } = scenario;
  const d = bolts.size_mm;
  const fub = boltStrength(bolts.propertyClass, d).fub_MPa;
  const fu = plate.fu_MPa;
  const t = plate.spec.thickness_mm;
  const gM2 = s.factors.gamma_M2;
  const factor = bearingHoleFactor(bolts.hole, bolts.slotDirection);
  const half = plate.spec.width_mm / 2;
  const cap = oneLineLap ? singleLapLimit(fu, d, t, gM2) : Infinity;
  const out: BoltBearing[] = [];
  // forEachTearOut visits the holes in their order: the i-th visit is holes[i].
  let i = 0;
  forEachTearOut(holes, connection, (h, toEnd_mm, toHoleAhead_mm) => {
    const d0 = holeWidth(h);
    const end = toHoleAhead_mm === null;
    const along = end ? toEnd_mm - (h.along_mm - d0) / 2 : toHoleAhead_mm;
    const ad = end ? alpha_d_end(along, d0) : alpha_d_inner(along, d0);
    const below = across.below[i]!;
    const above = across.above[i]!;
    const p2 = across.p2_mm[i]!;
    i++;
    const reach = (h.across_mm - d0) / 2;
    const e2 = Math.min(below ? Infinity : half + h.y_mm - reach, above ? Infinity : half - h.y_mm - reach);
    const p2v = Number.isFinite(p2) ? p2 : null;
    const edge = !below || !above;
    const k1 = edge ? k1_edge(e2, p2v, d0) : k1_inner(p2, d0);
    const ab = alpha_b(ad, fub, fu);
    const Fb = Fb_Rd(k1, ab, fu, d, t, gM2, factor);
    out.push({ hole: h, end, along_mm: along, alpha_d: ad, alpha_b: ab, edge, e2_mm: e2, p2_mm: p2v, k1, d0_mm: d0, Fb_N: Math.min(Fb, cap), limited: Fb > cap });
  });
  return out;
}

/** One group's bearings on one plate, with what they were measured from. */
interface MeasuredBearings {
  g: Ec3Group;
  connection: PlateConnection;
  fu_MPa: number;
  thickness_mm: number;
  width_mm: number;
  each: BoltBearing[];
}

/**
 * What the checks of one joint check (one call of checkJoint, one joint) measure on its plates, each
 * measured once and handed again to the next plate with the same numbers: a group's Fb,Rd on a plate
 * (the same group toward the same end in a plate of the same fu, t and width: both covers of a butt
 * splice; the bearing check and the small-hole condition), and the governing tear-out block (the same
 * block shapes in a plate of the same t, fy, fu and force share: both covers, and the two main plates,
 * whose groups are mirror images). Made afresh for every check: nothing is kept between calls.
 */
export class JointMeasures {
  readonly #bearings: MeasuredBearings[] = [];
  readonly #blocks: GoverningBlocksOfCall<null>;
  constructor(
    private readonly scenario: CheckableScenario,
    private readonly s: Ec3Settings,
  ) {
    const { gamma_M0, gamma_M2 } = s.factors;
    this.#blocks = new GoverningBlocksOfCall<null>((shapes, bolts, t, fy, fu, share, load) =>
      governingBlock(shapes, bolts, share, load, (shape) => Veff_1_Rd(shape.tensionNet_mm * t, shape.shearNet_mm * t, fy, fu, gamma_M0, gamma_M2), () => null),
    );
  }

  /** Fb,Rd of every bolt of group g on the plate, toward the end of `connection`. */
  bearingsOf(plate: PlatePiece, connection: PlateConnection, g: Ec3Group): BoltBearing[] {
    const fu = plate.fu_MPa;
    const t = plate.spec.thickness_mm;
    const width = plate.spec.width_mm;
    for (const m of this.#bearings) {
      if (m.g === g && sameEnd(m.connection, connection) && m.fu_MPa === fu && m.thickness_mm === t && m.width_mm === width) return m.each;
    }
    const each = boltBearings(g.holes, connection, plate, this.scenario, this.s, g.oneLineLap, g.across);
    this.#bearings.push({ g, connection, fu_MPa: fu, thickness_mm: t, width_mm: width, each });
    return each;
  }

  /**
   * The block shapes of a group's holes in the plate toward the end of `connection`, and the governing
   * one by 3.10.2(2), Veff,1,Rd (null: no shape forms), once per call for the same shapes and figures.
   */
  blockOf(plate: PlatePiece, connection: PlateConnection, holes: readonly Hole[], jointHoles: readonly Hole[]): { shapes: readonly BlockShape[]; best: GoverningBlock<null> | null } {
    const shapes = blockShapes(holes, connection, plate.spec.width_mm, jointHoles);
    const best = this.#blocks.of(shapes, holes.length, plate.spec.thickness_mm, plate.fy_MPa, plate.fu_MPa, plate.forceShare, this.scenario.options.blockShearLoad);
    return { shapes, best };
  }
}

function bearingText(b: BoltBearing, fub: number, fu: number, d: number, t: number, gM2: number, factor: number): string {
  const aTerm = b.end ? `e1/3d0 = ${f(b.along_mm)}/(3 × ${f(b.d0_mm)}) = ${f(b.alpha_d, 3)}` : `p1/3d0 − 1/4 = ${f(b.along_mm)}/(3 × ${f(b.d0_mm)}) − 0.25 = ${f(b.alpha_d, 3)}`;
  const eTerm = b.edge ? `2.8e2/d0 − 1.7 = 2.8 × ${f(b.e2_mm)}/${f(b.d0_mm)} − 1.7 = ${f(2.8 * b.e2_mm / b.d0_mm - 1.7, 3)}, ` : "";
  const pTerm = b.p2_mm === null ? "" : `1.4p2/d0 − 1.7 = 1.4 × ${f(b.p2_mm)}/${f(b.d0_mm)} − 1.7 = ${f(1.4 * b.p2_mm / b.d0_mm - 1.7, 3)}, `;
  return (
    `bolt ${b.hole.id} (${b.end ? "end" : "inner"}, ${b.edge ? "edge" : "inner"}): αb = min(${aTerm}, fub/fu = ${fub}/${fu} = ${f(fub / fu, 3)}, 1) = ${f(b.alpha_b, 3)}; ` +
    `k1 = min(${eTerm}${pTerm}2.5) = ${f(b.k1, 3)}; Fb,Rd = ${f(b.k1, 3)} × ${f(b.alpha_b, 3)} × ${fu} × ${d} × ${f(t)}${factor !== 1 ? ` × ${factor}` : ""} / ${f(gM2, 2)}` +
    (b.limited ? ` → limited to 1.5·fu·d·t/γM2 = ${kN(b.Fb_N, 2)}` : ` = ${kN(b.Fb_N, 2)}`)
  );
}

/**
 * Bearing of one group's bolts on one plate: plate force ≤ the group's bearing resistance.
 * EN 1993-1-8, 3.6.1, Table 3.4 (Fb,Rd per bolt), 3.6.1(10) (single lap, one transverse line) and 3.7
 * (group: ΣFb,Rd, or n × the least resistance where some Fv,Rd < Fb,Rd).
 */
export function bearingCheck(
  joint: Joint,
  scenario: CheckableScenario,
  s: Ec3Settings,
  plate: PlatePiece,
  connection: PlateConnection,
  g: Ec3Group,
  measures: JointMeasures = new JointMeasures(scenario, s),
): StrengthCheck {
  const { bolts } = scenario;
  const d = bolts.size_mm;
  const oneLine = g.oneLineLap;
  const each = measures.bearingsOf(plate, connection, g);
  const planes = planesCarrying(plate, g.group);
  const Fv = planes * g.FvPlane_N;
  // The least bolt (the first of equal ones) and ΣFb,Rd, in one pass over the bolts.
  const Fb: number[] = [];
  let least = each[0]!;
  let sum = 0;
  for (const b of each) {
    Fb.push(b.Fb_N);
    if (b.Fb_N < least.Fb_N) least = b;
    sum += b.Fb_N;
  }
  const group = groupResistance(Fb, Fv);
  const T = scenario.load.factoredTension_N;
  const fub = g.bolt.fub_MPa;
  const t = plate.spec.thickness_mm;
  const factor = bearingHoleFactor(bolts.hole, bolts.slotDirection);
  const side = joint.spliceType === "lap" ? "" : `, side ${connection.group}`;
  return strength({
    id: `bearing:${plate.id}:${connection.group}`,
    kind: "bolt-bearing",
    title: "Bolt bearing (group)",
    component: `${plate.label}${side}`,
    citation: oneLine ? BEARING_ONE_LINE_CITATION : BEARING_CITATION,
    formula: "F ≤ ΣFb,Rd if every Fv,Rd ≥ Fb,Rd, else n·min(Fv,Rd, Fb,Rd);  Fb,Rd = k1·αb·fu·d·t / γM2",
    substituted: () =>
      `least ${bearingText(least, fub, plate.fu_MPa, d, t, s.factors.gamma_M2, factor)};  ΣFb,Rd over ${each.length} bolts = ${kN(sum)};  ` +
      `Fv,Rd = ${kN(Fv, 2)} (${planes} plane${planes > 1 ? "s" : ""}) ` +
      (group.rule === "sum" ? `≥ every Fb,Rd → ΣFb,Rd = ${kN(group.resistance_N)}` : `< some Fb,Rd → ${each.length} × ${kN(group.resistance_N / each.length, 2)} = ${kN(group.resistance_N)}`) +
      (plate.forceShare !== 1 ? `;  F = ${f(plate.forceShare, 3)} × T` : ""),
    limitState: "ULS",
    demand_N: T * plate.forceShare,
    resistance_N: group.resistance_N,
    loadRatio: plate.forceShare,
    notes: () => [
      `Fb,Rd per bolt: ${each.map((b) => `${b.hole.id} ${f(b.Fb_N / 1000, 1)}`).join(", ")} kN`,
      ...(factor !== 1 ? [`bearing × ${factor} for ${bolts.hole} holes (Table 3.4, note 1)`] : []),
      ...(oneLine ? ["single lap joint with one transverse line of bolts: Fb,Rd ≤ 1.5·fu·d·t/γM2, washers under head and nut (3.6.1(10))"] : []),
    ],
  });
}

/**
 * M12/M14 bolts in 2 mm clearance holes are allowed only where bearing governs: bolt by bolt, on every
 * plate the group joins, the design bearing resistance Fb,Rd must not exceed the design shear resistance
 * Fv,Rd (× 0.85 for 4.8–10.9) of the planes that carry that plate's force into the bolt — the comparison
 * 3.7 makes fastener by fastener. EN 1993-1-8, 3.6.1(5) (the condition's wording from memory: "the design
 * resistance of the bolt group based on bearing is less than or equal to that based on bolt shear"; taken
 * bolt by bolt, the reading that refuses more). The check limits no load (load ratio 0): it passes or
 * fails the layout. Demand is the worst bolt's Fb,Rd, resistance its Fv,Rd.
 */
export function smallHoleConditionCheck(joint: Joint, scenario: CheckableScenario, s: Ec3Settings, g: Ec3Group, measures: JointMeasures = new JointMeasures(scenario, s)): StrengthCheck {
  let worst: { bearing: BoltBearing; shear_N: number; plate: PlatePiece } | null = null;
  for (const plate of joint.plates) {
    if (plate.role === "packing") continue;
    for (const c of plate.connections) {
      if (c.group !== g.group.id) continue;
      const shear = planesCarrying(plate, g.group) * g.FvPlane_N;
      for (const b of measures.bearingsOf(plate, c, g)) {
        if (!worst || b.Fb_N / shear > worst.bearing.Fb_N / worst.shear_N) worst = { bearing: b, shear_N: shear, plate };
      }
    }
  }
  const w = worst!;
  const d = scenario.bolts.size_mm;
  const holds = w.bearing.Fb_N <= w.shear_N * (1 + 1e-9);
  return strength({
    id: `small-bolt-holes:${g.group.id}`,
    kind: "bolt-bearing",
    title: `M${d} in 2 mm clearance holes: bearing must govern`,
    component: groupLabel(joint, g.group),
    citation: SMALL_HOLES_CITATION,
    formula: "every bolt, every plate: Fb,Rd ≤ Fv,Rd (× 0.85) of the planes carrying that plate",
    substituted: () =>
      `worst: bolt ${w.bearing.hole.id} on ${w.plate.label}: Fb,Rd = ${kN(w.bearing.Fb_N, 2)} ${holds ? "≤" : ">"} Fv,Rd = ${kN(w.shear_N, 2)}` +
      (holds ? " → bearing governs every bolt" : " → shear would govern: 2 mm clearance holes are not allowed here"),
    limitState: "ULS",
    demand_N: w.bearing.Fb_N,
    resistance_N: w.shear_N,
    loadRatio: 0,
    notes: () => [
      "a condition on the layout: it sets no load",
      ...(holds ? [] : [`use normal clearance holes for M${d} (options.small_bolt_clearance: 1, EN 1090-2 Table 11), thinner plies, or a bolt that bears`]),
    ],
  });
}

/**
 * Slip resistance of a preloaded group: Category B at the service load (γM3,ser), Category C at the
 * factored load (γM3). EN 1993-1-8, 3.9.1, Tables 3.6 (ks) and 3.7 (μ); Table 3.2 (categories).
 * F ≤ n · Fs,Rd;  Fs,Rd = ks·nf·μ·Fp,C / γM3;  Fp,C = 0.7·fub·As.
 */
export function slipCheck(joint: Joint, scenario: CheckableScenario, s: Ec3Settings, g: Ec3Group): StrengthCheck {
  const { bolts, load } = scenario;
  const As = boltNetArea_mm2(bolts.size_mm, "iso-stress-area");
  const FpC = Fp_C(g.bolt.fub_MPa, As);
  const mu = bolts.slipFactor ?? 0;
  const nf = g.group.shearPlanes;
  const k = ks(bolts.hole, bolts.slotDirection);
  const service = s.category === "B";
  const gamma = service ? s.factors.gamma_M3_ser : s.factors.gamma_M3;
  const perBolt = Fs_Rd(k, nf, mu, FpC, gamma);
  const n = g.holes.length;
  const demand = service ? (load.serviceTension_N ?? load.factoredTension_N) : load.factoredTension_N;
  return strength({
    id: `slip:${g.group.id}`,
    kind: "slip",
    title: service ? "Slip resistance at service load (Category B)" : "Slip resistance at factored load (Category C)",
    component: groupLabel(joint, g.group),
    citation: SLIP_CITATION,
    formula: service ? "F ≤ n·Fs,Rd,ser;  Fs,Rd,ser = ks·n·μ·Fp,C / γM3,ser;  Fp,C = 0.7·fub·As" : "F ≤ n·Fs,Rd;  Fs,Rd = ks·n·μ·Fp,C / γM3;  Fp,C = 0.7·fub·As",
    substituted: () =>
      `Fp,C = 0.7 × ${g.bolt.fub_MPa} × ${f(As)} = ${kN(FpC, 2)};  Fs,Rd = ${k} × ${nf} × ${f(mu, 2)} × ${kN(FpC, 2)} / ${f(gamma, 2)} = ${kN(perBolt, 2)};  ` +
      `${n} × ${kN(perBolt, 2)} = ${kN(n * perBolt)}`,
    limitState: service ? "SLS" : "ULS",
    demand_N: demand,
    resistance_N: n * perBolt,
    loadRatio: service ? demand / load.factoredTension_N : 1,
    notes: () => [service ? "Category B: demand is the service tension (load.service_tension)" : "Category C: demand is the factored tension", `ks = ${k} for ${bolts.hole} holes (Table 3.6)`],
  });
}

function shareText(plate: PlatePiece): string {
  return plate.forceShare !== 1 ? `;  F = ${f(plate.forceShare, 3)} × T (covers share by area)` : "";
}

/**
 * Gross-section yield of a plate, F ≤ Npl,Rd = A·fy/γM0.
 * EN 1993-1-1, 6.2.3(2)a, equation (6.6).
 */
export function grossYieldCheck(scenario: CheckableScenario, s: Ec3Settings, plate: PlatePiece): StrengthCheck {
  const { width_mm: b, thickness_mm: t } = plate.spec;
  const R = Npl_Rd(b * t, plate.fy_MPa, s.factors.gamma_M0);
  return strength({
    id: `gross-yield:${plate.id}`,
    kind: "gross-yield",
    title: "Gross-section yield",
    component: plate.label,
    citation: GROSS_YIELD_CITATION,
    formula: "F ≤ Npl,Rd = A·fy / γM0",
    substituted: () => `Npl,Rd = ${f(b)} × ${f(t)} × ${plate.fy_MPa} / ${f(s.factors.gamma_M0, 2)} = ${kN(R)}` + shareText(plate),
    limitState: "ULS",
    demand_N: scenario.load.factoredTension_N * plate.forceShare,
    resistance_N: R,
    loadRatio: plate.forceShare,
    notes: () => [plate.materialNote],
  });
}

/**
 * Net section of a plate over the least net path, straight or staggered.
 * EN 1993-1-1, 6.2.3(2)b, equation (6.7): F ≤ Nu,Rd = 0.9·Anet·fu/γM2; Category C connections
 * 6.2.3(4), equation (6.8): F ≤ Nnet,Rd = Anet·fy/γM0. Anet by 6.2.2.2: (b − Σd0 + Σ s²/4p)·t, the least
 * of every path (with options.net_section_load "transferred", the path of highest demand/resistance,
 * each carrying the load its plate has not yet passed to bolts ahead of it).
 */
export function netSectionCheck(joint: Joint, scenario: CheckableScenario, s: Ec3Settings, plate: PlatePiece): StrengthCheck {
  const { width_mm: b, thickness_mm: t } = plate.spec;
  const holes = holesOfPlate(joint, plate);
  const transferred = scenario.options.netSectionLoad === "transferred";
  const { path, fraction } = netPathFor(plate, holes, scenario.options.netSectionLoad);
  const Anet = path.netWidth_mm * t;
  const catC = s.category === "C";
  const R = catC ? Nnet_Rd(Anet, plate.fy_MPa, s.factors.gamma_M0) : Nu_Rd(Anet, plate.fu_MPa, s.factors.gamma_M2);
  const ratio = plate.forceShare * fraction;
  const resistance = () => catC ? `Nnet,Rd = ${f(Anet)} × ${plate.fy_MPa} / ${f(s.factors.gamma_M0, 2)}` : `Nu,Rd = 0.9 × ${f(Anet)} × ${plate.fu_MPa} / ${f(s.factors.gamma_M2, 2)}`;
  return strength({
    id: `net-section:${plate.id}`,
    kind: "net-section",
    title: catC ? "Net section (Category C)" : "Net-section rupture",
    component: plate.label,
    citation: catC ? NET_CATEGORY_C_CITATION : NET_CITATION,
    formula: transferred ? (catC ? NET_FORMULA_TRANSFERRED_C : NET_FORMULA_TRANSFERRED) : catC ? NET_FORMULA_C : NET_FORMULA,
    substituted: () =>
      `${transferred ? "governing" : "least"} path ${pathLabel(path)}: Anet = (${f(b)} − ${f(path.holeDeduction_mm)} + ${f(path.staggerAddition_mm)}) × ${f(t)} = ${f(Anet)} mm²;  ` +
      `${resistance()} = ${kN(R)}` +
      (transferred ? `;  load still in the plate at this path: ${f(fraction, 3)} of its force` : "") +
      shareText(plate),
    limitState: "ULS",
    demand_N: scenario.load.factoredTension_N * ratio,
    resistance_N: R,
    loadRatio: ratio,
    notes: () => [`path searched over every straight and staggered route through ${holes.length} holes`],
  });
}

/**
 * Block tearing of a plate for one bolt group: the governing shape of all that can form.
 * EN 1993-1-8, 3.10.2(2), equation (3.9), concentric loading: Veff,1,Rd = fu·Ant/γM2 + (1/√3)·fy·Anv/γM0.
 * A block holding k of the group's n bolts carries k/n of the plate's force (options.block_shear_load:
 * share), or the whole plate force (full); the check reports the joint tension the block permits.
 */
export function blockTearingCheck(
  joint: Joint,
  scenario: CheckableScenario,
  s: Ec3Settings,
  plate: PlatePiece,
  connection: PlateConnection,
  measures: JointMeasures = new JointMeasures(scenario, s),
): StrengthCheck | null {
  const holes = groupHoles(joint, connection.group);
  const { shapes, best } = measures.blockOf(plate, connection, holes, joint.holes);
  const t = plate.spec.thickness_mm;
  const { gamma_M0, gamma_M2 } = s.factors;
  const load = scenario.options.blockShearLoad;
  if (!best) return null;
  const { shape: b, value_N: R, ratio } = best;
  const side = joint.spliceType === "lap" ? "" : `, side ${connection.group}`;
  return strength({
    id: `block-shear:${plate.id}:${connection.group}`,
    kind: "block-shear",
    title: "Block tearing",
    component: `${plate.label}${side}`,
    citation: BLOCK_CITATION,
    formula: load === "full" ? BLOCK_FORMULA_FULL : BLOCK_FORMULA_SHARE,
    substituted: () =>
      `${b.description} (${b.boltsInBlock} of ${holes.length} bolts): Ant = ${f(b.tensionNet_mm)} × ${f(t)} = ${f(b.tensionNet_mm * t)} mm², ` +
      `Anv = ${f(b.shearNet_mm)} × ${f(t)} = ${f(b.shearNet_mm * t)} mm²;  Veff,1,Rd = R = ${plate.fu_MPa} × ${f(b.tensionNet_mm * t)}/${f(gamma_M2, 2)} + ${plate.fy_MPa} × ${f(b.shearNet_mm * t)}/(√3 × ${f(gamma_M0, 2)}) = ${kN(R)};  ` +
      blockLoadText(best, holes.length, plate.forceShare, load, (n) => kN(n)),
    limitState: "ULS",
    demand_N: scenario.load.factoredTension_N * ratio,
    resistance_N: R,
    loadRatio: ratio,
    notes: () => [`governing of ${shapes.length} block shapes`],
  });
}
