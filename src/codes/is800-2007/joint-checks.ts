/**
 * IS 800:2007 checks of a splice, run on the joint's hole coordinates.
 * Each function returns results (data); none prints, none throws for a failed check.
 */
import { boltMaterial, boltNetArea_mm2, shankArea_mm2 } from "../../catalogue/bolts.js";
import { blockLoadText, blockShapes, governingBlock, GoverningBlocksOfCall, type BlockShape, type BlockShearLoad, type GoverningBlock } from "../../geometry/block-shear.js";
import { groupHoles, holesOfPlate, sameEnd } from "../../geometry/joint-builder.js";
import { jointLength_mm } from "../../geometry/lines.js";
import { netPathFor, pathLabel } from "../../geometry/net-section.js";
import { forEachTearOut } from "../../geometry/tear-out.js";
import type { BoltGroupGeometry, Hole, Joint, PlateConnection, PlatePiece } from "../../model/joint.js";
import type { Citation, StrengthCheck, Warning } from "../../model/results.js";
import { mapped } from "../../model/lists.js";
import type { CheckableScenario } from "../../model/scenario.js";
import { strength } from "../check-builders.js";
import { f, kN } from "../format.js";
import { kb as kbFactor, Vdpb } from "./bearing.js";
import { beta_lg, beta_lj, beta_pkg, Vdsb } from "./bolt-shear.js";
import { fixedCl } from "./citation.js";
import { PARTIAL_FACTORS } from "./factors.js";
import { bearingHoleFactor, holeFactorKh } from "./holes.js";
import { F0, Vdsf } from "./slip.js";
import { Tdb, Tdb1_N, Tdb2_N, Tdg, Tdn, type BlockShearResult } from "./tension-member.js";

/** The citations of the checks below, made once (frozen; results share them). */
const BEARING_CITATION = fixedCl("10.3.4");
const SLIP_CITATION = fixedCl("10.4.3", { table: "Table 20", also: ["Table 5 for γmf"] });
/** Slip of a long joint: βlj applied to slip resistance too (cl. 10.3.3.1). */
const SLIP_CITATION_LONG_JOINT = fixedCl("10.4.3", { table: "Table 20", also: ["Table 5 for γmf", "10.3.3.1 for βlj"] });
const GROSS_YIELD_CITATION = fixedCl("6.2");
const NET_SECTION_CITATION = fixedCl("6.3.1");
const BLOCK_SHEAR_CITATION = fixedCl("6.4.1");

export interface GroupFactors {
  group: BoltGroupGeometry;
  holes: readonly Hole[];
  lj_mm: number;
  beta_lj: number;
  beta_lg: number;
  beta_pkg: number;
}

export function groupLabel(joint: Joint, group: BoltGroupGeometry): string {
  return joint.spliceType === "lap" ? "bolts" : `bolts, side ${group.id}`;
}

/** Reduction factors of one bolt group, from its hole coordinates (cl. 10.3.3.1–10.3.3.3). */
export function groupFactors(joint: Joint, group: BoltGroupGeometry): GroupFactors {
  const d = joint.boltDiameter_mm;
  const holes = groupHoles(joint, group.id);
  const lj = jointLength_mm(holes);
  const blj = beta_lj(lj, d);
  return {
    group,
    holes,
    lj_mm: lj,
    beta_lj: blj,
    beta_lg: beta_lg(group.grip_mm, d, blj),
    beta_pkg: beta_pkg(group.packing_mm),
  };
}

/**
 * Bolt shear of a bearing-type group: T ≤ n · Vdsb.
 * IS 800:2007, cl. 10.3.2 and 10.3.3 (with 10.3.3.1–10.3.3.3).
 */
