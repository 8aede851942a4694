/**
 * The drawing sheet and its DXF read back as a detailer and a CAD office would: US customary sheets in
 * feet-inches-fractions, real DIMENSION entities, the cutting plane and SECTION A–A, callouts, part
 * marks and the parts list, extension lines, the scale, the title block, hatching and break lines.
 * Check values come from the demo scenarios' own inputs, the standards named beside them, or hand
 * arithmetic shown in the test.
 */
import { readFileSync } from "node:fs";
import DxfParser from "dxf-parser";
import { XMLParser } from "fast-xml-parser";
import { describe, expect, it } from "vitest";
import { checkScenario } from "../src/engine/check.js";
import { billOfMaterials } from "../src/export/bolt-list.js";
import { buildDrawing, chainTextLifts, SCALES } from "../src/export/drawing.js";
import { exportFiles } from "../src/export/index.js";
import { DRAWING_AREA, drawingLoadText, layoutSheet, LINE_PATTERNS_MM } from "../src/export/svg.js";
import { parseScenario, requireCheckable } from "../src/io/scenario.js";
import { loadSenses } from "../src/model/load.js";
import { strengthFigures } from "../src/report/summary.js";
import { scenarioPath } from "./helpers/cli.js";

function load(text: string) {
  const { scenario, code } = parseScenario(text);
  const s = requireCheckable(scenario, code);
  return { scenario: s, ...checkScenario(s, code) };
}
const demoText = (name: string) => readFileSync(scenarioPath(name), "utf8");
const demo = (name: string) => load(demoText(name));
type Loaded = ReturnType<typeof load>;
const files = (d: Loaded, formats: Array<"svg" | "dxf">) => exportFiles({ scenario: d.scenario, joint: d.joint, report: d.report, date: "2026-01-01", base: "t" }, formats).files;
const svgOf = (d: Loaded) => files(d, ["svg"])[0]!.content;
const dxfOf = (d: Loaded) => files(d, ["dxf"])[0]!.content;

type Node = Record<string, unknown>;
interface Sheet {
  root: Node;
  k: number;
  els: Array<{ tag: string; n: Node; parent: Node | null }>;
  texts: string[];
}
function parseSvg(svg: string): Sheet {
  const doc = new XMLParser({ ignoreAttributes: false, parseTagValue: false, htmlEntities: true }).parse(svg);
  const els: Sheet["els"] = [];
  const walk = (node: unknown, tag: string, parent: Node | null) => {
    if (Array.isArray(node)) return node.forEach((n) => walk(n, tag, parent));
    if (!node || typeof node !== "object") return;
    els.push({ tag, n: node as Node, parent });
    for (const [key, v] of Object.entries(node)) if (!key.startsWith("@_") && key !== "#text") walk(v, key, node as Node);
  };
  walk(doc.svg, "svg", null);
  return { root: doc.svg as Node, k: Number((doc.svg as Node)["@_data-scale"]), els, texts: textLeaves(doc.svg) };
}
/** Every text node's content (fast-xml-parser gives a text element without attributes as a bare string). */
function textLeaves(node: unknown, out: string[] = [], tag = ""): string[] {
  if (Array.isArray(node)) node.forEach((n) => textLeaves(n, out, tag));
  else if (typeof node === "string" && (tag === "text" || tag === "title")) out.push(node);
  else if (node && typeof node === "object") {
    for (const [k, v] of Object.entries(node)) {
      if (k === "#text" && (tag === "text" || tag === "title")) out.push(String(v));
      else if (!k.startsWith("@_")) textLeaves(v, out, k);
    }
  }
  return out;
}
const num = (n: Node, a: string) => Number(n[`@_${a}`]);
const dims = (s: Sheet, view: "plan" | "section", direction?: "x" | "y") =>
  s.els.filter((e) => e.tag === "g" && e.n["@_class"] === "dim" && e.n["@_data-view"] === view && (!direction || e.n["@_data-direction"] === direction)).map((e) => e.n);

interface DxfEntity { type: string; layer: string; actualMeasurement?: number; block?: string; angle?: number; textHeight?: number; text?: string; vertices?: Array<{ x: number; y: number }>; center?: { x: number; y: number }; radius?: number }
interface DxfDoc { header: Record<string, unknown>; entities: DxfEntity[]; blocks: Record<string, { entities?: DxfEntity[] }>; tables: { layer: { layers: Record<string, { lineType?: string }> }; lineType: { lineTypes: Record<string, { pattern?: number[] }> } } }
const parseDxf = (text: string) => new DxfParser().parseSync(text) as unknown as DxfDoc;

