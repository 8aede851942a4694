/**
 * Every CSV of every demo scenario, read as a spreadsheet or a data tool reads it: the hole schedule and
 * bill of materials of each scenario (`export`, the search scenarios through `--rank 1`), the schedule and
 * order list of the demo project (`schedule --out`). Parsed with a real CSV parser (csv-parse, RFC 4180):
 * header on the first row, the same number of cells on every row, numbers in numeric columns, UTF-8 with
 * a byte-order mark (or ASCII only), note rows only after the data; the hole schedule's datum columns with
 * every plate measured rightward like the plan; the inch CSVs without "mm".
 *
 * Values checked against sources outside the project:
 * - steel density 7850 kg/m³ (common practice; EN 1991-1-1 Table A.4 gives 77–78.5 kN/m³ for steel);
 * - 1 in = 25.4 mm exactly, 1 lb = 0.45359237 kg exactly (international yard and pound, 1959);
 * - standard holes: M20 → 22 mm (IS 800:2007 Table 19; EN 1090-2 Table 11), 3/4 in → 13/16 in
 *   (AISC 360-16 Table J3.3: d + 1/16 below 1 in, as summarised in the wcfrobert.github.io "Primer: AISC
 *   360-16 Chapter J Connection Design"; 13/16 in is printed in AISC 360-22 Table J3.3);
 * - plate lengths and hole positions worked by hand from the scenario files' own pitch, end distances
 *   and butt gap (read here with the YAML library, not through the project's scenario reader).
 */
