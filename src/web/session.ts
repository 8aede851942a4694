/**
 * The scenario being edited, in the worker: its YAML document, the live check and the downloads. Every
 * step calls the functions the CLI calls (parseScenario, requireCheckable, checkScenario,
 * checkReportJson, layoutToExport, exportFiles, renderReportHtml), so the page shows and writes what
 * `check`, `export` and `report` would for the same file and date.
 */
import { findCode } from "../codes/registry.js";
import { checkScenario } from "../engine/check.js";
import { billOfMaterials } from "../export/bolt-list.js";
import { EXPORT_FORMATS, exportFiles, type ExportFormat } from "../export/index.js";
import { exportBase, exportDate, fileExtension } from "../export/names.js";
import { layoutToExport, reportOrigin } from "../io/layout-choice.js";
import { InputError, parseScenario, requireCheckable } from "../io/scenario.js";
import { checkReportJson } from "../report/check-json.js";
import { renderReportHtml } from "../report/html.js";
import { WorkLimitError } from "../search/work-estimate.js";
import { VERSION } from "../version.js";
import { ScenarioDocument } from "./document.js";
import { CODE_IDS, type CodeId } from "./fields.js";
import type { DownloadFormat, LiveState, OutFile, Problem } from "./protocol.js";
import { workbenchSummary } from "./summary.js";

export function problemOf(e: unknown): Problem {
  if (e instanceof InputError) return { kind: "input", path: e.path, message: e.message };
  // A search refused for its size is bad input of the field it names, as in the CLI.
  if (e instanceof WorkLimitError) return { kind: "input", path: e.path, message: e.message };
  return { kind: "internal", message: `${e instanceof Error ? e.message : String(e)} (please report it with the scenario file)` };
}

/** A scenario file's name as the CLI would be given it: with an extension, nothing but its last segment. */
export function scenarioFileName(name: string): string {
  const last = name.split(/[/\\]/).pop()?.trim() || "scenario.yaml";
  return fileExtension(last) ? last : `${last}.yaml`;
}

export class Session {
  private doc = ScenarioDocument.blank();
  private fileName = "scenario.yaml";
  private date = exportDate(undefined, new Date());

  open(text: string, fileName: string): LiveState {
    this.doc = ScenarioDocument.open(text);
    this.fileName = scenarioFileName(fileName);
    return this.evaluate();
  }

  blank(): LiveState {
    this.doc = ScenarioDocument.blank();
    this.fileName = "scenario.yaml";
    return this.evaluate();
  }

  edit(edits: ReadonlyArray<{ path: string[]; value: unknown }>): LiveState {
    for (const e of edits) this.doc.set(e.path, e.value);
    return this.evaluate();
  }

  setDate(date: string): LiveState {
    if (!/^\d{4}-\d{2}-\d{2}$/.test(date)) throw new InputError("date", `must be a date yyyy-mm-dd, got "${date}"`);
    this.date = date;
    return this.evaluate();
  }

  rename(fileName: string): LiveState {
    this.fileName = scenarioFileName(fileName);
    return this.evaluate();
  }

  /** Read the text as `check` does; check and draw it when it has a layout. */
  evaluate(): LiveState {
    const t0 = performance.now();
    const text = this.doc.text();
    const file = this.doc.plain();
    const state: LiveState = { text, file, fileName: this.fileName, date: this.date, ms: 0 };
    const codeId = typeof file.code === "string" ? findCode(file.code)?.id : undefined;
    if (codeId && (CODE_IDS as readonly string[]).includes(codeId)) state.codeId = codeId as CodeId;
    try {
      const { scenario, code } = parseScenario(text);
      if (!scenario.bolts && !scenario.layout) state.searchOnly = true;
      else {
        const checkable = requireCheckable(scenario, code);
        const { joint, report } = checkScenario(checkable, code);
        state.check = { summary: workbenchSummary(checkable, report), json: checkReportJson(checkable, joint, report) as unknown as Record<string, unknown> };
        try {
          const exported = layoutToExport(scenario, code, undefined, () => {
            throw new Error("no search for the drawing");
          });
          state.check.svg = exportFiles({ scenario: exported.checkable, joint, report, date: this.date, base: "drawing" }, ["svg"]).files[0]!.content;
        } catch (e) {
          state.check.svgProblem = problemOf(e).message;
        }
      }
    } catch (e) {
      state.problem = problemOf(e);
    }
    state.ms = performance.now() - t0;
    return state;
  }

  /** The files `export` and `report` write for this scenario and date, named as they name them. */
  download(formats: readonly DownloadFormat[]): { files: OutFile[]; notes: string[]; pass: boolean } {
    const text = this.doc.text();
    const base = exportBase(this.fileName);
    const files: OutFile[] = [];
    const notes: string[] = [];
    if (formats.includes("yaml")) files.push({ name: this.fileName, content: text });
    const exports = formats.filter((f): f is ExportFormat => (EXPORT_FORMATS as readonly string[]).includes(f));
    const wantReport = formats.includes("report");
    if (exports.length === 0 && !wantReport) return { files, notes, pass: true };
    const { scenario, code } = parseScenario(text);
    const { checkable } = layoutToExport(scenario, code, undefined, () => {
      throw new Error("no search for a download");
    });
    const { joint, report } = checkScenario(checkable, code);
    if (exports.length > 0) {
      const out = exportFiles({ scenario: checkable, joint, report, date: this.date, base }, exports);
      files.push(...out.files);
      notes.push(...out.bom.notes);
    }
    if (wantReport) {
      const bom = billOfMaterials(joint, checkable);
      files.push({ name: `${base}-report.html`, content: renderReportHtml({ scenario: checkable, joint, report, bom, date: this.date, version: VERSION, origin: reportOrigin(undefined) }) });
    }
    return { files, notes, pass: report.pass };
  }
}
