/** Seeded generation of small search scenarios (invented data, for the optimality tests only). */
import { stringify } from "yaml";

/** Mulberry32: a small deterministic PRNG. */
export function rng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const pick = <T>(r: () => number, xs: readonly T[]): T => xs[Math.floor(r() * xs.length)]!;

export interface Generated {
  yaml: string;
  description: string;
}

/** A small scenario over a reduced space: 2 sizes × 2 classes, a 10 mm step, few lines. */
export function smallSearchScenario(seed: number): Generated {
  const r = rng(seed);
  const type = pick(r, ["lap", "butt-single-cover", "butt-double-cover"] as const);
  const width = pick(r, [100, 120, 140, 160]);
  const t = pick(r, [8, 10, 12, 16]);
  const grade = pick(r, ["E250", "E350"]);
  const edges = pick(r, ["rolled", "sheared", "machine-flame-cut"]);
  const fy = grade === "E250" ? 250 : 350;
  const friction = r() < 0.2;
  const plates: Record<string, unknown> = { main: { width, thickness: t, grade, edges } };
  if (type !== "lap") {
    if (r() < 0.4) plates.main_b = { width, thickness: t + pick(r, [2, 4, 8]), grade, edges };
    plates.cover = { width, thickness: pick(r, [6, 8, 10]), grade: "E250", edges: "machine-flame-cut" };
  }
  const tension = Math.round(((width * t * fy) / 1.1 / 1000) * (0.2 + 0.5 * r()));
  const scenario: Record<string, unknown> = {
    name: `generated ${seed}`,
    code: "is800-2007",
    splice: { type },
    plates,
    load: { factored_tension: tension, ...(friction ? { service_tension: Math.round(tension * 0.7) } : {}) },
    search: {
      sizes: pick(r, [[12, 16], [16, 20], [12, 20]]),
      classes: friction ? ["8.8", "10.9"] : pick(r, [["4.6", "8.8"], ["5.6", "10.9"], ["4.6", "5.6"], ["8.8", "10.9"]]),
      step: 10,
      max_along: pick(r, [2, 3]),
      ...(type !== "lap" ? { cover_thicknesses: pick(r, [[6], [8], [6, 10]]) } : {}),
    },
    options: { net_section_load: pick(r, ["full", "transferred"]) },
  };
  if (friction) scenario.bolts = { size: 20, class: "8.8", type: "friction-grip", slip_factor: pick(r, [0.3, 0.48]), slip_at: pick(r, ["service", "ultimate"]) };
  return { yaml: stringify(scenario), description: `${type}, ${width} × ${t} ${grade}, T = ${tension} kN${friction ? ", friction grip" : ""}` };
}
