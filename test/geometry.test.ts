/**
 * Geometry from coordinates: least net path (straight and zig-zag) and block shear shapes.
 * No published values exist for these paths; the expectations are hand calculations from the
 * formula of IS 800:2007 cl. 6.3.1 (b − Σd0 + Σ s²/4g) and cl. 6.4.1, written out beside each,
 * plus a brute-force enumeration of every monotone path written independently here.
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { blockShapes } from "../src/geometry/block-shear.js";
import { leastNetPath } from "../src/geometry/net-section.js";
import { patternHoles } from "../src/geometry/patterns.js";
import type { Hole } from "../src/model/joint.js";

function holes(points: Array<[number, number]>, d0 = 22): Hole[] {
  return points.map(([x, y], i) => ({ id: `H${i + 1}`, group: "J", x_mm: x, y_mm: y, across_mm: d0, along_mm: d0 }));
}

/** Every path that rises strictly in y, by plain recursion over subsets (test oracle). */
function bruteForceNetWidth(hs: Hole[], width: number): number {
  const sorted = [...hs].sort((a, b) => a.y_mm - b.y_mm);
  let best = width;
  const walk = (last: Hole | null, from: number, width_so_far: number) => {
    // width_so_far = b − Σd0 + Σ s²/4g for the path so far
    best = Math.min(best, width_so_far);
    for (let k = from; k < sorted.length; k++) {
      const h = sorted[k]!;
      if (last && h.y_mm <= last.y_mm) continue;
      const add = last ? ((h.x_mm - last.x_mm) ** 2) / (4 * (h.y_mm - last.y_mm)) : 0;
      walk(h, k + 1, width_so_far - h.across_mm + add);
    }
  };
  walk(null, 0, width);
  return best;
}

describe("least net section, IS 800:2007 cl. 6.3.1", () => {
  it("straight path: 200 mm plate, two 22 mm holes → 156 mm (hand: 200 − 2 × 22)", () => {
    const p = leastNetPath(holes([[40, -50], [40, 50]]), 200);
    expect(p.netWidth_mm).toBeCloseTo(156, 9);
    expect(p.holes).toHaveLength(2);
  });

  it("zig-zag governs: staggered 3/2, s = 40, g = 45 on 260 mm → 185.56 mm", () => {
    // Gauge lines at −90, −45, 0, 45, 90; odd lines at x = 40 on −90, 0, 90; even at x = 80 on −45, 45.
    // Through all five: 260 − 5 × 22 + 4 × 40²/(4 × 45) = 260 − 110 + 35.56 = 185.56 mm.
    // Straight through three: 260 − 66 = 194 mm. The zig-zag is smaller.
    const hs = holes([[40, -90], [40, 0], [40, 90], [80, -45], [80, 45]]);
    const p = leastNetPath(hs, 260);
    expect(p.netWidth_mm).toBeCloseTo(260 - 110 + (4 * 1600) / 180, 9);
    expect(p.holes).toHaveLength(5);
    expect(p.staggerAddition_mm).toBeCloseTo(35.556, 3);
  });

  it("straight governs when the stagger is long: s = 80, g = 45 → 194 mm", () => {
    // Zig-zag: 260 − 110 + 4 × 80²/180 = 292.2 mm > straight 194 mm.
    const hs = holes([[40, -90], [40, 0], [40, 90], [120, -45], [120, 45]]);
    expect(leastNetPath(hs, 260).netWidth_mm).toBeCloseTo(194, 9);
  });

  it("a path may skip a gauge line between two holes: holes at y −60 and +60 with a hole at y 0 far away", () => {
    // Through the two outer holes only (leg g = 120, s = 0): 240 − 44 = 196 mm;
    // through all three: 240 − 66 + 2 × 300²/(4 × 60) = 924 mm.
    const hs = holes([[40, -60], [340, 0], [40, 60]]);
    expect(leastNetPath(hs, 240).netWidth_mm).toBeCloseTo(196, 9);
  });

  it("equals a brute-force enumeration of every monotone path on random hole sets", () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.integer({ min: 1, max: 12 }), fc.integer({ min: -5, max: 5 })), { minLength: 1, maxLength: 9 }),
        (cells) => {
          const unique = [...new Map(cells.map(([i, j]) => [`${i},${j}`, [i * 25, j * 20] as [number, number]])).values()];
          const hs = holes(unique, 18);
          const dp = leastNetPath(hs, 240).netWidth_mm;
          expect(dp).toBeCloseTo(bruteForceNetWidth(hs, 240), 9);
        },
      ),
      { numRuns: 300, seed: 20261202 },
    );
  });
});