import { mkdtempSync, readdirSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { parse } from "csv-parse/sync";
import { parse as parseYaml } from "yaml";
import { beforeAll, describe, expect, it } from "vitest";
import { csvDocument } from "../src/export/csv.js";
import { usDimensionText } from "../src/report/format.js";
import { cliAsync, ROOT, scenarioPath, tempScenario } from "./helpers/cli.js";

const IN = 25.4; // mm, exact
const LB = 0.45359237; // kg, exact
const STEEL_KG_PER_M3 = 7850; // common practice

interface CsvFile {
  name: string;
  bytes: Buffer;
  header: string[];
  data: string[][];
  notes: string[];
}

/** Parse a CSV as a strict RFC 4180 reader does, and split the data rows from the trailing note rows. */
function readCsv(name: string, bytes: Buffer): CsvFile {
  const text = bytes.toString("utf8");
  const records: string[][] = parse(text, { bom: true, relax_column_count: false, relax_quotes: false, skip_empty_lines: false });
  const [header, ...rest] = records;
  const firstNote = rest.findIndex((r) => r[0] === "#");
  const data = firstNote < 0 ? rest : rest.slice(0, firstNote);
  const noteRows = firstNote < 0 ? [] : rest.slice(firstNote);
  return { name, bytes, header: header ?? [], data, notes: noteRows.map((r) => r[1] ?? "") };
}

/** Columns that must hold numbers (or nothing), with the most decimals they may carry. */
function numericDigits(column: string): number | null {
  if (/_mm$|_kN$|_kg$|_lb$/.test(column)) return 2;
  if (/_in$/.test(column)) return 4;
  if (["strength_utilisation", "service_utilisation", "efficiency"].includes(column)) return 4;
  if (["cost_each", "cost", "own_optimum_cost_each", "premium_each", "premium"].includes(column)) return 2;
  if (["quantity", "holes", "bolts_each", "bolts"].includes(column)) return 0;
  return null;
}

/** What every CSV must be, whatever it lists. */
function expectSpreadsheetClean(f: CsvFile, name: string): void {
  const bom = f.bytes.subarray(0, 3).equals(Buffer.from([0xef, 0xbb, 0xbf]));
  expect(bom || f.bytes.every((b) => b < 0x80), `${f.name}: UTF-8 with BOM or ASCII`).toBe(true);
  const text = f.bytes.toString("utf8");
  expect(text.replace(/\r\n/g, ""), `${f.name}: CRLF line ends only`).not.toMatch(/[\r\n]/);
  // Header first: names, not comments or data.
  expect(f.header.length).toBeGreaterThan(3);
  for (const h of f.header) expect(h, `${f.name}: header cell`).toMatch(/^[a-z][a-z0-9_]*(_kN)?$/);
  expect(f.data.length, `${f.name}: data rows`).toBeGreaterThan(0);
  const all = [...f.data, ...f.notes];
  expect(new Set([f.header, ...f.data].map((r) => r.length)), `${f.name}: one width`).toEqual(new Set([f.header.length]));
  // Numbers in numeric columns, rounded.
  f.header.forEach((col, i) => {
    const digits = numericDigits(col);
    if (digits === null) return;
    for (const row of f.data) {
      const cell = row[i]!;
      if (cell === "") continue;
      expect(cell, `${f.name} ${col}`).toMatch(digits === 0 ? /^\d+$/ : new RegExp(`^-?\\d+(\\.\\d{1,${digits}})?$`));
    }
  });
  // Notes only after the data, and they carry the scenario's name and the caution.
  expect(all.length).toBe(f.data.length + f.notes.length);
  const notes = f.notes.join("\n");
  expect(notes, `${f.name}: names the scenario`).toContain(name);
  expect(notes).toMatch(/verified by a qualified engineer/);
  expect(notes).toMatch(/governing edition of the design code, its national annex and local regulations/);
  // A reader's comment option drops the note rows and keeps header + data.
  const withComments: string[][] = parse(text, { bom: true, comment: "#" });
  expect(withComments).toEqual([f.header, ...f.data]);
}

const col = (f: CsvFile, name: string) => {
  const i = f.header.indexOf(name);
  expect(i, `${f.name}: column ${name}`).toBeGreaterThanOrEqual(0);
  return (row: string[]) => row[i]!;
};
const num = (f: CsvFile, name: string) => {
  const get = col(f, name);
  return (row: string[]) => Number(get(row));
};

const DEMOS = readdirSync(join(ROOT, "scenarios")).filter((n) => n.endsWith(".yaml") && n !== "warehouse-roof-project.yaml").sort();

interface Exported {
  yaml: Record<string, unknown>;
  holes: CsvFile;
  bom: CsvFile;
  json: {
    scenario: string;
    layout: {
      holes: Array<{ id: string; x_mm: number; y_mm: number }>;
      plates: Array<{ id: string; width_mm: number; length_mm: number; x0_mm: number; x1_mm: number; continues: string; datum: { x_mm: number; y_mm: number }; holes: Array<{ id: string; x_from_left_end_mm: number; y_from_lower_edge_mm: number; diameter_mm: number }> }>;
    };
  };
}

const exported = new Map<string, Exported>();

beforeAll(async () => {
  await Promise.all(
    DEMOS.map(async (file) => {
      const dir = mkdtempSync(join(tmpdir(), "splicewright-csv-"));
      const search = file.includes("-search");
      const r = await cliAsync(["export", scenarioPath(file), ...(search ? ["--rank", "1"] : []), "--format", "csv,json", "--out", dir]);
      expect(r.code, `${file}: ${r.stderr}`).toBeLessThan(2);
      const base = file.replace(/\.yaml$/, "") + (search ? "-rank1" : "");
      const read = (n: string) => readFileSync(join(dir, n));
      exported.set(file, {
        yaml: parseYaml(readFileSync(scenarioPath(file), "utf8")) as Record<string, unknown>,
        holes: readCsv(`${base}-holes.csv`, read(`${base}-holes.csv`)),
        bom: readCsv(`${base}-bom.csv`, read(`${base}-bom.csv`)),
        json: JSON.parse(read(`${base}.json`).toString("utf8")),
      });
    }),
  );
}, 120_000);

describe.each(DEMOS)("%s: hole schedule and bill of materials", (file) => {
  const get = () => exported.get(file)!;
  const us = () => get().yaml.units === "us";
  const u = () => (us() ? "in" : "mm");
  const toMm = (v: number) => (us() ? v * IN : v);

  it("open cleanly in a spreadsheet", () => {
    const e = get();
    expectSpreadsheetClean(e.holes, e.json.scenario);
    expectSpreadsheetClean(e.bom, e.json.scenario);
  });

  it("the hole schedule measures every plate from its left end and lower edge as drawn, rightward and upward like the plan", () => {
    const { holes, json } = get();
    expect(holes.header.slice(0, 5)).toEqual(["plate", "plate_name", "hole", `x_from_left_end_${u()}`, `y_from_lower_edge_${u()}`]);
    const plate = col(holes, "plate");
    const hole = col(holes, "hole");
    const x = num(holes, `x_from_left_end_${u()}`);
    const y = num(holes, `y_from_lower_edge_${u()}`);
    const length = num(holes, `plate_length_${u()}`);
    const width = num(holes, `plate_width_${u()}`);
    // The schedule rounds to 0.0001 in or 0.01 mm; the JSON's joint coordinates to 0.01 mm.
    const tol = (us() ? 0.00005 * IN : 0.005) + 0.005 + 1e-9;
    const global = new Map(json.layout.holes.map((h) => [h.id, h]));
    const atBolt = new Map<string, number[]>();
    for (const p of json.layout.plates) {
      const rows = holes.data.filter((r) => plate(r) === p.id);
      if (rows.length === 0) continue;
      for (const r of rows) {
        // Inside the plate: 0 ≤ x ≤ length, 0 ≤ y ≤ width.
        expect(x(r)).toBeGreaterThan(0);
        expect(x(r)).toBeLessThan(length(r));
        expect(y(r)).toBeGreaterThan(0);
        expect(y(r)).toBeLessThan(width(r));
        expect(toMm(width(r))).toBeCloseTo(p.width_mm, 2);
        expect(toMm(length(r))).toBeCloseTo(p.x1_mm - p.x0_mm, 2);
      }
      // Same direction as the plan (the drawing's x runs rightward, y upward: test/export.test.ts reads the
      // SVG back at the layout's coordinates): schedule differences equal layout differences, same sign.
      const r0 = rows[0]!;
      const h0 = global.get(hole(r0))!;
      for (const r of rows) {
        const h = global.get(hole(r))!;
        expect(Math.abs(toMm(x(r) - x(r0)) - (h.x_mm - h0.x_mm)), `${p.id} ${hole(r)} x`).toBeLessThan(2 * tol);
        expect(Math.abs(toMm(y(r) - y(r0)) - (h.y_mm - h0.y_mm)), `${p.id} ${hole(r)} y`).toBeLessThan(2 * tol);
        // The datum is the plate's left end (x0) and lower edge (−width/2) as drawn.
        expect(Math.abs(toMm(x(r)) - (h.x_mm - p.x0_mm))).toBeLessThan(tol);
        expect(Math.abs(toMm(y(r)) - (h.y_mm + p.width_mm / 2))).toBeLessThan(tol);
        atBolt.set(hole(r), [...(atBolt.get(hole(r)) ?? []), toMm(x(r)) + p.x0_mm]);
      }
      // Drilling order along the plate.
      const xs = rows.map(x);
      expect(xs).toEqual([...xs].sort((a, b) => a - b));
      // The JSON gives the same holes in the same datum.
      expect(p.holes.map((h) => h.id)).toEqual(rows.map(hole));
      p.holes.forEach((h, i) => {
        expect(Math.abs(h.x_from_left_end_mm - toMm(x(rows[i]!)))).toBeLessThan(tol + 0.005);
        expect(Math.abs(h.y_from_lower_edge_mm - toMm(y(rows[i]!)))).toBeLessThan(tol + 0.005);
        expect(p.datum).toEqual({ x_mm: p.x0_mm, y_mm: -p.width_mm / 2 });
      });
    }
    // One bolt, one position: the plates it passes through agree where their datums put it.
    for (const [id, xsOfBolt] of atBolt) for (const v of xsOfBolt) expect(Math.abs(v - xsOfBolt[0]!), id).toBeLessThan(2 * tol);
    // Every hole of the layout is scheduled in at least one plate, and in each main plate of its side.
    expect(new Set(holes.data.map(hole))).toEqual(new Set(json.layout.holes.map((h) => h.id)));
  });

  it("the bill of materials lists bolts, nuts, washers and every supplied plate with size, grade, mass and standard", () => {
    const { bom, json, yaml } = get();
    const kind = col(bom, "kind");
    const qty = num(bom, "quantity");
    const kinds = bom.data.map(kind);
    for (const k of ["bolt", "nut", "washer"]) expect(kinds, k).toContain(k);
    const sum = (k: string) => bom.data.filter((r) => kind(r) === k).reduce((s, r) => s + qty(r), 0);
    expect(sum("bolt")).toBe(json.layout.holes.length); // one bolt per hole position
    expect(sum("nut")).toBe(sum("bolt"));
    expect(sum("washer")).toBeGreaterThanOrEqual(sum("bolt"));
    const standard = col(bom, "standard");
    for (const r of bom.data) expect(standard(r), `${kind(r)} standard`).not.toBe("");
    const code = String(yaml.code);
    const plateStandard = code.startsWith("aisc") ? /^ASTM A(36|572)$/ : code.startsWith("en1993") ? /^EN 10025-\d$/ : /^IS 2062$/;
    const L = num(bom, `length_${u()}`);
    const B = num(bom, `width_${u()}`);
    const t = num(bom, `thickness_${u()}`);
    const mass = num(bom, us() ? "mass_lb" : "mass_kg");
    const plates = bom.data.filter((r) => kind(r) === "plate" || kind(r) === "packing");
    const splice = (yaml.splice as { type: string }).type;
    expect(plates.length).toBe(splice === "lap" ? 0 : splice === "butt-single-cover" ? 1 + Number(kinds.includes("packing")) : 2);
    for (const r of plates) {
      expect(standard(r)).toMatch(plateStandard);
      expect(col(bom, "class_or_grade")(r)).not.toBe("");
      // Mass = L × B × t × 7850 kg/m³ (common practice), in kg or lb (1 lb = 0.45359237 kg).
      const volume_m3 = toMm(L(r)) * toMm(B(r)) * toMm(t(r)) * 1e-9;
      const expected = (volume_m3 * STEEL_KG_PER_M3) / (us() ? LB : 1);
      expect(Math.abs(mass(r) - expected), `${col(bom, "item")(r)} mass`).toBeLessThanOrEqual(0.005 + 1e-9);
      expect(qty(r)).toBe(1);
      expect(num(bom, "holes")(r)).toBeGreaterThan(0);
    }
  });

  it("the JSON's plates, bolt lengths and bill of materials carry no float noise (9.524999999999999)", () => {
    const j = get().json as unknown as { layout: { plates: unknown }; boltLengths: unknown; billOfMaterials: unknown };
    for (const part of [j.layout.plates, j.boltLengths, j.billOfMaterials]) expect(JSON.stringify(part)).not.toMatch(/\d\.\d*(9{6,}|0{6,}[1-9])\d*/);
  });

  it("an inch CSV says no mm anywhere; a metric one no inches", () => {
    const { holes, bom } = get();
    for (const f of [holes, bom]) {
      const text = f.bytes.toString("utf8");
      if (us()) {
        expect(text, f.name).not.toMatch(/mm\b|_mm/);
        expect(f.header.some((h) => h.endsWith("_in"))).toBe(true);
      } else {
        expect(f.header.some((h) => h.endsWith("_in"))).toBe(false);
        for (const row of f.data) for (const cell of row) expect(cell, f.name).not.toMatch(/\d+(\/\d+)?"/);
      }
    }
  });
});

describe("values by hand from the scenario files", () => {
  it('canopy-tie-us.yaml: cover plates PL 3/8" × 8" × 1\'-0 3/8", 10.53 lb; holes 13/16 in at 1 1/2, 4 1/2, 7 7/8, 10 7/8 in', () => {
    const { bom, holes } = exported.get("canopy-tie-us.yaml")!;
    // Cover length = 2 × (end 1.5 + pitch 3 + end at butt 1.5) + gap 0.375 = 12.375 in.
    const covers = bom.data.filter((r) => r[0] === "plate");
    expect(covers.map(col(bom, "size"))).toEqual(['PL 3/8" × 8" × 1\'-0 3/8"', 'PL 3/8" × 8" × 1\'-0 3/8"']);
    expect(covers.map((r) => Number(r[bom.header.indexOf("length_in")]))).toEqual([12.375, 12.375]);
    // 12.375 × 8 × 0.375 in³ × (0.0254 m)³ × 7850 kg/m³ / 0.45359237 kg/lb = 10.53 lb.
    const lb = (12.375 * 8 * 0.375 * 0.0254 ** 3 * 7850) / 0.45359237;
    expect(lb).toBeCloseTo(10.53, 2);
    expect(covers.map((r) => Number(r[bom.header.indexOf("mass_lb")]))).toEqual([10.53, 10.53]);
    // ASTM assembly items as the AISC order lists them.
    expect(bom.data.find((r) => r[0] === "bolt")![1]).toMatch(/ASTM F3125 Grade A325/);
    expect(bom.data.find((r) => r[0] === "nut")![1]).toMatch(/ASTM A563/);
    expect(bom.data.find((r) => r[0] === "washer")![1]).toMatch(/ASTM F436/);
    const x = col(holes, "x_from_left_end_in");
    const y = col(holes, "y_from_lower_edge_in");
    const cover = holes.data.filter((r) => r[0] === "coverA");
    expect([...new Set(cover.map((r) => Number(x(r))))]).toEqual([1.5, 4.5, 6 + 0.375 + 1.5, 6 + 0.375 + 4.5]);
    // Gauge 4 in centred on the 8 in plate: 2 and 6 in from the lower edge.
    expect([...new Set(cover.map((r) => Number(y(r))))].sort()).toEqual([2, 6]);
    expect(new Set(holes.data.map(col(holes, "hole_diameter_in")))).toEqual(new Set(["0.8125"]));
    // Main plate A: its length within the splice is 6 in; its end (at the butt) at x = 6, holes 1.5 in from it.
    const mainA = holes.data.filter((r) => r[0] === "mainA");
    expect([...new Set(mainA.map((r) => Number(x(r))))]).toEqual([1.5, 4.5]);
    expect(new Set(mainA.map(col(holes, "plate_length_in")))).toEqual(new Set(["6"]));
  });

  it("footbridge-tie.yaml: covers PL 10 × 220 × 300 E250, 5.18 kg; M20 holes Ø22; main plate A measured rightward", () => {
    const { bom, holes } = exported.get("footbridge-tie.yaml")!;
    // 0.300 × 0.220 × 0.010 m³ × 7850 kg/m³ = 5.181 kg.
    const covers = bom.data.filter((r) => r[0] === "plate");
    expect(covers.map((r) => [col(bom, "size")(r), col(bom, "class_or_grade")(r), Number(col(bom, "mass_kg")(r))])).toEqual([["PL 10 × 220 × 300", "E250", 5.18], ["PL 10 × 220 × 300", "E250", 5.18]]);
    expect(new Set(holes.data.map(col(holes, "hole_diameter_mm")))).toEqual(new Set(["22"]));
    // Main plate A's length within the splice: (300 − 10) / 2 = 145 mm; the butt end at x = 145, the holes
    // 40 mm from it (end distance at the butt) and 65 mm apart (pitch): x = 40 and 105, rightward.
    const mainA = holes.data.filter((r) => r[0] === "mainA");
    expect([...new Set(mainA.map((r) => Number(col(holes, "x_from_left_end_mm")(r))))]).toEqual([40, 105]);
    expect(new Set(mainA.map(col(holes, "plate_length_mm")))).toEqual(new Set(["145"]));
  });

  it("canopy-tie-us.yaml: the JSON gives inch dimensions exactly (13/16 in = 20.6375 mm, AISC 360-16 Table J3.3 for 3/4 in bolts; 1 in = 25.4 mm exact)", () => {
    const { json } = exported.get("canopy-tie-us.yaml")!;
    const plate = json.layout.plates[0]!;
    for (const h of plate.holes) expect(h.diameter_mm).toBe(20.6375);
    // Cover plate length 12 3/8 in = 314.325 mm (the scenario's layout, worked by hand in the test above).
    expect(plate.length_mm).toBe(314.325);
  });

  it("sports-hall-chord-ec3.yaml: every plate's holes are also measured from a real plate end (marking_end), main plate A from its butt end", () => {
    const { holes } = exported.get("sports-hall-chord-ec3.yaml")!;
    const x = num(holes, "x_from_left_end_mm");
    const fromEnd = num(holes, "x_from_marking_end_mm");
    const length = num(holes, "plate_length_mm");
    const end = col(holes, "marking_end");
    for (const r of holes.data) {
      if (r[0] === "mainA") expect([end(r), fromEnd(r)]).toEqual(["right", Number((length(r) - x(r)).toFixed(2))]);
      else expect([end(r), fromEnd(r)]).toEqual(["left", x(r)]);
    }
    // The scenario file: e1 = 45 mm at the covers' outer ends, 50 mm at the chord ends (the butt), pitch 70 mm.
    // Main plate A's nearest hole is 50 mm from its own end; the covers' first hole 45 mm from theirs.
    const nearest = (plate: string) => Math.min(...holes.data.filter((r) => r[0] === plate).map(fromEnd));
    expect(nearest("mainA")).toBe(50);
    expect(nearest("mainB")).toBe(50);
    expect(nearest("coverA")).toBe(45);
  });

  it.each(["along", "across"])("slotted holes (%s the force): the slot's length and direction in its own columns, the width as the diameter", async (direction) => {
    const text = readFileSync(scenarioPath("footbridge-tie.yaml"), "utf8").replace(/hole: standard[^\n]*/, `hole: short-slot\n  slot_direction: ${direction}`);
    const dir = mkdtempSync(join(tmpdir(), "splicewright-csv-slot-"));
    const r = await cliAsync(["export", tempScenario(text, "slotted.yaml"), "--format", "csv,json", "--out", dir]);
    expect(r.code, r.stderr).toBeLessThan(2);
    const f = readCsv("slotted-holes.csv", readFileSync(join(dir, "slotted-holes.csv")));
    const json = JSON.parse(readFileSync(join(dir, "slotted.json"), "utf8")) as { layout: { holes: Array<{ across_mm: number; along_mm: number }> } };
    const h0 = json.layout.holes[0]!;
    expect(f.data.length).toBeGreaterThan(0);
    for (const row of f.data) {
      expect(col(f, "slot_direction")(row)).toBe(`${direction} the force`);
      // The slot runs the way it is declared: longer along the force for "along", across for "across".
      expect(direction === "along" ? h0.along_mm > h0.across_mm : h0.across_mm > h0.along_mm).toBe(true);
      expect(num(f, "slot_length_mm")(row)).toBeCloseTo(Math.max(h0.along_mm, h0.across_mm), 2);
      // M20: the slot's width is the standard hole, 22 mm (IS 800:2007 Table 19).
      expect(num(f, "hole_diameter_mm")(row)).toBe(22);
    }
  });

  it("US shop dimension text (common practice): 1'-0 3/8\", 1'-0\", 5 1/2\", 3/4\"", () => {
    expect(usDimensionText(12.375 * IN)).toBe("1'-0 3/8\"");
    expect(usDimensionText(12 * IN)).toBe("1'-0\"");
    expect(usDimensionText(18.5 * IN)).toBe("1'-6 1/2\"");
    expect(usDimensionText(5.5 * IN)).toBe('5 1/2"');
    expect(usDimensionText(0.75 * IN)).toBe('3/4"');
  });
});

describe("the CSV form", () => {
  it("text a spreadsheet would run as a formula is made inert; numbers, negative ones too, stay numbers", () => {
    const f = readCsv("t", Buffer.from(csvDocument(["a_mm", "b", "c"], [[-12.5, "=HYPERLINK(\"x\")", "@SUM(1)"], [3, "+1", "plain, with comma"]], ["a note, with comma"]), "utf8"));
    expect(f.data).toEqual([["-12.5", "'=HYPERLINK(\"x\")", "'@SUM(1)"], ["3", "'+1", "plain, with comma"]]);
    expect(f.notes).toEqual(["a note, with comma"]);
    expect(() => csvDocument(["a"], [[1, 2]], [])).toThrow(/2 cells under a header of 1/);
  });
});

describe("schedule and order list of warehouse-roof-project.yaml", () => {
  let schedule: CsvFile;
  let order: CsvFile;
  const project = parseYaml(readFileSync(scenarioPath("warehouse-roof-project.yaml"), "utf8")) as { project: string; splices: Array<{ id: string; quantity: number }> };

  beforeAll(async () => {
    const dir = mkdtempSync(join(tmpdir(), "splicewright-csv-schedule-"));
    const r = await cliAsync(["schedule", scenarioPath("warehouse-roof-project.yaml"), "--workers", "0", "--out", dir]);
    expect(r.code, r.stderr).toBe(0);
    schedule = readCsv("schedule", readFileSync(join(dir, "warehouse-roof-project-schedule.csv")));
    order = readCsv("order", readFileSync(join(dir, "warehouse-roof-project-order.csv")));
  }, 120_000);

  it("open cleanly in a spreadsheet", () => {
    expectSpreadsheetClean(schedule, project.project);
    expectSpreadsheetClean(order, project.project);
  });

  it("one row per splice of the project file and no total row among them (a column's SUM is the job's); the totals note and the order list add up to them", () => {
    const id = col(schedule, "id");
    const qty = num(schedule, "quantity");
    const rows = schedule.data;
    expect(rows.map(id)).toEqual(project.splices.map((s) => s.id));
    expect(rows.map(qty)).toEqual(project.splices.map((s) => s.quantity));
    const bolts = num(schedule, "bolts");
    const jobBolts = rows.reduce((s, r) => s + bolts(r), 0);
    const splices = project.splices.reduce((s, x) => s + x.quantity, 0);
    expect(schedule.notes.join("\n")).toContain(`total: ${splices} splices, ${jobBolts} bolts`);
    const kind = col(order, "kind");
    const oq = num(order, "quantity");
    const ordered = (k: string) => order.data.filter((r) => kind(r) === k).reduce((s, r) => s + oq(r), 0);
    expect(ordered("bolt")).toBe(jobBolts);
    expect(ordered("nut")).toBe(jobBolts);
    // Efficiency in per cent, as every other output prints it.
    for (const r of rows) expect(num(schedule, "efficiency_percent")(r)).toBeGreaterThan(1);
    // Utilisation = factored tension / joint strength, to the 4 decimals printed.
    const util = num(schedule, "strength_utilisation");
    const T = num(schedule, "factored_tension_kN");
    const R = num(schedule, "joint_strength_kN");
    for (const r of rows) expect(Math.abs(util(r) - T(r) / R(r))).toBeLessThan(0.0005);
  });
});