/** The raw group-code pairs of the LAYER table (the parser keeps neither group 370 nor 6). */
function layerLineWeights(text: string, code = "370"): Record<string, number> {
  return Object.fromEntries(Object.entries(layerGroups(text, code)).map(([k, v]) => [k, Number(v)]));
}
function layerGroups(text: string, code: string): Record<string, string> {
  const lines = text.split(/\r?\n/).map((l) => l.trim());
  const out: Record<string, string> = {};
  for (let i = 0; i + 1 < lines.length; i += 2) {
    if (lines[i] === "0" && lines[i + 1] === "LAYER") {
      let name = "";
      for (let j = i + 2; j + 1 < lines.length && lines[j] !== "0"; j += 2) {
        if (lines[j] === "2") name = lines[j + 1]!;
        if (lines[j] === code) out[name] = lines[j + 1]!;
      }
    }
  }
  return out;
}

const FOOTBRIDGE = demo("footbridge-tie.yaml");
const CANOPY = demo("canopy-tie-us.yaml");
const TRUSS = demo("truss-chord-staggered.yaml");
const SPORTS = demo("sports-hall-chord-ec3.yaml");

describe("1. US customary sheet (canopy tie, AISC 360-16, units: us)", () => {
  const svg = svgOf(CANOPY);
  const sheet = parseSvg(svg);

  it("no text on the inch sheet says mm; the title block says feet and inches", () => {
    const visible = sheet.texts.join("\n");
    expect(visible).not.toMatch(/\bmm\b/);
    expect(visible).toMatch(/dimensions in feet and inches \(to 1\/16 in\)/);
    expect(sheet.root["@_data-units"]).toBe("us");
  });

  it("plan dimensions in feet-inches-fractions: 1 1/2, 3, 1 1/2, gap 3/8 … and the cover 2 × (1 1/2 + 3 + 1 1/2) + 3/8 = 12 3/8 in = 1'-0 3/8\" (scenario inputs; US shop-drawing habit, common practice)", () => {
    const along = dims(sheet, "plan", "x").map((d) => d["@_data-text"]);
    expect(along).toEqual(['1 1/2"', '3"', '1 1/2"', '3/8"', '1 1/2"', '3"', '1 1/2"', `1'-0 3/8"`]);
    const across = dims(sheet, "plan", "y").map((d) => d["@_data-text"]);
    // width 8 in, gauge 4 in, edges (8 − 4)/2 = 2 in
    expect(across).toEqual(['2"', '4"', '2"', '8"']);
  });

  it("holes called out in inches: 3/4 in bolt, standard hole 13/16 in (AISC 360-16 Table J3.3)", () => {
    expect(sheet.texts).toContain('8 holes Ø13/16"');
  });

  it("the load in kips: 120 kip factored tension (scenario) labels the arrows", () => {
    expect(sheet.texts.filter((t) => t === "T = 120 kips")).toHaveLength(2);
  });

  it("the DXF is in inches: $INSUNITS 1 (inches), $MEASUREMENT 0 (imperial) (DXF reference, header variables); its DIMENSION entities measure inches", () => {
    const dxf = parseDxf(dxfOf(CANOPY));
    expect(dxf.header.$INSUNITS).toBe(1);
    expect(dxf.header.$MEASUREMENT).toBe(0);
    const measured = dxf.entities.filter((e) => e.type === "DIMENSION" && e.angle === 0).map((e) => e.actualMeasurement);
    expect(measured.slice(0, 8)).toEqual([1.5, 3, 1.5, 0.375, 1.5, 3, 1.5, 12.375]);
    const texts = dxf.entities.filter((e) => e.type === "TEXT").map((e) => e.text ?? "").join("\n");
    expect(texts).not.toMatch(/\bmm\b/);
  });
});

