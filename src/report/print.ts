/**
 * How the report prints: the A4 page rules (portrait pages, a landscape page for the drawing), column
 * widths, page breaks, and the print scale of the embedded drawing. Pure.
 *
 * The drawing is a sheet whose root states its paper size in mm and its scale (data-scale, or "1:N" in
 * its text): the report's own, plan and section drawn for the landscape page's drawing area
 * (src/export/svg.ts renderViewsSvg), prints at its own scale; a larger sheet (the A3 sheet) prints
 * reduced at the largest ISO 5455 reduction scale (1:2, 1:5, 1:10, 1:20 ...) at which it fits, so the
 * printed scale is true; where the sheet states no paper size or scale, it is fitted and marked "not to scale".
 */
import { lengthText, type DisplayUnits } from "./format.js";

/** The drawing area of the landscape A4 page: 297 × 210 mm less the margins, heading and caption. */
export const DRAWING_BOX_MM = { width: 273, height: 160 } as const;

export interface DrawingPrint {
  /** The sheet's own size and scale (1:sheetDenominator on it). */
  sheetWidth_mm: number;
  sheetHeight_mm: number;
  sheetDenominator: number;
  /** The scale on the printed A4 page and the reduction that gives it. */
  printDenominator: number;
  factor: number;
  width_mm: number;
  height_mm: number;
}

/** ISO 5455 reduction scales 1:2, 1:5, 1:10 and so on, with 1:1 (full size). */
export function iso5455Denominators(max: number): number[] {
  const out = [1];
  for (let decade = 1; decade <= max; decade *= 10) for (const m of [2, 5, 10]) if (m * decade <= max && !out.includes(m * decade)) out.push(m * decade);
  return out;
}

/** The sheet's paper size (mm) and stated scale from its SVG root, or null when it states none. */
export function sheetOf(svg: string): { width_mm: number; height_mm: number; denominator: number } | null {
  const root = /<svg\b[^>]*>/.exec(svg)?.[0] ?? "";
  const w = /\bwidth="([\d.]+)mm"/.exec(root);
  const h = /\bheight="([\d.]+)mm"/.exec(root);
  const scale = /\bdata-scale="([\d.]+)"/.exec(root)?.[1] ?? /\b1:(\d+(?:\.\d+)?)\b/.exec(svg.replace(/<[^>]*>/g, " "))?.[1];
  const denominator = Number(scale);
  if (!w || !h || !(denominator > 0)) return null;
  return { width_mm: Number(w[1]), height_mm: Number(h[1]), denominator };
}

/** The print of the sheet on the landscape A4 page at a true ISO 5455 scale, or null (fitted, not to scale). */
export function drawingPrint(svg: string, box = DRAWING_BOX_MM): DrawingPrint | null {
  const sheet = sheetOf(svg);
  if (!sheet) return null;
  const fit = Math.min(1, box.width / sheet.width_mm, box.height / sheet.height_mm);
  const least = sheet.denominator / fit;
  // A sheet that fits prints at its own scale (2:1 included); a larger one at the next ISO reduction.
  const printDenominator = fit >= 1 ? sheet.denominator : iso5455Denominators(Math.max(10, least * 10)).find((d) => d >= least - 1e-9);
  if (printDenominator === undefined) return null;
  const factor = sheet.denominator / printDenominator;
  return {
    sheetWidth_mm: sheet.width_mm,
    sheetHeight_mm: sheet.height_mm,
    sheetDenominator: sheet.denominator,
    printDenominator,
    factor,
    width_mm: sheet.width_mm * factor,
    height_mm: sheet.height_mm * factor,
  };
}

