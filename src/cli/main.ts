/**
 * The command-line shell: reads files, prints, sets exit codes. All calculation is in the pure core.
 * Exit codes: 0 all checks pass, 1 a check fails or nothing complies, 2 bad input, 3 internal error,
 * 4 the output could not be written (output.ts).
 */
import { Command, CommanderError, Option } from "commander";
import { savedScenarioText } from "../io/save-scenario.js";
import { parseYaml } from "../io/yaml.js";
import { searchJson } from "../report/search-json.js";
import { RANK_BY, type RankBy } from "../search/ranking.js";
import { searchLayouts } from "../search/search.js";
import { checkTargets, writeFileSet } from "./files.js";
import { EXPORT_FORMATS, exportFileNames, exportFiles, type ExportFormat } from "../export/index.js";
import { exportBase } from "../export/names.js";
import { WorkLimitError } from "../search/work-estimate.js";
import { MAX_TOP, maxCandidatesOption, wholeNumber } from "./options.js";
import { PROCESS_IO, terminalSafe, type Io } from "./output.js";
import { SearchProgress } from "./search-progress.js";
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
import { styleFor } from "./style.js";
import { MIN_WIDTH, outputWidth, PIPED_WIDTH } from "./text.js";
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

/** `--top` and `--rank`: 1 … MAX_TOP. */
const rankNumber = (name: string) => wholeNumber(name, 1, MAX_TOP);

/** A scenario for export and report (metric bolts only). */
function parseForDrawing(file: string) {
  const { scenario, code } = parseScenario(readScenarioText(file));
  return { scenario, code };
}

