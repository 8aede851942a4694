/**
 * The workbench's worker: the scenario session (live check, downloads) and the long jobs (search,
 * compare, schedule). The page starts one worker for the session and a fresh one for each job, so that
 * cancelling a job is ending its worker. For a schedule the page also runs the per-splice searches on
 * a pool of workers of this script, as the CLI does with worker threads, and HiGHS in a worker of its own.
 */
import COSTS_TEXT from "../../catalogue/costs.yaml?raw";
import EQUIVALENTS_TEXT from "../../catalogue/equivalents.yaml?raw";
import { boltSizeText, ASTM_BOLT_GRADES } from "../catalogue/bolts.js";
import type { CostTable } from "../catalogue/costs.js";
import { ASTM_PLATE_GRADES, EN10025_NAMES, IS2062_GRADES } from "../catalogue/steels.js";
import { findCode } from "../codes/registry.js";
import { exportBase } from "../export/names.js";
import { compareRequest } from "../io/compare-request.js";
import { costTableFor, parseCostTable } from "../io/costs.js";
import { parseProject, type Project } from "../io/project.js";
import { savedScenarioText } from "../io/save-scenario.js";
import { InputError, parseScenario, parseYaml } from "../io/scenario.js";
import { compareJson } from "../report/compare-json.js";
import { searchJson } from "../report/search-json.js";
import { orderCsv, scheduleCsv, scheduleJson } from "../schedule/export.js";
import { selectionProblem, spliceOptions, type SpliceOptions } from "../schedule/options.js";
import { chooseBoltTypes, distinctSplices, methodRefusal, missingLayouts, noScheduleMessage, resultsOfGroup, rulesWith, scheduleFileNames, type HighsAnswer } from "../schedule/run.js";
import { buildSchedule } from "../schedule/schedule.js";
import { searchLayouts, type SearchStats } from "../search/search.js";
import { CODE_IDS, CODE_TITLES } from "./fields.js";
import type { CatalogueText, CodeInfo, Progress, Reply, Request, ScheduleRequest } from "./protocol.js";
import { problemOf, Session } from "./session.js";

interface WorkerScope {
  postMessage(message: Reply): void;
  onmessage: ((e: MessageEvent<{ id: number } & Request>) => void) | null;
}
const scope = self as unknown as WorkerScope;

const BUNDLED: CatalogueText = { text: COSTS_TEXT, name: "catalogue/costs.yaml" };
const session = new Session();

function catalogue(): CodeInfo[] {
  return CODE_IDS.map((id) => {
    const code = findCode(id)!;
    const grades = id === "is800-2007" ? Object.keys(IS2062_GRADES) : id === "en1993-1-8" ? [...EN10025_NAMES] : Object.keys(ASTM_PLATE_GRADES);
    const classes = (assembly: "bearing" | "friction-grip") => {
      const iso = [...code.classesFor(assembly)];
      if (id !== "aisc360-16") return iso;
      return [...ASTM_BOLT_GRADES.filter((g) => assembly === "bearing" || g !== "A307"), ...iso];
    };
    return { id, title: CODE_TITLES[id], sizes: code.boltSizes_mm.map(boltSizeText), classes: { bearing: classes("bearing"), "friction-grip": classes("friction-grip") }, grades };
  });
}

/** Progress at most every 100 ms. */
function throttled(id: number): (p: Progress) => void {
  let last = -Infinity;
  return (p) => {
    const now = performance.now();
    if (now - last < 100) return;
    last = now;
    scope.postMessage({ id, type: "progress", progress: p });
  };
}

function search(id: number, r: Extract<Request, { op: "search" }>) {
  const { scenario, code } = parseScenario(r.text);
  const cat = r.costs ?? BUNDLED;
  const costs = costTableFor(cat.text, cat.name, scenario.costs);
  const progress = throttled(id);
  const t0 = performance.now();
  const outcome = searchLayouts({ scenario, code, costs }, { top: r.top, rankBy: r.rankBy, onProgress: (s: Readonly<SearchStats>) => progress({ stage: "searching", checks: s.fullChecks }) });
  outcome.stats.elapsed_ms = Number((performance.now() - t0).toFixed(1));
  const original = parseYaml(r.text) as Record<string, unknown>;
  return { json: searchJson(scenario.name, outcome, r.rankBy, costs.currency, { variants: false, efficiencyBasis: scenario.options.efficiencyBasis }), saved: outcome.results.map((c, i) => savedScenarioText(original, c, i + 1)) };
}

function compare(id: number, r: Extract<Request, { op: "compare" }>) {
  const { scenario, code } = parseScenario(r.text);
  const cat = r.costs ?? BUNDLED;
  const costs = costTableFor(cat.text, cat.name, scenario.costs);
  const progress = throttled(id);
  let done = 0;
  let total: number | undefined;
  const columns = compareRequest(scenario, code, r.request, costs, () => EQUIVALENTS_TEXT, {
    onColumn: (d, t) => {
      done = d;
      total = t;
      progress({ stage: "searching columns", done: d, total: t });
    },
    onSearch: (s) => progress({ stage: "searching columns", done, ...(total !== undefined ? { total } : {}), checks: s.fullChecks }),
  });
  return compareJson(scenario.name, columns, costs.currency, scenario.options.efficiencyBasis);
}

