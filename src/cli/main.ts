/**
 * The command-line shell: reads files, prints, sets exit codes. All calculation is in the pure core.
 * Exit codes: 0 all checks pass, 1 a check fails or nothing complies, 2 bad input, 3 internal error.
 */
import { Command, CommanderError, Option } from "commander";
import { savedScenarioText } from "../io/save-scenario.js";
import { parseYaml } from "../io/yaml.js";
import { searchJson } from "../report/search-json.js";
import { RANK_BY, type RankBy } from "../search/ranking.js";
import { searchLayouts } from "../search/search.js";
import { writeFileSafely, writeFilesSafely } from "./files.js";
import { EXPORT_FORMATS, exportFiles, type ExportFormat } from "../export/index.js";
import { exportBase } from "../export/names.js";
import { join } from "node:path";
import { billOfMaterials } from "../export/bolt-list.js";
import { compareJson } from "../report/compare-json.js";
import { formatCompare } from "./compare-table.js";
import { compareRequest } from "../io/compare-request.js";
import { layoutToExport, reportOrigin } from "../io/layout-choice.js";
import { renderReportHtml } from "../report/html.js";
import { formatSearch } from "./search-table.js";
import { checkScenario, exitCodeOf } from "../engine/check.js";
import { InputError, parseScenario, requireCheckable } from "../io/scenario.js";
import { checkReportJson } from "../report/check-json.js";
import { formatSheet } from "./sheet.js";
import { registerSchedule } from "./schedule-command.js";
import { registerApp } from "./app-command.js";
import { BUNDLED_EQUIVALENTS, loadCosts, readScenarioText, today } from "./inputs.js";
import { VERSION } from "../version.js";

export { VERSION };
export { BUNDLED_COSTS, BUNDLED_EQUIVALENTS, loadCosts, readScenarioText } from "./inputs.js";

function loadCheckable(file: string) {
  const { scenario, code } = parseScenario(readScenarioText(file));
  return { scenario: requireCheckable(scenario, code), code };
}

function positiveInt(name: string) {
  return (v: string) => {
    if (!/^\d+$/.test(v) || Number(v) < 1) throw new InputError(`--${name}`, `must be a whole number of 1 or more, got "${v}"`);
    return Number(v);
  };
}

/** The scenario's own layout, or (with a rank) the rank-th layout of the search over its space. */
function chooseLayout(file: string, rank: number | undefined, costsFile: string | undefined) {
  const { scenario, code } = parseScenario(readScenarioText(file));
  return layoutToExport(scenario, code, rank, () => loadCosts(costsFile, scenario.costs));
}

