/**
 * The workbench in a real browser: Debian's chromium, headless, driven by playwright-core (no browser
 * download), on the static page `splicewright app --out` writes, opened from disk (file://), and once
 * served by `splicewright app`. Every figure the page shows is compared with the built CLI's output for
 * the same scenario: `check --json`, `search --json`, `compare --json`, `schedule --json`, and the bytes
 * of `export` and `report`. CI installs chromium; elsewhere the browser tests are skipped with a message
 * when /usr/bin/chromium is missing.
 */
import { spawn, spawnSync } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { parseYaml } from "../src/io/yaml.js";
import { BIN, cli, scenarioPath, tempScenario } from "./helpers/cli.js";

const CHROMIUM = "/usr/bin/chromium";
const haveBrowser = existsSync(CHROMIUM);
if (!haveBrowser && process.env.CI) throw new Error(`${CHROMIUM} is missing: .ci/run must install Debian's chromium`);
if (!haveBrowser) console.warn(`workbench browser tests skipped: ${CHROMIUM} not installed (apt-get install chromium)`);

const ARGS = ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"];
const EPOCH = "1700000000"; // 2023-11-14T22:13:20Z
const DATE = "2023-11-14";

async function launch(): Promise<Browser> {
  const { chromium } = await import("playwright-core");
  return chromium.launch({ executablePath: CHROMIUM, headless: true, args: ARGS });
}

/** Wait until every edit has been checked and shown. */
async function settled(page: Page): Promise<void> {
  await page.waitForFunction(() => document.documentElement.dataset.edits === "0", undefined, { timeout: 30_000 });
}

const controlId = (path: string[]) => `#f-${path.join("-").replace(/[^a-zA-Z0-9-]/g, "_")}`;

/** Open the folded section a control sits in, so that it can be reached. */
async function reveal(page: Page, selector: string): Promise<void> {
  await page.$eval(selector, (el) => {
    const d = el.closest("details");
    if (d) d.open = true;
  });
}

/** Type one field's value the way a user does: text typed, a choice chosen, a box ticked. */
async function setField(page: Page, path: string[], value: unknown): Promise<void> {
  const sel = controlId(path);
  await page.waitForSelector(sel, { state: "attached" });
  await reveal(page, sel);
  const el = page.locator(sel);
  await el.waitFor({ state: "visible", timeout: 10_000 });
  const tag = await el.evaluate((e) => (e instanceof HTMLInputElement ? e.type : e.tagName.toLowerCase()));
  if (tag === "select") await el.selectOption(String(value));
  else if (tag === "checkbox") await el.setChecked(value === true);
  else await el.fill(Array.isArray(value) ? value.join(", ") : String(value));
  await settled(page);
}

/** The leaf fields of a scenario file in file order, as (path, value). */
function leaves(value: unknown, path: string[] = []): Array<[string[], unknown]> {
  if (value !== null && typeof value === "object" && !Array.isArray(value)) return Object.entries(value as Record<string, unknown>).flatMap(([k, v]) => leaves(v, [...path, k]));
  return [[path, value]];
}

async function download(page: Page, click: () => Promise<void>): Promise<{ name: string; bytes: Buffer }> {
  const [dl] = await Promise.all([page.waitForEvent("download"), click()]);
  const path = await dl.path();
  return { name: dl.suggestedFilename(), bytes: readFileSync(path) };
}

async function openFile(page: Page, file: string): Promise<void> {
  const [chooser] = await Promise.all([page.waitForEvent("filechooser"), page.click("#open")]);
  await chooser.setFiles(file);
  await page.waitForFunction((name) => (document.getElementById("file-name") as HTMLInputElement).value === name, file.split("/").pop());
  await settled(page);
}

async function tab(page: Page, id: string): Promise<void> {
  await page.click(`#tab-${id}`);
  await page.waitForSelector(`#panel-${id}:not([hidden])`);
}

function cliJson(args: string[], env: NodeJS.ProcessEnv = process.env): { code: number; json: any } {
  const r = spawnSync(process.execPath, [BIN, ...args], { encoding: "utf8", env, maxBuffer: 1 << 26 });
  return { code: r.status ?? -1, json: JSON.parse(r.stdout) };
}

