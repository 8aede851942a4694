/**
 * Export read-back: the SVG's holes and dimension values and the DXF's holes against the layout, the
 * bill of materials against a hand count, bolt lengths against the product standards' dimensions.
 */
import { existsSync, mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import DxfParser from "dxf-parser";
import { XMLParser } from "fast-xml-parser";
import { describe, expect, it } from "vitest";
import { checkScenario } from "../src/engine/check.js";
import { billOfMaterials, boltLengths } from "../src/export/bolt-list.js";
import { exportFiles } from "../src/export/index.js";
import { parseScenario, requireCheckable } from "../src/io/scenario.js";
import { cli, scenarioPath, tempScenario } from "./helpers/cli.js";

function load(text: string) {
  const { scenario, code } = parseScenario(text);
  const s = requireCheckable(scenario, code);
  return { scenario: s, ...checkScenario(s, code) };
}
const demo = (name: string) => load(readFileSync(scenarioPath(name), "utf8"));

type Node = Record<string, unknown>;
function walk(node: unknown, visit: (tag: string, n: Node) => void, tag = ""): void {
  if (Array.isArray(node)) node.forEach((n) => walk(n, visit, tag));
  else if (node && typeof node === "object") {
    visit(tag, node as Node);
    for (const [k, v] of Object.entries(node)) if (!k.startsWith("@_") && k !== "#text") walk(v, visit, k);
  }
}

describe("SVG drawing read back", () => {
  const { scenario, joint, report } = demo("footbridge-tie.yaml");
  const svg = exportFiles({ scenario, joint, report, date: "2026-01-01", base: "t" }, ["svg"]).files[0]!.content;
  const doc = new XMLParser({ ignoreAttributes: false }).parse(svg);
  const root = doc.svg as Node;
  const k = Number(root["@_data-scale"]);
  const ox = Number(root["@_data-origin-x"]);
  const oy = Number(root["@_data-origin-y"]);
  const circles: Node[] = [];
  const dims: Node[] = [];
  walk(doc, (tag, n) => {
    if (tag === "circle" && n["@_data-hole"]) circles.push(n);
    if (tag === "g" && n["@_class"] === "dim" && n["@_data-view"] === "plan") dims.push(n);
  });

  it("has every hole at its coordinates, to scale, at true diameter", () => {
    expect(circles).toHaveLength(joint.holes.length);
    for (const h of joint.holes) {
      const c = circles.find((x) => x["@_data-hole"] === h.id)!;
      expect(Number(c["@_data-x-mm"])).toBeCloseTo(h.x_mm, 6);
      expect(Number(c["@_data-y-mm"])).toBeCloseTo(h.y_mm, 6);
      expect(Number(c["@_cx"])).toBeCloseTo(ox + h.x_mm / k, 2);
      expect(Number(c["@_cy"])).toBeCloseTo(oy - h.y_mm / k, 2);
      expect(Number(c["@_r"])).toBeCloseTo(22 / 2 / k, 3); // Ø22 for M20, IS 800:2007 Table 19
    }
  });

  it("dimensions the end distance 40, pitch 65, butt end distance 40, gap 10, edge 40, gauge 70 and the overall 300 × 220", () => {
    const along = dims.filter((d) => d["@_data-direction"] === "x").map((d) => Number(d["@_data-value"]));
    const across = dims.filter((d) => d["@_data-direction"] === "y").map((d) => Number(d["@_data-value"]));
    // chain along: cover end 40, pitch 65, at butt 40, gap 10, 40, 65, 40 — then the cover length 300
    expect(along).toEqual([40, 65, 40, 10, 40, 65, 40, 300]);
    // chain across: edge 40, gauge 70, 70, edge 40 — then the width 220
    expect(across).toEqual([40, 70, 70, 40, 220]);
  });

  it("carries a title block with the scenario, the code, the bolts, the strength and the scale; ISO 128 line types", () => {
    expect(svg).toContain("Footbridge FB-2 bottom tie");
    expect(svg).toContain("IS 800:2007");
    expect(svg).toContain("12 × M20 × 65 class 8.8");
    expect(svg).toMatch(/727\.4 kN for T = 620\.0 kN/);
    expect(svg).toMatch(/1:\d+ on A3/);
    expect(svg).toMatch(/\.centre \{[^}]*stroke-dasharray: 12 1\.5 0\.5 1\.5/); // long-dash dot, ISO 128-20 type 04.1: long dash 24 d, gap 3 d at d = 0.5 mm (the dot drawn 0.5 mm)
    expect(svg).toMatch(/\.outline \{[^}]*stroke-width: 0\.5/); // continuous wide
    expect(svg).toContain("qualified engineer");
  });
});

describe("DXF read back with a DXF parser", () => {
  const { scenario, joint, report } = demo("truss-chord-staggered.yaml");
  const dxfText = exportFiles({ scenario, joint, report, date: "2026-01-01", base: "t" }, ["dxf"]).files[0]!.content;
  const dxf = new DxfParser().parseSync(dxfText) as unknown as { header: Record<string, unknown>; entities: Array<{ type: string; layer: string; center?: { x: number; y: number }; radius?: number }>; tables: { layer: { layers: Record<string, unknown> } } };

  it("declares millimetres ($INSUNITS = 4) and has the layers", () => {
    expect(dxf.header.$INSUNITS).toBe(4);
    for (const l of ["OUTLINES", "HIDDEN", "HOLES", "CENTRE", "DIMENSIONS", "TEXT", "SECTION"]) expect(Object.keys(dxf.tables.layer.layers)).toContain(l);
  });

  it("has one circle per hole on layer HOLES, radius d0/2 = 11 mm, at the hole coordinates (full size)", () => {
    const holes = dxf.entities.filter((e) => e.type === "CIRCLE" && e.layer === "HOLES");
    expect(holes).toHaveLength(joint.holes.length);
    for (const h of joint.holes) {
      const c = holes.find((e) => Math.abs(e.center!.x - h.x_mm) < 1e-6 && Math.abs(e.center!.y - h.y_mm) < 1e-6);
      expect(c, h.id).toBeDefined();
      expect(c!.radius).toBeCloseTo(11, 6);
    }
  });
});

describe("bolt lengths and the bill of materials", () => {
  it("footbridge tie: grip 10 + 16 + 10 = 36; + washer 3 (ISO 7089) + nut 18 (ISO 4032) + 2 × 2.5 = 62 → M20 × 65; 12 of each; covers 300 × 220 × 10 = 5.18 kg", () => {
    const { scenario, joint } = demo("footbridge-tie.yaml");
    const bom = billOfMaterials(joint, scenario);
    expect(bom.lengths.map((l) => [l.grip_mm, l.required_mm, l.length_mm])).toEqual([[36, 62, 65], [36, 62, 65]]);
    expect(bom.bolts).toEqual([expect.objectContaining({ size: "M20", class: "8.8", length_mm: 65, quantity: 12 })]);
    expect(bom.nuts[0]!.quantity).toBe(12);
    expect(bom.washers[0]!.quantity).toBe(12);
    expect(bom.plates.map((p) => [p.id, p.length_mm, p.mass_kg])).toEqual([["coverA", 300, 5.18], ["coverB", 300, 5.18]]);
    expect(bom.ok).toBe(true);
  });

  it("friction-grip chord: grip 40 both sides (20 + 20; 20 + 4 packing + 16); 2 hardened washers 4 + nut 16 + 5 = 69 → 70; 20 bolts, 40 washers, a packing plate", () => {
    const { scenario, joint } = demo("truss-chord-staggered.yaml");
    const bom = billOfMaterials(joint, scenario);
    expect(bom.lengths.map((l) => [l.grip_mm, l.required_mm, l.length_mm])).toEqual([[40, 69, 70], [40, 69, 70]]);
    expect(bom.bolts[0]!.quantity).toBe(20);
    expect(bom.washers[0]!.quantity).toBe(40);
    expect(bom.plates.map((p) => p.id)).toEqual(["coverA", "packing"]);
  });

  it("threads excluded from the shear plane: M16 lap of 2 × 10 mm needs 45 mm, but its plain shank 45 − (2 × 16 + 6) = 7 mm stops short of the plane at 10 mm: 50 mm is used (shank 12 mm)", () => {
    const text = readFileSync(scenarioPath("mezzanine-hanger.yaml"), "utf8").replace("threads_in_shear_planes: true", "threads_in_shear_planes: false");
    const { scenario, joint } = load(text);
    const [line] = boltLengths(joint, scenario);
    // required: 20 + 3 + 14.8 + 2 × 2 = 41.8 → 45 (series); ISO 4014 b = 2d + 6 = 38 for l ≤ 125
    expect(line!.required_mm).toBeCloseTo(41.8, 6);
    expect(line!.deepestShearPlane_mm).toBe(10);
    expect(line!.length_mm).toBe(50);
    expect(line!.threadsClear).toBe(true);
    expect(line!.note).toMatch(/lengthened from 45 mm to 50 mm/);
  });
});

describe("bolt assemblies of the code in use (lengths on each standard's dimensions)", () => {
  it("EN 1993-1-8 non-preloaded (sports hall chord): EN 15048 assembly, ISO 4014 bolt, ISO 4032 nut 18 mm, ISO 7089 washer 3 mm (from memory): 10 + 16 + 10 + 3 + 18 + 2 × 2.5 = 62 → M20 × 65", () => {
    const { scenario, joint } = demo("sports-hall-chord-ec3.yaml");
    const bom = billOfMaterials(joint, scenario);
    expect(bom.lengths.map((l) => [l.grip_mm, l.required_mm, l.length_mm])).toEqual([[36, 62, 65], [36, 62, 65]]);
    expect(bom.bolts[0]!.item).toBe("M20 × 65 hexagon head bolt, property class 8.8");
    expect(bom.bolts[0]!.standard).toMatch(/EN 15048/);
    expect(JSON.stringify(bom)).not.toMatch(/IS \d{3,4}/);
  });
  it("EN 1993-1-8 preloaded (Category B): EN 14399-3 HR assembly with EN 14399-6 washers 4 mm under head and nut (h nom. 4 for M20, BS EN 14399-6 table as torqbolt.com reproduces it): 36 + 2 × 4 + 18 + 5 = 67 → M20 × 70", () => {
    const text = readFileSync(scenarioPath("sports-hall-chord-ec3.yaml"), "utf8")
      .replace(/type: bearing.*\n/, "type: friction-grip\n  slip_factor: 0.4\n  slip_at: service\n")
      .replace(/factored_tension: (.*)/, "factored_tension: $1\n  service_tension: 600 kN");
    const { scenario, joint } = load(text);
    const bom = billOfMaterials(joint, scenario);
    expect(bom.lengths.map((l) => [l.required_mm, l.length_mm, l.washersUnderHead, l.washersUnderNut])).toEqual([[67, 70, 1, 1], [67, 70, 1, 1]]);
    expect(bom.bolts[0]!.item).toBe("M20 × 70 HR 8.8 preloadable bolt (EN 14399-3)");
    expect(bom.washers[0]!.standard).toBe("EN 14399-6 washer");
    expect(JSON.stringify(bom)).not.toMatch(/IS 3757|IS 6623|IS 6649/);
  });
  it("AISC 360-16 (canopy tie, 3/4 in A325): grip 3/8 + 1/2 + 3/8 = 1-1/4 in; RCSC add-to-grip 1 in + one F436 washer 5/32 in = 2.406 in → 2-1/2 in (from memory)", () => {
    const { scenario, joint } = demo("canopy-tie-us.yaml");
    const bom = billOfMaterials(joint, scenario);
    expect(bom.lengths[0]!.grip_mm / 25.4).toBeCloseTo(1.25, 9);
    expect(bom.lengths[0]!.required_mm / 25.4).toBeCloseTo(1.25 + 1 + 5 / 32, 9);
    expect(bom.lengths[0]!.length_mm / 25.4).toBeCloseTo(2.5, 9);
    expect(bom.bolts[0]!.item).toBe("3/4 in × 2-1/2 in ASTM F3125 Grade A325 heavy hex structural bolt");
    expect(bom.nuts[0]!.item).toBe("3/4 in ASTM A563 Grade C heavy hex nut");
    expect(bom.washers[0]!.item).toBe("3/4 in ASTM F436 hardened flat washer, 5/32 in");
    expect(JSON.stringify(bom)).not.toMatch(/ISO 4014|ISO 4032|IS 3757/);
  });
  it("IS 800 friction grip keeps the IS 3757 / IS 6623 / IS 6649 assembly", () => {
    const { scenario, joint } = demo("truss-chord-staggered.yaml");
    expect(billOfMaterials(joint, scenario).bolts[0]!.standard).toMatch(/IS 3757/);
  });
});

describe("splicewright export", () => {
  it("writes every format into a new folder and names each file", () => {
    const dir = join(mkdtempSync(join(tmpdir(), "splicewright-export-")), "nested", "out");
    const r = cli(["export", scenarioPath("footbridge-tie.yaml"), "--format", "all", "--out", dir]);
    expect(r.code).toBe(0);
    for (const f of ["footbridge-tie.svg", "footbridge-tie.dxf", "footbridge-tie-holes.csv", "footbridge-tie-bom.csv", "footbridge-tie.json"]) expect(existsSync(join(dir, f)), f).toBe(true);
    const json = JSON.parse(readFileSync(join(dir, "footbridge-tie.json"), "utf8"));
    expect(json.schema).toBe("splicewright-export/1");
    expect(json.layout.holes).toHaveLength(12);
    const csv = readFileSync(join(dir, "footbridge-tie-holes.csv"), "utf8");
    // header on the first row, after the UTF-8 byte-order mark (test/csv-files.test.ts parses every CSV)
    expect(csv).toMatch(/^\ufeffplate,plate_name,hole,x_from_left_end_mm,y_from_lower_edge_mm,/);
    // cover plate A's first hole in drilling order: x = 40 from the cover's left end, y = 40 from its lower edge
    expect(csv.split("\r\n")[1]).toMatch(/^coverA,cover plate A,A4,40,40,22,/);
  });

  it("refuses to overwrite without --force and writes nothing then", () => {
    const dir = mkdtempSync(join(tmpdir(), "splicewright-export-"));
    writeFileSync(join(dir, "footbridge-tie.dxf"), "mine");
    const r = cli(["export", scenarioPath("footbridge-tie.yaml"), "--format", "svg,dxf", "--out", dir]);
    expect(r.code).toBe(2);
    expect(r.stderr.trim()).toMatch(/footbridge-tie\.dxf: already exists \(use --force to overwrite\)$/);
    expect(readFileSync(join(dir, "footbridge-tie.dxf"), "utf8")).toBe("mine");
    expect(existsSync(join(dir, "footbridge-tie.svg"))).toBe(false);
    expect(cli(["export", scenarioPath("footbridge-tie.yaml"), "--format", "svg,dxf", "--out", dir, "--force"]).code).toBe(0);
  });

  it("exports the n-th layout of the search with --rank", () => {
    const dir = mkdtempSync(join(tmpdir(), "splicewright-export-"));
    const r = cli(["export", scenarioPath("footbridge-tie-search.yaml"), "--rank", "2", "--format", "json", "--out", dir]);
    expect(r.code).toBe(0);
    const json = JSON.parse(readFileSync(join(dir, "footbridge-tie-search-rank2.json"), "utf8"));
    expect(json.result.pass).toBe(true);
  });

  it("an unknown format and a scenario without a layout are bad input (exit 2)", () => {
    const dir = mkdtempSync(join(tmpdir(), "splicewright-export-"));
    expect(cli(["export", scenarioPath("footbridge-tie.yaml"), "--format", "pdf", "--out", dir]).stderr).toMatch(/--format: unknown format "pdf"/);
    const r = cli(["export", scenarioPath("footbridge-tie-search.yaml"), "--format", "svg", "--out", dir]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/bolts: required for check/);
  });

  it("a failing layout is still drawn, and export exits 1 saying so", () => {
    const text = readFileSync(scenarioPath("mezzanine-hanger.yaml"), "utf8").replace("factored_tension: 150 kN", "factored_tension: 200 kN");
    const dir = mkdtempSync(join(tmpdir(), "splicewright-export-"));
    const r = cli(["export", tempScenario(text), "--format", "svg", "--out", dir]);
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(/the layout fails \d+ check/);
    expect(readFileSync(join(dir, "scenario.svg"), "utf8")).toContain("FAIL");
  });
});

describe("US-unit scenarios", () => {
  const text = readFileSync(scenarioPath("canopy-tie-us.yaml"), "utf8").replace("size: 3/4 in", "size: M20");

  it("the DXF of a US-unit scenario is drawn in inches ($INSUNITS = 1): an M20 hole (Ø22 mm, AISC Table J3.3M) has radius 11/25.4 in", () => {
    const { scenario, joint, report } = load(text);
    const dxfText = exportFiles({ scenario, joint, report, date: "2026-01-01", base: "t" }, ["dxf"]).files[0]!.content;
    const dxf = new DxfParser().parseSync(dxfText) as unknown as { header: Record<string, unknown>; entities: Array<{ type: string; layer: string; center?: { x: number; y: number }; radius?: number }> };
    expect(dxf.header.$INSUNITS).toBe(1);
    const holes = dxf.entities.filter((e) => e.type === "CIRCLE" && e.layer === "HOLES");
    expect(holes).toHaveLength(joint.holes.length);
    for (const h of holes) expect(h.radius).toBeCloseTo(11 / 25.4, 9);
    const h0 = joint.holes[0]!;
    expect(holes.some((c) => Math.abs(c.center!.x - h0.x_mm / 25.4) < 1e-9 && Math.abs(c.center!.y - h0.y_mm / 25.4) < 1e-9)).toBe(true);
  });

});
