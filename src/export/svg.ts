/**
 * The drawing as SVG on an A3 landscape sheet, to scale (ISO 5455 scales), with a title block. Pure:
 * returns the SVG text. Paper units are millimetres (width="420mm"), so a print at 100 % is to scale.
 */
import type { Joint } from "../model/joint.js";
import { boltWordsOf } from "../codes/words.js";
import type { CheckReport } from "../model/results.js";
import type { CheckableScenario } from "../model/scenario.js";
import type { BillOfMaterials } from "./bolt-list.js";
import { xmlText } from "../text/escape.js";
import { detailingState, strengthFigures } from "../report/summary.js";
import { arrowHeadPoints, buildDrawing, formatLength, SCALES, type Drawing, type Point, type Primitive } from "./drawing.js";
import { loadLabel, loadSenses } from "../model/load.js";

export const SHEET = { width: 420, height: 297, margin: 10, titleHeight: 42 } as const;

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

/** Choose the scale and place the drawing: returns the drawing and the paper transform. */
export function layoutSheet(input: SvgInput): { drawing: Drawing; scale: number; origin: Point } {
  const areaW = SHEET.width - 2 * SHEET.margin - 10;
  const areaH = SHEET.height - 2 * SHEET.margin - SHEET.titleHeight - 10;
  const loadText = loadLabel(input.scenario.load);
  const senses = loadSenses(input.scenario.load);
  let chosen: { drawing: Drawing; scale: number } | null = null;
  for (const k of SCALES) {
    const drawing = buildDrawing(input.joint, input.bom.lengths, { scale: k, loadText, senses });
    const w = (drawing.max[0] - drawing.min[0]) / k;
    const h = (drawing.max[1] - drawing.min[1]) / k;
    chosen = { drawing, scale: k };
    if (w <= areaW && h <= areaH) break;
  }
  const { drawing, scale } = chosen!;
  const w = (drawing.max[0] - drawing.min[0]) / scale;
  const h = (drawing.max[1] - drawing.min[1]) / scale;
  // Paper point of model (x, y): X = ox + x/k, Y = oy − y/k (SVG y runs down).
  const ox = SHEET.margin + 5 + (areaW - w) / 2 - drawing.min[0] / scale;
  const oy = SHEET.margin + 5 + (areaH - h) / 2 + drawing.max[1] / scale;
  return { drawing, scale, origin: [ox, oy] };
}

/** The title block's strength field: the strength utilisation and the detailing rules, never one number for both. */
function titleStrengthText(input: SvgInput, verdict: string): string {
  const f = strengthFigures(input.scenario, input.report);
  const d = detailingState(input.report);
  const rules = d.failures.length === 0 ? "rules all pass" : `${d.failures.length} rule${d.failures.length === 1 ? "" : "s"} fail`;
  const service = f.service ? `; service ${f.service.utilisation.toFixed(2)}` : "";
  const load = f.strengthBySense ? loadLabel(input.scenario.load) : `T = ${(f.factoredTension_N / 1000).toFixed(1)} kN`;
  return `${(f.jointStrength_N / 1000).toFixed(1)} kN for ${load}: strength utilisation ${f.strengthUtilisation.toFixed(2)}${service}; ${rules}; ${verdict}`;
}

