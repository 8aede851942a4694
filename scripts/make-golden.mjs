#!/usr/bin/env node
// Rewrites test/fixtures/golden/checks.json.gz from the current code (the record is built by
// test/helpers/golden-record.ts, run through vitest so it reads src/ exactly as the test does).
// Only for an intended change of results: say so in the commit that carries the new file.
import { spawnSync } from "node:child_process";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";

const root = join(dirname(fileURLToPath(import.meta.url)), "..");
const r = spawnSync(process.execPath, [join(root, "node_modules/vitest/vitest.mjs"), "run", "test/golden.test.ts"], {
  cwd: root,
  stdio: "inherit",
  env: { ...process.env, SPLICEWRIGHT_GOLDEN_WRITE: "1" },
});
process.exit(r.status ?? 3);
