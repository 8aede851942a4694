/** Small DOM helpers for the workbench page. */

type Attrs = Record<string, string | number | boolean | undefined | null>;
type Child = Node | string | null | undefined | false;

/** An element with attributes (false/undefined/null leave one out) and children. */
export function h<K extends keyof HTMLElementTagNameMap>(tag: K, attrs: Attrs = {}, ...children: Child[]): HTMLElementTagNameMap[K] {
  const el = document.createElement(tag);
  for (const [k, v] of Object.entries(attrs)) {
    if (v === undefined || v === null || v === false) continue;
    el.setAttribute(k, v === true ? "" : String(v));
  }
  for (const c of children) if (c !== null && c !== undefined && c !== false) el.append(c);
  return el;
}

export function byId<T extends HTMLElement = HTMLElement>(id: string): T {
  const el = document.getElementById(id);
  if (!el) throw new Error(`the page has no #${id}`);
  return el as T;
}

const TYPES: Record<string, string> = {
  svg: "image/svg+xml",
  dxf: "application/dxf",
  csv: "text/csv",
  json: "application/json",
  html: "text/html",
  yaml: "application/yaml",
};

/** Offer text as a file download, byte for byte (UTF-8, no byte-order mark). */
export function downloadText(name: string, content: string): void {
  const ext = name.slice(name.lastIndexOf(".") + 1).toLowerCase();
  const url = URL.createObjectURL(new Blob([content], { type: TYPES[ext] ?? "text/plain" }));
  const a = h("a", { href: url, download: name, hidden: true });
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

/** Ask for a local file and read it as text (null when none is chosen). */
export function pickTextFile(accept: string): Promise<{ name: string; text: string } | null> {
  return new Promise((resolve) => {
    const input = h("input", { type: "file", accept, hidden: true });
    input.addEventListener("change", () => {
      const file = input.files?.[0];
      input.remove();
      if (!file) return resolve(null);
      file.text().then((text) => resolve({ name: file.name, text }), () => resolve(null));
    });
    input.addEventListener("cancel", () => {
      input.remove();
      resolve(null);
    });
    document.body.append(input);
    input.click();
  });
}

/** A number with a fixed count of decimals, and thin-space thousands. */
export function fixed(v: number, decimals: number): string {
  if (!Number.isFinite(v)) return "—";
  const [whole, frac] = Math.abs(v).toFixed(decimals).split(".");
  const grouped = whole!.replace(/\B(?=(\d{3})+(?!\d))/g, "\u202f");
  return `${v < 0 ? "−" : ""}${grouped}${frac ? `.${frac}` : ""}`;
}
