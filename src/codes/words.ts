/** The bolt vocabulary of a design code by its id (each code's own words.ts). */
import { AISC360_WORDS } from "./aisc360-16/words.js";
import { EN1993_WORDS } from "./en1993-1-8/words.js";
import { IS800_WORDS } from "./is800-2007/words.js";
import type { BoltWords } from "./words-types.js";

export type { BoltWords } from "./words-types.js";

/** The words of the code with this id (IS 800's for an id no code owns, as the default code). */
export function boltWordsOf(codeId: string): BoltWords {
  if (codeId.startsWith("aisc")) return AISC360_WORDS;
  if (codeId.startsWith("en1993")) return EN1993_WORDS;
  return IS800_WORDS;
}
