/**
 * The long jobs: search, compare and the whole-job schedule, each in a worker of its own with progress
 * and a Cancel that ends the worker. The tables show the rows `search --json`, `compare --json` and
 * `schedule --json` carry.
 */
import type { CatalogueText, Progress, ScheduleRequest } from "../protocol.js";
import { Cancelled, Failure, WorkerClient } from "./client.js";
import { byId, downloadText, fixed, h } from "./dom.js";
import { bar } from "./results.js";
import { toUnit } from "../../units/units.js";

/**
 * One job at a time per panel: its worker, ended by Cancel or Escape. A worker that finished its job is
 * kept as the spare for the next one (its code already compiled); a cancelled or failed one is ended.
 */
export class Job {
  private static spare: WorkerClient | undefined;
  private client: WorkerClient | undefined;

  /** Start the spare worker ahead of the first job. */
  static prewarm(): void {
    Job.spare ??= new WorkerClient();
  }

  constructor(
    private readonly run: HTMLButtonElement,
    private readonly cancel: HTMLButtonElement,
    private readonly status: HTMLElement,
  ) {
    cancel.addEventListener("click", () => this.stop());
  }

  get running(): boolean {
    return this.client !== undefined;
  }

  stop(): void {
    this.client?.terminate();
  }

  /** Start `work` in a fresh worker; progress goes to the status line. Resolves null when cancelled or failed. */
  async start<T>(what: string, work: (c: WorkerClient, progress: (p: Progress) => void) => Promise<T>): Promise<T | null> {
    this.stop();
    const client = Job.spare ?? new WorkerClient();
    Job.spare = undefined;
    this.client = client;
    let keep = false;
    this.run.disabled = true;
    this.cancel.disabled = false;
    const t0 = performance.now();
    this.status.className = "status running";
    this.status.textContent = `${what}…`;
    const progress = (p: Progress) => {
      const parts = [p.stage];
      if (p.done !== undefined && p.total !== undefined) parts.push(`${p.done} of ${p.total}`);
      if (p.checks !== undefined) parts.push(`${fixed(p.checks, 0)} layouts checked`);
      parts.push(`${fixed((performance.now() - t0) / 1000, 1)} s`);
      this.status.textContent = `${parts.join(" · ")} — Cancel or Esc stops it`;
      const meter = this.status.parentElement?.querySelector("progress");
      if (meter instanceof HTMLProgressElement) {
        if (p.done !== undefined && p.total) {
          meter.max = p.total;
          meter.value = p.done;
        } else meter.removeAttribute("value");
      }
    };
    try {
      const value = await work(client, progress);
      keep = true;
      this.status.className = "status done";
      this.status.textContent = `${what}: done in ${fixed((performance.now() - t0) / 1000, 2)} s`;
      return value;
    } catch (e) {
      if (e instanceof Cancelled) {
        this.status.className = "status cancelled";
        this.status.textContent = `${what}: cancelled`;
      } else {
        this.status.className = "status failed";
        this.status.textContent = e instanceof Failure ? (e.problem.kind === "internal" ? `internal error: ${e.problem.message}` : e.problem.message) : String(e);
      }
      return null;
    } finally {
      if (keep && !Job.spare) Job.spare = client;
      else client.terminate();
      if (this.client === client) this.client = undefined;
      this.run.disabled = false;
      this.cancel.disabled = true;
    }
  }
}

export interface ResultRow {
  rank: number;
  bolt: string;
  pattern: string;
  counts: string;
  pitch_mm: number | null;
  gauge_mm: number | null;
  endDistance_mm: number;
  endDistanceAtButt_mm: number | null;
  edgeDistance_mm: number;
  coverThickness_mm: number | null;
  bolts: number;
  spliceLength_mm: number;
  jointStrength_kN: number;
  efficiency: number;
  utilisation: number;
  cost: number;
  governing: string;
}

export interface SearchAnswer {
  json: { results: ResultRow[]; searchSpace: string[]; currency: string; noResult?: string; provenStatement: string; stats: Record<string, number> };
  saved: string[];
}

const len = (mm: number | null, us: boolean) => (mm === null ? "—" : us ? toUnit(mm, "in", "length").toFixed(3).replace(/\.?0+$/, "") : fixed(mm, 0));

