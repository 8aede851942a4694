/**
 * Project file (YAML text) → the splices of a job, each a validated Scenario, and the schedule rules.
 * No file system here: the CLI reads the file and hands over its text.
 *
 * The splice fields are the scenario file's own schema pieces (src/io/schema.ts) and every splice goes
 * through `toScenario`, so a splice means exactly what the same fields mean in a scenario file. The
 * project's `search`, `bolts` and `options` are defaults: a splice's own entries replace them field by
 * field. Bolt size and class come from the search space, so a project's `bolts` gives only the assembly
 * (bearing or friction grip, slip factor, threads, holes).
 */
import { z } from "zod";
import { refuseScenarioAsProject } from "./file-kind.js";
import type { DesignCode } from "../codes/types.js";
import type { Scenario } from "../model/scenario.js";
import type { SelectionRules } from "../schedule/selection.js";
import { validateCosts, type CostFile } from "./costs.js";
import { toScenario } from "./scenario.js";
import { LIMITS } from "./limits.js";
import { scenarioSchema, type ScenarioFile } from "./schema.js";
import { InputError, parseYaml } from "./yaml.js";
import { freeText } from "./text-field.js";
import { memo } from "./memo.js";
import { PARSE_OPTIONS } from "./parse-options.js";

/** Largest fixed cost of stocking one bolt type (cost units): finite, far beyond any real figure. */
export const MAX_COST_PER_TYPE = 1_000_000_000;

/** Most splices in one project file. */
export const MAX_SPLICES = 5000;

/** The scenario file's schema pieces a project reuses, and its bolts section without size and class (the assembly). */
const scenarioPieces = memo(() => {
  const piece = scenarioSchema().shape;
  return { piece, assembly: piece.bolts.unwrap().omit({ size: true, class: true }) };
});

/** The project file's schema, built on first use from the scenario file's own pieces. */
export const projectSchema = memo(() => {
  const { piece, assembly } = scenarioPieces();
  const spliceEntry = z.strictObject({
    id: freeText().pipe(z.string().trim().min(1, "must not be empty")),
    mark: freeText().optional(),
    description: freeText({ lines: true }).optional(),
    quantity: z.number().int("must be a whole number").min(1, "must be at least 1").max(10_000, "must be at most 10000").default(1),
    splice: piece.splice,
    plates: piece.plates,
    packing: piece.packing,
    load: piece.load,
    bolts: assembly.optional(),
    search: piece.search,
    options: piece.options.optional(),
  });

  const scheduleSection = z.strictObject({
    max_types: z.number().int("must be a whole number").min(1, "must be at least 1").max(LIMITS.holes).optional(),
    cost_per_type: z.number().nonnegative("must not be negative").max(MAX_COST_PER_TYPE, `must be at most ${MAX_COST_PER_TYPE}`).default(0),
    one_class_per_diameter: z.boolean().default(false),
    min_bolts_per_type: z.number().int("must be a whole number").nonnegative("must not be negative").default(0),
  });

  const project = z.strictObject({
    project: freeText().pipe(z.string().trim().min(1, "must not be empty")),
    code: piece.code,
    costs: piece.costs,
    search: piece.search,
    bolts: assembly.optional(),
    options: piece.options.optional(),
    schedule: scheduleSection.default({ cost_per_type: 0, one_class_per_diameter: false, min_bolts_per_type: 0 }),
    splices: z.array(spliceEntry).min(1, "list at least one splice").max(MAX_SPLICES, `at most ${MAX_SPLICES} splices`),
  });
  return project;
});

export interface ProjectSplice {
  id: string;
  mark?: string;
  description?: string;
  quantity: number;
  scenario: Scenario;
  /** The fields of the splice's own search section (a search field's error names the section it came from). */
  ownSearchFields: string[];
}

export interface Project {
  name: string;
  code: DesignCode;
  /** The project's cost entries, over the catalogue. */
  costs?: CostFile;
  rules: SelectionRules;
  splices: ProjectSplice[];
  /** The fields of the project's search section (the defaults). */
  searchFields: string[];
}

const pathText = (path: ReadonlyArray<PropertyKey>) => path.reduce<string>((s, p) => (typeof p === "number" ? `${s}[${p}]` : s ? `${s}.${String(p)}` : String(p)), "");

function firstIssue(error: z.ZodError): InputError {
  const issue = error.issues[0]!;
  const at = pathText(issue.path);
  if (issue.code === "unrecognized_keys") return new InputError(pathText([...issue.path, issue.keys[0] ?? ""]), "unknown field (not part of the project format)");
  return new InputError(at, issue.code === "invalid_type" && issue.input === undefined ? "required" : issue.message);
}

