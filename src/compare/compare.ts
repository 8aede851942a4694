/**
 * Side by side: the same splice searched under different bolt classes, bolt sizes or design codes.
 * Every column is one run of the ordinary search (src/search/search.ts) with the space restricted to
 * that choice — there is no separate path. Pure.
 */
import type { CostTable } from "../catalogue/costs.js";
import { ASTM_ISO_EQUIVALENT, astmBoltGrade, type PropertyClass } from "../catalogue/bolts.js";
import type { DesignCode } from "../codes/types.js";
import type { PlateSpec, Scenario } from "../model/scenario.js";
import { searchLayouts, type Candidate, type SearchOptions, type SearchOutcome } from "../search/search.js";
import { resolveSpace } from "../search/space.js";
import { countCandidates, DEFAULT_MAX_CANDIDATES, workLimitError } from "../search/work-estimate.js";

export interface CompareColumn {
  label: string;
  code: DesignCode;
  scenario: Scenario;
  outcome: SearchOutcome;
  best: Candidate | null;
  /** Cost above the cheapest column (0 for the cheapest; null when this column has no layout). */
  costDifference: number | null;
  /** What was mapped to reach this code (codes comparison only). */
  mapping: string[];
}

export interface CodeMapping {
  steel: Array<Record<string, string>>;
  bolts: Array<Record<string, string>>;
}

/** A column before its search: the choice's label, its scenario and code, what was mapped. */
interface ColumnSpec {
  label: string;
  scenario: Scenario;
  code: DesignCode;
  mapping: string[];
}

/** Progress of a comparison (a column finished, or a node count inside the column being searched) and its work limit. */
export interface CompareOptions {
  /** Most candidate layouts the columns may declare together (default DEFAULT_MAX_CANDIDATES; work-estimate.ts). */
  maxCandidates?: number;
  onColumn?: (done: number, total: number) => void;
  onSearch?: SearchOptions["onProgress"];
}

/** One column per (class, size) choice; a list left empty keeps the scenario's own search range. */
export function compareChoices(scenario: Scenario, code: DesignCode, costs: CostTable, classes: PropertyClass[], sizes: number[], options: CompareOptions = {}): CompareColumn[] {
  const classList: Array<PropertyClass | undefined> = classes.length ? classes : [undefined];
  const sizeList: Array<number | undefined> = sizes.length ? sizes : [undefined];
  const specs: ColumnSpec[] = [];
  for (const c of classList) {
    for (const d of sizeList) {
      const search = { ...(scenario.search ?? {}) };
      if (c !== undefined) search.classes = [c];
      if (d !== undefined) search.sizes_mm = [d];
      const label = [d !== undefined ? `M${d}` : "", c !== undefined ? `class ${c}` : ""].filter(Boolean).join(" ");
      specs.push({ label, scenario: { ...scenario, search }, code, mapping: [] });
    }
  }
  return searchColumns(specs, costs, options);
}

/**
 * Search every column, after refusing the comparison when its columns together declare more than
 * the limit of candidate layouts (work-estimate.ts): nothing is searched then.
 */
function searchColumns(specs: ColumnSpec[], costs: CostTable, options: CompareOptions): CompareColumn[] {
  const maxCandidates = options.maxCandidates ?? DEFAULT_MAX_CANDIDATES;
  const counts = specs.map((s) => countCandidates(s.scenario, s.code, costs, resolveSpace(s.scenario, s.code, costs)));
  const total = counts.reduce((a, b) => a + b, 0);
  if (total > maxCandidates) {
    const largest = specs[counts.indexOf(Math.max(...counts))]!;
    throw workLimitError(largest.scenario, largest.code, costs, total, maxCandidates, "search", "the compared columns' search spaces hold together");
  }
  const columns = specs.map((s, i) => {
    const c = column(s, costs, options);
    options.onColumn?.(i + 1, specs.length);
    return c;
  });
  return withDifferences(columns);
}

function column({ label, scenario, code, mapping }: ColumnSpec, costs: CostTable, options: CompareOptions): CompareColumn {
  const outcome = searchLayouts({ scenario, code, costs }, { top: 1, rankBy: "cost", maxCandidates: Infinity, ...(options.onSearch ? { onProgress: options.onSearch } : {}) });
  return { label, code, scenario, outcome, best: outcome.results[0] ?? null, costDifference: null, mapping };
}