export function renderSvg(input: SvgInput): string {
  const { drawing, scale, origin } = layoutSheet(input);
  const P = (p: Point): Point => [origin[0] + p[0] / scale, origin[1] - p[1] / scale];
  const body: string[] = [];
  for (const prim of drawing.primitives) body.push(renderPrimitive(prim, P, scale));
  const b = input.scenario.bolts;
  const lengths = [...new Set(input.bom.lengths.map((l) => l.length_mm))].filter(Number.isFinite);
  const boltSpec = `${input.joint.holes.length} × M${b.size_mm} × ${lengths.join("/")} class ${b.propertyClass} ${boltWordsOf(input.scenario.code).assembly(b.assembly)}`;
  const verdict = input.report.pass ? "PASS" : "FAIL";
  const rows: Array<[string, string]> = [
    ["Scenario", input.title ?? input.scenario.name],
    ["Code", input.report.codeTitle],
    ["Bolts", `${boltSpec}; holes Ø${formatLength(input.joint.holes[0]?.across_mm ?? 0)}`],
    ["Joint strength", titleStrengthText(input, verdict)],
    ["Scale · date", `1:${scale} on A3 · ${input.date} · dimensions in mm`],
  ];
  const tbW = 200;
  const tbX = SHEET.width - SHEET.margin - tbW;
  const tbY = SHEET.height - SHEET.margin - SHEET.titleHeight;
  const title: string[] = [
    `<rect class="frame" x="${tbX}" y="${tbY}" width="${tbW}" height="${SHEET.titleHeight}"/>`,
    `<text class="tb-head" x="${tbX + 3}" y="${tbY + 6}">splicewright — bolted tension splice</text>`,
  ];
  rows.forEach(([k, v], i) => {
    const y = tbY + 12 + i * 6;
    title.push(`<line class="thin" x1="${tbX}" y1="${n(y - 4.3)}" x2="${tbX + tbW}" y2="${n(y - 4.3)}"/>`);
    title.push(`<text class="tb-key" x="${tbX + 3}" y="${n(y)}">${esc(k)}</text><text class="tb-val" x="${tbX + 33}" y="${n(y)}" data-field="${esc(k)}">${esc(v)}</text>`);
  });
  title.push(
    `<text class="tb-note" x="${SHEET.margin + 3}" y="${SHEET.height - SHEET.margin - 3}">To be verified by a qualified engineer against the governing code edition, its national annex and local regulations.</text>`,
  );
  return [
    `<?xml version="1.0" encoding="UTF-8"?>`,
    `<svg xmlns="http://www.w3.org/2000/svg" width="${SHEET.width}mm" height="${SHEET.height}mm" viewBox="0 0 ${SHEET.width} ${SHEET.height}" data-scale="${scale}" data-origin-x="${n(origin[0])}" data-origin-y="${n(origin[1])}">`,
    `<title>${esc(input.scenario.name)}</title>`,
    `<style>`,
    `  .outline { stroke: #000; stroke-width: 0.5; fill: none; }`,
    `  .hidden { stroke: #000; stroke-width: 0.25; stroke-dasharray: 3 1.5; fill: none; }`,
    `  .centre { stroke: #000; stroke-width: 0.18; stroke-dasharray: 9 1.5 1 1.5; fill: none; }`,
    `  .hole { stroke: #000; stroke-width: 0.35; fill: #fff; }`,
    `  .section { stroke: #000; stroke-width: 0.35; fill: url(#hatch); }`,
    `  .part { stroke: #000; stroke-width: 0.35; fill: #fff; }`,
    `  .dim line, .thin { stroke: #000; stroke-width: 0.18; }`,
    `  .dim polygon, .arrowhead { fill: #000; stroke: none; }`,
    `  .arrow { stroke: #000; stroke-width: 0.5; }`,
    `  .frame { stroke: #000; stroke-width: 0.5; fill: none; }`,
    `  text { font-family: "DejaVu Sans", "Liberation Sans", Arial, Helvetica, sans-serif; fill: #000; }`,
    `  .tb-head { font-size: 4px; font-weight: bold; } .tb-key { font-size: 2.8px; } .tb-val { font-size: 2.8px; } .tb-note { font-size: 2.5px; }`,
    `</style>`,
    `<defs><pattern id="hatch" width="2" height="2" patternUnits="userSpaceOnUse" patternTransform="rotate(45)"><rect width="2" height="2" fill="#fff"/><line x1="0" y1="0" x2="0" y2="2" stroke="#000" stroke-width="0.15"/></pattern></defs>`,
    `<rect class="frame" x="${SHEET.margin}" y="${SHEET.margin}" width="${SHEET.width - 2 * SHEET.margin}" height="${SHEET.height - 2 * SHEET.margin}"/>`,
    `<g id="drawing">`,
    ...body,
    `</g>`,
    `<g id="title-block">`,
    ...title,
    `</g>`,
    `</svg>`,
  ].join("\n");
}

