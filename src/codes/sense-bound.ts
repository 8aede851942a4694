/**
 * The search's strength bound for every sense of the load (DEVELOPERS.md, "Admissible bounds under
 * compression and reversal"). Tension: the code's own bound. Compression: the code's bound of the
 * compression sense — the same bolt-shear and slip terms, the bearing terms without the end distances
 * (in compression the bolts bear away from the plate ends), gross yield (the same formula as the
 * compression cross-section with holes filled) and no net section — at the force the splice carries,
 * scaled to the reference load as the checker scales its compression checks (model/load.ts).
 */
import type { CompressionChecks, DesignCode, LayoutShape, StrengthBound } from "./types.js";
import type { CheckableScenario } from "../model/scenario.js";
import { factoredOf, loadSenses, referenceLoad_N } from "../model/load.js";

/** The scenario with the carried compression standing for the tension, made once per scenario and code. */
const asCompressionOf = new WeakMap<CheckableScenario, { code: DesignCode; carried_N: number; scenario: CheckableScenario }>();

function compressionScenario(code: DesignCode, compression: CompressionChecks, scenario: CheckableScenario): { carried_N: number; scenario: CheckableScenario } {
  const known = asCompressionOf.get(scenario);
  if (known && known.code === code) return known;
  const share = compression.spliceShare(scenario).value;
  const carried = share * factoredOf(scenario.load, "compression");
  const Cs = scenario.load.serviceCompression_N;
  const made = { code, carried_N: carried, scenario: { ...scenario, load: { factoredTension_N: carried, ...(Cs !== undefined ? { serviceTension_N: share * Cs } : {}) } } };
  asCompressionOf.set(scenario, made);
  return made;
}

/** A bound of every sense of the load, with the tension sense's own joint-strength bound (null: no tension sense), N. */
export interface SenseBound extends StrengthBound {
  tension_N: number | null;
}

export function loadBound(code: DesignCode, scenario: CheckableScenario, shape: LayoutShape): SenseBound {
  // Tension alone (no compression sense): the code's own bound.
  if (!((scenario.load.factoredCompression_N ?? 0) > 0) || !code.compression) {
    const t = code.strengthBound(scenario, shape);
    return { jointStrength_N: t.jointStrength_N, check: t.check, serviceOk: t.serviceOk, perBolt_N: t.perBolt_N, plates_N: t.plates_N, tension_N: t.jointStrength_N };
  }
  const senses = loadSenses(scenario.load);
  const ref = referenceLoad_N(scenario.load);
  const { carried_N: carried, scenario: asCompression } = compressionScenario(code, code.compression, scenario);
  const { endDistance_mm: _e, endDistanceAtButt_mm: _eb, ...rest } = shape;
  const c = code.strengthBound(asCompression, { ...rest, sense: "compression" });
  const scale = ref / carried;
  const inRef: SenseBound = {
    jointStrength_N: c.jointStrength_N * scale,
    check: `${c.check} (compression)`,
    serviceOk: c.serviceOk,
    perBolt_N: c.perBolt_N * scale,
    plates_N: c.plates_N * scale,
    tension_N: null,
  };
  if (!senses.includes("tension")) return inRef;
  const t = code.strengthBound(scenario, shape);
  return {
    jointStrength_N: Math.min(t.jointStrength_N, inRef.jointStrength_N),
    check: t.jointStrength_N <= inRef.jointStrength_N ? t.check : inRef.check,
    serviceOk: t.serviceOk && inRef.serviceOk,
    perBolt_N: Math.min(t.perBolt_N, inRef.perBolt_N),
    plates_N: Math.min(t.plates_N, inRef.plates_N),
    tension_N: t.jointStrength_N,
  };
}
