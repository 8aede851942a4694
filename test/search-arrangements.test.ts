/**
 * Search rows worth choosing between: by default the best layout of each distinct arrangement (bolt
 * size and class, pattern, counts across × along), `--variants` every variant; `search.min_across`
 * and its default (two across wherever the narrowest plate fits two — common practice); dimensions
 * printed with the precision they have. The optimality of both readings against the brute force is in
 * search-optimality.test.ts. Scenarios: the bundled invented demos and small variants.
 */
import { readFileSync } from "node:fs";
import { parse, stringify } from "yaml";
import { describe, expect, it } from "vitest";
import { parseCostTable } from "../src/io/costs.js";
import { parseScenario } from "../src/io/scenario.js";
import { families, resolveSpace } from "../src/search/space.js";
import { searchLayouts } from "../src/search/search.js";
import { cli, ROOT, scenarioPath, tempScenario } from "./helpers/cli.js";

const costs = parseCostTable(readFileSync(`${ROOT}/catalogue/costs.yaml`, "utf8"), "catalogue");
const SEARCH = scenarioPath("footbridge-tie-search.yaml");
interface Row { bolt: string; pattern: string; counts: string; acrossPerLine: number[]; cost: number; edgeDistance_mm: number; pitch_mm: number | null; gauge_mm: number | null; endDistance_mm: number; spliceLength_mm: number }
const arrangement = (r: Row) => `${r.bolt}|${r.pattern}|${r.counts}`;
const rows = (args: string[]): Row[] => JSON.parse(cli(["search", ...args, "--json"]).stdout).results;

/** A scenario text with its search section changed. */
function withSearch(text: string, change: (s: Record<string, unknown>) => void): string {
  const file = parse(text) as Record<string, unknown>;
  const search = { ...((file.search as Record<string, unknown>) ?? {}) };
  change(search);
  return stringify({ ...file, search });
}

describe("distinct arrangements by default, every variant with --variants", () => {
  const best = rows([SEARCH, "--top", "10"]);
  const variants = rows([SEARCH, "--top", "60", "--variants"]);

  it("the default rows are ten different arrangements, in cost order", () => {
    expect(best).toHaveLength(10);
    expect(new Set(best.map(arrangement)).size).toBe(10);
    const c = best.map((r) => r.cost);
    expect([...c].sort((a, b) => a - b)).toEqual(c);
  });

  it("--variants repeats an arrangement with other end distances or cover thicknesses", () => {
    expect(new Set(variants.slice(0, 10).map(arrangement)).size).toBeLessThan(10);
  });

  it("each arrangement's first variant is its default row, in the same order", () => {
    const firsts: Row[] = [];
    for (const v of variants) if (!firsts.some((f) => arrangement(f) === arrangement(v))) firsts.push(v);
    expect(firsts.length).toBeGreaterThanOrEqual(2);
    expect(best.slice(0, firsts.length)).toEqual(firsts.slice(0, 10).map((f, i) => ({ ...f, rank: i + 1 })));
  });

  it("--save --rank and export --rank count the default rows; --variants counts every variant", () => {
    const r2 = rows([SEARCH, "--top", "2"])[1]!;
    const v2 = rows([SEARCH, "--top", "2", "--variants"])[1]!;
    expect(arrangement(r2)).not.toBe(arrangement(v2));
    const out = tempScenario("", "placeholder.yaml").replace(/placeholder\.yaml$/, "");
    const a = cli(["report", SEARCH, "--rank", "2", "--out", `${out}a.html`]);
    const b = cli(["report", SEARCH, "--rank", "2", "--variants", "--out", `${out}b.html`]);
    expect(a.code).toBe(0);
    expect(b.code).toBe(0);
    expect(readFileSync(`${out}a.html`, "utf8")).toContain(r2.counts);
    expect(readFileSync(`${out}b.html`, "utf8")).toContain("result 2 of `splicewright search --variants`");
  });
});

