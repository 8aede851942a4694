/**
 * AISC 360-16 (LRFD) checks of a splice, run on the joint's hole coordinates.
 * Each function returns results (data); none prints, none throws for a failed check.
 */
import { inchBoltSize, inchSizeText, shankArea_mm2 } from "../../catalogue/bolts.js";
import { mapped } from "../../model/lists.js";
import { blockLoadText, blockShapes, governingBlock, GoverningBlocksOfCall, type BlockShape, type BlockShearLoad, type GoverningBlock } from "../../geometry/block-shear.js";
import { groupHoles, holesOfPlate } from "../../geometry/joint-builder.js";
import { jointLength_mm } from "../../geometry/lines.js";
import { netPathFor, pathLabel } from "../../geometry/net-section.js";
import { forEachTearOut } from "../../geometry/tear-out.js";
import type { BoltGroupGeometry, Hole, Joint, PlateConnection, PlatePiece } from "../../model/joint.js";
import type { StrengthCheck } from "../../model/results.js";
import type { BoltSpec, CheckableScenario, Scenario } from "../../model/scenario.js";
import { strength } from "../check-builders.js";
import { f } from "../format.js";
import { groupLabel } from "../is800-2007/joint-checks.js";
import { BEARING_CASES, bearingCoefficients, clearDistance_mm, phiRnBearing, phiRnTearout, type BearingCoefficients } from "./bearing.js";
import { a307GripFactor, a307GripStep_mm, fillerFactor, Fnv_MPa, longJointFactor, phiRnShear } from "./bolt-shear.js";
import { fixedCl } from "./citation.js";
import { unitText, type UnitText } from "./display.js";
import { netAllowance_mm } from "./holes.js";
import { astmGradeOf, boltGroupOf, Tb_N, type BoltGroup } from "./materials.js";
import { hf, phiRnSlip, phiSlip } from "./slip.js";
import { phiPnRupture, phiPnYield, phiRnBlockShear, phiRnBlockShear_N, spliceEffectiveArea, type BlockShearResult } from "./tension.js";

/** What the checks need to know about the bolt, from the scenario. */
export interface AiscBolt {
  d_mm: number;
  /** Inch size (in) for inch bolts; undefined for metric bolts. */
  inch: number | undefined;
  name: string;
  group: BoltGroup;
  Ab_mm2: number;
  Fnv_MPa: number;
  threadsIncluded: boolean;
}

type BoltFields = Pick<BoltSpec, "size_mm" | "astmGrade" | "propertyClass" | "threadsInShearPlanes">;

/** The last bolt described, with the fields it was described from (a check asks about ten times). */
let lastBolt: { fields: { size_mm: number; astmGrade: string | undefined; propertyClass: string; threadsInShearPlanes: boolean }; bolt: Readonly<AiscBolt> } | null = null;

/** The bolt as the checks need it (its name, group, Ab, Fnv), from the scenario's bolt fields. */
export function aiscBolt(bolts: BoltFields): Readonly<AiscBolt> {
  const last = lastBolt;
  if (last && last.fields.size_mm === bolts.size_mm && last.fields.astmGrade === bolts.astmGrade && last.fields.propertyClass === bolts.propertyClass && last.fields.threadsInShearPlanes === bolts.threadsInShearPlanes) return last.bolt;
  const bolt = Object.freeze(describeBolt(bolts));
  lastBolt = { fields: { size_mm: bolts.size_mm, astmGrade: bolts.astmGrade, propertyClass: bolts.propertyClass, threadsInShearPlanes: bolts.threadsInShearPlanes }, bolt };
  return bolt;
}

function describeBolt(bolts: BoltFields): AiscBolt {
  const d = bolts.size_mm;
  const inch = inchBoltSize(d);
  const grade = astmGradeOf(bolts);
  if (!grade) throw new RangeError(`no ASTM grade for class ${bolts.propertyClass}`);
  const group = boltGroupOf(grade);
  const threadsIncluded = group === "A307" || bolts.threadsInShearPlanes;
  return {
    d_mm: d,
    inch,
    name: `${inch !== undefined ? inchSizeText(inch) : `M${d}`} ${grade}${inch === undefined ? "M" : ""} (${group})`,
    group,
    Ab_mm2: shankArea_mm2(d),
    Fnv_MPa: Fnv_MPa(group, threadsIncluded, inch !== undefined),
    threadsIncluded,
  };
}