function parseFormats(text: string): ExportFormat[] {
  if (text.trim() === "all") return [...EXPORT_FORMATS];
  const out: ExportFormat[] = [];
  for (const part of text.split(",").map((s) => s.trim()).filter(Boolean)) {
    if (!(EXPORT_FORMATS as readonly string[]).includes(part)) throw new InputError("--format", `unknown format "${part}" (known: ${EXPORT_FORMATS.join(", ")}, all)`);
    if (!out.includes(part as ExportFormat)) out.push(part as ExportFormat);
  }
  if (out.length === 0) throw new InputError("--format", "give at least one format");
  return out;
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
    .description("Check and search bolted tension splices in flat steel plates (IS 800:2007, EN 1993-1-8, AISC 360-16).\nResults are an aid to design: verify them with a qualified engineer.")
    .version(VERSION)
    .exitOverride()
    .configureOutput({
      writeOut: (s) => io.out(s.replace(/\n$/, "")),
      writeErr: (s) => io.err(s.replace(/\n$/, "")),
      // Usage mistakes read like every other bad input: one line, "splicewright: error: …".
      outputError: (s, write) => write(`splicewright: ${s.trim().split("\n").map((l) => l.trim()).filter(Boolean).join(" ")}\n`),
    });

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

  program
    .command("search")
    .description("find the best bolt layouts over the scenario's declared search space, proven optimal")
    .argument("<scenario>", "scenario file (YAML); bolts and layout are not needed")
    .option("--top <n>", "how many layouts to show", positiveInt("top"), 10)
    .addOption(new Option("--rank-by <what>", "rank by").choices([...RANK_BY]).default("cost"))
    .option("--costs <file>", "cost catalogue (YAML) instead of the bundled illustrative one")
    .option("--save <file>", "write the chosen layout (rank 1, or --rank) as a scenario that check accepts")
    .option("--rank <n>", "which result --save writes", positiveInt("rank"), 1)
    .option("--force", "let --save overwrite an existing file")
    .option("--json", "print the results as JSON")
    .action((file: string, opts: { top: number; rankBy: RankBy; costs?: string; save?: string; rank: number; force?: boolean; json?: boolean }) => {
      const text = readScenarioText(file);
      const { scenario, code } = parseScenario(text);
      const costs = loadCosts(opts.costs, scenario.costs);
      const t0 = performance.now();
      const outcome = searchLayouts({ scenario, code, costs }, { top: Math.max(opts.top, opts.save ? opts.rank : 1), rankBy: opts.rankBy });
      const elapsed = performance.now() - t0;
      outcome.stats.elapsed_ms = Number(elapsed.toFixed(1));
      if (opts.save) {
        const chosen = outcome.results[opts.rank - 1];
        if (chosen) writeFileSafely(opts.save, savedScenarioText(parseYaml(text) as Record<string, unknown>, chosen, opts.rank), opts.force ?? false);
        else if (outcome.results.length > 0) throw new InputError("--rank", `there are only ${outcome.results.length} results`);
      }
      const shown = { ...outcome, results: outcome.results.slice(0, opts.top) };
      io.out(opts.json ? JSON.stringify(searchJson(scenario.name, shown, opts.rankBy, costs.currency), null, 2) : formatSearch(scenario, shown, opts.rankBy, costs.currency, code.title, elapsed));
      if (opts.save && outcome.results[opts.rank - 1]) io.err(`saved result ${opts.rank} to ${opts.save}`);
      exit = outcome.results.length > 0 ? 0 : 1;
    });

  program
    .command("export")
    .description("write the drawing (SVG, DXF), hole schedule and bill of materials (CSV) or JSON for a layout")
    .argument("<scenario>", "scenario file (YAML)")
    .requiredOption("--format <formats>", `one or more of ${EXPORT_FORMATS.join(", ")} (comma-separated), or all`)
    .requiredOption("--out <dir>", "folder to write into (created if missing)")
    .option("--rank <n>", "export the n-th layout of the search instead of the scenario's own layout", positiveInt("rank"))
    .option("--costs <file>", "cost catalogue for --rank (instead of the bundled illustrative one)")
    .option("--force", "overwrite existing files")
    .action((file: string, opts: { format: string; out: string; rank?: number; costs?: string; force?: boolean }) => {
      const formats = parseFormats(opts.format);
      const { checkable, code } = chooseLayout(file, opts.rank, opts.costs);
      const { joint, report } = checkScenario(checkable, code);
      const base = exportBase(file, opts.rank);
      const { files, bom } = exportFiles({ scenario: checkable, joint, report, date: today(), base }, formats);
      writeFilesSafely(files.map((f) => ({ path: join(opts.out, f.name), content: f.content })), opts.force ?? false);
      for (const f of files) io.out(`wrote ${join(opts.out, f.name)}`);
      for (const n of bom.notes) io.err(`note: ${n}`);
      if (!report.pass) io.err(`the layout fails ${report.checks.filter((c) => !c.pass).length} check(s): see \`splicewright check ${file}\``);
      if (!bom.ok) io.err("the bill of materials has no valid bolt length for every group (see the notes)");
      exit = report.pass && bom.ok ? 0 : 1;
    });

  program
    .command("report")
    .description("write a self-contained HTML calculation report (inputs, drawing, every check, verdict)")
    .argument("<scenario>", "scenario file (YAML)")
    .requiredOption("--out <file>", "the HTML file to write")
    .option("--rank <n>", "report on the n-th layout of the search instead of the scenario's own layout", positiveInt("rank"))
    .option("--costs <file>", "cost catalogue for --rank (instead of the bundled illustrative one)")
    .option("--force", "overwrite an existing file")
    .action((file: string, opts: { out: string; rank?: number; costs?: string; force?: boolean }) => {
      const { checkable, code } = chooseLayout(file, opts.rank, opts.costs);
      const { joint, report } = checkScenario(checkable, code);
      const bom = billOfMaterials(joint, checkable);
      const html = renderReportHtml({ scenario: checkable, joint, report, bom, date: today(), version: VERSION, origin: reportOrigin(opts.rank) });
      writeFileSafely(opts.out, html, opts.force ?? false);
      io.out(`wrote ${opts.out} (${report.pass ? "PASS" : "FAIL"})`);
      exit = report.pass ? 0 : 1;
    });

  program
    .command("compare")
    .description("the same splice side by side under other bolt classes, bolt sizes or design codes")
    .argument("<scenario>", "scenario file (YAML)")
    .option("--classes <list>", "property classes, e.g. 4.6,8.8,10.9")
    .option("--sizes <list>", "bolt sizes, e.g. 16,20,24 or M16,M20")
    .option("--codes <list>", "design codes, e.g. is800,en1993,aisc360")
    .option("--costs <file>", "cost catalogue instead of the bundled illustrative one")
    .option("--json", "print the comparison as JSON")
    .action((file: string, opts: { classes?: string; sizes?: string; codes?: string; costs?: string; json?: boolean }) => {
      const { scenario, code } = parseScenario(readScenarioText(file));
      const costs = loadCosts(opts.costs, scenario.costs);
      const columns = compareRequest(scenario, code, opts, costs, () => readScenarioText(BUNDLED_EQUIVALENTS));
      io.out(opts.json ? JSON.stringify(compareJson(scenario.name, columns, costs.currency), null, 2) : formatCompare(scenario.name, columns, costs.currency));
      exit = columns.some((c) => c.best) ? 0 : 1;
    });

  registerSchedule(program, io, (c) => (exit = c));
  registerApp(program, io, (c) => (exit = c));

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
