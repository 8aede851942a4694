/**
 * The live result: the summary (verdict, load against joint strength, strength utilisation apart from
 * the detailing rules, governing check, efficiency), the drawing as `export` draws it, and the full
 * list of checks. Only figures the check produced are shown; nothing is computed here.
 */
import { words, type Words } from "../fields.js";
import type { LiveState } from "../protocol.js";
import type { SummaryCheck, WorkbenchSummary } from "../summary.js";
import { forceText, lengthText } from "../../report/format.js";
import { byId, fixed, h } from "./dom.js";

/** Forces and lengths as every shell prints them (src/report/format.ts): 0.1 kN or kips; lengths at their own precision. */
const force = forceText;
const length = lengthText;

/** A utilisation bar: the figure in words beside it; past 1 the bar is drawn full and marked. */
export function bar(u: number): HTMLElement {
  const width = Math.max(0, Math.min(1, u)) * 100;
  return h("span", { class: `ubar${u > 1 ? " over" : ""}`, role: "img", "aria-label": `utilisation ${fixed(u, 3)}` }, h("span", { class: "fill", style: `width:${width.toFixed(1)}%` }), h("span", { class: "tick" }));
}

/** A check's two figures as printed: demand and resistance, or value and limit. */
function figureTexts(f: SummaryCheck["figures"], units: "si" | "us"): [string, string] {
  return f.kind === "strength" ? [force(f.demand_N, units), force(f.resistance_N, units)] : [length(f.value_mm, units), length(f.limit_mm, units)];
}

function checkLine(c: SummaryCheck, units: "si" | "us"): string {
  const f = c.figures;
  const [a, b] = figureTexts(f, units);
  const numbers = f.kind === "strength" ? `${a} against ${b}` : `${a} against a ${f.bound === "min" ? "minimum" : "maximum"} of ${b}`;
  return `${c.title} (${c.component}), ${c.clause}: ${numbers}`;
}

/**
 * The summary. After an edit that makes the input bad, the last result stays, dimmed, under the
 * problem's line (so the page does not jump); after opening a file or New, nothing stale is kept.
 */
export function renderSummary(state: LiveState, keepLast: boolean): void {
  const box = byId("summary");
  const s = state.check?.summary;
  box.querySelector(".problem-note")?.remove();
  if (!s) {
    const problem = state.problem ? (state.problem.kind === "internal" ? `internal error: ${state.problem.message}` : state.problem.message) : "";
    if (state.problem && keepLast && box.dataset.result === "1") {
      box.classList.add("stale");
      box.prepend(h("p", { class: "problem-note", role: "status" }, "No result until the input is corrected: ", h("span", { class: "problem-line" }, problem), ". Dimmed: the result before the change."));
      return;
    }
    const why = state.problem
      ? h("p", { class: "pending" }, "No result until the input is corrected: ", h("span", { class: "problem-line" }, problem))
      : state.searchOnly
        ? h("p", { class: "pending" }, "No bolts or layout given: this scenario is for the search. Run a search and load an arrangement into the form.")
        : h("p", { class: "pending" }, "No result.");
    box.replaceChildren(h("div", { class: "verdict none", id: "verdict" }, h("span", { class: "word" }, "—")), why);
    box.dataset.result = "0";
    box.classList.remove("stale");
    return;
  }
  box.classList.remove("stale");
  box.dataset.result = "1";
  box.replaceChildren(...summaryParts(s, state));
}

/** The summary's terms in each code's words. */
const LOAD: Words = { "is800-2007": "Factored tension T", "en1993-1-8": "Design tension NEd", "aisc360-16": "Required strength Pu (LRFD)" };
const STRENGTH: Words = { "is800-2007": "Design strength of the joint", "en1993-1-8": "Design resistance of the joint", "aisc360-16": "Design strength φRn of the joint" };

/** One of the core summary's rows, worded as every shell words it. */
const row = (s: WorkbenchSummary, key: WorkbenchSummary["rows"][number]["key"]) => s.rows.find((r) => r.key === key);

function summaryParts(s: WorkbenchSummary, state: LiveState): HTMLElement[] {
  const verdict = h(
    "div",
    { class: `verdict ${s.pass ? "pass" : "fail"}`, id: "verdict", "data-pass": String(s.pass) },
    h("span", { class: "word" }, s.pass ? "PASS" : "FAIL"),
    h("span", { class: "sub" }, s.pass ? `all ${s.checks} checks met` : `${s.failing.length} of ${s.checks} checks not met`),
  );
  const json = state.check!.json;
  const fig = (label: string, id: string, ...value: Array<HTMLElement | string>) => h("div", { class: "figure" }, h("dt", {}, label), h("dd", { id }, ...value));
  const figures = h(
    "dl",
    { class: "figures" },
    fig(words(LOAD, state.codeId), "load", force(s.load_N, s.units)),
    fig(words(STRENGTH, state.codeId), "joint-strength", h("span", { "data-kn": String(json.jointStrength_kN) }, force(s.jointStrength_N, s.units))),
    fig("Strength utilisation", "strength-utilisation", h("span", { class: "num" }, fixed(s.strengthUtilisation, 3)), bar(s.strengthUtilisation), h("span", { class: "state" }, s.strengthPass ? "strength checks met" : "a strength check is not met")),
    ...(s.serviceUtilisation !== null ? [fig("Service utilisation", "service-utilisation", h("span", { class: "num" }, fixed(s.serviceUtilisation, 3)), bar(s.serviceUtilisation), h("span", { class: "state" }, row(s, "service-utilisation")?.value ?? ""))] : []),
    fig("Detailing rules", "rules", row(s, "detailing")?.value ?? "", ...(row(s, "detailing")?.detail ?? []).map((d) => h("span", { class: "definition" }, d))),
    fig("Governing check", "governing", s.governing ? `${s.governing.title} (${s.governing.component}), ${s.governing.clause}` : "—"),
    fig("Efficiency", "efficiency", h("span", { class: "num" }, `${fixed(100 * s.efficiency, 1)} %`), h("span", { class: "definition" }, s.efficiencyDefinition)),
  );
  const parts: HTMLElement[] = [verdict, figures];
  if (s.failing.length > 0) parts.push(h("ul", { class: "failing", "aria-label": "checks not met" }, ...s.failing.map((c) => h("li", {}, checkLine(c, s.units)))));
  if (s.warnings.length > 0) parts.push(h("ul", { class: "warnings", "aria-label": "warnings" }, ...s.warnings.map((w) => h("li", {}, h("code", {}, w.id), " ", w.message))));
  parts.push(h("p", { class: "timing", id: "timing", "data-ms": state.ms.toFixed(2) }, `read, checked and drawn in ${state.ms < 1 ? "under 1" : fixed(state.ms, 0)} ms`));
  return parts;
}