describe("2. DXF: DIMENSION entities, header, ISO 128 layer widths, rounded text heights", () => {
  const text = dxfOf(FOOTBRIDGE);
  const dxf = parseDxf(text);
  const scale = layoutSheet({ ...FOOTBRIDGE, bom: billOfMaterials(FOOTBRIDGE.joint, FOOTBRIDGE.scenario), date: "2026-01-01" }).scale;

  it("the mm demo declares $INSUNITS 4 (millimetres) and $MEASUREMENT 1 (metric), and $LTSCALE = the drawing's scale factor (full-size model plotted at 1:k: common practice)", () => {
    expect(dxf.header.$INSUNITS).toBe(4);
    expect(dxf.header.$MEASUREMENT).toBe(1);
    expect(dxf.header.$LTSCALE).toBe(scale);
  });

  it("plan dimensions are DIMENSION entities measuring 40, 65, 40, 10, 40, 65, 40, 300 along and 40, 70, 70, 40, 220 across (scenario inputs), each with its graphics block", () => {
    const ds = dxf.entities.filter((e) => e.type === "DIMENSION");
    expect(ds.filter((e) => e.angle === 0).map((e) => e.actualMeasurement)).toEqual([40, 65, 40, 10, 40, 65, 40, 300]);
    expect(ds.filter((e) => e.angle === 90).map((e) => e.actualMeasurement).slice(0, 5)).toEqual([40, 70, 70, 40, 220]);
    for (const d of ds) {
      expect(d.layer).toBe("DIMENSIONS");
      expect(dxf.blocks[d.block!]?.entities?.length ?? 0, d.block).toBeGreaterThan(2);
    }
    // no dimension is left as loose lines and text: the DIMENSIONS layer has nothing but DIMENSION entities in model space
    expect(dxf.entities.filter((e) => e.layer === "DIMENSIONS" && e.type !== "DIMENSION")).toHaveLength(0);
  });

  it("the section's DIMENSION entities measure the plies 10, 16, 10 (scenario) and the bolt length 65 (M20 × 65, grip 36 + washer 3 + nut 18 + 2 × 2.5 = 62 → 65, ISO 4014 series)", () => {
    const vertical = dxf.entities.filter((e) => e.type === "DIMENSION" && e.angle === 90).map((e) => e.actualMeasurement);
    expect(vertical.slice(5)).toEqual(expect.arrayContaining([65, 10, 16, 10]));
  });

  it("layer line widths (group 370, 1/100 mm) to ISO 128-20 line group 0.5: wide 0.50 for visible outlines and holes, narrow 0.25 for hidden, centre, dimension and hatching lines (wide : narrow = 2 : 1)", () => {
    const w = layerLineWeights(text);
    expect(w).toMatchObject({ OUTLINES: 50, HOLES: 50, SECTION: 50, HIDDEN: 25, CENTRE: 25, DIMENSIONS: 25, HATCHING: 25, THIN: 25 });
    expect(w.OUTLINES! / w.HIDDEN!).toBe(2);
  });

  it("text heights are round numbers (0.01 mm; inches 0.001 in), none like 5.6000000000000005", () => {
    for (const d of [FOOTBRIDGE, TRUSS, SPORTS]) {
      const t = dxfOf(d);
      const all = [...parseDxf(t).entities, ...Object.values(parseDxf(t).blocks).flatMap((b) => b.entities ?? [])];
      for (const e of all.filter((x) => x.type === "TEXT")) expect(Math.abs(e.textHeight! * 100 - Math.round(e.textHeight! * 100)), String(e.textHeight)).toBeLessThan(1e-9);
    }
    const us = parseDxf(dxfOf(CANOPY));
    for (const e of us.entities.filter((x) => x.type === "TEXT")) expect(Math.abs(e.textHeight! * 1000 - Math.round(e.textHeight! * 1000))).toBeLessThan(1e-9);
  });

  it("centre lines on CENTRE are long-dash dot (a line type of dash, gap, dot, gap: ISO 128-20 type 04.1); hidden lines dashed", () => {
    const lt = dxf.tables.lineType.lineTypes;
    expect(layerGroups(dxfOf(FOOTBRIDGE), "6").CENTRE).toBe("CENTER");
    expect(layerGroups(dxfOf(FOOTBRIDGE), "6").HIDDEN).toBe("DASHED");
    const p = lt.CENTER!.pattern!;
    expect(p).toHaveLength(4);
    expect(p[0]!).toBeGreaterThan(10 * p[2]!); // the long dash is many times the dot
    expect(lt.DASHED!.pattern).toHaveLength(2);
    // the same patterns on paper as the SVG sheet (mm drawing: paper mm)
    expect(p.map(Math.abs)).toEqual([...LINE_PATTERNS_MM.centre]);
    expect(lt.DASHED!.pattern!.map(Math.abs)).toEqual([...LINE_PATTERNS_MM.dashed]);
  });
});

