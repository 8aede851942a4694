/**
 * AISC 360-16 (LRFD) on whole splices: a hand-worked splice of our own in US units (the demo
 * scenarios/canopy-tie-us.yaml), fillers, slip-critical bolts, metric AISC work, the CLI in US units,
 * bad input, and the search (admissible bound; best-first = brute force).
 */
import { mkdtempSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { checkScenario } from "../src/engine/check.js";
import { parseCostTable } from "../src/io/costs.js";
import { InputError, parseScenario, requireCheckable } from "../src/io/scenario.js";
import type { StrengthCheck } from "../src/model/results.js";
import { bruteForceLayouts } from "../src/search/brute-force.js";
import { searchLayouts } from "../src/search/search.js";
import { families, resolveSpace, scenarioOf, layoutOf } from "../src/search/space.js";
import { cli, ROOT, scenarioPath, tempScenario } from "./helpers/cli.js";

const KIP = 4448.2216152605;
const kips = (N: number) => N / KIP;
const demo = readFileSync(scenarioPath("canopy-tie-us.yaml"), "utf8");

function run(yaml: string) {
  const { scenario, code } = parseScenario(yaml);
  return checkScenario(requireCheckable(scenario, code), code);
}
const strengthOf = (r: ReturnType<typeof run>, id: string) => r.report.checks.find((c) => c.id === id) as StrengthCheck;

describe("hand-worked splice (our own, US units): canopy tie, 8 × 1/2 in A572-50, two 3/8 in A36 covers, 3/4 in A325-N, 2 across × 2 along each side, Pu = 120 kips", () => {
  // Working (AISC 360-16, LRFD):
  //  holes 13/16 in (Table J3.3); net-area width 13/16 + 1/16 = 7/8 in (B4.3b).
  //  Bolt shear (J3.6): φrn = 0.75 × 54 × π(0.75)²/4 = 0.75 × 54 × 0.44179 = 17.892 kips per plane;
  //    4 bolts × 2 planes → 143.14 kips.
  //  Main plate, bolt group (J3.10, deformation considered): bearing 0.75 × 2.4 × 0.75 × 0.5 × 65 = 43.875 kips;
  //    bolts at the butt: lc = 1.5 − 13/32 = 1.09375 in, tearout 0.75 × 1.2 × 1.09375 × 0.5 × 65 = 31.992 kips;
  //    inner bolts: lc = 3 − 13/16 = 2.1875 in, tearout 63.98 > shear 2 × 17.892 = 35.784 kips;
  //    Σ = 2 × 31.992 + 2 × 35.784 = 135.55 kips  ← governs.
  //  Cover (half the force): per bolt min(17.892 shear, 29.36 bearing, tearout at the cover end
  //    0.75 × 1.2 × 1.09375 × 0.375 × 58 = 21.41) = 17.892 → 71.57 kips ≥ 60.
  //  Main plate yield (D2): 0.90 × 50 × 8 × 0.5 = 180 kips; rupture: An = (8 − 2 × 0.875) × 0.5 = 3.125 in²,
  //    0.75 × 65 × 3.125 = 152.34 kips.
  //  Cover rupture (J4.1): An = (8 − 1.75) × 0.375 = 2.344 ≤ 0.85 × 3 = 2.55 in², 0.75 × 58 × 2.344 = 101.95 kips
  //    per cover, 203.9 kips for the joint.
  //  Block shear of the main plate (J4.3), both gauge lines: Agv = 2 × 4.5 × 0.5 = 4.5, Anv = 4.5 − 2 × 1.5 × 0.875 × 0.5
  //    = 3.1875, Ant = (4 − 0.875) × 0.5 = 1.5625 in²; 0.75 × (0.6 × 65 × 3.1875 + 65 × 1.5625) = 169.41 kips.
  //  Joint strength 135.55 kips; efficiency 135.55 / 180 = 0.753.
  const r = run(demo);
  it("bolt shear 143.14 kips", () => expect(kips(strengthOf(r, "bolt-shear:A").resistance_N)).toBeCloseTo(143.14, 1));
  it("main plate group strength Σ min(shear, bearing, tearout) = 135.55 kips, and it governs", () => {
    expect(kips(strengthOf(r, "bearing:mainA:A").resistance_N)).toBeCloseTo(135.55, 1);
    expect(r.report.governing).toBe("bearing:mainA:A");
    expect(kips(r.report.jointStrength_N)).toBeCloseTo(135.55, 1);
  });
  it("cover group 71.57 kips against 60 kips", () => {
    const c = strengthOf(r, "bearing:coverA:A");
    expect(kips(c.resistance_N)).toBeCloseTo(71.57, 1);
    expect(kips(c.demand_N)).toBeCloseTo(60, 6);
  });
  it("main plate yield 180, rupture 152.34; cover rupture 101.95 kips", () => {
    expect(kips(strengthOf(r, "gross-yield:mainB").resistance_N)).toBeCloseTo(180, 6);
    expect(kips(strengthOf(r, "net-section:mainB").resistance_N)).toBeCloseTo(152.34, 1);
    expect(kips(strengthOf(r, "net-section:coverA").resistance_N)).toBeCloseTo(101.95, 1);
  });
  it("block shear of the main plate: the one-sided block over both gauge lines governs — Agv = 4.5 × 0.5 = 2.25, Anv = (4.5 − 1.5 × 7/8) × 0.5 = 1.594, Ant = (6 − 1.5 × 7/8) × 0.5 = 2.344 in²; 0.75 × (0.6 × 65 × 1.594 + 65 × 2.344) = 160.88 kips (< yield form 164.88)", () => {
    expect(kips(strengthOf(r, "block-shear:mainB:B").resistance_N)).toBeCloseTo(0.75 * (0.6 * 65 * 1.59375 + 65 * 2.34375), 2);
    expect(strengthOf(r, "block-shear:mainB:B").loadRatio).toBe(1);
  });
  it("no 3 d warning at a 3 in pitch (3 d = 2.25 in); a 2-1/8 in pitch passes 2⅔ d = 2 in but warns (J3.3)", () => {
    expect(r.report.warnings.some((w) => w.id === "spacing-below-3d")).toBe(false);
    const close = run(demo.replace("pitch: 3\n", "pitch: 2.125\n"));
    expect(close.report.checks.find((c) => c.id === "min-spacing")!.pass).toBe(true);
    expect(close.report.warnings.some((w) => w.id === "spacing-below-3d")).toBe(true);
  });
  it("efficiency 0.753, every check passes", () => {
    expect(r.report.efficiency).toBeCloseTo(0.753, 3);
    expect(r.report.pass).toBe(true);
  });
  it("deformation not a consideration raises the butt-end tearout to 1.5 lc t Fu: Σ = 2 × 35.784 + 2 × 35.784 = 143.14 kips (tearout 39.99 > shear)", () => {
    const r2 = run(demo.replace("bearing_deformation: considered", "bearing_deformation: not-considered"));
    expect(kips(strengthOf(r2, "bearing:mainA:A").resistance_N)).toBeCloseTo(143.14, 1);
  });
});

describe("fillers (J5.2) and slip-critical bolts (J3.8)", () => {
  // Main plate B 3/4 in, main plate A 1/4 in → 1/2 in filler under A (packing auto).
  const withFiller = demo.replace("name: Canopy truss CT-3 bottom tie, field splice S2", "name: filler case\n").replace("  main: { width: 8, thickness: 0.5, grade: A572-50, edges: sheared }", "  main: { width: 8, thickness: 0.25, grade: A572-50, edges: sheared }\n  main_b: { width: 8, thickness: 0.75, grade: A572-50, edges: sheared }").replace("factored_tension: 120 kip", "factored_tension: 50 kip");
  it("a 1/2 in filler reduces the side-A bolt shear by 1 − 0.4(0.5 − 0.25) = 0.90: 0.9 × 143.14 = 128.83 kips; side B unreduced", () => {
    const r = run(withFiller);
    expect(kips(strengthOf(r, "bolt-shear:A").resistance_N)).toBeCloseTo(128.83, 1);
    expect(kips(strengthOf(r, "bolt-shear:B").resistance_N)).toBeCloseTo(143.14, 1);
  });
  it("a 1 in filler, undeveloped, fails J5.2; developed, it passes and the shear is not reduced", () => {
    const thick = withFiller.replace("thickness: 0.75, grade", "thickness: 1.25, grade");
    const r = run(thick);
    const rule = r.report.checks.find((c) => c.id === "filler-thickness")!;
    expect(rule.pass).toBe(false);
    expect(r.report.pass).toBe(false);
    const developed = run(thick.replace("bearing_deformation: considered", "bearing_deformation: considered\n  fillers_developed: true"));
    expect(developed.report.checks.find((c) => c.id === "filler-thickness")).toBeUndefined();
    expect(kips(strengthOf(developed, "bolt-shear:A").resistance_N)).toBeCloseTo(143.14, 1);
  });
  it("slip-critical Class A: 4 bolts × 2 planes × 9.49 = 75.9 kips at the factored load, and still checked in shear and bearing", () => {
    const sc = demo.replace("type: bearing", "type: friction-grip\n  slip_factor: 0.30").replace("factored_tension: 120 kip", "factored_tension: 70 kip");
    const r = run(sc);
    expect(kips(strengthOf(r, "slip:A").resistance_N)).toBeCloseTo(4 * 2 * 9.492, 1);
    expect(r.report.checks.some((c) => c.id === "bolt-shear:A")).toBe(true);
    expect(r.report.checks.some((c) => c.id === "bearing:mainA:A")).toBe(true);
    expect(r.report.governing).toBe("slip:A");
  });
  it("a fastener pattern over 38 in takes 0.833 Fnv (Table J3.2 note [b])", () => {
    const long = demo.replace("along: 2 ", "along: 14 ").replace("factored_tension: 120 kip", "factored_tension: 100 kip");
    const r = run(long);
    // 14 lines at 3 in: pattern length 39 in > 38 in; 28 bolts × 2 planes × 0.833 × 17.892
    expect(kips(strengthOf(r, "bolt-shear:A").resistance_N)).toBeCloseTo(28 * 2 * 0.833 * 17.892, 0);
  });
});

describe("metric AISC work (SI units, Tables J3.3M, J3.4M)", () => {
  const metric = `name: metric AISC lap
code: aisc360
splice: { type: lap }
plates:
  main: { width: 200, thickness: 12, grade: A36 }
load: { factored_tension: 300 kN }
bolts: { size: M20, class: A325, threads_in_shear_planes: true }
layout: { pattern: grid, across: 2, along: 3, pitch: 70, gauge: 100, end_distance: 40 }
`;
  it("M20 A325M-N single shear: 6 × 0.75 × 372 MPa × 314.16 mm² = 525.9 kN; holes 22 mm; min edge 26 mm", () => {
    const r = run(metric);
    expect(strengthOf(r, "bolt-shear:J").resistance_N / 1000).toBeCloseTo(6 * 87.65, 0);
    expect(r.joint.holes[0]!.across_mm).toBe(22);
    expect(r.report.checks.find((c) => c.id === "min-edge-distance")!.type === "rule" && (r.report.checks.find((c) => c.id === "min-edge-distance") as { limit_mm: number }).limit_mm).toBe(26);
  });
});

describe("CLI in US units", () => {
  it("check prints in, kips, ksi and exits 0; JSON adds _kip and _in fields beside the SI ones", () => {
    const sheet = cli(["check", scenarioPath("canopy-tie-us.yaml")]);
    expect(sheet.code).toBe(0);
    expect(sheet.stdout).toContain("Joint design strength:  135.6 kips");
    expect(sheet.stdout).toContain("3/4 in ASTM A325");
    expect(sheet.stdout).toContain("Fy/Fu (ksi)");
    const json = cli(["check", scenarioPath("canopy-tie-us.yaml"), "--json"]);
    const j = JSON.parse(json.stdout);
    expect(j.units).toBe("us");
    expect(j.jointStrength_kip).toBeCloseTo(135.55, 1);
    expect(j.jointStrength_kN).toBeCloseTo(135.55 * 4.4482216, 0);
    expect(j.bolt).toMatchObject({ size: "3/4 in", astmGrade: "A325" });
    const edge = j.checks.find((c: { id: string }) => c.id === "min-edge-distance");
    expect(edge.limit_in).toBeCloseTo(1, 4);
  });
  it("search over the US demo exits 0 on a 1/4 in step; --save writes inches and check gives the same strength", () => {
    const r = cli(["search", scenarioPath("canopy-tie-us-search.yaml"), "--top", "3", "--json"]);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout);
    expect(j.results.length).toBe(3);
    for (const row of j.results) expect((row.pitch_mm / 6.35) % 1).toBeCloseTo(0, 6);
    const saved = join(mkdtempSync(join(tmpdir(), "splicewright-aisc-")), "best.yaml");
    expect(cli(["search", scenarioPath("canopy-tie-us-search.yaml"), "--save", saved]).code).toBe(0);
    const text = readFileSync(saved, "utf8");
    expect(text).toContain("units: us");
    const back = cli(["check", saved, "--json"]);
    expect(back.code).toBe(0);
    expect(JSON.parse(back.stdout).jointStrength_kN).toBeCloseTo(j.results[0].jointStrength_kN, 1);
  });
});