describe.skipIf(!haveBrowser)("the workbench in headless Chromium, opened from disk", () => {
  let browser: Browser;
  let page: Page;
  const errors: string[] = [];
  const requests: string[] = [];
  const footbridge = readFileSync(scenarioPath("footbridge-tie.yaml"), "utf8");
  const cliCheck = cliJson(["check", scenarioPath("footbridge-tie.yaml"), "--json"]).json;

  beforeAll(async () => {
    const dir = join(mkdtempSync(join(tmpdir(), "splicewright-wb-")), "page");
    expect(cli(["app", "--out", dir]).code).toBe(0);
    browser = await launch();
    page = await browser.newPage({ viewport: { width: 1400, height: 1000 }, acceptDownloads: true });
    page.on("pageerror", (e) => errors.push(e.message));
    page.on("request", (r) => {
      const url = r.url();
      if (!/^(file|data|blob):/.test(url)) requests.push(url);
    });
    await page.goto(pathToFileURL(join(dir, "index.html")).href);
    await page.waitForSelector("#verdict.pass, #verdict.fail", { timeout: 30_000 });
    await settled(page);
  }, 60_000);

  afterAll(async () => {
    await browser?.close();
  });

  it("fills the footbridge demo field by field from a blank form: verdict and joint strength are `check --json`'s", async () => {
    await page.click("#new");
    await settled(page);
    expect(await page.locator("#verdict .word").innerText()).toBe("—");
    expect(await page.locator("#form-problem").innerText()).toBe("the scenario must be a YAML mapping of fields (name, code, splice, plates, load, ...)");
    const fields = leaves(parseYaml(footbridge));
    expect(fields.length).toBeGreaterThan(30);
    for (const [path, value] of fields) await setField(page, path, value);
    await page.fill("#file-name", "footbridge-tie.yaml");
    await page.press("#file-name", "Enter");
    await settled(page);
    expect(await page.locator("#form-problem").isVisible()).toBe(false);
    expect(await page.locator("#verdict").getAttribute("data-pass")).toBe(String(cliCheck.pass));
    expect(await page.locator("#verdict .word").innerText()).toBe(cliCheck.pass ? "PASS" : "FAIL");
    expect(Number(await page.locator("#joint-strength [data-kn]").getAttribute("data-kn"))).toBe(cliCheck.jointStrength_kN);
    // As the CLI prints it (src/report/format.ts: forces to 0.1 kN).
    expect(await page.locator("#joint-strength").innerText()).toBe(`${cliCheck.jointStrength_kN.toFixed(1)} kN`);
    expect(cli(["check", scenarioPath("footbridge-tie.yaml")]).stdout).toContain(`Joint design strength:  ${cliCheck.jointStrength_kN.toFixed(1)} kN`);
    expect(await page.locator("#efficiency .num").innerText()).toBe(`${(cliCheck.efficiency * 100).toFixed(1)} %`);
    expect(await page.locator("#governing").innerText()).toContain(cliCheck.checks.find((c: { id: string }) => c.id === cliCheck.governing).clause);
    // The full check list, one click away: every check of the CLI, with its clause.
    await tab(page, "checks");
    expect(await page.locator("table.checks tr[data-check]").count()).toBe(cliCheck.checks.length);
    // Saved back, the file is one `check` reads as the same scenario.
    const saved = await download(page, () => page.click("#save"));
    expect(saved.name).toBe("footbridge-tie.yaml");
    const again = cliJson(["check", tempScenario(saved.bytes.toString("utf8")), "--json"]).json;
    expect(again).toEqual(cliCheck);
  }, 240_000);

  it("a load past the joint strength shows FAIL, with the bolts' and plates' checks named", async () => {
    const over = `${(cliCheck.jointStrength_kN + 1).toFixed(2)} kN`;
    await setField(page, ["load", "factored_tension"], over);
    const r = cliJson(["check", tempScenario(footbridge.replace("factored_tension: 620 kN", `factored_tension: ${over}`)), "--json"]);
    expect(r.code).toBe(1);
    expect(await page.locator("#verdict .word").innerText()).toBe("FAIL");
    expect(await page.locator("#strength-utilisation .state").innerText()).toBe("a strength check is not met");
    const failing = await page.locator("ul.failing li").allInnerTexts();
    expect(failing.length).toBe(r.json.checks.filter((c: { pass: boolean }) => !c.pass).length);
    expect(failing[0]).toContain(r.json.checks.find((c: { pass: boolean }) => !c.pass).clause);
    await setField(page, ["load", "factored_tension"], "620 kN");
    expect(await page.locator("#verdict .word").innerText()).toBe("PASS");
  }, 60_000);

  it("a bad value shows the CLI's one-line message beside its field, and the last good drawing is kept, dimmed", async () => {
    const cases: Array<[string[], string, string, string]> = [
      [["plates", "main", "width"], "-5", footbridge.replace("width: 220            # mm", "width: -5"), "220"],
      [["plates", "main", "thickness"], "16 mmm", footbridge.replace("thickness: 16         # mm", "thickness: 16 mmm"), "16"],
      [["bolts", "class"], "9.9", footbridge.replace('class: "8.8"', 'class: "9.9"'), "8.8"],
      [["layout", "pitch"], "45", footbridge.replace("pitch: 65", "pitch: 45"), "65"],
    ];
    for (const [path, typed, file, good] of cases) {
      await setField(page, path, typed);
      const r = cli(["check", tempScenario(file)]);
      const msg = page.locator(`${controlId(path)}-msg`);
      if (r.code === 2) {
        // Bad input: the CLI's one line, at the field, and the last good drawing kept, dimmed.
        expect(`splicewright: error: ${await msg.innerText()}`).toBe(r.stderr.trim());
        expect(await page.locator(controlId(path)).getAttribute("aria-invalid")).toBe("true");
        expect(await page.locator("#drawing-view").getAttribute("class")).toContain("stale");
      } else {
        // A valid input that fails a rule (pitch 45 mm < 2.5 d = 50 mm, IS 800:2007 cl. 10.2.2): a result, not a message.
        expect(r.code).toBe(1);
        expect(await msg.innerText()).toBe("");
        expect(await page.locator("#verdict .word").innerText()).toBe("FAIL");
        expect(await page.locator("#rules").innerText()).toMatch(/1 of \d+ fail[\s\S]*Minimum spacing[\s\S]*45 mm < 50 mm, 5 mm short/);
      }
      await setField(page, path, good);
      expect(await page.locator("#verdict .word").innerText()).toBe("PASS");
    }
    expect(await page.locator("#verdict .word").innerText()).toBe("PASS");
  }, 60_000);

  it("a file with a field the form has no control for: the CLI's message above the form, and a button that removes the field", async () => {
    const file = tempScenario(footbridge.replace("project: Canal footbridge FB-2 (demo)", "project: Canal footbridge FB-2 (demo)\ncolour: red"), "with-colour.yaml");
    await openFile(page, file);
    const r = cli(["check", file]);
    expect(`splicewright: error: ${(await page.locator("#form-problem").innerText()).replace(/ Remove colour from the scenario$/, "")}`).toBe(r.stderr.trim());
    await page.click("#remove-unknown");
    await settled(page);
    expect(await page.locator("#form-problem").isVisible()).toBe(false);
    expect(await page.locator("#verdict .word").innerText()).toBe("PASS");
  }, 60_000);

  it("a search in a worker gives the CLI's best arrangement; loading it checks as the CLI checks its saved scenario", async () => {
    await openFile(page, scenarioPath("footbridge-tie-search.yaml"));
    expect(await page.locator("#summary").innerText()).toContain("this scenario is for the search");
    await tab(page, "search");
    await page.click("#search-run");
    await page.waitForSelector("#search-table", { timeout: 60_000 });
    const cliSearch = cliJson(["search", scenarioPath("footbridge-tie-search.yaml"), "--json"]).json;
    const rows = await page.locator("#search-table tbody tr").count();
    expect(rows).toBe(cliSearch.results.length);
    const best = cliSearch.results[0];
    const cells = await page.locator('#search-table tbody tr[data-rank="1"] > *').allInnerTexts();
    expect(cells.slice(0, 4)).toEqual(["1", best.bolt, best.pattern, best.counts]);
    expect(cells[9]).toBe(String(best.bolts));
    expect(cells[14]).toBe(best.cost.toFixed(1));
    expect(cells[11]).toBe(best.jointStrength_kN.toFixed(1));
    // Load rank 1 into the form: it is the scenario `search --save` writes.
    const savedFile = join(mkdtempSync(join(tmpdir(), "splicewright-wb-")), "rank1.yaml");
    expect(cli(["search", scenarioPath("footbridge-tie-search.yaml"), "--save", savedFile]).code).toBe(0);
    const cliRank1 = cliJson(["check", savedFile, "--json"]).json;
    await page.click('#search-table button[data-rank="1"]');
    await page.waitForSelector("#verdict.pass, #verdict.fail");
    await settled(page);
    expect(Number(await page.locator("#joint-strength [data-kn]").getAttribute("data-kn"))).toBe(cliRank1.jointStrength_kN);
    expect(await page.locator("#verdict").getAttribute("data-pass")).toBe("true");
    await page.click("#tab-text");
    expect(await page.locator("#yaml-text").textContent()).toBe(readFileSync(savedFile, "utf8"));
  }, 120_000);

  it("Cancel (or Esc) ends a running search's worker", async () => {
    await openFile(page, tempScenario(readFileSync(scenarioPath("footbridge-tie-search.yaml"), "utf8").replace("step: 5 mm", "step: 2 mm"), "long-search.yaml"));
    await tab(page, "search");
    await page.fill("#search-top", "1000");
    await page.click("#search-run");
    await page.waitForFunction(() => /layouts checked/.test(document.getElementById("search-status")!.textContent ?? ""), undefined, { timeout: 30_000 });
    expect(await page.locator("#search-cancel").isEnabled()).toBe(true);
    await page.keyboard.press("Escape");
    await page.waitForFunction(() => /cancelled/.test(document.getElementById("search-status")!.textContent ?? ""));
    expect(await page.locator("#search-run").isEnabled()).toBe(true);
    expect(await page.locator("#search-cancel").isEnabled()).toBe(false);
    await page.fill("#search-top", "10");
  }, 120_000);

  it("downloads are byte for byte what `export` and `report` write for the same scenario and date (the DXF first)", async () => {
    await openFile(page, scenarioPath("footbridge-tie.yaml"));
    await tab(page, "handover");
    await page.fill("#date", DATE);
    await page.press("#date", "Enter");
    await settled(page);
    await page.waitForFunction((d) => document.querySelector("#drawing-view svg")?.textContent?.includes(d), DATE);
    const dir = mkdtempSync(join(tmpdir(), "splicewright-wb-export-"));
    const env = { ...process.env, SOURCE_DATE_EPOCH: EPOCH };
    expect(spawnSync(process.execPath, [BIN, "export", scenarioPath("footbridge-tie.yaml"), "--format", "all", "--out", dir], { env }).status).toBe(0);
    expect(spawnSync(process.execPath, [BIN, "report", scenarioPath("footbridge-tie.yaml"), "--out", join(dir, "footbridge-tie-report.html")], { env }).status).toBe(0);
    const dxf = await download(page, () => page.click('#downloads button[data-suffix=".dxf"]'));
    expect(dxf.name).toBe("footbridge-tie.dxf");
    expect(dxf.bytes.length).toBeGreaterThan(10_000);
    expect(dxf.bytes.equals(readFileSync(join(dir, "footbridge-tie.dxf")))).toBe(true);
    for (const [suffix, name] of [[".svg", "footbridge-tie.svg"], ["-holes.csv", "footbridge-tie-holes.csv"], ["-bom.csv", "footbridge-tie-bom.csv"], [".json", "footbridge-tie.json"], ["-report.html", "footbridge-tie-report.html"]] as const) {
      const f = await download(page, () => page.click(`#downloads button[data-suffix="${suffix}"]`));
      expect(f.name).toBe(name);
      expect(f.bytes.equals(readFileSync(join(dir, name))), name).toBe(true);
    }
  }, 120_000);

  it("compare: one column per class, the CLI's best layout and cost in each, and a chart per figure", async () => {
    await openFile(page, scenarioPath("footbridge-tie-search.yaml"));
    await tab(page, "compare");
    await page.fill("#compare-classes", "4.6, 8.8, 10.9");
    await page.click("#compare-run");
    await page.waitForSelector("#compare-table", { timeout: 120_000 });
    const c = cliJson(["compare", scenarioPath("footbridge-tie-search.yaml"), "--classes", "4.6,8.8,10.9", "--json"]).json;
    expect(await page.locator("#compare-table thead th").allInnerTexts()).toEqual(c.columns.map((x: { label: string }) => x.label));
    const row = async (name: string) => (await page.locator("#compare-table tbody tr", { hasText: name }).first().locator("td").allInnerTexts());
    expect(await row("Bolt count")).toEqual(c.columns.map((x: { best: { bolts: number } }) => String(x.best.bolts)));
    expect(await row("Cost above cheapest")).toEqual(c.columns.map((x: { costDifference: number }) => (x.costDifference === 0 ? "cheapest" : `+${x.costDifference.toFixed(1)}`)));
    expect(await page.locator("#compare-results figure.chart").count()).toBe(3);
    // A bad class is the CLI's one line.
    await page.fill("#compare-classes", "4.6, 9.9");
    await page.click("#compare-run");
    await page.waitForSelector("#compare-status.failed");
    const bad = cli(["compare", scenarioPath("footbridge-tie-search.yaml"), "--classes", "4.6,9.9"]);
    expect(`splicewright: error: ${await page.locator("#compare-status").innerText()}`).toBe(bad.stderr.trim());
  }, 180_000);

  it("the job schedule of the demo project in workers: the CLI's types and total, by enumeration and by HiGHS; the CSVs are the CLI's", async () => {
    await tab(page, "schedule");
    await page.click("#project-demo");
    const project = scenarioPath("warehouse-roof-project.yaml");
    for (const method of ["auto", "mip"]) {
      await page.selectOption("#rule-method", method);
      await page.click("#schedule-run");
      await page.waitForFunction(() => /done|failed|cancelled/.test(document.getElementById("schedule-status")!.textContent ?? ""), undefined, { timeout: 300_000 });
      expect(await page.locator("#schedule-status").getAttribute("class")).toContain("done");
      const out = join(mkdtempSync(join(tmpdir(), "splicewright-wb-sched-")), "out");
      const r = cliJson(["schedule", project, "--json", "--method", method, "--out", out]);
      expect(r.code).toBe(0);
      expect(Number(await page.locator("#schedule-statement").getAttribute("data-total"))).toBe(r.json.totals.total);
      expect(await page.locator("#schedule-statement").innerText()).toContain(r.json.provenStatement);
      expect(await page.locator("#schedule-types tbody th").allInnerTexts()).toEqual(r.json.types.map((t: { type: string }) => t.type));
      expect(await page.locator("#schedule-table tbody tr").count()).toBe(r.json.splices.length);
      for (const name of ["warehouse-roof-project-schedule.csv", "warehouse-roof-project-order.csv"]) {
        const f = await download(page, () => page.click(`#schedule-results button[data-file="${name}"]`));
        expect(f.bytes.equals(readFileSync(join(out, name))), `${method}: ${name}`).toBe(true);
      }
    }
    // A bad project file: the CLI's one line.
    const bad = tempScenario(readFileSync(project, "utf8").replace("quantity: 5", "quantity: 0"), "bad-project.yaml");
    const [chooser] = await Promise.all([page.waitForEvent("filechooser"), page.click("#project-open")]);
    await chooser.setFiles(bad);
    await page.waitForFunction(() => /bad-project/.test(document.getElementById("project-name")!.textContent ?? ""));
    await page.click("#schedule-run");
    await page.waitForSelector("#schedule-status.failed", { timeout: 60_000 });
    const r = cli(["schedule", bad]);
    expect(r.code).toBe(2);
    expect(`splicewright: error: ${await page.locator("#schedule-status").innerText()}`).toBe(r.stderr.trim());
  }, 400_000);

  it("keyboard: the tabs move with the arrow keys and Alt+number; every control is a native one", async () => {
    await page.focus("#tab-checks");
    await page.click("#tab-checks");
    await page.keyboard.press("ArrowRight");
    expect(await page.evaluate(() => document.activeElement?.id)).toBe("tab-search");
    expect(await page.locator("#panel-search").isVisible()).toBe(true);
    await page.keyboard.press("End");
    expect(await page.evaluate(() => document.activeElement?.id)).toBe("tab-text");
    await page.keyboard.press("Alt+1");
    expect(await page.locator("#panel-checks").isVisible()).toBe(true);
    const unlabelled = await page.$$eval("#form input, #form select, #form textarea", (els) => els.filter((e) => !(e as HTMLInputElement).labels?.length && !e.getAttribute("aria-label")).map((e) => e.id));
    expect(unlabelled).toEqual([]);
  });

  it("prints the summary, the drawing and the checks without the form or the controls", async () => {
    await openFile(page, scenarioPath("footbridge-tie.yaml"));
    await tab(page, "checks");
    await page.emulateMedia({ media: "print" });
    try {
      expect(await page.locator("aside.inputs").isVisible()).toBe(false);
      expect(await page.locator(".tabs").isVisible()).toBe(false);
      expect(await page.locator("#drawing-view > svg").isVisible()).toBe(true);
      expect(await page.locator("table.checks").isVisible()).toBe(true);
      const pdf = await page.pdf({ format: "A4", printBackground: true });
      expect(pdf.subarray(0, 4).toString()).toBe("%PDF");
    } finally {
      await page.emulateMedia({ media: "screen" });
    }
  });

  it("the checks table prints each check's own figures, as the sheet does (not the JSON's 0.01 kN rounded again)", async () => {
    // Two M16 4.6 bolts in single shear, threads in the plane: 2 × 400/(√3 × 1.25) × 0.78 × π × 16²/4 = 57.949 kN
    // (IS 800:2007 cl. 10.3.3): 57.9 kN to one decimal; the JSON's 57.95 rounded again would print 58.0.
    const lap = ["name: light lap", "code: is800-2007", "splice: { type: lap }", "plates:", "  main: { width: 200, thickness: 12, grade: E250, edges: sawn }", "load: { factored_tension: 50 kN }", 'bolts: { size: M16, class: "4.6", type: bearing, threads_in_shear_planes: true }', "layout: { pattern: grid, across: 2, along: 1, gauge: 100, end_distance: 40 }"].join("\n");
    const file = tempScenario(lap);
    expect(cliJson(["check", file, "--json"]).json.checks.find((c: { id: string }) => c.id === "bolt-shear:J").resistance_kN).toBe(57.95);
    await openFile(page, file);
    await tab(page, "checks");
    const cells = await page.locator('#checks-body tr[data-check="bolt-shear:J"] td.num').allInnerTexts();
    expect(cells[1]).toBe("57.9 kN");
    expect(cli(["check", file]).stdout).toContain("57.9 kN");
  }, 60_000);

  it("made no request beyond the page's own files and raised no error", () => {
    expect(requests).toEqual([]);
    expect(errors).toEqual([]);
  });
});