describe("3. cutting plane A–A and SECTION A–A on one datum", () => {
  const sheet = parseSvg(svgOf(FOOTBRIDGE));
  const ox = num(sheet.root, "data-origin-x");
  const oy = num(sheet.root, "data-origin-y");

  it("wide cutting-plane ends on the gauge line y = −70 (lowest of three at gauge 70 on a 220 plate), outside the plates, with arrows and a letter A at each end (ISO 128-40)", () => {
    const ends = sheet.els.filter((e) => e.tag === "line" && e.n["@_data-role"] === "cutting-plane" && e.n["@_class"] === "outline").map((e) => e.n);
    expect(ends).toHaveLength(2);
    for (const l of ends) {
      expect(num(l, "y1")).toBeCloseTo(oy + 70 / sheet.k, 2);
      expect(num(l, "y2")).toBeCloseTo(oy + 70 / sheet.k, 2);
    }
    // outside the main plates' drawn ends, one each side
    const plateXs = sheet.els.filter((e) => e.tag === "line" && String(e.n["@_data-part"] ?? "").startsWith("main")).flatMap((e) => [num(e.n, "x1"), num(e.n, "x2")]);
    const [minX, maxX] = [Math.min(...plateXs), Math.max(...plateXs)];
    const xs = ends.map((l) => [num(l, "x1"), num(l, "x2")]);
    expect(xs.some((x) => Math.max(...x) < minX)).toBe(true);
    expect(xs.some((x) => Math.min(...x) > maxX)).toBe(true);
    const letters = sheet.els.filter((e) => e.tag === "text" && e.n["@_data-role"] === "cutting-plane").map((e) => e.n["#text"]);
    expect(letters).toEqual(["A", "A"]);
    expect(sheet.els.filter((e) => e.tag === "g" && e.n["@_class"] === "cutting-plane")).toHaveLength(2);
    void ox;
  });

  it("the section is titled SECTION A–A and gives its gauge line from the plate's lower edge: −70 − (−110) = 40, the hole schedule's datum", () => {
    expect(sheet.texts).toContain("SECTION A–A");
    expect(sheet.texts).toContain("cut on the gauge line 40 from the lower edge of cover plate A");
    expect(sheet.texts.join(" ")).not.toMatch(/GAUGE LINE y =/);
  });
});

describe("4. callouts, part marks, parts list, plate lengths, section dimensions", () => {
  const sheet = parseSvg(svgOf(FOOTBRIDGE));

  it("hole callout 12 holes Ø22 (M20: standard clearance hole 22 mm, IS 800:2007 Table 19; 2 × 3 across × 2 along = 12)", () => {
    expect(sheet.texts).toContain("12 holes Ø22");
  });

  it("each plate has a mark in a circle on the drawing and a parts-list row: length × width × thickness and grade as a bill of materials lists it", () => {
    const marks = sheet.els.filter((e) => e.tag === "text" && e.n["@_data-role"] === "mark").map((e) => e.n["#text"]);
    for (const m of ["1", "2", "3", "4"]) expect(marks, m).toContain(m);
    const rows = sheet.els.filter((e) => e.tag === "g" && e.n["@_class"] === "pl-row").map((e) => textLeaves(e.n));
    expect(rows[0]).toEqual(["1", "1", "cover plate A 300 × 220 × 10", "E250", "12 holes Ø22"]);
    expect(rows[1]).toEqual(["2", "1", "cover plate B 300 × 220 × 10", "E250", "12 holes Ø22"]);
    expect(rows[2]).toEqual(["3", "1", "main plate A (member) 220 × 16", "E250", "6 holes Ø22"]);
  });

  it("the cover length 300 (2 × (40 + 65 + 40) + 10) is dimensioned; the section dimensions the plies 10 + 16 + 10 and the bolt length 65", () => {
    expect(dims(sheet, "plan", "x").map((d) => Number(d["@_data-value"]))).toContain(300);
    const section = dims(sheet, "section").map((d) => Number(d["@_data-value"]));
    expect(section).toEqual(expect.arrayContaining([65, 10, 16, 10]));
  });

  it("a friction-grip chord with packing: the packing ply 4 (= 20 − 16, scenario) is dimensioned in the section and listed", () => {
    const s = parseSvg(svgOf(TRUSS));
    expect(dims(s, "section").map((d) => Number(d["@_data-value"]))).toEqual(expect.arrayContaining([70, 20, 4, 16]));
    const rows = s.els.filter((e) => e.tag === "g" && e.n["@_class"] === "pl-row").map((e) => textLeaves(e.n));
    expect(rows.some((r) => r[2]?.startsWith("packing ") && r[2].endsWith(" × 260 × 4"))).toBe(true);
  });
});

