/**
 * The drawing as SVG on an A3 landscape sheet, to scale (the largest ISO 5455 scale at which plan and
 * section fit), with a parts list and a title block. Pure: returns the SVG text. Paper units are
 * millimetres (width="420mm"), so a print at 100 % is to scale. Line widths: the ISO 128-20 group
 * 0.5 / 0.25 mm (wide : narrow = 2 : 1).
 */
import type { Joint } from "../model/joint.js";
import { boltWordsOf } from "../codes/words.js";
import { boltSizeText } from "../catalogue/bolts.js";
import type { CheckReport } from "../model/results.js";
import type { CheckableScenario, Scenario } from "../model/scenario.js";
import { boltGradeOf, type BillOfMaterials } from "./bolt-list.js";
import { xmlText } from "../text/escape.js";
import { foundLayoutName } from "../text/layout-name.js";
import { detailingState, strengthFigures } from "../report/summary.js";
import { dimensionText, forceText, type DisplayUnits } from "../report/format.js";
import { toUnit } from "../units/units.js";
import { arrowHeadPoints, buildDrawing, EXTENSION_GAP_MM, EXTENSION_OVERRUN_MM, holeCallout, LETTERING_MM, SCALES, scaleText, TEXT_WIDTH_PER_HEIGHT, type Drawing, type Point, type Primitive } from "./drawing.js";
import { loadLabel, loadSenses, spliceKindWords } from "../model/load.js";

export const SHEET = { width: 420, height: 297, margin: 10, titleHeight: 50, titleWidth: 200 } as const;
/** ISO 128-20 line group 0.5: wide 0.5 mm, narrow 0.25 mm. */
export const LINE_WIDTH_MM = { wide: 0.5, narrow: 0.25 } as const;
/** Dash patterns on paper, mm: dash, gap (, dot, gap). Long-dash dot after ISO 128-20's element lengths (long dash 24 d, gap 3 d) at d = 0.5 mm, the dot 0.5 mm to stay visible. */
export const LINE_PATTERNS_MM = { dashed: [3, 1.5], centre: [12, 1.5, 0.5, 1.5] } as const;

/** Every text into the SVG goes through xmlText: well-formed XML whatever a name holds. */
const esc = xmlText;
const n = (v: number) => (Math.round(v * 1000) / 1000).toString();

export interface SvgInput {
  scenario: CheckableScenario;
  joint: Joint;
  report: CheckReport;
  bom: BillOfMaterials;
  date: string;
  title?: string;
}

export function displayUnitsOf(scenario: Pick<Scenario, "units">): DisplayUnits {
  return scenario.units === "us" ? "us" : "si";
}

/** The load as the drawing labels it: "T = 620 kN" or, in US units, "T = 120 kips". */
export function drawingLoadText(load: Scenario["load"], units: DisplayUnits): string {
  if (units !== "us") return loadLabel(load);
  const kips = (N: number) => `${Math.round(toUnit(N, "kip", "force"))} kips`;
  const parts: string[] = [];
  if (load.factoredTension_N > 0) parts.push(`T = ${kips(load.factoredTension_N)}`);
  if ((load.factoredCompression_N ?? 0) > 0) parts.push(`C = ${kips(load.factoredCompression_N ?? 0)}`);
  return parts.join(" / ");
}

/** The name on a drawing of a layout: a search scenario's "(layout to be found)" is dropped, the layout being found. */
export function drawingName(name: string): string {
  return foundLayoutName(name);
}

/** Drawing area above the title block and parts list, paper mm. */
export const DRAWING_AREA = { x: SHEET.margin + 4, y: SHEET.margin + 4, width: SHEET.width - 2 * SHEET.margin - 8, height: SHEET.height - 2 * SHEET.margin - SHEET.titleHeight - 6 } as const;

/** A rectangle of paper the views are drawn in, mm from the sheet's top left corner. */
export interface PaperArea {
  x: number;
  y: number;
  width: number;
  height: number;
}

/**
 * Choose the largest ISO 5455 scale at which plan and section fit the area (default: the A3 sheet's
 * drawing area), and centre the drawing there: the drawing and the paper transform.
 */
