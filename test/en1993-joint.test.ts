/**
 * EN 1993-1-8 checks of whole joints, worked by hand. The joints are invented: the bundled demo
 * sports-hall-chord-ec3.yaml (a cover-plate splice worked in full below) and small variants of it.
 * Sources: EN 1993-1-8 and EN 1993-1-1 clauses as cited; numbers worked here (F), written beside each.
 */
import { readFileSync } from "node:fs";
import { parse, stringify } from "yaml";
import { describe, expect, it } from "vitest";
import { checkScenario } from "../src/engine/check.js";
import { boltBearings } from "../src/codes/en1993-1-8/joint-checks.js";
import { settingsOf } from "../src/codes/en1993-1-8/settings.js";
import { InputError, parseScenario, requireCheckable } from "../src/io/scenario.js";
import type { CheckReport, RuleCheck, StrengthCheck } from "../src/model/results.js";
import { scenarioPath } from "./helpers/cli.js";

const DEMO = readFileSync(scenarioPath("sports-hall-chord-ec3.yaml"), "utf8");
const kN = (n: number) => n / 1000;

/** The demo with fields replaced (a deep merge of plain objects). */
function variant(changes: Record<string, unknown>, base: string = DEMO): string {
  const merge = (a: Record<string, unknown>, b: Record<string, unknown>): Record<string, unknown> => {
    const out = { ...a };
    for (const [k, v] of Object.entries(b)) {
      out[k] = v && typeof v === "object" && !Array.isArray(v) && out[k] && typeof out[k] === "object" ? merge(out[k] as Record<string, unknown>, v as Record<string, unknown>) : v;
    }
    return out;
  };
  return stringify(merge(parse(base) as Record<string, unknown>, changes));
}

/** An invented lap splice to EN 1993-1-8 in one line: plate, tension (kN), bolts and layout. */
function lap(plate: Record<string, unknown>, tension: number, bolts: Record<string, unknown>, layout: Record<string, unknown>, options: Record<string, unknown> = {}): string {
  return stringify({ name: "invented lap splice", code: "en1993-1-8", splice: { type: "lap" }, plates: { main: plate }, load: { factored_tension: tension }, bolts, layout, options });
}

function run(text: string) {
  const { scenario, code } = parseScenario(text);
  const checkable = requireCheckable(scenario, code);
  return { ...checkScenario(checkable, code), scenario: checkable, code };
}

function strength(report: CheckReport, id: string): StrengthCheck {
  const c = report.checks.find((x) => x.id === id);
  if (!c || c.type !== "strength") throw new Error(`no strength check ${id}: ${report.checks.map((x) => x.id).join(", ")}`);
  return c;
}

function ruleOf(report: CheckReport, id: string): RuleCheck {
  const c = report.checks.find((x) => x.id === id);
  if (!c || c.type !== "rule") throw new Error(`no rule ${id}`);
  return c;
}

function inputError(text: string): string {
  try {
    run(text);
  } catch (e) {
    if (e instanceof InputError) return e.message;
    throw e;
  }
  throw new Error("no input error");
}