describe("bad input: one line naming the field, exit 2", () => {
  const cases: Array<[string, string, string]> = [
    ["units: us under IS 800", demo.replace("code: aisc360-16", "code: is800-2007").replace("grade: A572-50", "grade: E250").replace("grade: A36", "grade: E250").replace("class: A325 ", "class: 8.8 ").replace(/options:\n.*\n/, ""), "units"],
    ["an ASTM bolt grade under IS 800", demo.replace("units: us\n", "").replace("code: aisc360-16", "code: is800-2007").replace(/options:\n.*\n/, ""), "bolts.class"],
    ["an IS 2062 grade under AISC", demo.replace("grade: A36", "grade: E250"), "plates.cover.grade"],
    ["a slip coefficient that is no AISC class", demo.replace("type: bearing", "type: friction-grip\n  slip_factor: 0.4"), "bolts.slip_factor"],
    ["an inch size outside the catalogue", demo.replace("size: 3/4 in", "size: 1 1/4 in"), "bolts.size"],
    ["an unknown bearing switch", demo.replace("bearing_deformation: considered", "bearing_deformation: sometimes"), "options.bearing_deformation"],
  ];
  it.each(cases)("%s", (_label, yaml, path) => {
    const r = cli(["check", tempScenario(yaml)]);
    expect(r.code).toBe(2);
    expect(r.stderr.trim().split("\n")).toHaveLength(1);
    expect(r.stderr).toContain(path);
  });
  it("parseScenario throws InputError naming units for IS 800", () => {
    expect(() => parseScenario(cases[0]![1])).toThrow(InputError);
  });
});

