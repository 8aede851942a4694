#!/usr/bin/env node
// Builds the browser workbench into dist/web with vite (run by `npm run build`, after tsc).
//
// The page must work from disk (file://), where Chromium refuses ES-module scripts and workers loaded
// by URL, so every script is a classic one (IIFE) and workers start from Blob URLs:
//   app.js           the page (src/web/app), with the worker's source bundled into it as a string;
//   highs-worker.js  loaded only when a schedule needs the integer programme: sets the HiGHS worker's
//                    source (highs/build/highs.js unchanged, its WebAssembly as base64, src/web/highs-worker.ts);
//   index.html, app.css, LICENSES.txt copied as they are.
import { copyFileSync, mkdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { createRequire } from "node:module";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { build } from "vite";

const root = join(dirname(fileURLToPath(import.meta.url)), "..");
const out = join(root, "dist", "web");
const require = createRequire(import.meta.url);

/** One entry bundled as a classic script, returned as text (nothing written). */
async function bundle(entry, name, plugins = []) {
  const result = await build({
    configFile: false,
    root,
    logLevel: "warn",
    plugins,
    build: {
      write: false,
      emptyOutDir: false,
      minify: true,
      target: "es2022",
      reportCompressedSize: false,
      lib: { entry: join(root, entry), formats: ["iife"], name, fileName: () => `${name}.js` },
    },
  });
  const outputs = (Array.isArray(result) ? result : [result]).flatMap((r) => r.output);
  const chunks = outputs.filter((o) => o.type === "chunk");
  if (chunks.length !== 1) throw new Error(`${entry}: expected one script, got ${chunks.length}`);
  return chunks[0].code;
}

/** `import source from "virtual:worker-source"`: the worker script as a string. */
function workerSource(code) {
  const id = "virtual:worker-source";
  return {
    name: "splicewright-worker-source",
    resolveId: (source) => (source === id ? `\0${id}` : null),
    load: (resolved) => (resolved === `\0${id}` ? `export default ${JSON.stringify(code)};` : null),
  };
}

const t0 = performance.now();
rmSync(out, { recursive: true, force: true });
mkdirSync(out, { recursive: true });

const worker = await bundle("src/web/worker.ts", "splicewrightWorker");
const app = await bundle("src/web/app/main.ts", "splicewrightWorkbench", [workerSource(worker)]);
writeFileSync(join(out, "app.js"), app);

// The package's CommonJS build (a plain script: `var Module = ...`) and its WebAssembly ("highs/runtime").
const highsScript = require.resolve("highs");
const wasm = readFileSync(require.resolve("highs/runtime")).toString("base64");
const highsGlue = await bundle("src/web/highs-worker.ts", "splicewrightHighs");
const highsWorker = [`self.HIGHS_WASM_BASE64=${JSON.stringify(wasm)};`, readFileSync(highsScript, "utf8"), highsGlue].join("\n");
writeFileSync(join(out, "highs-worker.js"), `window.splicewrightHighsWorker=${JSON.stringify(highsWorker)};\n`);

copyFileSync(join(root, "src", "web", "index.html"), join(out, "index.html"));
copyFileSync(join(root, "src", "web", "app.css"), join(out, "app.css"));
copyFileSync(join(root, "src", "web", "LICENSES.txt"), join(out, "LICENSES.txt"));
console.log(`workbench built in ${((performance.now() - t0) / 1000).toFixed(1)} s: dist/web (app.js ${(app.length / 1024).toFixed(0)} KiB, worker inside it ${(worker.length / 1024).toFixed(0)} KiB, highs-worker.js ${(highsWorker.length / 1024).toFixed(0)} KiB)`);
