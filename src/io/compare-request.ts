/**
 * `compare`'s choices, given as lists of text ("4.6,8.8", "16,M20", "is800,en1993"), validated and run.
 * Both shells call this: the CLI with its options, the workbench with its fields. Throws InputError
 * naming the option for an unknown class, size or code, or a grade the mapping cannot translate.
 */
import { BOLT_SIZES_MM, isBoltSize, isPropertyClass, type PropertyClass } from "../catalogue/bolts.js";
import type { CostTable } from "../catalogue/costs.js";
import { codeIds, findCode } from "../codes/registry.js";
import type { DesignCode } from "../codes/types.js";
import { compareChoices, compareCodes, MappingError, type CompareColumn, type CompareOptions } from "../compare/compare.js";
import type { Scenario } from "../model/scenario.js";
import { parseMapping, parseMappingText } from "./equivalents.js";
import { InputError } from "./yaml.js";

export interface CompareRequest {
  classes?: string;
  sizes?: string;
  codes?: string;
}

/** The bundled equivalents table's name in messages. */
export const EQUIVALENTS_NAME = "catalogue/equivalents.yaml";

/** A comma-separated list; an empty one (`--classes ,,,`) is bad input of its option. */
export function splitList(text: string, option: string): string[] {
  const items = text.split(",").map((s) => s.trim()).filter(Boolean);
  if (items.length === 0) throw new InputError(option, `give at least one value (a comma-separated list), got "${text}"`);
  return items;
}

/**
 * The comparison's columns. `equivalentsText` gives the bundled table of equivalent materials; it is
 * read only for a comparison of codes on a scenario without its own `compare:` section.
 */
export function compareRequest(scenario: Scenario, code: DesignCode, request: CompareRequest, costs: CostTable, equivalentsText: () => string, progress: CompareOptions = {}): CompareColumn[] {
  if (request.classes === undefined && request.sizes === undefined && request.codes === undefined) throw new InputError("compare", "give --classes, --sizes or --codes");
  if (request.codes !== undefined && (request.classes !== undefined || request.sizes !== undefined)) throw new InputError("--codes", "compare codes on their own (classes and sizes differ between codes)");
  if (request.codes !== undefined) {
    const codes = splitList(request.codes, "--codes").map((id) => {
      const found = findCode(id);
      if (!found) throw new InputError("--codes", `unknown design code "${id}" (known: ${codeIds().join(", ")})`);
      return found;
    });
    const table = scenario.compare !== undefined ? parseMapping(scenario.compare, "compare") : parseMappingText(equivalentsText(), EQUIVALENTS_NAME);
    try {
      return compareCodes(scenario, code, codes, costs, table, progress);
    } catch (e) {
      if (e instanceof MappingError) throw new InputError(e.field, e.message);
      throw e;
    }
  }
  const allowed = code.classesFor(scenario.bolts?.assembly ?? "bearing") as readonly string[];
  const classes = request.classes !== undefined
    ? splitList(request.classes, "--classes").map((c) => {
        if (!isPropertyClass(c) || !allowed.includes(c)) throw new InputError("--classes", `unknown or not allowed property class "${c}" (allowed: ${allowed.join(", ")})`);
        return c as PropertyClass;
      })
    : [];
  const sizes = request.sizes !== undefined
    ? splitList(request.sizes, "--sizes").map((t) => {
        const d = Number(t.replace(/^M/i, ""));
        if (!isBoltSize(d)) throw new InputError("--sizes", `unknown bolt size "${t}" (known: ${BOLT_SIZES_MM.map((x) => `M${x}`).join(", ")})`);
        return d;
      })
    : [];
  return compareChoices(scenario, code, costs, classes, sizes, progress);
}
