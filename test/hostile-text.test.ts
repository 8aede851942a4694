/**
 * Odd text: encodings, prototype names, units, SOURCE_DATE_EPOCH, YAML aliases; and text on its way into
 * the outputs — every writer keeps its format whatever a name holds (the input refuses such names; the
 * writers are tested with them directly, as a library user could call them). Scenarios are demo data.
 */
import { mkdtempSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import DxfParser from "dxf-parser";
import { XMLValidator } from "fast-xml-parser";
import { describe, expect, it } from "vitest";
import { formatSheet } from "../src/cli/sheet.js";
import { checkScenario } from "../src/engine/check.js";
import { exportFiles } from "../src/export/index.js";
import { parseScenario, requireCheckable } from "../src/io/scenario.js";
import { billOfMaterials } from "../src/export/bolt-list.js";
import { renderReportHtml } from "../src/report/html.js";
import { controlPicture, csvField, dxfText, plainLine, terminalText, xmlText } from "../src/text/escape.js";
import { parseQuantity } from "../src/units/units.js";
import { cli, scenarioPath, tempScenario } from "./helpers/cli.js";

const demoText = readFileSync(scenarioPath("footbridge-tie.yaml"), "utf8");

/** One line naming the field and the reason, exit 2, nothing on stdout, no stack trace. */
function oneLine(r: { code: number; stdout: string; stderr: string }, pattern: RegExp) {
  expect(r.code, r.stderr).toBe(2);
  expect(r.stdout).toBe("");
  const lines = r.stderr.trimEnd().split("\n");
  expect(lines).toHaveLength(1);
  expect(lines[0]).toMatch(/^splicewright: error: /);
  expect(lines[0]).toMatch(pattern);
  expect(r.stderr).not.toMatch(/\n\s+at |node:internal/);
}

function tempBytes(bytes: Uint8Array): string {
  const file = join(mkdtempSync(join(tmpdir(), "splicewright-text-")), "scenario.yaml");
  writeFileSync(file, bytes);
  return file;
}

describe("encodings of the input file", () => {
  const utf16 = (text: string, be: boolean) => {
    const body = Buffer.from(text, "utf16le");
    if (be) body.swap16();
    return Buffer.concat([Buffer.from(be ? [0xfe, 0xff] : [0xff, 0xfe]), body]);
  };
  it("UTF-16 with a byte-order mark (LE and BE) is decoded and checked like the UTF-8 file", () => {
    const plain = cli(["check", scenarioPath("footbridge-tie.yaml"), "--json"]);
    for (const be of [false, true]) {
      const r = cli(["check", tempBytes(utf16(demoText, be)), "--json"]);
      expect(r.code).toBe(0);
      expect(JSON.parse(r.stdout).jointStrength_kN).toBe(JSON.parse(plain.stdout).jointStrength_kN);
    }
  });
  it("UTF-8 with a byte-order mark is read", () => {
    expect(cli(["check", tempBytes(Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), Buffer.from(demoText)]))]).code).toBe(0);
  });
  it("invalid UTF-8 (a Latin-1 é) is one line with its offset", () => {
    const bytes = Buffer.from(demoText.replace("Canal footbridge", "Canal footbridge X"));
    bytes[bytes.indexOf("X")] = 0xe9;
    oneLine(cli(["check", tempBytes(bytes)]), /scenario\.yaml: is not UTF-8 text \(an invalid byte 0xe9 at offset \d+\): save it as UTF-8/);
  });
  it("a NUL byte, and UTF-16 without a byte-order mark, are one line with the offset", () => {
    oneLine(cli(["check", tempBytes(Buffer.from(demoText.replace("E250", "E2\u000050")))]), /scenario\.yaml: holds a NUL byte at offset \d+ \(a binary file, or UTF-16 text without a byte-order mark\?\)/);
    oneLine(cli(["check", tempBytes(Buffer.from(demoText, "utf16le"))]), /scenario\.yaml: holds a NUL byte at offset 1 /);
  });
  it("a UTF-16 file with a broken surrogate is refused, not read with replacement characters", () => {
    const bytes = utf16(demoText, false);
    bytes.writeUInt16LE(0xd800, 10);
    oneLine(cli(["check", tempBytes(bytes)]), /is not UTF-16LE text: save it as UTF-8/);
  });
});