/** The export's own SVG, adopted as a node (scripts and handlers, which it never has, are refused anyway). */
export function renderDrawing(state: LiveState, keepLast: boolean): void {
  const box = byId("drawing-view");
  const svg = state.check?.svg;
  if (!svg && !keepLast) box.replaceChildren();
  if (!svg) {
    if (state.check?.svgProblem) box.replaceChildren(h("p", { class: "pending" }, `No drawing: ${state.check.svgProblem}`));
    else if (!state.problem) box.replaceChildren(h("p", { class: "pending" }, state.searchOnly ? "The drawing appears once the form holds bolts and a layout." : ""));
    box.classList.toggle("stale", Boolean(state.problem));
    return;
  }
  box.classList.remove("stale");
  const parsed = new DOMParser().parseFromString(svg, "image/svg+xml").documentElement;
  parsed.querySelectorAll("script, foreignObject").forEach((n) => n.remove());
  for (const el of [parsed, ...Array.from(parsed.querySelectorAll("*"))]) for (const a of Array.from(el.attributes)) if (/^on/i.test(a.name)) el.removeAttribute(a.name);
  parsed.setAttribute("role", "img");
  parsed.setAttribute("aria-label", `drawing of ${String(state.check?.json.scenario ?? "the splice")}`);
  parsed.removeAttribute("width");
  parsed.removeAttribute("height");
  box.replaceChildren(document.importNode(parsed, true));
}

type CheckJson = {
  id: string;
  title: string;
  component: string;
  clause: string;
  formula: string;
  substituted: string;
  limitState: string;
  utilisation: number;
  pass: boolean;
  notes: string[];
};

/** Every check, grouped by component, with clause, formula, substituted values and utilisation. */
export function renderChecks(state: LiveState): void {
  const box = byId("checks-body");
  const json = state.check?.json;
  if (!json) {
    box.replaceChildren(h("p", { class: "pending" }, "The checks appear once the form holds a complete scenario with bolts and a layout."));
    return;
  }
  const us = json.units === "us";
  const checks = json.checks as CheckJson[];
  const components = [...new Set(checks.map((c) => c.component))];
  const units = us ? "us" : "si";
  // The check's own figures (unrounded, from the summary of the same check); the JSON's kN are rounded
  // to 0.01, and rounding them again for print would differ from the sheet in the last digit.
  const own = state.check!.summary.figuresById;
  const figure = (c: CheckJson) => figureTexts(own[c.id]!, units);
  const groups = components.map((component) =>
    h(
      "tbody",
      {},
      h("tr", { class: "group" }, h("th", { colspan: 7, scope: "rowgroup" }, component)),
      ...checks
        .filter((c) => c.component === component)
        .map((c) => {
          const [a, b] = figure(c);
          return h(
            "tr",
            { class: c.pass ? "pass" : "fail", "data-check": c.id },
            h("th", { scope: "row" }, c.title, c.limitState === "SLS" ? h("span", { class: "tag" }, " service") : ""),
            h("td", { class: "clause" }, c.clause),
            h("td", { class: "formula" }, h("div", {}, c.formula), h("div", { class: "substituted" }, c.substituted), c.notes.length ? h("details", {}, h("summary", {}, "notes"), h("ul", {}, ...c.notes.map((n) => h("li", {}, n)))) : ""),
            h("td", { class: "num" }, a!),
            h("td", { class: "num" }, b!),
            h("td", { class: "num u" }, fixed(c.utilisation, 3), bar(c.utilisation)),
            h("td", { class: "state" }, c.pass ? "met" : "NOT MET"),
          );
        }),
    ),
  );
  const head = h("thead", {}, h("tr", {}, ...["Check", "Clause", "Formula and substituted values", "Demand or value", "Resistance or limit", "Utilisation", ""].map((t) => h("th", { scope: "col" }, t))));
  const conventions = json.conventions as string[];
  box.replaceChildren(
    h("table", { class: "checks" }, head, ...groups),
    h("h3", {}, "Conventions"),
    h("ul", { class: "conventions" }, ...conventions.map((c) => h("li", {}, c))),
    h("p", { class: "caution" }, String(json.caution)),
  );
}