/** A project parsed once per pool worker, as the CLI's worker threads do. */
let parsedProject: { text: string; project: Project } | undefined;

function spliceOptionsOf(r: Extract<Request, { op: "splice-options" }>): SpliceOptions {
  if (parsedProject?.text !== r.projectText) parsedProject = { text: r.projectText, project: parseProject(r.projectText) };
  const { project } = parsedProject;
  return spliceOptions(project.splices[r.index]!.scenario, project.code, r.costs as CostTable);
}

/**
 * The per-splice searches, one request per group of identical splices, run by the page on a pool of
 * workers (as the CLI runs them on worker threads); each result is spread over its group.
 */
function searchPool(id: number, text: string, project: Project, costs: CostTable, size: number): Promise<SpliceOptions[]> {
  const groups = distinctSplices(project);
  return new Promise((resolve) => {
    poolWaiting.set(id, (results) => {
      const found: SpliceOptions[] = Array(project.splices.length);
      groups.forEach((g, i) => {
        for (const [s, r] of resultsOfGroup(project, g, results[i] as SpliceOptions)) found[s] = r;
      });
      resolve(found);
    });
    scope.postMessage({
      id,
      type: "pool",
      stage: "searching splices",
      requests: groups.map((g) => ({ op: "splice-options", projectText: text, costs, index: g[0]! })),
      weights: groups.map((g) => g.length),
      workers: size,
    });
  });
}

const poolWaiting = new Map<number, (results: unknown[]) => void>();

/** Answers to HiGHS solves the page runs for this worker (HiGHS runs in a worker of its own). */
const highsWaiting = new Map<number, (a: HighsAnswer) => void>();

async function schedule(id: number, r: ScheduleRequest) {
  const project = parseProject(r.projectText);
  const cat = r.costs ?? BUNDLED;
  const costs = costTableFor(cat.text, cat.name, project.costs);
  const rules = rulesWith(project.rules, r.overrides);
  const refusal = methodRefusal(rules, r.method);
  if (refusal) throw new InputError("--method", refusal);
  const t0 = performance.now();
  const searches = await searchPool(id, r.projectText, project, costs, r.workers);
  const search_ms = performance.now() - t0;
  const missing = missingLayouts(project, searches);
  if (missing) return { scheduled: false, message: missing.text };
  const { problem, options } = selectionProblem(project.splices, searches, rules);
  const t1 = performance.now();
  const selection = await chooseBoltTypes(problem, r.method, r.timeLimit_s, (lp, timeLimit_s) => {
    scope.postMessage({ id, type: "progress", progress: { stage: "choosing bolt types (HiGHS integer programme)" } });
    return new Promise<HighsAnswer>((resolve) => {
      highsWaiting.set(id, resolve);
      scope.postMessage({ id, type: "highs", lp, timeLimit_s });
    });
  });
  const selection_ms = performance.now() - t1;
  if (!selection.assignment) return { scheduled: false, message: noScheduleMessage(selection, rules) };
  const built = buildSchedule({ project: project.name, splices: project.splices, problem, options, selection: { ...selection, assignment: selection.assignment }, code: project.code, costs });
  const json = scheduleJson(built, { code: project.code.title, currency: costs.currency, elapsed_ms: { search: Math.round(search_ms), selection: Math.round(selection_ms) } });
  const names = scheduleFileNames(exportBase(r.fileName));
  return {
    scheduled: true,
    json,
    searched: distinctSplices(project).length,
    files: [
      { name: names.schedule, content: scheduleCsv(built) },
      { name: names.order, content: orderCsv(built) },
      { name: names.json, content: JSON.stringify(json, null, 2) + "\n" },
    ],
  };
}

async function answer(id: number, r: Request): Promise<unknown> {
  switch (r.op) {
    case "catalogue":
      return { codes: catalogue(), prices: parseCostTable(BUNDLED.text, BUNDLED.name).boltAssembly };
    case "open":
      return session.open(r.text, r.fileName);
    case "blank":
      return session.blank();
    case "edit":
      return session.edit(r.edits);
    case "date":
      return session.setDate(r.date);
    case "rename":
      return session.rename(r.fileName);
    case "download":
      return session.download(r.formats);
    case "search":
      return search(id, r);
    case "compare":
      return compare(id, r);
    case "schedule":
      return schedule(id, r);
    case "splice-options":
      return spliceOptionsOf(r);
    case "highs-answer":
      highsWaiting.get(id)?.(r.answer as HighsAnswer);
      highsWaiting.delete(id);
      return undefined;
    case "pool-answer":
      poolWaiting.get(id)?.(r.results);
      poolWaiting.delete(id);
      return undefined;
  }
}

scope.onmessage = (e) => {
  const { id, ...request } = e.data;
  if (request.op === "highs-answer" || request.op === "pool-answer") {
    void answer(id, request as Request);
    return;
  }
  answer(id, request as Request).then(
    (value) => scope.postMessage({ id, type: "done", value }),
    (err: unknown) => scope.postMessage({ id, type: "failed", problem: problemOf(err) }),
  );
};