describe("block shear shapes, IS 800:2007 cl. 6.4.1", () => {
  // 3 across × 2 along, g 70, p 65, end 40, plate 220 wide, d0 22; the plate end at x = 0,
  // bolts bearing toward it (towardEnd −1, endX 0).
  const hs = holes(patternHoles({ kind: "grid", across: 3, along: 2, pitch_mm: 65, gauge_mm: 70, endDistance_mm: 40, endDistanceAtButt_mm: 40 }, 40).map((h) => [h.x_mm, h.y_mm] as [number, number]));
  const shapes = blockShapes(hs, { group: "J", endX_mm: 0, towardEnd: -1 }, 220);

  it("central block between the outer gauge lines: Lv = 105, Avg/t = 210, Avn/t = 2 × (105 − 1.5 × 22) = 144, Atg/t = 140, Atn/t = 140 − 2 × 22 = 96", () => {
    const central = shapes.find((s) => s.description === "central block between gauge lines 1 and 3 of 3")!;
    expect(central).toMatchObject({ shearGross_mm: 210, shearNet_mm: 144, tensionGross_mm: 140, tensionNet_mm: 96, boltsInBlock: 6 });
  });

  it("edge strips outside the outer gauge lines: Atg/t = 2 × 40 = 80, Atn/t = 2 × (40 − 11) = 58, 4 of 6 bolts", () => {
    const edges = shapes.find((s) => s.description === "edge strips outside the outer gauge lines")!;
    expect(edges).toMatchObject({ shearGross_mm: 210, shearNet_mm: 144, tensionGross_mm: 80, tensionNet_mm: 58, boltsInBlock: 4 });
  });

  it("one edge strip over gauge lines 2–3: shear 105 / 72, tension 110 / (110 − 22 − 11) = 77, 4 of 6 bolts", () => {
    const one = shapes.find((s) => s.description === "one edge strip, gauge lines 2–3 of 3")!;
    expect(one).toMatchObject({ shearGross_mm: 105, shearNet_mm: 72, tensionGross_mm: 110, tensionNet_mm: 77, boltsInBlock: 4 });
  });

  it("the one-sided block over every gauge line: shear plane on line 1, 105 / (105 − 1.5 × 22) = 72; tension plane from line 1 to the far edge, 2 × 70 + 40 = 180 / (180 − 2.5 × 22) = 125; 6 of 6 bolts", () => {
    const one = shapes.find((s) => s.description.startsWith("one-sided block, shear plane on gauge line 1 of 3"))!;
    expect(one).toMatchObject({ shearGross_mm: 105, shearNet_mm: 72, tensionGross_mm: 180, tensionNet_mm: 125, boltsInBlock: 6 });
    const mirror = shapes.find((s) => s.description.startsWith("one-sided block, shear plane on gauge line 3 of 3"))!;
    expect(mirror).toMatchObject({ shearGross_mm: 105, shearNet_mm: 72, tensionGross_mm: 180, tensionNet_mm: 125, boltsInBlock: 6 });
  });

  it("lists every shape: 3 central blocks, 1 two-sided and 4 one-sided edge strips, 2 one-sided blocks over every line, for 3 gauge lines", () => {
    expect(shapes).toHaveLength(10);
  });

  it("a single gauge line forms the one-sided block each way: shear 100 / (100 − 1.5 × 22) = 67, tension 50 / (50 − 11) = 39, 2 of 2 bolts", () => {
    const line = holes([[40, 0], [100, 0]]);
    const single = blockShapes(line, { group: "J", endX_mm: 0, towardEnd: -1 }, 100);
    expect(single).toHaveLength(2);
    for (const s of single) expect(s).toMatchObject({ shearGross_mm: 100, shearNet_mm: 67, tensionGross_mm: 50, tensionNet_mm: 39, boltsInBlock: 2 });
  });
});
