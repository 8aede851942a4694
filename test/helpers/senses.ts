/**
 * A scenario's load turned into another sense, for tests that must hold in tension, compression and
 * reversal alike.
 */
import { parse, stringify } from "yaml";

export type Sense = "tension" | "compression" | "reversal";

/**
 * The scenario text with its load as given, turned into compression alone, or reversing: C = 0.8 T,
 * rounded, in the unit the tension was written in ("620 kN" → "496 kN", "120 kip" → "96 kip").
 */
export function withSense(yaml: string, sense: Sense): string {
  if (sense === "tension") return yaml;
  const file = parse(yaml) as { load: Record<string, unknown> };
  const T = file.load.factored_tension as number | string;
  file.load.factored_compression = typeof T === "number" ? Math.round(0.8 * T) : `${Math.round(0.8 * parseFloat(T))} ${T.replace(/^\s*[\d.]+\s*/, "")}`;
  if (sense === "compression") {
    delete file.load.factored_tension;
    delete file.load.service_tension;
  }
  return stringify(file);
}
