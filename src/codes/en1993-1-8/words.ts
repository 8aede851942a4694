/**
 * EN 1993-1-8's words for bolts: Categories A, B and C of 3.4.1 (A bearing type; B slip-resistant at
 * serviceability limit state; C slip-resistant at ultimate limit state), preloaded bolts (3.1.2), and
 * the shear plane through the threaded or unthreaded portion of the bolt (Table 3.4).
 */
import type { BoltWords } from "../words-types.js";

export const EN1993_WORDS: BoltWords = {
  boltType: (b) =>
    b.assembly === "bearing"
      ? `Category A: bearing type${b.preloaded ? ", preloaded bolts" : ""}`
      : b.slipAt === "ultimate"
        ? `Category C: slip-resistant at ultimate limit state, preloaded bolts (μ ${b.slipFactor ?? "?"})`
        : `Category B: slip-resistant at serviceability limit state, preloaded bolts (μ ${b.slipFactor ?? "?"})`,
  assembly: (a) => (a === "bearing" ? "Category A, bearing type" : "Category B or C, preloaded"),
  tag: (a) => (a === "bearing" ? "" : "preloaded"),
  threads: (inPlanes) => (inPlanes ? "shear planes through the threaded portion" : "shear planes through the unthreaded portion"),
  noServiceSlip: "Category A (bearing type) has no slip check at serviceability",
};
