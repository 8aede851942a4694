/**
 * The report as a checking engineer prints it: Chromium's print to PDF on A4 (Debian's chromium driven
 * by playwright-core, as test/report.test.ts), the pages read back with a small reader of the browser's
 * own PDFs (helpers/pdf-text.ts). Page 1 carries the summary (verdict, load against the joint strength,
 * strength utilisation, governing check and clause, efficiency and its basis), the design basis with the
 * factors the checks used, and the sign-off block; the drawing prints at a true ISO 5455 scale on its own
 * landscape page; no check is split from its formula row; a US customary report carries no SI unit.
 * CI installs chromium; elsewhere the browser tests are skipped with a message.
 */
import { existsSync, mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { cli, scenarioPath } from "./helpers/cli.js";
import { pdfPages, squeezed, type PdfPage } from "./helpers/pdf-text.js";
import { displayText, usDimensionText } from "../src/report/format.js";

const CHROMIUM = "/usr/bin/chromium";
const haveBrowser = existsSync(CHROMIUM);
if (!haveBrowser && process.env.CI) throw new Error(`${CHROMIUM} is missing: .ci/run must install Debian's chromium`);
if (!haveBrowser) console.warn(`report print test skipped: ${CHROMIUM} not installed (apt-get install chromium)`);

const DEMOS = ["footbridge-tie.yaml", "mezzanine-hanger.yaml", "truss-chord-staggered.yaml", "truss-top-chord-reversal.yaml", "sports-hall-chord-ec3.yaml", "canopy-tie-us.yaml"];

/** A4, ISO 216: 210 × 297 mm = 595.3 × 841.9 pt. */
const A4_PT = { short: (210 / 25.4) * 72, long: (297 / 25.4) * 72 };

function scenarioVariant(name: string, edit: (text: string) => string): string {
  const text = edit(readFileSync(scenarioPath(name), "utf8"));
  const file = join(mkdtempSync(join(tmpdir(), "splicewright-print-")), name);
  writeFileSync(file, text);
  return file;
}

/** The report of a scenario (exit 0 pass or 1 a check fails: a report is written either way). */
function writeReport(scenario: string): { file: string; html: string } {
  const file = join(mkdtempSync(join(tmpdir(), "splicewright-print-")), "report.html");
  const r = cli(["report", scenario, "--out", file]);
  if (r.code !== 0 && r.code !== 1) throw new Error(`report ${scenario}: exit ${r.code} ${r.stderr}`);
  return { file, html: readFileSync(file, "utf8") };
}

/** The design-basis factor rows of a report: symbol, value, use and source as printed. */
function factorRows(html: string): Array<{ symbol: string; value: number; use: string; source: string }> {
  return [...html.matchAll(/<tr data-factor="[^"]*"><td class="sym">([^<]+)<\/td><td class="num">([\d.]+)<\/td><td>([^<]*)<\/td><td class="src">([^<]*)<\/td><\/tr>/g)].map((m) => ({ symbol: m[1]!, value: Number(m[2]), use: m[3]!, source: m[4]! }));
}

describe("design basis: the factors the checks use, against the codes' published values", () => {
  // IS 800:2007 cl. 5.4.1, Table 5: γm0 1.10 (yielding), γm1 1.25 (ultimate stress), γmb 1.25 (bolts,
  // bearing type) as reproduced at https://infralens.in/code/IS-800-2007/clause/5-4-1; γmf 1.10 slip designed
  // at service load, 1.25 at ultimate load (from memory; only a quiz page corroborates it).
  it("IS 800:2007, bearing-type bolts: γm0 1.10, γm1 1.25, γmb 1.25 (Table 5), no γmf", () => {
    const rows = factorRows(writeReport(scenarioPath("footbridge-tie.yaml")).html);
    expect(rows.map((r) => [r.symbol, r.value])).toEqual([["γm0", 1.1], ["γm1", 1.25], ["γmb", 1.25]]);
    for (const r of rows) expect(r.source).toBe("IS 800:2007 cl. 5.4.1, Table 5");
  });

  it("IS 800:2007, friction-grip bolts designed against slip at service: γmf 1.10 (Table 5)", () => {
    const rows = factorRows(writeReport(scenarioPath("truss-chord-staggered.yaml")).html);
    expect(rows.find((r) => r.symbol === "γmf")).toMatchObject({ value: 1.1, source: "IS 800:2007 cl. 5.4.1, Table 5" });
    const ultimate = factorRows(writeReport(scenarioVariant("truss-chord-staggered.yaml", (t) => t.replace("slip_at: service", "slip_at: ultimate"))).html);
    expect(ultimate.find((r) => r.symbol === "γmf")?.value).toBe(1.25); // Table 5: slip resistance designed at ultimate load
  });

  // EN 1993-1-8:2005 Table 2.1 recommended values: γM2 1.25 (bolts, plates in bearing,
  // net section), γM3 1.25 (slip at ULS), γM3,ser 1.10 (slip at SLS); EN 1993-1-1:2005 6.1 NOTE 2B: γM0 1.00, γM1 1.00.
  // The same numbers are the UK National Annexes' (SCI Blue Book, steelforlifebluebook.co.uk, explanatory notes 5.1);
  // that they are also the recommended values: from memory.
  it("EN 1993-1-8, Category A with the recommended values: γM0 1.00, γM2 1.25, said to be recommended", () => {
    const { html } = writeReport(scenarioPath("sports-hall-chord-ec3.yaml"));
    const rows = factorRows(html);
    expect(rows.map((r) => [r.symbol, r.value])).toEqual([["γM0", 1.0], ["γM2", 1.25]]);
    expect(rows[0]!.source).toMatch(/^EN 1993-1-1 6\.1/);
    expect(rows[1]!.source).toMatch(/^EN 1993-1-8 Table 2\.1/);
    expect(html).toContain("recommended values (EN 1993-1-1 6.1, EN 1993-1-8 Table 2.1); no national annex given");
  });

  it("EN 1993-1-8, Categories B and C: γM3,ser 1.10 and γM3 1.25 (Table 2.1)", () => {
    const slipAt = (at: string) => (t: string) => t.replace("type: bearing ", `type: friction-grip\n  slip_at: ${at}\n  slip_factor: 0.4 `).replace("factored_tension: 950 kN", "factored_tension: 950 kN\n  service_tension: 600 kN");
    const b = factorRows(writeReport(scenarioVariant("sports-hall-chord-ec3.yaml", slipAt("service"))).html);
    expect(b.find((r) => r.symbol === "γM3,ser")).toMatchObject({ value: 1.1 });
    expect(b.some((r) => r.symbol === "γM3")).toBe(false);
    const c = factorRows(writeReport(scenarioVariant("sports-hall-chord-ec3.yaml", slipAt("ultimate"))).html);
    expect(c.find((r) => r.symbol === "γM3")).toMatchObject({ value: 1.25 });
  });

  it("EN 1993-1-8 with a national annex's γM2 in the scenario: the value printed is the scenario's, and says so", () => {
    const { html } = writeReport(scenarioVariant("sports-hall-chord-ec3.yaml", (t) => t.replace("# factors:", "factors:").replace("#   gamma_m2: 1.25", "  gamma_m2: 1.30")));
    const m2 = factorRows(html).find((r) => r.symbol === "γM2");
    expect(m2).toMatchObject({ value: 1.3 });
    expect(m2!.source).toMatch(/national annex/);
    expect(html).toMatch(/national annex values given by the scenario/);
  });

  // AISC 360-16: J4.3 block shear φ 0.75 (T. B. Quimby, A Beginner's Guide to the Steel Construction Manual,
  // 15th ed., §3.7, https://bgstructuralengineering.com/BGSCM15/BGSCM003/BGSCM00307.htm). From memory: D2 φt
  // 0.90 yielding, 0.75 rupture; J3.6 bolt shear φ 0.75; J3.10 bearing and tearout φ 0.75; J3.8 slip φ 1.00
  // (the same φ in 360-22 J4.1, J3.7, J3.11, J3.9).
  it("AISC 360-16 LRFD: φ 0.90 yield, 0.75 rupture, 0.75 bolt shear, bearing and block shear, with their sections", () => {
    const rows = factorRows(writeReport(scenarioPath("canopy-tie-us.yaml")).html);
    const by = (source: string) => rows.find((r) => r.source.includes(source))?.value;
    expect(by("D2(a)")).toBe(0.9);
    expect(by("D2(b)")).toBe(0.75);
    expect(by("J3.6")).toBe(0.75);
    expect(by("J3.10")).toBe(0.75);
    expect(by("J4.3")).toBe(0.75);
  });
});

describe("US customary dimensions in the bill of materials", () => {
  // US shop drawings and bills dimension in feet, inches and fractions to 1/16 in, whole inches always
  // written after the feet, 1'-0 3/8" (common practice).
  it("to 1/16 in, feet-inches from 12 in, whole inches written after the feet", () => {
    const cases: Array<[number, string]> = [[0.75, '3/4"'], [5.5, '5 1/2"'], [12, "1'-0\""], [12.375, "1'-0 3/8\""], [18.5, "1'-6 1/2\""], [24.0625, "2'-0 1/16\""]];
    for (const [inches, text] of cases) expect(usDimensionText(inches * 25.4)).toBe(text);
  });

  it("canopy-tie-us.yaml: the report's bill of materials gives the cover plates as 8\" × 3/8\" × 1'-0 3/8\" and their mass in lb", () => {
    const { html } = writeReport(scenarioPath("canopy-tie-us.yaml"));
    // Covers 12.375 in long (2 × (1.5 + 3 + 1.5) in + 0.375 in butt gap), 8 in × 3/8 in; steel 490 lb/ft³ (common practice):
    // 8 × 0.375 × 12.375 in³ × 490 / 1728 = 10.5 lb.
    expect(html).toContain("cover plate A 8&quot; × 3/8&quot; × 1&#39;-0 3/8&quot; A36</td><td class=\"num\">1</td><td>10.5 lb");
  });
});

describe("SI texts of the core shown on a US customary report", () => {
  // Exact conversions (NIST SP 811, from memory): 1 in = 25.4 mm, 1 kip = 4.4482216152605 kN, 1 ksi = 6.894757293168 MPa.
  it("converts numbers with mm, mm², kN and MPa, and leaves SI output alone", () => {
    expect(displayText("|y centroid| ≤ 0.5 mm", "us")).toBe("|y centroid| ≤ 0.02 in"); // 0.5 / 25.4 = 0.0197 in
    expect(displayText("Ag = 2464.0 mm²", "us")).toBe("Ag = 3.819 in²"); // 2464 / 645.16
    expect(displayText("Tdn = 727.4 kN", "us")).toBe("Tdn = 163.53 kips"); // 727.4 / 4.44822
    expect(displayText("fu 410 MPa", "us")).toBe("fu 59.5 ksi"); // 410 / 6.894757
    expect(displayText("dimensions in mm", "us")).toBe("dimensions in in");
    expect(displayText("Ag = 2464.0 mm², 0.5 mm, 727.4 kN", "si")).toBe("Ag = 2464.0 mm², 0.5 mm, 727.4 kN");
  });
});

describe("sign-off block", () => {
  it("carries the scenario's document fields; absent ones are blank lines to sign", () => {
    const doc = "document:\n  job: J-2041\n  calculation_number: C-017\n  revision: B\n  prepared_by: R. Menon\n  checked_by: S. Okafor\n  date: 2026-11-30\n";
    const { html } = writeReport(scenarioVariant("footbridge-tie.yaml", (t) => `${t}\n${doc}`));
    const cell = (h: string, key: string) => new RegExp(`<td data-field="${key}"[^>]*>([^<]*)</td>`).exec(h)?.[1];
    expect([cell(html, "job"), cell(html, "calculation"), cell(html, "revision"), cell(html, "prepared"), cell(html, "checked"), cell(html, "date")]).toEqual(["J-2041", "C-017", "B", "R. Menon", "S. Okafor", "2026-11-30"]);
    const bare = writeReport(scenarioPath("footbridge-tie.yaml")).html;
    for (const key of ["job", "calculation", "revision", "prepared", "checked"]) expect(bare).toContain(`<td data-field="${key}" class="blank"></td>`);
  });
});

describe.skipIf(!haveBrowser)("the report printed to PDF on A4 in headless Chromium", () => {
  let browser: Browser;
  beforeAll(async () => {
    const { chromium } = await import("playwright-core");
    browser = await chromium.launch({ executablePath: CHROMIUM, args: ["--no-sandbox", "--disable-gpu", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"] });
  }, 60_000);
  afterAll(async () => {
    await browser?.close();
  });

  async function open(file: string): Promise<Page> {
    const page = await browser.newPage({ viewport: { width: 1200, height: 900 } });
    await page.goto(pathToFileURL(file).href, { waitUntil: "load" });
    return page;
  }

  /** Print as a user's print to PDF on A4 does, and read the pages back. */
  async function print(page: Page): Promise<PdfPage[]> {
    return pdfPages(await page.pdf({ format: "A4", printBackground: true }));
  }

  const text = (page: Page, selector: string) => page.locator(selector).first().innerText();

  // Each demo, and a heavily failing layout (the EN demo at about three times its load: 12 checks fail),
  // whose page 1 must still hold the summary and the caution.
  const overloaded = () => scenarioVariant("sports-hall-chord-ec3.yaml", (t) => t.replace("factored_tension: 950 kN", "factored_tension: 2950 kN"));
  const CASES: Array<[string, () => string, "PASS" | "FAIL"]> = [...DEMOS.map((d): [string, () => string, "PASS"] => [d, () => scenarioPath(d), "PASS"]), ["sports-hall-chord-ec3.yaml at 2950 kN", overloaded, "FAIL"]];

  it.each(CASES)("%s: A4 pages printed at full size; page 1 carries the summary, design basis, sign-off and caution", async (name, path, verdict) => {
    const { file } = writeReport(path());
    const page = await open(file);
    try {
      const summary = {
        verdict: await text(page, "#summary-verdict"),
        load: await text(page, '#summary tr[data-row="load"] td:last-child'),
        strength: await text(page, '#summary tr[data-row="strength"] td:last-child'),
        utilisation: (await text(page, '#summary tr[data-row="strength-utilisation"] td:last-child')).split("\n")[0]!,
        governing: await text(page, '#summary tr[data-row="governing"] td:last-child'),
        efficiency: (await text(page, '#summary tr[data-row="efficiency"] td:last-child')).split("\n")[0]!,
      };
      expect(summary.verdict.startsWith(verdict)).toBe(true);
      expect(summary.governing).toMatch(/\((IS 800:2007|EN 1993-1-8|EN 1993-1-1|AISC 360-16) /); // the clause beside the check
      const factors = await page.locator("#factors tr").allInnerTexts();
      expect(factors.length).toBeGreaterThanOrEqual(2);
      const codeTitle = (await text(page, "#design-basis tr td:last-child")).trim();
      const pages = await print(page);

      // Every page A4, printed at 100 % (a CSS px is 0.75 pt: the browser did not shrink a page to fit).
      for (const p of pages) {
        const [w, h] = p.width_pt < p.height_pt ? [p.width_pt, p.height_pt] : [p.height_pt, p.width_pt];
        expect(Math.abs(w - A4_PT.short)).toBeLessThan(2);
        expect(Math.abs(h - A4_PT.long)).toBeLessThan(2);
        expect(p.pointsPerPx).toBeCloseTo(0.75, 4);
      }
      // One landscape page, the drawing's.
      const landscape = pages.filter((p) => p.width_pt > p.height_pt);
      expect(landscape).toHaveLength(1);
      expect(squeezed(landscape[0]!.text)).toContain("2.Drawing");

      const first = squeezed(pages[0]!.text);
      for (const t of [...Object.values(summary), codeTitle, "Designbasis", "Caution.", "Job", "Calculationno.", "Revision", "Preparedby", "Checkedby"]) expect(first).toContain(squeezed(t));
      for (const row of factors) expect(first).toContain(squeezed(row));
      expect(first).not.toContain("1.Inputs"); // page 1 holds its own content and nothing after it
      expect(squeezed(pages[1]!.text)).toContain("1.Inputs");
      expect(squeezed(pages.at(-1)!.text)).toContain(`Verdict:${verdict}`);
      expect(pages.length).toBeLessThanOrEqual(10);
      console.info(`${name}: ${pages.length} A4 pages`);
    } finally {
      await page.close();
    }
  }, 60_000);

  it.each(["footbridge-tie.yaml", "canopy-tie-us.yaml"])("%s: no check is split from its formula row, no heading from its table, across a page break", async (name) => {
    const { file } = writeReport(scenarioPath(name));
    const page = await open(file);
    try {
      const rows = await page.locator("table.checks tbody.check").evaluateAll((bodies) =>
        bodies.map((b) => {
          const cells = [...b.querySelectorAll("tr")[0]!.querySelectorAll("td.num")].map((td) => (td as HTMLElement).innerText);
          return { figures: cells.join(""), formula: (b.querySelector(".subst") as HTMLElement).innerText };
        }),
      );
      expect(rows.length).toBeGreaterThan(15);
      const headings = await page.locator("#checks h3").allInnerTexts();
      const pages = (await print(page)).map((p) => squeezed(p.text));
      // Each group's heading lands on the page of its table's header row (kept with its table).
      for (const h of headings) expect(pages.some((p) => p.includes(`${squeezed(h)}ClauseCheckDemand`)), h).toBe(true);
      for (const r of rows) {
        const figures = squeezed(r.figures);
        const formula = squeezed(r.formula).slice(0, 24);
        const together = pages.some((p) => p.includes(figures) && p.indexOf(formula, p.indexOf(figures)) > 0);
        expect(together, `${r.figures} | ${r.formula.slice(0, 40)}`).toBe(true);
      }
    } finally {
      await page.close();
    }
  }, 60_000);

  it.each(["footbridge-tie.yaml", "canopy-tie-us.yaml", "sports-hall-chord-ec3.yaml"])("%s: the drawing prints at the ISO 5455 scale its caption states, true on the page", async (name) => {
    const { file, html } = writeReport(scenarioPath(name));
    const root = /<figure class="drawing[^"]*"><svg\b[^>]*>/.exec(html)![0];
    const sheet = { width_mm: Number(/width="([\d.]+)mm"/.exec(root)![1]), scale: Number(/data-scale="([\d.]+)"/.exec(root)![1]) };
    const page = await open(file);
    try {
      const stated = await text(page, "#print-scale");
      const printed = Number(/^1:(\d+)$/.exec(stated)![1]);
      // ISO 5455 reduction scales: 1:2, 1:5, 1:10 and their multiples by 10.
      expect(/^[125]0*$/.test(String(printed))).toBe(true);
      await page.emulateMedia({ media: "print" });
      const box = (await page.locator("#drawing figure > svg").boundingBox())!;
      const width_mm = (box.width * 25.4) / 96; // CSS: 96 px to the inch
      // On paper: the sheet drawn at 1:sheet.scale, printed at 1:printed.
      expect(width_mm).toBeCloseTo((sheet.width_mm * sheet.scale) / printed, 0);
      // It fits the landscape A4 page within its margins (297 − 2 × 12 mm across).
      expect(width_mm).toBeLessThanOrEqual(273);
      const bar = Number(await page.locator("svg.scale-bar").getAttribute("data-bar-paper-mm"));
      const label = await page.locator("svg.scale-bar text").nth(1).textContent();
      const real_mm = name.includes("-us") ? Number(/^([\d.]+) in$/.exec(label!)![1]) * 25.4 : Number(/^([\d.]+) mm$/.exec(label!)![1]);
      expect(bar * printed).toBeCloseTo(real_mm, 1);
    } finally {
      await page.close();
    }
  }, 60_000);

  it("canopy-tie-us.yaml: the inch report shows kips, ksi and inches, and no mm, kN or MPa (the centroid tolerance included)", async () => {
    const { file } = writeReport(scenarioPath("canopy-tie-us.yaml"));
    const page = await open(file);
    try {
      // The whole document, the embedded drawing's own text included.
      const shown = await page.evaluate(() => document.body.textContent ?? "");
      expect(shown).not.toMatch(/\bmm²?(?![A-Za-z])/);
      expect(shown).not.toMatch(/\bkN\b/);
      expect(shown).not.toMatch(/\bMPa\b/);
      expect(shown).toMatch(/\d kips\b/);
      expect(shown).toMatch(/\d ksi\b/);
      expect(shown).toMatch(/\d in\b/);
      const centroid = await page.locator('tr[data-check*="centroid"] + tr .formula').innerText();
      expect(centroid).toMatch(/≤ 0\.02 in/); // 0.5 mm = 0.0197 in
      const pages = await print(page);
      for (const p of pages) expect(squeezed(p.text)).not.toMatch(/\d(mm|kN|MPa)/);
    } finally {
      await page.close();
    }
  }, 60_000);
});
