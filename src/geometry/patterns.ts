/**
 * Pattern generators: a layout spec → hole centres of one bolt group.
 * Local coordinates: x from the loaded plate end (lap: end of plate B; butt: butt end of main plate B),
 * y from the plate axis.
 */
import type { LayoutSpec } from "../model/scenario.js";

export interface LocalHole {
  x_mm: number;
  y_mm: number;
}

/** Round to 1e-9 mm so generated coordinates compare exactly. */
function clean(v: number): number {
  const r = Math.round(v * 1e9) / 1e9;
  return r === 0 ? 0 : r;
}

/**
 * Hole centres of one group. `firstLineX_mm` is the x of the first transverse line
 * (the end distance at the loaded end).
 */
export function patternHoles(layout: LayoutSpec, firstLineX_mm: number): LocalHole[] {
  const holes: LocalHole[] = [];
  switch (layout.kind) {
    case "grid":
      for (let i = 0; i < layout.along; i++) {
        for (let j = 0; j < layout.across; j++) {
          holes.push({
            x_mm: clean(firstLineX_mm + i * layout.pitch_mm),
            y_mm: clean((j - (layout.across - 1) / 2) * layout.gauge_mm),
          });
        }
      }
      return holes;
    case "staggered": {
      // Gauge lines k = 0 .. 2·across − 2 at spacing g, centred on the axis.
      // Odd transverse lines (i = 0, 2, ...) use even k (across bolts); even lines use odd k (across − 1 bolts).
      const gaugeLines = 2 * layout.across - 1;
      for (let i = 0; i < layout.along; i++) {
        for (let k = i % 2; k < gaugeLines; k += 2) {
          holes.push({
            x_mm: clean(firstLineX_mm + i * layout.pitch_mm),
            y_mm: clean((k - (gaugeLines - 1) / 2) * layout.gauge_mm),
          });
        }
      }
      return holes;
    }
    case "tapered":
      layout.acrossPerLine.forEach((count, i) => {
        for (let j = 0; j < count; j++) {
          holes.push({
            x_mm: clean(firstLineX_mm + i * layout.pitch_mm),
            y_mm: clean((j - (count - 1) / 2) * layout.gauge_mm),
          });
        }
      });
      return holes;
    case "holes":
      return layout.holes.map((h) => ({ x_mm: h.x_mm, y_mm: h.y_mm }));
  }
}

/** End distance at the loaded end: lap — plate B's end; butt — the main plate's butt end. */
export function loadedEndDistance(layout: LayoutSpec, butt: boolean): number {
  if (layout.kind === "holes") return Math.min(...layout.holes.map((h) => h.x_mm));
  return butt ? layout.endDistanceAtButt_mm : layout.endDistance_mm;
}

/** Describe a pattern so no one misreads the counts: "3 across × 4 along". */
export function describePattern(layout: LayoutSpec, holesPerGroup: number): string {
  switch (layout.kind) {
    case "grid":
      return `${layout.across} across × ${layout.along} along (grid)`;
    case "staggered":
      return `${layout.across}/${layout.across - 1} across × ${layout.along} along (staggered)`;
    case "tapered":
      return `${layout.acrossPerLine.join("-")} across × ${layout.acrossPerLine.length} along (tapered)`;
    case "holes":
      return `${holesPerGroup} holes (explicit coordinates)`;
  }
}
