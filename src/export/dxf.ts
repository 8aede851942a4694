/**
 * The drawing as an ASCII DXF in model space at full size, written with @tarikjabiri/dxf (a maintained
 * DXF writer). Units declared in the header ($INSUNITS). Layers: OUTLINES, HIDDEN, HOLES,
 * CENTRE, DIMENSIONS, TEXT, SECTION. Dimensions are drawn as lines, arrowheads and text, which every
 * CAD program displays without regenerating dimension blocks. A US-unit scenario is drawn in inches
 * ($INSUNITS: inches). Pure: returns the DXF text.
 */
import { DxfWriter, point3d, Units, Colors } from "@tarikjabiri/dxf";
import { boltWordsOf } from "../codes/words.js";
import type { Joint } from "../model/joint.js";
import type { CheckReport } from "../model/results.js";
import type { CheckableScenario } from "../model/scenario.js";
import type { BillOfMaterials } from "./bolt-list.js";
import { dxfText } from "../text/escape.js";
import { detailingState, strengthFigures } from "../report/summary.js";
import { arrowHeadPoints, buildDrawing, formatLength, type Layer, type Point } from "./drawing.js";
import { loadLabel, loadSenses } from "../model/load.js";

export const DXF_LAYERS: Record<Layer, string> = {
  outlines: "OUTLINES",
  hidden: "HIDDEN",
  holes: "HOLES",
  centre: "CENTRE",
  dimensions: "DIMENSIONS",
  text: "TEXT",
  section: "SECTION",
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

export function renderDxf(input: DxfInput): string {
  const k = input.scale;
  const drawing = buildDrawing(input.joint, input.bom.lengths, { scale: k, loadText: loadLabel(input.scenario.load), senses: loadSenses(input.scenario.load) });
  const dxf = new DxfWriter();
  const u = input.units === "in" ? 1 / 25.4 : 1; // model mm → drawing units
  dxf.setUnits(input.units === "in" ? Units.Inches : Units.Millimeters);
  dxf.addLType("DASHED", "Dashed __ __ __", [3 * k * u, -1.5 * k * u]);
  dxf.addLType("CENTER", "Center ____ _ ____ _", [9 * k * u, -1.5 * k * u, 1 * k * u, -1.5 * k * u]);
  dxf.addLayer(DXF_LAYERS.outlines, Colors.White, "Continuous");
  dxf.addLayer(DXF_LAYERS.hidden, Colors.White, "DASHED");
  dxf.addLayer(DXF_LAYERS.holes, Colors.Cyan, "Continuous");
  dxf.addLayer(DXF_LAYERS.centre, Colors.Red, "CENTER");
  dxf.addLayer(DXF_LAYERS.dimensions, Colors.Green, "Continuous");
  dxf.addLayer(DXF_LAYERS.text, Colors.White, "Continuous");
  dxf.addLayer(DXF_LAYERS.section, Colors.Yellow, "Continuous");
  const p3 = (p: Point) => point3d(p[0] * u, p[1] * u, 0);
  const pts = (ps: Point[]) => ps.map((q) => ({ point: { x: q[0] * u, y: q[1] * u } }));
  const text = 3.5 * k * u;
  for (const prim of drawing.primitives) {
    switch (prim.kind) {
      case "line":
        dxf.addLine(p3(prim.a), p3(prim.b), { layerName: DXF_LAYERS[prim.layer] });
        break;
      case "poly":
        dxf.addLWPolyline(pts(prim.points), { layerName: DXF_LAYERS[prim.layer], flags: prim.closed ? 1 : 0 });
        break;
      case "circle":
        dxf.addCircle(p3(prim.c), prim.r * u, { layerName: DXF_LAYERS[prim.layer] });
        break;
      case "text":
        dxf.addText(p3(prim.at), prim.height * u, dxfText(prim.text), { layerName: DXF_LAYERS[prim.layer] });
        break;
      case "arrow": {
        dxf.addLine(p3(prim.from), p3(prim.to), { layerName: DXF_LAYERS[prim.layer] });
        dxf.addLWPolyline(pts(arrowHeadPoints(prim.to, prim.from, 3 * k)), { layerName: DXF_LAYERS[prim.layer], flags: 1 });
        break;
      }
      case "dim": {
        const layerName = DXF_LAYERS.dimensions;
        const along = prim.direction === "x";
        const a: Point = along ? [prim.from[0], prim.at] : [prim.at, prim.from[1]];
        const b: Point = along ? [prim.to[0], prim.at] : [prim.at, prim.to[1]];
        dxf.addLine(p3(prim.from), p3(a), { layerName });
        dxf.addLine(p3(prim.to), p3(b), { layerName });
        dxf.addLine(p3(a), p3(b), { layerName });
        const arrow = Math.min(2.5 * k, Math.hypot(b[0] - a[0], b[1] - a[1]) / 3);
        for (const [tip, from] of [[a, b], [b, a]] as Array<[Point, Point]>) {
          dxf.addLWPolyline(pts(arrowHeadPoints(tip, from, arrow)), { layerName, flags: 1 });
        }
        const mid: Point = [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2];
        const label = input.units === "in" ? `${(prim.value / 25.4).toFixed(3).replace(/\.?0+$/, "")}"` : formatLength(prim.value);
        dxf.addText(p3(along ? [mid[0], mid[1] + 1 * k] : [mid[0] - 1 * k, mid[1]]), 2.5 * k * u, label, { layerName, rotation: along ? 0 : 90 });
        break;
      }
    }
  }
  // Title information in model space, under the drawing.
  const b = input.scenario.bolts;
  const lines = [
    `splicewright - bolted tension splice: ${input.scenario.name}`,
    `${input.report.codeTitle}`,
    `${input.joint.holes.length} x M${b.size_mm} class ${b.propertyClass} ${boltWordsOf(input.scenario.code).assembly(b.assembly)}; joint strength ${(input.report.jointStrength_N / 1000).toFixed(1)} kN; strength utilisation ${strengthFigures(input.scenario, input.report).strengthUtilisation.toFixed(2)}; detailing rules ${detailingState(input.report).failures.length === 0 ? "all pass" : `${detailingState(input.report).failures.length} fail`}; ${input.report.pass ? "PASS" : "FAIL"}`,
    `drawn for 1:${k}; dimensions in ${input.units === "in" ? "inches" : "mm"}; ${input.date}. To be verified by a qualified engineer.`,
  ];
  lines.forEach((t, i) => dxf.addText(p3([drawing.min[0], drawing.min[1] - (8 + 6 * i) * k]), text, dxfText(t), { layerName: DXF_LAYERS.text }));
  return dxf.stringify();
}
