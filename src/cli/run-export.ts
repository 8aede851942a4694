/**
 * `splicewright export`: the drawing (SVG, DXF), hole schedule and bill of materials (CSV) or JSON of a
 * layout. Loaded only when the command runs (main.ts holds its options).
 */
import { join } from "node:path";
import { checkScenario } from "../engine/check.js";
import { EXPORT_FORMATS, exportFileNames, exportFiles, type ExportFormat } from "../export/index.js";
import { exportBase } from "../export/names.js";
import { InputError } from "../io/input-error.js";
import { chooseLayout, parseForDrawing, type LayoutChoice } from "./chosen-layout.js";
import { checkTargets, writeFileSet } from "./files.js";
import { today } from "./inputs.js";
import type { Io } from "./output.js";

export interface ExportCommandOptions extends LayoutChoice {
  format: string;
  out: string;
  force?: boolean;
}

/** `--format`: a comma-separated list of formats, or all. */
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

/** Write the files; the exit code is 0 when the layout passes and has a bill of materials, 1 otherwise. */
export async function runExport(file: string, opts: ExportCommandOptions, io: Io): Promise<number> {
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
  return report.pass && bom.ok ? 0 : 1;
}
