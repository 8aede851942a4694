/**
 * The workbench's summary of a check, read from the fields the check report already carries.
 *
 * INTERIM: the core is to get its own summary of a check (verdict, load against joint strength,
 * strength utilisation apart from the detailing rules, governing check, efficiency with its basis).
 * When it lands, `workbenchSummary` is replaced by it; this is its only call site (src/web/session.ts).
 * It computes nothing a check has not: it picks and groups the report's own figures.
 */
import type { CheckReport, StrengthCheck, Warning } from "../model/results.js";
import type { CheckableScenario } from "../model/scenario.js";
import { citationText } from "../report/check-json.js";

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
  /** The highest utilisation of the ultimate-limit-state strength checks (the load over the joint strength). */
  strengthUtilisation: number;
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
}

export function workbenchSummary(scenario: CheckableScenario, report: CheckReport): WorkbenchSummary {
  const row = (c: CheckReport["checks"][number]): SummaryCheck => ({
    id: c.id,
    title: c.title,
    component: c.component,
    clause: citationText(c.citation),
    utilisation: c.utilisation,
    figures: c.type === "strength" ? { kind: "strength", demand_N: c.demand_N, resistance_N: c.resistance_N } : { kind: "rule", value_mm: c.value_mm, limit_mm: c.limit_mm, bound: c.bound },
  });
  const strength = report.checks.filter((c): c is StrengthCheck => c.type === "strength");
  const rules = report.checks.filter((c) => c.type === "rule");
  const governing = report.checks.find((c) => c.id === report.governing);
  const load = scenario.load.factoredTension_N;
  return {
    pass: report.pass,
    units: scenario.units === "us" ? "us" : "si",
    load_N: load,
    jointStrength_N: report.jointStrength_N,
    strengthUtilisation: Math.max(0, ...strength.filter((c) => c.limitState === "ULS").map((c) => c.utilisation)),
    strengthPass: strength.every((c) => c.pass),
    rulesPass: rules.every((c) => c.pass),
    rules: rules.length,
    failing: report.checks.filter((c) => !c.pass).map(row),
    governing: governing ? row(governing) : null,
    efficiency: report.efficiency,
    efficiencyDefinition: report.efficiencyDefinition,
    maxUtilisation: report.maxUtilisation,
    warnings: report.warnings,
    checks: report.checks.length,
  };
}