describe("units and names", () => {
  it('"-1 1/2 in" is −38.1 mm: the sign applies to the whole mixed number (1 in = 25.4 mm, exact)', () => {
    expect(parseQuantity("-1 1/2 in", "length")).toBeCloseTo(-38.1, 9);
    expect(parseQuantity("-3/4 in", "length")).toBeCloseTo(-19.05, 9);
    expect(parseQuantity("+1 1/2 in", "length")).toBeCloseTo(38.1, 9);
  });
  it("a hole at y = \"-1 1/2 in\" sits at −38.1 mm in the checked layout", () => {
    const yaml = demoText.replace(/layout:[\s\S]*?(?=\noptions:)/, 'layout:\n  pattern: holes\n  end_distance: 40\n  holes: [[40, "-1 1/2 in"], [40, "1 1/2 in"], [105, 0]]\n');
    const r = cli(["check", tempScenario(yaml), "--json"]);
    expect(r.stderr).toBe("");
    const ys = (JSON.parse(r.stdout).holes as Array<{ y_mm: number }>).map((h) => h.y_mm);
    expect(ys).toContain(-38.1);
  });
  it("a unit, a code or a grade named after an Object property is unknown, not an internal error", () => {
    oneLine(cli(["check", tempScenario(demoText.replace("width: 220", 'width: "10 toString"'))]), /plates\.main\.width: unknown length unit "toString"/);
    oneLine(cli(["check", tempScenario(demoText.replace("code: is800-2007", "code: constructor"))]), /^splicewright: error: code: unknown design code "constructor"/);
    oneLine(cli(["check", tempScenario(demoText.replace("code: is800-2007", "code: en1993-1-8").replace(/E250/g, "hasOwnProperty").replace(/options:[\s\S]*$/, ""))]), /plates\.main\.grade: .*hasOwnProperty/);
  });
  it("an error that echoes user text never passes an escape sequence to the terminal", () => {
    const r = cli(["check", tempScenario(demoText.replace("grade: E250           #", 'grade: "\\e[2J\\e[31mE9" #'))]);
    oneLine(r, /plates\.main\.grade: unknown IS 2062 grade "␛\[2J␛\[31mE9"/);
    expect(r.stderr).not.toContain("\u001b");
  });
  it("an invalid SOURCE_DATE_EPOCH is one line naming it, before anything is written", () => {
    const out = join(mkdtempSync(join(tmpdir(), "splicewright-date-")), "out");
    for (const bad of ["yesterday", "-5", "99999999999999", "1.5"]) {
      const r = cli(["export", scenarioPath("footbridge-tie.yaml"), "--format", "svg", "--out", out], undefined, { SOURCE_DATE_EPOCH: bad });
      oneLine(r, /^splicewright: error: SOURCE_DATE_EPOCH: must be whole seconds since 1970-01-01 UTC/);
    }
    expect(() => readdirSync(out)).toThrow();
    const ok = cli(["export", scenarioPath("footbridge-tie.yaml"), "--format", "svg", "--out", out], undefined, { SOURCE_DATE_EPOCH: "1700000000" });
    expect(ok.code).toBe(0);
    expect(readFileSync(join(out, "footbridge-tie.svg"), "utf8")).toContain("2023-11-14");
  });
});

describe("YAML aliases: limited by what they expand to, not by their count", () => {
  it("101 splices sharing one &anchor are scheduled", () => {
    const splices = Array.from({ length: 101 }, (_, i) =>
      i === 0 ? `  - { id: S0, splice: { type: lap }, plates: &p { main: { width: 100, thickness: 10, grade: E250 } }, load: { factored_tension: 100 } }` : `  - { id: S${i}, splice: { type: lap }, plates: *p, load: { factored_tension: ${100 + (i % 3)} } }`,
    );
    const yaml = ["project: Alias test (invented)", "code: is800-2007", "search: { sizes: [M16], classes: ['8.8'], max_along: 2 }", "splices:", ...splices].join("\n");
    const r = cli(["schedule", tempScenario(yaml), "--json", "--workers", "0"]);
    expect(r.stderr).toBe("");
    expect(JSON.parse(r.stdout).splices).toHaveLength(101);
  });
  it("an alias bomb is refused by its expanded size", () => {
    const lines = ["a: &a [1,1,1,1,1,1,1,1,1,1]", ..."bcdefgh".split("").map((c, i) => `${c}: &${c} [${Array(10).fill(`*${"abcdefg"[i]}`).join(",")}]`)];
    oneLine(cli(["check", tempScenario(lines.join("\n"))]), /YAML aliases expand the file to \d{9} values, more than the 1000000 accepted/);
  });
});

