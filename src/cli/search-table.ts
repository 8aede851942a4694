/** The search results as a terminal table. */
import Table from "cli-table3";
import { CAUTION } from "../report/check-json.js";
import { resultRow } from "../report/search-json.js";
import type { RankBy } from "../search/ranking.js";
import type { SearchOutcome } from "../search/search.js";
import type { Scenario } from "../model/scenario.js";
import { toUnit } from "../units/units.js";

const fx = (v: number | null, d = 0) => (v === null ? "—" : v.toFixed(d));

/** Display of lengths and forces: mm and kN, or in and kips for a scenario with `units: us`. */
function displayUnits(scenario: Scenario) {
  const us = scenario.units === "us";
  return {
    us,
    len: (mm: number | null) => (mm === null ? "—" : us ? toUnit(mm, "in", "length").toFixed(3).replace(/\.?0+$/, "") : mm.toFixed(0)),
    force: (kN: number) => (us ? toUnit(kN * 1000, "kip", "force").toFixed(1) : kN.toFixed(1)),
    lengthUnit: us ? "in" : "mm",
    forceUnit: us ? "kips" : "kN",
  };
}

export function formatSearch(scenario: Scenario, outcome: SearchOutcome, rankBy: RankBy, currency: string, codeTitle: string, elapsed_ms: number): string {
  const out: string[] = [];
  const butt = scenario.splice.type !== "lap";
  out.push("splicewright — layout search: bolted tension splice");
  out.push(`Scenario: ${scenario.name}${scenario.project ? `   Project: ${scenario.project}` : ""}`);
  out.push(`Code:     ${codeTitle}`);
  const u = displayUnits(scenario);
  out.push(`Load:     factored tension T = ${u.force(scenario.load.factoredTension_N / 1000)} ${u.forceUnit}${scenario.load.serviceTension_N !== undefined ? `; service tension ${u.force(scenario.load.serviceTension_N / 1000)} ${u.forceUnit}` : ""}`);
  out.push("");
  out.push("Search space (declared):");
  for (const line of outcome.spaceText) out.push(`  - ${line}`);
  out.push("");
  if (outcome.results.length === 0) {
    out.push(`No compliant layout: ${outcome.noResultReason ?? "nothing in the space passes"}`);
  } else {
    out.push(`Best ${outcome.results.length} by ${rankBy}${butt ? " (counts, pitch and end distances per side of the butt)" : ""}:`);
    const head = ["#", "Bolt", "Pattern", "Counts", "Pitch", "Gauge", butt ? "End / at butt" : "End", "Edge", ...(butt ? ["Cover t"] : []), "Bolts", "Length", `Strength ${u.forceUnit}`, "Eff.", "Util.", `Cost`];
    const table = new Table({ head, style: { head: [], border: [] } });
    outcome.results.forEach((c, i) => {
      const r = resultRow(c, i + 1);
      table.push([
        String(r.rank),
        r.bolt,
        r.pattern,
        r.counts,
        u.len(r.pitch_mm),
        u.len(r.gauge_mm),
        butt ? `${u.len(r.endDistance_mm)} / ${u.len(r.endDistanceAtButt_mm)}` : u.len(r.endDistance_mm),
        u.len(r.edgeDistance_mm),
        ...(butt ? [u.len(r.coverThickness_mm)] : []),
        String(r.bolts),
        u.len(r.spliceLength_mm),
        u.force(r.jointStrength_kN),
        `${fx(r.efficiency * 100, 1)} %`,
        fx(r.utilisation, 2),
        fx(r.cost, 1),
      ]);
    });
    out.push(table.toString());
    out.push(`Dimensions in ${u.lengthUnit}${u.us ? " (the search space above is stated in mm)" : ""}; cost in ${currency}. Every row has passed every check of \`splicewright check\` on its hole coordinates.`);
    out.push("Proven: nothing in the declared space ranks above the rows shown — every candidate that could was checked or excluded by an admissible bound (DEVELOPERS.md).");
    out.push("Util.: the highest utilisation of any check, spacing and edge rules included. Counts \"3/2 across\": a staggered pattern, 3 bolts on odd transverse lines and 2 on even ones.");
    out.push("Ties: fewer bolts, then higher efficiency, then a fixed order of size, class, pattern, counts and dimensions.");
  }
  const s = outcome.stats;
  out.push("");
  out.push(
    `Search effort: ${s.families} families (${s.familiesSkippedByBound} excluded by bound), ${s.nodes} nodes, ${s.candidatesSkippedByBound} candidates excluded by bound, ` +
      `${s.fullChecks} full checks, ${s.integerProgrammes} integer programmes (${s.enumerationFallbacks} enumeration fallbacks), ${elapsed_ms.toFixed(0)} ms.`,
  );
  out.push("");
  out.push(`CAUTION: ${CAUTION}`);
  return out.join("\n");
}
