/**
 * The drawing as an ASCII DXF in model space at full size, written with @tarikjabiri/dxf (a maintained
 * DXF writer). Pure: returns the DXF text.
 *
 * - Units in the header: millimetres ($INSUNITS 4, $MEASUREMENT 1 metric, $LUNITS 2 decimal) or, for a
 *   US-unit scenario, inches ($INSUNITS 1, $MEASUREMENT 0 imperial, $LUNITS 4 architectural).
 * - Line types defined at their paper size; $LTSCALE (and $DIMSCALE) = the drawing scale factor, as a
 *   CAD office plots model space at 1:k (common practice).
 * - Layers carry ISO 128-20 line widths (group code 370, hundredths of a mm): wide 0.50 for visible
 *   outlines and holes, narrow 0.25 for hidden, centre, dimension, hatching, break and leader lines;
 *   text 0.35 (ISO 3098: h/10 for 3.5 mm lettering).
 * - Dimensions are DIMENSION entities (rotated linear, their measured value in group 42) with the
 *   graphics in their own anonymous block (*D…), so a CAD program shows them as drawn and lets the
 *   office edit and re-measure them. Text heights are rounded to 0.01 mm / 0.001 in.
 */
import { DxfRecord, DxfWriter, point3d, Units, Colors, LinearDimension, type DxfBlock, type Dxfier } from "@tarikjabiri/dxf";
import type { Joint } from "../model/joint.js";
import type { CheckReport } from "../model/results.js";
import type { CheckableScenario } from "../model/scenario.js";
import type { BillOfMaterials } from "./bolt-list.js";
import { dxfText } from "../text/escape.js";
import { arrowHeadPoints, buildDrawing, EXTENSION_GAP_MM, EXTENSION_OVERRUN_MM, LETTERING_MM, scaleText, type Layer, type Point, type Primitive } from "./drawing.js";
import { loadSenses, spliceKindWords } from "../model/load.js";
import { displayUnitsOf, drawingLoadText, LINE_PATTERNS_MM, partsListRows, titleRows } from "./svg.js";

export const DXF_LAYERS: Record<Layer, string> = {
  outlines: "OUTLINES",
  hidden: "HIDDEN",
  holes: "HOLES",
  centre: "CENTRE",
  dimensions: "DIMENSIONS",
  text: "TEXT",
  section: "SECTION",
  hatch: "HATCHING",
  thin: "THIN",
};

/** Layer colour (ACI), line type and ISO 128-20 line width in hundredths of a mm. */
export const DXF_LAYER_STYLE: Record<Layer, { color: number; lineType: string; lineWeight: number }> = {
  outlines: { color: Colors.White, lineType: "Continuous", lineWeight: 50 },
  hidden: { color: Colors.White, lineType: "DASHED", lineWeight: 25 },
  holes: { color: Colors.Cyan, lineType: "Continuous", lineWeight: 50 },
  centre: { color: Colors.Red, lineType: "CENTER", lineWeight: 25 },
  dimensions: { color: Colors.Green, lineType: "Continuous", lineWeight: 25 },
  text: { color: Colors.White, lineType: "Continuous", lineWeight: 35 },
  section: { color: Colors.Yellow, lineType: "Continuous", lineWeight: 50 },
  hatch: { color: Colors.Yellow, lineType: "Continuous", lineWeight: 25 },
  thin: { color: Colors.White, lineType: "Continuous", lineWeight: 25 },
};

export interface DxfInput {
  scenario: CheckableScenario;
  joint: Joint;
  report: CheckReport;
  bom: BillOfMaterials;
  date: string;
  /** Drawing scale the text heights are sized for (text 3.5 mm at 1:scale). */
  scale: number;
  /** Drawing units: millimetres, or inches for a US-unit scenario. */
  units: "mm" | "in";
}

/** A drawing quantity in drawing units, rounded: 0.01 mm or 0.001 in (no 5.6000000000000005). */
function rounder(units: "mm" | "in"): (v: number) => number {
  const f = units === "in" ? 1000 : 100;
  return (v) => Math.round(v * f) / f;
}

