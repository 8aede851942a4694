/**
 * The summary every output opens with: verdict, factored load against the joint design strength, the
 * strength utilisation (ultimate) and the service utilisation (slip at service) kept apart from the
 * detailing rules and conditions, and twins printed once. The numbers are worked by hand beside each
 * check from the clauses cited; the scenarios are the bundled invented demos and small variants.
 */
import { readFileSync } from "node:fs";
import { parse, stringify } from "yaml";
import { describe, expect, it } from "vitest";
import { checkScenario } from "../src/engine/check.js";
import { parseScenario, requireCheckable } from "../src/io/scenario.js";
import type { CheckResult, StrengthCheck } from "../src/model/results.js";
import { detailingState, strengthFigures, summarise, summaryRows } from "../src/report/summary.js";
import { foldTwins } from "../src/report/twins.js";
import { cli, scenarioPath, tempScenario } from "./helpers/cli.js";

function run(text: string) {
  const { scenario, code } = parseScenario(text);
  const checkable = requireCheckable(scenario, code);
  return { ...checkScenario(checkable, code), scenario: checkable };
}
const demo = (name: string) => readFileSync(scenarioPath(name), "utf8");
const DEMOS = ["footbridge-tie.yaml", "mezzanine-hanger.yaml", "truss-chord-staggered.yaml", "sports-hall-chord-ec3.yaml", "canopy-tie-us.yaml"];

describe("strength utilisation = factored tension / joint design strength", () => {
  it("footbridge tie: 620 / 727.37 = 0.8524 — the net section of the main plate governs (IS 800:2007 cl. 6.3.1: Tdn = 0.9 × (220 − 3 × 22) × 16 × 410 / 1.25 = 727.37 kN)", () => {
    const { report, scenario } = run(demo("footbridge-tie.yaml"));
    const f = strengthFigures(scenario, report);
    expect(report.jointStrength_N / 1000).toBeCloseTo((0.9 * (220 - 3 * 22) * 16 * 410) / 1.25 / 1000, 6);
    expect(f.strengthUtilisation).toBeCloseTo(620 / 727.3728, 4);
    expect(f.service).toBeNull();
  });

  it.each(DEMOS)("%s: it is the highest demand/resistance of the loaded ultimate checks, and no rule enters it", (name) => {
    const { report, scenario } = run(demo(name));
    const loaded = report.checks.filter((c): c is StrengthCheck => c.type === "strength" && c.limitState === "ULS" && c.loadRatio > 0);
    const highest = Math.max(...loaded.map((c) => c.demand_N / c.resistance_N));
    expect(strengthFigures(scenario, report).strengthUtilisation).toBeCloseTo(highest, 9);
    const d = detailingState(report);
    expect(d.total).toBeGreaterThan(0);
    expect(d.passing).toBe(d.total);
  });

  it("an end distance at its minimum is a rule at its limit, not a strength utilisation of 1: mezzanine hanger with e = 1.5 d0 = 27 mm (IS 800:2007 cl. 10.2.4.2, d0 = 18 mm for M16, Table 19)", () => {
    const text = demo("mezzanine-hanger.yaml").replace("end_distance: 35", "end_distance: 27");
    const { report, scenario } = run(text);
    // Bolt shear governs: 6 × 400/√3 × 0.78 × π × 16²/4 / 1.25 = 6 × 28.98 = 173.85 kN (cl. 10.3.3);
    // bearing with kb = 27/54 = 0.5: 6 × 2.5 × 0.5 × 16 × 10 × 410 / 1.25 = 393.6 kN (cl. 10.3.4).
    const Vdsb = ((400 / Math.sqrt(3)) * 0.78 * Math.PI * 64) / 1.25;
    expect(report.jointStrength_N).toBeCloseTo(6 * Vdsb, 0);
    expect(report.maxUtilisation).toBeCloseTo(1, 6); // the old mixed figure: the rule at its limit
    const s = summarise(scenario, report);
    expect(s.strengthUtilisation).toBeCloseTo(150_000 / (6 * Vdsb), 4);
    expect(s.detailing.failures).toEqual([]);
    expect(s.detailing.tightest?.checkKind).toBe("min-end-distance");
    expect(s.detailing.tightest?.margin_mm).toBeCloseTo(0, 9);
    const row = summaryRows(s).find((r) => r.key === "detailing")!;
    expect(row.detail.join(" ")).toMatch(/Minimum end distance.*27 mm ≥ 27 mm, at the limit/);
  });

  it("a failing rule is named with how far it is beyond its limit; the strength utilisation stays below 1 (pitch 38 mm < 2.5 × 16 = 40 mm, cl. 10.2.2)", () => {
    const { report, scenario } = run(demo("mezzanine-hanger.yaml").replace("pitch: 50", "pitch: 38"));
    const s = summarise(scenario, report);
    expect(s.pass).toBe(false);
    expect(s.strengthUtilisation).toBeLessThan(1);
    expect(s.detailing.failures.map((f) => f.checkKind)).toContain("min-spacing");
    const f = s.detailing.failures.find((x) => x.checkKind === "min-spacing")!;
    expect(f.margin_mm).toBeCloseTo(-2, 9);
    expect(summaryRows(s).find((r) => r.key === "detailing")!.detail.join(" ")).toMatch(/38 mm < 40 mm, 2 mm short/);
  });

  it("a condition that sets no load (EN 1993-1-8 3.6.1(5), M12 in 2 mm holes, shear-governed) counts with the detailing, never in the strength utilisation", () => {
    const text = stringify({
      name: "invented lap splice",
      code: "en1993-1-8",
      splice: { type: "lap" },
      plates: { main: { width: 100, thickness: 8, grade: "S275" } },
      load: { factored_tension: 80 },
      bolts: { size: "M12", class: "8.8" },
      layout: { pattern: "grid", across: 2, along: 2, pitch: 40, gauge: 45, end_distance: 30 },
      options: { small_bolt_clearance: 2 },
    });
    const { report, scenario } = run(text);
    // Fv,Rd = 0.85 × 0.6 × 800 × 84.3 / 1.25 = 27.52 kN per bolt (Table 3.4, 3.6.1(5)); 4 bolts = 110.07 kN governs.
    const FvRd = (0.85 * 0.6 * 800 * 84.3) / 1.25;
    expect(report.jointStrength_N).toBeCloseTo(4 * FvRd, 3);
    const s = summarise(scenario, report);
    expect(s.strengthUtilisation).toBeCloseTo(80_000 / (4 * FvRd), 6);
    expect(s.strengthChecks.failures).toEqual([]);
    expect(s.detailing.failures.map((f) => f.id)).toEqual(["small-bolt-holes:J"]);
    expect(s.detailing.failures[0]!.kind).toBe("condition");
    expect(s.verdict).toBe("FAIL");
    const j = JSON.parse(cli(["check", tempScenario(text), "--json"]).stdout);
    expect(j.strengthUtilisation).toBeCloseTo(80 / 110.07, 3);
    expect(j.detailing.failures.map((f: { id: string }) => f.id)).toEqual(["small-bolt-holes:J"]);
  });

  it("service utilisation: truss chord, friction grip with slip at service — 540 kN / (10 × 0.48 × 1 × 1 × 0.7 × 1040 × 245.0 / 1.10) = 540 / 778.4 = 0.694 (IS 800:2007 cl. 10.4.3; Anb = 0.78 × π × 20²/4 = 245.0 mm²)", () => {
    const { report, scenario } = run(demo("truss-chord-staggered.yaml"));
    const f = strengthFigures(scenario, report);
    const slip = (10 * 0.48 * 0.7 * 1040 * 0.78 * Math.PI * 100) / 1.1;
    expect(f.service).not.toBeNull();
    expect(f.service!.resistance_N).toBeCloseTo(slip, 0);
    expect(f.service!.utilisation).toBeCloseTo(540_000 / slip, 4);
    // The ultimate figure is a different number: 780 / the least ultimate strength.
    expect(f.strengthUtilisation).toBeCloseTo(780_000 / report.jointStrength_N, 9);
    expect(f.strengthUtilisation).not.toBeCloseTo(f.service!.utilisation, 2);
  });
});