describe("5. extension lines and centre lines", () => {
  for (const [name, d] of [["footbridge", FOOTBRIDGE], ["staggered chord", TRUSS]] as const) {
    it(`${name}: every extension line starts a gap (≥ 0.9 mm on paper) off its feature and none lies along a plate outline (ISO 129-1)`, () => {
      const s = parseSvg(svgOf(d));
      const outlines = s.els.filter((e) => e.tag === "line" && (e.n["@_class"] === "outline" || e.n["@_class"] === "hidden" || e.n["@_class"] === "section-edge")).map((e) => e.n);
      const exts = s.els.filter((e) => e.tag === "line" && e.n["@_class"] === "extension").map((e) => e.n);
      expect(exts.length).toBeGreaterThan(6);
      for (const x of exts) {
        const [x1, y1, x2, y2] = ["x1", "y1", "x2", "y2"].map((a) => num(x, a)) as [number, number, number, number];
        for (const o of outlines) {
          const [a1, b1, a2, b2] = ["x1", "y1", "x2", "y2"].map((a) => num(o, a)) as [number, number, number, number];
          const horizontal = Math.abs(y1 - y2) < 1e-6 && Math.abs(b1 - b2) < 1e-6 && Math.abs(y1 - b1) < 0.05;
          const vertical = Math.abs(x1 - x2) < 1e-6 && Math.abs(a1 - a2) < 1e-6 && Math.abs(x1 - a1) < 0.05;
          const overlap = horizontal ? Math.min(Math.max(x1, x2), Math.max(a1, a2)) - Math.max(Math.min(x1, x2), Math.min(a1, a2)) : vertical ? Math.min(Math.max(y1, y2), Math.max(b1, b2)) - Math.max(Math.min(y1, y2), Math.min(b1, b2)) : -1;
          expect(overlap, `extension ${x1},${y1}–${x2},${y2} along outline ${a1},${b1}–${a2},${b2}`).toBeLessThan(0.5);
        }
      }
    });
  }

  it("footbridge: the extension lines of the plan's along-the-force dimensions start 1 mm (paper) above the plate's top edge at y = 110 (ISO 129-1: a small gap, common practice 1 mm)", () => {
    const s = parseSvg(svgOf(FOOTBRIDGE));
    const oy = num(s.root, "data-origin-y");
    const edge = oy - 110 / s.k;
    const groups = s.els.filter((e) => e.tag === "g" && e.n["@_class"] === "dim" && e.n["@_data-view"] === "plan" && e.n["@_data-direction"] === "x");
    const ext = groups.flatMap((g) => ([] as Node[]).concat(g.n.line as Node[])).filter((l) => l["@_class"] === "extension");
    expect(ext.length).toBeGreaterThanOrEqual(4); // cover ends and butt ends (hole positions use their centre lines)
    for (const l of ext) expect(Math.max(num(l, "y1"), num(l, "y2"))).toBeCloseTo(edge - 1, 2);
  });

  it("every centre line is long-dash dot: the class 'centre' carries a four-part dash pattern (ISO 128-20 type 04.1)", () => {
    const svg = svgOf(FOOTBRIDGE);
    const pattern = /\.centre \{[^}]*stroke-dasharray: ([\d. ]+);/.exec(svg)![1]!.trim().split(/\s+/).map(Number);
    expect(pattern).toHaveLength(4);
    expect(pattern[0]!).toBeGreaterThan(10 * pattern[2]!);
    const d = buildDrawing(FOOTBRIDGE.joint, billOfMaterials(FOOTBRIDGE.joint, FOOTBRIDGE.scenario).lengths, { scale: 2, loadText: "x" });
    // centre lines of holes run on (long-dash dot) to the dimension lines instead of extension lines
    const centre = d.primitives.filter((p) => p.kind === "line" && p.layer === "centre");
    expect(centre.length).toBeGreaterThan(FOOTBRIDGE.joint.holes.length / 2);
  });
});

