/**
 * Numbers for people: every shell (terminal, HTML, drawing, CSV) prints a figure the same way. Pure.
 *
 * Dimensions keep the precision they have and no more: 62.5 mm prints "62.5", 60 mm prints "60",
 * 37.4 mm prints "37.4" (up to 0.01 mm; inches up to 0.001 in). Forces print to 0.1 kN or 0.1 kips.
 */
import { toUnit } from "../units/units.js";

export type DisplayUnits = "si" | "us";

/** A number to at most `digits` decimals, trailing zeros dropped ("62.5", "60", "0.125"). */
export function trimmed(v: number, digits: number): string {
  if (!Number.isFinite(v)) return v > 0 ? "∞" : "—";
  const s = v.toFixed(digits);
  const t = s.includes(".") ? s.replace(/\.?0+$/, "") : s;
  return t === "-0" ? "0" : t;
}

/** A length without its unit: mm to 0.01, or inches to 0.001 (US display). */
export function lengthNumber(mm: number, units: DisplayUnits = "si"): string {
  return units === "us" ? trimmed(toUnit(mm, "in", "length"), 3) : trimmed(mm, 2);
}

/** A length with its unit: "62.5 mm", "2.5 in". */
export function lengthText(mm: number, units: DisplayUnits = "si"): string {
  return `${lengthNumber(mm, units)} ${units === "us" ? "in" : "mm"}`;
}

/** A force without its unit, to 0.1 kN or 0.1 kips. */
export function forceNumber(N: number, units: DisplayUnits = "si"): string {
  if (!Number.isFinite(N)) return "∞";
  return units === "us" ? toUnit(N, "kip", "force").toFixed(1) : (N / 1000).toFixed(1);
}

/** A force with its unit: "620.0 kN", "135.6 kips". */
export function forceText(N: number, units: DisplayUnits = "si"): string {
  return `${forceNumber(N, units)} ${units === "us" ? "kips" : "kN"}`;
}

/** A utilisation (a ratio of forces) to `digits` decimals. */
export function ratioText(v: number, digits = 2): string {
  return Number.isFinite(v) ? v.toFixed(digits) : "∞";
}

/** Sixteenths of an inch in a length, rounded to the nearest (US shop drawings dimension to 1/16 in: common practice). */
function sixteenthsOf(mm: number): number {
  return Math.round(toUnit(mm, "in", "length") * 16);
}

/** Whole inches and a reduced fraction of sixteenths, "5 1/2", "3/4", "12", "0". */
function inchesAndFraction(sixteenths: number): string {
  const whole = Math.floor(sixteenths / 16);
  let numerator = sixteenths % 16;
  let denominator = 16;
  while (numerator > 0 && numerator % 2 === 0) {
    numerator /= 2;
    denominator /= 2;
  }
  if (numerator === 0) return String(whole);
  return whole > 0 ? `${whole} ${numerator}/${denominator}` : `${numerator}/${denominator}`;
}

/**
 * A length as a US shop drawing writes it, to the nearest 1/16 in: below 12 in in inches with a fraction
 * (`5 1/2"`, `3/4"`), from 12 in in feet and inches (`1'-6 1/2"`, `2'-0"`) (common practice).
 */
export function usDimensionText(mm: number): string {
  const sixteenths = sixteenthsOf(Math.abs(mm));
  const sign = mm < 0 && sixteenths > 0 ? "-" : "";
  if (sixteenths < 12 * 16) return `${sign}${inchesAndFraction(sixteenths)}"`;
  const feet = Math.floor(sixteenths / (12 * 16));
  const rest = sixteenths - feet * 12 * 16;
  // Under an inch after the feet, the whole inches are written as 0: 1'-0 3/8" (common practice).
  return `${sign}${feet}'-${rest > 0 && rest < 16 ? "0 " : ""}${inchesAndFraction(rest)}"`;
}

/** A dimension for a drawing or a bill of materials: mm as `lengthNumber` gives it, or US feet-inches-fractions. */
export function dimensionText(mm: number, units: DisplayUnits = "si"): string {
  return units === "us" ? usDimensionText(mm) : lengthNumber(mm, "si");
}

/** A stress with its unit: "410 MPa" or "58 ksi" (to 0.1). */
export function stressText(MPa: number, units: DisplayUnits = "si"): string {
  return units === "us" ? `${trimmed(toUnit(MPa, "ksi", "stress"), 1)} ksi` : `${trimmed(MPa, 1)} MPa`;
}
