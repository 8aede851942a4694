/**
 * The compression sense reads the bolt-group checks alone from the joint with its bearing directions
 * reversed (DesignCode.checkJoint with scope "bolts"), and a splice in compression alone reads the
 * layout's rules alone from the joint as built (scope "layout"; engine/senses.ts). Each scope must give
 * exactly those checks of the full check, in its order, with the same numbers and text ("layout" also
 * its warnings and conventions), on every generated scenario of the golden record (invented data) in
 * all three codes, as built and with its bearing directions reversed.
 */
import { describe, expect, it } from "vitest";
import { compressionJoint } from "../src/engine/senses.js";
import { buildJoint } from "../src/geometry/joint-builder.js";
import { parseScenario, requireCheckable } from "../src/io/scenario.js";
import type { CheckResult } from "../src/model/results.js";
import { generatedScenarios } from "./helpers/golden-record.js";

const BOLT_KINDS = new Set(["slip", "bolt-shear", "bolt-bearing"]);
const view = (c: CheckResult) => ({ ...c, substituted: c.substituted, notes: c.notes });

describe("checkJoint scopes 'bolts' and 'layout' = those checks of scope 'all'", () => {
  const cases = generatedScenarios().flatMap(({ name, yaml }) => {
    try {
      const { scenario, code } = parseScenario(yaml);
      return scenario.layout ? [{ name, scenario: requireCheckable(scenario, code), code }] : [];
    } catch {
      return []; // a generated scenario the input checks refuse (the golden record keeps its error)
    }
  });
  it("has scenarios of every code to compare", () => {
    for (const id of ["is800-2007", "en1993-1-8", "aisc360-16"]) expect(cases.filter((c) => c.code.id === id).length).toBeGreaterThan(20);
  });
  for (const { name, scenario, code } of cases) {
    it(name, () => {
      const built = buildJoint(scenario, code);
      for (const joint of [built, compressionJoint(built)]) {
        const all = code.checkJoint(joint, scenario).checks.filter((c) => c.type === "strength" && BOLT_KINDS.has(c.kind));
        const bolts = code.checkJoint(joint, scenario, "bolts");
        expect(bolts.checks.length).toBeGreaterThan(0);
        expect(bolts.checks.map(view)).toEqual(all.map(view));
        expect(bolts.warnings).toEqual([]);
        const full = code.checkJoint(joint, scenario);
        const layout = code.checkJoint(joint, scenario, "layout");
        expect(layout.checks.length).toBeGreaterThan(0);
        expect(layout.checks.map(view)).toEqual(full.checks.filter((c) => c.type === "rule").map(view));
        expect(layout.warnings).toEqual(full.warnings);
        expect(layout.conventions).toEqual(full.conventions);
      }
    });
  }
});