export function layoutSheet(input: SvgInput, area: PaperArea = DRAWING_AREA): { drawing: Drawing; scale: number; origin: Point } {
  const units = displayUnitsOf(input.scenario);
  const loadText = drawingLoadText(input.scenario.load, units);
  const senses = loadSenses(input.scenario.load);
  let chosen: { drawing: Drawing; scale: number } | null = null;
  for (const k of SCALES) {
    const drawing = buildDrawing(input.joint, input.bom.lengths, { scale: k, loadText, senses, units });
    chosen = { drawing, scale: k };
    if ((drawing.max[0] - drawing.min[0]) / k <= area.width && (drawing.max[1] - drawing.min[1]) / k <= area.height) break;
  }
  const { drawing, scale } = chosen!;
  const w = (drawing.max[0] - drawing.min[0]) / scale;
  const h = (drawing.max[1] - drawing.min[1]) / scale;
  // Paper point of model (x, y): X = ox + x/k, Y = oy − y/k (SVG y runs down).
  const ox = area.x + (area.width - w) / 2 - drawing.min[0] / scale;
  const oy = area.y + (area.height - h) / 2 + drawing.max[1] / scale;
  return { drawing, scale, origin: [ox, oy] };
}

/** The title block's strength field: the strength utilisation and the detailing rules, never one number for both. */
export function titleStrengthText(input: Pick<SvgInput, "scenario" | "report">): string {
  const units = displayUnitsOf(input.scenario);
  const f = strengthFigures(input.scenario, input.report);
  const d = detailingState(input.report);
  const rules = d.failures.length === 0 ? "rules all pass" : `${d.failures.length} rule${d.failures.length === 1 ? "" : "s"} fail`;
  const service = f.service ? `; service ${f.service.utilisation.toFixed(2)}` : "";
  const load = f.strengthBySense ? drawingLoadText(input.scenario.load, units) : `T = ${forceText(f.factoredTension_N, units)}`;
  return `${forceText(f.jointStrength_N, units)} for ${load}: strength utilisation ${f.strengthUtilisation.toFixed(2)}${service}; ${rules}; ${input.report.pass ? "PASS" : "FAIL"}`;
}

/** "12 × M20 × 65 class 8.8 bearing type" or "8 × 3/4 in × 2 1/2" A325 bearing-type". */
export function boltSpecText(input: Pick<SvgInput, "scenario" | "joint" | "bom">): string {
  const units = displayUnitsOf(input.scenario);
  const b = input.scenario.bolts;
  const lengths = [...new Set(input.bom.lengths.map((l) => l.length_mm))].filter(Number.isFinite).map((l) => dimensionText(l, units));
  const grade = input.scenario.code.startsWith("aisc") ? boltGradeOf(input.scenario) : `class ${b.propertyClass}`;
  return `${input.joint.holes.length} × ${boltSizeText(b.size_mm)} × ${lengths.join("/") || "?"} ${grade} ${boltWordsOf(input.scenario.code).assembly(b.assembly)}`;
}

/** Title block rows (key, value): job, title, drawing number and revision, code, bolts, strength, drawn/checked/date, scale. */
export function titleRows(input: SvgInput, scale: number): Array<[string, string]> {
  const doc = input.scenario.document ?? {};
  const units = displayUnitsOf(input.scenario);
  const dash = "—";
  return [
    ["Job", doc.job ?? input.scenario.project ?? dash],
    ["Title", input.title ?? drawingName(input.scenario.name)],
    ["Drawing · revision", `${doc.drawingNumber ?? dash} · rev. ${doc.revision ?? dash}`],
    ["Code", input.report.codeTitle],
    ["Bolts", `${boltSpecText(input)}; ${holeCallout({ joint: input.joint, dimText: (mm) => dimensionText(mm, units) })}`],
    ["Joint strength", titleStrengthText(input)],
    ["Drawn · checked · date", `${doc.drawnBy ?? dash} · ${doc.checkedBy ?? dash} · ${doc.date ?? input.date}`],
    ["Scale · units", `${scaleText(scale)} on A3 · ${units === "us" ? "dimensions in feet and inches (to 1/16 in)" : "dimensions in mm"}`],
  ];
}

