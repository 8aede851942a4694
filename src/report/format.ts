/**
 * Numbers for people: every shell (terminal, HTML, drawing, CSV) prints a figure the same way. Pure.
 *
 * Dimensions keep the precision they have and no more: 62.5 mm prints "62.5", 60 mm prints "60",
 * 37.4 mm prints "37.4" (up to 0.01 mm; inches up to 0.001 in). Forces print to 0.1 kN or 0.1 kips.
 */
import { sixteenthsParts, toUnit } from "../units/units.js";

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
  const { whole, fraction } = sixteenthsParts(sixteenths);
  if (!fraction) return String(whole);
  return whole > 0 ? `${whole} ${fraction}` : fraction;
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
  // Under an inch, the inches still show: 1'-0 3/8" (common practice).
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

/** Kilograms in one avoirdupois pound: 0.45359237 kg exactly (international yard and pound, 1959). */
export const KG_PER_LB = 0.45359237;

/** A rounded number for a data file: `digits` decimals, no float noise, never -0. */
export function roundedNumber(v: number, digits: number): number {
  const r = Number(v.toFixed(digits));
  return r === 0 ? 0 : r;
}

/** A length as a number for a data file (CSV): mm to 0.01, or decimal inches to 0.0001 (US). */
export function lengthValue(mm: number, units: DisplayUnits = "si"): number {
  return units === "us" ? roundedNumber(toUnit(mm, "in", "length"), 4) : roundedNumber(mm, 2);
}

/** A mass as a number for a data file: kg, or lb (US), to 0.01. */
export function massValue(kg: number, units: DisplayUnits = "si"): number {
  return roundedNumber(units === "us" ? kg / KG_PER_LB : kg, 2);
}

/** The unit suffix of a data file's column: "mm" or "in" for lengths, "kg" or "lb" for masses. */
export function unitSuffix(quantity: "length" | "mass", units: DisplayUnits = "si"): string {
  if (quantity === "mass") return units === "us" ? "lb" : "kg";
  return units === "us" ? "in" : "mm";
}

/**
 * A text the core wrote in SI (formula texts, notes, conventions, warnings: "|y centroid| ≤ 0.5 mm") as a
 * US customary output shows it: every "<number> mm" in inches (to 0.001 in), mm² in in², kN in kips,
 * MPa in ksi, and a bare "mm" unit word as "in". SI text is returned unchanged. Display only: the figures
 * behind it stay in N, mm, MPa.
 */
export function displayText(text: string, units: DisplayUnits): string {
  if (units !== "us") return text;
  const num = String.raw`(-?\d+(?:\.\d+)?)`;
  return text
    .replace(new RegExp(`${num}\\s?mm²`, "g"), (_, v: string) => `${trimmed(toUnit(toUnit(Number(v), "in", "length"), "in", "length"), 3)} in²` /* mm² ÷ 25.4² */)
    .replace(new RegExp(`${num}\\s?mm\\b`, "g"), (_, v: string) => `${trimmed(toUnit(Number(v), "in", "length"), 3)} in`)
    .replace(new RegExp(`${num}\\s?kN\\b`, "g"), (_, v: string) => `${trimmed(toUnit(Number(v) * 1000, "kip", "force"), 2)} kips`)
    .replace(new RegExp(`${num}\\s?MPa\\b`, "g"), (_, v: string) => `${trimmed(toUnit(Number(v), "ksi", "stress"), 1)} ksi`)
    .replace(/\bmm²/g, "in²")
    .replace(/\bmm\b/g, "in")
    .replace(/\bkN\b/g, "kips")
    .replace(/\bMPa\b/g, "ksi");
}
