/**
 * EN 1993-1-8 / EN 1993-1-1 checks of a splice in compression: the cross-section of each plate
 * (EN 1993-1-1 6.2.4), each cover as a strut across the butt (6.3.1), local buckling of a ply between
 * fasteners (EN 1993-1-8 Table 3.3 note 2), and the part of the force butt ends in contact may carry.
 * The bolt checks are the tension ones run on the joint with its bearing directions reversed.
 */
import { strength } from "../check-builders.js";
import { compressionArea, compressionOf, compressionShare, COVER_STRUT_K, coverStrutLength_mm, largestPitch_mm, plateRadius_mm } from "../compression-measures.js";
import { f, kN } from "../format.js";
import { holePlates } from "../rule-measures.js";
import type { CompressionChecks } from "../types.js";
import type { Joint, PlatePiece } from "../../model/joint.js";
import type { CheckResult, StrengthCheck } from "../../model/results.js";
import type { CheckableScenario, Scenario } from "../../model/scenario.js";
import { cl, cl11, fixed } from "./citation.js";
import { chi, IMPERFECTION, Nb_Rd, Nc_Rd } from "./compression-member.js";
import type { PartialFactors } from "./settings.js";

/**
 * Where members are prepared for full contact in bearing, splice material transmits at least 25 % of the
 * maximum compressive force: the contact may carry the rest. EN 1993-1-8, 6.2.7.1(14) (clause and 25 % as
 * Steel Buildings in Europe, Part 5: Joint Design, p. 5-85, cites them, https://infosteel.be/images/Steel-Buildings-in-Europe/MSB05/96;
 * the 25 % also in SCI Advisory Desk note AD 393, newsteelconstruction.com). A column-splice rule applied to a
 * plate splice whose butt ends bear (the reading stated in the output).
 */
export const EN_CONTACT_SPLICE_SHARE = 0.25;

/** The citations of the compression checks, made once and shared by every result (frozen). */
const GROSS_COMPRESSION_CITATION = fixed(cl11("6.2.4", { equation: "(6.10)", also: ["6.2.4(3) (holes filled by fasteners, from memory)"] }));
const COVER_STRUT_CITATION = fixed(cl11("6.3.1", { equation: "(6.47)", also: ["6.3.1.2 (6.49), Table 6.1 (curve c)"] }));
const PLY_BUCKLING_CITATION = fixed(cl("Table 3.3", { also: ["note 2", "EN 1993-1-1 6.3.1 (curve c)"] }));

function spliceShare(scenario: Scenario): { value: number; text: string } {
  if (!scenario.splice.endsInContact) return { value: 1, text: "compression: butt ends not in contact — the bolts and covers carry the whole compression" };
  return {
    value: EN_CONTACT_SPLICE_SHARE,
    text: "compression: butt ends prepared for full contact in bearing — the splice material (bolts, covers) carries 25 % of the compression and the contact 75 % (EN 1993-1-8 6.2.7.1(14)); the main plates' cross-section carries the whole force",
  };
}

/**
 * Cross-section of a plate in compression: F ≤ Nc,Rd = A·fy/γM0, fastener holes filled by fasteners
 * not deducted, oversize and slotted holes deducted. EN 1993-1-1, 6.2.4, Eq. (6.10); 6.2.4(3) (from memory).
 */
function grossCompressionCheck(joint: Joint, scenario: CheckableScenario, plate: PlatePiece, share: number, factors: PartialFactors): StrengthCheck {
  const filled = scenario.bolts.hole === "standard";
  const a = compressionArea(joint, plate, filled);
  const N = Nc_Rd(a.A_mm2, plate.fy_MPa, factors.gamma_M0);
  const s = compressionShare(plate, share);
  return strength({
    id: `gross-compression:${plate.id}`,
    kind: "gross-compression",
    title: "Cross-section in compression",
    component: plate.label,
    citation: GROSS_COMPRESSION_CITATION,
    formula: "NEd ≤ Nc,Rd = A·fy/γM0",
    substituted: () =>
      `A = ${filled ? `${f(plate.spec.width_mm)} × ${f(plate.spec.thickness_mm)}` : `${f(plate.spec.width_mm * plate.spec.thickness_mm)} − ${f(a.deducted)} (holes of the fullest line)`} = ${f(a.A_mm2)} mm²;  ` +
      `Nc,Rd = ${f(a.A_mm2)} × ${plate.fy_MPa} / ${f(factors.gamma_M0, 2)} = ${kN(N)}` + (s !== 1 ? `;  NEd = ${f(s, 3)} × C` : ""),
    limitState: "ULS",
    demand_N: compressionOf(scenario) * s,
    resistance_N: N,
    loadRatio: s,
    notes: () => [filled ? "normal holes filled by the bolts: not deducted" : `${scenario.bolts.hole} holes deducted`],
  });
}

/** Flexural buckling of a plate strut of length Lcr, curve c: Nb,Rd = χ·A·fy/γM1. EN 1993-1-1, 6.3.1. */
function plateBuckling(plate: PlatePiece, Lcr_mm: number, factors: PartialFactors) {
  const t = plate.spec.thickness_mm;
  const A = plate.spec.width_mm * t;
  const slenderness = Lcr_mm / plateRadius_mm(t);
  const c = chi(slenderness, plate.fy_MPa, IMPERFECTION.c);
  return { A, slenderness, ...c, N_N: Nb_Rd(c.chi, A, plate.fy_MPa, factors.gamma_M1) };
}

