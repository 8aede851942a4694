/**
 * The settings an EN 1993-1-8 check depends on beyond the plates, bolts and layout: the partial factors
 * (recommended values, or a national annex's), the source of fy and fu, the M12/M14 clearance and the
 * category of the bolted connection.
 */
import type { En10025Convention } from "../../catalogue/steels.js";
import type { BoltSpec, Scenario } from "../../model/scenario.js";

export interface PartialFactors {
  /** Resistance of cross-sections (gross yield; Category C net section), γM0. EN 1993-1-1, 6.1. */
  gamma_M0: number;
  /** Resistance of members to instability (buckling of a cover strut or a ply in compression), γM1. EN 1993-1-1, 6.1. */
  gamma_M1: number;
  /** Net-section rupture, bolts, plates in bearing, γM2. EN 1993-1-1, 6.1; EN 1993-1-8, Table 2.1. */
  gamma_M2: number;
  /** Slip resistance at the ultimate limit state (Category C), γM3. EN 1993-1-8, Table 2.1. */
  gamma_M3: number;
  /** Slip resistance at the serviceability limit state (Category B), γM3,ser. EN 1993-1-8, Table 2.1. */
  gamma_M3_ser: number;
}

/**
 * The recommended values. EN 1993-1-1, 6.1(1) NOTE 2B (γM0 1.00, γM2 1.25) and EN 1993-1-8, 2.2(2)
 * NOTE, Table 2.1 (γM2 1.25, γM3 1.25, γM3,ser 1.10); see ../shared check values. A national annex may
 * set others (scenario section `factors:`).
 */
export const RECOMMENDED_FACTORS: PartialFactors = { gamma_M0: 1.0, gamma_M1: 1.0, gamma_M2: 1.25, gamma_M3: 1.25, gamma_M3_ser: 1.1 };

/**
 * Categories of bolted connections loaded in shear. EN 1993-1-8, 3.4.1: A bearing type; B slip-resistant
 * at the serviceability limit state; C slip-resistant at the ultimate limit state.
 */
export type Category = "A" | "B" | "C";

export interface Ec3Settings {
  factors: PartialFactors;
  steel: En10025Convention;
  /** Normal-hole clearance of M12 and M14 bolts, mm. */
  smallBoltClearance_mm: 1 | 2;
  category: Category;
}

/** The category of a scenario's bolts (no bolts: bearing type, as the search assumes). */
export function categoryOf(bolts: BoltSpec | undefined): Category {
  if (!bolts || bolts.assembly === "bearing") return "A";
  return bolts.slipAt === "ultimate" ? "C" : "B";
}

/** The settings of a scenario, with the recommended values and the product standard where it is silent. */
export function settingsOf(scenario: Scenario): Ec3Settings {
  const f = scenario.factors ?? {};
  return {
    factors: {
      gamma_M0: f.gammaM0 ?? RECOMMENDED_FACTORS.gamma_M0,
      gamma_M1: f.gammaM1 ?? RECOMMENDED_FACTORS.gamma_M1,
      gamma_M2: f.gammaM2 ?? RECOMMENDED_FACTORS.gamma_M2,
      gamma_M3: f.gammaM3 ?? RECOMMENDED_FACTORS.gamma_M3,
      gamma_M3_ser: f.gammaM3ser ?? RECOMMENDED_FACTORS.gamma_M3_ser,
    },
    steel: scenario.options.steelStrengths ?? "en10025-2",
    smallBoltClearance_mm: scenario.options.smallBoltClearance_mm ?? 1,
    category: categoryOf(scenario.bolts),
  };
}

/**
 * Whether a scenario has these settings (a bound code checks every scenario it is given against its
 * own). Reads the scenario's fields directly: the search asks this for every bound it takes.
 */
export function settingsMatch(s: Ec3Settings, scenario: Scenario): boolean {
  const f = scenario.factors;
  const r = RECOMMENDED_FACTORS;
  return (
    (f?.gammaM0 ?? r.gamma_M0) === s.factors.gamma_M0 &&
    (f?.gammaM1 ?? r.gamma_M1) === s.factors.gamma_M1 &&
    (f?.gammaM2 ?? r.gamma_M2) === s.factors.gamma_M2 &&
    (f?.gammaM3 ?? r.gamma_M3) === s.factors.gamma_M3 &&
    (f?.gammaM3ser ?? r.gamma_M3_ser) === s.factors.gamma_M3_ser &&
    (scenario.options.steelStrengths ?? "en10025-2") === s.steel &&
    (scenario.options.smallBoltClearance_mm ?? 1) === s.smallBoltClearance_mm &&
    categoryOf(scenario.bolts) === s.category
  );
}

/** The partial factors as printed on the sheet. */
export function factorsText(f: PartialFactors): string {
  const recommended =
    f.gamma_M0 === RECOMMENDED_FACTORS.gamma_M0 &&
    f.gamma_M1 === RECOMMENDED_FACTORS.gamma_M1 &&
    f.gamma_M2 === RECOMMENDED_FACTORS.gamma_M2 &&
    f.gamma_M3 === RECOMMENDED_FACTORS.gamma_M3 &&
    f.gamma_M3_ser === RECOMMENDED_FACTORS.gamma_M3_ser;
  return `partial factors γM0 ${f.gamma_M0.toFixed(2)}, γM2 ${f.gamma_M2.toFixed(2)}, γM3 ${f.gamma_M3.toFixed(2)}, γM3,ser ${f.gamma_M3_ser.toFixed(2)} (${recommended ? "the recommended values of EN 1993-1-1 6.1 and EN 1993-1-8 Table 2.1" : "set by the scenario (national annex)"})`;
}