describe("6. the largest ISO 5455 scale at which plan and section fit", () => {
  for (const [name, d, expected] of [["footbridge", FOOTBRIDGE, 2], ["staggered chord", TRUSS, 2], ["EN chord", SPORTS, 2], ["canopy (US)", CANOPY, 2]] as const) {
    it(`${name}: 1:${expected}, and the next larger ISO 5455 scale would not fit (ISO 5455: 2:1, 1:1, 1:2, 1:5, 1:10 …)`, () => {
      const bom = billOfMaterials(d.joint, d.scenario);
      const { scale, drawing } = layoutSheet({ ...d, bom, date: "2026-01-01" });
      expect(scale).toBe(expected);
      const fits = (k: number, dr = buildDrawing(d.joint, bom.lengths, { scale: k, loadText: drawingLoadText(d.scenario.load, d.scenario.units === "us" ? "us" : "si"), senses: loadSenses(d.scenario.load), units: d.scenario.units === "us" ? "us" : "si" })) =>
        (dr.max[0] - dr.min[0]) / k <= DRAWING_AREA.width && (dr.max[1] - dr.min[1]) / k <= DRAWING_AREA.height;
      expect(fits(scale)).toBe(true);
      const larger = SCALES[SCALES.indexOf(scale) - 1];
      if (larger !== undefined) expect(fits(larger)).toBe(false);
      // the sheet is filled: the drawing takes at least 70 % of the area's width or height
      const w = (drawing.max[0] - drawing.min[0]) / scale / DRAWING_AREA.width;
      const h = (drawing.max[1] - drawing.min[1]) / scale / DRAWING_AREA.height;
      expect(Math.max(w, h)).toBeGreaterThan(0.7);
    });
  }

  it("a layout found by search is never titled '(layout to be found)'", () => {
    const found = { ...FOOTBRIDGE, scenario: { ...FOOTBRIDGE.scenario, name: `${FOOTBRIDGE.scenario.name} (layout to be found)` } };
    const svg = svgOf(found);
    expect(svg).not.toMatch(/to be found/);
    expect(dxfOf(found)).not.toMatch(/to be found/);
  });
});

describe("7. title block", () => {
  it("job, drawing number, revision, drawn and checked by and the date from scenario.document; the strength utilisation is the strength one (T / joint strength)", () => {
    const text = demoText("footbridge-tie.yaml").replace(/^code:/m, "document:\n  job: J-2291 canal footbridge\n  drawing_number: J2291-S-105\n  revision: C\n  drawn_by: A. Detailer\n  checked_by: B. Checker\n  date: 2026-03-02\n\ncode:");
    const d = load(text);
    const s = parseSvg(svgOf(d));
    const field = (key: string) => String(s.els.find((e) => e.tag === "text" && e.n["@_data-field"] === key)?.n["#text"]);
    expect(field("Job")).toBe("J-2291 canal footbridge");
    expect(field("Drawing · revision")).toBe("J2291-S-105 · rev. C");
    expect(field("Drawn · checked · date")).toBe("A. Detailer · B. Checker · 2026-03-02");
    const U = strengthFigures(d.scenario, d.report).strengthUtilisation;
    // 620 kN / 727.4 kN = 0.852 (hand arithmetic on the sheet's own joint strength)
    expect(U).toBeCloseTo(620 / 727.4, 3);
    expect(field("Joint strength")).toContain(`strength utilisation ${U.toFixed(2)}`);
    expect(field("Scale · units")).toBe("1:2 on A3 · dimensions in mm");
  });
});