export function boltShearCheck(joint: Joint, scenario: CheckableScenario, gf: GroupFactors): StrengthCheck {
  const { bolts, options } = scenario;
  const d = bolts.size_mm;
  const mat = boltMaterial(bolts.propertyClass, d, options.boltStrength);
  const Anb = boltNetArea_mm2(d, options.boltNetArea);
  const Asb = shankArea_mm2(d);
  const planes = gf.group.shearPlanes;
  const nn = bolts.threadsInShearPlanes ? planes : 0;
  const ns = planes - nn;
  const perBolt = Vdsb({ fub_MPa: mat.fub_MPa, nn, ns, Anb_mm2: Anb, Asb_mm2: Asb, beta_lj: gf.beta_lj, beta_lg: gf.beta_lg, beta_pkg: gf.beta_pkg });
  const n = gf.holes.length;
  const T = scenario.load.factoredTension_N;
  const notes = () => [
    `fub = ${mat.fub_MPa} MPa (${mat.source})`,
    `Anb = ${f(Anb)} mm² (${options.boltNetArea === "0.78-gross" ? "0.78 × π d²/4, the design-aid approximation of the net area at the threads" : "ISO 898-1 stress area"}), Asb = π d²/4 = ${f(Asb)} mm²`,
    `lj = ${f(gf.lj_mm)} mm ${gf.lj_mm > 15 * d ? `> 15d = ${f(15 * d)} mm: βlj = 1.075 − 0.005 × ${f(gf.lj_mm)}/${d} = ${f(gf.beta_lj, 3)} (limits 0.75–1.0)` : `≤ 15d = ${f(15 * d)} mm: βlj = 1.0`}`,
    `lg = ${f(gf.group.grip_mm)} mm ${gf.group.grip_mm > 5 * d ? `> 5d: βlg = min(8/(3 + lg/d), βlj) = ${f(gf.beta_lg, 3)}` : `≤ 5d = ${f(5 * d)} mm: βlg = 1.0`}`,
    gf.group.packing_mm > 6
      ? `packing ${f(gf.group.packing_mm)} mm > 6 mm: βpkg = 1 − 0.0125 × ${f(gf.group.packing_mm)} = ${f(gf.beta_pkg, 3)}`
      : `packing ${f(gf.group.packing_mm)} mm ≤ 6 mm: βpkg = 1.0`,
  ];
  return strength({
    id: `bolt-shear:${gf.group.id}`,
    kind: "bolt-shear",
    title: "Bolt shear",
    component: groupLabel(joint, gf.group),
    citation: boltShearCitation(gf),
    formula: "T ≤ n·Vdsb;  Vdsb = fub/√3 · (nn·Anb + ns·Asb) · βlj·βlg·βpkg / γmb",
    substituted: () =>
      `Vdsb = ${mat.fub_MPa}/√3 × (${nn} × ${f(Anb)} + ${ns} × ${f(Asb)}) × ${f(gf.beta_lj, 3)} × ${f(gf.beta_lg, 3)} × ${f(gf.beta_pkg, 3)} / ${PARTIAL_FACTORS.gamma_mb}` +
      ` = ${kN(perBolt, 2)};  n·Vdsb = ${n} × ${kN(perBolt, 2)} = ${kN(n * perBolt)}`,
    limitState: "ULS",
    demand_N: T,
    resistance_N: n * perBolt,
    loadRatio: 1,
    notes,
  });
}

/**
 * Bolt shear's citation: cl. 10.3.3 with the reduction clauses it applies (cited only when they
 * reduce), one frozen citation for each of the eight combinations of βlj, βlg and βpkg.
 */
const BOLT_SHEAR_CITATIONS = mapped([0, 1, 2, 3, 4, 5, 6, 7], (reduces) => {
  const also: string[] = [];
  if (reduces & 1) also.push("10.3.3.1 (βlj)");
  if (reduces & 2) also.push("10.3.3.2 (βlg)");
  if (reduces & 4) also.push("10.3.3.3 (βpkg)");
  return fixedCl("10.3.3", also.length > 0 ? { also } : {});
});

