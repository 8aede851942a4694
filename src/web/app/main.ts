/**
 * The workbench page: the form on the left, the summary and the drawing large on the right, and tabs
 * for the full checks, search, compare, the job schedule, hand-over files and the scenario's text.
 * The page computes nothing itself: a worker holds the scenario and runs the core on every change.
 */
import FOOTBRIDGE from "../../../scenarios/footbridge-tie.yaml?raw";
import FOOTBRIDGE_SEARCH from "../../../scenarios/footbridge-tie-search.yaml?raw";
import MEZZANINE from "../../../scenarios/mezzanine-hanger.yaml?raw";
import TRUSS from "../../../scenarios/truss-chord-staggered.yaml?raw";
import SPORTS from "../../../scenarios/sports-hall-chord-ec3.yaml?raw";
import SPORTS_SEARCH from "../../../scenarios/sports-hall-chord-ec3-search.yaml?raw";
import CANOPY from "../../../scenarios/canopy-tie-us.yaml?raw";
import CANOPY_SEARCH from "../../../scenarios/canopy-tie-us-search.yaml?raw";
import WAREHOUSE from "../../../scenarios/warehouse-roof-project.yaml?raw";
import type { CatalogueText, CodeInfo, DownloadFormat, LiveState, OutFile } from "../protocol.js";
import { Failure, WorkerClient } from "./client.js";
import { byId, downloadText, h, pickTextFile } from "./dom.js";
import { ScenarioForm } from "./form.js";
import { Job, renderCompare, renderSchedule, renderSearch, type CompareAnswer, type ScheduleAnswer, type SearchAnswer } from "./jobs.js";
import { renderChecks, renderDrawing, renderSummary } from "./results.js";

const DEMOS: Array<[string, string, string]> = [
  ["footbridge-tie.yaml", "Footbridge tie: butt, two covers, IS 800", FOOTBRIDGE],
  ["footbridge-tie-search.yaml", "Footbridge tie, layout to be found (search)", FOOTBRIDGE_SEARCH],
  ["mezzanine-hanger.yaml", "Mezzanine hanger: lap, IS 800", MEZZANINE],
  ["truss-chord-staggered.yaml", "Truss chord: friction grip, staggered, IS 800", TRUSS],
  ["sports-hall-chord-ec3.yaml", "Sports hall chord: EN 1993-1-8", SPORTS],
  ["sports-hall-chord-ec3-search.yaml", "Sports hall chord, layout to be found (search)", SPORTS_SEARCH],
  ["canopy-tie-us.yaml", "Canopy tie: AISC 360-16, US units", CANOPY],
  ["canopy-tie-us-search.yaml", "Canopy tie, layout to be found (search)", CANOPY_SEARCH],
];

/** Most rows a search shows. */
const MAX_TOP = 1000;

const session = new WorkerClient();
let state: LiveState | undefined;
let costs: CatalogueText | undefined;
let project: { name: string; text: string } | undefined;

const form = new ScenarioForm(byId("form"), byId("form-problem"), edit);

// ── Edits: sent as they happen; while one is being checked the next ones wait and go together. ──
const queued = new Map<string, { path: string[]; value: unknown }>();
let inFlight: Promise<void> | undefined;
/** When the oldest edit not yet sent was made (the live update's latency is measured from it). */
let queuedSince: number | undefined;

function edit(path: string[], value: unknown): void {
  queued.set(path.join("\u0000"), { path, value });
  queuedSince ??= performance.now();
  pump();
}

/** Requests to the session not yet answered. */
let busy = 0;

/** Edits and session requests not yet answered, on the page element (tests and scripts wait for 0). */
function markEdits(): void {
  document.documentElement.dataset.edits = String(queued.size + busy);
}

/** A session request, counted while it is out. */
function track<T>(p: Promise<T>): Promise<T> {
  busy++;
  markEdits();
  return p.finally(() => {
    busy--;
    markEdits();
  });
}