/** The search's rows, each with a button that loads it into the form. */
export function renderSearch(answer: SearchAnswer, us: boolean, load: (rank: number) => void): void {
  const box = byId("search-results");
  const j = answer.json;
  const space = h("details", { class: "space" }, h("summary", {}, "Search space searched"), h("ul", {}, ...j.searchSpace.map((l) => h("li", {}, l))));
  if (j.results.length === 0) {
    box.replaceChildren(h("p", { class: "none", id: "search-none" }, `No compliant layout: ${j.noResult ?? "nothing in the space passes"}`), space);
    return;
  }
  const u = us ? "in" : "mm";
  const head = ["#", "Bolt", "Pattern", "Counts", `Pitch ${u}`, `Gauge ${u}`, `End / at butt ${u}`, `Edge ${u}`, `Cover t ${u}`, "Bolts", `Length ${u}`, `Strength ${us ? "kips" : "kN"}`, "Efficiency", "Utilisation", `Cost`, ""];
  const rows = j.results.map((r) => {
    const button = h("button", { type: "button", class: "small", "data-rank": r.rank }, "Load");
    button.addEventListener("click", () => load(r.rank));
    return h(
      "tr",
      { "data-rank": r.rank },
      h("th", { scope: "row" }, String(r.rank)),
      h("td", {}, r.bolt),
      h("td", {}, r.pattern),
      h("td", {}, r.counts),
      h("td", { class: "num" }, len(r.pitch_mm, us)),
      h("td", { class: "num" }, len(r.gauge_mm, us)),
      h("td", { class: "num" }, r.endDistanceAtButt_mm === null ? len(r.endDistance_mm, us) : `${len(r.endDistance_mm, us)} / ${len(r.endDistanceAtButt_mm, us)}`),
      h("td", { class: "num" }, len(r.edgeDistance_mm, us)),
      h("td", { class: "num" }, len(r.coverThickness_mm, us)),
      h("td", { class: "num" }, String(r.bolts)),
      h("td", { class: "num" }, len(r.spliceLength_mm, us)),
      h("td", { class: "num" }, us ? fixed(toUnit(r.jointStrength_kN * 1000, "kip", "force"), 1) : fixed(r.jointStrength_kN, 1)),
      h("td", { class: "num" }, `${fixed(r.efficiency * 100, 1)} %`),
      h("td", { class: "num u" }, fixed(r.utilisation, 2), bar(r.utilisation)),
      h("td", { class: "num" }, fixed(r.cost, 1)),
      h("td", {}, button),
    );
  });
  box.replaceChildren(
    h("table", { class: "results", id: "search-table" }, h("thead", {}, h("tr", {}, ...head.map((t) => h("th", { scope: "col" }, t)))), h("tbody", {}, ...rows)),
    h("p", { class: "hint" }, `Cost in ${j.currency}. Every row has passed every check of the checker on its hole coordinates. ${j.provenStatement}. Utilisation: the highest of any check, spacing and edge rules included.`),
    space,
  );
}

export interface CompareAnswer {
  currency: string;
  columns: Array<{ label: string; code: string; best: ResultRow | null; costDifference: number | null; mapping: string[]; noResult?: string | null }>;
  mappingCaveat: string;
}

