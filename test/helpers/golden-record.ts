/**
 * The golden record of the checker: for every demo scenario and a fixed-seed set of generated
 * scenarios (invented data; all three codes, lap and butt, tension, compression and reversal), the
 * full check results — every check's numbers and every text, read through the lazy getters so the
 * text is guarded too — and, for the search demos, the search's best layouts.
 *
 * test/golden.test.ts compares it with test/fixtures/golden/checks.json.gz; scripts/make-golden.mjs
 * rewrites that file from the current code (only for an intended change of results).
 */
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { parse, stringify } from "yaml";
import { checkScenario } from "../../src/engine/check.js";
import { parseCostTable } from "../../src/io/costs.js";
import { parseScenario, requireCheckable } from "../../src/io/scenario.js";
import type { Joint } from "../../src/model/joint.js";
import type { CheckReport, CheckResult } from "../../src/model/results.js";
import { searchLayouts } from "../../src/search/search.js";
import { ROOT } from "./cli.js";
import { aiscScenario, ec3Scenario, rng, smallSearchScenario } from "./generate.js";

type Rec = Record<string, unknown>;
const costs = parseCostTable(readFileSync(join(ROOT, "catalogue/costs.yaml"), "utf8"), "catalogue");

/** Generated scenarios per design code. */
export const GENERATED_PER_CODE = 70;
export const GOLDEN_SEED = 16_2026;

const pick = <T>(r: () => number, xs: readonly T[]): T => xs[Math.floor(r() * xs.length)]!;

/** Non-finite numbers as text, so the record survives JSON to the last digit. */
export function normalised(value: unknown): Rec {
  return JSON.parse(JSON.stringify(value, (_k, v) => (typeof v === "number" && !Number.isFinite(v) ? `number:${v}` : v)));
}

const CHECK_FIELDS = [
  "type", "id", "kind", "title", "component", "citation", "formula", "substituted", "limitState", "sense",
  "demand_N", "resistance_N", "loadRatio", "value_mm", "limit_mm", "bound", "utilisation", "pass", "notes",
];

/** Every field of a check, read by name (the lazy text is read here, like a report writer reads it). */
function checkRecord(c: CheckResult): Rec {
  const out: Rec = {};
  const byName = c as unknown as Rec;
  for (const k of CHECK_FIELDS) if (byName[k] !== undefined) out[k] = byName[k];
  return out;
}

const REPORT_FIELDS = [
  "code", "codeTitle", "jointStrength_N", "governing", "senses", "strengthBySense", "efficiency", "efficiencyDefinition",
  "unperforatedStrength_N", "maxUtilisation", "pass", "warnings", "conventions",
];

function reportRecord(report: CheckReport): Rec {
  const out: Rec = {};
  const byName = report as unknown as Rec;
  for (const k of REPORT_FIELDS) if (byName[k] !== undefined) out[k] = byName[k];
  out.checks = report.checks.map(checkRecord);
  return out;
}

function holesRecord(joint: Joint): unknown[] {
  return joint.holes.map((h) => [h.group, h.x_mm, h.y_mm, h.along_mm]);
}