describe("hand-worked: sports-hall-chord-ec3.yaml — 260 × 16 S355 chord, two 260 × 10 S355 covers, M20 8.8, 3 across × 3 along, p 70, g 80, e 45 / 50 at the butt", () => {
  // Materials: EN 10025-2, t ≤ 16 mm: S355 fy 355, fu 470 MPa. M20 8.8: fub 800 MPa, As 245 mm², d0 22 mm (EN 1090-2).
  // Edge distance e2 = (260 − 2 × 80)/2 = 50 mm. Recommended γM0 1.00, γM2 1.25.
  const { report, joint, scenario } = run(DEMO);

  it("geometry: 18 holes of 22 mm; cover length 2 × (5 + 50 + 2 × 70 + 45) = 480 mm", () => {
    expect(joint.holes).toHaveLength(18);
    expect(joint.holes.every((h) => h.across_mm === 22)).toBe(true);
    expect(joint.spliceLength_mm).toBe(480);
  });

  it("bolt shear (Table 3.4): Fv,Rd = 2 planes × 0.6 × 800 × 245/1.25 = 188.16 kN; Lj = 140 ≤ 15d, βLf = 1; 9 bolts → 1693.44 kN vs 950 kN", () => {
    const c = strength(report, "bolt-shear:A");
    expect(kN(c.resistance_N)).toBeCloseTo(1693.44, 2);
    expect(c.utilisation).toBeCloseTo(950 / 1693.44, 6);
  });

  it("bearing per bolt on the main plate: k1 = min(2.8 × 50/22 − 1.7 = 4.66, 1.4 × 80/22 − 1.7 = 3.39, 2.5) = 2.5; line at the butt αb = 50/66 → 227.88 kN, other lines αb = 70/66 − 0.25 → 243.83 kN", () => {
    const plate = joint.plates.find((p) => p.id === "mainA")!;
    const each = boltBearings(joint.holes.filter((h) => h.group === "A"), plate.connections[0]!, plate, scenario, settingsOf(scenario), false);
    const byId = new Map(each.map((b) => [b.hole.id, b]));
    for (const id of ["A1", "A2", "A3"]) {
      expect(byId.get(id)!.end).toBe(true);
      expect(kN(byId.get(id)!.Fb_N)).toBeCloseTo(2.5 * (50 / 66) * 470 * 20 * 16 / 1.25 / 1000, 9);
      expect(kN(byId.get(id)!.Fb_N)).toBeCloseTo(227.88, 2);
    }
    for (const id of ["A4", "A5", "A6", "A7", "A8", "A9"]) expect(kN(byId.get(id)!.Fb_N)).toBeCloseTo(243.83, 2);
    expect(byId.get("A1")!.edge && !byId.get("A2")!.edge && byId.get("A3")!.edge).toBe(true);
    expect(each.every((b) => b.k1 === 2.5)).toBe(true);
  });

  it("bearing of the group on the main plate (3.7): Fv,Rd 188.16 < Fb,Rd 227.88 → 9 × 188.16 = 1693.44 kN vs 950 kN", () => {
    expect(kN(strength(report, "bearing:mainA:A").resistance_N)).toBeCloseTo(1693.44, 2);
  });

  it("bearing on a cover (3.7): Fb,Rd = 2.5 × (45/66) × 470 × 20 × 10/1.25 = 128.18 kN at the cover end; one plane 94.08 kN < → 9 × 94.08 = 846.72 kN vs T/2 = 475 kN", () => {
    const c = strength(report, "bearing:coverA:B");
    expect(kN(c.resistance_N)).toBeCloseTo(846.72, 2);
    expect(kN(c.demand_N)).toBeCloseTo(475, 9);
  });

  it("gross yield (EN 1993-1-1 6.2.3(2)a): main 260 × 16 × 355/1.0 = 1476.8 kN; cover 260 × 10 × 355 = 923.0 kN vs 475 kN", () => {
    expect(kN(strength(report, "gross-yield:mainB").resistance_N)).toBeCloseTo(1476.8, 6);
    expect(kN(strength(report, "gross-yield:coverB").resistance_N)).toBeCloseTo(923.0, 6);
  });

  it("net section (6.2.3(2)b) governs: Anet = (260 − 3 × 22) × 16 = 3104 mm²; Nu,Rd = 0.9 × 3104 × 470/1.25 = 1050.39 kN; covers (260 − 66) × 10 → 656.50 kN", () => {
    expect(kN(strength(report, "net-section:mainA").resistance_N)).toBeCloseTo(1050.39, 2);
    expect(kN(strength(report, "net-section:coverA").resistance_N)).toBeCloseTo(656.5, 2);
    expect(report.governing).toMatch(/^net-section:main/);
    expect(kN(report.jointStrength_N)).toBeCloseTo(1050.39, 2);
  });

  it("block tearing, main plate (3.10.2(2)): the one-sided block over all 3 gauge lines, 9 of 9 bolts, governs; Anv = (190 − 2.5 × 22) × 16 = 2160, Ant = (2 × 80 + 50 − 2.5 × 22) × 16 = 2480 mm²; 470 × 2480/1.25 + 355 × 2160/√3 = 1375.19 kN vs 950 kN (the edge strip of lines 2–3, 6 of 9 bolts, 1026.27 kN, permits 1026.27 × 9/6 = 1539.4 kN)", () => {
    const c = strength(report, "block-shear:mainA:A");
    expect(kN(c.resistance_N)).toBeCloseTo(932.48 + 442.7165, 2);
    expect(c.loadRatio).toBe(1);
  });

  it("block tearing, cover: one-sided block, Anv = (185 − 55) × 10 = 1300, Ant = 155 × 10 = 1550 mm² → 582.8 + 266.45 = 849.25 kN vs 475 kN", () => {
    expect(kN(strength(report, "block-shear:coverA:A").resistance_N)).toBeCloseTo(582.8 + 266.448, 2);
    expect(strength(report, "block-shear:coverA:A").loadRatio).toBeCloseTo(0.5, 12);
  });

  it("Table 3.3 minima: p1 70 ≥ 2.2 × 22 = 48.4; p2 80 ≥ 52.8; e1 45 ≥ 26.4; e2 50 ≥ 26.4; a grid has no staggered pairs; not exposed: no maxima", () => {
    expect([ruleOf(report, "min-pitch").value_mm, ruleOf(report, "min-pitch").limit_mm]).toEqual([70, 2.2 * 22]);
    expect(ruleOf(report, "min-gauge").value_mm).toBe(80);
    expect(ruleOf(report, "min-end-distance").value_mm).toBe(45);
    expect(ruleOf(report, "min-edge-distance").value_mm).toBe(50);
    expect(report.checks.some((c) => c.id.startsWith("min-stagger") || c.id.startsWith("max-"))).toBe(false);
  });

  it("efficiency = 1050.39 / min(4160 × 355/1.0, 0.9 × 4160 × 470/1.25 = 1407.74) = 0.746; every check passes", () => {
    expect(kN(report.unperforatedStrength_N)).toBeCloseTo(1407.744, 3);
    expect(report.efficiency).toBeCloseTo(1050.39 / 1407.744, 4);
    expect(report.pass).toBe(true);
    expect(report.code).toBe("en1993-1-8");
  });
});