function pump(): void {
  markEdits();
  if (inFlight || queued.size === 0) return;
  const edits = [...queued.values()];
  const since = queuedSince ?? performance.now();
  queued.clear();
  queuedSince = undefined;
  inFlight = track(session.request<LiveState>({ op: "edit", edits }))
    .then((s) => {
      show(s, false);
      const ms = performance.now() - since;
      document.documentElement.dataset.updateMs = ms.toFixed(1);
      const timing = document.getElementById("timing");
      if (timing) timing.textContent = `updated ${ms < 1 ? "in under 1" : `in ${ms.toFixed(0)}`} ms after the change (the check itself ${s.ms.toFixed(0)} ms)`;
    }, reportFailure)
    .finally(() => {
      inFlight = undefined;
      pump();
    });
}

/** Resolves when every edit made so far has been checked. */
async function settled(): Promise<void> {
  while (inFlight || queued.size > 0) {
    pump();
    await inFlight;
  }
}

function reportFailure(e: unknown): void {
  const banner = byId("form-problem");
  banner.hidden = false;
  banner.textContent = e instanceof Failure ? (e.problem.kind === "internal" ? `internal error: ${e.problem.message}` : e.problem.message) : String(e);
}

let firstResult = true;

function show(s: LiveState, fill: boolean): void {
  state = s;
  form.refresh(s, fill);
  renderSummary(s, !fill);
  renderDrawing(s, !fill);
  if (!byId("panel-checks").hidden) renderChecks(s);
  if (!byId("panel-text").hidden) byId("yaml-text").textContent = s.text;
  const name = byId<HTMLInputElement>("file-name");
  if (document.activeElement !== name) name.value = s.fileName;
  const date = byId<HTMLInputElement>("date");
  if (document.activeElement !== date) date.value = s.date;
  document.documentElement.dataset.state = s.problem ? "problem" : s.check ? (s.check.summary.pass ? "pass" : "fail") : "none";
  if (firstResult && s.check) {
    firstResult = false;
    document.documentElement.dataset.firstResultMs = performance.now().toFixed(0);
    setTimeout(() => Job.prewarm(), 500);
  }
}

async function open(text: string, fileName: string): Promise<void> {
  await settled();
  try {
    show(await track(session.request<LiveState>({ op: "open", text, fileName })), true);
  } catch (e) {
    reportFailure(e instanceof Failure && e.problem.kind === "input" ? new Failure({ ...e.problem, message: `${fileName}: ${e.problem.message}` }) : e);
  }
}

// ── Files ──
async function download(format: DownloadFormat, suffix: string): Promise<void> {
  await settled();
  const status = byId("handover-status");
  try {
    const out = await session.request<{ files: OutFile[]; notes: string[]; pass: boolean }>({ op: "download", formats: [format] });
    const file = format === "yaml" ? out.files[0] : out.files.find((f) => f.name.endsWith(suffix));
    if (!file) throw new Error(`no ${suffix} file was written`);
    downloadText(file.name, file.content);
    const lines = [`${file.name}: ${file.content.length} characters`];
    if (!out.pass) lines.push(`the layout fails ${state?.check?.summary.failing.length ?? "some"} check(s): see the Checks tab`);
    for (const n of out.notes) lines.push(`note: ${n}`);
    status.className = "status done";
    status.textContent = lines.join(" — ");
  } catch (e) {
    status.className = "status failed";
    status.textContent = e instanceof Failure ? e.problem.message : String(e);
  }
}

function wireFile(): void {
  byId("new").addEventListener("click", () => void track(settled().then(() => session.request<LiveState>({ op: "blank" }))).then((s) => show(s, true), reportFailure));
  byId("open").addEventListener("click", () => void openFile());
  byId("save").addEventListener("click", () => void download("yaml", ""));
  byId("print").addEventListener("click", () => {
    if (state) renderChecks(state);
    window.print();
  });
  const demo = byId<HTMLSelectElement>("demo");
  for (const [file, title] of DEMOS) demo.append(h("option", { value: file }, title));
  demo.addEventListener("change", () => {
    const d = DEMOS.find(([file]) => file === demo.value);
    if (d) void open(d[2], d[0]);
    demo.value = "";
  });
  const name = byId<HTMLInputElement>("file-name");
  name.addEventListener("change", () => void track(settled().then(() => session.request<LiveState>({ op: "rename", fileName: name.value }))).then((s) => show(s, false), reportFailure));
  const date = byId<HTMLInputElement>("date");
  date.addEventListener("change", () => void track(settled().then(() => session.request<LiveState>({ op: "date", date: date.value.trim() }))).then((s) => show(s, false), reportFailure));
  for (const b of Array.from(byId("downloads").querySelectorAll("button"))) {
    b.addEventListener("click", () => void download(b.dataset.format as DownloadFormat, b.dataset.suffix ?? ""));
  }
}

