#!/usr/bin/env node
// Renders the exported SVG drawing of a scenario to PNG in Debian's chromium (headless, playwright-core).
// Run after `npm run build`, from the repository:
//   node scripts/drawing-screenshot.mjs                     → docs/drawing-footbridge.png (the README's picture)
//   node scripts/drawing-screenshot.mjs SCENARIO.yaml OUT.png [--dxf]
import { readFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { chromium } from "playwright-core";
import { checkScenario } from "../dist/engine/check.js";
import { exportFiles } from "../dist/export/index.js";
import { parseScenario, requireCheckable } from "../dist/io/scenario.js";

const root = join(dirname(fileURLToPath(import.meta.url)), "..");
const [scenarioFile = join(root, "scenarios", "footbridge-tie.yaml"), out = join(root, "docs", "drawing-footbridge.png")] = process.argv.slice(2);
const { scenario, code } = parseScenario(readFileSync(scenarioFile, "utf8"));
const checkable = requireCheckable(scenario, code);
const { joint, report } = checkScenario(checkable, code);
const svg = exportFiles({ scenario: checkable, joint, report, date: "2026-01-15", base: "drawing" }, ["svg"]).files[0].content
  .replace(/^<\?xml[^>]*>\s*/, "")
  .replace(/width="420mm" height="297mm"/, 'width="100%" height="100%"');
const browser = await chromium.launch({ executablePath: "/usr/bin/chromium", headless: true, args: ["--headless", "--no-sandbox", "--disable-gpu", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"] });
try {
  // DRAWING_ZOOM="x,y,w,h" (CSS pixels of the 1400 × 990 view) shoots that part at 3× for a close look.
  const zoom = process.env.DRAWING_ZOOM?.split(",").map(Number);
  const page = await browser.newPage({ viewport: { width: 1400, height: 990 }, deviceScaleFactor: zoom ? 3 : 1 });
  await page.setContent(`<!doctype html><html><body style="margin:0;background:#fff;width:1400px;height:990px">${svg}</body></html>`);
  await page.screenshot({ path: out, ...(zoom ? { clip: { x: zoom[0], y: zoom[1], width: zoom[2], height: zoom[3] } } : {}) });
} finally {
  await browser.close();
}
console.log(`wrote ${out}`);