/** The reduction clauses a group's bolt shear applies, in its citation. */
function boltShearCitation(gf: GroupFactors): Citation {
  return BOLT_SHEAR_CITATIONS[(gf.beta_lj < 1 ? 1 : 0) | (gf.beta_lg < 1 ? 2 : 0) | (gf.beta_pkg < 1 ? 4 : 0)]!;
}

/** The least end distance e and pitch p toward a plate end of one group's holes, and the largest d0 along (cl. 10.3.4). */
export interface TearOut {
  e_mm: number;
  p_mm: number;
  d0_mm: number;
}

/** e, p and d0 of one group's holes bearing toward one plate end, from coordinates. */
export function tearOutOf(holes: readonly Hole[], connection: PlateConnection): TearOut {
  let e = Infinity;
  let p = Infinity;
  let d0 = 0;
  forEachTearOut(holes, connection, (hole, toEnd_mm, toHoleAhead_mm) => {
    d0 = Math.max(d0, hole.along_mm);
    if (toHoleAhead_mm === null) e = Math.min(e, toEnd_mm);
    else p = Math.min(p, toHoleAhead_mm);
  });
  return { e_mm: e, p_mm: p, d0_mm: d0 };
}

/**
 * The tear-out measurements of one check's joint, each measured once and handed to every plate that
 * bears toward the same end with the same group (both cover plates of a butt splice). Made afresh for
 * each call (never kept between calls): the holes of a group are those of this joint.
 */
export class TearOuts {
  readonly #measured: { connection: PlateConnection; tearOut: TearOut }[] = [];
  constructor(private readonly joint: Joint) {}
  of(connection: PlateConnection): TearOut {
    for (const m of this.#measured) {
      const c = m.connection;
      if (sameEnd(c, connection)) return m.tearOut;
    }
    const tearOut = tearOutOf(groupHoles(this.joint, connection.group), connection);
    this.#measured.push({ connection, tearOut });
    return tearOut;
  }
}

/** kb from a group's tear-out measurements (cl. 10.3.4). */
function bearingFactorOf(t: TearOut, fub_MPa: number, fu_MPa: number) {
  return { e_mm: t.e_mm, p_mm: t.p_mm, d0_mm: t.d0_mm, kb: kbFactor(t.e_mm, t.p_mm, t.d0_mm, fub_MPa, fu_MPa) };
}

/** The e-term of kb in words: "e/3d0 = 40/(3 × 22) = 0.606", or "e: —" where no bolt bears on an end. */
function eTermText(b: { e_mm: number; d0_mm: number }): string {
  return Number.isFinite(b.e_mm) ? `e/3d0 = ${f(b.e_mm)}/(3 × ${f(b.d0_mm)}) = ${f(b.e_mm / (3 * b.d0_mm), 3)}` : "e: —";
}

/** The p-term of kb in words, or "p: no bolt behind another". */
function pTermText(b: { p_mm: number; d0_mm: number }): string {
  return Number.isFinite(b.p_mm) ? `p/3d0 − 0.25 = ${f(b.p_mm)}/(3 × ${f(b.d0_mm)}) − 0.25 = ${f(b.p_mm / (3 * b.d0_mm) - 0.25, 3)}` : "p: no bolt behind another";
}

/**
 * Bearing of one group's bolts on one plate: plate force ≤ n · Vdpb.
 * IS 800:2007, cl. 10.3.4. Each plate bears with its own kb (its own end distance and pitch toward its
 * own end); the cover plates of a double-cover splice are checked one by one against their share.
 */