/** Reductions of one group's bolt shear: long joint (Table J3.2 [b]), fillers (J5.2), A307 grip ([c]). */
export interface GroupShear {
  group: BoltGroupGeometry;
  holes: readonly Hole[];
  patternLength_mm: number;
  longJoint: number;
  filler: number;
  grip: number;
  /** φRn of one bolt in one shear plane, N. */
  perPlane_N: number;
}

export function groupShear(joint: Joint, scenario: Scenario & { bolts: BoltSpec }, group: BoltGroupGeometry): GroupShear {
  const bolt = aiscBolt(scenario.bolts);
  const holes = groupHoles(joint, group.id);
  const length = jointLength_mm(holes);
  const lj = longJointFactor(length, bolt.inch !== undefined);
  const filler = fillerFactor(group.packing_mm, scenario.options.fillersDeveloped ?? false);
  const grip = a307GripFactor(bolt.group, group.grip_mm, bolt.d_mm);
  return { group, holes, patternLength_mm: length, longJoint: lj, filler, grip, perPlane_N: phiRnShear(bolt.Fnv_MPa, bolt.Ab_mm2, lj * filler * grip) };
}

function reductionNotes(gs: GroupShear, scenario: CheckableScenario): string[] {
  const u = unitText(scenario);
  const bolt = aiscBolt(scenario.bolts);
  const limit = bolt.inch !== undefined ? "38 in" : "950 mm";
  return [
    `fastener pattern length ${u.len(gs.patternLength_mm)} ${gs.longJoint < 1 ? `> ${limit}: Fnv × 0.833` : `≤ ${limit}: no reduction`} (Table J3.2 note [b])`,
    gs.group.packing_mm > 0
      ? `filler ${u.len(gs.group.packing_mm)}: ${gs.filler < 1 ? `1 − 0.4(t − 0.25) = ${f(gs.filler, 3)} (J5.2)` : scenario.options.fillersDeveloped ? "developed, no reduction (J5.2)" : "≤ 1/4 in, no reduction (J5.2)"}`
      : "no filler",
    ...(bolt.group === "A307" ? [`A307 grip ${u.len(gs.group.grip_mm)}: factor ${f(gs.grip, 3)} (1 % per ${a307GripStep_mm(bolt.d_mm) === 2 ? "2 mm" : "1/16 in"} over 5d; Table J3.2 note [c], from memory)`] : []),
  ];
}

/** J3.6 with Table J3.2 and Eq. J3-1, cited by every bolt shear check. */
const BOLT_SHEAR_CITATION = fixedCl("J3.6", { table: "Table J3.2", equation: "J3-1" });

/**
 * Bolt shear of a group: T ≤ n·ns·φRn, φRn = φ·Fnv·Ab with the long-joint, filler and A307 grip
 * reductions. AISC 360-16 J3.6, Table J3.2, J5.2.
 */
