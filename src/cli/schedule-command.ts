/**
 * `splicewright schedule <project.yaml>`: the command's options. The work is in schedule-run.ts, loaded
 * only when the command runs. Exit codes: 0 scheduled, 1 a splice has no compliant layout or no choice
 * of types meets the rules, 2 bad input.
 */
import { Option, type Command } from "commander";
import { LIMITS } from "../io/limits.js";
import { METHOD_REQUESTS } from "../schedule/method.js";
import { amount, MAX_AMOUNT, MAX_TIME_LIMIT_S, maxCandidatesOption, maxWorkers, wholeNumber } from "./options.js";
import type { ScheduleOptions } from "./schedule-run.js";
import type { Io } from "./output.js";


/** Largest --min-bolts-per-type: every bolt of the largest job (10 000 of each of 5 000 splices × 2 000 bolts). */
const MAX_MIN_BOLTS = 100_000_000_000;

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
      const { runSchedule } = await import("./schedule-run.js");
      setExit(await runSchedule(file, opts, io));
    });
}