/** The parts list (ISO 7573 order: item, quantity, description, material, holes): plates by mark, then bolts, nuts, washers. */
export function partsListRows(input: SvgInput, drawing: Drawing): string[][] {
  const units = displayUnitsOf(input.scenario);
  const D = (mm: number) => dimensionText(mm, units);
  const rows: string[][] = [];
  const d0 = input.joint.holes[0] ? Math.min(input.joint.holes[0].across_mm, input.joint.holes[0].along_mm) : 0;
  for (const { plate, mark } of drawing.marks) {
    const p = input.joint.plates.find((q) => q.id === plate)!;
    const holes = plate.startsWith("main") ? input.joint.holes.filter((h) => p.connections.some((c) => c.group === h.group)).length : (input.bom.plates.find((q) => q.id === plate)?.holes ?? 0);
    const size = p.role === "main" ? `(member) ${D(p.spec.width_mm)} × ${D(p.spec.thickness_mm)}` : `${D(p.x1_mm - p.x0_mm)} × ${D(p.spec.width_mm)} × ${D(p.spec.thickness_mm)}`;
    rows.push([mark, "1", `${p.label} ${size}`, p.spec.grade, `${holes} holes Ø${D(d0)}`]);
  }
  for (const b of input.bom.bolts) rows.push(["", String(b.quantity), b.item, b.standard, ""]);
  for (const nut of input.bom.nuts) rows.push(["", String(nut.quantity), nut.item, nut.standard, ""]);
  for (const w of input.bom.washers) rows.push(["", String(w.quantity), w.item, w.standard, ""]);
  return rows;
}

/** The views (plan and section) as SVG elements in paper mm, through the paper transform of layoutSheet. */
function viewElements(drawing: Drawing, scale: number, origin: Point): string[] {
  const P = (p: Point): Point => [origin[0] + p[0] / scale, origin[1] - p[1] / scale];
  const body: string[] = [];
  for (const prim of drawing.primitives) body.push(renderPrimitive(prim, P, scale));
  return body;
}

/** The SVG root of a sheet: its paper size in mm, its scale and paper origin (for readers of the file), its units. */
function sheetRoot(input: SvgInput, width_mm: number, height_mm: number, scale: number, origin: Point): string {
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${width_mm}mm" height="${height_mm}mm" viewBox="0 0 ${width_mm} ${height_mm}" data-scale="${scale}" data-origin-x="${n(origin[0])}" data-origin-y="${n(origin[1])}" data-units="${displayUnitsOf(input.scenario)}">`;
}

/**
 * The views alone, plan and section, on a sheet of the given paper size at the largest ISO 5455 scale
 * at which they fit: no frame, title block or parts list (a report carries those in its own header and
 * bill of materials). Lettering keeps its ISO 3098 height on paper, as on the A3 sheet.
 */
export function renderViewsSvg(input: SvgInput, paper: { width: number; height: number }): string {
  const inset = 2;
  const { drawing, scale, origin } = layoutSheet(input, { x: inset, y: inset, width: paper.width - 2 * inset, height: paper.height - 2 * inset });
  return [
    sheetRoot(input, paper.width, paper.height, scale, origin),
    `<title>${esc(drawingName(input.scenario.name))}</title>`,
    ...sheetStyle(),
    `<g id="drawing">`,
    ...viewElements(drawing, scale, origin),
    `</g>`,
    `</svg>`,
  ].join("\n");
}

