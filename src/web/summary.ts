/**
 * The workbench's summary of a check: the core's own summary (src/report/summary.ts — the same the
 * terminal sheet, the HTML report and the drawing's title block print), with the page's extras (the
 * failing checks with their figures). It computes nothing the core has not.
 */
import type { CheckReport, Warning } from "../model/results.js";
import type { CheckableScenario } from "../model/scenario.js";
import { citationText } from "../report/check-json.js";
import { summarise, summaryRows, type SummaryRow } from "../report/summary.js";

export interface SummaryCheck {
  id: string;
  title: string;
  component: string;
  clause: string;
  utilisation: number;
  /** Strength checks: demand and resistance, N. Rules: value and limit, mm. */
  figures: { kind: "strength"; demand_N: number; resistance_N: number } | { kind: "rule"; value_mm: number; limit_mm: number; bound: "min" | "max" };
}

export interface WorkbenchSummary {
  pass: boolean;
  units: "si" | "us";
  load_N: number;
  jointStrength_N: number;
  /** T / joint design strength (the core's definition, src/report/summary.ts). */
  strengthUtilisation: number;
  /** Service tension / slip resistance at service, where slip at service is checked; else null. */
  serviceUtilisation: number | null;
  /** The core's summary as labelled rows (verdict, load, strength, both utilisations, governing, efficiency, detailing, warnings). */
  rows: SummaryRow[];
  /** Every strength check (ULS and service) passes. */
  strengthPass: boolean;
  /** Every detailing rule (spacing, edge and end distances, grip, centroid) is met. */
  rulesPass: boolean;
  rules: number;
  failing: SummaryCheck[];
  governing: SummaryCheck | null;
  efficiency: number;
  efficiencyDefinition: string;
  maxUtilisation: number;
  warnings: Warning[];
  checks: number;
  /** Every check's figures by id, unrounded: the checks table prints these (the JSON's kN are rounded to 0.01). */
  figuresById: Record<string, SummaryCheck["figures"]>;
}

export function workbenchSummary(scenario: CheckableScenario, report: CheckReport): WorkbenchSummary {
  const figures = (c: CheckReport["checks"][number]): SummaryCheck["figures"] =>
    c.type === "strength" ? { kind: "strength", demand_N: c.demand_N, resistance_N: c.resistance_N } : { kind: "rule", value_mm: c.value_mm, limit_mm: c.limit_mm, bound: c.bound };
  const row = (c: CheckReport["checks"][number]): SummaryCheck => ({
    id: c.id,
    title: c.title,
    component: c.component,
    clause: citationText(c.citation),
    utilisation: c.utilisation,
    figures: figures(c),
  });
  const figuresById: Record<string, SummaryCheck["figures"]> = {};
  for (const c of report.checks) figuresById[c.id] = figures(c);
  const core = summarise(scenario, report);
  const units = scenario.units === "us" ? "us" : "si";
  const governing = report.checks.find((c) => c.id === report.governing);
  return {
    pass: report.pass,
    units,
    load_N: core.factoredTension_N,
    jointStrength_N: core.jointStrength_N,
    strengthUtilisation: core.strengthUtilisation,
    serviceUtilisation: core.service ? core.service.utilisation : null,
    rows: summaryRows(core, units),
    strengthPass: core.strengthChecks.failures.length === 0,
    rulesPass: core.detailing.failures.length === 0,
    rules: core.detailing.total,
    failing: report.checks.filter((c) => !c.pass).map(row),
    governing: governing ? row(governing) : null,
    efficiency: report.efficiency,
    efficiencyDefinition: report.efficiencyDefinition,
    maxUtilisation: report.maxUtilisation,
    warnings: report.warnings,
    checks: report.checks.length,
    figuresById,
  };
}
