/**
 * AISC 360-16's words for bolts (J3.1, J3.6, J3.8): snug-tight or pretensioned bearing-type
 * connections, slip-critical connections, threads not excluded (N) or excluded (X) from the shear
 * planes (Table J3.2).
 */
import type { BoltWords } from "../words-types.js";

export const AISC360_WORDS: BoltWords = {
  boltType: (b) => (b.assembly === "bearing" ? `bearing-type, ${b.preloaded ? "pretensioned" : "snug-tight"}` : `slip-critical, pretensioned (μ ${b.slipFactor ?? "?"})`),
  assembly: (a) => (a === "bearing" ? "bearing-type" : "slip-critical"),
  tag: (a) => (a === "bearing" ? "" : "SC"),
  threads: (inPlanes) => (inPlanes ? "threads included in the shear planes (N)" : "threads excluded from the shear planes (X)"),
  noServiceSlip: "bearing-type bolts have no slip check at service",
};
