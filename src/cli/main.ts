/**
 * The command-line shell: reads files, prints, sets exit codes. All calculation is in the pure core.
 * Exit codes: 0 all checks pass, 1 a check fails or nothing complies, 2 bad input, 3 internal error,
 * 4 the output could not be written (output.ts).
 */
import { Command, CommanderError, Option } from "commander";
import { EXPORT_FORMATS } from "../export/formats.js";
import { InputError } from "../io/input-error.js";
import { RANK_BY } from "../search/ranking.js";
import { WorkLimitError } from "../search/work-limit.js";
import { VERSION } from "../version.js";
import { registerApp } from "./app-command.js";
import { MAX_TOP, maxCandidatesOption, wholeNumber } from "./options.js";
import { PROCESS_IO, terminalSafe, type Io } from "./output.js";
import type { CheckCommandOptions } from "./run-check.js";
import type { CompareCommandOptions } from "./run-compare.js";
import type { ExportCommandOptions } from "./run-export.js";
import type { ReportCommandOptions } from "./run-report.js";
import type { SearchCommandOptions } from "./run-search.js";
import { registerSchedule } from "./schedule-command.js";
import { MIN_WIDTH, PIPED_WIDTH } from "./text.js";

export { VERSION };

/** `--top` and `--rank`: 1 … MAX_TOP. */
const rankNumber = (name: string) => wholeNumber(name, 1, MAX_TOP);

/** --width: a whole number of columns, at least the narrowest layout. */
function widthOption(v: string): number {
  if (!/^\d+$/.test(v) || Number(v) < MIN_WIDTH || Number(v) > 1000) throw new InputError("--width", `must be a whole number of columns from ${MIN_WIDTH} to 1000, got "${v}"`);
  return Number(v);
}

type SetExit = (code: number) => void;

/** The program: its name, version and the one-line form of usage mistakes. */
function newProgram(io: Io): Command {
  return new Command()
    .name("splicewright")
    .description("Check and search bolted tension splices in flat steel plates (IS 800:2007, EN 1993-1-8, AISC 360-16).\nResults are an aid to design: verify them with a qualified engineer.")
    .version(VERSION)
    .exitOverride()
    .configureOutput({
      writeOut: (s) => io.out(s.replace(/\n$/, "")),
      writeErr: (s) => io.err(s.replace(/\n$/, "")),
      // Usage mistakes read like every other bad input: one line, "splicewright: error: …".
      outputError: (s, write) => write(`splicewright: ${s.trim().split("\n").map((l) => l.trim()).filter(Boolean).join(" ")}\n`),
    });
}

/** `check`: the calculation sheet of the scenario's own layout (run-check.ts). */
function defineCheck(program: Command, io: Io, setExit: SetExit): void {
  program
    .command("check")
    .description("check the scenario's bolt layout against every clause of its design code")
    .argument("<scenario>", "scenario file (YAML)")
    .option("--json", "print the results as JSON instead of a calculation sheet")
    .option("--brief", "the summary and one line per check")
    .option("--width <columns>", `lay the sheet out for this many columns (default: the terminal's, at least ${MIN_WIDTH}; ${PIPED_WIDTH} when piped)`, widthOption)
    .action(async (file: string, opts: CheckCommandOptions) => {
      const { runCheck } = await import("./run-check.js");
      setExit(runCheck(file, opts, io));
    });
}

/** `search`: the best layouts over the declared search space (run-search.ts). */
function defineSearch(program: Command, io: Io, setExit: SetExit): void {
  program
    .command("search")
    .description("find the best bolt layouts over the scenario's declared search space, proven optimal")
    .argument("<scenario>", "scenario file (YAML); bolts and layout are not needed")
    .option("--top <n>", `how many layouts to show (1 to ${MAX_TOP})`, rankNumber("top"), 10)
    .addOption(new Option("--rank-by <what>", "rank by").choices([...RANK_BY]).default("cost"))
    .option("--costs <file>", "cost catalogue (YAML) instead of the bundled illustrative one")
    .option("--save <file>", "write the chosen layout (rank 1, or --rank) as a scenario that check accepts")
    .option("--rank <n>", "which result --save writes", rankNumber("rank"), 1)
    .option("--force", "let --save overwrite an existing file")
    .option(...maxCandidatesOption)
    .option("--variants", "show every variant (pitch, end distances, cover thickness) instead of the best layout of each arrangement")
    .option("--json", "print the results as JSON")
    .action(async (file: string, opts: SearchCommandOptions) => {
      const { runSearch } = await import("./run-search.js");
      setExit(await runSearch(file, opts, io));
    });
}

