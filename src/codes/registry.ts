/** The design codes splicewright knows, by the id a scenario's `code:` names. */
import { IS800_2007 } from "./is800-2007/index.js";
import type { DesignCode } from "./types.js";

const CODES: Record<string, DesignCode> = {
  "is800-2007": IS800_2007,
};

/** Accepted spellings of each code id. */
const ALIASES: Record<string, string> = {
  is800: "is800-2007",
  "is 800": "is800-2007",
  "is 800:2007": "is800-2007",
  "is800:2007": "is800-2007",
};

export function codeIds(): string[] {
  return Object.keys(CODES);
}

export function findCode(id: string): DesignCode | undefined {
  const key = id.trim().toLowerCase();
  return CODES[ALIASES[key] ?? key];
}