describe.skipIf(!haveBrowser)("the workbench served by `splicewright app`", () => {
  it("loads from 127.0.0.1 under its content-security policy: first verdict, a search, the DXF the same as from disk", async () => {
    const child = spawn(process.execPath, [BIN, "app"], { stdio: ["ignore", "pipe", "pipe"] });
    const url = await new Promise<string>((resolve, reject) => {
      let out = "";
      child.stdout!.on("data", (d: Buffer) => {
        out += d.toString();
        const m = /(http:\/\/127\.0\.0\.1:\d+\/)/.exec(out);
        if (m) resolve(m[1]!);
      });
      child.on("exit", (code) => reject(new Error(`app exited ${code}`)));
    });
    const browser = await launch();
    try {
      const page = await browser.newPage({ acceptDownloads: true });
      const errors: string[] = [];
      page.on("pageerror", (e) => errors.push(e.message));
      page.on("console", (m) => {
        if (m.type() === "error" && /Content Security Policy|Refused/.test(m.text())) errors.push(m.text());
      });
      await page.goto(url);
      await page.waitForSelector("#verdict.pass", { timeout: 30_000 });
      await settled(page);
      await tab(page, "search");
      await page.click("#search-run");
      await page.waitForSelector("#search-table", { timeout: 60_000 });
      await tab(page, "handover");
      await page.fill("#date", DATE);
      await page.press("#date", "Enter");
      await settled(page);
      const dir = mkdtempSync(join(tmpdir(), "splicewright-wb-http-"));
      expect(spawnSync(process.execPath, [BIN, "export", scenarioPath("footbridge-tie.yaml"), "--format", "dxf", "--out", dir], { env: { ...process.env, SOURCE_DATE_EPOCH: EPOCH } }).status).toBe(0);
      const [dl] = await Promise.all([page.waitForEvent("download"), page.click('#downloads button[data-suffix=".dxf"]')]);
      expect(readFileSync(await dl.path()).equals(readFileSync(join(dir, "footbridge-tie.dxf")))).toBe(true);
      expect(errors).toEqual([]);
    } finally {
      await browser.close();
      child.kill("SIGTERM");
    }
  }, 120_000);
});
