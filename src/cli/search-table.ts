/** The search results as a terminal table. */
import Table from "cli-table3";
import { CAUTION } from "../report/check-json.js";
import { provenStatement, resultRow } from "../report/search-json.js";
import { lengthNumber } from "../report/format.js";
import { efficiencyBasisNote } from "../report/summary.js";
import type { RankBy } from "../search/ranking.js";
import type { SearchOutcome } from "../search/search.js";
import type { Scenario } from "../model/scenario.js";
import { toUnit } from "../units/units.js";
import { loadWords, spliceKindWords } from "../model/load.js";
import { PIPED_WIDTH, strengthUtilisationWords, wrap } from "./text.js";

const fx = (v: number | null, d = 0) => (v === null ? "—" : v.toFixed(d));

/** Display of lengths and forces: mm and kN, or in and kips for a scenario with `units: us`. */
function displayUnits(scenario: Scenario) {
  const us = scenario.units === "us";
  return {
    us,
    len: (mm: number | null) => (mm === null ? "—" : lengthNumber(mm, us ? "us" : "si")),
    force: (kN: number) => (us ? toUnit(kN * 1000, "kip", "force").toFixed(1) : kN.toFixed(1)),
    lengthUnit: us ? "in" : "mm",
    forceUnit: us ? "kips" : "kN",
  };
}

/** The search results and their notes; prose wraps to `width` columns (the table keeps one row per layout). */
export function formatSearch(scenario: Scenario, outcome: SearchOutcome, rankBy: RankBy, currency: string, codeTitle: string, elapsed_ms: number, variants = false, width = PIPED_WIDTH): string {
  const out: string[] = [];
  const text = (t: string, first = "", rest = first) => wrap(t, width, first, rest);
  const butt = scenario.splice.type !== "lap";
  out.push(`splicewright — layout search: bolted ${spliceKindWords(scenario.load)}`);
  out.push(...text(scenario.name, "Scenario: ", "          "));
  if (scenario.project) out.push(...text(scenario.project, "Project:  ", "          "));
  out.push(...text(codeTitle, "Code:     ", "          "));
  const u = displayUnits(scenario);
  out.push(`Load:     ${scenario.load.factoredCompression_N === undefined ? "factored tension " : ""}${loadWords(scenario.load, (N) => `${u.force(N / 1000)} ${u.forceUnit}`)}`);
  out.push("");
  out.push("Search space (declared):");
  for (const line of outcome.spaceText) out.push(...text(line, "  - ", "    "));
  out.push("");
  if (outcome.minimumDesignAction) out.push(...text(`Note: ${outcome.minimumDesignAction}.`), "");
  if (outcome.results.length === 0) {
    out.push(...text(`No compliant layout: ${outcome.noResultReason ?? "nothing in the space passes"}`, "", "  "));
  } else {
    const what = variants ? "layouts (every variant)" : `arrangements (the best layout of each; --variants shows every variant)`;
    out.push(...text(`Best ${outcome.results.length} ${what} by ${rankBy}${butt ? "; counts, pitch and end distances per side of the butt" : ""}:`));
    const rows = outcome.results.map((c, i) => resultRow(c, i + 1));
    const service = rows.some((r) => r.serviceUtilisation !== null);
    const head = ["#", "Bolt", "Pattern", "Counts", "Pitch", "Gauge", butt ? "End / at butt" : "End", "Edge", ...(butt ? ["Cover t"] : []), "Bolts", "Length", `Strength ${u.forceUnit}`, "Str. util.", ...(service ? ["SLS util."] : []), "Eff.", "Tightest rule (all pass)", `Cost`];
    const table = new Table({ head, style: { head: [], border: [], compact: true } });
    rows.forEach((r) => {
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
        fx(r.strengthUtilisation, 2),
        ...(service ? [fx(r.serviceUtilisation, 2)] : []),
        `${fx(r.efficiency * 100, 1)} %`,
        r.tightestRule,
        fx(r.cost, 1),
      ]);
    });
    out.push(table.toString());
    out.push(...text(`Dimensions in ${u.lengthUnit}; cost in ${currency}. Every row has passed every check of \`splicewright check\` on its hole coordinates.`));
    out.push(...text(`Proven over the declared space above: ${provenStatement(variants)} (DEVELOPERS.md).`));
    out.push(
      ...text(`Str. util.: strength utilisation = ${strengthUtilisationWords(scenario.load)} (ultimate limit state)${service ? "; SLS util.: service tension / slip resistance at service" : ""}. ` +
        "Tightest rule: every detailing rule (spacing, end and edge distances, grip) passes in every row; the cell names the one closest to its limit (by the ratio of value to limit) and its margin in length."),
    );
    out.push(...text(efficiencyBasisNote(scenario.options.efficiencyBasis)));
    out.push(...text("Counts \"3/2 across\": a staggered pattern, 3 bolts on odd transverse lines and 2 on even ones."));
    out.push(...text("Ties: fewer bolts, then higher efficiency, then a fixed order of size, class, pattern, counts and dimensions."));
  }
  const s = outcome.stats;
  out.push("");
  out.push(
    ...text(`Search effort: ${s.families} families (${s.familiesSkippedByBound} excluded by bound), ${s.nodes} nodes, ${s.candidatesSkippedByBound} candidates excluded by bound, ` +
      `${s.fullChecks} full checks, ${s.integerProgrammes} integer programmes (${s.enumerationFallbacks} enumeration fallbacks), ${elapsed_ms.toFixed(0)} ms.`),
  );
  out.push("");
  out.push(...text(`CAUTION: ${CAUTION}`));
  return out.join("\n");
}
