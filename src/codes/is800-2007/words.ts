/**
 * IS 800:2007's words for bolts: bearing type bolts (cl. 10.3) and high strength friction grip (HSFG)
 * bolts (cl. 10.4), threads intercepting the shear plane (cl. 10.3.3).
 */
import type { BoltWords } from "../words-types.js";

export const IS800_WORDS: BoltWords = {
  boltType: (b) => (b.assembly === "bearing" ? "bearing type" : `HSFG (friction grip), μf ${b.slipFactor ?? "?"}, slip at ${b.slipAt ?? "service"} load`),
  assembly: (a) => (a === "bearing" ? "bearing type" : "HSFG (friction grip)"),
  tag: (a) => (a === "bearing" ? "" : "HSFG"),
  threads: (inPlanes) => (inPlanes ? "threads in the shear planes" : "threads excluded from the shear planes"),
  noServiceSlip: "bearing type bolts have no service slip check",
};
