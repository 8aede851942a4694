/**
 * Export of a checked layout: every format as text, named, ready for the CLI to write. Pure.
 */
import type { Joint } from "../model/joint.js";
import type { CheckReport } from "../model/results.js";
import type { CheckableScenario } from "../model/scenario.js";
import { billOfMaterials, type BillOfMaterials } from "./bolt-list.js";
import { billOfMaterialsCsv, holeScheduleCsv } from "./csv.js";
import { renderDxf } from "./dxf.js";
import { exportJson } from "./json.js";
import { layoutSheet, renderSvg } from "./svg.js";
import { EXPORT_FORMATS, type ExportFormat } from "./formats.js";

export { EXPORT_FORMATS, type ExportFormat };

export interface ExportFile {
  name: string;
  content: string;
}

export interface ExportInput {
  scenario: CheckableScenario;
  joint: Joint;
  report: CheckReport;
  date: string;
  /** Base of the file names, e.g. "footbridge-tie". */
  base: string;
}

/** The names of the files `exportFiles` writes for these formats, in its order (known before any work). */
export function exportFileNames(base: string, formats: readonly ExportFormat[]): string[] {
  const names: Record<ExportFormat, string[]> = { svg: [`${base}.svg`], dxf: [`${base}.dxf`], csv: [`${base}-holes.csv`, `${base}-bom.csv`], json: [`${base}.json`] };
  return formats.flatMap((f) => names[f]);
}

export function exportFiles(input: ExportInput, formats: readonly ExportFormat[]): { files: ExportFile[]; bom: BillOfMaterials } {
  const bom = billOfMaterials(input.joint, input.scenario);
  const svgInput = { scenario: input.scenario, joint: input.joint, report: input.report, bom, date: input.date };
  const files: ExportFile[] = [];
  for (const f of formats) {
    if (f === "svg") files.push({ name: `${input.base}.svg`, content: renderSvg(svgInput) });
    if (f === "dxf") files.push({ name: `${input.base}.dxf`, content: renderDxf({ ...svgInput, scale: layoutSheet(svgInput).scale, units: input.scenario.units === "us" ? "in" : "mm" }) });
    if (f === "csv") {
      const units = input.scenario.units === "us" ? "us" : "si";
      files.push({ name: `${input.base}-holes.csv`, content: holeScheduleCsv(input.joint, input.scenario.name, units) });
      files.push({ name: `${input.base}-bom.csv`, content: billOfMaterialsCsv(bom, input.scenario.name, units) });
    }
    if (f === "json") files.push({ name: `${input.base}.json`, content: JSON.stringify(exportJson(input.scenario, input.joint, input.report, bom, input.date), null, 2) + "\n" });
  }
  return { files, bom };
}