describe("3.7 group rule, both branches", () => {
  it("some Fv,Rd < Fb,Rd — n × the least: 10.9 bolts (one plane 98 kN) on 8 mm covers, Fb,Rd ≥ 150.4 × 45/66 = 102.55 kN → 9 × 98 = 882 kN; main plate 2 × 98 = 196 < 227.88 → 9 × 196 = 1764 kN", () => {
    const { report } = run(variant({ plates: { cover: { thickness: 8 } }, bolts: { class: "10.9" } }));
    expect(kN(strength(report, "bearing:coverA:A").resistance_N)).toBeCloseTo(9 * 98, 6);
    expect(kN(strength(report, "bearing:mainA:A").resistance_N)).toBeCloseTo(1764, 6);
  });
  it("every Fv,Rd ≥ Fb,Rd — the sum: 8.8 bolts on 5 mm covers, Fb,Rd = 94.0 × 45/66 = 64.09 at the end line, 94.0 × (70/66 − 0.25) = 76.20 elsewhere, all ≤ 94.08 → 3 × 64.09 + 6 × 76.20 = 649.45 kN", () => {
    const { report } = run(variant({ plates: { cover: { thickness: 5 } } }));
    const c = strength(report, "bearing:coverA:A");
    expect(kN(c.resistance_N)).toBeCloseTo(3 * 94.0 * (45 / 66) + 6 * 94.0 * (70 / 66 - 0.25), 6);
    expect(kN(c.resistance_N)).toBeCloseTo(649.45, 2);
  });
});

describe("single lap joints with one transverse line (3.6.1(10))", () => {
  const oneLine = lap({ width: 150, thickness: 8, grade: "S275" }, 150, { size: "M20", class: "10.9" }, { pattern: "grid", across: 2, along: 1, gauge: 70, end_distance: 50 });
  it("Fb,Rd = 2.5 × (50/66) × 410 × 20 × 8/1.25 = 99.39 kN is limited to 1.5 × 410 × 20 × 8/1.25 = 78.72 kN; Fv,Rd 98 ≥ 78.72 → ΣFb,Rd = 157.44 kN governs", () => {
    const { report } = run(oneLine);
    const c = strength(report, "bearing:mainA:J");
    expect(kN(c.resistance_N)).toBeCloseTo(2 * 78.72, 6);
    expect(report.governing).toMatch(/^bearing:/);
    expect(kN(report.jointStrength_N)).toBeCloseTo(157.44, 6);
  });
  it("washers under head and nut are required: a warning, and the clause on the check", () => {
    const { report } = run(oneLine);
    expect(report.warnings.map((w) => w.id)).toContain("single-lap-one-line");
    expect(strength(report, "bearing:mainB:J").citation.also).toContain("3.6.1(10), Eq. (3.2)");
  });
  it("with two transverse lines the limit does not apply", () => {
    const { report } = run(variant({ layout: { along: 2, pitch: 60 } }, oneLine));
    expect(report.warnings.map((w) => w.id)).not.toContain("single-lap-one-line");
    expect(strength(report, "bearing:mainA:J").resistance_N).toBeGreaterThan(2 * 78.72e3);
  });
});

