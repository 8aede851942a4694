/**
 * Citations as printed: one meaning per field, no doubled brackets, the clause that holds the rule.
 * Sources: IS 800:2007 cl. 10.2.4.2 (minimum end and edge distances; Table 19 gives hole clearances);
 * EN 1993-1-1 6.2.3(2)a eq. (6.6), 6.2.3(2)b eq. (6.7); EN 1993-1-8 3.10.2(2) eq. (3.9); AISC 360-16 J3.4
 * with Table J3.4M for metric bolts, J3.8 with Table J3.1M (clause numbers as published; read against the
 * standards' own numbering, from memory where no copy was to hand).
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { checkScenario } from "../src/engine/check.js";
import { parseScenario, requireCheckable } from "../src/io/scenario.js";
import { citationText } from "../src/report/check-json.js";
import { scenarioPath } from "./helpers/cli.js";

const DEMOS = ["footbridge-tie.yaml", "mezzanine-hanger.yaml", "truss-chord-staggered.yaml", "sports-hall-chord-ec3.yaml", "canopy-tie-us.yaml"];
const report = (text: string) => {
  const { scenario, code } = parseScenario(text);
  return checkScenario(requireCheckable(scenario, code), code).report;
};
const labels = (text: string) => new Map(report(text).checks.map((c) => [c.id, citationText(c.citation)]));

describe("no label prints doubled or nested brackets", () => {
  it.each(DEMOS)("%s", (name) => {
    const r = report(readFileSync(scenarioPath(name), "utf8"));
    for (const c of r.checks) {
      const text = citationText(c.citation);
      expect(text, c.id).not.toMatch(/\(\(|\)\)/);
      expect(c.citation.equation ?? "", c.id).not.toMatch(/^Eq\.|with |;/);
    }
  });
});

describe("labels name the clause that holds the rule", () => {
  it("IS 800:2007 minimum end distance: cl. 10.2.4.2 (not Table 19)", () => {
    const l = labels(readFileSync(scenarioPath("footbridge-tie.yaml"), "utf8"));
    expect(l.get("min-end-distance")).toBe("IS 800:2007 cl. 10.2.4.2");
  });
  it("EN 1993-1-1 gross yield and net section; EN 1993-1-8 block tearing", () => {
    const l = labels(readFileSync(scenarioPath("sports-hall-chord-ec3.yaml"), "utf8"));
    expect(l.get("gross-yield:mainA")).toBe("EN 1993-1-1 cl. 6.2.3(2)a, Eq. (6.6)");
    expect(l.get("net-section:mainA")).toBe("EN 1993-1-1 cl. 6.2.3(2)b, Eq. (6.7); with 6.2.2.2 for Anet");
    expect(l.get("block-shear:mainA:A")).toBe("EN 1993-1-8 cl. 3.10.2(2), Eq. (3.9)");
  });
  it("AISC 360-16 metric bolts cite Table J3.4M; inch bolts Table J3.4", () => {
    const us = readFileSync(scenarioPath("canopy-tie-us.yaml"), "utf8");
    expect(labels(us).get("min-end-distance")).toBe("AISC 360-16 Sect. J3.4, Table J3.4");
    const metric = `name: metric AISC tie
code: aisc360-16
splice: { type: butt-double-cover, butt_gap: 10 }
plates: { main: { width: 200, thickness: 12, grade: A572-50 }, cover: { width: 200, thickness: 10, grade: A36 } }
load: { factored_tension: 500 kN }
bolts: { size: M20, class: A325 }
layout: { pattern: grid, across: 2, along: 2, pitch: 75, gauge: 100, end_distance: 40, end_distance_at_butt: 40 }
`;
    expect(labels(metric).get("min-end-distance")).toBe("AISC 360-16 Sect. J3.4, Table J3.4M");
  });
});
