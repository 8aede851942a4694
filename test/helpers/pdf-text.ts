/**
 * The text of each page of a PDF that Chromium prints (its Skia PDF writer): page size, and the text the
 * page shows, decoded through each font's ToUnicode CMap. A reader for these files only (uncompressed
 * object dictionaries, Flate streams, Type0 fonts with hex strings, PDF 1.4 cross-reference table) — not
 * a general PDF parser; it throws when a file uses what it does not read, so a test cannot pass on
 * text it failed to find. Checked against poppler's pdftotext on the demo reports while writing it.
 */
import { inflateSync } from "node:zlib";

export interface PdfPage {
  /** MediaBox width and height, points (A4 portrait about 595 × 842). */
  width_pt: number;
  height_pt: number;
  /** The text shown, one text-showing operation per space-separated run, in content order. */
  text: string;
  /**
   * Points of paper per CSS pixel, from the transformations the page content opens with: 0.75 (72/96)
   * when the browser printed at 100 %, less when it shrank the page to fit.
   */
  pointsPerPx: number;
}

interface PdfObject {
  dict: string;
  stream?: Buffer;
}

function objectsOf(pdf: Buffer): Map<number, PdfObject> {
  const s = pdf.toString("latin1");
  const objects = new Map<number, PdfObject>();
  const head = /(\d+) 0 obj\b/g;
  for (let m = head.exec(s); m; m = head.exec(s)) {
    const start = m.index + m[0].length;
    const end = s.indexOf("endobj", start);
    if (end < 0) throw new Error(`object ${m[1]}: no endobj`);
    const body = s.slice(start, end);
    const at = body.search(/\bstream\r?\n/);
    if (at < 0) {
      objects.set(Number(m[1]), { dict: body });
      continue;
    }
    const dict = body.slice(0, at);
    const dataStart = start + at + (body.slice(at).startsWith("stream\r\n") ? 8 : 7);
    const length = /\/Length (\d+)(?! \d+ R)/.exec(dict);
    const dataEnd = length ? dataStart + Number(length[1]) : s.indexOf("endstream", dataStart);
    let data: Buffer = pdf.subarray(dataStart, dataEnd);
    if (/\/Filter\s*\/FlateDecode/.test(dict)) data = inflateSync(data);
    else if (/\/Filter/.test(dict)) throw new Error(`object ${m[1]}: a stream filter other than FlateDecode`);
    objects.set(Number(m[1]), { dict, stream: data });
    head.lastIndex = end;
  }
  if (objects.size === 0) throw new Error("no PDF objects found");
  if (s.includes("/ObjStm")) throw new Error("object streams are not read");
  return objects;
}

const ref = (text: string, key: string): number | undefined => {
  const m = new RegExp(`/${key}\\s+(\\d+) 0 R`).exec(text);
  return m ? Number(m[1]) : undefined;
};

/** A ToUnicode CMap: code (hex, as written) to text; and the code length in hex digits. */
function cmapOf(text: string): { map: Map<string, string>; digits: number } {
  const map = new Map<string, string>();
  const utf16 = (hex: string) => String.fromCharCode(...(hex.match(/.{4}/g) ?? []).map((h) => parseInt(h, 16)));
  const space = /begincodespacerange\s*<([0-9A-Fa-f]+)>/.exec(text);
  const digits = space ? space[1]!.length : 4;
  for (const block of text.matchAll(/beginbfchar([\s\S]*?)endbfchar/g))
    for (const m of block[1]!.matchAll(/<([0-9A-Fa-f]+)>\s*<([0-9A-Fa-f]+)>/g)) map.set(m[1]!.toUpperCase(), utf16(m[2]!));
  for (const block of text.matchAll(/beginbfrange([\s\S]*?)endbfrange/g)) {
    for (const m of block[1]!.matchAll(/<([0-9A-Fa-f]+)>\s*<([0-9A-Fa-f]+)>\s*(<[0-9A-Fa-f]+>|\[[^\]]*\])/g)) {
      const lo = parseInt(m[1]!, 16);
      const hi = parseInt(m[2]!, 16);
      const dst = m[3]!;
      const list = dst.startsWith("[") ? [...dst.matchAll(/<([0-9A-Fa-f]+)>/g)].map((x) => x[1]!) : null;
      for (let c = lo; c <= hi; c++) {
        const key = c.toString(16).toUpperCase().padStart(m[1]!.length, "0");
        if (list) map.set(key, utf16(list[c - lo] ?? ""));
        else {
          const base = parseInt(dst.slice(1, -1), 16) + (c - lo);
          map.set(key, utf16(base.toString(16).padStart(dst.length - 2, "0")));
        }
      }
    }
  }
  return { map, digits };
}

