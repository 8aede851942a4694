/**
 * The words a design code uses for its bolts: one vocabulary per code (its own folder's words.ts),
 * used by every output (sheet, summary, search, compare, schedule, report, drawing, bill of materials).
 * One internal meaning (BoltSpec: assembly, slip setting, threads); each code words it its own way.
 */
import type { BoltAssembly, BoltSpec } from "../model/scenario.js";

export interface BoltWords {
  /** The bolt type in full, with its slip setting: "Category B: slip-resistant at serviceability, preloaded (μ 0.4)". */
  boltType(b: Pick<BoltSpec, "assembly" | "slipAt" | "slipFactor" | "preloaded">): string;
  /** The bolt type without slip setting, for a search space or a bolt type of a schedule: "bearing type". */
  assembly(a: BoltAssembly): string;
  /** A short tag after size and grade in a table cell ("" for the plain bearing bolt): "HSFG", "preloaded", "SC". */
  tag(a: BoltAssembly): string;
  /** Where the threads are, in the code's words. */
  threads(inShearPlanes: boolean): string;
  /** Why a bearing-type joint has no service utilisation. */
  noServiceSlip: string;
}