function bucklingText(b: ReturnType<typeof plateBuckling>, plate: PlatePiece, Lcr: string, factors: PartialFactors, s: number): string {
  return `${Lcr};  Lcr/i = ${f(b.slenderness, 2)} (i = t/√12);  λ̄ = ${f(b.lambdaBar, 3)}, Φ = ${f(b.Phi, 3)}, α = ${IMPERFECTION.c} (curve c);  χ = ${f(b.chi, 3)};  ` +
    `Nb,Rd = ${f(b.chi, 3)} × ${f(b.A)} × ${plate.fy_MPa} / ${f(factors.gamma_M1, 2)} = ${kN(b.N_N)};  NEd = ${f(s, 3)} × C`;
}

/**
 * A cover as a strut across the butt: NEd ≤ Nb,Rd, Lcr = 0.65·L, L between the innermost bolt lines
 * either side (common practice), curve c. EN 1993-1-1, 6.3.1.1 Eq. (6.47), 6.3.1.2 Eq. (6.49), Table 6.1.
 */
function coverStrutCheck(joint: Joint, scenario: CheckableScenario, plate: PlatePiece, share: number, factors: PartialFactors): StrengthCheck {
  const L = coverStrutLength_mm(joint);
  const b = plateBuckling(plate, COVER_STRUT_K * L, factors);
  const s = compressionShare(plate, share);
  return strength({
    id: `cover-strut:${plate.id}`,
    kind: "strut-buckling",
    title: "Cover plate as a strut across the butt",
    component: plate.label,
    citation: COVER_STRUT_CITATION,
    formula: "NEd ≤ Nb,Rd = χ·A·fy/γM1;  χ = 1/(Φ + √(Φ² − λ̄²));  λ̄ = (Lcr/i)/(π√(E/fy));  Lcr = 0.65·L",
    substituted: () => bucklingText(b, plate, `L = ${f(L)} mm between the innermost bolt lines, Lcr = ${COVER_STRUT_K} × ${f(L)} = ${f(COVER_STRUT_K * L)} mm`, factors, s),
    limitState: "ULS",
    demand_N: compressionOf(scenario) * s,
    resistance_N: b.N_N,
    loadRatio: s,
    notes: () => ["Lcr = 0.65 L: the cover held in position and direction by the bolt groups either side (common practice)"],
  });
}

/**
 * Local buckling of a ply between fasteners: with p1/t ≥ 9ε, the ply as a strut of buckling length
 * 0.6·p1 (curve c); below 9ε no check is needed. EN 1993-1-8, Table 3.3 note 2; EN 1993-1-1, 6.3.1.
 */
function plyBucklingCheck(joint: Joint, scenario: CheckableScenario, plate: PlatePiece, share: number, factors: PartialFactors): StrengthCheck | null {
  const p1 = largestPitch_mm(joint, plate);
  const t = plate.spec.thickness_mm;
  const eps = Math.sqrt(235 / plate.fy_MPa);
  if (p1 === 0 || p1 / t < 9 * eps) return null;
  const b = plateBuckling(plate, 0.6 * p1, factors);
  const s = compressionShare(plate, share);
  return strength({
    id: `ply-buckling:${plate.id}`,
    kind: "ply-buckling",
    title: "Local buckling of the ply between fasteners",
    component: plate.label,
    citation: PLY_BUCKLING_CITATION,
    formula: "p1/t ≥ 9ε: NEd ≤ Nb,Rd with Lcr = 0.6·p1",
    substituted: () => bucklingText(b, plate, `p1/t = ${f(p1)}/${f(t)} = ${f(p1 / t, 2)} ≥ 9ε = ${f(9 * eps, 2)}; Lcr = 0.6 × ${f(p1)} = ${f(0.6 * p1)} mm`, factors, s),
    limitState: "ULS",
    demand_N: compressionOf(scenario) * s,
    resistance_N: b.N_N,
    loadRatio: s,
    notes: () => ["the ply's whole width as the strut (the plate between two transverse lines of fasteners)"],
  });
}

export function en1993Compression(factors: PartialFactors): CompressionChecks {
  return {
    spliceShare,
    checks(joint, scenario, share): { checks: CheckResult[]; conventions: string[] } {
      const out: CheckResult[] = [];
      for (const plate of holePlates(joint)) out.push(grossCompressionCheck(joint, scenario, plate, share, factors));
      const covers = joint.plates.filter((p) => p.role === "cover");
      for (const cover of covers) out.push(coverStrutCheck(joint, scenario, cover, share, factors));
      for (const plate of holePlates(joint)) {
        const ply = plyBucklingCheck(joint, scenario, plate, share, factors);
        if (ply) out.push(ply);
      }
      return {
        checks: out,
        conventions: [
          covers.length > 0
            ? `compression: each cover a strut between the innermost bolt lines either side of the butt, Lcr = 0.65 L (common practice), curve c, γM1 ${f(factors.gamma_M1, 2)}`
            : "compression: a lap splice has no butt, so no cover strut check; the plates' buckling as members is the member design's",
          "compression: local buckling of each ply between fasteners over 0.6 p1 where p1/t ≥ 9ε (Table 3.3 note 2)",
        ],
      };
    },
  };
}