/** `export`: drawing, hole schedule, bill of materials or JSON files (run-export.ts). */
function defineExport(program: Command, io: Io, setExit: SetExit): void {
  program
    .command("export")
    .description("write the drawing (SVG, DXF), hole schedule and bill of materials (CSV) or JSON for a layout")
    .argument("<scenario>", "scenario file (YAML)")
    .requiredOption("--format <formats>", `one or more of ${EXPORT_FORMATS.join(", ")} (comma-separated), or all`)
    .requiredOption("--out <dir>", "folder to write into (created if missing)")
    .option("--rank <n>", "export the n-th layout of the search instead of the scenario's own layout", rankNumber("rank"))
    .option("--costs <file>", "cost catalogue for --rank (instead of the bundled illustrative one)")
    .option("--variants", "count --rank over every variant, as `search --variants` does")
    .option("--force", "overwrite existing files (regular files only)")
    .option(...maxCandidatesOption)
    .action(async (file: string, opts: ExportCommandOptions) => {
      const { runExport } = await import("./run-export.js");
      setExit(await runExport(file, opts, io));
    });
}

/** `report`: the HTML calculation report (run-report.ts). */
function defineReport(program: Command, io: Io, setExit: SetExit): void {
  program
    .command("report")
    .description("write a self-contained HTML calculation report (inputs, drawing, every check, verdict)")
    .argument("<scenario>", "scenario file (YAML)")
    .requiredOption("--out <file>", "the HTML file to write")
    .option("--rank <n>", "report on the n-th layout of the search instead of the scenario's own layout", rankNumber("rank"))
    .option("--costs <file>", "cost catalogue for --rank (instead of the bundled illustrative one)")
    .option("--variants", "count --rank over every variant, as `search --variants` does")
    .option("--force", "overwrite an existing file (a regular file only)")
    .option(...maxCandidatesOption)
    .action(async (file: string, opts: ReportCommandOptions) => {
      const { runReport } = await import("./run-report.js");
      setExit(await runReport(file, opts, io));
    });
}

/** `compare`: other bolt classes, sizes or codes side by side (run-compare.ts). */
function defineCompare(program: Command, io: Io, setExit: SetExit): void {
  program
    .command("compare")
    .description("the same splice side by side under other bolt classes, bolt sizes or design codes")
    .argument("<scenario>", "scenario file (YAML)")
    .option("--classes <list>", "property classes, e.g. 4.6,8.8,10.9")
    .option("--sizes <list>", "bolt sizes, e.g. 16,20,24 or M16,M20")
    .option("--codes <list>", "design codes, e.g. is800,en1993,aisc360")
    .option("--costs <file>", "cost catalogue instead of the bundled illustrative one")
    .option(...maxCandidatesOption)
    .option("--json", "print the comparison as JSON")
    .action(async (file: string, opts: CompareCommandOptions) => {
      const { runCompare } = await import("./run-compare.js");
      setExit(runCompare(file, opts, io));
    });
}

async function run(argv: string[], io: Io): Promise<number> {
  let exit = 0;
  const setExit: SetExit = (code) => (exit = code);
  const program = newProgram(io);
  for (const define of [defineCheck, defineSearch, defineExport, defineReport, defineCompare, registerSchedule, registerApp]) define(program, io, setExit);

  try {
    await program.parseAsync(argv);
  } catch (e) {
    if (e instanceof CommanderError) {
      if (e.code === "commander.helpDisplayed" || e.code === "commander.version" || e.code === "commander.help") return 0;
      return 2;
    }
    throw e;
  }
  return exit;
}

/** Entry point used by bin/splicewright.js. Never lets a stack trace reach the user for bad input. */
export async function main(argv: string[], rawIo: Io = PROCESS_IO): Promise<number> {
  const io = terminalSafe(rawIo);
  try {
    return await run(argv, io);
  } catch (e) {
    if (e instanceof InputError || e instanceof WorkLimitError) {
      io.err(`splicewright: error: ${e.message}`);
      return 2;
    }
    const message = e instanceof Error ? e.message : String(e);
    io.err(`splicewright: internal error: ${message} (please report it with the scenario file)`);
    if (process.env.SPLICEWRIGHT_DEBUG && e instanceof Error && e.stack) io.err(e.stack);
    return 3;
  }
}
