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

/** A small EN 1993-1-8 search scenario over a reduced space (2 sizes × 2 classes, 10 mm steps, ≤ 3 lines). */
export function smallEc3Scenario(seed: number): Generated {
  const r = rng(seed);
  const type = pick(r, ["lap", "butt-single-cover", "butt-double-cover"] as const);
  const width = pick(r, [100, 120, 140, 160, 200]);
  const t = pick(r, [8, 10, 12, 16]);
  const grade = pick(r, ["S235", "S275", "S355"]);
  const fy = { S235: 235, S275: 275, S355: 355 }[grade]!;
  const category = pick(r, ["A", "A", "A", "B", "C"] as const);
  const plates: Record<string, unknown> = { main: { width, thickness: t, grade } };
  if (type !== "lap") {
    if (r() < 0.4) plates.main_b = { width, thickness: t + pick(r, [2, 4, 8]), grade };
    plates.cover = { width, thickness: pick(r, [6, 8, 10]), grade: "S275" };
  }
  const tension = Math.round(((width * t * fy) / 1000) * (0.15 + 0.5 * r()));
  const scenario: Record<string, unknown> = {
    name: `generated EC3 ${seed}`,
    code: "en1993-1-8",
    splice: { type },
    plates,
    load: { factored_tension: tension, ...(category === "B" ? { service_tension: Math.round(tension * 0.7) } : {}) },
    search: {
      sizes: pick(r, [[12, 16], [16, 20], [12, 20]]),
      classes: category !== "A" ? ["8.8", "10.9"] : pick(r, [["4.6", "8.8"], ["5.6", "10.9"], ["4.6", "5.6"], ["8.8", "10.9"]]),
      step: 10,
      max_along: pick(r, [2, 3]),
      ...(type !== "lap" ? { cover_thicknesses: pick(r, [[6], [8], [6, 10]]) } : {}),
    },
    options: { net_section_load: pick(r, ["full", "transferred"]), exposed_to_corrosion: r() < 0.3 },
  };
  if (category !== "A") scenario.bolts = { size: 20, class: "8.8", type: "friction-grip", slip_factor: pick(r, [0.3, 0.5]), slip_at: category === "B" ? "service" : "ultimate" };
  return { yaml: stringify(scenario), description: `EC3 ${type}, ${width} × ${t} ${grade}, T = ${tension} kN, Category ${category}` };
}

/** A small AISC 360-16 search scenario in US units (inch bolts, A36 / A572-50 plates, a 1/2 in step, ≤ 3 lines). */
export function smallAiscScenario(seed: number): Generated {
  const r = rng(seed);
  const type = pick(r, ["lap", "butt-single-cover", "butt-double-cover"] as const);
  const width = pick(r, [4, 5, 6, 8]);
  const t = pick(r, [0.375, 0.5, 0.625]);
  const grade = pick(r, ["A36", "A572-50"]);
  const Fy = grade === "A36" ? 36 : 50;
  const slip = r() < 0.2;
  const plates: Record<string, unknown> = { main: { width, thickness: t, grade, edges: "sheared" } };
  if (type !== "lap") {
    if (r() < 0.3) plates.main_b = { width, thickness: t + 0.125, grade, edges: "sheared" };
    plates.cover = { width, thickness: pick(r, [0.25, 0.375]), grade: "A36", edges: "sheared" };
  }
  const tension = Math.round(0.9 * width * t * Fy * (0.2 + 0.5 * r()));
  const scenario: Record<string, unknown> = {
    name: `generated AISC ${seed}`,
    units: "us",
    code: "aisc360-16",
    splice: { type, ...(type !== "lap" ? { butt_gap: 0.375 } : {}) },
    plates,
    load: { factored_tension: tension },
    search: {
      sizes: pick(r, [["5/8 in", "3/4 in"], ["1/2 in", "3/4 in"], ["3/4 in", "7/8 in"]]),
      classes: slip ? ["8.8", "10.9"] : pick(r, [["4.6", "8.8"], ["8.8", "10.9"], ["4.6", "10.9"]]),
      step: "1/2 in",
      max_along: pick(r, [2, 3]),
      ...(type !== "lap" ? { cover_thicknesses: pick(r, [["1/4 in"], ["3/8 in"]]) } : {}),
    },
    options: { net_section_load: pick(r, ["full", "transferred"]) },
  };
  if (slip) scenario.bolts = { size: "3/4 in", class: "A325", type: "friction-grip", slip_factor: pick(r, [0.3, 0.5]) };
  return { yaml: stringify(scenario), description: `AISC ${type}, ${width} × ${t} in ${grade}, Pu = ${tension} kips${slip ? ", slip-critical" : ""}` };
}
