/** The bundled equivalents table (catalogue/equivalents.yaml) or a scenario's `compare:` section. */
import { z } from "zod";
import type { CodeMapping } from "../compare/compare.js";
import { InputError, parseYaml } from "./yaml.js";
import { memo } from "./memo.js";
import { PARSE_OPTIONS } from "./parse-options.js";

/** The equivalents table's schema (steel and bolt rows), built on first use. */
export const mappingSchema = memo(() => {
  const rows = z.array(z.record(z.string(), z.union([z.string(), z.number()]).transform((v) => (typeof v === "number" ? v.toFixed(1) : v))));
  return z.strictObject({ steel: rows, bolts: rows });
});

export function parseMapping(value: unknown, where: string): CodeMapping {
  const r = mappingSchema().safeParse(value, PARSE_OPTIONS);
  if (!r.success) {
    const issue = r.error.issues[0]!;
    throw new InputError([where, ...issue.path.map(String)].join("."), issue.message);
  }
  return r.data;
}

export function parseMappingText(text: string, where: string): CodeMapping {
  return parseMapping(parseYaml(text), where);
}