export function renderDxf(input: DxfInput): string {
  const k = input.scale;
  const display = displayUnitsOf(input.scenario);
  const drawing = buildDrawing(input.joint, input.bom.lengths, { scale: k, loadText: drawingLoadText(input.scenario.load, display), senses: loadSenses(input.scenario.load), units: display });
  const dxf = new DxfWriter();
  const inch = input.units === "in";
  const u = inch ? 1 / 25.4 : 1; // model mm → drawing units
  const paper = (mm: number) => rounder(input.units)(mm * u); // a paper size in drawing units, before the scale
  const R = rounder(input.units);
  setupDocument(dxf, input, k, paper);
  const p3 = (p: Point) => point3d(p[0] * u, p[1] * u, 0);
  const pts = (ps: Point[]) => ps.map((q) => ({ point: { x: q[0] * u, y: q[1] * u } }));
  const ctx: DimCtx = { dxf, k, u, R, p3, pts, count: 0 };
  for (const prim of drawing.primitives) writePrimitive(ctx, prim);
  // Title block, parts list and caution as text in model space, under the drawing.
  const rows = titleRows(input, k).map(([key, v]) => `${key}: ${v}`);
  const parts = partsListRows(input, drawing).map((r) => r.filter(Boolean).join("  "));
  const lines = [
    `splicewright - bolted ${spliceKindWords(input.scenario.load)}: ${titleRows(input, k)[1]![1]}`,
    ...rows.slice(2),
    ...parts,
    `drawn for ${scaleText(k)}; ${inch ? "dimensions in inches" : "dimensions in mm"}. To be verified by a qualified engineer against the governing code edition, its national annex and local regulations.`,
  ];
  const text = R(LETTERING_MM.text * k * u);
  lines.forEach((t, i) => dxf.addText(p3([drawing.min[0], drawing.min[1] - (8 + 6 * i) * k]), text, dxfText(t), { layerName: DXF_LAYERS.text }));
  return dxf.stringify();
}

/** Header variables, line types, layers with their widths, and the dimension style. */
function setupDocument(dxf: DxfWriter, input: DxfInput, k: number, paper: (mm: number) => number): void {
  const inch = input.units === "in";
  dxf.setUnits(inch ? Units.Inches : Units.Millimeters);
  dxf.setVariable("$MEASUREMENT", { 70: inch ? 0 : 1 });
  dxf.setVariable("$LUNITS", { 70: inch ? 4 : 2 });
  dxf.setVariable("$LUPREC", { 70: inch ? 4 : 1 });
  dxf.setVariable("$LTSCALE", { 40: k });
  dxf.setVariable("$DIMSCALE", { 40: k });
  dxf.setVariable("$DIMSTYLE", { 2: "SPLICEWRIGHT" });
  // The SVG's patterns on paper (svg.ts LINE_PATTERNS_MM): ISO 128-20 element lengths (long dash 24 d,
  // gap 3 d) at d = 0.5 mm, the dot drawn 0.5 mm long to stay visible; dashed: dash 3, gap 1.5.
  dxf.addLType("DASHED", "Dashed __ __ __", LINE_PATTERNS_MM.dashed.map((v, i) => (i % 2 ? -paper(v) : paper(v))));
  dxf.addLType("CENTER", "Long-dash dot ____ . ____ .", LINE_PATTERNS_MM.centre.map((v, i) => (i % 2 ? -paper(v) : paper(v))));
  for (const layer of Object.keys(DXF_LAYERS) as Layer[]) {
    const s = DXF_LAYER_STYLE[layer];
    const record = dxf.addLayer(DXF_LAYERS[layer], s.color, s.lineType);
    withLineWeight(record, s.lineWeight);
  }
  const style = dxf.addDimStyle("SPLICEWRIGHT");
  Object.assign(style, {
    DIMSCALE: k,
    DIMTXT: paper(LETTERING_MM.dimension),
    DIMASZ: paper(2.5),
    DIMEXO: paper(EXTENSION_GAP_MM),
    DIMEXE: paper(EXTENSION_OVERRUN_MM),
    DIMGAP: paper(1),
    DIMTAD: 1,
    DIMTIH: 0,
    DIMTOH: 0,
    DIMLUNIT: inch ? 4 : 2,
    DIMDEC: inch ? 4 : 1,
    DIMZIN: inch ? 3 : 8,
    DIMLWD: 25,
    DIMLWE: 25,
  });
}

/** The layer record writes its line width (group 370) instead of the library's "by default". */
function withLineWeight(record: object, weight: number): void {
  const layer = record as { dxfy(dx: Dxfier): void; name: string; flags: number; colorNumber: number; lineType: string };
  layer.dxfy = (dx: Dxfier) => {
    DxfRecord.prototype.dxfy.call(layer, dx);
    dx.subclassMarker("AcDbLayerTableRecord");
    dx.name(layer.name);
    dx.push(70, layer.flags);
    dx.colorNumber(layer.colorNumber);
    dx.lineType(layer.lineType);
    dx.push(370, weight);
    dx.push(390, 0);
  };
}

interface DimCtx {
  dxf: DxfWriter;
  k: number;
  u: number;
  R: (v: number) => number;
  p3: (p: Point) => ReturnType<typeof point3d>;
  pts: (ps: Point[]) => Array<{ point: { x: number; y: number } }>;
  count: number;
}

