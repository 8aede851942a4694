/**
 * `splicewright schedule <project.yaml>`: the shell around the pure schedule core. It reads the project,
 * runs the per-splice searches on worker threads, runs HiGHS in a worker when the integer programme is
 * needed, prints the schedule and writes its files. Exit codes: 0 scheduled, 1 a splice has no compliant
 * layout or no choice of types meets the rules, 2 bad input.
 */
import { existsSync } from "node:fs";
import { join } from "node:path";
import { Option, type Command } from "commander";
import { parseProject } from "../io/project.js";
import { InputError } from "../io/yaml.js";
import { scheduleCsv, scheduleJson, orderCsv } from "../schedule/export.js";
import { selectionProblem } from "../schedule/options.js";
import { buildSchedule } from "../schedule/schedule.js";
import { chooseBoltTypes, methodRefusal, missingLayouts, noScheduleMessage, rulesWith, scheduleFileNames } from "../schedule/run.js";
import { METHOD_REQUESTS, type MethodRequest } from "../schedule/solve.js";
import { exportBase } from "../export/names.js";
import { writeFilesSafely } from "./files.js";
import { loadCosts, readScenarioText } from "./inputs.js";
import { solveWithHighs } from "./schedule-highs.js";
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
  json?: boolean;
  out?: string;
  force?: boolean;
}

const wholeNumber = (name: string, min: number) => (v: string) => {
  if (!/^\d+$/.test(v) || Number(v) < min) throw new InputError(`--${name}`, `must be a whole number of ${min} or more, got "${v}"`);
  return Number(v);
};
const amount = (name: string) => (v: string) => {
  const n = Number(v);
  if (v.trim() === "" || !Number.isFinite(n) || n < 0) throw new InputError(`--${name}`, `must be a number of 0 or more, got "${v}"`);
  return n;
};

export function registerSchedule(program: Command, io: Io, setExit: (code: number) => void): void {
  program
    .command("schedule")
    .description("schedule every splice of a project with few bolt types: the least total cost, proven")
    .argument("<project>", "project file (YAML) listing the splices")
    .option("--max-types <k>", "at most k bolt types for the whole job (over schedule.max_types)", wholeNumber("max-types", 1))
    .option("--cost-per-type <amount>", "fixed cost of each bolt type stocked (over schedule.cost_per_type)", amount("cost-per-type"))
    .option("--one-class-per-diameter", "never two property classes of one diameter")
    .option("--no-one-class-per-diameter", "let classes of one diameter mix (over the project file)")
    .option("--min-bolts-per-type <n>", "every bolt type used carries at least n bolts over the job; 0 switches the rule off", wholeNumber("min-bolts-per-type", 0))
    .addOption(new Option("--method <how>", "how the types are chosen: auto (enumeration unless the rules or the size need the integer programme), enumerate, mip").choices([...METHOD_REQUESTS]).default("auto"))
    .option("--time-limit <seconds>", "time limit of the integer programme (HiGHS)", wholeNumber("time-limit", 1), 60)
    .option("--costs <file>", "cost catalogue (YAML) instead of the bundled illustrative one")
    .option("--workers <n>", "worker threads for the per-splice searches (0: the main thread); default: the machine's cores", wholeNumber("workers", 0))
    .option("--json", "print the schedule as JSON")
    .option("--out <dir>", "write NAME-schedule.csv, NAME-order.csv and NAME-schedule.json into this folder")
    .option("--force", "let --out overwrite existing files")
    .action(async (file: string, opts: ScheduleOptions) => {
      const text = readScenarioText(file);
      const project = parseProject(text);
      const costs = loadCosts(opts.costs, project.costs);
      const rules = rulesWith(project.rules, opts);
      const names = scheduleFileNames(exportBase(file));
      const targets = opts.out ? [names.schedule, names.order, names.json].map((n) => join(opts.out!, n)) : [];
      // Refuse before the long searches, not after them.
      if (!opts.force) for (const t of targets) if (existsSync(t)) throw new InputError(t, "already exists (use --force to overwrite)");
      const refusal = methodRefusal(rules, opts.method);
      if (refusal) throw new InputError("--method", refusal);

      const bar = new ProgressBar(process.stderr, "schedule: searching splices", project.splices.length, ProgressBar.wanted(process.stderr, project.splices.length));
      const t0 = performance.now();
      let pool;
      try {
        pool = await searchSplices(text, project, costs, { workers: opts.workers ?? defaultWorkers(), onProgress: (done) => bar.update(done) });
      } finally {
        bar.finish();
      }
      const search_ms = performance.now() - t0;
      const searches = pool.results;

      const missing = missingLayouts(project, searches);
      if (missing) {
        io.out(opts.json ? JSON.stringify(missing.json, null, 2) : missing.text);
        for (const l of missing.lines) io.err(l);
        setExit(1);
        return;
      }

      const { problem, options } = selectionProblem(project.splices, searches, rules);
      const t1 = performance.now();
      const tty = process.stderr.isTTY && project.splices.length > 20;
      const selection = await chooseBoltTypes(problem, opts.method, opts.timeLimit, async (lp, timeLimit_s) => {
        if (tty) process.stderr.write("schedule: choosing bolt types (HiGHS integer programme)…");
        const answer = await solveWithHighs(lp, timeLimit_s);
        if (tty) process.stderr.write("\r\u001b[K");
        return answer;
      });
      const selection_ms = performance.now() - t1;

      if (!selection.assignment) {
        const message = noScheduleMessage(selection, rules);
        if (opts.json) io.out(JSON.stringify({ project: project.name, scheduled: false, reason: message, method: selection.method, proven: selection.proven }, null, 2));
        else io.out(message);
        io.err(message);
        setExit(1);
        return;
      }

      const schedule = buildSchedule({ project: project.name, splices: project.splices, problem, options, selection: { ...selection, assignment: selection.assignment }, code: project.code, costs });
      const effort = {
        searched: pool.searched,
        workers: pool.workers,
        typesSearched: searches.reduce((n, r) => n + r.options.length + r.none.length, 0),
        checks: searches.reduce((n, r) => n + r.checks, 0),
        search_ms,
        selection_ms,
      };
      const json = scheduleJson(schedule, { code: project.code.title, currency: costs.currency, elapsed_ms: { search: Math.round(search_ms), selection: Math.round(selection_ms) } });
      if (targets.length > 0) {
        const [csvPath, orderPath, jsonPath] = targets as [string, string, string];
        writeFilesSafely([{ path: csvPath, content: scheduleCsv(schedule) }, { path: orderPath, content: orderCsv(schedule) }, { path: jsonPath, content: JSON.stringify(json, null, 2) + "\n" }], opts.force ?? false);
      }
      io.out(opts.json ? JSON.stringify({ scheduled: true, ...json, effort }, null, 2) : formatSchedule(schedule, project.code.title, costs.currency, effort));
      for (const t of targets) io.err(`wrote ${t}`);
      setExit(schedule.notes.some((n) => n.includes("no valid bolt length")) ? 1 : 0);
    });
}
