/**
 * The declared search space never loses the optimum: for each code, a brute-force enumeration over a
 * space that reaches three steps past every declared range (pitch, gauge, end distances, edge
 * distances) finds nothing better than the search over the declared space. Where a top is a code
 * maximum (IS 800:2007 cl. 10.2.3, 10.2.4.3; AISC 360-16 J3.5; EN 1993-1-8 Table 3.3 exposed to
 * corrosion) everything past it fails the rule; where it is declared (EN 1993-1-8 not exposed) the
 * range ends at the first step at or beyond the point where the growing terms stop.
 * Scenarios are generated (invented data).
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import type { DesignCode, RangeTop } from "../src/codes/types.js";
import { parseCostTable } from "../src/io/costs.js";
import { parseScenario } from "../src/io/scenario.js";
import { bruteForceLayouts } from "../src/search/brute-force.js";
import { searchLayouts } from "../src/search/search.js";
import { families, rangeTo, resolveSpace } from "../src/search/space.js";
import { ROOT } from "./helpers/cli.js";
import { aiscScenario, ec3Scenario, smallSearchScenario } from "./helpers/generate.js";

const costs = parseCostTable(readFileSync(`${ROOT}/catalogue/costs.yaml`, "utf8"), "catalogue");

/** The same code with every searched range reaching `more_mm` past its top (the checks unchanged). */
function reachingPast(code: DesignCode, more_mm: number): DesignCode {
  const past: RangeTop = { kind: "declared", ruleMax_mm: Infinity };
  return {
    ...code,
    searchLimits: (scenario, d, pattern) => {
      const l = code.searchLimits(scenario, d, pattern);
      return {
        ...l,
        pitchMax_mm: l.pitchMax_mm + more_mm,
        gaugeMax_mm: l.gaugeMax_mm + more_mm,
        endMax_mm: l.endMax_mm + more_mm,
        endAtButtMax_mm: l.endAtButtMax_mm + more_mm,
        edgeMax_mm: l.edgeMax_mm + more_mm,
        tops: { pitch: past, gauge: past, end: past, endAtButt: past },
      };
    },
  };
}

/** One size, one class, at most 2 lines: the brute force past every range stays small. */
function compare(yaml: string) {
  const { scenario, code } = parseScenario(yaml);
  const s = scenario.search!;
  const { maxEndDistance_mm: _narrowing, ...own } = s; // the code's own end range, not the generator's narrowing
  scenario.search = { ...own, sizes_mm: s.sizes_mm!.slice(1), classes: s.classes!.slice(-1), maxAlong: 2 };
  const step = resolveSpace(scenario, code, costs).step_mm;
  const line = (c: { key: { numbers: number[]; text: string } }) => `${c.key.numbers.join(" ")} ${c.key.text}`;
  const declared = searchLayouts({ scenario, code, costs }, { top: 3, rankBy: "cost" }).results.map(line);
  const wider = bruteForceLayouts({ scenario, code: reachingPast(code, 3 * step), costs }, 3, "cost").results.map(line);
  return { declared, wider };
}

describe("range tops: a rule top is never passed, a declared top is reached", () => {
  it("M22 in 24 mm holes on a 5 mm step: 3 d0 = 72 mm is reached at 75 mm; a 119.3 mm rule stops at 115 mm", () => {
    expect(rangeTo(36, 72, { kind: "declared", ruleMax_mm: Infinity }, 5).at(-1)).toBe(75);
    expect(rangeTo(36, 72, { kind: "declared", ruleMax_mm: 73 }, 5).at(-1)).toBe(70);
    expect(rangeTo(36, 119.3, { kind: "rule" }, 5).at(-1)).toBe(115);
  });
  it("IS 800:2007: end distances run to 12 t ε (cl. 10.2.4.3), past 3 d0 where kb stops growing", () => {
    const { scenario, code } = parseScenario(smallSearchScenario(1003).yaml.replace("step: 10", "step: 5").replace(/ *max_end_distance: 60\n/, ""));
    const fams = families(scenario, code, costs, resolveSpace(scenario, code, costs));
    expect(fams.length).toBeGreaterThan(0);
    for (const f of fams) {
      expect(f.ends_mm.at(-1)!).toBeGreaterThan(f.limits.endMax_mm - 5);
      expect(f.ends_mm.at(-1)!).toBeLessThanOrEqual(f.limits.endMax_mm + 1e-9);
      expect(f.ends_mm.at(-1)!).toBeGreaterThan(3 * code.holeDimensions(f.size_mm, "standard", undefined).along_mm);
    }
  });
});

describe("the declared space never loses the optimum (brute force three steps past every range)", () => {
  // Seeds chosen so that every scenario has compliant layouts (an empty answer on both sides proves little).
  it.each([1001, 1007, 1016, 1025, 1031])("IS 800:2007, seed %i", (seed) => {
    const r = compare(smallSearchScenario(seed).yaml);
    expect(r.declared.length).toBeGreaterThan(0);
    expect(r.declared).toEqual(r.wider);
  });
  it.each([3001, 3010, 3022, 3028, 3034])("EN 1993-1-8, seed %i", (seed) => {
    const r = compare(ec3Scenario(seed).yaml);
    expect(r.declared.length).toBeGreaterThan(0);
    expect(r.declared).toEqual(r.wider);
  });
  it.each([4001, 4013, 4019, 4022, 4028])("AISC 360-16, seed %i", (seed) => {
    const r = compare(aiscScenario(seed).yaml);
    expect(r.declared.length).toBeGreaterThan(0);
    expect(r.declared).toEqual(r.wider);
  });
});

describe("an end distance past 3 d0 on a 5 mm step (IS 800:2007 cl. 10.3.4)", () => {
  // Invented lap: 200 × 8 E250, M22 10.9 (d0 24), T = 283 kN. One line of 2 bolts: bearing 2.5·kb·22·8·410/1.25 =
  // 144.3·kb kN a bolt, shear 1040/√3 × 296.5/1.25 = 142.4 kN. At e = 70: kb = 70/72 = 0.972, 2 × 140.3 = 280.6 kN < 283;
  // at e = 75 (3 d0 = 72 reached): kb = 1, 2 × min(144.3, 142.4) = 284.9 kN ≥ 283 — two bolts suffice.
  const yaml = `name: invented lap
code: is800-2007
splice: { type: lap }
plates: { main: { width: 200, thickness: 8, grade: E250 } }
load: { factored_tension: 283 }
search: { sizes: [M22], classes: ["10.9"], step: 5 }
`;
  it("the cheapest layout is 2 bolts at e = 75 mm, which a range floored at 70 mm would miss", () => {
    const { scenario, code } = parseScenario(yaml);
    const best = searchLayouts({ scenario, code, costs }, { top: 1, rankBy: "cost" }).results[0]!;
    expect(best.counts).toEqual([2]);
    expect(best.layout.endDistance_mm).toBe(75);
    expect(best.report.jointStrength_N / 1000).toBeCloseTo(2 * (1040 / Math.sqrt(3)) * (0.78 * Math.PI * 22 ** 2 / 4) / 1.25 / 1000, 6);
  });
});
