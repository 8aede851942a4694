/**
 * Units. The calculation core works in one system only: N, mm, MPa (N/mm²).
 * Conversion happens at input (scenario files) and at display, nowhere else.
 *
 * Conversion factors are exact by definition (common practice):
 *   1 in  = 25.4 mm (international inch, 1959)
 *   1 ft  = 304.8 mm
 *   1 lbf = 4.4482216152605 N  → 1 kip = 4448.2216152605 N
 *   1 ksi = 1 kip/in² = 6.894757293168 MPa
 */
import { ownEntry } from "../catalogue/lookup.js";

export type Quantity = "length" | "force" | "stress";

/** Factor from each accepted unit to the core unit of its quantity (mm, N, MPa). */
export const UNIT_FACTORS: Record<Quantity, Record<string, number>> = {
  length: { mm: 1, cm: 10, m: 1000, in: 25.4, ft: 304.8 },
  force: { N: 1, kN: 1000, MN: 1e6, lbf: 4.4482216152605, kip: 4448.2216152605, kips: 4448.2216152605 },
  stress: { MPa: 1, "N/mm2": 1, "N/mm²": 1, GPa: 1000, psi: 0.006894757293168, ksi: 6.894757293168 },
};

/** The unit a bare number means in a scenario file, per quantity. */
export const DEFAULT_INPUT_UNIT: Record<Quantity, string> = { length: "mm", force: "kN", stress: "MPa" };

/** The unit a bare number means in a scenario file with `units: us` (US customary). */
export const US_INPUT_UNIT: Record<Quantity, string> = { length: "in", force: "kip", stress: "ksi" };

export class UnitError extends Error {}

/**
 * Parse a value with an optional unit into core units.
 * A bare number takes the documented default of the field (mm, kN, MPa).
 * Accepts "12 mm", "12mm", "0.75 in", "100 kip", "36 ksi", "450 kN", and simple fractions "3/4 in", "1 1/8 in".
 * @throws UnitError naming the reason when the text is not a number with a known unit of this quantity.
 */
export function parseQuantity(value: unknown, quantity: Quantity, defaults: Record<Quantity, string> = DEFAULT_INPUT_UNIT): number {
  if (typeof value === "number") {
    if (!Number.isFinite(value)) throw new UnitError(`${value} is not a finite number`);
    return value * factorOf(defaults[quantity], quantity);
  }
  if (typeof value !== "string") throw new UnitError(`expected a number or a string such as "12 mm", got ${describe(value)}`);
  const text = value.trim();
  const match = /^([-+]?(?:\d+\s+\d+\/\d+|\d+\/\d+|\d*\.?\d+(?:[eE][-+]?\d+)?))\s*([A-Za-z/²2]*)$/.exec(text);
  if (!match) throw new UnitError(`"${value}" is not a number with a unit`);
  const amount = parseAmount(match[1] ?? "");
  const unit = match[2] ?? "";
  const factor = unit === "" ? factorOf(defaults[quantity], quantity) : factorOf(unit, quantity);
  return amount * factor;
}

/** A number, a fraction "3/4" or a mixed number "1 1/2"; a sign applies to the whole amount ("-1 1/2" is −1.5). */
function parseAmount(text: string): number {
  const sign = text.startsWith("-") ? -1 : 1;
  const unsigned = text.replace(/^[-+]/, "");
  const mixed = /^(\d+)\s+(\d+)\/(\d+)$/.exec(unsigned);
  if (mixed) return sign * (Number(mixed[1]) + Number(mixed[2]) / Number(mixed[3]));
  const fraction = /^(\d+)\/(\d+)$/.exec(unsigned);
  if (fraction) return (sign * Number(fraction[1])) / Number(fraction[2]);
  return Number(text);
}

function factorOf(unit: string, quantity: Quantity): number {
  const factor = ownEntry(UNIT_FACTORS[quantity], unit);
  if (factor === undefined) {
    const known = Object.keys(UNIT_FACTORS[quantity]).join(", ");
    throw new UnitError(`unknown ${quantity} unit "${unit}" (known: ${known})`);
  }
  return factor;
}

function describe(value: unknown): string {
  if (value === null) return "null";
  if (Array.isArray(value)) return "a list";
  return typeof value;
}

/** Convert a core value (mm, N, MPa) to a display unit. */
export function toUnit(coreValue: number, unit: string, quantity: Quantity): number {
  return coreValue / factorOf(unit, quantity);
}

/** Convert a display value into core units (mm, N, MPa). */
export function fromUnit(value: number, unit: string, quantity: Quantity): number {
  return value * factorOf(unit, quantity);
}

export const N_PER_KN = 1000;

/**
 * A count of sixteenths of an inch as whole inches and a reduced fraction: 36 → { whole: 2, fraction: "1/4" },
 * 12 → { whole: 0, fraction: "3/4" }, 32 → { whole: 2, fraction: "" }. Every inch text (sizes, lengths,
 * dimensions) is written from this.
 */
export function sixteenthsParts(sixteenths: number): { whole: number; fraction: string } {
  const whole = Math.floor(sixteenths / 16);
  let numerator = sixteenths - whole * 16;
  let denominator = 16;
  while (numerator > 0 && numerator % 2 === 0) {
    numerator /= 2;
    denominator /= 2;
  }
  return { whole, fraction: numerator > 0 ? `${numerator}/${denominator}` : "" };
}

/** An inch amount as a bolt size or an ordered bolt length is written: "3/4", "1-1/8", "2-1/2", "2" ("0" for none). */
export function hyphenatedInches(sixteenths: number): string {
  const { whole, fraction } = sixteenthsParts(sixteenths);
  if (whole === 0) return fraction || "0";
  return fraction ? `${whole}-${fraction}` : String(whole);
}