type Raw = Record<string, unknown>;
const rawOf = (v: unknown): Raw => (v !== null && typeof v === "object" && !Array.isArray(v) ? (v as Raw) : {});

/**
 * Where a search field of splice m is set: `splices[m].search` when the splice gives it, `search` when
 * only the project's defaults do, and the splice's own section when neither does (the default value).
 */
export function searchFieldPath(project: Project, m: number, field: string): string {
  const splice = project.splices[m]!;
  if (!splice.ownSearchFields.includes(field) && project.searchFields.includes(field)) return `search.${field}`;
  return `splices[${m}].search.${field}`;
}

/**
 * The splice whose scenario the project's code is bound by (`parseProject` binds it by the last splice's
 * settings); a worker thread binds the same code again from that scenario (codes/registry.ts, boundCode).
 */
export const codeSpliceOf = (project: Project): ProjectSplice => project.splices[project.splices.length - 1]!;

/** Parse and validate a project file's text completely (every splice through `toScenario`). */
export function parseProject(text: string): Project {
  const value = parseYaml(text);
  if (value === null || typeof value !== "object" || Array.isArray(value)) throw new InputError("", "the project must be a YAML mapping of fields (project, code, splices, ...)");
  refuseScenarioAsProject(value as Raw);
  const parsed = projectSchema().safeParse(value, PARSE_OPTIONS);
  if (!parsed.success) throw firstIssue(parsed.error);
  const file = parsed.data;
  const raw = value as Raw;
  const rawSplices = raw.splices as unknown[];
  const costs = file.costs === undefined ? undefined : validateCosts(file.costs, "costs");
  const { piece, assembly } = scenarioPieces();
  const seen = new Map<string, number>();
  let code: DesignCode | undefined;
  const splices = file.splices.map((s, i): ProjectSplice => {
    const at = `splices[${i}]`;
    const earlier = seen.get(s.id);
    if (earlier !== undefined) throw new InputError(`${at}.id`, `"${s.id}" is already the id of splices[${earlier}]`);
    seen.set(s.id, i);
    const own = rawOf(rawSplices[i]);
    // Defaults field by field: the splice's own entries over the project's (both already validated).
    const merged = (key: "search" | "bolts" | "options") => ({ ...rawOf(raw[key]), ...rawOf(own[key]) });
    // Where a problem lies: a default's field is the project's unless the splice gives its own; a field
    // neither gives belongs to the section that is there (the splice's first).
    const origin = (path: string): string => {
      const [head, field] = path.split(/[.[]/);
      if (head === "code" || head === "costs") return path;
      if (head === "search" || head === "bolts" || head === "options") {
        const mine = rawOf(own[head]);
        const theirs = rawOf(raw[head]);
        const projects = field !== undefined && !(field in mine) && (field in theirs || (own[head] === undefined && raw[head] !== undefined));
        if (projects) return path;
      }
      return path ? `${at}.${path}` : at;
    };
    const scenarioFile: ScenarioFile = {
      name: s.id,
      project: file.project,
      code: file.code,
      splice: s.splice,
      plates: s.plates,
      load: s.load,
      costs: file.costs,
      options: piece.options.parse(merged("options"), PARSE_OPTIONS),
    };
    if (s.packing !== undefined) scenarioFile.packing = s.packing;
    if (raw.search !== undefined || own.search !== undefined) scenarioFile.search = piece.search.parse(merged("search"), PARSE_OPTIONS);
    if (raw.bolts !== undefined || own.bolts !== undefined) {
      // Size and class are the search's to choose; these stand in only until it does.
      scenarioFile.bolts = { ...assembly.parse(merged("bolts"), PARSE_OPTIONS), size: 20, class: "8.8" };
    }
    let scenario: Scenario;
    try {
      ({ scenario, code } = toScenario(scenarioFile));
    } catch (e) {
      if (e instanceof InputError) throw new InputError(origin(e.path), e.reason);
      throw e;
    }
    const entry: ProjectSplice = { id: s.id, quantity: s.quantity, scenario, ownSearchFields: Object.keys(rawOf(own.search)) };
    if (s.mark !== undefined) entry.mark = s.mark;
    if (s.description !== undefined) entry.description = s.description;
    return entry;
  });
  const sched = file.schedule;
  const rules: SelectionRules = { costPerType: sched.cost_per_type, oneClassPerDiameter: sched.one_class_per_diameter, minBoltsPerType: sched.min_bolts_per_type };
  if (sched.max_types !== undefined) rules.maxTypes = sched.max_types;
  const project: Project = { name: file.project, code: code!, rules, splices, searchFields: Object.keys(rawOf(raw.search)) };
  if (costs) project.costs = costs;
  return project;
}