describe("packing (3.6.1(12)) and long joints (3.8)", () => {
  it("single cover, 16 → 24 mm with 8 mm packing under the thinner plate: βp = 9 × 20/(160 + 24) = 0.978 on side A only", () => {
    const { report } = run(variant({ splice: { type: "butt-single-cover" }, plates: { main_b: { width: 260, thickness: 24, grade: "S355" }, cover: { thickness: 16 } }, load: { factored_tension: 600 } }));
    expect(kN(strength(report, "bolt-shear:A").resistance_N)).toBeCloseTo(9 * 94.08 * (180 / 184), 6);
    expect(kN(strength(report, "bolt-shear:B").resistance_N)).toBeCloseTo(9 * 94.08, 6);
    expect(report.warnings.map((w) => w.id)).toContain("packing");
  });
  it("1 across × 8 along at 60 mm: Lj = 420 > 15d = 300 → βLf = 1 − 120/4000 = 0.97; 8 × 2 × 94.08 × 0.97 = 1460.1 kN", () => {
    const { report } = run(variant({ layout: { across: 1, along: 8, pitch: 60, gauge: undefined } }));
    expect(kN(strength(report, "bolt-shear:A").resistance_N)).toBeCloseTo(8 * 188.16 * 0.97, 6);
    expect(report.warnings.map((w) => w.id)).toContain("long-joint");
  });
});

describe("preloaded bolts: Categories B and C (3.4.1, 3.9.1)", () => {
  const preloaded = (slipAt: "service" | "ultimate") =>
    variant({ bolts: { class: "10.9", type: "friction-grip", slip_factor: 0.4, slip_at: slipAt }, load: { service_tension: 600 } });
  it("Category B: Fs,Rd,ser = 2 × 0.4 × 0.7 × 1000 × 245/1.10 = 124.73 kN; 9 bolts = 1122.5 kN vs 600 kN at service; bolt shear still checked", () => {
    const { report } = run(preloaded("service"));
    const slip = strength(report, "slip:A");
    expect(slip.limitState).toBe("SLS");
    expect(kN(slip.resistance_N)).toBeCloseTo(9 * 124.7273, 3);
    expect(kN(slip.demand_N)).toBe(600);
    expect(kN(strength(report, "bolt-shear:A").resistance_N)).toBeCloseTo(9 * 196, 6);
    expect(kN(strength(report, "net-section:mainA").resistance_N)).toBeCloseTo(1050.39, 2);
  });
  it("Category C: Fs,Rd = 2 × 0.4 × 171.5/1.25 = 109.76 kN; 9 bolts = 987.84 kN governs; net section Anet·fy/γM0 = 3104 × 355 = 1101.92 kN; no bolt-shear check", () => {
    const { report } = run(preloaded("ultimate"));
    expect(kN(strength(report, "slip:A").resistance_N)).toBeCloseTo(987.84, 6);
    expect(strength(report, "slip:A").limitState).toBe("ULS");
    expect(kN(strength(report, "net-section:mainA").resistance_N)).toBeCloseTo(1101.92, 6);
    expect(report.checks.some((c) => c.kind === "bolt-shear")).toBe(false);
    expect(report.checks.some((c) => c.kind === "bolt-bearing")).toBe(true);
    expect(report.governing).toBe("slip:A");
  });
  it("Category C efficiency is against A·fy/γM0 = 1476.8 kN, so it never exceeds 1: 987.84/1476.8 = 0.669", () => {
    const { report } = run(preloaded("ultimate"));
    expect(report.efficiency).toBeCloseTo(987.84 / 1476.8, 6);
  });
});

