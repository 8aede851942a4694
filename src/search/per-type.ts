/**
 * The best compliant layout of a splice for each bolt type of its declared space, as a by-product of
 * the layout search: one `searchLayouts` run per bolt type (size and class; the assembly kind is the
 * scenario's), each over the scenario's space restricted to that size and class.
 *
 * The families of the declared space are partitioned by size and class, so each run is the proven
 * search over exactly that type's part of the space: its first result is the type's best layout, and
 * the least over the types is the splice's own optimum over the whole space.
 */
import type { PropertyClass } from "../catalogue/bolts.js";
import type { BoltAssembly } from "../model/scenario.js";
import { searchLayouts, type Candidate, type SearchContext, type SearchStats } from "./search.js";
import { resolveSpace } from "./space.js";
import { boltPrice } from "../catalogue/costs.js";
import { assertWithinLimit, DEFAULT_MAX_CANDIDATES } from "./work-estimate.js";

/** A bolt type: size + property class + assembly kind. Lengths are bill-of-materials detail. */
export interface BoltType {
  size_mm: number;
  propertyClass: PropertyClass;
  assembly: BoltAssembly;
}

export interface TypeBest {
  type: BoltType;
  /** The type's best layout by cost (ties as `search`), or null when nothing of this type complies. */
  best: Candidate | null;
  /** Why nothing of this type complies, when best is null. */
  noResultReason?: string;
  stats: SearchStats;
}

/**
 * Best layout per bolt type over the scenario's declared space, types in space order (size, then class).
 * The whole space is held to `maxCandidates` before the first type is searched (each type's part is
 * smaller): a WorkLimitError otherwise.
 */
export function bestPerBoltType(ctx: SearchContext, maxCandidates = DEFAULT_MAX_CANDIDATES): TypeBest[] {
  assertWithinLimit(ctx.scenario, ctx.code, ctx.costs, maxCandidates);
  const space = resolveSpace(ctx.scenario, ctx.code, ctx.costs);
  const out: TypeBest[] = [];
  for (const size of space.sizes_mm) {
    for (const propertyClass of space.classes) {
      if (boltPrice(ctx.costs, size, propertyClass) === undefined) continue;
      const scenario = { ...ctx.scenario, search: { ...(ctx.scenario.search ?? {}), sizes_mm: [size], classes: [propertyClass] } };
      const outcome = searchLayouts({ ...ctx, scenario }, { top: 1, rankBy: "cost", maxCandidates: Infinity });
      const entry: TypeBest = { type: { size_mm: size, propertyClass, assembly: space.assembly }, best: outcome.results[0] ?? null, stats: outcome.stats };
      if (!entry.best && outcome.noResultReason) entry.noResultReason = outcome.noResultReason;
      out.push(entry);
    }
  }
  return out;
}