export function renderSvg(input: SvgInput): string {
  const { drawing, scale, origin } = layoutSheet(input);
  const body = viewElements(drawing, scale, origin);
  const tbW = SHEET.titleWidth;
  const tbX = SHEET.width - SHEET.margin - tbW;
  const tbY = SHEET.height - SHEET.margin - SHEET.titleHeight;
  const title: string[] = [
    `<rect class="frame" x="${tbX}" y="${tbY}" width="${tbW}" height="${SHEET.titleHeight}"/>`,
    `<text class="tb-head" x="${tbX + 3}" y="${tbY + 5.5}">splicewright — bolted ${spliceKindWords(input.scenario.load)}</text>`,
  ];
  titleRows(input, scale).forEach(([k, v], i) => {
    const y = tbY + 12 + i * 5.2;
    title.push(`<line class="thin" x1="${tbX}" y1="${n(y - 3.7)}" x2="${tbX + tbW}" y2="${n(y - 3.7)}"/>`);
    title.push(`<text class="tb-key" x="${tbX + 2}" y="${n(y)}">${esc(k)}</text><text class="tb-val" x="${tbX + 36}" y="${n(y)}" data-field="${esc(k)}">${esc(v)}</text>`);
  });
  return [
    `<?xml version="1.0" encoding="UTF-8"?>`,
    sheetRoot(input, SHEET.width, SHEET.height, scale, origin),
    `<title>${esc(drawingName(input.scenario.name))}</title>`,
    ...sheetStyle(),
    `<rect class="frame" x="${SHEET.margin}" y="${SHEET.margin}" width="${SHEET.width - 2 * SHEET.margin}" height="${SHEET.height - 2 * SHEET.margin}"/>`,
    `<g id="drawing">`,
    ...body,
    `</g>`,
    `<g id="parts-list">`,
    ...renderPartsList(input, drawing, tbX),
    `</g>`,
    `<g id="title-block">`,
    ...title,
    `</g>`,
    `</svg>`,
  ].join("\n");
}

/** The style sheet of a sheet: ISO 128-20 line widths and patterns, lettering. */
function sheetStyle(): string[] {
  return [
    `<style>`,
    `  .outline { stroke: #000; stroke-width: ${LINE_WIDTH_MM.wide}; fill: none; stroke-linecap: round; }`,
    `  .hidden { stroke: #000; stroke-width: ${LINE_WIDTH_MM.narrow}; stroke-dasharray: ${LINE_PATTERNS_MM.dashed.join(" ")}; fill: none; }`,
    `  .centre { stroke: #000; stroke-width: ${LINE_WIDTH_MM.narrow}; stroke-dasharray: ${LINE_PATTERNS_MM.centre.join(" ")}; fill: none; }`,
    `  .hole { stroke: #000; stroke-width: ${LINE_WIDTH_MM.wide}; fill: #fff; }`,
    `  .part { stroke: none; fill: #fff; }`,
    `  .section-edge { stroke: #000; stroke-width: ${LINE_WIDTH_MM.wide}; stroke-linecap: round; }`,
    `  .bolt { stroke: #000; stroke-width: ${LINE_WIDTH_MM.wide}; fill: #fff; }`,
    `  .hatch line { stroke: #000; stroke-width: ${LINE_WIDTH_MM.narrow}; }`,
    `  .dim line, .thin, .leader { stroke: #000; stroke-width: ${LINE_WIDTH_MM.narrow}; fill: none; }`,
    `  .dim polygon, .arrowhead, .dot { fill: #000; stroke: none; }`,
    `  .dim text { paint-order: stroke; stroke: #fff; stroke-width: 0.6; }`,
    `  .arrow { stroke: #000; stroke-width: ${LINE_WIDTH_MM.wide}; }`,
    `  .frame { stroke: #000; stroke-width: ${LINE_WIDTH_MM.wide}; fill: none; }`,
    `  text { font-family: "DejaVu Sans", "Liberation Sans", Arial, Helvetica, sans-serif; fill: #000; }`,
    `  .tb-head { font-size: 4px; font-weight: bold; } .tb-key { font-size: 2.5px; } .tb-val { font-size: 2.5px; } .tb-note { font-size: 2.3px; } .pl { font-size: 2.3px; } .pl-head { font-size: 2.3px; font-weight: bold; }`,
    `</style>`,
  ];
}

