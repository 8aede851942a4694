/**
 * `splicewright schedule`, the work: reads the project, runs the per-splice searches on worker threads,
 * runs HiGHS in a worker when the integer programme is needed, prints the schedule and writes its files.
 * Loaded only when the command runs (schedule-command.ts holds its options).
 */
import { join } from "node:path";
import type { CostTable } from "../catalogue/costs.js";
import { parseProject, searchFieldPath, type Project } from "../io/project.js";
import { InputError } from "../io/yaml.js";
import { orderCsv, scheduleCsv, scheduleJson } from "../schedule/export.js";
import type { MethodRequest } from "../schedule/method.js";
import { selectionProblem } from "../schedule/options.js";
import { chooseBoltTypes, methodRefusal, missingLayouts, noScheduleMessage, rulesWith, scheduleFileNames, spliceIdentity } from "../schedule/run.js";
import { buildSchedule } from "../schedule/schedule.js";
import type { SelectionProblem } from "../schedule/selection.js";
import { chooseMethod, type SolvedSelection } from "../schedule/solve.js";
import { assertWithinLimit, DEFAULT_MAX_CANDIDATES, WorkLimitError } from "../search/work-estimate.js";
import { exportBase } from "../export/names.js";
import { checkTargets, writeFileSet } from "./files.js";
import { loadCosts, readScenarioText } from "./inputs.js";
import { maxWorkers } from "./options.js";
import { solveWithHighs } from "./schedule-highs.js";
import { defaultWorkers, searchSplices, type PoolResult } from "./schedule-pool.js";
import { ProgressBar } from "./schedule-progress.js";
import { formatSchedule } from "./schedule-table.js";
import { outputWidth } from "./text.js";
import type { Io } from "./output.js";


export interface ScheduleOptions {
  maxTypes?: number;
  costPerType?: number;
  oneClassPerDiameter?: boolean;
  minBoltsPerType?: number;
  method: MethodRequest;
  timeLimit: number;
  costs?: string;
  workers?: number;
  maxCandidates?: number;
  json?: boolean;
  out?: string;
  force?: boolean;
}

/**
 * Every distinct splice's declared space held to the limit before any search starts; the error names the
 * search field where it is set (the splice's own section or the project's defaults) and the splice.
 */
function checkSpliceWork(project: Project, costs: CostTable, limit: number): void {
  const seen = new Set<string>();
  project.splices.forEach((s, m) => {
    const key = spliceIdentity(project, m);
    if (seen.has(key)) return;
    seen.add(key);
    try {
      assertWithinLimit(s.scenario, project.code, costs, limit);
    } catch (e) {
      if (!(e instanceof WorkLimitError)) throw e;
      throw new WorkLimitError(searchFieldPath(project, m, e.path.split(".").pop()!), `splice ${s.id}: ${e.reason}`, e.candidates);
    }
  });
}

/** The choice of bolt types by the chosen method; the bar shows the phase (and pulses while HiGHS runs in its worker). */
async function chooseTypes(problem: SelectionProblem, opts: ScheduleOptions, bar: ProgressBar): Promise<SolvedSelection> {
  const { method } = chooseMethod(problem, opts.method);
  bar.phase(`schedule: choosing bolt types (${method === "enumeration" ? "enumeration" : "HiGHS integer programme"})`, 1);
  return chooseBoltTypes(problem, opts.method, opts.timeLimit, async (lp, timeLimit_s) => {
    const ticking = setInterval(() => bar.pulse(), 250); // the main thread is free to draw
    try {
      return await solveWithHighs(lp, timeLimit_s);
    } finally {
      clearInterval(ticking);
    }
  });
}

/** What the searches found, for the choice of types and the schedule. */
interface Searched {
  project: Project;
  costs: CostTable;
  rules: ReturnType<typeof rulesWith>;
  targets: string[];
  pool: PoolResult;
  search_ms: number;
}

