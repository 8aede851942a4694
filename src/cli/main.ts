/**
 * The command-line shell: reads files, prints, sets exit codes. All calculation is in the pure core.
 * Exit codes: 0 all checks pass, 1 a check fails or nothing complies, 2 bad input, 3 internal error.
 */
import { readFileSync, statSync } from "node:fs";
import { Command, CommanderError } from "commander";
import { checkScenario, exitCodeOf } from "../engine/check.js";
import { InputError, MAX_FILE_BYTES, parseScenario, requireCheckable } from "../io/scenario.js";
import { checkReportJson } from "../report/check-json.js";
import { formatSheet } from "./sheet.js";

export const VERSION = "0.1.0";

/** Read a scenario file's text, or throw an InputError naming the file. */
export function readScenarioText(file: string): string {
  let size: number;
  try {
    const st = statSync(file);
    if (!st.isFile()) throw new InputError(file, "not a file");
    size = st.size;
  } catch (e) {
    if (e instanceof InputError) throw e;
    throw new InputError(file, "cannot read the file (does it exist?)");
  }
  if (size > MAX_FILE_BYTES) throw new InputError(file, `file is larger than ${MAX_FILE_BYTES} bytes`);
  return readFileSync(file, "utf8");
}

function loadCheckable(file: string) {
  const { scenario, code } = parseScenario(readScenarioText(file));
  return { scenario: requireCheckable(scenario, code), code };
}

interface Io {
  out: (text: string) => void;
  err: (text: string) => void;
}

async function run(argv: string[], io: Io): Promise<number> {
  let exit = 0;
  const program = new Command();
  program
    .name("splicewright")
    .description("Check and search bolted tension splices in flat steel plates (IS 800:2007).\nResults are an aid to design: verify them with a qualified engineer.")
    .version(VERSION)
    .exitOverride()
    .configureOutput({ writeOut: (s) => io.out(s.replace(/\n$/, "")), writeErr: (s) => io.err(s.replace(/\n$/, "")) });

  program
    .command("check")
    .description("check the scenario's bolt layout against every clause of its design code")
    .argument("<scenario>", "scenario file (YAML)")
    .option("--json", "print the results as JSON instead of a calculation sheet")
    .action((file: string, opts: { json?: boolean }) => {
      const { scenario, code } = loadCheckable(file);
      const { joint, report } = checkScenario(scenario, code);
      io.out(opts.json ? JSON.stringify(checkReportJson(scenario, joint, report), null, 2) : formatSheet(scenario, joint, report));
      exit = exitCodeOf(report);
    });

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
export async function main(argv: string[], io: Io = { out: (s) => process.stdout.write(`${s}\n`), err: (s) => process.stderr.write(`${s}\n`) }): Promise<number> {
  try {
    return await run(argv, io);
  } catch (e) {
    if (e instanceof InputError) {
      io.err(`splicewright: error: ${e.message}`);
      return 2;
    }
    const message = e instanceof Error ? e.message : String(e);
    io.err(`splicewright: internal error: ${message} (please report it with the scenario file)`);
    if (process.env.SPLICEWRIGHT_DEBUG && e instanceof Error && e.stack) io.err(e.stack);
    return 3;
  }
}