/** The parts list left of the title block, and the caution under it. */
function renderPartsList(input: SvgInput, drawing: Drawing, right: number): string[] {
  const x0 = SHEET.margin;
  const y0 = SHEET.height - SHEET.margin - SHEET.titleHeight;
  const cols = [x0 + 2, x0 + 10, x0 + 18, x0 + 112, x0 + 176];
  const out: string[] = [`<line class="thin" x1="${x0}" y1="${y0}" x2="${right}" y2="${y0}"/>`];
  const head = ["Item", "Qty", "Description", "Material / standard", "Holes"];
  head.forEach((h, i) => out.push(`<text class="pl-head" x="${n(cols[i]!)}" y="${n(y0 + 4)}">${esc(h)}</text>`));
  const rows = partsListRows(input, drawing);
  rows.slice(0, 9).forEach((r, j) => {
    const y = y0 + 8.2 + j * 4.1;
    out.push(`<g class="pl-row"${r[0] ? ` data-mark="${esc(r[0])}"` : ""}>` + r.map((cell, i) => `<text class="pl" x="${n(cols[i]!)}" y="${n(y)}">${esc(fit(cell, i === 2 ? 68 : i === 3 ? 46 : 16))}</text>`).join("") + `</g>`);
  });
  out.push(`<text class="tb-note" x="${x0 + 2}" y="${SHEET.height - SHEET.margin - 1.5}">To be verified by a qualified engineer against the governing code edition, its national annex and local regulations.</text>`);
  return out;
}

/** A cell's text cut to a column (characters), marked with an ellipsis. */
function fit(text: string, chars: number): string {
  return text.length <= chars ? text : `${text.slice(0, chars - 1)}…`;
}

function renderPrimitive(p: Primitive, P: (p: Point) => Point, k: number): string {
  switch (p.kind) {
    case "line": {
      const [a, b] = [P(p.a), P(p.b)];
      const cls = p.layer === "outlines" ? "outline" : p.layer === "hidden" ? "hidden" : p.layer === "centre" ? "centre" : p.layer === "section" ? "section-edge" : "thin";
      const data = `${p.role ? ` data-role="${p.role}"` : ""}${p.part ? ` data-part="${p.part}"` : ""}`;
      return `<line class="${cls}"${data} x1="${n(a[0])}" y1="${n(a[1])}" x2="${n(b[0])}" y2="${n(b[1])}"/>`;
    }
    case "poly": {
      const pts = p.points.map((q) => P(q).map(n).join(",")).join(" ");
      const cls = p.layer === "section" ? (p.plate ? "part" : "bolt") : p.layer === "hidden" ? "hidden" : p.layer === "thin" ? "thin" : "outline";
      const tag = p.closed ? "polygon" : "polyline";
      return `<${tag} class="${cls}"${p.plate ? ` data-plate="${p.plate}"` : ""}${p.role ? ` data-role="${p.role}"` : ""} points="${pts}"/>`;
    }
    case "circle": {
      const c = P(p.c);
      const h = p.hole;
      if (!h) return `<circle class="${p.fill === "black" ? "dot" : "thin"}" cx="${n(c[0])}" cy="${n(c[1])}" r="${n(p.r / k)}"/>`;
      const data = ` data-hole="${h.id}" data-x-mm="${n(h.x_mm)}" data-y-mm="${n(h.y_mm)}" data-d-mm="${n(h.across_mm)}"`;
      return `<circle class="hole"${data} cx="${n(c[0])}" cy="${n(c[1])}" r="${n(p.r / k)}"/>`;
    }
    case "text": {
      const a = P(p.at);
      const role = p.role ? ` data-role="${p.role}"` : "";
      const weight = p.role === "title" ? ` font-weight="bold"` : "";
      return `<text${role}${weight} x="${n(a[0])}" y="${n(a[1])}" font-size="${n(p.height / k)}" text-anchor="${p.anchor}">${esc(p.text)}</text>`;
    }
    case "arrow": {
      const [a, b] = [P(p.from), P(p.to)];
      const head = arrowHead(b, a, 3);
      const cls = p.role === "cutting-plane" ? "thin" : "arrow";
      return `<g class="${p.role ?? "load"}"><line class="${cls}" x1="${n(a[0])}" y1="${n(a[1])}" x2="${n(b[0])}" y2="${n(b[1])}"/><polygon class="arrowhead" points="${head}"/></g>`;
    }
    case "hatch":
      return `<g class="hatch" data-part="${p.part}" data-angle="${p.angle_deg}" data-spacing-mm="${n(p.spacing_mm / k)}">${p.lines.map(([a, b]) => { const [pa, pb] = [P(a), P(b)]; return `<line x1="${n(pa[0])}" y1="${n(pa[1])}" x2="${n(pb[0])}" y2="${n(pb[1])}"/>`; }).join("")}</g>`;
    case "dim":
      return renderDim(p, P);
  }
}