export function bearingCheck(joint: Joint, scenario: CheckableScenario, plate: PlatePiece, connection: PlateConnection, tearOuts: TearOuts = new TearOuts(joint)): StrengthCheck {
  const { bolts, options } = scenario;
  const d = bolts.size_mm;
  const mat = boltMaterial(bolts.propertyClass, d, options.boltStrength);
  const holes = groupHoles(joint, connection.group);
  const b = bearingFactorOf(tearOuts.of(connection), mat.fub_MPa, plate.fu_MPa);
  const holeFactor = bearingHoleFactor(bolts.hole);
  const t = plate.spec.thickness_mm;
  const perBolt = Vdpb(b.kb, d, t, plate.fu_MPa, holeFactor);
  const n = holes.length;
  const T = scenario.load.factoredTension_N;
  const sideText = joint.spliceType === "lap" ? "" : `, side ${connection.group}`;
  return strength({
    id: `bearing:${plate.id}:${connection.group}`,
    kind: "bolt-bearing",
    title: "Bolt bearing",
    component: `${plate.label}${sideText}`,
    citation: BEARING_CITATION,
    formula: "F ≤ n·Vdpb;  Vdpb = 2.5·kb·d·t·fu / γmb;  kb = min(e/3d0, p/3d0 − 0.25, fub/fu, 1.0)",
    substituted: () =>
      `kb = min(${eTermText(b)}, ${pTermText(b)}, fub/fu = ${mat.fub_MPa}/${plate.fu_MPa} = ${f(mat.fub_MPa / plate.fu_MPa, 3)}, 1.0) = ${f(b.kb, 3)};  ` +
      `Vdpb = 2.5 × ${f(b.kb, 3)} × ${d} × ${f(t)} × ${plate.fu_MPa}${holeFactor !== 1 ? ` × ${holeFactor}` : ""} / ${PARTIAL_FACTORS.gamma_mb} = ${kN(perBolt, 2)};  ` +
      `n·Vdpb = ${n} × ${kN(perBolt, 2)} = ${kN(n * perBolt)}` +
      (plate.forceShare !== 1 ? `;  F = ${f(plate.forceShare, 3)} × T` : ""),
    limitState: "ULS",
    demand_N: T * plate.forceShare,
    resistance_N: n * perBolt,
    loadRatio: plate.forceShare,
    notes: () => holeFactor !== 1 ? [`bearing reduced by ${holeFactor} for ${bolts.hole} holes (cl. 10.3.4)`] : [],
  });
}

/**
 * Slip resistance of a friction-grip group: load ≤ n · Vdsf.
 * IS 800:2007, cl. 10.4.3. At service (γmf 1.10) against the service tension, or at ultimate (γmf 1.25)
 * against the factored tension.
 */
export function slipCheck(joint: Joint, scenario: CheckableScenario, gf: GroupFactors): StrengthCheck {
  const { bolts, options, load } = scenario;
  const d = bolts.size_mm;
  const mat = boltMaterial(bolts.propertyClass, d, options.boltStrength);
  const Anb = boltNetArea_mm2(d, options.boltNetArea);
  const proof = F0(Anb, mat.fub_MPa);
  const mu = bolts.slipFactor ?? 0;
  const ne = gf.group.shearPlanes;
  const Kh = holeFactorKh(bolts.hole, bolts.slotDirection);
  const slipAt = bolts.slipAt ?? "service";
  const perBolt = Vdsf(mu, ne, Kh, proof, slipAt, gf.beta_lj);
  const gamma = slipAt === "service" ? PARTIAL_FACTORS.gamma_mf_service : PARTIAL_FACTORS.gamma_mf_ultimate;
  const n = gf.holes.length;
  const demand = slipAt === "service" ? (load.serviceTension_N ?? load.factoredTension_N) : load.factoredTension_N;
  return strength({
    id: `slip:${gf.group.id}`,
    kind: "slip",
    title: slipAt === "service" ? "Slip resistance at service load" : "Slip resistance at factored load",
    component: groupLabel(joint, gf.group),
    citation: gf.beta_lj < 1 ? SLIP_CITATION_LONG_JOINT : SLIP_CITATION,
    formula: "F ≤ n·Vdsf;  Vdsf = μf·ne·Kh·F0·βlj / γmf;  F0 = 0.7·fub·Anb",
    substituted: () =>
      `F0 = 0.7 × ${mat.fub_MPa} × ${f(Anb)} = ${kN(proof, 2)};  Vdsf = ${f(mu, 2)} × ${ne} × ${Kh} × ${kN(proof, 2)} × ${f(gf.beta_lj, 3)} / ${gamma} = ${kN(perBolt, 2)};  ` +
      `n·Vdsf = ${n} × ${kN(perBolt, 2)} = ${kN(n * perBolt)}`,
    limitState: slipAt === "service" ? "SLS" : "ULS",
    demand_N: demand,
    resistance_N: n * perBolt,
    loadRatio: slipAt === "service" ? demand / load.factoredTension_N : 1,
    notes: () => [
      ...(slipAt === "service" ? ["service tension from load.service_tension"] : []),
      `μf = ${f(mu, 2)} (Table 20), γmf = ${gamma} (Table 5, slip at ${slipAt === "service" ? "service" : "the factored load"})`,
      `βlj = ${f(gf.beta_lj, 3)}: the long-joint factor of cl. 10.3.3.1 applied to slip resistance as well (from memory; the reading that refuses more)`,
    ],
  });
}

