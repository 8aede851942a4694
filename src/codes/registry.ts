/** The design codes splicewright knows, by the id a scenario's `code:` names. */
import { ownEntry } from "../catalogue/lookup.js";
import { IS800_2007 } from "./is800-2007/index.js";
import { EN1993_1_8 } from "./en1993-1-8/index.js";
import { AISC360_16 } from "./aisc360-16/index.js";
import type { Scenario } from "../model/scenario.js";
import type { DesignCode } from "./types.js";

const CODES: Record<string, DesignCode> = {
  "is800-2007": IS800_2007,
  "en1993-1-8": EN1993_1_8,
  "aisc360-16": AISC360_16,
};

/** Accepted spellings of each code id. */
const ALIASES: Record<string, string> = {
  is800: "is800-2007",
  "is 800": "is800-2007",
  "is 800:2007": "is800-2007",
  "is800:2007": "is800-2007",
  en1993: "en1993-1-8",
  "en 1993-1-8": "en1993-1-8",
  "en1993-1-8:2005": "en1993-1-8",
  "en 1993-1-8:2005": "en1993-1-8",
  ec3: "en1993-1-8",
  "eurocode 3": "en1993-1-8",
  aisc360: "aisc360-16",
  "aisc 360-16": "aisc360-16",
  "aisc 360": "aisc360-16",
};

export function codeIds(): string[] {
  return Object.keys(CODES);
}

export function findCode(id: string): DesignCode | undefined {
  const key = id.trim().toLowerCase();
  return ownEntry(CODES, ownEntry(ALIASES, key) ?? key);
}

/**
 * A code module bound to a validated scenario's settings (partial factors of a national annex, units):
 * what `toScenario` returns, and what a worker thread rebuilds from the scenario alone (design codes
 * hold functions, which cannot cross threads).
 */
export function boundCode(code: DesignCode, scenario: Scenario): DesignCode {
  return code.settings ? code.settings.bind(scenario) : code;
}