describe("8. hatching per part and break lines", () => {
  /** Adjacent plies in the stack: each pair shares a face. */
  const adjacent: Array<[string, string]> = [["coverA", "mainA"], ["coverA", "mainB"], ["mainA", "coverB"], ["mainB", "coverB"], ["coverA", "packing"], ["packing", "mainB"]];

  for (const [name, d] of [["footbridge", FOOTBRIDGE], ["staggered chord with packing", TRUSS]] as const) {
    it(`${name}: adjacent parts hatched in another direction or at another spacing (ISO 128-50), lines at 45° or 135° measured from the drawn lines`, () => {
      const s = parseSvg(svgOf(d));
      const hatch = new Map(s.els.filter((e) => e.tag === "g" && e.n["@_class"] === "hatch").map((e) => {
        const lines = ([] as Node[]).concat(e.n.line as Node[]);
        const l = lines[0]!;
        const angle = (Math.atan2(-(num(l, "y2") - num(l, "y1")), num(l, "x2") - num(l, "x1")) * 180) / Math.PI;
        return [String(e.n["@_data-part"]), { angle: ((Math.round(angle) % 180) + 180) % 180, spacing: Number(e.n["@_data-spacing-mm"]), count: lines.length }] as const;
      }));
      for (const p of d.joint.plates) expect(hatch.get(p.id)?.count ?? 0, p.id).toBeGreaterThan(2);
      for (const [a, b] of adjacent) {
        const A = hatch.get(a);
        const B = hatch.get(b);
        if (!A || !B) continue;
        expect(A.angle !== B.angle || Math.abs(A.spacing - B.spacing) > 0.2, `${a} / ${b}`).toBe(true);
        for (const h of [A, B]) expect([45, 135]).toContain(h.angle);
      }
    });
  }

  it("break lines (narrow, with a zigzag) run across each main plate's full width where it is cut off; no wide end line there (ISO 128-20 type 01.1)", () => {
    const s = parseSvg(svgOf(FOOTBRIDGE));
    const breaks = s.els.filter((e) => e.tag === "polyline" && e.n["@_data-role"] === "break").map((e) => e.n);
    const plan = breaks.filter((b) => b["@_data-plate"] === "mainA" || b["@_data-plate"] === "mainB");
    expect(plan.length).toBe(4); // two in plan, two in the section
    for (const b of plan) expect(b["@_class"]).toBe("thin");
    const planBreaks = plan.filter((b) => {
      const ys = String(b["@_points"]).split(" ").map((p) => Number(p.split(",")[1]));
      return Math.max(...ys) - Math.min(...ys) > 220 / s.k; // spans the 220 mm plate and a little more
    });
    expect(planBreaks).toHaveLength(2);
    for (const b of planBreaks) {
      const xs = String(b["@_points"]).split(" ").map((p) => Number(p.split(",")[0]));
      expect(new Set(xs.map((x) => x.toFixed(2))).size).toBeGreaterThan(2); // a zigzag, not a straight line
      const xb = xs[0]!;
      const wideEnd = s.els.filter((e) => e.tag === "line" && e.n["@_class"] === "outline" && Math.abs(num(e.n, "x1") - xb) < 0.01 && Math.abs(num(e.n, "x2") - xb) < 0.01);
      expect(wideEnd).toHaveLength(0);
    }
  });
});

describe("legibility: nothing written over anything else written", () => {
  type Box = { t: string; x0: number; x1: number; y0: number; y1: number; balloon?: boolean };
  /** Boxes of every text, dimension value and mark circle, model mm; a text's width estimated at 0.6 × its height per character (a sans-serif's average advance: common practice). */
  function boxes(d: Loaded): Box[] {
    const { drawing, scale: k } = layoutSheet({ ...d, bom: billOfMaterials(d.joint, d.scenario), date: "2026-01-01" });
    const out: Box[] = [];
    const H = 2.5 * k;
    for (const p of drawing.primitives) {
      if (p.kind === "text") {
        const w = 0.6 * p.height * p.text.length;
        const x0 = p.anchor === "start" ? p.at[0] : p.anchor === "end" ? p.at[0] - w : p.at[0] - w / 2;
        out.push({ t: p.text, x0, x1: x0 + w, y0: p.at[1] - 0.2 * p.height, y1: p.at[1] + 0.8 * p.height });
      } else if (p.kind === "dim") {
        const f = p.textAt ?? 0.5;
        const w = 0.6 * H * p.text.length;
        if (p.direction === "x") {
          const xm = p.from[0] + (p.to[0] - p.from[0]) * f;
          out.push({ t: `dim ${p.text}`, x0: xm - w / 2, x1: xm + w / 2, y0: p.at + k, y1: p.at + k + H });
        } else {
          const ym = p.from[1] + (p.to[1] - p.from[1]) * f;
          const short = w > Math.abs(p.to[1] - p.from[1]) - k; // as the SVG writer decides: the value beside the line when it is longer than the space
          out.push(short ? { t: `dim ${p.text}`, x0: p.at + k, x1: p.at + k + w, y0: ym - 0.35 * H, y1: ym + 0.65 * H } : { t: `dim ${p.text}`, x0: p.at - k - H, x1: p.at - k, y0: ym - w / 2, y1: ym + w / 2 });
        }
      } else if (p.kind === "circle" && !p.hole && p.fill !== "black") out.push({ t: "mark circle", x0: p.c[0] - p.r, x1: p.c[0] + p.r, y0: p.c[1] - p.r, y1: p.c[1] + p.r, balloon: true });
    }
    return out;
  }
  // A single line of bolts: the cut lies on the plate axis, beside the load arrows (invented test joint).
  const oneLine = "name: One line of M12\ncode: is800-2007\nsplice: { type: lap }\nplates: { main: { width: 50, thickness: 6, grade: E250, edges: sawn } }\nload: { factored_tension: 30 kN }\nbolts: { size: M12, class: \"4.6\", type: bearing, threads_in_shear_planes: true }\nlayout: { pattern: grid, across: 1, along: 2, pitch: 35, end_distance: 25 }\n";
  for (const name of ["footbridge-tie.yaml", "canopy-tie-us.yaml", "truss-chord-staggered.yaml", "sports-hall-chord-ec3.yaml", "mezzanine-hanger.yaml", "truss-top-chord-reversal.yaml", "one line of bolts"]) {
    it(name, () => {
      const b = boxes(name.endsWith(".yaml") ? demo(name) : load(oneLine));
      const clashes: string[] = [];
      for (let i = 0; i < b.length; i++) {
        for (let j = i + 1; j < b.length; j++) {
          const [p, q] = [b[i]!, b[j]!];
          if ((p.balloon && /^\d+$/.test(q.t)) || (q.balloon && /^\d+$/.test(p.t))) continue; // a mark inside its own circle
          if (p.x0 < q.x1 && q.x0 < p.x1 && p.y0 < q.y1 && q.y0 < p.y1) clashes.push(`${p.t} / ${q.t}`);
        }
      }
      expect(clashes).toEqual([]);
    });
  }
});