/**
 * Gross-section yield of a plate, F ≤ Tdg = Ag·fy/γm0.
 * IS 800:2007, cl. 6.2.
 */
export function grossYieldCheck(scenario: CheckableScenario, plate: PlatePiece): StrengthCheck {
  const { width_mm: b, thickness_mm: t } = plate.spec;
  const Ag = b * t;
  const R = Tdg(Ag, plate.fy_MPa);
  return strength({
    id: `gross-yield:${plate.id}`,
    kind: "gross-yield",
    title: "Gross-section yield",
    component: plate.label,
    citation: GROSS_YIELD_CITATION,
    formula: "F ≤ Tdg = Ag·fy / γm0",
    substituted: () => `Tdg = ${f(b)} × ${f(t)} × ${plate.fy_MPa} / ${PARTIAL_FACTORS.gamma_m0} = ${kN(R)}` + shareText(plate),
    limitState: "ULS",
    demand_N: scenario.load.factoredTension_N * plate.forceShare,
    resistance_N: R,
    loadRatio: plate.forceShare,
    notes: () => [plate.materialNote],
  });
}

function shareText(plate: PlatePiece): string {
  return plate.forceShare !== 1 ? `;  F = ${f(plate.forceShare, 3)} × T (covers share by area)` : "";
}

/**
 * Net-section rupture of a plate over the least net path (straight or zig-zag), F ≤ Tdn = 0.9·An·fu/γm1.
 * IS 800:2007, cl. 6.3.1. With options.net_section_load "full", the whole plate force on every path
 * (the clause as written); with "transferred", each path carries only what the plate has not yet passed
 * to bolts ahead of it (see governingNetPath), and the governing path has the highest demand/resistance.
 */
export function netSectionCheck(joint: Joint, scenario: CheckableScenario, plate: PlatePiece, holes: readonly Hole[] = holesOfPlate(joint, plate)): StrengthCheck {
  const { width_mm: b, thickness_mm: t } = plate.spec;
  const transferred = scenario.options.netSectionLoad === "transferred";
  const { path, fraction } = netPathFor(plate, holes, scenario.options.netSectionLoad);
  const An = path.netWidth_mm * t;
  const R = Tdn(An, plate.fu_MPa);
  const ratio = plate.forceShare * fraction;
  return strength({
    id: `net-section:${plate.id}`,
    kind: "net-section",
    title: "Net-section rupture",
    component: plate.label,
    citation: NET_SECTION_CITATION,
    formula: transferred
      ? "F·k/n ≤ Tdn = 0.9·An·fu / γm1;  An = (b − Σd0 + Σ s²/4g)·t; k = bolts not yet passed; highest F·k/n / Tdn over all paths"
      : "F ≤ Tdn = 0.9·An·fu / γm1;  An = (b − Σd0 + Σ s²/4g)·t, least over all paths",
    substituted: () =>
      `${transferred ? "governing" : "least"} path ${pathLabel(path)}: An = (${f(b)} − ${f(path.holeDeduction_mm)} + ${f(path.staggerAddition_mm)}) × ${f(t)} = ${f(An)} mm²;  ` +
      `Tdn = 0.9 × ${f(An)} × ${plate.fu_MPa} / ${PARTIAL_FACTORS.gamma_m1} = ${kN(R)}` +
      (transferred ? `;  load still in the plate at this path: ${f(fraction, 3)} of its force` : "") +
      shareText(plate),
    limitState: "ULS",
    demand_N: scenario.load.factoredTension_N * ratio,
    resistance_N: R,
    loadRatio: ratio,
    notes: () => [
      `path searched over every straight and zig-zag route through ${holes.length} holes`,
      ...(transferred ? ["net-section load: transferred (each path carries the load its plate has not yet passed to bolts ahead of it)"] : []),
    ],
  });
}