describe("M12 bolts in 2 mm clearance holes (3.6.1(5))", () => {
  const small = (clearance: 1 | 2) =>
    lap({ width: 100, thickness: 8, grade: "S275" }, 80, { size: "M12", class: "8.8" }, { pattern: "grid", across: 2, along: 2, pitch: 40, gauge: 45, end_distance: 30 }, { small_bolt_clearance: clearance });
  it("Fv,Rd of M12 8.8 in 14 mm holes = 0.85 × 0.6 × 800 × 84.3/1.25 = 27.5 kN (EN 1993-1-8 Table 3.4 × 0.85; ArcelorMittal bolt resistance tables, class 8.8, M12: 27.5 kN)", () => {
    const { report, joint } = run(small(2));
    expect(joint.holes[0]!.across_mm).toBe(14);
    expect(kN(strength(report, "bolt-shear:J").resistance_N) / 4).toBeCloseTo(27.5, 1);
    expect(kN(strength(report, "bolt-shear:J").resistance_N)).toBeCloseTo(4 * 0.85 * 0.6 * 800 * 84.3 / 1.25 / 1000, 9);
  });
  it("shear-governed (8 mm plies): Fb,Rd of every bolt 55.3–56.2 kN > Fv,Rd 27.5 kN, so the 2 mm holes are refused with the reason", () => {
    const { report } = run(small(2));
    // bearing, S275 fu 410, d0 14, e2 27.5: k1 = 2.5; Fb,Rd = 2.5 × 410 × 12 × 8/1.25 × αb = 78.72 × (30/42) = 56.23 (end bolts),
    // 78.72 × (40/42 − 0.25) = 55.29 (inner): the worst ratio is an end bolt, 56.23 / 27.52
    const cond = strength(report, "small-bolt-holes:J");
    expect(cond.loadRatio).toBe(0);
    expect(kN(cond.demand_N)).toBeCloseTo(78.72 * (30 / 42), 2);
    expect(kN(cond.resistance_N)).toBeCloseTo(0.85 * 0.6 * 800 * 84.3 / 1.25 / 1000, 6);
    expect(cond.pass).toBe(false);
    expect(cond.substituted).toMatch(/shear would govern/);
    expect(report.pass).toBe(false);
  });
  it("bearing-governed (5 mm plies, e1 20, p1 32): Fb,Rd 23.43 (end) and 25.19 kN (inner) ≤ Fv,Rd 27.52 kN: allowed", () => {
    const { report } = run(lap({ width: 100, thickness: 5, grade: "S275" }, 60, { size: "M12", class: "8.8" }, { pattern: "grid", across: 2, along: 2, pitch: 32, gauge: 45, end_distance: 20 }, { small_bolt_clearance: 2 }));
    // αd = 20/42 = 0.4762 (end), 32/42 − 0.25 = 0.5119 (inner); k1 = min(2.8 × 27.5/14 − 1.7, 1.4 × 45/14 − 1.7, 2.5) = 2.5;
    // Fb,Rd = 2.5 × αd × 410 × 12 × 5/1.25 = 23.43 / 25.19 kN (Table 3.4)
    const cond = strength(report, "small-bolt-holes:J");
    expect(kN(cond.demand_N)).toBeCloseTo(2.5 * (32 / 42 - 0.25) * 410 * 12 * 5 / 1.25 / 1000, 6);
    expect(cond.pass).toBe(true);
    expect(report.pass).toBe(true);
  });
  it("class 4.6 M12 in 2 mm holes: no 0.85, but the condition still applies", () => {
    const text = lap({ width: 100, thickness: 8, grade: "S275" }, 40, { size: "M12", class: "4.6" }, { pattern: "grid", across: 2, along: 2, pitch: 40, gauge: 45, end_distance: 30 }, { small_bolt_clearance: 2 });
    const { report } = run(text);
    // Fv,Rd = 0.6 × 400 × 84.3/1.25 = 16.19 kN (ArcelorMittal class 4.6 table, M12: 16.2 kN); Fb,Rd 56.23 > 16.19: refused
    expect(kN(strength(report, "bolt-shear:J").resistance_N) / 4).toBeCloseTo(16.2, 1);
    expect(strength(report, "small-bolt-holes:J").pass).toBe(false);
  });
  it("13 mm holes: no 0.85 and no condition", () => {
    const { report, joint } = run(small(1));
    expect(joint.holes[0]!.across_mm).toBe(13);
    expect(kN(strength(report, "bolt-shear:J").resistance_N)).toBeCloseTo(4 * 32.3712, 3);
    expect(report.checks.some((c) => c.id.startsWith("small-bolt-holes"))).toBe(false);
  });
});

