/**
 * IS 800:2007 checks of a splice in compression: the gross section of each plate, each cover as a
 * strut across the butt, the compression pitch limit. The bolt checks (shear, bearing, slip) are the
 * tension ones run on the joint with its bearing directions reversed (engine/senses.ts).
 */
import { rule, strength } from "../check-builders.js";
import { compressionArea, compressionOf, compressionShare, COVER_STRUT_K, coverStrutLength_mm, plateRadius_mm, worstCompressionPitch } from "../compression-measures.js";
import { f, kN } from "../format.js";
import type { CompressionChecks } from "../types.js";
import type { Joint, PlatePiece } from "../../model/joint.js";
import type { CheckResult, RuleCheck, StrengthCheck } from "../../model/results.js";
import type { CheckableScenario, Scenario } from "../../model/scenario.js";
import { fixedCl } from "./citation.js";
import { fcd_MPa, IMPERFECTION, Pd_gross } from "./compression-member.js";
import { PARTIAL_FACTORS } from "./factors.js";
import { holePlates } from "../rule-measures.js";

/** The citations of the checks below, made once (frozen; results share them). */
const GROSS_COMPRESSION_CITATION = fixedCl("7.1.2", { also: ["7.3.2 (holes filled by bolts, from memory)"] });
const COVER_STRUT_CITATION = fixedCl("7.1.2.1", { table: "Table 7", also: ["Table 11 (K = 0.65)"] });
const COMPRESSION_PITCH_CITATION = fixedCl("10.2.3.2");

/**
 * Butt ends in contact. IS 800:2007 gives no share of the force that machined or sawn butt ends of a
 * plate splice may carry by contact that this checker relies on (from memory; the reading that refuses
 * more): the bolts and covers carry the whole compression.
 */
function spliceShare(scenario: Scenario): { value: number; text: string } {
  if (!scenario.splice.endsInContact) return { value: 1, text: "compression: butt ends not in contact — the bolts and covers carry the whole compression" };
  return {
    value: 1,
    text: "compression: butt ends in contact — IS 800:2007 gives no figure for the part a plate splice's contact may carry (from memory; the reading that refuses more): the contact is relied on for nothing, the bolts and covers carry the whole compression",
  };
}

/**
 * Gross section of a plate in compression: F ≤ Pd = Ae·fy/γm0, Ae = Ag with standard holes filled by
 * bolts, holes deducted where oversize or slotted. IS 800:2007, cl. 7.1.2 (λ → 0 for the plate held by
 * the bolts); cl. 7.3.2 for the holes (from memory).
 */
export function grossCompressionCheck(joint: Joint, scenario: CheckableScenario, plate: PlatePiece, share: number): StrengthCheck {
  const filled = scenario.bolts.hole === "standard";
  const a = compressionArea(joint, plate, filled);
  const Pd = Pd_gross(a.A_mm2, plate.fy_MPa);
  const s = compressionShare(plate, share);
  return strength({
    id: `gross-compression:${plate.id}`,
    kind: "gross-compression",
    title: "Gross section in compression",
    component: plate.label,
    citation: GROSS_COMPRESSION_CITATION,
    formula: "C ≤ Pd = Ae·fy/γm0",
    substituted: () =>
      `Ae = ${filled ? `Ag = ${f(plate.spec.width_mm)} × ${f(plate.spec.thickness_mm)}` : `Ag − holes of the fullest line = ${f(plate.spec.width_mm * plate.spec.thickness_mm)} − ${f(a.deducted)}`} = ${f(a.A_mm2)} mm²;  ` +
      `Pd = ${f(a.A_mm2)} × ${plate.fy_MPa} / ${PARTIAL_FACTORS.gamma_m0} = ${kN(Pd)}` + (s !== 1 ? `;  C = ${f(s, 3)} × C` : ""),
    limitState: "ULS",
    demand_N: compressionOf(scenario) * s,
    resistance_N: Pd,
    loadRatio: s,
    notes: () => [filled ? "standard holes filled by the bolts: not deducted" : `${scenario.bolts.hole} holes deducted`],
  });
}