/** A generated scenario with a layout to check in place of its search block. */
function checkableVariant(generated: string, seed: number): string {
  const r = rng(seed * 7919 + 13);
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  const s: any = parse(generated);
  const us = s.units === "us";
  const search = s.search;
  delete s.search;
  const size = pick(r, search.sizes);
  const friction = s.bolts?.type === "friction-grip";
  s.bolts = friction ? { ...s.bolts, size } : { size, class: pick(r, search.classes), type: "bearing", ...(r() < 0.5 ? { threads_in_shear_planes: r() < 0.5 } : {}) };
  if (!friction && !us && r() < 0.15) s.bolts.hole = pick(r, ["oversize", "short-slot"]);
  if (s.bolts.hole === "short-slot") s.bolts.slot_direction = pick(r, ["along", "across"]);
  const pattern = pick(r, ["grid", "grid", "staggered", "tapered"]);
  const along = 1 + Math.floor(r() * 4);
  const mm = (v: number) => (us ? `${(v / 25.4).toFixed(3)} in` : v);
  const width_mm = Math.min(...Object.values(s.plates as Record<string, { width: number }>).map((p) => (us ? p.width * 25.4 : p.width)));
  const across = pattern === "staggered" ? 2 + Math.floor(r() * 3) : pattern === "tapered" ? 3 : 1 + Math.floor(r() * 4);
  // A gauge that keeps the holes on the plate (about 25 mm to each edge).
  const gauge_mm = Math.min(pick(r, [35, 45, 55, 65]), Math.floor((width_mm - 50) / Math.max(1, across - 1)));
  const layout: Rec = { pattern, pitch: mm(pick(r, [40, 50, 60, 70, 80])), end_distance: mm(pick(r, [25, 30, 35, 40, 50])) };
  if (across > 1) layout.gauge = mm(gauge_mm);
  if (pattern === "tapered") layout.across_per_line = Array.from({ length: Math.max(2, along) }, (_, i) => Math.max(1, 3 - i));
  else Object.assign(layout, { across, along: pattern === "staggered" ? Math.max(2, along) : along });
  if (s.splice.type !== "lap") layout.end_distance_at_butt = mm(pick(r, [30, 35, 40, 45]));
  s.layout = layout;
  s.options = { ...s.options, block_shear_load: pick(r, ["share", "full"]), efficiency_basis: pick(r, ["lesser", "rupture", "yield"]) };
  const sense = r();
  const T = s.load.factored_tension;
  if (sense < 0.2) s.load = { factored_compression: T };
  else if (sense < 0.35) s.load = { ...s.load, factored_compression: T };
  if (s.load.factored_compression !== undefined && s.load.service_tension !== undefined) s.load.service_compression = s.load.service_tension;
  if (s.load.factored_compression !== undefined && s.splice.type !== "lap" && r() < 0.5) s.splice.ends_in_contact = r() < 0.5;
  return stringify(s);
}

/** The generated scenarios of the record: name and YAML text. */
export function generatedScenarios(): Array<{ name: string; yaml: string }> {
  const out: Array<{ name: string; yaml: string }> = [];
  const gens: Array<[string, (seed: number) => { yaml: string }]> = [["is800", smallSearchScenario], ["en1993", ec3Scenario], ["aisc360", aiscScenario]];
  for (const [code, gen] of gens) {
    for (let i = 0; i < GENERATED_PER_CODE; i++) {
      const seed = GOLDEN_SEED + i;
      out.push({ name: `generated ${code} ${seed}`, yaml: checkableVariant(gen(seed).yaml, seed) });
    }
  }
  return out;
}

/**
 * One scenario's record: its check (when it has a layout) or the reason it cannot be checked, and for a
 * search demo the best layouts with their checks.
 */
export function scenarioRecord(yamlText: string, withSearch: boolean): Rec {
  let parsed;
  try {
    parsed = parseScenario(yamlText);
  } catch (e) {
    return { error: String((e as Error).message) };
  }
  const { scenario, code } = parsed;
  const out: Rec = {};
  if (scenario.layout) {
    try {
      const { joint, report } = checkScenario(requireCheckable(scenario, code), code);
      out.holes = holesRecord(joint);
      out.report = reportRecord(report);
    } catch (e) {
      out.error = String((e as Error).message);
    }
  }
  if (withSearch) {
    const found = searchLayouts({ scenario, code, costs }, { top: 3, rankBy: "cost" });
    out.search = {
      stats: found.stats,
      results: found.results.map((c) => ({ key: { numbers: c.key.numbers, text: c.key.text }, counts: c.counts, cost: c.cost.total, holes: holesRecord(c.joint), report: reportRecord(c.report) })),
    };
  }
  return normalised(out);
}

/** The whole record: demos by file name, then the generated scenarios. */
export function goldenRecord(): Record<string, Rec> {
  const scenariosDir = join(ROOT, "scenarios");
  const record: Record<string, Rec> = {};
  for (const file of readdirSync(scenariosDir).sort()) {
    if (!file.endsWith(".yaml") || file.includes("project")) continue;
    const text = readFileSync(join(scenariosDir, file), "utf8");
    record[`demo ${file}`] = scenarioRecord(text, /search/.test(file));
  }
  for (const g of generatedScenarios()) record[g.name] = scenarioRecord(g.yaml, false);
  return record;
}
