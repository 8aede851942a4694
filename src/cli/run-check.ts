/**
 * `splicewright check`: every clause of the design code on the scenario's own layout, as a calculation
 * sheet or JSON. Loaded only when the command runs (main.ts holds its options).
 */
import { checkScenario, exitCodeOf } from "../engine/check.js";
import { parseScenario, requireCheckable } from "../io/scenario.js";
import { checkReportJson } from "../report/check-json.js";
import { InputError } from "../io/input-error.js";
import { readScenarioText } from "./inputs.js";
import type { Io } from "./output.js";
import { formatSheet } from "./sheet.js";
import { styleFor } from "./style.js";
import { outputWidth } from "./text.js";

export interface CheckCommandOptions {
  json?: boolean;
  brief?: boolean;
  width?: number;
}

/** Print the check; the exit code is 0 when every check passes, 1 when one fails. */
export function runCheck(file: string, opts: CheckCommandOptions, io: Io): number {
  if (opts.json && (opts.brief || opts.width !== undefined)) {
    throw new InputError(opts.brief ? "--brief" : "--width", "lays out the calculation sheet, and --json prints every check in full instead: give one or the other");
  }
  const parsed = parseScenario(readScenarioText(file));
  const scenario = requireCheckable(parsed.scenario, parsed.code);
  const { joint, report } = checkScenario(scenario, parsed.code);
  const stream = io.stdout ?? {};
  const sheet = () => formatSheet(scenario, joint, report, { width: outputWidth(stream, opts.width), style: styleFor(stream), brief: opts.brief ?? false });
  io.out(opts.json ? JSON.stringify(checkReportJson(scenario, joint, report), null, 2) : sheet());
  return exitCodeOf(report);
}
