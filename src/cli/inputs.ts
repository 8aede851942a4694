/**
 * What the CLI reads from disk and the environment: scenario and catalogue files, and the date for
 * drawings. The parsing itself is in src/io and the core, shared with the workbench.
 */
import { readFileSync, statSync } from "node:fs";
import { fileURLToPath } from "node:url";
import type { CostTable } from "../catalogue/costs.js";
import { costTableFor } from "../io/costs.js";
import { exportDate } from "../export/names.js";
import { InputError, MAX_FILE_BYTES } from "../io/yaml.js";
import { decodeText } from "../io/decode.js";

/** Read a scenario file's text, or throw an InputError naming the file. */
export function readScenarioText(file: string): string {
  let size: number;
  try {
    const st = statSync(file);
    if (!st.isFile()) throw new InputError(file, "not a file");
    size = st.size;
  } catch (e) {
    if (e instanceof InputError) throw e;
    throw new InputError(file, "cannot read the file (does it exist?)");
  }
  if (size > MAX_FILE_BYTES) throw new InputError(file, `file is larger than ${MAX_FILE_BYTES} bytes`);
  return decodeText(readFileSync(file), file);
}

/** The bundled table of nearest equivalent materials between codes. */
export const BUNDLED_EQUIVALENTS = fileURLToPath(new URL("../../catalogue/equivalents.yaml", import.meta.url));

/** The bundled cost catalogue (illustrative prices), next to the package. */
export const BUNDLED_COSTS = fileURLToPath(new URL("../../catalogue/costs.yaml", import.meta.url));

/** The cost table for a scenario: the bundled catalogue or --costs, with the scenario's own entries over it. */
export function loadCosts(costsFile: string | undefined, scenarioCosts: unknown): CostTable {
  const file = costsFile ?? BUNDLED_COSTS;
  return costTableFor(readScenarioText(file), costsFile ? file : "catalogue/costs.yaml", scenarioCosts);
}

/** Latest date SOURCE_DATE_EPOCH may name: 9999-12-31 (ISO 8601 four-digit years). */
const MAX_EPOCH_S = 253_402_300_799;

/**
 * Today's date (ISO), or the one SOURCE_DATE_EPOCH names (reproducible output, common practice): whole
 * seconds since 1970-01-01 UTC, up to the year 9999; anything else is bad input.
 */
export function today(): string {
  const epoch = process.env.SOURCE_DATE_EPOCH;
  if (epoch !== undefined && epoch !== "" && (!/^\d{1,12}$/.test(epoch) || Number(epoch) > MAX_EPOCH_S)) {
    throw new InputError("SOURCE_DATE_EPOCH", `must be whole seconds since 1970-01-01 UTC up to ${MAX_EPOCH_S} (the year 9999), got "${epoch}"`);
  }
  return exportDate(epoch, new Date());
}