async function openFile(): Promise<void> {
  const f = await pickTextFile(".yaml,.yml,text/yaml");
  if (f) await open(f.text, f.name);
}

// ── Tabs: arrow keys move between them (WAI-ARIA tabs). ──
function wireTabs(): void {
  const tabs = Array.from(document.querySelectorAll<HTMLButtonElement>('[role="tab"]'));
  const select = (tab: HTMLButtonElement, focus: boolean) => {
    for (const t of tabs) {
      const on = t === tab;
      t.setAttribute("aria-selected", String(on));
      t.tabIndex = on ? 0 : -1;
      byId(t.getAttribute("aria-controls")!).hidden = !on;
    }
    if (focus) tab.focus();
    if (state && tab.id === "tab-checks") renderChecks(state);
    if (state && tab.id === "tab-text") byId("yaml-text").textContent = state.text;
  };
  tabs.forEach((t, i) => {
    t.addEventListener("click", () => select(t, false));
    t.addEventListener("keydown", (e) => {
      const to = e.key === "ArrowRight" ? i + 1 : e.key === "ArrowLeft" ? i - 1 : e.key === "Home" ? 0 : e.key === "End" ? tabs.length - 1 : null;
      if (to === null) return;
      e.preventDefault();
      select(tabs[(to + tabs.length) % tabs.length]!, true);
    });
  });
  document.addEventListener("keydown", (e) => {
    if (e.altKey && /^[1-6]$/.test(e.key)) {
      e.preventDefault();
      select(tabs[Number(e.key) - 1]!, true);
    }
  });
}

// ── Jobs ──
const searchJob = new Job(byId<HTMLButtonElement>("search-run"), byId<HTMLButtonElement>("search-cancel"), byId("search-status"));
const compareJob = new Job(byId<HTMLButtonElement>("compare-run"), byId<HTMLButtonElement>("compare-cancel"), byId("compare-status"));
const scheduleJob = new Job(byId<HTMLButtonElement>("schedule-run"), byId<HTMLButtonElement>("schedule-cancel"), byId("schedule-status"));

const meter = (id: string, on: boolean) => {
  byId(id).hidden = !on;
};

function wireJobs(): void {
  byId("search-run").addEventListener("click", () => void runSearch());
  byId("compare-run").addEventListener("click", () => void runCompare());
  byId("schedule-run").addEventListener("click", () => void runSchedule());
  byId("prices-open").addEventListener("click", async () => {
    const f = await pickTextFile(".yaml,.yml,text/yaml");
    if (!f) return;
    costs = { text: f.text, name: f.name };
    byId("prices-name").textContent = `${f.name} (used by search, compare and schedule)`;
    byId("prices-reset").hidden = false;
  });
  byId("prices-reset").addEventListener("click", () => {
    costs = undefined;
    byId("prices-name").textContent = "the bundled catalogue (illustrative, invented prices)";
    byId("prices-reset").hidden = true;
  });
  byId("project-open").addEventListener("click", async () => {
    const f = await pickTextFile(".yaml,.yml,.json,text/yaml");
    if (f) setProject(f.name, f.text);
  });
  byId("project-demo").addEventListener("click", () => setProject("warehouse-roof-project.yaml", WAREHOUSE));
  byId<HTMLInputElement>("rule-workers").value = String(Math.max(1, Math.min(4, navigator.hardwareConcurrency || 2)));
  document.addEventListener("keydown", (e) => {
    if (e.key === "Escape") for (const j of [searchJob, compareJob, scheduleJob]) if (j.running) j.stop();
    if ((e.ctrlKey || e.metaKey) && (e.key === "o" || e.key === "s")) {
      e.preventDefault();
      if (e.key === "o") void openFile();
      else void download("yaml", "");
    }
  });
}

function setProject(name: string, text: string): void {
  project = { name, text };
  byId("project-name").textContent = `${name} (${text.split("\n").length} lines)`;
}