describe("staggered holes, EN 1993-1-1 6.2.2.2", () => {
  it("200 × 12 S355 lap, staggered 2/1 across at g 60, s 40, M20: least path −60 → 0 → 60: 200 − 66 + 2 × 40²/(4 × 60) = 147.33 mm; Nu,Rd = 0.9 × 1768 × 470/1.25 = 598.3 kN", () => {
    const { report } = run(lap({ width: 200, thickness: 12, grade: "S355" }, 300, { size: "M20", class: "8.8" }, { pattern: "staggered", across: 2, along: 4, pitch: 40, gauge: 60, end_distance: 40 }));
    const c = strength(report, "net-section:mainA");
    expect(kN(c.resistance_N)).toBeCloseTo((0.9 * ((200 - 66 + (2 * 1600) / 240) * 12) * 470) / 1.25 / 1000, 6);
    expect(kN(c.resistance_N)).toBeCloseTo(598.3, 1);
    // Table 3.3 note 5: p2 = 60 ≥ 1.2 d0 = 26.4 with L = √(40² + 60²) = 72.1 ≥ 2.4 d0 = 52.8; on a gauge line 2s = 80 ≥ 48.4
    expect(ruleOf(report, "min-stagger-distance").value_mm).toBeCloseTo(Math.hypot(40, 60), 9);
    expect(ruleOf(report, "min-stagger-gauge").value_mm).toBe(60);
    expect(ruleOf(report, "min-pitch").value_mm).toBe(80);
  });
});

describe("Table 3.3 maxima, exposed to corrosion", () => {
  it("the demo exposed: e ≤ 4 × 10 + 40 = 80; p1,0 ≤ min(14 × 10, 200) = 140 (across the butt 2 × 50 + 10 = 110); p2 80 ≤ 140 — all pass", () => {
    const { report } = run(variant({ options: { exposed_to_corrosion: true } }));
    expect(ruleOf(report, "max-edge-distance").limit_mm).toBe(80);
    expect(ruleOf(report, "max-edge-line-pitch").value_mm).toBe(110);
    expect(ruleOf(report, "max-edge-line-pitch").limit_mm).toBe(140);
    expect(ruleOf(report, "max-pitch").limit_mm).toBe(280);
    expect(ruleOf(report, "max-spacing").value_mm).toBe(80);
    expect(report.pass).toBe(true);
  });
  it("with 6 mm covers the pitch across the butt, 110 mm, exceeds min(14 × 6, 200) = 84 mm: fails", () => {
    const { report } = run(variant({ plates: { cover: { thickness: 6 } }, options: { exposed_to_corrosion: true }, load: { factored_tension: 500 } }));
    const r = ruleOf(report, "max-edge-line-pitch");
    expect([r.value_mm, r.limit_mm, r.pass]).toEqual([110, 84, false]);
    expect(report.pass).toBe(false);
  });
});

describe("scenario settings: national-annex factors and the steel-strength convention", () => {
  it("γM2 1.10 (a national annex): Nu,Rd = 0.9 × 3104 × 470/1.10 = 1193.63 kN, stated on the sheet", () => {
    const { report } = run(variant({ factors: { gamma_m2: 1.1 } }));
    expect(kN(strength(report, "net-section:mainA").resistance_N)).toBeCloseTo(1193.63, 2);
    expect(report.conventions.some((c) => c.includes("γM2 1.10") && c.includes("national annex"))).toBe(true);
  });
  it("γM0 1.05: Npl,Rd = 4160 × 355/1.05 = 1406.48 kN", () => {
    const { report } = run(variant({ factors: { gamma_m0: 1.05 } }));
    expect(kN(strength(report, "gross-yield:mainA").resistance_N)).toBeCloseTo(1406.476, 3);
  });
  it("EN 1993-1-1 Table 3.1 instead of EN 10025-2: S355 fu 510 → Nu,Rd = 0.9 × 3104 × 510/1.25 = 1139.79 kN", () => {
    const { report, joint } = run(variant({ options: { steel_strengths: "en1993-1-1" } }));
    expect(joint.plates[0]!.fu_MPa).toBe(510);
    expect(kN(strength(report, "net-section:mainA").resistance_N)).toBeCloseTo(1139.789, 3);
    expect(report.conventions.some((c) => c.includes("EN 1993-1-1 Table 3.1"))).toBe(true);
  });
  it("a code bound to Category A serves a Category B scenario exactly as its own binding does (only Category C changes the plate-only methods)", () => {
    const { code: bearingCode } = parseScenario(DEMO);
    const text = variant({ bolts: { class: "10.9", type: "friction-grip", slip_factor: 0.4, slip_at: "service" }, load: { service_tension: 600 } });
    const own = run(text);
    const viaA = checkScenario(own.scenario, bearingCode).report;
    expect(viaA.checks.map((c) => [c.id, c.utilisation])).toEqual(own.report.checks.map((c) => [c.id, c.utilisation]));
    expect(viaA.efficiency).toBe(own.report.efficiency);
    const catC = parseScenario(variant({ bolts: { class: "10.9", type: "friction-grip", slip_factor: 0.4, slip_at: "ultimate" } })).scenario;
    expect(() => checkScenario(requireCheckable(catC, bearingCode), bearingCode)).toThrow(/bound to other settings/);
  });
  it("a code object bound to other settings refuses the scenario (an internal error, never a wrong answer)", () => {
    const { code } = parseScenario(DEMO);
    const { scenario } = parseScenario(variant({ factors: { gamma_m2: 1.1 } }));
    expect(() => checkScenario(requireCheckable(scenario, code), code)).toThrow(/bound to other settings/);
  });
});