describe("search.min_across", () => {
  const flat = (width: number, min?: number) =>
    stringify({
      name: "invented flat tie",
      code: "is800-2007",
      splice: { type: "lap" },
      plates: { main: { width, thickness: 10, grade: "E250", edges: "rolled" } },
      load: { factored_tension: 120 },
      search: { sizes: ["M16", "M20"], classes: ["8.8"], step: 10, max_along: 3, ...(min !== undefined ? { min_across: min } : {}) },
    });
  const gridAcross = (text: string) => {
    const { scenario, code } = parseScenario(text);
    const fams = families(scenario, code, costs, resolveSpace(scenario, code, costs));
    const by = new Map<number, Set<number>>();
    for (const f of fams) if (f.pattern === "grid") by.set(f.size_mm, (by.get(f.size_mm) ?? new Set()).add(f.across));
    return by;
  };

  it("default: two across where the narrowest plate fits two, one where it does not — on a 100 mm flat M16 fits two (2 × 1.5 × 18 + 2.5 × 16 = 94 mm), M20 does not (2 × 1.5 × 22 + 2.5 × 20 = 116 mm) (IS 800:2007 cl. 10.2.2, 10.2.4.2, Table 19)", () => {
    const by = gridAcross(flat(100));
    expect(Math.min(...by.get(16)!)).toBe(2);
    expect(Math.min(...by.get(20)!)).toBe(1);
    expect(Math.max(...by.get(20)!)).toBe(1);
  });

  it("min_across: 1 lifts it; min_across: 3 raises it (grid, staggered and the tapered line at the butt)", () => {
    expect(Math.min(...gridAcross(flat(100, 1)).get(16)!)).toBe(1);
    const wide = flat(200, 3);
    const { scenario, code } = parseScenario(wide);
    const fams = families(scenario, code, costs, resolveSpace(scenario, code, costs));
    for (const f of fams) if (f.pattern !== "tapered") expect(f.across).toBeGreaterThanOrEqual(3);
    const out = searchLayouts({ scenario, code, costs }, { top: 15, rankBy: "cost", variants: true });
    expect(out.results.length).toBeGreaterThan(0);
    for (const c of out.results) expect(c.counts[0]!).toBeGreaterThanOrEqual(3);
    expect(out.spaceText.join("\n")).toContain("at least 3 (search.min_across)");
  });

  it("the 200 mm chord with two covers (truss bottom chord of the warehouse demo): no single gauge line among the rows, even every variant", () => {
    const chord = stringify({
      name: "invented chord",
      code: "is800-2007",
      splice: { type: "butt-double-cover" },
      plates: { main: { width: 200, thickness: 16, grade: "E250" }, cover: { width: 200, thickness: 10, grade: "E250", edges: "machine-flame-cut" } },
      load: { factored_tension: 560 },
      search: { sizes: ["M16", "M20", "M24"], classes: ["4.6", "8.8", "10.9"], max_along: 6 },
    });
    for (const r of rows([tempScenario(chord), "--top", "20", "--variants"])) expect(Math.max(...r.acrossPerLine), r.counts).toBeGreaterThanOrEqual(2);
    const lifted = withSearch(chord, (s) => (s.min_across = 1));
    const { scenario, code } = parseScenario(lifted);
    expect(families(scenario, code, costs, resolveSpace(scenario, code, costs)).some((f) => f.pattern === "grid" && f.across === 1)).toBe(true);
  });

  it("bad input: min_across above max_across, or zero — one line, exit 2", () => {
    const a = cli(["search", tempScenario(flat(200, 3).replace("min_across: 3", "min_across: 3\n  max_across: 2"))]);
    expect(a.code).toBe(2);
    expect(a.stderr.trim()).toBe("splicewright: error: search.min_across: 3 is more than search.max_across (2)");
    const b = cli(["search", tempScenario(flat(200, 0))]);
    expect(b.code).toBe(2);
    expect(b.stderr.trim().split("\n")).toHaveLength(1);
    expect(b.stderr).toMatch(/search\.min_across/);
  });
});

describe("dimensions with the precision they have", () => {
  it("search table: every length cell is the JSON value as it is (72.5 stays 72.5, 40 stays 40)", () => {
    const t = cli(["search", SEARCH, "--top", "10"]).stdout;
    const j = rows([SEARCH, "--top", "10"]);
    const lines = t.split("\n").filter((l) => /^│ \d+ +│/.test(l));
    expect(lines).toHaveLength(10);
    let fractional = 0;
    lines.forEach((l, i) => {
      const cells = l.split("│").map((c) => c.trim());
      const r = j[i]!;
      expect(cells).toContain(String(r.edgeDistance_mm));
      expect(cells).toContain(String(r.spliceLength_mm));
      expect(cells).toContain(r.gauge_mm === null ? "—" : String(r.gauge_mm));
      for (const c of [cells[5], cells[6], cells[8]]) expect(c).not.toMatch(/\.0$/); // pitch, gauge, edge: no spurious decimals
      if (!Number.isInteger(r.edgeDistance_mm)) fractional++;
    });
    expect(fractional).toBeGreaterThan(0); // the demo has a 72.5 mm edge distance (2 across on 220 mm at a 75 mm gauge)
  });

  it("the sheet: 40 mm, not 40.0 mm, in the layout line and the plate table", () => {
    const s = cli(["check", scenarioPath("footbridge-tie.yaml")]).stdout;
    expect(s).toMatch(/pitch 65 mm, gauge 70 mm, end distance\s+40 mm/);
    expect(s).toMatch(/both cover plates +220 × 10 /);
  });
});

describe("tapered counts with min_across: the programme and its fallback agree", () => {
  it("every vector of 3 lines with at most 5 across, line 0 at least 4: the integer programme's stream equals the enumeration's", async () => {
    const { enumerateNext, meetsConstraints, nextTaperedCounts } = await import("../src/search/tapered-ip.js");
    // A plate that no net-section row limits (invented numbers: the rows only bound the counts here).
    const problem = { lines: 3, kmax: [5, 5, 5], minFirst: 4, holeAcross_mm: 22, tension_N: 100_000, transferred: false, rows: [{ share: 1, perWidth_N_per_mm: 5000, width_mm: 300, atOrNearer: [[0], [0, 1], [0, 1, 2]] }] };
    const stream = (next: typeof nextTaperedCounts | typeof enumerateNext) => {
      const out: number[][] = [];
      for (let N = 3; N <= 15; N++) {
        for (;;) {
          const a = next(problem, N, out);
          if (!a) break;
          out.push(a.counts);
        }
      }
      return out;
    };
    const ip = stream(nextTaperedCounts);
    const en = stream(enumerateNext);
    expect(ip.map((c) => c.join("-")).sort()).toEqual(en.map((c) => c.join("-")).sort());
    expect(ip.length).toBeGreaterThan(3);
    for (const c of ip) expect(c[0]!).toBeGreaterThanOrEqual(4);
    // Uniform vectors are not excluded here (no cuts given), so 4-4-4 and 5-5-5 appear; 3-1-1 never does.
    expect(meetsConstraints(problem, [3, 1, 1])).toBe(false);
    expect(meetsConstraints(problem, [4, 2, 2])).toBe(true);
  });
});