describe("the sheet's title names the splice by the sense of its load", () => {
  it("a splice under reversing load is not titled a tension splice (SVG and DXF)", () => {
    const d = demo("truss-top-chord-reversal.yaml");
    expect(svgOf(d)).toContain("bolted splice under reversing load");
    expect(svgOf(d)).not.toContain("tension splice");
    expect(dxfOf(d)).toContain("bolted splice under reversing load");
    expect(svgOf(demo("footbridge-tie.yaml"))).toContain("bolted tension splice");
  });
});

describe("8. chain dimension values that are wider than their spaces", () => {
  // ISO 129-1 (common practice): where the space between extension lines is too short for the value, the
  // value stands off the dimension line; here each second value of a run of such values is set a row
  // higher (2.5 mm lettering + 1 mm), so neighbours never overprint. Text width: 0.6 × height per character.
  it("values that fit stay on the line; a run of three tight values is set low, high, low", () => {
    expect(chainTextLifts([{ text: "40", space_mm: 20 }, { text: "65", space_mm: 32.5 }, { text: "10", space_mm: 5 }])).toEqual([0, 0, 0]);
    // "1 1/2"" is 6 × 0.6 × 2.5 = 9 mm wide: tight in 7.62 mm (1 1/2 in at 1:5); "3/8"" (6 mm) in 1.9 mm.
    expect(chainTextLifts([{ text: '3"', space_mm: 15.24 }, { text: '1 1/2"', space_mm: 7.62 }, { text: '3/8"', space_mm: 1.9 }, { text: '1 1/2"', space_mm: 7.62 }, { text: '3"', space_mm: 15.24 }])).toEqual([0, 0, 3.5, 0, 0]);
  });

  it("the canopy tie in the report's 1:5 view: no two values of the chain overprint", () => {
    const { scenario, code } = parseScenario(readFileSync(scenarioPath("canopy-tie-us.yaml"), "utf8"));
    const s = requireCheckable(scenario, code);
    const { joint } = checkScenario(s, code);
    const drawing = buildDrawing(joint, billOfMaterials(joint, s).lengths, { scale: 5, loadText: "T", senses: loadSenses(s.load), units: "us" });
    const chain = drawing.primitives.filter((p): p is Extract<typeof p, { kind: "dim" }> => p.kind === "dim" && p.view === "plan" && p.direction === "x");
    const level = Math.min(...chain.map((d) => d.at));
    const boxes = chain
      .filter((d) => d.at === level)
      .map((d) => {
        const mid = (d.from[0] + d.to[0]) / 2 / 5; // paper mm
        const half = (0.6 * 2.5 * d.text.length) / 2;
        return { lo: mid - half, hi: mid + half, lift: d.textLift_mm ?? 0 };
      })
      .sort((a, b) => a.lo - b.lo);
    for (let i = 1; i < boxes.length; i++) {
      const [a, b] = [boxes[i - 1]!, boxes[i]!];
      if (a.lift === b.lift) expect(b.lo, `values ${i - 1} and ${i}`).toBeGreaterThanOrEqual(a.hi - 1e-9);
    }
    expect(boxes.some((b) => b.lift > 0)).toBe(true);
  });
});
