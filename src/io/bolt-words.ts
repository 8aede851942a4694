/**
 * The bolt type as a scenario file may give it: in the shared spelling (`type: bearing | friction-grip`,
 * `slip_at`, `threads_in_shear_planes`) or in the words of its code — EN 1993-1-8 `category: A | B | C`
 * (3.4.1) and `preloaded` (3.1.2); AISC 360-16 `joint: snug-tight | pretensioned | slip-critical` (J3.1,
 * J3.8) and `threads: N | X` (Table J3.2). Both spellings reach one internal meaning; where both are
 * given they must agree. A code's own words are refused under another code.
 */
import { InputError } from "./yaml.js";

export interface BoltWordsInput {
  type?: "bearing" | "friction-grip" | undefined;
  category?: "A" | "B" | "C" | undefined;
  preloaded?: boolean | undefined;
  joint?: "snug-tight" | "pretensioned" | "slip-critical" | undefined;
  threads?: "N" | "X" | undefined;
  slip_at?: "service" | "ultimate" | undefined;
  threads_in_shear_planes?: boolean | undefined;
}

export interface BoltTypeMeaning {
  assembly: "bearing" | "friction-grip";
  slipAt?: "service" | "ultimate";
  /** Bearing-type bolts tightened to their preload (EN Category A preloaded; AISC pretensioned). */
  preloaded: boolean;
  threadsInShearPlanes: boolean;
}

const OWNER: Record<"category" | "preloaded" | "joint" | "threads", string> = { category: "en1993-1-8", preloaded: "en1993-1-8", joint: "aisc360-16", threads: "aisc360-16" };

function agree<T>(path: string, fromWords: T, shared: T | undefined, sharedPath: string): void {
  if (shared !== undefined && shared !== fromWords) throw new InputError(path, `disagrees with ${sharedPath}: ${String(shared)} (give one of them)`);
}

/** The internal meaning of a file's bolt type under the code with this id. */
export function boltTypeOf(b: BoltWordsInput, codeId: string): BoltTypeMeaning {
  for (const k of Object.keys(OWNER) as Array<keyof typeof OWNER>) {
    if (b[k] !== undefined && OWNER[k] !== codeId) throw new InputError(`bolts.${k}`, `not read by ${codeId} (a bolt setting in the words of ${OWNER[k]}; use bolts.type, slip_at, threads_in_shear_planes)`);
  }
  let assembly = b.type ?? "bearing";
  let slipAt = b.slip_at;
  let preloaded = false;
  let threads = b.threads_in_shear_planes ?? true;
  if (b.category !== undefined) {
    const meaning = b.category === "A" ? "bearing" : "friction-grip";
    agree("bolts.category", meaning, b.type, "bolts.type");
    if (b.category !== "A") agree("bolts.category", b.category === "B" ? "service" : "ultimate", b.slip_at, "bolts.slip_at");
    if (b.category !== "A" && b.preloaded === false) throw new InputError("bolts.preloaded", `Category ${b.category} needs preloaded bolts (EN 1993-1-8 3.4.1)`);
    assembly = meaning;
    if (b.category !== "A") slipAt = b.category === "B" ? "service" : "ultimate";
    preloaded = b.category !== "A" || b.preloaded === true;
  } else if (b.preloaded !== undefined) {
    // Preloaded bolts without a category: Category B (slip-resistant at serviceability) unless slip_at says C;
    // not preloaded: Category A.
    agree("bolts.preloaded", b.preloaded ? "friction-grip" : "bearing", b.type, "bolts.type");
    assembly = b.preloaded ? "friction-grip" : "bearing";
    preloaded = b.preloaded;
  }
  if (b.joint !== undefined) {
    const meaning = b.joint === "slip-critical" ? "friction-grip" : "bearing";
    agree("bolts.joint", meaning, b.type, "bolts.type");
    assembly = meaning;
    preloaded = b.joint !== "snug-tight";
  }
  if (b.threads !== undefined) {
    agree("bolts.threads", b.threads === "N", b.threads_in_shear_planes, "bolts.threads_in_shear_planes");
    threads = b.threads === "N";
  }
  if (assembly === "friction-grip") preloaded = true;
  const out: BoltTypeMeaning = { assembly, preloaded, threadsInShearPlanes: threads };
  if (slipAt !== undefined) out.slipAt = slipAt;
  return out;
}
