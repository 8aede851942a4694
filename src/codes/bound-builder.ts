/**
 * Shared pieces of every code's search bound (DesignCode.strengthBound): collecting its terms, and the
 * grip and packing of each bolt group as the joint builder forms them.
 */
import type { Scenario } from "../model/scenario.js";
import type { SearchLimits, StrengthBound } from "./types.js";

/** Collects the terms of a strength bound: the least capacity and its check, per bolt, plates only. */
export class BoundBuilder {
  readonly result: StrengthBound = { jointStrength_N: Infinity, check: "", serviceOk: true, perBolt_N: Infinity, plates_N: Infinity };

  /** @param boltsPerGroup the n that bolt-group capacities are divided by for perBolt_N */
  constructor(private readonly boltsPerGroup: number) {}

  private least(capacity: number, check: string): void {
    if (capacity < this.result.jointStrength_N) {
      this.result.jointStrength_N = capacity;
      this.result.check = check;
    }
  }

  /** A bolt-group term (shear, slip at ULS, bearing); its per-bolt share defaults to capacity / n. */
  bolt(capacity: number, check: string, perBolt: number = capacity / this.boltsPerGroup): void {
    this.least(capacity, check);
    this.result.perBolt_N = Math.min(this.result.perBolt_N, perBolt);
  }

  /** A plate term (gross yield, net section), independent of the bolt count. */
  plate(capacity: number, check: string): void {
    this.least(capacity, check);
    this.result.plates_N = Math.min(this.result.plates_N, capacity);
  }

  /** A service-load check that cannot pass. */
  serviceFails(): void {
    this.result.serviceOk = false;
  }
}

/**
 * Grip and packing of each bolt group, as the joint builder forms them: a lap splice has one group through
 * both plates; a butt splice has side A and side B through the covers, the packing lying on the thinner
 * main plate's side.
 */
export function groupGrips(scenario: Scenario): { grips: number[]; packs: number[] } {
  const { plates, splice } = scenario;
  const tA = plates.mainA.thickness_mm;
  const tB = plates.mainB.thickness_mm;
  if (splice.type === "lap") return { grips: [tA + tB], packs: [0] };
  const coverT = plates.covers.reduce((s, c) => s + c.thickness_mm, 0);
  const packs = [tA <= tB ? scenario.packing_mm : 0, tB < tA ? scenario.packing_mm : 0];
  return { grips: [coverT + tA + packs[0]!, coverT + tB + packs[1]!], packs };
}

/**
 * A code's search limits with their statement in words written when the output reads it. A class: an
 * object literal with a getter is built on V8's slow path, and a search asks for limits hundreds of
 * times (every size, class, cover and pattern, in the work estimate and the family list).
 */
class LimitsWithStatement implements SearchLimits {
  readonly pitchMin_mm: number;
  readonly pitchMax_mm: number;
  readonly gaugeMin_mm: number;
  readonly gaugeMax_mm: number;
  readonly endMin_mm: number;
  readonly endMax_mm: number;
  readonly endAtButtMax_mm: number;
  readonly edgeMin_mm: number;
  readonly edgeMax_mm: number;
  readonly staggeredButtSpanMax_mm: number;
  readonly tops: SearchLimits["tops"];
  #statement: (() => string) | string;
  constructor(l: SearchLimitsInput, statement: () => string) {
    this.pitchMin_mm = l.pitchMin_mm;
    this.pitchMax_mm = l.pitchMax_mm;
    this.gaugeMin_mm = l.gaugeMin_mm;
    this.gaugeMax_mm = l.gaugeMax_mm;
    this.endMin_mm = l.endMin_mm;
    this.endMax_mm = l.endMax_mm;
    this.endAtButtMax_mm = l.endAtButtMax_mm;
    this.edgeMin_mm = l.edgeMin_mm;
    this.edgeMax_mm = l.edgeMax_mm;
    this.staggeredButtSpanMax_mm = l.staggeredButtSpanMax_mm ?? Infinity;
    this.tops = l.tops;
    this.#statement = statement;
  }
  get statement(): string {
    if (typeof this.#statement === "function") this.#statement = this.#statement();
    return this.#statement;
  }
}

/** A code's search limits before their statement; a code without a stagger span limit leaves it out (Infinity). */
type SearchLimitsInput = Omit<SearchLimits, "statement" | "staggeredButtSpanMax_mm"> & { staggeredButtSpanMax_mm?: number };

/** Search limits whose statement is written on first read. */
export function searchLimitsWith(limits: SearchLimitsInput, statement: () => string): SearchLimits {
  return new LimitsWithStatement(limits, statement);
}