export function boltShearCheck(joint: Joint, scenario: CheckableScenario, gs: GroupShear): StrengthCheck {
  const bolt = aiscBolt(scenario.bolts);
  const u = unitText(scenario);
  const n = gs.holes.length;
  const ns = gs.group.shearPlanes;
  const R = n * ns * gs.perPlane_N;
  return strength({
    id: `bolt-shear:${gs.group.id}`,
    kind: "bolt-shear",
    title: "Bolt shear",
    component: groupLabel(joint, gs.group),
    citation: BOLT_SHEAR_CITATION,
    formula: "T ≤ n·ns·φRn;  φRn = φ·Fnv·Ab·(long joint)·(filler)·(A307 grip), φ = 0.75, Ab = π d²/4",
    substituted: () =>
      `${bolt.name}, threads ${bolt.threadsIncluded ? "included (N)" : "excluded (X)"}: Fnv = ${u.stress(bolt.Fnv_MPa)}, Ab = ${u.area(bolt.Ab_mm2)};  ` +
      `φRn = 0.75 × ${u.stress(bolt.Fnv_MPa)} × ${u.area(bolt.Ab_mm2)} × ${f(gs.longJoint, 3)} × ${f(gs.filler, 3)} × ${f(gs.grip, 3)} = ${u.force(gs.perPlane_N)};  ` +
      `n·ns·φRn = ${n} × ${ns} × ${u.force(gs.perPlane_N)} = ${u.force(R)}`,
    limitState: "ULS",
    demand_N: scenario.load.factoredTension_N,
    resistance_N: R,
    loadRatio: 1,
    notes: () => reductionNotes(gs, scenario),
  });
}

/** Shear planes a plate's bolts transfer its force through: a main plate between two covers 2, else 1. */
function planesFor(plate: PlatePiece, group: BoltGroupGeometry): number {
  return plate.role === "main" ? group.shearPlanes : 1;
}

/** Holes with their width and length enlarged by the B4.3b allowance (1/16 in, 2 mm) for net areas. */
export function netHoles(holes: readonly Hole[], d_mm: number): Hole[] {
  const a = netAllowance_mm(d_mm);
  // Written field by field in the joint builder's order, so that an enlarged hole has the same shape
  // (hidden class) as a hole: the geometry then sees one kind of object and stays fast.
  return mapped(holes, (h) => ({ id: h.id, group: h.group, x_mm: h.x_mm, y_mm: h.y_mm, across_mm: h.across_mm + a, along_mm: h.along_mm + a }));
}

/**
 * The enlarged hole lists of the joint checked last: `sources[k]` (a list of the joint's holes) was
 * enlarged to `nets[k]`. A joint asks with a few lists (its groups', its own), so two short arrays.
 */
let lastNetHoles: { jointHoles: readonly Hole[]; d_mm: number; sources: Array<readonly Hole[]>; nets: Hole[][] } | null = null;

/**
 * netHoles of a list of one joint's holes, made once per list and joint: the plates that ask with the
 * same list (both covers; a main plate's net section and block shear) get the same array, so the net
 * path and the block shapes measured for one are handed to the next (net-section.ts, block-shear.ts).
 */
function netHolesOf(joint: Joint, holes: readonly Hole[]): Hole[] {
  if (!lastNetHoles || lastNetHoles.jointHoles !== joint.holes || lastNetHoles.d_mm !== joint.boltDiameter_mm) {
    lastNetHoles = { jointHoles: joint.holes, d_mm: joint.boltDiameter_mm, sources: [], nets: [] };
  }
  const k = lastNetHoles.sources.indexOf(holes);
  if (k >= 0) return lastNetHoles.nets[k]!;
  const net = netHoles(holes, joint.boltDiameter_mm);
  lastNetHoles.sources.push(holes);
  lastNetHoles.nets.push(net);
  return net;
}

/** The citation and formula of the group bearing check for each case of J3.10(a), made once. */
const BEARING_TEXTS = new Map<BearingCoefficients, { citation: ReturnType<typeof fixedCl>; formula: string }>();
for (const c of BEARING_CASES) {
  BEARING_TEXTS.set(c, { citation: fixedCl("J3.10", { equation: c.equation }), formula: `F ≤ Σ min(ns·φFnv·Ab, φ·${c.cb}·d·t·Fu, φ·${c.ct}·lc·t·Fu), φ = 0.75` });
}

/** The notes of the group bearing check: which items of J3.10(a) apply. */
const BEARING_NOTES_CONSIDERED = (): string[] => ["deformation at the bolt hole at service load is a design consideration: bearing J3.10(a)(1)(i), tearout J3.10(a)(2)(i)"];
const BEARING_NOTES_NOT_CONSIDERED = (): string[] => ["deformation at the bolt hole at service load is not a design consideration: bearing J3.10(a)(1)(ii), tearout J3.10(a)(2)(ii)"];

