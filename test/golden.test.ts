/**
 * The golden guard of the one checker: every demo scenario and a fixed-seed set of generated scenarios
 * (invented data; IS 800:2007, EN 1993-1-8 and AISC 360-16; lap and butt; tension, compression and
 * reversal) give the same check results as recorded in test/fixtures/golden/checks.json.gz, to the
 * last digit: every check's id, clause, demand, resistance, utilisation, verdict, formula, substituted
 * values and notes (the lazy text is read, so it is guarded too), the report's figures, warnings and
 * conventions, the hole coordinates, and the search demos' best layouts.
 *
 * The record was made from the code before any speed work (commit 71608d4's results). Rewrite it
 * (`npm run golden:make`) only for an intended change of results, and say so in the commit.
 */
import { existsSync, readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { gunzipSync, gzipSync } from "node:zlib";
import { describe, expect, it } from "vitest";
import { ROOT } from "./helpers/cli.js";
import { goldenRecord } from "./helpers/golden-record.js";

const FIXTURE = join(ROOT, "test/fixtures/golden/checks.json.gz");
const actual = goldenRecord();

if (process.env.SPLICEWRIGHT_GOLDEN_WRITE === "1") {
  writeFileSync(FIXTURE, gzipSync(`${JSON.stringify(actual, null, 1)}\n`, { level: 9 }));
}

const expected = JSON.parse(gunzipSync(readFileSync(FIXTURE)).toString("utf8")) as typeof actual;

describe("golden record of the checker (test/fixtures/golden/checks.json.gz)", () => {
  it("covers every demo and every generated scenario, with checks in all three codes and in compression", () => {
    expect(existsSync(FIXTURE)).toBe(true);
    expect(Object.keys(actual)).toEqual(Object.keys(expected));
    const reports = Object.values(expected).flatMap((r) => (r.report ? [r.report as { code: string; senses?: string[] }] : []));
    for (const code of ["is800-2007", "en1993-1-8", "aisc360-16"]) expect(reports.filter((r) => r.code === code).length).toBeGreaterThan(20);
    expect(reports.filter((r) => r.senses?.includes("compression")).length).toBeGreaterThan(10);
  });

  for (const name of Object.keys(expected)) {
    it(name, () => {
      expect(actual[name]).toEqual(expected[name]);
    });
  }
});