/**
 * A cover plate as a strut across the butt: F ≤ Pd = Ag·fcd, KL from the innermost bolt lines either
 * side of the butt with K = 0.65 (both ends held in position and direction, Table 11; common practice),
 * r = t/√12, buckling class c (α = 0.49). IS 800:2007, cl. 7.1.2, 7.1.2.1, Tables 7 and 11.
 */
export function coverStrutCheck(joint: Joint, scenario: CheckableScenario, plate: PlatePiece, share: number, L: number = coverStrutLength_mm(joint)): StrengthCheck {
  const t = plate.spec.thickness_mm;
  const slenderness = (COVER_STRUT_K * L) / plateRadius_mm(t);
  const r = fcd_MPa(plate.fy_MPa, slenderness, IMPERFECTION.c);
  const Ag = plate.spec.width_mm * t;
  const Pd = Ag * r.fcd_MPa;
  const s = compressionShare(plate, share);
  return strength({
    id: `cover-strut:${plate.id}`,
    kind: "strut-buckling",
    title: "Cover plate as a strut across the butt",
    component: plate.label,
    citation: COVER_STRUT_CITATION,
    formula: "F ≤ Pd = Ag·fcd;  fcd = (fy/γm0)/(φ + √(φ² − λ²));  φ = 0.5[1 + α(λ − 0.2) + λ²];  λ = √(fy/fcc), fcc = π²E/(KL/r)²",
    substituted: () =>
      `L = ${f(L)} mm between the innermost bolt lines; KL/r = ${COVER_STRUT_K} × ${f(L)} / (${f(t)}/√12) = ${f(slenderness, 2)};  λ = ${f(r.lambda, 3)}, φ = ${f(r.phi, 3)}, α = ${IMPERFECTION.c} (class c);  ` +
      `fcd = ${f(r.fcd_MPa, 1)} MPa;  Pd = ${f(Ag)} × ${f(r.fcd_MPa, 1)} = ${kN(Pd)};  F = ${f(s, 3)} × C`,
    limitState: "ULS",
    demand_N: compressionOf(scenario) * s,
    resistance_N: Pd,
    loadRatio: s,
    notes: () => ["effective length factor K = 0.65: the cover held in position and direction by the bolt groups either side (common practice)"],
  });
}

/** The compression pitch limit in symbols, for the substituted text. */
const COMPRESSION_PITCH_LIMIT_TEXT = (): string => "min(12t, 200)";

/** Pitch along the force in compression: p ≤ min(12 t, 200 mm), t the thinner plate. IS 800:2007, cl. 10.2.3.2. */
export function compressionPitchRule(joint: Joint): RuleCheck[] {
  const worst = worstCompressionPitch(joint, (t) => ({ limit_mm: Math.min(12 * t, 200), text: COMPRESSION_PITCH_LIMIT_TEXT }));
  if (!worst) return [];
  return [
    rule({
      id: "max-pitch-compression",
      kind: "max-pitch",
      title: "Maximum pitch along the force (compression member)",
      component: worst.where,
      citation: COMPRESSION_PITCH_CITATION,
      formula: "p ≤ min(12 t, 200 mm)",
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
  // Both covers span the same length across the butt.
  const L = covers.length > 0 ? coverStrutLength_mm(joint) : 0;
  for (const cover of covers) out.push(coverStrutCheck(joint, scenario, cover, share, L));
  for (const c of compressionPitchRule(joint)) out.push(c);
  return {
    checks: out,
    conventions: [
      covers.length > 0
        ? "compression: each cover a strut between the innermost bolt lines either side of the butt, K = 0.65 (common practice), buckling class c (cl. 7.1.2.1)"
        : "compression: a lap splice has no butt, so no cover strut check; the plates' buckling as members is the member design's",
    ],
  };
}

export const IS800_COMPRESSION: CompressionChecks = { spliceShare, checks };
