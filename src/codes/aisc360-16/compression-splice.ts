/**
 * AISC 360-16 checks of a splice in compression: each plate as a connecting element in compression
 * (J4.4), each cover as a strut across the butt (J4.4 / Chapter E), the fastener spacing of plates in
 * compression (J3.5 with E6.2), and what butt ends finished to bear let the splice carry (J1.4(b)).
 * The bolt checks are the tension ones run on the joint with its bearing directions reversed.
 */
import { rule, strength } from "../check-builders.js";
import { compressionArea, compressionOf, compressionShare, COVER_STRUT_K, coverStrutLength_mm, plateRadius_mm, worstCompressionPitch } from "../compression-measures.js";
import { f } from "../format.js";
import { holePlates } from "../rule-measures.js";
import type { CompressionChecks } from "../types.js";
import type { Joint, PlatePiece } from "../../model/joint.js";
import type { CheckResult, RuleCheck, StrengthCheck } from "../../model/results.js";
import type { CheckableScenario, Scenario } from "../../model/scenario.js";
import { inchBoltSize } from "../../catalogue/bolts.js";
import { fixedCl } from "./citation.js";
import { E_STEEL_MPA, phiPnCompressionElement } from "./compression.js";
import { unitText } from "./display.js";
import { MM_PER_IN } from "./factors.js";

/**
 * Compression members other than columns with ends finished to bear: splice material and its
 * connectors hold all parts in line, for the lesser of (1) a tension of 50 % of the required compressive
 * strength and (2) the effects of a transverse load of 2 %. AISC 360-16 J1.4(b) (wording as printed in
 * AISC 360-22 J1.4(b); the 360-16 text not re-read).
 * Read here as: the bolts and covers carry 50 % of the compression, the contact the rest; (2) is not
 * evaluated ((1) is taken, the reading that refuses more).
 */
export const AISC_CONTACT_SPLICE_SHARE = 0.5;

function spliceShare(scenario: Scenario): { value: number; text: string } {
  if (!scenario.splice.endsInContact) return { value: 1, text: "compression: butt ends not in contact — the bolts and covers carry the whole compression" };
  return {
    value: AISC_CONTACT_SPLICE_SHARE,
    text: "compression: butt ends finished to bear — the bolts and covers carry 50 % of the compression and the contact the rest (J1.4(b)(1), from memory; (2) not evaluated); J1.4(b)(1) asks the splice for a tension of 50 % of the compression too: give load.factored_tension at least that",
  };
}

/** J4.4 with Eq. J4-6 (Lc/r ≤ 25), or with Chapter E past it (E3); J3.5 with E6.2(a) for the pitch. */
const J4_4_ELEMENT = fixedCl("J4.4", { equation: "J4-6" });
const J4_4_WITH_E3 = fixedCl("J4.4", { also: ["E3 (Eq. E3-2, E3-3)"] });
const J3_5_WITH_E6_2 = fixedCl("J3.5", { also: ["E6.2(a) (from memory)"] });

/**
 * A plate in compression as a connecting element: F ≤ φPn = 0.90·Fy·Ag (Lc/r ≤ 25, Eq. J4-6), standard
 * holes filled by the bolts not deducted (J4.4 uses Ag), other holes deducted. AISC 360-16 J4.4.
 */
function grossCompressionCheck(joint: Joint, scenario: CheckableScenario, plate: PlatePiece, share: number): StrengthCheck {
  const u = unitText(scenario);
  const filled = scenario.bolts.hole === "standard";
  const a = compressionArea(joint, plate, filled);
  const r = phiPnCompressionElement(a.A_mm2, plate.fy_MPa, 0);
  const s = compressionShare(plate, share);
  return strength({
    id: `gross-compression:${plate.id}`,
    kind: "gross-compression",
    title: "Gross section in compression",
    component: plate.label,
    citation: J4_4_ELEMENT,
    formula: "Pu ≤ φPn = 0.90·Fy·Ag",
    substituted: () => `Ag = ${u.area(a.A_mm2)}${filled ? "" : " (holes of the fullest line deducted)"};  φPn = 0.90 × ${u.stress(plate.fy_MPa)} × ${u.area(a.A_mm2)} = ${u.force(r.phiPn_N)}` + (s !== 1 ? `;  F = ${f(s, 3)} × C` : ""),
    limitState: "ULS",
    demand_N: compressionOf(scenario) * s,
    resistance_N: r.phiPn_N,
    loadRatio: s,
    notes: () => [filled ? "standard holes filled by the bolts: Ag (J4.4)" : `${scenario.bolts.hole} holes deducted`],
  });
}