async function runSearch(): Promise<void> {
  await settled();
  if (!state) return;
  const text = state.text;
  const asked = Number(byId<HTMLInputElement>("search-top").value.trim() || "10");
  // Bounded: at most MAX_TOP rows (each is a full, checked layout kept in memory and drawn in the table).
  const top = Number.isInteger(asked) && asked > 0 ? Math.min(asked, MAX_TOP) : 10;
  byId<HTMLInputElement>("search-top").value = String(top);
  const rankBy = byId<HTMLSelectElement>("search-rank").value as "cost";
  const us = state.file.units === "us";
  const fileName = state.fileName;
  meter("search-meter", true);
  const answer = await searchJob.start("search", (c, progress) => c.request<SearchAnswer>({ op: "search", text, top, rankBy, ...(costs ? { costs } : {}) }, progress));
  meter("search-meter", false);
  if (answer) renderSearch(answer, us, (rank) => void open(answer.saved[rank - 1]!, fileName));
}

async function runCompare(): Promise<void> {
  await settled();
  if (!state) return;
  const text = state.text;
  const request: { classes?: string; sizes?: string; codes?: string } = {};
  for (const k of ["classes", "sizes", "codes"] as const) {
    const v = byId<HTMLInputElement>(`compare-${k}`).value.trim();
    if (v) request[k] = v;
  }
  meter("compare-meter", true);
  const answer = await compareJob.start("compare", (c, progress) => c.request<CompareAnswer>({ op: "compare", text, request, ...(costs ? { costs } : {}) }, progress));
  meter("compare-meter", false);
  if (answer) renderCompare(answer);
}

function wholeOrUndefined(id: string): number | undefined {
  const v = byId<HTMLInputElement>(id).value.trim();
  return v === "" ? undefined : Number(v);
}

async function runSchedule(): Promise<void> {
  if (!project) {
    byId("schedule-status").textContent = "Open a project file (or the demo project) first.";
    return;
  }
  const overrides: { maxTypes?: number; costPerType?: number; oneClassPerDiameter?: boolean; minBoltsPerType?: number } = {};
  const maxTypes = wholeOrUndefined("rule-max-types");
  const costPerType = wholeOrUndefined("rule-cost-per-type");
  const minBolts = wholeOrUndefined("rule-min-bolts");
  const oneClass = byId<HTMLSelectElement>("rule-one-class").value;
  if (maxTypes !== undefined) overrides.maxTypes = maxTypes;
  if (costPerType !== undefined) overrides.costPerType = costPerType;
  if (minBolts !== undefined) overrides.minBoltsPerType = minBolts;
  if (oneClass) overrides.oneClassPerDiameter = oneClass === "yes";
  const bad = [["rule-max-types", maxTypes, 1], ["rule-min-bolts", minBolts, 0], ["rule-cost-per-type", costPerType, 0]].find(([, v, min]) => v !== undefined && !(Number.isFinite(v as number) && (v as number) >= (min as number)));
  if (bad) {
    byId("schedule-status").textContent = `${String(bad[0]).replace("rule-", "")}: must be a number of ${String(bad[2])} or more`;
    return;
  }
  const p = project;
  meter("schedule-meter", true);
  const answer = await scheduleJob.start("schedule", (c, progress) =>
    c.request<ScheduleAnswer>(
      {
        op: "schedule",
        projectText: p.text,
        fileName: p.name,
        ...(costs ? { costs } : {}),
        overrides,
        method: byId<HTMLSelectElement>("rule-method").value as "auto",
        timeLimit_s: Math.max(1, wholeOrUndefined("rule-time-limit") ?? 60),
        workers: Math.max(1, wholeOrUndefined("rule-workers") ?? 2),
      },
      progress,
    ),
  );
  meter("schedule-meter", false);
  if (answer) renderSchedule(answer);
}

async function start(): Promise<void> {
  wireFile();
  wireTabs();
  wireJobs();
  const { codes, prices } = await session.request<{ codes: CodeInfo[]; prices: Record<string, Record<string, number>> }>({ op: "catalogue" });
  form.setCatalogue(codes, prices);
  await open(FOOTBRIDGE, "footbridge-tie.yaml");
}

void start();
