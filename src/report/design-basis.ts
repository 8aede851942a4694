/**
 * The design basis of a checked layout, as data for page 1 of the report: the code edition, the
 * partial factors (IS 800, EN 1993-1-8) or resistance factors (AISC 360 LRFD) the checks used, where
 * each value comes from (the code's table, the recommended values, or the scenario's national annex),
 * and the material and bolt standards. Reads the factors from the code modules; never restates them. Pure.
 */
import { PARTIAL_FACTORS } from "../codes/is800-2007/factors.js";
import { PHI } from "../codes/aisc360-16/factors.js";
import { phiSlip } from "../codes/aisc360-16/slip.js";
import { settingsOf } from "../codes/en1993-1-8/settings.js";
import { ASTM_PLATE_GRADES, astmPlateGrade } from "../catalogue/steels.js";
import type { BillOfMaterials } from "../export/bolt-list.js";
import type { CheckKind, CheckReport } from "../model/results.js";
import type { CheckableScenario } from "../model/scenario.js";

/** One factor as the design basis lists it. */
export interface FactorLine {
  /** The code's own symbol: γm0, γM2, φ. */
  symbol: string;
  value: number;
  /** What it divides or multiplies, in the code's words. */
  use: string;
  /** Where the value comes from (clause and table, or the scenario's national annex). */
  source: string;
}

export interface DesignBasis {
  /** "partial safety factors" (IS), "partial factors" (EN) or "resistance factors φ (LRFD)" (AISC). */
  factorsTitle: string;
  factors: FactorLine[];
  /** One line on the values: the code's fixed table, recommended values, or a national annex. */
  factorsNote: string;
  plates: string[];
  bolts: string[];
}

const has = (kinds: Set<CheckKind>, ...k: CheckKind[]) => k.some((x) => kinds.has(x));

function isFactors(kinds: Set<CheckKind>, scenario: CheckableScenario): FactorLine[] {
  const T5 = "IS 800:2007 cl. 5.4.1, Table 5";
  const lines: FactorLine[] = [
    { symbol: "γm0", value: PARTIAL_FACTORS.gamma_m0, use: "resistance governed by yielding (gross section, compression)", source: T5 },
    { symbol: "γm1", value: PARTIAL_FACTORS.gamma_m1, use: "resistance governed by ultimate stress (net section, block shear)", source: T5 },
  ];
  if (has(kinds, "bolt-shear", "bolt-bearing")) lines.push({ symbol: "γmb", value: PARTIAL_FACTORS.gamma_mb, use: "bearing-type bolts (shear, bearing)", source: T5 });
  if (has(kinds, "slip")) {
    const service = scenario.bolts.slipAt !== "ultimate";
    lines.push({ symbol: "γmf", value: service ? PARTIAL_FACTORS.gamma_mf_service : PARTIAL_FACTORS.gamma_mf_ultimate, use: `friction-grip bolts, slip designed at the ${service ? "service" : "ultimate"} load`, source: T5 });
  }
  return lines;
}

function enFactors(kinds: Set<CheckKind>, scenario: CheckableScenario): { lines: FactorLine[]; national: boolean } {
  const s = settingsOf(scenario);
  const given = scenario.factors ?? {};
  const src = (key: keyof typeof given, recommended: string) => (given[key] !== undefined ? "the scenario (national annex), factors." + key : recommended);
  const ec1 = "EN 1993-1-1 6.1 NOTE 2B, recommended";
  const t21 = "EN 1993-1-8 Table 2.1, recommended";
  const lines: FactorLine[] = [
    { symbol: "γM0", value: s.factors.gamma_M0, use: "resistance of cross-sections (gross yield; the shear area in block tearing, EN 1993-1-8 3.10.2)", source: src("gammaM0", ec1) },
  ];
  if (has(kinds, "strut-buckling", "ply-buckling")) lines.push({ symbol: "γM1", value: s.factors.gamma_M1, use: "resistance of members to instability (cover strut, ply buckling)", source: src("gammaM1", ec1) });
  lines.push({ symbol: "γM2", value: s.factors.gamma_M2, use: "net-section rupture, bolts, plates in bearing, the tension area in block tearing", source: src("gammaM2", t21) });
  if (has(kinds, "slip") && s.category === "C") lines.push({ symbol: "γM3", value: s.factors.gamma_M3, use: "slip resistance at the ultimate limit state (Category C)", source: src("gammaM3", t21) });
  if (has(kinds, "slip") && s.category === "B") lines.push({ symbol: "γM3,ser", value: s.factors.gamma_M3_ser, use: "slip resistance at the serviceability limit state (Category B)", source: src("gammaM3ser", t21) });
  return { lines, national: Object.values(given).some((v) => v !== undefined) };
}

