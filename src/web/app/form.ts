/**
 * The scenario form: one control per field of the scenario file (src/web/fields.ts), built once;
 * labels, units, suggestions and which fields apply follow the code and the splice as they change.
 * A bad value shows the CLI's own one-line message beside its field.
 */
import { CODE_IDS, fieldKey, fieldOfPath, FIELDS, fieldShown, inputOfValue, SECTIONS, sectionHasValue, unitOf, valueAt, valueOfInput, words, type CodeId, type Field, type FieldContext, type Section } from "../fields.js";
import type { CodeInfo, LiveState } from "../protocol.js";
import { byId, h } from "./dom.js";

export type Edit = (path: string[], value: unknown) => void;

const idOf = (path: readonly string[]) => `f-${path.join("-").replace(/[^a-zA-Z0-9-]/g, "_")}`;

interface Row {
  field: Field;
  section: Section;
  el: HTMLElement;
  label: HTMLElement;
  control?: HTMLInputElement | HTMLSelectElement | HTMLTextAreaElement | undefined;
  msg: HTMLElement;
  hint?: HTMLElement | undefined;
  /** What the label and choices were last drawn for (code, unit, value): redrawn only when it changes. */
  drawn?: string;
}

type Table = Record<string, Record<string, unknown>>;

export class ScenarioForm {
  private readonly rows = new Map<string, Row>();
  private readonly groups = new Map<string, HTMLElement>();
  private catalogue: CodeInfo[] = [];
  private bundledPrices: Record<string, Record<string, number>> = {};
  private state: LiveState | undefined;
  /** The price table and equivalents as last edited here (edits may still be on their way). */
  private prices: Table = {};
  private equivalents: Record<string, Array<Record<string, string>>> = {};

  constructor(
    private readonly root: HTMLElement,
    private readonly banner: HTMLElement,
    private readonly edit: Edit,
  ) {
    for (const s of SECTIONS) this.buildSection(s);
    for (const list of ["grades", "sizes", "classes"]) root.append(h("datalist", { id: `dl-${list}` }));
  }

  setCatalogue(info: CodeInfo[], prices: Record<string, Record<string, number>>): void {
    this.catalogue = info;
    this.bundledPrices = prices;
  }

  private buildSection(s: Section): void {
    const body = s.folded ? h("details", { id: `s-${s.id}`, class: "section" }, h("summary", {}, words(s.title, undefined))) : h("fieldset", { id: `s-${s.id}`, class: "section" }, h("legend", {}, words(s.title, undefined)));
    for (const f of s.fields) body.append(this.buildRow(f, s));
    this.groups.set(s.id, body);
    this.root.append(body);
  }

  private buildRow(field: Field, section: Section): HTMLElement {
    const key = fieldKey(field.path);
    const id = idOf(field.path);
    const msg = h("p", { class: "msg", id: `${id}-msg`, "aria-live": "polite" });
    const label = h("label", { for: id });
    const el = h("div", { class: `field kind-${field.kind}`, "data-path": key });
    const row: Row = { field, section, el, label, msg };
    let control: Row["control"];
    switch (field.kind) {
      case "choice": {
        control = h("select", { id, name: key, "aria-describedby": `${id}-msg` });
        control.addEventListener("change", () => this.edit([...field.path], valueOfInput(field, control!.value)));
        break;
      }
      case "flag": {
        control = h("input", { id, name: key, type: "checkbox", "aria-describedby": `${id}-msg` });
        const box = control as HTMLInputElement;
        box.addEventListener("change", () => this.edit([...field.path], valueOfInput(field, box.checked)));
        break;
      }
      case "points": {
        control = h("textarea", { id, name: key, rows: 4, spellcheck: "false", "aria-describedby": `${id}-msg` });
        control.addEventListener("input", () => this.edit([...field.path], valueOfInput(field, control!.value)));
        break;
      }
      case "prices":
      case "equivalents":
        break;
      default: {
        const numeric = field.kind === "quantity" || field.kind === "number" || field.kind === "count";
        const list = field.kind === "text" || field.kind === "list" ? field.suggestions : undefined;
        control = h("input", { id, name: key, type: "text", autocomplete: "off", spellcheck: "false", inputmode: numeric ? "decimal" : undefined, list: list ? `dl-${list}` : undefined, "aria-describedby": `${id}-msg` });
        control.addEventListener("input", () => this.edit([...field.path], valueOfInput(field, control!.value)));
      }
    }
    row.control = control;
    if (field.kind === "flag") el.append(h("span", { class: "check" }, control!, label));
    else if (field.kind === "prices" || field.kind === "equivalents") el.append(h("div", { class: "label-line", id }, label), h("div", { class: "table-editor", id: `${id}-table` }));
    else el.append(label, control!);
    if (field.hint) {
      row.hint = h("p", { class: "hint" });
      el.append(row.hint);
    }
    el.append(msg);
    this.rows.set(key, row);
    return el;
  }