/**
 * A cover as a strut across the butt: F ≤ φPn, Lc = K·L, K = 0.65 (common practice), L between the
 * innermost bolt lines; Lc/r ≤ 25: 0.90·Fy·Ag, else Chapter E (E3). AISC 360-16 J4.4, E3.
 */
function coverStrutCheck(joint: Joint, scenario: CheckableScenario, plate: PlatePiece, share: number): StrengthCheck {
  const u = unitText(scenario);
  const L = coverStrutLength_mm(joint);
  const t = plate.spec.thickness_mm;
  const Ag = plate.spec.width_mm * t;
  const slenderness = (COVER_STRUT_K * L) / plateRadius_mm(t);
  const r = phiPnCompressionElement(Ag, plate.fy_MPa, slenderness);
  const s = compressionShare(plate, share);
  return strength({
    id: `cover-strut:${plate.id}`,
    kind: "strut-buckling",
    title: "Cover plate as a strut across the butt",
    component: plate.label,
    citation: r.chapterE ? J4_4_WITH_E3 : J4_4_ELEMENT,
    formula: "F ≤ φPn;  Lc/r ≤ 25: Pn = Fy·Ag;  else Pn = Fcr·Ag (E3);  φ = 0.90",
    substituted: () =>
      `L = ${u.len(L)} between the innermost bolt lines; Lc/r = ${COVER_STRUT_K} × ${u.len(L)} / (t/√12) = ${f(slenderness, 2)}${r.chapterE ? ` > 25: Fcr = ${u.stress(r.Fcr_MPa)} (E3)` : " ≤ 25: Fy"};  ` +
      `φPn = 0.90 × ${u.stress(r.Fcr_MPa)} × ${u.area(Ag)} = ${u.force(r.phiPn_N)};  F = ${f(s, 3)} × C`,
    limitState: "ULS",
    demand_N: compressionOf(scenario) * s,
    resistance_N: r.phiPn_N,
    loadRatio: s,
    notes: () => ["K = 0.65: the cover held in position and direction by the bolt groups either side (common practice)"],
  });
}

/**
 * Longitudinal spacing of fasteners in plates in compression: besides the J3.5 limit (24 t, 12 in),
 * 0.75·t·√(E/Fy) and 12 in, t the thinner plate (AISC 360-16 E6.2(a) as J3.5 refers to it for members in
 * compression; from memory, the reading that refuses more). Fy the highest of the plates. AISC 360-22 prints
 * the limit in E6.2(b) (0.75 t √(E/Fy), 12 in (300 mm); staggered fasteners 1.12 t √(E/Fy), 18 in); the
 * 360-16 item letter not re-read.
 */
function compressionPitchRule(joint: Joint): RuleCheck[] {
  const Fy = Math.max(...holePlates(joint).map((p) => p.fy_MPa));
  const cap = inchBoltSize(joint.boltDiameter_mm) !== undefined ? 12 * MM_PER_IN : 305;
  const k = 0.75 * Math.sqrt(E_STEEL_MPA / Fy);
  const worst = worstCompressionPitch(joint, (t) => ({ limit_mm: Math.min(k * t, cap), text: () => `min(0.75 t √(E/Fy) = ${f(k, 2)} t, ${f(cap)} mm), Fy ${f(Fy)} MPa` }));
  if (!worst) return [];
  return [
    rule({
      id: "max-pitch-compression",
      kind: "max-pitch",
      title: "Maximum pitch along the force (plates in compression)",
      component: worst.where,
      citation: J3_5_WITH_E6_2,
      formula: "p ≤ min(0.75 t √(E/Fy), 12 in)",
      substituted: worst.detail,
      value_mm: worst.value,
      limit_mm: worst.limit,
      bound: "max",
    }),
  ];
}

function checks(joint: Joint, scenario: CheckableScenario, share: number): { checks: CheckResult[]; conventions: string[] } {
  const out: CheckResult[] = [];
  for (const plate of holePlates(joint)) out.push(grossCompressionCheck(joint, scenario, plate, share));
  const covers = joint.plates.filter((p) => p.role === "cover");
  for (const cover of covers) out.push(coverStrutCheck(joint, scenario, cover, share));
  out.push(...compressionPitchRule(joint));
  return {
    checks: out,
    conventions: [
      covers.length > 0
        ? "compression: each cover a strut between the innermost bolt lines either side of the butt, K = 0.65 (common practice), J4.4 (Chapter E past Lc/r = 25)"
        : "compression: a lap splice has no butt, so no cover strut check; the plates' buckling as members is the member design's",
    ],
  };
}

export const AISC_COMPRESSION: CompressionChecks = { spliceShare, checks };