function aiscFactors(kinds: Set<CheckKind>, scenario: CheckableScenario): FactorLine[] {
  const lines: FactorLine[] = [];
  if (has(kinds, "gross-yield")) lines.push({ symbol: "φt", value: PHI.yield, use: "tensile yielding of the gross section", source: "AISC 360-16 D2(a), J4.1(a)" });
  if (has(kinds, "net-section")) lines.push({ symbol: "φt", value: PHI.rupture, use: "tensile rupture of the net section", source: "AISC 360-16 D2(b), J4.1(b)" });
  if (has(kinds, "bolt-shear")) lines.push({ symbol: "φ", value: PHI.boltShear, use: "bolt shear", source: "AISC 360-16 J3.6" });
  if (has(kinds, "bolt-bearing")) lines.push({ symbol: "φ", value: PHI.bearing, use: "bearing and tearout at bolt holes", source: "AISC 360-16 J3.10" });
  if (has(kinds, "block-shear")) lines.push({ symbol: "φ", value: PHI.blockShear, use: "block shear rupture", source: "AISC 360-16 J4.3" });
  if (has(kinds, "slip")) lines.push({ symbol: "φ", value: phiSlip(scenario.bolts.hole, scenario.bolts.slotDirection), use: `slip resistance, ${scenario.bolts.hole} holes`, source: "AISC 360-16 J3.8" });
  if (has(kinds, "gross-compression", "strut-buckling", "ply-buckling")) lines.push({ symbol: "φc", value: 0.9, use: "connecting elements in compression", source: "AISC 360-16 J4.4" });
  return lines;
}

function plateStandards(scenario: CheckableScenario): string[] {
  const grades = [...new Set([scenario.plates.mainA, scenario.plates.mainB, ...scenario.plates.covers].map((p) => p.grade))];
  if (scenario.code.startsWith("is800")) return grades.map((g) => `${g} to IS 2062 (fy by thickness, IS 2062 Table 2)`);
  if (scenario.code.startsWith("en1993")) {
    const steel = scenario.options.steelStrengths ?? "en10025-2";
    return grades.map((g) => `${g} to EN 10025 (fy, fu ${steel === "en10025-2" ? "by thickness from the product standard, EN 10025-2" : "from EN 1993-1-1 Table 3.1"})`);
  }
  return grades.map((g) => {
    const key = astmPlateGrade(g);
    const row = key ? ASTM_PLATE_GRADES[key] : undefined;
    return row ? `${row.source.replace(/, AISC Manual.*$/, "")} (Fy ${row.Fy_ksi} ksi, Fu ${row.Fu_ksi} ksi; AISC Manual Table 2-5)` : g;
  });
}

function boltStandards(scenario: CheckableScenario, bom: BillOfMaterials): string[] {
  const b = scenario.bolts;
  const grade = scenario.code.startsWith("aisc") ? `ASTM F3125 Grade ${b.astmGrade ?? b.propertyClass}` : `property class ${b.propertyClass} (ISO 898-1)`;
  const assembly = [...new Set([...bom.bolts, ...bom.nuts, ...bom.washers].map((x) => x.standard))];
  return [grade, `assembly: ${assembly.join(", ")}`];
}

/** The design basis of a checked layout (the factors listed are those its checks use). */
export function designBasis(scenario: CheckableScenario, report: CheckReport, bom: BillOfMaterials): DesignBasis {
  const kinds = new Set(report.checks.map((c) => c.kind));
  const plates = plateStandards(scenario);
  const bolts = boltStandards(scenario, bom);
  if (scenario.code.startsWith("en1993")) {
    const { lines, national } = enFactors(kinds, scenario);
    const allRecommended = lines.every((l) => !l.source.startsWith("the scenario"));
    return {
      factorsTitle: "Partial factors",
      factors: lines,
      factorsNote: national && !allRecommended ? "national annex values given by the scenario (section factors:) where stated; recommended values elsewhere" : "recommended values (EN 1993-1-1 6.1, EN 1993-1-8 Table 2.1); no national annex given",
      plates,
      bolts,
    };
  }
  if (scenario.code.startsWith("aisc")) {
    return { factorsTitle: "Resistance factors φ (LRFD)", factors: aiscFactors(kinds, scenario), factorsNote: "LRFD: design strength φRn ≥ required strength Ru (AISC 360-16 B3.1)", plates, bolts };
  }
  return { factorsTitle: "Partial safety factors", factors: isFactors(kinds, scenario), factorsNote: "the values of IS 800:2007 Table 5 (limit state method)", plates, bolts };
}