  /** Bring the form up to the state: labels, what applies, messages; values too when `fill`. */
  refresh(state: LiveState, fill: boolean): void {
    this.state = state;
    const ctx: FieldContext = { file: state.file, codeId: state.codeId };
    const info = this.catalogue.find((c) => c.id === state.codeId) ?? this.catalogue[0];
    if (info) this.fillSuggestions(info, state);
    for (const s of SECTIONS) {
      const group = this.groups.get(s.id)!;
      const any = s.fields.some((f) => fieldShown(f, s, ctx));
      group.hidden = !any;
      group.querySelector("legend, summary")!.textContent = words(s.title, state.codeId);
      if (fill && group instanceof HTMLDetailsElement) group.open = sectionHasValue(s, state.file);
    }
    for (const row of this.rows.values()) this.refreshRow(row, ctx, fill);
    this.showProblem(state);
  }

  private refreshRow(row: Row, ctx: FieldContext, fill: boolean): void {
    const { field } = row;
    row.el.hidden = !fieldShown(field, row.section, ctx);
    const unit = unitOf(field, ctx.file);
    const value = valueAt(ctx.file, field.path);
    const c = row.control;
    const drawn = `${ctx.codeId ?? ""}|${unit}|${c instanceof HTMLSelectElement ? String(value) : ""}`;
    if (fill || row.drawn !== drawn) this.redrawRow(row, ctx, unit, value, fill);
    row.drawn = drawn;
    if (fill && c) {
      const text = inputOfValue(field, value);
      if (c instanceof HTMLInputElement && c.type === "checkbox") c.checked = text === true;
      else if (!(c instanceof HTMLSelectElement)) c.value = String(text);
    }
    if (field.kind === "prices") this.refreshPrices(row, ctx, fill);
    if (field.kind === "equivalents") this.refreshEquivalents(row, fill);
  }

  /** Label, hint, choices and placeholder in the code's words. */
  private redrawRow(row: Row, ctx: FieldContext, unit: string, value: unknown, fill: boolean): void {
    const { field } = row;
    row.label.replaceChildren(words(field.label, ctx.codeId), unit ? h("span", { class: "unit" }, ` ${unit}`) : "");
    if (row.hint && field.hint) row.hint.textContent = words(field.hint, ctx.codeId);
    const c = row.control;
    if (c instanceof HTMLSelectElement && field.kind === "choice") {
      const current = value === undefined ? "" : String(value);
      const options = [h("option", { value: "" }, field.blank !== undefined ? `default: ${words(field.blank, ctx.codeId)}` : "— choose —")];
      for (const ch of field.choices) options.push(h("option", { value: String(ch.value) }, words(ch.text, ctx.codeId)));
      if (current && !field.choices.some((ch) => String(ch.value) === current)) options.push(h("option", { value: current }, current));
      const selected = fill ? current : c.value;
      c.replaceChildren(...options);
      c.value = selected;
    } else if (c && "placeholder" in c && field.kind !== "flag") {
      const blank = "blank" in field && field.blank !== undefined && typeof field.blank !== "boolean" ? `default: ${words(field.blank, ctx.codeId)}` : "";
      c.placeholder = blank;
    }
  }

  private fillSuggestions(info: CodeInfo, state: LiveState): void {
    const assembly = valueAt(state.file, ["bolts", "type"]) === "friction-grip" ? "friction-grip" : "bearing";
    const lists: Record<string, string[]> = { grades: info.grades, sizes: info.sizes, classes: info.classes[assembly] };
    for (const [name, values] of Object.entries(lists)) {
      const dl = byId(`dl-${name}`);
      if (dl.dataset.code === `${info.id}/${assembly}`) continue;
      dl.dataset.code = `${info.id}/${assembly}`;
      dl.replaceChildren(...values.map((v) => h("option", { value: v })));
    }
  }

  /** Bolt assembly prices: sizes of the code by class, the catalogue's price as the placeholder. */
  private refreshPrices(row: Row, ctx: FieldContext, fill: boolean): void {
    const holder = row.el.querySelector(".table-editor")!;
    const info = this.catalogue.find((c) => c.id === ctx.codeId) ?? this.catalogue[0];
    if (!info) return;
    if (fill) this.prices = structuredClone((valueAt(ctx.file, row.field.path) as Table | undefined) ?? {});
    const classes = ["4.6", "5.6", "8.8", "10.9"];
    if (!fill && holder.getAttribute("data-code") === info.id && holder.childElementCount > 0) return;
    holder.setAttribute("data-code", info.id);
    const head = h("tr", {}, h("th", { scope: "col" }, "size"), ...classes.map((c) => h("th", { scope: "col" }, c)));
    const body = info.sizes.map((size) =>
      h(
        "tr",
        {},
        h("th", { scope: "row" }, size),
        ...classes.map((cls) => {
          const bundled = this.bundledPrices[size]?.[cls];
          const own = this.prices[size]?.[cls];
          const input = h("input", { type: "text", inputmode: "decimal", "aria-label": `price of ${size} ${cls}`, placeholder: bundled !== undefined ? String(bundled) : "", value: own !== undefined ? String(own) : undefined, disabled: bundled === undefined && own === undefined ? true : undefined });
          input.addEventListener("input", () => {
            const v = valueOfInput({ kind: "number", path: [], label: "" }, input.value);
            const entry = { ...(this.prices[size] ?? {}) };
            if (v === undefined) delete entry[cls];
            else entry[cls] = v;
            if (Object.keys(entry).length > 0) this.prices[size] = entry;
            else delete this.prices[size];
            this.edit([...row.field.path], Object.keys(this.prices).length > 0 ? structuredClone(this.prices) : undefined);
          });
          return h("td", {}, input);
        }),
      ),
    );
    holder.replaceChildren(h("table", { class: "grid" }, h("thead", {}, head), h("tbody", {}, ...body)));
  }