/**
 * The block shapes of one check's joint (blockShapes, which hands the same shapes to every plate end
 * with the same numbers), and the governing block of a set of shapes, worked out once for every plate
 * with the same shapes, bolts, t, fy, fu, share and load (both covers of a butt splice alike; the
 * mirror-image main plates). Made afresh for each call (never kept between calls).
 */
export class BlockShapesOf {
  readonly #governing = new GoverningBlocksOfCall(governingTdb);
  constructor(private readonly joint: Joint) {}
  of(connection: PlateConnection, width_mm: number): readonly BlockShape[] {
    return blockShapes(groupHoles(this.joint, connection.group), connection, width_mm, this.joint.holes);
  }
  /** The governing block of `shapes` in a plate of thickness t (governingBlock with cl. 6.4.1's Tdb), once per call for the same figures. */
  governing(shapes: readonly BlockShape[], bolts: number, t_mm: number, fy_MPa: number, fu_MPa: number, share: number, load: BlockShearLoad): GoverningBlock<BlockShearResult> | null {
    return this.#governing.of(shapes, bolts, t_mm, fy_MPa, fu_MPa, share, load);
  }
}

/** The governing block by cl. 6.4.1: every shape's Tdb as a number (no object per shape); the two terms of the governing one for its text. */
function governingTdb(shapes: readonly BlockShape[], bolts: number, t: number, fy: number, fu: number, share: number, load: BlockShearLoad): GoverningBlock<BlockShearResult> | null {
  const value = (shape: BlockShape) => Math.min(Tdb1_N(shape.shearGross_mm * t, shape.tensionNet_mm * t, fy, fu), Tdb2_N(shape.shearNet_mm * t, shape.tensionGross_mm * t, fy, fu));
  const resistance = (shape: BlockShape) => Tdb(shape.shearGross_mm * t, shape.shearNet_mm * t, shape.tensionGross_mm * t, shape.tensionNet_mm * t, fy, fu);
  return governingBlock(shapes, bolts, share, load, value, resistance);
}

/**
 * Block shear of a plate for one bolt group: the governing shape of all that can form.
 * IS 800:2007, cl. 6.4.1: Tdb = min(Avg·fy/(√3 γm0) + 0.9·Atn·fu/γm1, 0.9·Avn·fu/(√3 γm1) + Atg·fy/γm0).
 * A block holding k of the group's n bolts carries k/n of the plate's force (options.block_shear_load:
 * share), or the whole plate force (full); the check reports the joint tension the block permits.
 */
