/**
 * `splicewright report`: a self-contained HTML calculation report of a layout. Loaded only when the
 * command runs (main.ts holds its options).
 */
import { checkScenario } from "../engine/check.js";
import { billOfMaterials } from "../export/bolt-list.js";
import { reportOrigin } from "../io/layout-choice.js";
import { renderReportHtml } from "../report/html.js";
import { VERSION } from "../version.js";
import { chooseLayout, parseForDrawing, type LayoutChoice } from "./chosen-layout.js";
import { checkTargets, writeFileSet } from "./files.js";
import { today } from "./inputs.js";
import type { Io } from "./output.js";

export interface ReportCommandOptions extends LayoutChoice {
  out: string;
  force?: boolean;
}

/** Write the report; the exit code is 0 when the layout passes, 1 when it fails. */
export async function runReport(file: string, opts: ReportCommandOptions, io: Io): Promise<number> {
  const date = today();
  const parsed = parseForDrawing(file);
  checkTargets([opts.out], opts.force ?? false);
  const { checkable, code } = chooseLayout(parsed, opts);
  const { joint, report } = checkScenario(checkable, code);
  const bom = billOfMaterials(joint, checkable);
  const html = renderReportHtml({ scenario: checkable, joint, report, bom, date, version: VERSION, origin: reportOrigin(opts.rank, opts.variants ?? false) });
  await writeFileSet([{ path: opts.out, content: html }], opts.force ?? false);
  io.out(`wrote ${opts.out} (${report.pass ? "PASS" : "FAIL"})`);
  return report.pass ? 0 : 1;
}