function writePrimitive(c: DimCtx, prim: Primitive): void {
  const { dxf, p3, pts } = c;
  switch (prim.kind) {
    case "line":
      dxf.addLine(p3(prim.a), p3(prim.b), { layerName: DXF_LAYERS[prim.layer] });
      break;
    case "poly":
      if (prim.fill === "white" && prim.plate) break; // a paper fill only; the section's edges are lines
      dxf.addLWPolyline(pts(prim.points), { layerName: DXF_LAYERS[prim.layer], flags: prim.closed ? 1 : 0 });
      break;
    case "circle":
      dxf.addCircle(p3(prim.c), prim.r * c.u, { layerName: DXF_LAYERS[prim.layer] });
      break;
    case "text":
      dxf.addText(p3(prim.at), c.R(prim.height * c.u), dxfText(prim.text), { layerName: DXF_LAYERS[prim.layer], horizontalAlignment: prim.anchor === "start" ? 0 : prim.anchor === "middle" ? 1 : 2, secondAlignmentPoint: p3(prim.at) });
      break;
    case "arrow":
      dxf.addLine(p3(prim.from), p3(prim.to), { layerName: DXF_LAYERS[prim.layer] });
      dxf.addLWPolyline(pts(arrowHeadPoints(prim.to, prim.from, 3 * c.k)), { layerName: DXF_LAYERS[prim.layer], flags: 1 });
      break;
    case "hatch":
      for (const [a, b] of prim.lines) dxf.addLine(p3(a), p3(b), { layerName: DXF_LAYERS.hatch });
      break;
    case "dim":
      writeDimension(c, prim);
      break;
  }
}

/** A DIMENSION entity (rotated linear) with its graphics in an anonymous block. */
function writeDimension(c: DimCtx, p: Extract<Primitive, { kind: "dim" }>): void {
  const { dxf, k, p3 } = c;
  const along = p.direction === "x";
  const a: Point = along ? [p.from[0], p.at] : [p.at, p.from[1]];
  const b: Point = along ? [p.to[0], p.at] : [p.at, p.to[1]];
  const f = p.textAt ?? 0.5;
  const mid: Point = along ? [a[0] + (b[0] - a[0]) * f, p.at + (1 + (p.textLift_mm ?? 0)) * k] : [p.at - 1 * k, a[1] + (b[1] - a[1]) * f];
  const name = `*D${++c.count}`;
  const block = dxf.document.blocks.addBlock(name, dxf.document.objects, false) as DxfBlock;
  block.flags = 1; // anonymous
  block.setLayerName("0");
  const layerName = DXF_LAYERS.dimensions;
  const extension = (feature: Point, end: Point) => {
    const dx = end[0] - feature[0];
    const dy = end[1] - feature[1];
    const L = Math.hypot(dx, dy);
    if (L < EXTENSION_GAP_MM * k + 1e-9) return;
    const s: Point = [feature[0] + (dx / L) * EXTENSION_GAP_MM * k, feature[1] + (dy / L) * EXTENSION_GAP_MM * k];
    const e: Point = [end[0] + (dx / L) * EXTENSION_OVERRUN_MM * k, end[1] + (dy / L) * EXTENSION_OVERRUN_MM * k];
    block.addLine(p3(s), p3(e), { layerName });
  };
  if (p.extension[0]) extension(p.from, a);
  if (p.extension[1]) extension(p.to, b);
  block.addLine(p3(a), p3(b), { layerName });
  const arrow = Math.min(2.5 * k, Math.hypot(b[0] - a[0], b[1] - a[1]) / 3);
  for (const [tip, from] of [[a, b], [b, a]] as Array<[Point, Point]>) block.addLWPolyline(c.pts(arrowHeadPoints(tip, from, arrow)), { layerName, flags: 1 });
  block.addText(p3(mid), c.R(LETTERING_MM.dimension * k * c.u), dxfText(p.text), { layerName, rotation: along ? 0 : 90, horizontalAlignment: 1, secondAlignmentPoint: p3(mid) });
  const dim = new LinearDimension(p3(p.from), p3(p.to), {
    blockName: name,
    definitionPoint: p3(b),
    middlePoint: p3(mid),
    angle: along ? 0 : 90,
    ActualMeasurement: Number((p.value * c.u).toFixed(6)),
    styleName: "SPLICEWRIGHT",
    layerName,
  });
  (dim as unknown as { dimensionType: number }).dimensionType = 32; // rotated linear, block used by this dimension only
  dxf.document.modelSpace.addEntity(dim);
}
