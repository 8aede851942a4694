#!/usr/bin/env node
// Writes docs/workbench-screenshot.png: the workbench on the footbridge demo, in Debian's chromium
// (headless, driven by playwright-core). Run after `npm run build`: node scripts/workbench-screenshot.mjs
import { dirname, join } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";
import { chromium } from "playwright-core";

const root = join(dirname(fileURLToPath(import.meta.url)), "..");
const browser = await chromium.launch({ executablePath: "/usr/bin/chromium", headless: true, args: ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"] });
try {
  const page = await browser.newPage({ viewport: { width: 1440, height: 960 } });
  await page.goto(pathToFileURL(join(root, "dist", "web", "index.html")).href);
  await page.waitForSelector("#verdict.pass", { timeout: 30_000 });
  await page.waitForFunction(() => document.documentElement.dataset.edits === "0");
  await page.click("#tab-handover");
  await page.fill("#date", "2026-01-15");
  await page.press("#date", "Enter");
  await page.click("#tab-checks");
  await page.waitForFunction(() => document.querySelector("#drawing-view svg")?.textContent?.includes("2026-01-15"));
  await page.evaluate(() => window.scrollTo(0, 0));
  await page.screenshot({ path: join(root, "docs", "workbench-screenshot.png") });
} finally {
  await browser.close();
}
console.log("wrote docs/workbench-screenshot.png");