/** The scenario's own layout, or the rank-th row of the search over its space (io/layout-choice.ts). */
function chooseLayout({ scenario, code }: ReturnType<typeof parseForDrawing>, opts: { rank?: number; costs?: string; maxCandidates?: number; variants?: boolean }) {
  const limit = opts.maxCandidates === undefined ? {} : { maxCandidates: opts.maxCandidates };
  return withProgress(opts.rank ?? 1, (onProgress) => layoutToExport(scenario, code, opts.rank, () => loadCosts(opts.costs, scenario.costs), { variants: opts.variants ?? false, onProgress, ...limit }));
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

/** A search with a progress line on a terminal after 2 s (search, and --rank of export and report). */
function withProgress<T>(top: number, run: (onProgress: SearchProgress["update"]) => T): T {
  const progress = new SearchProgress(process.stderr, "searching", top);
  try {
    return run(progress.update);
  } finally {
    progress.finish();
  }
}

/** --width: a whole number of columns, at least the narrowest layout. */
function widthOption(v: string): number {
  if (!/^\d+$/.test(v) || Number(v) < MIN_WIDTH || Number(v) > 1000) throw new InputError("--width", `must be a whole number of columns from ${MIN_WIDTH} to 1000, got "${v}"`);
  return Number(v);
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
    .option("--brief", "the summary and one line per check")
    .option("--width <columns>", `lay the sheet out for this many columns (default: the terminal's, at least ${MIN_WIDTH}; ${PIPED_WIDTH} when piped)`, widthOption)
    .action((file: string, opts: { json?: boolean; brief?: boolean; width?: number }) => {
      const { scenario, code } = loadCheckable(file);
      const { joint, report } = checkScenario(scenario, code);
      const stream = io.stdout ?? {};
      const sheet = () => formatSheet(scenario, joint, report, { width: outputWidth(stream, opts.width), style: styleFor(stream), brief: opts.brief ?? false });
      io.out(opts.json ? JSON.stringify(checkReportJson(scenario, joint, report), null, 2) : sheet());
      exit = exitCodeOf(report);
    });

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
    .action(async (file: string, opts: { top: number; rankBy: RankBy; costs?: string; save?: string; rank: number; force?: boolean; maxCandidates?: number; json?: boolean; variants?: boolean }) => {
      const text = readScenarioText(file);
      const { scenario, code } = parseScenario(text);
      const costs = loadCosts(opts.costs, scenario.costs);
      if (opts.save) checkTargets([opts.save], opts.force ?? false); // before the search, not after it
      const t0 = performance.now();
      const top = Math.max(opts.top, opts.save ? opts.rank : 1);
      const limit = opts.maxCandidates === undefined ? {} : { maxCandidates: opts.maxCandidates };
      const outcome = withProgress(top, (onProgress) => searchLayouts({ scenario, code, costs }, { top, rankBy: opts.rankBy, variants: opts.variants ?? false, onProgress, ...limit }));
      const elapsed = performance.now() - t0;
      outcome.stats.elapsed_ms = Number(elapsed.toFixed(1));
      if (opts.save) {
        const chosen = outcome.results[opts.rank - 1];
        if (chosen) await writeFileSet([{ path: opts.save, content: savedScenarioText(parseYaml(text) as Record<string, unknown>, chosen, opts.rank) }], opts.force ?? false);
        else if (outcome.results.length > 0) throw new InputError("--rank", `there are only ${outcome.results.length} results`);
      }
      const shown = { ...outcome, results: outcome.results.slice(0, opts.top) };
      const variants = opts.variants ?? false;
      io.out(
        opts.json
          ? JSON.stringify(searchJson(scenario.name, shown, opts.rankBy, costs.currency, { variants, efficiencyBasis: scenario.options.efficiencyBasis }), null, 2)
          : formatSearch(scenario, shown, opts.rankBy, costs.currency, code.title, elapsed, variants),
      );
      if (opts.save && outcome.results[opts.rank - 1]) io.err(`saved result ${opts.rank} to ${opts.save}`);
      exit = outcome.results.length > 0 ? 0 : 1;
    });

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
    .action(async (file: string, opts: { format: string; out: string; rank?: number; costs?: string; force?: boolean; maxCandidates?: number; variants?: boolean }) => {
      const formats = parseFormats(opts.format);
      const date = today();
      const parsed = parseForDrawing(file);
      const base = exportBase(file, opts.rank);
      checkTargets(exportFileNames(base, formats).map((n) => join(opts.out, n)), opts.force ?? false);
      const { checkable, code } = chooseLayout(parsed, opts);
      const { joint, report } = checkScenario(checkable, code);
      const { files, bom } = exportFiles({ scenario: checkable, joint, report, date, base }, formats);
      await writeFileSet(files.map((f) => ({ path: join(opts.out, f.name), content: f.content })), opts.force ?? false);
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
    .option("--rank <n>", "report on the n-th layout of the search instead of the scenario's own layout", rankNumber("rank"))
    .option("--costs <file>", "cost catalogue for --rank (instead of the bundled illustrative one)")
    .option("--variants", "count --rank over every variant, as `search --variants` does")
    .option("--force", "overwrite an existing file (a regular file only)")
    .option(...maxCandidatesOption)
    .action(async (file: string, opts: { out: string; rank?: number; costs?: string; force?: boolean; maxCandidates?: number; variants?: boolean }) => {
      const date = today();
      const parsed = parseForDrawing(file);
      checkTargets([opts.out], opts.force ?? false);
      const { checkable, code } = chooseLayout(parsed, opts);
      const { joint, report } = checkScenario(checkable, code);
      const bom = billOfMaterials(joint, checkable);
      const html = renderReportHtml({ scenario: checkable, joint, report, bom, date, version: VERSION, origin: reportOrigin(opts.rank, opts.variants ?? false) });
      await writeFileSet([{ path: opts.out, content: html }], opts.force ?? false);
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
    .option(...maxCandidatesOption)
    .option("--json", "print the comparison as JSON")
    .action((file: string, opts: { classes?: string; sizes?: string; codes?: string; costs?: string; maxCandidates?: number; json?: boolean }) => {
      const { scenario, code } = parseScenario(readScenarioText(file));
      const costs = loadCosts(opts.costs, scenario.costs);
      const columns = compareRequest(scenario, code, opts, costs, () => readScenarioText(BUNDLED_EQUIVALENTS), opts.maxCandidates === undefined ? {} : { maxCandidates: opts.maxCandidates });
      const basis = scenario.options.efficiencyBasis;
      io.out(opts.json ? JSON.stringify(compareJson(scenario.name, columns, costs.currency, basis), null, 2) : formatCompare(scenario.name, columns, costs.currency, basis, scenario.load));
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