  /** Rows of equivalent materials, one column per code; a blank table means the bundled one. */
  private refreshEquivalents(row: Row, fill: boolean): void {
    const key = fieldKey(row.field.path);
    const holder = row.el.querySelector(".table-editor")!;
    if (!fill && holder.childElementCount > 0) return;
    const value = this.state ? valueAt(this.state.file, row.field.path) : undefined;
    this.equivalents[key] = Array.isArray(value) ? (value as Array<Record<string, unknown>>).map((r) => Object.fromEntries(Object.entries(r ?? {}).map(([k, v]) => [k, String(v)]))) : [];
    const send = () => {
      const rows = this.equivalents[key]!.map((r) => Object.fromEntries(Object.entries(r).filter(([, v]) => v.trim() !== ""))).filter((r) => Object.keys(r).length > 0);
      this.edit([...row.field.path], rows.length > 0 ? rows : undefined);
    };
    const render = () => {
      const lines = this.equivalents[key]!;
      const head = h("tr", {}, ...CODE_IDS.map((c) => h("th", { scope: "col" }, c)));
      const body = lines.map((line, i) =>
        h(
          "tr",
          {},
          ...CODE_IDS.map((c: CodeId) => {
            const input = h("input", { type: "text", "aria-label": `${words(row.field.label, undefined)}, row ${i + 1}, ${c}`, value: line[c] ?? "" });
            input.addEventListener("input", () => {
              line[c] = input.value;
              send();
            });
            return h("td", {}, input);
          }),
        ),
      );
      const add = h("button", { type: "button", class: "small" }, "Add a row");
      add.addEventListener("click", () => {
        lines.push({});
        render();
        (holder.querySelector("tbody tr:last-child input") as HTMLInputElement | null)?.focus();
      });
      holder.replaceChildren(h("table", { class: "grid" }, h("thead", {}, head), h("tbody", {}, ...body)), add, lines.length === 0 ? h("p", { class: "hint" }, "Blank: the bundled table of nearest equivalents is used.") : "");
    };
    render();
  }

  private showProblem(state: LiveState): void {
    for (const row of this.rows.values()) {
      row.msg.textContent = "";
      row.el.classList.remove("bad");
      row.control?.removeAttribute("aria-invalid");
    }
    this.banner.hidden = true;
    this.banner.textContent = "";
    const p = state.problem;
    if (!p) return;
    const row = p.kind === "input" ? this.rowOf(p.path) : undefined;
    if (row && !row.el.hidden) {
      row.msg.textContent = p.message;
      row.el.classList.add("bad");
      row.control?.setAttribute("aria-invalid", "true");
      const group = this.groups.get(row.section.id);
      if (group instanceof HTMLDetailsElement) group.open = true;
    } else {
      this.banner.hidden = false;
      this.banner.textContent = p.kind === "internal" ? `internal error: ${p.message}` : p.message;
      // A field the form has no control for (from an opened file): offer to take it out.
      if (p.kind === "input" && p.path && / unknown field /.test(` ${p.message} `)) {
        const remove = h("button", { type: "button", class: "small", id: "remove-unknown" }, `Remove ${p.path} from the scenario`);
        remove.addEventListener("click", () => this.edit(p.path.split(".").filter(Boolean), undefined));
        this.banner.append(" ", remove);
      }
    }
  }

  /** The row a message's path names: its field, or the first field inside the section it names. */
  private rowOf(path: string): Row | undefined {
    const field = fieldOfPath(path);
    if (field) return this.rows.get(fieldKey(field.path));
    const inside = FIELDS.find((f) => fieldKey(f.path).startsWith(`${path}.`));
    return inside ? this.rows.get(fieldKey(inside.path)) : undefined;
  }

  /** Focus the field a problem names, if any. */
  focusProblem(): void {
    const bad = this.root.querySelector(".field.bad input, .field.bad select, .field.bad textarea") as HTMLElement | null;
    bad?.focus();
  }
}
