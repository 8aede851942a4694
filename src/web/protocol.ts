/**
 * Messages between the page and its workers. Plain data only: everything crosses by structured clone.
 */
import type { CodeId } from "./fields.js";
import type { WorkbenchSummary } from "./summary.js";

/** Bad input (one line naming the field, as the CLI prints it after "splicewright: error: ") or a bug. */
export type Problem = { kind: "input"; path: string; message: string } | { kind: "internal"; message: string };

export interface CatalogueText {
  /** A cost catalogue's YAML text and the name its messages use. */
  text: string;
  name: string;
}

export interface CodeInfo {
  id: CodeId;
  title: string;
  sizes: string[];
  classes: { bearing: string[]; "friction-grip": string[] };
  grades: string[];
}

export interface LiveState {
  /** The scenario file's text: what `check` reads and what Save writes. */
  text: string;
  /** The same as a plain value, for the form. */
  file: Record<string, unknown>;
  codeId?: CodeId;
  fileName: string;
  date: string;
  problem?: Problem;
  /** No bolts or layout: a scenario for the search. */
  searchOnly?: boolean;
  check?: {
    summary: WorkbenchSummary;
    /** Exactly what `splicewright check --json` prints, as a value. */
    json: Record<string, unknown>;
    /** The drawing as `splicewright export --format svg` writes it. */
    svg?: string;
    svgProblem?: string;
  };
  /** Time the worker took to read, check and draw, ms. */
  ms: number;
}

export interface OutFile {
  name: string;
  content: string;
}

export type DownloadFormat = "svg" | "dxf" | "csv" | "json" | "report" | "yaml";

export interface ScheduleRequest {
  projectText: string;
  fileName: string;
  costs?: CatalogueText;
  overrides: { maxTypes?: number; costPerType?: number; oneClassPerDiameter?: boolean; minBoltsPerType?: number };
  method: "auto" | "enumerate" | "mip";
  timeLimit_s: number;
  workers: number;
}

export type Request =
  | { op: "catalogue" }
  | { op: "open"; text: string; fileName: string }
  | { op: "blank" }
  | { op: "edit"; edits: Array<{ path: string[]; value: unknown }> }
  | { op: "date"; date: string }
  | { op: "rename"; fileName: string }
  | { op: "download"; formats: DownloadFormat[] }
  | { op: "search"; text: string; top: number; rankBy: "cost" | "bolts" | "efficiency" | "length"; costs?: CatalogueText }
  | { op: "compare"; text: string; request: { classes?: string; sizes?: string; codes?: string }; costs?: CatalogueText }
  | ({ op: "schedule" } & ScheduleRequest)
  | { op: "splice-options"; projectText: string; costs: unknown; index: number }
  | { op: "highs-answer"; answer: unknown }
  | { op: "pool-answer"; results: unknown[] };

/**
 * From a worker: a final answer, a progress report, or (schedule) a request that the page run a HiGHS
 * solve or a pool of requests on workers of its own. (A worker of a page opened from disk has an opaque
 * origin and cannot start workers itself, so the page starts them.)
 */
export type Reply =
  | { id: number; type: "done"; value: unknown }
  | { id: number; type: "failed"; problem: Problem }
  | { id: number; type: "progress"; progress: Progress }
  | { id: number; type: "highs"; lp: string; timeLimit_s: number }
  | { id: number; type: "pool"; stage: string; requests: Request[]; weights: number[]; workers: number };

export interface Progress {
  /** What is being done, in words. */
  stage: string;
  done?: number;
  total?: number;
  /** Full checks made so far. */
  checks?: number;
}
