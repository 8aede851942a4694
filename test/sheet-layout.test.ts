/**
 * The calculation sheet as it reaches the eye: the summary first, `--brief`, lines that fit the width
 * (80 columns tested on every bundled demo, the 100 columns of piped output), and emphasis only on a
 * terminal (NO_COLOR honoured; no-color.org).
 */
import { readdirSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { checkScenario } from "../src/engine/check.js";
import { parseScenario, requireCheckable } from "../src/io/scenario.js";
import { formatSheet } from "../src/cli/sheet.js";
import { styleFor, styleMarksToAnsi, wantsColour } from "../src/cli/style.js";
import { outputWidth, visibleLength, wrap, wrapProse } from "../src/cli/text.js";
import { foldTwins } from "../src/report/twins.js";
import { cli, ROOT, scenarioPath, tempScenario } from "./helpers/cli.js";
import { readFileSync } from "node:fs";

const CHECKABLE = readdirSync(`${ROOT}/scenarios`).filter((f) => f.endsWith(".yaml") && !f.includes("search") && !f.includes("project"));
const longest = (text: string) => Math.max(...text.split("\n").map(visibleLength));

describe("the summary comes first", () => {
  it.each(CHECKABLE)("%s: verdict, load, joint strength, both utilisations, governing check, efficiency, rules and warnings before the detail", (name) => {
    const out = cli(["check", scenarioPath(name)]).stdout.split("\n");
    const at = (re: RegExp) => out.findIndex((l) => re.test(l));
    const labels = [/^SUMMARY$/, /^Verdict: +(PASS|FAIL)/, /^Factored load: +T = /, /^Joint design strength: /, /^Strength utilisation: +\d\.\d{3} = (T \/ joint design strength|the highest demand\/resistance of either sense)/, /^Service utilisation: /, /^Governing check: /, /^Efficiency: +\d+\.\d %/, /^Detailing rules: /, /^Warnings: /];
    const lines = labels.map(at);
    for (const [i, l] of lines.entries()) expect(l, String(labels[i])).toBeGreaterThanOrEqual(0);
    expect([...lines].sort((a, b) => a - b)).toEqual(lines);
    expect(lines[1]).toBeLessThan(10);
    expect(lines.at(-1)!).toBeLessThan(at(/^CHECKS /));
    // The efficiency basis's definition is printed with it.
    expect(out.slice(lines[7]!, lines[8]!).join(" ")).toMatch(/options\.efficiency_basis: lesser/);
  });

  it("a failing check: FAIL in the verdict names it (mezzanine hanger at 180 kN > the bolt shear strength of 173.85 kN)", () => {
    const text = readFileSync(scenarioPath("mezzanine-hanger.yaml"), "utf8").replace("factored_tension: 150 kN", "factored_tension: 180 kN");
    const r = cli(["check", tempScenario(text)]);
    expect(r.code).toBe(1);
    const verdict = r.stdout.split("\n").find((l) => l.startsWith("Verdict:"))!;
    expect(verdict).toMatch(/FAIL — 1 check fail: Bolt shear \(bolts\)/);
    expect(r.stdout).toMatch(/Strength utilisation: +1\.035/); // 180 / 173.85
  });
});

describe("check --brief: the summary and one line per check", () => {
  it.each(CHECKABLE)("%s", (name) => {
    const r = cli(["check", scenarioPath(name), "--brief", "--width", "80"]);
    expect(r.code).toBe(0);
    const { scenario, code } = parseScenario(readFileSync(scenarioPath(name), "utf8"));
    const { report } = checkScenario(requireCheckable(scenario, code), code);
    const entries = r.stdout.split("\n").filter((l) => /^ {0,2}\d+ {2}(pass|FAIL) {2}/.test(l));
    expect(entries).toHaveLength(foldTwins(report.checks).length);
    expect(r.stdout).toMatch(/^Verdict: /m);
    expect(r.stdout).not.toContain("CONVENTIONS");
    expect(r.stdout).not.toContain("Vdsb ="); // no substituted values
    expect(r.stdout).toContain("qualified engineer");
    expect(longest(r.stdout)).toBeLessThanOrEqual(80);
  });
});

describe("width", () => {
  it.each(CHECKABLE)("%s at 80 columns: no line of the full sheet wider than 80 (brief: above)", (name) => {
    const full = cli(["check", scenarioPath(name), "--width", "80"]);
    expect(full.code).toBe(0);
    expect(longest(full.stdout)).toBeLessThanOrEqual(80);
    expect(full.stdout.split("\n").length).toBeGreaterThan(60);
  });

  it("piped output (not a terminal) is laid out at 100 columns; a terminal at its own width, at least 80", () => {
    expect(outputWidth({ isTTY: false })).toBe(100);
    expect(outputWidth({ isTTY: true, columns: 132 })).toBe(132);
    expect(outputWidth({ isTTY: true, columns: 60 })).toBe(80);
    expect(outputWidth({ isTTY: true, columns: 60 }, 90)).toBe(90);
    const r = cli(["check", scenarioPath("footbridge-tie.yaml")]);
    expect(longest(r.stdout)).toBeLessThanOrEqual(100);
    expect(longest(r.stdout)).toBeGreaterThan(90); // the width is used
  });

  it("--width below 80 is bad input: one line, exit 2", () => {
    const r = cli(["check", scenarioPath("footbridge-tie.yaml"), "--width", "60"]);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe("");
    expect(r.stderr.trim().split("\n")).toHaveLength(1);
    expect(r.stderr).toMatch(/--width: must be a whole number of columns from 80/);
  });

  it("wrap never exceeds the width, keeps a number with its unit, and cuts a word longer than a line", () => {
    const text = `${"x".repeat(130)} then 40 mm and more words to wrap around the edge of the line`;
    const lines = wrap(text, 40, "  - ", "    ");
    for (const l of lines) expect(visibleLength(l)).toBeLessThanOrEqual(40);
    expect(lines.join("\n")).toContain("40 mm");
    expect(lines.join("").replace(/ /g, "")).toContain("x".repeat(36));
  });
});

describe("emphasis: colour only on a terminal, never with NO_COLOR", () => {
  it("the decision", () => {
    expect(wantsColour({ isTTY: true }, {})).toBe(true);
    expect(wantsColour({ isTTY: true }, { NO_COLOR: "1" })).toBe(false);
    expect(wantsColour({ isTTY: true }, { NO_COLOR: "" })).toBe(true);
    expect(wantsColour({ isTTY: false }, {})).toBe(false);
    expect(wantsColour({}, {})).toBe(false);
  });

  it("on a terminal FAIL and the verdict are coloured, and the width still holds; piped output is plain", () => {
    const text = readFileSync(scenarioPath("mezzanine-hanger.yaml"), "utf8").replace("factored_tension: 150 kN", "factored_tension: 180 kN");
    const { scenario, code } = parseScenario(text);
    const s = requireCheckable(scenario, code);
    const { joint, report } = checkScenario(s, code);
    // The sheet carries emphasis marks; the terminal shell turns them into SGR codes after making the text safe.
    const coloured = styleMarksToAnsi(formatSheet(s, joint, report, { width: 80, style: styleFor({ isTTY: true }, {}) }));
    expect(coloured).toMatch(/\u001b\[[0-9;]*mFAIL/);
    expect(coloured.split("\n").find((l) => l.startsWith("Verdict:"))).toMatch(/\u001b\[/);
    expect(longest(coloured)).toBeLessThanOrEqual(80);
    const plain = formatSheet(s, joint, report, { width: 80, style: styleFor({ isTTY: true }, { NO_COLOR: "1" }) });
    expect(plain).not.toMatch(/\u001b\[/);
    expect(cli(["check", tempScenario(text)]).stdout).not.toMatch(/\u001b\[/);
  });
});

describe("wrapProse: plain-text outputs laid out for a width, tables kept whole", () => {
  it("wraps a labelled line under its label, an indented line two spaces in, and leaves table lines and short lines alone", () => {
    const table = "│ M16 8.8 │ M16 × 35 class 8.8 hexagon head bolt │ 35     │ 60       │ " + "x".repeat(60);
    const lines = wrapProse(["Rules:    at most 2 bolt types; fixed cost per type stocked 150; one property class per diameter", "  layouts 120.5 + 2 types stocked × 150 = 420.5; 402 bolts and a long tail of words", "short", table], 40);
    expect(lines).toEqual([
      "Rules:    at most 2 bolt types; fixed",
      "          cost per type stocked 150; one",
      "          property class per diameter",
      "  layouts 120.5 + 2 types stocked × 150",
      "    = 420.5; 402 bolts and a long tail",
      "    of words",
      "short",
      table,
    ]);
  });

  it("the schedule of the demo project, piped: every line but the tables' within 100 columns", () => {
    const r = cli(["schedule", scenarioPath("warehouse-roof-project.yaml"), "--max-types", "2"]);
    expect(r.code).toBe(0);
    const prose = r.stdout.split("\n").filter((l) => !/^[┌│├└]/.test(l));
    expect(prose.length).toBeGreaterThan(15);
    for (const l of prose) expect(Array.from(l).length, l).toBeLessThanOrEqual(100);
  });
});