/** What one plate's bolts of a group resist in J3.6 and J3.10(a): the strengths per bolt, N. */
export interface PlateBolts {
  holes: readonly Hole[];
  connection: PlateConnection;
  ct: number;
  t_mm: number;
  Fu_MPa: number;
  /** Shear of one bolt through the plate's planes, φRn·ns. */
  shear_N: number;
  /** Bearing of one bolt on the plate, φ·cb·d·t·Fu. */
  bearing_N: number;
}

/**
 * Each bolt's least of shear, bearing and tearout, φ·ct·lc·t·Fu with lc its clear distance (J3.10(a)),
 * handed to `visit` in the group's order. The sum and the words both walk the bolts with this.
 */
function forEachBoltStrength(b: PlateBolts, visit: (least_N: number, lc_mm: number, toEnd: boolean) => void): void {
  forEachTearOut(b.holes, b.connection, (hole, toEnd_mm, toHoleAhead_mm) => {
    const lc = clearDistance_mm(toEnd_mm, toHoleAhead_mm, hole.along_mm);
    const tear = phiRnTearout(b.ct, lc, b.t_mm, b.Fu_MPa);
    visit(Math.min(b.shear_N, b.bearing_N, tear), lc, toHoleAhead_mm === null);
  });
}

/** Σ min(shear, bearing, tearout) over the bolts, N. AISC 360-16 J3.6, J3.10(a). */
function groupStrength_N(b: PlateBolts): number {
  let total = 0;
  forEachBoltStrength(b, (least) => {
    total += least;
  });
  return total;
}

/**
 * The group strengths Σ min(shear, bearing, tearout) of one check of a joint, each worked out once: a
 * plate whose bolts have the same holes, plate end, t, Fu and strengths per bolt as an earlier plate's
 * (both covers of a butt splice, for each group) has the same sum. Made afresh by every check call.
 */