describe("the escaping module", () => {
  const nasty = "Tie \u001b[31mred\u0007\r\nEOF\t<&>\"'\u202e\u0085\ud800 ^J end";
  it("plainLine: one line, controls as pictures (␛ for ESC), bidi controls and lone surrogates replaced", () => {
    const p = plainLine(nasty);
    expect(p).not.toMatch(/[\u0000-\u001f\u007f-\u009f\u202e]/);
    expect(p).toContain("␛[31mred␇");
    expect(p).not.toMatch(/[\ud800-\udfff]/);
    expect(controlPicture("\u0000")).toBe("␀");
  });
  it("xmlText, dxfText, csvField, terminalText", () => {
    expect(XMLValidator.validate(`<a b="${xmlText(nasty)}">${xmlText(nasty)}</a>`)).toBe(true);
    expect(dxfText(nasty)).not.toMatch(/[\r\n]/);
    expect(dxfText("a^Jb")).toBe("a^ Jb");
    expect(csvField('say "hi", then\nstop')).toBe('"say ""hi"", then\nstop"');
    expect(terminalText("a\u001b[2Jb\nc\rd")).toBe("a␛[2Jb\nc␍d");
  });
});

describe("hostile names into every writer (library calls; the CLI refuses such names at input)", () => {
  const hostile = 'T1 </title><script>alert(1)</script> \u001b[2J\n0\nEOF\n & "q" \u0000 ^I';
  const { scenario, code } = parseScenario(demoText);
  const checkable = { ...requireCheckable(scenario, code), name: hostile, project: hostile };
  const { joint, report } = checkScenario(checkable, code);
  const { files } = exportFiles({ scenario: checkable, joint, report, date: "2024-01-01", base: "t" }, ["svg", "dxf", "csv", "json"]);
  const file = (name: string) => files.find((f) => f.name === name)!.content;
  const clean = exportFiles({ scenario: { ...checkable, name: "clean", project: "clean" }, joint, report, date: "2024-01-01", base: "t" }, ["dxf", "csv"]).files;

  it("SVG stays well-formed XML and the script is text", () => {
    expect(XMLValidator.validate(file("t.svg"))).toBe(true);
    expect(file("t.svg")).not.toContain("<script>");
  });
  it("DXF: no group-code injection — the same entities as with a clean name, one EOF at the end", () => {
    const dxf = file("t.dxf");
    const parsed = new DxfParser().parseSync(dxf) as unknown as { entities: Array<{ type: string; text?: string }> };
    const cleanParsed = new DxfParser().parseSync(clean.find((f) => f.name === "t.dxf")!.content) as unknown as { entities: unknown[] };
    expect(parsed.entities.length).toBe(cleanParsed.entities.length);
    expect(dxf.split(/\r?\n/).filter((l) => l.trim() === "EOF")).toHaveLength(1);
    expect(dxf.trimEnd().endsWith("EOF")).toBe(true);
    expect(parsed.entities.some((e) => e.type === "TEXT" && e.text?.includes("alert(1)"))).toBe(true);
  });
  it("CSV: the note row naming the scenario stays one line and the rows are those of a clean name", () => {
    for (const name of ["t-holes.csv", "t-bom.csv"]) {
      const lines = file(name).split("\r\n");
      expect(lines.length).toBe(clean.find((f) => f.name === name)!.content.split("\r\n").length);
      expect(lines.find((l) => l.includes("alert(1)"))).toMatch(/^#,"[a-z ]+: T1 .*alert\(1\)/);
      expect(file(name)).not.toMatch(/[\u0000\u001b]/);
    }
  });
  it("JSON stays JSON and carries the name exactly", () => {
    expect(JSON.parse(file("t.json")).scenario).toBe(hostile);
  });
  it("HTML: the script is text, no control character is written", () => {
    const html = renderReportHtml({ scenario: checkable, joint, report, bom: billOfMaterials(joint, checkable), date: "2024-01-01", version: "test", origin: "test" });
    expect(html).not.toContain("<script>");
    expect(html).toContain("&lt;script&gt;alert(1)&lt;/script&gt;");
    expect(html).not.toMatch(/[\u0000-\u0008\u000b\u000c\u000e-\u001f]/);
  });
  it("terminal: the sheet through the CLI's output filter holds no escape sequence", () => {
    const sheet = terminalText(formatSheet(checkable, joint, report));
    expect(sheet).not.toMatch(/[\u0000-\u0008\u000b-\u001f]/);
    expect(sheet).toContain("␛[2J");
  });
});