/** A scale bar for the printed page: a round real length (SI mm, US inches) at the print scale, 25–60 mm of paper. */
export function scaleBarSvg(p: DrawingPrint, units: DisplayUnits): string {
  const candidates = units === "us" ? [1, 2, 3, 6, 12, 24, 36, 48, 120].map((i) => i * 25.4) : [10, 20, 50, 100, 200, 500, 1000, 2000];
  const real = [...candidates].reverse().find((mm) => mm / p.printDenominator <= 60) ?? candidates[0]!;
  const paper = real / p.printDenominator;
  const label = units === "us" ? lengthText(real, "us") : lengthText(real, "si");
  const w = paper + 34;
  return `<svg class="scale-bar" xmlns="http://www.w3.org/2000/svg" width="${w.toFixed(2)}mm" height="7mm" viewBox="0 0 ${w.toFixed(2)} 7" role="img" aria-label="scale bar ${label} at 1:${p.printDenominator}" data-bar-paper-mm="${paper.toFixed(3)}"><rect x="1" y="1" width="${(paper / 2).toFixed(3)}" height="1.5" fill="#000"/><rect x="${(1 + paper / 2).toFixed(3)}" y="1" width="${(paper / 2).toFixed(3)}" height="1.5" fill="#fff" stroke="#000" stroke-width="0.2"/><rect x="1" y="1" width="${paper.toFixed(3)}" height="1.5" fill="none" stroke="#000" stroke-width="0.2"/><text x="1" y="6" font-size="3" font-family="sans-serif">0</text><text x="${(1 + paper).toFixed(3)}" y="6" font-size="3" font-family="sans-serif" text-anchor="middle">${label}</text><text x="${(paper + 12).toFixed(3)}" y="6" font-size="3" font-family="sans-serif">1:${p.printDenominator}</text></svg>`;
}

