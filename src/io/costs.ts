/**
 * Cost tables from YAML: the bundled catalogue (catalogue/costs.yaml), a file given with --costs,
 * and a scenario's `costs:` section, which overrides single entries.
 */
import { z } from "zod";
import type { CostTable } from "../catalogue/costs.js";
import { sizeOfKey } from "../catalogue/bolts.js";
import { InputError, parseYaml } from "./yaml.js";
import { freeText } from "./text-field.js";
import { memo } from "./memo.js";
import { PARSE_OPTIONS } from "./parse-options.js";

/**
 * Largest price of one item (a bolt assembly, a hole, a kg of plate, a tightening): 10⁶ cost units.
 * Prices stay finite and far below where sums of thousands of bolts lose precision or overflow.
 */
export const MAX_PRICE = 1_000_000;

/** The cost file's schema, built on first use (one price schema for every price field). */
export const costSchema = memo(() => {
  const price = z.number().nonnegative("must not be negative").max(MAX_PRICE, `must be at most ${MAX_PRICE} (a price of one item)`);
  const classPrices = z.record(z.string().regex(/^(4\.6|5\.6|8\.8|10\.9)$/, "a property class: 4.6, 5.6, 8.8 or 10.9"), price);
  return z.strictObject({
    currency: freeText().optional(),
    bolt_assembly: z.record(z.string().refine((k) => sizeOfKey(k) !== undefined, "a bolt size such as M20 or 3/4 in"), classPrices).optional(),
    hole: price.optional(),
    plate_per_kg: price.optional(),
    friction_grip_extra: price.optional(),
  });
});

export type CostFile = z.infer<ReturnType<typeof costSchema>>;

function issueText(e: z.ZodError, prefix: string): InputError {
  const issue = e.issues[0]!;
  const path = [prefix, ...issue.path.map(String)].filter(Boolean).join(".");
  if (issue.code === "unrecognized_keys") {
    const key = (issue as { keys?: string[] }).keys?.[0] ?? "";
    return new InputError(`${path}.${key}`, "unknown field (not part of the cost table)");
  }
  return new InputError(path, issue.message);
}

/** Validate a cost section (from a file or a scenario), with `prefix` naming where it came from. */
export function validateCosts(value: unknown, prefix: string): CostFile {
  const r = costSchema().safeParse(value, PARSE_OPTIONS);
  if (!r.success) throw issueText(r.error, prefix);
  return r.data;
}

/** Apply a cost section over a table: listed entries replace, the rest stay. */
export function applyCosts(table: CostTable, file: CostFile): CostTable {
  const boltAssembly: CostTable["boltAssembly"] = { ...table.boltAssembly };
  for (const [size, prices] of Object.entries(file.bolt_assembly ?? {})) boltAssembly[size] = { ...(boltAssembly[size] ?? {}), ...prices };
  return {
    currency: file.currency ?? table.currency,
    boltAssembly,
    hole: file.hole ?? table.hole,
    platePerKg: file.plate_per_kg ?? table.platePerKg,
    frictionGripExtra: file.friction_grip_extra ?? table.frictionGripExtra,
  };
}

/** A complete cost table from YAML text (every field required). */
export function parseCostTable(text: string, name: string): CostTable {
  const file = validateCosts(parseYaml(text), name);
  for (const k of ["bolt_assembly", "hole", "plate_per_kg", "friction_grip_extra"] as const) {
    if (file[k] === undefined) throw new InputError(`${name}.${k}`, "required in a cost catalogue");
  }
  return applyCosts({ currency: "cost units", boltAssembly: {}, hole: 0, platePerKg: 0, frictionGripExtra: 0 }, file);
}

/**
 * The cost table a scenario prices with: a catalogue's text (the bundled one or the user's own), with
 * the scenario's `costs:` entries over it. Both shells call this with the text they have read.
 */
export function costTableFor(catalogueText: string, catalogueName: string, scenarioCosts: unknown): CostTable {
  let table = parseCostTable(catalogueText, catalogueName);
  if (scenarioCosts !== undefined) table = applyCosts(table, scenarioCosts as CostFile);
  return table;
}