function withDifferences(columns: CompareColumn[]): CompareColumn[] {
  const costs = columns.map((c) => c.best?.cost.total).filter((v): v is number => v !== undefined);
  const cheapest = costs.length ? Math.min(...costs) : 0;
  for (const c of columns) c.costDifference = c.best ? c.best.cost.total - cheapest : null;
  return columns;
}

/** The entry of a mapping table that names `value` under `from`, or undefined. */
function mapValue(table: Array<Record<string, string>>, from: string, to: string, value: string): string | undefined {
  return table.find((row) => row[from] === value)?.[to];
}

export class MappingError extends Error {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(message);
  }
}

/**
 * The scenario restated under another code: steel grades and bolt classes mapped by the table.
 * Throws MappingError naming what has no equivalent.
 */
export function mapScenario(scenario: Scenario, from: DesignCode, to: DesignCode, table: CodeMapping): { scenario: Scenario; mapping: string[] } {
  if (from.id === to.id) return { scenario, mapping: [] };
  const mapping: string[] = [];
  const grade = (spec: PlateSpec, where: string): PlateSpec => {
    const g = mapValue(table.steel, from.id, to.id, spec.grade);
    if (!g) throw new MappingError(`${where}.grade`, `no ${to.id} equivalent of steel ${spec.grade} in the mapping`);
    const line = `steel ${spec.grade} → ${g}`;
    if (!mapping.includes(line)) mapping.push(line);
    return { ...spec, grade: g };
  };
  const plates = {
    mainA: grade(scenario.plates.mainA, "plates.main"),
    mainB: grade(scenario.plates.mainB, "plates.main_b"),
    covers: scenario.plates.covers.map((c, i) => grade(c, i === 0 ? "plates.cover" : "plates.cover_b")),
  };
  const out: Scenario = { ...scenario, code: to.id, plates };
  // A mapped bolt grade named by ASTM (A325…) is held internally as the ISO class of its strength level,
  // as the scenario parser holds it (src/catalogue/bolts.ts, ASTM_ISO_EQUIVALENT).
  const internal = (name: string): PropertyClass => {
    const astm = astmBoltGrade(name);
    return astm ? ASTM_ISO_EQUIVALENT[astm] : (name as PropertyClass);
  };
  const classes = scenario.search?.classes;
  if (classes) {
    const mapped = classes.map((c) => {
      const m = mapValue(table.bolts, from.id, to.id, c);
      if (m) mapping.push(`bolt class ${c} → ${m}`);
      return m === undefined ? undefined : internal(m);
    }).filter((c): c is PropertyClass => c !== undefined);
    if (mapped.length === 0) throw new MappingError("search.classes", `none of the classes ${classes.join(", ")} has a ${to.id} equivalent in the mapping`);
    out.search = { ...scenario.search, classes: mapped };
  }
  if (scenario.bolts) {
    const m = mapValue(table.bolts, from.id, to.id, scenario.bolts.propertyClass);
    if (!m) throw new MappingError("bolts.class", `no ${to.id} equivalent of bolt class ${scenario.bolts.propertyClass} in the mapping`);
    const astm = astmBoltGrade(m);
    out.bolts = { ...scenario.bolts, propertyClass: internal(m), ...(astm ? { astmGrade: astm } : {}) };
  }
  return { scenario: out, mapping };
}

/** One column per design code, the scenario mapped to each by the table. */
export function compareCodes(scenario: Scenario, from: DesignCode, codes: DesignCode[], costs: CostTable, table: CodeMapping, options: CompareOptions = {}): CompareColumn[] {
  const specs = codes.map((to): ColumnSpec => {
    const { scenario: mapped, mapping } = mapScenario(scenario, from, to, table);
    // A code with scenario settings (factors, conventions) is bound to the mapped scenario, as parsing does.
    return { label: to.id, scenario: mapped, code: to.settings ? to.settings.bind(mapped) : to, mapping };
  });
  return searchColumns(specs, costs, options);
}