function fontsOf(page: string, objects: Map<number, PdfObject>): Map<string, { map: Map<string, string>; digits: number }> {
  const resId = ref(page, "Resources");
  const resources = resId !== undefined ? objects.get(resId)!.dict : page;
  const fontRef = ref(resources, "Font");
  const fontDict = fontRef !== undefined ? objects.get(fontRef)!.dict : (/\/Font\s*<<([\s\S]*?)>>/.exec(resources)?.[1] ?? "");
  const fonts = new Map<string, { map: Map<string, string>; digits: number }>();
  for (const m of fontDict.matchAll(/\/([A-Za-z0-9_.+-]+)\s+(\d+) 0 R/g)) {
    const font = objects.get(Number(m[2]));
    const uni = font ? ref(font.dict, "ToUnicode") : undefined;
    const cmap = uni !== undefined ? objects.get(uni)?.stream : undefined;
    if (!cmap) throw new Error(`font ${m[1]}: no ToUnicode CMap`);
    fonts.set(m[1]!, cmapOf(cmap.toString("latin1")));
  }
  return fonts;
}

/** The text a content stream shows: each Tj / TJ a run, runs joined by spaces. */
function textOf(content: string, fonts: Map<string, { map: Map<string, string>; digits: number }>): string {
  const runs: string[] = [];
  let font: { map: Map<string, string>; digits: number } | undefined;
  const token = /\/([A-Za-z0-9_.+-]+)\s+[\d.]+\s+Tf|(\[(?:[^\]]*)\]\s*TJ|<[0-9A-Fa-f\s]*>\s*Tj)|\((?:\\.|[^\\)])*\)\s*T[jJ]/g;
  for (const m of content.matchAll(token)) {
    if (m[1]) {
      font = fonts.get(m[1]);
      if (!font) throw new Error(`content selects font ${m[1]}, which the page does not list`);
      continue;
    }
    if (!m[2]) throw new Error("literal-string text is not read");
    if (!font) throw new Error("text shown before any font is selected");
    const f = font;
    const hexes = [...m[2].matchAll(/<([0-9A-Fa-f\s]*)>/g)].map((h) => h[1]!.replace(/\s+/g, "").toUpperCase());
    runs.push(hexes.map((hex) => (hex.match(new RegExp(`.{${f.digits}}`, "g")) ?? []).map((code) => f.map.get(code) ?? "\uFFFD").join("")).join(""));
  }
  return runs.join(" ");
}

function pageIds(objects: Map<number, PdfObject>, id: number): number[] {
  const o = objects.get(id);
  if (!o) throw new Error(`page tree object ${id} missing`);
  if (/\/Type\s*\/Pages\b/.test(o.dict)) {
    const kids = /\/Kids\s*\[([^\]]*)\]/.exec(o.dict)?.[1] ?? "";
    return [...kids.matchAll(/(\d+) 0 R/g)].flatMap((k) => pageIds(objects, Number(k[1])));
  }
  return [id];
}

/** Every page of a Chromium-printed PDF, in order, with its size and text. */
export function pdfPages(pdf: Buffer): PdfPage[] {
  if (pdf.subarray(0, 5).toString("latin1") !== "%PDF-") throw new Error("not a PDF");
  const objects = objectsOf(pdf);
  const catalog = [...objects.values()].find((o) => /\/Type\s*\/Catalog\b/.test(o.dict));
  const root = catalog ? ref(catalog.dict, "Pages") : undefined;
  if (root === undefined) throw new Error("no page tree");
  return pageIds(objects, root).map((id) => {
    const page = objects.get(id)!.dict;
    const box = /\/MediaBox\s*\[\s*([-\d.]+)\s+([-\d.]+)\s+([-\d.]+)\s+([-\d.]+)\s*\]/.exec(page);
    if (!box) throw new Error(`page ${id}: no MediaBox`);
    const contents = /\/Contents\s*\[([^\]]*)\]/.exec(page)?.[1] ?? /\/Contents\s+(\d+ 0 R)/.exec(page)?.[1] ?? "";
    const streams = [...contents.matchAll(/(\d+) 0 R/g)].map((c) => objects.get(Number(c[1]))?.stream?.toString("latin1") ?? "");
    const fonts = fontsOf(page, objects);
    const lead = /^(?:\s*(?:q|(?:[-\d.]+ ){6}cm|(?:[-\d.]+ ){4}re|W\*? n))+/.exec(streams[0] ?? "")?.[0] ?? "";
    const pointsPerPx = [...lead.matchAll(/([-\d.]+) [-\d.]+ [-\d.]+ ([-\d.]+) [-\d.]+ [-\d.]+ cm/g)].reduce((k, m) => k * Math.abs(Number(m[1])), 1);
    return { pointsPerPx, width_pt: Number(box[3]) - Number(box[1]), height_pt: Number(box[4]) - Number(box[2]), text: streams.map((c) => textOf(c, fonts)).join(" ") };
  });
}

/** Text compared without its spacing (the PDF places words and glyph runs, not spaces). */
export const squeezed = (text: string): string => text.normalize("NFKC").replace(/\s+/g, "");
