/**
 * Generated jobs for the benchmark and the tests: invented roof-steelwork splices (bracing flats in lap
 * splices, web ties with one cover plate, chords with two), seeded and reproducible. The project is
 * returned as JSON text, which is also YAML. Pure; not real data.
 */

/** A small deterministic generator (LCG, Numerical Recipes constants): values in [0, 1). */
export function seeded(seed: number): () => number {
  let s = seed >>> 0 || 1;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 4294967296;
  };
}

export interface GenerateOptions {
  sizes?: number[];
  classes?: string[];
  step?: number;
  maxAlong?: number;
  /** The schedule section of the project file. */
  schedule?: Record<string, unknown>;
}

/** A project of `count` splices. */
export function generatedProject(count: number, seed: number, opts: GenerateOptions = {}): string {
  const r = seeded(seed);
  const pick = <T>(xs: readonly T[]): T => xs[Math.floor(r() * xs.length)]!;
  const designYield_kN = (w: number, t: number) => (w * t * 250) / 1.1 / 1000;
  const splices = Array.from({ length: count }, (_, i) => {
    const kind = pick(["bracing", "bracing", "web", "chord"] as const);
    const id = `G-${String(i + 1).padStart(4, "0")}`;
    const quantity = 1 + Math.floor(r() * 6);
    const share = 0.25 + 0.35 * r();
    if (kind === "bracing") {
      const w = pick([80, 90, 100, 110, 120, 130, 140]);
      const t = pick([6, 8, 10, 12]);
      return { id, mark: `B${i + 1}`, quantity, splice: { type: "lap" }, plates: { main: { width: w, thickness: t, grade: "E250" } }, load: { factored_tension: Math.round(share * designYield_kN(w, t)) } };
    }
    if (kind === "web") {
      const w = pick([90, 100, 120, 140]);
      const t = pick([8, 10, 12]);
      return { id, mark: `W${i + 1}`, quantity, splice: { type: "butt-single-cover" }, plates: { main: { width: w, thickness: t, grade: "E250" }, cover: { width: w, thickness: t + pick([0, 2]), grade: "E250" } }, load: { factored_tension: Math.round(share * designYield_kN(w, t)) } };
    }
    const w = pick([160, 180, 200, 220, 240]);
    const t = pick([12, 16, 20]);
    const tc = Math.ceil(t / 2 / 2) * 2 + 2;
    return {
      id,
      mark: `C${i + 1}`,
      quantity,
      splice: { type: "butt-double-cover" },
      plates: { main: { width: w, thickness: t, grade: pick(["E250", "E350"]) }, cover: { width: w, thickness: tc, grade: "E250", edges: "machine-flame-cut" } },
      load: { factored_tension: Math.round(share * designYield_kN(w, t)) },
      search: { cover_thicknesses: [tc, tc + 2] },
    };
  });
  const project: Record<string, unknown> = {
    project: `Generated roof job ${seed} (${count} splices, invented)`,
    code: "is800-2007",
    search: { sizes: opts.sizes ?? [16, 20, 24], classes: opts.classes ?? ["4.6", "8.8", "10.9"], step: opts.step ?? 5, max_along: opts.maxAlong ?? 6 },
    splices,
  };
  if (opts.schedule) project.schedule = opts.schedule;
  return JSON.stringify(project, null, 1);
}