describe("search under AISC 360-16", () => {
  const costs = parseCostTable(readFileSync(`${ROOT}/catalogue/costs.yaml`, "utf8"), "catalogue");
  const base = readFileSync(scenarioPath("canopy-tie-us-search.yaml"), "utf8");
  it("the default step is 1/4 in (6.35 mm) for units: us", () => {
    const { scenario, code } = parseScenario(base.replace(/  step: 1\/4 in\n/, ""));
    expect(resolveSpace(scenario, code, costs).step_mm).toBe(6.35);
  });
  const withFiller = base.replace("  main: { width: 8, thickness: 0.5, grade: A572-50, edges: sheared }", "  main: { width: 8, thickness: 0.375, grade: A572-50, edges: sheared }\n  main_b: { width: 8, thickness: 0.75, grade: A572-50, edges: sheared }");
  it.each([
    ["the demo space", base],
    ["with a 3/8 in filler on side A (one side's shear reduced)", withFiller],
    ["slip-critical Class B", base.replace("search:", "bolts: { size: M20, class: A325, type: friction-grip, slip_factor: 0.5 }\nsearch:")],
  ])("strengthBound is never below the checker's joint strength (a sample of grid and staggered layouts): %s", (_label, yaml) => {
    const { scenario, code } = parseScenario(yaml.replace("max_along: 6", "max_along: 3"));
    const space = resolveSpace(scenario, code, costs);
    let checked = 0;
    for (const f of families(scenario, code, costs, space)) {
      if (f.pattern === "tapered" || !f.countsPerLine) continue;
      for (const p of f.pitches_mm.filter((_, i) => i % 5 === 0)) {
        for (const e of f.ends_mm.filter((_, i) => i % 2 === 0)) {
          const eb = f.endsAtButt_mm[f.endsAtButt_mm.length - 1];
          const g = f.gauges_mm[0]!;
          const s = scenarioOf(f, layoutOf(f, p, g, e, eb));
          const bound = code.strengthBound(s, { pattern: f.pattern, countsPerLine: f.countsPerLine, pitch_mm: p, endDistance_mm: e, ...(eb !== undefined ? { endDistanceAtButt_mm: eb } : {}) });
          const unknown = code.strengthBound(s, { pattern: f.pattern, countsPerLine: f.countsPerLine });
          const r = checkScenario(s, code).report;
          expect(bound.jointStrength_N).toBeGreaterThanOrEqual(r.jointStrength_N - 1e-6);
          expect(unknown.jointStrength_N).toBeGreaterThanOrEqual(bound.jointStrength_N - 1e-6);
          checked++;
        }
      }
    }
    expect(checked).toBeGreaterThan(100);
  });
  it("best-first search returns exactly what brute force returns on a reduced space", () => {
    const small = base.replace("sizes: [5/8 in, 3/4 in, 7/8 in, 1 in]", "sizes: [3/4 in, 7/8 in]\n  max_end_distance: 2 in").replace("max_along: 6", "max_along: 3").replace("cover_thicknesses: [5/16 in, 3/8 in, 1/2 in]", "cover_thicknesses: [3/8 in]").replace("step: 1/4 in", "step: 1/2 in");
    const { scenario, code } = parseScenario(small);
    const ctx = { scenario, code, costs };
    const line = (c: { key: { numbers: number[]; text: string } }) => `${c.key.numbers.join(" ")} ${c.key.text}`;
    const fast = searchLayouts(ctx, { top: 5, rankBy: "cost" }).results.map(line);
    const brute = bruteForceLayouts(ctx, 5, "cost").results.map(line);
    expect(fast.length).toBeGreaterThan(0);
    expect(fast).toEqual(brute);
  });
});