/** SVG points of an arrowhead (paper mm). */
function arrowHead(tip: Point, from: Point, len: number): string {
  return arrowHeadPoints(tip, from, len).map((q) => q.map(n).join(",")).join(" ");
}

/**
 * A dimension (ISO 129-1): extension lines from a gap off the feature to a little past the dimension
 * line (none where a centre line stands in), arrowheads inside or, when the space is short, outside,
 * the value above the line (x) or left of it reading from the right (y).
 */
function renderDim(p: Extract<Primitive, { kind: "dim" }>, P: (p: Point) => Point): string {
  const along = p.direction === "x";
  const a = P(along ? [p.from[0], p.at] : [p.at, p.from[1]]);
  const b = P(along ? [p.to[0], p.at] : [p.at, p.to[1]]);
  const ext = (feature: Point, end: Point) => {
    const dx = end[0] - feature[0];
    const dy = end[1] - feature[1];
    const L = Math.hypot(dx, dy);
    if (L < EXTENSION_GAP_MM + 0.1) return "";
    const s: Point = [feature[0] + (dx / L) * EXTENSION_GAP_MM, feature[1] + (dy / L) * EXTENSION_GAP_MM];
    const e: Point = [end[0] + (dx / L) * EXTENSION_OVERRUN_MM, end[1] + (dy / L) * EXTENSION_OVERRUN_MM];
    return `<line class="extension" x1="${n(s[0])}" y1="${n(s[1])}" x2="${n(e[0])}" y2="${n(e[1])}"/>`;
  };
  const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
  const h = LETTERING_MM.dimension;
  const textW = TEXT_WIDTH_PER_HEIGHT * h * p.text.length;
  const arrow = 2.5;
  const inside = len >= 2 * arrow + 0.5;
  const u: Point = len > 0 ? [(b[0] - a[0]) / len, (b[1] - a[1]) / len] : [1, 0];
  // Arrowheads inside point outward to the extension lines; outside they point inward from beyond them.
  const heads = inside
    ? `<polygon points="${arrowHead(a, b, arrow)}"/><polygon points="${arrowHead(b, a, arrow)}"/>`
    : `<polygon points="${arrowHead(a, [a[0] - u[0], a[1] - u[1]], arrow)}"/><polygon points="${arrowHead(b, [b[0] + u[0], b[1] + u[1]], arrow)}"/>` +
      `<line x1="${n(a[0] - u[0] * (arrow + 1.5))}" y1="${n(a[1] - u[1] * (arrow + 1.5))}" x2="${n(b[0] + u[0] * (arrow + 1.5))}" y2="${n(b[1] + u[1] * (arrow + 1.5))}"/>`;
  const f = p.textAt ?? 0.5;
  const mid: Point = [a[0] + (b[0] - a[0]) * f, a[1] + (b[1] - a[1]) * f];
  const short = textW > len - 1;
  const text = along
    ? `<text x="${n(mid[0])}" y="${n(mid[1] - 1 - (p.textLift_mm ?? 0))}" font-size="${h}" text-anchor="middle">${esc(p.text)}</text>`
    : short
      ? `<text x="${n(mid[0] + 1)}" y="${n(mid[1] + h * 0.35)}" font-size="${h}" text-anchor="start">${esc(p.text)}</text>`
      : `<text x="${n(mid[0] - 1)}" y="${n(mid[1])}" font-size="${h}" text-anchor="middle" transform="rotate(-90 ${n(mid[0] - 1)} ${n(mid[1])})">${esc(p.text)}</text>`;
  return (
    `<g class="dim" data-view="${p.view}" data-direction="${p.direction}" data-value="${n(p.value)}" data-text="${esc(p.text)}">` +
    (p.extension[0] ? ext(P(p.from), a) : "") +
    (p.extension[1] ? ext(P(p.to), b) : "") +
    `<line x1="${n(a[0])}" y1="${n(a[1])}" x2="${n(b[0])}" y2="${n(b[1])}"/>` +
    heads +
    text +
    `</g>`
  );
}
