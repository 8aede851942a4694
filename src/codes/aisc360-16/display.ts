/**
 * How the AISC 360-16 module writes numbers into its substituted-values text: in, kips, ksi for a
 * scenario in US customary units, mm, kN, MPa otherwise. Only text; every figure stays in N, mm, MPa.
 */
import type { Scenario } from "../../model/scenario.js";
import { f } from "../format.js";
import { MM_PER_IN, MPA_PER_KSI, N_PER_KIP } from "./factors.js";

export interface UnitText {
  us: boolean;
  len(mm: number): string;
  area(mm2: number): string;
  force(N: number): string;
  stress(MPa: number): string;
  /** A length as a bare number in the display unit (inside formulas). */
  n(mm: number): string;
}

const US: UnitText = {
  us: true,
  len: (mm) => `${f(mm / MM_PER_IN, 3)} in`,
  area: (mm2) => `${f(mm2 / (MM_PER_IN * MM_PER_IN), 3)} in²`,
  force: (N) => `${f(N / N_PER_KIP, 2)} kips`,
  stress: (MPa) => `${f(MPa / MPA_PER_KSI, 1)} ksi`,
  n: (mm) => f(mm / MM_PER_IN, 3),
};

const SI: UnitText = {
  us: false,
  len: (mm) => `${f(mm)} mm`,
  area: (mm2) => `${f(mm2)} mm²`,
  force: (N) => `${f(N / 1000, 2)} kN`,
  stress: (MPa) => `${f(MPa, 1)} MPa`,
  n: (mm) => f(mm),
};

export function unitText(scenario: Pick<Scenario, "units">): UnitText {
  return scenario.units === "us" ? US : SI;
}