/** The report's style sheet: screen and A4 print. */
export const REPORT_CSS = `  :root { --ink: #111; --muted: #555; --rule: #999; }
  * { box-sizing: border-box; }
  body { font-family: "DejaVu Sans", "Liberation Sans", Arial, Helvetica, sans-serif; color: var(--ink); margin: 0 auto; max-width: 1100px; padding: 16px 24px; font-size: 13px; line-height: 1.35; }
  header.sheet { border: 1.5px solid var(--ink); display: grid; grid-template-columns: 1fr auto; margin-bottom: 0; }
  header.sheet h1 { font-size: 17px; margin: 0; padding: 6px 10px; border-right: 1px solid var(--ink); border-bottom: 1px solid var(--ink); }
  header.sheet .meta { padding: 5px 10px; font-size: 11px; border-bottom: 1px solid var(--ink); }
  header.sheet .scenario { grid-column: 1 / span 2; padding: 5px 10px; }
  table.signoff { margin: 0 0 8px; border: 1.5px solid var(--ink); border-top: 0; table-layout: fixed; }
  table.signoff th { width: 13%; font-size: 11px; background: #f3f3f3; }
  table.signoff td { width: 20.3%; height: 1.9em; }
  table.signoff td.blank { border-bottom: 1.5px solid var(--ink); }
  table.signoff tr.sign td { height: 3.4em; }
  h2 { font-size: 15px; border-bottom: 1.5px solid var(--ink); padding-bottom: 2px; margin: 14px 0 6px; }
  h3 { font-size: 13px; margin: 12px 0 4px; }
  table { border-collapse: collapse; width: 100%; margin: 4px 0 8px; }
  th, td { border: 1px solid var(--rule); padding: 3px 6px; vertical-align: top; text-align: left; overflow-wrap: anywhere; }
  th { background: #eee; font-weight: 600; }
  td.num { text-align: right; white-space: nowrap; }
  td.clause { font-size: 12px; }
  table.checks { table-layout: fixed; }
  col.c-clause { width: 17%; } col.c-check { width: 27%; } col.c-demand { width: 13%; } col.c-resist { width: 15%; } col.c-util { width: 18%; } col.c-result { width: 10%; }
  table.checks td.num { white-space: normal; }
  tr.formula-row td.formula { font-family: "DejaVu Sans Mono", "Liberation Mono", Consolas, monospace; font-size: 11px; border-top: 0; padding-left: 14px; background: #fafafa; overflow-wrap: break-word; }
  td.formula .subst { margin-top: 2px; }
  .muted { color: var(--muted); font-size: 11px; font-family: inherit; }
  td.util { white-space: nowrap; }
  .bar { display: inline-block; width: 60px; height: 10px; border: 1px solid var(--ink); vertical-align: middle; position: relative; }
  .bar span { display: block; height: 100%; background: #444; }
  .bar.over span { background: repeating-linear-gradient(45deg, #000 0 3px, #fff 3px 5px); }
  .u { margin-left: 6px; font-variant-numeric: tabular-nums; }
  tr.fail td.result { font-weight: bold; color: #b00020; }
  tr.governing td { border-top: 2px solid var(--ink); }
  tr.formula-row.governing td { border-bottom: 2px solid var(--ink); border-top: 0; }
  .kv > tbody > tr > td:first-child, .kv > tr > td:first-child { width: 24%; color: var(--muted); }
  table.factors { margin: 0 0 2px; }
  table.factors td { padding: 1px 5px; font-size: 12px; }
  table.factors td.sym { width: 4em; white-space: nowrap; }
  table.factors td.num { width: 3.5em; }
  table.factors td.src { width: 31%; color: var(--muted); }
  ul.conventions { margin: 0; padding-left: 0; font-size: 11px; columns: 2; column-gap: 2.4em; }
  ul.conventions li { break-inside: avoid; margin-left: 1.1em; }
  table.plates td.num:nth-child(5) { white-space: normal; }
  figure.drawing { margin: 0; outline: 1px solid var(--rule); }
  figure.drawing > svg { width: 100%; height: auto; display: block; }
  .drawing-caption { font-size: 11px; margin: 4px 0 0; }
  .drawing-caption svg.scale-bar { vertical-align: middle; margin-left: 8px; }
  .verdict { border: 2px solid var(--ink); padding: 6px 12px; font-size: 16px; font-weight: bold; margin: 6px 0; }
  .verdict.is-pass { border-color: #1a6b2a; color: #1a6b2a; }
  .verdict.is-fail { border-color: #b00020; color: #b00020; border-width: 3px; }
  table.summary tr.fail td:last-child { color: #b00020; font-weight: bold; }
  table.summary tr.warn td:last-child { color: #8a5a00; }
  .caution { border: 1px solid var(--ink); padding: 6px 10px; font-size: 11px; margin-top: 10px; }
  footer { margin-top: 18px; font-size: 11px; color: var(--muted); }
  @page { size: A4 portrait; margin: 12mm 12mm 14mm; @bottom-right { content: "page " counter(page) " of " counter(pages); font-size: 8pt; } @bottom-left { content: "splicewright calculation report"; font-size: 8pt; } }
  @page drawing { size: A4 landscape; margin: 10mm 12mm 12mm; }
  @media print {
    body { max-width: none; padding: 0; font-size: 9pt; line-height: 1.3; }
    h2 { font-size: 11.5pt; margin: 8px 0 4px; }
    h3 { font-size: 9.5pt; margin: 8px 0 3px; }
    header.sheet h1 { font-size: 13pt; }
    .muted, table.factors td, .caution, td.clause { font-size: 7.5pt; }
    ul.conventions { font-size: 7pt; line-height: 1.2; }
    #page-1 .kv td { padding-top: 1px; padding-bottom: 1px; }
    #page-1 h2 { margin-top: 6px; }
    tr.formula-row td.formula { font-size: 7.5pt; }
    th, td { padding: 2px 5px; }
    .verdict { font-size: 12pt; padding: 4px 10px; }
    section.page { break-before: page; }
    section.landscape { page: drawing; break-before: page; }
    section.landscape h2 { margin-top: 0; }
    h2, h3 { break-after: avoid-page; }
    tr, tbody.check, .keep, .verdict, .caution, figure.drawing, table.signoff, table.factors { break-inside: avoid; }
    thead { display: table-header-group; }
    a { color: inherit; text-decoration: none; }
    footer { display: none; }
  }
`;