/** The comparison: a table, one column per choice, and bar charts of cost, bolts and splice length. */
export function renderCompare(a: CompareAnswer): void {
  const box = byId("compare-results");
  const cols = a.columns;
  const cell = (f: (r: ResultRow) => string) => cols.map((c) => h("td", {}, c.best ? f(c.best) : "—"));
  const rows: Array<[string, HTMLElement[]]> = [
    ["Code", cols.map((c) => h("td", {}, c.code))],
    ["Bolt", cell((r) => r.bolt)],
    ["Pattern", cell((r) => r.pattern)],
    ["Counts", cell((r) => r.counts)],
    ["Pitch / gauge (mm)", cell((r) => `${len(r.pitch_mm, false)} / ${len(r.gauge_mm, false)}`)],
    ["End / edge (mm)", cell((r) => `${len(r.endDistance_mm, false)} / ${len(r.edgeDistance_mm, false)}`)],
    ["Bolt count", cell((r) => String(r.bolts))],
    ["Splice length (mm)", cell((r) => fixed(r.spliceLength_mm, 0))],
    ["Joint strength (kN)", cell((r) => fixed(r.jointStrength_kN, 1))],
    ["Efficiency", cell((r) => `${fixed(r.efficiency * 100, 1)} %`)],
    ["Cost", cell((r) => fixed(r.cost, 1))],
    ["Cost above cheapest", cols.map((c) => h("td", {}, c.costDifference === null ? "—" : c.costDifference === 0 ? "cheapest" : `+${fixed(c.costDifference, 1)}`))],
    ["Governing check", cols.map((c) => h("td", {}, c.best ? c.best.governing : c.noResult ? "no compliant layout" : "—"))],
  ];
  const table = h("table", { class: "compare", id: "compare-table" }, h("thead", {}, h("tr", {}, h("td", {}), ...cols.map((c) => h("th", { scope: "col" }, c.label)))), h("tbody", {}, ...rows.map(([name, cells]) => h("tr", {}, h("th", { scope: "row" }, name), ...cells))));
  const charts = h("div", { class: "charts" }, chart(`Cost (${a.currency})`, cols.map((c) => [c.label, c.best?.cost ?? null])), chart("Bolts", cols.map((c) => [c.label, c.best?.bolts ?? null])), chart("Splice length (mm)", cols.map((c) => [c.label, c.best?.spliceLength_mm ?? null])));
  const notes: HTMLElement[] = [];
  const mapped = cols.filter((c) => c.mapping.length > 0);
  if (mapped.length > 0) notes.push(h("p", { class: "hint" }, `Mapping (${a.mappingCaveat}): `, ...mapped.map((c) => `${c.code}: ${c.mapping.join("; ")}. `)));
  for (const c of cols) if (!c.best && c.noResult) notes.push(h("p", { class: "none" }, `${c.label}: ${c.noResult}`));
  box.replaceChildren(table, charts, ...notes);
}

/** A horizontal bar chart (SVG): one bar per column, its value written at the end. */
function chart(title: string, values: Array<[string, number | null]>): HTMLElement {
  const NS = "http://www.w3.org/2000/svg";
  const rowH = 26;
  const labelW = 130;
  const barW = 200;
  const height = values.length * rowH + 8;
  const svg = document.createElementNS(NS, "svg");
  svg.setAttribute("viewBox", `0 0 ${labelW + barW + 70} ${height}`);
  svg.setAttribute("role", "img");
  svg.setAttribute("aria-label", `${title}: ${values.map(([l, v]) => `${l} ${v === null ? "none" : fixed(v, 0)}`).join(", ")}`);
  const top = Math.max(1, ...values.map(([, v]) => v ?? 0));
  values.forEach(([label, v], i) => {
    const y = 4 + i * rowH;
    const t = document.createElementNS(NS, "text");
    t.setAttribute("x", String(labelW - 6));
    t.setAttribute("y", String(y + 16));
    t.setAttribute("text-anchor", "end");
    t.textContent = label;
    svg.append(t);
    if (v !== null) {
      const r = document.createElementNS(NS, "rect");
      r.setAttribute("x", String(labelW));
      r.setAttribute("y", String(y + 3));
      r.setAttribute("height", String(rowH - 8));
      r.setAttribute("width", String(Math.max(1, (barW * v) / top)));
      r.setAttribute("class", "bar");
      svg.append(r);
    }
    const n = document.createElementNS(NS, "text");
    n.setAttribute("x", String(labelW + (v === null ? 0 : (barW * v) / top) + 6));
    n.setAttribute("y", String(y + 16));
    n.textContent = v === null ? "no layout" : fixed(v, 0);
    svg.append(n);
  });
  return h("figure", { class: "chart" }, h("figcaption", {}, title), svg as unknown as HTMLElement);
}

export interface ScheduleAnswer {
  scheduled: boolean;
  message?: string;
  searched?: number;
  json?: {
    project: string;
    code: string;
    currency: string;
    rulesText: string[];
    method: string;
    proven: boolean;
    provenStatement: string;
    types: Array<{ type: string; splices: number; bolts: number; layoutCost: number }>;
    splices: Array<{ id: string; mark: string; quantity: number; type: string; layout: { pattern: string; counts: string; pitch_mm: number | null; gauge_mm: number | null; endDistance_mm: number; utilisation: number }; boltsEach: number; bolts: number; costEach: number; cost: number; ownOptimum: { type: string; costEach: number }; premium: number }>;
    totals: { splices: number; bolts: number; typesUsed: number; layoutCost: number; stockingCost: number; total: number; ownOptimum: { total: number }; premium: number; premiumWithStocking: number };
    order: Array<{ type: string; kind: string; item: string; length_mm: number | null; quantity: number; standard: string }>;
    notes: string[];
  };
  files?: Array<{ name: string; content: string }>;
}

