/**
 * `splicewright schedule <project.yaml>`: the shell around the pure schedule core. It reads the project,
 * runs the per-splice searches on worker threads, runs HiGHS in a worker when the integer programme is
 * needed, prints the schedule and writes its files. Exit codes: 0 scheduled, 1 a splice has no compliant
 * layout or no choice of types meets the rules, 2 bad input.
 */
import { join } from "node:path";
import { Option, type Command } from "commander";
import type { CostTable } from "../catalogue/costs.js";
import { parseProject, searchFieldPath, type Project } from "../io/project.js";
import { LIMITS } from "../io/schema.js";
import { assertWithinLimit, DEFAULT_MAX_CANDIDATES, WorkLimitError } from "../search/work-estimate.js";
import { InputError } from "../io/yaml.js";
import { scheduleCsv, scheduleJson, orderCsv } from "../schedule/export.js";
import { selectionProblem } from "../schedule/options.js";
import { buildSchedule } from "../schedule/schedule.js";
import type { SelectionProblem } from "../schedule/selection.js";
import { chooseMethod, METHOD_REQUESTS, type MethodRequest, type SolvedSelection } from "../schedule/solve.js";
import { chooseBoltTypes, methodRefusal, missingLayouts, noScheduleMessage, rulesWith, scheduleFileNames, spliceIdentity } from "../schedule/run.js";
import { exportBase } from "../export/names.js";
import { checkTargets, writeFileSet } from "./files.js";
import { loadCosts, readScenarioText } from "./inputs.js";
import { solveWithHighs } from "./schedule-highs.js";
import { amount, MAX_AMOUNT, MAX_TIME_LIMIT_S, maxCandidatesOption, maxWorkers, wholeNumber } from "./options.js";
import { defaultWorkers, searchSplices } from "./schedule-pool.js";
import { ProgressBar } from "./schedule-progress.js";
import { formatSchedule } from "./schedule-table.js";

interface Io {
  out: (text: string) => void;
  err: (text: string) => void;
}

interface ScheduleOptions {
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

/** Largest --min-bolts-per-type: every bolt of the largest job (10 000 of each of 5 000 splices × 2 000 bolts). */
const MAX_MIN_BOLTS = 100_000_000_000;

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

export function registerSchedule(program: Command, io: Io, setExit: (code: number) => void): void {
  program
    .command("schedule")
    .description("schedule every splice of a project with few bolt types: the least total cost, proven")
    .argument("<project>", "project file (YAML) listing the splices")
    .option("--max-types <k>", "at most k bolt types for the whole job (over schedule.max_types)", wholeNumber("max-types", 1, LIMITS.holes))
    .option("--cost-per-type <amount>", "fixed cost of each bolt type stocked (over schedule.cost_per_type)", amount("cost-per-type", MAX_AMOUNT))
    .option("--one-class-per-diameter", "never two property classes of one diameter")
    .option("--no-one-class-per-diameter", "let classes of one diameter mix (over the project file)")
    .option("--min-bolts-per-type <n>", "every bolt type used carries at least n bolts over the job; 0 switches the rule off", wholeNumber("min-bolts-per-type", 0, MAX_MIN_BOLTS))
    .addOption(new Option("--method <how>", "how the types are chosen: auto (enumeration unless the rules or the size need the integer programme), enumerate, mip").choices([...METHOD_REQUESTS]).default("auto"))
    .option("--time-limit <seconds>", "time limit of the integer programme (HiGHS)", wholeNumber("time-limit", 1, MAX_TIME_LIMIT_S), 60)
    .option("--costs <file>", "cost catalogue (YAML) instead of the bundled illustrative one")
    .option("--workers <n>", "worker threads for the per-splice searches (0: the main thread; at most twice the cores, at least 4, never above 64); default: the machine's cores", wholeNumber("workers", 0, maxWorkers))
    .option(...maxCandidatesOption)
    .option("--json", "print the schedule as JSON")
    .option("--out <dir>", "write NAME-schedule.csv, NAME-order.csv and NAME-schedule.json into this folder")
    .option("--force", "let --out overwrite existing files (regular files only)")
    .action(async (file: string, opts: ScheduleOptions) => {
      const text = readScenarioText(file);
      const project = parseProject(text);
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
      const searches = pool.results;

      const missing = missingLayouts(project, searches);
      if (missing) {
        bar.finish();
        io.out(opts.json ? JSON.stringify(missing.json, null, 2) : missing.text);
        for (const l of missing.lines) io.err(l);
        setExit(1);
        return;
      }

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
        setExit(1);
        return;
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
        printed = opts.json ? JSON.stringify({ scheduled: true, ...json, effort }, null, 2) : formatSchedule(schedule, project.code.title, costs.currency, effort);
      } finally {
        bar.finish();
      }
      io.out(printed);
      for (const t of targets) io.err(`wrote ${t}`);
      setExit(schedule.notes.some((n) => n.includes("no valid bolt length")) ? 1 : 0);
    });
}
