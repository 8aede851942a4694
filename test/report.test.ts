/**
 * The HTML calculation report: self-contained, and rendered in a real browser (Debian's chromium,
 * driven by playwright-core): the drawing and the checks are visible, the verdict is there, no request
 * leaves the page, and printing to PDF succeeds. CI installs chromium; elsewhere the browser test is
 * skipped with a message when /usr/bin/chromium is missing.
 */
import { existsSync, mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { dirname, join } from "node:path";
import { pathToFileURL } from "node:url";
import { describe, expect, it } from "vitest";
import { cli, scenarioPath } from "./helpers/cli.js";

const CHROMIUM = "/usr/bin/chromium";
const haveBrowser = existsSync(CHROMIUM);
if (!haveBrowser && process.env.CI) throw new Error(`${CHROMIUM} is missing: .ci/run must install Debian's chromium`);
if (!haveBrowser) console.warn(`report browser test skipped: ${CHROMIUM} not installed (apt-get install chromium)`);

function writeReport(name: string, extra: string[] = []): { file: string; html: string; code: number } {
  const file = join(mkdtempSync(join(tmpdir(), "splicewright-report-")), "report.html");
  const r = cli(["report", scenarioPath(name), "--out", file, ...extra]);
  return { file, html: existsSync(file) ? readFileSync(file, "utf8") : "", code: r.code };
}

describe("HTML report content", () => {
  const { html, code } = writeReport("footbridge-tie.yaml");

  it("is one self-contained file: inline styles and drawing, no external resources", () => {
    expect(code).toBe(0);
    expect(html).toMatch(/^<!DOCTYPE html>/);
    expect(html).not.toMatch(/<link\b|<script\b|@import|src="http|href="http|url\(["']?http/i);
    expect(html).toContain("<svg");
    expect(html).toContain("@page");
  });

  it("shows the inputs, every check with its clause and substituted numbers, efficiency with its definition, the verdict and the caution", () => {
    expect(html).toContain("Factored tension T");
    // Every check is in the table, twins (the same check on each side or both covers) in one row.
    const rows = [...html.matchAll(/<tr class="(?:pass|fail)[^"]*" data-check="([^"]+)"/g)].map((m) => m[1]!.split(" "));
    expect(rows.length).toBeGreaterThan(15);
    const json = JSON.parse(cli(["check", scenarioPath("footbridge-tie.yaml"), "--json"]).stdout) as { checks: Array<{ id: string }> };
    expect(rows.flat().sort()).toEqual(json.checks.map((c) => c.id).sort());
    expect(rows.some((ids) => ids.length === 4)).toBe(true); // bearing on both covers, each side
    expect(html).toContain("IS 800:2007 cl. 6.3.1");
    expect(html).toContain("Tdn = 0.9 × 2464.0 × 410 / 1.25 = 727.4 kN");
    expect(html).toMatch(/Efficiency<\/td><td>90\.9 %/);
    expect(html).toContain("design tension strength of the unperforated thinner main plate, basis: the lesser of gross yield and rupture");
    expect(html).toMatch(/Verdict: PASS/);
    expect(html).toContain("qualified engineer");
  });

  it("prints its drawing at the drawing's own ISO 5455 scale, dimension figures 2.5 mm high on paper (ISO 3098 lettering; LETTERING_MM), with a key to the part marks", () => {
    const figure = /<figure class="drawing to-scale">(<svg\b[^>]*>)([\s\S]*?)<\/figure>/.exec(html)!;
    const sheetWidth_mm = Number(/width="([\d.]+)mm"/.exec(figure[1]!)![1]);
    const printedWidth_mm = Number(/figure\.drawing\.to-scale \{ width: ([\d.]+)mm; \}/.exec(html)![1]);
    // Printed at 100 %: 1 mm of the figure is 1 mm of paper, so the stated lettering is the printed lettering.
    expect(printedWidth_mm).toBeCloseTo(sheetWidth_mm, 6);
    const dimFigures = [...figure[2]!.matchAll(/<g class="dim"[^>]*>[\s\S]*?<text[^>]*font-size="([\d.]+)"/g)].map((m) => Number(m[1]));
    expect(dimFigures.length).toBeGreaterThan(5);
    for (const h of dimFigures) expect(h).toBeGreaterThanOrEqual(2.5);
    const scale = Number(/data-scale="([\d.]+)"/.exec(figure[1]!)![1]);
    expect(html).toContain(`<b id="print-scale">1:${scale}</b>`);
    expect(html).toContain("Marks: 1 cover plate A, 2 cover plate B, 3 main plate A (member), 4 main plate B (member)");
  });

  it("reports on a search result with --rank and says where the layout came from", () => {
    const r = writeReport("footbridge-tie-search.yaml", ["--rank", "1"]);
    expect(r.code).toBe(0);
    expect(r.html).toContain("result 1 of `splicewright search`");
  });

  it("a failing layout is reported FAIL, naming the failing checks, and exits 1", () => {
    const text = readFileSync(scenarioPath("mezzanine-hanger.yaml"), "utf8").replace("factored_tension: 150 kN", "factored_tension: 200 kN");
    const scenario = join(mkdtempSync(join(tmpdir(), "splicewright-report-")), "failing.yaml");
    writeFileSync(scenario, text);
    const out = join(dirname(scenario), "failing.html");
    expect(cli(["report", scenario, "--out", out]).code).toBe(1);
    const html = readFileSync(out, "utf8");
    expect(html).toMatch(/Verdict: FAIL — \d+ checks? fail/);
    expect(html).toMatch(/Failing: Bolt shear \(bolts\)/);
  });
});

describe.skipIf(!haveBrowser)("HTML report in headless Chromium", () => {
  it("renders the drawing and the check table, shows the verdict, makes no request, and prints to PDF", async () => {
    const { chromium } = await import("playwright-core");
    const { file } = writeReport("truss-chord-staggered.yaml");
    const browser = await chromium.launch({
      executablePath: CHROMIUM,
      args: ["--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
    });
    try {
      const page = await browser.newPage({ viewport: { width: 1200, height: 900 } });
      const requests: string[] = [];
      page.on("request", (req) => {
        const url = req.url();
        if (!url.startsWith("file:") && !url.startsWith("data:")) requests.push(url);
      });
      await page.goto(pathToFileURL(file).href, { waitUntil: "load" });
      const drawing = page.locator("#drawing figure svg");
      expect(await drawing.isVisible()).toBe(true);
      const box = await drawing.boundingBox();
      expect(box && box.width > 300 && box.height > 200).toBe(true);
      expect(await page.locator("#drawing circle[data-hole]").count()).toBe(20);
      const table = page.locator("table.checks").first();
      expect(await table.isVisible()).toBe(true);
      expect(await page.locator("table.checks tbody tr").count()).toBeGreaterThan(20);
      const summary = page.locator("#summary");
      expect(await summary.isVisible()).toBe(true);
      expect(await page.locator("#summary-verdict").innerText()).toMatch(/^PASS/);
      expect(await summary.locator('tr[data-row="strength-utilisation"]').innerText()).toMatch(/0\.745/);
      expect(await summary.locator('tr[data-row="service-utilisation"]').innerText()).toMatch(/0\.694/);
      expect(await page.locator("#verdict").innerText()).toMatch(/Verdict: PASS/);
      const pdf = await page.pdf({ format: "A4", printBackground: true });
      expect(pdf.subarray(0, 4).toString()).toBe("%PDF");
      expect(pdf.length).toBeGreaterThan(20_000);
      expect(requests).toEqual([]);
    } finally {
      await browser.close();
    }
  }, 60_000);
});