export function blockShearCheck(joint: Joint, scenario: CheckableScenario, plate: PlatePiece, connection: PlateConnection, shapesOf: BlockShapesOf = new BlockShapesOf(joint)): StrengthCheck | null {
  const holes = groupHoles(joint, connection.group);
  const shapes = shapesOf.of(connection, plate.spec.width_mm);
  const t = plate.spec.thickness_mm;
  const load = scenario.options.blockShearLoad;
  const best = shapesOf.governing(shapes, holes.length, t, plate.fy_MPa, plate.fu_MPa, plate.forceShare, load);
  if (!best) return null;
  const s = best.shape;
  const r = best.detail;
  const sideText = joint.spliceType === "lap" ? "" : `, side ${connection.group}`;
  return strength({
    id: `block-shear:${plate.id}:${connection.group}`,
    kind: "block-shear",
    title: "Block shear",
    component: `${plate.label}${sideText}`,
    citation: BLOCK_SHEAR_CITATION,
    formula: load === "full" ? BLOCK_SHEAR_FORMULA_FULL : BLOCK_SHEAR_FORMULA_SHARE,
    substituted: () =>
      `${s.description} (${s.boltsInBlock} of ${holes.length} bolts): Avg = ${f(s.shearGross_mm)} × ${f(t)} = ${f(s.shearGross_mm * t)}, ` +
      `Avn = ${f(s.shearNet_mm)} × ${f(t)} = ${f(s.shearNet_mm * t)}, Atg = ${f(s.tensionGross_mm)} × ${f(t)} = ${f(s.tensionGross_mm * t)}, ` +
      `Atn = ${f(s.tensionNet_mm)} × ${f(t)} = ${f(s.tensionNet_mm * t)} mm²;  Tdb1 = ${kN(r.Tdb1_N)}, Tdb2 = ${kN(r.Tdb2_N)}, Tdb = R = ${kN(r.Tdb_N)};  ` +
      blockLoadText(best, holes.length, plate.forceShare, load, (n) => kN(n)),
    limitState: "ULS",
    demand_N: scenario.load.factoredTension_N * best.ratio,
    resistance_N: r.Tdb_N,
    loadRatio: best.ratio,
    notes: () => [`governing of ${shapes.length} block shapes`],
  });
}

const BLOCK_SHEAR_FORMULA_FULL = "F ≤ Tdb = min(Avg·fy/(√3 γm0) + 0.9·Atn·fu/γm1,  0.9·Avn·fu/(√3 γm1) + Atg·fy/γm0)";
const BLOCK_SHEAR_FORMULA_SHARE = "F·k/n ≤ Tdb = min(Avg·fy/(√3 γm0) + 0.9·Atn·fu/γm1,  0.9·Avn·fu/(√3 γm1) + Atg·fy/γm0)";

/** Warnings about the joint's reductions (long joint, packing, eccentric single-shear splices). */
export function factorWarnings(joint: Joint, gfs: GroupFactors[]): Warning[] {
  const warnings: Warning[] = [];
  for (const gf of gfs) {
    if (gf.beta_lj <= 0.75 + 1e-9 && gf.lj_mm > 15 * joint.boltDiameter_mm) {
      warnings.push({ id: "long-joint-floor", message: `${groupLabel(joint, gf.group)}: long joint at the βlj floor of 0.75 (lj = ${f(gf.lj_mm)} mm); more bolts along add little` });
    } else if (gf.beta_lj < 1) {
      warnings.push({ id: "long-joint", message: `${groupLabel(joint, gf.group)}: long joint, βlj = ${f(gf.beta_lj, 3)} (cl. 10.3.3.1)` });
    }
    if (gf.group.packing_mm > 6) {
      warnings.push({ id: "packing-over-6mm", message: `${groupLabel(joint, gf.group)}: packing ${f(gf.group.packing_mm)} mm > 6 mm, βpkg = ${f(gf.beta_pkg, 3)} applied (cl. 10.3.3.3)` });
    }
  }
  if (joint.spliceType === "lap" || joint.spliceType === "butt-single-cover") {
    warnings.push({
      id: "eccentric-single-shear",
      message: `${joint.spliceType === "lap" ? "lap splice" : "single-cover butt splice"}: the load path is eccentric through the plate thickness; the plates bend at the joint ends — not covered by the checks`,
    });
  }
  return warnings;
}