function renderPrimitive(p: Primitive, P: (p: Point) => Point, k: number): string {
  switch (p.kind) {
    case "line": {
      const [a, b] = [P(p.a), P(p.b)];
      const cls = p.layer === "outlines" ? "outline" : p.layer === "hidden" ? "hidden" : p.layer === "centre" ? "centre" : "thin";
      return `<line class="${cls}" x1="${n(a[0])}" y1="${n(a[1])}" x2="${n(b[0])}" y2="${n(b[1])}"/>`;
    }
    case "poly": {
      const pts = p.points.map((q) => P(q).map(n).join(",")).join(" ");
      const cls = p.layer === "section" ? (p.fill === "section" ? "section" : "part") : p.layer === "hidden" ? "hidden" : "outline";
      const tag = p.closed ? "polygon" : "polyline";
      return `<${tag} class="${cls}"${p.plate ? ` data-plate="${p.plate}"` : ""} points="${pts}"/>`;
    }
    case "circle": {
      const c = P(p.c);
      const h = p.hole;
      const data = h ? ` data-hole="${h.id}" data-x-mm="${n(h.x_mm)}" data-y-mm="${n(h.y_mm)}" data-d-mm="${n(h.across_mm)}"` : "";
      return `<circle class="hole"${data} cx="${n(c[0])}" cy="${n(c[1])}" r="${n(p.r / k)}"/>`;
    }
    case "text": {
      const a = P(p.at);
      return `<text x="${n(a[0])}" y="${n(a[1])}" font-size="${n(p.height / k)}" text-anchor="${p.anchor}">${esc(p.text)}</text>`;
    }
    case "arrow": {
      const [a, b] = [P(p.from), P(p.to)];
      const head = arrowHead(b, a, 3);
      return `<g class="load"><line class="arrow" x1="${n(a[0])}" y1="${n(a[1])}" x2="${n(b[0])}" y2="${n(b[1])}"/><polygon class="arrowhead" points="${head}"/></g>`;
    }
    case "dim":
      return renderDim(p, P);
  }
}

/** SVG points of an arrowhead (paper mm). */
function arrowHead(tip: Point, from: Point, len: number): string {
  return arrowHeadPoints(tip, from, len).map((q) => q.map(n).join(",")).join(" ");
}

function renderDim(p: Extract<Primitive, { kind: "dim" }>, P: (p: Point) => Point): string {
  const along = p.direction === "x";
  const fromFeature = P(p.from);
  const toFeature = P(p.to);
  const a = P(along ? [p.from[0], p.at] : [p.at, p.from[1]]);
  const b = P(along ? [p.to[0], p.at] : [p.at, p.to[1]]);
  const ext = (feature: Point, end: Point) => {
    // Extension line from 1 mm off the feature to 2 mm past the dimension line (paper mm).
    const dx = end[0] - feature[0];
    const dy = end[1] - feature[1];
    const L = Math.hypot(dx, dy) || 1;
    const s: Point = [feature[0] + (dx / L) * 1, feature[1] + (dy / L) * 1];
    const e: Point = [end[0] + (dx / L) * 2, end[1] + (dy / L) * 2];
    return `<line x1="${n(s[0])}" y1="${n(s[1])}" x2="${n(e[0])}" y2="${n(e[1])}"/>`;
  };
  const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
  const arrow = Math.min(2.5, len / 3);
  const mid: Point = [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2];
  const label = formatLength(p.value);
  const text = along
    ? `<text x="${n(mid[0])}" y="${n(mid[1] - 1)}" font-size="2.5" text-anchor="middle">${label}</text>`
    : `<text x="${n(mid[0] - 1)}" y="${n(mid[1])}" font-size="2.5" text-anchor="middle" transform="rotate(-90 ${n(mid[0] - 1)} ${n(mid[1])})">${label}</text>`;
  return (
    `<g class="dim" data-direction="${p.direction}" data-value="${n(p.value)}">` +
    ext(fromFeature, a) +
    ext(toFeature, b) +
    `<line x1="${n(a[0])}" y1="${n(a[1])}" x2="${n(b[0])}" y2="${n(b[1])}"/>` +
    `<polygon points="${arrowHead(a, b, arrow)}"/><polygon points="${arrowHead(b, a, arrow)}"/>` +
    text +
    `</g>`
  );
}