/** Schedule the project; the exit code is 0 when scheduled, 1 when a splice or the rules leave no schedule. */
export async function runSchedule(file: string, opts: ScheduleOptions, io: Io): Promise<number> {
  const project = parseProject(readScenarioText(file));
  const costs = loadCosts(opts.costs, project.costs);
  const rules = rulesWith(project.rules, opts);
  const names = scheduleFileNames(exportBase(file));
  const targets = opts.out ? [names.schedule, names.order, names.json].map((n) => join(opts.out!, n)) : [];
  // Refuse before the long searches, not after them: the files, the rules and every splice's work.
  checkTargets(targets, opts.force ?? false);
  const refusal = methodRefusal(rules, opts.method);
  if (refusal) throw new InputError("--method", refusal);
  const maxCandidates = opts.maxCandidates ?? DEFAULT_MAX_CANDIDATES;
  checkSpliceWork(project, costs, maxCandidates);

  const bar = new ProgressBar(process.stderr, "schedule: searching splices", project.splices.length, ProgressBar.wanted(process.stderr, project.splices.length));
  const t0 = performance.now();
  let pool;
  try {
    pool = await searchSplices(project, costs, { workers: Math.min(opts.workers ?? defaultWorkers(), maxWorkers()), onProgress: (done) => bar.update(done), maxCandidates });
  } catch (e) {
    bar.finish();
    throw e;
  }
  const search_ms = performance.now() - t0;

  const missing = missingLayouts(project, pool.results);
  if (missing) {
    bar.finish();
    io.out(opts.json ? JSON.stringify(missing.json, null, 2) : missing.text);
    for (const l of missing.lines) io.err(l);
    return 1;
  }
  return scheduleSearched({ project, costs, rules, targets, pool, search_ms }, opts, bar, io);
}

/** Choose the bolt types, build the schedule, write its files and print it. */
async function scheduleSearched(found: Searched, opts: ScheduleOptions, bar: ProgressBar, io: Io): Promise<number> {
  const { project, costs, rules, targets, pool, search_ms } = found;
  const searches = pool.results;
  const { problem, options } = selectionProblem(project.splices, searches, rules);
  const t1 = performance.now();
  const selection = await chooseTypes(problem, opts, bar);
  const selection_ms = performance.now() - t1;

  if (!selection.assignment) {
    const message = noScheduleMessage(selection, rules);
    bar.finish();
    if (opts.json) io.out(JSON.stringify({ project: project.name, scheduled: false, reason: message, method: selection.method, proven: selection.proven }, null, 2));
    else io.out(message);
    io.err(message);
    return 1;
  }

  bar.phase("schedule: re-checking the scheduled layouts", project.splices.length);
  const schedule = buildSchedule({ project: project.name, splices: project.splices, problem, options, selection: { ...selection, assignment: selection.assignment }, code: project.code, costs, onProgress: (done) => bar.update(done) });
  const effort = {
    searched: pool.searched,
    workers: pool.workers,
    typesSearched: searches.reduce((n, r) => n + r.options.length + r.none.length, 0),
    checks: searches.reduce((n, r) => n + r.checks, 0),
    search_ms,
    selection_ms,
  };
  const json = scheduleJson(schedule, { code: project.code.title, currency: costs.currency, elapsed_ms: { search: Math.round(search_ms), selection: Math.round(selection_ms) } });
  bar.phase("schedule: writing the schedule", 1);
  let printed: string;
  try {
    if (targets.length > 0) {
      const [csvPath, orderPath, jsonPath] = targets as [string, string, string];
      await writeFileSet([{ path: csvPath, content: scheduleCsv(schedule) }, { path: orderPath, content: orderCsv(schedule) }, { path: jsonPath, content: JSON.stringify(json, null, 2) + "\n" }], opts.force ?? false);
    }
    printed = opts.json ? JSON.stringify({ scheduled: true, ...json, effort }, null, 2) : formatSchedule(schedule, project.code.title, costs.currency, effort, outputWidth(io.stdout ?? {}));
  } finally {
    bar.finish();
  }
  io.out(printed);
  for (const t of targets) io.err(`wrote ${t}`);
  return schedule.notes.some((n) => n.includes("no valid bolt length")) ? 1 : 0;
}