describe("twins: the same check on each side or both covers prints once, the JSON keeps every check", () => {
  it("footbridge tie (symmetric butt, two equal covers): 32 checks (31 of the parts and the cl. 10.7 minimum design action) fold to fewer, bearing on the covers once for all four", () => {
    const { report } = run(demo("footbridge-tie.yaml"));
    const folded = foldTwins(report.checks);
    expect(report.checks).toHaveLength(32);
    expect(folded.length).toBeLessThan(report.checks.length);
    expect(folded.flatMap((f) => f.members.map((m) => m.id)).sort()).toEqual(report.checks.map((c) => c.id).sort());
    const coverBearing = folded.find((f) => f.check.kind === "bolt-bearing" && f.component.includes("cover"))!;
    expect(coverBearing.component).toBe("both cover plates, each side");
    expect(coverBearing.members).toHaveLength(4);
    expect(folded.find((f) => f.check.kind === "bolt-shear")!.component).toBe("bolts, each side");
    expect(folded.find((f) => f.check.kind === "bolt-bearing" && f.component.includes("main"))!.component).toBe("both main plates");
    const sheet = cli(["check", scenarioPath("footbridge-tie.yaml")]).stdout;
    expect(sheet).toContain("Bolt bearing · both cover plates, each side");
    expect(sheet).not.toContain("cover plate B, side B");
    const json = JSON.parse(cli(["check", scenarioPath("footbridge-tie.yaml"), "--json"]).stdout);
    expect(json.checks).toHaveLength(32);
  });

  it("no fold where the figures differ: the truss chord's sides carry different packing (βpkg), so bolt shear prints for side A and side B", () => {
    const { report } = run(demo("truss-chord-staggered.yaml"));
    const shear = foldTwins(report.checks).filter((f) => f.check.kind === "bolt-shear");
    expect(shear.map((f) => f.component)).toEqual(["bolts, side A", "bolts, side B"]);
  });

  it("one changed figure stops a fold", () => {
    const { report } = run(demo("footbridge-tie.yaml"));
    const checks: CheckResult[] = report.checks.map((c) => ({ ...c, substituted: c.substituted, notes: c.notes }));
    const i = checks.findIndex((c) => c.id.startsWith("bolt-shear") && c.component.endsWith("side B"));
    checks[i] = { ...checks[i]!, substituted: `${checks[i]!.substituted} (changed)` } as CheckResult;
    const shear = foldTwins(checks).filter((f) => f.check.kind === "bolt-shear");
    expect(shear.map((f) => f.component)).toEqual(["bolts, side A", "bolts, side B"]);
  });

  it("unequal covers do not fold with each other (a cover_b of another thickness)", () => {
    const file = parse(demo("footbridge-tie.yaml")) as Record<string, Record<string, unknown>>;
    file.plates!.cover_b = { width: 220, thickness: 12, grade: "E250", edges: "machine-flame-cut" };
    const { report } = run(stringify(file));
    const bearing = foldTwins(report.checks).filter((f) => f.check.kind === "bolt-bearing" && f.component.includes("cover"));
    expect(bearing.map((f) => f.component).sort()).toEqual(["cover plate A, each side", "cover plate B, each side"]);
  });
});