export function renderSchedule(a: ScheduleAnswer): void {
  const box = byId("schedule-results");
  if (!a.scheduled || !a.json) {
    box.replaceChildren(h("p", { class: "none", id: "schedule-none" }, a.message ?? "No schedule."));
    return;
  }
  const j = a.json;
  const t = j.totals;
  const types = h("table", { class: "results", id: "schedule-types" }, h("thead", {}, h("tr", {}, ...["Bolt type", "Splices", "Bolts", `Layout cost (${j.currency})`].map((x) => h("th", { scope: "col" }, x)))), h("tbody", {}, ...j.types.map((u) => h("tr", {}, h("th", { scope: "row" }, u.type), h("td", { class: "num" }, String(u.splices)), h("td", { class: "num" }, String(u.bolts)), h("td", { class: "num" }, fixed(u.layoutCost, 1))))));
  const rows = j.splices.map((s) =>
    h("tr", {}, h("th", { scope: "row" }, s.id), h("td", {}, s.mark), h("td", { class: "num" }, String(s.quantity)), h("td", {}, s.type), h("td", {}, `${s.layout.pattern}, ${s.layout.counts}`), h("td", { class: "num" }, String(s.boltsEach)), h("td", { class: "num u" }, fixed(s.layout.utilisation, 2)), h("td", { class: "num" }, fixed(s.costEach, 1)), h("td", {}, s.ownOptimum.type), h("td", { class: "num" }, fixed(s.premium, 1))),
  );
  const splices = h("table", { class: "results", id: "schedule-table" }, h("thead", {}, h("tr", {}, ...["Splice", "Mark", "Qty", "Bolt type", "Layout", "Bolts each", "Util.", "Cost each", "Own optimum", "Premium"].map((x) => h("th", { scope: "col" }, x)))), h("tbody", {}, ...rows));
  const order = h("table", { class: "results", id: "schedule-order" }, h("thead", {}, h("tr", {}, ...["Type", "Item", "Length mm", "Quantity", "Standard"].map((x) => h("th", { scope: "col" }, x)))), h("tbody", {}, ...j.order.map((o) => h("tr", {}, h("td", {}, o.type), h("td", {}, `${o.kind}: ${o.item}`), h("td", { class: "num" }, o.length_mm === null ? "—" : String(o.length_mm)), h("td", { class: "num" }, String(o.quantity)), h("td", {}, o.standard)))));
  const downloads = h("p", { class: "downloads" }, ...(a.files ?? []).map((f) => {
    const b = h("button", { type: "button", "data-file": f.name }, `Download ${f.name}`);
    b.addEventListener("click", () => downloadText(f.name, f.content));
    return b;
  }));
  box.replaceChildren(
    h("p", { class: "statement", id: "schedule-statement", "data-total": String(t.total) }, `${j.project}: ${t.splices} splices, ${t.bolts} bolts, ${t.typesUsed} bolt type${t.typesUsed === 1 ? "" : "s"}; total ${fixed(t.total, 2)} ${j.currency} (layouts ${fixed(t.layoutCost, 2)} + stocking ${fixed(t.stockingCost, 2)}); each splice's own optimum ${fixed(t.ownOptimum.total, 2)}, premium ${fixed(t.premiumWithStocking, 2)} with stocking. ${j.method}: ${j.provenStatement}.`),
    h("p", { class: "hint" }, `Rules: ${j.rulesText.join("; ")}.`),
    h("h3", {}, "Bolt types chosen"),
    types,
    h("h3", {}, "Splices"),
    splices,
    h("h3", {}, "Bolts to order"),
    order,
    ...(j.notes.length > 0 ? [h("ul", { class: "warnings" }, ...j.notes.map((n) => h("li", {}, n)))] : []),
    downloads,
  );
}

export type { CatalogueText, ScheduleRequest };