export class GroupStrengths {
  readonly #measured: Array<{ bolts: PlateBolts; total_N: number }> = [];
  /** groupStrength_N of the plate's bolts, N (AISC 360-16 J3.6, J3.10(a)). */
  of(b: PlateBolts): number {
    for (const m of this.#measured) if (samePlateBolts(m.bolts, b)) return m.total_N;
    const total_N = groupStrength_N(b);
    this.#measured.push({ bolts: b, total_N });
    return total_N;
  }
}

/** Whether two plates' bolts have every number their group strength is worked out from. */
function samePlateBolts(a: PlateBolts, b: PlateBolts): boolean {
  return a.holes === b.holes && a.connection.towardEnd === b.connection.towardEnd && a.connection.endX_mm === b.connection.endX_mm && a.ct === b.ct && a.t_mm === b.t_mm && a.Fu_MPa === b.Fu_MPa && a.shear_N === b.shear_N && a.bearing_N === b.bearing_N;
}

/** The bolts grouped by what governs each, in words: "4 × 98.2 kN (bolt shear) + 2 × … (tearout, …)". */
function tallyText(b: PlateBolts, u: UnitText): string {
  const tally = new Map<string, { count: number; each: number; text: string }>();
  forEachBoltStrength(b, (least, lc, toEnd) => {
    const [key, text] =
      least === b.shear_N ? ["shear", "bolt shear"] : least === b.bearing_N ? ["bearing", "bearing"] : [`tearout ${f(lc, 3)}`, `tearout, lc = ${u.len(lc)} (${toEnd ? "to the end" : "to the hole ahead"})`];
    const entry = tally.get(key) ?? { count: 0, each: least, text };
    entry.count += 1;
    tally.set(key, entry);
  });
  return [...tally.values()].map((e) => `${e.count} × ${u.force(e.each)} (${e.text})`).join(" + ");
}

/**
 * Bolt group strength on one plate: plate force ≤ Σ over the bolts of min(shear, bearing, tearout).
 * AISC 360-16 J3.6 (shear per bolt, the planes through which this plate is loaded), J3.10(a) (bearing
 * φ·cb·d·t·Fu and tearout φ·ct·lc·t·Fu, lc the clear distance to the plate end or the hole ahead).
 */
export function groupBearingCheck(joint: Joint, scenario: CheckableScenario, plate: PlatePiece, connection: PlateConnection, gs: GroupShear, sums: GroupStrengths = new GroupStrengths()): StrengthCheck {
  const { bolts, options } = scenario;
  const bolt = aiscBolt(bolts);
  const u = unitText(scenario);
  const considered = (options.bearingDeformation ?? "considered") === "considered";
  const coefficients = bearingCoefficients(considered, bolts.hole, bolts.slotDirection);
  const { cb, ct } = coefficients;
  const texts = BEARING_TEXTS.get(coefficients)!;
  const t = plate.spec.thickness_mm;
  const Fu = plate.fu_MPa;
  const planes = planesFor(plate, gs.group);
  const shear = gs.perPlane_N * planes;
  const bearing = phiRnBearing(cb, bolt.d_mm, t, Fu);
  const plateBolts: PlateBolts = { holes: gs.holes, connection, ct, t_mm: t, Fu_MPa: Fu, shear_N: shear, bearing_N: bearing };
  const total = sums.of(plateBolts);
  return strength({
    id: `bearing:${plate.id}:${connection.group}`,
    kind: "bolt-bearing",
    title: "Bolt group: shear, bearing, tearout",
    component: joint.spliceType === "lap" ? plate.label : `${plate.label}, side ${connection.group}`,
    citation: texts.citation,
    formula: texts.formula,
    substituted: () =>
      `per bolt: shear ${planes} × ${u.force(gs.perPlane_N)} = ${u.force(shear)}; bearing 0.75 × ${cb} × ${u.len(bolt.d_mm)} × ${u.len(t)} × ${u.stress(Fu)} = ${u.force(bearing)};  ` +
      `Σ = ${tallyText(plateBolts, u)} = ${u.force(total)}` +
      (plate.forceShare !== 1 ? `;  F = ${f(plate.forceShare, 3)} × T` : ""),
    limitState: "ULS",
    demand_N: scenario.load.factoredTension_N * plate.forceShare,
    resistance_N: total,
    loadRatio: plate.forceShare,
    notes: considered ? BEARING_NOTES_CONSIDERED : BEARING_NOTES_NOT_CONSIDERED,
  });
}

/** J3.8, Eq. J3-4, with Tb from Table J3.1 (inch bolts) or J3.1M (metric). */
const SLIP_CITATION_INCH = fixedCl("J3.8", { table: "Table J3.1", equation: "J3-4" });
const SLIP_CITATION_METRIC = fixedCl("J3.8", { table: "Table J3.1M", equation: "J3-4" });
const SLIP_NOTES = (): string[] => ["slip checked at the factored (LRFD) load; the bolts are also checked in shear, bearing and tearout (J3.8)"];

/**
 * Slip resistance of a slip-critical group at the factored load: T ≤ n·φ·μ·Du·hf·Tb·ns.
 * AISC 360-16 J3.8, Eq. J3-4, Table J3.1 (Tb).
 */
export function slipCheck(joint: Joint, scenario: CheckableScenario, gs: GroupShear): StrengthCheck {
  const { bolts } = scenario;
  const bolt = aiscBolt(bolts);
  const u = unitText(scenario);
  const mu = bolts.slipFactor ?? 0;
  const phi = phiSlip(bolts.hole, bolts.slotDirection);
  const fillers = gs.group.packing_mm > 0 ? 1 : 0;
  const h = hf(fillers);
  const group = bolt.group === "Group B" ? "Group B" : "Group A";
  const Tb = Tb_N(bolt.d_mm, group, bolt.inch) ?? 0;
  const ns = gs.group.shearPlanes;
  const perBolt = phiRnSlip(phi, mu, h, Tb, ns);
  const n = gs.holes.length;
  return strength({
    id: `slip:${gs.group.id}`,
    kind: "slip",
    title: "Slip resistance (slip-critical)",
    component: groupLabel(joint, gs.group),
    citation: bolt.inch !== undefined ? SLIP_CITATION_INCH : SLIP_CITATION_METRIC,
    formula: "T ≤ n·φRn;  φRn = φ·μ·Du·hf·Tb·ns, Du = 1.13",
    substituted: () =>
      `Class ${mu >= 0.5 ? "B" : "A"} μ = ${f(mu, 2)}, Tb = ${u.force(Tb)} (${group}), hf = ${f(h, 2)} (${fillers} filler${fillers === 1 ? "" : "s"}), ns = ${ns}, φ = ${f(phi, 2)};  ` +
      `φRn = ${f(phi, 2)} × ${f(mu, 2)} × 1.13 × ${f(h, 2)} × ${u.force(Tb)} × ${ns} = ${u.force(perBolt)};  n·φRn = ${n} × ${u.force(perBolt)} = ${u.force(n * perBolt)}`,
    limitState: "ULS",
    demand_N: scenario.load.factoredTension_N,
    resistance_N: n * perBolt,
    loadRatio: 1,
    notes: SLIP_NOTES,
  });
}

/** Main plates are tension members (Chapter D); cover plates are connecting elements (J4.1). */
const isSplicePlate = (plate: PlatePiece) => plate.role === "cover";

/** Gross yielding: J4.1(a), Eq. J4-1, for splice plates; D2(a), Eq. D2-1, for main plates. */
const GROSS_YIELD_CITATION_COVER = fixedCl("J4.1(a)", { equation: "J4-1" });
const GROSS_YIELD_CITATION_MAIN = fixedCl("D2(a)", { equation: "D2-1" });

/**
 * Tensile yielding of the gross section: F ≤ 0.90·Fy·Ag.
 * AISC 360-16 D2(a) for main plates, J4.1(a) for splice plates.
 */
export function grossYieldCheck(scenario: CheckableScenario, plate: PlatePiece): StrengthCheck {
  const u = unitText(scenario);
  const { width_mm: b, thickness_mm: t } = plate.spec;
  const Ag = b * t;
  const R = phiPnYield(Ag, plate.fy_MPa);
  const cover = isSplicePlate(plate);
  return strength({
    id: `gross-yield:${plate.id}`,
    kind: "gross-yield",
    title: "Tensile yielding (gross section)",
    component: plate.label,
    citation: cover ? GROSS_YIELD_CITATION_COVER : GROSS_YIELD_CITATION_MAIN,
    formula: "F ≤ φ·Fy·Ag, φ = 0.90",
    substituted: () => `φPn = 0.90 × ${u.stress(plate.fy_MPa)} × ${u.len(b)} × ${u.len(t)} = ${u.force(R)}` + (plate.forceShare !== 1 ? `;  F = ${f(plate.forceShare, 3)} × T (covers share by area)` : ""),
    limitState: "ULS",
    demand_N: scenario.load.factoredTension_N * plate.forceShare,
    resistance_N: R,
    loadRatio: plate.forceShare,
    notes: () => [plate.materialNote],
  });
}

/** Net section rupture: J4.1(b), Eq. J4-2, for splice plates; D2(b), Eq. D2-2 with D3, for main plates; An by B4.3b. */
const NET_SECTION_CITATION_COVER = fixedCl("J4.1(b)", { equation: "J4-2", also: ["B4.3b for An"] });
const NET_SECTION_CITATION_MAIN = fixedCl("D2(b)", { equation: "D2-2", also: ["B4.3b for An", "D3, Table D3.1 case 1 (U = 1)"] });

/** The net section formula of a splice plate (J4.1(b)) or a main plate (D2(b)), hole widths + 1/16 in or 2 mm (B4.3b). */
function netSectionFormula(cover: boolean, inch: boolean): string {
  if (cover) return inch ? NET_FORMULA_COVER_INCH : NET_FORMULA_COVER_METRIC;
  return inch ? NET_FORMULA_MAIN_INCH : NET_FORMULA_MAIN_METRIC;
}
const NET_FORMULA_COVER_INCH = "F ≤ φ·Fu·Ae, Ae = An ≤ 0.85·Ag, An = (b − Σ(dh + 1/16 in) + Σ s²/4g)·t, φ = 0.75";
const NET_FORMULA_COVER_METRIC = "F ≤ φ·Fu·Ae, Ae = An ≤ 0.85·Ag, An = (b − Σ(dh + 2 mm) + Σ s²/4g)·t, φ = 0.75";
const NET_FORMULA_MAIN_INCH = "F ≤ φ·Fu·Ae, Ae = U·An, U = 1, An = (b − Σ(dh + 1/16 in) + Σ s²/4g)·t, φ = 0.75";
const NET_FORMULA_MAIN_METRIC = "F ≤ φ·Fu·Ae, Ae = U·An, U = 1, An = (b − Σ(dh + 2 mm) + Σ s²/4g)·t, φ = 0.75";

/**
 * Tensile rupture of the net section over the least straight or staggered path, hole widths + 1/16 in:
 * main plates F ≤ 0.75·Fu·Ae, Ae = U·An with U = 1 (D2(b), D3, Table D3.1 case 1 — every element of the
 * plate connected); splice plates F ≤ 0.75·Fu·An with An ≤ 0.85·Ag (J4.1(b)). An by B4.3.
 */
export function netSectionCheck(joint: Joint, scenario: CheckableScenario, plate: PlatePiece): StrengthCheck {
  const u = unitText(scenario);
  const { width_mm: b, thickness_mm: t } = plate.spec;
  const holes = netHolesOf(joint, holesOfPlate(joint, plate));
  const transferred = scenario.options.netSectionLoad === "transferred";
  const { path, fraction } = netPathFor(plate, holes, scenario.options.netSectionLoad);
  const An = path.netWidth_mm * t;
  const Ag = b * t;
  const inch = inchBoltSize(joint.boltDiameter_mm) !== undefined;
  const cover = isSplicePlate(plate);
  const Ae = cover ? spliceEffectiveArea(An, Ag) : An;
  const R = phiPnRupture(Ae, plate.fu_MPa);
  const ratio = plate.forceShare * fraction;
  return strength({
    id: `net-section:${plate.id}`,
    kind: "net-section",
    title: "Tensile rupture (net section)",
    component: plate.label,
    citation: cover ? NET_SECTION_CITATION_COVER : NET_SECTION_CITATION_MAIN,
    formula: netSectionFormula(cover, inch),
    substituted: () =>
      `${transferred ? "governing" : "least"} path ${pathLabel(path)}: An = (${u.n(b)} − ${u.n(path.holeDeduction_mm)} + ${u.n(path.staggerAddition_mm)}) × ${u.n(t)} = ${u.area(An)}` +
      (cover ? `;  Ae = min(An, 0.85 × ${u.area(Ag)}) = ${u.area(Ae)}` : `;  Ae = 1.0 × An = ${u.area(Ae)}`) +
      `;  φPn = 0.75 × ${u.stress(plate.fu_MPa)} × ${u.area(Ae)} = ${u.force(R)}` +
      (transferred ? `;  load still in the plate at this path: ${f(fraction, 3)} of its force` : "") +
      (plate.forceShare !== 1 ? `;  F = ${f(plate.forceShare, 3)} × T` : ""),
    limitState: "ULS",
    demand_N: scenario.load.factoredTension_N * ratio,
    resistance_N: R,
    loadRatio: ratio,
    notes: () => [`path searched over every straight and staggered route through ${holes.length} holes, each hole ${u.len(netAllowance_mm(joint.boltDiameter_mm))} wider than nominal (B4.3b)`],
  });
}

/** The governing blocks of one check call by J4.3 (GoverningBlocksOfCall): made afresh by every check call. */
export class GoverningBlocks extends GoverningBlocksOfCall<BlockShearResult> {
  constructor() {
    super(governingAiscBlock);
  }
}

/** The governing block of the shapes: every shape compared by its φRn alone, the rupture and yield terms worked out for the governing one (J4.3, Eq. J4-5). */
function governingAiscBlock(shapes: readonly BlockShape[], bolts: number, t: number, Fy: number, Fu: number, share: number, load: BlockShearLoad): GoverningBlock<BlockShearResult> | null {
  const phiRn = (shape: BlockShape) => phiRnBlockShear_N(shape.shearGross_mm * t, shape.shearNet_mm * t, shape.tensionNet_mm * t, Fy, Fu);
  const terms = (shape: BlockShape) => phiRnBlockShear(shape.shearGross_mm * t, shape.shearNet_mm * t, shape.tensionNet_mm * t, Fy, Fu);
  return governingBlock(shapes, bolts, share, load, phiRn, terms);
}

/** Block shear, J4.3, Eq. J4-5; the block's demand F (whole plate force) or F·k/n (its bolts' share). */
const BLOCK_SHEAR_CITATION = fixedCl("J4.3", { equation: "J4-5" });
const BLOCK_FORMULA_FULL = "F ≤ φ·min(0.60·Fu·Anv + Ubs·Fu·Ant, 0.60·Fy·Agv + Ubs·Fu·Ant), φ = 0.75, Ubs = 1";
const BLOCK_FORMULA_SHARE = "F·k/n ≤ φ·min(0.60·Fu·Anv + Ubs·Fu·Ant, 0.60·Fy·Agv + Ubs·Fu·Ant), φ = 0.75, Ubs = 1";

/**
 * Block shear of a plate for one group over every block shape the pattern forms; a block holding k of
 * the n bolts carries k/n of the plate's force (options.block_shear_load: share), or the whole plate
 * force (full); the check reports the joint tension the block permits. AISC 360-16 J4.3, Eq. J4-5
 * (Ubs = 1; net areas with the B4.3b allowance).
 */
export function blockShearCheck(joint: Joint, scenario: CheckableScenario, plate: PlatePiece, connection: PlateConnection, blocks: GoverningBlocks = new GoverningBlocks()): StrengthCheck | null {
  const u = unitText(scenario);
  const holes = netHolesOf(joint, groupHoles(joint, connection.group));
  const shapes = blockShapes(holes, connection, plate.spec.width_mm, joint.holes);
  const t = plate.spec.thickness_mm;
  const load = scenario.options.blockShearLoad;
  const best = blocks.of(shapes, holes.length, t, plate.fy_MPa, plate.fu_MPa, plate.forceShare, load);
  if (!best) return null;
  const s = best.shape;
  const r = best.detail;
  return strength({
    id: `block-shear:${plate.id}:${connection.group}`,
    kind: "block-shear",
    title: "Block shear",
    component: joint.spliceType === "lap" ? plate.label : `${plate.label}, side ${connection.group}`,
    citation: BLOCK_SHEAR_CITATION,
    formula: load === "full" ? BLOCK_FORMULA_FULL : BLOCK_FORMULA_SHARE,
    substituted: () =>
      `${s.description} (${s.boltsInBlock} of ${holes.length} bolts): Agv = ${u.area(s.shearGross_mm * t)}, Anv = ${u.area(s.shearNet_mm * t)}, Ant = ${u.area(s.tensionNet_mm * t)};  ` +
      `rupture 0.75 × (0.60 × ${u.stress(plate.fu_MPa)} × Anv + ${u.stress(plate.fu_MPa)} × Ant) = ${u.force(r.rupture_N)}, ` +
      `yield 0.75 × (0.60 × ${u.stress(plate.fy_MPa)} × Agv + ${u.stress(plate.fu_MPa)} × Ant) = ${u.force(r.yield_N)};  φRn = R = ${u.force(r.phiRn_N)};  ` +
      blockLoadText(best, holes.length, plate.forceShare, load, (n) => u.force(n)),
    limitState: "ULS",
    demand_N: scenario.load.factoredTension_N * best.ratio,
    resistance_N: r.phiRn_N,
    loadRatio: best.ratio,
    notes: () => [`governing of ${shapes.length} block shapes`],
  });
}