describe("bad input: one line naming the field and the reason", () => {
  it.each([
    [{ plates: { main: { grade: "E250" } } }, /^plates\.main\.grade: unknown EN 10025 grade "E250"/],
    [{ bolts: { class: "4.6", type: "friction-grip", slip_factor: 0.4, slip_at: "ultimate" } }, /^bolts\.class: preloaded bolts must be class 8\.8 or 10\.9/],
    [{ bolts: { class: "8.8", type: "friction-grip", slip_factor: 0.6, slip_at: "ultimate" } }, /^bolts\.slip_factor: 0\.6 exceeds 0\.5/],
    [{ bolts: { type: "friction-grip", slip_factor: 0.4, slip_at: "service" } }, /^load\.service_tension: required for Category B/],
    [{ bolts: { hole: "long-slot", slot_direction: "along" } }, /^bolts\.slot_direction: .*slots along the force/],
    [{ options: { bolt_net_area: "0.78-gross" } }, /^options\.bolt_net_area: EN 1993-1-8 Table 3\.4 uses the tensile stress area/],
    [{ options: { bolt_strength: "minimum" } }, /^options\.bolt_strength: EN 1993-1-8 Table 3\.1 gives the nominal fub/],
    [{ options: { small_bolt_clearance: 3 } }, /^options\.small_bolt_clearance: must be 1 or 2/],
    [{ factors: { gamma_m2: 0.9 } }, /^factors\.gamma_m2: must be at least 1\.0/],
    [{ factors: { gamma_m5: 1.0 } }, /^factors\.gamma_m5: unknown field/],
    [{ options: { steel_strengths: "en1993-1-1" }, plates: { main: { thickness: 90 } } }, /^plates\.main\.thickness: 90 mm is thicker than 80 mm/],
  ])("%o", (changes, message) => {
    expect(inputError(variant(changes))).toMatch(message);
  });
  it("settings of EN 1993-1-8 under IS 800:2007 are refused, not ignored", () => {
    const is800 = readFileSync(scenarioPath("footbridge-tie.yaml"), "utf8");
    expect(inputError(variant({ factors: { gamma_m0: 1.0 } }, is800))).toMatch(/^factors: not read by is800-2007 \(a setting of en1993-1-8\)/);
    expect(inputError(variant({ options: { steel_strengths: "en10025-2" } }, is800))).toMatch(/^options\.steel_strengths: not read by is800-2007/);
  });
  it("IS 800 scenarios keep their defaults (0.78 × gross area, ISO 898-1 minimum strengths)", () => {
    const { scenario } = parseScenario(readFileSync(scenarioPath("footbridge-tie-search.yaml"), "utf8"));
    expect([scenario.options.boltNetArea, scenario.options.boltStrength]).toEqual(["0.78-gross", "minimum"]);
    const ec3 = parseScenario(DEMO).scenario;
    expect([ec3.options.boltNetArea, ec3.options.boltStrength]).toEqual(["iso-stress-area", "nominal"]);
  });
});
